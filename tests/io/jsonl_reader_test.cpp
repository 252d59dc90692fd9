// JSON Lines reading through readArticles. Format: https://jsonlines.org (one JSON value per
// line, UTF-8, "\n" or "\r\n" line ends); JSON itself: RFC 8259. Column numbers of syntax errors
// come from Qt's parser (QJsonParseError::offset, a byte offset) and are checked in code points.

#include "core/io/article_reader.h"
#include "tests/io/reader_test_support.h"

#include <QElapsedTimer>
#include <QFile>
#include <QJsonObject>

using namespace fourfold;
using namespace fourfold::test;

TEST_CASE("JSON Lines: every field of a valid file", "[io][jsonl]")
{
    // A BOM, a blank line, CRLF on the last record and a non-ASCII text (invented demo data).
    const QByteArray bytes =
        "\xEF\xBB\xBF"
        R"({"id":"a1","title":"Flood barrier vote delayed","text":"Para one.\n\nPara two.",)"
        R"("outlet":"Riverton Ledger","published":"2024-03-05","language":"en",)"
        R"("meta":{"section":"local","words":120}})"
        "\n"
        "   \n"
        "{\"id\":\"a2\",\"title\":\"\",\"text\":\"Caf\xC3\xA9 \\ud83d\\ude00 owners\","
        "\"outlet\":null,\"meta\":null}\r\n";
    ImportOptions options;
    options.language = QStringLiteral("de");
    const auto result = readBytes(QStringLiteral("feed.jsonl"), bytes, options);
    REQUIRE(result.has_value());
    REQUIRE(result->size() == 2);

    const ImportedArticle &a = result->at(0);
    CHECK(a.externalId == QStringLiteral("a1"));
    CHECK(a.title == QStringLiteral("Flood barrier vote delayed"));
    CHECK(a.text == QStringLiteral("Para one.\n\nPara two."));
    CHECK(a.outlet == QStringLiteral("Riverton Ledger"));
    CHECK(a.published == QStringLiteral("2024-03-05"));
    CHECK(a.language == QStringLiteral("en"));
    CHECK(a.meta.value(QStringLiteral("section")).toString() == QStringLiteral("local"));
    CHECK(a.meta.value(QStringLiteral("words")).toInt() == 120);
    CHECK(a.meta.size() == 2);
    CHECK(a.sourceLine == 1);
    CHECK(a.sourceFile.endsWith(QStringLiteral("feed.jsonl")));

    const ImportedArticle &b = result->at(1);
    CHECK(b.externalId == QStringLiteral("a2"));
    CHECK(b.title.isEmpty());
    // RFC 8259 §7: a character outside the BMP is escaped as a UTF-16 surrogate pair.
    CHECK(b.text == QStringLiteral(u"Caf\u00E9 \U0001F600 owners"));
    CHECK(b.outlet.isEmpty());
    CHECK(b.language == QStringLiteral("de")); // from the options: the record names none
    CHECK(b.meta.isEmpty());
    CHECK(b.sourceLine == 3);
}

