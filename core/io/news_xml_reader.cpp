#include "core/io/news_xml_reader.h"

#include "core/io/html_reader.h"
#include "core/io/xml_document.h"

#include <QCoreApplication>
#include <QFileInfo>
#include <QJsonArray>
#include <QStringList>

#include <initializer_list>

namespace fourfold {

namespace {

// NewsML-G2's namespace (IPTC NewsML-G2 specification, "XML namespace"); NITF 3.x documents come
// without a namespace or with one under this prefix (the NITF 3.x XML schemas).
const QString g2Namespace = QStringLiteral("http://iptc.org/std/nar/2006-10-01/");
const QString nitfNamespacePrefix = QStringLiteral("http://iptc.org/std/NITF/");

// The sentences of this file, under a context that lupdate collects.
struct ArticleReaderText {
    Q_DECLARE_TR_FUNCTIONS(ArticleReaderText)
};

std::unexpected<Error> failed(const QString &file, const _xmlNode *node, const QString &what)
{
    return failAt(ErrorCode::InvalidInput, file, xmlLine(node), 0, what);
}

// The element at the end of a path of local names below `node`, or null.
_xmlNode *descend(const _xmlNode *node, std::initializer_list<const char *> path)
{
    _xmlNode *at = const_cast<_xmlNode *>(node);
    for (const char *name : path) {
        if (!at)
            return nullptr;
        at = xmlFirstChild(at, name);
    }
    return at;
}

QString textAt(const _xmlNode *node, std::initializer_list<const char *> path)
{
    _xmlNode *at = descend(node, path);
    return at ? xmlSimpleText(at) : QString();
}

QString attributeAt(
    const _xmlNode *node, std::initializer_list<const char *> path, const char *name)
{
    _xmlNode *at = descend(node, path);
    return at ? xmlAttribute(at, name).trimmed() : QString();
}

QString joined(const QStringList &paragraphs)
{
    return paragraphs.join(QLatin1StringView("\n\n"));
}

void insertIfSet(QJsonObject &meta, const QString &key, const QString &value)
{
    if (!value.isEmpty())
        meta.insert(key, value);
}

QJsonObject subject(const QString &code, const QString &name)
{
    QJsonObject object {{QStringLiteral("code"), code}};
    if (!name.isEmpty())
        object.insert(QStringLiteral("name"), name);
    return object;
}

bool isNitf(const _xmlNode *node)
{
    const QString ns = xmlNamespace(node);
    return xmlLocalName(node) == u"nitf" && (ns.isEmpty() || ns.startsWith(nitfNamespacePrefix));
}

// The paragraphs of a NITF document's <body.content> (NITF 3.x: p, hl2, block, table, lists
// and media captions), read by the HTML reader's rules.
Result<QStringList> nitfBody(const _xmlNode *nitf, const QString &file)
{
    _xmlNode *content = descend(nitf, {"body", "body.content"});
    if (!content)
        return failed(file, nitf, ArticleReaderText::tr("the NITF document has no <body.content>"));
    return htmlParagraphs(content);
}

// A NITF 3.x document (IPTC NITF 3.x specification: head/docdata, body/body.head).
Status readNitf(_xmlNode *nitf, const QString &file, const ImportedArticleSink &take)
{
    ImportedArticle article;
    article.sourceLine = xmlLine(nitf);
    _xmlNode *head = xmlFirstChild(nitf, "head");
    _xmlNode *bodyHead = descend(nitf, {"body", "body.head"});
    _xmlNode *docdata = head ? xmlFirstChild(head, "docdata") : nullptr;

    article.externalId = attributeAt(docdata, {"doc-id"}, "id-string");
    if (article.externalId.isEmpty())
        article.externalId = QFileInfo(file).completeBaseName();
    article.title = textAt(bodyHead, {"hedline", "hl1"});
    if (article.title.isEmpty())
        article.title = textAt(head, {"title"});
    article.outlet = attributeAt(head, {"pubdata"}, "name");
    article.published = attributeAt(docdata, {"date.issue"}, "norm");
    if (article.published.isEmpty())
        article.published = attributeAt(bodyHead, {"dateline", "story.date"}, "norm");
    _xmlNode *body = xmlFirstChild(nitf, "body");
    article.language = xmlLanguage(body ? body : nitf);

    QJsonObject &meta = article.meta;
    insertIfSet(meta, QStringLiteral("byline"), textAt(bodyHead, {"byline"}));
    insertIfSet(meta, QStringLiteral("dateline"), textAt(bodyHead, {"dateline"}));
    QString provider = textAt(bodyHead, {"distributor"});
    if (provider.isEmpty())
        provider = attributeAt(docdata, {"doc-id"}, "regsrc");
    insertIfSet(meta, QStringLiteral("provider"), provider);
    if (_xmlNode *abstract = bodyHead ? xmlFirstChild(bodyHead, "abstract") : nullptr)
        insertIfSet(meta, QStringLiteral("abstract"), joined(htmlParagraphs(abstract)));
    QJsonArray subjects;
    QJsonArray keywords;
    if (head) {
        for (_xmlNode *tobject : xmlChildElements(head)) {
            if (xmlLocalName(tobject) != u"tobject")
                continue;
            for (_xmlNode *s : xmlChildElements(tobject)) {
                if (xmlLocalName(s) != u"tobject.subject")
                    continue;
                QString name = xmlAttribute(s, "tobject.subject.matter").trimmed();
                if (name.isEmpty())
                    name = xmlAttribute(s, "tobject.subject.type").trimmed();
                subjects.append(subject(xmlAttribute(s, "tobject.subject.refnum").trimmed(), name));
            }
        }
    }
    if (_xmlNode *keyList = docdata ? xmlFirstChild(docdata, "key-list") : nullptr) {
        for (_xmlNode *keyword : xmlChildElements(keyList))
            keywords.append(xmlAttribute(keyword, "key").trimmed());
    }
    if (!subjects.isEmpty())
        meta.insert(QStringLiteral("subjects"), subjects);
    if (!keywords.isEmpty())
        meta.insert(QStringLiteral("keywords"), keywords);

    Result<QStringList> paragraphs = nitfBody(nitf, file);
    if (!paragraphs)
        return std::unexpected(paragraphs.error());
    article.text = joined(*paragraphs);
    return take(std::move(article));
}

// The text of a newsItem's contentSet: the first inlineXML (NITF or XHTML) or inlineData
// (text/plain) it holds; the others are renditions of the same content (NewsML-G2
// specification, "contentSet").
Result<QStringList> newsItemText(_xmlNode *item, const QString &file)
{
    _xmlNode *contentSet = xmlFirstChild(item, "contentSet");
    if (!contentSet)
        return failed(file, item, ArticleReaderText::tr("the newsItem has no <contentSet>"));
    for (_xmlNode *content : xmlChildElements(contentSet)) {
        const QString name = xmlLocalName(content);
        const QString type = xmlAttribute(content, "contenttype").trimmed();
        if (name == u"inlineData") {
            if (!type.isEmpty() && type != u"text/plain")
                return failed(file, content,
                    ArticleReaderText::tr(
                        "<inlineData> of type \"%1\" cannot be read; Fourfold reads text/plain")
                        .arg(type));
            return plainTextParagraphs(xmlText(content), file, xmlLine(content));
        }
        if (name != u"inlineXML")
            continue;
        const std::vector<_xmlNode *> children = xmlChildElements(content);
        if (children.size() != 1)
            return failed(file, content,
                ArticleReaderText::tr("<inlineXML> must hold one element (NITF or XHTML)"));
        _xmlNode *document = children.front();
        if (isNitf(document))
            return nitfBody(document, file);
        if (xmlLocalName(document) == u"html") {
            _xmlNode *body = xmlFirstChild(document, "body");
            return htmlParagraphs(body ? body : document);
        }
        return failed(file, document,
            ArticleReaderText::tr("<inlineXML> holds <%1>; Fourfold reads NITF and XHTML")
                .arg(xmlQualifiedName(document)));
    }
    return failed(file, contentSet,
        ArticleReaderText::tr(
            "the newsItem holds no text inline (no <inlineXML> or <inlineData>); remote content "
            "is not fetched"));
}

// A NewsML-G2 newsItem (IPTC NewsML-G2 specification: itemMeta, contentMeta, contentSet).
Status readNewsItem(_xmlNode *item, const QString &file, const ImportedArticleSink &take)
{
    ImportedArticle article;
    article.sourceLine = xmlLine(item);
    article.externalId = xmlAttribute(item, "guid").trimmed();
    if (article.externalId.isEmpty())
        return failed(file, item, ArticleReaderText::tr("the newsItem has no guid"));
    article.language = xmlLanguage(item);
    _xmlNode *itemMeta = xmlFirstChild(item, "itemMeta");
    _xmlNode *contentMeta = xmlFirstChild(item, "contentMeta");
    article.title = textAt(contentMeta, {"headline"});
    for (const char *date : {"contentCreated", "firstCreated", "versionCreated"}) {
        if (article.published.isEmpty())
            article.published = textAt(contentMeta, {date});
        if (article.published.isEmpty())
            article.published = textAt(itemMeta, {date});
    }

    QJsonObject &meta = article.meta;
    insertIfSet(meta, QStringLiteral("version"), xmlAttribute(item, "version").trimmed());
    insertIfSet(meta, QStringLiteral("byline"), textAt(contentMeta, {"by"}));
    insertIfSet(meta, QStringLiteral("dateline"), textAt(contentMeta, {"dateline"}));
    insertIfSet(meta, QStringLiteral("slugline"), textAt(contentMeta, {"slugline"}));
    if (_xmlNode *provider = descend(itemMeta, {"provider"})) {
        // A provider is named by a literal, a qcode or a name child (NewsML-G2
        // "Flex1PartyPropType").
        QString name = textAt(provider, {"name"});
        if (name.isEmpty())
            name = xmlAttribute(provider, "literal").trimmed();
        if (name.isEmpty())
            name = xmlAttribute(provider, "qcode").trimmed();
        insertIfSet(meta, QStringLiteral("provider"), name);
    }
    QJsonArray subjects;
    if (contentMeta) {
        for (_xmlNode *s : xmlChildElements(contentMeta)) {
            if (xmlLocalName(s) != u"subject")
                continue;
            QString code = xmlAttribute(s, "qcode").trimmed();
            if (code.isEmpty())
                code = xmlAttribute(s, "uri").trimmed();
            subjects.append(subject(code, textAt(s, {"name"})));
        }
    }
    if (!subjects.isEmpty())
        meta.insert(QStringLiteral("subjects"), subjects);

    Result<QStringList> paragraphs = newsItemText(item, file);
    if (!paragraphs)
        return std::unexpected(paragraphs.error());
    article.text = joined(*paragraphs);
    return take(std::move(article));
}

// A newsMessage's itemSet (NewsML-G2 specification, "News Message").
Status readNewsMessage(_xmlNode *message, const QString &file, const ImportedArticleSink &take)
{
    _xmlNode *itemSet = xmlFirstChild(message, "itemSet");
    const std::vector<_xmlNode *> items =
        itemSet ? xmlChildElements(itemSet) : std::vector<_xmlNode *> {};
    if (items.empty())
        return failed(file, itemSet ? itemSet : message,
            ArticleReaderText::tr("the newsMessage holds no newsItem: it contains no articles"));
    for (_xmlNode *item : items) {
        if (xmlLocalName(item) != u"newsItem" || xmlNamespace(item) != g2Namespace)
            return failed(file, item,
                ArticleReaderText::tr(
                    "the newsMessage holds a <%1>; Fourfold imports newsItems only")
                    .arg(xmlQualifiedName(item)));
        FOURFOLD_TRY_STATUS(readNewsItem(item, file, take));
    }
    return {};
}

} // namespace

bool isNewsXmlRoot(const _xmlNode *root)
{
    const QString name = xmlLocalName(root);
    return isNitf(root)
        || (xmlNamespace(root) == g2Namespace && (name == u"newsItem" || name == u"newsMessage"));
}

Status readNewsXmlArticles(_xmlNode *root, const QString &file, const ImportedArticleSink &take)
{
    if (isNitf(root))
        return readNitf(root, file, take);
    if (xmlNamespace(root) == g2Namespace && xmlLocalName(root) == u"newsItem")
        return readNewsItem(root, file, take);
    if (xmlNamespace(root) == g2Namespace && xmlLocalName(root) == u"newsMessage")
        return readNewsMessage(root, file, take);
    return failAt(ErrorCode::Unsupported, file, xmlLine(root), 0,
        ArticleReaderText::tr(
            "the root element <%1> is not a news item's (<nitf>, or NewsML-G2's <newsItem> or "
            "<newsMessage>)")
            .arg(xmlQualifiedName(root)));
}

} // namespace fourfold
