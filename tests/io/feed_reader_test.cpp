// RSS 2.0 and Atom 1.0 feeds through readArticles. The RSS feed follows the elements of the RSS
// 2.0 specification (RSS Advisory Board, rssboard.org/rss-specification: channel title, link,
// description; item title, link, description, guid, pubDate with an RFC 822 date, source,
// author, category) and the content module's content:encoded
// (web.resource.org/rss/1.0/modules/content), written from memory with an invented outlet and
// town. The Atom feeds are the two examples of RFC 4287 §1.1, the second with its people and
// blog renamed to invented ones.

#include "core/io/article_reader.h"
#include "tests/io/reader_test_support.h"

#include <QJsonArray>

using namespace fourfold;
using namespace fourfold::test;

namespace {

const QByteArray rssFeed = R"(<?xml version="1.0" encoding="UTF-8"?>
<rss version="2.0" xmlns:content="http://purl.org/rss/1.0/modules/content/"
     xmlns:dc="http://purl.org/dc/elements/1.1/">
  <channel>
    <title>Harbourside Courier</title>
    <link>https://courier.example/</link>
    <description>News from Ellisford and the bay.</description>
    <language>en-gb</language>
    <lastBuildDate>Tue, 10 Jun 2025 09:41:01 GMT</lastBuildDate>
    <docs>https://www.rssboard.org/rss-specification</docs>
    <item>
      <title>Ferry fares to rise in spring</title>
      <link>https://courier.example/2025/06/ferry-fares</link>
      <description>The &lt;b&gt;harbour board&lt;/b&gt; voted on Monday.&lt;p&gt;Fares rise by a &lt;em&gt;tenth&lt;/em&gt;.&lt;/p&gt;</description>
      <pubDate>Tue, 03 Jun 2025 09:39:21 GMT</pubDate>
      <guid>https://courier.example/2025/06/ferry-fares</guid>
      <category>Transport</category>
      <category>Council</category>
      <dc:creator>News Desk</dc:creator>
    </item>
    <item>
      <title>Quay wall repairs begin</title>
      <description>A short summary that the full text replaces.</description>
      <content:encoded><![CDATA[<h2>Quay wall</h2><p>Work on the
  old quay wall began at dawn.</p><script>track()</script><p>It will take &amp; cost more.</p>]]></content:encoded>
      <guid isPermaLink="false">courier-4471</guid>
      <pubDate>Mon, 02 Jun 2025 14:05:00 +0200</pubDate>
      <source url="https://wire.example/rss">Bay Wire Service</source>
      <author>desk@courier.example (News Desk)</author>
    </item>
  </channel>
</rss>
)";

// RFC 4287 §1.1, the first example ("A brief, single-entry Atom Feed Document"), as printed.
const QByteArray atomMinimal = R"(<?xml version="1.0" encoding="utf-8"?>
<feed xmlns="http://www.w3.org/2005/Atom">

  <title>Example Feed</title>
  <link href="http://example.org/"/>
  <updated>2003-12-13T18:30:02Z</updated>
  <author>
    <name>John Doe</name>
  </author>
  <id>urn:uuid:60a76c80-d399-11d9-b93C-0003939e0af6</id>

  <entry>
    <title>Atom-Powered Robots Run Amok</title>
    <link href="http://example.org/2003/12/13/atom03"/>
    <id>urn:uuid:1225c695-cfb8-4ebb-aaaa-80da344efa6a</id>
    <updated>2003-12-13T18:30:02Z</updated>
    <summary>Some text.</summary>
  </entry>

</feed>
)";

