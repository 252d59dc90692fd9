#pragma once
// The article-level items of the codebook (e.g. the dominant framing function) as a small form:
// one row per item with its question and a choice of its values. Choosing a value answers the
// item for the open article through the coding session, as one undoable change; choosing "not
// answered" again (or Withdraw answer on a row's context menu) withdraws the answer, undoably too.

#include "core/model/annotation.h"
#include "core/model/codebook.h"

#include <QWidget>

#include <vector>

class QComboBox;
class QLabel;
class QMenu;
class QVBoxLayout;

namespace fourfold {

class CodingSession;

class ItemForm : public QWidget
{
    Q_OBJECT
public:
    // With a session, the form shows the session's codebook and every answer chosen is sent to
    // session->answerItem() and every withdrawal to session->withdrawAnswer(). Without one
    // (nullptr) it only emits answerChosen() and answerWithdrawn().
    explicit ItemForm(CodingSession *session, QWidget *parent = nullptr);

    // Builds one row per article-level item of `codebook`. Keeps the article shown.
    void setCodebook(const Codebook &codebook);
    // Shows the answers in `ownJudgements` (the coder's own, of `article`; deleted ones are
    // ignored) and makes the form answer for `article`. An invalid id disables the form.
    void setArticle(ArticleId article, const std::vector<Judgement> &ownJudgements);
    // Asks to withdraw the answer to `itemKey` (nothing when it is not answered).
    void withdraw(const QString &itemKey);
    // Adds "Withdraw answer: …" to `menu` for each answered item: the desk's context menu offers
    // them.
    void addAnswerActions(QMenu *menu);

signals:
    // The user chose `value` for item `itemKey` of `article` (never "not answered").
    void answerChosen(ArticleId article, const QString &itemKey, const QString &value);
    // The user withdrew the answer to item `itemKey` of `article`.
    void answerWithdrawn(ArticleId article, const QString &itemKey);

private:
    struct Row {
        QString key;
        QString question;
        QComboBox *values = nullptr;
    };
    void choose(const Row &row, int index);

    QVBoxLayout *m_questions = nullptr;
    QLabel *m_noItems = nullptr;
    std::vector<Row> m_rows;
    Codebook m_codebook;
    ArticleId m_article;
    std::vector<Judgement> m_judgements;
};

} // namespace fourfold
