#pragma once
// An XML file parsed for the feed and news-item readers (libxml2), with the defences every XML
// input needs, and small helpers for reading its elements.

#include "core/model/error.h"

#include <QString>

#include <memory>
#include <vector>

struct _xmlDoc;
struct _xmlNode;

namespace fourfold {

class XmlDocument
{
public:
    // Parses the whole file's `bytes` (UTF-8; a BOM is dropped). Nothing is fetched: no network
    // (XML_PARSE_NONET), no DTD loaded, no external entity read, entities are not substituted by
    // the parser. Fails with InvalidInput naming `file` and the line: invalid UTF-8; an encoding
    // declaration other than UTF-8; XML that is not well-formed (libxml2's first error, its
    // message as the cause), which includes a cut-off file and an entity-expansion bomb
    // (libxml2's limits on entity amplification); a declared external entity, or a reference to
    // an entity that is not declared.
    static Result<XmlDocument> parse(const QByteArray &bytes, const QString &file);

    XmlDocument(XmlDocument &&) noexcept;
    XmlDocument &operator=(XmlDocument &&) noexcept;
    ~XmlDocument();

    _xmlNode *root() const;

private:
    struct Free {
        void operator()(_xmlDoc *doc) const;
    };
    explicit XmlDocument(_xmlDoc *doc);
    std::unique_ptr<_xmlDoc, Free> m_doc;
};

// The element's local name ("item" for <item> and <atom:item>).
QString xmlLocalName(const _xmlNode *node);
// The element's namespace URI, or empty.
QString xmlNamespace(const _xmlNode *node);
// The element's name as written in the file, with its prefix ("content:encoded").
QString xmlQualifiedName(const _xmlNode *node);
// The element's line in the file (1-based; 0 if libxml2 did not record it).
qint64 xmlLine(const _xmlNode *node);
// A libxml2 string (UTF-8; xmlChar is unsigned char) as a QString; a null string for nullptr.
QString fromXml(const unsigned char *text);
// The attribute's value (the attribute without a namespace), or a null string if absent.
QString xmlAttribute(const _xmlNode *node, const char *name);
// The value of the attribute of this local name in any namespace or none ("val" finds w:val), or
// a null string if absent.
QString xmlAnyAttribute(const _xmlNode *node, const char *localName);
// All the text inside the element, entities expanded, as written (not trimmed).
QString xmlText(const _xmlNode *node);
// xmlText with runs of whitespace made one space and trimmed.
QString xmlSimpleText(const _xmlNode *node);
// The language in scope (xml:lang on the element or an ancestor), or empty.
QString xmlLanguage(const _xmlNode *node);
// The element children of `node`, in document order.
std::vector<_xmlNode *> xmlChildElements(const _xmlNode *node);
// The first child element with this local name (any namespace), or null.
_xmlNode *xmlFirstChild(const _xmlNode *node, const char *localName);

} // namespace fourfold