TEST_CASE("JSON Lines: malformed files are refused with line, column and reason", "[io][jsonl]")
{
    const QByteArray ok = R"({"id":"a","title":"t","text":"x"})"
                          "\n";
    // clang-format off
    const BadInput cases[] = {
        {"invalid UTF-8 (0xFF never occurs in UTF-8; Unicode 15.0 §3.9 Table 3-7): byte column",
         ok + "{\"id\":\"b\",\"title\":\"x\xFFy\",\"text\":\"t\"}\n",
         ErrorCode::InvalidInput, 2, 21, "invalid UTF-8"},
        {"a binary file: NUL bytes",
         bytesOf("{\"id\":\"a\0\"}\n"), ErrorCode::InvalidInput, 1, 9, "binary"},
        {"a binary file: PNG signature (0x89 is a lone continuation byte)",
         bytesOf("\x89PNG\r\n\x1A\n\0\0\0\rIHDR"), ErrorCode::InvalidInput, 1, 1, "invalid UTF-8"},
        {"truncated last line: no final newline, the string never ends",
         ok + R"({"id":"b","title":"t","text":"cut of)", ErrorCode::InvalidInput, 2, 37,
         "the last line is truncated"},
        {"truncated last line: the object never closes",
         ok + R"({"id":"b","title":"t","text":"x")", ErrorCode::InvalidInput, 2, 33,
         "the last line is truncated"},
        {"the same unterminated string followed by a newline is an ordinary syntax error",
         ok + R"({"id":"b","title":"t","text":"cut of)" "\n" + ok, ErrorCode::InvalidInput, 2,
         37, "invalid JSON: unterminated string"},
        {"syntax error: the column counts characters: x is the 32nd character but the 33rd byte",
         ok + R"({"id":"a2","title":"é","text": x})" "\n", ErrorCode::InvalidInput, 2, 32,
         "invalid JSON"},
        {"garbage after the object",
         R"({"id":"a","title":"t","text":"x"} trailing)" "\n", ErrorCode::InvalidInput, 1, 35,
         "invalid JSON: garbage at the end"},
        {"title is a number", ok + R"({"id":"b","title":7,"text":"x"})" "\n",
         ErrorCode::InvalidInput, 2, 0, "field \"title\" must be a string, got number"},
        {"id is a number", R"({"id":17,"title":"t","text":"x"})" "\n",
         ErrorCode::InvalidInput, 1, 0, "field \"id\" must be a string, got number"},
        {"text is null", R"({"id":"a","title":"t","text":null})" "\n",
         ErrorCode::InvalidInput, 1, 0, "field \"text\" must be a string, got null"},
        {"outlet is a boolean", R"({"id":"a","title":"t","text":"x","outlet":true})" "\n",
         ErrorCode::InvalidInput, 1, 0, "field \"outlet\" must be a string or null, got boolean"},
        {"meta is an array", R"({"id":"a","title":"t","text":"x","meta":[1]})" "\n",
         ErrorCode::InvalidInput, 1, 0, "field \"meta\" must be an object or null, got array"},
        {"missing text", ok + R"({"id":"b","title":"t"})" "\n",
         ErrorCode::InvalidInput, 2, 0, "missing required field \"text\""},
        {"a typo in a field name is an unknown field, not silently lost data",
         R"({"id":"a","titel":"t","text":"x"})" "\n", ErrorCode::InvalidInput, 1, 0,
         "unknown field \"titel\""},
        {"several unknown fields are all named",
         R"({"id":"a","title":"t","text":"x","url":"u","author":"n"})" "\n",
         ErrorCode::InvalidInput, 1, 0, "unknown fields \"author\", \"url\""},
        {"an array line", ok + "[1,2]\n", ErrorCode::InvalidInput, 2, 0,
         "expected a JSON object, got array"},
        {"a number line", "42\n", ErrorCode::InvalidInput, 1, 0,
         "expected a JSON object, got number"},
        {"a string line", "\"just text\"\n", ErrorCode::InvalidInput, 1, 0,
         "expected a JSON object, got string"},
        {"an unpaired surrogate escape (RFC 8259 §8.2)",
         R"({"id":"a","title":"t","text":"a\ud800b"})" "\n", ErrorCode::InvalidInput, 1, 0,
         "unpaired surrogate"},
        {"duplicate id: named with the line where it was first seen",
         ok + R"({"id":"a7","title":"t","text":"x"})" "\n"
            + R"({"id":"a7","title":"u","text":"y"})" "\n",
         ErrorCode::Duplicate, 3, 0, "duplicate id \"a7\" (first seen on line 2)"},
        {"empty id", R"({"id":"","title":"t","text":"x"})" "\n", ErrorCode::InvalidInput, 1, 0,
         "has no id"},
        {"blank text", R"({"id":"a","title":"t","text":" \n "})" "\n", ErrorCode::InvalidInput,
         1, 0, "has no text"},
        {"empty file", "", ErrorCode::InvalidInput, 0, 0, "contains no articles"},
        {"only blank lines", "\n  \r\n\t\n", ErrorCode::InvalidInput, 0, 0,
         "contains no articles"},
        // An id must be one line of printable text: a line break, a tab or NUL inside it would
        // break the line-based exports that name the article (common practice).
        {"a line break in an id", ok + R"({"id":"b\nc","title":"t","text":"x"})" "\n",
         ErrorCode::InvalidInput, 2, 0, "holds a control character (U+000A)"},
        {"a tab in an id", R"({"id":"b\tc","title":"t","text":"x"})" "\n",
         ErrorCode::InvalidInput, 1, 0, "holds a control character (U+0009)"},
        {"NUL escaped in an id", R"({"id":"b\u0000","title":"t","text":"x"})" "\n",
         ErrorCode::InvalidInput, 1, 0, "holds a control character (U+0000)"},
        // Found by fuzz_article_jsonl: a NUL escaped in a text or a title got into the project.
        {"NUL escaped in a text", ok + R"({"id":"b","title":"t","text":"x\u0000y"})" "\n",
         ErrorCode::InvalidInput, 2, 0, "the text of the article \"b\" holds a NUL character"},
        {"NUL escaped in a title", R"({"id":"b","title":"\u0000","text":"x"})" "\n",
         ErrorCode::InvalidInput, 1, 0, "the title of the article \"b\" holds a NUL character"},
    };
    // clang-format on
    for (const BadInput &input : cases)
        checkBadInput(QStringLiteral("bad.jsonl"), input);
}

TEST_CASE("JSON Lines: a 50 MB line imports, a line above the limit is refused", "[io][jsonl]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());

    // 50 MB of text in one record: the line limit (64 MiB) leaves room for it.
    const qsizetype repeats = 50 * 1000 * 1000 / 10;
    const QByteArray chunk = "word word ";
    const QByteArray line =
        R"({"id":"big","title":"Big","text":")" + chunk.repeated(repeats) + "end\"}\n";
    const QString path = writeFile(dir, QStringLiteral("big.jsonl"), line);

    QElapsedTimer timer;
    timer.start();
    const auto result = readArticles(path, {});
    INFO("reading a 50 MB line took " << timer.elapsed() << " ms");
    REQUIRE(result.has_value());
    REQUIRE(result->size() == 1);
    CHECK(result->front().text.size() == repeats * chunk.size() + 3);
    CHECK(result->front().text.endsWith(QStringLiteral("word end")));

    // One byte over the limit (spaces, which would be valid JSON whitespace): refused before
    // any parsing, naming the line.
    QByteArray huge = R"({"id":"ok","title":"t","text":"x"})"
                      "\n";
    const qsizetype prefixSize = huge.size();
    huge.append(QByteArray(maxJsonLineSize + 1, ' '));
    huge.append('\n');
    REQUIRE(huge.size() == prefixSize + maxJsonLineSize + 2);
    const auto refused = readArticles(writeFile(dir, QStringLiteral("huge.jsonl"), huge), {});
    REQUIRE_FALSE(refused.has_value());
    CHECK(refused.error().code == ErrorCode::InvalidInput);
    CHECK(refused.error().line == 2);
    CHECK(refused.error().message.contains(QStringLiteral("a line may be at most 64 MiB")));
}
