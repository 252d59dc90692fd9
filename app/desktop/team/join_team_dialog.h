#pragma once
// Project → Join a team project…: makes a person's working file from the team project on a
// PostgreSQL server (TeamProject::join) — the server by host, port and database or by a
// connection string, the person's pseudonym and password, and where to keep the file. The
// password goes to libpq in memory only (TeamCredentials) and stays there for this session, so
// the background sync can log in; it is never written to the file, the settings or a log. The
// join runs on a worker thread; a refusal is told in the dialog's message bar.

#include "core/team/team_project.h"

#include <QDialog>
#include <QFutureWatcher>

#include <optional>

class QLineEdit;
class QPushButton;
class QRadioButton;

namespace fourfold {

class MessageBar;

class JoinTeamDialog : public QDialog
{
    Q_OBJECT
public:
    explicit JoinTeamDialog(QWidget *parent = nullptr);
    ~JoinTeamDialog() override;

    // Joins with what the fields say (the Join button). On success the dialog is accepted;
    // otherwise the message bar says why and the fields stay for another try.
    void join();
    bool isJoining() const { return m_watcher.isRunning(); }

    // After acceptance: the new working file and whose it is.
    QString workingFile() const { return m_report ? m_report->path : QString(); }
    QString pseudonym() const { return m_report ? m_report->pseudonym : QString(); }
    const std::optional<JoinReport> &report() const { return m_report; }

    // The fields, for tests and screenshots.
    QRadioButton *byPartsButton() const { return m_byParts; }
    QRadioButton *byStringButton() const { return m_byString; }
    QLineEdit *hostField() const { return m_host; }
    QLineEdit *portField() const { return m_port; }
    QLineEdit *databaseField() const { return m_database; }
    QLineEdit *connectionField() const { return m_connection; }
    QLineEdit *pseudonymField() const { return m_pseudonym; }
    QLineEdit *passwordField() const { return m_password; }
    QLineEdit *fileField() const { return m_file; }
    QPushButton *joinButton() const { return m_join; }
    MessageBar *messageBar() const { return m_messages; }

signals:
    // A join ended; accepted() follows a successful one.
    void joinFinished(bool joined);

private:
    void chooseFile();
    void updateFields();
    void finish();
    // The connection string the fields make (no password), or empty after telling what is
    // missing.
    QString server();

    MessageBar *m_messages = nullptr;
    QRadioButton *m_byParts = nullptr;
    QRadioButton *m_byString = nullptr;
    QLineEdit *m_host = nullptr;
    QLineEdit *m_port = nullptr;
    QLineEdit *m_database = nullptr;
    QLineEdit *m_connection = nullptr;
    QLineEdit *m_pseudonym = nullptr;
    QLineEdit *m_password = nullptr;
    QLineEdit *m_file = nullptr;
    QPushButton *m_browse = nullptr;
    QPushButton *m_join = nullptr;
    QString m_server; // of the join running
    QFutureWatcher<Result<JoinReport>> m_watcher;
    std::optional<JoinReport> m_report;
};

} // namespace fourfold
