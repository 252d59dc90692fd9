#pragma once
// JSON Lines input for readArticles; the rules are described in article_reader.h.

#include "core/io/imported_article.h"
#include "core/model/error.h"

#include <QByteArray>
#include <QString>

#include <vector>

namespace fourfold {

// Reads the articles of a JSON Lines file's bytes (UTF-8), one object per line. Returns the
// articles in line order without checking ids or texts (readArticles does that), or the first
// error: ErrorCode::InvalidInput naming `file`, the 1-based line and, for syntax errors, the
// 1-based column in code points.
Result<std::vector<ImportedArticle>> readJsonLinesArticles(
    const QByteArray &bytes, const QString &file);

} // namespace fourfold
