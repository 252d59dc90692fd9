#include "core/team/team_credentials.h"

#include "core/team/server_store_connection.h"
#include "core/team/server_store_roles.h"

#include <QHash>
#include <QMutex>
#include <QStringList>

namespace fourfold {

namespace {

// The passwords of this session, by server; reached from the GUI and from sync threads.
struct Remembered {
    QMutex mutex;
    QHash<QString, QByteArray> passwords;
};

Remembered &remembered()
{
    static Remembered r;
    return r;
}

// A conninfo value in single quotes (libpq: backslash escapes ' and \).
QString quoted(QString value)
{
    value.replace(QLatin1String("\\"), QLatin1String("\\\\"));
    value.replace(QLatin1String("'"), QLatin1String("\\'"));
    return QLatin1Char('\'') + value + QLatin1Char('\'');
}

// Overwrites a password before its memory goes back to the allocator.
void wipe(QByteArray &password)
{
    password.fill('\0');
    password.clear();
}

} // namespace

QString TeamCredentials::loginRole(const QString &database, const QString &pseudonym)
{
    return personRole(database, pseudonym);
}

QString TeamCredentials::connectionString(
    const QString &host, const QString &port, const QString &database, const QString &role)
{
    QStringList pairs;
    for (const auto &[key, value] : {std::pair {"host", host}, std::pair {"port", port},
             std::pair {"dbname", database}, std::pair {"user", role}})
        if (!value.trimmed().isEmpty())
            pairs << QLatin1String(key) + QLatin1Char('=') + quoted(value.trimmed());
    return pairs.join(QLatin1Char(' '));
}

Status TeamCredentials::rememberPassword(const QString &server, const QString &password)
{
    auto key = ServerConnection::withoutPassword(server);
    if (!key)
        return std::unexpected(key.error());
    if (password.isEmpty()) {
        forgetPassword(*key);
        return {};
    }
    Remembered &r = remembered();
    const QMutexLocker lock(&r.mutex);
    auto it = r.passwords.find(*key);
    if (it != r.passwords.end())
        wipe(*it);
    r.passwords.insert(*key, password.toUtf8());
    return {};
}

void TeamCredentials::forgetPassword(const QString &server)
{
    const QString key = ServerConnection::withoutPassword(server).value_or(server);
    Remembered &r = remembered();
    const QMutexLocker lock(&r.mutex);
    auto it = r.passwords.find(key);
    if (it == r.passwords.end())
        return;
    wipe(*it);
    r.passwords.erase(it);
}

std::optional<QByteArray> TeamCredentials::rememberedPassword(const QString &recordedServer)
{
    Remembered &r = remembered();
    const QMutexLocker lock(&r.mutex);
    const auto it = r.passwords.constFind(recordedServer);
    if (it == r.passwords.constEnd())
        return std::nullopt;
    return *it;
}

bool TeamCredentials::isMissingPassword(const Error &error)
{
    // libpq-fe.h: #define PQnoPasswordSupplied "fe_sendauth: no password supplied\n"
    return error.code == ErrorCode::NotAllowed
        && error.cause.contains(QLatin1String("no password supplied"));
}

} // namespace fourfold
