// The study design's writes as edits (core/project/study_edits): a draw, a plan and the effort
// setting each undo to the same database dump and redo to the same rows (times blanked: the
// assignments' created_at is the redo's), through Project::apply as the CLI and the desk do.
#include "core/project/annotation_edits.h"
#include "core/project/assignment_plans.h"
#include "core/project/study_edits.h"
#include "core/project/study_progress.h"
#include "core/project/subsample_draw.h"
#include "core/project/testing/project_database.h"
#include "core/store/project_tables.h"
#include "tests/project/study_fixture.h"
#include "tests/support/db_dump.h"

#include <QRegularExpression>

using namespace fourfold;
using namespace fourfold::test;

namespace {

struct StudyEditFixture : ProjectFixture {
    StudyEditFixture()
    {
        importJsonl(twentyArticles());
        for (const char *p : {"C01", "C02", "C03"})
            addCoder(QString::fromLatin1(p));
        lead = addCoder(QStringLiteral("L01"), CoderRole::Lead);
    }
    QString dump() { return dumpDatabase(databaseForTesting(project)); }
    // The event log too (left out of dump(): undo appends to it).
    QString log() { return dumpDatabase(databaseForTesting(project), {}); }
    CoderId lead;
};

} // namespace

TEST_CASE("a draw is one edit: undo restores the full dump and redo the same rows")
{
    StudyEditFixture f;
    DrawRequest request;
    request.size = 5;
    request.seed = 11;
    request.coders = {QStringLiteral("C01"), QStringLiteral("C02")};
    auto draw = SubsampleDraw::plan(f.project, request);
    REQUIRE(draw);
    const QString before = f.dump();

    auto edit = SubsampleDraw::edit(f.project, *draw, f.lead);
    REQUIRE(edit);
    CHECK_FALSE(draw->drawnAt.isEmpty());
    CHECK((*edit)->rows().size() == 10); // 5 articles × 2 coders
    REQUIRE(f.project.apply(**edit));
    auto rows = AssignmentPlans::rows(f.project, Phase::Reliability);
    REQUIRE(rows);
    CHECK(rows->size() == 10);
    auto recorded = SubsampleDraw::recorded(f.project, Phase::Reliability);
    REQUIRE(recorded);
    REQUIRE(recorded->has_value());
    CHECK((*recorded)->articles == draw->articles);
    CHECK((*recorded)->drawnAt == draw->drawnAt);
    // The log holds one event per assignment and the edit with the draw's record.
    const QString log = f.log();
    CHECK(log.count(QStringLiteral("assignment.add")) == 10);
    CHECK(log.count(QStringLiteral("assignment.plan")) == 1);
    CHECK(log.contains(QStringLiteral("\"drawn_at\"")));
    const QString applied = f.dump();

    REQUIRE(f.project.revert(**edit));
    CHECK(f.dump() == before);
    recorded = SubsampleDraw::recorded(f.project, Phase::Reliability);
    REQUIRE(recorded);
    CHECK_FALSE(recorded->has_value());

    REQUIRE(f.project.apply(**edit));
    CHECK(withoutTimes(f.dump()) == withoutTimes(applied));
    REQUIRE(f.project.revert(**edit));
    CHECK(f.dump() == before);
}

TEST_CASE("a draw edit made before another draw was recorded is refused and writes nothing")
{
    StudyEditFixture f;
    DrawRequest request;
    request.size = 3;
    request.coders = {QStringLiteral("C01"), QStringLiteral("C02")};
    auto first = SubsampleDraw::plan(f.project, request);
    REQUIRE(first);
    auto second = *first;
    auto late = SubsampleDraw::edit(f.project, second, f.lead);
    REQUIRE(late);
    REQUIRE(SubsampleDraw::commit(f.project, *first));
    const QString before = f.dump();
    const Status refused = f.project.apply(**late);
    REQUIRE_FALSE(refused);
    CHECK(refused.error().code == ErrorCode::Duplicate);
    CHECK(f.dump() == before);
}

