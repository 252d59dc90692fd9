#pragma once
// The article open in the comparison window as a lead compares it: its text, every coder's spans
// and answers, who has coded it (its coding scope), its gold spans with their sources, the
// rejections and the gold answers. The session holds it beside the desk's document and keeps it
// up to date: read once when the article opens, and after each applied edit, undo or redo only
// the parts the edit touches are read again (a gold span: the gold spans; a rejection: the
// rejections; a gold answer: the gold answers; a coder's span: the spans and the scope), so one
// adjudication costs the edit's own statements and one bounded read, whatever the size of the
// article or the project. Comparing and the queue's row of the article need no read at all.

#include "app/desktop/article_document.h"
#include "core/agreement/disagreements.h"
#include "core/model/gold_judgement.h"
#include "core/project/coding_scope.h"

#include <optional>
#include <vector>

namespace fourfold {

class Project;

class ComparisonDocument
{
public:
    // `project` outlives the document.
    explicit ComparisonDocument(const Project &project);

    // Reads `article` whole (and the project's people); on failure the document is left closed.
    Status open(ArticleId article);
    void close();
    // Reads `parts` of the open article again (nothing when it is closed): Spans, Answers and
    // Assignments also read the coding scope; Links read nothing (the comparison shows none).
    Status reload(ArticleDocument::Parts parts);

    bool isOpen() const { return m_article.has_value(); }
    ArticleId id() const { return m_article ? m_article->summary.id : ArticleId {}; }
    const Article &article() const { return *m_article; }
    // Every person of the project (pseudonyms name the columns).
    const std::vector<Coder> &people() const { return m_people; }
    // Every coder's spans of the article, as Project::annotations gives them.
    const std::vector<Annotation> &spans() const { return m_spans; }
    const std::vector<GoldAnnotation> &gold() const { return m_gold; }
    const std::vector<GoldRejection> &rejections() const { return m_rejections; }
    // Every coder's live answers to the article's items, and the live gold answers.
    const std::vector<Judgement> &answers() const { return m_answers; }
    const std::vector<GoldJudgement> &goldAnswers() const { return m_goldAnswers; }
    bool isRejected(AnnotationId span) const;

    // The coders whose coding of the article counts (articleCoders: done, or in progress too
    // with `includeUnfinished`), in pseudonym order.
    std::vector<Coder> countingCoders(bool includeUnfinished) const;
    // compareArticle on the document, without a read (the same errors; no passages when no
    // article is open).
    Result<Comparison> compare(const ComparisonFilter &filter) const;
    // articleDisagreement on the document: `row` (the queue's row of this article) computed
    // anew for its coders, without a read.
    Result<ArticleDisagreement> queueRow(
        const ArticleDisagreement &row, const ComparisonFilter &filter) const;

private:
    ArticleCodings codings() const;

    const Project &m_project;
    std::optional<Article> m_article;
    std::vector<Coder> m_people;
    std::optional<CodingScope> m_scope;
    std::vector<Annotation> m_spans;
    std::vector<GoldAnnotation> m_gold;
    std::vector<GoldRejection> m_rejections;
    std::vector<Judgement> m_answers;
    std::vector<GoldJudgement> m_goldAnswers;
};

} // namespace fourfold
