#pragma once
// The open project as one person codes it: who is coding, what they may see (blind coding: a
// coder sees only their own spans and the articles assigned to them), and every change as one
// undoable command over a core edit, written to the project file at once. Views read from the
// session and ask it for changes; they never write to the project themselves.

#include "app/desktop/article_document.h"
#include "app/desktop/article_list_model.h"
#include "app/desktop/compare/comparison_document.h"
#include "core/project/people.h"
#include "core/project/project.h"

#include <QHash>
#include <QObject>
#include <QUndoStack>

#include <memory>
#include <optional>
#include <vector>

namespace fourfold {

class Edit;

class CodingSession : public QObject
{
    Q_OBJECT
public:
    CodingSession(Project project, Coder coder, QObject *parent = nullptr);
    ~CodingSession() override;

    Project &project() { return m_project; }
    const Project &project() const { return m_project; }
    const Coder &coder() const { return m_coder; }
    // The sign-in that opened the desk (People::signIn), which People's changes ask for; none
    // when a session was made without one (tests of other windows).
    void setSignedIn(SignedIn who) { m_signedIn = std::move(who); }
    const SignedIn *signedIn() const { return m_signedIn ? &*m_signedIn : nullptr; }
    bool isLead() const { return m_coder.role == CoderRole::Lead; }
    const Codebook &codebook() const { return m_codebook; }
    QUndoStack *undoStack() { return &m_undo; }

    // Leads may show every coder's spans on the desk; coders never can.
    bool showsAllCoders() const { return isLead() && m_showAll; }
    void setShowAllCoders(bool on);
    // With every coder's spans shown: only those of `coder` (an invalid id: every coder's), on
    // every article opened until it changes; emits articleChanged for the open article.
    void setCoderFilter(CoderId coder);
    CoderId coderFilter() const { return m_document.coderFilter(); }
    // Every person's pseudonym by coder id (the names stay in the project): what the all-coders
    // view labels spans with. Read when first asked and again after an edit about no article
    // (People's changes) or its undo.
    const QHash<qint64, QString> &pseudonyms() const;

    // The article open on the desk, kept up to date by every change made through the session
    // (and its undo and redo): views read it instead of the project.
    const ArticleDocument &document() const { return m_document; }
    Status openDocument(ArticleId article);

    // The article open in the comparison window (a lead's), kept up to date by every change
    // made through the session the same way.
    const ComparisonDocument &comparisonDocument() const { return m_comparison; }
    Status openComparison(ArticleId article) { return m_comparison.open(article); }
    void closeComparison() { m_comparison.close(); }

    // The articles this person may open (their assignments; a lead: all articles) with this
    // person's status and active seconds on each, read with a fixed number of queries whatever
    // the number of articles (for the article list).
    std::vector<ArticleRow> articleRows() const;
    // This person's status of an article: "assigned" (not started), "started" or "done".
    // Of the open document without a read, as the next two.
    QString articleStatus(ArticleId article) const;
    // Seconds of active coding time recorded for this person on the article.
    qint64 secondsSpent(ArticleId article) const;
    // The spans shown on the desk: this person's own, or everyone's when showsAllCoders().
    std::vector<Annotation> visibleAnnotations(ArticleId article) const;
    // This person's answers to article-level items.
    std::vector<Judgement> ownJudgements(ArticleId article) const;

    // Changes. Each is one command on the undo stack, applied (and committed) at once. On
    // failure nothing is pushed, errorOccurred() is emitted, and the error is returned.
    Status addSpan(ArticleId article, FramingFunction function, TextRange range);
    // An edit about no article (People's changes): applied and put on the undo stack the same
    // way.
    Status applyProjectEdit(std::unique_ptr<Edit> edit);
    // An edit about `article` that the caller has applied and whose refusal it reports itself (a
    // lead's decision in the comparison window, which says so in its own window): put on the
    // undo stack, and `touched` of the open documents read again, as after the changes above.
    void pushApplied(std::unique_ptr<Edit> edit, ArticleId article, ArticleDocument::Parts touched);
    Status changeSpan(AnnotationId id, const AnnotationContent &content);
    Status deleteSpan(AnnotationId id);
    Status linkSpans(AnnotationId source, AnnotationId target, const QString &type);
    // Removes link `id` of a span of `article` (undoable).
    Status unlinkSpans(LinkId id, ArticleId article);
    Status answerItem(ArticleId article, const QString &itemKey, const QString &value);
    // Withdraws this person's answer to `itemKey` on `article`: the item is unanswered again
    // (undoable).
    Status withdrawAnswer(ArticleId article, const QString &itemKey);
    Status markDone(ArticleId article);
    // Records active coding time (not undoable, not a user edit).
    void addCodingTime(ArticleId article, qint64 seconds);
    // Another connection wrote the file (a team sync brought others' work): reads the open
    // document again and emits articleChanged with an invalid id.
    void reloadAfterSync();

    // The phase this person codes the article in: that of their assignment (production if none);
    // the open document's without a read.
    Phase phaseOf(ArticleId article) const;

    // A project file this process may not write (a read-only file, folder or mount) is opened
    // read-only: every change is refused before it is tried, with readOnlyMessage(), and no
    // coding time is recorded.
    bool isReadOnly() const { return m_project.isReadOnly(); }
    QString readOnlyMessage() const;

    // An edit the project file could not take (another program was writing it past the busy
    // timeout, or the disk refused): kept here, not on the undo stack, until it is retried or
    // discarded, so a change the coder made never silently vanishes. A refused edit (invalid,
    // not allowed) is not kept.
    bool hasUnsavedEdit() const { return m_unsaved != nullptr; }
    QString unsavedEditText() const;
    // Applies the unsaved edit again; on success it joins the undo stack.
    Status retryUnsavedEdit();
    void discardUnsavedEdit();

    // The id of the span the last successful addSpan() created.
    AnnotationId lastAddedSpan() const { return m_lastAdded; }

signals:
    // After any change to spans, links, answers or the status of `article` (including undo and
    // redo), once the open document holds it. An invalid `article`: any article may have changed
    // (reloadAfterSync), so views read again whatever they show.
    void articleChanged(ArticleId article);
    // After an edit about no article (the study design's, a codebook version, People's) was
    // applied, undone or redone, once the session read the codebook and the names again: the
    // lead's study windows read what they show again.
    void projectEdited();
    void errorOccurred(const QString &message);
    // An edit could not be written and is kept as unsaved (see hasUnsavedEdit()).
    void editNotSaved(const QString &editText, const QString &message);

private:
    friend class EditCommand;
    Status push(std::unique_ptr<Edit> edit, ArticleId article, ArticleDocument::Parts touched);
    // The article of span `id`.
    Result<ArticleId> articleOf(AnnotationId id) const;
    // Reads what changed into the open documents (those of `article`), then says so.
    void changed(ArticleId article, ArticleDocument::Parts touched);
    // Reads the current codebook again, in the user's language.
    void readCodebook();

    Project m_project;
    Coder m_coder;
    std::optional<SignedIn> m_signedIn;
    Codebook m_codebook;
    QUndoStack m_undo;
    bool m_showAll = false;
    mutable std::optional<QHash<qint64, QString>> m_pseudonyms;
    AnnotationId m_lastAdded;
    ArticleDocument m_document {m_project, m_coder};
    ComparisonDocument m_comparison {m_project};
    struct Unsaved;
    std::unique_ptr<Unsaved> m_unsaved;
};

} // namespace fourfold
