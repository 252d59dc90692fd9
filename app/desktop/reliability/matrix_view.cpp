#include "app/desktop/reliability/matrix_view.h"

#include "app/colour/colour.h"

#include <QFontMetrics>
#include <QPainter>

#include <algorithm>

namespace fourfold {

namespace {

constexpr int kCell = 64; // preferred cell width and height, pixels
constexpr int kMargin = 12;

} // namespace

MatrixView::MatrixView(QWidget *parent)
    : QWidget(parent)
{
    setSizePolicy(QSizePolicy::Expanding, QSizePolicy::Expanding);
}

void MatrixView::setMatrix(const QStringList &rows, const QStringList &columns,
    const std::vector<std::optional<double>> &shade, const QStringList &texts,
    const std::function<QColor(double)> &scale)
{
    m_rows = rows;
    m_columns = columns;
    m_shade = shade;
    m_texts = texts;
    m_scale = scale;
    m_shade.resize(size_t(rows.size() * columns.size()));
    while (m_texts.size() < rows.size() * columns.size())
        m_texts << QString();
    m_rowColours.clear();
    m_columnColours.clear();
    updateGeometry();
    update();
}

void MatrixView::setLabelColours(
    const std::vector<QColor> &rows, const std::vector<QColor> &columns)
{
    m_rowColours = rows;
    m_columnColours = columns;
    update();
}

void MatrixView::setAxisTitles(const QString &rows, const QString &columns)
{
    m_rowTitle = rows;
    m_columnTitle = columns;
    update();
}

void MatrixView::setCaption(const QString &caption)
{
    m_caption = caption;
    update();
}

QString MatrixView::text(int row, int column) const
{
    return m_texts.value(row * m_columns.size() + column);
}

QSize MatrixView::sizeHint() const
{
    const QFontMetrics fm(font());
    int label = 0;
    for (const QString &r : m_rows)
        label = std::max(label, fm.horizontalAdvance(r));
    return QSize(kMargin * 3 + fm.height() + label + kCell * int(m_columns.size()),
        kMargin * 3 + fm.height() * 4 + kCell * int(m_rows.size()));
}

QSize MatrixView::minimumSizeHint() const
{
    return QSize(200, 160);
}

QColor MatrixView::cellColour(const std::optional<double> &v) const
{
    return v && m_scale ? m_scale(*v) : QColor(0xF4, 0xF4, 0xF2);
}

void MatrixView::paintEvent(QPaintEvent *)
{
    QPainter p(this);
    p.setRenderHint(QPainter::Antialiasing);
    p.fillRect(rect(), palette().base());
    const QFontMetrics fm(font());
    const int rows = int(m_rows.size());
    const int columns = int(m_columns.size());
    if (rows == 0 || columns == 0)
        return;
    int label = 0;
    for (const QString &r : m_rows)
        label = std::max(label, fm.horizontalAdvance(r));
    const int left = kMargin + (m_rowTitle.isEmpty() ? 0 : fm.height() + 6) + label + 8;
    const int top = kMargin + (m_columnTitle.isEmpty() ? 0 : fm.height() + 4) + fm.height() + 6;
    const int captionHeight = m_caption.isEmpty() ? 0 : fm.height() * 2 + 6;
    // Cells grow with the window up to a size where the figures still read as one table.
    const int cell = std::clamp(std::min((width() - left - kMargin) / columns,
                                    (height() - top - kMargin - captionHeight) / rows),
        24, 2 * kCell);
    const QColor text = palette().text().color();

    if (!m_columnTitle.isEmpty()) {
        p.setPen(text);
        p.drawText(
            QRect(left, kMargin, cell * columns, fm.height()), Qt::AlignCenter, m_columnTitle);
    }
    if (!m_rowTitle.isEmpty()) {
        p.save();
        p.translate(kMargin + fm.ascent(), top + cell * rows / 2);
        p.rotate(-90);
        p.setPen(text);
        p.drawText(QRect(-cell * rows / 2, -fm.ascent(), cell * rows, fm.height()), Qt::AlignCenter,
            m_rowTitle);
        p.restore();
    }
    for (int c = 0; c < columns; ++c) {
        const QColor colour =
            size_t(c) < m_columnColours.size() && m_columnColours[size_t(c)].isValid()
            ? m_columnColours[size_t(c)]
            : text;
        p.setPen(colour);
        p.drawText(QRect(left + c * cell, top - fm.height() - 4, cell, fm.height()),
            Qt::AlignCenter, fm.elidedText(m_columns[c], Qt::ElideRight, cell - 2));
    }
    for (int r = 0; r < rows; ++r) {
        const QColor colour = size_t(r) < m_rowColours.size() && m_rowColours[size_t(r)].isValid()
            ? m_rowColours[size_t(r)]
            : text;
        p.setPen(colour);
        p.drawText(QRect(left - label - 8, top + r * cell, label, cell),
            Qt::AlignRight | Qt::AlignVCenter, m_rows[r]);
        for (int c = 0; c < columns; ++c) {
            const QRect box(left + c * cell, top + r * cell, cell, cell);
            const auto &v = m_shade[size_t(r * columns + c)];
            const QColor fill = cellColour(v);
            p.fillRect(box.adjusted(1, 1, -1, -1), fill);
            if (!v) {
                p.save();
                p.setPen(QPen(QColor(0xC8, 0xC8, 0xC4), 1));
                p.setClipRect(box.adjusted(1, 1, -1, -1));
                for (int d = -cell; d < cell; d += 8)
                    p.drawLine(box.left() + d, box.bottom(), box.left() + d + cell, box.top());
                p.restore();
            }
            p.setPen(readableOn(fill));
            p.drawText(box, Qt::AlignCenter, m_texts.value(r * columns + c));
        }
    }
    p.setPen(QPen(palette().mid().color(), 1));
    p.setBrush(Qt::NoBrush);
    p.drawRect(QRect(left, top, cell * columns, cell * rows));
    if (!m_caption.isEmpty()) {
        p.setPen(text);
        p.drawText(QRect(left, top + cell * rows + 6,
                       std::max(cell * columns, width() - left - kMargin), fm.height() * 2 + 4),
            Qt::AlignLeft | Qt::AlignTop | Qt::TextWordWrap, m_caption);
    }
}

} // namespace fourfold
