#pragma once
// The background sync of an opened team working file (a project file whose settings name its
// server, TeamProject::serverSettingKey): pushes soon after each local change (kPushDelayMs
// after the last), pulls every kPullIntervalMs and at once when the server notices a change
// (TeamListener), and says how things stand in one line for the status bar. Every sync runs on
// a worker thread with its own connection to the file (SyncWorker); the GUI thread never waits
// for the server.

#include "app/desktop/team/sync_worker.h"

#include <QDateTime>
#include <QObject>
#include <QTimer>

class QThread;

namespace fourfold {

class BackgroundSync : public QObject
{
    Q_OBJECT
public:
    static constexpr int kPushDelayMs = 1500;
    static constexpr int kPullIntervalMs = 5000;

    // Starts syncing the working file `path`, whose team state `status` was read on opening it:
    // the first sync at once.
    BackgroundSync(const QString &path, const TeamStatus &status, QObject *parent = nullptr);
    // Waits for a sync that is running to end, then closes the worker's connection.
    ~BackgroundSync() override;

    // A local change was committed: a sync follows kPushDelayMs after the last such call.
    void localChange();
    // Syncs now, or as soon as the sync running has ended.
    void syncNow();
    void setPullInterval(int milliseconds);

    // The status bar's line: "synced N s ago" (with "conflict — lead decides" while conflicts
    // wait for the lead), "offline — N changes waiting", or "syncing…" before the first sync.
    QString statusText() const;
    // Why the last sync failed (empty when it did not).
    QString problem() const;
    bool isOffline() const { return m_outcome.error.has_value(); }
    // The server as the file records it (no password).
    QString server() const { return m_server; }
    // Syncs ended (either way) and server notices received since this object started.
    int syncsFinished() const { return m_finished; }
    int noticesReceived() const { return m_notices; }
    const SyncOutcome &lastOutcome() const { return m_outcome; }

signals:
    void statusChanged(const QString &text);
    // A sync wrote others' changes into the file: the views read it again.
    void pulled();
    // The server asks for a password the session does not have; said once per object.
    void passwordNeeded(const QString &server);
    void syncFinished();

private:
    void finish(const SyncOutcome &outcome);
    void updateStatus();

    QString m_server;
    QThread *m_thread = nullptr;
    SyncWorker *m_worker = nullptr;
    QTimer m_pushTimer;
    QTimer m_pullTimer;
    QTimer m_clock; // the "N s ago" goes on counting
    bool m_running = false;
    bool m_again = false;
    bool m_askedPassword = false;
    int m_finished = 0;
    int m_notices = 0;
    SyncOutcome m_outcome;
    std::optional<TeamStatus> m_status;
    QDateTime m_lastSynced; // of the last sync that succeeded (UTC)
    QString m_text;
};

} // namespace fourfold
