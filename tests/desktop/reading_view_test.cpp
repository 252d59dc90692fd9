// The reading desk's article view: code-point offsets of what the keys and the mouse request
// (text with surrogate pairs, NFC accents and Hebrew), word and grapheme snapping, relabel,
// delete, keyboard resize, and real pixels in the lanes. Needs the QApplication of the GUI
// test main.

#include "app/desktop/function_style.h"
#include "app/desktop/reading_view.h"
#include "core/model/paragraph_role.h"
#include "core/text/canonical_text.h"
#include "core/text/segmenter.h"
#include "tests/support/test_support.h"

#include <QHelpEvent>
#include <QImage>
#include <QPalette>
#include <QTest>
#include <QTextCursor>
#include <QToolTip>

#include <cmath>
#include <optional>
#include <vector>

using namespace fourfold;

namespace {

// Three paragraphs: an emoji outside the BMP (one code point, two UTF-16 units) and an emoji
// ZWJ sequence (five code points, eight units, one grapheme cluster); NFC letters with
// diacritics (é U+00E9, ï U+00EF: one code point each); and Hebrew, written right to left.
const QString kText = QStringLiteral(
    "Flooding \U0001F30A hit \U0001F469\u200D\U0001F469\u200D\U0001F467 families in Tillney "
    "Point.\n\n"
    "The caf\u00E9 owner blamed the council's na\u00EFve plan for the pier.\n\n"
    "Residents said \u05E9\u05DC\u05D5\u05DD \u05E2\u05D5\u05DC\u05DD to the new ferry.");

// Code-point ranges of words in kText, counted by hand (W3C Web Annotation
// TextPositionSelector: positions count code points; 🌊 and each person of the family count 1).
constexpr qint64 kParagraphStarts[] {0, 49, 111};
constexpr TextRange kFamily {15, 20};
constexpr TextRange kCafe {53, 57};
constexpr TextRange kOwner {58, 63};
constexpr TextRange kBlamed {64, 70};
constexpr TextRange kCouncils {75, 84};
constexpr TextRange kPlan {91, 95};
constexpr TextRange kPier {104, 108};
constexpr TextRange kShalom {126, 130}; // שלום
constexpr TextRange kOlam {131, 135}; // עולם

Article makeArticle()
{
    Article article;
    article.text = kText;
    article.summary.language = QStringLiteral("en");
    Result<Segmentation> s = segmentText(kText, article.summary.language);
    REQUIRE(s.has_value());
    for (std::size_t i = 0; i < s->paragraphs.size(); ++i)
        article.paragraphs.push_back({s->paragraphs[i],
            defaultParagraphRole(qsizetype(i), qsizetype(s->paragraphs.size()))});
    article.sentences = s->sentences;
    article.tokens = s->tokens;
    return article;
}

Annotation span(qint64 id, FramingFunction f, TextRange range)
{
    Annotation a;
    a.id = AnnotationId {id};
    a.content.function = f;
    a.content.range = range;
    return a;
}

// UTF-16 position of code point `cp` in kText, with Qt's own decoder as an oracle independent
// of OffsetMap: the length of the first `cp` code points re-encoded as UTF-16.
int utf16At(qint64 cp)
{
    const QList<uint> ucs4 = kText.toUcs4();
    return int(QString::fromUcs4(reinterpret_cast<const char32_t *>(ucs4.constData()), cp).size());
}

// Every signal of the view, recorded (until the recorder goes).
struct Recorder {
    QObject context;
    struct Create {
        FramingFunction function;
        TextRange range;
    };
    std::vector<Create> created;
    std::vector<std::pair<AnnotationId, FramingFunction>> relabelled;
    std::vector<std::pair<AnnotationId, TextRange>> resized;
    std::vector<AnnotationId> deleted;
    std::vector<AnnotationId> activated;

