#pragma once
// Reading articles from files: plain text (a file or a folder of files), HTML, JSON Lines and
// CSV. Each file is read all-or-nothing: the first problem makes the whole file fail with an
// Error naming file, line (and column for JSON) and what is wrong.

#include "core/io/imported_article.h"
#include "core/model/error.h"

#include <QHash>
#include <QString>

#include <optional>
#include <vector>

namespace fourfold {

enum class ImportFormat { Text, Html, JsonLines, Csv };

// "txt", "html", "jsonl", "csv".
QString importFormatKey(ImportFormat format);
std::optional<ImportFormat> importFormatFromKey(const QString &key);
// From the file name's suffix (.txt/.text, .html/.htm, .jsonl/.ndjson, .csv); nothing otherwise.
std::optional<ImportFormat> importFormatFromPath(const QString &path);

struct ImportOptions {
    // Forced format; if unset, taken from each file's suffix.
    std::optional<ImportFormat> format;
    // Language for records that name none (txt, html, CSV without a language column); empty =
    // leave empty, the project fills in its default.
    QString language;
    // CSV: maps Fourfold's field names (id, title, text, outlet, published, language) to the
    // CSV header names that hold them; a field not in the map is looked up under its own name.
    QHash<QString, QString> csvColumns;
};

// Reads every article of `path`: a file, or for plain text a folder of *.txt files (sorted by
// name, not recursive). Returns the articles in file order, or the first error (nothing is
// returned for a file with any error). Duplicate ids inside one file are an error
// (ErrorCode::Duplicate, naming both lines). An empty file is an error.
Result<std::vector<ImportedArticle>> readArticles(const QString &path,
                                                  const ImportOptions &options);

} // namespace fourfold