// RFC 4287 §1.1, the second example ("A more extensive, single-entry Atom Feed Document"), with
// the blog's title, rights and people renamed to invented ones.
const QByteArray atomExtensive = R"(<?xml version="1.0" encoding="utf-8"?>
<feed xmlns="http://www.w3.org/2005/Atom">
  <title type="text">notes from ellisford</title>
  <subtitle type="html">
    A &lt;em&gt;lot&lt;/em&gt; of effort
    went into making this effortless
  </subtitle>
  <updated>2005-07-31T12:29:29Z</updated>
  <id>tag:example.org,2003:3</id>
  <link rel="alternate" type="text/html"
   hreflang="en" href="http://example.org/"/>
  <link rel="self" type="application/atom+xml"
   href="http://example.org/feed.atom"/>
  <rights>Copyright (c) 2003, Ada Quill</rights>
  <generator uri="http://www.example.com/" version="1.0">
    Example Toolkit
  </generator>
  <entry>
    <title>Atom draft-07 snapshot</title>
    <link rel="alternate" type="text/html"
     href="http://example.org/2005/04/02/atom"/>
    <link rel="enclosure" type="audio/mpeg" length="1337"
     href="http://example.org/audio/ph34r_my_podcast.mp3"/>
    <id>tag:example.org,2003:3.2397</id>
    <updated>2005-07-31T12:29:29Z</updated>
    <published>2003-12-13T08:29:29-04:00</published>
    <author>
      <name>Ada Quill</name>
      <uri>http://example.org/</uri>
      <email>ada@example.com</email>
    </author>
    <contributor>
      <name>Ben Arlow</name>
    </contributor>
    <contributor>
      <name>Cora Penn</name>
    </contributor>
    <content type="xhtml" xml:lang="en"
     xml:base="http://diveintomark.org/">
      <div xmlns="http://www.w3.org/1999/xhtml">
        <p><i>[Update: The Atom draft is finished.]</i></p>
      </div>
    </content>
  </entry>
</feed>
)";

} // namespace

TEST_CASE(
    "RSS 2.0: one article per item with its HTML read as the HTML reader reads it", "[io][feed]")
{
    const auto result = readBytes(QStringLiteral("courier.rss"), rssFeed);
    REQUIRE(result.has_value());
    REQUIRE(result->size() == 2);

    const ImportedArticle &first = result->at(0);
    CHECK(first.externalId == QStringLiteral("https://courier.example/2025/06/ferry-fares"));
    CHECK(first.title == QStringLiteral("Ferry fares to rise in spring"));
    // The description is entity-encoded HTML (RSS 2.0: "entity-encoded HTML is allowed").
    CHECK(first.text
        == QStringLiteral("The harbour board voted on Monday.\n\nFares rise by a tenth."));
    // RFC 822 "GMT" is UTC; written as ISO 8601.
    CHECK(first.published == QStringLiteral("2025-06-03T09:39:21Z"));
    CHECK(first.outlet == QStringLiteral("Harbourside Courier"));
    CHECK(first.language == QStringLiteral("en-gb"));
    CHECK(first.sourceLine == 11);
    CHECK(first.meta.value(QStringLiteral("link")).toString()
        == QStringLiteral("https://courier.example/2025/06/ferry-fares"));
    CHECK(first.meta.value(QStringLiteral("categories")).toArray()
        == QJsonArray {QStringLiteral("Transport"), QStringLiteral("Council")});
    // An extension module's element (Dublin Core) is kept under its prefixed name.
    CHECK(first.meta.value(QStringLiteral("dc:creator")).toString() == QStringLiteral("News Desk"));

    const ImportedArticle &second = result->at(1);
    CHECK(second.externalId == QStringLiteral("courier-4471"));
    CHECK(second.title == QStringLiteral("Quay wall repairs begin"));
    // content:encoded wins over description; the script is dropped (HTML reader rules), the
    // heading is a paragraph, whitespace collapses.
    CHECK(second.text
        == QStringLiteral(
            "Quay wall\n\nWork on the old quay wall began at dawn.\n\nIt will take & cost more."));
    CHECK(second.published == QStringLiteral("2025-06-02T14:05:00+02:00"));
    // The item's <source> names the channel it came from (RSS 2.0 "<source> sub-element").
    CHECK(second.outlet == QStringLiteral("Bay Wire Service"));
    CHECK(second.meta.value(QStringLiteral("author")).toString()
        == QStringLiteral("desk@courier.example (News Desk)"));
    CHECK_FALSE(second.meta.contains(QStringLiteral("link")));
    CHECK(second.sourceLine == 21);
}

