// Fourfold at study size: generates a study of N articles (bench/study_generator.h), imports it
// as a lead would (articles, then quote-anchored codings with gold, then the position baseline as
// an extractor run), and times every path the study-scale work names, each run three times:
//   agree on sentences (all functions, 1,000 bootstrap replicates), on tokens, on the continuum,
//   with diagnostics; the comparison queue and window; the progress board; the Reliability
//   window's Compute until its results are shown; the report (HTML and PDF); an export of every
//   coder's spans as W3C; `fourfold-cli build-sample` of the same study (every article a
//   reliability article of every coder); the desktop opened as the lead and as a coder (window
//   usable) and its full-text search. The imports and extract run once, and above 10,000
//   articles the export and build-sample too.
// Prints one table row per path: N, min and median seconds, and the peak memory so far.
// Build in a Release tree; runs offscreen unless QT_QPA_PLATFORM is set.
//
//   study_benchmark [ARTICLES=1000] [CODERS=4] [WORK_DIR=a temporary directory]
//
// With FOURFOLD_BENCH_REUSE set, the study an earlier run left in WORK_DIR is opened instead of
// made again (the imports are then not timed); FOURFOLD_BENCH_ONLY=TEXT times only the paths
// whose name holds TEXT.

#include "app/desktop/coding_session.h"
#include "app/desktop/compare/comparison_window.h"
#include "app/desktop/main_window.h"
#include "app/desktop/reliability/reliability_window.h"
#include "app/report/report_writer.h"
#include "bench/bench_support.h"
#include "bench/study_generator.h"
#include "core/agreement/agreement_run.h"
#include "core/agreement/diagnostics.h"
#include "core/agreement/disagreements.h"
#include "core/agreement/project_units.h"
#include "core/exchange/layer_export.h"
#include "core/extract/extractor_runs.h"
#include "core/extract/position_baseline.h"
#include "core/project/coding_import.h"
#include "core/project/project.h"
#include "core/project/study_progress.h"

#include <QApplication>
#include <QDir>
#include <QElapsedTimer>
#include <QEventLoop>
#include <QJsonArray>
#include <QJsonDocument>
#include <QJsonObject>
#include <QLineEdit>
#include <QProcess>
#include <QTemporaryDir>

#include <sys/resource.h>

#include <algorithm>
#include <cstdio>
#include <functional>
#include <optional>
#include <vector>

using namespace fourfold;
using namespace fourfold::bench;

