// fourfold-cli as a script sees it: exit codes, one-line errors, JSON output.
#include "core/project/project.h"
#include "core/project/testing/project_database.h"
#include "tests/support/cli_run.h"
#include "tests/support/test_support.h"

#include <QJsonArray>
#include <QJsonDocument>
#include <QJsonObject>
#include <QJsonValue>

using namespace fourfold;
using namespace fourfold::test;

namespace {

CliRun cli(const QStringList &args)
{
    return runCli(QStringLiteral(FOURFOLD_CLI), args);
}

} // namespace

TEST_CASE("every subcommand answers --help with exit 0")
{
    for (const char *command : {"new", "import", "info", "check", "build-sample", "agree"}) {
        INFO(command);
        const CliRun r = cli({QString::fromLatin1(command), QStringLiteral("--help")});
        CHECK(r.exitCode == 0);
        CHECK(r.out.contains(QStringLiteral("Usage: fourfold-cli %1").arg(QLatin1String(command))));
    }
}

TEST_CASE("usage errors exit 2, failures exit 1, each with a message on stderr")
{
    QTemporaryDir dir;
    CliRun r = cli({QStringLiteral("frobnicate")});
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
    CliRun r = cli({QStringLiteral("import"), project, jsonl});
    REQUIRE(r.exitCode == 0);
    CHECK(r.out.contains(QStringLiteral("1 added, 1 skipped")));
    CHECK(r.out.contains(QStringLiteral("line 2 (b)")));

    r = cli({QStringLiteral("info"), project, QStringLiteral("--json")});
    REQUIRE(r.exitCode == 0);
    const QJsonObject info = cliJson(r);
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
    const CliRun r = cli({QStringLiteral("import"), project, bad});
    CHECK(r.exitCode == 1);
    CHECK(r.err.contains(bad + QStringLiteral(":2")));
    const CliRun info = cli({QStringLiteral("info"), project, QStringLiteral("--json")});
    CHECK(cliJson(info).value(QStringLiteral("articles")).toInt() == 0);
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
        REQUIRE(databaseForTesting(*p).exec(QStringLiteral("UPDATE article SET sha256 = 'x'")));
    }
    const CliRun r = cli({QStringLiteral("check"), path, QStringLiteral("--json")});
    CHECK(r.exitCode == 1);
    const QJsonObject o = cliJson(r);
    CHECK_FALSE(o.value(QStringLiteral("ok")).toBool());
    CHECK(o.value(QStringLiteral("problems")).toArray().size() == 1);
}

TEST_CASE("the sample project builds and its figures are true")
{
    QTemporaryDir dir;
    const QString project = dir.filePath(QStringLiteral("demo.fourfold"));
    CliRun r = cli({QStringLiteral("build-sample"), QStringLiteral(FOURFOLD_SAMPLE_DIR), project});
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

    const QJsonObject info =
        cliJson(cli({QStringLiteral("info"), project, QStringLiteral("--json")}));
    CHECK(info.value(QStringLiteral("articles")).toInt() == articleCount);
    CHECK(info.value(QStringLiteral("annotations")).toInt() == spans);
    CHECK(info.value(QStringLiteral("judgements")).toInt() == judgements);
    const QJsonObject pf = info.value(QStringLiteral("annotationsPerFunction")).toObject();
    for (auto it = perFunction.cbegin(); it != perFunction.cend(); ++it)
        CHECK(pf.value(it.key()).toInt() == it.value());
    CHECK(info.value(QStringLiteral("coders")).toInt() == 4);
}

