#include "core/io/docx_reader.h"

#include "core/io/document_text.h"
#include "core/io/office_metadata.h"
#include "core/io/xml_document.h"

#include <QCoreApplication>
#include <QHash>
#include <QRegularExpression>

#include <libxml/tree.h>

#include <optional>

namespace fourfold {

namespace {

// WordprocessingML's namespace, transitional (ISO/IEC 29500-4, ECMA-376) and strict
// (ISO/IEC 29500-1 §17).
const QString wordTransitional =
    QStringLiteral("http://schemas.openxmlformats.org/wordprocessingml/2006/main");
const QString wordStrict = QStringLiteral("http://purl.oclc.org/ooxml/wordprocessingml/main");
// Markup compatibility (ISO/IEC 29500-3 §10.2): mc:AlternateContent's choices.
const QString markupCompatibility =
    QStringLiteral("http://schemas.openxmlformats.org/markup-compatibility/2006");

// The sentences of this file, under a context that lupdate collects.
struct ArticleReaderText {
    Q_DECLARE_TR_FUNCTIONS(ArticleReaderText)
};

bool isWord(const xmlNode *node)
{
    const QString ns = xmlNamespace(node);
    return ns == wordTransitional || ns == wordStrict;
}

bool isWord(const xmlNode *node, const char16_t *localName)
{
    return node->type == XML_ELEMENT_NODE && isWord(node) && xmlLocalName(node) == localName;
}

// The relationships of a part (Open Packaging Conventions, ISO/IEC 29500-2 §9.3): the target of
// each relationship type's last segment ("officeDocument", "styles", "footnotes"), resolved
// against the part's folder; empty when the part has no relationships.
Result<QHash<QString, QString>> relationships(ZipArchive &archive, const QString &part)
{
    const qsizetype slash = part.lastIndexOf(u'/');
    const QString folder = slash >= 0 ? part.first(slash + 1) : QString();
    const QString relsPart =
        folder + QStringLiteral("_rels/") + part.sliced(slash + 1) + QStringLiteral(".rels");
    QHash<QString, QString> targets;
    if (!archive.contains(relsPart))
        return targets;
    Result<XmlDocument> rels = parseZipPart(archive, relsPart);
    if (!rels)
        return std::unexpected(rels.error());
    for (xmlNode *relationship : xmlChildElements(rels->root())) {
        if (xmlLocalName(relationship) != u"Relationship"
            || xmlAttribute(relationship, "TargetMode") == u"External")
            continue;
        const QString type = xmlAttribute(relationship, "Type");
        const QString kind = type.sliced(type.lastIndexOf(u'/') + 1);
        const QString target =
            resolveZipPath(folder + QStringLiteral("x"), xmlAttribute(relationship, "Target"));
        if (!kind.isEmpty() && !target.isEmpty() && !targets.contains(kind))
            targets.insert(kind, target);
    }
    return targets;
}

// What a paragraph style makes of a paragraph (ISO/IEC 29500-1 §17.7.4.17 style, §17.3.1.20
// outlineLvl): the Title style, a heading of a level, or body text.
struct StyleKind {
    DocumentText::Kind kind = DocumentText::Kind::Body;
    int level = 0;
};

class Styles
{
public:
    void read(xmlNode *root)
    {
        for (xmlNode *style : xmlChildElements(root)) {
            if (!isWord(style, u"style") || xmlAnyAttribute(style, "type") != u"paragraph")
                continue;
            Entry entry;
            if (xmlNode *name = xmlFirstChild(style, "name"))
                entry.name = xmlAnyAttribute(name, "val").toLower();
            if (xmlNode *based = xmlFirstChild(style, "basedOn"))
                entry.basedOn = xmlAnyAttribute(based, "val");
            if (xmlNode *pPr = xmlFirstChild(style, "pPr")) {
                if (xmlNode *outline = xmlFirstChild(pPr, "outlineLvl"))
                    entry.outline = xmlAnyAttribute(outline, "val").toInt() + 1;
            }
            m_styles.insert(xmlAnyAttribute(style, "styleId"), entry);
        }
    }

