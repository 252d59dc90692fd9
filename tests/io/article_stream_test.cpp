// JSON Lines and CSV files read a chunk at a time (forEachArticle): the same articles and the
// same errors whatever the chunk size, one article held at a time, and the limits of a line and
// of a record. CSV grammar: RFC 4180 §2; JSON Lines: https://jsonlines.org.

#include "core/io/article_reader.h"
#include "tests/io/reader_test_support.h"

#include <QFile>
#include <QJsonObject>

using namespace fourfold;
using namespace fourfold::test;

namespace {

// Chunk sizes that cut a file at every kind of place: inside a multi-byte character, between
// CR and LF, inside a quoted field, and one larger than the file.
constexpr qsizetype kChunkSizes[] = {1, 2, 3, 5, 7, 16, 64, defaultReadChunkSize};

ImportOptions withChunkSize(qsizetype chunkSize)
{
    ImportOptions options;
    options.readChunkSize = chunkSize;
    return options;
}

// `count` JSON Lines articles a0, a1, ... with a short text each.
QByteArray jsonlArticles(int count)
{
    QByteArray bytes;
    for (int i = 0; i < count; ++i)
        bytes += QStringLiteral("{\"id\":\"a%1\",\"title\":\"T%1\",\"text\":\"Text number %1.\"}\n")
                     .arg(i)
                     .toUtf8();
    return bytes;
}

} // namespace

TEST_CASE("CSV read a chunk at a time: a quoted field with line breaks across every boundary",
    "[io][csv][stream]")
{
    // A BOM, CRLF and a lone CR, a quoted field spanning lines 2-4 with a doubled quote, a
    // character outside the BMP (4 bytes of UTF-8) and an empty line (RFC 4180 §2.6, §2.7).
    const QByteArray bytes = "\xEF\xBB\xBF"
                             "id,title,text\r\n"
                             "a1,\"Caf\xC3\xA9\",\"First line\r\n"
                             "second \"\"quoted\"\" line\r\n"
                             "third \xF0\x9F\x98\x80\"\r\n"
                             "\r\n"
                             "a2,Plain,Body\r"
                             "a3,\"Last\",\"No line break at the end\"";
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString path = writeFile(dir, QStringLiteral("span.csv"), bytes);
    for (const qsizetype chunkSize : kChunkSizes) {
        INFO("chunk size " << chunkSize);
        const auto result = readArticles(path, withChunkSize(chunkSize));
        REQUIRE(result.has_value());
        REQUIRE(result->size() == 3);
        CHECK(result->at(0).externalId == QStringLiteral("a1"));
        CHECK(result->at(0).title == QStringLiteral("Café"));
        CHECK(result->at(0).text
            == QStringLiteral(u"First line\r\nsecond \"quoted\" line\r\nthird \U0001F600"));
        CHECK(result->at(0).sourceLine == 2);
        CHECK(result->at(1).externalId == QStringLiteral("a2"));
        CHECK(result->at(1).text == QStringLiteral("Body"));
        CHECK(result->at(1).sourceLine == 6); // after the empty line 5
        CHECK(result->at(2).text == QStringLiteral("No line break at the end"));
        CHECK(result->at(2).sourceLine == 7); // a lone CR ends line 6
    }
}

TEST_CASE("JSON Lines read a chunk at a time: the same articles at every chunk size",
    "[io][jsonl][stream]")
{
    const QByteArray bytes = "\xEF\xBB\xBF"
                             R"({"id":"a1","title":"Caf\u00e9","text":"One \ud83d\ude00."})"
                             "\r\n"
                             "  \n"
                             "{\"id\":\"a2\",\"title\":\"\xC3\xA9t\xC3\xA9\",\"text\":\"Two.\"}";
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString path = writeFile(dir, QStringLiteral("chunks.jsonl"), bytes);
    for (const qsizetype chunkSize : kChunkSizes) {
        INFO("chunk size " << chunkSize);
        const auto result = readArticles(path, withChunkSize(chunkSize));
        REQUIRE(result.has_value());
        REQUIRE(result->size() == 2);
        CHECK(result->at(0).title == QStringLiteral("Café"));
        CHECK(result->at(0).text == QStringLiteral(u"One \U0001F600."));
        CHECK(result->at(0).sourceLine == 1);
        CHECK(result->at(1).title == QStringLiteral("été"));
        CHECK(result->at(1).sourceLine == 3);
    }
}

