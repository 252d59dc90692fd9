#pragma once
// The near copies a project holds (found at import: see near_copy_check.h), for `info`, the
// article list and the study design's sampling frame.

#include "core/model/error.h"
#include "core/model/near_copy.h"

#include <QHash>

#include <vector>

namespace fourfold {

class Project;

class NearCopies
{
public:
    // Every pair of live articles recorded as near copies (the newer article first).
    static Result<std::vector<NearCopy>> list(const Project &project);
    // How many pairs and how many articles that are a near copy of an older one.
    static Result<NearCopyCounts> counts(const Project &project);
    // Each live article that is a near copy of an older one, with those pairs.
    static Result<QHash<ArticleId, std::vector<NearCopy>>> byArticle(const Project &project);
};

} // namespace fourfold
