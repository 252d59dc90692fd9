// A person's working file from a team project's server (TeamProject::join): exactly what that
// person's login role may read there, in an ordinary project file. The oracle is the published
// project file itself: the coder's objects in the portable form coder copies merge by
// (store::portableRows) must come back unchanged through the server.

#include "core/project/project.h"
#include "core/project/testing/project_database.h"
#include "core/store/copy_tables.h"
#include "core/store/project_tables.h"
#include "core/team/team_project.h"
#include "tests/support/cli_run.h"
#include "tests/team/published_project.h"

#include <QFileInfo>
#include <QProcessEnvironment>

#include <catch2/catch.hpp>

using namespace fourfold;
using namespace fourfold::test;

namespace {

// The portable rows of `coderUuid` as "KEY DIGEST SECONDS" lines.

Project joined(PublishedProject &p, const QString &pseudonym, const QString &file)
{
    auto r = TeamProject::join(p.loginOf(pseudonym), pseudonym, file);
    INFO((r ? QString() : r.error().toString()).toStdString());
    REQUIRE(r);
    CHECK(r->pseudonym == pseudonym);
    CHECK(r->lastChange > 0);
    auto project = Project::open(file);
    REQUIRE(project);
    return std::move(*project);
}

} // namespace

TEST_CASE("A coder's working file holds the coder's articles and own codings and nothing else")
{
    PublishedProject p;
    const QString file = p.dir.filePath(QStringLiteral("c01.fourfold"));
    Project c1 = joined(p, QStringLiteral("C01"), file);
    const QString me = p.uuidOf(QStringLiteral("C01"));

    auto counts = c1.counts();
    REQUIRE(counts);
    CHECK(counts->coders == 1);
    CHECK(counts->articles == 2);
    CHECK(counts->assignments == 2);
    CHECK(counts->annotations == 3);
    CHECK(counts->links == 0);
    CHECK(counts->judgements == 0);
    CHECK(counts->goldAnnotations == 0);
    auto coders = c1.coders();
    REQUIRE(coders);
    REQUIRE(coders->size() == 1);
    CHECK(coders->front().pseudonym == "C01");
    CHECK(coders->front().uuid == me);
    auto articles = c1.articles();
    REQUIRE(articles);
    QStringList ids;
    for (const ArticleSummary &a : *articles)
        ids << a.externalId;
    ids.sort();
    CHECK(ids == QStringList {QStringLiteral("f1"), QStringLiteral("f2")});

    // The coder's objects come back as they were published (same keys, digests and times):
    // two assignments and three spans.
    CHECK(objectsOf(databaseForTesting(c1), me).size() == 5);
    CHECK(objectsOf(databaseForTesting(c1), me) == objectsOf(databaseForTesting(*p.main), me));
    auto others = store::rowsOfOtherCoders(databaseForTesting(c1), me);
    REQUIRE(others);
    CHECK(*others == 0);
    // Texts, units and spans are whole: the file's own integrity check finds nothing.
    auto check = c1.check();
    REQUIRE(check);
    INFO(check->problems.join(QLatin1Char('\n')).toStdString());
    CHECK(check->isClean());
    CHECK(check->articlesChecked == 2);
    CHECK(check->spansChecked == 3);
    auto a = c1.articleByExternalId(QStringLiteral("f1"));
    REQUIRE(a);
    REQUIRE(a->has_value());
    auto article = c1.article(**a);
    REQUIRE(article);
    CHECK(article->text == p.text1);

    // The file records where it came from, and no password.
    Database &db = databaseForTesting(c1);
    CHECK(store::setting(db, TeamProject::pseudonymSettingKey())->value_or(QString()) == "C01");
    const QString server = store::setting(db, TeamProject::serverSettingKey())->value_or(QString());
    CHECK(server.contains(p.db.name));
    CHECK_FALSE(server.contains(QLatin1String("password")));
    CHECK(store::setting(db, TeamProject::lastChangeSettingKey())->value_or(QString()).toLongLong()
        > 0);
}