TEST_CASE("Errors are the same whatever the chunk size", "[io][stream]")
{
    // Each file holds two problems; the one reported is the first in file order (within a line
    // or record: invalid UTF-8 first), or a syntax error over an earlier failed check.
    const QByteArray ok = R"({"id":"a","title":"t","text":"x"})"
                          "\n";
    // clang-format off
    const BadInput jsonl[] = {
        {"a syntax error before invalid UTF-8 further on: the column of the x",
         ok + R"({"id":"a2","title":"t","text": x})" "\n" + ok + "\xFF\n",
         ErrorCode::InvalidInput, 2, 32, "invalid JSON"},
        {"invalid UTF-8 before a syntax error on the same line: the byte",
         "{oops \xC3\x28}\n", ErrorCode::InvalidInput, 1, 7, "invalid UTF-8"},
        {"a duplicate id, then a syntax error: the syntax error wins",
         ok + ok + "[1]\n", ErrorCode::InvalidInput, 3, 0, "expected a JSON object"},
        {"a duplicate id, then an id without text: the first failed check",
         ok + ok + R"({"id":"b","title":"t","text":""})" "\n", ErrorCode::Duplicate, 2, 0,
         "first seen on line 1"},
    };
    const QByteArray header = "id,title,text\r\n";
    const BadInput csv[] = {
        {"a quoting fault in a record spanning lines, with invalid UTF-8 after it",
         header + "1,t,\"x\r\ny\" z\r\n2,\xFF,x\r\n", ErrorCode::InvalidInput, 3, 3,
         "after the closing double quote"},
        {"invalid UTF-8 inside a record before its quoting fault",
         header + "1,\xC3\x28\"a\",x\r\n", ErrorCode::InvalidInput, 2, 3, "invalid UTF-8"},
        {"an empty text, then a record with too few fields: the field count wins",
         header + "1,t,\r\n2,u\r\n", ErrorCode::InvalidInput, 3, 0, "the record has 2 fields"},
        {"an unterminated quote named at its opening, past a record with a line break",
         header + "1,\"a\r\nb\",x\r\n2,u,\"open\r\n3,v,w\r\n", ErrorCode::InvalidInput, 4, 5,
         "never closed"},
    };
    // clang-format on
    for (const qsizetype chunkSize : kChunkSizes) {
        INFO("chunk size " << chunkSize);
        for (const BadInput &input : jsonl)
            checkBadInput(QStringLiteral("two.jsonl"), input, withChunkSize(chunkSize));
        for (const BadInput &input : csv)
            checkBadInput(QStringLiteral("two.csv"), input, withChunkSize(chunkSize));
    }
}

TEST_CASE("A failed check stops the handing on but not the reading", "[io][stream]")
{
    // Line 2 repeats line 1's id: lines 3 and 4 are still read (a syntax error there would be
    // reported instead) but no longer handed on.
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QByteArray bytes = jsonlArticles(1) + jsonlArticles(4);
    int visited = 0;
    const Status read = forEachArticle(writeFile(dir, QStringLiteral("dup.jsonl"), bytes), {},
        [&](ImportedArticle &&, ReadProgress) {
            ++visited;
            return Status {};
        });
    REQUIRE_FALSE(read);
    CHECK(read.error().code == ErrorCode::Duplicate);
    CHECK(read.error().line == 2);
    CHECK(visited == 1);
}

TEST_CASE("A duplicate id far from its first use names both lines", "[io][stream]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QByteArray dup = R"({"id":"a2","title":"again","text":"Another text."})"
                           "\n";
    const QString jsonl = writeFile(dir, QStringLiteral("far.jsonl"), jsonlArticles(4000) + dup);
    QByteArray csvBytes = "id,title,text\n";
    for (int i = 0; i < 4000; ++i)
        csvBytes += QStringLiteral("a%1,T,\"Text\nnumber %1.\"\n").arg(i).toUtf8();
    csvBytes += "a2,again,Another text.\n";
    const QString csv = writeFile(dir, QStringLiteral("far.csv"), csvBytes);

    const auto fromJsonl = readArticles(jsonl, withChunkSize(100));
    REQUIRE_FALSE(fromJsonl);
    CHECK(fromJsonl.error().code == ErrorCode::Duplicate);
    CHECK(fromJsonl.error().line == 4001);
    CHECK(fromJsonl.error().message.endsWith(
        QStringLiteral("far.jsonl:4001: duplicate id \"a2\" (first seen on line 3)")));

    // Each CSV record spans two lines: a2 begins on line 6, the repeat on line 8002.
    const auto fromCsv = readArticles(csv, withChunkSize(100));
    REQUIRE_FALSE(fromCsv);
    CHECK(fromCsv.error().code == ErrorCode::Duplicate);
    CHECK(fromCsv.error().line == 8002);
    CHECK(fromCsv.error().message.endsWith(
        QStringLiteral("far.csv:8002: duplicate id \"a2\" (first seen on line 6)")));
}