    explicit Recorder(ReadingView &view)
    {
        QObject::connect(&view, &ReadingView::createSpanRequested, &context,
            [this](FramingFunction f, TextRange r) {
                created.push_back({f, r});
            });
        QObject::connect(&view, &ReadingView::relabelSpanRequested, &context,
            [this](AnnotationId id, FramingFunction f) { relabelled.emplace_back(id, f); });
        QObject::connect(&view, &ReadingView::resizeSpanRequested, &context,
            [this](AnnotationId id, TextRange r) { resized.emplace_back(id, r); });
        QObject::connect(&view, &ReadingView::deleteSpanRequested, &context,
            [this](AnnotationId id) { deleted.push_back(id); });
        QObject::connect(&view, &ReadingView::spanActivated, &context,
            [this](AnnotationId id) { activated.push_back(id); });
    }
};

// A shown view of kText, exposed so that it paints.
struct ShownView {
    ReadingView view;
    ShownView()
    {
        view.resize(900, 600);
        view.setArticle(makeArticle());
        view.show();
        REQUIRE(QTest::qWaitForWindowExposed(&view));
    }
};

// The caret rectangle (viewport coordinates) before code point `cp`, from QTextEdit's own API.
QRect caretRect(const ReadingView &view, qint64 cp)
{
    QTextCursor cursor(view.document());
    cursor.setPosition(utf16At(cp));
    return view.cursorRect(cursor);
}

// Pixels of exactly `colour` in the band below the text line of `range` (one line), between the
// glyphs' bottom and the next line, inside the range's horizontal extent (inset by `inset` on
// both sides). Returns the rows where they were found.
std::vector<int> rowsWithColour(const QImage &image, const ReadingView &view,
    const TextRange &range, QRgb colour, int inset = 2)
{
    const QRect start = caretRect(view, range.start);
    const QRect end = caretRect(view, range.end);
    REQUIRE(start.top() == end.top()); // the word pair must sit on one line
    const int x1 = std::min(start.left(), end.left()) + inset;
    const int x2 = std::max(start.left(), end.left()) - inset;
    const int y1 = start.bottom() + 1;
    const int y2 = start.bottom() + start.height() * 2; // below: the lanes, then the next line
    const QPoint origin = view.viewport()->mapTo(&view, QPoint(0, 0));
    std::vector<int> rows;
    for (int y = y1; y <= y2; ++y) {
        for (int x = x1; x <= x2; ++x) {
            const QPoint p = origin + QPoint(x, y);
            if (image.valid(p) && (image.pixel(p) & 0xFFFFFF) == (colour & 0xFFFFFF)) {
                rows.push_back(y);
                break;
            }
        }
    }
    return rows;
}

QImage grabImage(ReadingView &view)
{
    return view.grab().toImage().convertToFormat(QImage::Format_RGB32);
}

} // namespace

TEST_CASE("the sample text is canonical and its words are where the tests count them")
{
    REQUIRE(isCanonicalText(kText));
    CHECK(OffsetMap::slice(kText, kFamily)
        == QStringLiteral("\U0001F469\u200D\U0001F469\u200D\U0001F467"));
    CHECK(OffsetMap::slice(kText, kCafe) == QStringLiteral("caf\u00E9"));
    CHECK(OffsetMap::slice(kText, kOwner) == QStringLiteral("owner"));
    CHECK(OffsetMap::slice(kText, kCouncils) == QStringLiteral("council's"));
    CHECK(OffsetMap::slice(kText, kShalom) == QStringLiteral("\u05E9\u05DC\u05D5\u05DD"));
    const Article article = makeArticle();
    REQUIRE(article.paragraphs.size() == std::size(kParagraphStarts));
    for (std::size_t i = 0; i < article.paragraphs.size(); ++i)
        CHECK(article.paragraphs[i].range.start == kParagraphStarts[i]);
    // One extra UTF-16 unit for 🌊 and three for the family (Unicode §3.9, UTF-16 encoding form).
    CHECK(utf16At(kOwner.start) == kOwner.start + 4);
}

