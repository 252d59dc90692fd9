#pragma once
// A prepared SQLite statement (RAII) with bound parameters; parameters are 1-based as in SQLite.

#include "core/model/error.h"

#include <QByteArray>
#include <QString>

#include <optional>

struct sqlite3_stmt;

namespace fourfold {

class Database;

class Statement
{
public:
    // Owns `stmt`; when `sql` is given, hands it back to `db` for reuse when destroyed.
    Statement(const Database *db, sqlite3_stmt *stmt, QString sql = {});
    ~Statement();
    Statement(Statement &&other) noexcept;
    Statement &operator=(Statement &&other) noexcept;
    Statement(const Statement &) = delete;
    Statement &operator=(const Statement &) = delete;

    Statement &bind(int index, qint64 value);
    Statement &bind(int index, int value) { return bind(index, qint64(value)); }
    Statement &bind(int index, double value);
    Statement &bind(int index, const QString &value); // TEXT, UTF-8
    Statement &bind(int index, const QByteArray &value); // BLOB
    Statement &bind(int index, const std::optional<double> &value);
    Statement &bindNull(int index);

    // Advances to the next row: true if a row is there, false when done; an error otherwise.
    Result<bool> step();
    // Runs a statement that returns no rows (INSERT/UPDATE/DELETE), then resets it.
    Status run();
    // Resets for another run with new bindings (bindings are kept until rebound).
    void reset();

    qint64 columnInt(int index) const;
    double columnDouble(int index) const;
    bool columnIsNull(int index) const;
    QString columnText(int index) const;
    // The column's UTF-8 bytes without a copy: valid until the next step, reset or column call
    // of another type on this column.
    QByteArrayView columnUtf8(int index) const;
    QByteArray columnBlob(int index) const;
    std::optional<double> columnOptionalDouble(int index) const;

private:
    // Gives the statement back to its connection for reuse, or finalizes it.
    void release();

    const Database *m_db = nullptr;
    sqlite3_stmt *m_stmt = nullptr;
    QString m_sql; // the key under which the connection keeps it for reuse; empty: finalized
};

} // namespace fourfold
