#include "core/project/outdated_annotations.h"

#include "core/project/codebook_versions.h"
#include "core/project/project.h"
#include "core/project/study_names.h"
#include "core/store/codebook_table.h"

#include <QHash>

#include <algorithm>
#include <map>

namespace fourfold {

using namespace study;

Result<std::vector<OutdatedAnnotation>> OutdatedAnnotations::list(const Project &project)
{
    auto names = loadNames(project.db(), project);
    if (!names)
        return std::unexpected(names.error());
    auto current = store::currentCodebook(project.db());
    if (!current)
        return std::unexpected(current.error());
    auto versions = store::codebookVersionRows(project.db());
    if (!versions)
        return std::unexpected(versions.error());
    QHash<qint64, int> numberOf;
    for (const store::CodebookVersionRow &v : *versions)
        numberOf.insert(v.id.value, v.number);
    // Which functions changed between each older version and the current one.
    std::map<int, std::vector<FramingFunction>> changedSince;
    for (const store::CodebookVersionRow &v : *versions) {
        if (v.number >= current->number)
            continue;
        auto old = store::codebookByNumber(project.db(), v.number);
        if (!old)
            return std::unexpected(old.error());
        changedSince[v.number] = CodebookVersions::diff(*old, *current).changedFunctions();
    }
    auto all = project.allAnnotations();
    if (!all)
        return std::unexpected(all.error());
    std::vector<std::pair<Annotation, OutdatedAnnotation>> found;
    for (const Annotation &a : *all) {
        if (a.deleted)
            continue;
        const int number = numberOf.value(a.codebookVersion.value, current->number);
        if (number >= current->number)
            continue;
        const auto &changed = changedSince[number];
        found.push_back({a,
            OutdatedAnnotation {a.id, names->externalIdById.value(a.article.value),
                coderLabel(*names, a.coder), a.content.function, a.phase, number,
                std::ranges::find(changed, a.content.function) != changed.end()}});
    }
    std::ranges::stable_sort(found, [](const auto &x, const auto &y) {
        if (x.second.article != y.second.article)
            return x.second.article < y.second.article;
        if (x.second.coder != y.second.coder)
            return x.second.coder < y.second.coder;
        return x.first.content.range.start < y.first.content.range.start;
    });
    std::vector<OutdatedAnnotation> out;
    for (auto &f : found)
        out.push_back(std::move(f.second));
    return out;
}

} // namespace fourfold
