// NITF 3.x and NewsML-G2 news items through readArticles. The documents are written from memory
// after the IPTC specifications (NITF 3.x: nitf/head with title, tobject, docdata with doc-id,
// date.issue and key-list, pubdata; body/body.head with hedline, byline, distributor, dateline;
// body.content. NewsML-G2 2.x: newsItem with guid and version, itemMeta with itemClass, provider,
// versionCreated, firstCreated; contentMeta with contentCreated, subject, headline, by,
// dateline, slugline; contentSet with inlineXML or inlineData; newsMessage with header and
// itemSet), with an invented agency, paper, town and story.

#include "core/io/article_reader.h"
#include "tests/io/reader_test_support.h"

#include <QJsonArray>
#include <QJsonObject>

using namespace fourfold;
using namespace fourfold::test;

namespace {

const QByteArray nitfStory = R"(<?xml version="1.0" encoding="UTF-8"?>
<nitf version="-//IPTC//DTD NITF 3.6//EN" change.date="October 18, 2006" change.time="19:30">
  <head>
    <title>Ellisford council backs new ferry timetable</title>
    <tobject tobject.type="news">
      <tobject.subject tobject.subject.refnum="11006000" tobject.subject.matter="government"/>
      <tobject.subject tobject.subject.refnum="04015000" tobject.subject.type="transport"/>
    </tobject>
    <docdata>
      <doc-id regsrc="BWS" id-string="BWS-2025-0611-017"/>
      <date.issue norm="20250611T083000Z"/>
      <key-list><keyword key="ferry"/><keyword key="timetable"/></key-list>
    </docdata>
    <pubdata type="print" name="Ellisford Evening Post"/>
  </head>
  <body xml:lang="en-GB">
    <body.head>
      <hedline>
        <hl1>Council backs ferry timetable</hl1>
        <hl2>Winter sailings kept</hl2>
      </hedline>
      <byline>By <person>Dana Holloway</person>, <byttl>Transport Reporter</byttl></byline>
      <distributor>Bay Wire Service</distributor>
      <dateline><location><city>ELLISFORD</city></location>,
        <story.date norm="20250611T080000Z">June 11</story.date></dateline>
      <abstract><p>The timetable keeps winter sailings.</p></abstract>
    </body.head>
    <body.content>
      <p>Ellisford's council voted 9 to 4 on Tuesday to keep the
        winter sailings.</p>
      <hl2>Fares</hl2>
      <p>Fares stay as they are &amp; season tickets return.</p>
      <block><p>"We listened," the harbour master said.</p></block>
    </body.content>
    <body.end><tagline>Bay Wire Service</tagline></body.end>
  </body>
</nitf>
)";

const QByteArray newsItem = R"(<?xml version="1.0" encoding="UTF-8"?>
<newsItem xmlns="http://iptc.org/std/nar/2006-10-01/"
    guid="urn:newsml:baywire.example:20250611:ferry-timetable" version="3"
    standard="NewsML-G2" standardversion="2.29" conformance="power" xml:lang="en-GB">
  <catalogRef href="http://www.iptc.org/std/catalog/catalog.IPTC-G2-Standards_38.xml"/>
  <itemMeta>
    <itemClass qcode="ninat:text"/>
    <provider qcode="nprov:BWS"><name>Bay Wire Service</name></provider>
    <versionCreated>2025-06-11T09:15:00Z</versionCreated>
    <firstCreated>2025-06-11T08:30:00Z</firstCreated>
    <pubStatus qcode="stat:usable"/>
  </itemMeta>
  <contentMeta>
    <contentCreated>2025-06-11T08:00:00Z</contentCreated>
    <subject type="cpnat:abstract" qcode="medtop:11000000">
      <name>politics</name>
    </subject>
    <subject type="cpnat:abstract" qcode="medtop:20000000"/>
    <headline>Council backs ferry timetable</headline>
    <by>By Dana Holloway</by>
    <dateline>ELLISFORD, June 11</dateline>
    <slugline>FERRY-TIMETABLE</slugline>
  </contentMeta>
  <contentSet>
    <inlineXML contenttype="application/nitf+xml">
      <nitf xmlns="http://iptc.org/std/NITF/2006-10-18/">
        <body>
          <body.content>
            <p>Ellisford's council voted on Tuesday.</p>
            <p>Winter sailings stay.</p>
          </body.content>
        </body>
      </nitf>
    </inlineXML>
    <inlineXML contenttype="application/xhtml+xml">
      <html xmlns="http://www.w3.org/1999/xhtml"><body><p>Another rendition.</p></body></html>
    </inlineXML>
  </contentSet>
</newsItem>
)";

