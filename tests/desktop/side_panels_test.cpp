// The coding desk's side panels: frame card, codebook panel, article-level item form and span
// editor. The editors are tested without a coding session through the signals the session calls
// are connected to. Expected behaviour comes from design.md §1 and §6 (the frame card shows the
// four functions at a glance; every change is one undoable edit) and from the default codebook
// in resources/codebook/default_codebook.json.

#include "app/desktop/codebook_panel.h"
#include "app/desktop/coding_session.h"
#include "app/desktop/frame_card.h"
#include "app/desktop/interface_language.h"
#include "app/desktop/item_form.h"
#include "app/desktop/span_editor.h"
#include "app/desktop/span_quote.h"
#include "core/project/testing/project_database.h"
#include "core/store/database.h"
#include "tests/project/double_coded_project.h"
#include "tests/project/project_fixture.h"
#include "tests/support/test_support.h"

#include <QAbstractButton>
#include <QApplication>
#include <QComboBox>
#include <QDoubleSpinBox>
#include <QLabel>
#include <QLineEdit>
#include <QListWidget>
#include <QLocale>
#include <QPlainTextEdit>
#include <QPushButton>
#include <QSignalSpy>
#include <QStackedWidget>
#include <QTest>
#include <QTextBrowser>

using namespace fourfold;
using namespace fourfold::test;

namespace {

Codebook defaultCodebook()
{
    const QString path =
        QStringLiteral(FOURFOLD_SOURCE_DIR "/resources/codebook/default_codebook.json");
    auto codebook = Codebook::fromJson(readFile(path), path);
    REQUIRE(codebook);
    return *codebook;
}

Annotation span(qint64 id, FramingFunction function, TextRange range, const QString &quote,
    QJsonObject attributes = {})
{
    Annotation a;
    a.id = AnnotationId {id};
    a.article = ArticleId {1};
    a.coder = CoderId {1};
    a.content.function = function;
    a.content.range = range;
    a.content.attributes = std::move(attributes);
    a.quote = quote;
    return a;
}

template<typename T>
T *childNamed(const QWidget &parent, const QString &accessibleName)
{
    for (T *child : parent.findChildren<T *>())
        if (child->accessibleName() == accessibleName)
            return child;
    FAIL("no child with the accessible name " << accessibleName.toStdString());
    return nullptr;
}

QWidget *section(const FrameCard &card, FramingFunction f)
{
    auto *s = card.findChild<QWidget *>(QStringLiteral("section-%1").arg(functionKey(f)));
    REQUIRE(s);
    return s;
}

QStringList quotesIn(const QWidget *section)
{
    QStringList quotes;
    for (const QAbstractButton *b : section->findChildren<QAbstractButton *>())
        if (!b->isHidden())
            quotes << b->text();
    return quotes;
}

// An invented text; the emoji U+1F642 is one code point but two UTF-16 units (Unicode Standard
// 15.0, §3.9, UTF-16), so a span after it starts one code point later than its QString index.
const QString kText = QStringLiteral("The ferry stops in May. 🙂 The council blames the budget. "
                                     "That is unfair. Keep the ferry.");

} // namespace

