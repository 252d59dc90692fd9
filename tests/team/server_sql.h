#pragma once
// Plain SQL on a team project's server through libpq, as a person with psql would send it: the
// tests' independent view of what a role may read and write (nothing of core/team is used).

#include <QString>
#include <QStringList>

#include <catch2/catch.hpp>
#include <libpq-fe.h>

#include <memory>

namespace fourfold::test {

class ServerSql
{
public:
    explicit ServerSql(const QString &conninfo)
        : m_conn(PQconnectdb(conninfo.toUtf8().constData()), &PQfinish)
    {
        INFO(conninfo.toStdString() << ": " << PQerrorMessage(m_conn.get()));
        REQUIRE(PQstatus(m_conn.get()) == CONNECTION_OK);
    }

    // The rows of `sql`, each row's columns joined by '|'; fails the test on an error.
    QStringList rows(const QString &sql)
    {
        std::unique_ptr<PGresult, decltype(&PQclear)> r(
            PQexec(m_conn.get(), sql.toUtf8().constData()), &PQclear);
        INFO(sql.toStdString() << ": " << PQresultErrorMessage(r.get()));
        REQUIRE(PQresultStatus(r.get()) == PGRES_TUPLES_OK);
        QStringList out;
        for (int i = 0; i < PQntuples(r.get()); ++i) {
            QStringList cols;
            for (int c = 0; c < PQnfields(r.get()); ++c)
                cols << QString::fromUtf8(PQgetvalue(r.get(), i, c));
            out << cols.join(QLatin1Char('|'));
        }
        return out;
    }

    // The single value of `sql`.
    QString value(const QString &sql)
    {
        const QStringList r = rows(sql);
        REQUIRE(r.size() == 1);
        return r.first();
    }

    // Runs `sql`; returns "" on success with the number of rows it changed in `changed`, else
    // the SQLSTATE of the refusal.
    QString attempt(const QString &sql, long *changed = nullptr)
    {
        std::unique_ptr<PGresult, decltype(&PQclear)> r(
            PQexec(m_conn.get(), sql.toUtf8().constData()), &PQclear);
        const ExecStatusType status = PQresultStatus(r.get());
        if (status == PGRES_COMMAND_OK || status == PGRES_TUPLES_OK) {
            if (changed)
                *changed = QByteArray(PQcmdTuples(r.get())).toLong();
            return {};
        }
        const char *state = PQresultErrorField(r.get(), PG_DIAG_SQLSTATE);
        m_lastError = QString::fromUtf8(PQresultErrorMessage(r.get()));
        return QString::fromLatin1(state ? state : "?????");
    }

    QString lastError() const { return m_lastError; }

private:
    std::unique_ptr<PGconn, decltype(&PQfinish)> m_conn;
    QString m_lastError;
};

} // namespace fourfold::test
