#pragma once
// The reading desk's article view: one article's canonical text, read-only and selectable, with
// the coder's spans drawn in four lanes under each line of text (one lane per framing function,
// see function_style.h), a letter badge at each span's start, and the selected span tinted with
// drag handles at both ends. Keyboard first: select text, press 1-4.
//
// Positions in this class's API are half-open code-point ranges (TextRange) into the canonical
// text, as everywhere in Fourfold; the view converts to and from Qt's UTF-16 positions with
// OffsetMap only (design.md §3), and holds those as Utf16Range, a type of its own, so that a
// UTF-16 position given where a code point is meant does not compile.
//
// Keys (while the view has focus; they take precedence over window shortcuts). Ctrl and Alt are
// interchangeable below: common Linux window managers take Alt+drag and some Alt+Shift+arrows
// for themselves, so every Alt key also works with Ctrl (the list F1 shows: shortcut_table.h).
//   1-4                with a text selection: create a span of that function, snapped to whole
//                      words (UAX #29 word boundaries); Ctrl+1-4: exactly the selection, snapped
//                      only to whole grapheme clusters (also plain 1-4 while exact selection is
//                      on). With no text selection and a span selected: relabel that span.
//   Delete, Backspace  delete the selected span.
//   Ctrl+Down, Ctrl+Up select the next / previous span (from the caret when none is selected).
//   Ctrl+Left/Right    move the selected span's start one word earlier / later.
//   Ctrl+Shift+Left/Right  move the selected span's end one word earlier / later.
//                      (Mirrored where the text at that end runs right to left, as the caret is.)
//   Escape             clear the span selection, else the text selection.
//   Arrows, Shift+arrows, Ctrl+A, Ctrl+C: caret, selection and copy, as in any text view.
// Mouse: drag to select text; click a span's text, lane or badge to select it (clicking again on
// nested spans cycles through them, shortest first); drag a handle of the selected span to move
// that end (snapped to words; exact with Ctrl held at release, or while exact selection is on).
//
// Overlapping spans: each function has its own lane, so spans of different functions never
// cover each other. Where two or more spans of the SAME function overlap, their lane is drawn as
// a double rule over the shared stretch; each span keeps its own start badge and end tick, so
// the count and extent of each stays visible. Hovering a lane lists the spans under the pointer.

#include "app/desktop/span_lane_layout.h"
#include "app/desktop/span_lane_painter.h"
#include "core/model/annotation.h"
#include "core/model/article.h"
#include "core/text/offset_map.h"
#include "core/text/segmenter.h"

#include <QHash>
#include <QPoint>
#include <QTextEdit>

#include <array>
#include <vector>

class QMenu;
class QTextBlock;
class QTextLine;

namespace fourfold {

class ReadingView : public QTextEdit
{
    Q_OBJECT
public:
    explicit ReadingView(QWidget *parent = nullptr);
    ~ReadingView() override;

    // Shows `article`'s canonical text, its paragraph roles in the margin and uses its tokens
    // for word snapping. Clears the spans, the span selection and the text selection. Do not
    // use QTextEdit's own text setters on this view: the positions must stay the article's.
    void setArticle(const Article &article);
    const Article &article() const { return m_article; }

    // The spans to draw (already filtered for blind coding by the caller). Deleted spans and
    // spans whose range is empty or lies outside the text are skipped. Keeps the selected span
    // if its id is still present, else clears the selection. Geometry is cached per range, so
    // resending the list with one span more or changed costs only that span.
    void setSpans(const std::vector<Annotation> &spans);
    const std::vector<Annotation> &spans() const { return m_annotations; }
    // The pseudonyms of the spans' coders, by coder id: when set (a lead showing every coder's
    // spans), each badge carries its coder's pseudonym after the letter and the tooltip names it.
    // Empty (the default): one person's spans, no names. Call setSpans() after it.
    void setSpanOwners(const QHash<qint64, QString> &pseudonymByCoder);
    // The pseudonym shown with span `id`, or empty.
    QString spanOwner(AnnotationId id) const;
    // What the tooltip at `viewportPos` says (empty: none), one line per span under it.
    QString toolTipAt(const QPoint &viewportPos) const;

    // Selects span `id` (an invalid id or one not shown clears the selection) and draws it
    // emphasised. Collapses the text selection. Emits selectedSpanChanged() if it changed, never
    // spanActivated() (that is for the user's own choice).
    void setSelectedSpan(AnnotationId id);
    // The selected span, or an invalid id (0) when none is.
    AnnotationId selectedSpan() const { return m_selected; }

    // Scrolls so that span `id`'s first line is in view with some context above it; does nothing
    // for an id not shown.
    void scrollToSpan(AnnotationId id);

    // The current text selection as code points, snapped to whole words (the article's UAX #29
    // tokens; leading and trailing white space trimmed) unless `exact`, in which case it is only
    // widened to whole grapheme clusters. {-1, -1} when nothing is selected or the selection
    // holds no word token (e.g. only white space; not checked for an article without tokens).
    TextRange selectionRange(bool exact) const;

