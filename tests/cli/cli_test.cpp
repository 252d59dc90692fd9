// fourfold-cli as a script sees it: exit codes, one-line errors, JSON output.
#include "core/project/project.h"
#include "tests/support/test_support.h"

#include <QJsonArray>
#include <QJsonDocument>
#include <QJsonObject>
#include <QProcess>

using namespace fourfold;
using namespace fourfold::test;

namespace {

struct Run {
    int exitCode = -1;
    QString out;
    QString err;
};

Run cli(const QStringList &args)
{
    QProcess p;
    p.start(QStringLiteral(FOURFOLD_CLI), args);
    REQUIRE(p.waitForFinished(120000));
    return Run {p.exitCode(), QString::fromUtf8(p.readAllStandardOutput()),
        QString::fromUtf8(p.readAllStandardError())};
}

QJsonObject json(const Run &r)
{
    QJsonParseError e;
    const QJsonDocument doc = QJsonDocument::fromJson(r.out.toUtf8(), &e);
    INFO(r.out.toStdString());
    REQUIRE(e.error == QJsonParseError::NoError);
    return doc.object();
}

} // namespace

TEST_CASE("every subcommand answers --help with exit 0")
{
    for (const char *command : {"new", "import", "info", "check", "build-sample"}) {
        INFO(command);
        const Run r = cli({QString::fromLatin1(command), QStringLiteral("--help")});
        CHECK(r.exitCode == 0);
        CHECK(r.out.contains(QStringLiteral("Usage: fourfold-cli %1").arg(QLatin1String(command))));
    }
}

TEST_CASE("usage errors exit 2, failures exit 1, each with a message on stderr")
{
    QTemporaryDir dir;
    Run r = cli({QStringLiteral("frobnicate")});
    CHECK(r.exitCode == 2);
    CHECK(r.err.contains(QStringLiteral("unknown command \"frobnicate\"")));

    r = cli({QStringLiteral("import"), QStringLiteral("only-a-project.fourfold")});
    CHECK(r.exitCode == 2);

    r = cli({QStringLiteral("info"), dir.filePath(QStringLiteral("missing.fourfold"))});
    CHECK(r.exitCode == 1);
    CHECK(r.err.startsWith(QStringLiteral("fourfold-cli: There is no project file")));
    CHECK(r.err.count(QLatin1Char('\n')) == 1);
}

TEST_CASE("new, import, info and check on a small project")
{
    QTemporaryDir dir;
    const QString project = dir.filePath(QStringLiteral("p.fourfold"));
    REQUIRE(
        cli({QStringLiteral("new"), project, QStringLiteral("--language"), QStringLiteral("nl")})
            .exitCode
        == 0);
    const QString jsonl = writeFile(dir, QStringLiteral("a.jsonl"),
        "{\"id\":\"a\",\"title\":\"Dijk\",\"text\":\"De dijk is te laag. Dat is bijv. "
        "gevaarlijk.\\n\\nHerstel hem.\"}\n"
        "{\"id\":\"b\",\"title\":\"Copy\",\"text\":\"De dijk is te laag. Dat is bijv. "
        "gevaarlijk.\\n\\nHerstel hem.\"}\n");
    Run r = cli({QStringLiteral("import"), project, jsonl});
    REQUIRE(r.exitCode == 0);
    CHECK(r.out.contains(QStringLiteral("1 added, 1 skipped")));
    CHECK(r.out.contains(QStringLiteral("line 2 (b)")));

    r = cli({QStringLiteral("info"), project, QStringLiteral("--json")});
    REQUIRE(r.exitCode == 0);
    const QJsonObject info = json(r);
    CHECK(info.value(QStringLiteral("articles")).toInt() == 1);
    CHECK(info.value(QStringLiteral("paragraphs")).toInt() == 2);
    // "bijv." does not end a sentence (Dutch abbreviation): 3 sentences, not 4.
    CHECK(info.value(QStringLiteral("sentences")).toInt() == 3);
    CHECK(info.value(QStringLiteral("languages")).toObject().value(QStringLiteral("nl")).toInt()
        == 1);

    r = cli({QStringLiteral("check"), project});
    CHECK(r.exitCode == 0);
    CHECK(r.out.contains(QStringLiteral("no problems")));
}

