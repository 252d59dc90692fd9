#include "app/desktop/coding_session.h"

#include "app/desktop/edit_command.h"
#include "app/desktop/interface_language.h"
#include "core/model/logging.h"
#include "core/project/annotation_edits.h"
#include "core/project/article_status_edit.h"
#include "core/project/coding_scope.h"
#include "core/project/near_copies.h"

#include <QHash>
#include <QSet>

namespace fourfold {

struct CodingSession::Unsaved {
    std::unique_ptr<Edit> edit;
    ArticleId article;
    ArticleDocument::Parts touched;
};

namespace {

// Errors of the file rather than of the edit: trying again later can succeed.
bool worthRetrying(const Error &error)
{
    return error.code == ErrorCode::Busy || error.code == ErrorCode::Io;
}

} // namespace

CodingSession::CodingSession(Project project, Coder coder, QObject *parent)
    : QObject(parent)
    , m_project(std::move(project))
    , m_coder(std::move(coder))
{
    readCodebook();
}

void CodingSession::readCodebook()
{
    // The codebook's texts in the user's language where it has them (the keys and values stay).
    if (auto book = m_project.codebook())
        m_codebook = book->inLanguage(interfaceLanguage());
    else
        emit errorOccurred(book.error().toString());
}

CodingSession::~CodingSession()
{
    // Commands refer to the project: drop them before it goes.
    m_undo.clear();
}

void CodingSession::setShowAllCoders(bool on)
{
    m_showAll = on;
    if (auto st = m_document.setAllCoders(showsAllCoders()); !st)
        emit errorOccurred(st.error().toString());
}

void CodingSession::setCoderFilter(CoderId coder)
{
    m_document.setCoderFilter(coder);
    if (m_document.isOpen())
        emit articleChanged(m_document.id());
}

const QHash<qint64, QString> &CodingSession::pseudonyms() const
{
    if (!m_pseudonyms) {
        m_pseudonyms.emplace();
        if (auto coders = m_project.coders())
            for (const Coder &c : *coders)
                m_pseudonyms->insert(c.id.value, c.pseudonym);
    }
    return *m_pseudonyms;
}

Status CodingSession::openDocument(ArticleId article)
{
    return m_document.open(article, showsAllCoders());
}

void CodingSession::changed(ArticleId article, ArticleDocument::Parts touched)
{
    if (!article.isValid()) {
        // An edit about no article may be People's or a codebook version: read both again.
        m_pseudonyms.reset();
        readCodebook();
    }
    if (m_document.isOpen() && m_document.id() == article) {
        if (auto st = m_document.reload(touched); !st)
            emit errorOccurred(st.error().toString());
    }
    if (m_comparison.isOpen() && m_comparison.id() == article) {
        if (auto st = m_comparison.reload(touched); !st)
            emit errorOccurred(st.error().toString());
    }
    emit articleChanged(article);
    if (!article.isValid())
        emit projectEdited();
}

void CodingSession::reloadAfterSync()
{
    // A sync may bring a codebook version and people.
    m_pseudonyms.reset();
    readCodebook();
    if (m_document.isOpen())
        if (auto st = m_document.reload(ArticleDocument::Part::Everything); !st)
            emit errorOccurred(st.error().toString());
    // Opened again: a sync may also bring people (and their spans) the document did not know.
    if (m_comparison.isOpen())
        if (auto st = m_comparison.open(m_comparison.id()); !st)
            emit errorOccurred(st.error().toString());
    emit articleChanged(ArticleId {});
}

std::vector<ArticleRow> CodingSession::articleRows() const
{
    auto all = m_project.articles();
    auto assignments = m_project.assignments();
    // Spans or answers mean the work has started, whatever the assignment says (CodingScope
    // knows who holds codings where).
    auto scope = CodingScope::load(m_project);
    auto nearCopies = NearCopies::byArticle(m_project);
    if (!all || !assignments || !scope || !nearCopies)
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
        for (const NearCopy &n : nearCopies->value(s.id))
            row.nearCopyOf << tr("“%1” (%2), similarity %3")
                                  .arg(n.otherTitle, n.otherExternalId)
                                  .arg(n.similarity, 0, 'f', 2);
        out.push_back(std::move(row));
    }
    return out;
}

QString CodingSession::articleStatus(ArticleId article) const
{
    if (m_document.isOpen() && m_document.id() == article)
        return m_document.status();
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
    if (m_document.isOpen() && m_document.id() == article)
        return m_document.seconds();
    qint64 seconds = 0;
    if (auto a = m_project.assignments(article, m_coder.id))
        for (const Assignment &x : *a)
            seconds += x.activeSeconds;
    return seconds;
}