const QByteArray newsMessage = R"(<?xml version="1.0" encoding="UTF-8"?>
<newsMessage xmlns="http://iptc.org/std/nar/2006-10-01/">
  <header>
    <sent>2025-06-11T10:00:00Z</sent>
    <sender>baywire.example</sender>
  </header>
  <itemSet>
    <newsItem guid="urn:newsml:baywire.example:20250611:quay" version="1" standard="NewsML-G2"
        standardversion="2.29">
      <itemMeta><itemClass qcode="ninat:text"/><provider literal="BWS"/>
        <versionCreated>2025-06-11T09:00:00Z</versionCreated></itemMeta>
      <contentMeta><headline>Quay wall repairs</headline></contentMeta>
      <contentSet><inlineData contenttype="text/plain">Work began at dawn.

It will take a year.</inlineData></contentSet>
    </newsItem>
    <newsItem guid="urn:newsml:baywire.example:20250611:market" version="2" standard="NewsML-G2"
        standardversion="2.29">
      <itemMeta><itemClass qcode="ninat:text"/><provider qcode="nprov:BWS"/>
        <versionCreated>2025-06-11T09:30:00Z</versionCreated></itemMeta>
      <contentMeta><headline>Fish market moves</headline></contentMeta>
      <contentSet><inlineXML contenttype="application/xhtml+xml">
        <html xmlns="http://www.w3.org/1999/xhtml"><head><title>x</title></head>
          <body><h1>Fish market</h1><p>The market moves to the east quay.</p></body></html>
      </inlineXML></contentSet>
    </newsItem>
  </itemSet>
</newsMessage>
)";

QJsonObject subject(const char *code, const char *name = nullptr)
{
    QJsonObject object {{QStringLiteral("code"), QString::fromUtf8(code)}};
    if (name)
        object.insert(QStringLiteral("name"), QString::fromUtf8(name));
    return object;
}

} // namespace

TEST_CASE("NITF: headline byline dateline body subjects and provider", "[io][news]")
{
    const auto result = readBytes(QStringLiteral("story.nitf"), nitfStory);
    REQUIRE(result.has_value());
    REQUIRE(result->size() == 1);
    const ImportedArticle &a = result->front();
    CHECK(a.externalId == QStringLiteral("BWS-2025-0611-017"));
    CHECK(a.title == QStringLiteral("Council backs ferry timetable"));
    // body.content by the HTML rules: each p its own paragraph, the hl2 between them one too,
    // whitespace collapsed, entities decoded.
    CHECK(a.text
        == QStringLiteral("Ellisford's council voted 9 to 4 on Tuesday to keep the winter "
                          "sailings.\n\nFares\n\nFares stay as they are & season tickets "
                          "return.\n\n\"We listened,\" the harbour master said."));
    CHECK(a.published == QStringLiteral("20250611T083000Z"));
    CHECK(a.outlet == QStringLiteral("Ellisford Evening Post"));
    CHECK(a.language == QStringLiteral("en-GB"));
    CHECK(a.sourceLine == 2);
    CHECK(a.meta.value(QStringLiteral("byline")).toString()
        == QStringLiteral("By Dana Holloway, Transport Reporter"));
    CHECK(a.meta.value(QStringLiteral("dateline")).toString()
        == QStringLiteral("ELLISFORD, June 11"));
    CHECK(
        a.meta.value(QStringLiteral("provider")).toString() == QStringLiteral("Bay Wire Service"));
    CHECK(a.meta.value(QStringLiteral("abstract")).toString()
        == QStringLiteral("The timetable keeps winter sailings."));
    CHECK(a.meta.value(QStringLiteral("subjects")).toArray()
        == QJsonArray {subject("11006000", "government"), subject("04015000", "transport")});
    CHECK(a.meta.value(QStringLiteral("keywords")).toArray()
        == QJsonArray {QStringLiteral("ferry"), QStringLiteral("timetable")});
}

TEST_CASE("NewsML-G2: a newsItem with NITF inline", "[io][news]")
{
    const auto result = readBytes(QStringLiteral("story.newsml"), newsItem);
    REQUIRE(result.has_value());
    REQUIRE(result->size() == 1);
    const ImportedArticle &a = result->front();
    CHECK(a.externalId == QStringLiteral("urn:newsml:baywire.example:20250611:ferry-timetable"));
    CHECK(a.title == QStringLiteral("Council backs ferry timetable"));
    // The first rendition of the contentSet is read, not both.
    CHECK(
        a.text == QStringLiteral("Ellisford's council voted on Tuesday.\n\nWinter sailings stay."));
    CHECK(a.published == QStringLiteral("2025-06-11T08:00:00Z"));
    CHECK(a.language == QStringLiteral("en-GB"));
    CHECK(a.outlet.isEmpty());
    // An element's line is where its start tag ends (libxml2 records it there): the newsItem's
    // tag runs from line 2 to line 4.
    CHECK(a.sourceLine == 4);
    CHECK(
        a.meta.value(QStringLiteral("provider")).toString() == QStringLiteral("Bay Wire Service"));
    CHECK(a.meta.value(QStringLiteral("byline")).toString() == QStringLiteral("By Dana Holloway"));
    CHECK(a.meta.value(QStringLiteral("dateline")).toString()
        == QStringLiteral("ELLISFORD, June 11"));
    CHECK(a.meta.value(QStringLiteral("slugline")).toString() == QStringLiteral("FERRY-TIMETABLE"));
    CHECK(a.meta.value(QStringLiteral("version")).toString() == QStringLiteral("3"));
    CHECK(a.meta.value(QStringLiteral("subjects")).toArray()
        == QJsonArray {subject("medtop:11000000", "politics"), subject("medtop:20000000")});
}

