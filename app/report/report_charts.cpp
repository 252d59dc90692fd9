#include "app/report/report_charts.h"

#include "app/colour/colour.h"
#include "core/agreement/agreement_report.h"

#include <QBuffer>
#include <QCoreApplication>
#include <QFont>
#include <QFontMetricsF>
#include <QPainter>
#include <QPainterPath>
#include <QSvgGenerator>

#include <algorithm>
#include <cmath>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ReportChartsText {
    Q_DECLARE_TR_FUNCTIONS(ReportChartsText)
};

const QColor kInk(0x22, 0x26, 0x2E);
const QColor kMuted(0x6B, 0x70, 0x7A);
const QColor kRule(0xD8, 0xDA, 0xDE);

QFont chartFont(double pixels, bool bold = false)
{
    QFont font(QStringLiteral("DejaVu Sans"));
    font.setPixelSize(int(std::lround(pixels)));
    font.setBold(bold);
    return font;
}

// Alpha chart geometry (CSS pixels).
constexpr double kLabelWidth = 200;
constexpr double kValueWidth = 62;
constexpr double kPlotWidth = 400;
constexpr double kRowHeight = 30;
constexpr double kTop = 34;
constexpr double kBottom = 58;

// The axis runs from 0 (or lower, in steps of 0.2, when a value or interval lies below) to 1.
double axisMinimum(const std::vector<AlphaChartRow> &rows)
{
    double low = 0.0;
    for (const AlphaChartRow &r : rows)
        for (const auto &v : {r.alpha, r.pairLow, r.unitLow})
            if (v)
                low = std::min(low, *v);
    return std::max(-1.0, std::floor(low / 0.2) * 0.2);
}

} // namespace

QSizeF alphaChartSize(const std::vector<AlphaChartRow> &rows)
{
    return {kLabelWidth + kPlotWidth + kValueWidth + 16,
        kTop + kRowHeight * double(std::max<size_t>(rows.size(), 1)) + kBottom};
}

