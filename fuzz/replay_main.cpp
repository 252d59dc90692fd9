// The driver of a fuzz target when libFuzzer is not linked (every ordinary build): runs each file
// of the seed corpus folders given, then a fixed number of inputs made from them by
// deterministic mutations, so a ctest case replays the corpus and fuzzes a little, the same way
// on every machine.
//
//   fuzz_codings [--mutations N] [--seed S] CORPUS_FOLDER...
//
// Before each input runs it is written to fuzz-last-input in the current folder, so the input
// that stopped the program is at hand (run the target on that file alone to reproduce it).

#include "fuzz/fuzz_support.h"

#include <QByteArray>
#include <QCoreApplication>
#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QStringList>

#include <cstdio>
#include <vector>

namespace {

// xorshift64* (Vigna 2016): small, fast and the same everywhere.
struct Random {
    quint64 state;
    quint64 next()
    {
        state ^= state >> 12;
        state ^= state << 25;
        state ^= state >> 27;
        return state * 2685821657736338717ULL;
    }
    qsizetype below(qsizetype n) { return n <= 0 ? 0 : qsizetype(next() % quint64(n)); }
};

// Tokens that readers of JSON, CSV, XML and HTML treat specially.
const char *const kTokens[] = {"\"", "\\", "{", "}", "[", "]", ":", ",", "\n", "\r\n", "<", ">",
    "</", "/>", "&amp;", "&#0;", "<![CDATA[", "]]>", "<!DOCTYPE x [<!ENTITY e \"e\">]>", "null",
    "true", "-1", "0", "1e308", "9223372036854775807", "\"\"", "\xEF\xBB\xBF", "\xC3\xA9", "\xFF",
    "\xED\xA0\x80", "\\u0000", "\\ud800", "\t", "=", "|"};

QByteArray mutate(const QByteArray &input, const std::vector<QByteArray> &corpus, Random &random)
{
    QByteArray out = input;
    const int steps = 1 + int(random.below(4));
    for (int step = 0; step < steps; ++step) {
        const qsizetype at = random.below(out.size() + 1);
        switch (random.below(7)) {
        case 0: // flip a bit
            if (!out.isEmpty())
                out[random.below(out.size())] ^= char(1 << random.below(8));
            break;
        case 1: // a random byte
            out.insert(at, char(random.below(256)));
            break;
        case 2: // drop a piece
            out.remove(at, random.below(qMin<qsizetype>(64, out.size() - at) + 1));
            break;
        case 3: // repeat a piece
            out.insert(at, out.mid(at, random.below(64) + 1));
            break;
        case 4: // a special token
            out.insert(at, kTokens[random.below(std::size(kTokens))]);
            break;
        case 5: { // splice in a piece of another input
            const QByteArray &other = corpus[size_t(random.below(qsizetype(corpus.size())))];
            const qsizetype from = random.below(other.size());
            out.insert(at, other.mid(from, random.below(256) + 1));
            break;
        }
        default: // cut the input short
            out.truncate(at);
            break;
        }
    }
    return out;
}

int run(const QByteArray &input)
{
    QFile last(QStringLiteral("fuzz-last-input"));
    if (last.open(QIODevice::WriteOnly | QIODevice::Truncate))
        last.write(input);
    last.close();
    return LLVMFuzzerTestOneInput(
        reinterpret_cast<const uint8_t *>(input.constData()), size_t(input.size()));
}

} // namespace

int main(int argc, char **argv)
{
    QCoreApplication app(argc, argv);
    QStringList args = app.arguments().mid(1);
    long long mutations = 0;
    quint64 seed = 1;
    std::vector<QByteArray> corpus;
    for (qsizetype i = 0; i < args.size(); ++i) {
        if ((args[i] == "--mutations" || args[i] == "--seed") && i + 1 < args.size()) {
            bool ok = false;
            const qulonglong value = args[i + 1].toULongLong(&ok);
            if (!ok) {
                std::fprintf(stderr, "%s takes a whole number\n", qPrintable(args[i]));
                return 2;
            }
            (args[i] == "--mutations" ? mutations = (long long)value : seed = value);
            ++i;
            continue;
        }
        const QFileInfo info(args[i]);
        QStringList files;
        if (info.isDir()) {
            for (const QFileInfo &entry : QDir(args[i]).entryInfoList(QDir::Files, QDir::Name))
                files << entry.filePath();
        } else {
            files << args[i];
        }
        for (const QString &path : files) {
            QFile file(path);
            if (!file.open(QIODevice::ReadOnly)) {
                std::fprintf(stderr, "%s: cannot be read\n", qPrintable(path));
                return 2;
            }
            corpus.push_back(file.readAll());
        }
    }
    if (corpus.empty()) {
        std::fprintf(
            stderr, "usage: %s [--mutations N] [--seed S] CORPUS_FOLDER_OR_FILE...\n", argv[0]);
        return 2;
    }
    for (const QByteArray &input : corpus)
        run(input);
    Random random {seed * 0x9E3779B97F4A7C15ULL + 1};
    for (long long i = 0; i < mutations; ++i)
        run(mutate(corpus[size_t(random.below(qsizetype(corpus.size())))], corpus, random));
    std::printf(
        "%zu corpus inputs and %lld mutations ran without a finding\n", corpus.size(), mutations);
    return 0;
}
