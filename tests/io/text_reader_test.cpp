// Plain-text reading through readArticles: one article per file, or a folder of .txt files.
// The title rule is Fourfold's own (documented in article_reader.h); treating blank lines as
// paragraph separators is common practice for plain text.

#include "core/io/article_reader.h"
#include "tests/io/reader_test_support.h"

#include <QDir>
#include <QFileInfo>

using namespace fourfold;
using namespace fourfold::test;

TEST_CASE("Plain text: title and paragraphs", "[io][txt]")
{
    struct Good {
        const char *what;
        const char *name;
        QByteArray bytes;
        const char *title;
        const char *text;
    };
    const QByteArray longLine(maxTextTitleLength + 1, 'x');
    // clang-format off
    const Good cases[] = {
        {"a one-line first paragraph is the title; extra blank lines become one",
         "flood-vote.txt", "Headline\n\nPara one line 1\nline 2\n\n\n\nPara two\n",
         "Headline", "Para one line 1\nline 2\n\nPara two"},
        {"CRLF line ends, a BOM and leading blank lines; the title is trimmed",
         "crlf.txt", "\xEF\xBB\xBF\r\n\r\n  Headline  \r\n\r\nBody one\r\n\r\nBody two\r\n",
         "Headline", "Body one\n\nBody two"},
        {"whitespace-only lines separate paragraphs; indentation inside is kept",
         "ws.txt", "Title\n \t \n  Indented body\nsecond line  \n",
         "Title", "  Indented body\nsecond line  "},
        {"a single paragraph: the file name is the title and nothing is lost",
         "note-7.txt", "Just one paragraph\nacross two lines.\n",
         "note-7", "Just one paragraph\nacross two lines."},
        {"a single line", "one.txt", "Only a line", "one", "Only a line"},
        {"a first paragraph of several lines is body, not title",
         "multi.txt", "Line a\nLine b\n\nMore", "multi", "Line a\nLine b\n\nMore"},
        {"a first line longer than the title limit is body",
         "long.txt", longLine + "\n\nBody", "long", nullptr},
        {"only the last suffix is dropped from the name",
         "story.v2.txt", "One paragraph.", "story.v2", "One paragraph."},
        {"non-ASCII text", "utf8.text", "Caf\xC3\xA9 \xF0\x9F\x98\x80\n\nBody",
         "Caf\xC3\xA9 \xF0\x9F\x98\x80", "Body"},
    };
    // clang-format on
    for (const Good &c : cases) {
        INFO("case: " << c.what);
        ImportOptions options;
        options.language = QStringLiteral("en");
        const auto result = readBytes(QString::fromUtf8(c.name), c.bytes, options);
        REQUIRE(result.has_value());
        REQUIRE(result->size() == 1);
        const ImportedArticle &a = result->front();
        CHECK(a.title == QString::fromUtf8(c.title));
        const QString expectedText = c.text
            ? QString::fromUtf8(c.text)
            : QString::fromLatin1(longLine) + QStringLiteral("\n\nBody");
        CHECK(a.text == expectedText);
        CHECK(a.externalId == QFileInfo(QString::fromUtf8(c.name)).completeBaseName());
        CHECK(a.language == QStringLiteral("en"));
        CHECK(a.outlet.isEmpty());
        CHECK(a.sourceLine == 1);
        CHECK(a.sourceFile.endsWith(QString::fromUtf8(c.name)));
    }
}

TEST_CASE("Plain text: bad files are refused", "[io][txt]")
{
    // clang-format off
    const BadInput cases[] = {
        {"empty file", "", ErrorCode::InvalidInput, 0, 0, "contains no articles"},
        {"blank lines only", "\n \r\n\t\n", ErrorCode::InvalidInput, 0, 0,
         "contains no articles"},
        {"invalid UTF-8 (a Latin-1 é)", "Title\n\nCaf\xE9 au lait\n", ErrorCode::InvalidInput,
         3, 4, "invalid UTF-8"},
        {"a binary file", bytesOf("GIF89a\0\0"), ErrorCode::InvalidInput, 1, 7, "binary"},
    };
    // clang-format on
    for (const BadInput &input : cases)
        checkBadInput(QStringLiteral("bad.txt"), input);
}

TEST_CASE("Plain text: a folder of .txt files", "[io][txt]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());

    SECTION("sorted by name, not recursive, other files ignored")
    {
        writeFile(dir, QStringLiteral("b.txt"), "B title\n\nB body");
        writeFile(dir, QStringLiteral("a.txt"), "A body only");
        writeFile(dir, QStringLiteral("C.TXT"), "C title\n\nC body");
        writeFile(dir, QStringLiteral("notes.md"), "# not an article");
        writeFile(dir, QStringLiteral("sub/d.txt"), "D body");
        const auto result = readArticles(dir.path(), {});
        REQUIRE(result.has_value());
        REQUIRE(result->size() == 3);
        // Code-unit order: upper case before lower case.
        CHECK(result->at(0).externalId == QStringLiteral("C"));
        CHECK(result->at(0).title == QStringLiteral("C title"));
        CHECK(result->at(1).externalId == QStringLiteral("a"));
        CHECK(result->at(1).title == QStringLiteral("a"));
        CHECK(result->at(1).text == QStringLiteral("A body only"));
        CHECK(result->at(2).externalId == QStringLiteral("b"));
        CHECK(result->at(2).sourceFile == QDir(dir.path()).filePath(QStringLiteral("b.txt")));
    }
    SECTION("one bad file fails the whole folder and is named")
    {
        writeFile(dir, QStringLiteral("a.txt"), "Fine");
        writeFile(dir, QStringLiteral("b.txt"), "Bad \xFF byte");
        const auto result = readArticles(dir.path(), {});
        REQUIRE_FALSE(result.has_value());
        CHECK(result.error().code == ErrorCode::InvalidInput);
        CHECK(result.error().file == QDir(dir.path()).filePath(QStringLiteral("b.txt")));
        CHECK(result.error().line == 1);
        CHECK(result.error().column == 5);
    }
    SECTION("two files with the same id")
    {
        writeFile(dir, QStringLiteral("a.text"), "One");
        writeFile(dir, QStringLiteral("a.txt"), "Two");
        const auto result = readArticles(dir.path(), {});
        REQUIRE_FALSE(result.has_value());
        CHECK(result.error().code == ErrorCode::Duplicate);
        CHECK(result.error().file == QDir(dir.path()).filePath(QStringLiteral("a.txt")));
        CHECK(result.error().message.contains(QStringLiteral("duplicate id \"a\" (first seen in")));
    }
    SECTION("a folder without .txt files")
    {
        writeFile(dir, QStringLiteral("readme.md"), "x");
        const auto result = readArticles(dir.path(), {});
        REQUIRE_FALSE(result.has_value());
        CHECK(result.error().code == ErrorCode::InvalidInput);
        CHECK(result.error().message.contains(QStringLiteral("contains no .txt files")));
    }
    SECTION("a folder cannot be read as another format")
    {
        ImportOptions options;
        options.format = ImportFormat::Csv;
        const auto result = readArticles(dir.path(), options);
        REQUIRE_FALSE(result.has_value());
        CHECK(result.error().code == ErrorCode::Unsupported);
    }
}