    // The built-in names "Title" and "heading 1" … "heading 9" (ISO/IEC 29500-1 §17.7.4.9, the
    // latent styles; Word writes them in lower case), an outline level in the style, or one of
    // the styles it is based on; without styles.xml the ids "Title" and "Heading1" … (common
    // practice: the ids Word gives these styles).
    StyleKind kindOf(const QString &styleId) const
    {
        QString id = styleId;
        for (int depth = 0; depth < 16 && !id.isEmpty(); ++depth) {
            const auto found = m_styles.constFind(id);
            const QString name = found != m_styles.cend() ? found->name : id.toLower();
            static const QRegularExpression heading(QStringLiteral("^heading ?([1-9])$"));
            if (name == u"title")
                return {DocumentText::Kind::Title, 0};
            if (const auto match = heading.match(name); match.hasMatch())
                return {DocumentText::Kind::Heading, match.captured(1).toInt()};
            if (found == m_styles.cend())
                break;
            if (found->outline >= 1 && found->outline <= 9)
                return {DocumentText::Kind::Heading, found->outline};
            id = found->basedOn;
        }
        return {};
    }

private:
    struct Entry {
        QString name;
        QString basedOn;
        int outline = 0;
    };
    QHash<QString, Entry> m_styles;
};

// The footnotes or endnotes of a part (§17.11): each note's element by its id.
QHash<QString, xmlNode *> notesById(xmlNode *root)
{
    QHash<QString, xmlNode *> notes;
    for (xmlNode *note : xmlChildElements(root)) {
        const QString type = xmlAnyAttribute(note, "type");
        // The separator lines between text and notes are not notes (§17.18.33 ST_FtnEdn).
        if (type.isEmpty() || type == u"normal")
            notes.insert(xmlAnyAttribute(note, "id"), note);
    }
    return notes;
}

class BodyReader
{
public:
    BodyReader(ZipArchive &archive, const Styles &styles, DocumentText &text)
        : m_archive(archive)
        , m_styles(styles)
        , m_text(text)
    { }

    QHash<QString, xmlNode *> footnotes;
    QHash<QString, xmlNode *> endnotes;
    QString footnotesPart;
    QString endnotesPart;
    QString mainPart;

    // Block-level content (§17.2.2 body, §17.4.66 tc, §17.5.2.38 sdtContent): paragraphs and
    // tables, read row by row and cell by cell, each cell's paragraphs as paragraphs.
    Status blocks(xmlNode *parent)
    {
        for (xmlNode *node : xmlChildElements(parent)) {
            if (!isWord(node))
                continue;
            const QString name = xmlLocalName(node);
            if (name == u"p") {
                FOURFOLD_TRY_STATUS(paragraph(node));
            } else if (name == u"tbl" || name == u"tr" || name == u"tc" || name == u"sdt"
                || name == u"sdtContent" || name == u"customXml" || name == u"ins"
                || name == u"moveTo") {
                FOURFOLD_TRY_STATUS(blocks(node));
            }
            // Anything else (sectPr, bookmarks, tblPr, trPr, del, moveFrom) holds no text that
            // is read.
        }
        return {};
    }

private:
    Status paragraph(xmlNode *p)
    {
        StyleKind kind;
        if (xmlNode *pPr = xmlFirstChild(p, "pPr")) {
            if (xmlNode *style = xmlFirstChild(pPr, "pStyle"))
                kind = m_styles.kindOf(xmlAnyAttribute(style, "val"));
            if (xmlNode *outline = xmlFirstChild(pPr, "outlineLvl")) {
                const int level = xmlAnyAttribute(outline, "val").toInt() + 1;
                if (level >= 1 && level <= 9)
                    kind = {DocumentText::Kind::Heading, level};
            }
        }
        QString line;
        std::vector<xmlNode *> boxes;
        FOURFOLD_TRY_STATUS(inlineText(p, line, boxes, true));
        m_text.addParagraph(line, kind.kind, kind.level);
        // Text boxes anchored in the paragraph (txbxContent, ISO/IEC 29500-1 §17.17.1) follow it.
        for (xmlNode *box : boxes)
            FOURFOLD_TRY_STATUS(blocks(box));
        return {};
    }

