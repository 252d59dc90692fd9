#pragma once
// Plain-text input for readArticles; the rules are described in article_reader.h.

#include "core/io/imported_article.h"
#include "core/model/error.h"

#include <QByteArray>
#include <QString>

namespace fourfold {

// Reads the one article of a plain-text file's bytes (UTF-8). `file` is the path whose name
// gives the id (and the title when the text has none). Returns the article with sourceLine 1,
// or ErrorCode::InvalidInput naming `file` for invalid UTF-8, a binary file or a file without
// any non-blank line.
Result<ImportedArticle> readTextArticle(const QByteArray &bytes, const QString &file);

} // namespace fourfold