Phase CodingSession::phaseOf(ArticleId article) const
{
    if (m_document.isOpen() && m_document.id() == article)
        return m_document.phase();
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

Status CodingSession::push(
    std::unique_ptr<Edit> edit, ArticleId article, ArticleDocument::Parts touched)
{
    if (m_project.isReadOnly()) {
        // Not tried at all: a read-only file takes no change, and Retry could not help.
        Error refused = fail(ErrorCode::NotAllowed, readOnlyMessage()).error();
        emit errorOccurred(refused.message);
        return std::unexpected(std::move(refused));
    }
    // Applied first, so that a refused edit reports its own error and never reaches the stack.
    if (auto st = m_project.apply(*edit); !st) {
        logError(lcDesktop(), st.error());
        if (worthRetrying(st.error())) {
            const QString text = edit->text();
            m_unsaved.reset(new Unsaved {std::move(edit), article, touched});
            emit editNotSaved(text, st.error().toString());
        } else {
            emit errorOccurred(st.error().toString());
        }
        return st;
    }
    m_undo.push(new EditCommand(this, std::move(edit), article, touched));
    changed(article, touched);
    return {};
}

QString CodingSession::readOnlyMessage() const
{
    return tr("%1 is read-only: you can read, compare and compute, but nothing is saved. To "
              "code, copy the file to a folder you may write to and open the copy.")
        .arg(m_project.path());
}

QString CodingSession::unsavedEditText() const
{
    return m_unsaved ? m_unsaved->edit->text() : QString();
}

Status CodingSession::retryUnsavedEdit()
{
    if (!m_unsaved)
        return {};
    std::unique_ptr<Unsaved> unsaved = std::move(m_unsaved);
    return push(std::move(unsaved->edit), unsaved->article, unsaved->touched);
}

void CodingSession::discardUnsavedEdit()
{
    m_unsaved.reset();
}

Status CodingSession::applyProjectEdit(std::unique_ptr<Edit> edit)
{
    return push(std::move(edit), ArticleId {}, {});
}

void CodingSession::pushApplied(
    std::unique_ptr<Edit> edit, ArticleId article, ArticleDocument::Parts touched)
{
    m_undo.push(new EditCommand(this, std::move(edit), article, touched));
    changed(article, touched);
}

Status CodingSession::addSpan(ArticleId article, FramingFunction function, TextRange range)
{
    auto edit = std::make_unique<AddAnnotationEdit>(
        article, m_coder.id, AnnotationContent {function, range, {}, {}, {}}, phaseOf(article));
    AddAnnotationEdit *raw = edit.get();
    FOURFOLD_TRY_STATUS(push(std::move(edit), article, ArticleDocument::Part::Spans));
    m_lastAdded = raw->annotationId();
    return {};
}

Result<ArticleId> CodingSession::articleOf(AnnotationId id) const
{
    // The open article's spans are at hand; another article's span is read.
    if (const auto span = m_document.span(id))
        return span->article;
    auto span = m_project.annotation(id);
    if (!span)
        return std::unexpected(span.error());
    return span->article;
}

Status CodingSession::changeSpan(AnnotationId id, const AnnotationContent &content)
{
    auto article = articleOf(id);
    if (!article)
        return std::unexpected(article.error());
    return push(std::make_unique<ChangeAnnotationEdit>(id, content, m_coder.id), *article,
        ArticleDocument::Part::Spans);
}

Status CodingSession::deleteSpan(AnnotationId id)
{
    auto article = articleOf(id);
    if (!article)
        return std::unexpected(article.error());
    return push(std::make_unique<DeleteAnnotationEdit>(id, m_coder.id), *article,
        ArticleDocument::Part::Spans | ArticleDocument::Part::Links);
}

Status CodingSession::linkSpans(AnnotationId source, AnnotationId target, const QString &type)
{
    auto article = articleOf(source);
    if (!article)
        return std::unexpected(article.error());
    return push(std::make_unique<LinkAnnotationsEdit>(source, target, type, m_coder.id), *article,
        ArticleDocument::Part::Links);
}

Status CodingSession::unlinkSpans(LinkId id, ArticleId article)
{
    return push(std::make_unique<UnlinkAnnotationsEdit>(id, m_coder.id), article,
        ArticleDocument::Part::Links);
}

Status CodingSession::answerItem(ArticleId article, const QString &itemKey, const QString &value)
{
    return push(
        std::make_unique<SetJudgementEdit>(article, m_coder.id, itemKey, value, phaseOf(article)),
        article, ArticleDocument::Part::Answers);
}

Status CodingSession::withdrawAnswer(ArticleId article, const QString &itemKey)
{
    return push(
        std::make_unique<WithdrawJudgementEdit>(article, m_coder.id, itemKey, phaseOf(article)),
        article, ArticleDocument::Part::Answers);
}

Status CodingSession::markDone(ArticleId article)
{
    return push(std::make_unique<SetArticleStatusEdit>(article, m_coder.id, QStringLiteral("done")),
        article, ArticleDocument::Part::Assignments);
}

void CodingSession::addCodingTime(ArticleId article, qint64 seconds)
{
    if (m_project.isReadOnly())
        return; // reading a read-only file is not coding time to record
    if (auto st = m_project.addCodingTime(article, m_coder.id, seconds); !st) {
        emit errorOccurred(st.error().toString());
        return;
    }
    if (m_document.isOpen() && m_document.id() == article)
        if (auto st = m_document.reload(ArticleDocument::Part::Assignments); !st)
            emit errorOccurred(st.error().toString());
}

} // namespace fourfold
