// The report's Frames section: present when a frame analysis is saved, with its frames (names,
// sizes) and the alpha of each element variable, which must equal Krippendorff's alpha computed
// here by the plain binary formula from each coder's element indicators.
#include "app/report/report_data.h"
#include "app/report/report_document.h"
#include "core/project/project.h"
#include "core/scoring/element_indicators.h"
#include "tests/support/cli_run.h"

#include <QHash>
#include <QTemporaryDir>

#include <catch2/catch.hpp>

#include <optional>

using namespace fourfold;
using namespace fourfold::test;

namespace {

CliRun cli(const QStringList &args)
{
    return runCli(QStringLiteral(FOURFOLD_CLI), args, 180000);
}

// Krippendorff's alpha for 0/1 values (Krippendorff 2011, "Computing Krippendorff's alpha-
// reliability", §A–C): units with at least two values are pairable; each adds 1/(m − 1) to the
// coincidence of every ordered pair of its values from different coders; then
// alpha = 1 − (n − 1) o₀₁ / (n₀ n₁). `cells[u]` holds unit u's values (one per coder who coded).
std::optional<double> binaryAlpha(const std::vector<std::vector<int>> &units)
{
    double o01 = 0, n0 = 0, n1 = 0;
    for (const std::vector<int> &values : units) {
        const double m = double(values.size());
        if (m < 2)
            continue;
        double zeros = 0, ones = 0;
        for (int v : values)
            (v == 0 ? zeros : ones) += 1;
        o01 += zeros * ones / (m - 1);
        n0 += zeros;
        n1 += ones;
    }
    const double n = n0 + n1;
    if (n0 * n1 == 0)
        return std::nullopt;
    return 1 - (n - 1) * o01 / (n0 * n1);
}

} // namespace

TEST_CASE("the report shows the saved frames with the alpha of each element variable")
{
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("demo.fourfold"));
    REQUIRE(cli({"build-sample", FOURFOLD_SAMPLE_DIR, path}).exitCode == 0);
    {
        auto project = Project::open(path);
        REQUIRE(project);
        auto data = gatherReportData(*project, ReportOptions {});
        REQUIRE(data);
        CHECK_FALSE(data->frames); // nothing saved: no section
        CHECK_FALSE(reportHtml(*data, ReportFlavour::Html).contains("<section id=\"frames\">"));
    }
    REQUIRE(cli({"frames", path, "--layer", "consensus", "--k", "3", "--save", "Debate",
                    "--frame-name", "Costs", "--frame-name", "Blame"})
                .exitCode
        == 0);
    auto project = Project::open(path);
    REQUIRE(project);
    ReportOptions options;
    options.bootstrapReplicates = 0;
    auto data = gatherReportData(*project, options);
    REQUIRE(data);
    REQUIRE(data->frames);
    CHECK(data->frames->name == QStringLiteral("Debate"));
    REQUIRE(data->frames->frames.size() == 3);

    // Alpha of each element variable, against the plain formula on each coder's indicators.
    QStringList coders;
    for (const ReportCoder &c : data->coders)
        coders << c.pseudonym;
    REQUIRE(coders.size() >= 2);
    QHash<qint64, std::vector<std::vector<int>>> perArticle; // article -> variable -> values
    const QStringList variables = elementVariables(*project);
    for (const QString &p : coders) {
        auto layer = elementIndicators(*project, QStringLiteral("coder:") + p);
        REQUIRE(layer);
        for (size_t r = 0; r < layer->articles.size(); ++r) {
            auto &values = perArticle[layer->articles[r].id.value];
            values.resize(size_t(variables.size()));
            for (qsizetype v = 0; v < variables.size(); ++v)
                values[size_t(v)].push_back(
                    int(layer->values[r * size_t(variables.size()) + size_t(v)]));
        }
    }
    REQUIRE(data->elementAlphas.size() == size_t(variables.size()));
    int defined = 0;
    for (qsizetype v = 0; v < variables.size(); ++v) {
        std::vector<std::vector<int>> units;
        for (const auto &values : perArticle)
            units.push_back(values[size_t(v)]);
        const std::optional<double> expected = binaryAlpha(units);
        const ElementAlpha &got = data->elementAlphas[size_t(v)];
        INFO(variables[v].toStdString());
        CHECK(got.variable == variables[v]);
        REQUIRE(got.alpha.has_value() == expected.has_value());
        if (expected) {
            CHECK(*got.alpha == Approx(*expected).margin(1e-12));
            ++defined;
        }
    }
    CHECK(defined >= 3);

    // The section: the frames with their names and sizes, each element's alpha.
    const QString html = reportHtml(*data, ReportFlavour::Html);
    REQUIRE(html.contains("<section id=\"frames\">"));
    CHECK(html.contains("\u201cDebate\u201d"));
    CHECK(html.contains("<td>F1</td><td>Costs</td><td class=\"num\">"
        + QString::number(data->frames->frames[0].profile.value("size").toInt()) + "</td>"));
    for (const ElementAlpha &e : data->elementAlphas)
        if (e.alpha)
            CHECK(html.contains("<td>" + e.variable + "</td><td class=\"num\">"
                + QString::number(*e.alpha, 'f', 3) + "</td>"));
    CHECK(reportHtml(*data, ReportFlavour::Print).contains("<section id=\"frames\">"));
}
