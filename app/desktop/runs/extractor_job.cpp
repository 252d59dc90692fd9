#include "app/desktop/runs/extractor_job.h"

#include "core/project/project.h"

#include <QCoreApplication>

namespace fourfold {

namespace { } // namespace

Result<ExtractorOutcome> runExtractorJob(const ExtractorRequest &request)
{
    if (request.runs.isEmpty())
        return fail(ErrorCode::InvalidArgument,
            QCoreApplication::translate("ExtractorJob", "Choose at least one run."));
    // A connection of this thread's own: the window's connection stays on the GUI thread.
    auto project = Project::open(request.projectPath);
    if (!project)
        return std::unexpected(project.error());

    ExtractorOutcome out;
    for (const QString &name : request.runs) {
        RunOutcome run;
        run.run = name;
        ScoreOptions options;
        options.mode = request.mode;
        options.bootstrapReplicates = request.bootstrapReplicates;
        options.seed = request.seed;
        if (auto scores = scoreRun(*project, name, request.against, options)) {
            run.scores = std::move(*scores);
            if (auto errors = runErrors(*project, name, request.against, request.mode))
                run.errors = std::move(*errors);
            else
                run.scoreError = errors.error().message;
        } else {
            run.scoreError = scores.error().message;
        }
        RunAgreementOptions agreement;
        agreement.unit = request.agreementUnit;
        if (auto band = runAgreement(*project, name, agreement))
            run.agreement = std::move(*band);
        else
            run.agreementError = band.error().message;
        out.runs.push_back(std::move(run));
    }
    return out;
}

} // namespace fourfold
