// fourfold-cli assign and codebook as a script sees them: JSON, exit codes, one-line errors,
// and the same draw as the core for the same seed.
#include "core/project/article_status_edit.h"
#include "core/project/assignment_plans.h"
#include "core/project/subsample_draw.h"
#include "core/project/testing/project_database.h"
#include "tests/project/study_fixture.h"
#include "tests/support/cli_run.h"
#include "tests/support/db_dump.h"

#include <QJsonArray>
#include <QJsonDocument>
#include <QJsonObject>

using namespace fourfold;
using namespace fourfold::test;

namespace {

CliRun cli(const QStringList &args)
{
    return runCli(QStringLiteral(FOURFOLD_CLI), args);
}

QStringList strings(const QJsonValue &v)
{
    QStringList out;
    for (const QJsonValue &x : v.toArray())
        out << x.toString();
    return out;
}

struct CliFixture : ProjectFixture {
    CliFixture()
    {
        importJsonl(twentyArticles());
        for (const char *p : {"C01", "C02", "C03"})
            addCoder(QString::fromLatin1(p));
        path = project.path();
    }
    QString path;
};

} // namespace

TEST_CASE("assign --draw: the core's sample for the seed, recorded and shown")
{
    CliFixture f;
    DrawRequest r;
    r.size = 5;
    r.stratify = Stratum::Outlet;
    r.seed = 99;
    r.coders = {QStringLiteral("C01"), QStringLiteral("C02"), QStringLiteral("C03")};
    auto expected = SubsampleDraw::plan(f.project, r);
    REQUIRE(expected);

    CliRun run = cli(
        {QStringLiteral("assign"), f.path, QStringLiteral("--draw"), QStringLiteral("reliability"),
            QStringLiteral("--size"), QStringLiteral("5"), QStringLiteral("--stratify"),
            QStringLiteral("outlet"), QStringLiteral("--seed"), QStringLiteral("99"),
            QStringLiteral("--coders"), QStringLiteral("C01,C02,C03"), QStringLiteral("--json")});
    REQUIRE(run.exitCode == 0);
    QJsonObject o = cliJson(run);
    CHECK(strings(o.value(QStringLiteral("articles"))) == expected->articles);
    CHECK(o.value(QStringLiteral("written")).toBool());
    CHECK(o.value(QStringLiteral("seed")).toString() == QStringLiteral("99"));
    CHECK(
        o.value(QStringLiteral("advice")).toObject().value(QStringLiteral("minimum_values")).toInt()
        == 139); // Krippendorff (2004, §11.4): alpha_min .800, p = .05, pc = .25

    run =
        cli({QStringLiteral("assign"), f.path, QStringLiteral("--show"), QStringLiteral("--json")});
    REQUIRE(run.exitCode == 0);
    o = cliJson(run);
    CHECK(o.value(QStringLiteral("assignments")).toArray().size() == 15);
    const QJsonArray draws = o.value(QStringLiteral("draws")).toArray();
    REQUIRE(draws.size() == 1);
    CHECK(strings(draws[0].toObject().value(QStringLiteral("articles"))) == expected->articles);

    // A second draw of the phase is refused with one line on stderr.
    run = cli({QStringLiteral("assign"), f.path, QStringLiteral("--draw"),
        QStringLiteral("reliability"), QStringLiteral("--size"), QStringLiteral("2"),
        QStringLiteral("--coders"), QStringLiteral("C01,C02")});
    CHECK(run.exitCode == 1);
    CHECK(run.err.startsWith(
        QStringLiteral("fourfold-cli: The reliability phase already has a subsample")));
    CHECK(run.err.count(QLatin1Char('\n')) == 1);

    // Usage errors exit 2 before the project is opened.
    for (const QStringList &bad :
        {QStringList {QStringLiteral("--draw"), QStringLiteral("pilot"), QStringLiteral("--size"),
             QStringLiteral("0"), QStringLiteral("--coders"), QStringLiteral("C01,C02")},
            QStringList {QStringLiteral("--draw"), QStringLiteral("pilot"),
                QStringLiteral("--size"), QStringLiteral("2"), QStringLiteral("--stratify"),
                QStringLiteral("genre"), QStringLiteral("--coders"), QStringLiteral("C01,C02")},
            QStringList {QStringLiteral("--rest"), QStringLiteral("triple"),
                QStringLiteral("--coders"), QStringLiteral("C01")},
            QStringList {QStringLiteral("--show"), QStringLiteral("--progress")}}) {
        INFO(bad.join(QLatin1Char(' ')).toStdString());
        run = cli(QStringList {QStringLiteral("assign"), f.path} + bad);
        CHECK(run.exitCode == 2);
        CHECK(run.err.startsWith(QStringLiteral("fourfold-cli assign: ")));
    }

    run = cli({QStringLiteral("assign"), f.path, QStringLiteral("--rest"), QStringLiteral("single"),
        QStringLiteral("--coders"), QStringLiteral("C01,C02,C03"), QStringLiteral("--seed"),
        QStringLiteral("3"), QStringLiteral("--json")});
    REQUIRE(run.exitCode == 0);
    CHECK(cliJson(run).value(QStringLiteral("assignments")).toArray().size() == 15); // 20 − 5
}