TEST_CASE("a quote never sits between doubled quotation marks")
{
    // The marks of each locale as QLocale carries them (CLDR: en “ ” and ‘ ’; de „ “ and ‚ ‘; nl
    // ‘ ’), checked below for the plain case.
    const QLocale en(QLocale::English, QLocale::UnitedStates);
    const QLocale de(QLocale::German, QLocale::Germany);
    const QLocale nl(QLocale::Dutch, QLocale::Netherlands);
    CHECK(spanQuote(QStringLiteral("the ferry"), en) == QStringLiteral("“the ferry”"));
    CHECK(spanQuote(QStringLiteral("die Fähre"), de) == QStringLiteral("„die Fähre“"));
    CHECK(spanQuote(QStringLiteral("de veerboot"), nl) == QStringLiteral("‘de veerboot’"));
    // A span that is a whole quotation, marks included, keeps its own marks only.
    CHECK(spanQuote(QStringLiteral("“run the ferry down”"), en)
        == QStringLiteral("“run the ferry down”"));
    CHECK(spanQuote(QStringLiteral("„nicht mit uns“"), de) == QStringLiteral("„nicht mit uns“"));
    // A span ending in a quotation (the sample's C01 span on hb-02) gets the alternate marks.
    CHECK(spanQuote(QStringLiteral("the council had “run the ferry down”"), en)
        == QStringLiteral("‘the council had “run the ferry down”’"));
    CHECK(spanQuote(QStringLiteral("sagte „nicht mit uns“"), de)
        == QStringLiteral("‚sagte „nicht mit uns“‘"));
    // A closing apostrophe beside single marks: Dutch takes double marks around it.
    CHECK(spanQuote(QStringLiteral("de chauffeurs’"), nl) == QStringLiteral("“de chauffeurs’”"));
    CHECK(spanQuote(QStringLiteral("the drivers’"), en) == QStringLiteral("“the drivers’”"));

    // On the frame card (the default locale's marks).
    const QLocale before;
    QLocale::setDefault(en);
    FrameCard card;
    card.setSpans(kText,
        {span(1, FramingFunction::Problem, {0, 23}, QStringLiteral("“The ferry stops in May.”")),
            span(
                2, FramingFunction::Cause, {26, 56}, QStringLiteral("The council said “budget”"))});
    const QStringList problem = quotesIn(section(card, FramingFunction::Problem));
    const QStringList cause = quotesIn(section(card, FramingFunction::Cause));
    QLocale::setDefault(before);
    REQUIRE(problem.size() == 1);
    REQUIRE(cause.size() == 1);
    CHECK(problem[0] == QStringLiteral("“The ferry stops in May.”"));
    CHECK(cause[0] == QStringLiteral("‘The council said “budget”’"));
}

TEST_CASE("the frame card shows all four functions, with counts, in reading order")
{
    FrameCard card;
    std::vector<Annotation> spans {
        span(3, FramingFunction::Problem, {26, 56},
            QStringLiteral("The council blames the budget.")),
        span(1, FramingFunction::Problem, {0, 23}, QStringLiteral("The ferry stops in May.")),
        span(2, FramingFunction::Evaluation, {57, 72}, QStringLiteral("That is unfair.")),
    };
    Annotation deleted =
        span(4, FramingFunction::Remedy, {73, 88}, QStringLiteral("Keep the ferry."));
    deleted.deleted = true;
    spans.push_back(deleted);
    card.setSpans(kText, spans);

    // design.md §6: "the article's frame card: its four functions at a glance"; a function with
    // nothing coded is shown as empty, never hidden.
    for (FramingFunction f : kFramingFunctions)
        CHECK(!section(card, f)->isHidden());
    auto count = [&](FramingFunction f) {
        return section(card, f)->findChild<QLabel *>(QStringLiteral("count"))->text();
    };
    auto isEmpty = [&](FramingFunction f) {
        return !section(card, f)->findChild<QLabel *>(QStringLiteral("empty"))->isHidden();
    };
    CHECK(count(FramingFunction::Problem) == QStringLiteral("2"));
    CHECK(count(FramingFunction::Cause) == QStringLiteral("0"));
    CHECK(count(FramingFunction::Evaluation) == QStringLiteral("1"));
    CHECK(count(FramingFunction::Remedy) == QStringLiteral("0")); // the deleted span is gone
    CHECK(!isEmpty(FramingFunction::Problem));
    CHECK(isEmpty(FramingFunction::Cause));
    CHECK(isEmpty(FramingFunction::Remedy));

    // Reading order, whatever the order the spans came in.
    const QStringList problem = quotesIn(section(card, FramingFunction::Problem));
    REQUIRE(problem.size() == 2);
    CHECK(problem[0].contains(QStringLiteral("The ferry stops in May.")));
    CHECK(problem[1].contains(QStringLiteral("The council blames the budget.")));
    CHECK(quotesIn(section(card, FramingFunction::Cause)).isEmpty());

    // A refresh that changes nothing shown (here a note) keeps the quotes as they are, so a
    // click in progress on one is not lost.
    const QAbstractButton *first =
        section(card, FramingFunction::Problem)->findChild<QAbstractButton *>();
    spans[0].content.note = QStringLiteral("changed");
    card.setSpans(kText, spans);
    CHECK(section(card, FramingFunction::Problem)->findChild<QAbstractButton *>() == first);

    // Recounted when the spans change: the same card, now with nothing coded.
    card.setSpans(kText, {});
    for (FramingFunction f : kFramingFunctions) {
        CHECK(count(f) == QStringLiteral("0"));
        CHECK(isEmpty(f));
        CHECK(quotesIn(section(card, f)).isEmpty());
    }
}

