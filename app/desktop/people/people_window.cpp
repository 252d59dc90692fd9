#include "app/desktop/people/people_window.h"

#include "app/desktop/coding_session.h"
#include "app/desktop/message_bar.h"
#include "core/project/edit.h"

#include <QComboBox>
#include <QDialog>
#include <QDialogButtonBox>
#include <QFormLayout>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QInputDialog>
#include <QLabel>
#include <QLineEdit>
#include <QPushButton>
#include <QTableWidget>
#include <QVBoxLayout>

namespace fourfold {

PeopleWindow::PeopleWindow(CodingSession *session, QWidget *parent)
    : QWidget(parent, Qt::Window)
    , m_session(session)
{
    setWindowTitle(tr("People — %1").arg(session->project().settings().name));
    auto *layout = new QVBoxLayout(this);
    m_messages = new MessageBar(this);
    layout->addWidget(m_messages);
    auto *intro = new QLabel(tr("Names stay in this project; everything that leaves it carries the "
                                "pseudonym. A disabled person keeps their codings and takes no new "
                                "assignments."),
        this);
    intro->setWordWrap(true);
    layout->addWidget(intro);
    m_table = new QTableWidget(0, 4, this);
    m_table->setHorizontalHeaderLabels({tr("Pseudonym"), tr("Name"), tr("Role"), tr("State")});
    m_table->setSelectionBehavior(QAbstractItemView::SelectRows);
    m_table->setSelectionMode(QAbstractItemView::SingleSelection);
    m_table->setEditTriggers(QAbstractItemView::NoEditTriggers);
    m_table->verticalHeader()->hide();
    m_table->horizontalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
    m_table->horizontalHeader()->setStretchLastSection(true);
    m_table->setAccessibleName(tr("People"));
    layout->addWidget(m_table);
    auto *buttons = new QHBoxLayout;
    m_add = new QPushButton(tr("&Add a person…"), this);
    m_rename = new QPushButton(tr("&Rename…"), this);
    m_toggle = new QPushButton(tr("&Disable"), this);
    buttons->addWidget(m_add);
    buttons->addWidget(m_rename);
    buttons->addWidget(m_toggle);
    buttons->addStretch();
    layout->addLayout(buttons);
    connect(m_add, &QPushButton::clicked, this, &PeopleWindow::askAdd);
    connect(m_rename, &QPushButton::clicked, this, &PeopleWindow::askRename);
    connect(m_toggle, &QPushButton::clicked, this, &PeopleWindow::toggleSelected);
    connect(m_table, &QTableWidget::itemSelectionChanged, this, &PeopleWindow::updateButtons);
    // An undo or redo on the desk may take back a change made here.
    connect(m_session->undoStack(), &QUndoStack::indexChanged, this, &PeopleWindow::reload);
    resize(620, 420);
    reload();
    if (!m_session->signedIn() || !m_session->signedIn()->isLead())
        m_messages->showMessage(MessageBar::Kind::Warning,
            tr("Only a lead who chose themselves in \"Who is coding?\" can change people."));
}

void PeopleWindow::reload()
{
    const QString keep = selectedPseudonym();
    auto all = People::list(m_session->project());
    if (!all) {
        m_messages->showMessage(MessageBar::Kind::Error, all.error().message);
        return;
    }
    m_people = std::move(*all);
    m_table->setRowCount(int(m_people.size()));
    for (int row = 0; row < int(m_people.size()); ++row) {
        const Coder &c = m_people[std::size_t(row)];
        const QStringList cells {c.pseudonym, c.name,
            c.role == CoderRole::Lead ? tr("lead") : tr("coder"),
            c.disabled ? tr("disabled") : tr("enabled")};
        for (int col = 0; col < cells.size(); ++col) {
            auto *item = new QTableWidgetItem(cells[col]);
            if (c.disabled)
                item->setForeground(palette().color(QPalette::Disabled, QPalette::Text));
            m_table->setItem(row, col, item);
        }
        if (c.pseudonym == keep)
            m_table->selectRow(row);
    }
    updateButtons();
}

QString PeopleWindow::selectedPseudonym() const
{
    const auto rows = m_table->selectionModel()->selectedRows();
    if (rows.isEmpty() || rows.first().row() >= int(m_people.size()))
        return {};
    return m_people[std::size_t(rows.first().row())].pseudonym;
}

void PeopleWindow::updateButtons()
{
    const bool lead = m_session->signedIn() && m_session->signedIn()->isLead();
    const QString p = selectedPseudonym();
    const auto it = std::ranges::find(m_people, p, &Coder::pseudonym);
    m_add->setEnabled(lead);
    m_rename->setEnabled(lead && it != m_people.end());
    m_toggle->setEnabled(lead && it != m_people.end());
    m_toggle->setText(it != m_people.end() && it->disabled ? tr("&Enable") : tr("&Disable"));
}

Status PeopleWindow::apply(Result<std::unique_ptr<Edit>> edit, const QString &done)
{
    Status st = edit ? m_session->applyProjectEdit(std::move(*edit))
                     : Status(std::unexpected(edit.error()));
    if (!st) {
        m_messages->showMessage(MessageBar::Kind::Error, st.error().message);
        return st;
    }
    reload();
    m_messages->showMessage(MessageBar::Kind::Success, done, {}, {}, 8);
    return st;
}

Status PeopleWindow::refuseWithoutLead()
{
    auto st = fail(ErrorCode::NotAllowed,
        tr("Only a lead who chose themselves in \"Who is coding?\" can change people."));
    m_messages->showMessage(MessageBar::Kind::Error, st.error().message);
    return st;
}

Status PeopleWindow::addPerson(const NewPerson &person)
{
    return apply(People::add(m_session->project(), m_session->signedIn(), person),
        tr("Added %1. Undo takes it back.").arg(person.pseudonym.trimmed()));
}

Status PeopleWindow::rename(const QString &pseudonym, const QString &name)
{
    const SignedIn *by = m_session->signedIn();
    if (!by)
        return refuseWithoutLead();
    return apply(People::rename(m_session->project(), *by, pseudonym, name),
        tr("Renamed %1.").arg(pseudonym));
}

Status PeopleWindow::setDisabled(const QString &pseudonym, bool disabled)
{
    const SignedIn *by = m_session->signedIn();
    if (!by)
        return refuseWithoutLead();
    return apply(People::setDisabled(m_session->project(), *by, pseudonym, disabled),
        disabled
            ? tr("Disabled %1: their codings stay; they take no new assignments.").arg(pseudonym)
            : tr("Enabled %1.").arg(pseudonym));
}

void PeopleWindow::askAdd()
{
    QDialog form(this);
    form.setWindowTitle(tr("Add a person"));
    form.setMinimumWidth(440);
    auto *layout = new QFormLayout(&form);
    auto *name = new QLineEdit(&form);
    auto *pseudonym = new QLineEdit(&form);
    pseudonym->setPlaceholderText(tr("e.g. C04 — the only name written to exports"));
    auto *role = new QComboBox(&form);
    role->addItems({tr("coder"), tr("lead")});
    auto *passphrase = new QLineEdit(&form);
    passphrase->setEchoMode(QLineEdit::Password);
    auto *repeat = new QLineEdit(&form);
    repeat->setEchoMode(QLineEdit::Password);
    layout->addRow(tr("Name:"), name);
    layout->addRow(tr("Pseudonym:"), pseudonym);
    layout->addRow(tr("Role:"), role);
    layout->addRow(tr("New lead's passphrase:"), passphrase);
    layout->addRow(tr("Repeat it:"), repeat);
    auto sync = [=] {
        passphrase->setEnabled(role->currentIndex() == 1);
        repeat->setEnabled(role->currentIndex() == 1);
    };
    sync();
    connect(role, &QComboBox::currentIndexChanged, &form, sync);
    auto *error = new QLabel(&form);
    error->setWordWrap(true);
    error->setStyleSheet(QStringLiteral("color: #b00020;"));
    layout->addRow(error);
    for (QLineEdit *f : {name, pseudonym, passphrase, repeat})
        connect(f, &QLineEdit::textChanged, error, &QLabel::clear);
    auto *buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel, &form);
    layout->addRow(buttons);
    connect(buttons, &QDialogButtonBox::rejected, &form, &QDialog::reject);
    connect(buttons, &QDialogButtonBox::accepted, &form, [&] {
        const CoderRole r = role->currentIndex() == 1 ? CoderRole::Lead : CoderRole::Coder;
        if (r == CoderRole::Lead && passphrase->text() != repeat->text()) {
            error->setText(tr("The two passphrases differ; type the same one twice."));
            return;
        }
        if (addPerson({name->text(), pseudonym->text(), r, passphrase->text()}))
            form.accept();
        else
            error->setText(m_messages->text());
    });
    form.exec();
}

void PeopleWindow::askRename()
{
    const QString p = selectedPseudonym();
    const auto it = std::ranges::find(m_people, p, &Coder::pseudonym);
    if (it == m_people.end())
        return;
    bool ok = false;
    const QString name = QInputDialog::getText(this, tr("Rename %1").arg(p),
        tr("New name of %1 (kept in this project only):").arg(p), QLineEdit::Normal, it->name, &ok);
    if (ok)
        rename(p, name);
}

void PeopleWindow::toggleSelected()
{
    const QString p = selectedPseudonym();
    const auto it = std::ranges::find(m_people, p, &Coder::pseudonym);
    if (it != m_people.end())
        setDisabled(p, !it->disabled);
}

} // namespace fourfold
