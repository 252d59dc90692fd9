#include "app/desktop/span_lane_painter.h"

#include "app/colour/colour.h"
#include "app/desktop/function_style.h"

#include <QPainter>

#include <algorithm>
#include <cmath>

namespace fourfold {

namespace {

// `c` moved towards `target` in small steps until it reaches `ratio` against `against`.
QColor withContrast(QColor c, const QColor &target, const QColor &against, qreal ratio)
{
    for (int i = 0; i < 20 && contrastRatio(c, against) < ratio; ++i)
        c = mixColours(c, target, 0.1);
    return c;
}

} // namespace

LaneColours LaneColours::on(const QColor &base)
{
    LaneColours colours;
    colours.dark = base.lightnessF() < 0.5;
    const QColor white(Qt::white);
    const QColor black(Qt::black);
    for (FramingFunction f : kFramingFunctions) {
        const auto i = std::size_t(f);
        QColor lane = functionStyle(f).colour;
        if (colours.dark)
            lane = withContrast(lane, white, base, 4.5);
        colours.lane[i] = lane;
        colours.badgeFill[i] = mixColours(base, lane, colours.dark ? 0.22 : 0.12);
        colours.badgeText[i] =
            withContrast(lane, colours.dark ? white : black, colours.badgeFill[i], 4.5);
    }
    return colours;
}

void paintSpanLanes(QPainter &p, const SpanLaneLayout &layout, const LaneColours &colours,
    const std::vector<const LaneSpan *> &visible, const QRectF &clip)
{
    const LaneMetrics &metrics = layout.metrics();
    p.setRenderHint(QPainter::Antialiasing, false);
    const qreal stroke = metrics.stroke;

    struct Edge {
        qreal x;
        int delta;
    };
    for (FramingFunction f : kFramingFunctions) {
        const FunctionStyle style = functionStyle(f);
        const QColor colour = colours.lane[std::size_t(f)];
        std::vector<LanePiece> pieces;
        for (const LaneSpan *span : visible) {
            if (span->function != f)
                continue;
            for (const LanePiece &piece : layout.geometry(span->range16).pieces) {
                if (piece.lineBottom + metrics.zone >= clip.top() && piece.lineTop <= clip.bottom())
                    pieces.push_back(piece);
            }
        }
        std::sort(pieces.begin(), pieces.end(), [](const LanePiece &a, const LanePiece &b) {
            return a.lineKey != b.lineKey ? a.lineKey < b.lineKey : a.x1 < b.x1;
        });
        QPen pen(colour, stroke, style.line, Qt::FlatCap);
        QPen thin(colour, std::max<qreal>(1, std::floor(stroke / 2)), style.line, Qt::FlatCap);
        // Per line, sweep the pieces' edges: depth 1 is one rule, depth 2 and more a double rule.
        for (std::size_t i = 0; i < pieces.size();) {
            std::size_t j = i;
            std::vector<Edge> edges;
            while (j < pieces.size() && pieces[j].lineKey == pieces[i].lineKey) {
                edges.push_back({pieces[j].x1, +1});
                edges.push_back({pieces[j].x2, -1});
                ++j;
            }
            std::sort(edges.begin(), edges.end(), [](const Edge &a, const Edge &b) {
                return a.x != b.x ? a.x < b.x : a.delta > b.delta;
            });
            const qreal y = layout.laneY(pieces[i].lineBottom, style.lane);
            int depth = 0;
            for (std::size_t k = 0; k < edges.size(); ++k) {
                depth += edges[k].delta;
                if (depth <= 0 || k + 1 >= edges.size())
                    continue;
                const qreal x1 = edges[k].x;
                const qreal x2 = edges[k + 1].x;
                if (x2 - x1 < 0.5)
                    continue;
                // The pattern's phase follows x, so dashes line up across neighbouring stretches.
                if (depth == 1) {
                    pen.setDashOffset(x1 / stroke);
                    p.setPen(pen);
                    p.drawLine(QPointF(x1, y), QPointF(x2, y));
                } else {
                    thin.setDashOffset(x1 / thin.widthF());
                    p.setPen(thin);
                    const qreal half = thin.widthF();
                    p.drawLine(QPointF(x1, y - half - 1), QPointF(x2, y - half - 1));
                    p.drawLine(QPointF(x1, y + half), QPointF(x2, y + half));
                }
            }
            i = j;
        }
    }

    // End ticks: a short upright mark where each span ends, so overlapping spans of one function
    // still show where each stops.
    for (const LaneSpan *span : visible) {
        const SpanGeometry &g = layout.geometry(span->range16);
        if (g.pieces.empty())
            continue;
        const qreal y = layout.laneY(g.endBottom, functionStyle(span->function).lane);
        const qreal x = std::round(g.end.x()) + (g.endRtl ? 0 : -1);
        p.fillRect(QRectF(x, y - metrics.pitch * 0.5 - 1, std::max<qreal>(1, stroke - 1),
                       metrics.pitch + 1),
            colours.lane[std::size_t(span->function)]);
    }

    const std::vector<LaneBadge> badges = layout.layoutBadges(visible);
    p.setRenderHint(QPainter::Antialiasing, true);
    p.setFont(metrics.badgeFont);
    const qreal radius = std::max<qreal>(1.5, metrics.pitch * 0.45);
    for (const LaneBadge &badge : badges) {
        if (!badge.rect.intersects(clip))
            continue;
        const auto i = std::size_t(badge.span->function);
        const QRectF r = badge.rect.adjusted(0.5, 0.5, -0.5, -0.5);
        p.setPen(QPen(colours.lane[i], 1));
        p.setBrush(colours.badgeFill[i]);
        p.drawRoundedRect(r, radius, radius);
        p.setPen(colours.badgeText[i]);
        QString label(functionStyle(badge.span->function).letter);
        if (!badge.span->owner.isEmpty())
            label += QChar(0x2009) + badge.span->owner; // a thin space, then the pseudonym
        p.drawText(badge.rect, Qt::AlignCenter, label);
    }
    p.setBrush(Qt::NoBrush);
}

void paintSpanHandles(QPainter &p, const LaneMetrics &metrics, const SpanGeometry &g,
    const QColor &colour, const QColor &base)
{
    if (g.pieces.empty())
        return;
    p.setRenderHint(QPainter::Antialiasing, true);
    const qreal r = metrics.handleRadius;
    auto handle = [&](const QPointF &top, qreal bottom, bool knobOnTop) {
        const qreal x = std::round(top.x());
        const qreal barBottom = bottom + metrics.zone;
        p.fillRect(QRectF(x - 1, top.y(), 2, barBottom - top.y()), colour);
        const QPointF knob(x, knobOnTop ? top.y() - r + 1 : barBottom + r - 1);
        p.setPen(QPen(base, 1.5));
        p.setBrush(colour);
        p.drawEllipse(knob, r, r);
        p.setBrush(Qt::NoBrush);
    };
    handle(g.start, g.startBottom, true);
    handle(g.end, g.endBottom, false);
}

} // namespace fourfold
