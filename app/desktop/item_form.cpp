#include "app/desktop/item_form.h"

#include "app/desktop/coding_session.h"

#include <QComboBox>
#include <QLabel>
#include <QMenu>
#include <QVBoxLayout>

namespace fourfold {

namespace {

// The coder's current answer to `key`: the most recently changed live judgement, or empty.
QString answerOf(const std::vector<Judgement> &judgements, const QString &key)
{
    const Judgement *latest = nullptr;
    for (const Judgement &j : judgements)
        if (!j.deleted && j.itemKey == key && (!latest || j.modifiedAt >= latest->modifiedAt))
            latest = &j;
    return latest ? latest->value : QString();
}

} // namespace

ItemForm::ItemForm(CodingSession *session, QWidget *parent)
    : QWidget(parent)
{
    setAccessibleName(tr("Article-level items"));
    auto *layout = new QVBoxLayout(this);
    m_questions = new QVBoxLayout;
    layout->addLayout(m_questions);
    m_noItems =
        new QLabel(tr("The codebook asks no questions about the article as a whole."), this);
    m_noItems->setWordWrap(true);
    m_noItems->setForegroundRole(QPalette::PlaceholderText);
    layout->addWidget(m_noItems);

    if (session) {
        connect(this, &ItemForm::answerChosen, this,
            [this, session](ArticleId article, const QString &key, const QString &value) {
                // On failure the session reports the error; the form goes back to the answers
                // the project holds.
                if (!session->answerItem(article, key, value))
                    setArticle(m_article, m_judgements);
            });
        connect(this, &ItemForm::answerWithdrawn, this,
            [this, session](ArticleId article, const QString &key) {
                if (!session->withdrawAnswer(article, key))
                    setArticle(m_article, m_judgements);
            });
        setCodebook(session->codebook());
    } else {
        setCodebook(Codebook {});
    }
}

void ItemForm::setCodebook(const Codebook &codebook)
{
    m_codebook = codebook;
    // Deleted later: this may run while a combo is still emitting.
    while (QLayoutItem *item = m_questions->takeAt(0)) {
        if (QWidget *w = item->widget()) {
            w->hide();
            w->deleteLater();
        }
        delete item;
    }
    m_rows.clear();
    for (const ArticleItem &item : m_codebook.items) {
        auto *values = new QComboBox(this);
        values->setAccessibleName(item.question);
        values->addItem(tr("not answered"), QString());
        for (const QString &v : item.values)
            values->addItem(v, v);
        auto *question = new QLabel(item.question, this);
        question->setWordWrap(true);
        question->setBuddy(values);
        m_questions->addWidget(question);
        m_questions->addWidget(values);
        m_questions->addSpacing(fontMetrics().height() / 3);
        m_rows.push_back(Row {item.key, item.question, values});
    }
    for (size_t i = 0; i < m_rows.size(); ++i) {
        QComboBox *values = m_rows[i].values;
        connect(values, &QComboBox::activated, this,
            [this, i](int index) { choose(m_rows[i], index); });
        values->setContextMenuPolicy(Qt::CustomContextMenu);
        connect(values, &QWidget::customContextMenuRequested, this,
            [this, i, values](const QPoint &pos) {
                QMenu menu(this);
                const QString key = m_rows[i].key;
                QAction *withdrawing =
                    menu.addAction(tr("&Withdraw answer"), this, [this, key] { withdraw(key); });
                withdrawing->setEnabled(!answerOf(m_judgements, key).isEmpty());
                menu.exec(values->mapToGlobal(pos));
            });
    }
    m_noItems->setVisible(m_rows.empty());
    setArticle(m_article, m_judgements);
}

void ItemForm::setArticle(ArticleId article, const std::vector<Judgement> &ownJudgements)
{
    m_article = article;
    m_judgements = ownJudgements;
    for (const Row &row : m_rows) {
        const QString answer = answerOf(m_judgements, row.key);
        int index = row.values->findData(answer);
        if (index < 0) {
            // An answer outside this codebook's value set (an older codebook version): shown as
            // it is, so that nothing the coder said is hidden.
            row.values->addItem(answer, answer);
            index = row.values->count() - 1;
        }
        row.values->setCurrentIndex(index);
        // "not answered" withdraws an answer given.
        row.values->setItemData(0,
            answer.isEmpty() ? QString() : tr("Withdraw the answer: the item is unanswered again"),
            Qt::ToolTipRole);
    }
    setEnabled(m_article.isValid());
}

void ItemForm::choose(const Row &row, int index)
{
    const QString value = row.values->itemData(index).toString();
    const QString answer = answerOf(m_judgements, row.key);
    if (!m_article.isValid() || value == answer)
        return;
    if (value.isEmpty())
        emit answerWithdrawn(m_article, row.key);
    else
        emit answerChosen(m_article, row.key, value);
}

void ItemForm::withdraw(const QString &itemKey)
{
    if (m_article.isValid() && !answerOf(m_judgements, itemKey).isEmpty())
        emit answerWithdrawn(m_article, itemKey);
}

void ItemForm::addAnswerActions(QMenu *menu)
{
    if (!m_article.isValid())
        return;
    for (const Row &row : m_rows) {
        const QString answer = answerOf(m_judgements, row.key);
        if (answer.isEmpty())
            continue;
        const QString key = row.key;
        menu->addAction(tr("Withdraw answer: %1 (%2)").arg(row.question, answer), this,
            [this, key] { withdraw(key); });
    }
}

} // namespace fourfold