    // The text of a paragraph's runs (§17.3.3): w:t, tabs and breaks; deleted text (w:del,
    // w:delText, w:moveFrom), field instructions (w:instrText) and the fallback of
    // mc:AlternateContent are left out; a note reference becomes its marker.
    Status inlineText(xmlNode *parent, QString &out, std::vector<xmlNode *> &boxes, bool notes)
    {
        for (xmlNode *node = parent->children; node; node = node->next) {
            if (node->type != XML_ELEMENT_NODE)
                continue;
            if (xmlNamespace(node) == markupCompatibility) {
                if (xmlLocalName(node) == u"AlternateContent") {
                    if (xmlNode *choice = xmlFirstChild(node, "Choice"))
                        FOURFOLD_TRY_STATUS(inlineText(choice, out, boxes, notes));
                }
                continue;
            }
            if (!isWord(node)) {
                // DrawingML and VML around a text box: look inside for txbxContent.
                FOURFOLD_TRY_STATUS(inlineText(node, out, boxes, notes));
                continue;
            }
            const QString name = xmlLocalName(node);
            if (name == u"t") {
                out += xmlText(node);
            } else if (name == u"tab" || name == u"ptab") {
                out += u' ';
            } else if (name == u"br") {
                const QString type = xmlAnyAttribute(node, "type");
                out += type.isEmpty() || type == u"textWrapping" ? u'\n' : u' ';
            } else if (name == u"cr") {
                out += u'\n';
            } else if (name == u"noBreakHyphen") {
                out += u'-';
            } else if (name == u"txbxContent") {
                boxes.push_back(node);
            } else if (name == u"footnoteReference" || name == u"endnoteReference") {
                if (notes)
                    FOURFOLD_TRY_STATUS(noteReference(node, name == u"footnoteReference"));
                if (notes)
                    out += m_lastMarker;
            } else if (name == u"del" || name == u"moveFrom" || name == u"delText"
                || name == u"instrText" || name == u"pPr" || name == u"rPr"
                || name == u"footnoteRef" || name == u"endnoteRef" || name == u"softHyphen") {
                continue;
            } else {
                // r, hyperlink, ins, moveTo, smartTag, fldSimple, sdt, sdtContent, customXml, …
                FOURFOLD_TRY_STATUS(inlineText(node, out, boxes, notes));
            }
        }
        return {};
    }

    Status noteReference(xmlNode *reference, bool footnote)
    {
        const QString id = xmlAnyAttribute(reference, "id");
        const QHash<QString, xmlNode *> &notes = footnote ? footnotes : endnotes;
        const auto found = notes.constFind(id);
        if (found == notes.cend()) {
            return zipPartFailed(m_archive, mainPart, reference,
                (footnote ? ArticleReaderText::tr(
                     "the footnote %1 is referred to but %2 does not hold it")
                          : ArticleReaderText::tr(
                              "the endnote %1 is referred to but %2 does not hold it"))
                    .arg(id,
                        footnote ? (footnotesPart.isEmpty() ? QStringLiteral("word/footnotes.xml")
                                                            : footnotesPart)
                                 : (endnotesPart.isEmpty() ? QStringLiteral("word/endnotes.xml")
                                                           : endnotesPart)));
        }
        QStringList paragraphs;
        for (xmlNode *p : xmlChildElements(*found)) {
            if (!isWord(p, u"p"))
                continue;
            QString line;
            std::vector<xmlNode *> boxes;
            FOURFOLD_TRY_STATUS(inlineText(p, line, boxes, false));
            paragraphs.append(line);
        }
        m_lastMarker = m_text.addNote(paragraphs);
        return {};
    }

