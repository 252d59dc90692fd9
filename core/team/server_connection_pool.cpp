#include "core/team/server_connection_pool.h"

#include <map>
#include <mutex>
#include <optional>

namespace fourfold {

namespace {

constexpr int kKeptPerServer = 2;

struct Kept {
    std::mutex mutex;
    std::multimap<QString, ServerConnection> idle;
};

Kept &kept()
{
    static Kept k;
    return k;
}

} // namespace

Result<ServerConnection> ServerConnectionPool::take(const QString &conninfo)
{
    for (;;) {
        std::optional<ServerConnection> candidate;
        {
            std::lock_guard lock(kept().mutex);
            const auto it = kept().idle.find(conninfo);
            if (it == kept().idle.end())
                break;
            candidate.emplace(std::move(it->second));
            kept().idle.erase(it);
        }
        // A server restarted since, or a connection cut, fails here and is closed.
        if (candidate->exec(QStringLiteral("SELECT 1")))
            return std::move(*candidate);
    }
    return ServerConnection::open(conninfo);
}

void ServerConnectionPool::give(const QString &conninfo, ServerConnection conn)
{
    std::lock_guard lock(kept().mutex);
    if (kept().idle.count(conninfo) < size_t(kKeptPerServer))
        kept().idle.emplace(conninfo, std::move(conn));
}

} // namespace fourfold
