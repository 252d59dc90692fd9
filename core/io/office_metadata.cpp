#include "core/io/office_metadata.h"

#include "core/io/document_text.h"
#include "core/io/xml_document.h"
#include "core/io/zip_archive.h"

#include <QCoreApplication>
#include <QFileInfo>
#include <QStringList>

#include <libxml/tree.h>

namespace fourfold {

OfficeMetadata readOfficeMetadata(_xmlNode *root)
{
    OfficeMetadata metadata;
    xmlNode *holder = root;
    // ODF: office:document-meta holds office:meta (ODF 1.2 part 1 §3.1.3.4).
    if (xmlLocalName(root) == u"document-meta") {
        holder = xmlFirstChild(root, "meta");
        if (!holder)
            return metadata;
    }
    QString creator;
    QString initialCreator;
    QStringList keywords;
    for (xmlNode *element : xmlChildElements(holder)) {
        const QString name = xmlLocalName(element);
        const QString value = xmlSimpleText(element);
        if (value.isEmpty())
            continue;
        if (name == u"title")
            metadata.title = value;
        else if (name == u"created" || name == u"creation-date")
            metadata.created = value;
        else if (name == u"language")
            metadata.language = value;
        else if (name == u"creator")
            creator = value;
        else if (name == u"initial-creator")
            initialCreator = value;
        else if (name == u"subject" || name == u"description")
            metadata.meta.insert(name, value);
        else if (name == u"keywords" || name == u"keyword")
            keywords.append(value);
        else if (name == u"modified" || (name == u"date" && xmlLocalName(root) == u"document-meta"))
            metadata.meta.insert(QStringLiteral("modified"), value);
    }
    // ODF's dc:creator is the person who last changed the document (ODF 1.2 part 1 §4.3.2.6);
    // meta:initial-creator is its author (§4.3.2.5). OPC's dc:creator is the author (ISO/IEC
    // 29500-2 §11.4).
    const QString author = !initialCreator.isEmpty() ? initialCreator : creator;
    if (!author.isEmpty())
        metadata.meta.insert(QStringLiteral("author"), author);
    if (!keywords.isEmpty())
        metadata.meta.insert(QStringLiteral("keywords"), keywords.join(QStringLiteral(", ")));
    return metadata;
}

Result<OfficeMetadata> readOfficeMetadataPart(ZipArchive &archive, const QString &part)
{
    if (!archive.contains(part))
        return OfficeMetadata {};
    Result<XmlDocument> document = parseZipPart(archive, part);
    if (!document)
        return std::unexpected(document.error());
    return readOfficeMetadata(document->root());
}

Result<ImportedArticle> officeDocumentArticle(
    const DocumentText &text, const OfficeMetadata &metadata, const QString &file)
{
    if (text.isEmpty())
        return failAt(ErrorCode::InvalidInput, file, 0, 0,
            QCoreApplication::translate(
                "ArticleReader", "the document holds no text: it contains no articles"));
    ImportedArticle article;
    const QString baseName = QFileInfo(file).completeBaseName();
    article.externalId = baseName;
    article.title = text.title(metadata.title, baseName);
    article.text = text.text(article.title);
    article.published = metadata.created;
    article.language = metadata.language;
    article.meta = metadata.meta;
    article.sourceLine = 1;
    return article;
}

} // namespace fourfold
