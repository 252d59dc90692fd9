// fourfold-cli score and export, run as a program on a project built in a temporary directory.

#include "tests/scoring/scoring_fixture.h"
#include "tests/support/cli_run.h"

#include <QDir>
#include <QJsonArray>
#include <QJsonDocument>

using namespace fourfold;

namespace {

using F = FramingFunction;

using test::CliRun;

CliRun cli(const QStringList &args)
{
    return test::runCli(QStringLiteral(FOURFOLD_CLI), args);
}

// The hand-worked example of run_scores_test.cpp, scored against gold.
struct CliFixture : test::ScoringFixture {
    QString path = project.path();
    CliFixture()
    {
        gold(f1, F::Problem, 0, 40);
        gold(f1, F::Cause, 62, 73);
        gold(f1, F::Remedy, 75, 107);
        gold(f1, F::Evaluation, 108, 125);
        storeRun(QStringLiteral("hand"),
            {{f1, F::Problem, 0, 40}, {f1, F::Cause, 55, 73}, {f1, F::Evaluation, 75, 107},
                {f1, F::Remedy, 41, 54}});
    }
};

} // namespace

TEST_CASE_METHOD(CliFixture, "score prints the SemEval figures as JSON", "[exchange][cli]")
{
    const CliRun r =
        cli({QStringLiteral("score"), path, QStringLiteral("--run"), QStringLiteral("hand"),
            QStringLiteral("--match"), QStringLiteral("partial"), QStringLiteral("--json")});
    INFO(r.err.toStdString());
    REQUIRE(r.exitCode == 0);
    const QJsonObject o = test::cliJson(r);
    CHECK(o.value(QStringLiteral("against")).toString() == QStringLiteral("gold"));
    CHECK(o.value(QStringLiteral("match")).toString() == QStringLiteral("partial"));
    const QJsonObject micro = o.value(QStringLiteral("micro")).toObject();
    // Hand-worked (run_scores_test.cpp): partial P = R = (2 + ½·1) / 4 = 0.625.
    CHECK(micro.value(QStringLiteral("cor")).toDouble() == 2);
    CHECK(micro.value(QStringLiteral("par")).toDouble() == 1);
    CHECK(micro.value(QStringLiteral("precision")).toDouble() == 0.625);
    CHECK(micro.value(QStringLiteral("f1_ci")).toObject().value(QStringLiteral("low")).toDouble()
        == 0.625);
    // No human coded, so the band is not available, with the reason.
    CHECK(o.value(QStringLiteral("agreement_with_humans"))
              .toObject()
              .contains(QStringLiteral("error")));
}

TEST_CASE_METHOD(
    CliFixture, "score and export refuse bad command lines and inputs", "[exchange][cli]")
{
    struct Case {
        QStringList args;
        int exitCode;
        const char *message;
    };
    const QString out = dir.filePath(QStringLiteral("out"));
    const Case cases[] = {
        {{QStringLiteral("score"), path}, 2, "--run NAME"},
        {{QStringLiteral("score"), path, QStringLiteral("--run"), QStringLiteral("hand"),
             QStringLiteral("--match"), QStringLiteral("fuzzy")},
            2, "unknown match mode"},
        {{QStringLiteral("score"), path, QStringLiteral("--run"), QStringLiteral("nope")}, 1,
            "no extractor run \"nope\""},
        {{QStringLiteral("score"), path, QStringLiteral("--run"), QStringLiteral("hand"),
             QStringLiteral("--against"), QStringLiteral("C99")},
            1, "no coder \"C99\""},
        {{QStringLiteral("export"), path, QStringLiteral("--layer"), QStringLiteral("golden"),
             QStringLiteral("--format"), QStringLiteral("csv"), QStringLiteral("--out"), out},
            2, "Unknown layer"},
        {{QStringLiteral("export"), path, QStringLiteral("--layer"), QStringLiteral("gold"),
             QStringLiteral("--format"), QStringLiteral("xml"), QStringLiteral("--out"), out},
            2, "unknown format"},
        {{QStringLiteral("export"), path, QStringLiteral("--layer"), QStringLiteral("gold"),
             QStringLiteral("--format"), QStringLiteral("csv"), QStringLiteral("--out"), out,
             QStringLiteral("--split"), QStringLiteral("50/20")},
            2, "summing to 100"},
        {{QStringLiteral("export"), path, QStringLiteral("--layer"), QStringLiteral("coders"),
             QStringLiteral("--format"), QStringLiteral("csv"), QStringLiteral("--out"), out},
            1, "covers no article"},
    };
    for (const Case &c : cases) {
        INFO(c.args.join(QLatin1Char(' ')).toStdString());
        const CliRun r = cli(c.args);
        CHECK(r.exitCode == c.exitCode);
        CHECK(r.err.contains(QString::fromUtf8(c.message)));
    }
}

TEST_CASE_METHOD(CliFixture, "export writes the files and the manifest", "[exchange][cli]")
{
    const QString out = dir.filePath(QStringLiteral("gold-w3c"));
    const CliRun r = cli({QStringLiteral("export"), path, QStringLiteral("--layer"),
        QStringLiteral("gold"), QStringLiteral("--format"), QStringLiteral("w3c"),
        QStringLiteral("--out"), out, QStringLiteral("--json")});
    INFO(r.err.toStdString());
    REQUIRE(r.exitCode == 0);
    const QJsonObject manifest = test::cliJson(r);
    CHECK(manifest.value(QStringLiteral("layer")).toString() == QStringLiteral("gold"));
    CHECK(manifest.value(QStringLiteral("files")).toArray().size() == 1);
    CHECK(QFile::exists(QDir(out).filePath(QStringLiteral("manifest.json"))));
    const QJsonObject collection =
        QJsonDocument::fromJson(test::readFile(QDir(out).filePath(QStringLiteral("all.jsonld"))))
            .object();
    CHECK(collection.value(QStringLiteral("total")).toInt() == 4);
}

TEST_CASE_METHOD(CliFixture,
    "a split too small for its shares is written empty and named on stderr", "[exchange][cli]")
{
    // Gold covers one article: 80/20 puts it in train and leaves test empty.
    const QString out = dir.filePath(QStringLiteral("gold-split"));
    const CliRun r = cli({QStringLiteral("export"), path, QStringLiteral("--layer"),
        QStringLiteral("gold"), QStringLiteral("--format"), QStringLiteral("jsonl"),
        QStringLiteral("--out"), out, QStringLiteral("--split"), QStringLiteral("80/20"),
        QStringLiteral("--seed"), QStringLiteral("5")});
    INFO(r.err.toStdString());
    REQUIRE(r.exitCode == 0);
    CHECK(r.err.contains(QStringLiteral("the test split is empty; 1 article(s)")));
    CHECK_FALSE(r.err.contains(QStringLiteral("the train split is empty")));
}
