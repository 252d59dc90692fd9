// readArticles as a whole: choosing the format, and the failures that come before any format
// is read (missing files, unknown formats, the size limit).

#include "core/io/article_reader.h"
#include "tests/io/reader_test_support.h"

#include <QFile>

using namespace fourfold;
using namespace fourfold::test;

TEST_CASE("Import formats: keys and file suffixes", "[io]")
{
    for (const ImportFormat format :
        {ImportFormat::Text, ImportFormat::Html, ImportFormat::JsonLines, ImportFormat::Csv})
        CHECK(importFormatFromKey(importFormatKey(format)) == format);
    CHECK(importFormatKey(ImportFormat::JsonLines) == QStringLiteral("jsonl"));
    CHECK(importFormatFromKey(QStringLiteral("NDJSON")) == ImportFormat::JsonLines);
    CHECK(importFormatFromKey(QStringLiteral("xml")) == std::nullopt);

    CHECK(importFormatFromPath(QStringLiteral("/a/b.txt")) == ImportFormat::Text);
    CHECK(importFormatFromPath(QStringLiteral("b.text")) == ImportFormat::Text);
    CHECK(importFormatFromPath(QStringLiteral("B.HTM")) == ImportFormat::Html);
    CHECK(importFormatFromPath(QStringLiteral("page.html")) == ImportFormat::Html);
    CHECK(importFormatFromPath(QStringLiteral("feed.ndjson")) == ImportFormat::JsonLines);
    CHECK(importFormatFromPath(QStringLiteral("list.csv")) == ImportFormat::Csv);
    CHECK(importFormatFromPath(QStringLiteral("archive.csv.gz")) == std::nullopt);
    CHECK(importFormatFromPath(QStringLiteral("README")) == std::nullopt);
    CHECK(importFormatFromPath(QStringLiteral("notes.md")) == std::nullopt);
}

TEST_CASE("readArticles: format from the suffix or forced", "[io]")
{
    const QByteArray jsonl = R"({"id":"a","title":"t","text":"x"})"
                             "\n";
    SECTION("an unknown suffix is unsupported")
    {
        const auto result = readBytes(QStringLiteral("feed.dat"), jsonl);
        REQUIRE_FALSE(result.has_value());
        CHECK(result.error().code == ErrorCode::Unsupported);
        CHECK(result.error().message.contains(QStringLiteral("format cannot be told")));
    }
    SECTION("a forced format reads any name")
    {
        ImportOptions options;
        options.format = ImportFormat::JsonLines;
        const auto result = readBytes(QStringLiteral("feed.dat"), jsonl, options);
        REQUIRE(result.has_value());
        REQUIRE(result->size() == 1);
        CHECK(result->front().externalId == QStringLiteral("a"));
    }
    SECTION("a forced format wins over the suffix")
    {
        ImportOptions options;
        options.format = ImportFormat::Text;
        const auto result = readBytes(QStringLiteral("feed.jsonl"), jsonl, options);
        REQUIRE(result.has_value());
        CHECK(result->front().externalId == QStringLiteral("feed"));
        CHECK(result->front().text == QString::fromUtf8(jsonl.trimmed()));
    }
}

TEST_CASE("readArticles: files that cannot be read", "[io]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());

    SECTION("a missing file")
    {
        for (const QString &name : {QStringLiteral("gone.csv"), QStringLiteral("gone")}) {
            const auto result = readArticles(dir.filePath(name), {});
            REQUIRE_FALSE(result.has_value());
            CHECK(result.error().code == ErrorCode::Io);
            CHECK(result.error().message
                == dir.filePath(name) + QStringLiteral(": the file does not exist"));
        }
    }
    SECTION("a text or HTML file above the size limit is refused before it is read")
    {
        for (const QString &name : {QStringLiteral("huge.txt"), QStringLiteral("huge.html")}) {
            // A sparse file: it takes no disk space and is never read.
            const QString path = dir.filePath(name);
            QFile file(path);
            REQUIRE(file.open(QIODevice::WriteOnly));
            REQUIRE(file.resize(maxImportFileSize + 1));
            file.close();
            const auto result = readArticles(path, {});
            REQUIRE_FALSE(result.has_value());
            CHECK(result.error().code == ErrorCode::InvalidInput);
            CHECK(
                result.error().message.contains(QStringLiteral("a file may be at most 1024 MiB")));
        }
    }
    SECTION("JSON Lines and CSV files are streamed: a file above that size is read, not refused")
    {
        // The same sparse file of NUL bytes, 1 GiB + 1: read a chunk at a time, it fails on
        // its content (one line or record longer than the 64 MiB limit, or a binary file),
        // never on its size.
        const QString jsonl = dir.filePath(QStringLiteral("huge.jsonl"));
        const QString csv = dir.filePath(QStringLiteral("huge.csv"));
        for (const QString &path : {jsonl, csv}) {
            QFile file(path);
            REQUIRE(file.open(QIODevice::WriteOnly));
            REQUIRE(file.resize(maxImportFileSize + 1));
        }
        const auto line = readArticles(jsonl, {});
        REQUIRE_FALSE(line.has_value());
        CHECK(line.error().line == 1);
        CHECK(line.error().message.contains(QStringLiteral("a line may be at most 64 MiB")));
        const auto record = readArticles(csv, {});
        REQUIRE_FALSE(record.has_value());
        CHECK(record.error().line == 1);
        CHECK(record.error().column == 1);
        CHECK(record.error().message.contains(QStringLiteral("binary")));
    }
}
