#pragma once
// SavedFrames: reading the frame analyses a lead saved, beside Project (design.md §2, §10). They
// are written through the edits of frame_analysis_edits.h.

#include "core/model/error.h"
#include "core/model/saved_frame_analysis.h"

#include <vector>

namespace fourfold {

class Project;

class SavedFrames
{
public:
    // The live analyses, oldest first, with their frames and member counts but not their members
    // (a fixed number of statements).
    static Result<std::vector<SavedFrameAnalysis>> list(const Project &project);
    // The live analysis called `name`, whole. NotFound naming it if there is none.
    static Result<SavedFrameAnalysis> load(const Project &project, const QString &name);
};

} // namespace fourfold