TEST_CASE("dealing the rest is one edit that undo takes back whole")
{
    StudyEditFixture f;
    auto plan = AssignmentPlans::planRest(f.project,
        RestRequest {RestCoding::Double,
            {QStringLiteral("C01"), QStringLiteral("C02"), QStringLiteral("C03")}, 7});
    REQUIRE(plan);
    REQUIRE(plan->rows.size() == 40); // 20 articles, two coders each
    const QString before = f.dump();
    auto edit = AssignmentPlans::edit(f.project, *plan, {}, f.lead);
    REQUIRE(edit);
    CHECK((*edit)->text() == QStringLiteral("Assign 40 article(s)"));
    REQUIRE(f.project.apply(**edit));
    auto rows = AssignmentPlans::rows(f.project, Phase::Production);
    REQUIRE(rows);
    CHECK(rows->size() == 40);
    const QString applied = f.dump();
    REQUIRE(f.project.revert(**edit));
    CHECK(f.dump() == before);
    REQUIRE(f.project.apply(**edit));
    CHECK(withoutTimes(f.dump()) == withoutTimes(applied));

    // A plan whose assignments exist already is refused before anything is written.
    auto again = AssignmentPlans::edit(f.project, *plan);
    REQUIRE_FALSE(again);
    CHECK(again.error().code == ErrorCode::Duplicate);
}

TEST_CASE("assignments someone started coding are not undone and nothing changes")
{
    StudyEditFixture f;
    AssignmentPlan plan;
    plan.rows = {{QStringLiteral("a01"), QStringLiteral("C01"), Phase::Production},
        {QStringLiteral("a02"), QStringLiteral("C01"), Phase::Production},
        {QStringLiteral("a02"), QStringLiteral("C02"), Phase::Production}};
    auto edit = AssignmentPlans::edit(f.project, plan, {}, f.lead);
    REQUIRE(edit);
    REQUIRE(f.project.apply(**edit));
    // C01 marks a span on a02: that assignment has work now.
    auto a02 = f.project.articleByExternalId(QStringLiteral("a02"));
    REQUIRE(a02);
    REQUIRE(a02->has_value());
    auto c01 = f.project.coderByPseudonym(QStringLiteral("C01"));
    REQUIRE(c01);
    REQUIRE(c01->has_value());
    AddAnnotationEdit span(**a02, (*c01)->id,
        AnnotationContent {FramingFunction::Problem, {0, 5}, {}, {}, {}}, Phase::Production);
    REQUIRE(f.project.apply(span));
    const QString before = f.dump();
    const Status refused = f.project.revert(**edit);
    REQUIRE_FALSE(refused);
    CHECK(refused.error().code == ErrorCode::NotAllowed);
    CHECK(refused.error().message.contains(QStringLiteral("1 of its 3 assignments")));
    CHECK(f.dump() == before);
    // Once the span is undone, the plan is undone whole.
    REQUIRE(f.project.revert(span));
    REQUIRE(f.project.revert(**edit));
    CHECK(AssignmentPlans::rows(f.project, Phase::Production)->empty());
}

TEST_CASE("the effort setting is one edit: undo restores the value before or its absence")
{
    StudyEditFixture f;
    const QString before = f.dump();
    auto on = StudyProgress::effortEdit(true, f.lead);
    REQUIRE(f.project.apply(*on));
    CHECK(*StudyProgress::effortPerCoderVisible(f.project));
    const QString turnedOn = f.dump();
    auto off = StudyProgress::effortEdit(false, f.lead);
    REQUIRE(f.project.apply(*off));
    CHECK_FALSE(*StudyProgress::effortPerCoderVisible(f.project));
    REQUIRE(f.project.revert(*off));
    CHECK(f.dump() == turnedOn);
    REQUIRE(f.project.revert(*on));
    CHECK(f.dump() == before);
    CHECK(f.log().count(QStringLiteral("setting.effort_per_coder")) == 4); // 2 applied, 2 undone
}

namespace {

// The draw of five articles for C01 and C02 (seed 11), committed by the lead.
Draw commitFiveByTwo(StudyEditFixture &f)
{
    DrawRequest request;
    request.size = 5;
    request.seed = 11;
    request.coders = {QStringLiteral("C01"), QStringLiteral("C02")};
    auto draw = SubsampleDraw::plan(f.project, request);
    REQUIRE(draw);
    auto edit = SubsampleDraw::edit(f.project, *draw, f.lead);
    REQUIRE(edit);
    REQUIRE(f.project.apply(**edit));
    return *draw;
}

} // namespace

