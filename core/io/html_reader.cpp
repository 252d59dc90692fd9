#include "core/io/html_reader.h"

#include "core/io/xml_document.h"
#include "core/text/canonical_text.h"

#include <QCoreApplication>
#include <QFileInfo>
#include <QRegularExpression>
#include <QStringList>

#include <libxml/HTMLparser.h>
#include <libxml/parser.h>
#include <libxml/tree.h>
#include <libxml/xmlerror.h>

#include <algorithm>
#include <array>
#include <limits>
#include <memory>
#include <optional>
#include <string_view>
#include <utility>
#include <vector>

namespace fourfold {

namespace {

// Elements whose content is never article text: scripts and styles, page furniture, forms
// and embedded objects (common practice for extracting the readable text of a page).
// clang-format off
constexpr std::array<std::string_view, 20> droppedElements{
    "aside", "audio", "button", "canvas", "embed", "footer", "form", "head", "iframe", "math",
    "nav", "noscript", "object", "script", "select", "style", "svg", "template", "textarea",
    "video",
};
// clang-format on

// Elements that start and end a paragraph of their own (the block-level elements of HTML 4.01
// and the HTML Standard's flow content that is rendered as a block).
// clang-format off
constexpr std::array<std::string_view, 45> blockElements{
    "address", "article", "aside", "blockquote", "body", "caption", "center", "dd", "details",
    "dialog", "dir", "div", "dl", "dt", "fieldset", "figcaption", "figure", "footer", "form", "h1",
    "h2", "h3", "h4", "h5", "h6", "header", "hgroup", "hr", "html", "legend", "li", "main", "menu",
    "nav", "ol", "p", "pre", "section", "summary", "table", "tbody", "td", "th", "thead", "tr",
};
// clang-format on

constexpr std::array<std::string_view, 6> headingElements {"h1", "h2", "h3", "h4", "h5", "h6"};

template<std::size_t N>
bool isOneOf(std::string_view name, const std::array<std::string_view, N> &names)
{
    return std::ranges::find(names, name) != names.end();
}

std::string_view elementName(const xmlNode *node)
{
    return node->name ? std::string_view(reinterpret_cast<const char *>(node->name))
                      : std::string_view();
}

bool hasAncestor(const xmlNode *node, std::initializer_list<std::string_view> names)
{
    for (const xmlNode *p = node->parent; p; p = p->parent) {
        if (p->type == XML_ELEMENT_NODE && std::ranges::find(names, elementName(p)) != names.end())
            return true;
    }
    return false;
}

// Whether the style attribute sets display to none. Declarations are separated by ";" and the
// last one of a property wins unless an earlier one is "!important" (CSS Syntax 3 §5.4.5 and
// CSS Cascade 4 §6.4); comments (/* … */) are ignored.
bool styledDisplayNone(const xmlNode *node)
{
    QString style = xmlAttribute(node, "style");
    if (style.isEmpty())
        return false;
    static const QRegularExpression comments(
        QStringLiteral("/\\*.*?(\\*/|$)"), QRegularExpression::DotMatchesEverythingOption);
    static const QRegularExpression important(
        QStringLiteral("!\\s*important\\s*$"), QRegularExpression::CaseInsensitiveOption);
    style.remove(comments);
    bool none = false;
    bool wasImportant = false;
    for (const QStringView declaration : QStringView(style).split(u';')) {
        const qsizetype colon = declaration.indexOf(u':');
        if (colon < 0
            || declaration.first(colon).trimmed().compare(u"display", Qt::CaseInsensitive) != 0)
            continue;
        QString value = declaration.sliced(colon + 1).toString();
        const bool isImportant = value.contains(important);
        value.remove(important);
        if (wasImportant && !isImportant)
            continue;
        wasImportant = isImportant;
        none = value.trimmed().compare(u"none", Qt::CaseInsensitive) == 0;
    }
    return none;
}

// Elements a browser does not render at all: the hidden attribute (HTML Standard §6.1, "The
// hidden attribute") and display: none in the style attribute. They make no box, so unlike a
// dropped block they do not end the paragraph around them.
bool isHidden(const xmlNode *node)
{
    return xmlHasProp(node, reinterpret_cast<const xmlChar *>("hidden")) != nullptr
        || styledDisplayNone(node);
}

bool isDropped(const xmlNode *node, std::string_view name)
{
    if (isOneOf(name, droppedElements))
        return true;
    if (xmlAttribute(node, "aria-hidden").trimmed().compare(u"true", Qt::CaseInsensitive) == 0)
        return true;
    // HTML-AAM: a header maps to the banner role (page furniture) unless it is inside an
    // article, aside, main, nav or section element, where it introduces that content.
    return name == "header" && !hasAncestor(node, {"article", "aside", "main", "nav", "section"});
}

// Visits the subtree of `root` depth first. `enter(node)` returns whether to visit the node's
// children; `leave(node)` is called after the children of every node entered that way. Not
// recursive, so that deeply nested pages cannot exhaust the stack.
template<typename Enter, typename Leave>
void walk(xmlNode *root, Enter enter, Leave leave)
{
    xmlNode *node = root;
    while (node) {
        if (enter(node)) {
            if (node->children) {
                node = node->children;
                continue;
            }
            leave(node);
        }
        while (node != root && !node->next) {
            node = node->parent;
            leave(node);
        }
        if (node == root)
            break;
        node = node->next;
    }
}

template<typename Visit>
void forEachElement(xmlNode *root, Visit visit)
{
    walk(
        root,
        [&](xmlNode *node) {
            if (node->type != XML_ELEMENT_NODE)
                return false;
            visit(node);
            return true;
        },
        [](xmlNode *) {});
}

struct Block {
    QString text;
    bool heading = false;
};

// Gathers the text of the page into paragraphs, collapsing whitespace as a browser renders it.
class BlockCollector
{
public:
    int headingDepth = 0;
    int preDepth = 0;
    std::vector<Block> blocks;

