// The comparison window driven through its widgets and keys, offscreen, on a copy of the sample
// project (three coders C01..C03 on nine reliability articles, lead L01; gold on a few articles).
#include "app/desktop/coding_session.h"
#include "app/desktop/compare/answer_panel.h"
#include "app/desktop/compare/comparison_view.h"
#include "app/desktop/compare/comparison_window.h"
#include "app/desktop/compare/disagreement_queue_model.h"
#include "app/desktop/compare/gold_span_dialog.h"
#include "app/desktop/shortcut_table.h"
#include "core/project/project.h"
#include "core/project/testing/older_lead.h"
#include "core/project/testing/project_database.h"
#include "core/text/offset_map.h"
#include "tests/support/db_dump.h"
#include "tests/support/test_support.h"

#include <QAbstractItemModelTester>
#include <QAction>
#include <QApplication>
#include <QFile>
#include <QJsonObject>
#include <QLabel>
#include <QLineEdit>
#include <QPushButton>
#include <QSet>
#include <QSignalSpy>
#include <QTest>
#include <QTreeWidget>
#include <QUndoStack>

using namespace fourfold;
using namespace fourfold::test;

namespace {

struct CompareFixture {
    QTemporaryDir dir;
    std::unique_ptr<CodingSession> session;
    CompareFixture(const QString &who = QStringLiteral("L01"))
    {
        const QString path = dir.filePath(QStringLiteral("demo.fourfold"));
        REQUIRE(QFile::copy(QStringLiteral(FOURFOLD_SAMPLE_PROJECT), path));
        QFile::setPermissions(path, QFile::ReadOwner | QFile::WriteOwner);
        auto p = Project::open(path);
        REQUIRE(p);
        auto coder = p->coderByPseudonym(who);
        REQUIRE(coder);
        REQUIRE(coder->has_value());
        session = std::make_unique<CodingSession>(std::move(*p), **coder);
    }
    Project &project() { return session->project(); }
    // Every table but the event log: the whole content of the project file.
    QString dump() { return dumpDatabase(databaseForTesting(project())); }
    // The coders' own work: every table but gold (spans and answers), rejections and the event
    // log.
    QString rawDump()
    {
        return dumpDatabase(databaseForTesting(project()),
            {QStringLiteral("event_log"), QStringLiteral("gold_annotation"),
                QStringLiteral("gold_source"), QStringLiteral("gold_rejection"),
                QStringLiteral("gold_judgement")});
    }
};

void activate(QWidget &w)
{
    w.resize(1400, 900);
    w.show();
    w.activateWindow();
    REQUIRE(QTest::qWaitForWindowActive(&w));
}

} // namespace

TEST_CASE("the queue lists the articles coded by several coders, most disagreements first")
{
    CompareFixture f;
    ComparisonWindow w(f.session.get());
    QAbstractItemModelTester tester(
        w.queueModel(), QAbstractItemModelTester::FailureReportingMode::Fatal);
    // Independent count from the raw annotations: articles with spans by two or more coders.
    auto all = f.project().allAnnotations();
    REQUIRE(all);
    QHash<qint64, QSet<qint64>> codersOf;
    for (const Annotation &a : *all)
        codersOf[a.article.value].insert(a.coder.value);
    int several = 0;
    for (const auto &coders : std::as_const(codersOf))
        several += coders.size() >= 2 ? 1 : 0;
    REQUIRE(several == 9); // the sample project's reliability subsample
    const auto &rows = w.queueModel()->rows();
    REQUIRE(int(rows.size()) == several);
    for (size_t i = 1; i < rows.size(); ++i)
        CHECK(rows[i - 1].unresolved >= rows[i].unresolved);
    // The window opens the top article with its first undecided disagreement current.
    CHECK(w.currentArticle() == rows.front().article.id);
    REQUIRE(w.currentPassage() >= 0);
    CHECK_FALSE(w.passages()[size_t(w.currentPassage())].isAgreed());
    // Three coders and gold, one layout per paragraph shared by all columns.
    auto article = f.project().article(w.currentArticle());
    REQUIRE(article);
    CHECK(w.view()->paragraphCount() == qsizetype(article->paragraphs.size()));

    // A coder pair narrows the columns and passages to the two coders.
    auto c1 = f.project().coderByPseudonym(QStringLiteral("C01"));
    auto c3 = f.project().coderByPseudonym(QStringLiteral("C03"));
    REQUIRE((c1 && c3 && *c1 && *c3));
    w.setCoderPair((*c1)->id, (*c3)->id);
    for (const Passage &p : w.passages())
        for (const Annotation &a : p.spans)
            CHECK((a.coder == (*c1)->id || a.coder == (*c3)->id));
    w.setCoderPair({}, {});
    // One function: every passage shown has a span of it.
    w.setFunctionFilter(FramingFunction::Remedy);
    REQUIRE_FALSE(w.passages().empty());
    for (const Passage &p : w.passages())
        CHECK((p.functions() & (1u << unsigned(FramingFunction::Remedy))));
}