void paintAlphaChart(QPainter &p, const std::vector<AlphaChartRow> &rows)
{
    p.setRenderHint(QPainter::Antialiasing);
    const QSizeF size = alphaChartSize(rows);
    const double low = axisMinimum(rows);
    const double left = kLabelWidth;
    const double plotTop = kTop;
    const double plotBottom = kTop + kRowHeight * double(std::max<size_t>(rows.size(), 1));
    auto x = [&](double v) { return left + (v - low) / (1.0 - low) * kPlotWidth; };

    // Krippendorff (2004, §12.2): rely on alpha ≥ 0.800, tentative conclusions from 0.667.
    p.fillRect(QRectF(QPointF(x(kAlphaTentative), plotTop), QPointF(x(kAlphaReliable), plotBottom)),
        QColor(0xF6, 0xEE, 0xD9));
    p.fillRect(QRectF(QPointF(x(kAlphaReliable), plotTop), QPointF(x(1.0), plotBottom)),
        QColor(0xE4, 0xEF, 0xE6));

    // Grid and axis labels every 0.2.
    p.setFont(chartFont(11));
    for (int i = 0; low + i * 0.2 <= 1.0 + 1e-9; ++i) {
        const double v = low + i * 0.2;
        p.setPen(QPen(kRule, 1));
        p.drawLine(QPointF(x(v), plotTop), QPointF(x(v), plotBottom));
        p.setPen(kMuted);
        p.drawText(QRectF(x(v) - 30, plotBottom + 4, 60, 16), Qt::AlignHCenter | Qt::AlignTop,
            QString::number(v, 'f', 1));
    }
    // Each line in a shade and pattern of its own (the reliability window's), named at its top:
    // 0.667 to the left of its line and 0.800 to the right of its, so the two names never run
    // into each other however close a wide axis puts the lines.
    for (const auto &[value, colour, style, name, alignment] :
        {std::tuple {kAlphaTentative, QColor(0x85, 0x8B, 0x94), Qt::DashLine,
             QStringLiteral("0.667"), Qt::AlignRight},
            std::tuple {kAlphaReliable, QColor(0x5A, 0x3A, 0x8C), Qt::SolidLine,
                QStringLiteral("0.800"), Qt::AlignLeft}}) {
        p.setPen(QPen(colour, 1.6, style));
        p.drawLine(QPointF(x(value), plotTop - 8), QPointF(x(value), plotBottom));
        p.setPen(colour.darker(120));
        p.setFont(chartFont(11, true));
        const QRectF box = alignment == Qt::AlignRight ? QRectF(x(value) - 63, plotTop - 24, 60, 16)
                                                       : QRectF(x(value) + 3, plotTop - 24, 60, 16);
        p.drawText(box, alignment | Qt::AlignBottom, name);
    }

    for (size_t i = 0; i < rows.size(); ++i) {
        const AlphaChartRow &r = rows[i];
        const double y = plotTop + kRowHeight * (double(i) + 0.5);
        const QFont labelFont = chartFont(13);
        p.setFont(labelFont);
        p.setPen(kInk);
        p.drawText(QRectF(0, y - kRowHeight / 2, kLabelWidth - 12, kRowHeight),
            Qt::AlignRight | Qt::AlignVCenter,
            QFontMetricsF(labelFont).elidedText(r.label, Qt::ElideRight, kLabelWidth - 16));
        if (r.unitLow && r.unitHigh) {
            // Units resampled: a broad, light band.
            QColor band = r.colour;
            band.setAlphaF(0.35f);
            p.setPen(Qt::NoPen);
            p.setBrush(band);
            p.drawRoundedRect(
                QRectF(QPointF(x(*r.unitLow), y - 5), QPointF(x(*r.unitHigh), y + 5)), 3, 3);
        }
        if (r.pairLow && r.pairHigh) {
            // Pairs resampled (Hayes & Krippendorff 2007): a thin whisker with caps.
            p.setPen(QPen(kInk, 1.5));
            p.drawLine(QPointF(x(*r.pairLow), y), QPointF(x(*r.pairHigh), y));
            p.drawLine(QPointF(x(*r.pairLow), y - 6), QPointF(x(*r.pairLow), y + 6));
            p.drawLine(QPointF(x(*r.pairHigh), y - 6), QPointF(x(*r.pairHigh), y + 6));
        }
        p.setFont(chartFont(13, true));
        if (r.alpha) {
            p.setPen(QPen(Qt::white, 1.5));
            p.setBrush(r.colour);
            p.drawEllipse(QPointF(x(*r.alpha), y), 6.5, 6.5);
            p.setPen(kInk);
            p.drawText(QRectF(left + kPlotWidth + 8, y - kRowHeight / 2, kValueWidth, kRowHeight),
                Qt::AlignLeft | Qt::AlignVCenter, QString::number(*r.alpha, 'f', 3));
        } else {
            p.setPen(kMuted);
            p.drawText(QRectF(left + kPlotWidth + 8, y - kRowHeight / 2, kValueWidth, kRowHeight),
                Qt::AlignLeft | Qt::AlignVCenter, ReportChartsText::tr("undef."));
        }
    }

    // Legend.
    const double ly = size.height() - 18;
    p.setFont(chartFont(11));
    p.setPen(QPen(kInk, 1.5));
    p.drawLine(QPointF(left, ly), QPointF(left + 24, ly));
    p.drawLine(QPointF(left, ly - 5), QPointF(left, ly + 5));
    p.drawLine(QPointF(left + 24, ly - 5), QPointF(left + 24, ly + 5));
    p.setPen(kMuted);
    p.drawText(QRectF(left + 30, ly - 8, 190, 16), Qt::AlignLeft | Qt::AlignVCenter,
        ReportChartsText::tr("95% CI, pairs resampled"));
    QColor band = kMuted;
    band.setAlphaF(0.35f);
    p.setPen(Qt::NoPen);
    p.setBrush(band);
    p.drawRoundedRect(QRectF(left + 215, ly - 5, 24, 10), 3, 3);
    p.setPen(kMuted);
    p.drawText(QRectF(left + 245, ly - 8, 200, 16), Qt::AlignLeft | Qt::AlignVCenter,
        ReportChartsText::tr("95% CI, units resampled"));
}

QSizeF kappaHeatMapSize(const KappaGrid &grid)
{
    return {
        120 + 92.0 * double(grid.columns.size()) + 8, 40 + 34.0 * double(grid.rows.size()) + 46};
}

