#pragma once
// The near copies found at import (table article_near_copy, migration 8): an article that is a
// near copy of an older one, with the estimated Jaccard similarity of their word shingles.

#include "core/model/error.h"
#include "core/model/ids.h"

#include <QString>

#include <functional>
#include <vector>

namespace fourfold {

class Database;

namespace store {

struct NearCopyRow {
    ArticleId article; // the newer article
    QString articleExternalId;
    QString articleTitle;
    ArticleId other; // the older article it is a near copy of
    QString otherExternalId;
    QString otherTitle;
    double similarity = 0.0;
    QString foundAt; // ISO 8601 UTC
};

// Records that `article` is a near copy of `other` (found now); a pair already recorded keeps
// its row.
Status insertNearCopy(Database &db, ArticleId article, ArticleId other, double similarity);
// Every recorded pair whose two articles are live, by article then other.
Result<std::vector<NearCopyRow>> nearCopies(const Database &db);
// How many such pairs there are, and how many live articles are a near copy of another.
struct NearCopyCounts {
    qint64 pairs = 0;
    qint64 articles = 0;
};
Result<NearCopyCounts> nearCopyCounts(const Database &db);

// Streams the text of every live article in id order, one row held at a time.
Status forEachArticleText(
    const Database &db, const std::function<Status(ArticleId, QString &&text)> &visit);

} // namespace store
} // namespace fourfold
