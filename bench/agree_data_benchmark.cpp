// Times `agree --data` on a generated reliability matrix (a CSV of N units × C coders, labels
// "a" to "e", 10% of the cells empty) against a one-pass floor: the file read once with stdio,
// cells turned into label codes by a byte compare and counted into the coincidence matrix,
// alpha computed from it. Both give nominal alpha; the benchmark checks they agree. Prints min
// and median seconds of three runs of each and the process's peak memory. The whole CLI process
// is timed outside (e.g. /usr/bin/time -v fourfold-cli agree --data FILE).
//
//   agree_data_benchmark [UNITS=1000000] [CODERS=4] [CSV=a temporary file]

#include "bench/bench_support.h"
#include "core/agreement/value_encoding.h"
#include "core/io/reliability_table_reader.h"
#include "core/reliability/krippendorff_alpha.h"

#include <QCoreApplication>
#include <QElapsedTimer>
#include <QFile>
#include <QTemporaryDir>

#include <sys/resource.h>

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <cstring>
#include <functional>
#include <random>
#include <string>
#include <vector>

using namespace fourfold;
using namespace fourfold::bench;

namespace {

bool writeMatrix(const QString &path, int units, int coders)
{
    QFile f(path);
    if (!f.open(QIODevice::WriteOnly))
        return false;
    std::mt19937 rng(7);
    std::uniform_int_distribution<int> label(0, 4);
    std::bernoulli_distribution missing(0.1), agrees(0.7);
    QByteArray out = "unit";
    for (int c = 0; c < coders; ++c)
        out += ",C" + QByteArray::number(c + 1);
    out += '\n';
    for (int u = 0; u < units; ++u) {
        const int truth = label(rng);
        out += 'u' + QByteArray::number(u + 1);
        for (int c = 0; c < coders; ++c) {
            out += ',';
            if (!missing(rng))
                out += char('a' + (agrees(rng) ? truth : label(rng)));
        }
        out += '\n';
        if (out.size() > (1 << 20)) {
            f.write(out);
            out.clear();
        }
    }
    f.write(out);
    return f.error() == QFile::NoError;
}

// The floor: one pass over the bytes, no string per cell, nominal alpha from the coincidences
// (Krippendorff 2011, "Computing Krippendorff's alpha-reliability", eq. for nominal data).
double onePassAlpha(const char *path)
{
    std::FILE *f = std::fopen(path, "rb");
    if (!f)
        return NAN;
    std::vector<char> bytes;
    char buffer[1 << 16];
    for (size_t n; (n = std::fread(buffer, 1, sizeof buffer, f)) > 0;)
        bytes.insert(bytes.end(), buffer, buffer + n);
    std::fclose(f);
    std::vector<std::string> labels;
    std::vector<double> coincidence; // labels × labels, grown as labels appear
    std::vector<int> row;
    size_t i = 0;
    while (i < bytes.size() && bytes[i] != '\n')
        ++i;
    ++i;
    const auto codeOf = [&](const char *p, size_t n) {
        for (size_t k = 0; k < labels.size(); ++k)
            if (labels[k].size() == n && std::memcmp(labels[k].data(), p, n) == 0)
                return int(k);
        labels.emplace_back(p, n);
        return int(labels.size() - 1);
    };
    while (i < bytes.size()) {
        row.clear();
        bool first = true;
        size_t start = i;
        for (;; ++i) {
            const bool end = i == bytes.size() || bytes[i] == '\n';
            if (end || bytes[i] == ',') {
                if (!first && i > start)
                    row.push_back(codeOf(&bytes[start], i - start));
                first = false;
                start = i + 1;
                if (end)
                    break;
            }
        }
        ++i;
        const size_t k = labels.size();
        if (coincidence.size() < k * k) {
            std::vector<double> grown(k * k, 0.0);
            const size_t old = size_t(std::sqrt(double(coincidence.size())));
            for (size_t a = 0; a < old; ++a)
                for (size_t b = 0; b < old; ++b)
                    grown[a * k + b] = coincidence[a * old + b];
            coincidence.swap(grown);
        }
        const size_t m = row.size();
        if (m < 2)
            continue;
        for (size_t a = 0; a < m; ++a)
            for (size_t b = 0; b < m; ++b)
                if (a != b)
                    coincidence[size_t(row[a]) * k + size_t(row[b])] += 1.0 / double(m - 1);
    }
    const size_t k = labels.size();
    std::vector<double> margin(k, 0.0);
    double n = 0, agree = 0;
    for (size_t a = 0; a < k; ++a)
        for (size_t b = 0; b < k; ++b) {
            margin[a] += coincidence[a * k + b];
            n += coincidence[a * k + b];
            if (a == b)
                agree += coincidence[a * k + b];
        }
    // alpha = 1 − D_o / D_e = 1 − (n − 1) Σ_{c≠k} o_ck / (n² − Σ_c n_c²) for nominal data.
    double squares = 0;
    for (size_t a = 0; a < k; ++a)
        squares += margin[a] * margin[a];
    return 1.0 - (n - 1) * (n - agree) / (n * n - squares);
}

double fourfoldAlpha(const QString &path)
{
    auto table = readReliabilityTable(path);
    if (!table) {
        std::fprintf(stderr, "%s\n", qPrintable(table.error().toString()));
        std::exit(1);
    }
    auto encoded = encodeTable(*table, EncodingOptions {});
    if (!encoded) {
        std::fprintf(stderr, "%s\n", qPrintable(encoded.error().toString()));
        std::exit(1);
    }
    const auto alpha = reliability::krippendorffAlpha(encoded->data, encoded->metric);
    return alpha.value.value_or(NAN);
}

void timed(const char *what, const std::function<double()> &work)
{
    std::vector<double> seconds;
    double value = 0;
    for (int round = 0; round < 3; ++round) {
        QElapsedTimer t;
        t.start();
        value = work();
        seconds.push_back(double(t.nsecsElapsed()) / 1e9);
    }
    std::sort(seconds.begin(), seconds.end());
    std::printf("%-28s alpha %.6f  min %.3f s  median %.3f s  peak %.0f MiB\n", what, value,
        seconds.front(), seconds[1], peakMiB());
    std::fflush(stdout);
}

} // namespace

int main(int argc, char **argv)
{
    QCoreApplication app(argc, argv);
    const int units = argc > 1 ? std::atoi(argv[1]) : 1000000;
    const int coders = argc > 2 ? std::atoi(argv[2]) : 4;
    QTemporaryDir dir;
    const QString path =
        argc > 3 ? QString::fromLocal8Bit(argv[3]) : dir.filePath(QStringLiteral("matrix.csv"));
    if (!QFile::exists(path) && !writeMatrix(path, units, coders)) {
        std::fprintf(stderr, "cannot write %s\n", qPrintable(path));
        return 1;
    }
    const QByteArray local = path.toLocal8Bit();
    timed("one-pass floor", [&] { return onePassAlpha(local.constData()); });
    timed("read, encode, alpha", [&] { return fourfoldAlpha(path); });
    return 0;
}
