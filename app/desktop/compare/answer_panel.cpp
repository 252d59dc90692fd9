#include "app/desktop/compare/answer_panel.h"

#include <QComboBox>
#include <QFormLayout>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QLineEdit>
#include <QPushButton>
#include <QTreeWidget>
#include <QVBoxLayout>

#include <algorithm>

namespace fourfold {

namespace {

enum { KeyRole = Qt::UserRole };

// What a cell shows for no answer (an en dash, not words).
const QString kNone = QString(QChar(0x2013));

AnswerPanel::Agreement agreementOf(const std::vector<QString> &answers)
{
    QStringList given;
    for (const QString &a : answers)
        if (!a.isEmpty() && !given.contains(a))
            given << a;
    const bool everyone = std::ranges::none_of(answers, &QString::isEmpty);
    if (given.isEmpty())
        return AnswerPanel::Agreement::None;
    if (given.size() > 1)
        return AnswerPanel::Agreement::Differ;
    return everyone ? AnswerPanel::Agreement::Agree : AnswerPanel::Agreement::Partial;
}

} // namespace

AnswerPanel::AnswerPanel(QWidget *parent)
    : QWidget(parent)
{
    auto *layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    m_table = new QTreeWidget(this);
    m_table->setRootIsDecorated(false);
    m_table->setUniformRowHeights(true);
    m_table->setSelectionMode(QAbstractItemView::SingleSelection);
    m_table->setAccessibleName(tr("Answers to article-level items"));
    m_table->header()->setStretchLastSection(false);
    m_table->setTextElideMode(Qt::ElideRight);
    m_table->setHorizontalScrollBarPolicy(Qt::ScrollBarAlwaysOff);
    layout->addWidget(m_table);
    m_question = new QLabel(this);
    m_question->setWordWrap(true);
    m_question->setTextFormat(Qt::PlainText);
    layout->addWidget(m_question);

    auto *form = new QFormLayout;
    form->setContentsMargins(0, 0, 0, 0);
    m_value = new QComboBox(this);
    m_value->setAccessibleName(tr("Gold answer"));
    form->addRow(tr("Gold &answer:"), m_value);
    m_rationale = new QLineEdit(this);
    m_rationale->setPlaceholderText(tr("Why this answer, for the method section"));
    form->addRow(tr("Ra&tionale:"), m_rationale);
    layout->addLayout(form);
    auto *buttons = new QHBoxLayout;
    m_decide = new QPushButton(tr("&Decide gold answer"), this);
    m_decide->setToolTip(tr("Put the chosen value into gold as the answer to this item; it "
                            "replaces a gold answer decided before"));
    m_withdraw = new QPushButton(tr("&Withdraw gold answer"), this);
    m_withdraw->setToolTip(tr("Withdraw the gold answer to this item"));
    buttons->addWidget(m_decide);
    buttons->addWidget(m_withdraw);
    buttons->addStretch(1);
    layout->addLayout(buttons);

    connect(m_table, &QTreeWidget::currentItemChanged, this, [this] { refreshChoice(); });
    connect(m_decide, &QPushButton::clicked, this, [this] {
        if (const Row *row = currentRow(); row && !chosenValue().isEmpty())
            emit decideRequested(row->item, chosenValue(), rationale());
    });
    connect(m_withdraw, &QPushButton::clicked, this, [this] {
        if (const Row *row = currentRow(); row && row->goldId.isValid())
            emit withdrawRequested(row->goldId);
    });
    connect(m_value, &QComboBox::currentIndexChanged, this, [this] { updateButtons(); });
    clear();
}

void AnswerPanel::clear()
{
    m_rows.clear();
    m_items.clear();
    m_table->clear();
    m_question->setText(tr("No article open."));
    refreshChoice();
}

void AnswerPanel::setContent(const Codebook &codebook, const std::vector<Coder> &coders,
    const std::vector<Judgement> &answers, const std::vector<GoldJudgement> &gold,
    const std::vector<Coder> &people)
{
    const QString current = currentItem();
    m_items = codebook.items;
    m_coderNames.clear();
    for (const Coder &c : coders)
        m_coderNames << c.pseudonym;
    m_rows.clear();
    for (const ArticleItem &item : m_items) {
        Row row;
        row.item = item.key;
        row.question = item.question;
        row.answers.resize(coders.size());
        for (size_t c = 0; c < coders.size(); ++c) {
            // A coder's newest live answer (one per phase may exist).
            const Judgement *newest = nullptr;
            for (const Judgement &j : answers)
                if (j.coder == coders[c].id && j.itemKey == item.key && !j.deleted
                    && (!newest || j.modifiedAt > newest->modifiedAt))
                    newest = &j;
            if (newest)
                row.answers[c] = newest->value;
        }
        row.agreement = agreementOf(row.answers);
        for (const GoldJudgement &g : gold)
            if (g.itemKey == item.key && !g.deleted) {
                row.gold = g.value;
                row.goldId = g.id;
                row.goldRationale = g.rationale;
                const auto who = std::ranges::find(people, g.decidedBy, &Coder::id);
                row.goldDecidedBy = who == people.end() ? QString() : who->pseudonym;
            }
        m_rows.push_back(std::move(row));
    }

    const QSignalBlocker block(m_table);
    m_table->clear();
    QStringList headers {tr("Item")};
    headers << m_coderNames << tr("Agreement") << tr("Gold");
    m_table->setHeaderLabels(headers);
    const int agreementColumn = 1 + int(coders.size());
    for (const Row &row : m_rows) {
        auto *item = new QTreeWidgetItem(m_table);
        item->setText(0, row.item);
        item->setToolTip(0, row.question);
        item->setData(0, KeyRole, row.item);
        for (size_t c = 0; c < row.answers.size(); ++c) {
            item->setText(1 + int(c), row.answers[c].isEmpty() ? kNone : row.answers[c]);
            if (row.answers[c].isEmpty())
                item->setToolTip(
                    1 + int(c), tr("%1 has not answered").arg(m_coderNames[qsizetype(c)]));
        }
        QString agreement;
        switch (row.agreement) {
        case Agreement::None:
            agreement = tr("no answers");
            break;
        case Agreement::Agree:
            agreement = tr("\u2713 agree");
            break;
        case Agreement::Partial:
            agreement = tr("agree, not all answered");
            break;
        case Agreement::Differ:
            agreement = tr("\u2260 differ");
            break;
        }
        item->setText(agreementColumn, agreement);
        item->setText(agreementColumn + 1, row.gold.isEmpty() ? kNone : row.gold);
        if (!row.gold.isEmpty()) {
            QFont bold = item->font(agreementColumn + 1);
            bold.setBold(true);
            item->setFont(agreementColumn + 1, bold);
            item->setToolTip(agreementColumn + 1,
                row.goldRationale.isEmpty() ? tr("Decided by %1.").arg(row.goldDecidedBy)
                                            : tr("Decided by %1: \u201C%2\u201D")
                                                  .arg(row.goldDecidedBy, row.goldRationale));
        }
    }
    if (m_rows.empty())
        m_question->setText(tr("The codebook has no article-level items."));
    // The answers, agreement and gold keep their width; the item's key gives way (its question
    // is shown below the table).
    m_table->header()->setSectionResizeMode(0, QHeaderView::Stretch);
    for (int c = 1; c < m_table->columnCount(); ++c)
        m_table->header()->setSectionResizeMode(c, QHeaderView::ResizeToContents);
    // As high as its rows (up to six), so that the choice below stays close to them.
    const int rows = std::clamp(m_table->topLevelItemCount(), 1, 6);
    const int rowHeight = m_table->topLevelItemCount() > 0
        ? m_table->visualItemRect(m_table->topLevelItem(0)).height()
        : m_table->fontMetrics().height() + 4;
    m_table->setFixedHeight(m_table->header()->sizeHint().height()
        + rows * std::max(rowHeight, m_table->fontMetrics().height() + 4)
        + 2 * m_table->frameWidth());
    int select = 0;
    for (int i = 0; i < m_table->topLevelItemCount(); ++i)
        if (m_table->topLevelItem(i)->data(0, KeyRole).toString() == current)
            select = i;
    if (m_table->topLevelItemCount() > 0)
        m_table->setCurrentItem(m_table->topLevelItem(select));
    refreshChoice();
}

const AnswerPanel::Row *AnswerPanel::currentRow() const
{
    const QString key = currentItem();
    const auto it = std::ranges::find(m_rows, key, &Row::item);
    return key.isEmpty() || it == m_rows.end() ? nullptr : &*it;
}

QString AnswerPanel::currentItem() const
{
    const QTreeWidgetItem *item = m_table->currentItem();
    return item ? item->data(0, KeyRole).toString() : QString();
}

void AnswerPanel::setCurrentItem(const QString &key)
{
    for (int i = 0; i < m_table->topLevelItemCount(); ++i)
        if (m_table->topLevelItem(i)->data(0, KeyRole).toString() == key)
            m_table->setCurrentItem(m_table->topLevelItem(i));
}

void AnswerPanel::refreshChoice()
{
    const QSignalBlocker block(m_value);
    const QString before = m_value->currentData().toString();
    m_value->clear();
    const Row *row = currentRow();
    if (!row) {
        updateButtons();
        return;
    }
    m_question->setText(row->question);
    // The coders' answers first, each with who gave it; then the rest of the value set.
    const auto item = std::ranges::find(m_items, row->item, &ArticleItem::key);
    QStringList values;
    for (const QString &a : row->answers)
        if (!a.isEmpty() && !values.contains(a))
            values << a;
    for (const QString &value : values) {
        QStringList who;
        for (size_t c = 0; c < row->answers.size(); ++c)
            if (row->answers[c] == value)
                who << m_coderNames[qsizetype(c)];
        m_value->addItem(tr("%1 (given by %2)").arg(value, who.join(tr(", "))), value);
    }
    if (item != m_items.end())
        for (const QString &value : item->values)
            if (!values.contains(value))
                m_value->addItem(value, value);
    // Keep the choice, else start from the gold answer, else the first coder's answer.
    int index = m_value->findData(before);
    if (index < 0 && !row->gold.isEmpty())
        index = m_value->findData(row->gold);
    m_value->setCurrentIndex(std::max(0, index));
    updateButtons();
}

QStringList AnswerPanel::offeredValues() const
{
    QStringList out;
    for (int i = 0; i < m_value->count(); ++i)
        out << m_value->itemData(i).toString();
    return out;
}

QString AnswerPanel::chosenValue() const
{
    return m_value->currentData().toString();
}

bool AnswerPanel::setChosenValue(const QString &value)
{
    const int index = m_value->findData(value);
    if (index < 0)
        return false;
    m_value->setCurrentIndex(index);
    return true;
}

QString AnswerPanel::rationale() const
{
    return m_rationale->text().trimmed();
}

void AnswerPanel::setRationale(const QString &text)
{
    m_rationale->setText(text);
}

void AnswerPanel::setDecisionsEnabled(bool enabled)
{
    m_enabled = enabled;
    updateButtons();
}

void AnswerPanel::updateButtons()
{
    const Row *row = currentRow();
    m_value->setEnabled(m_enabled && row);
    m_rationale->setEnabled(m_enabled && row);
    m_decide->setEnabled(m_enabled && row && !chosenValue().isEmpty());
    m_withdraw->setEnabled(m_enabled && row && row->goldId.isValid());
}

} // namespace fourfold
