#pragma once
// A labelled matrix of figures drawn as shaded cells: the coder-pair agreement map and the
// function confusion matrix of the reliability window. The shade runs from near-white (the
// low end of the scale) to one strong colour (the high end); every cell also prints its figure,
// so the shade is never the only cue.

#include <QColor>
#include <QStringList>
#include <QWidget>

#include <functional>
#include <optional>
#include <vector>

namespace fourfold {

class MatrixView : public QWidget
{
    Q_OBJECT
public:
    explicit MatrixView(QWidget *parent = nullptr);

    // `shade` (row-major, rows × columns) gives each cell its colour through `scale`; nothing
    // draws the cell hatched as "not defined". `texts` (same size) are printed in the cells.
    // Row and column labels may carry a colour each (e.g. the function's); an invalid colour
    // prints in the text colour.
    void setMatrix(const QStringList &rows, const QStringList &columns,
        const std::vector<std::optional<double>> &shade, const QStringList &texts,
        const std::function<QColor(double)> &scale);
    void setLabelColours(const std::vector<QColor> &rows, const std::vector<QColor> &columns);
    // Titles of the row and column axes, e.g. "This coder's function".
    void setAxisTitles(const QString &rows, const QString &columns);
    // A line under the matrix explaining the scale.
    void setCaption(const QString &caption);

    int rowCount() const { return int(m_rows.size()); }
    QString text(int row, int column) const;

    QSize sizeHint() const override;
    QSize minimumSizeHint() const override;

protected:
    void paintEvent(QPaintEvent *event) override;

private:
    QColor cellColour(const std::optional<double> &v) const;

    QStringList m_rows, m_columns, m_texts;
    std::vector<QColor> m_rowColours, m_columnColours;
    std::vector<std::optional<double>> m_shade;
    std::function<QColor(double)> m_scale;
    QString m_rowTitle, m_columnTitle, m_caption;
};

} // namespace fourfold
