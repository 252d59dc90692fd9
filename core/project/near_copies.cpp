#include "core/project/near_copies.h"

#include "core/project/project.h"
#include "core/store/database.h"

namespace fourfold {

Result<std::vector<store::NearCopyRow>> NearCopies::list(const Project &project)
{
    return store::nearCopies(project.db());
}

Result<store::NearCopyCounts> NearCopies::counts(const Project &project)
{
    return store::nearCopyCounts(project.db());
}

Result<QHash<ArticleId, std::vector<store::NearCopyRow>>> NearCopies::byArticle(
    const Project &project)
{
    auto rows = list(project);
    if (!rows)
        return std::unexpected(rows.error());
    QHash<ArticleId, std::vector<store::NearCopyRow>> out;
    for (store::NearCopyRow &row : *rows)
        out[row.article].push_back(std::move(row));
    return out;
}

} // namespace fourfold
