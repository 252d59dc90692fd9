#include "core/io/pdf_reader.h"

#include "core/io/article_reader.h"

#include <QCoreApplication>
#include <QDateTime>
#include <QFileInfo>
#include <QHash>
#include <QRegularExpression>
#include <QStringList>

#include <poppler-document.h>
#include <poppler-global.h>
#include <poppler-page.h>

#include <algorithm>
#include <cmath>
#include <memory>
#include <vector>

// How the text of a PDF is rebuilt (common practice for extracting running text from PDF; the
// thresholds are Fourfold's own, checked on the test documents):
// - words come from poppler's text layer in its reading order (TextOutputDev's blocks and
//   lines), each with its box; a word whose box starts on another line than the last (its
//   vertical centre outside the line's box) or to the left of the last word starts a line;
// - running headers and footers: among the first two and the last two lines of each page (by
//   position), a line whose text, with digits made alike, stands there on more than half of the
//   pages (and on two at least) is dropped; so is a line there that is only a page number
//   ("7", "- 7 -", "Page 7", "7 of 12", "Page 7 of 12") within the top or bottom eighth of the
//   page;
// - paragraphs: a new one where the space from one line to the next is more than 1.3 times the
//   document's usual line spacing (the lower quartile of its line steps), where a line is indented
//   by more than half its height against the lines around it, and where the text goes up the page
//   (a new column or block) or on to the next page after a line that is shorter than 85% of the
//   widest line on its page (a line that fills the measure carries the paragraph on);
// - within a paragraph lines are joined by a space, but a line ending in a hyphen after a letter
//   whose next line starts with a small letter is joined without the hyphen ("trans-" "port" →
//   "transport"), before a capital with it ("Ellisford-" "Bay" → "Ellisford-Bay"), and a soft
//   hyphen (U+00AD) at a line end is always dropped.

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ArticleReaderText {
    Q_DECLARE_TR_FUNCTIONS(ArticleReaderText)
};

QString fromUstring(const poppler::ustring &text)
{
    const poppler::byte_array utf8 = text.to_utf8();
    return QString::fromUtf8(utf8.data(), qsizetype(utf8.size()));
}

// poppler writes its complaints about a damaged file to stderr unless told otherwise; the reader
// says what is wrong itself.
void quietPoppler(const std::string &, void *) { }

struct Line {
    QString text;
    double top = 0;
    double bottom = 0;
    double left = 0;
    double right = 0;
    int page = 0;
    double height() const { return bottom - top; }
};

std::vector<Line> pageLines(const poppler::page &page, int pageIndex)
{
    std::vector<Line> lines;
    bool spaceAfterLast = false;
    for (const poppler::text_box &word : page.text_list()) {
        const QString text = fromUstring(word.text());
        const poppler::rectf box = word.bbox();
        if (text.trimmed().isEmpty())
            continue;
        const double centre = box.y() + box.height() / 2;
        const bool newLine = lines.empty() || centre < lines.back().top
            || centre > lines.back().bottom || box.x() < lines.back().right - box.height();
        if (newLine) {
            lines.push_back(
                {text, box.y(), box.y() + box.height(), box.x(), box.x() + box.width(), pageIndex});
        } else {
            Line &line = lines.back();
            if (spaceAfterLast || box.x() - line.right > box.height() * 0.15)
                line.text += u' ';
            line.text += text;
            line.top = std::min(line.top, box.y());
            line.bottom = std::max(line.bottom, box.y() + box.height());
            line.right = std::max(line.right, box.x() + box.width());
        }
        spaceAfterLast = word.has_space_after();
    }
    for (Line &line : lines)
        line.text = line.text.simplified();
    return lines;
}

// A line's text with its digits made alike, for finding running headers and footers that carry
// the page number or a date.
QString runningKey(const QString &text)
{
    static const QRegularExpression digits(QStringLiteral("\\d+"));
    return QString(text).replace(digits, QStringLiteral("#")).toLower();
}

bool isPageNumber(const QString &text)
{
    static const QRegularExpression number(
        QStringLiteral("^[\\s\\-\u2013\u2014\\[\\(]*(page\\s+)?\\d+(\\s*(of|/"
                       ")\\s*\\d+)?[\\s\\-\u2013\u2014\\]\\)]*$"),
        QRegularExpression::CaseInsensitiveOption);
    return number.match(text).hasMatch();
}

