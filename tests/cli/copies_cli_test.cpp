// `fourfold-cli handout` and `merge` as a script sees them: exit codes (0 ok, 1 failed, 2 usage),
// one-line errors on stderr, JSON output; the project file checked before and after.
#include "core/project/article_status_edit.h"
#include "core/project/subsample_draw.h"
#include "tests/project/copies_fixture.h"
#include "tests/support/cli_run.h"

#include <QJsonArray>
#include <QJsonObject>
#include <QThread>

#include <sqlite3.h>

using namespace fourfold;
using namespace fourfold::test;

namespace {

CliRun cli(const QStringList &args)
{
    return runCli(QStringLiteral(FOURFOLD_CLI), args);
}

void execSql(const QString &path, const char *sql)
{
    sqlite3 *db = nullptr;
    REQUIRE(sqlite3_open_v2(path.toUtf8().constData(), &db, SQLITE_OPEN_READWRITE, nullptr)
        == SQLITE_OK);
    const int rc = sqlite3_exec(db, sql, nullptr, nullptr, nullptr);
    sqlite3_close(db);
    REQUIRE(rc == SQLITE_OK);
}

// Changes the actor of the coder's cause span on f1 in the project file `path`.
void changeCauseActor(const QString &path, const QString &actor)
{
    auto p = Project::open(path);
    REQUIRE(p);
    auto c = p->coderByPseudonym(QStringLiteral("C01"));
    REQUIRE(c);
    auto f1 = p->articleByExternalId(QStringLiteral("f1"));
    REQUIRE(f1);
    auto list = p->annotations(**f1, (*c)->id);
    REQUIRE(list);
    for (const Annotation &a : *list)
        if (a.content.function == FramingFunction::Cause) {
            AnnotationContent content = a.content;
            content.attributes = {{QStringLiteral("actor"), actor}};
            ChangeAnnotationEdit edit(a.id, content, (*c)->id);
            REQUIRE(p->apply(edit));
        }
}

} // namespace

TEST_CASE("handout and merge answer --help and refuse wrong command lines with exit 2")
{
    for (const char *command : {"handout", "merge"}) {
        const CliRun r = cli({QString::fromLatin1(command), QStringLiteral("--help")});
        CHECK(r.exitCode == 0);
        CHECK(r.out.contains(QStringLiteral("Usage: fourfold-cli %1").arg(QLatin1String(command))));
    }
    CHECK(cli({QStringLiteral("handout"), QStringLiteral("p.fourfold"), QStringLiteral("--out"),
                  QStringLiteral("x")})
              .exitCode
        == 2);
    CHECK(cli({QStringLiteral("merge"), QStringLiteral("p.fourfold")}).exitCode == 2);
    const CliRun r = cli({QStringLiteral("merge"), QStringLiteral("p.fourfold"),
        QStringLiteral("--resolve"), QStringLiteral("u")});
    CHECK(r.exitCode == 2);
    CHECK(r.err.contains(QStringLiteral("--keep")));
    CHECK(cli({QStringLiteral("merge"), QStringLiteral("p.fourfold"), QStringLiteral("--resolve"),
                  QStringLiteral("u"), QStringLiteral("--keep"), QStringLiteral("yours")})
              .exitCode
        == 2);
}

