#pragma once
// A throwaway PostgreSQL 15 cluster for tests that need a real server (team projects): initdb
// and pg_ctl in a temporary folder, listening on a Unix socket in that folder only, with SCRAM
// passwords. When the tests run as root, the server binaries run as the user "postgres" (initdb
// refuses root). One cluster serves a whole test program (shared()); each test takes a new
// database with newDatabase(). Missing server binaries fail the test with the packages to
// install: these tests are never skipped.

#include <QString>
#include <QTemporaryDir>

#include <memory>

namespace fourfold::test {

class PostgresCluster
{
public:
    // The cluster of this test program, started on first use and stopped and removed when the
    // program ends. Fails the running test (with what to install) when it cannot start.
    static PostgresCluster &shared();

    PostgresCluster(const PostgresCluster &) = delete;
    PostgresCluster &operator=(const PostgresCluster &) = delete;
    ~PostgresCluster();

    // The folder holding the server's socket (the libpq "host").
    QString socketDir() const { return m_dir.path(); }
    // The server also listens on this TCP port of 127.0.0.1 with TLS (PGPORT is set to it for
    // the Unix socket too), its certificate for localhost and 127.0.0.1 signed by the authority
    // whose certificate is caCertificate().
    int port() const { return m_port; }
    QString caCertificate() const { return m_dir.filePath(QStringLiteral("tls/ca.crt")); }
    // A libpq connection string for `user` with `password` on database `database`.
    QString conninfo(const QString &database, const QString &user, const QString &password) const;
    QString superuserConninfo(const QString &database = QStringLiteral("postgres")) const;

    // A new, empty database owned by a new administrator login (LOGIN CREATEROLE, not a
    // superuser) as a lead's institution would set it up (see README "Team projects").
    struct TestDatabase {
        QString name;
        QString admin; // the owning login role
        QString adminConninfo; // with the admin's password
    };
    TestDatabase newDatabase();

    // Stops the server as an administrator's restart would (pg_ctl stop -m fast: open
    // connections are cut, running transactions roll back) and starts it again on the same
    // data; for tests of a server that goes away in the middle of a sync.
    void stopServer();
    void startServer();

    // Runs `sql` as the superuser on `database`; fails the test on error.
    void superuserExec(const QString &sql, const QString &database = QStringLiteral("postgres"));

private:
    PostgresCluster();
    void start();
    void stop();
    // Runs a server binary (as "postgres" when this process is root); fails the test when it
    // does not exit with 0.
    void runServerBinary(const QString &binary, const QStringList &args);

    QTemporaryDir m_dir;
    QString m_binDir;
    QString m_password;
    bool m_running = false;
    int m_databases = 0;
    int m_port = 0;
};

} // namespace fourfold::test