TEST_CASE("keys 1-4 request a span over the selection in code points snapped to words")
{
    ReadingView view;
    view.setArticle(makeArticle());
    Recorder rec(view);

    // A selection made in Qt's UTF-16 positions: "wner bl".
    QTextCursor cursor(view.document());
    cursor.setPosition(utf16At(kOwner.start + 1));
    cursor.setPosition(utf16At(kBlamed.start + 2), QTextCursor::KeepAnchor);
    view.setTextCursor(cursor);

    SECTION("2 gives a cause over whole words")
    {
        QTest::keyClick(&view, Qt::Key_2);
        REQUIRE(rec.created.size() == 1);
        CHECK(rec.created[0].function == FramingFunction::Cause);
        // UAX #29 WB5: letters do not break, so "owner" and "blamed" are whole words.
        CHECK(rec.created[0].range == TextRange {kOwner.start, kBlamed.end});
        CHECK(view.selectionRange(false) == TextRange {kOwner.start, kBlamed.end});
    }
    SECTION("Alt+2 keeps the exact selection")
    {
        QTest::keyClick(&view, Qt::Key_2, Qt::AltModifier);
        REQUIRE(rec.created.size() == 1);
        CHECK(rec.created[0].function == FramingFunction::Cause);
        CHECK(rec.created[0].range == TextRange {kOwner.start + 1, kBlamed.start + 2});
    }
    SECTION("Ctrl+2 keeps the exact selection too (window managers may take Alt)")
    {
        QTest::keyClick(&view, Qt::Key_2, Qt::ControlModifier);
        REQUIRE(rec.created.size() == 1);
        CHECK(rec.created[0].range == TextRange {kOwner.start + 1, kBlamed.start + 2});
    }
    SECTION("with exact selection on, a plain 2 keeps the exact selection")
    {
        view.setExactSelection(true);
        QTest::keyClick(&view, Qt::Key_2);
        REQUIRE(rec.created.size() == 1);
        CHECK(rec.created[0].range == TextRange {kOwner.start + 1, kBlamed.start + 2});
    }
    SECTION("the toolbar's requestFunction does the same as the key")
    {
        view.requestFunction(FramingFunction::Remedy);
        REQUIRE(rec.created.size() == 1);
        CHECK(rec.created[0].function == FramingFunction::Remedy);
        CHECK(rec.created[0].range == TextRange {kOwner.start, kBlamed.end});
    }
    CHECK(rec.relabelled.empty());
}

TEST_CASE("snapping follows UAX #29 words and grapheme clusters")
{
    ReadingView view;
    view.setArticle(makeArticle());
    Recorder rec(view);

    SECTION("an apostrophe between letters stays inside the word (WB6, WB7)")
    {
        view.setTextSelection({kCouncils.start + 1, kCouncils.start + 3});
        QTest::keyClick(&view, Qt::Key_1);
        REQUIRE(rec.created.size() == 1);
        CHECK(rec.created[0].function == FramingFunction::Problem);
        CHECK(rec.created[0].range == kCouncils);
    }
    SECTION("an exact selection never splits an emoji ZWJ sequence (GB11)")
    {
        // Only the second person of the family: widened to the whole cluster.
        view.setTextSelection({kFamily.start + 2, kFamily.start + 3});
        QTest::keyClick(&view, Qt::Key_1, Qt::AltModifier);
        REQUIRE(rec.created.size() == 1);
        CHECK(rec.created[0].range == kFamily);
    }
    SECTION("Hebrew words after the emoji, in code points")
    {
        view.setTextSelection({kShalom.start + 1, kOlam.start + 2});
        QTest::keyClick(&view, Qt::Key_3);
        REQUIRE(rec.created.size() == 1);
        CHECK(rec.created[0].function == FramingFunction::Evaluation);
        CHECK(rec.created[0].range == TextRange {kShalom.start, kOlam.end});
    }
    SECTION("white space alone is no span")
    {
        view.setTextSelection({kOwner.end, kOwner.end + 1});
        CHECK(view.selectionRange(false) == TextRange {-1, -1});
        CHECK(view.selectionRange(true) == TextRange {-1, -1});
        QTest::keyClick(&view, Qt::Key_1);
        CHECK(rec.created.empty());
    }
    SECTION("nothing selected")
    {
        view.setTextSelection({kOwner.start, kOwner.start});
        CHECK(view.selectionRange(false) == TextRange {-1, -1});
        QTest::keyClick(&view, Qt::Key_1);
        CHECK(rec.created.empty());
    }
}

