#include "app/desktop/reading_view.h"

#include "app/colour/colour.h"
#include "app/desktop/function_style.h"
#include "core/model/logging.h"

#include <QAbstractTextDocumentLayout>
#include <QApplication>
#include <QContextMenuEvent>
#include <QFontMetricsF>
#include <QGlyphRun>
#include <QHelpEvent>
#include <QKeyEvent>
#include <QLoggingCategory>
#include <QMenu>
#include <QMouseEvent>
#include <QPainter>
#include <QRegularExpression>
#include <QScopedValueRollback>
#include <QScrollBar>
#include <QTextBlock>
#include <QTextCursor>
#include <QTextDocument>
#include <QTextFrame>
#include <QTextLayout>
#include <QToolTip>

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

bool isRtlDirection(QChar::Direction d)
{
    return d == QChar::DirR || d == QChar::DirAL || d == QChar::DirRLE || d == QChar::DirRLO
        || d == QChar::DirRLI;
}

bool isStrongDirection(QChar::Direction d)
{
    return d == QChar::DirL || d == QChar::DirR || d == QChar::DirAL;
}

// The role label in the margin.
QString roleLabel(ParagraphRole role)
{
    switch (role) {
    case ParagraphRole::Intro:
        return ReadingView::tr("intro");
    case ParagraphRole::Body:
        return ReadingView::tr("body");
    case ParagraphRole::Conclusion:
        return ReadingView::tr("conclusion");
    }
    return {};
}

quint64 rangeKey(const Utf16Range &r16)
{
    return (quint64(r16.start) << 32) | quint64(r16.end);
}

} // namespace

ReadingView::ReadingView(QWidget *parent)
    : QTextEdit(parent)
{
    setReadOnly(true);
    setAcceptRichText(false);
    setUndoRedoEnabled(false);
    setTabChangesFocus(true);
    setLineWrapMode(QTextEdit::WidgetWidth);
    setWordWrapMode(QTextOption::WrapAtWordBoundaryOrAnywhere);
    setHorizontalScrollBarPolicy(Qt::ScrollBarAlwaysOff);
    setFrameShape(QFrame::NoFrame);
    setFocusPolicy(Qt::StrongFocus);
    viewport()->setMouseTracking(true);
    setAccessibleName(tr("Article text"));

    connect(this, &QTextEdit::selectionChanged, this, [this] {
        // A text selection made by the user replaces the span selection: keys 1-4 then create.
        if (!m_changingSelection && m_selected.isValid() && textCursor().hasSelection()) {
            m_selected = {};
            updateEmphasis();
            updateAccessibleDescription();
            viewport()->update();
            emit selectedSpanChanged(m_selected);
        }
    });

    updateMetrics();
    updateColours();
    rebuildDocument();
    updateAccessibleDescription();
}

ReadingView::~ReadingView() = default;

// --- content ---------------------------------------------------------------------------------

void ReadingView::setArticle(const Article &article)
{
    m_searchHits.clear();
    m_article = article;
    m_map = OffsetMap(m_article.text);
    m_segmentation = {};
    for (const Paragraph &paragraph : m_article.paragraphs)
        m_segmentation.paragraphs.push_back(paragraph.range);
    m_segmentation.sentences = m_article.sentences;
    m_segmentation.tokens = m_article.tokens;

    m_hasRtl = false;
    for (const uint c : m_article.text.toUcs4()) {
        if (isRtlDirection(QChar::direction(char32_t(c)))) {
            m_hasRtl = true;
            break;
        }
    }

    m_paragraphStarts16.clear();
    m_paragraphRoles.clear();
    for (const Paragraph &paragraph : m_article.paragraphs) {
        const Utf16Range r16 = m_map.utf16Range(paragraph.range);
        if (r16.start < 0)
            continue;
        m_paragraphStarts16.push_back(r16.start);
        m_paragraphRoles.push_back(paragraph.role);
    }

    m_annotations.clear();
    m_spans.clear();
    m_indexById.clear();
    m_drag = {};
    const bool hadSelection = m_selected.isValid();
    m_selected = {};
    rebuildDocument();
    verticalScrollBar()->setValue(0);
    updateAccessibleDescription();
    if (hadSelection)
        emit selectedSpanChanged(m_selected);
}

