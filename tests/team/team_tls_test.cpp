// Team projects over TLS: with the authority's certificate the lead hands out
// (sslmode=verify-full, sslrootcert), publish, join and sync work over TCP, the server reports the
// connection encrypted, the working file records the TLS settings (never a password), and a
// certificate from another authority is refused. libpq's documented behaviour is the reference
// (PostgreSQL 15 documentation, 34.19 "SSL Support": verify-full checks the chain and the host
// name); the test cluster's server certificate is for localhost and 127.0.0.1.

#include "core/project/project.h"
#include "core/store/project_tables.h"
#include "core/team/team_project.h"
#include "tests/project/copies_fixture.h"
#include "tests/support/postgres_cluster.h"
#include "tests/team/server_sql.h"

#include <QDir>
#include <QProcess>

#include <catch2/catch.hpp>

using namespace fourfold;
using namespace fourfold::test;

namespace {

QString overTls(const PostgresCluster &cluster, const QString &database, const QString &rest,
    const QString &authority)
{
    return QStringLiteral("host=localhost port=%1 dbname='%2' sslmode=verify-full sslrootcert='%3' "
                          "%4")
        .arg(cluster.port())
        .arg(database, authority, rest);
}

} // namespace

TEST_CASE("Publish join and sync run over TLS verified with the lead's authority certificate")
{
    PostgresCluster &cluster = PostgresCluster::shared();
    PostgresCluster::TestDatabase db = cluster.newDatabase();
    CopiesFixture f;
    // The administrator's password as the fixture made it, over TCP with TLS.
    const QString admin = overTls(cluster, db.name,
        db.adminConninfo.mid(db.adminConninfo.indexOf(QLatin1String("user="))),
        cluster.caCertificate());
    auto published = TeamProject::publish(*f.main, admin, f.dir.filePath(QStringLiteral("logins")));
    INFO((published ? QString() : published.error().toString()).toStdString());
    REQUIRE(published);
    CHECK(published->server.startsWith(db.admin + QStringLiteral("@localhost:")));

    QString role, passfile;
    for (const TeamLogin &l : published->logins)
        if (l.pseudonym == QLatin1String("C01")) {
            role = l.role;
            passfile = l.passwordFile;
        }
    const QString c1Login = overTls(cluster, db.name,
        QStringLiteral("user='%1' passfile='%2'").arg(role, passfile), cluster.caCertificate());
    // The server says the coder's connection is encrypted.
    ServerSql sql(c1Login);
    CHECK(sql.value(QStringLiteral("SELECT ssl FROM pg_stat_ssl WHERE pid = pg_backend_pid()"))
        == "t");

    const QString file = f.dir.filePath(QStringLiteral("C01.fourfold"));
    auto joined = TeamProject::join(c1Login, QStringLiteral("C01"), file);
    INFO((joined ? QString() : joined.error().toString()).toStdString());
    REQUIRE(joined);
    auto c1 = Project::open(file);
    REQUIRE(c1);
    auto status = TeamProject::status(*c1);
    REQUIRE(status);
    CHECK(status->server.contains(QStringLiteral("sslmode='verify-full'")));
    CHECK(status->server.contains(cluster.caCertificate()));
    CHECK_FALSE(status->server.contains(QStringLiteral("password")));
    auto synced = TeamProject::sync(*c1);
    INFO((synced ? QString() : synced.error().toString()).toStdString());
    REQUIRE(synced);
    CHECK(synced->pushed == 0);
}

TEST_CASE("A server certificate from another authority is refused")
{
    PostgresCluster &cluster = PostgresCluster::shared();
    PostgresCluster::TestDatabase db = cluster.newDatabase();
    QTemporaryDir other;
    QProcess openssl;
    openssl.setWorkingDirectory(other.path());
    openssl.start(QStringLiteral("openssl"),
        {QStringLiteral("req"), QStringLiteral("-x509"), QStringLiteral("-newkey"),
            QStringLiteral("rsa:2048"), QStringLiteral("-nodes"), QStringLiteral("-keyout"),
            QStringLiteral("ca.key"), QStringLiteral("-out"), QStringLiteral("ca.crt"),
            QStringLiteral("-days"), QStringLiteral("1"), QStringLiteral("-subj"),
            QStringLiteral("/CN=Another authority")});
    REQUIRE(openssl.waitForFinished(60000));
    REQUIRE(openssl.exitCode() == 0);
    CopiesFixture f;
    const QString admin = overTls(cluster, db.name,
        db.adminConninfo.mid(db.adminConninfo.indexOf(QLatin1String("user="))),
        QDir(other.path()).filePath(QStringLiteral("ca.crt")));
    auto published = TeamProject::publish(*f.main, admin, f.dir.filePath(QStringLiteral("logins")));
    REQUIRE_FALSE(published);
    CHECK(published.error().code == ErrorCode::Io);
    CHECK(published.error().cause.contains(QStringLiteral("certificate")));
}
