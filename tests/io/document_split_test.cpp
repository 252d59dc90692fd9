// Many articles in one document (ImportOptions::splitOn, core/io/document_split.h): plain text,
// and DOCX, ODT and PDF files made by python3-docx, odfpy and reportlab, cut at matching lines;
// title, outlet and date from the pattern's named groups or the first line of each part; bad
// patterns and patterns that match nothing are errors naming the file.

#include "core/io/article_reader.h"
#include "tests/io/document_maker.h"
#include "tests/support/test_support.h"

#include <QTemporaryDir>

using namespace fourfold;
using namespace fourfold::test;

namespace {

ImportOptions splitOn(const QString &pattern)
{
    ImportOptions options;
    options.splitOn = pattern;
    return options;
}

// Three articles as an archive's export lists them: a numbered heading line with outlet and
// date, then the headline, then the body.
const char *const kDocxScript = R"(
import sys, docx
d = docx.Document()
d.core_properties.title = 'Archive export'
for n, (outlet, date, head, body) in enumerate([
        ('Harbour Courier', '2024-03-01', 'Ferry fares rise', 'The ferry company raises its fares in spring.'),
        ('Dyke Weekly', '2024-03-02', 'Council plans dyke', 'The council presented plans for a new dyke.'),
        ('Harbour Courier', '2024-03-05', 'Market square reopens', 'Traders return to the market square.')], 1):
    d.add_paragraph('Item %d | %s | %s' % (n, outlet, date))
    d.add_paragraph(head)
    d.add_paragraph(body)
    d.add_paragraph('A second paragraph of item %d.' % n)
d.save(sys.argv[1])
)";

const char *const kOdtScript = R"(
import sys
from odf.opendocument import OpenDocumentText
from odf.text import P
d = OpenDocumentText()
for line in ['Item 1 | Harbour Courier | 2024-03-01', 'Ferry fares rise',
             'The ferry company raises its fares in spring.',
             'Item 2 | Dyke Weekly | 2024-03-02', 'Council plans dyke',
             'The council presented plans for a new dyke.']:
    d.text.addElement(P(text=line))
d.save(sys.argv[1])
)";

const char *const kPdfScript = R"(
import sys
from reportlab.lib.pagesizes import A4
from reportlab.pdfgen import canvas
c = canvas.Canvas(sys.argv[1], pagesize=A4)
y = 780
for line in ['=====', '', 'Ferry fares rise', '', 'The ferry company raises its fares in spring.',
             '', '=====', '', 'Council plans dyke', '', 'The council presented plans for a new dyke.']:
    if line:
        c.drawString(72, y, line)
    y -= 30
c.save()
)";

const QString kItemPattern =
    QStringLiteral("^Item \\d+ \\| (?<outlet>[^|]+) \\| (?<date>\\d{4}-\\d{2}-\\d{2})$");

} // namespace

TEST_CASE("A text file is cut at lines of equals signs with the first line of each part as title",
    "[io][split]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString path = writeFile(dir, QStringLiteral("bundle.txt"),
        "=====\nFerry fares rise\n\nThe ferry company raises its fares.\n\nFares go up in "
        "May.\n=====\nCouncil plans dyke\n\nThe council presented plans.\n");
    auto articles = readArticles(path, splitOn(QStringLiteral("^=+$")));
    REQUIRE(articles);
    REQUIRE(articles->size() == 2);
    const ImportedArticle &a = (*articles)[0];
    CHECK(a.externalId == QStringLiteral("bundle#1"));
    CHECK(a.title == QStringLiteral("Ferry fares rise"));
    CHECK(a.text == QStringLiteral("The ferry company raises its fares.\n\nFares go up in May."));
    CHECK(a.meta.value(QStringLiteral("part")).toInteger() == 1);
    CHECK(a.sourceLine == 1);
    const ImportedArticle &b = (*articles)[1];
    CHECK(b.externalId == QStringLiteral("bundle#2"));
    CHECK(b.title == QStringLiteral("Council plans dyke"));
    CHECK(b.text == QStringLiteral("The council presented plans."));
    CHECK(b.sourceLine == 7);
}

