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

ReliabilityTable restrictSets(const ReliabilityTable &table, const QStringList &keep)
{
    ReliabilityTable out = table;
    for (QStringList &row : out.cells)
        for (QString &cell : row) {
            if (cell.isEmpty())
                continue;
            QStringList kept;
            for (const QString &key : cell.split(QLatin1Char('|'), Qt::SkipEmptyParts))
                if (keep.contains(key))
                    kept << key;
            cell = kept.isEmpty() ? QStringLiteral("{}") : kept.join(QLatin1Char('|'));
        }
    return out;
}

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
    base.unit = request.unit;
    base.coders = request.coders;
    base.phase = request.phase;
    base.item = request.item;
    base.includeGold = request.includeGold;
    base.includeUnfinished = request.includeUnfinished;
    // One read of the codings that count serves every analysis.
    auto counted = countedCodings(*project, base);
    if (!counted)
        return std::unexpected(counted.error());

    ReliabilityOutcome out;
    out.leftOut = counted->leftOut;
    AgreementOptions agreement;
    agreement.bootstrapReplicates = request.bootstrapReplicates;
    agreement.seed = request.seed;

    QStringList keys;
    for (FramingFunction f : request.functions)
        keys << functionKey(f);

    if (request.unit == UnitKind::Continuum) {
        Steps steps(progress, 2);
        UnitSelection sel = base;
        if (request.functions.size() == 1)
            sel.function = request.functions.front();
        auto continuum = continuumData(*counted, sel);
        if (!continuum)
            return std::unexpected(continuum.error());
        out.coders = continuum->coders;
        out.continuumArticles = int(continuum->articles.size());
        out.continuumLength = continuum->length;
        out.unitizing = reliability::unitizingAlpha(0, continuum->length,
            int(continuum->coders.size()), continuum->categories, continuum->units);
        if (!out.unitizing->inputError.empty())
            return fail(ErrorCode::Internal,
                QCoreApplication::translate(
                    "ReliabilityJob", "The continuum could not be compared."),
                QString::fromStdString(out.unitizing->inputError));
        if (!steps.next())
            return cancelled();
        auto matching = matchSpans(*counted, base, steps.inner());
        if (!matching)
            return std::unexpected(matching.error());
        out.matching = std::move(*matching);
        if (!steps.next())
            return cancelled();
        return out;
    }

    struct Analysis {
        UnitSelection selection;
        EncodingOptions encoding;
        std::optional<FramingFunction> function;
        bool sets = false;
    };
    std::vector<Analysis> analyses;
    if (request.unit == UnitKind::Article) {
        Analysis a {base, {}, std::nullopt, false};
        auto book = project->codebook();
        if (!book)
            return std::unexpected(book.error());
        if (const ArticleItem *item = book->item(request.item);
            item && item->level == MeasurementLevel::Ordinal) {
            a.encoding.level = reliability::Level::Ordinal;
            a.encoding.order = item->values;
        }
        analyses.push_back(a);
    } else {
        for (FramingFunction f : request.functions) {
            Analysis a {base, {}, f, false};
            a.selection.function = f;
            analyses.push_back(a);
        }
        if (request.functions.size() > 1) {
            Analysis a {base, {}, std::nullopt, true};
            a.encoding.distance = reliability::SetDistance::Masi;
            analyses.push_back(a);
        }
    }

    Steps steps(progress, int(analyses.size()) + 4);
    ReliabilityTable mainTable;
    std::optional<EncodedData> mainEncoded;
    for (const Analysis &a : analyses) {
        auto table = unitTable(*project, *counted, a.selection);
        if (!table)
            return std::unexpected(table.error());
        if (a.sets)
            *table = restrictSets(*table, keys);
        auto encoded = encodeTable(*table, a.encoding);
        if (!encoded)
            return std::unexpected(encoded.error());
        const QString scale =
            a.encoding.distance ? setDistanceKey(*a.encoding.distance) : levelKey(a.encoding.level);
        ReliabilityColumn column;
        column.function = a.function;
        column.report = computeAgreement(*encoded, table->coders, scale, agreement);
        out.columns.push_back(std::move(column));
        out.coders = table->coders;
        mainTable = std::move(*table);
        mainEncoded = std::move(*encoded);
        if (!steps.next())
            return cancelled();
    }
    out.mainColumn = int(out.columns.size()) - 1;
    const Analysis &main = analyses.back();

    auto coderCosts = leaveOneCoderOut(*mainEncoded, mainTable.coders, steps.inner());
    if (!coderCosts)
        return std::unexpected(coderCosts.error());
    out.coderCosts = std::move(*coderCosts);
    if (!steps.next())
        return cancelled();
    auto articleCosts = leaveOneArticleOut(*mainEncoded, mainTable.units, steps.inner());
    if (!articleCosts)
        return std::unexpected(articleCosts.error());
    out.articleCosts = std::move(*articleCosts);
    if (!steps.next())
        return cancelled();
    if (request.unit != UnitKind::Article) {
        auto matching = matchSpans(*counted, base, steps.inner());
        if (!matching)
            return std::unexpected(matching.error());
        out.matching = std::move(*matching);
    }
    if (!steps.next())
        return cancelled();
    // Sets restricted to the chosen functions are not what unitTable gives per period, so the
    // periods use the main table as built above.
    auto periods = alphaByPeriod(*project, main.selection, mainTable, main.encoding, request.period,
        request.batchSize, steps.inner());
    if (!periods)
        return std::unexpected(periods.error());
    out.periods = std::move(*periods);
    if (!steps.next())
        return cancelled();
    return out;
}

} // namespace fourfold