TEST_CASE("a draw nobody coded is withdrawn: its assignments are tombstones and the log says so")
{
    StudyEditFixture f;
    const QString beforeDraw = f.dump();
    const Draw draw = commitFiveByTwo(f);
    const QString drawn = f.dump();

    auto edit = SubsampleDraw::withdrawEdit(f.project, Phase::Reliability, f.lead);
    REQUIRE(edit);
    CHECK((*edit)->text() == QStringLiteral("Withdraw the reliability subsample"));
    REQUIRE(f.project.apply(**edit));
    CHECK((*edit)->withdrawnAssignments() == 10);
    auto rows = AssignmentPlans::rows(f.project, Phase::Reliability);
    REQUIRE(rows);
    CHECK(rows->empty());
    auto recorded = SubsampleDraw::recorded(f.project, Phase::Reliability);
    REQUIRE(recorded);
    CHECK_FALSE(recorded->has_value());
    // The rows stay as tombstones (10 of them), unlike before the draw.
    CHECK(f.dump() != beforeDraw);
    {
        auto article = f.project.articleByExternalId(draw.articles.front());
        auto c01 = f.project.coderByPseudonym(QStringLiteral("C01"));
        REQUIRE((article && *article && c01 && *c01));
        auto row = store::assignmentRecord(
            databaseForTesting(f.project), **article, (*c01)->id, Phase::Reliability);
        REQUIRE(row);
        REQUIRE(row->has_value());
        CHECK((*row)->deleted);
    }
    const QString log = f.log();
    CHECK(log.count(QStringLiteral("assignment.remove")) == 10);
    CHECK(log.count(QStringLiteral("draw.withdraw")) == 1);
    const QString withdrawn = f.dump();

    // Undo brings the draw back exactly; redo withdraws it again.
    REQUIRE(f.project.revert(**edit));
    CHECK(f.dump() == drawn);
    REQUIRE(f.project.apply(**edit));
    CHECK(withoutTimes(f.dump()) == withoutTimes(withdrawn));

    // The same draw again (same seed, same articles) brings the tombstones back to life, and
    // its undo leaves them tombstones.
    Draw again = draw;
    again.drawnAt.clear();
    auto redraw = SubsampleDraw::edit(f.project, again, f.lead);
    REQUIRE(redraw);
    REQUIRE(f.project.apply(**redraw));
    rows = AssignmentPlans::rows(f.project, Phase::Reliability);
    REQUIRE(rows);
    CHECK(rows->size() == 10);
    REQUIRE(f.project.revert(**redraw));
    CHECK(f.dump() == withdrawn);
}

TEST_CASE("a draw with one span on it is not withdrawn, and the refusal says how many have work")
{
    StudyEditFixture f;
    const Draw draw = commitFiveByTwo(f);
    auto article = f.project.articleByExternalId(draw.articles.front());
    REQUIRE(article);
    REQUIRE(article->has_value());
    auto c02 = f.project.coderByPseudonym(QStringLiteral("C02"));
    REQUIRE(c02);
    AddAnnotationEdit span(**article, (*c02)->id,
        AnnotationContent {FramingFunction::Problem, {0, 3}, {}, {}, {}}, Phase::Reliability);
    REQUIRE(f.project.apply(span));
    const QString before = f.dump();

    auto refused = SubsampleDraw::withdraw(f.project, Phase::Reliability);
    REQUIRE_FALSE(refused);
    CHECK(refused.error().code == ErrorCode::NotAllowed);
    CHECK(refused.error().message.contains(QStringLiteral("coding has started on 1 of its 10")));
    CHECK(f.dump() == before);

    // Coding time on another assignment counts as work too.
    auto c01 = f.project.coderByPseudonym(QStringLiteral("C01"));
    REQUIRE(c01);
    REQUIRE(f.project.addCodingTime(**article, (*c01)->id, 30));
    refused = SubsampleDraw::withdraw(f.project, Phase::Reliability);
    REQUIRE_FALSE(refused);
    CHECK(refused.error().message.contains(QStringLiteral("on 2 of its 10")));

    // A phase without a draw has nothing to withdraw.
    auto none = SubsampleDraw::withdraw(f.project, Phase::Pilot);
    REQUIRE_FALSE(none);
    CHECK(none.error().code == ErrorCode::NotFound);
}
