// OpenDocument text documents (OASIS ODF 1.2) through readArticles. The document is made in the
// test by Debian's python3-odf (odfpy 1.4.2), which writes the package of part 3 (a stored
// mimetype entry first, META-INF/manifest.xml, content.xml, styles.xml, meta.xml) and the
// elements of part 1 the script asks for: text:p and text:h (§5.1), text:s, text:tab,
// text:line-break and text:span (§6.1, §6.6), text:note (§6.3), office:annotation (§14.1),
// text:list (§5.3), table:table (§9.1) and meta.xml's Dublin Core and meta: elements (§4.3);
// section numbers from memory. Malformed packages are built entry by entry with libzip.

#include "core/io/article_reader.h"
#include "tests/io/document_maker.h"
#include "tests/io/reader_test_support.h"

using namespace fourfold;
using namespace fourfold::test;

namespace {

const char *const reportScript = R"PY(
import sys
from odf.opendocument import OpenDocumentText
from odf.style import Style
from odf.text import P, H, Span, Note, NoteCitation, NoteBody, LineBreak, S, Tab, List, ListItem
from odf.table import Table, TableColumn, TableRow, TableCell
from odf.office import Annotation
from odf import meta, dc
doc = OpenDocumentText()
doc.styles.addElement(Style(name='Title', family='paragraph'))
headline = Style(name='P1', family='paragraph', parentstylename='Title')
doc.automaticstyles.addElement(headline)
doc.meta.addElement(meta.InitialCreator(text='Ada Quill'))
doc.meta.addElement(dc.Creator(text='Ben Arlow'))
doc.meta.addElement(meta.CreationDate(text='2025-06-03T09:30:00'))
doc.meta.addElement(dc.Language(text='en-GB'))
doc.meta.addElement(meta.Keyword(text='ferries'))
doc.meta.addElement(meta.Keyword(text='fares'))
doc.text.addElement(P(stylename=headline, text='Harbour board raises ferry fares'))
doc.text.addElement(P(text='The harbour board voted on Monday to raise fares by a tenth.'))
doc.text.addElement(H(outlinelevel=2, text='Reaction'))
p = P()
p.addText('Commuters said')
p.addElement(S(c=3))
p.addText('the\trise\n')
p.addElement(Span(text='was steep'))
p.addText('.')
note = Note(id='ftn1', noteclass='footnote')
note.addElement(NoteCitation(text='1'))
body = NoteBody()
body.addElement(P(text='Harbour board minutes, 12 May 2019.'))
note.addElement(body)
p.addElement(note)
comment = Annotation()
comment.addElement(P(text='Check this figure'))
p.addElement(comment)
p.addElement(LineBreak())
p.addText('A second line.')
doc.text.addElement(p)
points = List()
for text in ('Fares rise in spring.', 'Passes stay the same.'):
    item = ListItem()
    item.addElement(P(text=text))
    points.addElement(item)
doc.text.addElement(points)
table = Table(name='Fares')
table.addElement(TableColumn(numbercolumnsrepeated=2))
for row in (('Route', 'Fare'), ('Ellisford\u2013Bay', '\u00a34.40')):
    tr = TableRow()
    for cell in row:
        tc = TableCell()
        tc.addElement(P(text=cell))
        tr.addElement(tc)
    table.addElement(tr)
doc.text.addElement(table)
doc.text.addElement(P(text=''))
doc.save(sys.argv[1])
)PY";

QByteArray contentXml(const QByteArray &text)
{
    return "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n<office:document-content "
           "xmlns:office=\"urn:oasis:names:tc:opendocument:xmlns:office:1.0\" "
           "xmlns:text=\"urn:oasis:names:tc:opendocument:xmlns:text:1.0\">\n<office:body>"
           "<office:text>"
        + text + "</office:text></office:body></office:document-content>";
}

ZipEntry mimetype(const QByteArray &type = "application/vnd.oasis.opendocument.text")
{
    return {QStringLiteral("mimetype"), type, false, true};
}

} // namespace

TEST_CASE("ODT: paragraphs headings lists tables notes and meta.xml", "[io][odt]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString path = makeWithPython(dir, QStringLiteral("ferry-fares.odt"), reportScript);
    const auto result = readArticles(path, {});
    REQUIRE(result.has_value());
    REQUIRE(result->size() == 1);
    const ImportedArticle &article = result->front();
    CHECK(article.externalId == QStringLiteral("ferry-fares"));
    // No dc:title: the paragraph whose style is based on the Title style is the title, and is
    // not repeated in the text.
    CHECK(article.title == QStringLiteral("Harbour board raises ferry fares"));
    // White space collapsed (part 1 §6.1.2: tab and line end are spaces, text:s a space), the
    // span read through, the note's marker where it stands and its body at the end, the
    // annotation (a comment) left out, text:line-break kept; list items and table cells as
    // paragraphs; the empty paragraph left out.
    CHECK(article.text
        == QStringLiteral("The harbour board voted on Monday to raise fares by a tenth.\n\n"
                          "Reaction\n\n"
                          "Commuters said the rise was steep.[1]\nA second line.\n\n"
                          "Fares rise in spring.\n\nPasses stay the same.\n\n"
                          "Route\n\nFare\n\nEllisford\u2013Bay\n\n\u00a34.40\n\n"
                          "[1] Harbour board minutes, 12 May 2019."));
    // meta:creation-date as written; meta:initial-creator is the author (dc:creator is who
    // changed it last, part 1 §4.3.2); the keywords joined.
    CHECK(article.published == QStringLiteral("2025-06-03T09:30:00"));
    CHECK(article.language == QStringLiteral("en-GB"));
    CHECK(article.meta.value(QStringLiteral("author")).toString() == QStringLiteral("Ada Quill"));
    CHECK(article.meta.value(QStringLiteral("keywords")).toString()
        == QStringLiteral("ferries, fares"));
    CHECK_FALSE(article.text.contains(QStringLiteral("Check this figure")));
    CHECK(article.sourceLine == 1);
}