namespace {

void row(const char *path, int articles, std::vector<double> seconds)
{
    std::sort(seconds.begin(), seconds.end());
    std::printf("%-44s %7d %9.3f %9.3f %9.0f\n", path, articles, seconds.front(),
        seconds[seconds.size() / 2], peakMiB());
    std::fflush(stdout);
}

// FOURFOLD_BENCH_ONLY=text times only the paths whose name holds the text (for profiling).
bool wanted(const char *path)
{
    const QByteArray only = qgetenv("FOURFOLD_BENCH_ONLY");
    return only.isEmpty() || QByteArray(path).contains(only);
}

void timed(const char *path, int articles, int rounds, const std::function<void()> &work)
{
    if (!wanted(path))
        return;
    std::vector<double> seconds;
    for (int i = 0; i < rounds; ++i) {
        QElapsedTimer t;
        t.start();
        work();
        seconds.push_back(double(t.nsecsElapsed()) / 1e9);
    }
    row(path, articles, seconds);
}

// What `fourfold-cli agree PROJECT --unit UNIT` computes, through the same AgreementRun.
void agree(const Project &project, UnitKind unit, int replicates, bool diagnostics)
{
    const AgreementRun run = check(AgreementRun::load(project, {}), "codings");
    AnalysisRequest request;
    request.unit = unit;
    AgreementOptions options;
    options.bootstrapReplicates = replicates;
    const AnalysisResult analysed = check(run.analyse(request, options), "agreement");
    if (!analysed.report.alpha.value)
        std::fprintf(stderr, "alpha undefined\n");
    if (diagnostics) {
        check(leaveOneOutCosts(analysed), "leave one out");
        check(run.matching(), "span matching");
    }
}

// A source folder for `fourfold-cli build-sample` made from the generated study: study.json
// (the coders, the lead and every article as a reliability article), the articles, the codings
// with their gold lines, and an empty gold.jsonl.
QString writeBuildSampleSource(
    const QString &dir, const bench::StudyFiles &files, int articles, int coders)
{
    const QString source = QDir(dir).filePath(QStringLiteral("build-sample-source"));
    QDir(source).removeRecursively();
    QDir().mkpath(source);
    QJsonArray people;
    for (int c = 0; c < coders; ++c) {
        const QString pseudonym = QStringLiteral("C%1").arg(c + 1, 2, 10, QLatin1Char('0'));
        people.append(QJsonObject {{QStringLiteral("name"), pseudonym},
            {QStringLiteral("pseudonym"), pseudonym},
            {QStringLiteral("role"), QStringLiteral("coder")}});
    }
    people.append(QJsonObject {{QStringLiteral("name"), QStringLiteral("Lead")},
        {QStringLiteral("pseudonym"), QStringLiteral("L01")},
        {QStringLiteral("role"), QStringLiteral("lead")}});
    QJsonArray reliability;
    for (int a = 0; a < articles; ++a)
        reliability.append(QStringLiteral("g%1").arg(a + 1, 6, 10, QLatin1Char('0')));
    QFile study(QDir(source).filePath(QStringLiteral("study.json")));
    QFile gold(QDir(source).filePath(QStringLiteral("gold.jsonl")));
    if (!study.open(QIODevice::WriteOnly) || !gold.open(QIODevice::WriteOnly)
        || study.write(QJsonDocument(
               QJsonObject {{QStringLiteral("name"), QStringLiteral("Generated study")},
                   {QStringLiteral("language"), QStringLiteral("en")},
                   {QStringLiteral("coders"), people},
                   {QStringLiteral("reliabilityArticles"), reliability}})
                           .toJson())
            < 0
        || !QFile::copy(files.articles, QDir(source).filePath(QStringLiteral("articles.jsonl")))
        || !QFile::copy(files.codings, QDir(source).filePath(QStringLiteral("codings.jsonl")))) {
        std::fprintf(stderr, "cannot write the build-sample source in %s\n", qPrintable(source));
        std::exit(1);
    }
    return source;
}

// Runs fourfold-cli build-sample SOURCE OUT --force as a user would, to its end.
void buildSample(const QString &source, const QString &out)
{
    QProcess cli;
    cli.setProcessChannelMode(QProcess::ForwardedErrorChannel);
    cli.start(QStringLiteral(FOURFOLD_CLI),
        {QStringLiteral("build-sample"), source, out, QStringLiteral("--force")});
    if (!cli.waitForFinished(-1) || cli.exitStatus() != QProcess::NormalExit
        || cli.exitCode() != 0) {
        std::fprintf(stderr, "build-sample failed (exit %d)\n", cli.exitCode());
        std::exit(1);
    }
}

} // namespace

