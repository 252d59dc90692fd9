#include "core/io/epub_reader.h"

#include "core/io/html_reader.h"
#include "core/io/xml_document.h"
#include "core/text/canonical_text.h"

#include <QCoreApplication>
#include <QFileInfo>
#include <QHash>
#include <QSet>
#include <QStringList>

#include <libxml/tree.h>

#include <optional>

// Section numbers are those of EPUB 3.2 (W3C's EPUB 3 Community Group, 2019), from memory: Open
// Container Format (OCF) and Packages.

namespace fourfold {

namespace {

const QString epubMediaType = QStringLiteral("application/epub+zip");
// IDPF and Adobe font obfuscation (OCF §4.6.2): encryption.xml lists obfuscated fonts, which are
// no obstacle to the text.
const QString idpfObfuscation = QStringLiteral("http://www.idpf.org/2008/embedding");
const QString adobeObfuscation = QStringLiteral("http://ns.adobe.com/pdf/enc#RC");

// The sentences of this file, under a context that lupdate collects.
struct ArticleReaderText {
    Q_DECLARE_TR_FUNCTIONS(ArticleReaderText)
};

std::unexpected<Error> failed(const QString &file, const QString &what)
{
    return failAt(ErrorCode::InvalidInput, file, 0, 0, what);
}

// The package document named by META-INF/container.xml (OCF §3.5.2.1): the first rootfile of
// the OPF media type.
Result<QString> packagePath(ZipArchive &archive)
{
    const QString container = QStringLiteral("META-INF/container.xml");
    if (!archive.contains(container))
        return failed(archive.file(),
            ArticleReaderText::tr(
                "the archive holds no META-INF/container.xml: it is not an EPUB publication"));
    Result<XmlDocument> parsed = parseZipPart(archive, container);
    if (!parsed)
        return std::unexpected(parsed.error());
    if (xmlNode *rootfiles = xmlFirstChild(parsed->root(), "rootfiles")) {
        for (xmlNode *rootfile : xmlChildElements(rootfiles)) {
            const QString type = xmlAttribute(rootfile, "media-type");
            if (xmlLocalName(rootfile) == u"rootfile"
                && (type.isEmpty() || type == u"application/oebps-package+xml"))
                return resolveZipPath(QString(), xmlAttribute(rootfile, "full-path"));
        }
    }
    return zipPartFailed(archive, container, parsed->root(),
        ArticleReaderText::tr("it names no package document (<rootfile "
                              "media-type=\"application/oebps-package+xml\">)"));
}

// The entries META-INF/encryption.xml says are encrypted (OCF §3.5.2.2), font obfuscation left
// out.
Result<QSet<QString>> encryptedEntries(ZipArchive &archive)
{
    QSet<QString> entries;
    const QString part = QStringLiteral("META-INF/encryption.xml");
    if (!archive.contains(part))
        return entries;
    Result<XmlDocument> parsed = parseZipPart(archive, part);
    if (!parsed)
        return std::unexpected(parsed.error());
    for (xmlNode *data : xmlChildElements(parsed->root())) {
        xmlNode *method = xmlFirstChild(data, "EncryptionMethod");
        const QString algorithm = method ? xmlAttribute(method, "Algorithm") : QString();
        if (algorithm == idpfObfuscation || algorithm == adobeObfuscation)
            continue;
        xmlNode *cipherData = xmlFirstChild(data, "CipherData");
        xmlNode *reference = cipherData ? xmlFirstChild(cipherData, "CipherReference") : nullptr;
        if (reference)
            entries.insert(resolveZipPath(QString(), xmlAttribute(reference, "URI")));
    }
    return entries;
}

struct Chapter {
    QString id; // the manifest item's id
    QString part; // its entry in the archive
    int position = 0; // 1-based place in the spine
};

} // namespace

Status readEpubArticles(const QByteArray &bytes, const QString &file, const ZipLimits &limits,
    bool wholeBook, const ImportedArticleSink &take)
{
    Result<ZipArchive> opened = ZipArchive::open(bytes, file, limits);
    if (!opened)
        return std::unexpected(opened.error());
    ZipArchive &archive = *opened;

    // The mimetype entry (OCF §3.3): application/epub+zip.
    if (archive.contains(QStringLiteral("mimetype"))) {
        Result<QByteArray> mimetype = archive.read(QStringLiteral("mimetype"));
        if (!mimetype)
            return std::unexpected(mimetype.error());
        const QString type = QString::fromUtf8(*mimetype).trimmed();
        if (type != epubMediaType)
            return failed(file,
                ArticleReaderText::tr(
                    "the package is of the type \"%1\", not an EPUB publication (%2)")
                    .arg(type, epubMediaType));
    }
    Result<QString> opf = packagePath(archive);
    if (!opf)
        return std::unexpected(opf.error());
    if (!archive.contains(*opf))
        return failed(file,
            ArticleReaderText::tr(
                "the archive holds no %1, the package document META-INF/container.xml names")
                .arg(*opf));
    Result<QSet<QString>> encrypted = encryptedEntries(archive);
    if (!encrypted)
        return std::unexpected(encrypted.error());
    Result<XmlDocument> package = parseZipPart(archive, *opf);
    if (!package)
        return std::unexpected(package.error());
    xmlNode *root = package->root();
    if (xmlLocalName(root) != u"package")
        return zipPartFailed(archive, *opf, root,
            ArticleReaderText::tr("the root element is <%1>, not <package>")
                .arg(xmlQualifiedName(root)));

    // Metadata (Packages §3.4.3, Dublin Core elements): title, creator, language, date,
    // publisher.
    QString bookTitle;
    QStringList creators;
    QString language;
    QString date;
    QString publisher;
    if (xmlNode *metadata = xmlFirstChild(root, "metadata")) {
        for (xmlNode *element : xmlChildElements(metadata)) {
            const QString name = xmlLocalName(element);
            const QString value = xmlSimpleText(element);
            if (value.isEmpty())
                continue;
            if (name == u"title" && bookTitle.isEmpty())
                bookTitle = value;
            else if (name == u"creator")
                creators.append(value);
            else if (name == u"language" && language.isEmpty())
                language = value;
            else if (name == u"date" && date.isEmpty())
                date = value;
            else if (name == u"publisher" && publisher.isEmpty())
                publisher = value;
        }
    }
    // Manifest (§3.4.5) and spine (§3.4.6): the linear itemrefs in reading order.
    QHash<QString, std::pair<QString, QString>> manifest; // id → (entry, media type)
    if (xmlNode *items = xmlFirstChild(root, "manifest")) {
        for (xmlNode *item : xmlChildElements(items)) {
            manifest.insert(xmlAttribute(item, "id"),
                {resolveZipPath(*opf, xmlAttribute(item, "href")),
                    xmlAttribute(item, "media-type")});
        }
    }
    xmlNode *spine = xmlFirstChild(root, "spine");
    if (!spine)
        return zipPartFailed(
            archive, *opf, root, ArticleReaderText::tr("the package has no <spine>"));
    std::vector<Chapter> chapters;
    int position = 0;
    for (xmlNode *itemref : xmlChildElements(spine)) {
        if (xmlLocalName(itemref) != u"itemref")
            continue;
        ++position;
        if (xmlAttribute(itemref, "linear") == u"no")
            continue; // auxiliary content read out of order (§3.4.6.2)
        const QString idref = xmlAttribute(itemref, "idref");
        const auto item = manifest.constFind(idref);
        if (item == manifest.cend())
            return zipPartFailed(archive, *opf, itemref,
                ArticleReaderText::tr(
                    "the spine refers to \"%1\", which the manifest does not hold")
                    .arg(idref));
        const auto &[part, type] = *item;
        if (type != u"application/xhtml+xml" && type != u"text/html")
            continue; // an SVG page or another kind of content: no running text
        if (!archive.contains(part))
            return zipPartFailed(archive, *opf, itemref,
                ArticleReaderText::tr("the spine's document %1 is not in the archive").arg(part));
        if (encrypted->contains(part))
            return failed(file,
                ArticleReaderText::tr(
                    "the chapter %1 is encrypted (DRM); Fourfold reads only books without it")
                    .arg(part));
        chapters.push_back({idref, part, position});
    }

    const QString baseName = QFileInfo(file).completeBaseName();
    const auto bookArticle = [&] {
        ImportedArticle article;
        article.outlet = publisher;
        article.published = date;
        article.language = language;
        if (!creators.isEmpty())
            article.meta.insert(QStringLiteral("author"), creators.join(QStringLiteral(", ")));
        if (!bookTitle.isEmpty())
            article.meta.insert(QStringLiteral("book"), bookTitle);
        return article;
    };
    QStringList wholeText;
    qint64 handed = 0;
    for (const Chapter &chapter : chapters) {
        Result<QByteArray> xhtml = archive.read(chapter.part);
        if (!xhtml)
            return std::unexpected(xhtml.error());
        // Chapters are read by the HTML rules (the XHTML as the HTML reader reads a page); a
        // document without text (a cover, a page of images) is passed over.
        Result<QString> decoded = decodeUtf8Strict(*xhtml, chapter.part);
        if (!decoded)
            return std::unexpected(inZipPart(decoded.error(), file, chapter.part));
        Result<QStringList> paragraphs = htmlFragmentParagraphs(*decoded, chapter.part, 1);
        if (!paragraphs)
            return std::unexpected(inZipPart(paragraphs.error(), file, chapter.part));
        if (paragraphs->isEmpty())
            continue;
        Result<ImportedArticle> page = readHtmlArticle(*xhtml, chapter.part);
        if (!page)
            return std::unexpected(inZipPart(page.error(), file, chapter.part));
        if (wholeBook) {
            // The chapter's headline stays in the book's text.
            if (!page->title.isEmpty() && !page->text.startsWith(page->title))
                wholeText.append(page->title);
            wholeText.append(page->text);
            continue;
        }
        ImportedArticle article = bookArticle();
        article.externalId = baseName + u'#' + chapter.id;
        article.title = page->title;
        article.text = page->text;
        if (!page->language.isEmpty())
            article.language = page->language;
        article.meta.insert(QStringLiteral("chapter"), chapter.position);
        article.meta.insert(QStringLiteral("href"), chapter.part);
        article.sourceLine = chapter.position;
        FOURFOLD_TRY_STATUS(take(std::move(article)));
        ++handed;
    }
    if (wholeBook && !wholeText.isEmpty()) {
        ImportedArticle article = bookArticle();
        article.externalId = baseName;
        article.title = !bookTitle.isEmpty() ? bookTitle : baseName;
        article.text = wholeText.join(QStringLiteral("\n\n"));
        article.sourceLine = 1;
        FOURFOLD_TRY_STATUS(take(std::move(article)));
        ++handed;
    }
    if (handed == 0)
        return failed(
            file, ArticleReaderText::tr("the book holds no text: it contains no articles"));
    return {};
}

} // namespace fourfold
