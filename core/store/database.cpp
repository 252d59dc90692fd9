#include "core/store/database.h"

#include "core/store/statement.h"

#include <QCoreApplication>
#include <QFile>
#include <QFileInfo>
#include <QUrl>

#include <sqlite3.h>
#include <unistd.h>

#include <cerrno>
#include <cstring>

namespace fourfold {

namespace {

// Enough for every query of the program's busiest path; more are compiled for each use.
constexpr qsizetype kMaxIdleStatements = 128;

Database::OpenFaultHook &openFaultHook()
{
    static Database::OpenFaultHook hook;
    return hook;
}

// The failure of one of open()'s own statements, injected by the test hook or SQLite's.
int openFault(const char *stage)
{
    const auto &hook = openFaultHook();
    return hook ? hook(QLatin1String(stage)) : SQLITE_OK;
}

// A full disk is said as such wherever it happens: it is neither damage nor a bug, and the
// person can do something about it.
QString diskFullMessage(const QString &path)
{
    return QCoreApplication::translate("Database",
        "The disk holding %1 is full; nothing was written. Free some space and try again.")
        .arg(path);
}

bool isDiskFull(int rc)
{
    return (rc & 0xff) == SQLITE_FULL;
}

} // namespace

void Database::setOpenFaultHook(OpenFaultHook hook)
{
    openFaultHook() = std::move(hook);
}

ErrorCode errorCodeForSqlite(int rc)
{
    switch (rc & 0xff) {
    case SQLITE_BUSY:
    case SQLITE_LOCKED:
        return ErrorCode::Busy;
    case SQLITE_CONSTRAINT:
        return ErrorCode::Constraint;
    case SQLITE_CORRUPT:
    case SQLITE_NOTADB:
        return ErrorCode::Corrupt;
    case SQLITE_CANTOPEN:
    case SQLITE_IOERR:
    case SQLITE_FULL:
    case SQLITE_READONLY:
    case SQLITE_PERM:
        return ErrorCode::Io;
    default:
        return ErrorCode::Internal;
    }
}

Database::~Database()
{
    close();
}

Database::Database(Database &&other) noexcept
    : m_db(std::exchange(other.m_db, nullptr))
    , m_path(std::move(other.m_path))
    , m_faultHook(std::move(other.m_faultHook))
    , m_statementsRun(other.m_statementsRun)
    , m_statementsPrepared(other.m_statementsPrepared)
    , m_idle(std::exchange(other.m_idle, {}))
{ }

Database &Database::operator=(Database &&other) noexcept
{
    if (this != &other) {
        close();
        m_db = std::exchange(other.m_db, nullptr);
        m_path = std::move(other.m_path);
        m_faultHook = std::move(other.m_faultHook);
        m_statementsRun = other.m_statementsRun;
        m_statementsPrepared = other.m_statementsPrepared;
        m_idle = std::exchange(other.m_idle, {});
    }
    return *this;
}

void Database::close()
{
    for (sqlite3_stmt *stmt : std::as_const(m_idle))
        sqlite3_finalize(stmt);
    m_idle.clear();
    if (m_db) {
        sqlite3_close_v2(m_db);
        m_db = nullptr;
    }
}

Result<Database> Database::open(const QString &path, OpenMode mode)
{
    int flags = SQLITE_OPEN_NOMUTEX;
    switch (mode) {
    case OpenMode::ReadOnly:
        flags |= SQLITE_OPEN_READONLY;
        break;
    case OpenMode::ReadWrite:
        flags |= SQLITE_OPEN_READWRITE;
        break;
    case OpenMode::ReadWriteCreate:
        flags |= SQLITE_OPEN_READWRITE | SQLITE_OPEN_CREATE;
        break;
    }
    // A file this call creates goes again if opening fails (a full disk must not leave an empty
    // project file behind).
    const bool creates = mode == OpenMode::ReadWriteCreate && !QFileInfo(path).isSymLink()
        && !QFileInfo::exists(path);
    // SQLite would open a file it may not write read-only and fail later with a cause that
    // names no reason; a command that writes says so at once.
    if (mode == OpenMode::ReadWrite && QFileInfo::exists(path)
        && ::access(QFile::encodeName(path).constData(), W_OK) != 0)
        return fail(ErrorCode::Io,
            QCoreApplication::translate("Database",
                "%1 is read-only (the file, or the disk it is on); this command writes to it.")
                .arg(path),
            QString::fromLocal8Bit(std::strerror(errno)));
    Database db;
    db.m_path = path;
    const auto failed = [&](Error e) -> Result<Database> {
        if (e.code == ErrorCode::Internal)
            e.code = ErrorCode::Io;
        db.close();
        if (creates)
            for (const char *suffix : {"", "-wal", "-shm", "-journal"})
                QFile::remove(path + QLatin1String(suffix));
        return std::unexpected(std::move(e));
    };
    const int rc = sqlite3_open_v2(path.toUtf8().constData(), &db.m_db, flags, nullptr);
    if (rc != SQLITE_OK)
        return failed(db.errorFor(rc,
            QCoreApplication::translate("Database", "Cannot open the project file %1.").arg(path)));
    sqlite3_extended_result_codes(db.m_db, 1);
    sqlite3_busy_timeout(db.m_db, 5000);
    // Reading the schema is the first touch of the file: a non-database fails here. Only that
    // (or damage) is called damage; a full disk, a lock or a read error is said as what it is.
    const auto touch = [&]() -> Status {
        if (const int fault = openFault("read"))
            return std::unexpected(db.errorFor(fault, QString()));
        return db.exec(
            QStringLiteral("PRAGMA foreign_keys = ON; SELECT count(*) FROM sqlite_schema;"));
    };
    Status touched = touch();
    if (!touched && mode == OpenMode::ReadOnly
        && (sqlite3_errcode(db.m_db) & 0xff) == SQLITE_CANTOPEN) {
        // A project (in WAL mode) in a folder nobody may write: SQLite cannot make the shared
        // memory file a reader needs. Nobody can write the file there either, so it is read as
        // immutable (https://www.sqlite.org/wal.html#readonly).
        db.close();
        const QByteArray uri = QUrl::fromLocalFile(path).toEncoded() + "?immutable=1";
        const int again =
            sqlite3_open_v2(uri.constData(), &db.m_db, flags | SQLITE_OPEN_URI, nullptr);
        if (again != SQLITE_OK)
            return failed(db.errorFor(again,
                QCoreApplication::translate("Database", "Cannot open the project file %1.")
                    .arg(path)));
        sqlite3_extended_result_codes(db.m_db, 1);
        touched = touch();
    }
    if (!touched) {
        Error e = touched.error();
        switch (e.code) {
        case ErrorCode::Busy:
            e.message = QCoreApplication::translate(
                "Database", "%1 is locked by another program; try again when it is done.")
                            .arg(path);
            break;
        case ErrorCode::Io:
            if (!e.message.contains(path))
                e.message = QCoreApplication::translate("Database", "%1 could not be read: %2.")
                                .arg(path, e.cause);
            break;
        default:
            e.code = ErrorCode::Corrupt;
            e.message = QCoreApplication::translate(
                "Database", "%1 is not a Fourfold project file or is damaged.")
                            .arg(path);
            break;
        }
        return failed(std::move(e));
    }
    if (mode != OpenMode::ReadOnly) {
        Status journal = [&]() -> Status {
            if (const int fault = openFault("journal"))
                return std::unexpected(db.errorFor(fault, QString()));
            return db.exec(QStringLiteral("PRAGMA journal_mode = WAL; PRAGMA synchronous = "
                                          "NORMAL; PRAGMA cache_size = -65536;"));
        }();
        if (!journal) {
            Error e = journal.error();
            if (e.message != diskFullMessage(path))
                e.message = QCoreApplication::translate(
                    "Database", "The project file %1 could not be prepared for writing.")
                                .arg(path);
            return failed(std::move(e));
        }
    }
    return db;
}

bool Database::isReadOnly() const
{
    return m_db && sqlite3_db_readonly(m_db, "main") == 1;
}

Status Database::exec(const QString &sql)
{
    char *message = nullptr;
    const int rc = sqlite3_exec(m_db, sql.toUtf8().constData(), nullptr, nullptr, &message);
    if (rc != SQLITE_OK) {
        Error e;
        e.code = errorCodeForSqlite(rc);
        e.message = isDiskFull(rc)
            ? diskFullMessage(m_path)
            : QCoreApplication::translate("Database", "The project file could not be updated.");
        e.cause = QString::fromUtf8(message ? message : sqlite3_errstr(rc));
        sqlite3_free(message);
        return std::unexpected(e);
    }
    return {};
}

Result<Statement> Database::prepare(const QString &sql) const
{
    if (sqlite3_stmt *idle = m_idle.take(sql))
        return Statement(this, idle, sql);
    sqlite3_stmt *stmt = nullptr;
    const QByteArray utf8 = sql.toUtf8();
    const int rc = sqlite3_prepare_v3(
        m_db, utf8.constData(), int(utf8.size()), SQLITE_PREPARE_PERSISTENT, &stmt, nullptr);
    if (rc != SQLITE_OK)
        return std::unexpected(errorFor(
            rc, QCoreApplication::translate("Database", "A query could not be prepared.")));
    ++m_statementsPrepared;
    return Statement(this, stmt, sql);
}

void Database::recycle(const QString &sql, sqlite3_stmt *stmt) const
{
    sqlite3_reset(stmt);
    sqlite3_clear_bindings(stmt);
    if (!m_db || m_idle.size() >= kMaxIdleStatements || m_idle.contains(sql)) {
        sqlite3_finalize(stmt);
        return;
    }
    m_idle.insert(sql, stmt);
}

void Database::setBusyTimeout(int milliseconds)
{
    sqlite3_busy_timeout(m_db, milliseconds);
}

qint64 Database::lastInsertRowId() const
{
    return sqlite3_last_insert_rowid(m_db);
}

qint64 Database::changes() const
{
    return sqlite3_changes64(m_db);
}

Error Database::errorFor(int rc, const QString &what) const
{
    Error e;
    e.code = errorCodeForSqlite(rc);
    e.message = isDiskFull(rc) ? diskFullMessage(m_path) : what;
    e.cause =
        m_db ? QString::fromUtf8(sqlite3_errmsg(m_db)) : QString::fromUtf8(sqlite3_errstr(rc));
    if (e.cause == QLatin1String("not an error"))
        e.cause = QString::fromUtf8(sqlite3_errstr(rc));
    return e;
}

} // namespace fourfold