TEST_CASE("Atom: the two examples of RFC 4287 section 1.1", "[io][feed]")
{
    SECTION("the brief feed: the summary is the text and updated the date")
    {
        const auto result = readBytes(QStringLiteral("example.atom"), atomMinimal);
        REQUIRE(result.has_value());
        REQUIRE(result->size() == 1);
        const ImportedArticle &entry = result->front();
        CHECK(entry.externalId == QStringLiteral("urn:uuid:1225c695-cfb8-4ebb-aaaa-80da344efa6a"));
        CHECK(entry.title == QStringLiteral("Atom-Powered Robots Run Amok"));
        CHECK(entry.text == QStringLiteral("Some text."));
        CHECK(entry.published == QStringLiteral("2003-12-13T18:30:02Z"));
        CHECK(entry.outlet == QStringLiteral("Example Feed"));
        CHECK(entry.sourceLine == 12);
        CHECK(entry.meta.value(QStringLiteral("link")).toString()
            == QStringLiteral("http://example.org/2003/12/13/atom03"));
    }
    SECTION("the extensive feed: xhtml content, published, people and links")
    {
        const auto result = readBytes(QStringLiteral("extensive.atom"), atomExtensive);
        REQUIRE(result.has_value());
        REQUIRE(result->size() == 1);
        const ImportedArticle &entry = result->front();
        CHECK(entry.externalId == QStringLiteral("tag:example.org,2003:3.2397"));
        CHECK(entry.title == QStringLiteral("Atom draft-07 snapshot"));
        CHECK(entry.text == QStringLiteral("[Update: The Atom draft is finished.]"));
        CHECK(entry.published == QStringLiteral("2003-12-13T08:29:29-04:00"));
        CHECK(entry.outlet == QStringLiteral("notes from ellisford"));
        // xml:lang is set on the content, not on the entry or feed.
        CHECK(entry.language.isEmpty());
        CHECK(entry.meta.value(QStringLiteral("link")).toString()
            == QStringLiteral("http://example.org/2005/04/02/atom"));
        CHECK(entry.meta.value(QStringLiteral("link:enclosure")).toString()
            == QStringLiteral("http://example.org/audio/ph34r_my_podcast.mp3"));
        CHECK(entry.meta.value(QStringLiteral("author")).toString() == QStringLiteral("Ada Quill"));
        CHECK(entry.meta.value(QStringLiteral("contributor")).toArray()
            == QJsonArray {QStringLiteral("Ben Arlow"), QStringLiteral("Cora Penn")});
    }
    SECTION("html and text content and an entry's language")
    {
        const QByteArray feed = R"(<feed xmlns="http://www.w3.org/2005/Atom" xml:lang="en">
<title type="html">Ellisford &lt;b&gt;Gazette&lt;/b&gt;</title>
<entry><id>e1</id><title>One</title><updated>2025-01-02T03:04:05.5+01:00</updated>
<content type="html">&lt;p&gt;First.&lt;/p&gt;&lt;p&gt;Second &amp;amp; last.&lt;/p&gt;</content></entry>
<entry xml:lang="cy"><id>e2</id><title>Two</title><updated>2025-01-03T00:00:00Z</updated>
<content>Plain  text
over two lines.

A second paragraph &lt;not a tag&gt;.</content></entry>
</feed>
)";
        const auto result = readBytes(QStringLiteral("gazette.atom"), feed);
        REQUIRE(result.has_value());
        REQUIRE(result->size() == 2);
        CHECK(result->at(0).outlet == QStringLiteral("Ellisford Gazette"));
        CHECK(result->at(0).text == QStringLiteral("First.\n\nSecond & last."));
        CHECK(result->at(0).published == QStringLiteral("2025-01-02T03:04:05.5+01:00"));
        CHECK(result->at(0).language == QStringLiteral("en"));
        // type="text" (the default): whitespace collapses, a blank line splits paragraphs, and
        // markup-like text stays text.
        CHECK(result->at(1).text
            == QStringLiteral("Plain text over two lines.\n\nA second paragraph <not a tag>."));
        CHECK(result->at(1).language == QStringLiteral("cy"));
    }
}