TEST_CASE("the frame card quotes from the text, in code points, when a span has no quote")
{
    FrameCard card;
    // Code points 26..56 are "The council blames the budget." (UTF-16 27..57, after the emoji).
    card.setSpans(kText, {span(5, FramingFunction::Cause, {26, 56}, QString())});
    const QStringList cause = quotesIn(section(card, FramingFunction::Cause));
    REQUIRE(cause.size() == 1);
    CHECK(cause[0].contains(QStringLiteral("The council blames the budget.")));
}

TEST_CASE("activating a quote on the frame card names its span")
{
    FrameCard card;
    card.setSpans(kText,
        {span(11, FramingFunction::Problem, {0, 23}, QStringLiteral("The ferry stops in May.")),
            span(12, FramingFunction::Remedy, {73, 88}, QStringLiteral("Keep the ferry."))});
    card.resize(320, 400);
    card.show();
    QSignalSpy spy(&card, &FrameCard::spanActivated);

    auto *remedy = section(card, FramingFunction::Remedy)->findChild<QAbstractButton *>();
    REQUIRE(remedy);
    QTest::mouseClick(remedy, Qt::LeftButton);
    REQUIRE(spy.count() == 1);
    CHECK(spy.at(0).at(0).value<AnnotationId>() == AnnotationId {12});

    // Keyboard: the card is one tab stop; the current quote follows the click, Up/Down/Home
    // move through the quotes in the order shown (problem before remedy), Space or Enter
    // activates (common practice for lists).
    CHECK(card.focusPolicy() & Qt::TabFocus);
    auto activatedByKeys = [&](std::initializer_list<Qt::Key> keys) {
        for (Qt::Key key : keys)
            QTest::keyClick(&card, key);
        REQUIRE(!spy.isEmpty());
        return spy.last().at(0).value<AnnotationId>();
    };
    CHECK(activatedByKeys({Qt::Key_Space}) == AnnotationId {12});
    CHECK(activatedByKeys({Qt::Key_Home, Qt::Key_Space}) == AnnotationId {11});
    CHECK(activatedByKeys({Qt::Key_Down, Qt::Key_Return}) == AnnotationId {12});
    CHECK(activatedByKeys({Qt::Key_Down, Qt::Key_Enter}) == AnnotationId {12}); // stays at the end
    CHECK(activatedByKeys({Qt::Key_Up, Qt::Key_Space}) == AnnotationId {11});
    CHECK(spy.count() == 6);

    card.setSelectedSpan(AnnotationId {12});
    CHECK(card.selectedSpan() == AnnotationId {12});
    card.setSelectedSpan(AnnotationId {99}); // not on the card
    CHECK(!card.selectedSpan().isValid());
}

