#pragma once
// The report's two charts, painted with QPainter so that the same drawing becomes inline SVG in
// the HTML report and a bitmap in the PDF: alpha per variable with its bootstrap intervals
// against Krippendorff's 0.667 and 0.800 lines, and Cohen's kappa per coder pair as a heat map.

#include <QByteArray>
#include <QColor>
#include <QImage>
#include <QSizeF>
#include <QString>
#include <QStringList>

#include <functional>
#include <optional>
#include <vector>

class QPainter;

namespace fourfold {

// One row of the alpha chart; intervals are 95% bootstrap intervals (either may be missing).
struct AlphaChartRow {
    QString label;
    QColor colour;
    std::optional<double> alpha;
    std::optional<double> pairLow, pairHigh; // Hayes & Krippendorff (2007): pairs resampled
    std::optional<double> unitLow, unitHigh; // units resampled (percentile)
};

// Kappa per coder pair (rows) and variable (columns), row-major; missing = undefined.
struct KappaGrid {
    QStringList rows;
    QStringList columns;
    std::vector<std::optional<double>> cells;
};

using ChartPainter = std::function<void(QPainter &)>;

// Size in CSS pixels (1/96 inch) of each chart for its data.
QSizeF alphaChartSize(const std::vector<AlphaChartRow> &rows);
QSizeF kappaHeatMapSize(const KappaGrid &grid);
// Paints into a device of the size above, origin top left.
void paintAlphaChart(QPainter &painter, const std::vector<AlphaChartRow> &rows);
void paintKappaHeatMap(QPainter &painter, const KappaGrid &grid);

// The drawing as an <svg> element (no XML declaration), with `title` and `description` for
// screen readers. Empty on failure (QSvgGenerator reports none).
QByteArray chartSvg(const QSizeF &size, const QString &title, const QString &description,
    const ChartPainter &paint);
// The drawing as an image `scale` times the size, on white.
QImage chartImage(const QSizeF &size, double scale, const ChartPainter &paint);

} // namespace fourfold
