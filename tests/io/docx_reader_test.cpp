// Office Open XML word-processing documents (ISO/IEC 29500) through readArticles. The documents
// are made in the test by Debian's python3-docx (0.8.11), which writes the package as the
// standard lays it out: _rels/.rels naming word/document.xml (part 2 §9.3, the officeDocument
// relationship), docProps/core.xml (part 2 §11, Dublin Core), word/styles.xml with the built-in
// styles "Title" and "heading 1" (part 1 §17.7). python-docx writes no notes or tracked changes,
// so the script adds them to its package as part 1 describes them (§17.11 footnotes with their
// separator, §17.13.5 w:del and w:ins), from memory. Malformed archives are built entry by entry
// with libzip.

#include "core/io/article_reader.h"
#include "tests/io/document_maker.h"
#include "tests/io/reader_test_support.h"

using namespace fourfold;
using namespace fourfold::test;

namespace {

const char *const reportScript = R"PY(
import sys, datetime, zipfile, docx
d = docx.Document()
cp = d.core_properties
cp.title = 'Harbour board raises ferry fares'
cp.author = 'Ada Quill'
cp.created = datetime.datetime(2025, 6, 3, 9, 30, 0)
cp.language = 'en-GB'
cp.subject = 'Transport'
cp.keywords = 'ferries, fares'
cp.comments = 'Invented for a test'
cp.last_modified_by = 'Ben Arlow'
d.add_heading('Harbour board raises ferry fares', level=0)
d.add_paragraph('The harbour board voted on Monday to raise fares by a tenth.')
d.add_heading('Reaction', level=1)
p = d.add_paragraph('Commuters said  the rise ')
p.add_run('was steep').bold = True
p.add_run('.')
t = d.add_table(rows=2, cols=2)
t.cell(0, 0).text = 'Route'
t.cell(0, 1).text = 'Fare'
t.cell(1, 0).text = 'Ellisford\u2013Bay'
t.cell(1, 1).text = '\u00a34.40'
d.add_paragraph('')
p = d.add_paragraph('Line one')
p.add_run().add_break()
p.add_run('line two')
d.add_paragraph('Fares last rose in 2019')
d.add_paragraph('The fare is final.')
d.save(sys.argv[1])

W = 'xmlns:w="http://schemas.openxmlformats.org/wordprocessingml/2006/main"'
def patch(text, old, new):
    assert text.count(old) == 1, old
    return text.replace(old, new)
with zipfile.ZipFile(sys.argv[1]) as z:
    parts = {n: z.read(n) for n in z.namelist()}
doc = parts['word/document.xml'].decode()
doc = patch(doc, '<w:t>Fares last rose in 2019</w:t></w:r>',
    '<w:t>Fares last rose in 2019</w:t></w:r><w:r><w:footnoteReference w:id="2"/></w:r>')
doc = patch(doc, '<w:r><w:t>The fare is final.</w:t></w:r>',
    '<w:r><w:t xml:space="preserve">The fare is </w:t></w:r>'
    '<w:del w:id="90" w:author="A" w:date="2025-06-03T00:00:00Z"><w:r><w:delText>not </w:delText></w:r></w:del>'
    '<w:ins w:id="91" w:author="A" w:date="2025-06-03T00:00:00Z"><w:r><w:t xml:space="preserve">now </w:t></w:r></w:ins>'
    '<w:r><w:t>final.</w:t></w:r>')
parts['word/document.xml'] = doc.encode()
parts['word/footnotes.xml'] = ('<?xml version="1.0" encoding="UTF-8" standalone="yes"?>'
    '<w:footnotes ' + W + '>'
    '<w:footnote w:type="separator" w:id="0"><w:p><w:r><w:separator/></w:r></w:p></w:footnote>'
    '<w:footnote w:type="continuationSeparator" w:id="1"><w:p><w:r><w:continuationSeparator/></w:r></w:p></w:footnote>'
    '<w:footnote w:id="2"><w:p><w:r><w:footnoteRef/></w:r><w:r><w:t xml:space="preserve"> Harbour board minutes, 12 May 2019.</w:t></w:r></w:p></w:footnote>'
    '</w:footnotes>').encode()
rels = parts['word/_rels/document.xml.rels'].decode()
parts['word/_rels/document.xml.rels'] = patch(rels, '</Relationships>',
    '<Relationship Id="rId99" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/footnotes" Target="footnotes.xml"/></Relationships>').encode()
with zipfile.ZipFile(sys.argv[1], 'w', zipfile.ZIP_DEFLATED) as z:
    for name, data in parts.items():
        z.writestr(name, data)
)PY";

// No core title and no Title style: the first heading of level 1 is the title.
const char *const headingScript = R"PY(
import sys, docx
d = docx.Document()
d.core_properties.title = ''
d.add_heading('Quay wall repairs begin', level=1)
d.add_paragraph('Work on the old quay wall began at dawn.')
d.add_heading('Costs', level=2)
d.add_paragraph('It will cost more than planned.')
d.save(sys.argv[1])
)PY";

