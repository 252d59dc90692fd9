// Times the exports of the coders' layer (W3C and IOB2) and the W3C import on a generated study
// (bench/study_generator.h) without the desktop: the study is imported once; each export runs
// three times; the W3C export is then imported three times, each into a fresh copy of a
// project that holds the articles only. Prints min and median seconds and the peak memory of
// the process so far after each path.
//
//   exchange_benchmark [ARTICLES=1000] [WORK_DIR=a temporary directory]

#include "bench/bench_support.h"
#include "bench/study_generator.h"
#include "core/exchange/layer_export.h"
#include "core/exchange/w3c_import.h"
#include "core/project/coding_import.h"
#include "core/project/project.h"

#include <QCoreApplication>
#include <QDir>
#include <QElapsedTimer>
#include <QFile>
#include <QTemporaryDir>

#include <sys/resource.h>

#include <algorithm>
#include <cstdio>
#include <functional>
#include <vector>

using namespace fourfold;
using namespace fourfold::bench;

namespace {

void timed(const char *path, int articles, const std::function<void()> &work)
{
    std::vector<double> seconds;
    for (int round = 0; round < 3; ++round) {
        QElapsedTimer t;
        t.start();
        work();
        seconds.push_back(double(t.nsecsElapsed()) / 1e9);
    }
    std::sort(seconds.begin(), seconds.end());
    std::printf("%-28s %7d  min %8.3f s  median %8.3f s  peak %6.0f MiB\n", path, articles,
        seconds.front(), seconds[1], peakMiB());
    std::fflush(stdout);
}

void removeProject(const QString &path)
{
    for (const char *suffix : {"", "-wal", "-shm"})
        QFile::remove(path + QLatin1String(suffix));
}

} // namespace

int main(int argc, char **argv)
{
    QCoreApplication app(argc, argv);
    const int n = argc > 1 ? std::atoi(argv[1]) : 1000;
    QTemporaryDir temporary;
    const QString dir = argc > 2 ? QString::fromLocal8Bit(argv[2]) : temporary.path();
    QDir().mkpath(dir);
    bench::StudySpec spec;
    spec.articles = n;
    const bench::StudyFiles files = bench::writeStudyOrExit(spec, dir);
    const QString base = QDir(dir).filePath(QStringLiteral("articles.fourfold"));
    const QString study = QDir(dir).filePath(QStringLiteral("study.fourfold"));
    removeProject(base);
    removeProject(study);
    {
        Project project = check(Project::create(base), "create");
        check(project.importFile(files.articles, ImportOptions {}), "import articles");
    }
    QFile::copy(base, study);
    Project project = check(Project::open(study), "open");
    addStudyPeople(project, spec.coders);
    check(importQuotedCodings(project, files.codings, Phase::Production), "codings");

    const auto exportAs = [&](ExportFormat format, const QString &name) {
        ExportOptions o;
        o.layer = LayerSpec {LayerKind::Coders, {}};
        o.format = format;
        o.outDir = QDir(dir).filePath(name);
        QDir(o.outDir).removeRecursively();
        check(exportLayer(project, o), "export");
    };
    timed("export coders as W3C", n, [&] { exportAs(ExportFormat::W3c, QStringLiteral("w3c")); });
    timed("export coders as IOB2", n, [&] { exportAs(ExportFormat::Iob2, QStringLiteral("bio")); });
    const QString w3c = QDir(dir).filePath(QStringLiteral("w3c/all.jsonld"));
    timed("import W3C", n, [&] {
        const QString copy = QDir(dir).filePath(QStringLiteral("w3c-import.fourfold"));
        removeProject(copy);
        QFile::copy(base, copy);
        Project target = check(Project::open(copy), "open");
        const W3cImportReport r = check(importW3cAnnotations(target, w3c), "import W3C");
        if (r.spans != files.spans)
            std::fprintf(stderr, "imported %lld of %lld spans\n", r.spans, files.spans);
    });
    return 0;
}
