#include "app/desktop/coder_dialog.h"

#include "core/project/project.h"

#include <QComboBox>
#include <QDialogButtonBox>
#include <QFormLayout>
#include <QLabel>
#include <QLineEdit>
#include <QListWidget>
#include <QPushButton>
#include <QVBoxLayout>

namespace fourfold {

CoderDialog::CoderDialog(
    const QString &projectName, const std::vector<Coder> &coders, QWidget *parent, Project *project)
    : QDialog(parent)
    , m_coders(coders)
    , m_project(project)
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
    if (m_project) {
        QPushButton *add = buttons->addButton(tr("Add a person…"), QDialogButtonBox::ActionRole);
        connect(add, &QPushButton::clicked, this, &CoderDialog::addPerson);
        connect(m_list, &QListWidget::currentRowChanged, this,
            [buttons](int row) { buttons->button(QDialogButtonBox::Ok)->setEnabled(row >= 0); });
    }
    connect(buttons, &QDialogButtonBox::accepted, this, &QDialog::accept);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    connect(m_list, &QListWidget::itemDoubleClicked, this, &QDialog::accept);
    layout->addWidget(buttons);
}

void CoderDialog::addPerson()
{
    QDialog form(this);
    form.setWindowTitle(tr("Add a person"));
    auto *layout = new QFormLayout(&form);
    auto *name = new QLineEdit(&form);
    auto *pseudonym = new QLineEdit(&form);
    pseudonym->setPlaceholderText(tr("e.g. C04 — the only name written to exports"));
    auto *role = new QComboBox(&form);
    role->addItem(tr("coder"));
    role->addItem(tr("lead"));
    layout->addRow(tr("Name:"), name);
    layout->addRow(tr("Pseudonym:"), pseudonym);
    layout->addRow(tr("Role:"), role);
    auto *error = new QLabel(&form);
    error->setWordWrap(true);
    layout->addRow(error);
    auto *buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel, &form);
    layout->addRow(buttons);
    connect(buttons, &QDialogButtonBox::rejected, &form, &QDialog::reject);
    connect(buttons, &QDialogButtonBox::accepted, &form, [&] {
        const CoderRole r = role->currentIndex() == 1 ? CoderRole::Lead : CoderRole::Coder;
        auto id = m_project->addCoder(name->text(), pseudonym->text(), r);
        if (!id) {
            error->setText(id.error().message); // the form stays open with what was typed
            return;
        }
        Coder c;
        c.id = *id;
        c.name = name->text().trimmed();
        c.pseudonym = pseudonym->text().trimmed();
        c.role = r;
        m_coders.push_back(c);
        m_list->addItem(
            QStringLiteral("%1 — %2 (%3)")
                .arg(c.pseudonym, c.name, r == CoderRole::Lead ? tr("lead") : tr("coder")));
        m_list->setCurrentRow(m_list->count() - 1);
        form.accept();
    });
    form.exec();
}

std::optional<Coder> CoderDialog::chosen() const
{
    const int row = m_list->currentRow();
    if (row < 0 || size_t(row) >= m_coders.size())
        return std::nullopt;
    return m_coders[size_t(row)];
}

} // namespace fourfold
