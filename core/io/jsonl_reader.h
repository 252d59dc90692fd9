#pragma once
// JSON Lines input for readArticles; the rules are described in article_reader.h.

#include "core/io/imported_article.h"
#include "core/model/error.h"

namespace fourfold {

class ChunkedInput;

// Reads the articles of a JSON Lines file (UTF-8) one line at a time, handing each to `sink` in
// line order as soon as its line is read, without checking ids or texts (readArticles does
// that). Holds one line at a time. Returns the first error: ErrorCode::InvalidInput naming the
// file, the 1-based line and, for syntax errors, the 1-based column in code points; or the
// first failure of `sink`, which stops the reading.
Status readJsonLinesArticles(ChunkedInput &input, const ImportedArticleSink &sink);

} // namespace fourfold
