#include "app/desktop/article_document.h"

#include "core/project/project.h"

#include <algorithm>
#include <iterator>

namespace fourfold {

ArticleDocument::ArticleDocument(const Project &project, const Coder &coder)
    : m_project(project)
    , m_coder(coder)
{ }

Status ArticleDocument::open(ArticleId article, bool allCoders)
{
    close();
    auto read = m_project.article(article);
    if (!read)
        return std::unexpected(read.error());
    m_article = std::move(*read);
    m_allCoders = allCoders;
    if (auto st = reload(Part::Everything); !st) {
        close();
        return st;
    }
    return {};
}

void ArticleDocument::close()
{
    m_article.reset();
    m_read.clear();
    m_spans.clear();
    m_links.clear();
    m_answers.clear();
    m_assignments.clear();
}

Status ArticleDocument::setAllCoders(bool allCoders)
{
    m_allCoders = allCoders;
    return reload(Part::Spans);
}

void ArticleDocument::setCoderFilter(CoderId coder)
{
    m_filter = coder;
    applyFilter();
}

void ArticleDocument::applyFilter()
{
    if (!m_allCoders || !m_filter.isValid()) {
        m_spans = m_read;
        return;
    }
    m_spans.clear();
    std::ranges::copy_if(m_read, std::back_inserter(m_spans),
        [this](const Annotation &a) { return a.coder == m_filter; });
}

Status ArticleDocument::reload(Parts parts)
{
    if (!m_article)
        return {};
    const ArticleId article = id();
    if (parts.testFlag(Part::Spans)) {
        auto spans = m_allCoders ? m_project.annotations(article)
                                 : m_project.annotations(article, m_coder.id);
        if (!spans)
            return std::unexpected(spans.error());
        m_read = std::move(*spans);
        applyFilter();
    }
    if (parts.testFlag(Part::Links)) {
        auto links = m_project.links(article);
        if (!links)
            return std::unexpected(links.error());
        m_links = std::move(*links);
    }
    if (parts.testFlag(Part::Answers)) {
        auto all = m_project.judgements(article);
        if (!all)
            return std::unexpected(all.error());
        m_answers.clear();
        for (Judgement &j : *all)
            if (j.coder == m_coder.id)
                m_answers.push_back(std::move(j));
    }
    if (parts.testFlag(Part::Assignments)) {
        auto assignments = m_project.assignments(article, m_coder.id);
        if (!assignments)
            return std::unexpected(assignments.error());
        m_assignments = std::move(*assignments);
    }
    return {};
}

std::optional<Annotation> ArticleDocument::span(AnnotationId id) const
{
    for (const Annotation &a : m_spans)
        if (a.id == id)
            return a;
    return std::nullopt;
}

QString ArticleDocument::status() const
{
    QString status = QStringLiteral("assigned");
    for (const Assignment &x : m_assignments) {
        if (x.status == QLatin1String("done"))
            return x.status;
        if (x.status == QLatin1String("started"))
            status = x.status;
    }
    // Spans or answers mean the work has started, whatever the assignment says.
    const bool ownSpans = std::any_of(m_read.begin(), m_read.end(),
        [this](const Annotation &a) { return a.coder == m_coder.id; });
    if (status == QLatin1String("assigned") && (ownSpans || !m_answers.empty()))
        status = QStringLiteral("started");
    return status;
}

qint64 ArticleDocument::seconds() const
{
    qint64 seconds = 0;
    for (const Assignment &x : m_assignments)
        seconds += x.activeSeconds;
    return seconds;
}

Phase ArticleDocument::phase() const
{
    return m_assignments.empty() ? Phase::Production : m_assignments.front().phase;
}

} // namespace fourfold
