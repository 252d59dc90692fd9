#include "core/io/odt_reader.h"

#include "core/io/document_text.h"
#include "core/io/office_metadata.h"
#include "core/io/xml_document.h"

#include <QCoreApplication>
#include <QHash>

#include <libxml/tree.h>

// Section numbers are those of OASIS ODF 1.2 part 1 (schema) and part 3 (packages), from memory.

namespace fourfold {

namespace {

const QString officeNamespace = QStringLiteral("urn:oasis:names:tc:opendocument:xmlns:office:1.0");
const QString textNamespace = QStringLiteral("urn:oasis:names:tc:opendocument:xmlns:text:1.0");
const QString tableNamespace = QStringLiteral("urn:oasis:names:tc:opendocument:xmlns:table:1.0");
const QString drawNamespace = QStringLiteral("urn:oasis:names:tc:opendocument:xmlns:drawing:1.0");
const QString styleNamespace = QStringLiteral("urn:oasis:names:tc:opendocument:xmlns:style:1.0");
// The media type of a text document (part 3 §3.3, the mimetype entry; appendix C).
const QString textMediaType = QStringLiteral("application/vnd.oasis.opendocument.text");

// The sentences of this file, under a context that lupdate collects.
struct ArticleReaderText {
    Q_DECLARE_TR_FUNCTIONS(ArticleReaderText)
};

bool is(const xmlNode *node, const QString &ns, const char16_t *localName)
{
    return node->type == XML_ELEMENT_NODE && xmlNamespace(node) == ns
        && xmlLocalName(node) == localName;
}

// The paragraph styles of the document: which are the Title style or based on it (part 1
// §16.2 style:style, style:parent-style-name), from styles.xml's named styles and
// content.xml's automatic ones.
class Styles
{
public:
    void read(xmlNode *stylesRoot)
    {
        for (xmlNode *group : xmlChildElements(stylesRoot)) {
            if (!is(group, officeNamespace, u"styles")
                && !is(group, officeNamespace, u"automatic-styles"))
                continue;
            for (xmlNode *style : xmlChildElements(group)) {
                if (is(style, styleNamespace, u"style"))
                    m_parent.insert(xmlAnyAttribute(style, "name"),
                        xmlAnyAttribute(style, "parent-style-name"));
            }
        }
    }

    bool isTitle(QString name) const
    {
        for (int depth = 0; depth < 16 && !name.isEmpty(); ++depth) {
            if (name == u"Title")
                return true;
            name = m_parent.value(name);
        }
        return false;
    }

private:
    QHash<QString, QString> m_parent;
};

class BodyReader
{
public:
    BodyReader(const Styles &styles, DocumentText &text)
        : m_styles(styles)
        , m_text(text)
    { }

    // Block content (part 1 §5.1 office:text, §5.3 lists, §5.4 sections, §9.1 tables): paragraphs
    // and headings; lists, sections and tables (row by row, cell by cell) read through.
    void blocks(xmlNode *parent)
    {
        for (xmlNode *node : xmlChildElements(parent)) {
            const QString ns = xmlNamespace(node);
            const QString name = xmlLocalName(node);
            if (ns == textNamespace && name == u"p") {
                paragraph(node,
                    m_styles.isTitle(xmlAnyAttribute(node, "style-name"))
                        ? DocumentText::Kind::Title
                        : DocumentText::Kind::Body,
                    0);
            } else if (ns == textNamespace && name == u"h") {
                // text:outline-level, 1 when absent (part 1 §5.1.2).
                const QString level = xmlAnyAttribute(node, "outline-level");
                paragraph(node, DocumentText::Kind::Heading, level.isEmpty() ? 1 : level.toInt());
            } else if ((ns == textNamespace
                           && (name == u"list" || name == u"list-item" || name == u"list-header"
                               || name == u"section"))
                || (ns == tableNamespace
                    && (name == u"table" || name == u"table-row" || name == u"table-rows"
                        || name == u"table-header-rows" || name == u"table-row-group"
                        || name == u"table-cell"))) {
                blocks(node);
            }
            // Anything else holds no article text: tracked changes (the deleted text, §5.5),
            // generated indexes and tables of contents, declarations, forms, covered cells.
        }
    }

private:
    void paragraph(xmlNode *p, DocumentText::Kind kind, int level)
    {
        QString line;
        std::vector<xmlNode *> boxes;
        inlineText(p, line, boxes, true);
        m_text.addParagraph(line, kind, level);
        for (xmlNode *box : boxes)
            blocks(box);
    }

