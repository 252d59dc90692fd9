#include "app/desktop/coder_dialog.h"

#include "core/project/coder_copies.h"
#include "core/project/edit.h"
#include "core/project/passphrase.h"
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

namespace {

QString roleText(CoderRole role)
{
    return role == CoderRole::Lead ? CoderDialog::tr("lead") : CoderDialog::tr("coder");
}

QLineEdit *passwordField(QWidget *parent, const QString &objectName)
{
    auto *field = new QLineEdit(parent);
    field->setEchoMode(QLineEdit::Password);
    field->setObjectName(objectName);
    return field;
}

// A message under a form: wrapped, as wide as the form, and red.
QLabel *makeMessageLabel(QWidget *parent)
{
    auto *label = new QLabel(parent);
    label->setObjectName(QStringLiteral("message"));
    label->setWordWrap(true);
    label->setTextFormat(Qt::PlainText);
    label->setStyleSheet(QStringLiteral("color: #b00020;"));
    label->setMinimumWidth(360);
    label->hide();
    return label;
}

void showMessage(QLabel *label, const QString &text)
{
    label->setText(text);
    label->setVisible(!text.isEmpty());
    if (QWidget *w = label->window())
        w->adjustSize(); // room for every line of the message
}

} // namespace

CoderDialog::CoderDialog(Project &project, QWidget *parent, const QString &preselect)
    : QDialog(parent)
    , m_project(project)
{
    setWindowTitle(tr("Who is coding?"));
    auto *layout = new QVBoxLayout(this);
    auto *intro = new QLabel(
        tr("<b>%1</b><br>Choose who you are. A coder sees only their own spans and the articles "
           "assigned to them; a lead sees every article and gives their passphrase.")
            .arg(project.settings().name.toHtmlEscaped()),
        this);
    intro->setWordWrap(true);
    layout->addWidget(intro);
    m_list = new QListWidget(this);
    m_list->setAccessibleName(tr("People"));
    layout->addWidget(m_list);

    auto *form = new QFormLayout;
    m_passphraseLabel = new QLabel(this);
    m_passphrase = passwordField(this, QStringLiteral("passphrase"));
    m_passphraseLabel->setBuddy(m_passphrase);
    form->addRow(m_passphraseLabel, m_passphrase);
    m_repeatLabel = new QLabel(tr("Repeat it:"), this);
    m_repeat = passwordField(this, QStringLiteral("repeat"));
    m_repeatLabel->setBuddy(m_repeat);
    form->addRow(m_repeatLabel, m_repeat);
    layout->addLayout(form);
    m_message = makeMessageLabel(this);
    layout->addWidget(m_message);

    auto *buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel, this);
    QPushButton *ok = buttons->button(QDialogButtonBox::Ok);
    ok->setText(tr("Start coding"));
    QPushButton *add = buttons->addButton(tr("Add a person…"), QDialogButtonBox::ActionRole);
    connect(add, &QPushButton::clicked, this, &CoderDialog::addPerson);
    connect(m_list, &QListWidget::currentRowChanged, this, [this, ok](int row) {
        ok->setEnabled(row >= 0);
        updateFields();
    });
    for (QLineEdit *field : {m_passphrase, m_repeat})
        connect(field, &QLineEdit::textEdited, this, [this] { showMessage(m_message, {}); });
    connect(buttons, &QDialogButtonBox::accepted, this, &CoderDialog::tryAccept);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    connect(m_list, &QListWidget::itemDoubleClicked, this, &CoderDialog::tryAccept);
    layout->addWidget(buttons);

    reload();
    if (!preselect.isEmpty())
        select(preselect);
    ok->setEnabled(m_list->currentRow() >= 0);
    updateFields();
}

void CoderDialog::reload()
{
    m_people.clear();
    m_list->clear();
    auto all = People::list(m_project);
    if (!all) {
        showMessage(m_message, all.error().message);
        return;
    }
    // A coder copy is its coder's alone: nobody else is offered (the lead and the other coders are
    // in it only as the authors of the codebook and assignments).
    auto copy = CoderCopies::copyInfo(m_project);
    const QString copyCoder = copy && *copy ? (*copy)->coderUuid : QString();
    for (const Coder &c : *all) {
        if (c.disabled)
            continue; // kept in the project, but nobody chooses them
        if (!copyCoder.isEmpty() && c.uuid != copyCoder)
            continue;
        m_people.push_back(c);
        // In a copy everyone codes as a coder, a lead included.
        const CoderRole shown = copyCoder.isEmpty() ? c.role : CoderRole::Coder;
        m_list->addItem(QStringLiteral("%1 — %2 (%3)").arg(c.pseudonym, c.name, roleText(shown)));
    }
    if (!m_people.empty())
        m_list->setCurrentRow(0);
}

bool CoderDialog::select(const QString &pseudonym)
{
    for (std::size_t i = 0; i < m_people.size(); ++i)
        if (m_people[i].pseudonym == pseudonym) {
            m_list->setCurrentRow(int(i));
            return true;
        }
    return false;
}

std::optional<Coder> CoderDialog::selected() const
{
    const int row = m_list->currentRow();
    if (row < 0 || std::size_t(row) >= m_people.size())
        return std::nullopt;
    return m_people[std::size_t(row)];
}

