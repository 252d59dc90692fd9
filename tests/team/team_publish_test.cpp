// Publishing a project to a real PostgreSQL 15 server (a throwaway cluster; nothing mocked), and
// what each person's login role may read and write there, checked with plain SQL. The row-level
// security rules are from the PostgreSQL 15 documentation, 5.8 "Row Security Policies"; the
// password file format from 34.16 "The Password File"; SQLSTATE 42501 is insufficient_privilege
// (Appendix A).

#include "core/project/project.h"
#include "core/project/testing/project_database.h"
#include "core/store/project_tables.h"
#include "core/team/server_store_schema.h"
#include "core/team/team_project.h"
#include "tests/support/cli_run.h"
#include "tests/team/published_project.h"
#include "tests/team/server_sql.h"

#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QJsonArray>

#include <catch2/catch.hpp>
#include <sys/stat.h>

using namespace fourfold;
using namespace fourfold::test;

namespace {

const QStringList kCoderTables {QStringLiteral("assignment"), QStringLiteral("annotation"),
    QStringLiteral("link"), QStringLiteral("judgement")};
const QStringList kGoldTables {QStringLiteral("gold_annotation"), QStringLiteral("gold_source"),
    QStringLiteral("gold_judgement"), QStringLiteral("gold_rejection")};

} // namespace

