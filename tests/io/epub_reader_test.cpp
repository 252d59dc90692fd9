// EPUB 3 publications through readArticles. The books are built entry by entry with libzip as
// EPUB 3.2's Open Container Format lays them out (from memory): the mimetype entry first and
// stored, META-INF/container.xml naming the package document, the package document's Dublin Core
// metadata, manifest and spine (Packages §3.4), XHTML content documents; a cover page without
// text, a navigation document outside the spine and a linear="no" item as real books have them.

#include "core/io/article_reader.h"
#include "tests/io/document_maker.h"
#include "tests/io/reader_test_support.h"

using namespace fourfold;
using namespace fourfold::test;

namespace {

const QByteArray container =
    R"(<?xml version="1.0" encoding="UTF-8"?>
<container version="1.0" xmlns="urn:oasis:names:tc:opendocument:xmlns:container">
  <rootfiles>
    <rootfile full-path="OEBPS/content.opf" media-type="application/oebps-package+xml"/>
  </rootfiles>
</container>)";

const QByteArray package = R"(<?xml version="1.0" encoding="UTF-8"?>
<package xmlns="http://www.idpf.org/2007/opf" version="3.0" unique-identifier="uid">
  <metadata xmlns:dc="http://purl.org/dc/elements/1.1/">
    <dc:identifier id="uid">urn:uuid:7d1f0c3e-4c5a-4a57-9a51-2f1d3c2b9e10</dc:identifier>
    <dc:title>The Bay in Winter</dc:title>
    <dc:creator>Ada Quill</dc:creator>
    <dc:creator>Ben Arlow</dc:creator>
    <dc:language>en-GB</dc:language>
    <dc:date>2025-01-15</dc:date>
    <dc:publisher>Harbourside Press</dc:publisher>
    <meta property="dcterms:modified">2025-01-15T10:00:00Z</meta>
  </metadata>
  <manifest>
    <item id="nav" href="nav.xhtml" media-type="application/xhtml+xml" properties="nav"/>
    <item id="cover" href="cover.xhtml" media-type="application/xhtml+xml"/>
    <item id="cover-image" href="images/cover.png" media-type="image/png"/>
    <item id="ch1" href="text/ferries.xhtml" media-type="application/xhtml+xml"/>
    <item id="ch2" href="text/quay%20wall.xhtml" media-type="application/xhtml+xml"/>
    <item id="notes" href="text/notes.xhtml" media-type="application/xhtml+xml"/>
  </manifest>
  <spine>
    <itemref idref="cover"/>
    <itemref idref="ch1"/>
    <itemref idref="notes" linear="no"/>
    <itemref idref="ch2"/>
  </spine>
</package>)";

QByteArray xhtml(const QByteArray &title, const QByteArray &body)
{
    return "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n<html "
           "xmlns=\"http://www.w3.org/1999/xhtml\" xmlns:epub=\"http://www.idpf.org/2007/ops\">"
           "<head><title>"
        + title + "</title></head><body>" + body + "</body></html>";
}

std::vector<ZipEntry> book(const QByteArray &opf = package)
{
    return {{QStringLiteral("mimetype"), "application/epub+zip", false, true},
        {QStringLiteral("META-INF/container.xml"), container},
        {QStringLiteral("OEBPS/content.opf"), opf},
        {QStringLiteral("OEBPS/nav.xhtml"),
            xhtml("Contents", "<nav epub:type=\"toc\"><ol><li>Ferries</li></ol></nav>")},
        {QStringLiteral("OEBPS/cover.xhtml"), xhtml("Cover", "<img src=\"images/cover.png\"/>")},
        {QStringLiteral("OEBPS/images/cover.png"), QByteArray("\x89PNG\r\n\x1a\n", 8)},
        {QStringLiteral("OEBPS/text/ferries.xhtml"),
            xhtml("Ferries",
                "<h1>Ferries</h1><p>Fares rise in spring.</p><p>The board "
                "met on Monday.</p>")},
        {QStringLiteral("OEBPS/text/quay wall.xhtml"),
            xhtml("The quay wall",
                "<section><h1>The quay wall</h1><p>Repairs began at "
                "dawn.</p></section>")},
        {QStringLiteral("OEBPS/text/notes.xhtml"), xhtml("Notes", "<p>A note.</p>")}};
}

} // namespace

