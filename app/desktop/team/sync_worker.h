#pragma once
// The background sync's work, on a thread of its own: a Project opened on the working file (no
// SQLite handle crosses threads; the file is in WAL mode, so the desk keeps reading while a sync
// writes, and a desk edit waits out a sync's write within the store's busy timeout),
// TeamProject::sync and status, and the server's change notices (a TeamListener whose socket is
// watched on this thread).

#include "core/model/error.h"
#include "core/project/project.h"
#include "core/team/team_listener.h"
#include "core/team/team_project.h"

#include <QObject>
#include <QString>

#include <optional>

class QSocketNotifier;

namespace fourfold {

// What one sync of the working file came to.
struct SyncOutcome {
    std::optional<Error> error; // the sync's failure (the file stays as it was), or none
    SyncReport report; // what went each way (when it did not fail)
    std::optional<TeamStatus> status; // the file's team state after it (read even offline)
};

class SyncWorker : public QObject
{
    Q_OBJECT
public:
    // `path`: the working file. Made on the GUI thread and moved to the worker thread.
    explicit SyncWorker(QString path);
    ~SyncWorker() override;

    // On the worker thread: one sync, then the file's status; emits finished(). After the first
    // sync that reaches the server, listens for its change notices.
    void sync();
    // On the worker thread: closes the listener and the project (before the thread ends).
    void stop();

signals:
    void finished(const fourfold::SyncOutcome &outcome);
    // The server said that shared rows changed (`count` notices since the last).
    void noticed(int count);

private:
    void listen(const QString &server);
    void stopListening();
    void readNotices();

    QString m_path;
    std::optional<Project> m_project;
    std::optional<TeamListener> m_listener;
    QSocketNotifier *m_notifier = nullptr;
};

} // namespace fourfold

Q_DECLARE_METATYPE(fourfold::SyncOutcome)
