// Gold answers: a lead adjudicates the answer to an article-level item (core/project/
// gold_answer_edits). Undo and redo are checked on the whole file (every table but the event log).
#include "core/project/annotation_edits.h"
#include "core/project/gold_answer_edits.h"
#include "core/project/testing/project_database.h"
#include "core/store/gold_judgement_table.h"
#include "project_fixture.h"
#include "tests/support/db_dump.h"

using namespace fourfold;
using namespace fourfold::test;

namespace {

const QString kItem = QStringLiteral("dominant_function");

struct GoldAnswerFixture : ProjectFixture {
    ArticleId f1, f2;
    CoderId c1, c2, lead;
    GoldAnswerFixture()
    {
        importJsonl(kTwoArticles);
        f1 = articleId(QStringLiteral("f1"));
        f2 = articleId(QStringLiteral("f2"));
        c1 = addCoder(QStringLiteral("C01"));
        c2 = addCoder(QStringLiteral("C02"));
        lead = addCoder(QStringLiteral("L01"), CoderRole::Lead);
        // The coders disagree on the dominant function of f1.
        SetJudgementEdit a(f1, c1, kItem, QStringLiteral("problem"));
        REQUIRE(project.apply(a));
        SetJudgementEdit b(f1, c2, kItem, QStringLiteral("cause"));
        REQUIRE(project.apply(b));
    }
    QString dump() { return dumpDatabase(databaseForTesting(project)); }
    // Every table but gold answers and the event log: the coders' work and everything else.
    QString rawDump()
    {
        return dumpDatabase(databaseForTesting(project),
            {QStringLiteral("event_log"), QStringLiteral("gold_judgement")});
    }
};

} // namespace

TEST_CASE("a lead's gold answer is stored with rationale and undone and redone row for row")
{
    GoldAnswerFixture f;
    const QString before = f.dump();
    const QString raw = f.rawDump();
    AdjudicateAnswerEdit edit(f.f1, f.lead, kItem, QStringLiteral("cause"),
        QStringLiteral("The budget cut is what the article is about."));
    REQUIRE(f.project.apply(edit));
    auto gold = f.project.goldJudgements(f.f1);
    REQUIRE(gold);
    REQUIRE(gold->size() == 1);
    const GoldJudgement &g = gold->front();
    CHECK(g.id == edit.goldAnswerId());
    CHECK(g.article == f.f1);
    CHECK(g.itemKey == kItem);
    CHECK(g.value == QStringLiteral("cause"));
    CHECK(g.decidedBy == f.lead);
    CHECK(g.rationale == QStringLiteral("The budget cut is what the article is about."));
    CHECK_FALSE(g.deleted);
    CHECK_FALSE(edit.replaced());
    // Nothing on the other article, and the whole project's list holds the one answer.
    CHECK(f.project.goldJudgements(f.f2)->empty());
    CHECK(f.project.goldJudgements()->size() == 1);
    // The coders' answers are exactly as they were.
    CHECK(f.rawDump() == raw);
    const QString after = f.dump();
    CHECK(after != before);

    REQUIRE(f.project.revert(edit));
    CHECK(f.dump() == before);
    CHECK(f.project.goldJudgements(f.f1)->empty());
    REQUIRE(f.project.apply(edit)); // redo: the same row, uuid and time
    CHECK(f.dump() == after);
}