void ReadingView::setSpans(const std::vector<Annotation> &spans)
{
    m_annotations = spans;
    m_spans.clear();
    m_spans.reserve(spans.size());
    for (const Annotation &a : spans) {
        if (a.deleted || !a.id.isValid())
            continue;
        // Every stored span lies in its text (the store checks it, `check` verifies it); one that
        // does not is left undrawn rather than drawn wrong.
        const Utf16Range r16 = m_map.utf16Range(a.content.range);
        if (!FOURFOLD_SOFT_ASSERT(lcDesktop(), r16.start >= 0 && !r16.isEmpty()))
            continue;
        m_spans.push_back({a.id, a.content.function, a.content.range, r16});
    }
    std::sort(m_spans.begin(), m_spans.end(), [](const Span &a, const Span &b) {
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

    if (m_drag.active && !spanById(m_drag.id))
        m_drag = {};
    if (m_selected.isValid() && !spanById(m_selected)) {
        m_selected = {};
        emit selectedSpanChanged(m_selected);
    }
    updateEmphasis();
    updateAccessibleDescription();
    viewport()->update();
}

void ReadingView::setSelectedSpan(AnnotationId id)
{
    if (id.isValid() && !spanById(id))
        id = {};
    if (id.isValid())
        clearTextSelection();
    if (id == m_selected)
        return;
    m_selected = id;
    m_drag = {};
    updateEmphasis();
    updateAccessibleDescription();
    viewport()->update();
    emit selectedSpanChanged(m_selected);
}

void ReadingView::scrollToSpan(AnnotationId id)
{
    const Span *span = spanById(id);
    if (!span)
        return;
    const Geometry &g = geometry(span->range16);
    if (g.pieces.empty())
        return;
    QScrollBar *bar = verticalScrollBar();
    const qreal top = g.start.y();
    const qreal bottom = g.endBottom + m_metrics.zone;
    const int height = viewport()->height();
    if (top >= bar->value() && bottom <= bar->value() + height)
        return;
    // Moving the caret lets QTextEdit bring its scroll range up to date with the (lazy) layout.
    {
        const QScopedValueRollback guard(m_changingSelection, true);
        QTextCursor cursor(document());
        cursor.setPosition(int(span->range16.start));
        setTextCursor(cursor);
    }
    ensureCursorVisible();
    bar->setValue(std::max(0, int(top) - height / 3));
}

TextRange ReadingView::selectionRange(bool exact) const
{
    const QTextCursor cursor = textCursor();
    if (!cursor.hasSelection())
        return {-1, -1};
    const TextRange raw =
        m_map.codePointRange(Utf16Range {cursor.selectionStart(), cursor.selectionEnd()});
    if (raw.start < 0 || raw.isEmpty())
        return {-1, -1};
    // A span must hold at least part of a word token; white space alone is no span.
    const auto &tokens = m_segmentation.tokens;
    const auto it = std::upper_bound(tokens.begin(), tokens.end(), raw.start,
        [](qint64 pos, const TextRange &t) { return pos < t.end; });
    if (!tokens.empty() && (it == tokens.end() || !it->overlaps(raw)))
        return {-1, -1};
    const TextRange snapped = exact ? snapToGraphemes(m_article.text, raw)
                                    : snapToWords(m_article.text, m_segmentation, raw);
    if (snapped.start < 0 || snapped.isEmpty())
        return {-1, -1};
    return snapped;
}

void ReadingView::setTextSelection(const TextRange &codePoints)
{
    const Utf16Range r16 = m_map.utf16Range(codePoints);
    QTextCursor cursor = textCursor();
    if (r16.start < 0) {
        cursor.clearSelection();
    } else {
        cursor.setPosition(int(r16.start));
        cursor.setPosition(int(r16.end), QTextCursor::KeepAnchor);
    }
    setTextCursor(cursor);
}

// --- actions ---------------------------------------------------------------------------------

void ReadingView::requestFunction(FramingFunction f)
{
    applyFunction(f, false);
}

void ReadingView::applyFunction(FramingFunction f, bool exact)
{
    if (textCursor().hasSelection()) {
        const TextRange range = selectionRange(exact);
        if (range.start >= 0)
            emit createSpanRequested(f, range);
        return;
    }
    if (const Span *span = spanById(m_selected); span && span->function != f)
        emit relabelSpanRequested(span->id, f);
}

void ReadingView::selectNextSpan()
{
    if (m_spans.empty())
        return;
    std::size_t next = 0;
    if (const Span *span = spanById(m_selected)) {
        next = std::size_t(span - m_spans.data()) + 1;
        if (next >= m_spans.size())
            return;
    } else {
        const qint64 caret = textCursor().selectionStart();
        const auto it = std::lower_bound(m_spans.begin(), m_spans.end(), caret,
            [](const Span &s, qint64 pos) { return s.range16.start < pos; });
        if (it == m_spans.end())
            return;
        next = std::size_t(it - m_spans.begin());
    }
    selectSpanByUser(m_spans[next].id);
}

void ReadingView::selectPreviousSpan()
{
    if (m_spans.empty())
        return;
    std::size_t previous = 0;
    if (const Span *span = spanById(m_selected)) {
        previous = std::size_t(span - m_spans.data());
        if (previous == 0)
            return;
        --previous;
    } else {
        const qint64 caret = textCursor().selectionStart();
        const auto it = std::lower_bound(m_spans.begin(), m_spans.end(), caret,
            [](const Span &s, qint64 pos) { return s.range16.start < pos; });
        if (it == m_spans.begin())
            return;
        previous = std::size_t(it - m_spans.begin()) - 1;
    }
    selectSpanByUser(m_spans[previous].id);
}

void ReadingView::selectSpanByUser(AnnotationId id)
{
    setSelectedSpan(id);
    if (!m_selected.isValid())
        return;
    scrollToSpan(id);
    emit spanActivated(id);
}

void ReadingView::resizeByWord(bool moveStart, int direction)
{
    const Span *span = spanById(m_selected);
    if (!span)
        return;
    const std::vector<TextRange> &tokens = m_segmentation.tokens;
    TextRange r = span->range;
    auto byStart = [](const TextRange &t, qint64 pos) { return t.start < pos; };
    auto byEnd = [](const TextRange &t, qint64 pos) { return t.end < pos; };
    if (moveStart && direction < 0) {
        auto it = std::lower_bound(tokens.begin(), tokens.end(), r.start, byStart);
        if (it == tokens.begin())
            return;
        r.start = std::prev(it)->start;
    } else if (moveStart) {
        auto it = std::upper_bound(tokens.begin(), tokens.end(), r.start,
            [](qint64 pos, const TextRange &t) { return pos < t.start; });
        if (it == tokens.end() || it->start >= r.end)
            return; // the span would become empty
        r.start = it->start;
    } else if (direction > 0) {
        auto it = std::upper_bound(tokens.begin(), tokens.end(), r.end,
            [](qint64 pos, const TextRange &t) { return pos < t.end; });
        if (it == tokens.end())
            return;
        r.end = it->end;
    } else {
        auto it = std::lower_bound(tokens.begin(), tokens.end(), r.end, byEnd);
        if (it == tokens.begin() || std::prev(it)->end <= r.start)
            return; // the span would become empty
        r.end = std::prev(it)->end;
    }
    if (r != span->range)
        emit resizeSpanRequested(span->id, r);
}

void ReadingView::clearTextSelection()
{
    QTextCursor cursor = textCursor();
    if (!cursor.hasSelection())
        return;
    const QScopedValueRollback guard(m_changingSelection, true);
    cursor.clearSelection();
    setTextCursor(cursor);
}

// --- keyboard --------------------------------------------------------------------------------

bool ReadingView::wantsKey(const QKeyEvent *e) const
{
    const Qt::KeyboardModifiers mods = e->modifiers() & ~Qt::KeypadModifier;
    const int key = e->key();
    const bool hasSpan = m_selected.isValid();
    if (key >= Qt::Key_1 && key <= Qt::Key_4 && !(mods & (Qt::ControlModifier | Qt::MetaModifier)))
        return hasSpan || textCursor().hasSelection();
    if ((key == Qt::Key_Delete || key == Qt::Key_Backspace) && mods == Qt::NoModifier)
        return hasSpan;
    if ((key == Qt::Key_Up || key == Qt::Key_Down) && mods == Qt::AltModifier)
        return !m_spans.empty();
    if ((key == Qt::Key_Left || key == Qt::Key_Right)
        && (mods == Qt::AltModifier || mods == (Qt::AltModifier | Qt::ShiftModifier)))
        return hasSpan;
    if (key == Qt::Key_Escape && mods == Qt::NoModifier)
        return hasSpan || textCursor().hasSelection() || m_drag.active;
    return false;
}

bool ReadingView::event(QEvent *e)
{
    // Claim our keys before window shortcuts (e.g. toolbar actions on 1-4) see them.
    if (e->type() == QEvent::ShortcutOverride && wantsKey(static_cast<QKeyEvent *>(e))) {
        e->accept();
        return true;
    }
    return QTextEdit::event(e);
}

void ReadingView::keyPressEvent(QKeyEvent *e)
{
    if (!wantsKey(e)) {
        QTextEdit::keyPressEvent(e);
        return;
    }
    const Qt::KeyboardModifiers mods = e->modifiers() & ~Qt::KeypadModifier;
    switch (e->key()) {
    case Qt::Key_1:
    case Qt::Key_2:
    case Qt::Key_3:
    case Qt::Key_4:
        applyFunction(FramingFunction(e->key() - Qt::Key_1), mods & Qt::AltModifier);
        break;
    case Qt::Key_Delete:
    case Qt::Key_Backspace:
        emit deleteSpanRequested(m_selected);
        break;
    case Qt::Key_Down:
        selectNextSpan();
        break;
    case Qt::Key_Up:
        selectPreviousSpan();
        break;
    case Qt::Key_Left:
    case Qt::Key_Right: {
        // The arrows follow the text at the moving end: in right-to-left text Left reads
        // forwards, as the caret does.
        const bool moveStart = !(mods & Qt::ShiftModifier);
        int direction = e->key() == Qt::Key_Right ? 1 : -1;
        if (const Span *span = spanById(m_selected)) {
            const qint64 at = moveStart ? span->range16.start : span->range16.end - 1;
            if (isRtlAt(at, document()->findBlock(int(at))))
                direction = -direction;
        }
        resizeByWord(moveStart, direction);
        break;
    }
    case Qt::Key_Escape:
        if (m_drag.active) {
            m_drag = {};
            updateEmphasis();
            viewport()->update();
        } else if (m_selected.isValid()) {
            setSelectedSpan({});
        } else {
            clearTextSelection();
        }
        break;
    default:
        break;
    }
    e->accept();
}

// --- mouse -----------------------------------------------------------------------------------

void ReadingView::mousePressEvent(QMouseEvent *e)
{
    m_pendingSpanClick = {};
    m_pressOnText = false;
    if (e->button() == Qt::LeftButton) {
        const QPoint pos = e->position().toPoint();
        const Hit hit = hitTest(pos);
        if (hit.kind == Hit::StartHandle || hit.kind == Hit::EndHandle) {
            const Span *span = spanById(m_selected);
            m_drag = {true, hit.kind == Hit::StartHandle, span->id, span->range, span->range};
            setFocus(Qt::MouseFocusReason);
            e->accept();
            return;
        }
        if (hit.kind == Hit::Lane || hit.kind == Hit::Badge) {
            // A lane is not text: do not move the caret.
            m_pendingSpanClick = hit.spans.front();
            m_pressPos = pos;
            setFocus(Qt::MouseFocusReason);
            e->accept();
            return;
        }
        m_pressPos = pos;
        m_pressOnText = true;
    }
    QTextEdit::mousePressEvent(e);
}

void ReadingView::mouseDoubleClickEvent(QMouseEvent *e)
{
    // A double click on a lane, badge or handle is two clicks on the span, not a word selection
    // in the line next to it.
    const Hit::Kind kind = hitTest(e->position().toPoint()).kind;
    if (e->button() == Qt::LeftButton && kind != Hit::Nothing && kind != Hit::Text) {
        e->accept();
        return;
    }
    QTextEdit::mouseDoubleClickEvent(e);
}

void ReadingView::mouseMoveEvent(QMouseEvent *e)
{
    const QPoint pos = e->position().toPoint();
    if (m_drag.active) {
        if (pos.y() < 0 || pos.y() > viewport()->height()) {
            QScrollBar *bar = verticalScrollBar();
            bar->setValue(bar->value() + (pos.y() < 0 ? pos.y() : pos.y() - viewport()->height()));
        }
        updateDragPreview(pos, e->modifiers() & Qt::AltModifier);
        e->accept();
        return;
    }
    if (m_pendingSpanClick.isValid()) {
        e->accept();
        return;
    }
    QTextEdit::mouseMoveEvent(e);
    if (e->buttons() == Qt::NoButton) {
        const Hit::Kind kind = hitTest(pos).kind;
        Qt::CursorShape shape = Qt::IBeamCursor;
        if (kind == Hit::StartHandle || kind == Hit::EndHandle)
            shape = Qt::SizeHorCursor;
        else if (kind == Hit::Lane || kind == Hit::Badge)
            shape = Qt::PointingHandCursor;
        viewport()->setCursor(shape);
    }
}

void ReadingView::mouseReleaseEvent(QMouseEvent *e)
{
    const QPoint pos = e->position().toPoint();
    if (m_drag.active && e->button() == Qt::LeftButton) {
        updateDragPreview(pos, e->modifiers() & Qt::AltModifier);
        const Drag drag = m_drag;
        m_drag = {};
        updateEmphasis();
        viewport()->update();
        if (drag.preview != drag.original && !drag.preview.isEmpty())
            emit resizeSpanRequested(drag.id, drag.preview);
        e->accept();
        return;
    }
    if (m_pendingSpanClick.isValid()) {
        m_pendingSpanClick = {};
        const Hit hit = hitTest(pos);
        if (hit.kind == Hit::Lane || hit.kind == Hit::Badge)
            selectFromHit(hit);
        e->accept();
        return;
    }
    QTextEdit::mouseReleaseEvent(e);
    if (m_pressOnText && e->button() == Qt::LeftButton && !textCursor().hasSelection()
        && (pos - m_pressPos).manhattanLength() < QApplication::startDragDistance()) {
        const Hit hit = hitTest(pos);
        if (hit.kind == Hit::Text)
            selectFromHit(hit);
        else
            setSelectedSpan({});
    }
    m_pressOnText = false;
}

void ReadingView::selectFromHit(const Hit &hit)
{
    if (hit.spans.empty())
        return;
    // Clicking again where spans nest cycles through them, shortest first.
    AnnotationId choice = hit.spans.front();
    const auto current = std::find(hit.spans.begin(), hit.spans.end(), m_selected);
    if (current != hit.spans.end())
        choice = std::next(current) == hit.spans.end() ? hit.spans.front() : *std::next(current);
    setSelectedSpan(choice);
    emit spanActivated(choice);
}

void ReadingView::updateDragPreview(const QPoint &viewportPos, bool exact)
{
    const qint64 cp = codePointAt(viewportPos);
    if (cp < 0)
        return;
    const TextRange original = m_drag.original;
    TextRange wanted = m_drag.moveStart
        ? TextRange {std::min(cp, original.end - 1), original.end}
        : TextRange {original.start, std::max(cp, original.start + 1)};
    const TextRange snapped = exact ? snapToGraphemes(m_article.text, wanted)
                                    : snapToWords(m_article.text, m_segmentation, wanted);
    if (snapped.start < 0)
        return;
    // Only the dragged end moves; the other keeps its place even if it is not on a word edge.
    TextRange preview = m_drag.moveStart ? TextRange {snapped.start, original.end}
                                         : TextRange {original.start, snapped.end};
    if (preview.isEmpty() || preview == m_drag.preview)
        return;
    m_drag.preview = preview;
    updateEmphasis();
    viewport()->update();
}

qint64 ReadingView::codePointAt(const QPoint &viewportPos) const
{
    const int pos16 = cursorForPosition(viewportPos).position();
    return m_map.codePointFromUtf16(std::min<qint64>(pos16, m_map.utf16Length()));
}

void ReadingView::contextMenuEvent(QContextMenuEvent *e)
{
    const bool hasSelection = textCursor().hasSelection();
    // A right click on a span (with no text selected) acts on that span.
    if (!hasSelection && e->reason() == QContextMenuEvent::Mouse) {
        const Hit hit = hitTest(e->pos());
        if (!hit.spans.empty()
            && std::find(hit.spans.begin(), hit.spans.end(), m_selected) == hit.spans.end())
            selectFromHit(hit);
    }
    QMenu *menu = createStandardContextMenu();
    menu->addSeparator();
    const Span *span = spanById(m_selected);
    for (FramingFunction f : kFramingFunctions) {
        const QString label = hasSelection ? tr("Mark as %1").arg(functionName(f))
                                           : tr("Change to %1").arg(functionName(f));
        QAction *action = menu->addAction(label, this, [this, f] { requestFunction(f); });
        action->setShortcut(QKeySequence(Qt::Key_1 + functionShortcutKey(f) - 1));
        action->setEnabled(hasSelection || (span && span->function != f));
    }
    QAction *remove = menu->addAction(tr("Delete span"), this, [this] {
        if (m_selected.isValid())
            emit deleteSpanRequested(m_selected);
    });
    remove->setShortcut(QKeySequence(Qt::Key_Delete));
    remove->setEnabled(span != nullptr);
    menu->setAttribute(Qt::WA_DeleteOnClose);
    menu->popup(e->globalPos());
}

bool ReadingView::viewportEvent(QEvent *e)
{
    if (e->type() == QEvent::ToolTip) {
        auto *help = static_cast<QHelpEvent *>(e);
        const Hit hit = hitTest(help->pos());
        if (hit.spans.empty() || hit.kind == Hit::Nothing) {
            QToolTip::hideText();
            e->ignore();
            return true;
        }
        QStringList lines;
        for (AnnotationId id : hit.spans) {
            const Span *span = spanById(id);
            QString quote = m_article.text.mid(span->range16.start, span->range16.length());
            if (quote.size() > 60)
                quote = quote.left(59) + QChar(0x2026);
            lines << tr("%1: \u201C%2\u201D")
                         .arg(functionName(span->function), quote.toHtmlEscaped());
        }
        QToolTip::showText(help->globalPos(), lines.join(QStringLiteral("<br>")), viewport());
        return true;
    }
    return QTextEdit::viewportEvent(e);
}

// --- layout, metrics, colours ----------------------------------------------------------------

void ReadingView::updateMetrics()
{
    const QFontMetricsF fm(font());
    const qreal em = fm.height();
    Metrics m;
    // Lanes are spaced about a quarter of a line apart: four of them, plus a gap, fit under the
    // glyphs' descent; everything follows the font, so it scales with the DPI.
    m.pitch = std::max<qreal>(4, std::round(em * 0.3));
    m.stroke = std::max<qreal>(2, std::round(m.pitch * 0.4));
    m.gap = std::max<qreal>(2, std::round(em * 0.12));
    // More air below the lanes than above them, so they read as belonging to the line above.
    m.zone = m.gap + 4 * m.pitch + std::max<qreal>(4, std::round(em * 0.45));
    m.handleRadius = std::max<qreal>(3, std::round(m.pitch * 0.7));
    // About 70 characters a line: a comfortable measure for reading (common practice).
    m.readingWidth =
        std::round(fm.horizontalAdvance(QStringLiteral("abcdefghijklmnopqrstuvwxyz")) / 26.0 * 70);

    m.badgeFont = font();
    m.badgeFont.setBold(true);
    m.badgeFont.setPixelSize(std::max(6, int(std::round(4 * m.pitch * 0.72))));

    m.labelFont = font();
    if (m.labelFont.pointSizeF() > 0)
        m.labelFont.setPointSizeF(m.labelFont.pointSizeF() * 0.8);
    else
        m.labelFont.setPixelSize(std::max(6, int(std::round(m.labelFont.pixelSize() * 0.8))));
    m.labelFont.setCapitalization(QFont::SmallCaps);
    m.labelFont.setLetterSpacing(QFont::PercentageSpacing, 104);
    const QFontMetricsF lm(m.labelFont);
    qreal widest = 0;
    for (ParagraphRole role :
        {ParagraphRole::Intro, ParagraphRole::Body, ParagraphRole::Conclusion})
        widest = std::max(widest, lm.horizontalAdvance(roleLabel(role)));
    m.labelColumn = std::ceil(widest + 2 * em);
    m_metrics = m;
}

void ReadingView::updateColours()
{
    const QPalette pal = palette();
    const QColor base = pal.color(QPalette::Base);
    m_dark = base.lightnessF() < 0.5;
    const QColor white(Qt::white);
    const QColor black(Qt::black);
    for (FramingFunction f : kFramingFunctions) {
        const auto i = std::size_t(f);
        QColor lane = functionStyle(f).colour;
        // On a dark background the palette's darker hues (blue above all) are lightened until
        // they read as well as text would (WCAG 2.1 SC 1.4.3, 4.5:1); on light backgrounds the
        // colours stay exactly as defined.
        if (m_dark)
            lane = withContrast(lane, white, base, 4.5);
        m_laneColours[i] = lane;
        m_badgeFill[i] = mixColours(base, lane, m_dark ? 0.22 : 0.12);
        m_badgeText[i] = withContrast(lane, m_dark ? white : black, m_badgeFill[i], 4.5);
    }
}

void ReadingView::rebuildDocument()
{
    const QFontMetricsF fm(font());
    auto *doc = new QTextDocument(this);
    doc->setUndoRedoEnabled(false);
    doc->setDefaultFont(font());
    doc->setDocumentMargin(0);

    // Every line leaves room for the four lanes under it; blank lines between paragraphs
    // shrink to a fixed gap, so paragraphs are set apart without a whole empty lane-line.
    QTextBlockFormat lineFormat;
    lineFormat.setLineHeight(m_metrics.zone, QTextBlockFormat::LineDistanceHeight);
    QTextBlockFormat gapFormat;
    gapFormat.setLineHeight(std::round(fm.height() * 0.9), QTextBlockFormat::FixedHeight);

    QTextCursor cursor(doc);
    cursor.setBlockFormat(lineFormat);
    // insertText turns each LF into a block separator of the same length, so document
    // positions stay the UTF-16 positions of the canonical text.
    cursor.insertText(m_article.text);
    for (QTextBlock block = doc->begin(); block.isValid(); block = block.next()) {
        if (block.length() == 1 && block.next().isValid())
            QTextCursor(block).setBlockFormat(gapFormat);
    }

    m_leftMargin = m_rightMargin = -1;
    m_geometry.clear();
    {
        const QScopedValueRollback guard(m_changingSelection, true);
        setExtraSelections({});
        setDocument(doc); // deletes the previous document: it was our child
    }
    setReadOnly(true);
    setTextInteractionFlags(Qt::TextSelectableByMouse | Qt::TextSelectableByKeyboard);
    updateMargins();
    updateEmphasis();
}

void ReadingView::updateMargins()
{
    const QFontMetricsF fm(font());
    const qreal em = fm.height();
    const qreal width = viewport()->width();
    const qreal left =
        std::max(m_metrics.labelColumn, std::floor((width - m_metrics.readingWidth) / 2));
    const qreal right = std::max(em, width - left - m_metrics.readingWidth);
    if (left == m_leftMargin && right == m_rightMargin)
        return;
    m_leftMargin = left;
    m_rightMargin = right;
    QTextFrameFormat format = document()->rootFrame()->frameFormat();
    format.setLeftMargin(left);
    format.setRightMargin(right);
    format.setTopMargin(em);
    format.setBottomMargin(2 * em);
    document()->rootFrame()->setFrameFormat(format);
    invalidateGeometry();
}

void ReadingView::invalidateGeometry()
{
    m_geometry.clear();
    m_geometryWidth = -1;
}

void ReadingView::resizeEvent(QResizeEvent *e)
{
    QTextEdit::resizeEvent(e);
    updateMargins();
}

void ReadingView::changeEvent(QEvent *e)
{
    QTextEdit::changeEvent(e);
    switch (e->type()) {
    case QEvent::FontChange: {
        const QTextCursor old = textCursor();
        const int anchor = old.anchor();
        const int position = old.position();
        const int scroll = verticalScrollBar()->value();
        updateMetrics();
        rebuildDocument();
        QTextCursor cursor(document());
        cursor.setPosition(anchor);
        cursor.setPosition(position, QTextCursor::KeepAnchor);
        {
            const QScopedValueRollback guard(m_changingSelection, true);
            setTextCursor(cursor);
        }
        verticalScrollBar()->setValue(scroll);
        break;
    }
    case QEvent::PaletteChange:
    case QEvent::StyleChange:
        updateColours();
        updateEmphasis();
        viewport()->update();
        break;
    default:
        break;
    }
}

int ReadingView::setSearchHighlight(const QString &query)
{
    m_searchHits.clear();
    const QString &text = m_article.text;
    for (QString term :
        query.split(QRegularExpression(QStringLiteral("\\s+")), Qt::SkipEmptyParts)) {
        term.remove(QLatin1Char('"'));
        if (term.endsWith(QLatin1Char('*')))
            term.chop(1);
        if (term.isEmpty() || term == QLatin1String("AND") || term == QLatin1String("OR")
            || term == QLatin1String("NOT") || term.startsWith(QLatin1String("NEAR")))
            continue;
        for (qsizetype at = text.indexOf(term, 0, Qt::CaseInsensitive); at >= 0;
             at = text.indexOf(term, at + term.size(), Qt::CaseInsensitive))
            m_searchHits.push_back(Utf16Range {at, at + term.size()});
    }
    updateEmphasis();
    return int(m_searchHits.size());
}

void ReadingView::updateEmphasis()
{
    QList<QTextEdit::ExtraSelection> selections;
    for (const Utf16Range &hit : m_searchHits) {
        QTextEdit::ExtraSelection mark;
        mark.cursor = QTextCursor(document());
        mark.cursor.setPosition(int(hit.start));
        mark.cursor.setPosition(int(hit.end), QTextCursor::KeepAnchor);
        // Okabe–Ito yellow, which no function uses; background only, so the layout (and the
        // cached span geometry) stays as it is.
        QColor yellow(0xF0, 0xE4, 0x42);
        yellow.setAlphaF(m_dark ? 0.35f : 0.55f);
        mark.format.setBackground(yellow);
        selections << mark;
    }
    const Span *span = spanById(m_drag.active ? m_drag.id : m_selected);
    if (span) {
        const Utf16Range r16 = m_drag.active ? m_map.utf16Range(m_drag.preview) : span->range16;
        if (r16.start >= 0) {
            QTextEdit::ExtraSelection tint;
            tint.cursor = QTextCursor(document());
            tint.cursor.setPosition(int(r16.start));
            tint.cursor.setPosition(int(r16.end), QTextCursor::KeepAnchor);
            QColor colour = laneColour(span->function);
            colour.setAlphaF(m_dark ? 0.30f : 0.16f);
            tint.format.setBackground(colour);
            selections << tint;
        }
    }
    const QScopedValueRollback guard(m_changingSelection, true);
    setExtraSelections(selections);
}

void ReadingView::updateAccessibleDescription()
{
    const Span *span = spanById(m_selected);
    if (!span) {
        setAccessibleDescription(tr("%n span(s). Select text and press 1 to 4 to mark a framing "
                                    "function; Alt+Down and Alt+Up move between spans.",
            nullptr, int(m_spans.size())));
        return;
    }
    QString quote = m_article.text.mid(span->range16.start, span->range16.length());
    if (quote.size() > 80)
        quote = quote.left(79) + QChar(0x2026);
    setAccessibleDescription(
        tr("Selected span: %1, \u201C%2\u201D. Press 1 to 4 to relabel, Delete "
           "to delete, Alt+Left/Right and Alt+Shift+Left/Right to resize.")
            .arg(functionName(span->function), quote));
}

// --- geometry --------------------------------------------------------------------------------

const ReadingView::Span *ReadingView::spanById(AnnotationId id) const
{
    if (!id.isValid())
        return nullptr;
    const auto it = m_indexById.constFind(id.value);
    return it == m_indexById.cend() ? nullptr : &m_spans[std::size_t(*it)];
}

qreal ReadingView::laneY(qreal lineBottom, int lane) const
{
    return std::floor(lineBottom + m_metrics.gap + m_metrics.pitch * (lane + 0.5));
}

const ReadingView::Geometry &ReadingView::geometry(const Utf16Range &range16) const
{
    if (m_geometryWidth != viewport()->width()) {
        m_geometry.clear();
        m_geometryWidth = viewport()->width();
    }
    const quint64 key = rangeKey(range16);
    auto it = m_geometry.find(key);
    if (it == m_geometry.end()) {
        Geometry g = computeGeometry(range16);
        if (g.pieces.empty()) {
            // Not laid out yet (or nothing visible): do not cache the empty answer.
            static const Geometry empty;
            return empty;
        }
        it = m_geometry.insert(key, std::move(g));
    }
    return *it;
}

bool ReadingView::isRtlAt(qint64 pos16, const QTextBlock &block) const
{
    if (pos16 >= 0 && pos16 < m_article.text.size()) {
        char32_t c = m_article.text.at(pos16).unicode();
        if (QChar::isHighSurrogate(c) && pos16 + 1 < m_article.text.size())
            c = QChar::surrogateToUcs4(m_article.text.at(pos16), m_article.text.at(pos16 + 1));
        const QChar::Direction d = QChar::direction(c);
        if (isStrongDirection(d))
            return isRtlDirection(d);
    }
    return block.textDirection() == Qt::RightToLeft;
}

void ReadingView::addPieces(const QTextBlock &block, const QTextLine &line, qint64 from16,
    qint64 to16, std::vector<Piece> &pieces) const
{
    const QTextLayout *layout = block.layout();
    const QPointF origin = layout->position();
    const qreal top = origin.y() + line.y();
    const qreal bottom = top + line.height();
    const qint64 key = (qint64(block.blockNumber()) << 24) | line.lineNumber();
    const int bpos = block.position();
    const int from = int(from16) - bpos;
    const int to = int(to16) - bpos;

    bool mixed = false;
    if (m_hasRtl) {
        const int lineStart = bpos + line.textStart();
        const int lineEnd = lineStart + line.textLength();
        bool rtl = false;
        bool ltr = false;
        for (int i = lineStart; i < lineEnd; ++i) {
            const QChar::Direction d = m_article.text.at(i).direction();
            rtl = rtl || isRtlDirection(d);
            ltr = ltr || d == QChar::DirL;
        }
        mixed = rtl && ltr;
    }
    if (!mixed) {
        const qreal x1 = line.cursorToX(from);
        const qreal x2 = line.cursorToX(to);
        pieces.push_back(
            {origin.x() + std::min(x1, x2), origin.x() + std::max(x1, x2), top, bottom, key});
        return;
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
    for (const auto &[x1, x2] : merged)
        pieces.push_back({origin.x() + x1, origin.x() + x2, top, bottom, key});
}

ReadingView::Geometry ReadingView::computeGeometry(const Utf16Range &range16) const
{
    Geometry g;
    QTextDocument *doc = document();
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
        const QTextLine firstLine = layout->lineForTextPosition(int(from - bpos));
        for (int i = firstLine.isValid() ? firstLine.lineNumber() : 0; i < layout->lineCount();
             ++i) {
            const QTextLine line = layout->lineAt(i);
            const qint64 lineStart = bpos + line.textStart();
            const qint64 lineEnd = lineStart + line.textLength();
            if (lineStart >= to)
                break;
            const qint64 a = std::max(from, lineStart);
            const qint64 b = std::min(to, lineEnd);
            if (b > a)
                addPieces(block, line, a, b, g.pieces);
        }
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

Utf16Range ReadingView::visibleRange16(const QRect &viewportRect) const
{
    const QAbstractTextDocumentLayout *layout = document()->documentLayout();
    const qreal dy = verticalScrollBar()->value();
    const qreal margin = m_metrics.zone + QFontMetricsF(font()).height();
    const qreal x = m_leftMargin + 1;
    int from = layout->hitTest(QPointF(x, viewportRect.top() + dy - margin), Qt::FuzzyHit);
    int to = layout->hitTest(QPointF(x, viewportRect.bottom() + dy + margin), Qt::FuzzyHit);
    if (from < 0)
        from = 0;
    if (to < 0)
        to = document()->characterCount();
    // Whole blocks: a hit at one end of a line says little about a bidi line's other end.
    const QTextBlock a = document()->findBlock(from);
    const QTextBlock b = document()->findBlock(to);
    return {a.isValid() ? a.position() : 0,
        b.isValid() ? b.position() + b.length() : document()->characterCount()};
}

std::vector<const ReadingView::Span *> ReadingView::spansIn(const Utf16Range &range16) const
{
    std::vector<const Span *> out;
    for (const Span &span : m_spans) {
        if (span.range16.start >= range16.end)
            break;
        if (span.range16.end > range16.start)
            out.push_back(&span);
    }
    return out;
}

QRectF ReadingView::badgeRect(const Geometry &g) const
{
    const QFontMetricsF fm(m_metrics.badgeFont);
    const qreal width = std::ceil(fm.horizontalAdvance(QLatin1Char('M')) + m_metrics.pitch);
    const qreal top = g.startBottom + m_metrics.gap - 1;
    const qreal height = 4 * m_metrics.pitch + 1;
    const qreal left = g.startRtl ? g.start.x() - width : g.start.x();
    return {std::round(left), top, width, height};
}

std::vector<ReadingView::Badge> ReadingView::layoutBadges(
    const std::vector<const Span *> &spans) const
{
    std::vector<Badge> badges;
    for (const Span *span : spans) {
        const Geometry &g = geometry(span->range16);
        if (!g.pieces.empty())
            badges.push_back({badgeRect(g), span, g.startRtl});
    }
    // Badges that would collide on one line move along it in their reading direction: left to
    // right text pushes later badges rightwards, right to left text leftwards.
    std::stable_sort(badges.begin(), badges.end(), [](const Badge &a, const Badge &b) {
        return a.rect.top() != b.rect.top() ? a.rect.top() < b.rect.top()
                                            : a.rect.left() < b.rect.left();
    });
    const Badge *previous = nullptr;
    for (Badge &badge : badges) {
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

// --- painting --------------------------------------------------------------------------------

void ReadingView::paintEvent(QPaintEvent *e)
{
    QTextEdit::paintEvent(e);
    if (m_article.text.isEmpty())
        return;
    QPainter p(viewport());
    const QPointF offset(-horizontalScrollBar()->value(), -verticalScrollBar()->value());
    p.translate(offset);
    const QRectF clip = QRectF(e->rect()).translated(-offset);
    p.setClipRect(clip);
    const Utf16Range visible = visibleRange16(e->rect());
    paintRoleLabels(p, visible);
    paintLanes(p, spansIn(visible), clip);
    paintSelection(p);
}

void ReadingView::paintRoleLabels(QPainter &p, const Utf16Range &visible16)
{
    p.setFont(m_metrics.labelFont);
    p.setPen(palette().color(QPalette::PlaceholderText));
    const QFontMetricsF fm(m_metrics.labelFont);
    const qreal right = m_leftMargin - QFontMetricsF(font()).height();
    auto it =
        std::lower_bound(m_paragraphStarts16.begin(), m_paragraphStarts16.end(), visible16.start);
    for (; it != m_paragraphStarts16.end() && *it < visible16.end; ++it) {
        const QTextBlock block = document()->findBlock(int(*it));
        const QTextLayout *layout = block.layout();
        if (!layout || layout->lineCount() == 0)
            continue;
        const QTextLine line = layout->lineForTextPosition(int(*it - block.position()));
        if (!line.isValid())
            continue;
        const QString label =
            roleLabel(m_paragraphRoles[std::size_t(it - m_paragraphStarts16.begin())]);
        const qreal baseline = layout->position().y() + line.y() + line.ascent();
        p.drawText(QPointF(right - fm.horizontalAdvance(label), baseline), label);
    }
}

void ReadingView::paintLanes(
    QPainter &p, const std::vector<const Span *> &visible, const QRectF &clip)
{
    p.setRenderHint(QPainter::Antialiasing, false);
    const qreal stroke = m_metrics.stroke;

    struct Edge {
        qreal x;
        int delta;
    };
    for (FramingFunction f : kFramingFunctions) {
        const FunctionStyle style = functionStyle(f);
        std::vector<Piece> pieces;
        for (const Span *span : visible) {
            if (span->function != f)
                continue;
            for (const Piece &piece : geometry(span->range16).pieces) {
                if (piece.lineBottom + m_metrics.zone >= clip.top()
                    && piece.lineTop <= clip.bottom())
                    pieces.push_back(piece);
            }
        }
        std::sort(pieces.begin(), pieces.end(), [](const Piece &a, const Piece &b) {
            return a.lineKey != b.lineKey ? a.lineKey < b.lineKey : a.x1 < b.x1;
        });
        QPen pen(laneColour(f), stroke, style.line, Qt::FlatCap);
        QPen thin(
            laneColour(f), std::max<qreal>(1, std::floor(stroke / 2)), style.line, Qt::FlatCap);
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
            const qreal y = laneY(pieces[i].lineBottom, style.lane);
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
    for (const Span *span : visible) {
        const Geometry &g = geometry(span->range16);
        if (g.pieces.empty())
            continue;
        const qreal y = laneY(g.endBottom, functionStyle(span->function).lane);
        const qreal x = std::round(g.end.x()) + (g.endRtl ? 0 : -1);
        p.fillRect(QRectF(x, y - m_metrics.pitch * 0.5 - 1, std::max<qreal>(1, stroke - 1),
                       m_metrics.pitch + 1),
            laneColour(span->function));
    }

    const std::vector<Badge> badges = layoutBadges(visible);
    p.setRenderHint(QPainter::Antialiasing, true);
    p.setFont(m_metrics.badgeFont);
    const qreal radius = std::max<qreal>(1.5, m_metrics.pitch * 0.45);
    for (const Badge &badge : badges) {
        if (!badge.rect.intersects(clip))
            continue;
        const auto i = std::size_t(badge.span->function);
        const QRectF r = badge.rect.adjusted(0.5, 0.5, -0.5, -0.5);
        p.setPen(QPen(m_laneColours[i], 1));
        p.setBrush(m_badgeFill[i]);
        p.drawRoundedRect(r, radius, radius);
        p.setPen(m_badgeText[i]);
        p.drawText(
            badge.rect, Qt::AlignCenter, QString(functionStyle(badge.span->function).letter));
    }
    p.setBrush(Qt::NoBrush);
}

void ReadingView::paintSelection(QPainter &p)
{
    const Span *span = spanById(m_drag.active ? m_drag.id : m_selected);
    if (!span)
        return;
    Geometry previewGeometry;
    const Geometry *g = nullptr;
    if (m_drag.active) {
        previewGeometry = computeGeometry(m_map.utf16Range(m_drag.preview));
        g = &previewGeometry;
    } else {
        g = &geometry(span->range16);
    }
    if (g->pieces.empty())
        return;
    const QColor colour = laneColour(span->function);

    // Handles: an upright bar through the line and its lanes, with a knob on top at the start and
    // at the bottom at the end.
    p.setRenderHint(QPainter::Antialiasing, true);
    const qreal r = m_metrics.handleRadius;
    auto handle = [&](const QPointF &top, qreal bottom, bool knobOnTop) {
        const qreal x = std::round(top.x());
        const qreal barBottom = bottom + m_metrics.zone;
        p.fillRect(QRectF(x - 1, top.y(), 2, barBottom - top.y()), colour);
        const QPointF knob(x, knobOnTop ? top.y() - r + 1 : barBottom + r - 1);
        p.setPen(QPen(palette().color(QPalette::Base), 1.5));
        p.setBrush(colour);
        p.drawEllipse(knob, r, r);
        p.setBrush(Qt::NoBrush);
    };
    handle(g->start, g->startBottom, true);
    handle(g->end, g->endBottom, false);
}

// --- hit testing -----------------------------------------------------------------------------

ReadingView::Hit ReadingView::hitTest(const QPoint &viewportPos) const
{
    Hit hit;
    if (m_article.text.isEmpty())
        return hit;
    const QPointF pos(viewportPos.x() + horizontalScrollBar()->value(),
        viewportPos.y() + verticalScrollBar()->value());
    const qreal zone = m_metrics.zone;

    if (const Span *span = spanById(m_selected)) {
        const Geometry &g = geometry(span->range16);
        const qreal slop =
            std::max<qreal>(m_metrics.handleRadius + 2, QFontMetricsF(font()).height() * 0.3);
        auto near = [&](const QPointF &top, qreal bottom, bool knobOnTop) {
            const qreal knobExtra = 2 * m_metrics.handleRadius;
            const qreal y1 = top.y() - (knobOnTop ? knobExtra : 0);
            const qreal y2 = bottom + zone + (knobOnTop ? 0 : knobExtra);
            return std::abs(pos.x() - top.x()) <= slop && pos.y() >= y1 && pos.y() <= y2;
        };
        if (!g.pieces.empty()) {
            if (near(g.start, g.startBottom, true)) {
                hit.kind = Hit::StartHandle;
                hit.spans = {span->id};
                return hit;
            }
            if (near(g.end, g.endBottom, false)) {
                hit.kind = Hit::EndHandle;
                hit.spans = {span->id};
                return hit;
            }
        }
    }

    const QRect around(viewportPos.x(), int(viewportPos.y() - 2 * zone), 1, int(4 * zone));
    const std::vector<const Span *> candidates = spansIn(visibleRange16(around));
    std::vector<const Span *> lane;
    std::vector<const Span *> text;
    std::vector<const Span *> badge;
    for (const Badge &b : layoutBadges(candidates)) {
        if (b.rect.contains(pos))
            badge.push_back(b.span);
    }
    for (const Span *span : candidates) {
        const Geometry &g = geometry(span->range16);
        if (g.pieces.empty())
            continue;
        const int laneIndex = functionStyle(span->function).lane;
        for (const Piece &piece : g.pieces) {
            if (pos.x() < piece.x1 - 1 || pos.x() > piece.x2 + 1)
                continue;
            const qreal y = laneY(piece.lineBottom, laneIndex);
            if (std::abs(pos.y() - y) <= m_metrics.pitch * 0.5 + 0.5)
                lane.push_back(span);
            else if (pos.y() >= piece.lineTop && pos.y() < piece.lineBottom)
                text.push_back(span);
        }
    }
    auto finish = [&](Hit::Kind kind, std::vector<const Span *> spans) {
        std::sort(spans.begin(), spans.end(), [](const Span *a, const Span *b) {
            if (a->range.length() != b->range.length())
                return a->range.length() < b->range.length();
            return a->range.start != b->range.start ? a->range.start < b->range.start
                                                    : a->id < b->id;
        });
        spans.erase(std::unique(spans.begin(), spans.end()), spans.end());
        hit.kind = kind;
        for (const Span *span : spans)
            hit.spans.push_back(span->id);
        return hit;
    };
    if (!badge.empty())
        return finish(Hit::Badge, badge);
    if (!lane.empty())
        return finish(Hit::Lane, lane);
    if (!text.empty())
        return finish(Hit::Text, text);
    return hit;
}

} // namespace fourfold