TEST_CASE("Publishing sends every shared row and writes one private password file per person")
{
    PublishedProject p;
    CHECK(p.report.schemaVersion == kServerSchemaVersion);
    CHECK(p.report.people == 4);
    CHECK(p.report.articles == 3);
    CHECK(p.report.assignments == 6);
    CHECK(p.report.annotations == 8);
    CHECK(p.report.links == 1);
    CHECK(p.report.judgements == 2);
    CHECK(p.report.gold == 1);
    CHECK(p.report.events > 0);
    REQUIRE(p.report.logins.size() == 4);

    // The folder and the files are private to their owner (0700, 0600); each file holds one
    // line host:port:database:role:password.
    struct stat st {
    };
    REQUIRE(stat(QFile::encodeName(p.credentials).constData(), &st) == 0);
    CHECK((st.st_mode & 0777) == 0700);
    QByteArray projectBytes;
    {
        p.main.reset(); // the whole file, without a WAL
        QFile f(p.mainPath);
        REQUIRE(f.open(QIODevice::ReadOnly));
        projectBytes = f.readAll();
        auto reopened = Project::open(p.mainPath);
        REQUIRE(reopened);
        p.main.emplace(std::move(*reopened));
    }
    for (const TeamLogin &l : p.report.logins) {
        CAPTURE(l.pseudonym.toStdString());
        CHECK(QFileInfo(l.passwordFile).fileName() == l.pseudonym + QStringLiteral(".pgpass"));
        CHECK(l.role == p.db.name + QLatin1Char('_') + l.pseudonym.toLower());
        CHECK(l.lead == (l.pseudonym == QLatin1String("L01")));
        REQUIRE(stat(QFile::encodeName(l.passwordFile).constData(), &st) == 0);
        CHECK((st.st_mode & 0777) == 0600);
        QFile f(l.passwordFile);
        REQUIRE(f.open(QIODevice::ReadOnly));
        const QList<QByteArray> fields = f.readAll().trimmed().split(':');
        REQUIRE(fields.size() == 5);
        CHECK(fields[0] == QFile::encodeName(p.cluster.socketDir()));
        CHECK(fields[1] == QByteArray::number(p.cluster.port())); // PGPORT, as libpq reads it
        CHECK(fields[2] == p.db.name.toUtf8());
        CHECK(fields[3] == l.role.toUtf8());
        CHECK(fields[4].size() == 24);
        // No password is ever stored in the project file.
        CHECK_FALSE(projectBytes.contains(fields[4]));
        // The file logs in (SCRAM), with nothing else given.
        ServerSql person(p.loginOf(l.pseudonym));
        CHECK(person.value(QStringLiteral("SELECT current_user")) == l.role);
    }

    // The project file records the server without the admin's password, and whose file it is.
    auto server = store::setting(databaseForTesting(*p.main), TeamProject::serverSettingKey());
    REQUIRE(server);
    REQUIRE(server->has_value());
    CHECK((*server)->contains(p.db.name));
    CHECK_FALSE((*server)->contains(QLatin1String("password")));
    auto pseudonym =
        store::setting(databaseForTesting(*p.main), TeamProject::pseudonymSettingKey());
    REQUIRE(pseudonym);
    CHECK(pseudonym->value_or(QString()) == QLatin1String("L01"));
    auto lastChange =
        store::setting(databaseForTesting(*p.main), TeamProject::lastChangeSettingKey());
    REQUIRE(lastChange);
    CHECK(lastChange->value_or(QString()).toLongLong() == p.report.lastChange);

    // The lead's role reads everything, and every row carries its own change number.
    ServerSql lead(p.loginOf(QStringLiteral("L01")));
    CHECK(lead.value(QStringLiteral("SELECT version FROM fourfold.schema_version"))
        == QString::number(kServerSchemaVersion));
    CHECK(lead.value(QStringLiteral("SELECT count(*) FROM fourfold.person")) == "4");
    CHECK(lead.value(QStringLiteral("SELECT count(*) FROM fourfold.article")) == "3");
    CHECK(lead.value(QStringLiteral("SELECT count(*) FROM fourfold.assignment")) == "6");
    CHECK(lead.value(QStringLiteral("SELECT count(*) FROM fourfold.annotation")) == "8");
    CHECK(lead.value(QStringLiteral("SELECT count(*) FROM fourfold.link")) == "1");
    CHECK(lead.value(QStringLiteral("SELECT count(*) FROM fourfold.judgement")) == "2");
    CHECK(lead.value(QStringLiteral("SELECT count(*) FROM fourfold.gold_annotation")) == "1");
    CHECK(lead.value(QStringLiteral("SELECT count(*) FROM fourfold.gold_source")) == "1");
    CHECK(lead.value(QStringLiteral("SELECT count(DISTINCT change) = count(*) FROM (SELECT change "
                                    "FROM fourfold.annotation UNION ALL SELECT change FROM "
                                    "fourfold.article UNION ALL SELECT change FROM "
                                    "fourfold.assignment) c"))
        == "t");
    // The last change number the file records is the highest on the server.
    CHECK(lead.value(QStringLiteral(
              "SELECT max(change) FROM (SELECT change FROM fourfold.person UNION ALL SELECT "
              "change FROM fourfold.codebook_version UNION ALL SELECT change FROM "
              "fourfold.article UNION ALL SELECT change FROM fourfold.assignment UNION ALL "
              "SELECT change FROM fourfold.annotation UNION ALL SELECT change FROM fourfold.link "
              "UNION ALL SELECT change FROM fourfold.judgement UNION ALL SELECT change FROM "
              "fourfold.gold_annotation UNION ALL SELECT change FROM fourfold.gold_source UNION "
              "ALL SELECT change FROM fourfold.event) c"))
        == QString::number(p.report.lastChange));
    // Frozen units arrive as stored: the paragraphs of f1 and the sentence pairs as bytes
    // (8 bytes per sentence: two little-endian int32).
    CHECK(lead.value(QStringLiteral("SELECT jsonb_array_length(paragraphs) FROM fourfold.article "
                                    "WHERE external_id = 'f1'"))
        == "2");
    CHECK(lead.value(QStringLiteral("SELECT length(sentences) FROM fourfold.article WHERE "
                                    "external_id = 'f1'"))
        == "32");
    // The gold span's provenance names C02's span.
    CHECK(lead.value(QStringLiteral("SELECT a.coder FROM fourfold.gold_source s JOIN "
                                    "fourfold.annotation a ON a.uuid = s.annotation"))
        == p.uuidOf(QStringLiteral("C02")));
}

