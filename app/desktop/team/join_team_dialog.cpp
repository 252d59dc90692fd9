#include "app/desktop/team/join_team_dialog.h"

#include "app/desktop/message_bar.h"
#include "core/team/team_credentials.h"

#include <QDialogButtonBox>
#include <QDir>
#include <QFileDialog>
#include <QFormLayout>
#include <QHBoxLayout>
#include <QIntValidator>
#include <QLabel>
#include <QLineEdit>
#include <QPushButton>
#include <QRadioButton>
#include <QVBoxLayout>
#include <QtConcurrent/QtConcurrentRun>

namespace fourfold {

JoinTeamDialog::JoinTeamDialog(QWidget *parent)
    : QDialog(parent)
{
    setWindowTitle(tr("Join a team project"));
    auto *column = new QVBoxLayout(this);
    m_messages = new MessageBar(this);
    column->addWidget(m_messages);
    auto *intro = new QLabel(tr("Your lead gives you the server, your pseudonym and your "
                                "password. Your working file is kept on this computer and "
                                "syncs with the server while it is open."),
        this);
    intro->setWordWrap(true);
    column->addWidget(intro);

    auto *form = new QFormLayout;
    m_byParts = new QRadioButton(tr("Host and database"), this);
    m_byString = new QRadioButton(tr("Connection string"), this);
    m_byParts->setChecked(true);
    auto *how = new QHBoxLayout;
    how->addWidget(m_byParts);
    how->addWidget(m_byString);
    how->addStretch();
    form->addRow(tr("Server:"), how);

    m_host = new QLineEdit(this);
    m_host->setPlaceholderText(tr("e.g. db.example.org"));
    m_port = new QLineEdit(this);
    m_port->setValidator(new QIntValidator(1, 65535, m_port));
    m_port->setPlaceholderText(QStringLiteral("5432"));
    m_port->setMaximumWidth(80);
    m_port->setAccessibleName(tr("Port"));
    auto *hostRow = new QHBoxLayout;
    hostRow->addWidget(m_host, 1);
    hostRow->addWidget(new QLabel(tr("Port:"), this));
    hostRow->addWidget(m_port);
    form->addRow(tr("Host:"), hostRow);
    m_database = new QLineEdit(this);
    form->addRow(tr("Database:"), m_database);
    m_connection = new QLineEdit(this);
    m_connection->setPlaceholderText(QStringLiteral("postgresql://study_c01@db.example.org/study"));
    form->addRow(tr("Connection string:"), m_connection);

    m_pseudonym = new QLineEdit(this);
    form->addRow(tr("Your pseudonym:"), m_pseudonym);
    m_password = new QLineEdit(this);
    m_password->setEchoMode(QLineEdit::Password);
    m_password->setToolTip(tr("Kept in memory while Fourfold runs, never written to a file. "
                              "Leave it empty when your password file (~/.pgpass) holds it."));
    form->addRow(tr("Password:"), m_password);

    m_file = new QLineEdit(this);
    m_file->setPlaceholderText(tr("Where to keep your working file"));
    m_browse = new QPushButton(tr("Choose…"), this);
    connect(m_browse, &QPushButton::clicked, this, &JoinTeamDialog::chooseFile);
    auto *fileRow = new QHBoxLayout;
    fileRow->addWidget(m_file, 1);
    fileRow->addWidget(m_browse);
    form->addRow(tr("Working file:"), fileRow);
    column->addLayout(form);

    auto *buttons = new QDialogButtonBox(QDialogButtonBox::Cancel, this);
    m_join = buttons->addButton(tr("&Join"), QDialogButtonBox::AcceptRole);
    m_join->setDefault(true);
    connect(buttons, &QDialogButtonBox::accepted, this, &JoinTeamDialog::join);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    column->addWidget(buttons);

    connect(m_byParts, &QRadioButton::toggled, this, &JoinTeamDialog::updateFields);
    connect(&m_watcher, &QFutureWatcherBase::finished, this, &JoinTeamDialog::finish);
    updateFields();
    resize(560, sizeHint().height());
}

JoinTeamDialog::~JoinTeamDialog()
{
    // The join writes a file of its own: let it end rather than leave it half made.
    m_watcher.waitForFinished();
}

void JoinTeamDialog::updateFields()
{
    const bool parts = m_byParts->isChecked();
    const bool idle = !m_watcher.isRunning();
    for (QWidget *w : {static_cast<QWidget *>(m_host), static_cast<QWidget *>(m_port),
             static_cast<QWidget *>(m_database)})
        w->setEnabled(idle && parts);
    m_connection->setEnabled(idle && !parts);
    for (QWidget *w : {static_cast<QWidget *>(m_pseudonym), static_cast<QWidget *>(m_password),
             static_cast<QWidget *>(m_file), static_cast<QWidget *>(m_browse),
             static_cast<QWidget *>(m_byParts), static_cast<QWidget *>(m_byString),
             static_cast<QWidget *>(m_join)})
        w->setEnabled(idle);
}

void JoinTeamDialog::chooseFile()
{
    QString suggestion = m_file->text();
    if (suggestion.isEmpty() && !m_pseudonym->text().trimmed().isEmpty())
        suggestion = QDir::home().filePath(
            QStringLiteral("%1-%2.fourfold")
                .arg(m_database->text().trimmed().isEmpty() ? QStringLiteral("team")
                                                            : m_database->text().trimmed(),
                    m_pseudonym->text().trimmed()));
    const QString path = QFileDialog::getSaveFileName(
        this, tr("Working file"), suggestion, tr("Fourfold projects (*.fourfold)"));
    if (!path.isEmpty())
        m_file->setText(path);
}

QString JoinTeamDialog::server()
{
    const QString pseudonym = m_pseudonym->text().trimmed();
    if (m_byParts->isChecked()) {
        if (m_host->text().trimmed().isEmpty() || m_database->text().trimmed().isEmpty()) {
            m_messages->showMessage(MessageBar::Kind::Warning,
                tr("Name the server: its host and database, or a connection string."));
            return {};
        }
        return TeamCredentials::connectionString(m_host->text(), m_port->text(), m_database->text(),
            TeamCredentials::loginRole(m_database->text().trimmed(), pseudonym));
    }
    if (m_connection->text().trimmed().isEmpty()) {
        m_messages->showMessage(MessageBar::Kind::Warning,
            tr("Name the server: its host and database, or a connection string."));
        return {};
    }
    return m_connection->text().trimmed();
}

void JoinTeamDialog::join()
{
    if (m_watcher.isRunning())
        return;
    const QString pseudonym = m_pseudonym->text().trimmed();
    if (pseudonym.isEmpty()) {
        m_messages->showMessage(
            MessageBar::Kind::Warning, tr("Give your pseudonym, as your lead gave it to you."));
        return;
    }
    QString path = m_file->text().trimmed();
    if (path.isEmpty()) {
        m_messages->showMessage(
            MessageBar::Kind::Warning, tr("Choose where to keep your working file."));
        return;
    }
    if (!path.endsWith(QLatin1String(".fourfold")))
        path += QLatin1String(".fourfold");
    m_server = server();
    if (m_server.isEmpty())
        return;
    // The password is held in memory for this server; every connection to it that names no
    // password of its own (the join, then the background sync) takes it from there.
    if (auto st = TeamCredentials::rememberPassword(m_server, m_password->text()); !st) {
        m_messages->showMessage(MessageBar::Kind::Error, st.error().message, {}, st.error().cause);
        return;
    }
    m_messages->showMessage(MessageBar::Kind::Information, tr("Joining the team project…"));
    m_watcher.setFuture(QtConcurrent::run([server = m_server, pseudonym, path] {
        return TeamProject::join(server, pseudonym, path);
    }));
    updateFields();
}

void JoinTeamDialog::finish()
{
    auto result = m_watcher.result();
    updateFields();
    if (!result) {
        TeamCredentials::forgetPassword(m_server);
        m_messages->showMessage(
            MessageBar::Kind::Error, result.error().message, {}, result.error().cause);
        emit joinFinished(false);
        return;
    }
    m_report = *result;
    m_messages->dismiss();
    emit joinFinished(true);
    accept();
}

} // namespace fourfold