TEST_CASE("a broken import file is refused with file and line, and nothing is added")
{
    QTemporaryDir dir;
    const QString project = dir.filePath(QStringLiteral("p.fourfold"));
    REQUIRE(cli({QStringLiteral("new"), project}).exitCode == 0);
    const QString bad = writeFile(dir, QStringLiteral("bad.jsonl"),
        "{\"id\":\"a\",\"title\":\"Fine\",\"text\":\"Fine.\"}\n{\"id\":\"b\",\"title\":5,\"text\":"
        "\"x\"}\n");
    const Run r = cli({QStringLiteral("import"), project, bad});
    CHECK(r.exitCode == 1);
    CHECK(r.err.contains(bad + QStringLiteral(":2")));
    const Run info = cli({QStringLiteral("info"), project, QStringLiteral("--json")});
    CHECK(json(info).value(QStringLiteral("articles")).toInt() == 0);
}

TEST_CASE("check reports a tampered project with exit 1")
{
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("p.fourfold"));
    {
        auto p = Project::create(path);
        REQUIRE(p);
        REQUIRE(p->importFile(writeFile(dir, QStringLiteral("a.jsonl"),
                                  "{\"id\":\"a\",\"title\":\"T\",\"text\":\"Some text.\"}\n"),
            ImportOptions {}));
        REQUIRE(p->databaseForTesting().exec(QStringLiteral("UPDATE article SET sha256 = 'x'")));
    }
    const Run r = cli({QStringLiteral("check"), path, QStringLiteral("--json")});
    CHECK(r.exitCode == 1);
    const QJsonObject o = json(r);
    CHECK_FALSE(o.value(QStringLiteral("ok")).toBool());
    CHECK(o.value(QStringLiteral("problems")).toArray().size() == 1);
}

TEST_CASE("the sample project builds and its figures are true")
{
    QTemporaryDir dir;
    const QString project = dir.filePath(QStringLiteral("demo.fourfold"));
    Run r = cli({QStringLiteral("build-sample"), QStringLiteral(FOURFOLD_SAMPLE_DIR), project});
    INFO(r.err.toStdString());
    REQUIRE(r.exitCode == 0);
    r = cli({QStringLiteral("check"), project});
    CHECK(r.exitCode == 0);

    // Count the source records independently of the program and compare with `info`.
    QFile codings(QStringLiteral(FOURFOLD_SAMPLE_DIR "/codings.jsonl"));
    REQUIRE(codings.open(QIODevice::ReadOnly));
    int spans = 0, judgements = 0;
    QMap<QString, int> perFunction;
    for (const QByteArray &line : codings.readAll().split('\n')) {
        if (line.trimmed().isEmpty())
            continue;
        const QJsonObject o = QJsonDocument::fromJson(line).object();
        if (o.contains(QStringLiteral("item"))) {
            ++judgements;
        } else {
            ++spans;
            ++perFunction[o.value(QStringLiteral("function")).toString()];
        }
    }
    QFile articles(QStringLiteral(FOURFOLD_SAMPLE_DIR "/articles.jsonl"));
    REQUIRE(articles.open(QIODevice::ReadOnly));
    const int articleCount = int(articles.readAll().trimmed().split('\n').size());

    const QJsonObject info = json(cli({QStringLiteral("info"), project, QStringLiteral("--json")}));
    CHECK(info.value(QStringLiteral("articles")).toInt() == articleCount);
    CHECK(info.value(QStringLiteral("annotations")).toInt() == spans);
    CHECK(info.value(QStringLiteral("judgements")).toInt() == judgements);
    const QJsonObject pf = info.value(QStringLiteral("annotationsPerFunction")).toObject();
    for (auto it = perFunction.cbegin(); it != perFunction.cend(); ++it)
        CHECK(pf.value(it.key()).toInt() == it.value());
    CHECK(info.value(QStringLiteral("coders")).toInt() == 4);
}