TEST_CASE("A DOCX export is cut at numbered item lines with outlet and date from named groups",
    "[io][split][docx]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString path = makeWithPython(dir, QStringLiteral("export.docx"), kDocxScript);
    auto articles = readArticles(path, splitOn(kItemPattern));
    REQUIRE(articles);
    REQUIRE(articles->size() == 3);
    CHECK((*articles)[0].externalId == QStringLiteral("export#1"));
    CHECK((*articles)[0].outlet == QStringLiteral("Harbour Courier"));
    CHECK((*articles)[0].published == QStringLiteral("2024-03-01"));
    CHECK((*articles)[0].title == QStringLiteral("Ferry fares rise"));
    CHECK((*articles)[0].text
        == QStringLiteral(
            "The ferry company raises its fares in spring.\n\nA second paragraph of item 1."));
    CHECK((*articles)[1].outlet == QStringLiteral("Dyke Weekly"));
    CHECK((*articles)[1].title == QStringLiteral("Council plans dyke"));
    CHECK((*articles)[2].published == QStringLiteral("2024-03-05"));
    CHECK((*articles)[2].text
        == QStringLiteral("Traders return to the market square.\n\nA second paragraph of item 3."));
    // The document's title (dc:title) is not in its text: it is no part.
    for (const ImportedArticle &a : *articles)
        CHECK_FALSE(a.text.contains(QStringLiteral("Archive export")));

    // The title from a group: the headline is then the first line of the text.
    auto titled = readArticles(path, splitOn(QStringLiteral("^Item (?<title>\\d+) \\|")));
    REQUIRE(titled);
    REQUIRE(titled->size() == 3);
    CHECK((*titled)[1].title == QStringLiteral("2"));
    CHECK((*titled)[1].text.startsWith(QStringLiteral("Council plans dyke\n\n")));
}

TEST_CASE("ODT and PDF documents are cut the same way", "[io][split][odt][pdf]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString odt = makeWithPython(dir, QStringLiteral("export.odt"), kOdtScript);
    auto fromOdt = readArticles(odt, splitOn(kItemPattern));
    REQUIRE(fromOdt);
    REQUIRE(fromOdt->size() == 2);
    CHECK((*fromOdt)[1].outlet == QStringLiteral("Dyke Weekly"));
    CHECK((*fromOdt)[1].title == QStringLiteral("Council plans dyke"));
    CHECK((*fromOdt)[1].text == QStringLiteral("The council presented plans for a new dyke."));

    const QString pdf = makeWithPython(dir, QStringLiteral("export.pdf"), kPdfScript);
    auto fromPdf = readArticles(pdf, splitOn(QStringLiteral("^=+$")));
    REQUIRE(fromPdf);
    REQUIRE(fromPdf->size() == 2);
    CHECK((*fromPdf)[0].title == QStringLiteral("Ferry fares rise"));
    CHECK((*fromPdf)[0].text == QStringLiteral("The ferry company raises its fares in spring."));
    CHECK((*fromPdf)[1].externalId == QStringLiteral("export#2"));
    CHECK((*fromPdf)[1].title == QStringLiteral("Council plans dyke"));
}

TEST_CASE("Bad split patterns and documents they cannot cut are refused", "[io][split]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString text = writeFile(
        dir, QStringLiteral("one.txt"), "Headline\n\nBody text.\n\n-----\nSecond\n\nMore text.\n");

    auto invalid = readArticles(text, splitOn(QStringLiteral("^(=+$")));
    REQUIRE_FALSE(invalid);
    CHECK(invalid.error().code == ErrorCode::InvalidArgument);
    CHECK(invalid.error().message.contains(QStringLiteral("not a valid regular expression")));
    CHECK(invalid.error().message.contains(QStringLiteral("one.txt")));

    auto otherGroup = readArticles(text, splitOn(QStringLiteral("^(?<headline>-+)$")));
    REQUIRE_FALSE(otherGroup);
    CHECK(otherGroup.error().message.contains(QStringLiteral("\"headline\"")));

    auto noMatch = readArticles(text, splitOn(QStringLiteral("^#+$")));
    REQUIRE_FALSE(noMatch);
    CHECK(noMatch.error().message.contains(QStringLiteral("matches no line")));

    // A part with a title and nothing else: its line is named.
    const QString empty = writeFile(
        dir, QStringLiteral("empty.txt"), "-----\nFirst\n\nBody.\n\n-----\nOnly a title\n");
    auto titleOnly = readArticles(empty, splitOn(QStringLiteral("^-+$")));
    REQUIRE_FALSE(titleOnly);
    CHECK(titleOnly.error().message.contains(QStringLiteral("part 2")));
    CHECK(titleOnly.error().line == 6);

    // A format that is not text-like.
    const QString jsonl = writeFile(
        dir, QStringLiteral("a.jsonl"), "{\"id\": \"a\", \"title\": \"A\", \"text\": \"x\"}\n");
    auto notText = readArticles(jsonl, splitOn(QStringLiteral("^-+$")));
    REQUIRE_FALSE(notText);
    CHECK(notText.error().code == ErrorCode::Unsupported);

    // The text before the first match, when it is more than a heading, is a part of its own.
    auto withLead = readArticles(text, splitOn(QStringLiteral("^-+$")));
    REQUIRE(withLead);
    REQUIRE(withLead->size() == 2);
    CHECK((*withLead)[0].title == QStringLiteral("Headline"));
    CHECK((*withLead)[0].text == QStringLiteral("Body text."));
    CHECK((*withLead)[1].title == QStringLiteral("Second"));
}
