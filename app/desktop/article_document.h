#pragma once
// The article open on the desk as the desk shows it: its text, the spans shown, their links, this
// person's answers and assignments. Read once when the article opens; after each applied edit or
// undo only the parts the edit touches are read again, so a key press costs the edit's own
// statements and one read of the spans, not a read of everything the desk shows.

#include "core/model/annotation.h"
#include "core/model/article.h"
#include "core/model/coder.h"
#include "core/model/error.h"

#include <QFlags>

#include <optional>
#include <vector>

namespace fourfold {

class Project;

class ArticleDocument
{
public:
    // What an edit touches. The desk's document holds the first four; the comparison's
    // (ComparisonDocument) the spans, answers and assignments and the lead's decisions: gold
    // spans, rejections of coders' spans and gold answers.
    enum class Part {
        Spans = 0x1,
        Links = 0x2,
        Answers = 0x4,
        Assignments = 0x8,
        Gold = 0x10,
        Rejections = 0x20,
        GoldAnswers = 0x40,
        Everything = 0x7F,
    };
    Q_DECLARE_FLAGS(Parts, Part)

    // `project` and `coder` outlive the document.
    ArticleDocument(const Project &project, const Coder &coder);

    // Reads `article` whole; on failure the document is left closed.
    Status open(ArticleId article, bool allCoders);
    void close();
    // Reads `parts` of the open article again (nothing when it is closed).
    Status reload(Parts parts);
    // Shows every coder's spans (a lead) or the person's own; reads the spans again.
    Status setAllCoders(bool allCoders);
    // With every coder's spans: shows only those of `coder` (an invalid id: all of them). No
    // read: the spans are at hand.
    void setCoderFilter(CoderId coder);
    CoderId coderFilter() const { return m_filter; }

    bool isOpen() const { return m_article.has_value(); }
    ArticleId id() const { return m_article ? m_article->summary.id : ArticleId {}; }
    const Article &article() const { return *m_article; }
    // The spans shown: the person's own, or everyone's with allCoders (only the filter's coder's
    // when one is set).
    const std::vector<Annotation> &spans() const { return m_spans; }
    // The spans read, before the coder filter: what the legend counts.
    const std::vector<Annotation> &unfilteredSpans() const { return m_read; }
    std::optional<Annotation> span(AnnotationId id) const;
    const std::vector<AnnotationLink> &links() const { return m_links; }
    // The person's own answers to article-level items.
    const std::vector<Judgement> &answers() const { return m_answers; }
    // "assigned" (not started), "started" (spans or answers, or the assignment says so) or
    // "done"; the active seconds over the person's assignments; the phase of the first one
    // (production without an assignment).
    QString status() const;
    qint64 seconds() const;
    Phase phase() const;

private:
    const Project &m_project;
    const Coder &m_coder;
    void applyFilter();

    bool m_allCoders = false;
    CoderId m_filter;
    std::optional<Article> m_article;
    std::vector<Annotation> m_read; // as read: the person's own or everyone's
    std::vector<Annotation> m_spans; // m_read through the coder filter
    std::vector<AnnotationLink> m_links;
    std::vector<Judgement> m_answers;
    std::vector<Assignment> m_assignments;
};

Q_DECLARE_OPERATORS_FOR_FLAGS(ArticleDocument::Parts)

} // namespace fourfold
