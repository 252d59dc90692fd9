#pragma once
// The lead's comparison and adjudication window: the queue of articles coded by several coders
// (most undecided disagreements first), the open article for every coder side by side (and gold),
// and the current passage's spans with the decisions a lead can take — accept a coder's span
// into gold, merge boundaries, edit, reject, or accept everything the coders agree on — each with
// an optional rationale; below, the article-level items with every coder's answer and the gold
// answer the lead decides (AnswerPanel). Every decision is one command on the session's undo
// stack, written to the project at once; the coders' own spans and answers are never changed.

#include "app/desktop/coding_session.h"
#include "core/agreement/disagreements.h"
#include "core/model/gold_judgement.h"

#include <QMainWindow>
#include <QPointer>

#include <memory>

class QAction;
class QCheckBox;
class QComboBox;
class QLabel;
class QLineEdit;
class QTableView;
class QToolButton;
class QTreeWidget;

namespace fourfold {

class AnswerPanel;
class ComparisonView;
class DisagreementQueueModel;

class ComparisonWindow : public QMainWindow
{
    Q_OBJECT
public:
    // `session` must outlive the window; its person should be a lead (for a coder the window
    // says that only leads compare and adjudicate, and offers nothing).
    explicit ComparisonWindow(CodingSession *session, QWidget *parent = nullptr);
    ~ComparisonWindow() override;

    // Opens `article` (if it is in the queue) at its first passage to look at.
    bool openArticle(ArticleId article);
    ArticleId currentArticle() const { return m_article; }
    // The passages shown (after the filters) and the current one (-1: none).
    const std::vector<Passage> &passages() const { return m_comparison.passages; }
    int currentPassage() const { return m_current; }
    // The line above the decision list: the passage's state, or why there is nothing to compare.
    QString passageText() const;
    void setCurrentPassage(int index);
    // Steps to the next / previous passage with an undecided disagreement (wraps around);
    // false if there is none. With "show decided" on, decided ones count too.
    bool nextDisagreement();
    bool previousDisagreement();
    // Filters: one function (none = all), one pair of coders (invalid ids = all coders).
    void setFunctionFilter(std::optional<FramingFunction> function);
    void setCoderPair(CoderId first, CoderId second);
    // The queue keeps its order while the lead decides (a decision updates its article's row
    // where it stands); this sorts it again by the queue's rule (disagreementQueue: most
    // undecided first) and takes in articles that have come or gone. The open article stays.
    void resortQueue();

    // The current passage's coder spans that are selected in the decision list.
    std::vector<Annotation> selectedSpans() const;
    // Selects the given spans of the current passage in the decision list.
    void selectSpans(const std::vector<AnnotationId> &ids);
    // Selects the given gold spans of the current passage (for Withdraw).
    void selectGold(const std::vector<GoldId> &ids);
    void setRationale(const QString &text);

    // Decisions; each pushes one command and returns false (with a message) if it could not.
    bool acceptSelected();
    bool mergeSelected();
    bool editSelected(); // asks for function and boundaries in a dialog
    bool decide(const GoldCandidate &candidate); // the non-interactive part of edit
    bool rejectSelected();
    bool withdrawSelectedGold();
    bool acceptAllAgreed();
    // Decides the gold answer `value` of the article-level item `item` on the open article (it
    // replaces the one decided before), and withdraws a gold answer.
    bool decideAnswer(const QString &item, const QString &value, const QString &rationale);
    bool withdrawGoldAnswer(GoldJudgementId id);

    DisagreementQueueModel *queueModel() const { return m_queueModel; }
    ComparisonView *view() const { return m_view; }
    AnswerPanel *answerPanel() const { return m_answers; }
    // The last message shown in the message bar (errors and confirmations).
    QString lastMessage() const { return m_lastMessage; }

private:
    void buildUi();
    void buildActions();
    void reloadQueue();
    // Recomputes the queue row of `article` in place; false when it has no row (or it failed).
    bool refreshQueueRow(ArticleId article);
    void reloadArticle();
    void refreshDecisionList();
    void refreshAnswers();
    void updateActions();
    void showMessage(const QString &text, bool error);
    // Applies `edit` through the session; `touched`: the parts of the article it changes.
    bool push(std::unique_ptr<Edit> edit, ArticleDocument::Parts touched);
    // Whether the session's comparison document holds the article shown.
    bool isArticleOpen() const;
    ComparisonFilter filter() const;
    bool isOpenDisagreement(const Passage &p) const;
    QString coderName(CoderId id) const;
    const Passage *passage() const;
    std::vector<GoldId> selectedGold() const;

    CodingSession *m_session;
    QPointer<CodingSession> m_sessionAlive;
    ArticleId m_article; // the article shown, held by the session's comparisonDocument()
    Comparison m_comparison;
    int m_current = -1;
    std::vector<Coder> m_coders;
    QString m_lastMessage;

    DisagreementQueueModel *m_queueModel = nullptr;
    QTableView *m_queueView = nullptr;
    QLabel *m_queueLabel = nullptr;
    QToolButton *m_resortButton = nullptr;
    ComparisonView *m_view = nullptr;
    QComboBox *m_functionBox = nullptr;
    QComboBox *m_pairBox = nullptr;
    QCheckBox *m_showDecided = nullptr;
    QCheckBox *m_showUnfinished = nullptr;
    QLabel *m_passageLabel = nullptr;
    QTreeWidget *m_spanList = nullptr;
    QLabel *m_detail = nullptr;
    QLineEdit *m_rationale = nullptr;
    QLabel *m_message = nullptr;
    QLabel *m_legend = nullptr;
    AnswerPanel *m_answers = nullptr;

    QAction *m_next = nullptr;
    QAction *m_previous = nullptr;
    QAction *m_nextArticle = nullptr;
    QAction *m_previousArticle = nullptr;
    QAction *m_resort = nullptr;
    QAction *m_accept = nullptr;
    QAction *m_merge = nullptr;
    QAction *m_edit = nullptr;
    QAction *m_reject = nullptr;
    QAction *m_withdraw = nullptr;
    QAction *m_acceptAgreed = nullptr;
    QAction *m_undo = nullptr;
    QAction *m_redo = nullptr;
};

} // namespace fourfold