TEST_CASE("a selection made with Shift+Right is snapped to the word it touches")
{
    ReadingView view;
    view.setArticle(makeArticle());
    Recorder rec(view);
    view.setTextSelection({kCafe.start, kCafe.start}); // caret before "café"
    QTest::keyClick(&view, Qt::Key_Right, Qt::ShiftModifier);
    QTest::keyClick(&view, Qt::Key_Right, Qt::ShiftModifier);
    CHECK(view.selectionRange(true) == TextRange {kCafe.start, kCafe.start + 2});
    QTest::keyClick(&view, Qt::Key_4);
    REQUIRE(rec.created.size() == 1);
    CHECK(rec.created[0].function == FramingFunction::Remedy);
    CHECK(rec.created[0].range == kCafe); // é is one code point in NFC (UAX #15)
}

TEST_CASE("a selection dragged with the mouse")
{
    ShownView shown;
    ReadingView &view = shown.view;
    Recorder rec(view);
    const QRect from = caretRect(view, kPlan.start + 1);
    const QRect to = caretRect(view, kPier.end - 1);
    QTest::mousePress(view.viewport(), Qt::LeftButton, {}, from.center());
    QTest::mouseMove(view.viewport(), (from.center() + to.center()) / 2);
    QTest::mouseMove(view.viewport(), to.center());
    QTest::mouseRelease(view.viewport(), Qt::LeftButton, {}, to.center());
    CHECK(view.selectionRange(true) == TextRange {kPlan.start + 1, kPier.end - 1});
    QTest::keyClick(&view, Qt::Key_1);
    REQUIRE(rec.created.size() == 1);
    CHECK(rec.created[0].range == TextRange {kPlan.start, kPier.end});
}