QByteArray documentXml(const QByteArray &body)
{
    return "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n<w:document "
           "xmlns:w=\"http://schemas.openxmlformats.org/wordprocessingml/2006/main\">\n<w:body>"
        + body + "</w:body></w:document>";
}

const QByteArray packageRels =
    "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n<Relationships "
    "xmlns=\"http://schemas.openxmlformats.org/package/2006/relationships\"><Relationship "
    "Id=\"rId1\" "
    "Type=\"http://schemas.openxmlformats.org/officeDocument/2006/relationships/officeDocument\" "
    "Target=\"word/document.xml\"/></Relationships>";

} // namespace

TEST_CASE("DOCX: paragraphs headings tables notes and core properties", "[io][docx]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString path = makeWithPython(dir, QStringLiteral("ferry-fares.docx"), reportScript);
    const auto result = readArticles(path, {});
    REQUIRE(result.has_value());
    REQUIRE(result->size() == 1);
    const ImportedArticle &article = result->front();
    CHECK(article.externalId == QStringLiteral("ferry-fares"));
    // dc:title of docProps/core.xml (ISO/IEC 29500-2 §11); the paragraph in the Title style that
    // says the same is not repeated in the text.
    CHECK(article.title == QStringLiteral("Harbour board raises ferry fares"));
    // Paragraphs (w:p) joined by a blank line; a heading (style "heading 1") is a paragraph;
    // runs (w:r) joined; table cells (w:tc) row by row, one paragraph each; an empty paragraph
    // left out; a line break (w:br) kept; a footnote's marker in the text and the note at the
    // end; deleted text (w:del) left out and inserted text (w:ins) kept.
    CHECK(article.text
        == QStringLiteral("The harbour board voted on Monday to raise fares by a tenth.\n\n"
                          "Reaction\n\n"
                          "Commuters said the rise was steep.\n\n"
                          "Route\n\nFare\n\nEllisford\u2013Bay\n\n\u00a34.40\n\n"
                          "Line one\nline two\n\n"
                          "Fares last rose in 2019[1]\n\n"
                          "The fare is now final.\n\n"
                          "[1] Harbour board minutes, 12 May 2019."));
    // dcterms:created as written (W3CDTF), dc:language, dc:creator as the author.
    CHECK(article.published == QStringLiteral("2025-06-03T09:30:00Z"));
    CHECK(article.language == QStringLiteral("en-GB"));
    CHECK(article.meta.value(QStringLiteral("author")).toString() == QStringLiteral("Ada Quill"));
    CHECK(article.meta.value(QStringLiteral("subject")).toString() == QStringLiteral("Transport"));
    CHECK(article.meta.value(QStringLiteral("keywords")).toString()
        == QStringLiteral("ferries, fares"));
    CHECK(article.meta.value(QStringLiteral("description")).toString()
        == QStringLiteral("Invented for a test"));
    // cp:lastModifiedBy names who saved the file, not the author: not kept.
    CHECK_FALSE(article.meta.contains(QStringLiteral("lastModifiedBy")));
    CHECK_FALSE(article.text.contains(QStringLiteral("Ben Arlow")));
    CHECK(article.sourceLine == 1);
    CHECK(article.sourceFile == path);
}

TEST_CASE("DOCX: without a title the first heading of level 1 is the title", "[io][docx]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString path = makeWithPython(dir, QStringLiteral("quay.docx"), headingScript);
    const auto result = readArticles(path, {});
    REQUIRE(result.has_value());
    REQUIRE(result->size() == 1);
    CHECK(result->front().title == QStringLiteral("Quay wall repairs begin"));
    CHECK(result->front().text
        == QStringLiteral("Work on the old quay wall began at dawn.\n\nCosts\n\nIt will cost more "
                          "than planned."));
}

TEST_CASE("DOCX: a package built entry by entry needs only its document part", "[io][docx]")
{
    // Without _rels/.rels the main part is looked for under its usual name; without styles the
    // style ids Word gives are used (common practice); without core properties the file name is
    // the fallback title.
    const QByteArray bytes = zipOf({{QStringLiteral("word/document.xml"),
        documentXml("<w:p><w:pPr><w:pStyle w:val=\"Heading2\"/></w:pPr><w:r><w:t>Sub</w:t></w:r>"
                    "</w:p><w:p><w:r><w:t>Body</w:t><w:tab/><w:t>text</w:t></w:r></w:p>")}});
    const auto result = readBytes(QStringLiteral("bare.docx"), bytes);
    REQUIRE(result.has_value());
    CHECK(result->front().title == QStringLiteral("bare"));
    CHECK(result->front().text == QStringLiteral("Sub\n\nBody text"));
}

