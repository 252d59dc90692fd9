#pragma once
// HTML input for readArticles (libxml2's HTML parser); the rules are described in
// article_reader.h.

#include "core/io/imported_article.h"
#include "core/model/error.h"

#include <QByteArray>
#include <QString>

namespace fourfold {

// Reads the one article of an HTML file's bytes (UTF-8). `file` is the path whose name gives
// the id (and the title when the page has none). Returns the article with sourceLine 1, or
// ErrorCode::InvalidInput naming `file` for invalid UTF-8 (with a hint when the page declares
// another character set), a binary file, or a page without any text outside the dropped
// elements. Safe to call from several threads (libxml2 is initialised once).
Result<ImportedArticle> readHtmlArticle(const QByteArray &bytes, const QString &file);

} // namespace fourfold