// The indices of the lines of a page that stand at its top and bottom edges (the first and last
// `count` by position).
std::vector<std::size_t> edgeLines(const std::vector<Line> &lines, std::size_t count)
{
    std::vector<std::size_t> order(lines.size());
    for (std::size_t i = 0; i < order.size(); ++i)
        order[i] = i;
    std::ranges::stable_sort(
        order, [&](std::size_t a, std::size_t b) { return lines[a].top < lines[b].top; });
    std::vector<std::size_t> edges;
    for (std::size_t i = 0; i < order.size(); ++i) {
        if (i < count || i + count >= order.size())
            edges.push_back(order[i]);
    }
    return edges;
}

// Drops running headers, footers and page numbers from every page's lines.
void dropRunningLines(std::vector<std::vector<Line>> &pages, const std::vector<double> &heights)
{
    constexpr std::size_t edgeCount = 2;
    QHash<QString, int> pagesWith;
    for (const std::vector<Line> &lines : pages) {
        QStringList seen;
        for (std::size_t i : edgeLines(lines, edgeCount)) {
            const QString key = runningKey(lines[i].text);
            if (!seen.contains(key)) {
                seen.append(key);
                ++pagesWith[key];
            }
        }
    }
    const int pageCount = int(pages.size());
    for (std::size_t p = 0; p < pages.size(); ++p) {
        std::vector<Line> &lines = pages[p];
        std::vector<bool> drop(lines.size(), false);
        for (std::size_t i : edgeLines(lines, edgeCount)) {
            const Line &line = lines[i];
            const int count = pagesWith.value(runningKey(line.text));
            const bool running = count >= 2 && count * 2 > pageCount;
            const double edge = heights[p] / 8;
            const bool atEdge = line.top < edge || line.bottom > heights[p] - edge;
            if (running || (atEdge && isPageNumber(line.text)))
                drop[i] = true;
        }
        std::vector<Line> kept;
        for (std::size_t i = 0; i < lines.size(); ++i) {
            if (!drop[i])
                kept.push_back(std::move(lines[i]));
        }
        lines = std::move(kept);
    }
}

bool isLetter(QChar c)
{
    return c.isLetter();
}

// Joins `next` to the paragraph `text`, undoing the hyphenation of a word broken at the line end.
void joinLine(QString &text, const QString &next)
{
    if (text.isEmpty()) {
        text = next;
        return;
    }
    if (text.endsWith(u'\u00AD')) {
        text.chop(1);
        text += next;
        return;
    }
    const bool hyphen = text.endsWith(u'-') || text.endsWith(u'\u2010');
    if (hyphen && text.size() >= 2 && isLetter(text.at(text.size() - 2)) && !next.isEmpty()
        && next.front().isLetter()) {
        // A word broken at the line end ("trans-" "port") is joined; a compound with a capital
        // after the hyphen ("Ellisford-" "Bay") keeps its hyphen.
        if (next.front().isLower())
            text.chop(1);
        text += next;
        return;
    }
    text += u' ';
    text += next;
}

// The lower quartile: the usual step within a paragraph, even where paragraphs are short and
// the wider steps between them are many.
double lowerQuartile(std::vector<double> values)
{
    if (values.empty())
        return 0;
    std::ranges::sort(values);
    return values[values.size() / 4];
}

QStringList paragraphsOf(const std::vector<std::vector<Line>> &pages)
{
    // The usual line spacing: the lower quartile of the steps from one line's top to the next
    // one's below it on the same page, within three line heights.
    std::vector<double> steps;
    for (const std::vector<Line> &lines : pages) {
        for (std::size_t i = 1; i < lines.size(); ++i) {
            const double step = lines[i].top - lines[i - 1].top;
            if (step > 0 && step < 3 * lines[i - 1].height())
                steps.push_back(step);
        }
    }
    const double usual = lowerQuartile(steps);

    QStringList paragraphs;
    QString current;
    const Line *previous = nullptr;
    double previousWidest = 0;
    const auto flush = [&] {
        if (!current.isEmpty())
            paragraphs.append(current);
        current.clear();
    };
    for (const std::vector<Line> &lines : pages) {
        double widest = 0;
        for (const Line &line : lines)
            widest = std::max(widest, line.right - line.left);
        for (std::size_t i = 0; i < lines.size(); ++i) {
            const Line &line = lines[i];
            bool breakBefore = false;
            if (previous) {
                const bool sameFlow = previous->page == line.page && line.top > previous->top;
                if (sameFlow) {
                    const double step = line.top - previous->top;
                    const double height = std::max(line.height(), previous->height());
                    breakBefore = usual > 0 ? step > usual * 1.3 : step > height * 1.8;
                    // A first-line indent: this line starts further right than the line before
                    // and the line after.
                    const double indent = line.height() / 2;
                    const bool nextBack =
                        i + 1 < lines.size() && lines[i + 1].left < line.left - indent;
                    if (line.left > previous->left + indent && nextBack)
                        breakBefore = true;
                } else {
                    // The text goes on in a new column or on the next page: the paragraph goes on
                    // with it only when the last line filled the measure.
                    const double width = previous->right - previous->left;
                    const double measure = previous->page == line.page ? widest : previousWidest;
                    breakBefore = width < measure * 0.85;
                }
            }
            if (breakBefore)
                flush();
            joinLine(current, line.text);
            previous = &line;
        }
        previousWidest = widest;
    }
    flush();
    return paragraphs;
}

} // namespace