TEST_CASE("DOCX: broken archives and documents are refused naming the file", "[io][docx]")
{
    const QByteArray good = zipOf({{QStringLiteral("_rels/.rels"), packageRels},
        {QStringLiteral("word/document.xml"),
            documentXml("<w:p><w:r><w:t>Text of the article.</w:t></w:r></w:p>")}});
    // A zip without its end of central directory record (APPNOTE.TXT §4.3.16) is not read as
    // one; one whose compressed data is damaged fails its inflate or CRC-32 check (§4.4.7).
    QByteArray damaged = good;
    const qsizetype data = damaged.indexOf("word/document.xml") + 17;
    REQUIRE(data > 17);
    for (qsizetype i = data + 4; i < data + 12; ++i)
        damaged[i] = char(damaged[i] ^ 0x5A);
    QByteArray bomb(2 << 20, ' ');
    bomb = documentXml("<w:p><w:r><w:t>" + bomb + "x</w:t></w:r></w:p>");
    const QByteArray half(700 << 10, 'y');
    ImportOptions small;
    small.zipLimits = {qint64(1) << 20, qint64(1) << 20};

    const BadInput cases[] = {
        {"not a zip archive", "Just some text.\n", ErrorCode::InvalidInput, 0, 0,
            "the file is not a readable zip archive"},
        {"a zip cut off before its directory", good.first(good.size() / 2), ErrorCode::InvalidInput,
            0, 0, "the file is not a readable zip archive"},
        {"a zip with damaged data", damaged, ErrorCode::InvalidInput, 0, 0,
            "the entry word/document.xml of the archive is damaged"},
        // A password-protected Office document is an OLE compound file ([MS-OFFCRYPTO] §2.3),
        // signature D0 CF 11 E0 A1 B1 1A E1 ([MS-CFB] §2.2).
        {"an encrypted Office document",
            QByteArray("\xD0\xCF\x11\xE0\xA1\xB1\x1A\xE1", 8) + QByteArray(504, '\0'),
            ErrorCode::InvalidInput, 0, 0, "password-protected"},
        {"no word/document.xml",
            zipOf({{QStringLiteral("[Content_Types].xml"), "<Types/>"},
                {QStringLiteral("_rels/.rels"), packageRels}}),
            ErrorCode::InvalidInput, 0, 0, "the archive holds no word/document.xml"},
        {"an encrypted entry",
            zipOf({{QStringLiteral("word/document.xml"),
                documentXml("<w:p><w:r><w:t>T</w:t></w:r></w:p>"), true}}),
            ErrorCode::InvalidInput, 0, 0,
            "the entry word/document.xml of the archive is encrypted"},
        {"a document part that is not well-formed",
            zipOf({{QStringLiteral("word/document.xml"), "<document>\n<body>\n</document>"}}),
            ErrorCode::InvalidInput, 0, 0,
            "word/document.xml, line 3: the file is not well-formed"},
        {"a spreadsheet named .docx",
            zipOf({{QStringLiteral("word/document.xml"),
                "<workbook "
                "xmlns=\"http://schemas.openxmlformats.org/spreadsheetml/2006/main\"/>"}}),
            ErrorCode::InvalidInput, 0, 0, "not WordprocessingML's <w:document>"},
        {"an external entity",
            zipOf({{QStringLiteral("word/document.xml"),
                "<!DOCTYPE w:document [<!ENTITY x SYSTEM \"file:///etc/passwd\">]>\n"
                "<w:document xmlns:w=\"http://schemas.openxmlformats.org/wordprocessingml/2006/"
                "main\"><w:body><w:p><w:r><w:t>&x;</w:t></w:r></w:p></w:body></w:document>"}}),
            ErrorCode::InvalidInput, 0, 0, "declares the external entity \"x\""},
        {"a footnote that is not there",
            zipOf({{QStringLiteral("word/document.xml"),
                documentXml("<w:p><w:r><w:t>T</w:t></w:r>\n<w:r><w:footnoteReference "
                            "w:id=\"7\"/></w:r></w:p>")}}),
            ErrorCode::InvalidInput, 0, 0,
            "word/document.xml, line 4: the footnote 7 is referred to but word/footnotes.xml"},
        {"a document without text",
            zipOf({{QStringLiteral("word/document.xml"), documentXml("<w:p/><w:p><w:r/></w:p>")}}),
            ErrorCode::InvalidInput, 0, 0, "the document holds no text"},
    };
    for (const BadInput &input : cases)
        checkBadInput(QStringLiteral("broken.docx"), input);

    // Zip bombs: what comes out of an entry is counted as it comes, whatever the archive says.
    const BadInput bombs[] = {
        {"an entry that unpacks beyond the limit",
            zipOf({{QStringLiteral("word/document.xml"), bomb}}), ErrorCode::InvalidInput, 0, 0,
            "the entry word/document.xml unpacks to more than 1 MiB"},
        {"entries that unpack beyond the limit together",
            zipOf({{QStringLiteral("word/document.xml"),
                       documentXml("<w:p><w:r><w:t>" + half + "</w:t></w:r></w:p>")},
                {QStringLiteral("docProps/core.xml"), "<c>" + half + "</c>"}}),
            ErrorCode::InvalidInput, 0, 0, "the archive unpacks to more than 1 MiB in all"},
    };
    for (const BadInput &input : bombs)
        checkBadInput(QStringLiteral("bomb.docx"), input, small);
}
