// PDF documents through readArticles (poppler's C++ interface). The documents are made in the
// test by Debian's python3-reportlab (3.6): a three-page article set line by line, with a
// running header and "Page N of 3" on every page, a paragraph that runs on from one page to the
// next, words hyphenated at line ends and the document information dictionary's Title and
// Author (ISO 32000-1 §14.3.3); reportlab's invariant mode fixes the CreationDate at
// 2000-01-01T00:00:00Z. A page of drawing without text stands for a scan; reportlab's
// encryption (the standard security handler, ISO 32000-1 §7.6.3) with a user password for a
// protected file.

#include "core/io/article_reader.h"
#include "tests/io/document_maker.h"
#include "tests/io/reader_test_support.h"

using namespace fourfold;
using namespace fourfold::test;

namespace {

const char *const articleScript = R"PY(
import sys
from reportlab.pdfgen import canvas
from reportlab.lib.pagesizes import A4
from reportlab.pdfbase.pdfmetrics import stringWidth
W, H = A4
LEFT, WIDTH, SIZE, LEAD, GAP = 72, 451, 11, 14, 9
def wrap(text):
    # Greedy lines of at most WIDTH points; "a-|b" ends a line after "a-" and starts the next
    # with "b" (a word hyphenated at the line end).
    lines, line = [], ''
    for word in text.split(' '):
        first, _, rest = word.partition('|')
        candidate = (line + ' ' + first).strip()
        if stringWidth(candidate, 'Helvetica', SIZE) > WIDTH:
            lines.append(line)
            candidate = first
        line = candidate
        if rest:
            lines.append(line)
            line = rest
    lines.append(line)
    return lines
P2 = wrap('The harbour board voted on Monday to raise ferry fares by a tenth from the first of '
          'April, the first rise since 2019. The board\'s transport commit-|tee said the rise '
          'would pay for two new engines and for repairs to the old quay wall.')
P3 = wrap('Commuters who cross the bay each day said the rise was steep. A season ticket will '
          'cost more than a month of parking in town, and many said they would drive round by '
          'the coast road instead, which takes an hour longer but costs less in the end. The '
          'board said it had looked at every other way of paying for the engines before it '
          'chose to raise the fares, and that the rise would be the last for three years.')
P4 = wrap('The first sailing on the Ellisford-|Bay route will keep its old fare until the summer.')
P5 = wrap('The board meets again in May.')
assert len(P3) >= 5
for line in P3[:3]:
    assert stringWidth(line, 'Helvetica', SIZE) > 0.88 * WIDTH, line
assert stringWidth(P4[-1], 'Helvetica', SIZE) < 0.7 * WIDTH
pages = [[P2, P3[:3]], [P3[3:], P4], [P5]]
c = canvas.Canvas(sys.argv[1], pagesize=A4, invariant=1)
c.setTitle('Harbour board raises ferry fares')
c.setAuthor('Ada Quill')
for number, paragraphs in enumerate(pages, 1):
    c.setFont('Helvetica', 9)
    c.drawString(LEFT, H - 40, 'Ellisford Courier - Tuesday 3 June 2025')
    c.drawCentredString(W / 2, 30, 'Page %d of %d' % (number, len(pages)))
    y = H - 90
    if number == 1:
        c.setFont('Helvetica-Bold', 16)
        c.drawString(LEFT, y, 'Harbour board raises ferry fares')
        y -= 30
    c.setFont('Helvetica', SIZE)
    for lines in paragraphs:
        for line in lines:
            c.drawString(LEFT, y, line)
            y -= LEAD
        y -= GAP
    c.showPage()
c.save()
)PY";

// One page, no Title in the information dictionary, a page number alone at the foot.
const char *const untitledScript = R"PY(
import sys
from reportlab.pdfgen import canvas
from reportlab.lib.pagesizes import A4
W, H = A4
c = canvas.Canvas(sys.argv[1], pagesize=A4, invariant=1)
c.setTitle('')
c.setFont('Helvetica-Bold', 14)
c.drawString(72, H - 90, 'Quay wall repairs begin')
c.setFont('Helvetica', 11)
c.drawString(72, H - 120, 'Work on the old quay wall began at dawn and will take')
c.drawString(72, H - 134, 'most of the summer.')
c.drawString(72, H - 157, 'It will cost more than planned.')
c.drawCentredString(W / 2, 30, '- 1 -')
c.showPage()
c.save()
)PY";

