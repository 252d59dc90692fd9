#include "core/io/article_reader.h"

#include "core/io/chunked_input.h"
#include "core/io/csv_reader.h"
#include "core/io/document_split.h"
#include "core/io/docx_reader.h"
#include "core/io/epub_reader.h"
#include "core/io/feed_reader.h"
#include "core/io/html_reader.h"
#include "core/io/jsonl_reader.h"
#include "core/io/news_xml_reader.h"
#include "core/io/odt_reader.h"
#include "core/io/pdf_reader.h"
#include "core/io/text_reader.h"
#include "core/io/xml_document.h"

#include <QCoreApplication>
#include <QDir>
#include <QFileInfo>
#include <QRegularExpression>

#include <algorithm>
#include <optional>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ArticleReaderText {
    Q_DECLARE_TR_FUNCTIONS(ArticleReaderText)
};

QString noArticles()
{
    return ArticleReaderText::tr("the file contains no articles");
}

// The checks every format shares, one article at a time as the reader hands them over: a
// non-blank id without control characters, no NUL in any field, a non-blank text, ids unique
// within the file; then the defaults for language and source file. A failed check is kept rather
// than returned: the reader goes on to the end of the file, handing nothing on any more, so that a
// syntax error further on is the one reported (syntax errors win over these checks).
class ArticleChecks
{
public:
    ArticleChecks(const QString &file, const ImportOptions &options, ImportedArticleSink next)
        : m_file(file)
        , m_options(options)
        , m_next(std::move(next))
    { }

    Status take(ImportedArticle &&article)
    {
        ++m_count;
        if (m_failed)
            return {};
        if (auto failed = check(article)) {
            m_failed = std::move(failed);
            m_firstLine.clear(); // not needed any more
            return {};
        }
        m_firstLine.insert(article.externalId, article.sourceLine);
        if (article.language.isEmpty())
            article.language = m_options.language;
        article.sourceFile = m_file;
        return m_next(std::move(article));
    }

    // Once the reader has read the whole file without an error: the first failed check, or
    // "no articles" if none came.
    Status finish() const
    {
        if (m_failed)
            return std::unexpected(*m_failed);
        if (m_count == 0)
            return failAt(ErrorCode::InvalidInput, m_file, 0, 0, noArticles());
        return {};
    }

private:
    std::optional<Error> check(const ImportedArticle &article) const
    {
        const auto failed = [&](ErrorCode code, const QString &what) {
            return failAt(code, m_file, article.sourceLine, 0, what).error();
        };
        if (QStringView(article.externalId).trimmed().isEmpty())
            return failed(ErrorCode::InvalidInput, ArticleReaderText::tr("the article has no id"));
        // A control character (a line break, a tab, NUL, ...) in an id would break every
        // line-based export that names the article (IOB2 comments, CSV, terminals).
        if (const auto control = std::ranges::find_if(
                article.externalId, [](QChar c) { return c.category() == QChar::Other_Control; });
            control != article.externalId.cend()) {
            return failed(ErrorCode::InvalidInput,
                ArticleReaderText::tr(
                    "the id \"%1\" holds a control character (U+%2); ids are one line of "
                    "printable text")
                    .arg(QString(article.externalId)
                             .replace(QRegularExpression(QStringLiteral("\\p{Cc}")),
                                 QStringLiteral("\uFFFD")))
                    .arg(QString::number(control->unicode(), 16)
                             .rightJustified(4, QLatin1Char('0'))
                             .toUpper()));
        }
        // A NUL can only come through an escape (\u0000 in JSON, &#0; is refused by XML), since
        // a NUL byte makes the whole file binary; no text holds one, and C strings end at it.
        for (const auto &[field, value] :
            {std::pair {"text", &article.text}, std::pair {"title", &article.title},
                std::pair {"outlet", &article.outlet}, std::pair {"published", &article.published},
                std::pair {"language", &article.language}})
            if (value->contains(QChar(0)))
                return failed(ErrorCode::InvalidInput,
                    ArticleReaderText::tr(
                        "the %1 of the article \"%2\" holds a NUL character (U+0000), which no "
                        "text holds")
                        .arg(QLatin1String(field), article.externalId));
        if (QStringView(article.text).trimmed().isEmpty()) {
            return failed(ErrorCode::InvalidInput,
                ArticleReaderText::tr("the article \"%1\" has no text").arg(article.externalId));
        }
        const auto seen = m_firstLine.constFind(article.externalId);
        if (seen != m_firstLine.cend()) {
            return failed(ErrorCode::Duplicate,
                ArticleReaderText::tr("duplicate id \"%1\" (first seen on line %2)")
                    .arg(article.externalId)
                    .arg(*seen));
        }
        return std::nullopt;
    }