TEST_CASE("A coder's role reads only its own rows and its own articles")
{
    PublishedProject p;
    ServerSql lead(p.loginOf(QStringLiteral("L01")));
    for (const QString &pseudonym :
        {QStringLiteral("C01"), QStringLiteral("C02"), QStringLiteral("C03")}) {
        CAPTURE(pseudonym.toStdString());
        const QString me = p.uuidOf(pseudonym);
        ServerSql coder(p.loginOf(pseudonym));
        // Its own rows, exactly as many as the lead sees for it; none of anyone else's.
        for (const QString &table : kCoderTables) {
            CAPTURE(table.toStdString());
            const QString mine =
                lead.value(QStringLiteral("SELECT count(*) FROM fourfold.%1 WHERE coder = '%2'")
                               .arg(table, me));
            CHECK(
                coder.value(QStringLiteral("SELECT count(*) FROM fourfold.%1").arg(table)) == mine);
            CHECK(coder.value(QStringLiteral("SELECT count(*) FROM fourfold.%1 WHERE coder <> '%2'")
                                  .arg(table, me))
                == "0");
        }
        // No gold, no provenance, no rejections: not even the gold taken from its own span.
        for (const QString &table : kGoldTables)
            CHECK(
                coder.value(QStringLiteral("SELECT count(*) FROM fourfold.%1").arg(table)) == "0");
        // No other person, no one else's events or progress.
        CHECK(coder.rows(QStringLiteral("SELECT pseudonym FROM fourfold.person"))
            == QStringList {pseudonym});
        CHECK(coder.value(QStringLiteral(
                  "SELECT count(*) FROM fourfold.event WHERE person IS DISTINCT FROM '%1'")
                              .arg(me))
            == "0");
        CHECK(coder.value(QStringLiteral("SELECT count(*) FROM fourfold.login")) == "1");
        // The articles assigned to it, and every codebook version.
        CHECK(coder.rows(QStringLiteral("SELECT external_id FROM fourfold.article ORDER BY 1"))
            == lead.rows(QStringLiteral("SELECT DISTINCT a.external_id FROM fourfold.article a "
                                        "JOIN fourfold.assignment s ON s.article = a.uuid WHERE "
                                        "s.coder = '%1' ORDER BY 1")
                             .arg(me)));
        CHECK(coder.value(QStringLiteral("SELECT count(*) FROM fourfold.codebook_version"))
            == lead.value(QStringLiteral("SELECT count(*) FROM fourfold.codebook_version")));
    }
    // The fixture's assignments: C01 codes f1 and f2 only.
    ServerSql c1(p.loginOf(QStringLiteral("C01")));
    CHECK(c1.rows(QStringLiteral("SELECT external_id FROM fourfold.article ORDER BY 1"))
        == QStringList {QStringLiteral("f1"), QStringLiteral("f2")});
    CHECK(c1.value(QStringLiteral("SELECT count(*) FROM fourfold.annotation")) == "3");
}