TEST_CASE("assign --training and --progress report hand-computed agreement")
{
    TenFixture f;
    const CoderId c1 = f.addCoder(QStringLiteral("C01"));
    const CoderId l1 = f.addCoder(QStringLiteral("L01"), CoderRole::Lead);
    const QString path = f.project.path();
    CliRun run = cli({QStringLiteral("assign"), path, QStringLiteral("--phase"),
        QStringLiteral("training"), QStringLiteral("--articles"), QStringLiteral("t1"),
        QStringLiteral("--coders"), QStringLiteral("C01,L01")});
    REQUIRE(run.exitCode == 0);
    f.codeBoth(c1, l1, Phase::Production);
    SetArticleStatusEdit done(f.article, c1, QStringLiteral("done"));
    REQUIRE(f.project.apply(done));
    REQUIRE(f.project.addCodingTime(f.article, c1, 300));

    run = cli({QStringLiteral("assign"), path, QStringLiteral("--training"), QStringLiteral("C01"),
        QStringLiteral("--json")});
    REQUIRE(run.exitCode == 0);
    QJsonObject o = cliJson(run);
    CHECK(o.value(QStringLiteral("master")).toString() == QStringLiteral("L01"));
    CHECK(o.value(QStringLiteral("training_complete")).toBool());
    const QJsonObject problem = o.value(QStringLiteral("functions")).toArray()[0].toObject();
    // Hand-computed in study_design_test.cpp: alpha = 23/42 (Krippendorff 2011, nominal).
    CHECK(problem.value(QStringLiteral("alpha")).toDouble() == Approx(23.0 / 42.0));
    CHECK(problem.value(QStringLiteral("percent_agreement")).toDouble() == Approx(0.8));

    run = cli(
        {QStringLiteral("assign"), path, QStringLiteral("--progress"), QStringLiteral("--json")});
    REQUIRE(run.exitCode == 0);
    o = cliJson(run);
    CHECK_FALSE(o.value(QStringLiteral("effort_per_coder")).toBool());
    QJsonArray rows = o.value(QStringLiteral("rows")).toArray();
    REQUIRE(rows.size() == 2);
    CHECK(rows[0].toObject().value(QStringLiteral("coder")).toString() == QStringLiteral("C01"));
    // Pooled over the four functions against the master: 134/213 (hand-computed, see
    // study_design_test.cpp).
    CHECK(
        rows[0].toObject().value(QStringLiteral("agreement")).toDouble() == Approx(134.0 / 213.0));
    CHECK_FALSE(rows[0].toObject().contains(QStringLiteral("active_seconds")));
    CHECK(o.value(QStringLiteral("effort"))
              .toArray()[0]
              .toObject()
              .value(QStringLiteral("active_seconds"))
              .toInt()
        == 300);

    REQUIRE(cli({QStringLiteral("assign"), path, QStringLiteral("--effort"), QStringLiteral("on")})
                .exitCode
        == 0);
    run = cli(
        {QStringLiteral("assign"), path, QStringLiteral("--progress"), QStringLiteral("--json")});
    rows = cliJson(run).value(QStringLiteral("rows")).toArray();
    CHECK(rows[0].toObject().value(QStringLiteral("active_seconds")).toInt() == 300);
}

TEST_CASE("codebook --update and --diff")
{
    CliFixture f;
    auto v1 = f.project.codebook();
    REQUIRE(v1);
    Codebook v2 = *v1;
    v2.functions[size_t(FramingFunction::Remedy)].definition = QStringLiteral("A call to act.");
    const QString file =
        writeFile(f.dir, QStringLiteral("v2.json"), QJsonDocument(v2.toJson()).toJson());
    CliRun run = cli({QStringLiteral("codebook"), f.path, QStringLiteral("--update"), file,
        QStringLiteral("--note"), QStringLiteral("Shorter remedy definition"),
        QStringLiteral("--json")});
    REQUIRE(run.exitCode == 0);
    QJsonObject o = cliJson(run);
    CHECK(o.value(QStringLiteral("version")).toInt() == 2);
    const QJsonArray changes = o.value(QStringLiteral("changes")).toArray();
    REQUIRE(changes.size() == 1);
    CHECK(changes[0].toObject().value(QStringLiteral("path")).toString()
        == QStringLiteral("remedy.definition"));
    CHECK(changes[0].toObject().value(QStringLiteral("after")).toString()
        == QStringLiteral("A call to act."));

    run = cli({QStringLiteral("codebook"), f.path, QStringLiteral("--diff"), QStringLiteral("1"),
        QStringLiteral("2")});
    REQUIRE(run.exitCode == 0);
    CHECK(run.out.startsWith(QStringLiteral("Codebook version 1 → 2\n~ remedy.definition: «")));
    CHECK(run.out.trimmed().endsWith(QStringLiteral("→ «A call to act.»")));

    // Bad input: no note (usage), a malformed file (line and column), a missing version.
    run = cli({QStringLiteral("codebook"), f.path, QStringLiteral("--update"), file});
    CHECK(run.exitCode == 2);
    const QString broken = writeFile(f.dir, QStringLiteral("broken.json"), "{\n  \"name\": ,\n}\n");
    run = cli({QStringLiteral("codebook"), f.path, QStringLiteral("--update"), broken,
        QStringLiteral("--note"), QStringLiteral("x")});
    CHECK(run.exitCode == 1);
    CHECK(run.err.contains(QStringLiteral("broken.json:2:")));
    run =
        cli({QStringLiteral("codebook"), f.path, QStringLiteral("--diff"), QStringLiteral("1,7")});
    CHECK(run.exitCode == 1);
    CHECK(run.err.contains(QStringLiteral("no codebook version 7")));
}

