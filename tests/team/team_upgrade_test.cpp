// A team project on an older server schema — as a build of server schema version 3 left it, before
// coding time had a table of its own — is refused by sync and join with a sentence that names both
// versions and the upgrade, with nothing written; its administrator upgrades it in one
// transaction (`fourfold-cli team upgrade`), a coder's login may not, and afterwards the coder's
// waiting coding time reaches the server once.

#include "core/project/project.h"
#include "core/project/testing/project_database.h"
#include "core/team/server_store_schema.h"
#include "core/team/team_project.h"
#include "tests/support/cli_run.h"
#include "tests/support/db_dump.h"
#include "tests/team/published_project.h"
#include "tests/team/server_sql.h"

#include <QFile>

#include <catch2/catch.hpp>

using namespace fourfold;
using namespace fourfold::test;

TEST_CASE("A team project on an older server schema is refused until its administrator upgrades it")
{
    PublishedProject p;
    Project c1 = joinAs(p, QStringLiteral("C01"));
    // The server as a build of server schema version 3 left it: no coding_time table (migration 4).
    ServerSql admin(p.db.adminConninfo);
    REQUIRE(admin.attempt(QStringLiteral("DROP TABLE fourfold.coding_time CASCADE")).isEmpty());
    REQUIRE(admin.attempt(QStringLiteral("DROP FUNCTION fourfold.add_coding_time()")).isEmpty());
    REQUIRE(
        admin.attempt(QStringLiteral("UPDATE fourfold.schema_version SET version = 3")).isEmpty());

    // C01 spends 30 s on f1; the sync is refused before anything is read or written.
    auto c01 = c1.coderByPseudonym(QStringLiteral("C01"));
    REQUIRE(c01);
    REQUIRE(c01->has_value());
    auto f1 = c1.articleByExternalId(QStringLiteral("f1"));
    REQUIRE(f1);
    REQUIRE(f1->has_value());
    REQUIRE(c1.addCodingTime(**f1, (*c01)->id, 30));
    const QString before = dumpDatabase(databaseForTesting(c1), {});
    auto refused = TeamProject::sync(c1);
    REQUIRE_FALSE(refused);
    CHECK(refused.error().code == ErrorCode::Unsupported);
    CHECK(refused.error().message.contains(QStringLiteral("server schema version 3")));
    CHECK(refused.error().message.contains(QStringLiteral("version %1").arg(kServerSchemaVersion)));
    CHECK(refused.error().message.contains(QStringLiteral("team upgrade")));
    CHECK(dumpDatabase(databaseForTesting(c1), {}) == before);
    // A join is refused the same way and leaves no file behind.
    const QString c02File = p.dir.filePath(QStringLiteral("C02.fourfold"));
    auto join = TeamProject::join(p.loginOf(QStringLiteral("C02")), QStringLiteral("C02"), c02File);
    REQUIRE_FALSE(join);
    CHECK(join.error().code == ErrorCode::Unsupported);
    CHECK_FALSE(QFile::exists(c02File));

    // A coder's login may not change the schema: refused, the server as it was.
    auto byCoder = TeamProject::upgradeServer(p.loginOf(QStringLiteral("C01")));
    REQUIRE_FALSE(byCoder);
    CHECK(admin.value(QStringLiteral("SELECT version FROM fourfold.schema_version")) == "3");
    CHECK(admin.value(QStringLiteral("SELECT to_regclass('fourfold.coding_time') IS NULL")) == "t");

    // The administrator upgrades it from the command line, once.
    const CliRun up = runCli(QStringLiteral(FOURFOLD_CLI),
        {QStringLiteral("team"), QStringLiteral("upgrade"), QStringLiteral("--server"),
            p.db.adminConninfo, QStringLiteral("--json")});
    INFO(up.err.toStdString());
    REQUIRE(up.exitCode == 0);
    CHECK(cliJson(up).value(QStringLiteral("from")).toInt() == 3);
    CHECK(cliJson(up).value(QStringLiteral("to")).toInt() == kServerSchemaVersion);
    CHECK(admin.value(QStringLiteral("SELECT version FROM fourfold.schema_version"))
        == QString::number(kServerSchemaVersion));
    const CliRun again = runCli(QStringLiteral(FOURFOLD_CLI),
        {QStringLiteral("team"), QStringLiteral("upgrade"), QStringLiteral("--server"),
            p.db.adminConninfo});
    REQUIRE(again.exitCode == 0);
    CHECK(again.out.contains(QStringLiteral("already")));

    // Now C01's sync goes through and the waiting 30 s reach the server once.
    synced(c1);
    synced(c1);
    CHECK(admin.value(QStringLiteral("SELECT sum(active_seconds) FROM fourfold.assignment WHERE "
                                     "coder = '%1'")
                          .arg(p.uuidOf(QStringLiteral("C01"))))
        == "30");
    // And C02 may join.
    CHECK(TeamProject::join(p.loginOf(QStringLiteral("C02")), QStringLiteral("C02"), c02File));
}
