// Issue 20, item 10: every reader refuses what is not a regular file (a link to /dev/zero would
// keep it reading forever) and a file longer than it takes, naming the file, before reading it.

#include "core/exchange/w3c_import.h"
#include "core/extract/extractor_runs.h"
#include "core/io/article_reader.h"
#include "core/io/input_file.h"
#include "core/io/reliability_table_reader.h"
#include "core/project/codebook_versions.h"
#include "core/project/coding_import.h"
#include "tests/project/project_fixture.h"
#include "tests/support/cli_run.h"

#include <QFile>
#include <QJsonObject>

using namespace fourfold;

namespace {

// A file of `bytes` bytes that takes no room on disk (a hole): the readers must refuse it from
// its size, before reading it.
QString sparseFile(const QTemporaryDir &dir, const QString &name, qint64 bytes)
{
    const QString path = dir.filePath(name);
    QFile f(path);
    REQUIRE(f.open(QIODevice::WriteOnly));
    REQUIRE(f.resize(bytes));
    return path;
}

// Every reader of the program, each a call that reads `path` and returns its error (or none).
std::vector<std::pair<const char *, std::function<std::optional<Error>(const QString &)>>> readers(
    test::ProjectFixture &fx)
{
    const auto errorOf = [](const auto &result) -> std::optional<Error> {
        if (result)
            return std::nullopt;
        return result.error();
    };
    return {
        {"codebook",
            [&fx, errorOf](const QString &path) {
                return errorOf(CodebookVersions::addFromFile(
                    fx.project, path, QStringLiteral("limits"), CoderId {}));
            }},
        {"span file",
            [&fx, errorOf](const QString &path) {
                return errorOf(ExtractorRuns::importRun(
                    fx.project, QStringLiteral("run"), path, QStringLiteral("1"), {}));
            }},
        {"codings",
            [&fx, errorOf](const QString &path) {
                return errorOf(importQuotedCodings(fx.project, path, Phase::Production));
            }},
        {"reliability matrix",
            [errorOf](const QString &path) { return errorOf(readReliabilityTable(path)); }},
        {"W3C annotations",
            [&fx, errorOf](
                const QString &path) { return errorOf(importW3cAnnotations(fx.project, path)); }},
        {"articles",
            [&fx, errorOf](const QString &path) {
                return errorOf(fx.project.importFile(path, ImportOptions {}));
            }},
    };
}

} // namespace

TEST_CASE("issue 20 item 10: every reader refuses a link to /dev/zero", "[files]")
{
    test::ProjectFixture fx;
    const QString link = fx.dir.filePath(QStringLiteral("zero.jsonl"));
    REQUIRE(QFile::link(QStringLiteral("/dev/zero"), link));
    for (const auto &[name, read] : readers(fx)) {
        INFO(name);
        const std::optional<Error> e = read(link);
        REQUIRE(e);
        CHECK(e->code == ErrorCode::Io);
        CHECK(e->file == link);
        CHECK(e->message.contains(QStringLiteral("not a regular file")));
    }
}

TEST_CASE(
    "issue 20 item 10: readers that hold a whole file refuse one beyond their limit", "[files]")
{
    test::ProjectFixture fx;
    const QString codebook =
        sparseFile(fx.dir, QStringLiteral("big.codebook.json"), maxCodebookFileSize + 1);
    const QString spans =
        sparseFile(fx.dir, QStringLiteral("big.spans.jsonl"), maxWholeFileSize + 1);
    const QString matrix = sparseFile(fx.dir, QStringLiteral("big.csv"), maxWholeFileSize + 1);
    struct Case {
        const char *reader;
        QString path;
        qint64 limitMiB;
    };
    const auto all = readers(fx);
    for (const Case &c : {Case {"codebook", codebook, 16}, Case {"span file", spans, 1024},
             Case {"reliability matrix", matrix, 1024}}) {
        INFO(c.reader);
        for (const auto &[name, read] : all) {
            if (QLatin1String(name) != QLatin1String(c.reader))
                continue;
            const std::optional<Error> e = read(c.path);
            REQUIRE(e);
            CHECK(e->code == ErrorCode::InvalidInput);
            CHECK(e->file == c.path);
            CHECK(e->message.contains(QStringLiteral("longer than %1 MiB").arg(c.limitMiB)));
        }
    }
}

TEST_CASE("issue 20 item 10: the codings reader refuses a line beyond 64 MiB", "[files]")
{
    test::ProjectFixture fx;
    // One endless line of spaces (a hole reads as NULs): refused at line 1 without holding it.
    const QString path = sparseFile(fx.dir, QStringLiteral("codings.jsonl"), maxJsonLineSize + 10);
    auto r = importQuotedCodings(fx.project, path, Phase::Production);
    REQUIRE_FALSE(r);
    CHECK(r.error().code == ErrorCode::InvalidInput);
    CHECK(r.error().file == path);
    CHECK(r.error().line == 1);
    CHECK(r.error().message.contains(QStringLiteral("longer than 64 MiB")));
}