TEST_CASE("A coder's role writes only rows carrying its own identity")
{
    PublishedProject p;
    const QString c1 = p.uuidOf(QStringLiteral("C01"));
    const QString c2 = p.uuidOf(QStringLiteral("C02"));
    ServerSql coder(p.loginOf(QStringLiteral("C01")));
    ServerSql lead(p.loginOf(QStringLiteral("L01")));
    const QString f1 =
        lead.value(QStringLiteral("SELECT uuid FROM fourfold.article WHERE external_id = 'f1'"));
    const QString f3 =
        lead.value(QStringLiteral("SELECT uuid FROM fourfold.article WHERE external_id = 'f3'"));
    const QString codebook =
        lead.value(QStringLiteral("SELECT uuid FROM fourfold.codebook_version LIMIT 1"));
    auto insertSpan = [&](const QString &uuid, const QString &article, const QString &person) {
        return coder.attempt(QStringLiteral(
            "INSERT INTO fourfold.annotation (uuid, article, coder, function, start, \"end\", "
            "quote, codebook_version, phase, created_at, modified_at) VALUES ('%1', '%2', '%3', "
            "'problem', 0, 3, 'The', '%4', 'reliability', '2026-01-01T00:00:00.000Z', "
            "'2026-01-01T00:00:00.000Z')")
                                 .arg(uuid, article, person, codebook));
    };
    const QString before =
        lead.value(QStringLiteral("SELECT max(change) FROM fourfold.annotation"));

    // Under another coder's identity, even on an article both code: refused.
    CHECK(insertSpan(QStringLiteral("00000000-0000-4000-8000-000000000001"), f1, c2) == "42501");
    // Its own identity on an article not assigned to it: refused.
    CHECK(insertSpan(QStringLiteral("00000000-0000-4000-8000-000000000002"), f3, c1) == "42501");
    // Its own identity on its own article: taken, with a new change number.
    CHECK(insertSpan(QStringLiteral("00000000-0000-4000-8000-000000000003"), f1, c1) == "");
    CHECK(lead.value(QStringLiteral("SELECT coder || '|' || (change > %1) FROM fourfold.annotation "
                                    "WHERE uuid = '00000000-0000-4000-8000-000000000003'")
                         .arg(before))
        == c1 + QStringLiteral("|true"));

    long changed = -1;
    // Another coder's rows cannot be changed (they are not even there for it).
    CHECK(
        coder.attempt(
            QStringLiteral("UPDATE fourfold.annotation SET note = 'x' WHERE coder = '%1'").arg(c2),
            &changed)
        == "");
    CHECK(changed == 0);
    CHECK(lead.value(QStringLiteral(
              "SELECT count(*) FROM fourfold.annotation WHERE coder = '%1' AND note = 'x'")
                         .arg(c2))
        == "0");
    // Its own row cannot be handed to another coder, nor its assignment moved to another article.
    CHECK(coder.attempt(QStringLiteral("UPDATE fourfold.annotation SET coder = '%1' WHERE uuid = "
                                       "'00000000-0000-4000-8000-000000000003'")
                            .arg(c2))
        != "");
    CHECK(coder.attempt(QStringLiteral("UPDATE fourfold.assignment SET article = '%1'").arg(f3))
        != "");
    CHECK(lead.value(QStringLiteral("SELECT count(*) FROM fourfold.assignment WHERE coder = '%1' "
                                    "AND article = '%2'")
                         .arg(c1, f3))
        == "0");
    // Its own progress it may set.
    CHECK(coder.attempt(QStringLiteral("UPDATE fourfold.assignment SET status = 'done'"), &changed)
        == "");
    CHECK(changed == 2);
    // No gold, no answers or links for others, no events under another person, no deleting.
    CHECK(coder.attempt(QStringLiteral(
              "INSERT INTO fourfold.gold_annotation (uuid, article, function, start, \"end\", "
              "quote, decided_by, decided_at) VALUES ('00000000-0000-4000-8000-000000000004', "
              "'%1', 'problem', 0, 3, 'The', '%2', '2026-01-01T00:00:00.000Z')")
                            .arg(f1, c1))
        == "42501");
    CHECK(coder.attempt(QStringLiteral(
              "INSERT INTO fourfold.judgement (uuid, article, coder, item, value, "
              "codebook_version, phase, created_at, modified_at) VALUES "
              "('00000000-0000-4000-8000-000000000005', '%1', '%2', 'dominant_function', "
              "'cause', '%3', 'reliability', 'x', 'x')")
                            .arg(f1, c2, codebook))
        == "42501");
    CHECK(coder.attempt(QStringLiteral(
              "INSERT INTO fourfold.event (source, source_id, at, person, action, object_type) "
              "VALUES ('x', 1, 'x', '%1', 'annotation.add', 'annotation')")
                            .arg(c2))
        == "42501");
    CHECK(coder.attempt(QStringLiteral(
              "INSERT INTO fourfold.event (source, source_id, at, person, action, object_type) "
              "VALUES ('x', 1, 'x', '%1', 'annotation.add', 'annotation')")
                            .arg(c1))
        == "");
    CHECK(coder.attempt(QStringLiteral("DELETE FROM fourfold.annotation")) == "42501");
    CHECK(coder.attempt(QStringLiteral("UPDATE fourfold.event SET action = 'x'")) == "42501");
    CHECK(
        coder.attempt(QStringLiteral("INSERT INTO fourfold.login VALUES ('x', '%1', true)").arg(c1))
        == "42501");
    CHECK(
        coder.attempt(QStringLiteral("UPDATE fourfold.person SET role = 'lead'"), &changed) == "");
    CHECK(changed == 0);
    CHECK(coder.attempt(QStringLiteral("SET ROLE %1_c02").arg(p.db.name)) == "42501");
    CHECK(coder.attempt(QStringLiteral("SELECT setval('fourfold.change_number', 1)")) == "42501");
    // The lead sees the coder's new span and changed progress.
    CHECK(lead.value(
              QStringLiteral("SELECT count(*) FROM fourfold.annotation WHERE coder = '%1'").arg(c1))
        == "4");
    CHECK(lead.value(QStringLiteral("SELECT count(*) FROM fourfold.assignment WHERE coder = '%1' "
                                    "AND status = 'done'")
                         .arg(c1))
        == "2");
}