TEST_CASE("assign --withdraw-draw: withdrawn before coding, refused after, with exit codes")
{
    CliFixture f;
    CliRun run = cli({QStringLiteral("assign"), f.path, QStringLiteral("--draw"),
        QStringLiteral("reliability"), QStringLiteral("--size"), QStringLiteral("3"),
        QStringLiteral("--seed"), QStringLiteral("5"), QStringLiteral("--coders"),
        QStringLiteral("C01,C02"), QStringLiteral("--json")});
    REQUIRE(run.exitCode == 0);
    const QStringList drawn = strings(cliJson(run).value(QStringLiteral("articles")));
    REQUIRE(drawn.size() == 3);
    const QStringList withdraw {QStringLiteral("assign"), f.path, QStringLiteral("--withdraw-draw"),
        QStringLiteral("reliability")};

    SECTION("before anyone codes: the assignments go and the log says so")
    {
        run = cli(withdraw + QStringList {QStringLiteral("--json")});
        REQUIRE(run.exitCode == 0);
        const QJsonObject o = cliJson(run);
        CHECK(o.value(QStringLiteral("phase")).toString() == QStringLiteral("reliability"));
        CHECK(o.value(QStringLiteral("withdrawn_assignments")).toInt() == 6); // 3 articles × 2
        auto rows = AssignmentPlans::rows(f.project, Phase::Reliability);
        REQUIRE(rows);
        CHECK(rows->empty());
        // The event log (the dump with it) holds the withdrawal and one removal per assignment.
        const QString log = dumpDatabase(databaseForTesting(f.project), {});
        CHECK(log.count(QStringLiteral("draw.withdraw")) == 1);
        CHECK(log.count(QStringLiteral("assignment.remove")) == 6);
        // Nothing left to withdraw: exit 1 with one line.
        run = cli(withdraw);
        CHECK(run.exitCode == 1);
        CHECK(run.err.startsWith(
            QStringLiteral("fourfold-cli: The reliability phase has no subsample to withdraw.")));
        CHECK(run.err.count(QLatin1Char('\n')) == 1);
        // The phase can be drawn again.
        run = cli({QStringLiteral("assign"), f.path, QStringLiteral("--draw"),
            QStringLiteral("reliability"), QStringLiteral("--size"), QStringLiteral("3"),
            QStringLiteral("--seed"), QStringLiteral("5"), QStringLiteral("--coders"),
            QStringLiteral("C01,C02")});
        CHECK(run.exitCode == 0);
    }
    SECTION("after one article is marked done: refused, naming how many have work")
    {
        auto article = f.project.articleByExternalId(drawn.front());
        auto c01 = f.project.coderByPseudonym(QStringLiteral("C01"));
        REQUIRE((article && *article && c01 && *c01));
        SetArticleStatusEdit done(**article, (*c01)->id, QStringLiteral("done"));
        REQUIRE(f.project.apply(done));
        run = cli(withdraw);
        CHECK(run.exitCode == 1);
        CHECK(run.err.startsWith(QStringLiteral(
            "fourfold-cli: The reliability subsample cannot be withdrawn: coding has started on "
            "1 of its 6 assignments")));
        auto rows = AssignmentPlans::rows(f.project, Phase::Reliability);
        REQUIRE(rows);
        CHECK(rows->size() == 6);
    }
    SECTION("an unknown phase is a usage error")
    {
        run = cli({QStringLiteral("assign"), f.path, QStringLiteral("--withdraw-draw"),
            QStringLiteral("main")});
        CHECK(run.exitCode == 2);
        CHECK(run.err.startsWith(QStringLiteral("fourfold-cli assign: unknown phase")));
    }
}