TEST_CASE("a disagreement is adjudicated into gold with the keyboard, undone, raw codings kept")
{
    CompareFixture f;
    ComparisonWindow w(f.session.get());
    activate(w);
    const QString before = f.dump();
    const QString raw = f.rawDump();
    const ArticleId article = w.currentArticle();
    // The gold spans already decided on this article (the sample has gold on a few articles).
    const size_t goldBefore = f.project().goldAnnotations(article)->size();

    // N steps to the next undecided disagreement, P back.
    const int first = w.currentPassage();
    QTest::keyClick(&w, Qt::Key_N);
    const int second = w.currentPassage();
    CHECK(second != first);
    CHECK_FALSE(w.passages()[size_t(second)].isAgreed());
    QTest::keyClick(&w, Qt::Key_P);
    CHECK(w.currentPassage() == first);

    // Accept the first coder's span of the passage, with a rationale.
    const Passage passage = w.passages()[size_t(first)];
    const Annotation chosen = passage.spans.front();
    w.selectSpans({chosen.id});
    w.setRationale(QStringLiteral("The coder marks the whole claim."));
    QTest::keyClick(&w, Qt::Key_A);
    auto gold = f.project().goldAnnotations(article);
    REQUIRE(gold);
    REQUIRE(gold->size() == goldBefore + 1);
    const auto it = std::ranges::find_if(*gold, [&](const GoldAnnotation &x) {
        return std::ranges::find(x.sources, chosen.id) != x.sources.end();
    });
    REQUIRE(it != gold->end());
    const GoldAnnotation g = *it;
    CHECK(g.content.function == chosen.content.function);
    CHECK(g.content.range == chosen.content.range);
    CHECK(g.quote == chosen.quote);
    CHECK(g.decidedBy == f.session->coder().id);
    CHECK(g.rationale == QStringLiteral("The coder marks the whole claim."));
    // The passage now counts as decided, in the window and in the queue.
    CHECK(w.passages()[size_t(w.currentPassage())].isResolved());
    CHECK(f.rawDump() == raw);

    // Undo (Ctrl+Z) removes the gold span; the project is as it was, content for content.
    QTest::keyClick(&w, Qt::Key_Z, Qt::ControlModifier);
    CHECK(f.project().goldAnnotations(article)->size() == goldBefore);
    CHECK(f.dump() == before);
    CHECK_FALSE(w.passages()[size_t(w.currentPassage())].isResolved());
    // Redo brings back the same gold span.
    f.session->undoStack()->redo();
    auto again = f.project().goldAnnotations(article);
    REQUIRE(again);
    REQUIRE(again->size() == goldBefore + 1);
    CHECK(std::ranges::any_of(*again, [&](const GoldAnnotation &x) { return x.uuid == g.uuid; }));
    CHECK(f.rawDump() == raw);
}