TEST_CASE("a coder copy handed out, edited, merged, merged again, tampered and in conflict")
{
    CopiesFixture f;
    f.main.reset();
    const QString main = f.mainPath;
    const QString copy = f.dir.filePath(QStringLiteral("c01.fourfold"));

    CliRun r = cli({QStringLiteral("handout"), main, QStringLiteral("--coder"),
        QStringLiteral("C01"), QStringLiteral("--out"), copy, QStringLiteral("--json")});
    REQUIRE(r.exitCode == 0);
    QJsonObject o = cliJson(r);
    CHECK(o.value(QStringLiteral("coder")).toString() == QStringLiteral("C01"));
    CHECK(o.value(QStringLiteral("articles")).toInteger() == 2);
    CHECK(o.value(QStringLiteral("annotations")).toInteger() == 3);
    CHECK_FALSE(r.out.contains(QStringLiteral("Noor"))); // pseudonyms only

    r = cli({QStringLiteral("handout"), main, QStringLiteral("--coder"), QStringLiteral("C01"),
        QStringLiteral("--out"), copy});
    CHECK(r.exitCode == 1);
    CHECK(r.err.startsWith(QStringLiteral("fourfold-cli: ")));
    CHECK(r.err.count(QLatin1Char('\n')) == 1);

    changeCauseActor(copy, QStringLiteral("the harbour board"));
    r = cli({QStringLiteral("merge"), main, copy, QStringLiteral("--json")});
    REQUIRE(r.exitCode == 0);
    o = cliJson(r);
    QJsonObject merged = o.value(QStringLiteral("merged")).toArray().at(0).toObject();
    CHECK(merged.value(QStringLiteral("changed")).toInteger() == 1);
    CHECK(merged.value(QStringLiteral("alreadyMerged")).toBool() == false);
    CHECK(o.value(QStringLiteral("openConflicts")).toInteger() == 0);

    r = cli({QStringLiteral("merge"), main, copy});
    CHECK(r.exitCode == 0);
    CHECK(r.out.contains(QStringLiteral("nothing new")));

    const QString infoBefore = cli({QStringLiteral("info"), main, QStringLiteral("--json")}).out;
    const QString tampered = f.dir.filePath(QStringLiteral("tampered.fourfold"));
    REQUIRE(QFile::copy(copy, tampered));
    execSql(tampered, "UPDATE article SET text = text || ' ' WHERE external_id = 'f2'");
    r = cli({QStringLiteral("merge"), main, tampered});
    CHECK(r.exitCode == 1);
    CHECK(r.err.contains(QStringLiteral("The text of article \"f2\"")));
    CHECK(r.err.count(QLatin1Char('\n')) == 1);
    CHECK(cli({QStringLiteral("info"), main, QStringLiteral("--json")}).out == infoBefore);

    // The same span changed in the project and later in the copy: the copy's later change is
    // kept, the project's is a conflict, listed and resolved.
    changeCauseActor(main, QStringLiteral("the province"));
    QThread::msleep(20); // later edits get later times (milliseconds)
    changeCauseActor(copy, QStringLiteral("the ferry company"));
    r = cli({QStringLiteral("merge"), main, copy});
    REQUIRE(r.exitCode == 0);
    CHECK(r.out.contains(QStringLiteral("conflicts 1,")));
    CHECK(r.out.contains(QStringLiteral("Open conflicts waiting for your decision: 1")));
    CHECK(r.out.contains(QStringLiteral("--conflicts")));
    r = cli(
        {QStringLiteral("merge"), main, QStringLiteral("--conflicts"), QStringLiteral("--json")});
    REQUIRE(r.exitCode == 0);
    const QJsonArray conflicts = cliJson(r).value(QStringLiteral("conflicts")).toArray();
    REQUIRE(conflicts.size() == 1);
    const QJsonObject c = conflicts.at(0).toObject();
    CHECK(c.value(QStringLiteral("coder")).toString() == QStringLiteral("C01"));
    CHECK(c.value(QStringLiteral("type")).toString() == QStringLiteral("annotation"));
    CHECK(c.value(QStringLiteral("article")).toString() == QStringLiteral("f1"));
    CHECK(c.value(QStringLiteral("mine"))
              .toObject()
              .value(QStringLiteral("attributes"))
              .toString()
              .contains(QStringLiteral("the ferry company")));
    CHECK(c.value(QStringLiteral("theirs"))
              .toObject()
              .value(QStringLiteral("attributes"))
              .toString()
              .contains(QStringLiteral("the province")));
    r = cli({QStringLiteral("merge"), main, QStringLiteral("--conflicts")});
    CHECK(r.out.contains(QStringLiteral(" on article f1")));
    CHECK(r.out.contains(QStringLiteral("mine (kept):   cause [")));
    CHECK(r.out.contains(QStringLiteral("the province")));
    CHECK(r.out.contains(QStringLiteral("theirs (lost): cause [")));
    CHECK(r.out.contains(QStringLiteral("the ferry company")));
    r = cli({QStringLiteral("merge"), main, QStringLiteral("--resolve"),
        c.value(QStringLiteral("conflict")).toString(), QStringLiteral("--keep"),
        QStringLiteral("theirs")});
    CHECK(r.exitCode == 0);
    r = cli({QStringLiteral("merge"), main, QStringLiteral("--conflicts")});
    CHECK(r.out.contains(QStringLiteral("No open merge conflicts.")));
    r = cli({QStringLiteral("merge"), main, QStringLiteral("--resolve"),
        c.value(QStringLiteral("conflict")).toString(), QStringLiteral("--keep"),
        QStringLiteral("mine")});
    CHECK(r.exitCode == 1);
    {
        auto p = Project::open(main);
        REQUIRE(p);
        auto all = p->allAnnotations();
        REQUIRE(all);
        CHECK(std::ranges::count_if(*all, [](const Annotation &a) {
            return a.content.attributes.value(QStringLiteral("actor")).toString()
                == QStringLiteral("the province");
        }) == 1);
    }
    r = cli({QStringLiteral("check"), main});
    CHECK(r.exitCode == 0);
}