TEST_CASE("A lead's working file holds the whole project")
{
    PublishedProject p;
    Project lead = joined(p, QStringLiteral("L01"), p.dir.filePath(QStringLiteral("l01.fourfold")));
    auto mine = lead.counts();
    auto original = p.main->counts();
    REQUIRE(mine);
    REQUIRE(original);
    CHECK(mine->coders == 4);
    CHECK(mine->articles == original->articles);
    CHECK(mine->sentences == original->sentences);
    CHECK(mine->tokens == original->tokens);
    CHECK(mine->paragraphs == original->paragraphs);
    CHECK(mine->assignments == original->assignments);
    CHECK(mine->annotations == original->annotations);
    CHECK(mine->links == original->links);
    CHECK(mine->judgements == original->judgements);
    CHECK(mine->goldAnnotations == 1);
    for (const QString &pseudonym : {QStringLiteral("C01"), QStringLiteral("C02"),
             QStringLiteral("C03"), QStringLiteral("L01")}) {
        const QString uuid = p.uuidOf(pseudonym);
        CHECK(objectsOf(databaseForTesting(lead), uuid)
            == objectsOf(databaseForTesting(*p.main), uuid));
    }
    auto gold = lead.goldAnnotations();
    auto goldThere = p.main->goldAnnotations();
    REQUIRE(gold);
    REQUIRE(goldThere);
    REQUIRE(gold->size() == 1);
    CHECK(gold->front().uuid == goldThere->front().uuid);
    CHECK(gold->front().content.range == goldThere->front().content.range);
    CHECK(gold->front().sources.size() == 1);
    auto check = lead.check();
    REQUIRE(check);
    CHECK(check->isClean());
}

TEST_CASE("Joining is refused for another person than the login and for an existing file")
{
    PublishedProject p;
    const QString file = p.dir.filePath(QStringLiteral("w.fourfold"));
    auto other = TeamProject::join(p.loginOf(QStringLiteral("C01")), QStringLiteral("C02"), file);
    REQUIRE_FALSE(other);
    CHECK(other.error().code == ErrorCode::InvalidArgument);
    CHECK_FALSE(QFileInfo::exists(file));
    auto admin = TeamProject::join(p.db.adminConninfo, QStringLiteral("L01"), file);
    REQUIRE_FALSE(admin);
    CHECK(admin.error().code == ErrorCode::NotAllowed);
    CHECK_FALSE(QFileInfo::exists(file));
    auto existing =
        TeamProject::join(p.loginOf(QStringLiteral("C01")), QStringLiteral("C01"), p.mainPath);
    REQUIRE_FALSE(existing);
    CHECK(existing.error().code == ErrorCode::Duplicate);
}

TEST_CASE("The CLI joins with a URI and the person's password file")
{
    PublishedProject p;
    const QString file = p.dir.filePath(QStringLiteral("c02.fourfold"));
    QString role, passfile;
    for (const TeamLogin &l : p.report.logins)
        if (l.pseudonym == QLatin1String("C02")) {
            role = l.role;
            passfile = l.passwordFile;
        }
    QProcessEnvironment env = QProcessEnvironment::systemEnvironment();
    env.insert(QStringLiteral("PGPASSFILE"), passfile);
    const CliRun run = runCli(QStringLiteral(FOURFOLD_CLI),
        {QStringLiteral("team"), QStringLiteral("join"),
            QStringLiteral("postgresql://%1@/%2?host=%3")
                .arg(role, p.db.name, p.cluster.socketDir()),
            QStringLiteral("--as"), QStringLiteral("C02"), QStringLiteral("--out"), file,
            QStringLiteral("--json")},
        120000, env);
    INFO(run.err.toStdString());
    REQUIRE(run.exitCode == 0);
    const QJsonObject json = cliJson(run);
    CHECK(json.value(QStringLiteral("annotations")).toInteger() == 3);
    CHECK(json.value(QStringLiteral("links")).toInteger() == 1);
    CHECK(json.value(QStringLiteral("judgements")).toInteger() == 1);
    CHECK(json.value(QStringLiteral("gold")).toInteger() == 0);
    CHECK(json.value(QStringLiteral("lead")).toBool() == false);
    CHECK(QFileInfo(file).isFile());
}
