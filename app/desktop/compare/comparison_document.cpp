#include "app/desktop/compare/comparison_document.h"

#include "core/project/project.h"

#include <algorithm>

namespace fourfold {

namespace {

// Reads `read` into `into`, or returns its error.
template<typename T>
Status take(Result<T> read, T &into)
{
    if (!read)
        return std::unexpected(read.error());
    into = std::move(*read);
    return {};
}

} // namespace

ComparisonDocument::ComparisonDocument(const Project &project)
    : m_project(project)
{ }

Status ComparisonDocument::open(ArticleId article)
{
    close();
    auto read = m_project.article(article);
    if (!read)
        return std::unexpected(read.error());
    m_article = std::move(*read);
    Status st = take(m_project.coders(), m_people);
    if (st)
        st = reload(ArticleDocument::Part::Everything);
    if (!st)
        close();
    return st;
}

void ComparisonDocument::close()
{
    m_article.reset();
    m_people.clear();
    m_scope.reset();
    m_spans.clear();
    m_gold.clear();
    m_rejections.clear();
    m_answers.clear();
    m_goldAnswers.clear();
}

Status ComparisonDocument::reload(ArticleDocument::Parts parts)
{
    using Part = ArticleDocument::Part;
    if (!m_article)
        return {};
    const ArticleId article = id();
    if (parts.testFlag(Part::Spans))
        FOURFOLD_TRY_STATUS(take(m_project.annotations(article), m_spans));
    if (parts.testFlag(Part::Answers))
        FOURFOLD_TRY_STATUS(take(m_project.judgements(article), m_answers));
    // Spans, answers and a status decide whose coding counts.
    if (parts & (Part::Spans | Part::Answers | Part::Assignments)) {
        auto scope = CodingScope::loadArticle(m_project, article);
        if (!scope)
            return std::unexpected(scope.error());
        m_scope = std::move(*scope);
    }
    if (parts.testFlag(Part::Gold))
        FOURFOLD_TRY_STATUS(take(m_project.goldAnnotations(article), m_gold));
    if (parts.testFlag(Part::Rejections))
        FOURFOLD_TRY_STATUS(take(m_project.goldRejections(article), m_rejections));
    if (parts.testFlag(Part::GoldAnswers))
        FOURFOLD_TRY_STATUS(take(m_project.goldJudgements(article), m_goldAnswers));
    return {};
}

bool ComparisonDocument::isRejected(AnnotationId span) const
{
    return std::ranges::find(m_rejections, span, &GoldRejection::annotation) != m_rejections.end();
}

std::vector<Coder> ComparisonDocument::countingCoders(bool includeUnfinished) const
{
    std::vector<Coder> out;
    if (!m_scope)
        return out;
    for (const Coder &c : m_people) {
        const CodingState state = m_scope->state(id(), c.id);
        if (state == CodingState::Done || (includeUnfinished && state == CodingState::InProgress))
            out.push_back(c);
    }
    std::ranges::sort(out, {}, &Coder::pseudonym);
    return out;
}

ArticleCodings ComparisonDocument::codings() const
{
    ArticleCodings codings {m_spans, m_gold, {}};
    for (const GoldRejection &r : m_rejections)
        codings.rejected.push_back(r.annotation);
    return codings;
}

Result<Comparison> ComparisonDocument::compare(const ComparisonFilter &filter) const
{
    if (!m_article)
        return Comparison {}; // nothing open: nothing to compare
    return compareCodings(id(), m_article->summary.title, countingCoders(filter.includeUnfinished),
        codings(), filter);
}

Result<ArticleDisagreement> ComparisonDocument::queueRow(
    const ArticleDisagreement &row, const ComparisonFilter &filter) const
{
    // As articleDisagreement: the row keeps its coders (they already are the pair when one is
    // chosen).
    std::vector<Coder> coders;
    for (CoderId id : row.coders) {
        Coder c;
        c.id = id;
        coders.push_back(c);
    }
    ComparisonFilter all = filter;
    all.coderPair.reset();
    auto comparison = compareCodings(row.article.id, row.article.title, coders, codings(), all);
    if (!comparison)
        return std::unexpected(comparison.error());
    return disagreementRow(row.article, *comparison);
}

} // namespace fourfold
