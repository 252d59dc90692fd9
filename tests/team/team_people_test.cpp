// People of a running team project (TeamProject::addPerson / setPersonDisabled, `fourfold-cli
// team people`) against a real server: a person added joins and receives work at once; a
// disabled person cannot log in and keeps every coding; the lead's own login, which may not
// create roles, is refused and nothing changes. PostgreSQL's documented rules are the reference:
// a NOLOGIN role cannot connect (PostgreSQL 15 documentation, CREATE ROLE / ALTER ROLE).

#include "core/project/people.h"
#include "core/project/project.h"
#include "core/project/testing/project_database.h"
#include "core/store/project_tables.h"
#include "core/team/team_project.h"
#include "tests/support/cli_run.h"
#include "tests/team/published_project.h"
#include "tests/team/server_sql.h"

#include <QFile>
#include <QFileInfo>
#include <QJsonObject>

#include <catch2/catch.hpp>
#include <libpq-fe.h>

using namespace fourfold;
using namespace fourfold::test;

namespace {

const QString kPassphrase = QStringLiteral("ferry harbour dyke");

SignedIn signedInLead(Project &project)
{
    auto in = People::signIn(project, QStringLiteral("L01"), kPassphrase);
    INFO((in ? QString() : in.error().toString()).toStdString());
    REQUIRE(in);
    return *in;
}

QString loginWith(PublishedProject &p, const TeamPersonReport &r)
{
    return QStringLiteral("host='%1' dbname='%2' user='%3' passfile='%4'")
        .arg(p.cluster.socketDir(), p.db.name, r.role, r.passwordFile);
}

bool canConnect(const QString &conninfo)
{
    PGconn *conn = PQconnectdb(conninfo.toUtf8().constData());
    const bool ok = PQstatus(conn) == CONNECTION_OK;
    PQfinish(conn);
    return ok;
}

} // namespace

TEST_CASE("A person added to a running team project joins and receives work at once")
{
    PublishedProject p; // the published file's server is the administrator's login
    const SignedIn lead = signedInLead(*p.main);
    auto added = TeamProject::addPerson(*p.main, lead,
        NewPerson {QStringLiteral("Rosa Testperson"), QStringLiteral("C04"), CoderRole::Coder, {}},
        p.credentials, p.db.adminConninfo);
    INFO((added ? QString() : added.error().toString()).toStdString());
    REQUIRE(added);
    CHECK(added->pseudonym == "C04");
    CHECK_FALSE(added->lead);
    CHECK(QFileInfo(added->passwordFile).dir() == QDir(p.credentials));
    // Mode 0600: the owner reads and writes, no one else anything.
    const QFileDevice::Permissions mode = QFile::permissions(added->passwordFile);
    CHECK(mode.testFlags(QFileDevice::ReadOwner | QFileDevice::WriteOwner));
    CHECK_FALSE(
        mode.testAnyFlags(QFileDevice::ReadGroup | QFileDevice::WriteGroup | QFileDevice::ExeGroup
            | QFileDevice::ReadOther | QFileDevice::WriteOther | QFileDevice::ExeOther));
    // Nothing of it waits for a sync: the person went to the server with the login.
    auto status = TeamProject::status(*p.main);
    REQUIRE(status);
    CHECK(status->waiting == 0);

    const QString file = p.dir.filePath(QStringLiteral("C04.fourfold"));
    auto joined = TeamProject::join(loginWith(p, *added), QStringLiteral("C04"), file);
    INFO((joined ? QString() : joined.error().toString()).toStdString());
    REQUIRE(joined);
    CHECK(joined->articles == 0);
    CHECK(joined->people == 1);

    // The lead assigns f1; the new coder's next sync brings the article and the assignment.
    auto c4 = p.main->coderByPseudonym(QStringLiteral("C04"));
    REQUIRE(c4);
    REQUIRE(c4->has_value());
    REQUIRE(p.main->assign(p.f1, (*c4)->id, Phase::Production));
    // The lead's file syncs through the lead's login (the administrator's needs its password).
    REQUIRE(store::setSetting(databaseForTesting(*p.main), TeamProject::serverSettingKey(),
        p.loginOf(QStringLiteral("L01"))));
    auto up = TeamProject::sync(*p.main);
    REQUIRE(up);
    CHECK(up->pushed == 1);
    auto mine = Project::open(file);
    REQUIRE(mine);
    auto down = TeamProject::sync(*mine);
    INFO((down ? QString() : down.error().toString()).toStdString());
    REQUIRE(down);
    CHECK(down->pulled == 2);
    auto f1 = mine->articleByExternalId(QStringLiteral("f1"));
    REQUIRE(f1);
    CHECK(f1->has_value());

    // The same pseudonym again is refused by the project's own rule, and nothing is left.
    auto again = TeamProject::addPerson(*p.main, lead,
        NewPerson {QStringLiteral("Rosa Other"), QStringLiteral("C04"), CoderRole::Coder, {}},
        p.dir.filePath(QStringLiteral("more-logins")), p.db.adminConninfo);
    REQUIRE_FALSE(again);
    CHECK(again.error().code == ErrorCode::Duplicate);
    CHECK_FALSE(QFileInfo::exists(p.dir.filePath(QStringLiteral("more-logins"))));
}

