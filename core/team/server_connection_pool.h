#pragma once
// Connections to a team project's server kept open between syncs of this program, one user at
// a time. A new connection costs the server a process and a SCRAM exchange; with many coders
// syncing every few edits that was most of the server's work (bench/team_load_benchmark), so a
// sync takes a kept connection when one still answers.

#include "core/model/error.h"
#include "core/team/server_store_connection.h"

#include <QString>

namespace fourfold {

class ServerConnectionPool
{
public:
    ServerConnectionPool() = delete;

    // A connection to `conninfo`: a kept one that still answers a query, else a new one
    // (ServerConnection::open, failing as it does).
    static Result<ServerConnection> take(const QString &conninfo);
    // Keeps `conn`, outside any transaction, for the next take of `conninfo` (a few per string;
    // the others are closed).
    static void give(const QString &conninfo, ServerConnection conn);
};

} // namespace fourfold
