// Assignment plans (core/project/assignment_plans): dealing the rest and the phase a new coding
// takes.
#include "core/project/annotation_edits.h"
#include "core/project/article_status_edit.h"
#include "core/project/assignment_plans.h"
#include "core/project/subsample_draw.h"
#include "core/project/testing/project_database.h"
#include "tests/project/study_fixture.h"
#include "tests/support/db_dump.h"

#include <map>
#include <set>

using namespace fourfold;
using namespace fourfold::test;

TEST_CASE("the rest is dealt evenly, single- or double-coded with rotating pairs")
{
    StudyFixture f;
    DrawRequest request;
    request.size = 8;
    request.coders = {QStringLiteral("C01"), QStringLiteral("C02"), QStringLiteral("C03")};
    auto d = SubsampleDraw::plan(f.project, request);
    REQUIRE(d);
    REQUIRE(SubsampleDraw::commit(f.project, *d));

    RestRequest single {RestCoding::Single,
        {QStringLiteral("C01"), QStringLiteral("C02"), QStringLiteral("C03"),
            QStringLiteral("C04")},
        42};
    auto plan = AssignmentPlans::planRest(f.project, single);
    REQUIRE(plan);
    CHECK(plan->rows.size() == 12); // 20 − 8 drawn, once each
    std::map<QString, int> load;
    std::set<QString> articles;
    for (const PlannedAssignment &r : plan->rows) {
        ++load[r.coder];
        articles.insert(r.article);
        CHECK_FALSE(d->articles.contains(r.article));
        CHECK(r.phase == Phase::Production);
    }
    CHECK(articles.size() == 12);
    for (const auto &[coder, n] : load)
        CHECK(n == 3);
    auto again = AssignmentPlans::planRest(f.project, single);
    REQUIRE(again);
    for (std::size_t i = 0; i < plan->rows.size(); ++i)
        CHECK(again->rows[i].article == plan->rows[i].article); // reproducible from the seed

    RestRequest twice = single;
    twice.coding = RestCoding::Double;
    plan = AssignmentPlans::planRest(f.project, twice);
    REQUIRE(plan);
    REQUIRE(plan->rows.size() == 24);
    load.clear();
    std::map<std::pair<QString, QString>, int> pairs;
    for (std::size_t i = 0; i < plan->rows.size(); i += 2) {
        CHECK(plan->rows[i].article == plan->rows[i + 1].article);
        CHECK(plan->rows[i].coder != plan->rows[i + 1].coder);
        ++load[plan->rows[i].coder];
        ++load[plan->rows[i + 1].coder];
        ++pairs[{plan->rows[i].coder, plan->rows[i + 1].coder}];
    }
    // 12 articles over the 6 pairs of 4 coders: each pair twice, each coder 6 articles.
    CHECK(pairs.size() == 6);
    for (const auto &[pair, n] : pairs)
        CHECK(n == 2);
    for (const auto &[coder, n] : load)
        CHECK(n == 6);
    REQUIRE(AssignmentPlans::commit(f.project, *plan));
    auto none = AssignmentPlans::planRest(f.project, twice);
    REQUIRE(none);
    CHECK(none->rows.empty());

    twice.coders = {QStringLiteral("C01")};
    CHECK(AssignmentPlans::planRest(f.project, twice).error().code == ErrorCode::InvalidArgument);
}

TEST_CASE("new annotations and answers take the phase of the coder's assignment")
{
    StudyFixture f;
    const CoderId c1 = f.coder("C01");
    auto plan = AssignmentPlans::planArticles(
        f.project, Phase::Reliability, {QStringLiteral("a01")}, {QStringLiteral("C01")});
    REQUIRE(plan);
    REQUIRE(AssignmentPlans::commit(f.project, *plan));
    const ArticleId a1 = f.articleId(QStringLiteral("a01"));
    AddAnnotationEdit add(a1, c1, AnnotationContent {FramingFunction::Problem, {0, 5}, {}, {}, {}});
    REQUIRE(f.project.apply(add));
    auto stored = f.project.annotation(add.annotationId());
    REQUIRE(stored);
    CHECK(stored->phase == Phase::Reliability);
    auto book = f.project.codebook();
    REQUIRE(book);
    CHECK(stored->codebookVersion == book->versionId);

    // No assignment: the phase asked for.
    const ArticleId a2 = f.articleId(QStringLiteral("a02"));
    AddAnnotationEdit unassigned(
        a2, c1, AnnotationContent {FramingFunction::Cause, {0, 5}, {}, {}, {}});
    REQUIRE(f.project.apply(unassigned));
    CHECK(f.project.annotation(unassigned.annotationId())->phase == Phase::Production);

    // Training done, production open: new spans belong to production, even when the front end
    // asks for training; once everything is done, a phase the coder was assigned is kept, any
    // other becomes the last finished one.
    const ArticleId a3 = f.articleId(QStringLiteral("a03"));
    REQUIRE(f.project.assign(a3, c1, Phase::Training));
    SetArticleStatusEdit done(a3, c1, QStringLiteral("done"));
    REQUIRE(f.project.apply(done));
    REQUIRE(f.project.assign(a3, c1, Phase::Production));
    const auto phaseOfNew = [&](Phase requested, int start) {
        AddAnnotationEdit e(a3, c1,
            AnnotationContent {FramingFunction::Remedy, {start, start + 3}, {}, {}, {}}, requested);
        REQUIRE(f.project.apply(e));
        return f.project.annotation(e.annotationId())->phase;
    };
    CHECK(phaseOfNew(Phase::Production, 0) == Phase::Production);
    CHECK(phaseOfNew(Phase::Training, 4) == Phase::Production);
    SetArticleStatusEdit allDone(a3, c1, QStringLiteral("done"));
    REQUIRE(f.project.apply(allDone));
    CHECK(phaseOfNew(Phase::Training, 8) == Phase::Training);
    CHECK(phaseOfNew(Phase::Pilot, 12) == Phase::Production);

    SetJudgementEdit answer(a1, c1, QStringLiteral("dominant_function"), QStringLiteral("problem"));
    REQUIRE(f.project.apply(answer));
    auto answers = f.project.judgements(a1);
    REQUIRE(answers);
    REQUIRE(answers->size() == 1);
    CHECK(answers->front().phase == Phase::Reliability);
}
