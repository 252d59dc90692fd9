#include "core/team/server_store_connection.h"

#include "core/team/team_credentials.h"

#include <QCoreApplication>
#include <QStringList>

#include <libpq-fe.h>

#include <optional>
#include <vector>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ServerConnectionText {
    Q_DECLARE_TR_FUNCTIONS(ServerConnectionText)
};

QString serverText(const char *text)
{
    return QString::fromUtf8(text ? text : "").trimmed();
}

// SQLSTATE classes (PostgreSQL 15 documentation, Appendix A "PostgreSQL Error Codes").
ErrorCode codeForState(const QByteArray &state)
{
    if (state == "42501" || state.startsWith("28"))
        return ErrorCode::NotAllowed; // insufficient_privilege; invalid authorization
    if (state.startsWith("23"))
        return ErrorCode::Constraint; // integrity constraint violation
    if (state.startsWith("08") || state.startsWith("57"))
        return ErrorCode::Io; // connection exception; operator intervention (shutdown)
    if (state == "40001" || state == "40P01" || state == "55P03")
        return ErrorCode::Busy; // serialization failure, deadlock, lock not available
    return ErrorCode::InvalidInput;
}

// The options libpq reads from `options` but the password, as "key='value'" pairs.
QString pairsWithoutPassword(const PQconninfoOption *options)
{
    QStringList pairs;
    for (const PQconninfoOption *o = options; o->keyword; ++o) {
        if (!o->val || qstrcmp(o->keyword, "password") == 0)
            continue;
        QString value = QString::fromUtf8(o->val);
        value.replace(QLatin1String("\\"), QLatin1String("\\\\"));
        value.replace(QLatin1String("'"), QLatin1String("\\'"));
        pairs << QStringLiteral("%1='%2'").arg(QLatin1String(o->keyword), value);
    }
    return pairs.join(QLatin1Char(' '));
}

// The password remembered in this session for the server of `conninfo`, when the string names
// no password of its own.
std::optional<QByteArray> sessionPassword(const QByteArray &conninfo)
{
    PQconninfoOption *options = PQconninfoParse(conninfo.constData(), nullptr);
    if (!options)
        return std::nullopt; // connecting fails with libpq's reason
    bool named = false;
    for (const PQconninfoOption *o = options; o->keyword; ++o)
        if (qstrcmp(o->keyword, "password") == 0 && o->val)
            named = true;
    const QString server = pairsWithoutPassword(options);
    PQconninfoFree(options);
    if (named)
        return std::nullopt;
    return TeamCredentials::rememberedPassword(server);
}

} // namespace

void ServerResult::Free::operator()(pg_result *r) const
{
    PQclear(r);
}

int ServerResult::rows() const
{
    return PQntuples(m_result.get());
}

int ServerResult::columns() const
{
    return PQnfields(m_result.get());
}

bool ServerResult::isNull(int row, int column) const
{
    return PQgetisnull(m_result.get(), row, column) != 0;
}

QString ServerResult::text(int row, int column) const
{
    return QString::fromUtf8(
        PQgetvalue(m_result.get(), row, column), PQgetlength(m_result.get(), row, column));
}

QByteArray ServerResult::bytes(int row, int column) const
{
    return QByteArray(
        PQgetvalue(m_result.get(), row, column), PQgetlength(m_result.get(), row, column));
}

qint64 ServerResult::integer(int row, int column) const
{
    return bytes(row, column).toLongLong();
}

void ServerConnection::Free::operator()(pg_conn *c) const
{
    PQfinish(c);
}

ServerConnection::ServerConnection(pg_conn *conn)
    : m_conn(conn)
{ }

Result<ServerConnection> ServerConnection::open(const QString &conninfo)
{
    const QByteArray info = conninfo.toUtf8();
    // A remembered password goes to libpq as one more keyword after the string's own (which it
    // expands from "dbname"), never into a string that could be recorded or logged.
    const std::optional<QByteArray> password = sessionPassword(info);
    const char *keywords[] = {"dbname", "password", nullptr};
    const char *values[] = {info.constData(), password ? password->constData() : nullptr, nullptr};
    PGconn *raw = password ? PQconnectdbParams(keywords, values, 1) : PQconnectdb(info.constData());
    if (!raw)
        return fail(ErrorCode::Internal,
            ServerConnectionText::tr("Out of memory while connecting to the server."));
    ServerConnection conn(raw);
    if (PQstatus(raw) != CONNECTION_OK) {
        const QString cause = serverText(PQerrorMessage(raw));
        // libpq has no SQLSTATE for a refused login; its message says so.
        const bool refused = cause.contains(QLatin1String("authentication failed"))
            || cause.contains(QLatin1String("password")) || cause.contains(QLatin1String("role"));
        return fail(refused ? ErrorCode::NotAllowed : ErrorCode::Io,
            refused
                ? ServerConnectionText::tr("The server refused the login %1.").arg(conn.describe())
                : ServerConnectionText::tr("Could not connect to the server %1.")
                      .arg(conn.describe()),
            cause);
    }
    // Every text this program sends and reads is UTF-8; times are text, so the zone is moot.
    if (PQsetClientEncoding(raw, "UTF8") != 0)
        return fail(ErrorCode::Io,
            ServerConnectionText::tr("The server %1 cannot speak UTF-8.").arg(conn.describe()),
            serverText(PQerrorMessage(raw)));
    return conn;
}