    QString m_file;
    const ImportOptions &m_options;
    ImportedArticleSink m_next;
    QHash<QString, qint64> m_firstLine; // the ids so far and where each was seen
    std::optional<Error> m_failed;
    qint64 m_count = 0;
};

// Reads an XML file whole and hands its articles to `take`: as a feed or a news item when
// `format` says so, else as whichever its root element makes it.
Status readXmlArticles(
    ChunkedInput &input, std::optional<ImportFormat> format, const ImportedArticleSink &take)
{
    const QString &path = input.path();
    Result<QByteArray> bytes = input.readAll();
    if (!bytes)
        return std::unexpected(bytes.error());
    Result<XmlDocument> document = XmlDocument::parse(*bytes, path);
    if (!document)
        return std::unexpected(document.error());
    _xmlNode *root = document->root();
    if (format == ImportFormat::Feed || (!format && isFeedRoot(root)))
        return readFeedArticles(root, path, take);
    if (format == ImportFormat::NewsXml || (!format && isNewsXmlRoot(root)))
        return readNewsXmlArticles(root, path, take);
    return failAt(ErrorCode::Unsupported, path, xmlLine(root), 0,
        ArticleReaderText::tr(
            "the XML root element <%1> is neither a feed's (<rss>, Atom's <feed>) nor a news "
            "item's (<nitf>, NewsML-G2's <newsItem> or <newsMessage>)")
            .arg(xmlQualifiedName(root)));
}

// Whether the file's first bytes (after a BOM and whitespace) open markup: a file of unknown
// suffix that does is read as XML and told by its root element.
bool looksLikeXml(QByteArrayView start)
{
    if (start.startsWith("\xEF\xBB\xBF"))
        start = start.sliced(3);
    while (!start.isEmpty() && QByteArrayView(" \t\r\n").contains(start.front()))
        start = start.sliced(1);
    return start.startsWith("<");
}

// The kind of a zip container whose suffix names no format: its mimetype entry (EPUB's OCF §3.3,
// ODF 1.2 part 3 §3.3), else a WordprocessingML main part ([Content_Types].xml's override for
// word/document.xml, ISO/IEC 29500-2 §10.1.2, or the entry itself).
Result<ImportFormat> zipContainerFormat(
    const QByteArray &bytes, const QString &path, ZipLimits limits)
{
    Result<ZipArchive> archive = ZipArchive::open(bytes, path, limits);
    if (!archive)
        return std::unexpected(archive.error());
    if (archive->contains(QStringLiteral("mimetype"))) {
        Result<QByteArray> type = archive->read(QStringLiteral("mimetype"));
        if (!type)
            return std::unexpected(type.error());
        const QByteArray mimetype = type->trimmed();
        if (mimetype == "application/epub+zip")
            return ImportFormat::Epub;
        if (mimetype.startsWith("application/vnd.oasis.opendocument.text"))
            return ImportFormat::Odt;
    }
    if (archive->contains(QStringLiteral("word/document.xml")))
        return ImportFormat::Docx;
    return failAt(ErrorCode::Unsupported, path, 0, 0,
        ArticleReaderText::tr(
            "the file is a zip archive but not a DOCX, ODT or EPUB document; choose the format if "
            "it is one"));
}

