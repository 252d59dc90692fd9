#include "app/desktop/span_lane_layout.h"

#include "app/desktop/function_style.h"

#include <QAbstractTextDocumentLayout>
#include <QFontMetricsF>
#include <QGlyphRun>
#include <QTextBlock>
#include <QTextDocument>
#include <QTextLayout>
#include <QWidget>

#include <algorithm>
#include <cmath>

namespace fourfold {

namespace {

bool isRtlDirection(QChar::Direction d)
{
    return d == QChar::DirR || d == QChar::DirAL || d == QChar::DirRLE || d == QChar::DirRLO
        || d == QChar::DirRLI;
}

bool isStrongDirection(QChar::Direction d)
{
    return d == QChar::DirL || d == QChar::DirR || d == QChar::DirAL;
}

quint64 rangeKey(const Utf16Range &r16)
{
    return (quint64(r16.start) << 32) | quint64(r16.end);
}

} // namespace

std::vector<std::pair<qreal, qreal>> lineExtents(
    const QTextLine &line, int from, int to, bool mixedDirections)
{
    if (!mixedDirections) {
        const qreal x1 = line.cursorToX(from);
        const qreal x2 = line.cursorToX(to);
        return {{std::min(x1, x2), std::max(x1, x2)}};
    }
    // A line mixing directions: a logical range may show as several visual pieces.
    std::vector<std::pair<qreal, qreal>> runs;
    for (const QGlyphRun &run : line.glyphRuns(from, to - from)) {
        const QRectF r = run.boundingRect();
        if (r.width() > 0)
            runs.emplace_back(r.left(), r.right());
    }
    std::sort(runs.begin(), runs.end());
    std::vector<std::pair<qreal, qreal>> merged;
    for (const auto &run : runs) {
        if (!merged.empty() && run.first <= merged.back().second + 0.5)
            merged.back().second = std::max(merged.back().second, run.second);
        else
            merged.push_back(run);
    }
    return merged;
}

void forEachLineOf(const QTextLayout &layout, qint64 from, qint64 to,
    const std::function<void(const QTextLine &, qint64, qint64)> &visit)
{
    if (to <= from)
        return;
    const QTextLine firstLine = layout.lineForTextPosition(int(from));
    for (int i = firstLine.isValid() ? firstLine.lineNumber() : 0; i < layout.lineCount(); ++i) {
        const QTextLine line = layout.lineAt(i);
        const qint64 lineStart = line.textStart();
        const qint64 lineEnd = lineStart + line.textLength();
        if (lineStart >= to)
            break;
        const qint64 a = std::max(from, lineStart);
        const qint64 b = std::min(to, lineEnd);
        if (b > a)
            visit(line, a, b);
    }
}

SpanLaneLayout::SpanLaneLayout(const QWidget *viewport)
    : m_viewport(viewport)
{ }

void SpanLaneLayout::setText(const QString &text)
{
    m_text = text;
    m_hasRtl = false;
    for (const uint c : m_text.toUcs4()) {
        if (isRtlDirection(QChar::direction(char32_t(c)))) {
            m_hasRtl = true;
            break;
        }
    }
    invalidate();
}

void SpanLaneLayout::setDocument(QTextDocument *document)
{
    m_document = document;
    invalidate();
}

void SpanLaneLayout::setSpans(std::vector<LaneSpan> spans)
{
    m_spans = std::move(spans);
    std::sort(m_spans.begin(), m_spans.end(), [](const LaneSpan &a, const LaneSpan &b) {
        if (a.range16.start != b.range16.start)
            return a.range16.start < b.range16.start;
        if (a.range16.end != b.range16.end)
            return a.range16.end < b.range16.end;
        return a.id < b.id;
    });
    m_indexById.clear();
    m_indexById.reserve(qsizetype(m_spans.size()));
    for (std::size_t i = 0; i < m_spans.size(); ++i)
        m_indexById.insert(m_spans[i].id.value, qsizetype(i));

    // Stale ranges (spans resized or deleted) only cost memory; drop them now and then.
    if (m_geometry.size() > 4 * qsizetype(m_spans.size()) + 256)
        m_geometry.clear();
}

const LaneSpan *SpanLaneLayout::spanById(AnnotationId id) const
{
    if (!id.isValid())
        return nullptr;
    const auto it = m_indexById.constFind(id.value);
    return it == m_indexById.cend() ? nullptr : &m_spans[std::size_t(*it)];
}

std::vector<const LaneSpan *> SpanLaneLayout::spansIn(const Utf16Range &range16) const
{
    std::vector<const LaneSpan *> out;
    for (const LaneSpan &span : m_spans) {
        if (span.range16.start >= range16.end)
            break;
        if (span.range16.end > range16.start)
            out.push_back(&span);
    }
    return out;
}

void SpanLaneLayout::invalidate()
{
    m_geometry.clear();
    m_geometryWidth = -1;
}

qreal SpanLaneLayout::laneY(qreal lineBottom, int lane) const
{
    return std::floor(lineBottom + m_metrics.gap + m_metrics.pitch * (lane + 0.5));
}

const SpanGeometry &SpanLaneLayout::geometry(const Utf16Range &range16) const
{
    if (m_geometryWidth != m_viewport->width()) {
        m_geometry.clear();
        m_geometryWidth = m_viewport->width();
    }
    const quint64 key = rangeKey(range16);
    auto it = m_geometry.find(key);
    if (it == m_geometry.end()) {
        SpanGeometry g = computeGeometry(range16);
        if (g.pieces.empty()) {
            // Not laid out yet (or nothing visible): do not cache the empty answer.
            static const SpanGeometry empty;
            return empty;
        }
        it = m_geometry.insert(key, std::move(g));
    }
    return *it;
}

bool SpanLaneLayout::isRtlAt(qint64 pos16, const QTextBlock &block) const
{
    if (pos16 >= 0 && pos16 < m_text.size()) {
        char32_t c = m_text.at(pos16).unicode();
        if (QChar::isHighSurrogate(c) && pos16 + 1 < m_text.size())
            c = QChar::surrogateToUcs4(m_text.at(pos16), m_text.at(pos16 + 1));
        const QChar::Direction d = QChar::direction(c);
        if (isStrongDirection(d))
            return isRtlDirection(d);
    }
    return block.textDirection() == Qt::RightToLeft;
}

void SpanLaneLayout::addPieces(const QTextBlock &block, const QTextLine &line, qint64 from16,
    qint64 to16, std::vector<LanePiece> &pieces) const
{
    const QTextLayout *layout = block.layout();
    const QPointF origin = layout->position();
    const qreal top = origin.y() + line.y();
    const qreal bottom = top + line.height();
    const qint64 key = (qint64(block.blockNumber()) << 24) | line.lineNumber();
    const int bpos = block.position();

    bool mixed = false;
    if (m_hasRtl) {
        const int lineStart = bpos + line.textStart();
        const int lineEnd = lineStart + line.textLength();
        bool rtl = false;
        bool ltr = false;
        for (int i = lineStart; i < lineEnd; ++i) {
            const QChar::Direction d = m_text.at(i).direction();
            rtl = rtl || isRtlDirection(d);
            ltr = ltr || d == QChar::DirL;
        }
        mixed = rtl && ltr;
    }
    for (const auto &[x1, x2] : lineExtents(line, int(from16) - bpos, int(to16) - bpos, mixed))
        pieces.push_back({origin.x() + x1, origin.x() + x2, top, bottom, key});
}

SpanGeometry SpanLaneLayout::computeGeometry(const Utf16Range &range16) const
{
    SpanGeometry g;
    QTextDocument *doc = m_document;
    if (!doc)
        return g;
    const QTextBlock first = doc->findBlock(int(range16.start));
    const QTextBlock last = doc->findBlock(int(range16.end - 1));
    if (!first.isValid() || !last.isValid())
        return g;
    // Lays the document out up to the range's last block (the layout is lazy).
    doc->documentLayout()->blockBoundingRect(last);

    for (QTextBlock block = first; block.isValid() && block.position() < range16.end;
         block = block.next()) {
        const QTextLayout *layout = block.layout();
        if (!layout || layout->lineCount() == 0)
            continue;
        const qint64 bpos = block.position();
        const qint64 from = std::max(range16.start, bpos);
        const qint64 to = std::min(range16.end, bpos + block.length() - 1);
        if (to <= from)
            continue; // the range only crosses this block's separator
        forEachLineOf(
            *layout, from - bpos, to - bpos, [&](const QTextLine &line, qint64 a, qint64 b) {
                addPieces(block, line, bpos + a, bpos + b, g.pieces);
            });
    }
    if (g.pieces.empty())
        return g;

    auto anchor = [&](qint64 pos16, qint64 charPos16, QPointF &point, qreal &bottom, bool &rtl) {
        const QTextBlock block = doc->findBlock(int(charPos16));
        const QTextLayout *layout = block.layout();
        const int rel = int(pos16 - block.position());
        const QTextLine line = layout->lineForTextPosition(int(charPos16 - block.position()));
        if (!line.isValid())
            return;
        const int clamped = std::clamp(rel, line.textStart(), line.textStart() + line.textLength());
        point = {
            layout->position().x() + line.cursorToX(clamped), layout->position().y() + line.y()};
        bottom = point.y() + line.height();
        rtl = isRtlAt(charPos16, block);
    };
    anchor(range16.start, range16.start, g.start, g.startBottom, g.startRtl);
    anchor(range16.end, range16.end - 1, g.end, g.endBottom, g.endRtl);
    return g;
}

QRectF SpanLaneLayout::badgeRect(const SpanGeometry &g, const LaneSpan &span) const
{
    const QFontMetricsF fm(m_metrics.badgeFont);
    qreal text = fm.horizontalAdvance(QLatin1Char('M'));
    if (!span.owner.isEmpty())
        text += fm.horizontalAdvance(QChar(0x2009) + span.owner);
    const qreal width = std::ceil(text + m_metrics.pitch);
    const qreal top = g.startBottom + m_metrics.gap - 1;
    const qreal height = 4 * m_metrics.pitch + 1;
    const qreal left = g.startRtl ? g.start.x() - width : g.start.x();
    return {std::round(left), top, width, height};
}

std::vector<LaneBadge> SpanLaneLayout::layoutBadges(
    const std::vector<const LaneSpan *> &spans) const
{
    std::vector<LaneBadge> badges;
    for (const LaneSpan *span : spans) {
        const SpanGeometry &g = geometry(span->range16);
        if (!g.pieces.empty())
            badges.push_back({badgeRect(g, *span), span, g.startRtl});
    }
    // Badges that would collide on one line move along it in their reading direction: left to
    // right text pushes later badges rightwards, right to left text leftwards.
    std::stable_sort(badges.begin(), badges.end(), [](const LaneBadge &a, const LaneBadge &b) {
        return a.rect.top() != b.rect.top() ? a.rect.top() < b.rect.top()
                                            : a.rect.left() < b.rect.left();
    });
    const LaneBadge *previous = nullptr;
    for (LaneBadge &badge : badges) {
        if (badge.rtl)
            continue;
        if (previous && badge.rect.top() == previous->rect.top()
            && badge.rect.left() < previous->rect.right() + 1)
            badge.rect.moveLeft(previous->rect.right() + 1);
        previous = &badge;
    }
    previous = nullptr;
    for (auto it = badges.rbegin(); it != badges.rend(); ++it) {
        if (!it->rtl)
            continue;
        if (previous && it->rect.top() == previous->rect.top()
            && it->rect.right() > previous->rect.left() - 1)
            it->rect.moveRight(previous->rect.left() - 1);
        previous = &*it;
    }
    return badges;
}

LaneHit SpanLaneLayout::hitTest(const QPointF &pos, const LaneSpan *selected, qreal handleSlop,
    const std::vector<const LaneSpan *> &candidates) const
{
    LaneHit hit;
    const qreal zone = m_metrics.zone;

    if (selected) {
        const SpanGeometry &g = geometry(selected->range16);
        auto near = [&](const QPointF &top, qreal bottom, bool knobOnTop) {
            const qreal knobExtra = 2 * m_metrics.handleRadius;
            const qreal y1 = top.y() - (knobOnTop ? knobExtra : 0);
            const qreal y2 = bottom + zone + (knobOnTop ? 0 : knobExtra);
            return std::abs(pos.x() - top.x()) <= handleSlop && pos.y() >= y1 && pos.y() <= y2;
        };
        if (!g.pieces.empty()) {
            if (near(g.start, g.startBottom, true)) {
                hit.kind = LaneHit::StartHandle;
                hit.spans = {selected->id};
                return hit;
            }
            if (near(g.end, g.endBottom, false)) {
                hit.kind = LaneHit::EndHandle;
                hit.spans = {selected->id};
                return hit;
            }
        }
    }

    std::vector<const LaneSpan *> lane;
    std::vector<const LaneSpan *> text;
    std::vector<const LaneSpan *> badge;
    for (const LaneBadge &b : layoutBadges(candidates)) {
        if (b.rect.contains(pos))
            badge.push_back(b.span);
    }
    for (const LaneSpan *span : candidates) {
        const SpanGeometry &g = geometry(span->range16);
        if (g.pieces.empty())
            continue;
        const int laneIndex = functionStyle(span->function).lane;
        for (const LanePiece &piece : g.pieces) {
            if (pos.x() < piece.x1 - 1 || pos.x() > piece.x2 + 1)
                continue;
            const qreal y = laneY(piece.lineBottom, laneIndex);
            if (std::abs(pos.y() - y) <= m_metrics.pitch * 0.5 + 0.5)
                lane.push_back(span);
            else if (pos.y() >= piece.lineTop && pos.y() < piece.lineBottom)
                text.push_back(span);
        }
    }
    auto finish = [&](LaneHit::Kind kind, std::vector<const LaneSpan *> spans) {
        std::sort(spans.begin(), spans.end(), [](const LaneSpan *a, const LaneSpan *b) {
            if (a->range.length() != b->range.length())
                return a->range.length() < b->range.length();
            return a->range.start != b->range.start ? a->range.start < b->range.start
                                                    : a->id < b->id;
        });
        spans.erase(std::unique(spans.begin(), spans.end()), spans.end());
        hit.kind = kind;
        for (const LaneSpan *span : spans)
            hit.spans.push_back(span->id);
        return hit;
    };
    if (!badge.empty())
        return finish(LaneHit::Badge, badge);
    if (!lane.empty())
        return finish(LaneHit::Lane, lane);
    if (!text.empty())
        return finish(LaneHit::Text, text);
    return hit;
}

} // namespace fourfold
