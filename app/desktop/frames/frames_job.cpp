#include "app/desktop/frames/frames_job.h"

#include "core/project/project.h"

#include <QCoreApplication>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct FramesJobText {
    Q_DECLARE_TR_FUNCTIONS(FramesJob)
};

std::unexpected<Error> cancelled()
{
    return fail(ErrorCode::Cancelled, FramesJobText::tr("The computation was cancelled."));
}

} // namespace

Result<FramesOutcome> runFramesJob(const FramesRequest &request, const FramesProgress &progress)
{
    // A connection of this thread's own: the window's connection stays on the GUI thread.
    auto project = Project::openForReading(request.projectPath);
    if (!project)
        return std::unexpected(project.error());
    auto input = frameInput(*project, request.layer);
    if (!input)
        return std::unexpected(input.error());
    const int n = int(input->matrix.rows);
    if (n < kFewestFrameArticles)
        return fail(ErrorCode::InvalidInput,
            FramesJobText::tr(
                "The layer %1 holds %n article(s); frames need at least 3.", nullptr, n)
                .arg(request.layer));
    const int total = 1 + request.bootstrap;
    std::atomic<bool> stop = false;
    auto ask = [&](int done) {
        if (progress && !progress(done, total))
            stop = true;
        return !stop.load();
    };
    if (!ask(0))
        return cancelled();

    frames::FrameAnalysisOptions options;
    options.k = request.k;
    options.maxK = request.maxK;
    options.cancelled = &stop;
    auto analysis = frames::analyseFrames(input->matrix, options);
    if (stop.load())
        return cancelled();
    if (!analysis)
        return fail(ErrorCode::InvalidInput,
            FramesJobText::tr("%1: %2").arg(
                input->source, QString::fromStdString(analysis.error())));
    if (!ask(1))
        return cancelled();

    FramesOutcome out;
    out.request = request;
    if (request.bootstrap > 0) {
        frames::StabilityOptions stability;
        stability.replicates = request.bootstrap;
        stability.seed = request.seed;
        stability.cancelled = &stop;
        stability.progress = [&](int done) { ask(1 + done); };
        auto computed = frames::clusterStability(
            input->matrix, analysis->frames.partition, twoStepMethod(analysis->k), stability);
        if (stop.load())
            return cancelled();
        if (!computed)
            return fail(ErrorCode::InvalidInput, QString::fromStdString(computed.error()));
        out.stability = std::move(*computed);
    }
    out.tables = frameGroupTables(*input, analysis->frames.partition);
    out.input = std::move(*input);
    out.analysis = std::move(*analysis);
    return out;
}

} // namespace fourfold
