// Imports N generated articles of about 5 KB each from one JSON Lines or CSV file into a new
// project (canonical text, SHA-256, ICU segmentation, SQLite rows and the FTS5 index) and prints
// articles per second and peak memory. Target: 50,000 articles in under 60 s at a peak below
// 500 MB for the whole process.
//
//   import_benchmark [ARTICLES=10000] [WORK_DIR=a temporary directory] [jsonl|csv]

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

// One CSV field, enclosed in double quotes with inner quotes doubled (RFC 4180 §2.5, §2.7).
QByteArray csvField(const QString &value)
{
    QByteArray utf8 = value.toUtf8();
    utf8.replace('"', QByteArrayLiteral("\"\""));
    return '"' + utf8 + '"';
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
    const QString dir =
        argc > 2 && argv[2][0] != '\0' ? QString::fromLocal8Bit(argv[2]) : temp.path();
    const QString format = argc > 3 ? QString::fromLocal8Bit(argv[3]) : QStringLiteral("jsonl");
    if (format != u"jsonl" && format != u"csv") {
        std::fprintf(stderr, "the format is jsonl or csv, not %s\n", qPrintable(format));
        return 2;
    }

    std::mt19937 rng(20261201);
    const QString inputPath = dir + QStringLiteral("/bench.") + format;
    {
        QFile out(inputPath);
        if (!out.open(QIODevice::WriteOnly | QIODevice::Truncate)) {
            std::fprintf(stderr, "cannot write %s\n", qPrintable(inputPath));
            return 1;
        }
        if (format == u"csv")
            out.write("id,title,language,text\r\n");
        for (int i = 0; i < count; ++i) {
            const QString id = QStringLiteral("b%1").arg(i);
            const QString title = QStringLiteral("Generated article %1").arg(i);
            const QString language = i % 3 == 0 ? QStringLiteral("nl") : QStringLiteral("en");
            const QString text = makeText(rng, 5000);
            if (format == u"csv") {
                out.write(csvField(id) + ',' + csvField(title) + ',' + csvField(language) + ','
                    + csvField(text) + "\r\n");
                continue;
            }
            const QJsonObject o {{QStringLiteral("id"), id}, {QStringLiteral("title"), title},
                {QStringLiteral("language"), language}, {QStringLiteral("text"), text}};
            out.write(QJsonDocument(o).toJson(QJsonDocument::Compact));
            out.write("\n");
        }
    }
    const qint64 fileBytes = QFileInfo(inputPath).size();
    const QString projectPath = dir + QStringLiteral("/bench.fourfold");
    for (const char *suffix : {"", "-wal", "-shm"})
        QFile::remove(projectPath + QLatin1String(suffix));
    auto project = Project::create(projectPath);
    if (!project) {
        std::fprintf(stderr, "%s\n", qPrintable(project.error().toString()));
        return 1;
    }
    const long rssBefore = peakRssKiB();
    ImportedArticleCount::resetMost();
    const qsizetype articlesBefore = ImportedArticleCount::alive();
    QElapsedTimer timer;
    timer.start();
    auto report = project->importFile(inputPath, ImportOptions {});
    const double seconds = double(timer.nsecsElapsed()) / 1e9;
    if (!report) {
        std::fprintf(stderr, "%s\n", qPrintable(report.error().toString()));
        return 1;
    }
    auto counts = project->counts();
    std::printf("articles imported:   %zu (%.1f MB of %s)\n", report->added.size(),
        double(fileBytes) / 1e6, format == u"csv" ? "CSV" : "JSON Lines");
    std::printf("units stored:        %lld paragraphs, %lld sentences, %lld tokens\n",
        counts ? counts->paragraphs : -1LL, counts ? counts->sentences : -1LL,
        counts ? counts->tokens : -1LL);
    std::printf("import time:         %.2f s (read, canonical text, hash, ICU segmentation, "
                "SQLite, FTS5)\n",
        seconds);
    std::printf("articles per second: %.0f\n", double(report->added.size()) / seconds);
    std::printf("articles held at once: %lld (the reader's most)\n",
        static_cast<long long>(ImportedArticleCount::most() - articlesBefore));
    std::printf("peak memory:         %.1f MiB (%.1f MiB before the import)\n",
        double(peakRssKiB()) / 1024.0, double(rssBefore) / 1024.0);
    return 0;
}
