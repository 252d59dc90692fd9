#include "app/desktop/coder_dialog.h"

#include <QDialogButtonBox>
#include <QLabel>
#include <QListWidget>
#include <QPushButton>
#include <QVBoxLayout>

namespace fourfold {

CoderDialog::CoderDialog(
    const QString &projectName, const std::vector<Coder> &coders, QWidget *parent)
    : QDialog(parent)
    , m_coders(coders)
{
    setWindowTitle(tr("Who is coding?"));
    auto *layout = new QVBoxLayout(this);
    auto *intro = new QLabel(
        tr("<b>%1</b><br>Choose who you are. A coder sees only their own spans and the articles "
           "assigned to them; a lead sees every article.")
            .arg(projectName.toHtmlEscaped()),
        this);
    intro->setWordWrap(true);
    layout->addWidget(intro);
    m_list = new QListWidget(this);
    m_list->setAccessibleName(tr("Coders"));
    for (const Coder &c : m_coders)
        m_list->addItem(
            QStringLiteral("%1 — %2 (%3)")
                .arg(c.pseudonym, c.name, c.role == CoderRole::Lead ? tr("lead") : tr("coder")));
    if (!m_coders.empty())
        m_list->setCurrentRow(0);
    layout->addWidget(m_list);
    auto *buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel, this);
    buttons->button(QDialogButtonBox::Ok)->setText(tr("Start coding"));
    buttons->button(QDialogButtonBox::Ok)->setEnabled(!m_coders.empty());
    connect(buttons, &QDialogButtonBox::accepted, this, &QDialog::accept);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    connect(m_list, &QListWidget::itemDoubleClicked, this, &QDialog::accept);
    layout->addWidget(buttons);
}

std::optional<Coder> CoderDialog::chosen() const
{
    const int row = m_list->currentRow();
    if (row < 0 || size_t(row) >= m_coders.size())
        return std::nullopt;
    return m_coders[size_t(row)];
}

} // namespace fourfold
