#include "core/io/article_reader.h"

#include "core/io/csv_reader.h"
#include "core/io/html_reader.h"
#include "core/io/input_file.h"
#include "core/io/jsonl_reader.h"
#include "core/io/text_reader.h"

#include <QCoreApplication>
#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QRegularExpression>

#include <algorithm>

namespace fourfold {

namespace {

Result<QByteArray> readFileBytes(const QString &path)
{
    const QFileInfo info(path);
    if (!info.exists()) {
        return failAt(ErrorCode::Io, path, 0, 0,
            QCoreApplication::translate("ArticleReader", "the file does not exist"));
    }
    FOURFOLD_TRY_STATUS(requireRegularFile(path));
    if (info.size() > maxImportFileSize) {
        return failAt(ErrorCode::InvalidInput, path, 0, 0,
            QCoreApplication::translate("ArticleReader",
                "the file is %1 MiB long; a file may be at "
                "most %2 MiB")
                .arg(info.size() >> 20)
                .arg(maxImportFileSize >> 20));
    }
    QFile file(path);
    if (!file.open(QIODevice::ReadOnly)) {
        auto error = failAt(ErrorCode::Io, path, 0, 0,
            QCoreApplication::translate("ArticleReader", "the file cannot be opened for reading"));
        error.error().cause = file.errorString();
        return error;
    }
    QByteArray bytes = file.readAll();
    if (file.error() != QFileDevice::NoError) {
        auto error = failAt(ErrorCode::Io, path, 0, 0,
            QCoreApplication::translate("ArticleReader", "the file cannot be read"));
        error.error().cause = file.errorString();
        return error;
    }
    return bytes;
}

QString noArticles()
{
    return QCoreApplication::translate("ArticleReader", "the file contains no articles");
}

// The checks every format shares, made once the file has been parsed: at least one article,
// non-blank ids and texts, unique ids; then the defaults for language and source file.
Status checkArticles(
    std::vector<ImportedArticle> &articles, const QString &file, const ImportOptions &options)
{
    if (articles.empty())
        return failAt(ErrorCode::InvalidInput, file, 0, 0, noArticles());
    QHash<QString, qint64> firstLine;
    for (ImportedArticle &article : articles) {
        if (QStringView(article.externalId).trimmed().isEmpty()) {
            return failAt(ErrorCode::InvalidInput, file, article.sourceLine, 0,
                QCoreApplication::translate("ArticleReader", "the article has no id"));
        }
        // A control character (a line break, a tab, NUL, ...) in an id would break every
        // line-based export that names the article (IOB2 comments, CSV, terminals).
        if (const auto control = std::ranges::find_if(
                article.externalId, [](QChar c) { return c.category() == QChar::Other_Control; });
            control != article.externalId.cend()) {
            return failAt(ErrorCode::InvalidInput, file, article.sourceLine, 0,
                QCoreApplication::translate("ArticleReader",
                    "the id \"%1\" holds a control character (U+%2); ids are one line of "
                    "printable text")
                    .arg(QString(article.externalId)
                             .replace(QRegularExpression(QStringLiteral("\\p{Cc}")),
                                 QStringLiteral("\uFFFD")))
                    .arg(QString::number(control->unicode(), 16)
                             .rightJustified(4, QLatin1Char('0'))
                             .toUpper()));
        }
        if (QStringView(article.text).trimmed().isEmpty()) {
            return failAt(ErrorCode::InvalidInput, file, article.sourceLine, 0,
                QCoreApplication::translate("ArticleReader", "the article \"%1\" has no text")
                    .arg(article.externalId));
        }
        const auto seen = firstLine.constFind(article.externalId);
        if (seen != firstLine.cend()) {
            return failAt(ErrorCode::Duplicate, file, article.sourceLine, 0,
                QCoreApplication::translate("ArticleReader",
                    "duplicate id \"%1\" (first seen on line "
                    "%2)")
                    .arg(article.externalId)
                    .arg(*seen));
        }
        firstLine.insert(article.externalId, article.sourceLine);
        if (article.language.isEmpty())
            article.language = options.language;
        article.sourceFile = file;
    }
    return {};
}

Result<std::vector<ImportedArticle>> readFile(
    const QString &path, ImportFormat format, const ImportOptions &options)
{
    Result<QByteArray> bytes = readFileBytes(path);
    if (!bytes)
        return std::unexpected(bytes.error());
    if (bytes->isEmpty()) {
        return failAt(ErrorCode::InvalidInput, path, 0, 0,
            QCoreApplication::translate(
                "ArticleReader", "the file is empty: it contains no articles"));
    }

    std::vector<ImportedArticle> articles;
    switch (format) {
    case ImportFormat::Text:
    case ImportFormat::Html: {
        Result<ImportedArticle> article = format == ImportFormat::Text
            ? readTextArticle(*bytes, path)
            : readHtmlArticle(*bytes, path);
        if (!article)
            return std::unexpected(article.error());
        articles.push_back(std::move(*article));
        break;
    }
    case ImportFormat::JsonLines: {
        Result<std::vector<ImportedArticle>> read = readJsonLinesArticles(*bytes, path);
        if (!read)
            return std::unexpected(read.error());
        articles = std::move(*read);
        break;
    }
    case ImportFormat::Csv: {
        Result<std::vector<ImportedArticle>> read =
            readCsvArticles(*bytes, path, options.csvColumns);
        if (!read)
            return std::unexpected(read.error());
        articles = std::move(*read);
        break;
    }
    }
    if (Status checked = checkArticles(articles, path, options); !checked)
        return std::unexpected(checked.error());
    return articles;
}

Result<std::vector<ImportedArticle>> readTextFolder(
    const QString &path, const ImportOptions &options)
{
    QFileInfoList entries = QDir(path).entryInfoList(QDir::Files);
    entries.removeIf([](const QFileInfo &entry) {
        return importFormatFromPath(entry.fileName()) != ImportFormat::Text;
    });
    if (entries.isEmpty()) {
        return failAt(ErrorCode::InvalidInput, path, 0, 0,
            QCoreApplication::translate("ArticleReader", "the folder contains no .txt files"));
    }
    // Code-unit order of the names: the same on every system and locale.
    std::ranges::sort(entries,
        [](const QFileInfo &a, const QFileInfo &b) { return a.fileName() < b.fileName(); });

    std::vector<ImportedArticle> articles;
    QHash<QString, QString> firstFile;
    for (const QFileInfo &entry : entries) {
        const QString file = QDir(path).filePath(entry.fileName());
        Result<std::vector<ImportedArticle>> read = readFile(file, ImportFormat::Text, options);
        if (!read)
            return std::unexpected(read.error());
        for (ImportedArticle &article : *read) {
            const auto seen = firstFile.constFind(article.externalId);
            if (seen != firstFile.cend()) {
                return failAt(ErrorCode::Duplicate, file, 0, 0,
                    QCoreApplication::translate("ArticleReader",
                        "duplicate id \"%1\" (first seen in "
                        "%2)")
                        .arg(article.externalId, *seen));
            }
            firstFile.insert(article.externalId, file);
            articles.push_back(std::move(article));
        }
    }
    return articles;
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
    return std::nullopt;
}

std::optional<ImportFormat> importFormatFromPath(const QString &path)
{
    const QString suffix = QFileInfo(path).suffix();
    if (suffix.isEmpty())
        return std::nullopt;
    return importFormatFromKey(suffix);
}

Result<std::vector<ImportedArticle>> readArticles(const QString &path, const ImportOptions &options)
{
    const QFileInfo info(path);
    if (info.isDir()) {
        if (options.format && *options.format != ImportFormat::Text) {
            return failAt(ErrorCode::Unsupported, path, 0, 0,
                QCoreApplication::translate("ArticleReader",
                    "a folder can only be read as plain text "
                    "(its .txt files)"));
        }
        return readTextFolder(path, options);
    }
    const std::optional<ImportFormat> format =
        options.format ? options.format : importFormatFromPath(path);
    if (!format) {
        if (!info.exists()) {
            return failAt(ErrorCode::Io, path, 0, 0,
                QCoreApplication::translate("ArticleReader", "the file does not exist"));
        }
        return failAt(ErrorCode::Unsupported, path, 0, 0,
            QCoreApplication::translate("ArticleReader",
                "the format cannot be told from the file "
                "name; name the file .txt, .html, .jsonl or "
                ".csv, or choose the format"));
    }
    return readFile(path, *format, options);
}

} // namespace fourfold
