// Imports N generated articles of about 5 KB each from one JSON Lines file into a new project
// (canonical text, SHA-256, ICU segmentation, SQLite rows and the FTS5 index) and prints
// articles per second and peak memory. Target: 10,000 articles in under 10 s on one core.
//
//   import_benchmark [ARTICLES=10000] [WORK_DIR=a temporary directory]

#include "core/project/project.h"

#include <QCoreApplication>
#include <QElapsedTimer>
#include <QFile>
#include <QFileInfo>
#include <QJsonDocument>
#include <QJsonObject>
#include <QTemporaryDir>

#include <sys/resource.h>

#include <cstdio>
#include <random>

using namespace fourfold;

namespace {

// Invented filler vocabulary in three languages, so segmentation meets several scripts' rules.
const char *const kWords[] = {
    "ferry",
    "council",
    "budget",
    "harbour",
    "residents",
    "dyke",
    "turbine",
    "market",
    "square",
    "veerpont",
    "gemeente",
    "bewoners",
    "windpark",
    "dijk",
    "Marktplatz",
    "Händler",
    "Rat",
    "café",
    "naïve",
    "Straße",
    "über",
    "twijfel",
    "because",
    "should",
    "must",
    "unfair",
};

QString makeText(std::mt19937 &rng, int targetBytes)
{
    std::uniform_int_distribution<size_t> word(0, std::size(kWords) - 1);
    std::uniform_int_distribution<int> sentenceLength(6, 22);
    std::uniform_int_distribution<int> paragraphLength(2, 6);
    QString text;
    int sentencesInParagraph = 0;
    int paragraphTarget = paragraphLength(rng);
    while (text.size() < targetBytes) {
        const int n = sentenceLength(rng);
        QString sentence;
        for (int i = 0; i < n; ++i) {
            QString w = QString::fromUtf8(kWords[word(rng)]);
            if (i == 0)
                w[0] = w[0].toUpper();
            sentence += w + (i + 1 < n ? QStringLiteral(" ") : QStringLiteral("."));
        }
        if (!text.isEmpty())
            text += ++sentencesInParagraph >= paragraphTarget ? QStringLiteral("\n\n")
                                                              : QStringLiteral(" ");
        if (sentencesInParagraph >= paragraphTarget) {
            sentencesInParagraph = 0;
            paragraphTarget = paragraphLength(rng);
        }
        text += sentence;
    }
    return text;
}

long peakRssKiB()
{
    rusage usage {};
    getrusage(RUSAGE_SELF, &usage);
    return usage.ru_maxrss;
}

} // namespace

int main(int argc, char *argv[])
{
    QCoreApplication app(argc, argv);
    const int count = argc > 1 ? std::atoi(argv[1]) : 10000;
    QTemporaryDir temp;
    const QString dir = argc > 2 ? QString::fromLocal8Bit(argv[2]) : temp.path();

    std::mt19937 rng(20261201);
    const QString jsonlPath = dir + QStringLiteral("/bench.jsonl");
    {
        QFile out(jsonlPath);
        if (!out.open(QIODevice::WriteOnly | QIODevice::Truncate)) {
            std::fprintf(stderr, "cannot write %s\n", qPrintable(jsonlPath));
            return 1;
        }
        for (int i = 0; i < count; ++i) {
            const QJsonObject o {{QStringLiteral("id"), QStringLiteral("b%1").arg(i)},
                {QStringLiteral("title"), QStringLiteral("Generated article %1").arg(i)},
                {QStringLiteral("language"),
                    i % 3 == 0 ? QStringLiteral("nl") : QStringLiteral("en")},
                {QStringLiteral("text"), makeText(rng, 5000)}};
            out.write(QJsonDocument(o).toJson(QJsonDocument::Compact));
            out.write("\n");
        }
    }
    const qint64 fileBytes = QFileInfo(jsonlPath).size();
    const QString projectPath = dir + QStringLiteral("/bench.fourfold");
    for (const char *suffix : {"", "-wal", "-shm"})
        QFile::remove(projectPath + QLatin1String(suffix));
    auto project = Project::create(projectPath);
    if (!project) {
        std::fprintf(stderr, "%s\n", qPrintable(project.error().toString()));
        return 1;
    }
    const long rssBefore = peakRssKiB();
    QElapsedTimer timer;
    timer.start();
    auto report = project->importFile(jsonlPath, ImportOptions {});
    const double seconds = double(timer.nsecsElapsed()) / 1e9;
    if (!report) {
        std::fprintf(stderr, "%s\n", qPrintable(report.error().toString()));
        return 1;
    }
    auto counts = project->counts();
    std::printf("articles imported:   %zu (%.1f MB of JSON Lines)\n", report->added.size(),
        double(fileBytes) / 1e6);
    std::printf("units stored:        %lld paragraphs, %lld sentences, %lld tokens\n",
        counts ? counts->paragraphs : -1LL, counts ? counts->sentences : -1LL,
        counts ? counts->tokens : -1LL);
    std::printf("import time:         %.2f s (read, canonical text, hash, ICU segmentation, "
                "SQLite, FTS5)\n",
        seconds);
    std::printf("articles per second: %.0f\n", double(report->added.size()) / seconds);
    std::printf("peak memory:         %.1f MiB (%.1f MiB before the import)\n",
        double(peakRssKiB()) / 1024.0, double(rssBefore) / 1024.0);
    return 0;
}
