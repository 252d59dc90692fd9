// What one adjudication costs the project file: the comparison window keeps the open article in
// the session's comparison document and reads again only what a decision touched, so accepting a
// span, rejecting one, deciding an answer and undoing each run a handful of statements, the same
// number whether the article holds few spans or many and the project few articles or many.
// Statements are counted on the project's connection (Database::statementsRun, as the desk's
// key-press test does).
#include "app/desktop/coding_session.h"
#include "app/desktop/compare/comparison_window.h"
#include "app/desktop/compare/disagreement_queue_model.h"
#include "core/project/annotation_edits.h"
#include "core/project/testing/project_database.h"
#include "core/store/database.h"
#include "tests/project/project_fixture.h"
#include "tests/support/test_support.h"

#include <QUndoStack>

#include <array>

using namespace fourfold;
using namespace fourfold::test;

namespace {

// `articles` invented articles; the first has `sentences` sentences, the others two. Coders C01
// and C02 each mark every sentence of every article and mark the articles done: C01 always as the
// problem, C02 as the problem on even sentences and as the cause on odd ones, so every odd
// sentence is a disagreement on the function. The lead L01 decides.
struct AdjudicationStudy : ProjectFixture {
    ArticleId first;
    CoderId c01;
    CoderId c02;

    AdjudicationStudy(int articles, int sentences)
    {
        QByteArray jsonl;
        for (int a = 1; a <= articles; ++a)
            jsonl += QStringLiteral("{\"id\":\"q%1\",\"title\":\"Quay %1\",\"language\":\"en\","
                                    "\"text\":\"%2\"}\n")
                         .arg(a)
                         .arg(text(a, a == 1 ? sentences : 2))
                         .toUtf8();
        importJsonl(jsonl);
        c01 = addCoder(QStringLiteral("C01"));
        c02 = addCoder(QStringLiteral("C02"));
        addCoder(QStringLiteral("L01"), CoderRole::Lead);
        first = articleId(QStringLiteral("q1"));
        for (int a = 1; a <= articles; ++a) {
            const ArticleId id = articleId(QStringLiteral("q%1").arg(a));
            for (int s = 0; s < (a == 1 ? sentences : 2); ++s) {
                span(id, c01, FramingFunction::Problem, s);
                span(id, c02, s % 2 == 0 ? FramingFunction::Problem : FramingFunction::Cause, s);
            }
            markDone(project, id, c01);
            markDone(project, id, c02);
        }
    }

    // Sentence i starts at i * kLength: every sentence has kLength - 1 characters and a space
    // after it; articles differ in the quay's letter (an import passes over a repeated text).
    static constexpr qint64 kLength = 40;
    static QString text(int article, int sentences)
    {
        QStringList out;
        for (int s = 0; s < sentences; ++s) {
            out << QStringLiteral("The toll at quay %1 keeps all boats off.")
                       .arg(QChar(QLatin1Char('A' + article % 26)));
            REQUIRE(out.back().size() == kLength - 1);
        }
        return out.join(QLatin1Char(' '));
    }