TEST_CASE("A streamed file holds one article at a time", "[io][stream]")
{
    // ImportedArticleCount counts the articles that exist; reading 3,000 articles one by one
    // must never hold more than one, while readArticles holds them all (the count works).
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString jsonl = writeFile(dir, QStringLiteral("many.jsonl"), jsonlArticles(3000));
    QByteArray csvBytes = "id,title,text\r\n";
    for (int i = 0; i < 3000; ++i)
        csvBytes += QStringLiteral("a%1,T%1,\"Text number %1.\"\r\n").arg(i).toUtf8();
    const QString csv = writeFile(dir, QStringLiteral("many.csv"), csvBytes);

    for (const QString &path : {jsonl, csv}) {
        INFO(path.toStdString());
        const qsizetype before = ImportedArticleCount::alive();
        ImportedArticleCount::resetMost();
        qsizetype visited = 0;
        REQUIRE(forEachArticle(path, withChunkSize(4096), [&](ImportedArticle &&, ReadProgress) {
            ++visited;
            return Status {};
        }));
        CHECK(visited == 3000);
        CHECK(ImportedArticleCount::most() - before == 1);
        CHECK(ImportedArticleCount::alive() == before);

        ImportedArticleCount::resetMost();
        const auto all = readArticles(path, {});
        REQUIRE(all);
        CHECK(ImportedArticleCount::most() - before >= 3000);
    }
}

TEST_CASE("Progress counts the bytes read up to each article", "[io][stream]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QByteArray bytes = jsonlArticles(50);
    const QString path = writeFile(dir, QStringLiteral("p.jsonl"), bytes);
    std::vector<ReadProgress> seen;
    REQUIRE(forEachArticle(path, withChunkSize(64), [&](ImportedArticle &&, ReadProgress p) {
        seen.push_back(p);
        return Status {};
    }));
    REQUIRE(seen.size() == 50);
    // After the first article: exactly its line with the line break.
    CHECK(seen.front().bytesRead == bytes.indexOf('\n') + 1);
    for (std::size_t i = 1; i < seen.size(); ++i)
        CHECK(seen[i].bytesRead > seen[i - 1].bytesRead);
    CHECK(seen.back().bytesRead == bytes.size());
    CHECK(seen.back().totalBytes == bytes.size());
}

TEST_CASE("A CSV record may hold at most 64 MiB", "[io][csv][stream]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    // 65 MiB of lines without a quote after the fault.
    const QByteArray tail = QByteArray("more text\n").repeated((qsizetype(65) << 20) / 10);

    SECTION("a quoted field that is never closed is named where it opens")
    {
        const QString path = writeFile(
            dir, QStringLiteral("open.csv"), "id,title,text\n1,t,x\n2,u,\"never closed\n" + tail);
        const auto result = readArticles(path, {});
        REQUIRE_FALSE(result);
        CHECK(result.error().line == 3);
        CHECK(result.error().column == 5);
        CHECK(result.error().message.contains(QStringLiteral("is not closed within 64 MiB")));
    }
    SECTION("a fault before it is reported instead: a quote inside an unquoted field")
    {
        const QString path =
            writeFile(dir, QStringLiteral("stray.csv"), "id,title,text\n1,say \"hi,x\n" + tail);
        const auto result = readArticles(path, {});
        REQUIRE_FALSE(result);
        CHECK(result.error().line == 2);
        CHECK(result.error().column == 7);
        CHECK(result.error().message.contains(QStringLiteral("a double quote inside a field")));
    }
    SECTION("a quoted field of 2 MiB across many chunks is read whole")
    {
        const QByteArray text = QByteArray("line of text\r\n").repeated(150000);
        const QString path =
            writeFile(dir, QStringLiteral("long.csv"), "id,title,text\n1,t,\"" + text + "\"\n");
        const auto result = readArticles(path, withChunkSize(4096));
        REQUIRE(result);
        REQUIRE(result->size() == 1);
        CHECK(result->front().text == QString::fromLatin1(text));
    }
}
