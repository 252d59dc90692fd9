#pragma once
// The near copies found at import (table article_near_copy, migration 8): an article that is a
// near copy of an older one, with the estimated Jaccard similarity of their word shingles.

#include "core/model/error.h"
#include "core/model/ids.h"
#include "core/model/near_copy.h"

#include <QString>

#include <functional>
#include <vector>

namespace fourfold {

class Database;

namespace store {

// Records that `article` is a near copy of `other` (found now); a pair already recorded keeps
// its row.
Status insertNearCopy(Database &db, ArticleId article, ArticleId other, double similarity);
// Every recorded pair whose two articles are live, by article then other.
Result<std::vector<NearCopy>> nearCopies(const Database &db);
// How many such pairs there are, and how many live articles are a near copy of another.
Result<NearCopyCounts> nearCopyCounts(const Database &db);

// Streams the text of every live article in id order, one row held at a time.
Status forEachArticleText(
    const Database &db, const std::function<Status(ArticleId, QString &&text)> &visit);

} // namespace store
} // namespace fourfold
