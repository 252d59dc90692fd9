// Documents whose suffix names no format are told from their content: a PDF by its "%PDF-"
// header (ISO 32000-1 §7.5.2), a zip container by its signature (APPNOTE.TXT §4.3.7) and then
// its kind: the mimetype entry of EPUB (OCF §3.3) and ODF (part 3 §3.3), a WordprocessingML main
// part for DOCX (from memory). The archives are built with libzip in the test.

#include "core/io/article_reader.h"
#include "tests/io/document_maker.h"
#include "tests/io/reader_test_support.h"

using namespace fourfold;
using namespace fourfold::test;

TEST_CASE("Documents of unknown suffix are told from their content", "[io][sniffing]")
{
    const QByteArray docx = zipOf({{QStringLiteral("word/document.xml"),
        "<w:document xmlns:w=\"http://schemas.openxmlformats.org/wordprocessingml/2006/main\">"
        "<w:body><w:p><w:r><w:t>From a word processor.</w:t></w:r></w:p></w:body></w:document>"}});
    const QByteArray odt =
        zipOf({{QStringLiteral("mimetype"), "application/vnd.oasis.opendocument.text", false, true},
            {QStringLiteral("content.xml"),
                "<office:document-content "
                "xmlns:office=\"urn:oasis:names:tc:opendocument:xmlns:office:1.0\" "
                "xmlns:text=\"urn:oasis:names:tc:opendocument:xmlns:text:1.0\"><office:body>"
                "<office:text><text:p>From an office suite.</text:p></office:text></office:body>"
                "</office:document-content>"}});
    const QByteArray epub = zipOf({{QStringLiteral("mimetype"), "application/epub+zip", false,
                                       true},
        {QStringLiteral("META-INF/container.xml"),
            "<container xmlns=\"urn:oasis:names:tc:opendocument:xmlns:container\"><rootfiles>"
            "<rootfile full-path=\"p.opf\" media-type=\"application/oebps-package+xml\"/>"
            "</rootfiles></container>"},
        {QStringLiteral("p.opf"),
            "<package xmlns=\"http://www.idpf.org/2007/opf\"><metadata/><manifest><item id=\"c\" "
            "href=\"c.xhtml\" media-type=\"application/xhtml+xml\"/></manifest><spine><itemref "
            "idref=\"c\"/></spine></package>"},
        {QStringLiteral("c.xhtml"),
            "<html xmlns=\"http://www.w3.org/1999/xhtml\"><head><title>C</title></head><body><p>"
            "From a book.</p></body></html>"}});
    struct Case {
        const char *name;
        QByteArray bytes;
        const char *text;
    };
    const Case cases[] = {
        {"letter.bin", docx, "From a word processor."},
        {"memo", odt, "From an office suite."},
        {"book.dat", epub, "From a book."},
    };
    for (const Case &c : cases) {
        INFO("file: " << c.name);
        const auto result = readBytes(QString::fromUtf8(c.name), c.bytes);
        REQUIRE(result.has_value());
        REQUIRE(result->size() == 1);
        CHECK(result->front().text == QString::fromUtf8(c.text));
    }
    // A PDF header sends the file to the PDF reader, which says what is wrong with it.
    const BadInput pdf {"a damaged PDF of unknown suffix", "%PDF-1.7\n%%EOF\n",
        ErrorCode::InvalidInput, 0, 0, "the PDF cannot be read"};
    checkBadInput(QStringLiteral("scan.dat"), pdf);
    // Another kind of zip archive is not guessed at.
    const BadInput other {"a zip archive of another kind",
        zipOf({{QStringLiteral("data.csv"), "a,b\n"}}), ErrorCode::Unsupported, 0, 0,
        "the file is a zip archive but not a DOCX, ODT or EPUB document"};
    checkBadInput(QStringLiteral("data.bin"), other);
}
