#pragma once
// Extractor runs and their spans (tables extractor_run and extracted_span, schema migration 1).
// Runs are machine output: they are written whole by core/extract and removed whole.

#include "core/model/error.h"
#include "core/model/extractor_run.h"

#include <functional>
#include <optional>
#include <vector>

namespace fourfold {
class Database;
namespace store {

// Inserts `run` (uuid, name, version, parameters, createdAt as given; `run.id` ignored).
// Constraint if the name or uuid is taken.
Result<RunId> insertRun(Database &db, const ExtractorRun &run);
// Inserts `spans` under `run` (each span's own `run` field is ignored). Constraint if an
// article does not exist or a range is empty or negative.
Status insertExtractedSpans(Database &db, RunId run, const std::vector<ExtractedSpan> &spans);
// Removes the run and (by ON DELETE CASCADE) its spans. NotFound if there is no such run.
Status removeRun(Database &db, RunId run);
// Every run, oldest first (by creation time, then id).
Result<std::vector<ExtractorRun>> runs(const Database &db);
// The run called `name`, or nothing.
Result<std::optional<ExtractorRun>> runByName(const Database &db, const QString &name);
// The spans of `run` (of one article when `article` is valid), by article, start, end, function.
Result<std::vector<ExtractedSpan>> extractedSpans(const Database &db, RunId run, ArticleId article);
// Every span of `run` in the same order, handed to `visit` one at a time (one statement).
Status forEachExtractedSpan(
    const Database &db, RunId run, const std::function<Status(ExtractedSpan &&)> &visit);
// The number of spans of `run`.
Result<qint64> extractedSpanCount(const Database &db, RunId run);

} // namespace store
} // namespace fourfold
