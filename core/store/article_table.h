#pragma once
// The article rows of a project file and their frozen segmentation.

#include "core/model/article.h"
#include "core/model/error.h"

#include <functional>
#include <optional>
#include <vector>

namespace fourfold {

class Database;

namespace store {

// Inserts `article` (its summary.id is ignored; uuid made if empty) with its paragraphs,
// sentences and tokens. Fails with Duplicate if the external id or the SHA-256 is taken.
Result<ArticleId> insertArticle(Database &db, const Article &article);

// All live articles in import order, without text.
Result<std::vector<ArticleSummary>> articleSummaries(const Database &db);
// One article with its text and segmentation; NotFound if there is none with `id`.
Result<Article> article(const Database &db, ArticleId id);
// Streams one segmentation of every article (live or not) in article id order: `visit` gets each
// article's ranges in text order, from one statement (articles without ranges are not visited).
// Stops at and returns the first error of `visit` or of the file.
Status forEachSegmentation(const Database &db, SegmentKind kind,
    const std::function<Status(ArticleId, std::vector<TextRange> &&)> &visit);
// The part of an article's text at a code-point range, read without the rest of the text.
struct ArticleSlice {
    qint64 length = 0; // the whole text's length in code points
    QString text; // the text at the range, if the range lies inside [0, length]
};
// The article's length and its text at `range` (SQLite's length() and substr() count
// characters, which in its UTF-8 text are code points). NotFound if there is no article `id`.
Result<ArticleSlice> articleSlice(const Database &db, ArticleId id, const TextRange &range);
// The article with this external id or SHA-256, if any.
Result<std::optional<ArticleId>> articleIdByExternalId(
    const Database &db, const QString &externalId);
Result<std::optional<ArticleId>> articleIdBySha256(const Database &db, const QString &sha256);

// Full-text search (SQLite FTS5 query syntax over title and text), best match first.
// Fails with InvalidArgument for a query FTS5 cannot parse.
Result<std::vector<ArticleId>> searchArticles(const Database &db, const QString &query);

// Sets the role of paragraph `index` of `article`; NotFound if there is no such paragraph.
Status setParagraphRole(Database &db, ArticleId article, qsizetype index, ParagraphRole role);

} // namespace store
} // namespace fourfold