Result<ImportedArticle> readPdfArticle(const QByteArray &bytes, const QString &file)
{
    const auto failed = [&](const QString &what) {
        return failAt(ErrorCode::InvalidInput, file, 0, 0, what);
    };
    // The header (ISO 32000-1 §7.5.2) is "%PDF-" and the version; readers accept it anywhere in
    // the first 1024 bytes (common practice, as the PDF Reference's implementation notes allow).
    if (!bytes.first(std::min<qsizetype>(bytes.size(), 1024)).contains("%PDF-"))
        return failed(ArticleReaderText::tr("the file is not a PDF (it has no \"%PDF-\" header)"));
    static const bool quiet = [] {
        poppler::set_debug_error_function(quietPoppler, nullptr);
        return true;
    }();
    Q_UNUSED(quiet);
    std::unique_ptr<poppler::document> document(
        poppler::document::load_from_raw_data(bytes.constData(), int(bytes.size())));
    if (!document)
        return failed(ArticleReaderText::tr(
            "the PDF cannot be read: it is damaged, cut off or encrypted in a way "
            "poppler cannot open"));
    if (document->is_locked())
        return failed(ArticleReaderText::tr(
            "the PDF is encrypted with a password; save a copy without the password "
            "first"));

    const int pageCount = document->pages();
    if (pageCount <= 0)
        return failed(ArticleReaderText::tr("the PDF has no pages: it is damaged or cut off"));
    std::vector<std::vector<Line>> pages;
    std::vector<double> heights;
    qsizetype characters = 0;
    for (int p = 0; p < pageCount; ++p) {
        std::unique_ptr<poppler::page> page(document->create_page(p));
        if (!page) {
            return failed(
                ArticleReaderText::tr("page %1 of the PDF cannot be read: the file is damaged")
                    .arg(p + 1));
        }
        pages.push_back(pageLines(*page, p));
        heights.push_back(page->page_rect(poppler::media_box).height());
        for (const Line &line : pages.back())
            characters += line.text.size();
    }
    if (characters == 0)
        return failed(ArticleReaderText::tr(
            "the PDF has no text layer on any of its %1 page(s): it looks scanned "
            "(pages as images); run it through OCR (text recognition) first and "
            "import the result")
                          .arg(pageCount));
    dropRunningLines(pages, heights);
    QStringList paragraphs = paragraphsOf(pages);
    if (paragraphs.isEmpty())
        return failed(ArticleReaderText::tr(
            "the PDF holds no text besides running headers, footers and page numbers"));

    ImportedArticle article;
    const QString baseName = QFileInfo(file).completeBaseName();
    article.externalId = baseName;
    // The document information dictionary (ISO 32000-1 §14.3.3): Title, Author, CreationDate.
    const QString infoTitle = fromUstring(document->get_title()).simplified();
    if (!infoTitle.isEmpty()) {
        article.title = infoTitle;
        if (paragraphs.front().simplified() == infoTitle)
            paragraphs.removeFirst();
    } else if (paragraphs.size() > 1 && paragraphs.front().size() <= maxTextTitleLength) {
        // As for plain text: a short first paragraph followed by more is the title.
        article.title = paragraphs.takeFirst();
    } else {
        article.title = baseName;
    }
    if (paragraphs.isEmpty())
        return failed(ArticleReaderText::tr("the PDF holds no text besides its title"));
    article.text = paragraphs.join(QStringLiteral("\n\n"));
    const QString author = fromUstring(document->get_author()).simplified();
    if (!author.isEmpty())
        article.meta.insert(QStringLiteral("author"), author);
    const time_t created = document->get_creation_date_t();
    if (created > 0)
        article.published =
            QDateTime::fromSecsSinceEpoch(qint64(created), Qt::UTC).toString(Qt::ISODate);
    article.meta.insert(QStringLiteral("pages"), pageCount);
    article.sourceLine = 1;
    return article;
}

} // namespace fourfold
