#pragma once
// How a front end logs a person in to a team project's server without writing a password
// anywhere: the login role team publish made for a pseudonym, a connection string from its
// parts, and the passwords typed in this session, held in memory only and handed to libpq as it
// connects (ServerConnection::open). Nothing here reaches a project file, the settings or a log.

#include "core/model/error.h"

#include <QByteArray>
#include <QString>

#include <optional>

namespace fourfold {

class TeamCredentials
{
public:
    TeamCredentials() = delete;

    // The login role of the person `pseudonym` in the team project on `database`: the
    // database's name, then the pseudonym in lower case, as team publish makes it.
    static QString loginRole(const QString &database, const QString &pseudonym);

    // A libpq connection string ("key='value'" pairs) naming `host` (a host name, an address or
    // a Unix socket folder), `port` (empty: libpq's default), `database` and the login `role`,
    // without a password. Empty parts are left out.
    static QString connectionString(
        const QString &host, const QString &port, const QString &database, const QString &role);

    // Keeps `password` in memory until forgotten or the program ends, for every connection to
    // `server` (a libpq connection string, compared in the form team join records, so a
    // "postgresql://" URI and its key='value' form are the same server) that names no password
    // of its own. An empty password forgets. Fails with InvalidArgument, with libpq's reason,
    // when `server` is not a connection string (nothing is kept then).
    static Status rememberPassword(const QString &server, const QString &password);
    static void forgetPassword(const QString &server);
    // The password remembered for `recordedServer` (in the form team join records), if any.
    static std::optional<QByteArray> rememberedPassword(const QString &recordedServer);

    // True when `error`, from connecting, says that the server asked for a password and none
    // was at hand (libpq's PQnoPasswordSupplied).
    static bool isMissingPassword(const Error &error);
};

} // namespace fourfold