TEST_CASE("reject, merge and accept-all-agreed are single undoable steps")
{
    CompareFixture f;
    ComparisonWindow w(f.session.get());
    activate(w);
    const QString before = f.dump();
    const QString raw = f.rawDump();
    const ArticleId article = w.currentArticle();
    QUndoStack *undo = f.session->undoStack();
    const size_t goldAtStart = f.project().goldAnnotations(article)->size();

    // Reject every span of a presence disagreement (a span not every coder has).
    int presence = -1;
    for (size_t i = 0; i < w.passages().size(); ++i)
        if (w.passages()[i].has(DisagreementKind::Presence)) {
            presence = int(i);
            break;
        }
    REQUIRE(presence >= 0);
    w.setCurrentPassage(presence);
    std::vector<AnnotationId> ids;
    for (const Annotation &a : w.passages()[size_t(presence)].spans)
        ids.push_back(a.id);
    w.selectSpans(ids);
    QTest::keyClick(&w, Qt::Key_R);
    auto rejections = f.project().goldRejections(article);
    REQUIRE(rejections);
    CHECK(rejections->size() == ids.size());
    CHECK(w.passages()[size_t(presence)].isResolved());
    CHECK(undo->count() == 1);

    // Merge the boundaries of a boundary disagreement's spans of one function.
    int boundary = -1;
    for (size_t i = 0; i < w.passages().size(); ++i)
        if (w.passages()[i].has(DisagreementKind::Boundary)
            && !w.passages()[i].has(DisagreementKind::Function) && !w.passages()[i].isResolved()) {
            boundary = int(i);
            break;
        }
    REQUIRE(boundary >= 0); // the sample holds one
    {
        w.setCurrentPassage(boundary);
        const Passage p = w.passages()[size_t(boundary)];
        ids.clear();
        TextRange expected = p.spans.front().content.range;
        for (const Annotation &a : p.spans)
            if (a.content.function == p.spans.front().content.function) {
                ids.push_back(a.id);
                expected.start = std::min(expected.start, a.content.range.start);
                expected.end = std::max(expected.end, a.content.range.end);
            }
        w.selectSpans(ids);
        QTest::keyClick(&w, Qt::Key_M);
        auto gold = f.project().goldAnnotations(article);
        REQUIRE(gold);
        REQUIRE(gold->size() == goldAtStart + 1);
        const auto merged = std::ranges::find_if(*gold, [&](const GoldAnnotation &x) {
            return std::ranges::find(x.sources, ids.front()) != x.sources.end();
        });
        REQUIRE(merged != gold->end());
        CHECK(merged->content.range == expected);
        CHECK(merged->sources.size() == ids.size());
        CHECK(undo->count() == 2);
    }

    // Accept every agreed passage at once: one step on the undo stack.
    const int steps = undo->count();
    const size_t goldBefore = f.project().goldAnnotations(article)->size();
    auto comparison = compareArticle(f.project(), article);
    REQUIRE(comparison);
    const auto agreed = agreedCandidates(*comparison);
    if (!agreed.empty()) {
        QTest::keyClick(&w, Qt::Key_A, Qt::ControlModifier | Qt::ShiftModifier);
        CHECK(f.project().goldAnnotations(article)->size() == goldBefore + agreed.size());
        CHECK(undo->count() == steps + 1);
    }
    CHECK(f.rawDump() == raw);
    while (undo->canUndo())
        undo->undo();
    CHECK(f.dump() == before);
}

TEST_CASE("a coder cannot adjudicate: the window says so and offers nothing")
{
    CompareFixture f(QStringLiteral("C01"));
    ComparisonWindow w(f.session.get());
    CHECK(w.queueModel() == nullptr);
    CHECK(w.currentPassage() == -1);
}

TEST_CASE("an empty queue says why and what fills it")
{
    QTemporaryDir dir;
    auto p = Project::create(dir.filePath(QStringLiteral("empty.fourfold")));
    REQUIRE(p);
    auto lead = addOlderLeadForTesting(*p, QStringLiteral("Lotte Lead"), QStringLiteral("L01"));
    REQUIRE(lead);
    auto coder = p->coderByPseudonym(QStringLiteral("L01"));
    REQUIRE(coder);
    REQUIRE(coder->has_value());
    CodingSession session(std::move(*p), **coder);
    ComparisonWindow w(&session);
    REQUIRE(w.queueModel());
    CHECK(w.queueModel()->rowCount() == 0);
    CHECK(w.currentPassage() == -1);
    CHECK(w.passageText().startsWith(QStringLiteral("Nothing to compare yet.")));
    CHECK(w.passageText().contains(QStringLiteral("Study design")));
}