    void addText(QStringView text)
    {
        for (const QChar c : text) {
            // ASCII whitespace as the HTML Standard defines it: TAB, LF, FF, CR, SPACE.
            const bool space = c == u' ' || c == u'\t' || c == u'\n' || c == u'\f' || c == u'\r';
            if (!space) {
                if (m_pendingSpace && !m_current.isEmpty() && !m_current.endsWith(u'\n'))
                    m_current.append(u' ');
                m_pendingSpace = false;
                m_current.append(c);
            } else if (preDepth > 0 && c == u'\n') {
                addLineBreak();
            } else if (preDepth == 0 || c != u'\r') {
                m_pendingSpace = true;
            }
        }
    }

    void addLineBreak()
    {
        m_current.append(u'\n');
        m_pendingSpace = false;
    }

    // Ends the current block: its lines are trimmed, and an empty line (two line breaks in a
    // row) splits it into paragraphs.
    void endBlock()
    {
        QStringList paragraph;
        const auto endParagraph = [&] {
            if (!paragraph.isEmpty())
                blocks.push_back(Block {paragraph.join(u'\n'), headingDepth > 0});
            paragraph.clear();
        };
        for (const QStringView line : QStringView(m_current).split(u'\n')) {
            const QStringView trimmed = line.trimmed();
            if (trimmed.isEmpty())
                endParagraph();
            else
                paragraph.append(trimmed.toString());
        }
        endParagraph();
        m_current.clear();
        m_pendingSpace = false;
    }

private:
    QString m_current;
    bool m_pendingSpace = false;
};

struct XmlDocFree {
    void operator()(xmlDoc *doc) const { xmlFreeDoc(doc); }
};

struct HtmlContextFree {
    void operator()(htmlParserCtxt *context) const { htmlFreeParserCtxt(context); }
};

void initialiseLibxml2()
{
    // xmlInitParser sets up global tables; once, before any thread parses.
    static const bool initialised = [] {
        xmlInitParser();
        return true;
    }();
    Q_UNUSED(initialised);
}

// The character set the page declares in its first 1024 bytes (the window of the HTML
// Standard's "prescan a byte stream to determine its encoding"), or an empty string.
QString declaredCharset(const QByteArray &bytes)
{
    static const QRegularExpression charset(
        QStringLiteral("charset\\s*=\\s*[\"']?\\s*([A-Za-z0-9._:-]+)"),
        QRegularExpression::CaseInsensitiveOption);
    const QRegularExpressionMatch match = charset.match(QString::fromLatin1(bytes.left(1024)));
    return match.hasMatch() ? match.captured(1) : QString();
}

bool startsAt(const QByteArray &bytes, qsizetype at, const char *text)
{
    return QByteArrayView(bytes).sliced(at).startsWith(QByteArrayView(text));
}

// Where the internal subset of the page's DOCTYPE lies ("[" to "]" in "<!DOCTYPE html [
// <!ENTITY …> ]>", XML 1.0 §2.8), or nothing. The HTML parser does not know internal subsets:
// it ends the DOCTYPE at the subset's first ">" and reads the rest as text. The DOCTYPE is looked
// for where it stands, after a byte order mark, whitespace, an XML declaration and comments.
std::optional<std::pair<qsizetype, qsizetype>> internalSubset(const QByteArray &bytes)
{
    const qsizetype n = bytes.size();
    qsizetype at = bytes.startsWith("\xEF\xBB\xBF") ? 3 : 0;
    while (true) {
        while (at < n && QByteArrayView(" \t\r\n\f").contains(bytes.at(at)))
            ++at;
        if (startsAt(bytes, at, "<?") || startsAt(bytes, at, "<!--")) {
            const bool comment = startsAt(bytes, at, "<!--");
            const qsizetype end = bytes.indexOf(comment ? "-->" : "?>", at + 2);
            if (end < 0)
                return std::nullopt;
            at = end + (comment ? 3 : 2);
            continue;
        }
        break;
    }
    if (QByteArrayView(bytes)
            .sliced(at)
            .first(std::min<qsizetype>(9, n - at))
            .compare("<!DOCTYPE", Qt::CaseInsensitive)
        != 0)
        return std::nullopt;
    // The subset opens at a "[" before the DOCTYPE's ">" and closes at the first "]" outside
    // quoted literals and comments.
    char quote = 0;
    qsizetype open = -1;
    for (qsizetype i = at + 9; i < n && open < 0; ++i) {
        const char c = bytes.at(i);
        if (quote != 0) {
            quote = c == quote ? char(0) : quote;
        } else if (c == '"' || c == '\'') {
            quote = c;
        } else if (c == '>') {
            return std::nullopt;
        } else if (c == '[') {
            open = i;
        }
    }
    if (open < 0)
        return std::nullopt;
    for (qsizetype i = open + 1; i < n; ++i) {
        const char c = bytes.at(i);
        if (quote != 0) {
            quote = c == quote ? char(0) : quote;
        } else if (c == '"' || c == '\'') {
            quote = c;
        } else if (startsAt(bytes, i, "<!--")) {
            const qsizetype end = bytes.indexOf("-->", i + 4);
            if (end < 0)
                return std::nullopt;
            i = end + 2;
        } else if (c == ']') {
            return std::pair {open, i};
        }
    }
    return std::nullopt;
}

// The page as the HTML parser is given it: the DOCTYPE's internal subset blanked (its line breaks
// kept, so that lines stay where they were), and every CDATA section outside comments ("<![CDATA[
// … ]]>", XML 1.0 §2.7) replaced by its content as text, with "&", "<" and ">" escaped. The HTML
// parser knows CDATA sections only inside svg and math; elsewhere it would keep "<![CDATA[" and
// "]]>" as text and read tags inside as markup. An unclosed section runs to the end of the file.
// The bytes are shared, not copied, when there is neither.
QByteArray forHtmlParser(QByteArray bytes)
{
    if (const auto subset = internalSubset(bytes)) {
        for (qsizetype i = subset->first; i <= subset->second; ++i)
            if (bytes.at(i) != '\n')
                bytes[i] = ' ';
    }
    if (!bytes.contains("<![CDATA["))
        return bytes;
    QByteArray out;
    out.reserve(bytes.size());
    qsizetype at = 0;
    while (at < bytes.size()) {
        const qsizetype cdata = bytes.indexOf("<![CDATA[", at);
        const qsizetype comment = bytes.indexOf("<!--", at);
        if (cdata < 0) {
            out += QByteArrayView(bytes).sliced(at);
            break;
        }
        if (comment >= 0 && comment < cdata) {
            const qsizetype end = bytes.indexOf("-->", comment + 4);
            const qsizetype next = end < 0 ? bytes.size() : end + 3;
            out += QByteArrayView(bytes).sliced(at, next - at);
            at = next;
            continue;
        }
        out += QByteArrayView(bytes).sliced(at, cdata - at);
        const qsizetype end = bytes.indexOf("]]>", cdata + 9);
        const qsizetype contentEnd = end < 0 ? bytes.size() : end;
        for (qsizetype i = cdata + 9; i < contentEnd; ++i) {
            const char c = bytes.at(i);
            if (c == '&')
                out += "&amp;";
            else if (c == '<')
                out += "&lt;";
            else if (c == '>')
                out += "&gt;";
            else
                out += c;
        }
        at = end < 0 ? bytes.size() : end + 3;
    }
    return out;
}

// The paragraphs of the element tree under `root`, by the rules of the HTML reader's body (see
// article_reader.h); `firstTime`, when given, receives the datetime of the first <time>. An XML
// tree (XHTML, NITF's body) is read the same way, by its elements' local names; a reference to
// an entity the parser kept as a reference is read as the entity's text.
std::vector<Block> collectBlocks(xmlNode *root, QString *firstTime)
{
    BlockCollector collector;
    walk(
        root,
        [&](xmlNode *node) {
            if (node->type == XML_TEXT_NODE || node->type == XML_CDATA_SECTION_NODE) {
                collector.addText(fromXml(node->content));
                return false;
            }
            if (node->type == XML_ENTITY_REF_NODE) {
                xmlChar *content = xmlNodeGetContent(node);
                collector.addText(fromXml(content));
                xmlFree(content);
                return false;
            }
            if (node->type != XML_ELEMENT_NODE)
                return false;
            const std::string_view name = elementName(node);
            if (name == "br") {
                collector.addLineBreak();
                return false;
            }
            if (isHidden(node))
                return false;
            const bool block = isOneOf(name, blockElements);
            if (block)
                collector.endBlock();
            if (isDropped(node, name))
                return false;
            if (isOneOf(name, headingElements))
                ++collector.headingDepth;
            if (name == "pre")
                ++collector.preDepth;
            if (name == "time" && firstTime && firstTime->isEmpty())
                *firstTime = xmlAttribute(node, "datetime").trimmed();
            return true;
        },
        [&](xmlNode *node) {
            const std::string_view name = elementName(node);
            if (isOneOf(name, blockElements))
                collector.endBlock();
            if (isOneOf(name, headingElements))
                --collector.headingDepth;
            if (name == "pre")
                --collector.preDepth;
        });
    collector.endBlock();
    return std::move(collector.blocks);
}

// Parses valid UTF-8 `bytes` with libxml2's HTML parser (no network, no error output). Returns
// the tree (null for a page without any element), or InvalidInput naming `file` when the parser
// stopped before the end.
Result<std::unique_ptr<xmlDoc, XmlDocFree>> parseHtml(const QByteArray &bytes, const QString &file)
{
    initialiseLibxml2();
    // Valid UTF-8 by now; libxml2 gets the bytes without a BOM and is told to ignore any
    // <meta charset>, which would otherwise make it decode them again as something else.
    // XML_PARSE_HUGE lifts libxml2's nesting limit of 256 (the file size limit bounds the
    // input already, and the walk below is not recursive).
    const qsizetype skip = bytes.startsWith("\xEF\xBB\xBF") ? 3 : 0;
    const QByteArray page = forHtmlParser(bytes);
    if (page.size() - skip > std::numeric_limits<int>::max())
        return failAt(ErrorCode::InvalidInput, file, 0, 0,
            QCoreApplication::translate("ArticleReader",
                "the page is too large for the HTML parser once its CDATA sections are escaped"));
    const std::unique_ptr<htmlParserCtxt, HtmlContextFree> context(htmlNewParserCtxt());
    if (!context) {
        return failAt(ErrorCode::Internal, file, 0, 0,
            QCoreApplication::translate("ArticleReader", "the HTML parser could not be started"));
    }
    const int parseOptions = int(HTML_PARSE_NOERROR) | int(HTML_PARSE_NOWARNING)
        | int(HTML_PARSE_NONET) | int(HTML_PARSE_IGNORE_ENC) | int(XML_PARSE_HUGE);
    std::unique_ptr<xmlDoc, XmlDocFree> doc(
        htmlCtxtReadMemory(context.get(), page.constData() + skip,
            static_cast<int>(page.size() - skip), nullptr, "UTF-8", parseOptions));
    // The HTML parser recovers from bad markup on its own; it only halts (and then leaves a
    // partial tree) on a fatal error such as running out of memory. Half a page is refused.
    if (context->disableSAX != 0 || context->instate == XML_PARSER_EOF) {
        const xmlError *last = xmlCtxtGetLastError(context.get());
        auto error = failAt(ErrorCode::InvalidInput, file, last ? last->line : 0, 0,
            QCoreApplication::translate("ArticleReader",
                "the HTML parser stopped before the end "
                "of the page"));
        if (last && last->message)
            error.error().cause = QString::fromUtf8(last->message).trimmed();
        return error;
    }
    return doc;
}

} // namespace

Result<ImportedArticle> readHtmlArticle(const QByteArray &bytes, const QString &file)
{
    Result<QString> decoded = decodeUtf8Strict(bytes, file);
    if (!decoded) {
        Error error = decoded.error();
        const QString charset = declaredCharset(bytes);
        if (!charset.isEmpty() && charset.compare(u"utf-8", Qt::CaseInsensitive) != 0
            && charset.compare(u"utf8", Qt::CaseInsensitive) != 0) {
            error.message += QLatin1Char(' ')
                + QCoreApplication::translate("ArticleReader",
                    "The page declares the character set \"%1\"; "
                    "convert it to UTF-8 first.")
                      .arg(charset);
        }
        return std::unexpected(std::move(error));
    }
    const QString baseName = QFileInfo(file).completeBaseName();

    Result<std::unique_ptr<xmlDoc, XmlDocFree>> doc = parseHtml(bytes, file);
    if (!doc)
        return std::unexpected(doc.error());
    xmlNode *root = *doc ? xmlDocGetRootElement(doc->get()) : nullptr;
    if (!root) {
        return failAt(ErrorCode::InvalidInput, file, 0, 0,
            QCoreApplication::translate("ArticleReader",
                "the file contains no articles: the page "
                "holds no text"));
    }

    ImportedArticle article;
    article.externalId = baseName;
    article.sourceLine = 1;
    article.language = xmlAttribute(root, "lang").trimmed();

    QString pageTitle;
    QString ogTitle;
    QString firstH1;
    QString metaPublished;
    forEachElement(root, [&](xmlNode *node) {
        const std::string_view name = elementName(node);
        if (name == "title" && pageTitle.isEmpty() && !hasAncestor(node, {"svg"})) {
            pageTitle = xmlSimpleText(node);
        } else if (name == "h1" && firstH1.isEmpty()) {
            firstH1 = xmlSimpleText(node);
        } else if (name == "meta") {
            QString key = xmlAttribute(node, "property").trimmed();
            if (key.isEmpty())
                key = xmlAttribute(node, "name").trimmed();
            const QString content = xmlAttribute(node, "content").simplified();
            // The Open Graph protocol (ogp.me): og:title, og:site_name, and the article
            // type's article:published_time.
            if (key == u"og:title" && ogTitle.isEmpty())
                ogTitle = content;
            else if (key == u"og:site_name" && article.outlet.isEmpty())
                article.outlet = content;
            else if (key == u"article:published_time" && metaPublished.isEmpty())
                metaPublished = content;
        }
    });

    QString timePublished;
    std::vector<Block> blocks = collectBlocks(root, &timePublished);

    article.title = !ogTitle.isEmpty() ? ogTitle
        : !pageTitle.isEmpty()         ? pageTitle
        : !firstH1.isEmpty()           ? firstH1
                                       : baseName;
    const auto firstHeading = std::ranges::find_if(blocks, &Block::heading);
    if (firstHeading != blocks.end() && firstHeading->text.simplified() == article.title)
        blocks.erase(firstHeading);
    if (blocks.empty()) {
        return failAt(ErrorCode::InvalidInput, file, 0, 0,
            QCoreApplication::translate("ArticleReader",
                "the file contains no articles: the page holds no text outside "
                "scripts, styles, navigation, forms and other dropped elements"));
    }
    QStringList paragraphs;
    for (const Block &b : blocks)
        paragraphs.append(b.text);
    article.text = paragraphs.join(QLatin1StringView("\n\n"));
    article.published = !metaPublished.isEmpty() ? metaPublished : timePublished;
    return article;
}

QStringList htmlParagraphs(xmlNode *root)
{
    QStringList paragraphs;
    for (const Block &block : collectBlocks(root, nullptr))
        paragraphs.append(block.text);
    return paragraphs;
}

Result<QStringList> htmlFragmentParagraphs(const QString &html, const QString &file, qint64 line)
{
    Result<std::unique_ptr<xmlDoc, XmlDocFree>> doc = parseHtml(html.toUtf8(), file);
    if (!doc) {
        auto failed = failAt(doc.error().code, file, line, 0,
            QCoreApplication::translate(
                "ArticleReader", "the HTML parser stopped before the end of the element's HTML"));
        failed.error().cause = doc.error().cause;
        return failed;
    }
    xmlNode *root = *doc ? xmlDocGetRootElement(doc->get()) : nullptr;
    return root ? htmlParagraphs(root) : QStringList();
}

Result<QStringList> plainTextParagraphs(const QString &text, const QString &file, qint64 line)
{
    static const QRegularExpression blankLines(QStringLiteral("\\n[ \\t\\r\\f]*\\n"));
    QStringList parts = text.split(blankLines);
    for (QString &part : parts)
        part = QStringLiteral("<p>") + part.toHtmlEscaped() + QStringLiteral("</p>");
    return htmlFragmentParagraphs(parts.join(QString()), file, line);
}

} // namespace fourfold
