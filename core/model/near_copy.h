#pragma once
// Near copies found at import: an article that is a near copy of an older one, with the
// estimated Jaccard similarity of their word shingles (core/project/near_copy_check.h).

#include "core/model/ids.h"

#include <QString>

namespace fourfold {

struct NearCopy {
    ArticleId article; // the newer article
    QString articleExternalId;
    QString articleTitle;
    ArticleId other; // the older article it is a near copy of
    QString otherExternalId;
    QString otherTitle;
    double similarity = 0.0; // 0–1
    QString foundAt; // ISO 8601 UTC
};

// How many recorded pairs there are, and how many live articles are a near copy of another.
struct NearCopyCounts {
    qint64 pairs = 0;
    qint64 articles = 0;
};

} // namespace fourfold
