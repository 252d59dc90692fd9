#include "core/project/coding_scope.h"

#include "core/project/project.h"
#include "core/store/database.h"
#include "core/store/project_tables.h"

namespace fourfold {

namespace {

struct PairFacts {
    bool inPhase = false; // an assignment, span or answer in the selected phase
    bool done = false; // some assignment of the pair is marked done (marking sets every phase)
    bool touched = false; // started in the phase, or spans or answers in the phase
};

} // namespace

Result<CodingScope> CodingScope::load(const Project &project, const CodingScopeOptions &options)
{
    return loadArticle(project, ArticleId {}, options);
}

Result<CodingScope> CodingScope::loadArticle(
    const Project &project, ArticleId article, const CodingScopeOptions &options)
{
    auto assignments = store::assignments(project.db(), article);
    if (!assignments)
        return std::unexpected(assignments.error());
    auto coded = store::codedTriples(project.db(), article);
    if (!coded)
        return std::unexpected(coded.error());
    const auto wanted = [&](Phase p) { return !options.phase || *options.phase == p; };

    QHash<QPair<qint64, qint64>, PairFacts> facts;
    for (const Assignment &a : *assignments) {
        PairFacts &f = facts[{a.article.value, a.coder.value}];
        f.done = f.done || a.status == QLatin1String("done");
        if (wanted(a.phase)) {
            f.inPhase = true;
            f.touched = f.touched || a.status != QLatin1String("assigned");
        }
    }
    for (const store::CodedTriple &t : *coded)
        if (wanted(t.phase)) {
            PairFacts &f = facts[{t.article.value, t.coder.value}];
            f.inPhase = f.touched = true;
        }

    CodingScope scope;
    scope.m_options = options;
    for (auto it = facts.cbegin(); it != facts.cend(); ++it) {
        const PairFacts &f = it.value();
        if (!f.inPhase)
            continue;
        if (f.done)
            scope.m_states.insert(it.key(), CodingState::Done);
        else if (f.touched)
            scope.m_states.insert(it.key(), CodingState::InProgress);
    }
    return scope;
}

CodingState CodingScope::state(ArticleId article, CoderId coder) const
{
    return m_states.value({article.value, coder.value}, CodingState::Untouched);
}

bool CodingScope::counts(ArticleId article, CoderId coder) const
{
    const CodingState s = state(article, coder);
    return s == CodingState::Done || (m_options.includeUnfinished && s == CodingState::InProgress);
}

bool CodingScope::leftOut(ArticleId article, CoderId coder) const
{
    return !m_options.includeUnfinished && state(article, coder) == CodingState::InProgress;
}

} // namespace fourfold
