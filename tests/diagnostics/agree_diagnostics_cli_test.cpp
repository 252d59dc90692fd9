// `fourfold-cli agree PROJECT --diagnostics` on the generated project with planted problems:
// the JSON names the planted coder, article and boundary habit first, and the report's own keys
// are those of `agree --json` without the flag (the diagnostics are one added key).

#include "tests/diagnostics/planted_project.h"
#include "tests/support/cli_run.h"

#include <QJsonArray>
#include <QJsonObject>

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
