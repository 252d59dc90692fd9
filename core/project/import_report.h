#pragma once
// What an import did: the articles added and those skipped, each with its line and reason.

#include "core/model/ids.h"

#include <QString>

#include <vector>

namespace fourfold {

struct SkippedArticle {
    QString externalId;
    qint64 line = 0; // in the source file (1 for txt/html)
    QString reason; // a translated sentence
};

struct ImportReport {
    QString source;
    std::vector<ArticleId> added;
    std::vector<SkippedArticle> skipped;
};

} // namespace fourfold