TEST_CASE("with a span selected the keys relabel and delete and resize it")
{
    ReadingView view;
    view.setArticle(makeArticle());
    view.setSpans(
        {span(7, FramingFunction::Problem, kOwner), span(8, FramingFunction::Cause, kShalom)});
    Recorder rec(view);
    view.setSelectedSpan(AnnotationId {7});
    REQUIRE(view.selectedSpan() == AnnotationId {7});

    SECTION("1-4 relabel; the same function is no change")
    {
        QTest::keyClick(&view, Qt::Key_3);
        REQUIRE(rec.relabelled.size() == 1);
        CHECK(rec.relabelled[0].first == AnnotationId {7});
        CHECK(rec.relabelled[0].second == FramingFunction::Evaluation);
        QTest::keyClick(&view, Qt::Key_1);
        CHECK(rec.relabelled.size() == 1);
        CHECK(rec.created.empty());
    }
    SECTION("a new text selection takes over from the selected span")
    {
        view.setTextSelection(kPier);
        CHECK_FALSE(view.selectedSpan().isValid());
        QTest::keyClick(&view, Qt::Key_3);
        CHECK(rec.relabelled.empty());
        REQUIRE(rec.created.size() == 1);
        CHECK(rec.created[0].range == kPier);
    }
    SECTION("Delete and Backspace")
    {
        QTest::keyClick(&view, Qt::Key_Delete);
        QTest::keyClick(&view, Qt::Key_Backspace);
        CHECK(rec.deleted == std::vector<AnnotationId> {AnnotationId {7}, AnnotationId {7}});
        view.setSelectedSpan({});
        QTest::keyClick(&view, Qt::Key_Delete);
        CHECK(rec.deleted.size() == 2);
    }
    SECTION("Alt+Shift+Right/Left move the end by a word; Alt+Left/Right the start")
    {
        QTest::keyClick(&view, Qt::Key_Right, Qt::AltModifier | Qt::ShiftModifier);
        QTest::keyClick(&view, Qt::Key_Left, Qt::AltModifier);
        REQUIRE(rec.resized.size() == 2);
        CHECK(rec.resized[0].first == AnnotationId {7});
        CHECK(rec.resized[0].second == TextRange {kOwner.start, kBlamed.end});
        CHECK(rec.resized[1].second == TextRange {kCafe.start, kOwner.end});
        // A one-word span cannot shrink to nothing.
        QTest::keyClick(&view, Qt::Key_Left, Qt::AltModifier | Qt::ShiftModifier);
        QTest::keyClick(&view, Qt::Key_Right, Qt::AltModifier);
        CHECK(rec.resized.size() == 2);
    }
    SECTION("in right-to-left text the arrows follow reading order")
    {
        // Left is forwards in Hebrew, as the caret moves in right-to-left text (common practice).
        view.setSelectedSpan(AnnotationId {8});
        QTest::keyClick(&view, Qt::Key_Left, Qt::AltModifier | Qt::ShiftModifier);
        REQUIRE(rec.resized.size() == 1);
        CHECK(rec.resized[0].second == TextRange {kShalom.start, kOlam.end});
    }
    SECTION("Alt+Down and Alt+Up move between spans")
    {
        QTest::keyClick(&view, Qt::Key_Down, Qt::AltModifier);
        CHECK(view.selectedSpan() == AnnotationId {8});
        QTest::keyClick(&view, Qt::Key_Up, Qt::AltModifier);
        CHECK(view.selectedSpan() == AnnotationId {7});
        CHECK(rec.activated == std::vector<AnnotationId> {AnnotationId {8}, AnnotationId {7}});
    }
    SECTION("the Ctrl keys do what the Alt keys do")
    {
        QTest::keyClick(&view, Qt::Key_Right, Qt::ControlModifier | Qt::ShiftModifier);
        QTest::keyClick(&view, Qt::Key_Left, Qt::ControlModifier);
        REQUIRE(rec.resized.size() == 2);
        CHECK(rec.resized[0].second == TextRange {kOwner.start, kBlamed.end});
        CHECK(rec.resized[1].second == TextRange {kCafe.start, kOwner.end});
        QTest::keyClick(&view, Qt::Key_Down, Qt::ControlModifier);
        CHECK(view.selectedSpan() == AnnotationId {8});
        QTest::keyClick(&view, Qt::Key_Up, Qt::ControlModifier);
        CHECK(view.selectedSpan() == AnnotationId {7});
    }
    SECTION("Escape clears the span selection")
    {
        QTest::keyClick(&view, Qt::Key_Escape);
        CHECK_FALSE(view.selectedSpan().isValid());
    }
}

TEST_CASE("setSpans keeps the selected span while it exists")
{
    std::optional<AnnotationId> changed; // outlives the view that reports to it
    ReadingView view;
    view.setArticle(makeArticle());
    QObject::connect(
        &view, &ReadingView::selectedSpanChanged, [&](AnnotationId id) { changed = id; });
    view.setSpans({span(7, FramingFunction::Problem, kOwner)});
    view.setSelectedSpan(AnnotationId {7});
    REQUIRE(changed == AnnotationId {7});
    view.setSpans(
        {span(7, FramingFunction::Remedy, kBlamed), span(9, FramingFunction::Cause, kCafe)});
    CHECK(view.selectedSpan() == AnnotationId {7});
    view.setSpans({span(9, FramingFunction::Cause, kCafe)});
    CHECK_FALSE(view.selectedSpan().isValid());
    CHECK(changed == AnnotationId {});
    // A span outside the text is not drawn and cannot be selected.
    view.setSpans({span(10, FramingFunction::Cause, {150, 400})});
    view.setSelectedSpan(AnnotationId {10});
    CHECK_FALSE(view.selectedSpan().isValid());
}

