// HTML reading through readArticles. Character references are those of the HTML Standard
// (named references such as &eacute; = U+00E9; numeric &#x1F600; = U+1F600); whitespace
// collapsing follows CSS 'white-space: normal' on ASCII whitespace; the <header> rule is the
// HTML-AAM mapping of header to the banner role; og:* and article:* meta tags are the Open
// Graph protocol (ogp.me).

#include "core/io/article_reader.h"
#include "tests/io/reader_test_support.h"

using namespace fourfold;
using namespace fourfold::test;

namespace {

// Text that must never reach the body: every marker sits in an element that is dropped.
const char *const droppedMarkers[] = {
    "SCRIPT-TEXT",
    "INLINE-SCRIPT",
    "STYLE-TEXT",
    "NOSCRIPT-TEXT",
    "TEMPLATE-TEXT",
    "SVG-TEXT",
    "FORM-TEXT",
    "ASIDE-TEXT",
    "IFRAME-TEXT",
    "HIDDEN-TEXT",
    "ARIA-HIDDEN",
    "FOOTER-TEXT",
    "PAGE-FOOTER",
    "SITE-BANNER",
    "NAV-TEXT",
    "BUTTON-TEXT",
    "COMMENT-TEXT",
};

} // namespace

TEST_CASE("HTML: a news page keeps its text and drops scripts and page furniture", "[io][html]")
{
    // The page declares windows-1252 but is UTF-8: the declaration must be ignored.
    const QByteArray page = R"(<!DOCTYPE html>
<html lang="en-GB">
<head>
<meta charset="windows-1252">
<title>Harbour plan splits council | Riverton Ledger</title>
<meta property="og:site_name" content="Riverton Ledger">
<meta property="og:title" content="Harbour plan splits council">
<meta property="article:published_time" content="2024-03-05T08:00:00Z">
<style>p { content: "STYLE-TEXT" }</style>
<script>var secret = "SCRIPT-TEXT <p>not a paragraph</p>";</script>
</head>
<body>
<header><nav><a href="/">NAV-TEXT</a></nav><p>SITE-BANNER</p></header>
<article>
<header><h1>Harbour  plan splits
  council</h1><p class="standfirst">A   standfirst with &amp; &eacute; &#x1F600; &#233; &lt;tag&gt; &quot;q&quot;</p></header>
<!-- COMMENT-TEXT -->
<p>First   paragraph
 spans lines with <b>bold</b>, <a href="#">a link</a> and café.</p>
<script>document.write("INLINE-SCRIPT")</script>
<h2>Background</h2>
<p>Line one<br>Line two<br><br>New paragraph after two breaks.</p>
<ul><li>Item one</li><li>Item <em>two</em></li></ul>
<blockquote>A quote.</blockquote>
<pre>code  line 1
code line 2</pre>
<table><tr><th>Head</th><td>Cell A</td><td>Cell B</td></tr></table>
<div>Div text <span>inline</span><div>Nested div</div>tail</div>
<noscript>NOSCRIPT-TEXT</noscript>
<template><p>TEMPLATE-TEXT</p></template>
<svg><title>SVG-TITLE</title><text>SVG-TEXT</text></svg>
<form><label>FORM-TEXT</label><input><button>BUTTON-TEXT</button></form>
<aside>ASIDE-TEXT</aside>
<iframe src="x">IFRAME-TEXT</iframe>
<p hidden>HIDDEN-TEXT</p>
<p aria-hidden="true">ARIA-HIDDEN</p>
<footer>FOOTER-TEXT</footer>
</article>
<footer>PAGE-FOOTER</footer>
</body></html>
)";
    ImportOptions options;
    options.language = QStringLiteral("de"); // not used: the page names its language
    const auto result = readBytes(QStringLiteral("harbour-plan.html"), page, options);
    REQUIRE(result.has_value());
    REQUIRE(result->size() == 1);
    const ImportedArticle &a = result->front();

    CHECK(a.externalId == QStringLiteral("harbour-plan"));
    CHECK(a.title == QStringLiteral("Harbour plan splits council")); // og:title
    CHECK(a.outlet == QStringLiteral("Riverton Ledger"));
    CHECK(a.published == QStringLiteral("2024-03-05T08:00:00Z"));
    CHECK(a.language == QStringLiteral("en-GB"));
    CHECK(a.sourceLine == 1);
    // The h1 equals the title and is left out; every block is one paragraph.
    const QString expected =
        QStringLiteral(u"A standfirst with & \u00E9 \U0001F600 \u00E9 <tag> \"q\"\n\n"
                       u"First paragraph spans lines with bold, a link and caf\u00E9.\n\n"
                       u"Background\n\n"
                       u"Line one\nLine two\n\n"
                       u"New paragraph after two breaks.\n\n"
                       u"Item one\n\n"
                       u"Item two\n\n"
                       u"A quote.\n\n"
                       u"code line 1\ncode line 2\n\n"
                       u"Head\n\nCell A\n\nCell B\n\n"
                       u"Div text inline\n\nNested div\n\ntail");
    CHECK(a.text == expected);
    for (const char *marker : droppedMarkers) {
        INFO("marker: " << marker);
        CHECK_FALSE(a.text.contains(QLatin1StringView(marker)));
    }
}

