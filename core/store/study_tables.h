#pragma once
// Queries for study design (core/project/study_design): the sampling frame of articles with
// their strata and unit counts, and one coder's assignments of one article.

#include "core/model/annotation.h"
#include "core/model/error.h"

#include <QString>

#include <vector>

namespace fourfold {
class Database;
namespace store {

// A live article as the reliability draw sees it.
struct FrameArticle {
    ArticleId id;
    QString externalId;
    QString outlet;
    QString language; // BCP 47
    QString topic; // metadata key "topic" if it is a string, else empty
    qint64 paragraphs = 0;
    qint64 sentences = 0;
};

// Every live article, ordered by external id (byte order of the UTF-8 text, so the order does
// not depend on the locale).
Result<std::vector<FrameArticle>> frameArticles(const Database &db);

// The live assignments of `coder` on `article`, in any phase.
Result<std::vector<Assignment>> coderAssignments(
    const Database &db, ArticleId article, CoderId coder);

} // namespace store
} // namespace fourfold