TEST_CASE("a click on a span's text selects it; a click on plain text clears it")
{
    ShownView shown;
    ReadingView &view = shown.view;
    view.setSpans({span(7, FramingFunction::Problem, kOwner),
        span(8, FramingFunction::Cause, {kCafe.start, kBlamed.end})});
    Recorder rec(view);
    const QPoint inOwner = caretRect(view, kOwner.start + 2).center();
    QTest::mouseClick(view.viewport(), Qt::LeftButton, {}, inOwner);
    CHECK(view.selectedSpan() == AnnotationId {7}); // the shorter of the two nested spans
    // Clicking again on nested spans cycles to the longer one.
    QTest::mouseClick(view.viewport(), Qt::LeftButton, {}, inOwner, 600);
    CHECK(view.selectedSpan() == AnnotationId {8});
    CHECK(rec.activated == std::vector<AnnotationId> {AnnotationId {7}, AnnotationId {8}});
    QTest::mouseClick(
        view.viewport(), Qt::LeftButton, {}, caretRect(view, kPier.start + 1).center(), 600);
    CHECK_FALSE(view.selectedSpan().isValid());
}

TEST_CASE("dragging a handle of the selected span resizes it")
{
    ShownView shown;
    ReadingView &view = shown.view;
    view.setSpans({span(7, FramingFunction::Problem, kOwner)});
    view.setSelectedSpan(AnnotationId {7});
    Recorder rec(view);
    constexpr TextRange kThe {71, 74}; // "the" after "blamed"

    SECTION("the end handle, snapped to the word under the pointer")
    {
        const QPoint handle = caretRect(view, kOwner.end).center();
        const QPoint target = caretRect(view, kThe.start + 1).center();
        QTest::mousePress(view.viewport(), Qt::LeftButton, {}, handle);
        QTest::mouseMove(view.viewport(), target);
        QTest::mouseRelease(view.viewport(), Qt::LeftButton, {}, target);
        REQUIRE(rec.resized.size() == 1);
        CHECK(rec.resized[0].first == AnnotationId {7});
        CHECK(rec.resized[0].second == TextRange {kOwner.start, kThe.end});
    }
    SECTION("the start handle, exact with Alt held at release")
    {
        const QPoint handle = caretRect(view, kOwner.start).center();
        const QPoint target = caretRect(view, kCafe.start + 2).center();
        QTest::mousePress(view.viewport(), Qt::LeftButton, {}, handle);
        QTest::mouseMove(view.viewport(), target);
        QTest::mouseRelease(view.viewport(), Qt::LeftButton, Qt::AltModifier, target);
        REQUIRE(rec.resized.size() == 1);
        CHECK(rec.resized[0].second == TextRange {kCafe.start + 2, kOwner.end});
    }
    SECTION("a drag that ends where it began requests nothing")
    {
        const QPoint handle = caretRect(view, kOwner.end).center();
        QTest::mousePress(view.viewport(), Qt::LeftButton, {}, handle);
        QTest::mouseRelease(view.viewport(), Qt::LeftButton, {}, handle);
        CHECK(rec.resized.empty());
        CHECK_FALSE(view.textCursor().hasSelection());
    }
}

