// Gold answers (answers to article-level items adjudicated by a lead) through fourfold-cli: agree
// --with-gold takes them as one more coder of the article units, export --layer gold writes them
// beside the gold spans, and the report counts them. The project is built with core's edits.

#include "core/project/gold_answer_edits.h"
#include "core/project/gold_edits.h"
#include "tests/project/study_fixture.h"
#include "tests/support/cli_run.h"

#include <QDir>
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

const QString kItem = QStringLiteral("dominant_function");

// Four invented articles a01..a04 (twentyArticles' first four), coded by C01 and C02 (who
// answer the dominant function) and adjudicated by the lead L01:
//   article  C01         C02      gold
//   a01      problem     problem  problem
//   a02      cause       problem  cause
//   a03      remedy      remedy   remedy
//   a04      evaluation  cause    evaluation
// Gold spans on a01..a03 only (so a04 is not in the gold layer).
struct GoldAnswersFixture : ProjectFixture {
    CoderId c1, c2, lead;
    std::vector<ArticleId> articles;
    std::vector<QString> goldUuids; // of the live gold answers, a01..a04
    QString replacedUuid; // the gold answer a02 had before

    GoldAnswersFixture()
    {
        QByteArray four;
        for (const QByteArray &line : twentyArticles().split('\n').mid(0, 4))
            four += line + '\n';
        importJsonl(four);
        c1 = addCoder(QStringLiteral("C01"));
        c2 = addCoder(QStringLiteral("C02"));
        lead = addCoder(QStringLiteral("L01"), CoderRole::Lead);
        const QStringList first {QStringLiteral("problem"), QStringLiteral("cause"),
            QStringLiteral("remedy"), QStringLiteral("evaluation")};
        const QStringList second {QStringLiteral("problem"), QStringLiteral("problem"),
            QStringLiteral("remedy"), QStringLiteral("cause")};
        for (int i = 0; i < 4; ++i) {
            const ArticleId a =
                articleId(QStringLiteral("a%1").arg(i + 1, 2, 10, QLatin1Char('0')));
            articles.push_back(a);
            SetJudgementEdit one(a, c1, kItem, first[i]);
            REQUIRE(project.apply(one));
            SetJudgementEdit two(a, c2, kItem, second[i]);
            REQUIRE(project.apply(two));
            markDone(project, a, c1);
            markDone(project, a, c2);
        }
        // a02 was first decided "problem", then "cause": only the later counts.
        AdjudicateAnswerEdit before(articles[1], lead, kItem, QStringLiteral("problem"), {});
        REQUIRE(project.apply(before));
        replacedUuid = before.objectUuid();
        for (int i = 0; i < 4; ++i) {
            AdjudicateAnswerEdit gold(articles[size_t(i)], lead, kItem, first[i],
                i == 1 ? QStringLiteral("The lead names the cause.") : QString());
            REQUIRE(project.apply(gold));
            goldUuids.push_back(gold.objectUuid());
        }
        for (int i = 0; i < 3; ++i) {
            AdjudicateSpanEdit span(articles[size_t(i)], lead,
                AnnotationContent {FramingFunction::Problem, {0, 5}, {}, {}, {}}, {}, {});
            REQUIRE(project.apply(span));
        }
    }

    double alpha(const QStringList &extra)
    {
        const CliRun r =
            cli(QStringList {QStringLiteral("agree"), project.path(), QStringLiteral("--unit"),
                    QStringLiteral("article"), QStringLiteral("--json")}
                + extra);
        INFO(r.err.toStdString());
        REQUIRE(r.exitCode == 0);
        const QJsonObject o = cliJson(r);
        return o.value(QStringLiteral("alpha"))
            .toObject()
            .value(QStringLiteral("value"))
            .toDouble();
    }
};

} // namespace

TEST_CASE("agree --with-gold takes gold answers as one more coder of the article units")
{
    GoldAnswersFixture f;
    // Nominal alpha by hand (Krippendorff 2011, "Computing Krippendorff's Alpha-Reliability",
    // coincidence matrix and D_o / D_e):
    // C01 and C02: n = 8, off-diagonal 4 → D_o = 4/8; n_c = problem 3, cause 2, remedy 2,
    //   evaluation 1 → D_e = (64 − 18)/(8·7) = 46/56; alpha = 1 − (1/2)/(46/56) = 9/23.
    // With gold: n = 12, off-diagonal 4 → D_o = 4/12; n_c = 4, 3, 3, 2 → D_e = (144 − 38)/132;
    //   alpha = 1 − (4/12)/(106/132) = 31/53.
    CHECK(f.alpha({}) == Approx(9.0 / 23.0).margin(1e-9));
    CHECK(f.alpha({QStringLiteral("--with-gold")}) == Approx(31.0 / 53.0).margin(1e-9));

    // The same matrix through agree --data (its alpha is checked against Krippendorff's own
    // worked example in cli_tests) gives the same figure.
    const QString data = writeFile(f.dir, QStringLiteral("m.csv"),
        "unit,C01,C02,gold\na01,problem,problem,problem\na02,cause,problem,cause\n"
        "a03,remedy,remedy,remedy\na04,evaluation,cause,evaluation\n");
    const CliRun r =
        cli({QStringLiteral("agree"), QStringLiteral("--data"), data, QStringLiteral("--json")});
    REQUIRE(r.exitCode == 0);
    CHECK(cliJson(r)
              .value(QStringLiteral("alpha"))
              .toObject()
              .value(QStringLiteral("value"))
              .toDouble()
        == Approx(31.0 / 53.0).margin(1e-9));

    // Gold is named "gold" among the coders.
    const QJsonObject o =
        cliJson(cli({QStringLiteral("agree"), f.project.path(), QStringLiteral("--unit"),
            QStringLiteral("article"), QStringLiteral("--with-gold"), QStringLiteral("--json")}));
    CHECK(o.value(QStringLiteral("coders")).toArray().last().toString() == QStringLiteral("gold"));
}

