#include "app/desktop/reading_view.h"

#include "app/desktop/function_style.h"
#include "core/model/logging.h"

#include <QAbstractTextDocumentLayout>
#include <QApplication>
#include <QContextMenuEvent>
#include <QFontMetricsF>
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

} // namespace

ReadingView::ReadingView(QWidget *parent)
    : QTextEdit(parent)
    , m_lanes(viewport())
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

    m_lanes.setText(m_article.text);

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
    m_lanes.setSpans({});
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
    std::vector<LaneSpan> shown;
    shown.reserve(spans.size());
    for (const Annotation &a : spans) {
        if (a.deleted || !a.id.isValid())
            continue;
        // Every stored span lies in its text (the store checks it, `check` verifies it); one that
        // does not is left undrawn rather than drawn wrong.
        const Utf16Range r16 = m_map.utf16Range(a.content.range);
        if (!FOURFOLD_SOFT_ASSERT(lcDesktop(), r16.start >= 0 && !r16.isEmpty()))
            continue;
        shown.push_back(
            {a.id, a.content.function, a.content.range, r16, m_ownerNames.value(a.coder.value)});
    }
    m_lanes.setSpans(std::move(shown));

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

void ReadingView::setSpanOwners(const QHash<qint64, QString> &pseudonymByCoder)
{
    if (pseudonymByCoder == m_ownerNames)
        return;
    m_ownerNames = pseudonymByCoder;
    viewport()->update();
}

QString ReadingView::spanOwner(AnnotationId id) const
{
    const LaneSpan *span = spanById(id);
    return span ? span->owner : QString();
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
    const LaneSpan *span = spanById(id);
    if (!span)
        return;
    const SpanGeometry &g = m_lanes.geometry(span->range16);
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
    if (const LaneSpan *span = spanById(m_selected); span && span->function != f)
        emit relabelSpanRequested(span->id, f);
}

void ReadingView::selectNextSpan()
{
    const std::vector<LaneSpan> &shown = m_lanes.spans();
    if (shown.empty())
        return;
    std::size_t next = 0;
    if (const LaneSpan *span = spanById(m_selected)) {
        next = std::size_t(span - shown.data()) + 1;
        if (next >= shown.size())
            return;
    } else {
        const qint64 caret = textCursor().selectionStart();
        const auto it = std::lower_bound(shown.begin(), shown.end(), caret,
            [](const LaneSpan &s, qint64 pos) { return s.range16.start < pos; });
        if (it == shown.end())
            return;
        next = std::size_t(it - shown.begin());
    }
    selectSpanByUser(shown[next].id);
}

