// Times `import --codings` on a generated study (bench/study_generator.h) without the desktop:
// the articles are imported once into a template project, and each of three rounds imports the
// codings (spans, answers, gold) into a fresh copy of it. Prints N, spans, min and median
// seconds and the process's peak memory.
//
//   coding_import_benchmark [ARTICLES=1000] [WORK_DIR=a temporary directory]

#include "bench/bench_support.h"
#include "bench/study_generator.h"
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
#include <vector>

using namespace fourfold;
using namespace fourfold::bench;

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
    const QString base = QDir(dir).filePath(QStringLiteral("template.fourfold"));
    QFile::remove(base);
    {
        Project project = check(Project::create(base), "create");
        addStudyPeople(project, spec.coders);
        check(project.importFile(files.articles, ImportOptions {}), "import articles");
    }

    std::vector<double> seconds;
    for (int round = 0; round < 3; ++round) {
        const QString path = QDir(dir).filePath(QStringLiteral("round.fourfold"));
        for (const char *suffix : {"", "-wal", "-shm"})
            QFile::remove(path + QLatin1String(suffix));
        if (!QFile::copy(base, path)) {
            std::fprintf(stderr, "cannot copy the template project\n");
            return 1;
        }
        Project project = check(Project::open(path), "open");
        QElapsedTimer t;
        t.start();
        check(importQuotedCodings(project, files.codings, Phase::Production), "codings");
        seconds.push_back(double(t.nsecsElapsed()) / 1e9);
    }
    std::sort(seconds.begin(), seconds.end());
    std::printf("import codings: %d articles, %lld spans, %lld answers, %lld gold: min %.3f s, "
                "median %.3f s, peak %.0f MiB\n",
        n, files.spans, files.answers, files.goldSpans, seconds.front(), seconds[1], peakMiB());
    return 0;
}
