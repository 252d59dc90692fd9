#pragma once
// ExtractorRuns: the stored runs of automatic extractors, beside Project (design.md §2, §4).
// A run is written whole or not at all.
//
// CONTRACT shared by the extractor work (which implements it) and the scoring/export work (which
// reads runs through it). Extend it; do not change these signatures without telling the lead.

#include "core/model/error.h"
#include "core/model/extractor_run.h"

#include <functional>
#include <optional>
#include <vector>

namespace fourfold {

class Extractor;
class Project;

class ExtractorRuns
{
public:
    // Every run of the project, oldest first.
    // How many articles an extractor that reads each article alone is given at a time.
    static constexpr size_t kArticlesPerBatch = 256;

    static Result<std::vector<ExtractorRun>> runs(const Project &project);
    // The run called `name`, or nothing.
    static Result<std::optional<ExtractorRun>> runByName(
        const Project &project, const QString &name);
    // The spans of `run` (of one article when `article` is valid), by article then start.
    static Result<std::vector<ExtractedSpan>> spans(
        const Project &project, RunId run, ArticleId article = {});
    // The same spans of the whole run, handed over one at a time (one statement, one row held).
    static Status forEachSpan(
        const Project &project, RunId run, const std::function<Status(ExtractedSpan &&)> &visit);

    // --- writing runs (each whole or not at all, logged in the event log) -------------------
    // Runs `extractor` over the project's articles (all of them when `articles` is empty) and
    // stores its spans as a run called `name`, with the extractor's version and parameters
    // ({"extractor": kind, ...}). InvalidArgument for an empty name, Duplicate if the name is
    // taken (checked before the extractor runs), NotFound for an unknown article, the
    // extractor's own error if it fails; nothing is stored on any failure.
    static Result<ExtractorRun> create(Project &project, Extractor &extractor, const QString &name,
        const std::vector<ArticleId> &articles = {});
    // Imports a finished run from a span file (JSON Lines, one span per line, articles by
    // external id; see extractor_protocol.h) as a run called `name`. The parameters stored are
    // `parameters` plus {"extractor": "file", "file": file name, "sha256": of the file}. Io if
    // the file cannot be read; InvalidInput naming the file, line and column for a malformed
    // line; as create() otherwise. Nothing is stored on any failure.
    static Result<ExtractorRun> importRun(Project &project, const QString &name,
        const QString &path, const QString &version = {}, const QJsonObject &parameters = {});
    // Stores finished `spans` as `run` (its name, version, parameters; id, uuid and time are
    // set here). Every span must lie inside its article. Errors as create().
    static Result<ExtractorRun> storeRun(
        Project &project, ExtractorRun run, const std::vector<ExtractedSpan> &spans);
    // Deletes the run called `name` and its spans (runs are machine output: no tombstone; the
    // deletion is logged). NotFound if there is no such run.
    static Status deleteRun(Project &project, const QString &name);
    // The number of spans of `run`.
    static Result<qint64> spanCount(const Project &project, RunId run);
};

} // namespace fourfold