TEST_CASE("export --layer gold writes the gold answers of its articles with pseudonyms")
{
    GoldAnswersFixture f;
    auto summaries = f.project.articles();
    REQUIRE(summaries);
    const QString out = f.dir.filePath(QStringLiteral("gold"));
    const CliRun r = cli({QStringLiteral("export"), f.project.path(), QStringLiteral("--layer"),
        QStringLiteral("gold"), QStringLiteral("--format"), QStringLiteral("jsonl"),
        QStringLiteral("--out"), out});
    INFO(r.err.toStdString());
    REQUIRE(r.exitCode == 0);
    const QByteArray bytes = readFile(QDir(out).filePath(QStringLiteral("all.answers.jsonl")));
    // One line per live gold answer of the layer's articles (a01..a03: a04 has no gold span), in
    // article order, exactly as README "Exporting gold, codings and runs" describes.
    QByteArray expected;
    for (int i = 0; i < 3; ++i) {
        const ArticleSummary &a = (*summaries)[size_t(i)];
        const QString value = QStringList {
            QStringLiteral("problem"), QStringLiteral("cause"), QStringLiteral("remedy")}[i];
        expected +=
            QJsonDocument(
                QJsonObject {{QStringLiteral("article"), a.externalId},
                    {QStringLiteral("sha256"), a.sha256}, {QStringLiteral("item"), kItem},
                    {QStringLiteral("value"), value},
                    {QStringLiteral("coder"), QStringLiteral("L01")},
                    {QStringLiteral("source"), QStringLiteral("gold")},
                    {QStringLiteral("id"), QStringLiteral("urn:uuid:") + f.goldUuids[size_t(i)]}})
                .toJson(QJsonDocument::Compact)
            + '\n';
    }
    CHECK(bytes == expected);
    CHECK_FALSE(bytes.contains(f.replacedUuid.toUtf8()));
    // The manifest counts them; no file of the export names a person.
    const QJsonObject manifest =
        QJsonDocument::fromJson(readFile(QDir(out).filePath(QStringLiteral("manifest.json"))))
            .object();
    CHECK(manifest.value(QStringLiteral("splits"))
              .toObject()
              .value(QStringLiteral("all"))
              .toObject()
              .value(QStringLiteral("answers"))
              .toInt()
        == 3);
    for (const QString &name : QDir(out).entryList(QDir::Files)) {
        const QByteArray file = readFile(QDir(out).filePath(name));
        CHECK_FALSE(file.contains("Test person"));
    }
}

#ifdef FOURFOLD_CLI_HAS_REPORT
TEST_CASE("the report counts the gold answers and says how disagreements were resolved")
{
    GoldAnswersFixture f;
    const QString html = f.dir.filePath(QStringLiteral("r.html"));
    const CliRun r = cli({QStringLiteral("report"), f.project.path(), QStringLiteral("--out"), html,
        QStringLiteral("--bootstrap"), QStringLiteral("0"), QStringLiteral("--language"),
        QStringLiteral("en"), QStringLiteral("--json")});
    INFO(r.err.toStdString());
    REQUIRE(r.exitCode == 0);
    const QJsonObject gold = cliJson(r).value(QStringLiteral("gold")).toObject();
    // Four live gold answers (the replaced one on a02 is not counted), one with a rationale.
    CHECK(gold.value(QStringLiteral("answers")).toInt() == 4);
    CHECK(gold.value(QStringLiteral("answer_articles")).toInt() == 4);
    CHECK(gold.value(QStringLiteral("answers_with_rationale")).toInt() == 1);
    CHECK(gold.value(QStringLiteral("spans")).toInt() == 3);
    CHECK(gold.value(QStringLiteral("decided_by")).toArray() == QJsonArray {QStringLiteral("L01")});
    const QString page = QString::fromUtf8(readFile(html));
    CHECK(page.contains(QStringLiteral("Answers to article-level items were adjudicated as well")));
    CHECK_FALSE(page.contains(QStringLiteral("Test person")));
}
#endif