TEST_CASE("A disabled person cannot log in and keeps every coding")
{
    PublishedProject p;
    const SignedIn lead = signedInLead(*p.main);
    ServerSql admin(p.db.adminConninfo);
    const QString u2 = p.uuidOf(QStringLiteral("C02"));
    const QString spans = QStringLiteral(
        "SELECT count(*) FROM fourfold.annotation WHERE coder = '%1' AND deleted = 0")
                              .arg(u2);
    const QString before = admin.value(spans);
    REQUIRE(before.toInt() > 0);
    REQUIRE(canConnect(p.loginOf(QStringLiteral("C02"))));

    auto off = TeamProject::setPersonDisabled(
        *p.main, lead, QStringLiteral("C02"), true, p.db.adminConninfo);
    INFO((off ? QString() : off.error().toString()).toStdString());
    REQUIRE(off);
    CHECK_FALSE(off->loginAllowed);
    CHECK_FALSE(canConnect(p.loginOf(QStringLiteral("C02"))));
    CHECK(admin.value(spans) == before);
    CHECK(admin.value(
              QStringLiteral("SELECT disabled FROM fourfold.person WHERE uuid = '%1'").arg(u2))
        == "1");
    auto inFile = p.main->coderByPseudonym(QStringLiteral("C02"));
    REQUIRE(inFile);
    CHECK((*inFile)->disabled);

    auto on = TeamProject::setPersonDisabled(
        *p.main, lead, QStringLiteral("C02"), false, p.db.adminConninfo);
    REQUIRE(on);
    CHECK(canConnect(p.loginOf(QStringLiteral("C02"))));
    CHECK(admin.value(
              QStringLiteral("SELECT disabled FROM fourfold.person WHERE uuid = '%1'").arg(u2))
        == "0");
}

TEST_CASE("The lead's own login may not create roles and adding a person changes nothing")
{
    PublishedProject p;
    REQUIRE(store::setSetting(databaseForTesting(*p.main), TeamProject::serverSettingKey(),
        p.loginOf(QStringLiteral("L01"))));
    const SignedIn lead = signedInLead(*p.main);
    const QString dir = p.dir.filePath(QStringLiteral("new-logins"));
    auto added = TeamProject::addPerson(*p.main, lead,
        NewPerson {QStringLiteral("Rosa Testperson"), QStringLiteral("C04"), CoderRole::Coder, {}},
        dir);
    REQUIRE_FALSE(added);
    CHECK(added.error().code == ErrorCode::NotAllowed);
    CHECK(added.error().message.contains(QStringLiteral("administrator")));
    auto c4 = p.main->coderByPseudonym(QStringLiteral("C04"));
    REQUIRE(c4);
    CHECK_FALSE(c4->has_value());
    CHECK_FALSE(QFileInfo::exists(dir));
    ServerSql admin(p.db.adminConninfo);
    CHECK(
        admin.value(QStringLiteral("SELECT count(*) FROM fourfold.person WHERE pseudonym = 'C04'"))
        == "0");
}

TEST_CASE("The CLI adds a person with the administrator's login and disables them")
{
    PublishedProject p;
    const QString passphraseFile =
        writeFile(p.dir, QStringLiteral("pass.txt"), "ferry harbour dyke\n");
    const QString logins = p.dir.filePath(QStringLiteral("new-logins"));
    const CliRun added = runCli(QStringLiteral(FOURFOLD_CLI),
        {QStringLiteral("team"), QStringLiteral("people"), p.mainPath, QStringLiteral("--add"),
            QStringLiteral("Rosa Testperson"), QStringLiteral("--pseudonym"), QStringLiteral("C04"),
            QStringLiteral("--lead"), QStringLiteral("L01"),
            QStringLiteral("--lead-passphrase-file"), passphraseFile, QStringLiteral("--server"),
            p.db.adminConninfo, QStringLiteral("--credentials-out"), logins,
            QStringLiteral("--json")});
    INFO(added.err.toStdString());
    REQUIRE(added.exitCode == 0);
    const QJsonObject json = cliJson(added);
    CHECK(json.value(QStringLiteral("pseudonym")).toString() == "C04");
    CHECK(json.value(QStringLiteral("login_allowed")).toBool());
    const QString file = json.value(QStringLiteral("password_file")).toString();
    CHECK(QFileInfo(file).dir() == QDir(logins));
    // The name stays in the files: the output names the person by pseudonym alone.
    CHECK_FALSE(added.out.contains(QStringLiteral("Rosa")));

    TeamPersonReport r;
    r.role = json.value(QStringLiteral("login_role")).toString();
    r.passwordFile = file;
    CHECK(canConnect(loginWith(p, r)));
    const CliRun disabled = runCli(QStringLiteral(FOURFOLD_CLI),
        {QStringLiteral("team"), QStringLiteral("people"), p.mainPath, QStringLiteral("--disable"),
            QStringLiteral("C04"), QStringLiteral("--lead"), QStringLiteral("L01"),
            QStringLiteral("--lead-passphrase-file"), passphraseFile, QStringLiteral("--server"),
            p.db.adminConninfo});
    INFO(disabled.err.toStdString());
    REQUIRE(disabled.exitCode == 0);
    CHECK_FALSE(canConnect(loginWith(p, r)));

    // A wrong passphrase changes nothing.
    const QString wrong = writeFile(p.dir, QStringLiteral("wrong.txt"), "not the passphrase\n");
    const CliRun refused = runCli(QStringLiteral(FOURFOLD_CLI),
        {QStringLiteral("team"), QStringLiteral("people"), p.mainPath, QStringLiteral("--enable"),
            QStringLiteral("C04"), QStringLiteral("--lead"), QStringLiteral("L01"),
            QStringLiteral("--lead-passphrase-file"), wrong, QStringLiteral("--server"),
            p.db.adminConninfo});
    CHECK(refused.exitCode != 0);
    CHECK_FALSE(canConnect(loginWith(p, r)));
}