TEST_CASE("a second gold answer to the same item replaces the first and its undo brings it back")
{
    GoldAnswerFixture f;
    AdjudicateAnswerEdit first(f.f1, f.lead, kItem, QStringLiteral("problem"), {});
    REQUIRE(f.project.apply(first));
    const QString afterFirst = f.dump();
    AdjudicateAnswerEdit second(
        f.f1, f.lead, kItem, QStringLiteral("cause"), QStringLiteral("Second look."));
    REQUIRE(f.project.apply(second));
    REQUIRE(second.replaced() == first.goldAnswerId());
    auto gold = f.project.goldJudgements(f.f1);
    REQUIRE(gold);
    REQUIRE(gold->size() == 1);
    CHECK(gold->front().value == QStringLiteral("cause"));
    CHECK(gold->front().id == second.goldAnswerId());
    // The first is kept as a tombstone with its value, not overwritten.
    auto firstRow = store::goldJudgement(databaseForTesting(f.project), first.goldAnswerId());
    REQUIRE(firstRow);
    CHECK(firstRow->deleted);
    CHECK(firstRow->value == QStringLiteral("problem"));
    CHECK(firstRow->uuid == first.objectUuid());
    CHECK(second.objectUuid() != first.objectUuid());
    const QString afterSecond = f.dump();

    REQUIRE(f.project.revert(second));
    CHECK(f.dump() == afterFirst);
    gold = f.project.goldJudgements(f.f1);
    REQUIRE(gold->size() == 1);
    CHECK(gold->front().value == QStringLiteral("problem"));
    REQUIRE(f.project.apply(second));
    CHECK(f.dump() == afterSecond);

    // Another item's or another article's gold answer is not touched by the replacement.
    AdjudicateAnswerEdit other(f.f2, f.lead, kItem, QStringLiteral("none"), {});
    REQUIRE(f.project.apply(other));
    CHECK(f.project.goldJudgements(f.f1)->front().value == QStringLiteral("cause"));
    CHECK(f.project.goldJudgements()->size() == 2);
}

TEST_CASE("a gold answer is withdrawn and restored and cannot be withdrawn twice")
{
    GoldAnswerFixture f;
    AdjudicateAnswerEdit edit(f.f1, f.lead, kItem, QStringLiteral("problem"), {});
    REQUIRE(f.project.apply(edit));
    const QString decided = f.dump();
    WithdrawGoldAnswerEdit withdraw(edit.goldAnswerId(), f.lead);
    REQUIRE(f.project.apply(withdraw));
    CHECK(withdraw.objectUuid() == edit.objectUuid());
    CHECK(f.project.goldJudgements(f.f1)->empty());
    const QString withdrawn = f.dump();
    WithdrawGoldAnswerEdit again(edit.goldAnswerId(), f.lead);
    auto st = f.project.apply(again);
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::NotFound);
    CHECK(f.dump() == withdrawn);
    REQUIRE(f.project.revert(withdraw));
    CHECK(f.dump() == decided);
    REQUIRE(f.project.apply(withdraw));
    CHECK(f.dump() == withdrawn);
}

TEST_CASE("only a lead adjudicates answers and only with a value of the item")
{
    GoldAnswerFixture f;
    const QString before = f.dump();
    AdjudicateAnswerEdit byCoder(f.f1, f.c1, kItem, QStringLiteral("problem"), {});
    auto st = f.project.apply(byCoder);
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::InvalidArgument);
    CHECK(st.error().message.contains(QStringLiteral("lead")));

    // The default codebook's dominant_function takes problem, cause, evaluation, remedy, none.
    AdjudicateAnswerEdit outside(f.f1, f.lead, kItem, QStringLiteral("conflict"), {});
    st = f.project.apply(outside);
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::InvalidInput);
    AdjudicateAnswerEdit unknownItem(
        f.f1, f.lead, QStringLiteral("tone"), QStringLiteral("problem"), {});
    st = f.project.apply(unknownItem);
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::NotFound);
    AdjudicateAnswerEdit noArticle(ArticleId {999}, f.lead, kItem, QStringLiteral("cause"), {});
    st = f.project.apply(noArticle);
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::NotFound);

    // A coder cannot withdraw a lead's gold answer either.
    AdjudicateAnswerEdit edit(f.f1, f.lead, kItem, QStringLiteral("problem"), {});
    REQUIRE(f.project.apply(edit));
    const QString decided = f.dump();
    WithdrawGoldAnswerEdit withdraw(edit.goldAnswerId(), f.c2);
    st = f.project.apply(withdraw);
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::InvalidArgument);
    CHECK(f.dump() == decided);
    REQUIRE(f.project.revert(edit));
    CHECK(f.dump() == before);
}
