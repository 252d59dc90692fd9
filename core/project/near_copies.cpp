#include "core/project/near_copies.h"

#include "core/project/project.h"
#include "core/store/database.h"
#include "core/store/near_copy_table.h"

namespace fourfold {

Result<std::vector<NearCopy>> NearCopies::list(const Project &project)
{
    return store::nearCopies(project.db());
}

Result<NearCopyCounts> NearCopies::counts(const Project &project)
{
    return store::nearCopyCounts(project.db());
}

Result<QHash<ArticleId, std::vector<NearCopy>>> NearCopies::byArticle(const Project &project)
{
    auto rows = list(project);
    if (!rows)
        return std::unexpected(rows.error());
    QHash<ArticleId, std::vector<NearCopy>> out;
    for (NearCopy &row : *rows)
        out[row.article].push_back(std::move(row));
    return out;
}

} // namespace fourfold
