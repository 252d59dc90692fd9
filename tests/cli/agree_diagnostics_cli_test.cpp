// `fourfold-cli agree PROJECT --diagnostics` on the generated project with planted problems:
// the JSON names the planted coder, article and boundary habit first, and the report's own keys
// are those of `agree --json` without the flag (the diagnostics are one added key).

#include "tests/agreement/planted_project.h"
#include "tests/support/cli_run.h"
#include "tests/support/test_support.h"

#include <QJsonArray>
#include <QJsonObject>
#include <QTemporaryDir>

using namespace fourfold;
using namespace fourfold::test;

namespace {

QJsonObject agreeJson(const QStringList &args)
{
    const CliRun run =
        runCli(QStringLiteral(FOURFOLD_CLI), QStringList {QStringLiteral("agree")} + args);
    INFO(run.err.toStdString());
    REQUIRE(run.exitCode == 0);
    return cliJson(run);
}

} // namespace

TEST_CASE("agree --diagnostics finds the planted coder, article and habit")
{
    PlantedProject p;
    const QString path = p.project.path();
    const QStringList base {path, QStringLiteral("--unit"), QStringLiteral("sentence"),
        QStringLiteral("--phase"), QStringLiteral("reliability"), QStringLiteral("--json")};
    const QJsonObject plain = agreeJson(base);
    const QJsonObject withDiagnostics =
        agreeJson(base + QStringList {QStringLiteral("--diagnostics")});
    QJsonObject stripped = withDiagnostics;
    stripped.remove(QStringLiteral("diagnostics"));
    CHECK(stripped == plain);

    const QJsonObject d = withDiagnostics.value(QStringLiteral("diagnostics")).toObject();
    const QJsonArray coders = d.value(QStringLiteral("leave_one_coder_out")).toArray();
    REQUIRE(coders.size() == 4);
    CHECK(coders[0].toObject().value(QStringLiteral("coder")).toString() == QStringLiteral("C02"));
    CHECK(coders[0].toObject().value(QStringLiteral("change")).toDouble() > 0);
    const QJsonArray articles = d.value(QStringLiteral("leave_one_article_out")).toArray();
    REQUIRE(articles.size() == 6);
    CHECK(
        articles[0].toObject().value(QStringLiteral("article")).toString() == QStringLiteral("a5"));
    CHECK(articles[0].toObject().value(QStringLiteral("units")).toInt() == 6);
    const QJsonObject matching = d.value(QStringLiteral("span_matching")).toObject();
    const QJsonObject habit = matching.value(QStringLiteral("boundaries")).toArray()[0].toObject();
    CHECK(habit.value(QStringLiteral("coder")).toString() == QStringLiteral("C04"));
    CHECK(habit.value(QStringLiteral("mean_length_difference")).toDouble() == 10.0);
    CHECK(habit.value(QStringLiteral("systematic")).toBool());
    // Row "cause", column "problem": the 15 planted swaps seen from the others' side.
    const QJsonObject causeRow =
        matching.value(QStringLiteral("confusion")).toArray()[1].toObject();
    CHECK(causeRow.value(QStringLiteral("function")).toString() == QStringLiteral("cause"));
    CHECK(causeRow.value(QStringLiteral("other"))
              .toObject()
              .value(QStringLiteral("problem"))
              .toDouble()
        == 15.0);
}

TEST_CASE("agree --data --diagnostics prints the 20 costliest rows and counts the rest")
{
    // 25 rows, each its own article (no unit suffix); the row "bad" alone disagrees, so it
    // costs most and comes first. The JSON lists every row.
    QByteArray csv = "unit,A,B\n";
    for (int u = 1; u <= 24; ++u)
        csv += "r" + QByteArray::number(u) + (u % 3 ? ",x,x\n" : ",y,y\n");
    csv += "bad,x,y\n";
    QTemporaryDir dir;
    const QString path = writeFile(dir, QStringLiteral("m.csv"), csv);
    const QStringList args {QStringLiteral("--data"), path, QStringLiteral("--diagnostics")};
    const CliRun text =
        runCli(QStringLiteral(FOURFOLD_CLI), QStringList {QStringLiteral("agree")} + args);
    REQUIRE(text.exitCode == 0);
    const QStringList lines = text.out.split(QLatin1Char('\n'));
    const qsizetype heading =
        lines.indexOf(QStringLiteral("Alpha without each article (costliest first)"));
    REQUIRE(heading >= 0);
    CHECK(lines[heading + 1].trimmed().startsWith(QStringLiteral("bad ")));
    CHECK(lines[heading + 21] == QStringLiteral("  … and 5 more (--json lists every one)"));
    const QJsonObject json = agreeJson(args + QStringList {QStringLiteral("--json")});
    const QJsonArray articles = json.value(QStringLiteral("diagnostics"))
                                    .toObject()
                                    .value(QStringLiteral("leave_one_article_out"))
                                    .toArray();
    CHECK(articles.size() == 25);
    CHECK(articles.first().toObject().value(QStringLiteral("article")) == QStringLiteral("bad"));
}