void ReadingView::selectPreviousSpan()
{
    const std::vector<LaneSpan> &shown = m_lanes.spans();
    if (shown.empty())
        return;
    std::size_t previous = 0;
    if (const LaneSpan *span = spanById(m_selected)) {
        previous = std::size_t(span - shown.data());
        if (previous == 0)
            return;
        --previous;
    } else {
        const qint64 caret = textCursor().selectionStart();
        const auto it = std::lower_bound(shown.begin(), shown.end(), caret,
            [](const LaneSpan &s, qint64 pos) { return s.range16.start < pos; });
        if (it == shown.begin())
            return;
        previous = std::size_t(it - shown.begin()) - 1;
    }
    selectSpanByUser(shown[previous].id);
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
    const LaneSpan *span = spanById(m_selected);
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

bool ReadingView::exactDrag(Qt::KeyboardModifiers mods) const
{
    return m_exactSelection || (mods & (Qt::AltModifier | Qt::ControlModifier));
}

bool ReadingView::wantsKey(const QKeyEvent *e) const
{
    const Qt::KeyboardModifiers mods = e->modifiers() & ~Qt::KeypadModifier;
    const int key = e->key();
    const bool hasSpan = m_selected.isValid();
    // Ctrl does what Alt does: window managers take some Alt keys before the program sees them.
    const bool step = mods == Qt::AltModifier || mods == Qt::ControlModifier;
    const bool stepShift = mods == (Qt::AltModifier | Qt::ShiftModifier)
        || mods == (Qt::ControlModifier | Qt::ShiftModifier);
    if (key >= Qt::Key_1 && key <= Qt::Key_4 && !(mods & Qt::MetaModifier)
        && !(mods & Qt::AltModifier && mods & Qt::ControlModifier))
        return hasSpan || textCursor().hasSelection();
    if ((key == Qt::Key_Delete || key == Qt::Key_Backspace) && mods == Qt::NoModifier)
        return hasSpan;
    if ((key == Qt::Key_Up || key == Qt::Key_Down) && step)
        return !m_lanes.spans().empty();
    if ((key == Qt::Key_Left || key == Qt::Key_Right) && (step || stepShift))
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
        applyFunction(FramingFunction(e->key() - Qt::Key_1),
            m_exactSelection || (mods & (Qt::AltModifier | Qt::ControlModifier)));
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
        if (const LaneSpan *span = spanById(m_selected)) {
            const qint64 at = moveStart ? span->range16.start : span->range16.end - 1;
            if (m_lanes.isRtlAt(at, document()->findBlock(int(at))))
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
        const LaneHit hit = hitTest(pos);
        if (hit.kind == LaneHit::StartHandle || hit.kind == LaneHit::EndHandle) {
            const LaneSpan *span = spanById(m_selected);
            m_drag = {true, hit.kind == LaneHit::StartHandle, span->id, span->range, span->range};
            setFocus(Qt::MouseFocusReason);
            e->accept();
            return;
        }
        if (hit.kind == LaneHit::Lane || hit.kind == LaneHit::Badge) {
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
    const LaneHit::Kind kind = hitTest(e->position().toPoint()).kind;
    if (e->button() == Qt::LeftButton && kind != LaneHit::Nothing && kind != LaneHit::Text) {
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
        updateDragPreview(pos, exactDrag(e->modifiers()));
        e->accept();
        return;
    }
    if (m_pendingSpanClick.isValid()) {
        e->accept();
        return;
    }
    QTextEdit::mouseMoveEvent(e);
    if (e->buttons() == Qt::NoButton) {
        const LaneHit::Kind kind = hitTest(pos).kind;
        Qt::CursorShape shape = Qt::IBeamCursor;
        if (kind == LaneHit::StartHandle || kind == LaneHit::EndHandle)
            shape = Qt::SizeHorCursor;
        else if (kind == LaneHit::Lane || kind == LaneHit::Badge)
            shape = Qt::PointingHandCursor;
        viewport()->setCursor(shape);
    }
}

void ReadingView::mouseReleaseEvent(QMouseEvent *e)
{
    const QPoint pos = e->position().toPoint();
    if (m_drag.active && e->button() == Qt::LeftButton) {
        updateDragPreview(pos, exactDrag(e->modifiers()));
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
        const LaneHit hit = hitTest(pos);
        if (hit.kind == LaneHit::Lane || hit.kind == LaneHit::Badge)
            selectFromHit(hit);
        e->accept();
        return;
    }
    QTextEdit::mouseReleaseEvent(e);
    if (m_pressOnText && e->button() == Qt::LeftButton && !textCursor().hasSelection()
        && (pos - m_pressPos).manhattanLength() < QApplication::startDragDistance()) {
        const LaneHit hit = hitTest(pos);
        if (hit.kind == LaneHit::Text)
            selectFromHit(hit);
        else
            setSelectedSpan({});
    }
    m_pressOnText = false;
}

void ReadingView::selectFromHit(const LaneHit &hit)
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
        const LaneHit hit = hitTest(e->pos());
        if (!hit.spans.empty()
            && std::find(hit.spans.begin(), hit.spans.end(), m_selected) == hit.spans.end())
            selectFromHit(hit);
    }
    QMenu *menu = createStandardContextMenu();
    menu->addSeparator();
    const LaneSpan *span = spanById(m_selected);
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
    menu->addSeparator();
    emit contextMenuAboutToShow(menu);
    menu->setAttribute(Qt::WA_DeleteOnClose);
    menu->popup(e->globalPos());
}

bool ReadingView::viewportEvent(QEvent *e)
{
    if (e->type() == QEvent::ToolTip) {
        auto *help = static_cast<QHelpEvent *>(e);
        const QString text = toolTipAt(help->pos());
        if (text.isEmpty()) {
            QToolTip::hideText();
            e->ignore();
            return true;
        }
        QToolTip::showText(help->globalPos(), text, viewport());
        return true;
    }
    return QTextEdit::viewportEvent(e);
}

QString ReadingView::toolTipAt(const QPoint &viewportPos) const
{
    const LaneHit hit = hitTest(viewportPos);
    if (hit.spans.empty() || hit.kind == LaneHit::Nothing)
        return {};
    QStringList lines;
    for (AnnotationId id : hit.spans) {
        const LaneSpan *span = spanById(id);
        QString quote = m_article.text.mid(span->range16.start, span->range16.length());
        if (quote.size() > 60)
            quote = quote.left(59) + QChar(0x2026);
        const QString line =
            tr("%1: \u201C%2\u201D").arg(functionName(span->function), quote.toHtmlEscaped());
        lines << (span->owner.isEmpty()
                ? line
                : tr("%1 \u00B7 %2").arg(span->owner.toHtmlEscaped(), line));
    }
    return lines.join(QStringLiteral("<br>"));
}

// --- layout, metrics, colours ----------------------------------------------------------------

void ReadingView::updateMetrics()
{
    const QFontMetricsF fm(font());
    const qreal em = fm.height();
    LaneMetrics m;
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
    m_lanes.setMetrics(m);
}

void ReadingView::updateColours()
{
    m_colours = LaneColours::on(palette().color(QPalette::Base));
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
    m_lanes.setDocument(doc);
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
    m_lanes.invalidate();
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
        yellow.setAlphaF(m_colours.dark ? 0.35f : 0.55f);
        mark.format.setBackground(yellow);
        selections << mark;
    }
    const LaneSpan *span = spanById(m_drag.active ? m_drag.id : m_selected);
    if (span) {
        const Utf16Range r16 = m_drag.active ? m_map.utf16Range(m_drag.preview) : span->range16;
        if (r16.start >= 0) {
            QTextEdit::ExtraSelection tint;
            tint.cursor = QTextCursor(document());
            tint.cursor.setPosition(int(r16.start));
            tint.cursor.setPosition(int(r16.end), QTextCursor::KeepAnchor);
            QColor colour = laneColour(span->function);
            colour.setAlphaF(m_colours.dark ? 0.30f : 0.16f);
            tint.format.setBackground(colour);
            selections << tint;
        }
    }
    const QScopedValueRollback guard(m_changingSelection, true);
    setExtraSelections(selections);
}

