#include "core/io/feed_reader.h"

#include "core/io/html_reader.h"
#include "core/io/xml_document.h"

#include <QCoreApplication>
#include <QDateTime>
#include <QHash>
#include <QJsonArray>
#include <QRegularExpression>
#include <QStringList>

#include <array>
#include <optional>

namespace fourfold {

namespace {

// Atom 1.0 (RFC 4287 §2), the RSS content module (web.resource.org/rss/1.0/modules/content)
// and XHTML.
const QString atomNamespace = QStringLiteral("http://www.w3.org/2005/Atom");
const QString contentNamespace = QStringLiteral("http://purl.org/rss/1.0/modules/content/");
const QString xhtmlNamespace = QStringLiteral("http://www.w3.org/1999/xhtml");

// The sentences of this file, under a context that lupdate collects.
struct ArticleReaderText {
    Q_DECLARE_TR_FUNCTIONS(ArticleReaderText)
};

std::unexpected<Error> failed(const QString &file, const _xmlNode *node, const QString &what)
{
    return failAt(ErrorCode::InvalidInput, file, xmlLine(node), 0, what);
}

template<std::size_t N>
bool isOneOf(const QString &name, const std::array<const char16_t *, N> &names)
{
    return std::ranges::any_of(names, [&](const char16_t *n) { return name == n; });
}

// Keeps a further element of an item under `key` in the article's meta: a string, or an array
// once the key repeats.
void addMeta(QJsonObject &meta, const QString &key, const QString &value)
{
    const auto it = meta.find(key);
    if (it == meta.end()) {
        meta.insert(key, value);
    } else if (it->isArray()) {
        QJsonArray values = it->toArray();
        values.append(value);
        *it = values;
    } else {
        *it = QJsonArray {it->toString(), value};
    }
}

void appendMeta(QJsonObject &meta, const QString &key, const QString &value)
{
    QJsonArray values = meta.value(key).toArray();
    values.append(value);
    meta.insert(key, values);
}

// An RFC 822 date-time (RFC 822 §5.1, with RFC 1123's four-digit years), or an invalid one. Qt
// reads numeric zones only; the zone names of §5.1 are turned into theirs first (the military
// one-letter zones other than "Z" are left out: RFC 1123 §5.2.14 says their signs were given
// wrongly). A weekday that does not fit the date makes it invalid.
QDateTime rfc822Date(QString text)
{
    static const QRegularExpression zoneName(QStringLiteral("\\s([A-Za-z]{1,3})$"));
    static const QHash<QString, QString> offsets {{QStringLiteral("UT"), QStringLiteral("+0000")},
        {QStringLiteral("GMT"), QStringLiteral("+0000")},
        {QStringLiteral("Z"), QStringLiteral("+0000")},
        {QStringLiteral("EST"), QStringLiteral("-0500")},
        {QStringLiteral("EDT"), QStringLiteral("-0400")},
        {QStringLiteral("CST"), QStringLiteral("-0600")},
        {QStringLiteral("CDT"), QStringLiteral("-0500")},
        {QStringLiteral("MST"), QStringLiteral("-0700")},
        {QStringLiteral("MDT"), QStringLiteral("-0600")},
        {QStringLiteral("PST"), QStringLiteral("-0800")},
        {QStringLiteral("PDT"), QStringLiteral("-0700")}};
    const QRegularExpressionMatch match = zoneName.match(text);
    if (match.hasMatch()) {
        const QString offset = offsets.value(match.captured(1).toUpper());
        if (offset.isEmpty())
            return {};
        text.replace(match.capturedStart(1), match.capturedLength(1), offset);
    }
    return QDateTime::fromString(text, Qt::RFC2822Date);
}

QString joined(const QStringList &paragraphs)
{
    return paragraphs.join(QLatin1StringView("\n\n"));
}

// RSS 2.0's elements of a channel and of an item (RSS 2.0 specification, RSS Advisory Board,
// "Required channel elements", "Optional channel elements", "Elements of <item>").
// clang-format off
constexpr std::array<const char16_t *, 20> rssChannelElements{
    u"title", u"link", u"description", u"language", u"copyright", u"managingEditor",
    u"webMaster", u"pubDate", u"lastBuildDate", u"category", u"generator", u"docs", u"cloud",
    u"ttl", u"image", u"rating", u"textInput", u"skipHours", u"skipDays", u"item",
};
// clang-format on

Status readRssItem(_xmlNode *item, const QString &file, const QString &channelTitle,
    const QString &language, const ImportedArticleSink &take)
{
    ImportedArticle article;
    article.sourceLine = xmlLine(item);
    article.language = language;
    QString guid;
    QString link;
    QString source;
    std::optional<QString> description;
    std::optional<QString> encoded;
    qint64 htmlLine = article.sourceLine;
    for (_xmlNode *child : xmlChildElements(item)) {
        const QString name = xmlLocalName(child);
        const QString ns = xmlNamespace(child);
        if (ns == contentNamespace && name == u"encoded") {
            encoded = xmlText(child);
            htmlLine = xmlLine(child);
        } else if (!ns.isEmpty()) {
            // An extension module's element (Dublin Core, media, ...): kept as its text.
            addMeta(article.meta, xmlQualifiedName(child), xmlSimpleText(child));
        } else if (name == u"title") {
            article.title = xmlSimpleText(child);
        } else if (name == u"link") {
            link = xmlText(child).trimmed();
        } else if (name == u"description") {
            description = xmlText(child);
            if (!encoded)
                htmlLine = xmlLine(child);
        } else if (name == u"guid") {
            guid = xmlText(child).trimmed();
        } else if (name == u"pubDate") {
            // RFC 822 dates, with four-digit years allowed (RSS 2.0 specification).
            const QString raw = xmlSimpleText(child);
            const QDateTime date = rfc822Date(raw);
            if (!date.isValid())
                return failed(file, child,
                    ArticleReaderText::tr(
                        "the pubDate \"%1\" is not an RFC 822 date (such as \"Sat, 07 Sep 2002 "
                        "09:42:31 GMT\")")
                        .arg(raw));
            article.published = date.toString(Qt::ISODate);
        } else if (name == u"source") {
            source = xmlSimpleText(child);
        } else if (name == u"author" || name == u"comments") {
            addMeta(article.meta, name, xmlSimpleText(child));
        } else if (name == u"category") {
            appendMeta(article.meta, QStringLiteral("categories"), xmlSimpleText(child));
        } else if (name == u"enclosure") {
            addMeta(article.meta, name, xmlAttribute(child, "url").trimmed());
        } else {
            return failed(file, child,
                ArticleReaderText::tr("<%1> is not an element of an RSS 2.0 item")
                    .arg(xmlQualifiedName(child)));
        }
    }
    article.externalId = !guid.isEmpty() ? guid : link;
    if (article.externalId.isEmpty())
        return failed(file, item,
            ArticleReaderText::tr("the item has neither a guid nor a link to take its id from"));
    const std::optional<QString> &html = encoded ? encoded : description;
    if (!html)
        return failed(file, item,
            ArticleReaderText::tr("the item \"%1\" has neither a description nor a content:encoded")
                .arg(article.externalId));
    Result<QStringList> paragraphs = htmlFragmentParagraphs(*html, file, htmlLine);
    if (!paragraphs)
        return std::unexpected(paragraphs.error());
    article.text = joined(*paragraphs);
    article.outlet = !source.isEmpty() ? source : channelTitle;
    if (!link.isEmpty())
        article.meta.insert(QStringLiteral("link"), link);
    return take(std::move(article));
}

Status readRss(_xmlNode *root, const QString &file, const ImportedArticleSink &take)
{
    const QString version = xmlAttribute(root, "version").trimmed();
    if (version != u"2.0")
        return failed(file, root,
            ArticleReaderText::tr(
                "the RSS version is \"%1\"; Fourfold reads RSS 2.0 (<rss version=\"2.0\">)")
                .arg(version));
    std::vector<_xmlNode *> channels;
    for (_xmlNode *child : xmlChildElements(root)) {
        if (xmlNamespace(child).isEmpty() && xmlLocalName(child) == u"channel")
            channels.push_back(child);
        else if (xmlNamespace(child).isEmpty())
            return failed(file, child,
                ArticleReaderText::tr("<%1> is not an element of <rss>")
                    .arg(xmlQualifiedName(child)));
    }
    if (channels.size() != 1)
        return failed(file, root,
            ArticleReaderText::tr("<rss> holds %1 channels; an RSS 2.0 feed has exactly one")
                .arg(channels.size()));
    _xmlNode *channel = channels.front();
    QString title;
    QString language;
    std::vector<_xmlNode *> items;
    for (_xmlNode *child : xmlChildElements(channel)) {
        const QString name = xmlLocalName(child);
        if (!xmlNamespace(child).isEmpty())
            continue; // an extension module's channel element: not about any one article
        if (!isOneOf(name, rssChannelElements))
            return failed(file, child,
                ArticleReaderText::tr("<%1> is not an element of an RSS 2.0 channel")
                    .arg(xmlQualifiedName(child)));
        if (name == u"title")
            title = xmlSimpleText(child);
        else if (name == u"language")
            language = xmlSimpleText(child);
        else if (name == u"item")
            items.push_back(child);
    }
    if (items.empty())
        return failed(file, channel,
            ArticleReaderText::tr("the feed holds no items: it contains no articles"));
    for (_xmlNode *item : items)
        FOURFOLD_TRY_STATUS(readRssItem(item, file, title, language, take));
    return {};
}

// An Atom Text construct (RFC 4287 §3.1) or content (§4.1.3) as paragraphs: type "text" (the
// default), "html" (escaped HTML) or "xhtml" (one XHTML div); content may also be of a text/*
// media type, read as text.
Result<QStringList> atomParagraphs(_xmlNode *node, const QString &file, bool content)
{
    const QString type = xmlAttribute(node, "type").trimmed();
    if (type.isEmpty() || type == u"text" || (content && type.startsWith(u"text/")))
        return plainTextParagraphs(xmlText(node), file, xmlLine(node));
    if (type == u"html")
        return htmlFragmentParagraphs(xmlText(node), file, xmlLine(node));
    if (type == u"xhtml") {
        _xmlNode *div = xmlFirstChild(node, "div");
        if (!div || xmlNamespace(div) != xhtmlNamespace)
            return failed(file, node,
                ArticleReaderText::tr(
                    "<%1 type=\"xhtml\"> must hold one XHTML <div> (RFC 4287 §3.1.1.3)")
                    .arg(xmlQualifiedName(node)));
        return htmlParagraphs(div);
    }
    return failed(file, node,
        ArticleReaderText::tr(
            "<%1> has the type \"%2\"; Fourfold reads text, html, xhtml and text/* content")
            .arg(xmlQualifiedName(node), type));
}

// The elements of an entry (RFC 4287 §4.1.2).
// clang-format off
constexpr std::array<const char16_t *, 12> atomEntryElements{
    u"author", u"category", u"content", u"contributor", u"id", u"link", u"published",
    u"rights", u"source", u"summary", u"title", u"updated",
};
// The elements of a feed (RFC 4287 §4.1.1).
constexpr std::array<const char16_t *, 13> atomFeedElements{
    u"author", u"category", u"contributor", u"generator", u"icon", u"id", u"link", u"logo",
    u"rights", u"subtitle", u"title", u"updated", u"entry",
};
// clang-format on

Result<QString> atomDate(_xmlNode *node, const QString &file)
{
    // RFC 3339 date-times (RFC 4287 §3.3).
    const QString raw = xmlText(node).trimmed();
    if (!QDateTime::fromString(raw, Qt::ISODateWithMs).isValid())
        return failed(file, node,
            ArticleReaderText::tr("<%1> \"%2\" is not an RFC 3339 date-time (such as "
                                  "\"2003-12-13T18:30:02Z\")")
                .arg(xmlQualifiedName(node), raw));
    return raw;
}

QString personName(_xmlNode *person)
{
    _xmlNode *name = xmlFirstChild(person, "name");
    return name ? xmlSimpleText(name) : xmlSimpleText(person);
}

Status readAtomEntry(
    _xmlNode *entry, const QString &file, const QString &feedTitle, const ImportedArticleSink &take)
{
    ImportedArticle article;
    article.sourceLine = xmlLine(entry);
    article.language = xmlLanguage(entry);
    article.outlet = feedTitle;
    _xmlNode *content = nullptr;
    _xmlNode *summary = nullptr;
    QString updated;
    for (_xmlNode *child : xmlChildElements(entry)) {
        const QString name = xmlLocalName(child);
        if (xmlNamespace(child) != atomNamespace) {
            // Foreign markup (RFC 4287 §6.4): kept as its text.
            addMeta(article.meta, xmlQualifiedName(child), xmlSimpleText(child));
            continue;
        }
        if (!isOneOf(name, atomEntryElements))
            return failed(file, child,
                ArticleReaderText::tr("<%1> is not an element of an Atom entry")
                    .arg(xmlQualifiedName(child)));
        if (name == u"id") {
            article.externalId = xmlText(child).trimmed();
        } else if (name == u"title") {
            Result<QStringList> title = atomParagraphs(child, file, false);
            if (!title)
                return std::unexpected(title.error());
            article.title = title->join(u' ');
        } else if (name == u"content") {
            content = child;
        } else if (name == u"summary") {
            summary = child;
        } else if (name == u"published" || name == u"updated") {
            Result<QString> date = atomDate(child, file);
            if (!date)
                return std::unexpected(date.error());
            (name == u"published" ? article.published : updated) = *date;
        } else if (name == u"link") {
            const QString rel = xmlAttribute(child, "rel").trimmed();
            const QString href = xmlAttribute(child, "href").trimmed();
            if (rel.isEmpty() || rel == u"alternate")
                addMeta(article.meta, QStringLiteral("link"), href);
            else
                addMeta(article.meta, QStringLiteral("link:") + rel, href);
        } else if (name == u"author" || name == u"contributor") {
            addMeta(article.meta, name, personName(child));
        } else if (name == u"category") {
            appendMeta(
                article.meta, QStringLiteral("categories"), xmlAttribute(child, "term").trimmed());
        } else if (name == u"rights") {
            article.meta.insert(name, xmlSimpleText(child));
        } else if (name == u"source") {
            // The feed the entry was copied from (RFC 4287 §4.2.11): its title is the outlet.
            if (_xmlNode *title = xmlFirstChild(child, "title"))
                article.outlet = xmlSimpleText(title);
        }
    }
    if (article.externalId.isEmpty())
        return failed(file, entry,
            ArticleReaderText::tr("the entry has no <id> (RFC 4287 §4.1.2 requires one)"));
    if (article.published.isEmpty())
        article.published = updated;
    // Content given by reference (src, RFC 4287 §4.1.3.2) is not fetched; the summary, which
    // such an entry must have, stands for it.
    if (content && !xmlAttribute(content, "src").isNull())
        content = nullptr;
    _xmlNode *body = content ? content : summary;
    if (!body)
        return failed(file, entry,
            ArticleReaderText::tr(
                "the entry \"%1\" has neither a content held in the feed nor a summary")
                .arg(article.externalId));
    Result<QStringList> paragraphs = atomParagraphs(body, file, body == content);
    if (!paragraphs)
        return std::unexpected(paragraphs.error());
    article.text = joined(*paragraphs);
    return take(std::move(article));
}

Status readAtom(_xmlNode *root, const QString &file, const ImportedArticleSink &take)
{
    QString title;
    std::vector<_xmlNode *> entries;
    for (_xmlNode *child : xmlChildElements(root)) {
        if (xmlNamespace(child) != atomNamespace)
            continue; // foreign markup about the feed, not about any one article
        const QString name = xmlLocalName(child);
        if (!isOneOf(name, atomFeedElements))
            return failed(file, child,
                ArticleReaderText::tr("<%1> is not an element of an Atom feed")
                    .arg(xmlQualifiedName(child)));
        if (name == u"title") {
            Result<QStringList> paragraphs = atomParagraphs(child, file, false);
            if (!paragraphs)
                return std::unexpected(paragraphs.error());
            title = paragraphs->join(u' ');
        } else if (name == u"entry") {
            entries.push_back(child);
        }
    }
    if (entries.empty())
        return failed(file, root,
            ArticleReaderText::tr("the feed holds no entries: it contains no articles"));
    for (_xmlNode *entry : entries)
        FOURFOLD_TRY_STATUS(readAtomEntry(entry, file, title, take));
    return {};
}

} // namespace

bool isFeedRoot(const _xmlNode *root)
{
    const QString name = xmlLocalName(root);
    const QString ns = xmlNamespace(root);
    return (name == u"rss" && ns.isEmpty()) || (name == u"feed" && ns == atomNamespace);
}

Status readFeedArticles(_xmlNode *root, const QString &file, const ImportedArticleSink &take)
{
    if (xmlLocalName(root) == u"rss" && xmlNamespace(root).isEmpty())
        return readRss(root, file, take);
    if (xmlLocalName(root) == u"feed" && xmlNamespace(root) == atomNamespace)
        return readAtom(root, file, take);
    return failAt(ErrorCode::Unsupported, file, xmlLine(root), 0,
        ArticleReaderText::tr("the root element <%1> is not a feed's (<rss> or Atom's <feed>)")
            .arg(xmlQualifiedName(root)));
}

} // namespace fourfold