TEST_CASE("HTML: title, date and language fall back in order", "[io][html]")
{
    ImportOptions options;
    options.language = QStringLiteral("fr");

    SECTION("<title> when there is no og:title; an h1 that differs stays in the body")
    {
        const auto result = readBytes(QStringLiteral("p.html"),
            "<html><head><title> Quiet\n streets </title></head>"
            "<body><h1>Quiet streets at night</h1><p>Body.</p></body></html>",
            options);
        REQUIRE(result.has_value());
        CHECK(result->front().title == QStringLiteral("Quiet streets"));
        CHECK(result->front().text == QStringLiteral("Quiet streets at night\n\nBody."));
        CHECK(result->front().language == QStringLiteral("fr")); // no lang attribute
        CHECK(result->front().outlet.isEmpty());
        CHECK(result->front().published.isEmpty());
    }
    SECTION("the first h1 when there is no title; it is not repeated in the body")
    {
        const auto result = readBytes(QStringLiteral("p.html"),
            "<body><h1>Quiet <i>streets</i></h1><p>Text <time datetime=\"2023-11-02\">2 Nov"
            "</time>.</p><h1>Second</h1></body>",
            options);
        REQUIRE(result.has_value());
        CHECK(result->front().title == QStringLiteral("Quiet streets"));
        CHECK(result->front().text == QStringLiteral("Text 2 Nov.\n\nSecond"));
        CHECK(result->front().published == QStringLiteral("2023-11-02"));
    }
    SECTION("the file name when the page has neither")
    {
        const auto result = readBytes(QStringLiteral("story-3.htm"), "<p>Only text.</p>", options);
        REQUIRE(result.has_value());
        CHECK(result->front().title == QStringLiteral("story-3"));
        CHECK(result->front().externalId == QStringLiteral("story-3"));
        CHECK(result->front().text == QStringLiteral("Only text."));
    }
}

TEST_CASE("HTML: broken markup is read the way the parser repairs it", "[io][html]")
{
    SECTION("unclosed paragraphs")
    {
        const auto result =
            readBytes(QStringLiteral("broken.html"), "<p>One<p>Two<div>Three &nope; &amp;");
        REQUIRE(result.has_value());
        CHECK(result->front().text == QStringLiteral("One\n\nTwo\n\nThree &nope; &"));
    }
    SECTION("nesting deeper than libxml2's default limit of 256 is read in full")
    {
        QByteArray deep;
        for (int i = 0; i < 20000; ++i)
            deep += "<div><span>";
        deep += "deep text";
        const auto result = readBytes(QStringLiteral("deep.html"), deep);
        REQUIRE(result.has_value());
        CHECK(result->front().text == QStringLiteral("deep text"));
    }
}

TEST_CASE("HTML: files without text or with bad bytes are refused", "[io][html]")
{
    // clang-format off
    const BadInput cases[] = {
        {"invalid UTF-8 in a page that declares Latin-1: the hint names the declared charset",
         "<meta charset=\"iso-8859-1\">\n<p>caf\xE9</p>", ErrorCode::InvalidInput, 2, 7,
         "The page declares the character set \"iso-8859-1\""},
        {"invalid UTF-8 without a declaration", "<p>\xC0\xAF</p>", ErrorCode::InvalidInput, 1, 4,
         "invalid UTF-8"},
        {"a binary file", bytesOf("<p>\0\0</p>"), ErrorCode::InvalidInput, 1, 4, "binary"},
        {"only a script", "<script>SCRIPT-TEXT</script>", ErrorCode::InvalidInput, 0, 0,
         "holds no text"},
        {"only navigation and whitespace", "<nav>NAV-TEXT</nav> \n <p>&nbsp;</p>",
         ErrorCode::InvalidInput, 0, 0, "holds no text"},
        {"empty file", "", ErrorCode::InvalidInput, 0, 0, "contains no articles"},
        {"whitespace only", "  \n\t", ErrorCode::InvalidInput, 0, 0, "contains no articles"},
    };
    // clang-format on
    for (const BadInput &input : cases)
        checkBadInput(QStringLiteral("bad.html"), input);
}

