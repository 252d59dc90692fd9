#pragma once
// Saved frame analyses (tables frame_analysis, frame_cluster, frame_member, schema migration 8).
// An analysis is written whole; deleting it by a person leaves a tombstone (deleted = 1), undoing
// its saving removes its rows.

#include "core/model/error.h"
#include "core/model/saved_frame_analysis.h"

#include <optional>
#include <vector>

namespace fourfold {
class Database;
namespace store {

// Inserts `analysis` (uuid, name, time, creator, settings, frames and members as given), live.
// Constraint if the uuid is taken, an article does not exist or a cluster is negative.
Status insertFrameAnalysis(Database &db, const SavedFrameAnalysis &analysis);
// Removes analysis `uuid` with its frames and members. NotFound if there is no such analysis.
Status removeFrameAnalysis(Database &db, const QString &uuid);
// Marks analysis `uuid` deleted (a tombstone) or live again. NotFound if there is none.
Status setFrameAnalysisDeleted(Database &db, const QString &uuid, bool deleted);
// Names frame `cluster` of analysis `uuid`. NotFound if there is no such frame.
Status setFrameName(Database &db, const QString &uuid, int cluster, const QString &name);
// The live analyses, oldest first (by time, then row), with their frames and memberCount but
// without members: three statements whatever their number.
Result<std::vector<SavedFrameAnalysis>> frameAnalyses(const Database &db);
// The analysis `uuid` (live or deleted), whole; nothing if there is none.
Result<std::optional<SavedFrameAnalysis>> frameAnalysisByUuid(
    const Database &db, const QString &uuid);
// The live analysis called `name`, whole; nothing if there is none.
Result<std::optional<SavedFrameAnalysis>> frameAnalysisByName(
    const Database &db, const QString &name);
// Whether analysis `uuid` is deleted (a tombstone); nothing if there is no such analysis.
Result<std::optional<bool>> frameAnalysisDeleted(const Database &db, const QString &uuid);

} // namespace store
} // namespace fourfold