    // A paragraph's text (part 1 §6.1): character data with its white space collapsed (§6.1.2:
    // tabs and line ends are spaces, runs of spaces one), text:s spaces, text:tab a space,
    // text:line-break a line break; spans, links, fields and other marks read through; a note
    // becomes its marker; annotations (comments), ruby text and the citation of a note are
    // left out; a frame's text box follows the paragraph.
    void inlineText(xmlNode *parent, QString &out, std::vector<xmlNode *> &boxes, bool notes)
    {
        for (xmlNode *node = parent->children; node; node = node->next) {
            if (node->type == XML_TEXT_NODE || node->type == XML_CDATA_SECTION_NODE) {
                QString text = fromXml(node->content);
                for (QChar &c : text) {
                    if (c == u'\t' || c == u'\n' || c == u'\r')
                        c = u' ';
                }
                out += text;
                continue;
            }
            if (node->type == XML_ENTITY_REF_NODE) {
                out += xmlText(node);
                continue;
            }
            if (node->type != XML_ELEMENT_NODE)
                continue;
            const QString ns = xmlNamespace(node);
            const QString name = xmlLocalName(node);
            if (ns == textNamespace && name == u"s") {
                out += u' ';
            } else if (ns == textNamespace && name == u"tab") {
                out += u' ';
            } else if (ns == textNamespace && name == u"line-break") {
                out += u'\n';
            } else if (ns == textNamespace && name == u"note") {
                if (notes)
                    out += note(node);
            } else if (ns == drawNamespace && name == u"text-box") {
                boxes.push_back(node);
            } else if ((ns == officeNamespace && name == u"annotation")
                || (ns == textNamespace
                    && (name == u"ruby-text" || name == u"tracked-changes"
                        || name == u"note-citation"))) {
                continue;
            } else {
                inlineText(node, out, boxes, notes);
            }
        }
    }

    QString note(xmlNode *noteElement)
    {
        QStringList paragraphs;
        if (xmlNode *body = xmlFirstChild(noteElement, "note-body")) {
            for (xmlNode *p : xmlChildElements(body)) {
                QString line;
                std::vector<xmlNode *> boxes;
                inlineText(p, line, boxes, false);
                paragraphs.append(line);
            }
        }
        return m_text.addNote(paragraphs);
    }

    const Styles &m_styles;
    DocumentText &m_text;
};

// Whether META-INF/manifest.xml says that an entry is encrypted (part 3 §4.4,
// manifest:encryption-data).
Result<bool> manifestSaysEncrypted(ZipArchive &archive)
{
    const QString manifest = QStringLiteral("META-INF/manifest.xml");
    if (!archive.contains(manifest))
        return false;
    Result<XmlDocument> parsed = parseZipPart(archive, manifest);
    if (!parsed)
        return std::unexpected(parsed.error());
    for (xmlNode *entry : xmlChildElements(parsed->root())) {
        if (xmlFirstChild(entry, "encryption-data"))
            return true;
    }
    return false;
}

} // namespace

Result<ImportedArticle> readOdtArticle(
    const QByteArray &bytes, const QString &file, const ZipLimits &limits)
{
    Result<ZipArchive> opened = ZipArchive::open(bytes, file, limits);
    if (!opened)
        return std::unexpected(opened.error());
    ZipArchive &archive = *opened;

    // The mimetype entry names the kind of package (part 3 §3.3).
    if (archive.contains(QStringLiteral("mimetype"))) {
        Result<QByteArray> mimetype = archive.read(QStringLiteral("mimetype"));
        if (!mimetype)
            return std::unexpected(mimetype.error());
        const QString type = QString::fromUtf8(*mimetype).trimmed();
        if (type != textMediaType && type != textMediaType + QStringLiteral("-template"))
            return failAt(ErrorCode::InvalidInput, file, 0, 0,
                ArticleReaderText::tr(
                    "the package is of the type \"%1\", not an OpenDocument text (%2)")
                    .arg(type, textMediaType));
    }
    Result<bool> encrypted = manifestSaysEncrypted(archive);
    if (!encrypted)
        return std::unexpected(encrypted.error());
    if (*encrypted)
        return failAt(ErrorCode::InvalidInput, file, 0, 0,
            ArticleReaderText::tr(
                "the document is encrypted (its manifest holds encryption data); save it without "
                "a password first"));
    const QString contentPart = QStringLiteral("content.xml");
    if (!archive.contains(contentPart))
        return failAt(ErrorCode::InvalidInput, file, 0, 0,
            ArticleReaderText::tr(
                "the archive holds no content.xml: it is not an OpenDocument text"));
    Result<XmlDocument> content = parseZipPart(archive, contentPart);
    if (!content)
        return std::unexpected(content.error());
    xmlNode *root = content->root();
    if (!is(root, officeNamespace, u"document-content"))
        return zipPartFailed(archive, contentPart, root,
            ArticleReaderText::tr("the root element is <%1>, not <office:document-content>")
                .arg(xmlQualifiedName(root)));
    xmlNode *body = xmlFirstChild(root, "body");
    xmlNode *officeText = body ? xmlFirstChild(body, "text") : nullptr;
    if (!officeText)
        return zipPartFailed(archive, contentPart, body ? body : root,
            ArticleReaderText::tr(
                "the document has no <office:text> body: it is not a text document"));

    Styles styles;
    const QString stylesPart = QStringLiteral("styles.xml");
    if (archive.contains(stylesPart)) {
        Result<XmlDocument> parsed = parseZipPart(archive, stylesPart);
        if (!parsed)
            return std::unexpected(parsed.error());
        styles.read(parsed->root());
    }
    styles.read(root); // the automatic styles of content.xml
    DocumentText text;
    BodyReader(styles, text).blocks(officeText);

    Result<OfficeMetadata> metadata = readOfficeMetadataPart(archive, QStringLiteral("meta.xml"));
    if (!metadata)
        return std::unexpected(metadata.error());
    return officeDocumentArticle(text, *metadata, file);
}

} // namespace fourfold