TEST_CASE("merge names the articles a coder coded on a draw withdrawn while the copy was out")
{
    // A reliability draw of one article for C01 and C02, C01's copy handed out, the draw
    // withdrawn, then C01 codes the article in the copy (core/project/coder_copies.h).
    QTemporaryDir dir;
    const QString main = dir.filePath(QStringLiteral("main.fourfold"));
    const QString copy = dir.filePath(QStringLiteral("c01.fourfold"));
    QString drawn;
    {
        auto p = Project::create(main);
        REQUIRE(p);
        REQUIRE(p->importFile(
            writeFile(dir, QStringLiteral("a.jsonl"), kThreeArticles), ImportOptions {}));
        REQUIRE(p->addCoder(
            QStringLiteral("Noor Testperson"), QStringLiteral("C01"), CoderRole::Coder));
        REQUIRE(
            p->addCoder(QStringLiteral("Sam Testperson"), QStringLiteral("C02"), CoderRole::Coder));
        DrawRequest request;
        request.size = 1;
        request.seed = 7;
        request.coders = {QStringLiteral("C01"), QStringLiteral("C02")};
        auto d = SubsampleDraw::plan(*p, request);
        REQUIRE(d);
        REQUIRE(SubsampleDraw::commit(*p, *d));
        drawn = d->articles.front();
        REQUIRE(CoderCopies::handout(*p, QStringLiteral("C01"), copy));
    }
    // The withdrawal names the copy out with the draw's assignments.
    CliRun r = cli({QStringLiteral("assign"), main, QStringLiteral("--withdraw-draw"),
        QStringLiteral("reliability"), QStringLiteral("--json")});
    INFO(r.err.toStdString());
    REQUIRE(r.exitCode == 0);
    const QJsonArray out = cliJson(r).value(QStringLiteral("copies_out")).toArray();
    REQUIRE(out.size() == 1);
    CHECK(out.at(0).toObject().value(QStringLiteral("coder")).toString() == QStringLiteral("C01"));
    CHECK(out.at(0).toObject().value(QStringLiteral("articles")).toArray() == QJsonArray {drawn});
    {
        auto p = Project::open(copy);
        REQUIRE(p);
        auto me = p->coderByPseudonym(QStringLiteral("C01"));
        REQUIRE(me);
        auto a = p->articleByExternalId(drawn);
        REQUIRE(a);
        SetArticleStatusEdit done(**a, (*me)->id, QStringLiteral("done"));
        REQUIRE(p->apply(done));
    }

    r = cli({QStringLiteral("merge"), main, copy});
    REQUIRE(r.exitCode == 0);
    CHECK(r.out.contains(QStringLiteral("C01 coded 1 article")));
    CHECK(r.out.contains(drawn + QStringLiteral(" (reliability)")));
    CHECK(r.out.contains(QStringLiteral("assignments stay withdrawn")));

    r = cli({QStringLiteral("merge"), main, QStringLiteral("--conflicts")});
    REQUIRE(r.exitCode == 0);
    CHECK(r.out.contains(QStringLiteral("mine (kept):   assigned (deleted)")));
    CHECK(r.out.contains(QStringLiteral("theirs (lost): done")));
    CHECK(r.out.contains(QStringLiteral("withdrawn in the project while C01 coded the article")));

    // The JSON report lists the article too; merging again names nothing.
    r = cli({QStringLiteral("merge"), main, copy, QStringLiteral("--json")});
    REQUIRE(r.exitCode == 0);
    const QJsonObject again = cliJson(r).value(QStringLiteral("merged")).toArray().at(0).toObject();
    CHECK(again.value(QStringLiteral("alreadyMerged")).toBool());
    CHECK(again.value(QStringLiteral("withdrawn")).toArray().isEmpty());
}

TEST_CASE("assign --withdraw-draw names in a sentence the coder copy out with the draw")
{
    QTemporaryDir dir;
    const QString main = dir.filePath(QStringLiteral("main.fourfold"));
    {
        auto p = Project::create(main);
        REQUIRE(p);
        REQUIRE(p->importFile(
            writeFile(dir, QStringLiteral("a.jsonl"), kThreeArticles), ImportOptions {}));
        for (const char *c : {"C01", "C02"})
            REQUIRE(p->addCoder(QStringLiteral("Coder %1").arg(QLatin1String(c)),
                QString::fromLatin1(c), CoderRole::Coder));
    }
    CliRun r = cli(
        {QStringLiteral("assign"), main, QStringLiteral("--draw"), QStringLiteral("reliability"),
            QStringLiteral("--size"), QStringLiteral("2"), QStringLiteral("--seed"),
            QStringLiteral("4"), QStringLiteral("--coders"), QStringLiteral("C01,C02")});
    INFO(r.err.toStdString());
    REQUIRE(r.exitCode == 0);
    r = cli({QStringLiteral("handout"), main, QStringLiteral("--coder"), QStringLiteral("C02"),
        QStringLiteral("--out"), dir.filePath(QStringLiteral("c02.fourfold"))});
    REQUIRE(r.exitCode == 0);
    r = cli({QStringLiteral("assign"), main, QStringLiteral("--withdraw-draw"),
        QStringLiteral("reliability")});
    REQUIRE(r.exitCode == 0);
    CHECK(r.out.contains(QStringLiteral("4 assignment(s) removed")));
    CHECK(r.out.contains(QStringLiteral("C02's coder copy, handed out ")));
    CHECK(r.out.contains(QStringLiteral("holds 2 of the withdrawn assignments")));
    CHECK_FALSE(r.out.contains(QStringLiteral("C01's")));
}
