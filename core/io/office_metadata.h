#pragma once
// A document's own metadata as word-processing formats keep it: the core properties of an Office
// Open XML package (docProps/core.xml, ISO/IEC 29500-2 §11) and an OpenDocument's meta.xml (OASIS
// ODF 1.2 part 1 §4.3), both built on Dublin Core.

#include "core/io/imported_article.h"
#include "core/model/error.h"

#include <QJsonObject>
#include <QString>

struct _xmlNode;

namespace fourfold {

struct OfficeMetadata {
    QString title; // dc:title
    QString created; // dcterms:created (OPC) or meta:creation-date (ODF), as given
    QString language; // dc:language
    // author (OPC dc:creator; ODF meta:initial-creator, else dc:creator), subject, description,
    // keywords (one string; ODF's several meta:keyword joined by ", "), modified (dcterms:modified
    // or ODF's dc:date); only those the document sets.
    QJsonObject meta;
};

// Reads `root`, the root element of docProps/core.xml (cp:coreProperties) or of meta.xml
// (office:document-meta). Elements it does not know are left out (cp:lastModifiedBy names who
// saved the file last, not its author; statistics describe the file, not the article).
OfficeMetadata readOfficeMetadata(_xmlNode *root);

class DocumentText;
class ZipArchive;

// The metadata in the part `part` of `archive` (docProps/core.xml or meta.xml); empty metadata
// when the document has no such part; the part's error when it is not well-formed XML.
Result<OfficeMetadata> readOfficeMetadataPart(ZipArchive &archive, const QString &part);

// The one article a word-processing document `file` holds: its id the file's base name, its title
// from the metadata or the text (DocumentText::title), the text without the title, and the
// metadata's date, language and further fields. InvalidInput naming the file when the document
// holds no text.
Result<ImportedArticle> officeDocumentArticle(
    const DocumentText &text, const OfficeMetadata &metadata, const QString &file);

} // namespace fourfold