TEST_CASE("the codebook panel shows the definition and rules of the function in focus")
{
    const Codebook codebook = defaultCodebook();
    CodebookPanel panel;
    panel.setCodebook(codebook);
    auto *text = panel.findChild<QTextBrowser *>();
    REQUIRE(text);

    const FunctionDefinition &evaluation = codebook.definition(FramingFunction::Evaluation);
    const FunctionDefinition &cause = codebook.definition(FramingFunction::Cause);
    panel.showFunction(FramingFunction::Evaluation);
    CHECK(panel.function() == FramingFunction::Evaluation);
    QString shown = text->toPlainText();
    CHECK(shown.contains(evaluation.label));
    CHECK(shown.contains(evaluation.definition));
    for (const QString &rule : evaluation.rules)
        CHECK(shown.contains(rule));
    CHECK(!shown.contains(cause.definition));

    panel.showFunction(FramingFunction::Cause);
    shown = text->toPlainText();
    CHECK(shown.contains(cause.definition));
    CHECK(shown.contains(cause.examples.first()));
    CHECK(!shown.contains(evaluation.definition));
}

TEST_CASE("the item form answers article-level items for the open article")
{
    ItemForm form(nullptr);
    form.setCodebook(defaultCodebook());
    QSignalSpy spy(&form, &ItemForm::answerChosen);
    auto *combo = childNamed<QComboBox>(
        form, QStringLiteral("Which framing function dominates the article as a whole?"));

    form.setArticle({}, {});
    CHECK(!form.isEnabled()); // no article open

    form.setArticle(ArticleId {7}, {});
    CHECK(form.isEnabled());
    CHECK(combo->currentData().toString().isEmpty()); // "not answered"

    // A choice the user makes (the combo's activated signal, here from the keyboard).
    combo->setFocus();
    QTest::keyClick(combo, Qt::Key_Down);
    REQUIRE(spy.count() == 1);
    CHECK(spy.at(0).at(0).value<ArticleId>() == ArticleId {7});
    CHECK(spy.at(0).at(1).toString() == QStringLiteral("dominant_function"));
    CHECK(spy.at(0).at(2).toString() == QStringLiteral("problem"));

    // The stored answer is shown; "not answered" can no longer be chosen, choosing the same
    // answer again changes nothing.
    Judgement j;
    j.article = ArticleId {7};
    j.itemKey = QStringLiteral("dominant_function");
    j.value = QStringLiteral("evaluation");
    form.setArticle(ArticleId {7}, {j});
    CHECK(combo->currentData().toString() == QStringLiteral("evaluation"));
    combo->setCurrentIndex(0);
    emit combo->activated(0);
    const int evaluationIndex = combo->findData(QStringLiteral("evaluation"));
    combo->setCurrentIndex(evaluationIndex);
    emit combo->activated(evaluationIndex);
    CHECK(spy.count() == 1);
}

namespace {

struct EditorFixture {
    SpanEditor editor {nullptr};
    QSignalSpy edits {&editor, &SpanEditor::contentEdited};
    QSignalSpy links {&editor, &SpanEditor::linkRequested};
    Annotation problem =
        span(21, FramingFunction::Problem, {0, 23}, QStringLiteral("The ferry stops in May."));
    Annotation cause =
        span(22, FramingFunction::Cause, {26, 56}, QStringLiteral("The council blames the budget."),
            QJsonObject {{QStringLiteral("actor"), QStringLiteral("council")}});
    Annotation evaluation =
        span(23, FramingFunction::Evaluation, {57, 72}, QStringLiteral("That is unfair."),
            QJsonObject {{QStringLiteral("polarity"), QStringLiteral("negative")}});
    Annotation remedy =
        span(24, FramingFunction::Remedy, {73, 88}, QStringLiteral("Keep the ferry."));

    EditorFixture()
    {
        editor.setCodebook(defaultCodebook());
        editor.resize(360, 640);
        editor.show();
        evaluation.content.confidence = 0.8;
    }
    std::vector<Annotation> all() const { return {problem, cause, evaluation, remedy}; }
    AnnotationContent lastEdit() const
    {
        REQUIRE(!edits.isEmpty());
        return edits.last().at(1).value<AnnotationContent>();
    }
};

} // namespace

