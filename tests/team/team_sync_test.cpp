// One push and pull of a team working file (TeamProject::sync) against a real server: two
// coders and the lead converge, a second sync changes nothing, coding time adds up, and an
// object changed on both sides keeps the later version with a conflict recorded (the rule of
// coder copies, README "Coder copies: coding offline").

#include "core/project/annotation_edits.h"
#include "core/project/article_status_edit.h"
#include "core/project/coder_copies.h"
#include "core/project/project.h"
#include "core/project/testing/project_database.h"
#include "core/store/copy_tables.h"
#include "core/store/project_tables.h"
#include "core/team/team_project.h"
#include "tests/team/published_project.h"
#include "tests/team/server_sql.h"

#include <QThread>

#include <catch2/catch.hpp>

using namespace fourfold;
using namespace fourfold::test;

namespace {

CoderId idOf(Project &project, const QString &pseudonym)
{
    auto c = project.coderByPseudonym(pseudonym);
    REQUIRE(c);
    REQUIRE(c->has_value());
    return (*c)->id;
}

ArticleId articleOf(Project &project, const QString &externalId)
{
    auto a = project.articleByExternalId(externalId);
    REQUIRE(a);
    REQUIRE(a->has_value());
    return **a;
}

} // namespace

TEST_CASE("Two coders and the lead converge by sync and a second sync changes nothing")
{
    PublishedProject p;
    // The lead's file must use the server's login of the lead, not the administrator's.
    REQUIRE(store::setSetting(databaseForTesting(*p.main), TeamProject::serverSettingKey(),
        p.loginOf(QStringLiteral("L01"))));
    Project c1 = joinAs(p, QStringLiteral("C01"));
    Project c2 = joinAs(p, QStringLiteral("C02"));

    // Nothing changed anywhere yet: nothing goes either way.
    for (Project *f : {&c1, &c2, &*p.main}) {
        const SyncReport r = synced(*f);
        CHECK(r.pushed == 0);
        CHECK(r.pulled == 0);
        CHECK(r.conflicts == 0);
    }

    // C01 codes a new span on f1 and spends 30 s; C02 codes a span on f3 and marks f3 done.
    const CoderId me1 = idOf(c1, QStringLiteral("C01"));
    AddAnnotationEdit add1(articleOf(c1, QStringLiteral("f1")), me1,
        span(FramingFunction::Evaluation, p.text1, QStringLiteral("It is a disgrace.")),
        Phase::Reliability);
    REQUIRE(c1.apply(add1));
    REQUIRE(c1.addCodingTime(articleOf(c1, QStringLiteral("f1")), me1, 30));
    const CoderId me2 = idOf(c2, QStringLiteral("C02"));
    AddAnnotationEdit add2(articleOf(c2, QStringLiteral("f3")), me2,
        span(FramingFunction::Cause, p.text3, QStringLiteral("Shopkeepers fear the loss")),
        Phase::Reliability);
    REQUIRE(c2.apply(add2));
    SetArticleStatusEdit done(articleOf(c2, QStringLiteral("f3")), me2, QStringLiteral("done"));
    REQUIRE(c2.apply(done));

    SyncReport r1 = synced(c1);
    CHECK(r1.pushed == 2); // the span, and the assignment's coding time
    CHECK(r1.pulled == 0);
    SyncReport r2 = synced(c2);
    CHECK(r2.pushed == 2); // the span, and the assignment's status
    CHECK(r2.pulled == 0);
    SyncReport lead = synced(*p.main);
    CHECK(lead.pushed == 0);
    CHECK(lead.pulled == 3); // both spans and C02's status; C01's time comes as time
    CHECK(lead.conflicts == 0);

    // The lead's file holds each coder's objects exactly as the coder's file does.
    const QString u1 = p.uuidOf(QStringLiteral("C01"));
    const QString u2 = p.uuidOf(QStringLiteral("C02"));
    CHECK(objectsOf(databaseForTesting(*p.main), u1) == objectsOf(databaseForTesting(c1), u1));
    CHECK(objectsOf(databaseForTesting(*p.main), u2) == objectsOf(databaseForTesting(c2), u2));
    auto counts = p.main->counts();
    REQUIRE(counts);
    CHECK(counts->annotations == 10);
    // The coders never receive each other's work.
    auto others = store::rowsOfOtherCoders(databaseForTesting(c1), u1);
    REQUIRE(others);
    CHECK(*others == 0);
    auto c1Counts = c1.counts();
    REQUIRE(c1Counts);
    CHECK(c1Counts->annotations == 4);

    // A second round changes nothing anywhere.
    for (Project *f : {&c1, &c2, &*p.main}) {
        const SyncReport r = synced(*f);
        CHECK(r.pushed == 0);
        CHECK(r.pulled == 0);
        CHECK(r.conflicts == 0);
    }
    // Coding time adds up: 30 s more on C01's f1 assignment, once.
    ServerSql sql(p.loginOf(QStringLiteral("L01")));
    CHECK(objectsOf(databaseForTesting(*p.main), u1) == objectsOf(databaseForTesting(c1), u1));
    CHECK(sql.value(QStringLiteral("SELECT sum(active_seconds) FROM fourfold.assignment WHERE "
                                   "coder = '%1'")
                        .arg(u1))
        == "30");
}

TEST_CASE("A span changed on both sides keeps the later version and records a conflict")
{
    PublishedProject p;
    REQUIRE(store::setSetting(databaseForTesting(*p.main), TeamProject::serverSettingKey(),
        p.loginOf(QStringLiteral("L01"))));
    Project c1 = joinAs(p, QStringLiteral("C01"));
    const CoderId me = idOf(c1, QStringLiteral("C01"));
    auto mine = c1.annotations(articleOf(c1, QStringLiteral("f1")), me);
    REQUIRE(mine);
    REQUIRE_FALSE(mine->empty());
    const Annotation target = mine->front();

    // The lead changes the span's note first; the coder changes it later.
    auto inLead = p.main->annotations(articleOf(*p.main, QStringLiteral("f1")), p.c1);
    REQUIRE(inLead);
    const auto leadCopy =
        std::ranges::find_if(*inLead, [&](const Annotation &a) { return a.uuid == target.uuid; });
    REQUIRE(leadCopy != inLead->end());
    AnnotationContent leadContent = leadCopy->content;
    leadContent.note = QStringLiteral("lead's note");
    ChangeAnnotationEdit leadEdit(leadCopy->id, leadContent, p.lead);
    REQUIRE(p.main->apply(leadEdit));
    CHECK(synced(*p.main).pushed == 1);

    QThread::msleep(5); // a later modification time (milliseconds)
    AnnotationContent coderContent = target.content;
    coderContent.note = QStringLiteral("coder's note");
    ChangeAnnotationEdit coderEdit(target.id, coderContent, me);
    REQUIRE(c1.apply(coderEdit));
    const SyncReport r = synced(c1);
    CHECK(r.conflicts == 1);
    CHECK(r.pushed == 1); // the coder's later version wins and goes up
    CHECK(r.pulled == 0);
    auto conflicts = CoderCopies::conflicts(c1, false);
    REQUIRE(conflicts);
    REQUIRE(conflicts->size() == 1);
    CHECK(conflicts->front().objectUuid == target.uuid);
    CHECK(conflicts->front().theirs.value(QLatin1String("note")).toString() == "lead's note");

    const SyncReport back = synced(*p.main);
    CHECK(back.pulled == 1);
    auto now = p.main->annotation(leadCopy->id);
    REQUIRE(now);
    CHECK(now->content.note == "coder's note");
}
