#include "tests/support/postgres_cluster.h"

#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QProcess>
#include <QUuid>

#include <arpa/inet.h>
#include <catch2/catch.hpp>
#include <libpq-fe.h>
#include <netinet/in.h>
#include <pwd.h>
#include <sys/socket.h>
#include <unistd.h>

namespace fourfold::test {

namespace {

constexpr const char *kPackages = "postgresql libpq-dev";

QString defaultBinDir()
{
    const QByteArray env = qgetenv("FOURFOLD_PG_BINDIR");
    return env.isEmpty() ? QStringLiteral("/usr/lib/postgresql/15/bin")
                         : QString::fromLocal8Bit(env);
}

// A conninfo value in single quotes (libpq: backslash escapes ' and \).
QString quoted(QString value)
{
    value.replace(QLatin1String("\\"), QLatin1String("\\\\"));
    value.replace(QLatin1String("'"), QLatin1String("\\'"));
    return QLatin1Char('\'') + value + QLatin1Char('\'');
}

// A TCP port on 127.0.0.1 that nothing listens on now (the kernel's choice for port 0), so
// several test programs' clusters can run at once.
int freePort()
{
    const int fd = socket(AF_INET, SOCK_STREAM, 0);
    REQUIRE(fd >= 0);
    sockaddr_in address {};
    address.sin_family = AF_INET;
    address.sin_addr.s_addr = htonl(INADDR_LOOPBACK);
    address.sin_port = 0;
    socklen_t length = sizeof address;
    const bool bound = bind(fd, reinterpret_cast<sockaddr *>(&address), sizeof address) == 0
        && getsockname(fd, reinterpret_cast<sockaddr *>(&address), &length) == 0;
    close(fd);
    REQUIRE(bound);
    return ntohs(address.sin_port);
}

// Runs openssl (a dependency of Debian's postgresql, through ssl-cert) with `args` in `dir`.
void openssl(const QString &dir, const QStringList &args)
{
    QProcess process;
    process.setProcessChannelMode(QProcess::MergedChannels);
    process.setWorkingDirectory(dir);
    process.start(QStringLiteral("openssl"), args);
    const bool finished = process.waitForFinished(60000);
    INFO("openssl " << args.join(QLatin1Char(' ')).toStdString() << "\n"
                    << process.readAll().toStdString()
                    << "\n(install the Debian package openssl; tools/setup-debian does)");
    REQUIRE(finished);
    REQUIRE(process.exitStatus() == QProcess::NormalExit);
    REQUIRE(process.exitCode() == 0);
}

// A certificate authority (ca.crt) and a server certificate it signed for localhost and
// 127.0.0.1 (server.crt, server.key), valid for a day, in `dir`.
void makeCertificates(const QString &dir)
{
    openssl(dir,
        {QStringLiteral("req"), QStringLiteral("-x509"), QStringLiteral("-newkey"),
            QStringLiteral("rsa:2048"), QStringLiteral("-nodes"), QStringLiteral("-keyout"),
            QStringLiteral("ca.key"), QStringLiteral("-out"), QStringLiteral("ca.crt"),
            QStringLiteral("-days"), QStringLiteral("1"), QStringLiteral("-subj"),
            QStringLiteral("/CN=Fourfold test authority")});
    openssl(dir,
        {QStringLiteral("req"), QStringLiteral("-newkey"), QStringLiteral("rsa:2048"),
            QStringLiteral("-nodes"), QStringLiteral("-keyout"), QStringLiteral("server.key"),
            QStringLiteral("-out"), QStringLiteral("server.csr"), QStringLiteral("-subj"),
            QStringLiteral("/CN=localhost")});
    QFile names(QDir(dir).filePath(QStringLiteral("names.ext")));
    REQUIRE(names.open(QIODevice::WriteOnly));
    names.write("subjectAltName=DNS:localhost,IP:127.0.0.1\n");
    names.close();
    openssl(dir,
        {QStringLiteral("x509"), QStringLiteral("-req"), QStringLiteral("-in"),
            QStringLiteral("server.csr"), QStringLiteral("-CA"), QStringLiteral("ca.crt"),
            QStringLiteral("-CAkey"), QStringLiteral("ca.key"), QStringLiteral("-CAcreateserial"),
            QStringLiteral("-out"), QStringLiteral("server.crt"), QStringLiteral("-days"),
            QStringLiteral("1"), QStringLiteral("-extfile"), QStringLiteral("names.ext")});
}

QString runuserPath()
{
    for (const char *p : {"/usr/sbin/runuser", "/sbin/runuser", "/usr/bin/runuser"})
        if (QFileInfo(QString::fromLatin1(p)).isExecutable())
            return QString::fromLatin1(p);
    return {};
}

} // namespace

PostgresCluster &PostgresCluster::shared()
{
    static std::unique_ptr<PostgresCluster> cluster;
    static QString failure;
    if (!cluster && failure.isEmpty()) {
        cluster.reset(new PostgresCluster);
        try {
            cluster->start();
        } catch (...) {
            failure = QStringLiteral("the throwaway PostgreSQL cluster did not start");
            cluster.reset();
            throw;
        }
    }
    if (!cluster)
        FAIL(failure.toStdString());
    return *cluster;
}

PostgresCluster::PostgresCluster()
    : m_binDir(defaultBinDir())
    , m_password(QUuid::createUuid().toString(QUuid::Id128))
{ }

PostgresCluster::~PostgresCluster()
{
    stop();
}

void PostgresCluster::runServerBinary(const QString &binary, const QStringList &args)
{
    QProcess process;
    process.setProcessChannelMode(QProcess::MergedChannels);
    process.setWorkingDirectory(m_dir.path());
    const QString path = QDir(m_binDir).filePath(binary);
    if (geteuid() == 0) {
        const QString runuser = runuserPath();
        INFO("runuser (util-linux) is needed to run the server as the user postgres");
        REQUIRE(!runuser.isEmpty());
        process.start(runuser,
            QStringList {
                QStringLiteral("-u"), QStringLiteral("postgres"), QStringLiteral("--"), path}
                + args);
    } else {
        process.start(path, args);
    }
    const bool finished = process.waitForFinished(60000);
    INFO(binary.toStdString() << " " << args.join(QLatin1Char(' ')).toStdString() << "\n"
                              << process.readAll().toStdString());
    REQUIRE(finished);
    REQUIRE(process.exitStatus() == QProcess::NormalExit);
    REQUIRE(process.exitCode() == 0);
}

void PostgresCluster::start()
{
    for (const char *binary : {"initdb", "pg_ctl", "postgres"}) {
        const QString path = QDir(m_binDir).filePath(QString::fromLatin1(binary));
        if (!QFileInfo(path).isExecutable())
            FAIL("The PostgreSQL server program "
                << path.toStdString() << " is missing: install the Debian packages " << kPackages
                << " (tools/setup-debian does), or set "
                   "FOURFOLD_PG_BINDIR to PostgreSQL 15's bin "
                   "folder.");
    }
    REQUIRE(m_dir.isValid());
    const QString pwfile = m_dir.filePath(QStringLiteral("pw"));
    {
        QFile f(pwfile);
        REQUIRE(f.open(QIODevice::WriteOnly));
        f.write(m_password.toUtf8() + '\n');
    }
    if (geteuid() == 0) {
        const passwd *pg = getpwnam("postgres");
        if (!pg)
            FAIL("The tests run as root, so the server must run as the user postgres, which "
                 "does not exist: install the Debian packages "
                << kPackages << " (the package creates the user).");
        for (const QString &p : {m_dir.path(), pwfile})
            REQUIRE(chown(QFile::encodeName(p).constData(), pg->pw_uid, pg->pw_gid) == 0);
    }
    // TLS on a TCP port of 127.0.0.1 beside the Unix socket: every libpq client of this
    // program (and the programs it starts) uses the port through PGPORT.
    m_port = freePort();
    qputenv("PGPORT", QByteArray::number(m_port));
    const QString tls = m_dir.filePath(QStringLiteral("tls"));
    REQUIRE(QDir().mkpath(tls));
    makeCertificates(tls);
    REQUIRE(QFile::setPermissions(QDir(tls).filePath(QStringLiteral("server.key")),
        QFileDevice::ReadOwner | QFileDevice::WriteOwner));
    if (geteuid() == 0) {
        const passwd *pg = getpwnam("postgres");
        for (const char *f : {"", "/server.key", "/server.crt"})
            REQUIRE(
                chown(QFile::encodeName(tls + QLatin1String(f)).constData(), pg->pw_uid, pg->pw_gid)
                == 0);
    }
    const QString data = m_dir.filePath(QStringLiteral("data"));
    // No fsync: a throwaway cluster needs no durability, and starts in about a second.
    runServerBinary(QStringLiteral("initdb"),
        {QStringLiteral("-D"), data, QStringLiteral("-A"), QStringLiteral("scram-sha-256"),
            QStringLiteral("--pwfile=") + pwfile, QStringLiteral("-U"), QStringLiteral("postgres"),
            QStringLiteral("-E"), QStringLiteral("UTF8"), QStringLiteral("--locale=C.UTF-8"),
            QStringLiteral("--no-sync"), QStringLiteral("--no-instructions")});
    startServer();
}

void PostgresCluster::startServer()
{
    runServerBinary(QStringLiteral("pg_ctl"),
        {QStringLiteral("-D"), m_dir.filePath(QStringLiteral("data")), QStringLiteral("-l"),
            m_dir.filePath(QStringLiteral("log")), QStringLiteral("-w"), QStringLiteral("-t"),
            QStringLiteral("60"), QStringLiteral("-o"),
            QStringLiteral("-F -k %1 -p %2 -c listen_addresses=127.0.0.1 -c ssl=on -c "
                           "ssl_cert_file=%3/server.crt -c ssl_key_file=%3/server.key")
                .arg(m_dir.path())
                .arg(m_port)
                .arg(m_dir.filePath(QStringLiteral("tls"))),
            QStringLiteral("start")});
    m_running = true;
}

void PostgresCluster::stopServer()
{
    runServerBinary(QStringLiteral("pg_ctl"),
        {QStringLiteral("-D"), m_dir.filePath(QStringLiteral("data")), QStringLiteral("-m"),
            QStringLiteral("fast"), QStringLiteral("-w"), QStringLiteral("-t"),
            QStringLiteral("60"), QStringLiteral("stop")});
    m_running = false;
}

void PostgresCluster::stop()
{
    if (!m_running)
        return;
    m_running = false;
    QProcess process;
    const QString pgctl = QDir(m_binDir).filePath(QStringLiteral("pg_ctl"));
    const QStringList args {QStringLiteral("-D"), m_dir.filePath(QStringLiteral("data")),
        QStringLiteral("-m"), QStringLiteral("immediate"), QStringLiteral("-w"),
        QStringLiteral("stop")};
    if (geteuid() == 0)
        process.start(runuserPath(),
            QStringList {
                QStringLiteral("-u"), QStringLiteral("postgres"), QStringLiteral("--"), pgctl}
                + args);
    else
        process.start(pgctl, args);
    process.waitForFinished(60000);
    // QTemporaryDir removes the folder (root may remove postgres's files).
}

QString PostgresCluster::conninfo(
    const QString &database, const QString &user, const QString &password) const
{
    return QStringLiteral("host=%1 dbname=%2 user=%3 password=%4 connect_timeout=10")
        .arg(quoted(socketDir()), quoted(database), quoted(user), quoted(password));
}

QString PostgresCluster::superuserConninfo(const QString &database) const
{
    return conninfo(database, QStringLiteral("postgres"), m_password);
}

void PostgresCluster::superuserExec(const QString &sql, const QString &database)
{
    PGconn *conn = PQconnectdb(superuserConninfo(database).toUtf8().constData());
    INFO(PQerrorMessage(conn));
    REQUIRE(PQstatus(conn) == CONNECTION_OK);
    PGresult *r = PQexec(conn, sql.toUtf8().constData());
    const ExecStatusType status = PQresultStatus(r);
    const std::string error = PQresultErrorMessage(r);
    PQclear(r);
    PQfinish(conn);
    INFO(sql.toStdString() << "\n" << error);
    REQUIRE((status == PGRES_COMMAND_OK || status == PGRES_TUPLES_OK));
}

PostgresCluster::TestDatabase PostgresCluster::newDatabase()
{
    TestDatabase db;
    ++m_databases;
    db.name = QStringLiteral("study%1").arg(m_databases);
    db.admin = db.name + QStringLiteral("_admin");
    const QString password = QUuid::createUuid().toString(QUuid::Id128);
    // Names are made here (letters and digits), the password is hex: nothing to quote.
    superuserExec(
        QStringLiteral("CREATE ROLE %1 LOGIN CREATEROLE PASSWORD '%2'").arg(db.admin, password));
    superuserExec(QStringLiteral("CREATE DATABASE %1 OWNER %2").arg(db.name, db.admin));
    db.adminConninfo = conninfo(db.name, db.admin, password);
    return db;
}

} // namespace fourfold::test