TEST_CASE("edit decides a gold span with the lead's own function and boundaries")
{
    CompareFixture f;
    ComparisonWindow w(f.session.get());
    const ArticleId article = w.currentArticle();
    auto text = f.project().article(article);
    REQUIRE(text);
    REQUIRE(w.currentPassage() >= 0);
    const Passage p = w.passages()[size_t(w.currentPassage())];
    const Annotation &span = p.spans.front();

    // The dialog starts from the span and returns what the lead set.
    GoldSpanDialog dialog(*text, span.content);
    AnnotationContent same = dialog.content();
    CHECK(same.range == span.content.range);
    CHECK(same.function == span.content.function);

    // Chosen on the text: a selection inside words snaps to them, unless exact.
    {
        Article plain;
        plain.summary.language = QStringLiteral("en");
        plain.text = QStringLiteral("The ferry levy hurts islanders.");
        auto codebook = f.project().codebook();
        REQUIRE(codebook);
        AnnotationContent cause;
        cause.function = FramingFunction::Cause;
        cause.range = {0, 3};
        GoldSpanDialog onText(plain, cause, *codebook);
        onText.selectOnText(6, 12); // "rry le"
        CHECK(onText.content().range == TextRange {4, 14}); // "ferry levy"
        onText.setExact(true);
        CHECK(onText.content().range == TextRange {6, 12});
        // The attribute fields are the function's own (the default codebook's cause has the
        // free-text actor and the closed list of the actor's kind): what is typed there comes
        // back under its key, and a list left unset adds nothing.
        const auto causeSpecs = codebook->definition(FramingFunction::Cause).attributes;
        REQUIRE(causeSpecs.size() == 2);
        REQUIRE(causeSpecs.front().type == AttributeSpec::Type::Text);
        QLineEdit *actor = nullptr;
        for (QLineEdit *e : onText.findChildren<QLineEdit *>())
            if (e->accessibleName() == causeSpecs.front().label)
                actor = e;
        REQUIRE(actor);
        actor->setText(QStringLiteral("the island council"));
        CHECK(onText.content().attributes
            == QJsonObject {{causeSpecs.front().key, QStringLiteral("the island council")}});
    }

    // A narrower range of another function, decided from that span.
    const TextRange narrower {span.content.range.start, span.content.range.start + 5};
    GoldCandidate c;
    c.content = span.content;
    c.content.function = FramingFunction::Remedy;
    c.content.attributes = {}; // the cause's attributes do not fit the remedy's schema
    c.content.range = narrower;
    c.sources = {span.id};
    const size_t goldBefore = f.project().goldAnnotations(article)->size();
    REQUIRE(w.decide(c));
    auto gold = f.project().goldAnnotations(article);
    REQUIRE(gold);
    REQUIRE(gold->size() == goldBefore + 1);
    const auto it =
        std::ranges::find(*gold, narrower, [](const GoldAnnotation &g) { return g.content.range; });
    REQUIRE(it != gold->end());
    CHECK(it->content.function == FramingFunction::Remedy);
    CHECK(it->quote == OffsetMap::slice(text->text, narrower));

    // An empty range is refused with a message in this window (not also on the desk, which
    // shows the session's errors), and nothing is pushed.
    const int steps = f.session->undoStack()->count();
    QSignalSpy deskErrors(f.session.get(), &CodingSession::errorOccurred);
    c.content.range = TextRange {narrower.start, narrower.start};
    CHECK_FALSE(w.decide(c));
    CHECK_FALSE(w.lastMessage().isEmpty());
    CHECK(f.session->undoStack()->count() == steps);
    CHECK(deskErrors.isEmpty());
}

TEST_CASE("a click in a coder's column makes the passage current and chooses that coder's spans")
{
    CompareFixture f;
    ComparisonWindow w(f.session.get());
    REQUIRE(w.passages().size() >= 2);
    // The last passage, in the column of the last coder who has a span in it.
    const int index = int(w.passages().size()) - 1;
    const Passage p = w.passages().back();
    const CoderId coder = p.coders.back();
    auto coders = compareArticle(f.project(), w.currentArticle());
    REQUIRE(coders);
    const auto column = std::ranges::find(coders->coders, coder) - coders->coders.begin();
    emit w.view()->passageClicked(index, int(column));
    CHECK(w.currentPassage() == index);
    const auto chosen = w.selectedSpans();
    REQUIRE_FALSE(chosen.empty());
    for (const Annotation &a : chosen)
        CHECK(a.coder == coder);
}