TEST_CASE("ODT: the title from meta.xml and else the first heading", "[io][odt]")
{
    const QByteArray meta =
        "<office:document-meta xmlns:office=\"urn:oasis:names:tc:opendocument:xmlns:office:1.0\" "
        "xmlns:dc=\"http://purl.org/dc/elements/1.1/\"><office:meta><dc:title>Quay wall</dc:title>"
        "</office:meta></office:document-meta>";
    const QByteArray content = contentXml(
        "<text:h text:outline-level=\"1\">Repairs begin</text:h><text:p>Work began.</text:p>");
    const auto titled = readBytes(QStringLiteral("quay.odt"),
        zipOf({mimetype(), {QStringLiteral("content.xml"), content},
            {QStringLiteral("meta.xml"), meta}}));
    REQUIRE(titled.has_value());
    CHECK(titled->front().title == QStringLiteral("Quay wall"));
    CHECK(titled->front().text == QStringLiteral("Repairs begin\n\nWork began."));
    const auto untitled = readBytes(
        QStringLiteral("quay.odt"), zipOf({mimetype(), {QStringLiteral("content.xml"), content}}));
    REQUIRE(untitled.has_value());
    CHECK(untitled->front().title == QStringLiteral("Repairs begin"));
    CHECK(untitled->front().text == QStringLiteral("Work began."));
}

TEST_CASE("ODT: broken packages and documents are refused naming the file", "[io][odt]")
{
    const QByteArray text = contentXml("<text:p>Text of the article.</text:p>");
    const QByteArray manifest =
        "<manifest:manifest xmlns:manifest=\"urn:oasis:names:tc:opendocument:xmlns:manifest:1.0\">"
        "<manifest:file-entry manifest:full-path=\"content.xml\" manifest:media-type=\"text/xml\">"
        "<manifest:encryption-data manifest:checksum-type=\"SHA1/1K\" manifest:checksum=\"AA==\"/>"
        "</manifest:file-entry></manifest:manifest>";
    ImportOptions small;
    small.zipLimits = {qint64(1) << 20, qint64(4) << 20};
    const BadInput cases[] = {
        {"not a zip archive", "<office:document/>", ErrorCode::InvalidInput, 0, 0,
            "the file is not a readable zip archive"},
        {"a spreadsheet named .odt",
            zipOf({mimetype("application/vnd.oasis.opendocument.spreadsheet"),
                {QStringLiteral("content.xml"), text}}),
            ErrorCode::InvalidInput, 0, 0,
            "the package is of the type \"application/vnd.oasis.opendocument.spreadsheet\""},
        {"no content.xml", zipOf({mimetype()}), ErrorCode::InvalidInput, 0, 0,
            "the archive holds no content.xml"},
        // ODF 1.2 part 3 §4.4 (from memory): an encrypted document keeps its package readable
        // and says in the manifest which entries are encrypted.
        {"an encrypted document",
            zipOf({mimetype(), {QStringLiteral("META-INF/manifest.xml"), manifest},
                {QStringLiteral("content.xml"), QByteArray("\x8f\x01\xfe", 3)}}),
            ErrorCode::InvalidInput, 0, 0, "the document is encrypted"},
        {"an encrypted entry", zipOf({mimetype(), {QStringLiteral("content.xml"), text, true}}),
            ErrorCode::InvalidInput, 0, 0, "the entry content.xml of the archive is encrypted"},
        {"content.xml not well-formed",
            zipOf({mimetype(), {QStringLiteral("content.xml"), "<a>\n<b>\n</a>"}}),
            ErrorCode::InvalidInput, 0, 0, "content.xml, line 3: the file is not well-formed"},
        {"a drawing's content",
            zipOf({mimetype(),
                {QStringLiteral("content.xml"),
                    "<office:document-content "
                    "xmlns:office=\"urn:oasis:names:tc:opendocument:xmlns:office:1.0\"><office:"
                    "body>"
                    "<office:drawing/></office:body></office:document-content>"}}),
            ErrorCode::InvalidInput, 0, 0, "it is not a text document"},
        {"a document without text",
            zipOf({mimetype(), {QStringLiteral("content.xml"), contentXml("<text:p> </text:p>")}}),
            ErrorCode::InvalidInput, 0, 0, "the document holds no text"},
    };
    for (const BadInput &input : cases)
        checkBadInput(QStringLiteral("broken.odt"), input);

    const BadInput bomb {"an entry that unpacks beyond the limit",
        zipOf({mimetype(),
            {QStringLiteral("content.xml"),
                contentXml("<text:p>" + QByteArray(3 << 20, 'z') + "</text:p>")}}),
        ErrorCode::InvalidInput, 0, 0, "the entry content.xml unpacks to more than 1 MiB"};
    checkBadInput(QStringLiteral("bomb.odt"), bomb, small);
}