void ReadingView::updateAccessibleDescription()
{
    const LaneSpan *span = spanById(m_selected);
    if (!span) {
        setAccessibleDescription(tr("%n span(s). Select text and press 1 to 4 to mark a framing "
                                    "function; Ctrl+Down and Ctrl+Up move between spans.",
            nullptr, int(m_lanes.spans().size())));
        return;
    }
    QString quote = m_article.text.mid(span->range16.start, span->range16.length());
    if (quote.size() > 80)
        quote = quote.left(79) + QChar(0x2026);
    setAccessibleDescription(
        tr("Selected span: %1, \u201C%2\u201D. Press 1 to 4 to relabel, Delete "
           "to delete, Ctrl+Left/Right and Ctrl+Shift+Left/Right to resize.")
            .arg(functionName(span->function), quote));
}

// --- geometry --------------------------------------------------------------------------------

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
    paintSpanLanes(p, m_lanes, m_colours, m_lanes.spansIn(visible), clip);
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

void ReadingView::paintSelection(QPainter &p)
{
    const LaneSpan *span = spanById(m_drag.active ? m_drag.id : m_selected);
    if (!span)
        return;
    if (m_drag.active) {
        paintSpanHandles(p, m_metrics, m_lanes.computeGeometry(m_map.utf16Range(m_drag.preview)),
            laneColour(span->function), palette().color(QPalette::Base));
    } else {
        paintSpanHandles(p, m_metrics, m_lanes.geometry(span->range16), laneColour(span->function),
            palette().color(QPalette::Base));
    }
}

// --- hit testing -----------------------------------------------------------------------------

LaneHit ReadingView::hitTest(const QPoint &viewportPos) const
{
    if (m_article.text.isEmpty())
        return {};
    const QPointF pos(viewportPos.x() + horizontalScrollBar()->value(),
        viewportPos.y() + verticalScrollBar()->value());
    const qreal zone = m_metrics.zone;
    const qreal slop =
        std::max<qreal>(m_metrics.handleRadius + 2, QFontMetricsF(font()).height() * 0.3);
    const QRect around(viewportPos.x(), int(viewportPos.y() - 2 * zone), 1, int(4 * zone));
    return m_lanes.hitTest(
        pos, spanById(m_selected), slop, m_lanes.spansIn(visibleRange16(around)));
}

} // namespace fourfold
