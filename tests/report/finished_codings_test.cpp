// Which codings count, seen from every consumer of the sample project: a reliability draw that
// nobody has coded yet, and an article a coder has started but not marked done, change no
// figure; marking it done makes it count. The figures are those a lead publishes: `fourfold-cli
// agree --json` for every analysis of the report (the reliability engine itself is checked
// against published worked examples in tests/reliability), the report's own figures, the
// progress board's agreement so far, drift per batch, the comparison queue and the human band
// beside an extractor run. The rule itself (a coder's article counts once the coder marked it
// done) is common practice in content analysis: an unread article is missing, not "absent".
#include "app/report/report_data.h"
#include "core/agreement/diagnostics.h"
#include "core/agreement/disagreements.h"
#include "core/project/annotation_edits.h"
#include "core/project/article_status_edit.h"
#include "core/project/project.h"
#include "core/project/study_progress.h"
#include "core/project/subsample_draw.h"
#include "core/scoring/run_agreement.h"
#include "tests/support/cli_run.h"
#include "tests/support/test_support.h"

#include <QFile>
#include <QJsonArray>
#include <QJsonDocument>
#include <QJsonObject>
#include <QTemporaryDir>

using namespace fourfold;
using namespace fourfold::test;

namespace {

CliRun cli(const QStringList &args)
{
    static QTemporaryDir runtime;
    QProcessEnvironment env = QProcessEnvironment::systemEnvironment();
    if (!env.contains(QStringLiteral("XDG_RUNTIME_DIR")))
        env.insert(QStringLiteral("XDG_RUNTIME_DIR"), runtime.path());
    return runCli(QStringLiteral(FOURFOLD_CLI), args, 180000, env);
}

QJsonValue optionalJson(const std::optional<double> &v)
{
    return v ? QJsonValue(*v) : QJsonValue(QJsonValue::Null);
}

// Everything a lead would publish or act on, as one JSON object; what lists left-out work is
// returned apart, so that the figures themselves can be compared.
struct Snapshot {
    QJsonObject figures;
    QJsonObject leftOut; // per analysis id: agree's "left_out"
};

Snapshot snapshot(const QString &path)
{
    Snapshot s;
    auto project = Project::open(path);
    REQUIRE(project);

    ReportOptions options;
    options.bootstrapReplicates = 0;
    auto report = gatherReportData(*project, options);
    INFO((report ? QString() : report.error().toString()).toStdString());
    REQUIRE(report);
    QJsonObject reportJson = report->toJson();
    reportJson.remove(QStringLiteral("generated_at"));
    QJsonObject sample = reportJson.value(QStringLiteral("sample")).toObject();
    sample.remove(QStringLiteral("draw")); // the draw itself is what changes
    sample.remove(QStringLiteral("draw_record"));
    reportJson.insert(QStringLiteral("sample"), sample);
    QJsonObject selection = reportJson.value(QStringLiteral("selection")).toObject();
    s.leftOut.insert(QStringLiteral("report"), selection.take(QStringLiteral("left_out")));
    reportJson.insert(QStringLiteral("selection"), selection);
    s.figures.insert(QStringLiteral("report"), reportJson);

    // The agree command behind every figure of the report, run as a script would.
    QJsonObject agree;
    for (const ReportAnalysis &a : report->analyses) {
        const CliRun r = cli(QStringList {QStringLiteral("agree"), path} + a.agreeArguments
            + QStringList {QStringLiteral("--json")});
        QJsonObject o;
        if (r.exitCode == 0) {
            o = cliJson(r);
            s.leftOut.insert(a.id, o.take(QStringLiteral("left_out")));
        } else {
            o.insert(QStringLiteral("error"), r.err.trimmed());
        }
        agree.insert(a.id, o);
    }
    s.figures.insert(QStringLiteral("agree"), agree);

    auto board = StudyProgress::board(*project);
    REQUIRE(board);
    QJsonArray progress;
    for (const ProgressRow &row : board->rows)
        progress.append(QJsonObject {{QStringLiteral("coder"), row.coder},
            {QStringLiteral("phase"), phaseKey(row.phase)},
            {QStringLiteral("agreement"), optionalJson(row.agreement)},
            {QStringLiteral("compared"), row.comparedArticles}});
    s.figures.insert(QStringLiteral("progress"), progress);

    UnitSelection all;
    all.unit = UnitKind::Sentence;
    auto table = unitTable(*project, all);
    REQUIRE(table);
    EncodingOptions encoding;
    encoding.distance = reliability::SetDistance::Masi;
    auto periods = alphaByPeriod(*project, all, *table, encoding, PeriodKind::Batch, 3);
    REQUIRE(periods);
    QJsonArray drift;
    for (const PeriodAlpha &p : *periods)
        drift.append(QJsonObject {{QStringLiteral("label"), p.label},
            {QStringLiteral("articles"), QJsonArray::fromStringList(p.articles)},
            {QStringLiteral("alpha"), optionalJson(p.alpha.value)}});
    s.figures.insert(QStringLiteral("drift"), drift);

    auto queue = disagreementQueue(*project);
    REQUIRE(queue);
    QJsonArray rows;
    for (const ArticleDisagreement &row : *queue)
        rows.append(QJsonObject {{QStringLiteral("article"), row.article.externalId},
            {QStringLiteral("coders"), qint64(row.coders.size())},
            {QStringLiteral("passages"), row.passages},
            {QStringLiteral("disagreements"), row.disagreements}});
    s.figures.insert(QStringLiteral("queue"), rows);

    auto band = runAgreement(*project, QStringLiteral("position"), {});
    REQUIRE(band);
    // The humans' band, and the run against each human apart (a run covers every article, so
    // an article one coder finished changes that coder's pair with the run, not the band).
    QJsonArray humans, runPairs;
    for (const FunctionBand &f : band->functions) {
        QJsonArray pairs;
        for (const PairAlpha &p : f.humanPairs)
            pairs.append(optionalJson(p.alpha));
        humans.append(QJsonObject {{QStringLiteral("pairs"), pairs},
            {QStringLiteral("low"), optionalJson(f.bandLow)},
            {QStringLiteral("high"), optionalJson(f.bandHigh)},
            {QStringLiteral("alpha"), optionalJson(f.humansAlpha)}});
        QJsonArray run;
        for (const PairAlpha &p : f.runPairs)
            run.append(optionalJson(p.alpha));
        runPairs.append(run);
    }
    s.figures.insert(QStringLiteral("band"), humans);
    s.figures.insert(QStringLiteral("run"), runPairs);
    return s;
}

// The first difference between two JSON values, as a path, or empty when they are equal.
QString firstDifference(const QJsonValue &a, const QJsonValue &b, const QString &path = {})
{
    if (a.isObject() && b.isObject()) {
        const QJsonObject x = a.toObject(), y = b.toObject();
        QStringList keys = x.keys() + y.keys();
        keys.removeDuplicates();
        for (const QString &k : keys)
            if (QString d = firstDifference(x.value(k), y.value(k), path + QLatin1Char('.') + k);
                !d.isEmpty())
                return d;
        return {};
    }
    if (a.isArray() && b.isArray()) {
        const QJsonArray x = a.toArray(), y = b.toArray();
        if (x.size() != y.size())
            return path + QStringLiteral(" (length %1 vs %2)").arg(x.size()).arg(y.size());
        for (qsizetype i = 0; i < x.size(); ++i)
            if (QString d =
                    firstDifference(x[i], y[i], path + QLatin1Char('.') + QString::number(i));
                !d.isEmpty())
                return d;
        return {};
    }
    return a == b ? QString() : path;
}

QStringList leftOutArticles(const QJsonValue &leftOut, const QString &coder)
{
    for (const QJsonValue &v : leftOut.toArray())
        if (v.toObject().value(QStringLiteral("coder")).toString() == coder) {
            QStringList out;
            for (const QJsonValue &a : v.toObject().value(QStringLiteral("articles")).toArray())
                out << a.toString();
            return out;
        }
    return {};
}

} // namespace

