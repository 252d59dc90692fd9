#pragma once
// What an import did: the articles added and those skipped, each with its line and reason, and the
// near copies found among the added ones.

#include "core/model/ids.h"

#include <QString>

#include <vector>

namespace fourfold {

struct SkippedArticle {
    QString externalId;
    qint64 line = 0; // in the source file (1 for txt/html)
    QString reason; // a translated sentence
};

// An added article whose word shingles are close to those of an article already in the project
// (or added before it by the same import): see core/text/minhash.h.
struct NearCopyFound {
    QString externalId; // the added article
    qint64 line = 0;
    ArticleId article;
    QString otherExternalId; // the article it is a near copy of
    ArticleId other;
    double similarity = 0.0; // MinHash estimate of the Jaccard similarity
};

struct ImportReport {
    QString source;
    std::vector<ArticleId> added;
    std::vector<SkippedArticle> skipped;
    std::vector<NearCopyFound> nearCopies; // in the order the articles were added
};

} // namespace fourfold