TEST_CASE("after a decision with a rationale the next key steps on and the queue keeps its order")
{
    CompareFixture f;
    ComparisonWindow w(f.session.get());
    activate(w);
    QLineEdit *rationale = w.findChild<QLineEdit *>();
    REQUIRE(rationale);
    const int first = w.currentPassage();
    const ArticleId article = w.currentArticle();
    std::vector<ArticleId> order;
    for (const ArticleDisagreement &row : w.queueModel()->rows())
        order.push_back(row.article.id);
    w.selectSpans({w.passages()[size_t(first)].spans.front().id});
    // The lead writes the rationale (Ctrl+L goes to the field) and accepts from the toolbar.
    QTest::keyClick(&w, Qt::Key_L, Qt::ControlModifier);
    REQUIRE(rationale->hasFocus());
    QTest::keyClicks(rationale, QStringLiteral("whole claim"));
    QAction *accept = nullptr;
    for (QAction *a : w.findChildren<QAction *>())
        if (a->text() == QStringLiteral("Accept"))
            accept = a;
    REQUIRE(accept);
    accept->trigger();
    CHECK(rationale->text().isEmpty());
    CHECK_FALSE(rationale->hasFocus());
    // N now steps to the next disagreement instead of typing into the rationale.
    QTest::keyClick(QApplication::focusWidget(), Qt::Key_N);
    CHECK(rationale->text().isEmpty());
    CHECK(w.currentPassage() != first);
    // The decided article stays where it was in the queue, and stays current.
    CHECK(w.currentArticle() == article);
    std::vector<ArticleId> after;
    for (const ArticleDisagreement &row : w.queueModel()->rows())
        after.push_back(row.article.id);
    CHECK(after == order);
}

TEST_CASE("the queue keeps its order through decisions until the lead re-sorts it")
{
    CompareFixture f;
    ComparisonWindow w(f.session.get());
    activate(w);
    const auto &rows = w.queueModel()->rows();
    REQUIRE(rows.size() >= 2);
    const ArticleId article = w.currentArticle();
    REQUIRE(article == rows.front().article.id);
    std::vector<ArticleId> order;
    for (const ArticleDisagreement &row : rows)
        order.push_back(row.article.id);
    // Decide the top article's disagreements one by one until it has fewer undecided ones than
    // the second row: sorted, it would no longer be first.
    const int below = rows[1].unresolved;
    int decisions = 0;
    while (rows.front().unresolved >= below && w.currentPassage() >= 0) {
        const Passage &p = w.passages()[size_t(w.currentPassage())];
        REQUIRE_FALSE(p.spans.empty());
        w.selectSpans({p.spans.front().id});
        REQUIRE(w.acceptSelected());
        ++decisions;
        // Each decision updates the row where it stands: same order, same article open.
        std::vector<ArticleId> now;
        for (const ArticleDisagreement &row : rows)
            now.push_back(row.article.id);
        CHECK(now == order);
        CHECK(w.currentArticle() == article);
        if (!w.nextDisagreement())
            break;
    }
    REQUIRE(decisions > 0);
    REQUIRE(rows.front().unresolved < below); // the queue is now out of its sort order
    CHECK(w.queueModel()->rowOf(article) == 0);

    // F5 (from the shortcut table) sorts it again by the rule of disagreementQueue
    // (disagreements.h: most undecided first, then most disagreements, then title); the article
    // stays open in its new row.
    QTest::keyClick(&w, Qt::Key_F5);
    REQUIRE(rows.size() == order.size());
    for (size_t i = 1; i < rows.size(); ++i)
        CHECK(std::tuple(
                  -rows[i - 1].unresolved, -rows[i - 1].disagreements, rows[i - 1].article.title)
            <= std::tuple(-rows[i].unresolved, -rows[i].disagreements, rows[i].article.title));
    CHECK(w.queueModel()->rowOf(article) > 0);
    CHECK(w.currentArticle() == article);
    // The same order as a queue computed afresh for the project.
    auto fresh = disagreementQueue(f.project());
    REQUIRE(fresh);
    REQUIRE(fresh->size() == rows.size());
    for (size_t i = 0; i < rows.size(); ++i)
        CHECK((*fresh)[i].article.id == rows[i].article.id);
}