void paintKappaHeatMap(QPainter &p, const KappaGrid &grid)
{
    p.setRenderHint(QPainter::Antialiasing);
    constexpr double left = 120, top = 40, w = 92, h = 34;
    p.setFont(chartFont(12, true));
    p.setPen(kInk);
    for (qsizetype c = 0; c < grid.columns.size(); ++c)
        p.drawText(QRectF(left + w * double(c), 0, w, top - 6), Qt::AlignHCenter | Qt::AlignBottom,
            grid.columns[c]);
    for (qsizetype r = 0; r < grid.rows.size(); ++r) {
        p.setFont(chartFont(12, true));
        p.setPen(kInk);
        p.drawText(QRectF(0, top + h * double(r), left - 10, h), Qt::AlignRight | Qt::AlignVCenter,
            grid.rows[r]);
        for (qsizetype c = 0; c < grid.columns.size(); ++c) {
            const QRectF cell(left + w * double(c) + 1, top + h * double(r) + 1, w - 2, h - 2);
            const size_t index = size_t(r * grid.columns.size() + c);
            const double *v =
                index < grid.cells.size() && grid.cells[index] ? &*grid.cells[index] : nullptr;
            p.setFont(chartFont(12));
            if (v) {
                const QColor fill = agreementColour(*v);
                p.fillRect(cell, fill);
                p.setPen(readableOn(fill, kInk));
                p.drawText(cell, Qt::AlignCenter, QString::number(*v, 'f', 3));
            } else {
                p.fillRect(cell, QBrush(kRule, Qt::BDiagPattern));
                p.setPen(kMuted);
                p.drawText(cell, Qt::AlignCenter, ReportChartsText::tr("undefined"));
            }
        }
    }
    // The colour scale, -0.2 … 1.
    const double sy = top + h * double(grid.rows.size()) + 14;
    const double sw = std::min(260.0, w * double(grid.columns.size()));
    for (int i = 0; i < 60; ++i) {
        const double v = -0.2 + 1.2 * i / 59.0;
        p.fillRect(QRectF(left + sw * i / 60.0, sy, sw / 60.0 + 0.5, 10), agreementColour(v));
    }
    p.setFont(chartFont(10));
    p.setPen(kMuted);
    for (double v : {-0.2, 0.0, 0.5, 1.0})
        p.drawText(QRectF(left + sw * (v + 0.2) / 1.2 - 20, sy + 11, 40, 14), Qt::AlignHCenter,
            QString::number(v, 'f', 1));
    p.drawText(QRectF(left + sw + 10, sy - 3, 160, 16), Qt::AlignLeft | Qt::AlignVCenter,
        ReportChartsText::tr("Cohen's kappa"));
}

QByteArray chartSvg(
    const QSizeF &size, const QString &title, const QString &description, const ChartPainter &paint)
{
    QBuffer buffer;
    buffer.open(QIODevice::WriteOnly);
    QSvgGenerator generator;
    generator.setOutputDevice(&buffer);
    generator.setSize(size.toSize());
    generator.setViewBox(QRectF(QPointF(0, 0), size));
    // QSvgGenerator writes both verbatim into <title> and <desc>.
    generator.setTitle(title.toHtmlEscaped());
    generator.setDescription(description.toHtmlEscaped());
    // 96 dpi makes one painter unit one CSS pixel, so fonts keep their pixel size.
    generator.setResolution(96);
    {
        QPainter painter(&generator);
        paint(painter);
    }
    const QByteArray svg = buffer.data();
    const qsizetype start = svg.indexOf("<svg");
    const qsizetype viewBox = svg.indexOf("viewBox=", start);
    if (start < 0 || viewBox < 0)
        return {};
    // The generator gives the size in millimetres; CSS pixels keep the drawing at its size.
    return QByteArrayLiteral("<svg width=\"") + QByteArray::number(qRound(size.width()))
        + QByteArrayLiteral("\" height=\"") + QByteArray::number(qRound(size.height()))
        + QByteArrayLiteral("\" role=\"img\"\n ") + svg.mid(viewBox);
}

QImage chartImage(const QSizeF &size, double scale, const ChartPainter &paint)
{
    QImage image((size * scale).toSize(), QImage::Format_RGB32);
    image.fill(Qt::white);
    image.setDotsPerMeterX(int(std::lround(96 * scale / 0.0254)));
    image.setDotsPerMeterY(int(std::lround(96 * scale / 0.0254)));
    QPainter painter(&image);
    painter.scale(scale, scale);
    paint(painter);
    return image;
}

} // namespace fourfold