TEST_CASE("Issue 20 item 11: elements hidden by display none or the hidden attribute are left out",
    "[io][html]")
{
    // display: none in the style attribute (CSS 2.1 §9.2.4: the element and its descendants
    // generate no box), with the cascade's order of declarations and !important (CSS Cascade 4
    // §6.4); the hidden attribute (HTML Standard, "The hidden attribute").
    const QByteArray page = R"(<html><body>
<p>Visible one.</p>
<p style="display:none">NONE-PLAIN</p>
<div style="color: red; DISPLAY : None ">NONE-SPACED <p>NONE-CHILD</p></div>
<p style="display: none !important; display: block">NONE-IMPORTANT</p>
<p style="display: /* a comment */ none">NONE-COMMENTED</p>
<p style="display: none; display: block">Shown again.</p>
<p style="visibility: hidden-not; display: inline">Inline shown.</p>
<div>Before <div style="display:none">NONE-INSIDE</div>after.</div>
<section hidden><p>HIDDEN-SECTION</p></section>
<p>Words <span hidden="until-found">HIDDEN-SPAN</span>around <b HIDDEN>HIDDEN-UPPER</b>it.</p>
</body></html>
)";
    const auto result = readBytes(QStringLiteral("hidden.html"), page);
    REQUIRE(result.has_value());
    // A hidden element makes no box, so it does not split the paragraph around it.
    CHECK(result->front().text
        == QStringLiteral("Visible one.\n\nShown again.\n\nInline shown.\n\nBefore after.\n\n"
                          "Words around it."));
    for (const char *marker : {"NONE-PLAIN", "NONE-SPACED", "NONE-CHILD", "NONE-IMPORTANT",
             "NONE-COMMENTED", "NONE-INSIDE", "HIDDEN-SECTION", "HIDDEN-SPAN", "HIDDEN-UPPER"}) {
        INFO("marker: " << marker);
        CHECK_FALSE(result->front().text.contains(QLatin1StringView(marker)));
    }
}

TEST_CASE("Issue 20 item 11: a DOCTYPE internal subset never reaches the text", "[io][html]")
{
    // The internal subset is the part in brackets (XML 1.0 §2.8, [28] doctypedecl); its
    // declarations hold ">" inside quoted literals and comments.
    const QByteArray page = "\xEF\xBB\xBF<?xml version=\"1.0\"?>\n<!-- a comment -->\n"
                            "<!DOCTYPE html PUBLIC \"-//W3C//DTD XHTML 1.0 Strict//EN\" "
                            "\"http://www.w3.org/TR/xhtml1/DTD/xhtml1-strict.dtd\" [\n"
                            "  <!ENTITY brand \"SUBSET-ENTITY > with ] inside\">\n"
                            "  <!ELEMENT extra ANY>\n"
                            "  <!-- SUBSET-COMMENT ] > -->\n"
                            "  <!ATTLIST p data-x CDATA 'SUBSET-ATTLIST>'>\n"
                            "]>\n"
                            "<html><body><p>Only this text.</p></body></html>\n";
    const auto result = readBytes(QStringLiteral("doctype.html"), page);
    REQUIRE(result.has_value());
    CHECK(result->front().text == QStringLiteral("Only this text."));

    // A DOCTYPE without a subset and brackets in the body are read as before.
    const auto plain = readBytes(QStringLiteral("plain.html"),
        "<!DOCTYPE html>\n<html><body><p>Text [in brackets] &gt; more.</p></body></html>");
    REQUIRE(plain.has_value());
    CHECK(plain->front().text == QStringLiteral("Text [in brackets] > more."));
}

TEST_CASE("Issue 20 item 11: a CDATA section is read as its text without the markers", "[io][html]")
{
    // A CDATA section is character data up to the first "]]>" (XML 1.0 §2.7): markup inside is
    // text, and "<![CDATA[" and "]]>" are not.
    const QByteArray page =
        "<html><body>\n"
        "<p>Before <![CDATA[inside <b>not bold</b> & \"quoted\"\nsecond line]]> after.</p>\n"
        "<!-- <![CDATA[COMMENT-CDATA]]> -->\n"
        "<script>//<![CDATA[\nvar SCRIPT_CDATA = 1 < 2;\n//]]></script>\n"
        "<p><![CDATA[]]>Empty section.</p>\n"
        "<p>Unclosed <![CDATA[runs <i>to</i> the end\n";
    const auto result = readBytes(QStringLiteral("cdata.html"), page);
    REQUIRE(result.has_value());
    CHECK(result->front().text
        == QStringLiteral("Before inside <b>not bold</b> & \"quoted\" second line after.\n\n"
                          "Empty section.\n\n"
                          "Unclosed runs <i>to</i> the end"));
    for (const char *marker : {"CDATA[", "]]>", "COMMENT-CDATA", "SCRIPT_CDATA"}) {
        INFO("marker: " << marker);
        CHECK_FALSE(result->front().text.contains(QLatin1StringView(marker)));
    }
}