int main(int argc, char **argv)
{
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM"))
        qputenv("QT_QPA_PLATFORM", "offscreen");
    QApplication app(argc, argv);
    const int n = argc > 1 ? std::atoi(argv[1]) : 1000;
    const int coders = argc > 2 ? std::atoi(argv[2]) : 4;
    QTemporaryDir temporary;
    const QString dir = argc > 3 ? QString::fromLocal8Bit(argv[3]) : temporary.path();
    QDir().mkpath(dir);

    bench::StudySpec spec;
    spec.articles = n;
    spec.coders = coders;
    const QString path = QDir(dir).filePath(QStringLiteral("study.fourfold"));
    const bool reuse = !qEnvironmentVariableIsEmpty("FOURFOLD_BENCH_REUSE") && QFile::exists(path);
    std::optional<bench::StudyFiles> files;
    if (!reuse) {
        QElapsedTimer clock;
        clock.start();
        files = bench::writeStudyOrExit(spec, dir);
        std::printf("study: %d articles, %d coders, %lld spans, %lld answers, %lld gold spans "
                    "(generated in %.1f s)\n",
            n, coders, files->spans, files->answers, files->goldSpans,
            double(clock.elapsed()) / 1000);
        for (const char *suffix : {"", "-wal", "-shm"})
            QFile::remove(path + QLatin1String(suffix));
    }
    std::printf("%-44s %7s %9s %9s %9s\n", "path", "articles", "min s", "median s", "peak MiB");

    Project project = check(reuse ? Project::open(path) : Project::create(path), "open");
    if (files) {
        addStudyPeople(project, coders);
        timed("import articles", n, 1,
            [&] { check(project.importFile(files->articles, ImportOptions {}), "import"); });
        timed("import codings (spans, answers, gold)", n, 1, [&] {
            check(importQuotedCodings(project, files->codings, Phase::Production), "codings");
        });
        timed("extract (position baseline)", n, 1, [&] {
            auto position = check(PositionBaseline::create(), "baseline");
            check(ExtractorRuns::create(project, position, QStringLiteral("position")), "run");
        });
    }

    timed("agree sentence, all functions, 1000 replicates", n, 3,
        [&] { agree(project, UnitKind::Sentence, 1000, false); });
    timed("agree token, all functions", n, 3, [&] { agree(project, UnitKind::Token, 0, false); });
    timed(
        "agree sentence --diagnostics", n, 3, [&] { agree(project, UnitKind::Sentence, 0, true); });
    timed("agree continuum (C01 and C02)", n, 3, [&] {
        UnitSelection s;
        s.coders = {QStringLiteral("C01"), QStringLiteral("C02")};
        const AgreementRun run = check(AgreementRun::load(project, s), "codings");
        check(run.continuum(std::nullopt), "continuum");
    });
    timed("comparison queue", n, 3, [&] { check(disagreementQueue(project), "queue"); });
    if (wanted("comparison: one decision's queue row")) {
        const auto queue = check(disagreementQueue(project), "queue");
        timed("comparison: one decision's queue row", n, 3,
            [&] { check(articleDisagreement(project, queue.front()), "row"); });
    }
    if (wanted("comparison window")) {
        const auto lead = check(project.coderByPseudonym(QStringLiteral("L01")), "lead");
        if (!lead)
            fail("lead", Error {ErrorCode::NotFound, QStringLiteral("no lead L01"), {}, {}, 0, 0});
        CodingSession session(check(Project::open(path), "open"), *lead);
        timed("comparison window opened (queue and first passage)", n, 3, [&] {
            ComparisonWindow window(&session);
            window.resize(1400, 900);
            window.show();
            QCoreApplication::processEvents();
        });
    }
    timed("Reliability window: Compute until shown", n, 3, [&] {
        ReliabilityWindow window(project);
        window.resize(1200, 800);
        window.show();
        QCoreApplication::processEvents();
        QEventLoop loop;
        bool ok = false;
        QObject::connect(&window, &ReliabilityWindow::computed, &loop, [&](bool success) {
            ok = success;
            loop.quit();
        });
        window.compute();
        loop.exec();
        QCoreApplication::processEvents();
        if (!ok)
            fail("reliability", Error {ErrorCode::Internal, window.errorMessage(), {}, {}, 0, 0});
    });
    timed("progress board", n, 3, [&] { check(StudyProgress::board(project), "progress"); });
    timed("report HTML + PDF (1000 replicates)", n, 3, [&] {
        ReportOptions options;
        check(writeReport(project, options, QDir(dir).filePath(QStringLiteral("r.html"))),
            "report html");
        check(writeReport(project, options, QDir(dir).filePath(QStringLiteral("r.pdf"))),
            "report pdf");
    });
    timed("export coders as W3C", n, n <= 10000 ? 3 : 1, [&] {
        ExportOptions o;
        o.layer = LayerSpec {LayerKind::Coders, {}};
        o.format = ExportFormat::W3c;
        o.outDir = QDir(dir).filePath(QStringLiteral("w3c"));
        QDir(o.outDir).removeRecursively();
        check(exportLayer(project, o), "export");
    });
    if (files && wanted("build-sample")) {
        const QString source = writeBuildSampleSource(dir, *files, n, coders);
        const QString out = QDir(dir).filePath(QStringLiteral("built.fourfold"));
        // Three runs up to 10,000 articles; one at larger sizes (an import, like the others).
        timed("build-sample (every article a reliability article)", n, n <= 10000 ? 3 : 1,
            [&] { buildSample(source, out); });
    }
    const auto openDesktop = [&](const char *label, const QString &as) {
        timed(label, n, 3, [&] {
            MainWindow window;
            // A lead gives a passphrase (set on the first open): one Argon2id computation per open.
            check(window.openProject(path, as, QStringLiteral("demo lead passphrase")), "desktop");
            window.show();
            QCoreApplication::processEvents();
        });
    };
    openDesktop("desktop opened as the lead", QStringLiteral("L01"));
    openDesktop("desktop opened as a coder (C01)", QStringLiteral("C01"));
    {
        MainWindow window;
        check(
            window.openProject(path, QStringLiteral("L01"), QStringLiteral("demo lead passphrase")),
            "desktop");
        window.show();
        QCoreApplication::processEvents();
        int round = 0;
        // A word of the generated texts, and a rarer phrase; the list filters to the hits.
        timed("desktop: full-text search, list filtered", n, 3, [&] {
            window.searchField()->setText(
                round++ % 2 ? QStringLiteral("\"harbour levy\"") : QStringLiteral("turbine"));
            emit window.searchField()->returnPressed();
            QCoreApplication::processEvents();
        });
    }
    return 0;
}