TEST_CASE("lanes are drawn in each function's colour with one lane per function")
{
    ShownView shown;
    ReadingView &view = shown.view;
    // Problem over "café owner", cause over "owner blamed": they overlap on "owner".
    view.setSpans({span(1, FramingFunction::Problem, {kCafe.start, kOwner.end}),
        span(2, FramingFunction::Cause, {kOwner.start, kBlamed.end})});
    const QImage image = grabImage(view);
    // Okabe & Ito (2008) vermillion #D55E00 and blue #0072B2, as function_style defines them.
    const QRgb vermillion = qRgb(0xD5, 0x5E, 0x00);
    const QRgb blue = qRgb(0x00, 0x72, 0xB2);
    REQUIRE(functionStyle(FramingFunction::Problem).colour.rgb() == vermillion);
    REQUIRE(functionStyle(FramingFunction::Cause).colour.rgb() == blue);

    // Under "blamed" only the cause; under "plan" nothing.
    CHECK_FALSE(rowsWithColour(image, view, kBlamed, blue).empty());
    CHECK(rowsWithColour(image, view, kBlamed, vermillion).empty());
    CHECK(rowsWithColour(image, view, kPlan, blue).empty());
    CHECK(rowsWithColour(image, view, kPlan, vermillion).empty());

    // Under "owner" both, the problem's lane above the cause's (lanes 0 and 1).
    const TextRange ownerEnd {kOwner.start + 3, kOwner.end}; // right of the cause's badge
    const std::vector<int> problemRows = rowsWithColour(image, view, ownerEnd, vermillion);
    const std::vector<int> causeRows = rowsWithColour(image, view, ownerEnd, blue);
    REQUIRE_FALSE(problemRows.empty());
    REQUIRE_FALSE(causeRows.empty());
    CHECK(problemRows.back() < causeRows.front());
    // Both lanes lie below the glyphs of their line.
    CHECK(problemRows.front() > caretRect(view, kOwner.start).bottom());
}

TEST_CASE("a span's lane answers to the pointer")
{
    ShownView shown;
    ReadingView &view = shown.view;
    view.setSpans({span(1, FramingFunction::Problem, kOwner),
        span(2, FramingFunction::Cause, {kOwner.start, kBlamed.end})});
    Recorder rec(view);
    // Find the cause's lane under "blamed" in the rendered pixels.
    const QImage image = grabImage(view);
    const QRgb blue = functionStyle(FramingFunction::Cause).colour.rgb();
    const std::vector<int> rows = rowsWithColour(image, view, kBlamed, blue);
    REQUIRE_FALSE(rows.empty());
    const int x = (caretRect(view, kBlamed.start).left() + caretRect(view, kBlamed.end).left()) / 2;
    const QPoint onLane(x, rows.front());

    QHelpEvent help(QEvent::ToolTip, onLane, view.viewport()->mapToGlobal(onLane));
    QCoreApplication::sendEvent(view.viewport(), &help);
    CHECK(QToolTip::text().contains(functionName(FramingFunction::Cause)));
    CHECK(QToolTip::text().contains(QStringLiteral("owner blamed")));
    CHECK_FALSE(QToolTip::text().contains(functionName(FramingFunction::Problem)));
    QToolTip::hideText();

    // A click on the lane selects that span and leaves the caret and selection alone.
    const int caret = view.textCursor().position();
    QTest::mouseClick(view.viewport(), Qt::LeftButton, {}, onLane);
    CHECK(view.selectedSpan() == AnnotationId {2});
    CHECK(rec.activated == std::vector<AnnotationId> {AnnotationId {2}});
    CHECK(view.textCursor().position() == caret);
}

TEST_CASE("each paragraph's role is written in the margin beside its first line")
{
    ShownView shown;
    ReadingView &view = shown.view;
    const QImage image = grabImage(view);
    const QColor base = view.palette().color(QPalette::Base);
    const QPoint origin = view.viewport()->mapTo(&view, QPoint(0, 0));
    // Pixels that are not background, left of the text column, in rows [y1, y2].
    auto inked = [&](int y1, int y2, int right) {
        int count = 0;
        for (int y = y1; y <= y2; ++y)
            for (int x = 0; x < right; ++x)
                count += image.pixelColor(origin + QPoint(x, y)) != base ? 1 : 0;
        return count;
    };
    for (qint64 start : kParagraphStarts) {
        const QRect line = caretRect(view, start);
        CAPTURE(start);
        CHECK(inked(line.top(), line.bottom(), line.left() - 2) > 0);
        // Nothing in the margin beside the lanes under it.
        CHECK(inked(line.bottom() + 2, line.bottom() + line.height(), line.left() - 2) == 0);
    }
}