TEST_CASE("the comparison window steps through articles with Ctrl keys and lists every key")
{
    CompareFixture f;
    ComparisonWindow w(f.session.get());
    activate(w);
    const auto &rows = w.queueModel()->rows();
    REQUIRE(rows.size() >= 2);
    REQUIRE(w.currentArticle() == rows[0].article.id);
    // Ctrl+PgDown / Ctrl+PgUp, as on the desk (common Linux window managers take Alt+arrows).
    QTest::keyClick(&w, Qt::Key_PageDown, Qt::ControlModifier);
    CHECK(w.currentArticle() == rows[1].article.id);
    QTest::keyClick(&w, Qt::Key_PageUp, Qt::ControlModifier);
    CHECK(w.currentArticle() == rows[0].article.id);
    // Alt+Down stays as a second key where the window manager leaves it alone.
    QTest::keyClick(&w, Qt::Key_Down, Qt::AltModifier);
    CHECK(w.currentArticle() == rows[1].article.id);

    // Every shortcut of every action of the window is in the table F1 shows, spelled the same.
    QStringList listed;
    for (const ShortcutRow &row : comparisonShortcuts())
        listed << row.keys.split(QStringLiteral(" or "));
    int withKeys = 0;
    for (QAction *a : w.actions())
        for (const QKeySequence &k : a->shortcuts()) {
            if (k.isEmpty())
                continue;
            ++withKeys;
            const QString keys = k.toString(QKeySequence::NativeText);
            INFO(a->text().toStdString() << " " << keys.toStdString());
            CHECK(listed.contains(keys));
        }
    CHECK(withKeys >= 16);
    // The hint under the rationale names the article keys of the table, not Alt alone.
    bool hinted = false;
    for (QLabel *label : w.findChildren<QLabel *>())
        if (label->text().startsWith(QStringLiteral("Keys:")))
            hinted = label->text().contains(
                CompareKeys::nextArticle().front().toString(QKeySequence::NativeText));
    CHECK(hinted);
}