// Reads one opened file of `format` (none: XML told from its root element), handing each
// article that passes the checks to `visit` with the bytes read so far: `before` plus this
// file's position, of `total`.
Status readOpenFile(ChunkedInput &input, std::optional<ImportFormat> format,
    const ImportOptions &options, const ArticleVisit &visit, qint64 before, qint64 total)
{
    const QString &path = input.path();
    const bool whole = format != ImportFormat::JsonLines && format != ImportFormat::Csv;
    if (whole && input.size() > maxImportFileSize) {
        return failAt(ErrorCode::InvalidInput, path, 0, 0,
            ArticleReaderText::tr("the file is %1 MiB long; a file may be at most %2 MiB")
                .arg(input.size() >> 20)
                .arg(maxImportFileSize >> 20));
    }
    Result<bool> any = input.readMore();
    if (!any)
        return std::unexpected(any.error());
    if (!*any)
        return failAt(ErrorCode::InvalidInput, path, 0, 0,
            ArticleReaderText::tr("the file is empty: it contains no articles"));

    ArticleChecks checks(path, options, [&](ImportedArticle &&article) {
        return visit(std::move(article), ReadProgress {before + input.position(), total});
    });
    const ImportedArticleSink take = [&](ImportedArticle &&article) {
        return checks.take(std::move(article));
    };
    // A suffix that names no format: a PDF by its header (ISO 32000-1 §7.5.2), a zip container
    // (APPNOTE.TXT's local file header signature) by its kind; else XML, below.
    if (!format && input.pending().startsWith("%PDF-"))
        format = ImportFormat::Pdf;
    if (!format && input.pending().startsWith("PK\x03\x04")) {
        Result<QByteArray> bytes = input.readAll();
        if (!bytes)
            return std::unexpected(bytes.error());
        Result<ImportFormat> zipped = zipContainerFormat(*bytes, path, options.zipLimits);
        if (!zipped)
            return std::unexpected(zipped.error());
        if (*zipped == ImportFormat::Epub) {
            FOURFOLD_TRY_STATUS(
                readEpubArticles(*bytes, path, options.zipLimits, options.epubWholeBook, take));
        } else {
            Result<ImportedArticle> article = *zipped == ImportFormat::Docx
                ? readDocxArticle(*bytes, path, options.zipLimits)
                : readOdtArticle(*bytes, path, options.zipLimits);
            if (!article)
                return std::unexpected(article.error());
            FOURFOLD_TRY_STATUS(take(std::move(*article)));
        }
        return checks.finish();
    }
    if (!format || format == ImportFormat::Feed || format == ImportFormat::NewsXml) {
        if (!format && !looksLikeXml(input.pending())) {
            return failAt(ErrorCode::Unsupported, path, 0, 0,
                ArticleReaderText::tr(
                    "the format cannot be told from the file name or its content; name the file "
                    ".txt, .html, .jsonl, .csv, .rss, .atom, .docx, .odt, .pdf, .epub or .xml, or "
                    "choose the format"));
        }
        FOURFOLD_TRY_STATUS(readXmlArticles(input, format, take));
        return checks.finish();
    }
    switch (*format) {
    case ImportFormat::Text:
    case ImportFormat::Html:
    case ImportFormat::Docx:
    case ImportFormat::Odt:
    case ImportFormat::Pdf: {
        Result<QByteArray> bytes = input.readAll();
        if (!bytes)
            return std::unexpected(bytes.error());
        Result<ImportedArticle> article = format == ImportFormat::Text
            ? readTextArticle(*bytes, path)
            : format == ImportFormat::Html ? readHtmlArticle(*bytes, path)
            : format == ImportFormat::Docx ? readDocxArticle(*bytes, path, options.zipLimits)
            : format == ImportFormat::Odt  ? readOdtArticle(*bytes, path, options.zipLimits)
                                           : readPdfArticle(*bytes, path);
        if (!article)
            return std::unexpected(article.error());
        FOURFOLD_TRY_STATUS(take(std::move(*article)));
        break;
    }
    case ImportFormat::Epub: {
        Result<QByteArray> bytes = input.readAll();
        if (!bytes)
            return std::unexpected(bytes.error());
        FOURFOLD_TRY_STATUS(
            readEpubArticles(*bytes, path, options.zipLimits, options.epubWholeBook, take));
        break;
    }
    case ImportFormat::JsonLines:
        FOURFOLD_TRY_STATUS(readJsonLinesArticles(input, take));
        break;
    case ImportFormat::Csv:
        FOURFOLD_TRY_STATUS(readCsvArticles(input, options.csvColumns, take));
        break;
    case ImportFormat::Feed:
    case ImportFormat::NewsXml:
        break; // read above
    }
    return checks.finish();
}