    void span(ArticleId article, CoderId coder, FramingFunction f, int sentence)
    {
        const TextRange range {sentence * kLength, sentence * kLength + kLength - 1};
        AddAnnotationEdit edit(article, coder, AnnotationContent {f, range, {}, {}, {}});
        REQUIRE(project.apply(edit));
    }
};

// Statements run and result rows read by one action.
struct Cost {
    qint64 statements = 0;
    qint64 rows = 0;
    bool operator==(const Cost &) const = default;
};

struct Costs {
    Cost accept;
    Cost reject;
    Cost answer;
    Cost undo;
    Cost redo;
};

std::ostream &operator<<(std::ostream &os, const Cost &c)
{
    return os << c.statements << " statements, " << c.rows << " rows";
}

Costs adjudicationCosts(int articles, int sentences)
{
    AdjudicationStudy study(articles, sentences);
    auto lead = study.project.coderByPseudonym(QStringLiteral("L01"));
    REQUIRE(lead);
    REQUIRE(lead->has_value());
    const ArticleId article = study.first;
    CodingSession session(std::move(study.project), **lead);
    ComparisonWindow w(&session);
    REQUIRE(w.queueModel()->rowCount() == articles);
    REQUIRE(w.openArticle(article));
    REQUIRE(int(w.passages().size()) == sentences);
    Database &db = databaseForTesting(session.project());
    const auto costOf = [&](const auto &action) {
        const Cost before {db.statementsRun(), db.rowsRead()};
        action();
        return Cost {db.statementsRun() - before.statements, db.rowsRead() - before.rows};
    };
    Costs costs;

    // Accept C01's span of the second sentence (a disagreement on the function) into gold.
    w.setCurrentPassage(1);
    const Passage second = w.passages()[1];
    REQUIRE(second.has(DisagreementKind::Function));
    REQUIRE(second.spans.size() == 2);
    const auto byC01 = std::ranges::find(second.spans, study.c01, &Annotation::coder);
    REQUIRE(byC01 != second.spans.end());
    // Choosing spans shows them in the columns from the document: no read at all.
    CHECK(costOf([&] { w.selectSpans({byC01->id}); }) == Cost {});
    costs.accept = costOf([&] { REQUIRE(w.acceptSelected()); });
    CHECK(w.passages()[1].isResolved());
    auto gold = session.project().goldAnnotations(article);
    REQUIRE(gold);
    REQUIRE(gold->size() == 1);
    CHECK(gold->front().sources == std::vector<AnnotationId> {byC01->id});
    // The queue's row of the article counts one undecided disagreement less.
    const int row = w.queueModel()->rowOf(article);
    REQUIRE(row >= 0);
    CHECK(w.queueModel()->rows()[size_t(row)].unresolved == sentences / 2 - 1);
    // What the window shows from its document is what the project file says (core's
    // compareArticle and articleDisagreement, which read it).
    const auto stored = compareArticle(session.project(), article);
    REQUIRE(stored);
    REQUIRE(stored->passages.size() == w.passages().size());
    for (size_t i = 0; i < w.passages().size(); ++i) {
        CHECK(w.passages()[i].range == stored->passages[i].range);
        CHECK(w.passages()[i].kinds == stored->passages[i].kinds);
        CHECK(w.passages()[i].isResolved() == stored->passages[i].isResolved());
    }
    const auto storedRow =
        articleDisagreement(session.project(), w.queueModel()->rows()[size_t(row)]);
    REQUIRE(storedRow);
    CHECK(storedRow->unresolved == w.queueModel()->rows()[size_t(row)].unresolved);
    CHECK(storedRow->agreedOpen == w.queueModel()->rows()[size_t(row)].agreedOpen);

    // Reject both spans of the fourth sentence.
    w.setCurrentPassage(3);
    const Passage fourth = w.passages()[3];
    REQUIRE(fourth.has(DisagreementKind::Function));
    w.selectSpans({fourth.spans[0].id, fourth.spans[1].id});
    costs.reject = costOf([&] { REQUIRE(w.rejectSelected()); });
    CHECK(w.passages()[3].isResolved());
    CHECK(session.project().goldRejections(article)->size() == 2);
    CHECK(w.queueModel()->rows()[size_t(row)].unresolved == sentences / 2 - 2);

    // Decide the gold answer of the dominant function (an item of the default codebook).
    costs.answer = costOf([&] {
        REQUIRE(w.decideAnswer(QStringLiteral("dominant_function"), QStringLiteral("problem"), {}));
    });
    auto answers = session.project().goldJudgements(article);
    REQUIRE(answers);
    REQUIRE(answers->size() == 1);
    CHECK(answers->front().value == QStringLiteral("problem"));

    // Undo and redo the rejection (the answer first).
    QUndoStack *undo = session.undoStack();
    undo->undo();
    CHECK(session.project().goldJudgements(article)->empty());
    costs.undo = costOf([&] { undo->undo(); });
    CHECK(session.project().goldRejections(article)->empty());
    CHECK_FALSE(w.passages()[3].isResolved());
    CHECK(w.queueModel()->rows()[size_t(row)].unresolved == sentences / 2 - 1);
    costs.redo = costOf([&] { undo->redo(); });
    CHECK(w.passages()[3].isResolved());
    CHECK(w.queueModel()->rows()[size_t(row)].unresolved == sentences / 2 - 2);
    return costs;
}

} // namespace

TEST_CASE("one adjudication runs the same few statements for a small and a large study")
{
    const Costs small = adjudicationCosts(3, 4);
    const Costs large = adjudicationCosts(12, 24);
    // Measured before the comparison document (every decision read the article again whole):
    // accept 27 statements, reject 27, answer 25, undo 23, redo 27, with rows growing with the
    // article's spans. Now the edit's own statements and one read of the part it touched.
    INFO("accept " << small.accept << " / " << large.accept);
    INFO("reject " << small.reject << " / " << large.reject);
    INFO("answer " << small.answer << " / " << large.answer);
    INFO("undo " << small.undo << " / " << large.undo);
    INFO("redo " << small.redo << " / " << large.redo);
    // Neither statements nor rows grow with the article's spans or the project's articles.
    CHECK(large.accept == small.accept);
    CHECK(large.reject == small.reject);
    CHECK(large.answer == small.answer);
    CHECK(large.undo == small.undo);
    CHECK(large.redo == small.redo);
    CHECK(small.accept.statements > 0);
    CHECK(small.accept.statements <= 10);
    CHECK(small.reject.statements <= 10);
    CHECK(small.answer.statements <= 8);
    CHECK(small.undo.statements <= 6);
    CHECK(small.redo.statements <= 10);
}
