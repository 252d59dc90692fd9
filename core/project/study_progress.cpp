#include "core/project/study_progress.h"

#include "core/project/pair_matrix.h"
#include "core/project/project.h"
#include "core/project/study_edits.h"
#include "core/project/study_names.h"
#include "core/reliability/krippendorff_alpha.h"
#include "core/store/project_tables.h"
#include "core/store/study_tables.h"

#include <QJsonArray>
#include <QSet>

#include <algorithm>
#include <map>
#include <set>

namespace fourfold {

using namespace study;

namespace {

const QString kEffortKey = QStringLiteral("study.effort_per_coder");

} // namespace

// --- progress and effort ------------------------------------------------------------------------

Result<bool> StudyProgress::effortPerCoderVisible(const Project &project)
{
    auto value = store::setting(project.db(), kEffortKey);
    if (!value)
        return std::unexpected(value.error());
    return *value && **value == QStringLiteral("on");
}

std::unique_ptr<Edit> StudyProgress::effortEdit(bool visible, CoderId lead)
{
    return std::make_unique<SetProjectSettingEdit>(lead,
        visible ? StudyDesignText::tr("Show effort per coder")
                : StudyDesignText::tr("Hide effort per coder"),
        QStringLiteral("setting.effort_per_coder"), kEffortKey,
        visible ? QStringLiteral("on") : QStringLiteral("off"));
}

Status StudyProgress::setEffortPerCoderVisible(Project &project, bool visible, CoderId lead)
{
    return project.apply(*effortEdit(visible, lead));
}

Result<ProgressBoard> StudyProgress::board(const Project &project, std::optional<Phase> phase)
{
    auto names = loadNames(project.db(), project);
    if (!names)
        return std::unexpected(names.error());
    auto visible = effortPerCoderVisible(project);
    if (!visible)
        return std::unexpected(visible.error());
    auto assignments = project.assignments();
    if (!assignments)
        return std::unexpected(assignments.error());
    // Every live span as an outline, by (coder, phase): read once, with one statement.
    std::map<std::pair<qint64, Phase>, std::vector<Annotation>> spansBy;
    FOURFOLD_TRY_STATUS(project.forEachAnnotationOutline([&](Annotation &&a) -> Status {
        spansBy[{a.coder.value, a.phase}].push_back(std::move(a));
        return {};
    }));
    const std::vector<Annotation> noSpans;
    const auto spansOfIn = [&](CoderId coder, Phase ph) -> const std::vector<Annotation> & {
        auto it = spansBy.find({coder.value, ph});
        return it == spansBy.end() ? noSpans : it->second;
    };

    ProgressBoard board;
    board.effortPerCoder = *visible;
    // The one lead with training spans, if there is exactly one.
    std::optional<Coder> master;
    int trainingLeads = 0;
    for (const Coder &c : names->coders)
        if (c.role == CoderRole::Lead && !spansOfIn(c.id, Phase::Training).empty()) {
            master = c;
            ++trainingLeads;
        }
    if (trainingLeads != 1)
        master.reset();
    // Sentence ranges of every article, read with one statement when first needed.
    UnitCache cache(project, UnitKind::Sentence);
    bool unitsLoaded = false;
    const reliability::Metric nominal {reliability::Level::Nominal, {}, {}};

    for (Phase ph : kPhases) {
        if (phase && ph != *phase)
            continue;
        // Per coder of the phase (by pseudonym): their assignments and finished articles.
        std::map<QString, std::vector<Assignment>> byCoder;
        for (const Assignment &a : *assignments)
            if (a.phase == ph && names->externalIdById.contains(a.article.value))
                byCoder[coderLabel(*names, a.coder)].push_back(a);
        if (byCoder.empty())
            continue;
        PhaseEffort effort;
        effort.phase = ph;
        std::map<qint64, std::set<qint64>> doneBy; // coder → articles done
        std::map<qint64, std::set<qint64>> spannedBy; // coder → articles with spans in the phase
        for (const auto &[key, spans] : spansBy)
            if (key.second == ph)
                for (const Annotation &a : spans)
                    spannedBy[key.first].insert(a.article.value);
        for (const auto &[pseudonym, list] : byCoder)
            for (const Assignment &a : list)
                if (a.status == QStringLiteral("done"))
                    doneBy[a.coder.value].insert(a.article.value);

        // Alpha of two coders over the articles both finished (present/absent per unit and
        // function, pooled as one nominal variable); none when undefined. Between two coders who
        // both must have finished, the figure is the same both ways and computed once.
        std::map<std::pair<qint64, qint64>, std::pair<std::optional<double>, int>> mutual;
        auto pairAlpha = [&](CoderId x, CoderId y, bool yNeedsDone,
                             int *articles) -> Result<std::optional<double>> {
            const std::pair<qint64, qint64> key {
                std::min(x.value, y.value), std::max(x.value, y.value)};
            if (yNeedsDone)
                if (auto known = mutual.find(key); known != mutual.end()) {
                    *articles = known->second.second;
                    return known->second.first;
                }
            std::vector<ArticleId> common;
            for (qint64 id : doneBy[x.value]) {
                const bool yCoded =
                    yNeedsDone ? doneBy[y.value].contains(id) : spannedBy[y.value].contains(id);
                if (yCoded)
                    common.push_back(ArticleId {id});
            }
            *articles = int(common.size());
            std::optional<double> alpha;
            if (!common.empty()) {
                if (!unitsLoaded) {
                    FOURFOLD_TRY_STATUS(cache.loadAll());
                    unitsLoaded = true;
                }
                auto m = pairMatrix(cache, common,
                    std::vector<FramingFunction>(
                        kFramingFunctions.begin(), kFramingFunctions.end()),
                    spansOfIn(x, ph), spansOfIn(y, ph));
                if (!m)
                    return std::unexpected(m.error());
                alpha = reliability::krippendorffAlpha(m->data, nominal).value;
            }
            if (yNeedsDone)
                mutual.emplace(key, std::pair {alpha, *articles});
            return alpha;
        };

        for (const auto &[pseudonym, list] : byCoder) {
            ProgressRow row;
            row.coder = pseudonym;
            row.phase = ph;
            qint64 seconds = 0;
            for (const Assignment &a : list) {
                ++row.assigned;
                if (a.status == QStringLiteral("started"))
                    ++row.started;
                else if (a.status == QStringLiteral("done"))
                    ++row.done;
                seconds += a.activeSeconds;
            }
            effort.doneArticles += row.done;
            effort.activeSeconds += seconds;
            if (board.effortPerCoder)
                row.activeSeconds = seconds;
            const CoderId me = list.front().coder;
            if (ph == Phase::Training) {
                if (master && master->id != me) {
                    auto alpha = pairAlpha(me, master->id, false, &row.comparedArticles);
                    if (!alpha)
                        return std::unexpected(alpha.error());
                    row.agreement = *alpha;
                }
            } else {
                double sum = 0;
                int defined = 0;
                for (const auto &[other, otherList] : byCoder) {
                    if (other == pseudonym)
                        continue;
                    int n = 0;
                    auto alpha = pairAlpha(me, otherList.front().coder, true, &n);
                    if (!alpha)
                        return std::unexpected(alpha.error());
                    row.comparedArticles += n;
                    if (*alpha) {
                        sum += **alpha;
                        ++defined;
                    }
                }
                if (defined > 0)
                    row.agreement = sum / defined;
            }
            board.rows.push_back(row);
        }
        if (effort.doneArticles > 0)
            effort.meanSecondsPerDoneArticle = double(effort.activeSeconds) / effort.doneArticles;
        board.effort.push_back(effort);
    }
    return board;
}

QJsonObject StudyProgress::boardJson(const ProgressBoard &board)
{
    QJsonArray rows;
    for (const ProgressRow &r : board.rows) {
        QJsonObject o {{QStringLiteral("coder"), r.coder},
            {QStringLiteral("phase"), phaseKey(r.phase)}, {QStringLiteral("assigned"), r.assigned},
            {QStringLiteral("started"), r.started}, {QStringLiteral("done"), r.done},
            {QStringLiteral("agreement"), r.agreement ? QJsonValue(*r.agreement) : QJsonValue()},
            {QStringLiteral("compared_articles"), r.comparedArticles}};
        if (r.activeSeconds)
            o.insert(QStringLiteral("active_seconds"), *r.activeSeconds);
        rows.append(o);
    }
    QJsonArray effort;
    for (const PhaseEffort &e : board.effort)
        effort.append(QJsonObject {{QStringLiteral("phase"), phaseKey(e.phase)},
            {QStringLiteral("done_articles"), e.doneArticles},
            {QStringLiteral("active_seconds"), e.activeSeconds},
            {QStringLiteral("mean_seconds_per_done_article"),
                e.meanSecondsPerDoneArticle ? QJsonValue(*e.meanSecondsPerDoneArticle)
                                            : QJsonValue()}});
    return QJsonObject {{QStringLiteral("effort_per_coder"), board.effortPerCoder},
        {QStringLiteral("rows"), rows}, {QStringLiteral("effort"), effort}};
}

} // namespace fourfold
