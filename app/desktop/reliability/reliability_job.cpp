#include "app/desktop/reliability/reliability_job.h"

#include "core/project/project.h"

#include <QCoreApplication>

namespace fourfold {

namespace {

// Counts the job's steps and asks the caller whether to go on.
class Steps
{
public:
    Steps(const JobProgress &progress, int total)
        : m_progress(progress)
        , m_total(total)
    { }
    bool next()
    {
        ++m_done;
        return !m_progress || m_progress(m_done, m_total);
    }
    // For a core call's own progress: only cancellation is passed on.
    DiagnosticsProgress inner() const
    {
        return [this](int, int) { return !m_progress || m_progress(m_done, m_total); };
    }

private:
    const JobProgress &m_progress;
    int m_total = 0;
    int m_done = 0;
};

std::unexpected<Error> cancelled()
{
    return fail(ErrorCode::Cancelled,
        QCoreApplication::translate("ReliabilityJob", "The computation was cancelled."));
}

} // namespace

Result<ReliabilityOutcome> runReliabilityJob(
    const ReliabilityRequest &request, const JobProgress &progress)
{
    if (request.functions.empty() && request.unit != UnitKind::Article)
        return fail(ErrorCode::InvalidArgument,
            QCoreApplication::translate("ReliabilityJob", "Choose at least one framing function."));
    // A connection of this thread's own: the window's connection stays on the GUI thread.
    auto project = Project::open(request.projectPath);
    if (!project)
        return std::unexpected(project.error());

    UnitSelection base;
    base.coders = request.coders;
    base.phase = request.phase;
    base.includeGold = request.includeGold;
    base.includeUnfinished = request.includeUnfinished;
    // One read of the codings that count serves every analysis.
    auto run = AgreementRun::load(*project, base);
    if (!run)
        return std::unexpected(run.error());

    ReliabilityOutcome out;
    out.leftOut = run->codings().leftOut;
    AgreementOptions agreement;
    agreement.bootstrapReplicates = request.bootstrapReplicates;
    agreement.seed = request.seed;

    if (request.unit == UnitKind::Continuum) {
        Steps steps(progress, 2);
        auto continuum = run->continuum(request.functions.size() == 1
                ? std::optional<FramingFunction>(request.functions.front())
                : std::nullopt);
        if (!continuum)
            return std::unexpected(continuum.error());
        out.coders = continuum->data.coders;
        out.continuumArticles = int(continuum->data.articles.size());
        out.continuumLength = continuum->data.length;
        out.unitizing = std::move(continuum->unitizing);
        if (!steps.next())
            return cancelled();
        auto matching = run->matching(steps.inner());
        if (!matching)
            return std::unexpected(matching.error());
        out.matching = std::move(*matching);
        if (!steps.next())
            return cancelled();
        return out;
    }

    // One column per function, then the chosen functions as sets; or the article item alone.
    std::vector<AnalysisRequest> analyses;
    if (request.unit == UnitKind::Article) {
        AnalysisRequest a;
        a.unit = UnitKind::Article;
        a.item = request.item;
        analyses.push_back(a);
    } else {
        for (FramingFunction f : request.functions) {
            AnalysisRequest a;
            a.unit = request.unit;
            a.function = f;
            analyses.push_back(a);
        }
        if (request.functions.size() > 1) {
            AnalysisRequest a;
            a.unit = request.unit;
            a.setFunctions = request.functions;
            analyses.push_back(a);
        }
    }

    Steps steps(progress, int(analyses.size()) + 4);
    std::optional<AnalysisResult> main;
    for (const AnalysisRequest &a : analyses) {
        auto analysed = run->analyse(a, agreement);
        if (!analysed)
            return std::unexpected(analysed.error());
        ReliabilityColumn column;
        column.function = a.function;
        column.report = analysed->report;
        out.columns.push_back(std::move(column));
        out.coders = analysed->table.coders;
        main = std::move(*analysed);
        if (!steps.next())
            return cancelled();
    }
    out.mainColumn = int(out.columns.size()) - 1;

    auto costs = leaveOneOutCosts(*main, steps.inner());
    if (!costs)
        return std::unexpected(costs.error());
    out.coderCosts = std::move(costs->coders);
    out.articleCosts = std::move(costs->articles);
    if (!steps.next() || !steps.next())
        return cancelled();
    if (request.unit != UnitKind::Article) {
        auto matching = run->matching(steps.inner());
        if (!matching)
            return std::unexpected(matching.error());
        out.matching = std::move(*matching);
    }
    if (!steps.next())
        return cancelled();
    auto periods = run->periods(*main, request.period, request.batchSize, steps.inner());
    if (!periods)
        return std::unexpected(periods.error());
    out.periods = std::move(*periods);
    if (!steps.next())
        return cancelled();
    return out;
}

} // namespace fourfold