TEST_CASE("Feeds: broken or unreadable feeds are refused naming file and line", "[io][feed]")
{
    const BadInput cases[] = {
        {"an RSS feed with no items",
            "<rss version=\"2.0\">\n<channel>\n<title>Empty</title>\n</channel>\n</rss>\n",
            ErrorCode::InvalidInput, 2, 0, "the feed holds no items"},
        {"an Atom feed with no entries",
            "<feed xmlns=\"http://www.w3.org/2005/Atom\">\n<title>Empty</title>\n</feed>\n",
            ErrorCode::InvalidInput, 1, 0, "the feed holds no entries"},
        {"an RSS version other than 2.0",
            "<rss version=\"0.91\">\n<channel><item><guid>a</guid></item></channel></rss>\n",
            ErrorCode::InvalidInput, 1, 0, "the RSS version is \"0.91\""},
        {"two channels", "<rss version=\"2.0\">\n<channel/>\n<channel/>\n</rss>\n",
            ErrorCode::InvalidInput, 1, 0, "holds 2 channels"},
        {"an item without guid or link",
            "<rss version=\"2.0\"><channel>\n<item>\n<title>T</title>\n<description>D</description>"
            "\n</item>\n</channel></rss>\n",
            ErrorCode::InvalidInput, 2, 0, "neither a guid nor a link"},
        {"an item without description or content",
            "<rss version=\"2.0\"><channel>\n<item><guid>g1</guid></item>\n</channel></rss>\n",
            ErrorCode::InvalidInput, 2, 0, "neither a description nor a content:encoded"},
        {"a misspelt item element",
            "<rss version=\"2.0\"><channel>\n<item><guid>g1</guid>\n<titel>T</titel>"
            "<description>D</description></item>\n</channel></rss>\n",
            ErrorCode::InvalidInput, 3, 0, "<titel> is not an element of an RSS 2.0 item"},
        {"a misspelt channel element",
            "<rss version=\"2.0\"><channel>\n<tilte>T</tilte>\n<item><guid>g1</guid>"
            "<description>D</description></item>\n</channel></rss>\n",
            ErrorCode::InvalidInput, 2, 0, "<tilte> is not an element of an RSS 2.0 channel"},
        {"a pubDate that is not RFC 822",
            "<rss version=\"2.0\"><channel>\n<item><guid>g1</guid><description>D</description>\n"
            "<pubDate>yesterday</pubDate></item>\n</channel></rss>\n",
            ErrorCode::InvalidInput, 3, 0, "the pubDate \"yesterday\" is not an RFC 822 date"},
        {"the same guid twice",
            "<rss version=\"2.0\"><channel>\n<item><guid>g1</guid><description>A</description>"
            "</item>\n<item><guid>g1</guid><description>B</description></item>\n</channel></rss>\n",
            ErrorCode::Duplicate, 3, 0, "duplicate id \"g1\" (first seen on line 2)"},
        {"an entry without id",
            "<feed xmlns=\"http://www.w3.org/2005/Atom\">\n<entry><title>T</title>\n"
            "<summary>S</summary></entry>\n</feed>\n",
            ErrorCode::InvalidInput, 2, 0, "the entry has no <id>"},
        {"an Atom element the RFC does not define",
            "<feed xmlns=\"http://www.w3.org/2005/Atom\">\n<entry><id>e</id>\n<summery>S</summery>"
            "</entry>\n</feed>\n",
            ErrorCode::InvalidInput, 3, 0, "<summery> is not an element of an Atom entry"},
        {"content given by reference without a summary",
            "<feed xmlns=\"http://www.w3.org/2005/Atom\">\n<entry><id>e</id>\n"
            "<content src=\"http://example.org/a\"/></entry>\n</feed>\n",
            ErrorCode::InvalidInput, 2, 0, "neither a content held in the feed nor a summary"},
        {"content of a type that is not text",
            "<feed xmlns=\"http://www.w3.org/2005/Atom\">\n<entry><id>e</id>\n"
            "<content type=\"image/png\">iVBOR</content></entry>\n</feed>\n",
            ErrorCode::InvalidInput, 3, 0, "has the type \"image/png\""},
        {"an updated date that is not RFC 3339",
            "<feed xmlns=\"http://www.w3.org/2005/Atom\">\n<entry><id>e</id><summary>S</summary>\n"
            "<updated>13/12/2003</updated></entry>\n</feed>\n",
            ErrorCode::InvalidInput, 3, 0, "is not an RFC 3339 date-time"},
    };
    for (const BadInput &input : cases) {
        checkBadInput(QStringLiteral("broken.rss"), input);
    }
}

TEST_CASE("Feeds: an RSS item whose HTML holds no text has no text", "[io][feed]")
{
    // The shared checks (article_reader.h) refuse an article without text, naming the item's
    // line.
    checkBadInput(QStringLiteral("blank.rss"),
        {"a description of markup only",
            "<rss version=\"2.0\"><channel>\n<item><guid>g1</guid>"
            "<description>&lt;script&gt;x()&lt;/script&gt;</description></item>\n</channel></"
            "rss>\n",
            ErrorCode::InvalidInput, 2, 0, "the article \"g1\" has no text"});
}
