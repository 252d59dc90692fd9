#pragma once
// The comparison window's article-level items: for the open article each item of the codebook
// with every coder's answer side by side (pseudonyms only), whether they agree, and the gold
// answer; below, the lead chooses a value (a coder's or another of the item's value set) and a
// rationale and asks to decide the gold answer or to withdraw it. The panel only shows and asks:
// the window turns a request into an edit on the session's undo stack.

#include "core/model/annotation.h"
#include "core/model/codebook.h"
#include "core/model/coder.h"
#include "core/model/gold_judgement.h"

#include <QWidget>

#include <vector>

class QComboBox;
class QLabel;
class QLineEdit;
class QPushButton;
class QTreeWidget;

namespace fourfold {

class AnswerPanel : public QWidget
{
    Q_OBJECT
public:
    // How the coders' answers to an item stand.
    enum class Agreement {
        None, // nobody answered
        Agree, // every coder answered, all alike
        Partial, // those who answered agree, someone has not answered
        Differ, // two or more different answers
    };
    // One item of the codebook on the open article.
    struct Row {
        QString item; // key
        QString question;
        std::vector<QString> answers; // per coder of the columns; empty: no answer
        Agreement agreement = Agreement::None;
        QString gold; // the gold answer's value; empty: none decided
        GoldJudgementId goldId;
        QString goldRationale;
        QString goldDecidedBy; // pseudonym
    };

    explicit AnswerPanel(QWidget *parent = nullptr);

    // Shows the items of `codebook` with the answers of `coders` (one column each, by pseudonym)
    // taken from `answers` (the article's live answers; a coder's newest counts when they answered
    // in several phases) and the article's live gold answers `gold`. `people` names who decided.
    // The current item stays current when it is still there.
    void setContent(const Codebook &codebook, const std::vector<Coder> &coders,
        const std::vector<Judgement> &answers, const std::vector<GoldJudgement> &gold,
        const std::vector<Coder> &people);
    // Clears the table (no article open).
    void clear();

    const std::vector<Row> &rows() const { return m_rows; }
    // The pseudonyms of the coders' columns, in the order of Row::answers.
    QStringList coderNames() const { return m_coderNames; }
    // The item whose values the choice below offers; empty when there is none.
    QString currentItem() const;
    void setCurrentItem(const QString &key);
    // The values offered for the current item, coders' answers first; and the one chosen.
    QStringList offeredValues() const;
    QString chosenValue() const;
    // Chooses `value` if it is offered; false otherwise.
    bool setChosenValue(const QString &value);
    QString rationale() const;
    void setRationale(const QString &text);
    // Whether the lead may decide (a lead with an article open); false hides nothing but disables
    // the buttons.
    void setDecisionsEnabled(bool enabled);

signals:
    void decideRequested(const QString &item, const QString &value, const QString &rationale);
    void withdrawRequested(GoldJudgementId id);

private:
    void refreshChoice();
    void updateButtons();
    const Row *currentRow() const;

    std::vector<Row> m_rows;
    std::vector<ArticleItem> m_items;
    QStringList m_coderNames;
    bool m_enabled = true;

    QTreeWidget *m_table = nullptr;
    QLabel *m_question = nullptr;
    QComboBox *m_value = nullptr;
    QLineEdit *m_rationale = nullptr;
    QPushButton *m_decide = nullptr;
    QPushButton *m_withdraw = nullptr;
};

} // namespace fourfold