TEST_CASE("NewsML-G2: a newsMessage gives one article per newsItem", "[io][news]")
{
    const auto result = readBytes(QStringLiteral("batch.newsml"), newsMessage);
    REQUIRE(result.has_value());
    REQUIRE(result->size() == 2);
    const ImportedArticle &quay = result->at(0);
    CHECK(quay.externalId == QStringLiteral("urn:newsml:baywire.example:20250611:quay"));
    CHECK(quay.title == QStringLiteral("Quay wall repairs"));
    CHECK(quay.text == QStringLiteral("Work began at dawn.\n\nIt will take a year."));
    // No contentCreated or firstCreated: versionCreated.
    CHECK(quay.published == QStringLiteral("2025-06-11T09:00:00Z"));
    CHECK(quay.meta.value(QStringLiteral("provider")).toString() == QStringLiteral("BWS"));
    CHECK(quay.sourceLine == 9); // its start tag runs over lines 8 and 9

    const ImportedArticle &market = result->at(1);
    CHECK(market.title == QStringLiteral("Fish market moves"));
    // XHTML inline: the body by the HTML rules (the head's title is not body text).
    CHECK(market.text == QStringLiteral("Fish market\n\nThe market moves to the east quay."));
    CHECK(market.meta.value(QStringLiteral("provider")).toString() == QStringLiteral("nprov:BWS"));
    CHECK(market.sourceLine == 18); // lines 17 and 18
}

TEST_CASE("News XML: broken news items are refused naming file and line", "[io][news]")
{
    const BadInput cases[] = {
        {"a NITF document without body.content",
            "<nitf>\n<head><title>T</title></head>\n<body><body.head/></body>\n</nitf>\n",
            ErrorCode::InvalidInput, 1, 0, "the NITF document has no <body.content>"},
        {"a newsItem without guid",
            "<newsItem "
            "xmlns=\"http://iptc.org/std/nar/2006-10-01/\">\n<contentSet/>\n</newsItem>\n",
            ErrorCode::InvalidInput, 1, 0, "the newsItem has no guid"},
        {"a newsItem whose content is remote",
            "<newsItem xmlns=\"http://iptc.org/std/nar/2006-10-01/\" guid=\"g\">\n<contentSet>\n"
            "<remoteContent href=\"http://example.org/a.txt\"/>\n</contentSet>\n</newsItem>\n",
            ErrorCode::InvalidInput, 2, 0, "holds no text inline"},
        {"inline data that is not plain text",
            "<newsItem xmlns=\"http://iptc.org/std/nar/2006-10-01/\" guid=\"g\">\n<contentSet>\n"
            "<inlineData "
            "contenttype=\"image/jpeg\">/9j/</inlineData>\n</contentSet>\n</newsItem>\n",
            ErrorCode::InvalidInput, 3, 0, "<inlineData> of type \"image/jpeg\" cannot be read"},
        {"a newsMessage holding a packageItem",
            "<newsMessage xmlns=\"http://iptc.org/std/nar/2006-10-01/\">\n<itemSet>\n"
            "<packageItem guid=\"p\"/>\n</itemSet>\n</newsMessage>\n",
            ErrorCode::InvalidInput, 3, 0,
            "holds a <packageItem>; Fourfold imports newsItems only"},
        {"a newsMessage without items",
            "<newsMessage xmlns=\"http://iptc.org/std/nar/2006-10-01/\">\n<itemSet>\n</itemSet>\n"
            "</newsMessage>\n",
            ErrorCode::InvalidInput, 2, 0, "holds no newsItem"},
        {"a forced news format on a feed", "<rss version=\"2.0\">\n<channel/>\n</rss>\n",
            ErrorCode::Unsupported, 1, 0, "the root element <rss> is not a news item's"},
    };
    for (const BadInput &input : cases) {
        checkBadInput(QStringLiteral("broken.nitf"), input);
    }
}
