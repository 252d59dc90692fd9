#include "core/team/team_listener.h"

#include "core/team/server_store_connection.h"

#include <QDeadlineTimer>

#include <poll.h>

#include <cerrno>

namespace fourfold {

TeamListener::TeamListener(std::unique_ptr<ServerConnection> conn)
    : m_conn(std::move(conn))
{ }

TeamListener::TeamListener(TeamListener &&) noexcept = default;
TeamListener &TeamListener::operator=(TeamListener &&) noexcept = default;
TeamListener::~TeamListener() = default;

Result<TeamListener> TeamListener::open(const QString &server)
{
    auto conn = ServerConnection::open(server);
    if (!conn)
        return std::unexpected(conn.error());
    auto owned = std::make_unique<ServerConnection>(std::move(*conn));
    // The channel is a fixed identifier of ours: nothing to quote.
    FOURFOLD_TRY_STATUS(owned->exec(QStringLiteral("LISTEN ") + channel()));
    return TeamListener(std::move(owned));
}

int TeamListener::socket() const
{
    return m_conn->socket();
}

Result<int> TeamListener::take()
{
    auto channels = m_conn->notifications();
    if (!channels)
        return std::unexpected(channels.error());
    return int(channels->count(channel()));
}

Result<int> TeamListener::wait(int timeoutMs)
{
    const QDeadlineTimer deadline(timeoutMs);
    for (;;) {
        auto taken = take();
        if (!taken || *taken > 0)
            return taken;
        const qint64 left = deadline.remainingTime();
        if (left <= 0)
            return 0;
        pollfd fd {socket(), POLLIN, 0};
        if (::poll(&fd, 1, int(left)) < 0 && errno != EINTR)
            return take(); // says why, or finds nothing
    }
}

} // namespace fourfold