TEST_CASE("two overlapping spans of one function both stay visible")
{
    ShownView shown;
    ReadingView &view = shown.view;
    view.setSpans({span(1, FramingFunction::Cause, {kCafe.start, kOwner.end}),
        span(2, FramingFunction::Cause, {kOwner.start, kBlamed.end})});
    const QImage image = grabImage(view);
    const QRgb blue = functionStyle(FramingFunction::Cause).colour.rgb();
    // Where both cover "owner" the lane is a double rule (two separate rows of colour with a
    // gap); where one covers "blamed", a single rule.
    auto bands = [](const std::vector<int> &rows) {
        int count = rows.empty() ? 0 : 1;
        for (std::size_t i = 1; i < rows.size(); ++i)
            count += rows[i] != rows[i - 1] + 1 ? 1 : 0;
        return count;
    };
    // (Inset past the badges at the starts and the end ticks.)
    CHECK(bands(rowsWithColour(image, view, {kOwner.start + 3, kOwner.end}, blue, 3)) == 2);
    CHECK(bands(rowsWithColour(image, view, {kBlamed.start + 1, kBlamed.end}, blue, 3)) == 1);
}

TEST_CASE("on a dark palette the lanes keep a non-text contrast of at least 3:1")
{
    ShownView shown;
    ReadingView &view = shown.view;
    // A dark theme's grey-blue view background (from memory, close to KDE's Breeze Dark); the
    // Okabe–Ito blue itself has only about 2.4:1 against it.
    const QColor base(0x31, 0x36, 0x3B);
    QPalette dark = view.palette();
    dark.setColor(QPalette::Base, base);
    dark.setColor(QPalette::Text, QColor(0xEF, 0xF0, 0xF1));
    view.setPalette(dark);
    view.setSpans({span(1, FramingFunction::Cause, {kOwner.start, kCouncils.end})});
    const QImage image = grabImage(view);
    // WCAG 2.1 relative luminance and contrast ratio; SC 1.4.11 asks 3:1 for graphics.
    auto luminance = [](const QColor &c) {
        auto ch = [](double v) {
            return v <= 0.03928 ? v / 12.92 : std::pow((v + 0.055) / 1.055, 2.4);
        };
        return 0.2126 * ch(c.redF()) + 0.7152 * ch(c.greenF()) + 0.0722 * ch(c.blueF());
    };
    // Under "council's", away from the badge at the span's start.
    const QRect start = caretRect(view, kCouncils.start);
    const QRect end = caretRect(view, kCouncils.end - 1);
    const QPoint origin = view.viewport()->mapTo(&view, QPoint(0, 0));
    int bluish = 0;
    double lowest = 21;
    for (int y = start.bottom() + 1; y <= start.bottom() + 2 * start.height(); ++y) {
        for (int x = start.left(); x < end.left(); ++x) {
            const QColor c = image.pixelColor(origin + QPoint(x, y));
            // The cause's hue (Okabe–Ito blue, about 202°) with some saturation.
            if (c.hsvSaturationF() < 0.3 || std::abs(c.hsvHueF() * 360 - 202) > 20)
                continue;
            ++bluish;
            const double ratio = (std::max(luminance(c), luminance(base)) + 0.05)
                / (std::min(luminance(c), luminance(base)) + 0.05);
            lowest = std::min(lowest, ratio);
        }
    }
    CHECK(lowest >= 3.0);
    CHECK(bluish > 0);
}
