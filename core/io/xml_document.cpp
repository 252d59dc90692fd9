#include "core/io/xml_document.h"

#include "core/text/canonical_text.h"

#include <QCoreApplication>
#include <QRegularExpression>

#include <libxml/entities.h>
#include <libxml/parser.h>
#include <libxml/tree.h>
#include <libxml/xmlerror.h>

#include <limits>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ArticleReaderText {
    Q_DECLARE_TR_FUNCTIONS(ArticleReaderText)
};

struct ContextFree {
    void operator()(xmlParserCtxt *context) const { xmlFreeParserCtxt(context); }
};

// The first error libxml2 reports while parsing (warnings are left out, but for a reference
// to an undeclared entity, which the parser lets pass when the document names an external DTD
// it does not read).
struct FirstError {
    const xmlParserCtxt *main = nullptr; // the parser of the file
    bool seen = false;
    int line = 0;
    QString message;
};

void keepFirstError(void *userData, xmlErrorPtr error)
{
    auto *context = static_cast<xmlParserCtxt *>(userData);
    auto *first = static_cast<FirstError *>(context->_private);
    if (!first || first->seen || !error)
        return;
    if (error->level < XML_ERR_ERROR && error->code != XML_WAR_UNDECLARED_ENTITY)
        return;
    first->seen = true;
    // Inside an entity's replacement text the parser counts that text's lines (in an input of
    // its own, or in a parser of its own that shares this handler); the place in the file is
    // where the main parser's first input, the file itself, has come to.
    const xmlParserCtxt *main = first->main;
    first->line = context != main || main->inputNr > 1
        ? (main->inputTab && main->inputTab[0] ? main->inputTab[0]->line : error->line)
        : error->line;
    first->message = error->message ? QString::fromUtf8(error->message).trimmed() : QString();
}

// The line of the first "<!ENTITY name" in the file, for an error about that declaration
// (libxml2 keeps no line for declarations); 0 if not found.
qint64 declarationLine(const QByteArray &bytes, const QString &name)
{
    static const QRegularExpression space(QStringLiteral("\\s+"));
    const QString text = QString::fromUtf8(bytes);
    const QRegularExpression declaration(
        QStringLiteral("<!ENTITY\\s+(?:%\\s+)?%1\\s").arg(QRegularExpression::escape(name)));
    const QRegularExpressionMatch match = declaration.match(text);
    if (!match.hasMatch())
        return 0;
    return text.first(match.capturedStart()).count(u'\n') + 1;
}

// Refuses external entities: an external entity declared in the internal subset (general or
// parameter), and any reference to an entity that is not declared (the parser keeps it as an
// empty reference when the document names a DTD it does not read).
Status checkEntities(xmlDoc *doc, const QByteArray &bytes, const QString &file)
{
    if (doc->intSubset) {
        for (xmlNode *node = doc->intSubset->children; node; node = node->next) {
            if (node->type != XML_ENTITY_DECL)
                continue;
            const auto *entity = reinterpret_cast<const xmlEntity *>(node);
            const bool external = entity->etype == XML_EXTERNAL_GENERAL_PARSED_ENTITY
                || entity->etype == XML_EXTERNAL_GENERAL_UNPARSED_ENTITY
                || entity->etype == XML_EXTERNAL_PARAMETER_ENTITY;
            if (external) {
                const QString name = fromXml(entity->name);
                return failAt(ErrorCode::InvalidInput, file, declarationLine(bytes, name), 0,
                    ArticleReaderText::tr(
                        "the file declares the external entity \"%1\" (%2); Fourfold reads "
                        "nothing from outside the file")
                        .arg(name, fromXml(entity->SystemID)));
            }
        }
    }
    // Depth first without recursion.
    xmlNode *node = xmlDocGetRootElement(doc);
    while (node) {
        if (node->type == XML_ENTITY_REF_NODE) {
            if (!node->children) {
                const qint64 line = node->parent ? xmlGetLineNo(node->parent) : 0;
                return failAt(ErrorCode::InvalidInput, file, line, 0,
                    ArticleReaderText::tr("the entity \"&%1;\" is not declared in the file")
                        .arg(fromXml(node->name)));
            }
        } else if (node->children) {
            node = node->children;
            continue;
        }
        while (node && !node->next)
            node = node->parent;
        if (node)
            node = node->next;
    }
    return {};
}

} // namespace

void XmlDocument::Free::operator()(_xmlDoc *doc) const
{
    xmlFreeDoc(doc);
}

XmlDocument::XmlDocument(_xmlDoc *doc)
    : m_doc(doc)
{ }

XmlDocument::XmlDocument(XmlDocument &&) noexcept = default;
XmlDocument &XmlDocument::operator=(XmlDocument &&) noexcept = default;
XmlDocument::~XmlDocument() = default;

_xmlNode *XmlDocument::root() const
{
    return xmlDocGetRootElement(m_doc.get());
}

