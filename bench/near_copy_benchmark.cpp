// The near-copy check (core/text/minhash.h, near_copy_index.h, core/project/near_copy_check.h)
// at study size. Two parts:
//
//   near_copy_benchmark index [ARTICLES=50000]
//     N generated articles of about 600 words (4 KB), every 50th a copy of an earlier one with 5%
//     of its words rewritten in three passages: signatures, index and look-ups of all of them,
//     as one import does, with the time per part, the candidates compared and the planted
//     copies found.
//   near_copy_benchmark import [ARTICLES=50000] [WORK_DIR]
//     A project holding N such articles (imported first, not timed), then an import of 1,000
//     more (10 of them planted copies): the time of that import with and without the near-copy
//     check (threshold 1.0 still reads every signature; the difference is the look-ups), and the
//     peak memory.

#include "bench/bench_support.h"
#include "core/project/near_copies.h"
#include "core/project/project.h"
#include "core/text/minhash.h"
#include "core/text/near_copy_index.h"

#include <QCoreApplication>
#include <QElapsedTimer>
#include <QFile>
#include <QJsonDocument>
#include <QJsonObject>
#include <QStringList>
#include <QTemporaryDir>

#include <cstdio>
#include <random>
#include <vector>

using namespace fourfold;

namespace {

// An invented vocabulary of 8,000 pseudo-words (syllables), shared by every article.
const QStringList &vocabulary()
{
    static const QStringList words = [] {
        static const char *syllables[] = {"ka", "lo", "mi", "ne", "ru", "sa", "te", "vo", "zi",
            "da", "pe", "bri", "sto", "gla", "fen", "mor", "tis", "wen", "hul", "an"};
        QStringList out;
        for (int i = 0; out.size() < 8000; ++i) {
            QString w;
            for (int n = i;; n /= 20) {
                w += QLatin1String(syllables[n % 20]);
                if (n < 20)
                    break;
            }
            out << w;
        }
        return out;
    }();
    return words;
}

QString article(std::mt19937_64 &rng)
{
    const QStringList &words = vocabulary();
    // Zipf-like: small indexes are common (function words), large ones rare (topic words).
    std::uniform_real_distribution<double> u(0.0, 1.0);
    QStringList paragraphs;
    for (int p = 0; p < 8; ++p) {
        QStringList sentence;
        for (int w = 0; w < 75; ++w) {
            const auto index = qsizetype(std::pow(double(words.size()), u(rng))) - 1;
            sentence << words[index];
        }
        paragraphs << sentence.join(QLatin1Char(' ')) + QLatin1Char('.');
    }
    return paragraphs.join(QStringLiteral("\n\n"));
}

// 5% of the words replaced in three runs.
QString plantedCopy(const QString &text, std::mt19937_64 &rng)
{
    QStringList words = text.split(QLatin1Char(' '));
    const qsizetype run = words.size() / 60;
    for (int r = 0; r < 3; ++r) {
        const qsizetype third = words.size() / 3;
        const qsizetype start = third * r + qsizetype(rng() % quint64(third - run));
        for (qsizetype i = start; i < start + run; ++i)
            words[i] = QStringLiteral("rewritten%1").arg(i);
    }
    return words.join(QLatin1Char(' '));
}

std::vector<QString> corpus(int n, int copyEvery, std::vector<int> &copyOf)
{
    std::mt19937_64 rng(20261205);
    std::vector<QString> texts;
    texts.reserve(size_t(n));
    copyOf.assign(size_t(n), -1);
    for (int i = 0; i < n; ++i) {
        if (copyEvery > 0 && i > 0 && i % copyEvery == 0) {
            const int original = int(rng() % quint64(i));
            copyOf[size_t(i)] = original;
            texts.push_back(plantedCopy(texts[size_t(original)], rng));
        } else {
            texts.push_back(article(rng));
        }
    }
    return texts;
}

double seconds(const QElapsedTimer &t)
{
    return double(t.nsecsElapsed()) / 1e9;
}

int runIndex(int n)
{
    std::vector<int> copyOf;
    const std::vector<QString> texts = corpus(n, 50, copyOf);
    qint64 bytes = 0;
    for (const QString &t : texts)
        bytes += t.toUtf8().size();
    QElapsedTimer timer;
    timer.start();
    std::vector<MinHashSignature> signatures;
    signatures.reserve(texts.size());
    for (const QString &t : texts)
        signatures.push_back(minHashSignature(t));
    const double signing = seconds(timer);
    timer.restart();
    NearCopyIndex index(0.8);
    // The article each one was copied from in the end (itself when it is no copy).
    const auto root = [&](qint64 i) {
        while (copyOf[size_t(i)] >= 0)
            i = copyOf[size_t(i)];
        return i;
    };
    int planted = 0;
    int found = 0;
    int related = 0; // other pairs of copies of one original
    int unrelated = 0;
    for (size_t i = 0; i < signatures.size(); ++i) {
        const auto matches = index.matches(signatures[i]);
        if (copyOf[i] >= 0)
            ++planted;
        for (const NearCopyMatch &m : matches) {
            if (m.id == copyOf[i])
                ++found;
            else
                (root(m.id) == root(qint64(i)) ? related : unrelated) += 1;
        }
        index.add(qint64(i), signatures[i]);
    }
    const double looking = seconds(timer);
    std::printf("articles:              %d (%.1f MB of text, about %lld words each)\n", n,
        double(bytes) / 1e6, static_cast<long long>(texts.front().count(QLatin1Char(' ')) + 1));
    std::printf("signatures (128 min):  %.2f s\n", signing);
    std::printf("LSH index + look-ups:  %.2f s (%d rows per band; %lld candidates compared)\n",
        looking, index.rowsPerBand(), static_cast<long long>(index.candidatesCompared()));
    std::printf("planted copies found:  %d of %d; other pairs: %d between copies of one original, "
                "%d unrelated\n",
        found, planted, related, unrelated);
    std::printf("peak memory:           %.1f MiB\n", bench::peakMiB());
    return 0;
}

void writeJsonl(
    const QString &path, const std::vector<QString> &texts, int from, int to, const QString &prefix)
{
    QFile out(path);
    if (!out.open(QIODevice::WriteOnly | QIODevice::Truncate)) {
        std::fprintf(stderr, "cannot write %s\n", qPrintable(path));
        std::exit(1);
    }
    for (int i = from; i < to; ++i) {
        const QJsonObject o {{QStringLiteral("id"), prefix + QString::number(i)},
            {QStringLiteral("title"), QStringLiteral("Generated article %1").arg(i)},
            {QStringLiteral("text"), texts[size_t(i)]}};
        out.write(QJsonDocument(o).toJson(QJsonDocument::Compact));
        out.write("\n");
    }
}

int runImport(int n, const QString &dir)
{
    std::vector<int> copyOf;
    const std::vector<QString> texts = corpus(n + 1000, 0, copyOf);
    // The last thousand: every hundredth a planted copy of one of the first n.
    std::vector<QString> later(texts.begin(), texts.end());
    std::mt19937_64 rng(7);
    for (int i = n; i < n + 1000; i += 100)
        later[size_t(i)] = plantedCopy(texts[size_t(rng() % quint64(n))], rng);
    const QString base = dir + QStringLiteral("/base.jsonl");
    const QString more = dir + QStringLiteral("/more.jsonl");
    writeJsonl(base, later, 0, n, QStringLiteral("a"));
    writeJsonl(more, later, n, n + 1000, QStringLiteral("a"));

    double withCheck = 0.0;
    double withoutCheck = 0.0;
    qint64 nearCopies = 0;
    for (const double threshold : {0.8, 1.0}) {
        const QString projectPath = dir + QStringLiteral("/bench-%1.fourfold").arg(threshold);
        for (const char *suffix : {"", "-wal", "-shm"})
            QFile::remove(projectPath + QLatin1String(suffix));
        Project project = bench::check(Project::create(projectPath), "create");
        ImportOptions options;
        options.nearCopyThreshold = threshold;
        bench::check(project.importFile(base, options), "import the base");
        QElapsedTimer timer;
        timer.start();
        const ImportReport report = bench::check(project.importFile(more, options), "import");
        (threshold < 1.0 ? withCheck : withoutCheck) = seconds(timer);
        if (threshold < 1.0)
            nearCopies = qint64(report.nearCopies.size());
    }
    std::printf("project:               %d articles\n", n);
    std::printf("import of 1,000 more:  %.2f s (near copies at 0.8: %lld found, 10 planted)\n",
        withCheck, static_cast<long long>(nearCopies));
    std::printf("same at threshold 1.0: %.2f s\n", withoutCheck);
    std::printf("peak memory:           %.1f MiB\n", bench::peakMiB());
    return 0;
}

} // namespace

int main(int argc, char *argv[])
{
    QCoreApplication app(argc, argv);
    const QString part = argc > 1 ? QString::fromLocal8Bit(argv[1]) : QStringLiteral("index");
    const int n = argc > 2 ? std::atoi(argv[2]) : 50000;
    if (part == u"index")
        return runIndex(n);
    if (part == u"import") {
        QTemporaryDir temp;
        const QString dir =
            argc > 3 && argv[3][0] != '\0' ? QString::fromLocal8Bit(argv[3]) : temp.path();
        return runImport(n, dir);
    }
    std::fprintf(stderr, "the part is index or import, not %s\n", qPrintable(part));
    return 2;
}