TEST_CASE("the span editor shows a hint and nothing to edit when no span is selected")
{
    EditorFixture f;
    auto *pages = f.editor.findChild<QStackedWidget *>();
    REQUIRE(pages);
    f.editor.setSpan(std::nullopt, f.all(), {});
    CHECK(pages->currentIndex() == 0);
    CHECK(!pages->widget(1)->isEnabled());
    f.editor.setSpan(f.evaluation, f.all(), {});
    CHECK(pages->currentIndex() == 1);
    CHECK(pages->widget(1)->isEnabled());
}

TEST_CASE("each change in the span editor is one edit with the full new content")
{
    EditorFixture f;
    f.editor.setSpan(f.evaluation, f.all(), {});
    CHECK(f.edits.isEmpty()); // showing a span is not an edit

    SECTION("an attribute from the codebook's schema")
    {
        auto *polarity = childNamed<QComboBox>(f.editor, QStringLiteral("Polarity"));
        CHECK(polarity->currentData().toString() == QStringLiteral("negative"));
        polarity->setFocus();
        QTest::keyClick(polarity, Qt::Key_Down); // negative → neutral
        REQUIRE(f.edits.count() == 1);
        CHECK(f.edits.at(0).at(0).value<AnnotationId>() == AnnotationId {23});
        const AnnotationContent c = f.lastEdit();
        CHECK(c.function == FramingFunction::Evaluation);
        CHECK(c.range == TextRange {57, 72});
        CHECK(
            c.attributes == QJsonObject {{QStringLiteral("polarity"), QStringLiteral("neutral")}});
        CHECK(c.confidence == 0.8);
    }
    SECTION("a note is committed when its field is left, not per keystroke")
    {
        auto *note = childNamed<QPlainTextEdit>(f.editor, QStringLiteral("Note"));
        note->setFocus();
        QTest::keyClicks(note, QStringLiteral("quoted source"));
        CHECK(f.edits.isEmpty());
        QFocusEvent out(QEvent::FocusOut, Qt::TabFocusReason);
        QApplication::sendEvent(note, &out);
        REQUIRE(f.edits.count() == 1);
        CHECK(f.lastEdit().note == QStringLiteral("quoted source"));
        QApplication::sendEvent(note, &out); // leaving it again, unchanged: no edit
        CHECK(f.edits.count() == 1);
    }
    SECTION("an edit in progress is committed before another span is shown")
    {
        auto *note = childNamed<QPlainTextEdit>(f.editor, QStringLiteral("Note"));
        note->setFocus();
        QTest::keyClicks(note, QStringLiteral("check"));
        f.editor.setSpan(f.cause, f.all(), {});
        REQUIRE(f.edits.count() == 1);
        CHECK(f.edits.at(0).at(0).value<AnnotationId>() == AnnotationId {23});
        CHECK(f.lastEdit().note == QStringLiteral("check"));
        CHECK(note->toPlainText().isEmpty()); // the cause span has no note
    }
    SECTION("changing the function keeps only attributes the new function declares")
    {
        auto *toCause = childNamed<QAbstractButton>(f.editor, QStringLiteral("Function: Cause"));
        QTest::mouseClick(toCause, Qt::LeftButton);
        REQUIRE(f.edits.count() == 1);
        CHECK(f.lastEdit().function == FramingFunction::Cause);
        CHECK(f.lastEdit().attributes.isEmpty()); // "polarity" is not a cause attribute
        // The fields now follow the cause schema: a free-text actor, no polarity.
        auto *actor = childNamed<QLineEdit>(f.editor, QStringLiteral("Actor held responsible"));
        // Keyboard: the new field comes right after the function in the tab order.
        CHECK(childNamed<QAbstractButton>(f.editor, QStringLiteral("Function: Remedy"))
                  ->nextInFocusChain()
            == actor);
        actor->setFocus();
        QTest::keyClicks(actor, QStringLiteral("the council"));
        CHECK(f.edits.count() == 1);
        QTest::keyClick(actor, Qt::Key_Return);
        REQUIRE(f.edits.count() == 2);
        CHECK(f.lastEdit().attributes
            == QJsonObject {{QStringLiteral("actor"), QStringLiteral("the council")}});
    }
    SECTION("a confidence is committed once it has stopped changing")
    {
        auto *confidence = childNamed<QDoubleSpinBox>(f.editor, QStringLiteral("Confidence"));
        confidence->setFocus();
        QTest::keyClick(confidence, Qt::Key_Up); // 0.8 → 0.9
        QTest::keyClick(confidence, Qt::Key_Up); // → 1.0
        CHECK(f.edits.isEmpty());
        for (int i = 0; i < 40 && f.edits.isEmpty(); ++i)
            QTest::qWait(50);
        REQUIRE(f.edits.count() == 1);
        REQUIRE(f.lastEdit().confidence.has_value());
        CHECK(*f.lastEdit().confidence == Approx(1.0));
        // Down to "not set": no confidence at all.
        for (int i = 0; i < 12; ++i)
            QTest::keyClick(confidence, Qt::Key_Down);
        f.editor.commitPendingEdits();
        REQUIRE(f.edits.count() == 2);
        CHECK(!f.lastEdit().confidence.has_value());
    }
}

