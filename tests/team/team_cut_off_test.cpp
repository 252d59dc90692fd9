// A sync cut off in the middle loses nothing and duplicates nothing: a client killed with
// SIGKILL before or after the server's commit, and a server restarted (pg_ctl stop -m fast)
// while a sync's transaction is open. After the next sync the server holds each object once
// with its coding time counted once, and the lead's file holds the coder's objects exactly as the
// coder's file does (the dump of the check). PostgreSQL's documented behaviour is the
// reference: a transaction whose connection is lost rolls back (PostgreSQL 15 documentation,
// 3.4 "Transactions"); SQLite's: a transaction not committed when the process dies is rolled
// back from its journal on the next open (sqlite.org, "Atomic Commit In SQLite").

#include "core/project/annotation_edits.h"
#include "core/project/project.h"
#include "core/project/testing/project_database.h"
#include "core/store/copy_tables.h"
#include "core/store/project_tables.h"
#include "core/team/team_project.h"
#include "tests/team/published_project.h"
#include "tests/team/server_sql.h"

#include <QProcess>

#include <catch2/catch.hpp>

using namespace fourfold;
using namespace fourfold::test;

namespace {

// C01's working file with one new span on f1 and 30 s of coding time there, not yet synced.
struct CoderWithWork {
    PublishedProject &p;
    QString file = p.dir.filePath(QStringLiteral("C01.fourfold"));
    QString uuid = p.uuidOf(QStringLiteral("C01"));

    explicit CoderWithWork(PublishedProject &published)
        : p(published)
    {
        REQUIRE(store::setSetting(databaseForTesting(*p.main), TeamProject::serverSettingKey(),
            p.loginOf(QStringLiteral("L01"))));
        auto joined =
            TeamProject::join(p.loginOf(QStringLiteral("C01")), QStringLiteral("C01"), file);
        INFO((joined ? QString() : joined.error().toString()).toStdString());
        REQUIRE(joined);
        auto c1 = Project::open(file);
        REQUIRE(c1);
        auto me = c1->coderByPseudonym(QStringLiteral("C01"));
        REQUIRE(me);
        auto f1 = c1->articleByExternalId(QStringLiteral("f1"));
        REQUIRE(f1);
        AddAnnotationEdit add(**f1, (*me)->id,
            span(FramingFunction::Evaluation, p.text1, QStringLiteral("It is a disgrace.")),
            Phase::Reliability);
        REQUIRE(c1->apply(add));
        REQUIRE(c1->addCodingTime(**f1, (*me)->id, 30));
    }

    // The server's count of C01's live spans and C01's coding time, as the lead sees them.
    QString onServer()
    {
        ServerSql lead(p.loginOf(QStringLiteral("L01")));
        return lead.value(QStringLiteral("SELECT (SELECT count(*) FROM fourfold.annotation WHERE "
                                         "coder = '%1' AND deleted = 0) || ' ' || (SELECT "
                                         "sum(active_seconds) FROM fourfold.assignment WHERE "
                                         "coder = '%1')")
                              .arg(uuid));
    }

    // Runs the helper until it reports `stage`, then kills it with SIGKILL.
    void killAt(const QString &stage)
    {
        QProcess helper;
        helper.start(QStringLiteral(SYNC_STOP_HELPER), {file, stage});
        REQUIRE(helper.waitForStarted());
        QByteArray said;
        while (!said.contains('\n') && helper.state() == QProcess::Running)
            if (helper.waitForReadyRead(60000))
                said += helper.readAllStandardOutput();
        INFO(helper.readAllStandardError().toStdString());
        REQUIRE(said.trimmed() == stage.toUtf8());
        helper.kill(); // SIGKILL: no destructor, no rollback sent, no clean close of SQLite
        REQUIRE(helper.waitForFinished(60000));
    }

    // After a second, whole sync of the coder and one of the lead: everything once.
    void checkEverythingOnce()
    {
        auto c1 = Project::open(file);
        REQUIRE(c1);
        auto integrity = c1->check();
        REQUIRE(integrity);
        CHECK(integrity->isClean());
        synced(*c1);
        CHECK(onServer() == "4 30"); // three published spans and the new one; 30 s once
        synced(*p.main);
        CHECK(objectsOf(databaseForTesting(*p.main), uuid)
            == objectsOf(databaseForTesting(*c1), uuid));
        // A further round moves nothing.
        for (Project *f : {&*c1, &*p.main}) {
            const SyncReport r = synced(*f);
            CHECK(r.pushed == 0);
            CHECK(r.pulled == 0);
        }
        CHECK(onServer() == "4 30");
    }
};

} // namespace

TEST_CASE("A client killed after the server's commit and before the file's sends nothing twice")
{
    PublishedProject p;
    CoderWithWork c(p);
    REQUIRE(c.onServer() == "3 0");
    c.killAt(QStringLiteral("server-committed"));
    // The server has the work; the file does not know it was sent.
    CHECK(c.onServer() == "4 30");
    {
        auto c1 = Project::open(c.file);
        REQUIRE(c1);
        auto status = TeamProject::status(*c1);
        REQUIRE(status);
        CHECK(status->waiting == 2);
    }
    c.checkEverythingOnce();
}

TEST_CASE("A client killed before the server's commit leaves the server as it was")
{
    PublishedProject p;
    CoderWithWork c(p);
    c.killAt(QStringLiteral("server-written"));
    CHECK(c.onServer() == "3 0");
    c.checkEverythingOnce();
}

TEST_CASE("A server restarted in the middle of a sync loses nothing of the file")
{
    PublishedProject p;
    CoderWithWork c(p);
    {
        auto c1 = Project::open(c.file);
        REQUIRE(c1);
        auto cut = TeamProject::sync(*c1, [&](SyncStage stage) {
            if (stage == SyncStage::ServerWritten)
                p.cluster.stopServer();
        });
        p.cluster.startServer();
        REQUIRE_FALSE(cut);
        INFO(cut.error().toString().toStdString());
        CHECK(cut.error().code == ErrorCode::Io);
        CHECK(c.onServer() == "3 0");
        // The file still waits to send its work, and nothing of the sync was kept in it.
        auto status = TeamProject::status(*c1);
        REQUIRE(status);
        CHECK(status->waiting == 2);
        CHECK(status->lastSync.isEmpty());
    }
    c.checkEverythingOnce();
}
