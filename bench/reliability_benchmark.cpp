// Prints timings of the reliability engine (not a test; nothing is asserted):
// 1. Krippendorff's alpha, nominal and interval, on 1,000,000 units × 4 coders, 10% missing
//    (target: under 150 ms on one core);
// 2. 10,000 pair-resampling bootstrap replicates on 100,000 pairable values with two threads
//    (target: under 3 s);
// 3. token-level alpha for all four functions (MASI on sets) on the sample project scaled to
//    1,000 articles (its token table repeated);
// 4. NLTK's alpha on a 10,000-unit slice of run 1, for comparison (/usr/bin/python3).
//
//   reliability_benchmark [SAMPLE_PROJECT]

#include "core/agreement/project_units.h"
#include "core/agreement/value_encoding.h"
#include "core/project/project.h"
#include "core/reliability/alpha_bootstrap.h"
#include "core/reliability/krippendorff_alpha.h"

#include <QCoreApplication>
#include <QElapsedTimer>
#include <QFile>
#include <QProcess>
#include <QTemporaryDir>

#include <algorithm>
#include <cstdio>
#include <random>

using namespace fourfold;
using namespace fourfold::reliability;

namespace {

ReliabilityData randomData(int units, int coders, int values, double missing, std::uint32_t seed)
{
    std::mt19937 rng(seed);
    std::uniform_int_distribution<int> value(0, values - 1);
    std::bernoulli_distribution isMissing(missing);
    // Coders agree with a unit's "true" value 70% of the time, so alpha is neither 0 nor 1.
    std::bernoulli_distribution agrees(0.7);
    ReliabilityData d;
    d.units = units;
    d.coders = coders;
    d.values = values;
    d.cells.resize(size_t(units) * size_t(coders));
    for (int u = 0; u < units; ++u) {
        const int truth = value(rng);
        for (int c = 0; c < coders; ++c)
            d.cells[size_t(u) * size_t(coders) + size_t(c)] =
                isMissing(rng) ? kMissing : (agrees(rng) ? truth : value(rng));
    }
    return d;
}

double millisecondsOf(const std::function<void()> &work, int repeats = 5)
{
    double best = 1e300;
    for (int i = 0; i < repeats; ++i) {
        QElapsedTimer t;
        t.start();
        work();
        best = std::min(best, double(t.nsecsElapsed()) / 1e6);
    }
    return best;
}

} // namespace

int main(int argc, char *argv[])
{
    QCoreApplication app(argc, argv);

    const ReliabilityData big = randomData(1000000, 4, 5, 0.10, 7);
    Metric nominal;
    Metric interval;
    interval.level = Level::Interval;
    interval.numeric = {1, 2, 3, 4, 5};
    AlphaResult a;
    const double nominalMs = millisecondsOf([&] { a = krippendorffAlpha(big, nominal); });
    std::printf("alpha nominal,  1,000,000 units x 4 coders, 10%% missing: %8.1f ms (alpha %.4f; "
                "best of 5)\n",
        nominalMs, a.value.value_or(-1));
    const double intervalMs = millisecondsOf([&] { a = krippendorffAlpha(big, interval); });
    std::printf("alpha interval, 1,000,000 units x 4 coders, 10%% missing: %8.1f ms (alpha %.4f; "
                "best of 5)\n",
        intervalMs, a.value.value_or(-1));

    // 100,000 pairable values: 25,000 complete units of 4 coders.
    const ReliabilityData mid = randomData(25000, 4, 5, 0.0, 11);
    BootstrapOptions b;
    b.replicates = 10000;
    b.seed = 1;
    b.threads = 2;
    BootstrapResult boot;
    const double bootMs = millisecondsOf([&] { boot = bootstrapAlpha(mid, nominal, b); }, 1);
    std::printf("pair bootstrap, 10,000 replicates on 100,000 values, 2 threads: %8.1f ms (95%% CI "
                "%.4f..%.4f)\n",
        bootMs, boot.ciLow.value_or(-1), boot.ciHigh.value_or(-1));

    if (argc > 1) {
        auto project = Project::open(QString::fromLocal8Bit(argv[1]));
        if (!project) {
            std::fprintf(stderr, "%s\n", qPrintable(project.error().toString()));
            return 1;
        }
        UnitSelection s;
        s.unit = UnitKind::Token;
        QElapsedTimer t;
        t.start();
        auto table = unitTable(*project, s);
        const double unitizeMs = double(t.nsecsElapsed()) / 1e6;
        if (!table) {
            std::fprintf(stderr, "%s\n", qPrintable(table.error().toString()));
            return 1;
        }
        const int articles = 1000;
        const size_t perArticle = std::max<size_t>(1, table->unitCount() / 9);
        std::vector<size_t> repeated; // the sample's units over and over
        while (repeated.size() < perArticle * articles)
            for (size_t u = 0; u < table->unitCount(); ++u)
                repeated.push_back(u);
        const ReliabilityTable scaled = table->rows(repeated);
        EncodingOptions e;
        e.distance = SetDistance::Masi;
        t.restart();
        auto encoded = encodeTable(scaled, e);
        const double encodeMs = double(t.nsecsElapsed()) / 1e6;
        if (!encoded)
            return 1;
        const double alphaMs =
            millisecondsOf([&] { a = krippendorffAlpha(encoded->data, encoded->metric); });
        std::printf(
            "token units, all functions (MASI), sample project: %lld units unitized in %.1f ms\n",
            qint64(table->unitCount()), unitizeMs);
        std::printf("  scaled to ~1,000 articles (%lld units): encoding %.1f ms, alpha %.1f ms "
                    "(alpha %.4f)\n",
            qint64(scaled.unitCount()), encodeMs, alphaMs, a.value.value_or(-1));
    }

    // NLTK on a 10,000-unit slice of the big nominal matrix.
    QTemporaryDir dir;
    QFile csv(dir.filePath(QStringLiteral("slice.csv")));
    if (csv.open(QIODevice::WriteOnly)) {
        for (int u = 0; u < 10000; ++u)
            for (int c = 0; c < 4; ++c)
                if (big.at(u, c) != kMissing)
                    csv.write(
                        QStringLiteral("%1,%2,%3\n").arg(c).arg(u).arg(big.at(u, c)).toLatin1());
        csv.close();
        const QString script =
            QStringLiteral("import csv,time\nfrom nltk.metrics.agreement import AnnotationTask\n"
                           "data=[(r[0],r[1],r[2]) for r in csv.reader(open('%1'))]\n"
                           "t=time.perf_counter(); a=AnnotationTask(data=data).alpha(); "
                           "ms=(time.perf_counter()-t)*1000\n"
                           "print('NLTK alpha nominal, 10,000 units x 4 coders: %.1f ms (alpha "
                           "%.4f)' % (ms, a))\n")
                .arg(csv.fileName());
        QProcess python;
        python.start(QStringLiteral("/usr/bin/python3"), {QStringLiteral("-c"), script});
        if (python.waitForFinished(600000) && python.exitCode() == 0)
            std::printf("%s", python.readAllStandardOutput().constData());
        else
            std::printf("NLTK comparison skipped: %s\n", python.readAllStandardError().constData());
        const ReliabilityData slice = [&] {
            ReliabilityData s = big;
            s.units = 10000;
            s.cells.resize(size_t(10000) * 4);
            return s;
        }();
        const double sliceMs = millisecondsOf([&] { a = krippendorffAlpha(slice, nominal); });
        std::printf("Fourfold alpha nominal, same slice:          %.3f ms (alpha %.4f)\n", sliceMs,
            a.value.value_or(-1));
    }
    return 0;
}