TEST_CASE("the span editor links an evaluation to a cause and a remedy to a problem")
{
    EditorFixture f;
    auto *target = childNamed<QComboBox>(f.editor, QStringLiteral("Span to link to"));
    auto *link = childNamed<QPushButton>(f.editor, QStringLiteral("Link to the chosen span"));
    auto *list = childNamed<QListWidget>(f.editor, QStringLiteral("Links of this span"));

    CHECK(SpanEditor::linkTypeFrom(FramingFunction::Evaluation) == QStringLiteral("judges"));
    CHECK(SpanEditor::linkTypeFrom(FramingFunction::Remedy) == QStringLiteral("addresses"));
    CHECK(SpanEditor::linkTypeFrom(FramingFunction::Problem).isEmpty());

    // An evaluation judges a cause: only the cause is offered, not the problem before it.
    f.editor.setSpan(f.evaluation, f.all(), {});
    REQUIRE(target->count() == 1);
    CHECK(target->itemData(0).toLongLong() == 22);
    CHECK(!target->isHidden());
    CHECK(target->currentIndex() == 0); // the first cause is proposed
    QTest::mouseClick(link, Qt::LeftButton);
    REQUIRE(f.links.count() == 1);
    CHECK(f.links.at(0).at(0).value<AnnotationId>() == AnnotationId {23});
    CHECK(f.links.at(0).at(1).value<AnnotationId>() == AnnotationId {22});
    CHECK(f.links.at(0).at(2).toString() == QStringLiteral("judges"));

    // Once linked, the link is listed and the cause is no longer offered again.
    AnnotationLink judges;
    judges.source = AnnotationId {23};
    judges.target = AnnotationId {22};
    judges.type = QStringLiteral("judges");
    judges.id = LinkId {31};
    f.editor.setSpan(f.evaluation, f.all(), {judges});
    CHECK(target->count() == 0);
    CHECK_FALSE(link->isEnabled());
    REQUIRE(list->count() == 1);
    CHECK(list->item(0)->text().contains(QStringLiteral("The council blames the budget.")));

    // The cause lists the link from its side and offers no link of its own.
    f.editor.setSpan(f.cause, f.all(), {judges});
    CHECK(target->isHidden());
    REQUIRE(list->count() == 1);
    CHECK(list->item(0)->text().contains(QStringLiteral("That is unfair.")));

    // A remedy addresses a problem: only the problem is offered.
    f.editor.setSpan(f.remedy, f.all(), {judges});
    REQUIRE(target->count() == 1);
    CHECK(target->itemData(0).toLongLong() == 21);
    QTest::mouseClick(link, Qt::LeftButton);
    REQUIRE(f.links.count() == 2);
    CHECK(f.links.at(1).at(1).value<AnnotationId>() == AnnotationId {21});
    CHECK(f.links.at(1).at(2).toString() == QStringLiteral("addresses"));
}

