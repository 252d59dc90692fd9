#pragma once
// Where spans' lanes lie on screen: the span-lane layout of the reading desk (reading_view.h)
// and the pieces of text lines a UTF-16 range covers, which the comparison view draws its lanes
// under too (compare/comparison_view.h).
//
// A range of text becomes one piece per text line it crosses (several where a line mixes
// directions); a span's lane runs under its pieces, in its function's lane (function_style.h).
// Positions are Qt's UTF-16 positions (Utf16Range); the views convert from code points with
// OffsetMap. Coordinates are the document's (or the layout's), before scrolling.

#include "core/model/annotation.h"
#include "core/text/utf16_range.h"

#include <QFont>
#include <QHash>
#include <QPointF>
#include <QRectF>

#include <functional>
#include <utility>
#include <vector>

class QTextBlock;
class QTextDocument;
class QTextLayout;
class QTextLine;
class QWidget;

namespace fourfold {

// The horizontal extents, relative to `line`'s layout, that the layout positions [from, to)
// cover on `line` (both inside the line): one extent, or where `mixedDirections` one per visual
// run of glyphs, sorted and merged.
std::vector<std::pair<qreal, qreal>> lineExtents(
    const QTextLine &line, int from, int to, bool mixedDirections);

// Calls `visit` for each line of `layout` that the layout positions [from, to) cross, with the
// part of the range on that line (layout positions, never empty), in line order.
void forEachLineOf(const QTextLayout &layout, qint64 from, qint64 to,
    const std::function<void(const QTextLine &, qint64, qint64)> &visit);

// Sizes derived from the font, so everything scales with it (and with the screen's DPI).
struct LaneMetrics {
    qreal pitch = 4; // distance between lanes
    qreal stroke = 2; // lane line width
    qreal gap = 2; // between the glyphs and the first lane
    qreal zone = 20; // lanes' total height under a line
    qreal readingWidth = 600; // the text column
    qreal labelColumn = 80; // the paragraph-role margin
    qreal handleRadius = 4;
    QFont badgeFont;
    QFont labelFont;
};

// A span as drawn: its function and both position units.
struct LaneSpan {
    AnnotationId id;
    FramingFunction function = FramingFunction::Problem;
    TextRange range; // code points
    Utf16Range range16; // UTF-16 positions in the document
    QString owner; // the coder's pseudonym, shown in the badge after the letter; empty: none
};

// One visual piece of a range on one text line, in document coordinates.
struct LanePiece {
    qreal x1 = 0;
    qreal x2 = 0;
    qreal lineTop = 0;
    qreal lineBottom = 0; // bottom of the glyphs; the lanes start below it
    qint64 lineKey = 0; // block number and line index: same value, same line
};

// Where a range lies on screen, computed once from the text layout and cached.
struct SpanGeometry {
    std::vector<LanePiece> pieces;
    QPointF start; // caret x at the range's start, top of its line
    qreal startBottom = 0;
    bool startRtl = false;
    QPointF end; // caret x at the range's end, top of its line
    qreal endBottom = 0;
    bool endRtl = false;
};

// A span's letter badge at its start (with its coder's pseudonym when LaneSpan::owner is set).
struct LaneBadge {
    QRectF rect; // document coordinates
    const LaneSpan *span = nullptr;
    bool rtl = false;
};

// What a point hits.
struct LaneHit {
    enum Kind { Nothing, Text, Lane, Badge, StartHandle, EndHandle } kind = Nothing;
    std::vector<AnnotationId> spans; // shortest first
};

// The reading desk's spans laid out over its QTextDocument: geometry per range (cached for the
// viewport's width), badges, and what a point hits.
class SpanLaneLayout
{
public:
    // `viewport`: the widget whose width the document is laid out at (the cache follows it).
    explicit SpanLaneLayout(const QWidget *viewport);

    // The text the document shows (positions are its UTF-16 positions) and the document. Both
    // clear the cached geometry.
    void setText(const QString &text);
    void setDocument(QTextDocument *document);
    void setMetrics(const LaneMetrics &metrics) { m_metrics = metrics; }
    const LaneMetrics &metrics() const { return m_metrics; }

    // The spans to lay out, in any order: kept sorted by UTF-16 start, then end, then id.
    void setSpans(std::vector<LaneSpan> spans);
    const std::vector<LaneSpan> &spans() const { return m_spans; }
    const LaneSpan *spanById(AnnotationId id) const;
    // The spans that overlap `range16`, in the order above.
    std::vector<const LaneSpan *> spansIn(const Utf16Range &range16) const;

    // Drops the cached geometry (the layout changed: margins, font).
    void invalidate();
    // The geometry of `range16`, cached; empty pieces when it is not laid out.
    const SpanGeometry &geometry(const Utf16Range &range16) const;
    // The same, computed anew and not cached (a drag's preview).
    SpanGeometry computeGeometry(const Utf16Range &range16) const;
    // The middle of lane `lane` under a line whose glyphs end at `lineBottom`.
    qreal laneY(qreal lineBottom, int lane) const;
    // Whether the character at `pos16` (else `block`) runs right to left.
    bool isRtlAt(qint64 pos16, const QTextBlock &block) const;
    // The spans' badges, moved along their line where they would collide.
    std::vector<LaneBadge> layoutBadges(const std::vector<const LaneSpan *> &spans) const;

    // What document point `pos` hits: a handle of `selected` (within `handleSlop` of it), else
    // the badges, lanes and text of `candidates`, in that order.
    LaneHit hitTest(const QPointF &pos, const LaneSpan *selected, qreal handleSlop,
        const std::vector<const LaneSpan *> &candidates) const;

private:
    QRectF badgeRect(const SpanGeometry &g, const LaneSpan &span) const;
    void addPieces(const QTextBlock &block, const QTextLine &line, qint64 from16, qint64 to16,
        std::vector<LanePiece> &pieces) const;

    const QWidget *m_viewport;
    QTextDocument *m_document = nullptr;
    QString m_text;
    bool m_hasRtl = false;
    LaneMetrics m_metrics;

    std::vector<LaneSpan> m_spans; // sorted by UTF-16 start, then end, then id
    QHash<qint64, qsizetype> m_indexById;

    // Range geometry keyed by (start16, end16); valid for m_geometryWidth.
    mutable QHash<quint64, SpanGeometry> m_geometry;
    mutable int m_geometryWidth = -1;
};

} // namespace fourfold
