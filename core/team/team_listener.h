#pragma once
// Notices from a team project's server that shared rows changed. From server schema version 2
// every insert or update statement on a shared table sends NOTIFY on the channel
// "fourfold_change" with an empty payload (whose rows, which or how many stays unsaid),
// delivered when the writing transaction commits. A listener holds a connection of its own that
// LISTENs; a front end watches socket() for input (QSocketNotifier) and calls take(), or blocks
// in wait() on a worker thread. A listener is used on one thread at a time.

#include "core/model/error.h"

#include <QString>

#include <memory>

namespace fourfold {

class ServerConnection;

class TeamListener
{
public:
    // The notification channel of team projects.
    static QString channel() { return QStringLiteral("fourfold_change"); }

    // Connects to `server` (a libpq connection string, as a working file records it; the
    // password from libpq's conventions or TeamCredentials) and listens. Fails as
    // ServerConnection::open, or with the server's error.
    static Result<TeamListener> open(const QString &server);

    TeamListener(TeamListener &&) noexcept;
    TeamListener &operator=(TeamListener &&) noexcept;
    ~TeamListener();

    // The socket to watch for input.
    int socket() const;
    // The number of change notices the server has sent since the last call, read without
    // waiting. Fails with Io when the connection is lost (the listener is then of no more use).
    Result<int> take();
    // Waits up to `timeoutMs` milliseconds for change notices and returns their number (0 when
    // none came). Fails as take().
    Result<int> wait(int timeoutMs);

private:
    explicit TeamListener(std::unique_ptr<ServerConnection> conn);
    std::unique_ptr<ServerConnection> m_conn;
};

} // namespace fourfold
