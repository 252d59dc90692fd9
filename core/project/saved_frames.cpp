#include "core/project/saved_frames.h"

#include "core/project/project.h"
#include "core/store/frame_table.h"

#include <QCoreApplication>

namespace fourfold {

Result<std::vector<SavedFrameAnalysis>> SavedFrames::list(const Project &project)
{
    return store::frameAnalyses(project.db());
}

Result<SavedFrameAnalysis> SavedFrames::load(const Project &project, const QString &name)
{
    auto found = store::frameAnalysisByName(project.db(), name);
    if (!found)
        return std::unexpected(found.error());
    if (!*found)
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("SavedFrames", "%1 has no saved frame analysis \"%2\".")
                .arg(project.path(), name));
    return std::move(**found);
}

} // namespace fourfold