Status readFile(const QString &path, std::optional<ImportFormat> format,
    const ImportOptions &options, const ArticleVisit &visit)
{
    Result<ChunkedInput> input = ChunkedInput::open(path, options.readChunkSize);
    if (!input)
        return std::unexpected(input.error());
    return readOpenFile(*input, format, options, visit, 0, input->size());
}

Status readTextFolder(const QString &path, const ImportOptions &options, const ArticleVisit &visit)
{
    QFileInfoList entries = QDir(path).entryInfoList(QDir::Files);
    entries.removeIf([](const QFileInfo &entry) {
        return importFormatFromPath(entry.fileName()) != ImportFormat::Text;
    });
    if (entries.isEmpty())
        return failAt(ErrorCode::InvalidInput, path, 0, 0,
            ArticleReaderText::tr("the folder contains no .txt files"));
    // Code-unit order of the names: the same on every system and locale.
    std::ranges::sort(entries,
        [](const QFileInfo &a, const QFileInfo &b) { return a.fileName() < b.fileName(); });
    qint64 total = 0;
    for (const QFileInfo &entry : entries)
        total += entry.size();

    QHash<QString, QString> firstFile;
    qint64 before = 0;
    for (const QFileInfo &entry : entries) {
        const QString file = QDir(path).filePath(entry.fileName());
        Result<ChunkedInput> input = ChunkedInput::open(file, options.readChunkSize);
        if (!input)
            return std::unexpected(input.error());
        FOURFOLD_TRY_STATUS(readOpenFile(
            *input, ImportFormat::Text, options,
            [&](ImportedArticle &&article, ReadProgress progress) -> Status {
                const auto seen = firstFile.constFind(article.externalId);
                if (seen != firstFile.cend()) {
                    return failAt(ErrorCode::Duplicate, file, 0, 0,
                        ArticleReaderText::tr("duplicate id \"%1\" (first seen in %2)")
                            .arg(article.externalId, *seen));
                }
                firstFile.insert(article.externalId, file);
                return visit(std::move(article), progress);
            },
            before, total));
        before += input->size();
    }
    return {};
}

// A text-like document cut at the lines matching options.splitOn (document_split.h).
Status readFileSplit(const QString &path, std::optional<ImportFormat> format,
    const ImportOptions &options, const ArticleVisit &visit)
{
    if (!format
        || !(*format == ImportFormat::Text || *format == ImportFormat::Docx
            || *format == ImportFormat::Odt || *format == ImportFormat::Pdf))
        return failAt(ErrorCode::Unsupported, path, 0, 0,
            ArticleReaderText::tr("a split pattern cuts plain text, DOCX, ODT and PDF documents "
                                  "(told by their suffix); this file is %1")
                .arg(format ? importFormatKey(*format) : ArticleReaderText::tr("of another kind")));
    auto pattern = compileSplitPattern(options.splitOn);
    if (!pattern)
        return failAt(pattern.error().code, path, 0, 0, pattern.error().message);
    return readFile(path, format, options, [&](ImportedArticle &&document, ReadProgress progress) {
        if (document.sourceFile.isEmpty())
            document.sourceFile = path;
        // The readers take a document's first line out of its text when it is its title; the
        // split puts it back, as it may be the first matching line.
        if (!document.title.isEmpty() && document.title != QFileInfo(path).completeBaseName()
            && !document.text.startsWith(document.title))
            document.text = document.title + QStringLiteral("\n\n") + document.text;
        return splitDocument(document, *pattern,
            [&](ImportedArticle &&part) { return visit(std::move(part), progress); });
    });
}

} // namespace