    // Selects `codePoints` (an empty range places the caret there without a selection; an
    // invalid or out-of-bounds range clears the selection). Clears the span selection if the
    // new text selection is not empty.
    void setTextSelection(const TextRange &codePoints);
    // Marks every occurrence of the words of a full-text search (case-insensitive; FTS5
    // operators, quotes and a trailing * are ignored) with a search-hit background; an empty
    // query clears the marks. Returns how many occurrences were marked.
    int setSearchHighlight(const QString &query);

signals:
    // Keys 1-4 or requestFunction() with a text selection: a new span of `function` over
    // `range` (code points; snapped to words unless Alt was held).
    void createSpanRequested(FramingFunction function, TextRange range);
    // Keys 1-4 with a span selected and no text selection, when the function differs.
    void relabelSpanRequested(AnnotationId id, FramingFunction function);
    // The selected span's new extent (code points, never empty): Alt(+Shift)+Left/Right, or a
    // handle dragged and released.
    void resizeSpanRequested(AnnotationId id, TextRange range);
    // Delete or Backspace with a span selected.
    void deleteSpanRequested(AnnotationId id);
    // The user selected span `id` (click, or Alt+Up/Down); the view has already selected it.
    void spanActivated(AnnotationId id);
    // The selected span changed for any reason; an invalid id when none is selected.
    void selectedSpanChanged(AnnotationId id);
    // The context menu is about to show (the span under the pointer already selected): a
    // receiver may add actions of its own (removing the span's links, withdrawing answers).
    void contextMenuAboutToShow(QMenu *menu);

public slots:
    // Same as pressing the function's key (1-4) without Alt: create over the word-snapped text
    // selection, else relabel the selected span.
    void requestFunction(FramingFunction f);
    // Exact selection: while on, new spans and handle drags take the text as selected instead of
    // snapping to whole words (the same as holding Ctrl).
    void setExactSelection(bool on) { m_exactSelection = on; }
    bool exactSelection() const { return m_exactSelection; }
    // Alt+Down / Alt+Up: select the next / previous span in reading order and scroll to it.
    void selectNextSpan();
    void selectPreviousSpan();

protected:
    bool event(QEvent *e) override;
    bool viewportEvent(QEvent *e) override;
    void paintEvent(QPaintEvent *e) override;
    void resizeEvent(QResizeEvent *e) override;
    void changeEvent(QEvent *e) override;
    void keyPressEvent(QKeyEvent *e) override;
    void mousePressEvent(QMouseEvent *e) override;
    void mouseMoveEvent(QMouseEvent *e) override;
    void mouseDoubleClickEvent(QMouseEvent *e) override;
    void mouseReleaseEvent(QMouseEvent *e) override;
    void contextMenuEvent(QContextMenuEvent *e) override;

private:
    std::vector<Utf16Range> m_searchHits; // UTF-16 ranges of search hits
    struct Drag {
        bool active = false;
        bool moveStart = false;
        AnnotationId id;
        TextRange original; // code points
        TextRange preview; // code points
    };

    void rebuildDocument();
    void updateMetrics();
    void updateMargins();
    void updateColours();
    void updateEmphasis();
    void updateAccessibleDescription();
    void invalidateGeometry();

    const LaneSpan *spanById(AnnotationId id) const { return m_lanes.spanById(id); }
    QColor laneColour(FramingFunction f) const { return m_colours.lane[std::size_t(f)]; }
    Utf16Range visibleRange16(const QRect &viewportRect) const;

    void paintSelection(QPainter &p);
    void paintRoleLabels(QPainter &p, const Utf16Range &visible16);

    LaneHit hitTest(const QPoint &viewportPos) const;
    qint64 codePointAt(const QPoint &viewportPos) const;
    void selectSpanByUser(AnnotationId id);
    void selectFromHit(const LaneHit &hit);
    void applyFunction(FramingFunction f, bool exact);
    // A handle drag ends exactly where released (no word snap): Ctrl or Alt held, or exact
    // selection on.
    bool exactDrag(Qt::KeyboardModifiers mods) const;
    void resizeByWord(bool moveStart, int direction);
    void clearTextSelection();
    bool wantsKey(const QKeyEvent *e) const;
    void updateDragPreview(const QPoint &viewportPos, bool exact);

    Article m_article;
    OffsetMap m_map {QString()};
    Segmentation m_segmentation;
    std::vector<qint64> m_paragraphStarts16; // sorted, with m_paragraphRoles
    std::vector<ParagraphRole> m_paragraphRoles;

    std::vector<Annotation> m_annotations;
    QHash<qint64, QString> m_ownerNames; // coder id → pseudonym; empty: no owners shown
    AnnotationId m_selected;
    Drag m_drag;

    LaneMetrics m_metrics;
    SpanLaneLayout m_lanes; // the spans shown, their geometry and hit testing
    LaneColours m_colours;
    bool m_dark = false;
    qreal m_leftMargin = -1;
    qreal m_rightMargin = -1;

    QPoint m_pressPos;
    bool m_pressOnText = false;
    AnnotationId m_pendingSpanClick;
    bool m_changingSelection = false;
    bool m_exactSelection = false;
};

} // namespace fourfold
