#pragma once
// One connection to a team project's PostgreSQL server through libpq: a thin RAII layer like
// Database over SQLite. Parameters are always bound ($1, $2 …, sent as text), never pasted into
// SQL; the few statements PostgreSQL cannot parameterise (CREATE ROLE, GRANT) quote names and
// literals with libpq's own escaping. libpq stays inside this pair of files.

#include "core/model/error.h"

#include <QByteArray>
#include <QList>
#include <QString>
#include <QStringList>

#include <memory>
#include <optional>

struct pg_conn;
struct pg_result;

namespace fourfold {

// The rows a query returned (text format).
class ServerResult
{
public:
    int rows() const;
    int columns() const;
    bool isNull(int row, int column) const;
    QString text(int row, int column) const;
    QByteArray bytes(int row, int column) const;
    qint64 integer(int row, int column) const;

private:
    friend class ServerConnection;
    struct Free {
        void operator()(pg_result *r) const;
    };
    std::unique_ptr<pg_result, Free> m_result;
};

class ServerConnection
{
public:
    // Connects with a libpq connection string (a "postgresql://" URI or "key=value" pairs; the
    // password comes from libpq's conventions: a password file, PGPASSFILE, PGPASSWORD; a string
    // that names no password uses the one remembered for its server in this session,
    // TeamCredentials::rememberPassword, handed to libpq in memory only). Fails with Io naming
    // the server when it cannot be reached, NotAllowed when the login is refused.
    static Result<ServerConnection> open(const QString &conninfo);

    // `conninfo` without any password, as "key='value'" pairs: what a project file may record.
    // InvalidArgument, with libpq's reason, when libpq cannot read it.
    static Result<QString> withoutPassword(const QString &conninfo);

    ServerConnection(ServerConnection &&) noexcept = default;
    ServerConnection &operator=(ServerConnection &&) noexcept = default;

    // Runs one or more statements without parameters (schema text). Fails with the server's
    // error (see query).
    Status exec(const QString &sql);
    // Runs one statement with text parameters ($1 …; a null QByteArray is SQL NULL). Fails with
    // NotAllowed when the server refuses it for the role (privileges, row-level security),
    // Constraint for a unique, foreign-key or check violation, Io when the connection is lost,
    // InvalidInput otherwise; the message names the server and the cause is the server's text.
    Result<ServerResult> query(const QString &sql, const QList<QByteArray> &params = {});
    Status run(const QString &sql, const QList<QByteArray> &params = {});

    // An identifier / literal quoted for this server (libpq's PQescapeIdentifier/Literal).
    QString quotedIdentifier(const QString &name) const;
    QString quotedLiteral(const QString &value) const;
    // The SCRAM-SHA-256 verifier of `password` for `role`, computed here so that the password
    // itself never travels to the server or its logs.
    Result<QString> passwordVerifier(const QString &role, const QString &password) const;

    QString host() const; // as connected: a host name or a Unix socket folder
    QString port() const;
    QString database() const;
    QString user() const;
    // "user@host:port/database", for messages.
    QString describe() const;

    // The connection's socket, to wait on for notifications (-1 when there is none).
    int socket() const;
    // Reads what the server has sent, without waiting, and returns the channels of the
    // notifications (LISTEN / NOTIFY) received since the last call, in order. Fails with Io when
    // the connection is lost.
    Result<QStringList> notifications();

private:
    struct Free {
        void operator()(pg_conn *c) const;
    };
    explicit ServerConnection(pg_conn *conn);
    std::unique_ptr<pg_conn, Free> m_conn;
};

} // namespace fourfold