TEST_CASE("the span editor removes the chosen link")
{
    EditorFixture f;
    QSignalSpy unlinks {&f.editor, &SpanEditor::unlinkRequested};
    auto *list = childNamed<QListWidget>(f.editor, QStringLiteral("Links of this span"));
    auto *remove = childNamed<QPushButton>(f.editor, QStringLiteral("Remove the chosen link"));
    AnnotationLink judges;
    judges.id = LinkId {31};
    judges.source = AnnotationId {23};
    judges.target = AnnotationId {22};
    judges.type = QStringLiteral("judges");
    f.editor.setSpan(f.evaluation, f.all(), {judges});
    REQUIRE(list->count() == 1);
    // Nothing chosen, nothing to remove.
    CHECK(!remove->isHidden());
    CHECK_FALSE(remove->isEnabled());
    list->setCurrentRow(0);
    REQUIRE(remove->isEnabled());
    QTest::mouseClick(remove, Qt::LeftButton);
    REQUIRE(unlinks.count() == 1);
    CHECK(unlinks.at(0).at(0).value<LinkId>() == LinkId {31});
    // A span without links shows no remove button.
    f.editor.setSpan(f.problem, f.all(), {});
    CHECK(remove->isHidden());
}

TEST_CASE("with a coding session, each change in the panels is one undoable edit of the project")
{
    ProjectFixture f;
    f.importJsonl(kTwoArticles);
    const ArticleId article = f.articleId(QStringLiteral("f1"));
    const CoderId coderId = f.addCoder(QStringLiteral("C01"));
    auto coder = f.project.coderByPseudonym(QStringLiteral("C01"));
    REQUIRE(coder);
    REQUIRE(coder->has_value());
    CHECK((*coder)->id == coderId);
    CodingSession session(std::move(f.project), **coder);
    QUndoStack *undo = session.undoStack();

    // "It is a disgrace." is code points 108..125 of f1 (see kTwoArticles).
    REQUIRE(session.addSpan(article, FramingFunction::Evaluation, TextRange {108, 125}));
    const AnnotationId id = session.lastAddedSpan();
    const std::vector<Annotation> spans = session.visibleAnnotations(article);
    REQUIRE(spans.size() == 1);
    const int steps = undo->count();

    SpanEditor editor(&session);
    editor.setSpan(spans[0], spans, {});
    auto *polarity = childNamed<QComboBox>(editor, QStringLiteral("Polarity"));
    polarity->setFocus();
    QTest::keyClick(polarity, Qt::Key_Down); // not set → negative
    CHECK(undo->count() == steps + 1);
    auto stored = session.project().annotation(id);
    REQUIRE(stored);
    CHECK(stored->content.attributes
        == QJsonObject {{QStringLiteral("polarity"), QStringLiteral("negative")}});
    undo->undo();
    stored = session.project().annotation(id);
    REQUIRE(stored);
    CHECK(stored->content.attributes.isEmpty());

    ItemForm items(&session);
    items.setArticle(article, session.ownJudgements(article));
    auto *dominant = childNamed<QComboBox>(
        items, QStringLiteral("Which framing function dominates the article as a whole?"));
    dominant->setFocus();
    QTest::keyClick(dominant, Qt::Key_Down); // not answered → problem
    const std::vector<Judgement> answers = session.ownJudgements(article);
    REQUIRE(answers.size() == 1);
    CHECK(answers[0].itemKey == QStringLiteral("dominant_function"));
    CHECK(answers[0].value == QStringLiteral("problem"));
    CHECK(undo->index() == steps + 1); // the undone attribute edit was replaced by the answer
}