QString importFormatKey(ImportFormat format)
{
    switch (format) {
    case ImportFormat::Text:
        return QStringLiteral("txt");
    case ImportFormat::Html:
        return QStringLiteral("html");
    case ImportFormat::JsonLines:
        return QStringLiteral("jsonl");
    case ImportFormat::Csv:
        return QStringLiteral("csv");
    case ImportFormat::Feed:
        return QStringLiteral("feed");
    case ImportFormat::NewsXml:
        return QStringLiteral("newsxml");
    case ImportFormat::Docx:
        return QStringLiteral("docx");
    case ImportFormat::Odt:
        return QStringLiteral("odt");
    case ImportFormat::Pdf:
        return QStringLiteral("pdf");
    case ImportFormat::Epub:
        return QStringLiteral("epub");
    }
    return QStringLiteral("txt");
}

std::optional<ImportFormat> importFormatFromKey(const QString &key)
{
    const QString k = key.toLower();
    if (k == u"txt" || k == u"text")
        return ImportFormat::Text;
    if (k == u"html" || k == u"htm")
        return ImportFormat::Html;
    if (k == u"jsonl" || k == u"ndjson")
        return ImportFormat::JsonLines;
    if (k == u"csv")
        return ImportFormat::Csv;
    if (k == u"feed" || k == u"rss" || k == u"atom")
        return ImportFormat::Feed;
    if (k == u"newsxml" || k == u"nitf" || k == u"newsml")
        return ImportFormat::NewsXml;
    if (k == u"docx")
        return ImportFormat::Docx;
    if (k == u"odt")
        return ImportFormat::Odt;
    if (k == u"pdf")
        return ImportFormat::Pdf;
    if (k == u"epub")
        return ImportFormat::Epub;
    return std::nullopt;
}

std::optional<ImportFormat> importFormatFromPath(const QString &path)
{
    const QString suffix = QFileInfo(path).suffix();
    if (suffix.isEmpty())
        return std::nullopt;
    return importFormatFromKey(suffix);
}

Status forEachArticle(const QString &path, const ImportOptions &options, const ArticleVisit &visit)
{
    const QFileInfo info(path);
    if (info.isDir()) {
        if (options.format && *options.format != ImportFormat::Text) {
            return failAt(ErrorCode::Unsupported, path, 0, 0,
                ArticleReaderText::tr("a folder can only be read as plain text (its .txt files)"));
        }
        return readTextFolder(path, options, visit);
    }
    // No format: .xml and unknown suffixes are told from the content (readOpenFile).
    const std::optional<ImportFormat> format =
        options.format ? options.format : importFormatFromPath(path);
    if (options.splitOn.isEmpty())
        return readFile(path, format, options, visit);
    return readFileSplit(path, format, options, visit);
}

Result<std::vector<ImportedArticle>> readArticles(const QString &path, const ImportOptions &options)
{
    std::vector<ImportedArticle> articles;
    FOURFOLD_TRY_STATUS(forEachArticle(path, options, [&](ImportedArticle &&article, ReadProgress) {
        articles.push_back(std::move(article));
        return Status {};
    }));
    return articles;
}

} // namespace fourfold
