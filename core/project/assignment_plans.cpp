#include "core/project/assignment_plans.h"

#include "core/project/project.h"
#include "core/project/reproducible_shuffle.h"
#include "core/project/study_names.h"
#include "core/store/store_util.h"
#include "core/store/study_tables.h"

#include <QSet>

#include <algorithm>
#include <random>

namespace fourfold {

using namespace study;

// --- the rest and explicit assignments -----------------------------------------------------------

Result<AssignmentPlan> AssignmentPlans::planRest(const Project &project, const RestRequest &request)
{
    const qsizetype need = request.coding == RestCoding::Double ? 2 : 1;
    if (request.coders.size() < need)
        return fail(ErrorCode::InvalidArgument,
            request.coding == RestCoding::Double
                ? StudyDesignText::tr("Double coding needs at least two coders; %1 given.")
                      .arg(request.coders.size())
                : StudyDesignText::tr("Name at least one coder for the remaining articles."));
    auto names = loadNames(project.db(), project);
    if (!names)
        return std::unexpected(names.error());
    auto coders = resolveCoders(*names, request.coders);
    if (!coders)
        return std::unexpected(coders.error());
    auto assignments = project.assignments();
    if (!assignments)
        return std::unexpected(assignments.error());
    QSet<qint64> assigned;
    for (const Assignment &a : *assignments)
        assigned.insert(a.article.value);
    std::vector<QString> rest;
    for (const store::FrameArticle &a : names->articles)
        if (!assigned.contains(a.id.value))
            rest.push_back(a.externalId);
    std::mt19937_64 engine(request.seed);
    shuffle(rest, engine);

    const std::size_t k = coders->size();
    AssignmentPlan plan;
    if (request.coding == RestCoding::Single) {
        for (std::size_t i = 0; i < rest.size(); ++i)
            plan.rows.push_back({rest[i], (*coders)[i % k].pseudonym, Phase::Production});
        return plan;
    }
    // Pairs in the order of a round-robin tournament (the circle method, common practice):
    // every round holds each coder at most once, so loads stay even while pairs rotate.
    const std::size_t m = k % 2 == 0 ? k : k + 1; // with a "bye" when k is odd
    std::vector<std::pair<std::size_t, std::size_t>> pairs;
    for (std::size_t round = 0; round + 1 < m; ++round) {
        for (std::size_t i = 0; i < m / 2; ++i) {
            const std::size_t a = i == 0 ? m - 1 : (round + i) % (m - 1);
            const std::size_t b = (round + (m - 1) - i) % (m - 1);
            if (a < k && b < k)
                pairs.emplace_back(std::min(a, b), std::max(a, b));
        }
    }
    for (std::size_t i = 0; i < rest.size(); ++i) {
        const auto &[a, b] = pairs[i % pairs.size()];
        plan.rows.push_back({rest[i], (*coders)[a].pseudonym, Phase::Production});
        plan.rows.push_back({rest[i], (*coders)[b].pseudonym, Phase::Production});
    }
    return plan;
}

Result<AssignmentPlan> AssignmentPlans::planArticles(
    const Project &project, Phase phase, const QStringList &articles, const QStringList &coders)
{
    if (articles.isEmpty() || coders.isEmpty())
        return fail(ErrorCode::InvalidArgument,
            StudyDesignText::tr("Name at least one article and one coder."));
    auto names = loadNames(project.db(), project);
    if (!names)
        return std::unexpected(names.error());
    auto resolved = resolveCoders(*names, coders);
    if (!resolved)
        return std::unexpected(resolved.error());
    for (const QString &a : articles)
        if (!names->articleIndex.contains(a))
            return fail(ErrorCode::NotFound,
                StudyDesignText::tr("There is no article \"%1\" in the project.").arg(a));
    auto assignments = project.assignments();
    if (!assignments)
        return std::unexpected(assignments.error());
    QSet<QString> existing;
    for (const Assignment &a : *assignments)
        if (a.phase == phase)
            existing.insert(names->externalIdById.value(a.article.value) + QLatin1Char('\n')
                + coderLabel(*names, a.coder));
    AssignmentPlan plan;
    QSet<QString> planned;
    for (const QString &a : articles)
        for (const Coder &c : *resolved) {
            const QString key = a + QLatin1Char('\n') + c.pseudonym;
            if (!existing.contains(key) && !planned.contains(key)) {
                planned.insert(key);
                plan.rows.push_back({a, c.pseudonym, phase});
            }
        }
    return plan;
}

Result<std::unique_ptr<AssignEdit>> AssignmentPlans::edit(const Project &project,
    const AssignmentPlan &plan, const QJsonObject &record, CoderId actor, const QString &text)
{
    const Database &db = project.db();
    auto names = loadNames(db, project);
    if (!names)
        return std::unexpected(names.error());
    auto existing = project.assignments();
    if (!existing)
        return std::unexpected(existing.error());
    QSet<QString> present;
    for (const Assignment &a : *existing)
        present.insert(QStringLiteral("%1/%2/%3")
                           .arg(a.article.value)
                           .arg(a.coder.value)
                           .arg(phaseKey(a.phase)));
    std::vector<AssignmentToWrite> rows;
    rows.reserve(plan.rows.size());
    for (const PlannedAssignment &row : plan.rows) {
        const auto article = names->articleIndex.constFind(row.article);
        if (article == names->articleIndex.constEnd())
            return fail(ErrorCode::NotFound,
                StudyDesignText::tr("There is no article \"%1\" in the project.").arg(row.article));
        const auto coder = names->coderByPseudonym.constFind(row.coder);
        if (coder == names->coderByPseudonym.constEnd())
            return fail(ErrorCode::NotFound,
                StudyDesignText::tr("There is no coder \"%1\" in the project.").arg(row.coder));
        if (coder->disabled)
            return fail(ErrorCode::InvalidArgument,
                StudyDesignText::tr(
                    "%1 is disabled and takes no new assignments; enable them first.")
                    .arg(row.coder));
        const ArticleId articleId = names->articles[size_t(*article)].id;
        const QString key = QStringLiteral("%1/%2/%3")
                                .arg(articleId.value)
                                .arg(coder->id.value)
                                .arg(phaseKey(row.phase));
        if (present.contains(key))
            return fail(ErrorCode::Duplicate,
                StudyDesignText::tr("Article \"%1\" is already assigned to %2 in the %3 phase.")
                    .arg(row.article, row.coder, phaseKey(row.phase)));
        present.insert(key);
        rows.push_back({articleId, coder->id, row.phase, store::newUuid()});
    }
    const QString undoText = !text.isEmpty()
        ? text
        : StudyDesignText::tr("Assign %n article(s)", nullptr, int(rows.size()));
    return std::make_unique<AssignEdit>(actor, undoText, std::move(rows), record);
}

Status AssignmentPlans::commit(
    Project &project, const AssignmentPlan &plan, const QJsonObject &record)
{
    auto made = edit(project, plan, record);
    if (!made)
        return std::unexpected(made.error());
    return project.apply(**made);
}

Result<std::vector<AssignmentRow>> AssignmentPlans::rows(
    const Project &project, std::optional<Phase> phase)
{
    auto names = loadNames(project.db(), project);
    if (!names)
        return std::unexpected(names.error());
    auto assignments = project.assignments();
    if (!assignments)
        return std::unexpected(assignments.error());
    std::vector<AssignmentRow> rows;
    for (const Assignment &a : *assignments) {
        if (phase && a.phase != *phase)
            continue;
        if (!names->externalIdById.contains(a.article.value))
            continue; // a deleted article
        rows.push_back({names->externalIdById.value(a.article.value), coderLabel(*names, a.coder),
            a.phase, a.status});
    }
    std::ranges::stable_sort(rows, [](const AssignmentRow &x, const AssignmentRow &y) {
        if (x.phase != y.phase)
            return phaseRank(x.phase) < phaseRank(y.phase);
        if (x.article != y.article)
            return x.article < y.article;
        return x.coder < y.coder;
    });
    return rows;
}

Result<Phase> AssignmentPlans::phaseForNewCoding(
    const Database &db, ArticleId article, CoderId coder, Phase requested)
{
    auto mine = store::coderAssignments(db, article, coder);
    if (!mine)
        return std::unexpected(mine.error());
    if (mine->empty())
        return requested;
    const auto isDone = [](const Assignment &a) { return a.status == QStringLiteral("done"); };
    if (std::ranges::any_of(
            *mine, [&](const Assignment &a) { return a.phase == requested && !isDone(a); }))
        return requested;
    std::optional<Phase> open;
    std::optional<Phase> last;
    for (const Assignment &a : *mine) {
        if (!isDone(a)) {
            if (!open || phaseRank(a.phase) < phaseRank(*open))
                open = a.phase;
        } else if (!last || phaseRank(a.phase) > phaseRank(*last)) {
            last = a.phase;
        }
    }
    if (open)
        return *open;
    if (std::ranges::any_of(*mine, [&](const Assignment &a) { return a.phase == requested; }))
        return requested;
    return *last;
}

} // namespace fourfold