TEST_CASE("the article list reads the same few statements for 6 and for 18 articles")
{
    qint64 counts[2][2] = {};
    int i = 0;
    for (int n : {6, 18}) {
        DoubleCodedProject p(n);
        auto coders = p.project.coders();
        REQUIRE(coders);
        const Coder lead = coders->back();
        const Coder coder = coders->front();
        REQUIRE(lead.role == CoderRole::Lead);
        CodingSession asLead(std::move(p.project), lead);
        Database &db = databaseForTesting(asLead.project());
        qint64 before = db.statementsRun();
        const std::vector<ArticleRow> all = asLead.articleRows();
        counts[i][0] = db.statementsRun() - before;
        CHECK(qint64(all.size()) == n);
        auto reopened = Project::open(asLead.project().path());
        REQUIRE(reopened);
        CodingSession asCoder(std::move(*reopened), coder);
        Database &own = databaseForTesting(asCoder.project());
        before = own.statementsRun();
        const std::vector<ArticleRow> mine = asCoder.articleRows();
        counts[i][1] = own.statementsRun() - before;
        // C01 codes two of every three articles, all done.
        CHECK(qint64(mine.size()) == n * 2 / 3);
        for (const ArticleRow &row : mine)
            CHECK(row.status == QStringLiteral("done"));
        ++i;
    }
    CHECK(counts[0][0] == counts[1][0]);
    CHECK(counts[0][1] == counts[1][1]);
    CHECK(counts[1][0] > 0);
    CHECK(counts[1][0] <= 6);
}

TEST_CASE("a coder who works in German reads the codebook in German and answers with its keys")
{
    // The default codebook carries German and Dutch texts (Codebook::inLanguage); the desk shows
    // those of the program's language, and what is stored keeps the codebook's keys and values.
    ProjectFixture f;
    f.importJsonl(kTwoArticles);
    const ArticleId article = f.articleId(QStringLiteral("f1"));
    f.addCoder(QStringLiteral("C01"));
    auto coder = f.project.coderByPseudonym(QStringLiteral("C01"));
    REQUIRE(coder);
    const Codebook german = defaultCodebook().inLanguage(QStringLiteral("de"));
    setInterfaceLanguage(QStringLiteral("de"));
    CodingSession session(std::move(f.project), **coder);
    setInterfaceLanguage(QString());
    CHECK(session.codebook().definition(FramingFunction::Evaluation).label
        == QStringLiteral("Moralische Bewertung"));

    CodebookPanel panel;
    panel.setCodebook(session.codebook());
    panel.showFunction(FramingFunction::Remedy);
    auto *text = panel.findChild<QTextBrowser *>();
    REQUIRE(text);
    CHECK(text->toPlainText().contains(german.definition(FramingFunction::Remedy).definition));
    CHECK(text->toPlainText().contains(QStringLiteral("Handlungsempfehlung")));

    REQUIRE(session.addSpan(article, FramingFunction::Evaluation, TextRange {108, 125}));
    const AnnotationId id = session.lastAddedSpan();
    SpanEditor editor(&session);
    editor.setSpan(session.visibleAnnotations(article)[0], session.visibleAnnotations(article), {});
    auto *object = childNamed<QComboBox>(editor, QStringLiteral("Was bewertet wird"));
    object->setFocus();
    QTest::keyClick(object, Qt::Key_Down); // not set → the first value
    auto stored = session.project().annotation(id);
    REQUIRE(stored);
    CHECK(stored->content.attributes
        == QJsonObject {{QStringLiteral("object"), QStringLiteral("government")}});

    ItemForm items(&session);
    items.setArticle(article, session.ownJudgements(article));
    CHECK(childNamed<QComboBox>(
        items, QStringLiteral("Welche Framing-Funktion dominiert den Artikel als Ganzes?")));
}