TEST_CASE("agree --data reproduces Krippendorff's worked example and refuses bad matrices")
{
    QTemporaryDir dir;
    // Krippendorff (2011), "Computing Krippendorff's Alpha-Reliability", §C–D (also Krippendorff
    // 2004, p. 230): 4 coders × 12 units, values 1–5, "." missing → nominal 0.743, interval 0.849.
    const QString path = writeFile(dir, QStringLiteral("k.csv"),
        "unit,A,B,C,D\n1,1,1,,1\n2,2,2,3,2\n3,3,3,3,3\n4,3,3,3,3\n5,2,2,2,2\n6,1,2,3,4\n"
        "7,4,4,4,4\n8,1,1,2,1\n9,2,2,2,2\n10,,5,5,5\n11,,,1,1\n12,,3,,\n");
    CliRun r =
        cli({QStringLiteral("agree"), QStringLiteral("--data"), path, QStringLiteral("--json")});
    REQUIRE(r.exitCode == 0);
    QJsonObject o = cliJson(r);
    CHECK(o.value(QStringLiteral("pairable_values")).toDouble() == 40);
    CHECK(o.value(QStringLiteral("pairable_units")).toInt() == 11);
    CHECK(o.value(QStringLiteral("alpha")).toObject().value(QStringLiteral("value")).toDouble()
        == Approx(0.743).margin(5e-4));
    CHECK(o.value(QStringLiteral("alpha")).toObject().value(QStringLiteral("level")).toString()
        == QStringLiteral("nominal"));
    // Missing cells: no Cohen's kappa, no Fleiss' kappa.
    CHECK_FALSE(o.contains(QStringLiteral("cohen_kappa")));
    CHECK_FALSE(o.contains(QStringLiteral("fleiss_kappa")));

    r = cli({QStringLiteral("agree"), QStringLiteral("--data"), path, QStringLiteral("--level"),
        QStringLiteral("interval"), QStringLiteral("--bootstrap"), QStringLiteral("200"),
        QStringLiteral("--seed"), QStringLiteral("5"), QStringLiteral("--json")});
    REQUIRE(r.exitCode == 0);
    o = cliJson(r);
    CHECK(o.value(QStringLiteral("alpha")).toObject().value(QStringLiteral("value")).toDouble()
        == Approx(0.849).margin(5e-4));
    const QJsonObject boot = o.value(QStringLiteral("bootstrap")).toObject();
    CHECK(boot.value(QStringLiteral("method"))
              .toString()
              .contains(QStringLiteral("Hayes & Krippendorff")));
    CHECK(boot.value(QStringLiteral("replicates")).toInt() == 200);
    CHECK(boot.value(QStringLiteral("seed")).toString() == QStringLiteral("5"));
    CHECK(boot.value(QStringLiteral("ci95")).toArray().size() == 2);
    CHECK(boot.value(QStringLiteral("q_below")).toObject().contains(QStringLiteral("0.667")));
    CHECK(o.value(QStringLiteral("bootstrap_units"))
              .toObject()
              .value(QStringLiteral("method"))
              .toString()
              .contains(QStringLiteral("unit")));

    // Two coders, complete: the kappa family appears; an undefined alpha is null with a reason.
    const QString same = writeFile(dir, QStringLiteral("s.csv"), "unit,A,B\n1,x,x\n2,x,x\n");
    o = cliJson(
        cli({QStringLiteral("agree"), QStringLiteral("--data"), same, QStringLiteral("--json")}));
    CHECK(o.value(QStringLiteral("alpha")).toObject().value(QStringLiteral("value")).isNull());
    CHECK_FALSE(o.value(QStringLiteral("alpha"))
                    .toObject()
                    .value(QStringLiteral("reason"))
                    .toString()
                    .isEmpty());
    CHECK(o.contains(QStringLiteral("cohen_kappa")));
    CHECK(o.value(QStringLiteral("scott_pi")).isNull());
    CHECK(o.contains(QStringLiteral("scott_pi_reason")));

    struct Bad {
        QByteArray content;
        QStringList extra;
        const char *expected;
    };
    const Bad bad[] = {
        {"unit,A,B\n1,x,y\n2,x\n", {}, ":3: this row has 2 fields"},
        {"unit,A,B\n1,1,2\n2,1,two\n", {QStringLiteral("--level"), QStringLiteral("interval")},
            ":3: unit \"2\", coder \"B\": \"two\" is not a number"},
        {"unit,A\n1,x\n", {}, "at least two coders"},
        {"", {}, "the file is empty"},
    };
    for (const Bad &b : bad) {
        INFO(b.expected);
        const QString p = writeFile(dir, QStringLiteral("bad.csv"), b.content);
        r = cli(QStringList {QStringLiteral("agree"), QStringLiteral("--data"), p} + b.extra);
        CHECK(r.exitCode == 1);
        CHECK(r.err.contains(QString::fromUtf8(b.expected)));
        CHECK(r.err.count(QLatin1Char('\n')) == 1);
    }
}