Result<XmlDocument> XmlDocument::parse(const QByteArray &bytes, const QString &file)
{
    Result<QString> decoded = decodeUtf8Strict(bytes, file);
    if (!decoded)
        return std::unexpected(decoded.error());
    // The XML declaration's encoding (XML 1.0 §4.3.3): the file is read as UTF-8, so one that
    // says otherwise is refused rather than read as something it is not.
    static const QRegularExpression declaration(
        QStringLiteral("^\\s*<\\?xml[^>]*\\bencoding\\s*=\\s*[\"']([^\"']*)[\"']"));
    const QRegularExpressionMatch match =
        declaration.match(decoded->first(std::min<qsizetype>(decoded->size(), 200)));
    if (match.hasMatch()) {
        const QString encoding = match.captured(1);
        if (encoding.compare(u"utf-8", Qt::CaseInsensitive) != 0
            && encoding.compare(u"utf8", Qt::CaseInsensitive) != 0) {
            return failAt(ErrorCode::InvalidInput, file, 1, 0,
                ArticleReaderText::tr(
                    "the file declares the encoding \"%1\"; convert it to UTF-8 first")
                    .arg(encoding));
        }
    }

    static const bool initialised = [] {
        xmlInitParser();
        return true;
    }();
    Q_UNUSED(initialised);
    const qsizetype skip = bytes.startsWith("\xEF\xBB\xBF") ? 3 : 0;
    if (bytes.size() - skip > std::numeric_limits<int>::max())
        return failAt(ErrorCode::InvalidInput, file, 0, 0,
            ArticleReaderText::tr("the file is too large for the XML parser"));
    const std::unique_ptr<xmlParserCtxt, ContextFree> context(xmlNewParserCtxt());
    if (!context)
        return failAt(ErrorCode::Internal, file, 0, 0,
            ArticleReaderText::tr("the XML parser could not be started"));
    FirstError first;
    first.main = context.get();
    context->_private = &first;
    context->sax->serror = keepFirstError;
    // No XML_PARSE_NOENT (it would read external entities) and no XML_PARSE_DTDLOAD; internal
    // entities are kept as references and read when the text is read. XML_PARSE_HUGE is not
    // set, so libxml2's limits on entity amplification apply.
    const int options = int(XML_PARSE_NONET) | int(XML_PARSE_NOERROR) | int(XML_PARSE_NOWARNING)
        | int(XML_PARSE_NOCDATA);
    std::unique_ptr<xmlDoc, Free> doc(xmlCtxtReadMemory(context.get(), bytes.constData() + skip,
        static_cast<int>(bytes.size() - skip), nullptr, "UTF-8", options));
    if (first.seen || !doc || context->wellFormed == 0) {
        const xmlError *last = xmlCtxtGetLastError(context.get());
        const qint64 line = first.seen ? first.line : last ? last->line : 0;
        const QString cause = first.seen ? first.message
            : last && last->message      ? QString::fromUtf8(last->message).trimmed()
                                         : QString();
        const bool amplified = cause.contains(u"entity reference loop")
            || cause.contains(u"amplification") || cause.contains(u"Maximum entity");
        auto error = failAt(ErrorCode::InvalidInput, file, line, 0,
            amplified ? ArticleReaderText::tr(
                "the XML is refused: its entities expand too far (an entity-expansion "
                "bomb?): %1")
                            .arg(cause)
                      : ArticleReaderText::tr("the file is not well-formed XML: %1").arg(cause));
        error.error().cause = cause;
        return error;
    }
    FOURFOLD_TRY_STATUS(checkEntities(doc.get(), bytes, file));
    if (!xmlDocGetRootElement(doc.get()))
        return failAt(ErrorCode::InvalidInput, file, 0, 0,
            ArticleReaderText::tr("the file holds no XML element"));
    return XmlDocument(doc.release());
}

QString xmlLocalName(const _xmlNode *node)
{
    return fromXml(node->name);
}

QString xmlNamespace(const _xmlNode *node)
{
    return node->ns ? fromXml(node->ns->href) : QString();
}

QString xmlQualifiedName(const _xmlNode *node)
{
    if (node->ns && node->ns->prefix)
        return fromXml(node->ns->prefix) + u':' + fromXml(node->name);
    return fromXml(node->name);
}

QString fromXml(const xmlChar *text)
{
    return text ? QString::fromUtf8(reinterpret_cast<const char *>(text)) : QString();
}

qint64 xmlLine(const _xmlNode *node)
{
    return std::max<long>(0, xmlGetLineNo(node));
}

QString xmlAttribute(const _xmlNode *node, const char *name)
{
    xmlChar *value = xmlGetNoNsProp(node, reinterpret_cast<const xmlChar *>(name));
    QString result = fromXml(value);
    xmlFree(value);
    return result;
}

QString xmlAnyAttribute(const _xmlNode *node, const char *localName)
{
    for (const xmlAttr *attribute = node->properties; attribute; attribute = attribute->next) {
        if (xmlStrEqual(attribute->name, reinterpret_cast<const xmlChar *>(localName))) {
            xmlChar *value = xmlNodeListGetString(node->doc, attribute->children, 1);
            QString result = fromXml(value);
            xmlFree(value);
            return result.isNull() ? QStringLiteral("") : result;
        }
    }
    return {};
}

QString xmlText(const _xmlNode *node)
{
    xmlChar *content = xmlNodeGetContent(node);
    QString result = fromXml(content);
    xmlFree(content);
    return result;
}

QString xmlSimpleText(const _xmlNode *node)
{
    return xmlText(node).simplified();
}

QString xmlLanguage(const _xmlNode *node)
{
    xmlChar *lang = xmlNodeGetLang(node);
    QString result = fromXml(lang).trimmed();
    xmlFree(lang);
    return result;
}

std::vector<_xmlNode *> xmlChildElements(const _xmlNode *node)
{
    std::vector<_xmlNode *> children;
    for (_xmlNode *child = node->children; child; child = child->next) {
        if (child->type == XML_ELEMENT_NODE)
            children.push_back(child);
    }
    return children;
}

_xmlNode *xmlFirstChild(const _xmlNode *node, const char *localName)
{
    for (_xmlNode *child = node->children; child; child = child->next) {
        if (child->type == XML_ELEMENT_NODE
            && xmlStrEqual(child->name, reinterpret_cast<const xmlChar *>(localName)))
            return child;
    }
    return nullptr;
}

} // namespace fourfold
