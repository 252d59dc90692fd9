#include "app/desktop/compare/comparison_view.h"

#include "app/desktop/function_style.h"
#include "app/desktop/span_lane_layout.h"

#include <QEvent>
#include <QFontMetricsF>
#include <QHelpEvent>
#include <QMouseEvent>
#include <QPainter>
#include <QPainterPath>
#include <QScrollBar>
#include <QTextLine>
#include <QToolTip>

#include <algorithm>
#include <cmath>

namespace fourfold {

namespace {

constexpr qreal kColumnGap = 18;
constexpr qreal kSidePadding = 10;

} // namespace

ComparisonView::ComparisonView(QWidget *parent)
    : QAbstractScrollArea(parent)
{
    setFocusPolicy(Qt::StrongFocus);
    viewport()->setBackgroundRole(QPalette::Base);
    viewport()->setAutoFillBackground(true);
    verticalScrollBar()->setSingleStep(20);
    setAccessibleName(tr("Coders side by side"));
}

ComparisonView::~ComparisonView() = default;

void ComparisonView::setContent(
    const Article &article, std::vector<Column> columns, std::vector<Passage> passages, int current)
{
    m_article = article;
    m_map = OffsetMap(article.text);
    m_columns = std::move(columns);
    m_passages = std::move(passages);
    m_passages16.clear();
    for (const Passage &p : m_passages)
        m_passages16.push_back(m_map.utf16Range(p.range));
    m_current = current;
    m_layoutWidth = -1;
    relayout();
    viewport()->update();
}

void ComparisonView::setCurrentPassage(int index)
{
    m_current = index;
    viewport()->update();
}

qreal ComparisonView::headerHeight() const
{
    return std::round(QFontMetricsF(font()).height() * 2.0);
}

qreal ComparisonView::lanePitch() const
{
    return std::max<qreal>(3, std::round(QFontMetricsF(font()).height() * 0.22));
}

qreal ComparisonView::lineAdvance() const
{
    // The glyphs, then four lanes and a little air: as in the reading desk, the lanes read as
    // belonging to the line above them.
    const QFontMetricsF fm(font());
    return std::ceil(fm.height() + 4 * lanePitch() + fm.height() * 0.3);
}

qreal ComparisonView::columnWidth() const
{
    const qreal gutter = QFontMetricsF(font()).height() * 2.6;
    const int n = std::max<int>(1, int(m_columns.size()));
    return std::max<qreal>(
        80, (viewport()->width() - gutter - kSidePadding - kColumnGap * (n - 1)) / n);
}

qreal ComparisonView::columnLeft(int column) const
{
    const qreal gutter = QFontMetricsF(font()).height() * 2.6;
    return gutter + column * (columnWidth() + kColumnGap);
}

void ComparisonView::relayout()
{
    const qreal width = columnWidth();
    if (width == m_layoutWidth && !m_paragraphs.empty())
        return;
    m_layoutWidth = width;
    m_paragraphs.clear();
    const QFontMetricsF fm(font());
    const qreal advance = lineAdvance();
    qreal y = headerHeight() + fm.height() * 0.5;
    QTextOption option;
    option.setWrapMode(QTextOption::WordWrap);
    option.setTextDirection(Qt::LeftToRight);
    std::vector<Utf16Range> ranges;
    for (const Paragraph &p : m_article.paragraphs)
        ranges.push_back(m_map.utf16Range(p.range));
    if (ranges.empty() && !m_article.text.isEmpty())
        ranges.push_back(Utf16Range {0, m_article.text.size()});
    for (const Utf16Range &r16 : ranges) {
        Para para;
        para.range16 = r16;
        para.layout = std::make_unique<QTextLayout>(
            m_article.text.mid(r16.start, r16.length()), font(), viewport());
        para.layout->setTextOption(option);
        para.layout->beginLayout();
        qreal lineY = 0;
        while (true) {
            QTextLine line = para.layout->createLine();
            if (!line.isValid())
                break;
            line.setLineWidth(width);
            line.setPosition(QPointF(0, lineY));
            lineY += advance;
        }
        para.layout->endLayout();
        para.top = y;
        para.height = lineY;
        y += lineY + fm.height() * 0.6;
        m_paragraphs.push_back(std::move(para));
    }
    m_contentHeight = y + fm.height();
    verticalScrollBar()->setPageStep(viewport()->height());
    verticalScrollBar()->setRange(0, std::max(0, int(m_contentHeight) - viewport()->height()));
}

std::vector<QRectF> ComparisonView::lineRects(const Utf16Range &range16) const
{
    std::vector<QRectF> out;
    const qreal textHeight = QFontMetricsF(font()).height();
    for (const Para &para : m_paragraphs) {
        const qint64 from = std::max(range16.start, para.range16.start);
        const qint64 to = std::min(range16.end, para.range16.end);
        // The same line pieces as the reading desk's lanes (span_lane_layout.h); the columns
        // are laid out left to right, so each line holds one piece.
        forEachLineOf(*para.layout, from - para.range16.start, to - para.range16.start,
            [&](const QTextLine &line, qint64 a, qint64 b) {
                for (const auto &[x1, x2] : lineExtents(line, int(a), int(b), false))
                    out.emplace_back(QPointF(x1, para.top + line.y()),
                        QPointF(x2, para.top + line.y() + textHeight));
            });
    }
    return out;
}

int ComparisonView::passageAt(qint64 pos16) const
{
    for (size_t i = 0; i < m_passages16.size(); ++i)
        if (pos16 >= m_passages16[i].start && pos16 < m_passages16[i].end)
            return int(i);
    return -1;
}

QString ComparisonView::kindSymbols(const Passage &p) const
{
    // Symbols rather than letters, so they are not mistaken for the functions' badges
    // (P, C, E, R): ∅ a coder has nothing here, ≠ functions differ, ↔ boundaries differ,
    // ≈ attributes differ.
    QString s;
    if (p.has(DisagreementKind::Presence))
        s += QChar(0x2205);
    if (p.has(DisagreementKind::Function))
        s += QChar(0x2260);
    if (p.has(DisagreementKind::Boundary))
        s += QChar(0x2194);
    if (p.has(DisagreementKind::Attributes))
        s += QChar(0x2248);
    return s;
}

QString ComparisonView::passageToolTip(const Passage &p) const
{
    QStringList kinds;
    if (p.has(DisagreementKind::Presence))
        kinds << (p.coders.size() == 1 ? tr("only one coder has a span here")
                                       : tr("not every coder has a span here"));
    if (p.has(DisagreementKind::Function))
        kinds << tr("different functions");
    if (p.has(DisagreementKind::Boundary))
        kinds << tr("different boundaries");
    if (p.has(DisagreementKind::Attributes))
        kinds << tr("different attributes");
    QString text = kinds.isEmpty() ? tr("The coders agree here.")
                                   : tr("Disagreement: %1.").arg(kinds.join(tr("; ")));
    if (p.isResolved())
        text += QLatin1Char(' ') + tr("Decided.");
    return text;
}

void ComparisonView::ensurePassageVisible(int index)
{
    if (index < 0 || size_t(index) >= m_passages16.size())
        return;
    relayout();
    const auto rects = lineRects(m_passages16[size_t(index)]);
    if (rects.empty())
        return;
    const qreal top = rects.front().top() - headerHeight();
    const qreal bottom = rects.back().bottom() + lineAdvance();
    QScrollBar *bar = verticalScrollBar();
    const qreal visibleTop = bar->value();
    const qreal visibleBottom = bar->value() + viewport()->height() - headerHeight();
    if (top >= visibleTop && bottom - headerHeight() <= visibleBottom)
        return;
    const qreal centre = (top + bottom - headerHeight()) / 2;
    bar->setValue(int(centre - (viewport()->height() - headerHeight()) / 2));
}

void ComparisonView::paintEvent(QPaintEvent *)
{
    relayout();
    QPainter p(viewport());
    const QPalette pal = palette();
    const QFontMetricsF fm(font());
    const qreal scroll = verticalScrollBar()->value();
    const qreal width = columnWidth();
    const qreal pitch = lanePitch();
    const qreal stroke = std::max<qreal>(2, std::round(pitch * 0.7));
    const qreal gutter = columnLeft(0);
    const bool dark = pal.color(QPalette::Base).lightnessF() < 0.5;
    p.translate(0, -scroll);

    // The current passage: a band across every column.
    if (m_current >= 0 && size_t(m_current) < m_passages16.size()) {
        const auto rects = lineRects(m_passages16[size_t(m_current)]);
        if (!rects.empty()) {
            QColor band = pal.color(QPalette::Highlight);
            band.setAlphaF(dark ? 0.22f : 0.10f);
            const QRectF r(QPointF(2, rects.front().top() - 3),
                QPointF(viewport()->width() - 2, rects.back().top() + lineAdvance() - 2));
            p.fillRect(r, band);
            QColor edge = pal.color(QPalette::Highlight);
            p.fillRect(QRectF(r.left(), r.top(), 3, r.height()), edge);
        }
    }

    // Text, once per column.
    p.setPen(pal.color(QPalette::Text));
    for (size_t c = 0; c < m_columns.size(); ++c) {
        const qreal left = columnLeft(int(c));
        for (const Para &para : m_paragraphs)
            para.layout->draw(&p, QPointF(left, para.top));
        if (c + 1 < m_columns.size()) {
            QColor rule = pal.color(QPalette::Mid);
            rule.setAlphaF(0.5f);
            p.fillRect(QRectF(left + width + kColumnGap / 2 - 0.5, scroll + headerHeight(), 1,
                           viewport()->height()),
                rule);
        }
    }

    // Spans: one lane per function under each line, the function's colour and pattern.
    p.setRenderHint(QPainter::Antialiasing, false);
    for (size_t c = 0; c < m_columns.size(); ++c) {
        const qreal left = columnLeft(int(c));
        for (const Mark &mark : m_columns[c].marks) {
            const FunctionStyle style = functionStyle(mark.function);
            const auto rects = lineRects(m_map.utf16Range(mark.range));
            if (mark.selected) {
                QColor tint = style.colour;
                tint.setAlphaF(dark ? 0.35f : 0.22f);
                for (const QRectF &r : rects)
                    p.fillRect(r.translated(left, 0), tint);
            }
            QColor colour = style.colour;
            if (mark.rejected)
                colour = pal.color(QPalette::PlaceholderText);
            QPen pen(colour, mark.selected ? stroke + 1 : stroke, style.line, Qt::FlatCap);
            p.setPen(pen);
            for (const QRectF &r : rects) {
                const qreal y = std::floor(r.bottom() + pitch * (style.lane + 0.6));
                p.drawLine(QPointF(left + r.left(), y), QPointF(left + r.right(), y));
            }
            if (!rects.empty()) {
                // End ticks show where each span stops, even when spans of one function touch.
                const QRectF &first = rects.front();
                const QRectF &last = rects.back();
                const qreal y1 = std::floor(first.bottom() + pitch * (style.lane + 0.6));
                const qreal y2 = std::floor(last.bottom() + pitch * (style.lane + 0.6));
                p.fillRect(QRectF(left + first.left(), y1 - pitch * 0.6, 1.5, pitch * 1.2), colour);
                p.fillRect(
                    QRectF(left + last.right() - 1.5, y2 - pitch * 0.6, 1.5, pitch * 1.2), colour);
                if (mark.rejected) {
                    // A rejected span is struck through in its column: it stays visible (raw
                    // codings are never changed) but reads as set aside.
                    p.setPen(QPen(colour, 1));
                    for (const QRectF &r : rects) {
                        const qreal ym = r.center().y();
                        p.drawLine(QPointF(left + r.left(), ym), QPointF(left + r.right(), ym));
                    }
                }
            }
        }
    }

    // A coder with nothing in a passage: the passage is hatched in their column.
    for (size_t i = 0; i < m_passages.size(); ++i) {
        const Passage &passage = m_passages[i];
        if (passage.missing.empty())
            continue;
        const auto rects = lineRects(m_passages16[i]);
        for (size_t c = 0; c < m_columns.size(); ++c) {
            if (std::ranges::find(passage.missing, m_columns[c].coder) == passage.missing.end())
                continue;
            const qreal left = columnLeft(int(c));
            QColor hatch = pal.color(QPalette::Text);
            hatch.setAlphaF(dark ? 0.30f : 0.22f);
            const QBrush brush(hatch, Qt::BDiagPattern);
            for (const QRectF &r : rects)
                p.fillRect(r.translated(left, 0).adjusted(0, 0, 0, pitch * 4), brush);
        }
    }

    // The gutter: a mark per passage with a disagreement (its kinds), a tick once decided.
    QFont symbolFont = font();
    symbolFont.setBold(true);
    p.setFont(symbolFont);
    p.setRenderHint(QPainter::Antialiasing, true);
    for (size_t i = 0; i < m_passages.size(); ++i) {
        const Passage &passage = m_passages[i];
        const auto rects = lineRects(m_passages16[i]);
        if (rects.empty())
            continue;
        const qreal top = rects.front().top();
        const qreal bottom = rects.back().top() + fm.height();
        if (passage.isAgreed() && !passage.isResolved())
            continue;
        QColor colour =
            passage.isResolved() ? pal.color(QPalette::PlaceholderText) : pal.color(QPalette::Text);
        p.fillRect(QRectF(gutter - 6, top, 2, bottom - top), colour);
        const QString symbols = passage.isResolved()
            ? QString(QChar(0x2713)) + (passage.isAgreed() ? QString() : kindSymbols(passage))
            : kindSymbols(passage);
        p.setPen(colour);
        p.drawText(
            QRectF(2, top, gutter - 10, fm.height()), Qt::AlignRight | Qt::AlignVCenter, symbols);
    }

    // Column titles stay at the top while the text scrolls under them.
    p.resetTransform();
    const qreal header = headerHeight();
    p.fillRect(QRectF(0, 0, viewport()->width(), header), pal.color(QPalette::Window));
    p.setPen(pal.color(QPalette::Mid));
    p.drawLine(QPointF(0, header - 0.5), QPointF(viewport()->width(), header - 0.5));
    QFont titleFont = font();
    titleFont.setBold(true);
    p.setFont(titleFont);
    p.setPen(pal.color(QPalette::WindowText));
    for (size_t c = 0; c < m_columns.size(); ++c)
        p.drawText(QRectF(columnLeft(int(c)), 0, width, header), Qt::AlignLeft | Qt::AlignVCenter,
            m_columns[c].title);
}

void ComparisonView::resizeEvent(QResizeEvent *e)
{
    QAbstractScrollArea::resizeEvent(e);
    relayout();
    // The lines wrap anew at another width: keep the current passage in sight.
    ensurePassageVisible(m_current);
}

void ComparisonView::changeEvent(QEvent *e)
{
    QAbstractScrollArea::changeEvent(e);
    if (e->type() == QEvent::FontChange || e->type() == QEvent::PaletteChange) {
        m_layoutWidth = -1;
        relayout();
        viewport()->update();
    }
}

bool ComparisonView::viewportEvent(QEvent *e)
{
    if (e->type() == QEvent::ToolTip) {
        auto *help = static_cast<QHelpEvent *>(e);
        const qreal y = help->pos().y() + verticalScrollBar()->value();
        for (size_t i = 0; i < m_passages16.size(); ++i) {
            const auto rects = lineRects(m_passages16[i]);
            if (!rects.empty() && y >= rects.front().top()
                && y < rects.back().top() + lineAdvance()) {
                QToolTip::showText(help->globalPos(), passageToolTip(m_passages[i]), viewport());
                return true;
            }
        }
        QToolTip::hideText();
        return true;
    }
    return QAbstractScrollArea::viewportEvent(e);
}

void ComparisonView::mousePressEvent(QMouseEvent *e)
{
    const QPointF pos = e->position() + QPointF(0, verticalScrollBar()->value());
    int column = -1;
    for (size_t c = 0; c < m_columns.size(); ++c)
        if (pos.x() >= columnLeft(int(c)) && pos.x() < columnLeft(int(c)) + columnWidth())
            column = int(c);
    const qreal x = column >= 0 ? pos.x() - columnLeft(column) : 0;
    for (const Para &para : m_paragraphs) {
        if (pos.y() < para.top || pos.y() >= para.top + para.height)
            continue;
        const QTextLine line = para.layout->lineForTextPosition(0).isValid()
            ? para.layout->lineAt(std::clamp(
                int((pos.y() - para.top) / lineAdvance()), 0, para.layout->lineCount() - 1))
            : QTextLine();
        if (!line.isValid())
            break;
        const qint64 pos16 = para.range16.start + line.xToCursor(x);
        int passage = passageAt(pos16);
        if (passage < 0 && pos16 > para.range16.start)
            passage = passageAt(pos16 - 1);
        if (passage >= 0)
            emit passageClicked(passage, column);
        break;
    }
    QAbstractScrollArea::mousePressEvent(e);
}

} // namespace fourfold
