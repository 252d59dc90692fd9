#pragma once
// Paints the reading desk's span lanes over a SpanLaneLayout: one rule per span in its
// function's lane (a double rule where spans of one function overlap), an end tick per span, a
// letter badge at each start, and the selected span's drag handles.

#include "app/desktop/span_lane_layout.h"

#include <QColor>

#include <array>

class QPainter;

namespace fourfold {

// The colours of lanes and badges, per function (index: FramingFunction).
struct LaneColours {
    std::array<QColor, 4> lane;
    std::array<QColor, 4> badgeFill;
    std::array<QColor, 4> badgeText;

    // On a dark `base` the functions' darker hues are lightened until they read as well as text
    // would (WCAG 2.1 SC 1.4.3, 4.5:1); on light backgrounds they stay exactly as defined.
    static LaneColours on(const QColor &base);
    bool dark = false; // `base` was dark
};

// Paints the lanes, end ticks and badges of `visible` (painter in document coordinates) that
// reach into `clip`.
void paintSpanLanes(QPainter &p, const SpanLaneLayout &layout, const LaneColours &colours,
    const std::vector<const LaneSpan *> &visible, const QRectF &clip);

// Paints the two handles of a selected span at `g` in `colour`, ringed in `base`: an upright bar
// through the line and its lanes, with a knob on top at the start and at the bottom at the end.
void paintSpanHandles(QPainter &p, const LaneMetrics &metrics, const SpanGeometry &g,
    const QColor &colour, const QColor &base);

} // namespace fourfold