TEST_CASE("issue 20 item 10: a whole-file read stops at its limit", "[files]")
{
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("small.json"));
    {
        QFile f(path);
        REQUIRE(f.open(QIODevice::WriteOnly));
        REQUIRE(f.write(QByteArray(2 << 20, 'x')) == 2 << 20);
    }
    auto over = readWholeFile(path, 1 << 20);
    REQUIRE_FALSE(over);
    CHECK(over.error().code == ErrorCode::InvalidInput);
    CHECK(over.error().message.contains(QStringLiteral("longer than 1 MiB")));
    auto within = readWholeFile(path, 2 << 20);
    REQUIRE(within);
    CHECK(within->size() == 2 << 20);
}

TEST_CASE(
    "issue 20 item 10: a whole-file read takes memory for the file not for the limit", "[files]")
{
    // Found by libFuzzer (fuzz_reliability_table): reading a whole file asked for its 1 GiB cap
    // at once, so `agree --data` on a three-line matrix aborted wherever memory cannot be
    // promised beyond what is there (here: an address-space limit of 800 MB, set by prlimit).
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("m.csv"));
    {
        QFile f(path);
        REQUIRE(f.open(QIODevice::WriteOnly));
        REQUIRE(f.write("unit,A,B\nu1,x,y\nu2,x,x\nu3,y,y\n") > 0);
    }
    const test::CliRun r = test::runCli(QStringLiteral("/usr/bin/prlimit"),
        {QStringLiteral("--as=800000000"), QStringLiteral(FOURFOLD_CLI), QStringLiteral("agree"),
            QStringLiteral("--data"), path, QStringLiteral("--json")});
    INFO(r.err.toStdString());
    REQUIRE(r.exitCode == 0);
    // Three units, two coders, every cell filled: n = 6 pairable values; nominal alpha
    // 1 − D_o/D_e = 1 − (2/6)/(3·3·2/(6·5)) = 4/9 (Krippendorff 2011, §C, worked by hand).
    const QJsonObject report = test::cliJson(r);
    CHECK(report.value(QStringLiteral("pairable_values")).toDouble() == 6);
    CHECK(report.value(QStringLiteral("alpha")).toObject().value(QStringLiteral("value")).toDouble()
        == Approx(4.0 / 9.0).margin(1e-12));
}

TEST_CASE(
    "a whole file mapped gives the file's bytes and the checks of a whole-file read", "[files]")
{
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("matrix.csv"));
    QByteArray content;
    for (int i = 0; i < 100000; ++i)
        content += "u" + QByteArray::number(i) + ",a,b\n";
    {
        QFile f(path);
        REQUIRE(f.open(QIODevice::WriteOnly));
        REQUIRE(f.write(content) == content.size());
    }
    auto file = WholeFile::open(path, maxWholeFileSize);
    REQUIRE(file);
    CHECK(file->isMapped());
    CHECK(file->bytes() == std::string_view(content.constData(), size_t(content.size())));
    CHECK(file->rawData() == content);
    // Moved, the mapping goes along and stays readable.
    WholeFile moved = std::move(*file);
    CHECK(moved.bytes().size() == size_t(content.size()));
    CHECK(moved.bytes().substr(0, 8) == "u0,a,b\nu");

    // An empty file cannot be mapped: it is read, and empty.
    const QString empty = dir.filePath(QStringLiteral("empty.csv"));
    {
        QFile f(empty);
        REQUIRE(f.open(QIODevice::WriteOnly));
    }
    auto none = WholeFile::open(empty, maxWholeFileSize);
    REQUIRE(none);
    CHECK_FALSE(none->isMapped());
    CHECK(none->bytes().empty());

    // The same refusals as readWholeFile: too long, missing, not a regular file.
    auto over = WholeFile::open(path, 1 << 20);
    REQUIRE_FALSE(over);
    CHECK(over.error().code == ErrorCode::InvalidInput);
    CHECK(over.error().message.contains(QStringLiteral("longer than 1 MiB")));
    auto missing = WholeFile::open(dir.filePath(QStringLiteral("nothing.csv")), maxWholeFileSize);
    REQUIRE_FALSE(missing);
    CHECK(missing.error().code == ErrorCode::Io);
    auto folder = WholeFile::open(dir.path(), maxWholeFileSize);
    REQUIRE_FALSE(folder);
    CHECK(folder.error().message.contains(QStringLiteral("not a regular file")));
}
