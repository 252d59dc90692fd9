#pragma once
// One thin, RAII layer over SQLite's C API: a connection with Fourfold's pragmas, errors as
// values with distinct codes for busy, constraint and corrupt, and plain SQL execution.
// Values always go through Statement's bound parameters, never into SQL text.

#include "core/model/error.h"

#include <QHash>
#include <QString>

#include <functional>
#include <memory>

struct sqlite3;
struct sqlite3_stmt;

namespace fourfold {

class Statement;

class Database
{
public:
    enum class OpenMode { ReadWrite, ReadWriteCreate, ReadOnly };

    Database() = default;
    ~Database();
    Database(Database &&other) noexcept;
    Database &operator=(Database &&other) noexcept;
    Database(const Database &) = delete;
    Database &operator=(const Database &) = delete;

    // Opens `path` and sets foreign_keys=ON, a 5 s busy timeout and (unless read-only) WAL mode.
    // Fails with Io if the file cannot be opened, read or created (a full disk is said as such:
    // "The disk holding … is full"), Busy if another program holds it, Corrupt only if it is not
    // an SQLite file or is damaged. A file this call created is removed again when it fails.
    static Result<Database> open(const QString &path, OpenMode mode);

    // A test hook for fault injection in open(): called with "read" before the first read of the
    // file and "journal" before the pragmas that set up writing; a non-zero SQLite result code
    // makes that stage fail with it. Process-wide; empty in production.
    using OpenFaultHook = std::function<int(const QString &stage)>;
    static void setOpenFaultHook(OpenFaultHook hook);

    bool isOpen() const { return m_db != nullptr; }
    // True for a connection that may not write (opened ReadOnly, or SQLite found the file
    // read-only).
    bool isReadOnly() const;
    QString path() const { return m_path; }
    sqlite3 *handle() const { return m_db; }

    // Runs one or more SQL statements without parameters (schema, pragmas). Fails with the
    // mapped error code and SQLite's message as the cause.
    Status exec(const QString &sql);

    // How long a write waits for another connection's write lock before it fails with Busy
    // (5,000 ms after open()).
    void setBusyTimeout(int milliseconds);

    // Compiles one statement, or takes the one compiled before for the same `sql` that is not
    // in use: a finished Statement goes back to the connection (reset, bindings cleared), so a
    // query run once per row is compiled once per connection. Fails with the mapped error code.
    Result<Statement> prepare(const QString &sql) const;

    // The rowid of the last successful INSERT on this connection.
    qint64 lastInsertRowId() const;
    // Rows changed by the last INSERT/UPDATE/DELETE.
    qint64 changes() const;

    // The error for SQLite result code `rc` with the connection's current message as the cause;
    // `what` is the sentence shown to people (for SQLITE_FULL: that the disk is full).
    Error errorFor(int rc, const QString &what) const;

    // A test hook for fault injection: called before every Statement::step(); returning a
    // non-zero SQLite result code makes that step fail with it. Empty in production.
    using FaultHook = std::function<int()>;
    void setFaultHook(FaultHook hook) { m_faultHook = std::move(hook); }
    const FaultHook &faultHook() const { return m_faultHook; }

    // How many statement runs this connection has started (a run: the first step after
    // preparing, a reset or the end of the rows). Tests count queries with it: a view that loads
    // in a bounded number of queries keeps this figure independent of the project's size.
    qint64 statementsRun() const { return m_statementsRun; }
    void countStatementRun() const { ++m_statementsRun; }
    // How many result rows this connection has stepped to. A view that reads one article's rows
    // keeps this figure independent of the project's size, where statementsRun() cannot tell
    // an indexed query from a scan of a whole table.
    qint64 rowsRead() const { return m_rowsRead; }
    // How many statements this connection has compiled (prepare() calls that found no finished
    // statement of the same SQL to reuse). Tests check that an import compiles a fixed number
    // whatever the number of its rows.
    qint64 statementsPrepared() const { return m_statementsPrepared; }

private:
    friend class Statement;
    void close();
    // Takes back a finished statement of `sql` for reuse (Statement's destructor).
    void recycle(const QString &sql, sqlite3_stmt *stmt) const;

    sqlite3 *m_db = nullptr;
    QString m_path;
    FaultHook m_faultHook;
    mutable qint64 m_statementsRun = 0;
    mutable qint64 m_rowsRead = 0;
    mutable qint64 m_statementsPrepared = 0;
    // Finished statements by their SQL, at most one per text and kMaxIdleStatements in all.
    mutable QHash<QString, sqlite3_stmt *> m_idle;
};

// Maps an SQLite primary result code to Fourfold's error code.
ErrorCode errorCodeForSqlite(int rc);

} // namespace fourfold