    ZipArchive &m_archive;
    const Styles &m_styles;
    DocumentText &m_text;
    QString m_lastMarker;
};

} // namespace

Result<ImportedArticle> readDocxArticle(
    const QByteArray &bytes, const QString &file, const ZipLimits &limits)
{
    // A password-protected Office document is not a zip package but an OLE compound file holding
    // the encrypted package ([MS-OFFCRYPTO] §2.3.4; the signature of [MS-CFB] §2.2), as is an old
    // binary .doc.
    if (bytes.startsWith("\xD0\xCF\x11\xE0\xA1\xB1\x1A\xE1"))
        return failAt(ErrorCode::InvalidInput, file, 0, 0,
            ArticleReaderText::tr(
                "the file is an OLE compound file, not a zip package: a password-protected "
                "(encrypted) Office document or an old binary .doc; save it as .docx without a "
                "password first"));
    Result<ZipArchive> opened = ZipArchive::open(bytes, file, limits);
    if (!opened)
        return std::unexpected(opened.error());
    ZipArchive &archive = *opened;

    // The package's relationships name the main part (ISO/IEC 29500-2 §9.3, the
    // officeDocument relationship) and the core properties (§11).
    Result<QHash<QString, QString>> package = relationships(archive, QString());
    if (!package)
        return std::unexpected(package.error());
    const QString mainPart =
        package->value(QStringLiteral("officeDocument"), QStringLiteral("word/document.xml"));
    if (!archive.contains(mainPart))
        return failAt(ErrorCode::InvalidInput, file, 0, 0,
            ArticleReaderText::tr(
                "the archive holds no %1: it is not a word-processing document (DOCX)")
                .arg(mainPart));
    Result<XmlDocument> document = parseZipPart(archive, mainPart);
    if (!document)
        return std::unexpected(document.error());
    xmlNode *root = document->root();
    if (!isWord(root, u"document"))
        return zipPartFailed(archive, mainPart, root,
            ArticleReaderText::tr(
                "the root element is <%1>, not WordprocessingML's <w:document>: the file is not a "
                "word-processing document")
                .arg(xmlQualifiedName(root)));
    xmlNode *body = xmlFirstChild(root, "body");
    if (!body)
        return zipPartFailed(
            archive, mainPart, root, ArticleReaderText::tr("the document has no <w:body>"));

    Result<QHash<QString, QString>> parts = relationships(archive, mainPart);
    if (!parts)
        return std::unexpected(parts.error());
    Styles styles;
    if (const QString part = parts->value(QStringLiteral("styles")); archive.contains(part)) {
        Result<XmlDocument> parsed = parseZipPart(archive, part);
        if (!parsed)
            return std::unexpected(parsed.error());
        styles.read(parsed->root());
    }
    DocumentText text;
    BodyReader reader(archive, styles, text);
    reader.mainPart = mainPart;
    // The notes parts (§17.11.7 footnotes, §17.11.4 endnotes), kept parsed while the body is
    // read.
    std::optional<XmlDocument> footnotes;
    std::optional<XmlDocument> endnotes;
    const auto readNotes = [&](const QString &kind, std::optional<XmlDocument> &notesDocument,
                               QHash<QString, xmlNode *> &notes, QString &partName) -> Status {
        const QString part = parts->value(kind);
        if (part.isEmpty() || !archive.contains(part))
            return {};
        Result<XmlDocument> parsed = parseZipPart(archive, part);
        if (!parsed)
            return std::unexpected(parsed.error());
        notesDocument = std::move(*parsed);
        notes = notesById(notesDocument->root());
        partName = part;
        return {};
    };
    FOURFOLD_TRY_STATUS(
        readNotes(QStringLiteral("footnotes"), footnotes, reader.footnotes, reader.footnotesPart));
    FOURFOLD_TRY_STATUS(
        readNotes(QStringLiteral("endnotes"), endnotes, reader.endnotes, reader.endnotesPart));
    FOURFOLD_TRY_STATUS(reader.blocks(body));

    Result<OfficeMetadata> metadata = readOfficeMetadataPart(archive,
        package->value(QStringLiteral("core-properties"), QStringLiteral("docProps/core.xml")));
    if (!metadata)
        return std::unexpected(metadata.error());
    return officeDocumentArticle(text, *metadata, file);
}

} // namespace fourfold
