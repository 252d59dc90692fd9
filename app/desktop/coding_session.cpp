#include "app/desktop/coding_session.h"

#include "app/desktop/edit_command.h"
#include "core/project/annotation_edits.h"
#include "core/project/article_status_edit.h"
#include "core/project/coding_scope.h"

#include <QHash>
#include <QSet>

namespace fourfold {

CodingSession::CodingSession(Project project, Coder coder, QObject *parent)
    : QObject(parent)
    , m_project(std::move(project))
    , m_coder(std::move(coder))
{
    if (auto book = m_project.codebook())
        m_codebook = *book;
}

CodingSession::~CodingSession()
{
    // Commands refer to the project: drop them before it goes.
    m_undo.clear();
}

void CodingSession::setShowAllCoders(bool on)
{
    m_showAll = on;
}

std::vector<ArticleRow> CodingSession::articleRows() const
{
    auto all = m_project.articles();
    auto assignments = m_project.assignments();
    // Spans or answers mean the work has started, whatever the assignment says (CodingScope
    // knows who holds codings where).
    auto scope = CodingScope::load(m_project);
    if (!all || !assignments || !scope)
        return {};
    struct Mine {
        QString status = QStringLiteral("assigned");
        qint64 seconds = 0;
    };
    QHash<qint64, Mine> mine;
    for (const Assignment &x : *assignments) {
        if (x.coder != m_coder.id)
            continue;
        Mine &m = mine[x.article.value];
        m.seconds += x.activeSeconds;
        if (x.status == QLatin1String("done")
            || (x.status == QLatin1String("started") && m.status != QLatin1String("done")))
            m.status = x.status;
    }
    std::vector<ArticleRow> out;
    out.reserve(all->size());
    for (const ArticleSummary &s : *all) {
        auto it = mine.constFind(s.id.value);
        if (it == mine.constEnd() && !isLead())
            continue;
        ArticleRow row {s, it == mine.constEnd() ? QStringLiteral("assigned") : it->status,
            it == mine.constEnd() ? 0 : it->seconds};
        if (row.status == QLatin1String("assigned")
            && scope->state(s.id, m_coder.id) != CodingState::Untouched)
            row.status = QStringLiteral("started");
        out.push_back(std::move(row));
    }
    return out;
}

QString CodingSession::articleStatus(ArticleId article) const
{
    QString status = QStringLiteral("assigned");
    if (auto a = m_project.assignments(article, m_coder.id))
        for (const Assignment &x : *a) {
            if (x.status == QLatin1String("done"))
                return x.status;
            if (x.status == QLatin1String("started"))
                status = x.status;
        }
    // Spans or answers mean the work has started, whatever the assignment says.
    if (status == QLatin1String("assigned")) {
        if (auto own = m_project.annotations(article, m_coder.id); own && !own->empty())
            status = QStringLiteral("started");
    }
    return status;
}

qint64 CodingSession::secondsSpent(ArticleId article) const
{
    qint64 seconds = 0;
    if (auto a = m_project.assignments(article, m_coder.id))
        for (const Assignment &x : *a)
            seconds += x.activeSeconds;
    return seconds;
}

Phase CodingSession::phaseOf(ArticleId article) const
{
    if (auto a = m_project.assignments(article, m_coder.id))
        for (const Assignment &x : *a)
            return x.phase;
    return Phase::Production;
}

std::vector<Annotation> CodingSession::visibleAnnotations(ArticleId article) const
{
    auto spans = showsAllCoders() ? m_project.annotations(article)
                                  : m_project.annotations(article, m_coder.id);
    return spans ? *spans : std::vector<Annotation> {};
}

std::vector<Judgement> CodingSession::ownJudgements(ArticleId article) const
{
    std::vector<Judgement> out;
    if (auto all = m_project.judgements(article))
        for (const Judgement &j : *all)
            if (j.coder == m_coder.id)
                out.push_back(j);
    return out;
}

Status CodingSession::push(std::unique_ptr<Edit> edit, ArticleId article)
{
    // Applied first, so that a refused edit reports its own error and never reaches the stack.
    if (auto st = m_project.apply(*edit); !st) {
        emit errorOccurred(st.error().toString());
        return st;
    }
    m_undo.push(new EditCommand(this, std::move(edit), article));
    emit articleChanged(article);
    return {};
}

Status CodingSession::addSpan(ArticleId article, FramingFunction function, TextRange range)
{
    auto edit = std::make_unique<AddAnnotationEdit>(
        article, m_coder.id, AnnotationContent {function, range, {}, {}, {}}, phaseOf(article));
    AddAnnotationEdit *raw = edit.get();
    FOURFOLD_TRY_STATUS(push(std::move(edit), article));
    m_lastAdded = raw->annotationId();
    return {};
}

Status CodingSession::changeSpan(AnnotationId id, const AnnotationContent &content)
{
    auto span = m_project.annotation(id);
    if (!span)
        return std::unexpected(span.error());
    return push(std::make_unique<ChangeAnnotationEdit>(id, content, m_coder.id), span->article);
}

Status CodingSession::deleteSpan(AnnotationId id)
{
    auto span = m_project.annotation(id);
    if (!span)
        return std::unexpected(span.error());
    return push(std::make_unique<DeleteAnnotationEdit>(id, m_coder.id), span->article);
}

Status CodingSession::linkSpans(AnnotationId source, AnnotationId target, const QString &type)
{
    auto span = m_project.annotation(source);
    if (!span)
        return std::unexpected(span.error());
    return push(
        std::make_unique<LinkAnnotationsEdit>(source, target, type, m_coder.id), span->article);
}

Status CodingSession::unlinkSpans(LinkId id, ArticleId article)
{
    return push(std::make_unique<UnlinkAnnotationsEdit>(id, m_coder.id), article);
}

Status CodingSession::answerItem(ArticleId article, const QString &itemKey, const QString &value)
{
    return push(
        std::make_unique<SetJudgementEdit>(article, m_coder.id, itemKey, value, phaseOf(article)),
        article);
}

Status CodingSession::markDone(ArticleId article)
{
    return push(std::make_unique<SetArticleStatusEdit>(article, m_coder.id, QStringLiteral("done")),
        article);
}

void CodingSession::addCodingTime(ArticleId article, qint64 seconds)
{
    if (auto st = m_project.addCodingTime(article, m_coder.id, seconds); !st)
        emit errorOccurred(st.error().toString());
}

} // namespace fourfold
