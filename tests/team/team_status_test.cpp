// A working file's team state (TeamProject::status, `fourfold-cli team status`): what the next
// sync would send is what that sync then sends (TeamProject::sync is the reference), and the
// answer comes from the file alone, with the server stopped or not.

#include "core/project/annotation_edits.h"
#include "core/project/project.h"
#include "core/project/testing/project_database.h"
#include "core/store/project_tables.h"
#include "core/team/team_project.h"
#include "tests/team/published_project.h"

#include <QDateTime>
#include <QJsonDocument>
#include <QJsonObject>
#include <QProcess>

#include <catch2/catch.hpp>

using namespace fourfold;
using namespace fourfold::test;

namespace {

TeamStatus statusOf(const Project &project)
{
    auto s = TeamProject::status(project);
    INFO((s ? QString() : s.error().toString()).toStdString());
    REQUIRE(s);
    return *s;
}

} // namespace

TEST_CASE("Team status counts what the next sync sends and the time of the last sync")
{
    PublishedProject p;
    const QString file = p.dir.filePath(QStringLiteral("C01.fourfold"));
    REQUIRE(TeamProject::join(p.loginOf(QStringLiteral("C01")), QStringLiteral("C01"), file));
    auto c1 = Project::open(file);
    REQUIRE(c1);

    TeamStatus fresh = statusOf(*c1);
    CHECK(fresh.pseudonym == QStringLiteral("C01"));
    CHECK_FALSE(fresh.lead);
    CHECK(fresh.waiting == 0);
    CHECK(fresh.lastSync.isEmpty());
    CHECK(fresh.lastChange > 0);
    CHECK(fresh.server.contains(p.db.name));

    // A new span and 20 s of coding time on another article: two objects wait.
    auto me = c1->coderByPseudonym(QStringLiteral("C01"));
    REQUIRE(me);
    auto f1 = c1->articleByExternalId(QStringLiteral("f1"));
    REQUIRE(f1);
    AddAnnotationEdit add(**f1, (*me)->id,
        span(FramingFunction::Problem, p.text1, QStringLiteral("It is a disgrace.")),
        Phase::Reliability);
    REQUIRE(c1->apply(add));
    REQUIRE(c1->addCodingTime(**f1, (*me)->id, 20));
    TeamStatus before = statusOf(*c1);
    CHECK(before.waiting == 2);
    CHECK(before.waitingByType.value(QStringLiteral("annotation")) == 1);
    CHECK(before.waitingByType.value(QStringLiteral("assignment")) == 1);

    // The sync sends exactly what status counted, then nothing waits.
    auto synced = TeamProject::sync(*c1);
    REQUIRE(synced);
    CHECK(synced->pushed == before.waiting);
    TeamStatus after = statusOf(*c1);
    CHECK(after.waiting == 0);
    CHECK(after.waitingByType.isEmpty());
    CHECK_FALSE(after.lastSync.isEmpty());
    CHECK(QDateTime::fromString(after.lastSync, Qt::ISODate).isValid());
    CHECK(after.lastChange >= fresh.lastChange);

    // The CLI prints the same from the file alone, as JSON.
    QProcess cli;
    cli.start(QStringLiteral(FOURFOLD_CLI),
        {QStringLiteral("team"), QStringLiteral("status"), file, QStringLiteral("--json")});
    REQUIRE(cli.waitForFinished(60000));
    REQUIRE(cli.exitCode() == 0);
    const QJsonObject json = QJsonDocument::fromJson(cli.readAllStandardOutput()).object();
    CHECK(json.value(QStringLiteral("pseudonym")).toString() == QStringLiteral("C01"));
    CHECK(json.value(QStringLiteral("waiting")).toInteger() == 0);
    CHECK(json.value(QStringLiteral("last_sync")).toString() == after.lastSync);
    CHECK(json.value(QStringLiteral("last_change")).toInteger() == after.lastChange);
}

TEST_CASE("Team status refuses a file that is not a working file")
{
    QTemporaryDir dir;
    auto plain = Project::create(dir.filePath(QStringLiteral("plain.fourfold")));
    REQUIRE(plain);
    auto s = TeamProject::status(*plain);
    REQUIRE_FALSE(s);
    CHECK(s.error().code == ErrorCode::InvalidArgument);
    CHECK(s.error().message.contains(QStringLiteral("not a team working file")));
}