TEST_CASE("EPUB: each chapter of the spine an article", "[io][epub]")
{
    const auto result = readBytes(QStringLiteral("bay.epub"), zipOf(book()));
    REQUIRE(result.has_value());
    // The cover (no text) and the linear="no" notes are passed over; the navigation document
    // is not in the spine.
    REQUIRE(result->size() == 2);
    const ImportedArticle &first = result->at(0);
    CHECK(first.externalId == QStringLiteral("bay#ch1"));
    CHECK(first.title == QStringLiteral("Ferries"));
    CHECK(first.text == QStringLiteral("Fares rise in spring.\n\nThe board met on Monday."));
    CHECK(first.outlet == QStringLiteral("Harbourside Press"));
    CHECK(first.published == QStringLiteral("2025-01-15"));
    CHECK(first.language == QStringLiteral("en-GB"));
    CHECK(first.meta.value(QStringLiteral("author")).toString()
        == QStringLiteral("Ada Quill, Ben Arlow"));
    CHECK(
        first.meta.value(QStringLiteral("book")).toString() == QStringLiteral("The Bay in Winter"));
    CHECK(first.meta.value(QStringLiteral("chapter")).toInt() == 2);
    CHECK(first.meta.value(QStringLiteral("href")).toString()
        == QStringLiteral("OEBPS/text/ferries.xhtml"));
    CHECK(first.sourceLine == 2);
    const ImportedArticle &second = result->at(1);
    // The href's %20 is decoded to find the entry (Packages: hrefs are URLs).
    CHECK(second.externalId == QStringLiteral("bay#ch2"));
    CHECK(second.title == QStringLiteral("The quay wall"));
    CHECK(second.text == QStringLiteral("Repairs began at dawn."));
    CHECK(second.sourceLine == 4);
}

TEST_CASE("EPUB: the whole book as one article", "[io][epub]")
{
    ImportOptions options;
    options.epubWholeBook = true;
    const auto result = readBytes(QStringLiteral("bay.epub"), zipOf(book()), options);
    REQUIRE(result.has_value());
    REQUIRE(result->size() == 1);
    const ImportedArticle &whole = result->front();
    CHECK(whole.externalId == QStringLiteral("bay"));
    CHECK(whole.title == QStringLiteral("The Bay in Winter"));
    // Each chapter's headline stays in the book's text.
    CHECK(whole.text
        == QStringLiteral("Ferries\n\nFares rise in spring.\n\nThe board met on Monday.\n\n"
                          "The quay wall\n\nRepairs began at dawn."));
    CHECK(whole.meta.value(QStringLiteral("author")).toString()
        == QStringLiteral("Ada Quill, Ben Arlow"));
}

TEST_CASE("EPUB: broken books are refused naming the file", "[io][epub]")
{
    std::vector<ZipEntry> noContainer = book();
    noContainer.erase(noContainer.begin() + 1);
    QByteArray missingItem = package;
    missingItem.replace("<itemref idref=\"ch2\"/>", "<itemref idref=\"ch9\"/>");
    std::vector<ZipEntry> drm = book();
    drm.push_back({QStringLiteral("META-INF/encryption.xml"),
        "<encryption xmlns=\"urn:oasis:names:tc:opendocument:xmlns:container\" "
        "xmlns:enc=\"http://www.w3.org/2001/04/xmlenc#\"><enc:EncryptedData>"
        "<enc:EncryptionMethod Algorithm=\"http://www.w3.org/2001/04/xmlenc#aes256-cbc\"/>"
        "<enc:CipherData><enc:CipherReference URI=\"OEBPS/text/ferries.xhtml\"/>"
        "</enc:CipherData></enc:EncryptedData></encryption>"});
    std::vector<ZipEntry> noText = book();
    noText[6].bytes = xhtml("Ferries", "<img src=\"a.png\"/>");
    noText[7].bytes = xhtml("Quay", "");
    const BadInput cases[] = {
        {"not a zip archive", "Just some text.\n", ErrorCode::InvalidInput, 0, 0,
            "the file is not a readable zip archive"},
        {"another kind of package",
            zipOf({{QStringLiteral("mimetype"), "application/vnd.oasis.opendocument.text", false,
                true}}),
            ErrorCode::InvalidInput, 0, 0, "not an EPUB publication (application/epub+zip)"},
        {"no container.xml", zipOf(noContainer), ErrorCode::InvalidInput, 0, 0,
            "the archive holds no META-INF/container.xml"},
        {"a spine item the manifest does not hold", zipOf(book(missingItem)),
            ErrorCode::InvalidInput, 0, 0,
            "OEBPS/content.opf, line 25: the spine refers to \"ch9\""},
        {"an encrypted chapter", zipOf(drm), ErrorCode::InvalidInput, 0, 0,
            "the chapter OEBPS/text/ferries.xhtml is encrypted (DRM)"},
        {"a book without text", zipOf(noText), ErrorCode::InvalidInput, 0, 0,
            "the book holds no text"},
    };
    for (const BadInput &input : cases)
        checkBadInput(QStringLiteral("broken.epub"), input);
}