TEST_CASE("a draw nobody coded and an article in progress change no figure until it is marked done")
{
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("demo.fourfold"));
    const CliRun built =
        cli({QStringLiteral("build-sample"), QStringLiteral(FOURFOLD_SAMPLE_DIR), path});
    INFO(built.err.toStdString());
    REQUIRE(built.exitCode == 0);

    const Snapshot before = snapshot(path);
    // The sample's reliability articles are all done: nothing is left out.
    for (const QJsonValue &v : before.leftOut)
        CHECK(v.toArray().isEmpty());
    // The figures the README publishes for the sample (sentence units): 218 pairable units.
    const QJsonObject remedy = before.figures.value(QStringLiteral("agree"))
                                   .toObject()
                                   .value(QStringLiteral("function-remedy"))
                                   .toObject();
    CHECK(remedy.value(QStringLiteral("units")).toInt() == 218);

    // The lead draws three more reliability articles for three coders; nobody opens them.
    const CliRun drawn = cli(
        {QStringLiteral("assign"), path, QStringLiteral("--draw"), QStringLiteral("reliability"),
            QStringLiteral("--size"), QStringLiteral("3"), QStringLiteral("--coders"),
            QStringLiteral("C01,C02,C03"), QStringLiteral("--seed"), QStringLiteral("3")});
    INFO(drawn.err.toStdString());
    REQUIRE(drawn.exitCode == 0);
    const Snapshot afterDraw = snapshot(path);
    CHECK(firstDifference(before.figures, afterDraw.figures) == QString());

    // C01 codes one drawn article and marks it done; C02 starts it (one span) but does not.
    QString drawnArticle;
    ArticleId article;
    CoderId c01, c02;
    {
        auto project = Project::open(path);
        REQUIRE(project);
        auto draw = SubsampleDraw::recorded(*project, Phase::Reliability);
        REQUIRE(draw);
        REQUIRE(*draw);
        drawnArticle = (*draw)->articles.front();
        auto id = project->articleByExternalId(drawnArticle);
        REQUIRE(id);
        REQUIRE(*id);
        article = **id;
        auto first = project->coderByPseudonym(QStringLiteral("C01"));
        auto second = project->coderByPseudonym(QStringLiteral("C02"));
        REQUIRE((first && *first && second && *second));
        c01 = (*first)->id;
        c02 = (*second)->id;
        auto text = project->article(article);
        REQUIRE(text);
        const TextRange sentence = text->sentences.front();
        for (CoderId c : {c01, c02}) {
            AddAnnotationEdit span(article, c,
                AnnotationContent {FramingFunction::Problem, sentence, {}, {}, {}},
                Phase::Reliability);
            REQUIRE(project->apply(span));
        }
        SetArticleStatusEdit done(article, c01, QStringLiteral("done"));
        REQUIRE(project->apply(done));
    }
    const Snapshot inProgress = snapshot(path);
    // C01 alone on that article adds no pairable unit: every published figure stays.
    const QJsonObject agreeBefore = before.figures.value(QStringLiteral("agree")).toObject();
    const QJsonObject agreeInProgress =
        inProgress.figures.value(QStringLiteral("agree")).toObject();
    for (const QString &id : agreeBefore.keys()) {
        INFO(id.toStdString());
        const QJsonObject x = agreeBefore.value(id).toObject();
        const QJsonObject y = agreeInProgress.value(id).toObject();
        if (x.contains(QStringLiteral("alpha"))) {
            CHECK(x.value(QStringLiteral("alpha")) == y.value(QStringLiteral("alpha")));
            CHECK(x.value(QStringLiteral("pairable_values"))
                == y.value(QStringLiteral("pairable_values")));
        }
        // ... and C02's started article is listed as left out.
        CHECK(leftOutArticles(inProgress.leftOut.value(id), QStringLiteral("C02"))
            == QStringList {drawnArticle});
    }
    CHECK(leftOutArticles(inProgress.leftOut.value(QStringLiteral("report")), QStringLiteral("C02"))
        == QStringList {drawnArticle});
    CHECK(firstDifference(before.figures.value(QStringLiteral("queue")),
              inProgress.figures.value(QStringLiteral("queue")))
        == QString());
    CHECK(firstDifference(before.figures.value(QStringLiteral("band")),
              inProgress.figures.value(QStringLiteral("band")))
        == QString());

    // With --include-unfinished the started article is taken in: both coders marked its first
    // sentence as a problem, so more pairable units.
    const CliRun taken = cli({QStringLiteral("agree"), path, QStringLiteral("--unit"),
        QStringLiteral("sentence"), QStringLiteral("--function"), QStringLiteral("problem"),
        QStringLiteral("--include-unfinished"), QStringLiteral("--json")});
    REQUIRE(taken.exitCode == 0);
    const QJsonObject takenJson = cliJson(taken);
    CHECK(takenJson.value(QStringLiteral("left_out")).toArray().isEmpty());
    const int problemUnits = agreeBefore.value(QStringLiteral("function-problem"))
                                 .toObject()
                                 .value(QStringLiteral("units"))
                                 .toInt();
    CHECK(takenJson.value(QStringLiteral("units")).toInt() > problemUnits);

    // C02 marks it done: now it counts everywhere, with the same units as the option gave.
    {
        auto project = Project::open(path);
        REQUIRE(project);
        SetArticleStatusEdit done(article, c02, QStringLiteral("done"));
        REQUIRE(project->apply(done));
    }
    const Snapshot finished = snapshot(path);
    for (const QJsonValue &v : finished.leftOut)
        CHECK(v.toArray().isEmpty());
    const QJsonObject problemDone = finished.figures.value(QStringLiteral("agree"))
                                        .toObject()
                                        .value(QStringLiteral("function-problem"))
                                        .toObject();
    CHECK(problemDone.value(QStringLiteral("units")) == takenJson.value(QStringLiteral("units")));
    CHECK(problemDone.value(QStringLiteral("alpha")) == takenJson.value(QStringLiteral("alpha")));
    // The report's count of C02's articles went up by one; the queue now lists the article.
    const auto coderArticles = [](const Snapshot &s, const QString &pseudonym) {
        for (const QJsonValue &c : s.figures.value(QStringLiteral("report"))
                                       .toObject()
                                       .value(QStringLiteral("coders"))
                                       .toArray())
            if (c.toObject().value(QStringLiteral("pseudonym")).toString() == pseudonym)
                return c.toObject().value(QStringLiteral("articles")).toInt();
        return -1;
    };
    CHECK(coderArticles(finished, QStringLiteral("C02"))
        == coderArticles(before, QStringLiteral("C02")) + 1);
    bool listed = false;
    for (const QJsonValue &row : finished.figures.value(QStringLiteral("queue")).toArray())
        listed =
            listed || row.toObject().value(QStringLiteral("article")).toString() == drawnArticle;
    CHECK(listed);
}