TEST_CASE("agree on the sample project: units, functions, continuum")
{
    QTemporaryDir dir;
    const QString project = dir.filePath(QStringLiteral("demo.fourfold"));
    REQUIRE(
        cli({QStringLiteral("build-sample"), QStringLiteral(FOURFOLD_SAMPLE_DIR), project}).exitCode
        == 0);
    QJsonObject o = cliJson(
        cli({QStringLiteral("agree"), project, QStringLiteral("--unit"), QStringLiteral("sentence"),
            QStringLiteral("--function"), QStringLiteral("remedy"), QStringLiteral("--json")}));
    CHECK(o.value(QStringLiteral("coders")).toArray().size() == 3);
    const double remedy =
        o.value(QStringLiteral("alpha")).toObject().value(QStringLiteral("value")).toDouble();
    CHECK(remedy > 0.0);
    CHECK(remedy < 1.0);
    // Leaving out the coder who misses most remedies (C03) raises agreement on remedies.
    o = cliJson(cli({QStringLiteral("agree"), project, QStringLiteral("--unit"),
        QStringLiteral("sentence"), QStringLiteral("--function"), QStringLiteral("remedy"),
        QStringLiteral("--coders"), QStringLiteral("C01,C02"), QStringLiteral("--json")}));
    CHECK(o.value(QStringLiteral("alpha")).toObject().value(QStringLiteral("value")).toDouble()
        > remedy);
    CHECK(o.contains(QStringLiteral("cohen_kappa")));

    o = cliJson(cli({QStringLiteral("agree"), project, QStringLiteral("--unit"),
        QStringLiteral("continuum"), QStringLiteral("--json")}));
    const QJsonObject u = o.value(QStringLiteral("unitizing_alpha")).toObject();
    CHECK(u.value(QStringLiteral("per_function")).toObject().size() == 4);
    CHECK(u.value(QStringLiteral("overall")).toObject().value(QStringLiteral("value")).isDouble());
    CHECK(o.value(QStringLiteral("span_agreement")).toArray().size() == 3);

    const CliRun bad = cli({QStringLiteral("agree"), project, QStringLiteral("--unit"),
        QStringLiteral("sentence"), QStringLiteral("--coders"), QStringLiteral("C01,C77")});
    CHECK(bad.exitCode == 1);
    CHECK(bad.err.contains(QStringLiteral("no coder \"C77\"")));
}

TEST_CASE("a message quoting input with terminal escapes writes them as text")
{
    // A unit id carrying ESC [31m (colour) and an OSC title sequence ending in BEL: the error
    // quotes the id, and must not hand the sequences to the terminal (common practice for
    // programs that echo untrusted text).
    QTemporaryDir dir;
    const QString data = writeFile(dir, QStringLiteral("escapes.csv"),
        QByteArray("unit,A,B\nu\x1b[31mX,a,b\nu2,\x1b]0;title\x07,c\n"));
    const CliRun r = cli({QStringLiteral("agree"), QStringLiteral("--data"), data,
        QStringLiteral("--level"), QStringLiteral("interval")});
    CHECK(r.exitCode == 1);
    CHECK(r.err.contains(QStringLiteral("unit \"u\\x1B[31mX\"")));
    for (const QChar c : r.err)
        CHECK((c.unicode() >= 0x20 || c == QLatin1Char('\n')));
}
