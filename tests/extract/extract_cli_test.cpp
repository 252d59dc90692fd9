// `fourfold-cli extract` as a script sees it: exit codes (0 done, 1 failed, 2 bad command line),
// one-line errors on stderr, JSON output, and no run left behind after a failure.
#include "tests/extract/extract_fixture.h"
#include "tests/support/cli_run.h"

#include <QJsonArray>
#include <QJsonObject>

using namespace fourfold;
using namespace fourfold::test;

namespace {

CliRun cli(const QStringList &args)
{
    return runCli(QStringLiteral(FOURFOLD_CLI), args);
}

QStringList runNames(const QString &project)
{
    const CliRun r = cli(
        {QStringLiteral("extract"), project, QStringLiteral("--list"), QStringLiteral("--json")});
    REQUIRE(r.exitCode == 0);
    QStringList names;
    for (const QJsonValue &v : cliJson(r).value(QStringLiteral("runs")).toArray())
        names << v.toObject().value(QStringLiteral("name")).toString();
    return names;
}

} // namespace

TEST_CASE("extract: baselines, list and delete through the CLI")
{
    ProjectFixture f;
    f.importJsonl(kFerryArticle + kDykeArticle);
    const QString project = f.project.path();
    const QString e = QStringLiteral("extract");

    CliRun r = cli({e, QStringLiteral("--help")});
    CHECK(r.exitCode == 0);
    CHECK(r.out.contains(QStringLiteral("Usage: fourfold-cli extract")));

    r = cli({e, project, QStringLiteral("--extractor"), QStringLiteral("position"),
        QStringLiteral("--run"), QStringLiteral("pos"), QStringLiteral("--param"),
        QStringLiteral("body=cause"), QStringLiteral("--json")});
    REQUIRE(r.exitCode == 0);
    const QJsonObject run = cliJson(r).value(QStringLiteral("run")).toObject();
    CHECK(run.value(QStringLiteral("name")).toString() == QStringLiteral("pos"));
    CHECK(run.value(QStringLiteral("spans")).toInt() == 4);
    CHECK(run.value(QStringLiteral("spansPerFunction")).toObject()
        == QJsonObject {{QStringLiteral("problem"), 2}, {QStringLiteral("cause"), 1},
            {QStringLiteral("evaluation"), 0}, {QStringLiteral("remedy"), 1}});
    CHECK(run.value(QStringLiteral("parameters")).toObject().value(QStringLiteral("body"))
        == QStringLiteral("cause"));

    r = cli({e, project, QStringLiteral("--extractor"), QStringLiteral("cues"),
        QStringLiteral("--run"), QStringLiteral("cues")});
    REQUIRE(r.exitCode == 0);
    CHECK(r.out.contains(QStringLiteral("Run          cues (cues, version 1)")));
    CHECK(runNames(project) == QStringList {QStringLiteral("pos"), QStringLiteral("cues")});

    r = cli({e, project, QStringLiteral("--delete"), QStringLiteral("pos")});
    CHECK(r.exitCode == 0);
    CHECK(runNames(project) == QStringList {QStringLiteral("cues")});
}

TEST_CASE("extract: wrong command lines exit 2 and store nothing")
{
    ProjectFixture f;
    f.importJsonl(kFerryArticle);
    const QString project = f.project.path();
    const QString e = QStringLiteral("extract");
    const std::vector<QStringList> wrong {
        {e, project},
        {e, project, QStringLiteral("--extractor"), QStringLiteral("position")},
        {e, project, QStringLiteral("--extractor"), QStringLiteral("magic"),
            QStringLiteral("--run"), QStringLiteral("x")},
        {e, project, QStringLiteral("--extractor"), QStringLiteral("position"),
            QStringLiteral("--command"), QStringLiteral("true"), QStringLiteral("--run"),
            QStringLiteral("x")},
        {e, project, QStringLiteral("--extractor"), QStringLiteral("position"),
            QStringLiteral("--run"), QStringLiteral("x"), QStringLiteral("--param"),
            QStringLiteral("intro=frame")},
        {e, project, QStringLiteral("--extractor"), QStringLiteral("cues"), QStringLiteral("--run"),
            QStringLiteral("x"), QStringLiteral("--param"), QStringLiteral("noequals")},
        {e, project, QStringLiteral("--command"), QStringLiteral("true"), QStringLiteral("--run"),
            QStringLiteral("x"), QStringLiteral("--timeout"), QStringLiteral("-3")},
    };
    for (const QStringList &args : wrong) {
        INFO(args.join(QLatin1Char(' ')).toStdString());
        const CliRun r = cli(args);
        CHECK(r.exitCode == 2);
        CHECK(r.err.startsWith(QStringLiteral("fourfold-cli extract: ")));
    }
    CHECK(runNames(project).isEmpty());
}

TEST_CASE("extract: a failing external extractor or span file exits 1 and leaves no run")
{
    ProjectFixture f;
    f.importJsonl(kFerryArticle);
    const QString project = f.project.path();
    const QString e = QStringLiteral("extract");
    const QString scripts = QStringLiteral(FOURFOLD_EXTRACT_SCRIPTS);

    CliRun r = cli({e, project, QStringLiteral("--command"),
        QStringLiteral("/usr/bin/python3 %1/hanging_extractor.py").arg(scripts),
        QStringLiteral("--timeout"), QStringLiteral("1"), QStringLiteral("--run"),
        QStringLiteral("slow")});
    CHECK(r.exitCode == 1);
    CHECK(r.err.contains(QStringLiteral("did not finish within 1 s and was stopped")));
    CHECK(r.err.count(QLatin1Char('\n')) == 1);

    r = cli({e, project, QStringLiteral("--command"),
        QStringLiteral("/usr/bin/python3 %1/garbage_extractor.py").arg(scripts),
        QStringLiteral("--run"), QStringLiteral("garbage")});
    CHECK(r.exitCode == 1);
    CHECK(r.err.contains(QStringLiteral("garbage_extractor.py\":2:24: not valid JSON")));

    const QString spans = writeFile(f.dir, QStringLiteral("spans.jsonl"),
        "{\"article\":\"ferry\",\"function\":\"remedy\",\"start\":85,\"end\":126}\n"
        "{\"article\":\"ferry\",\"function\":\"remedy\",\"start\":85,\"end\":127}\n");
    r = cli({e, project, QStringLiteral("--from-file"), spans, QStringLiteral("--run"),
        QStringLiteral("file")});
    CHECK(r.exitCode == 1);
    CHECK(r.err
        == QStringLiteral("fourfold-cli: %1:2: the span [85, 127) ends past the end of the "
                          "article, which has 126 code points\n")
               .arg(spans));
    CHECK(runNames(project).isEmpty());

    // The same file without its bad line imports.
    writeFile(f.dir, QStringLiteral("spans.jsonl"),
        "{\"article\":\"ferry\",\"function\":\"remedy\",\"start\":85,\"end\":126}\n");
    r = cli({e, project, QStringLiteral("--from-file"), spans, QStringLiteral("--run"),
        QStringLiteral("file"), QStringLiteral("--version"), QStringLiteral("7")});
    CHECK(r.exitCode == 0);
    CHECK(runNames(project) == QStringList {QStringLiteral("file")});
}