void CoderDialog::updateFields()
{
    m_passphrase->clear();
    m_repeat->clear();
    showMessage(m_message, {});
    const auto person = selected();
    auto state = person ? People::passphraseState(m_project, person->pseudonym)
                        : Result<PassphraseState>(PassphraseState::NotNeeded);
    if (!state) {
        showMessage(m_message, state.error().message);
        state = PassphraseState::NotNeeded;
    }
    const bool ask = *state != PassphraseState::NotNeeded;
    const bool setting = *state == PassphraseState::NotSetYet;
    if (ask)
        m_passphraseLabel->setText(setting
                ? tr("%1 has no passphrase yet. Set one (at least %2 characters):")
                      .arg(person->pseudonym)
                      .arg(kMinPassphraseLength)
                : tr("Passphrase of %1:").arg(person->pseudonym));
    m_passphraseLabel->setWordWrap(true);
    m_passphraseLabel->setVisible(ask);
    m_passphrase->setVisible(ask);
    m_repeatLabel->setVisible(setting);
    m_repeat->setVisible(setting);
    if (ask)
        m_passphrase->setFocus();
}

void CoderDialog::tryAccept()
{
    const auto person = selected();
    if (!person)
        return;
    if (m_repeat->isVisible() && m_repeat->text() != m_passphrase->text()) {
        showMessage(m_message, tr("The two passphrases differ; type the same one twice."));
        return;
    }
    auto in = People::signIn(m_project, person->pseudonym, m_passphrase->text());
    if (!in) {
        m_passphrase->clear();
        m_repeat->clear();
        showMessage(m_message, in.error().message);
        m_passphrase->setFocus();
        return;
    }
    m_signedIn = *in;
    accept();
}

void CoderDialog::addPerson()
{
    QDialog form(this);
    form.setWindowTitle(tr("Add a person"));
    form.setMinimumWidth(440);
    auto *layout = new QFormLayout(&form);
    layout->setSizeConstraint(QLayout::SetMinimumSize);
    layout->setRowWrapPolicy(QFormLayout::WrapLongRows);
    auto *name = new QLineEdit(&form);
    name->setObjectName(QStringLiteral("name"));
    auto *pseudonym = new QLineEdit(&form);
    pseudonym->setObjectName(QStringLiteral("pseudonym"));
    pseudonym->setPlaceholderText(tr("e.g. C04 — the only name written to exports"));
    auto *role = new QComboBox(&form);
    role->setObjectName(QStringLiteral("role"));
    role->addItem(tr("coder"));
    role->addItem(tr("lead"));
    auto *passphrase = passwordField(&form, QStringLiteral("passphrase"));
    auto *repeat = passwordField(&form, QStringLiteral("repeat"));
    layout->addRow(tr("Name:"), name);
    layout->addRow(tr("Pseudonym:"), pseudonym);
    layout->addRow(tr("Role:"), role);
    layout->addRow(tr("New lead's passphrase:"), passphrase);
    layout->addRow(tr("Repeat it:"), repeat);

    // Once the project has a lead, only a lead adds people: they say who they are.
    const bool open = People::mayAddWithoutLead(m_project).value_or(false);
    auto *lead = new QComboBox(&form);
    lead->setObjectName(QStringLiteral("lead"));
    auto *leadPassphrase = passwordField(&form, QStringLiteral("leadPassphrase"));
    if (!open) {
        for (const Coder &c : m_people)
            if (c.role == CoderRole::Lead)
                lead->addItem(c.pseudonym);
        auto *who = new QLabel(
            tr("Only a lead adds people. Choose your lead entry and give its passphrase."), &form);
        who->setWordWrap(true);
        layout->addRow(who);
        layout->addRow(tr("Added by:"), lead);
        layout->addRow(tr("Your passphrase:"), leadPassphrase);
    } else {
        lead->hide();
        leadPassphrase->hide();
    }
    auto showLeadFields = [=] {
        const bool isLead = role->currentIndex() == 1;
        passphrase->setEnabled(isLead);
        repeat->setEnabled(isLead);
        if (!isLead) {
            passphrase->clear();
            repeat->clear();
        }
    };
    showLeadFields();

    auto *error = makeMessageLabel(&form);
    layout->addRow(error);
    auto *buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel, &form);
    layout->addRow(buttons);
    // A message goes as soon as a field changes: it spoke of what was there before.
    for (QLineEdit *field : {name, pseudonym, passphrase, repeat, leadPassphrase})
        connect(field, &QLineEdit::textChanged, &form, [error] { showMessage(error, {}); });
    connect(role, &QComboBox::currentIndexChanged, &form, [=] {
        showMessage(error, {});
        showLeadFields();
    });
    connect(lead, &QComboBox::currentIndexChanged, &form, [error] { showMessage(error, {}); });
    connect(buttons, &QDialogButtonBox::rejected, &form, &QDialog::reject);
    connect(buttons, &QDialogButtonBox::accepted, &form, [&] {
        const CoderRole r = role->currentIndex() == 1 ? CoderRole::Lead : CoderRole::Coder;
        if (r == CoderRole::Lead && passphrase->text() != repeat->text()) {
            showMessage(error, tr("The two passphrases differ; type the same one twice."));
            return;
        }
        std::optional<SignedIn> by;
        if (!open && lead->count() > 0) {
            auto in = People::signIn(m_project, lead->currentText(), leadPassphrase->text());
            if (!in) {
                showMessage(error, in.error().message);
                return;
            }
            by = *in;
        }
        auto edit = People::add(m_project, by ? &*by : nullptr,
            {name->text(), pseudonym->text(), r, passphrase->text()});
        Status applied = edit ? m_project.apply(**edit) : Status(std::unexpected(edit.error()));
        if (!applied) {
            showMessage(error, applied.error().message); // the form stays open as it was typed
            return;
        }
        const QString added = pseudonym->text().trimmed();
        form.accept();
        reload();
        select(added);
    });
    emit personFormOpened(&form);
    form.exec();
}

} // namespace fourfold