Result<QString> ServerConnection::withoutPassword(const QString &conninfo)
{
    char *error = nullptr;
    const QByteArray info = conninfo.toUtf8();
    PQconninfoOption *options = PQconninfoParse(info.constData(), &error);
    if (!options) {
        const QString cause = serverText(error);
        PQfreemem(error);
        return fail(ErrorCode::InvalidArgument,
            ServerConnectionText::tr("\"%1\" is not a PostgreSQL connection string.").arg(conninfo),
            cause);
    }
    const QString pairs = pairsWithoutPassword(options);
    PQconninfoFree(options);
    return pairs;
}

Status ServerConnection::exec(const QString &sql)
{
    auto r = query(sql);
    if (!r)
        return std::unexpected(r.error());
    return {};
}

Result<ServerResult> ServerConnection::query(const QString &sql, const QList<QByteArray> &params)
{
    const QByteArray text = sql.toUtf8();
    std::vector<const char *> values;
    values.reserve(size_t(params.size()));
    for (const QByteArray &p : params)
        values.push_back(p.isNull() ? nullptr : p.constData());
    PGresult *raw = params.isEmpty()
        ? PQexec(m_conn.get(), text.constData())
        : PQexecParams(m_conn.get(), text.constData(), int(params.size()), nullptr, values.data(),
            nullptr, nullptr, 0);
    ServerResult result;
    result.m_result.reset(raw);
    const ExecStatusType status = raw ? PQresultStatus(raw) : PGRES_FATAL_ERROR;
    if (status == PGRES_COMMAND_OK || status == PGRES_TUPLES_OK)
        return result;
    const QByteArray state = raw ? QByteArray(PQresultErrorField(raw, PG_DIAG_SQLSTATE)) : "08006";
    const QString cause =
        serverText(raw ? PQresultErrorMessage(raw) : PQerrorMessage(m_conn.get()));
    const ErrorCode code =
        PQstatus(m_conn.get()) != CONNECTION_OK ? ErrorCode::Io : codeForState(state);
    QString message;
    switch (code) {
    case ErrorCode::NotAllowed:
        message = ServerConnectionText::tr("The server %1 does not allow this for the role %2.")
                      .arg(describe(), user());
        break;
    case ErrorCode::Constraint:
        message = ServerConnectionText::tr(
            "The server %1 refused a row that breaks a rule of the team project.")
                      .arg(describe());
        break;
    case ErrorCode::Io:
        message =
            ServerConnectionText::tr("The connection to the server %1 was lost.").arg(describe());
        break;
    default:
        message =
            ServerConnectionText::tr("The server %1 could not run a statement.").arg(describe());
    }
    return fail(code, message, cause);
}

Status ServerConnection::run(const QString &sql, const QList<QByteArray> &params)
{
    auto r = query(sql, params);
    if (!r)
        return std::unexpected(r.error());
    return {};
}

QString ServerConnection::quotedIdentifier(const QString &name) const
{
    const QByteArray utf8 = name.toUtf8();
    char *quoted = PQescapeIdentifier(m_conn.get(), utf8.constData(), size_t(utf8.size()));
    const QString out = QString::fromUtf8(quoted ? quoted : "");
    PQfreemem(quoted);
    return out;
}

QString ServerConnection::quotedLiteral(const QString &value) const
{
    const QByteArray utf8 = value.toUtf8();
    char *quoted = PQescapeLiteral(m_conn.get(), utf8.constData(), size_t(utf8.size()));
    const QString out = QString::fromUtf8(quoted ? quoted : "");
    PQfreemem(quoted);
    return out;
}

Result<QString> ServerConnection::passwordVerifier(
    const QString &role, const QString &password) const
{
    const QByteArray pw = password.toUtf8();
    const QByteArray user = role.toUtf8();
    char *verifier =
        PQencryptPasswordConn(m_conn.get(), pw.constData(), user.constData(), "scram-sha-256");
    if (!verifier)
        return fail(ErrorCode::Internal,
            ServerConnectionText::tr("Could not make a SCRAM verifier for the role %1.").arg(role),
            serverText(PQerrorMessage(m_conn.get())));
    const QString out = QString::fromUtf8(verifier);
    PQfreemem(verifier);
    return out;
}

QString ServerConnection::host() const
{
    return serverText(PQhost(m_conn.get()));
}

QString ServerConnection::port() const
{
    return serverText(PQport(m_conn.get()));
}

QString ServerConnection::database() const
{
    return serverText(PQdb(m_conn.get()));
}

QString ServerConnection::user() const
{
    return serverText(PQuser(m_conn.get()));
}

QString ServerConnection::describe() const
{
    return QStringLiteral("%1@%2:%3/%4").arg(user(), host(), port(), database());
}

int ServerConnection::socket() const
{
    return PQsocket(m_conn.get());
}

Result<QStringList> ServerConnection::notifications()
{
    if (PQconsumeInput(m_conn.get()) == 0 || PQstatus(m_conn.get()) != CONNECTION_OK)
        return fail(ErrorCode::Io,
            ServerConnectionText::tr("The connection to the server %1 was lost.").arg(describe()),
            serverText(PQerrorMessage(m_conn.get())));
    QStringList channels;
    while (PGnotify *n = PQnotifies(m_conn.get())) {
        channels << QString::fromUtf8(n->relname);
        PQfreemem(n);
    }
    return channels;
}

} // namespace fourfold