TEST_CASE("A refused publish leaves the server and the credentials folder as they were")
{
    CopiesFixture f;
    PostgresCluster &cluster = PostgresCluster::shared();
    const auto db = cluster.newDatabase();
    // A role of that name exists already (another project, say): nothing may be kept.
    cluster.superuserExec(QStringLiteral("CREATE ROLE %1_c02").arg(db.name));
    const QString credentials = f.dir.filePath(QStringLiteral("credentials"));
    auto r = TeamProject::publish(*f.main, db.adminConninfo, credentials);
    REQUIRE_FALSE(r);
    CHECK(r.error().code == ErrorCode::Duplicate);
    CHECK(r.error().message.contains(db.name + QStringLiteral("_c02")));
    CHECK_FALSE(QFileInfo::exists(credentials));
    ServerSql admin(db.adminConninfo);
    CHECK(admin.value(QStringLiteral("SELECT to_regnamespace('fourfold') IS NULL")) == "t");
    CHECK(admin.value(QStringLiteral("SELECT count(*) FROM pg_roles WHERE rolname LIKE '%1\\_%'")
                          .arg(db.name))
        == "2"); // the admin and the role made above
    auto server = store::setting(databaseForTesting(*f.main), TeamProject::serverSettingKey());
    REQUIRE(server);
    CHECK_FALSE(server->has_value());

    // Publishing twice into one database: the second is refused, the first stays whole.
    cluster.superuserExec(QStringLiteral("DROP ROLE %1_c02").arg(db.name));
    REQUIRE(TeamProject::publish(*f.main, db.adminConninfo, credentials));
    auto again =
        TeamProject::publish(*f.main, db.adminConninfo, f.dir.filePath(QStringLiteral("c2")));
    REQUIRE_FALSE(again);
    CHECK(again.error().code == ErrorCode::Duplicate);
    CHECK_FALSE(QFileInfo::exists(f.dir.filePath(QStringLiteral("c2"))));
    CHECK(admin.value(QStringLiteral("SELECT count(*) FROM fourfold.annotation")) == "8");
    // A folder that holds something already is refused before the server is touched.
    auto notEmpty = TeamProject::publish(*f.main, db.adminConninfo, credentials);
    REQUIRE_FALSE(notEmpty);
    CHECK(notEmpty.error().code == ErrorCode::Duplicate);
}

TEST_CASE("The CLI publishes a project and names each person's password file")
{
    CopiesFixture f;
    PostgresCluster &cluster = PostgresCluster::shared();
    const auto db = cluster.newDatabase();
    f.main.reset();
    const QString credentials = f.dir.filePath(QStringLiteral("keys"));
    const CliRun run = runCli(QStringLiteral(FOURFOLD_CLI),
        {QStringLiteral("team"), QStringLiteral("publish"), f.mainPath, QStringLiteral("--server"),
            db.adminConninfo, QStringLiteral("--credentials-out"), credentials,
            QStringLiteral("--json")});
    INFO(run.err.toStdString());
    REQUIRE(run.exitCode == 0);
    const QJsonObject json = cliJson(run);
    CHECK(json.value(QStringLiteral("annotations")).toInteger() == 8);
    CHECK(json.value(QStringLiteral("schema_version")).toInteger() == kServerSchemaVersion);
    const QJsonArray logins = json.value(QStringLiteral("logins")).toArray();
    REQUIRE(logins.size() == 4);
    CHECK(logins[0].toObject().value(QStringLiteral("pseudonym")).toString() == "C01");
    CHECK(logins[0].toObject().value(QStringLiteral("file")).toString()
        == QDir(credentials).filePath(QStringLiteral("C01.pgpass")));
    // People's names stay out of the output (pseudonyms only).
    CHECK_FALSE(run.out.contains(QLatin1String("Testperson")));
    CHECK_FALSE(run.out.contains(QLatin1String("password=")));

    // Wrong use: no server named.
    const CliRun usage = runCli(QStringLiteral(FOURFOLD_CLI),
        {QStringLiteral("team"), QStringLiteral("publish"), f.mainPath});
    CHECK(usage.exitCode == 2);
    CHECK(usage.err.contains(QLatin1String("--server")));
}