TEST_CASE("a gold answer is decided in the window from the coders' answers, undone and redone")
{
    CompareFixture f;
    ComparisonWindow w(f.session.get());
    activate(w);
    // hb-01: C01 and C02 answer "problem", C03 "cause" (sample-project/codings.jsonl).
    auto id = f.project().articleByExternalId(QStringLiteral("hb-01"));
    REQUIRE(id);
    REQUIRE(id->has_value());
    const ArticleId article = **id;
    REQUIRE(w.openArticle(article));
    AnswerPanel *panel = w.answerPanel();
    REQUIRE(panel);
    const QString item = QStringLiteral("dominant_function");
    REQUIRE(panel->rows().size() == f.session->codebook().items.size());
    const auto row = [&] {
        const auto it = std::ranges::find(panel->rows(), item, &AnswerPanel::Row::item);
        REQUIRE(it != panel->rows().end());
        return *it;
    };
    // Every coder's answer side by side, by pseudonym, as the project holds them.
    const QStringList names = panel->coderNames();
    CHECK(
        names == QStringList {QStringLiteral("C01"), QStringLiteral("C02"), QStringLiteral("C03")});
    auto answers = f.project().judgements(article);
    REQUIRE(answers);
    for (qsizetype c = 0; c < names.size(); ++c) {
        auto coder = f.project().coderByPseudonym(names[c]);
        REQUIRE((coder && *coder));
        const auto it = std::ranges::find_if(*answers,
            [&](const Judgement &j) { return j.coder == (*coder)->id && j.itemKey == item; });
        REQUIRE(it != answers->end());
        CHECK(row().answers[size_t(c)] == it->value);
    }
    CHECK(row().answers
        == std::vector<QString> {
            QStringLiteral("problem"), QStringLiteral("problem"), QStringLiteral("cause")});
    CHECK(row().agreement == AnswerPanel::Agreement::Differ);
    CHECK(row().gold.isEmpty());
    // The coders' answers are offered first, then the rest of the item's value set.
    CHECK(panel->offeredValues()
        == QStringList {QStringLiteral("problem"), QStringLiteral("cause"),
            QStringLiteral("evaluation"), QStringLiteral("remedy"), QStringLiteral("none")});
    const QString before = f.dump();
    const QString raw = f.rawDump();
    QUndoStack *undo = f.session->undoStack();
    const int steps = undo->count();
    // The lead takes C03's answer, with a rationale, through the panel's button.
    REQUIRE(panel->setChosenValue(QStringLiteral("cause")));
    panel->setRationale(QStringLiteral("The headline and the lead name the cause."));
    QPushButton *decide = nullptr;
    for (QPushButton *b : panel->findChildren<QPushButton *>())
        if (b->text().contains(QStringLiteral("Decide")))
            decide = b;
    REQUIRE(decide);
    REQUIRE(decide->isEnabled());
    QTest::mouseClick(decide, Qt::LeftButton);
    CHECK(undo->count() == steps + 1);
    auto gold = f.project().goldJudgements(article);
    REQUIRE(gold);
    REQUIRE(gold->size() == 1);
    const GoldJudgement first = gold->front();
    CHECK(first.itemKey == item);
    CHECK(first.value == QStringLiteral("cause"));
    CHECK(first.rationale == QStringLiteral("The headline and the lead name the cause."));
    CHECK(first.decidedBy == f.session->coder().id);
    CHECK(row().gold == QStringLiteral("cause"));
    CHECK(panel->rationale().isEmpty());
    // Pseudonyms only: no person's name in any label, table cell or header of the window, the
    // gold answer's "decided by" included.
    QStringList shown;
    for (const QLabel *label : w.findChildren<QLabel *>())
        shown << label->text();
    for (const QTreeWidget *tree : w.findChildren<QTreeWidget *>())
        for (int c = 0; c < tree->columnCount(); ++c) {
            shown << tree->headerItem()->text(c);
            for (int i = 0; i < tree->topLevelItemCount(); ++i)
                shown << tree->topLevelItem(i)->text(c) << tree->topLevelItem(i)->toolTip(c);
        }
    auto people = f.project().coders();
    REQUIRE(people);
    for (const Coder &c : *people)
        CHECK_FALSE(shown.join(QLatin1Char('\n')).contains(c.name));

    // The coders' answers and everything else but gold answers are untouched.
    CHECK(f.rawDump() == raw);
    const QString decided = f.dump();
    CHECK(decided != before);

    // Undo removes it, row for row; redo writes the same row again.
    undo->undo();
    CHECK(f.dump() == before);
    CHECK(f.project().goldJudgements(article)->empty());
    CHECK(row().gold.isEmpty());
    undo->redo();
    CHECK(f.dump() == decided);
    CHECK(row().gold == QStringLiteral("cause"));

    // A second decision (a value no coder gave) replaces the first; its undo brings it back.
    REQUIRE(w.decideAnswer(item, QStringLiteral("evaluation"), {}));
    gold = f.project().goldJudgements(article);
    REQUIRE(gold->size() == 1);
    CHECK(gold->front().value == QStringLiteral("evaluation"));
    CHECK(row().gold == QStringLiteral("evaluation"));
    undo->undo();
    CHECK(f.dump() == decided);
    CHECK(row().gold == QStringLiteral("cause"));

    // A look at the window with the answers (tests run offscreen: the grab is as drawn).
    const QString shot = qEnvironmentVariable("FOURFOLD_GOLD_ANSWER_SHOT");
    if (!shot.isEmpty())
        CHECK(w.grab().save(shot));

    // Withdrawing is one more undoable step.
    REQUIRE(w.withdrawGoldAnswer(first.id));
    CHECK(f.project().goldJudgements(article)->empty());
    undo->undo();
    CHECK(f.dump() == decided);
}