const char *const scannedScript = R"PY(
import sys
from reportlab.pdfgen import canvas
c = canvas.Canvas(sys.argv[1], invariant=1)
for page in range(2):
    for row in range(40):
        c.rect(72, 100 + row * 15, 300 + (row * 37) % 150, 9, stroke=0, fill=1)
    c.showPage()
c.save()
)PY";

const char *const encryptedScript = R"PY(
import sys
from reportlab.pdfgen import canvas
c = canvas.Canvas(sys.argv[1], invariant=1, encrypt='secret')
c.drawString(72, 700, 'A protected article.')
c.showPage()
c.save()
)PY";

QByteArray madeBy(const char *script)
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    return readFile(makeWithPython(dir, QStringLiteral("made.pdf"), script));
}

} // namespace

TEST_CASE("PDF: reading order paragraphs hyphenation and running lines", "[io][pdf]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString path = makeWithPython(dir, QStringLiteral("ferry-fares.pdf"), articleScript);
    const auto result = readArticles(path, {});
    REQUIRE(result.has_value());
    REQUIRE(result->size() == 1);
    const ImportedArticle &article = result->front();
    CHECK(article.externalId == QStringLiteral("ferry-fares"));
    // The information dictionary's Title; the headline line that says the same is left out.
    CHECK(article.title == QStringLiteral("Harbour board raises ferry fares"));
    // The running header and "Page N of 3" are gone; paragraphs come from the wider spacing
    // between them; the paragraph that fills the last line of page 1 runs on to page 2, the one
    // whose last line is short on page 2 ends there; "commit-" + "tee" is one word again and
    // "Ellisford-" + "Bay" keeps its hyphen (a capital follows).
    CHECK(article.text
        == QStringLiteral(
            "The harbour board voted on Monday to raise ferry fares by a tenth from the first of "
            "April, the first rise since 2019. The board's transport committee said the rise "
            "would pay for two new engines and for repairs to the old quay wall.\n\n"
            "Commuters who cross the bay each day said the rise was steep. A season ticket will "
            "cost more than a month of parking in town, and many said they would drive round by "
            "the coast road instead, which takes an hour longer but costs less in the end. The "
            "board said it had looked at every other way of paying for the engines before it "
            "chose to raise the fares, and that the rise would be the last for three years.\n\n"
            "The first sailing on the Ellisford-Bay route will keep its old fare until the "
            "summer.\n\n"
            "The board meets again in May."));
    // CreationDate D:20000101000000+00'00' (reportlab's invariant mode) in ISO 8601.
    CHECK(article.published == QStringLiteral("2000-01-01T00:00:00Z"));
    CHECK(article.meta.value(QStringLiteral("author")).toString() == QStringLiteral("Ada Quill"));
    CHECK(article.meta.value(QStringLiteral("pages")).toInt() == 3);
    CHECK(article.sourceLine == 1);
}

TEST_CASE("PDF: without a Title a short first paragraph is the title", "[io][pdf]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString path = makeWithPython(dir, QStringLiteral("quay.pdf"), untitledScript);
    const auto result = readArticles(path, {});
    REQUIRE(result.has_value());
    REQUIRE(result->size() == 1);
    CHECK(result->front().title == QStringLiteral("Quay wall repairs begin"));
    // The page number alone at the foot of the page is dropped even on a single page.
    CHECK(result->front().text
        == QStringLiteral("Work on the old quay wall began at dawn and will take most of the "
                          "summer.\n\nIt will cost more than planned."));
}

TEST_CASE("PDF: unreadable scanned and protected files are refused naming the file", "[io][pdf]")
{
    const BadInput cases[] = {
        {"not a PDF", "Just some text.\n", ErrorCode::InvalidInput, 0, 0,
            "the file is not a PDF (it has no \"%PDF-\" header)"},
        {"a header and nothing else", "%PDF-1.7\n%%EOF\n", ErrorCode::InvalidInput, 0, 0,
            "the PDF cannot be read"},
        {"a PDF without a text layer", madeBy(scannedScript), ErrorCode::InvalidInput, 0, 0,
            "the PDF has no text layer on any of its 2 page(s): it looks scanned"},
        {"a PDF encrypted with a password", madeBy(encryptedScript), ErrorCode::InvalidInput, 0, 0,
            "the PDF is encrypted with a password"},
    };
    for (const BadInput &input : cases)
        checkBadInput(QStringLiteral("broken.pdf"), input);
    // The scan's message says what to do.
    const auto scanned = readBytes(QStringLiteral("scan.pdf"), madeBy(scannedScript));
    REQUIRE_FALSE(scanned.has_value());
    CHECK(scanned.error().message.contains(QStringLiteral("run it through OCR")));
}
