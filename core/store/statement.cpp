#include "core/store/statement.h"

#include "core/store/database.h"

#include <QCoreApplication>

#include <sqlite3.h>

#include <utility>

namespace fourfold {

Statement::Statement(const Database *db, sqlite3_stmt *stmt, QString sql)
    : m_db(db)
    , m_stmt(stmt)
    , m_sql(std::move(sql))
{ }

Statement::~Statement()
{
    release();
}

Statement::Statement(Statement &&other) noexcept
    : m_db(other.m_db)
    , m_stmt(std::exchange(other.m_stmt, nullptr))
    , m_sql(std::move(other.m_sql))
{ }

Statement &Statement::operator=(Statement &&other) noexcept
{
    if (this != &other) {
        release();
        m_db = other.m_db;
        m_stmt = std::exchange(other.m_stmt, nullptr);
        m_sql = std::move(other.m_sql);
    }
    return *this;
}

void Statement::release()
{
    if (!m_stmt)
        return;
    if (m_db && !m_sql.isEmpty())
        m_db->recycle(m_sql, std::exchange(m_stmt, nullptr));
    else
        sqlite3_finalize(std::exchange(m_stmt, nullptr));
}

Statement &Statement::bind(int index, qint64 value)
{
    sqlite3_bind_int64(m_stmt, index, value);
    return *this;
}

Statement &Statement::bind(int index, double value)
{
    sqlite3_bind_double(m_stmt, index, value);
    return *this;
}

Statement &Statement::bind(int index, const QString &value)
{
    const QByteArray utf8 = value.toUtf8();
    sqlite3_bind_text64(m_stmt, index, utf8.constData(), sqlite3_uint64(utf8.size()),
        SQLITE_TRANSIENT, SQLITE_UTF8);
    return *this;
}

Statement &Statement::bind(int index, const QByteArray &value)
{
    sqlite3_bind_blob64(
        m_stmt, index, value.constData(), sqlite3_uint64(value.size()), SQLITE_TRANSIENT);
    return *this;
}

Statement &Statement::bind(int index, const std::optional<double> &value)
{
    return value ? bind(index, *value) : bindNull(index);
}

Statement &Statement::bindNull(int index)
{
    sqlite3_bind_null(m_stmt, index);
    return *this;
}

Result<bool> Statement::step()
{
    int rc = SQLITE_OK;
    if (!sqlite3_stmt_busy(m_stmt))
        m_db->countStatementRun();
    if (m_db->faultHook())
        rc = m_db->faultHook()();
    if (rc == SQLITE_OK)
        rc = sqlite3_step(m_stmt);
    if (rc == SQLITE_ROW) {
        ++m_db->m_rowsRead;
        return true;
    }
    if (rc == SQLITE_DONE)
        return false;
    Error e = m_db->errorFor(rc,
        QCoreApplication::translate("Database", "The project file could not be read or written."));
    sqlite3_reset(m_stmt);
    return std::unexpected(e);
}

Status Statement::run()
{
    auto r = step();
    sqlite3_reset(m_stmt);
    if (!r)
        return std::unexpected(r.error());
    return {};
}

void Statement::reset()
{
    sqlite3_reset(m_stmt);
}

qint64 Statement::columnInt(int index) const
{
    return sqlite3_column_int64(m_stmt, index);
}

double Statement::columnDouble(int index) const
{
    return sqlite3_column_double(m_stmt, index);
}

bool Statement::columnIsNull(int index) const
{
    return sqlite3_column_type(m_stmt, index) == SQLITE_NULL;
}

QString Statement::columnText(int index) const
{
    const auto *text = reinterpret_cast<const char *>(sqlite3_column_text(m_stmt, index));
    return QString::fromUtf8(text, sqlite3_column_bytes(m_stmt, index));
}

QByteArrayView Statement::columnUtf8(int index) const
{
    const auto *text = reinterpret_cast<const char *>(sqlite3_column_text(m_stmt, index));
    return QByteArrayView(text, sqlite3_column_bytes(m_stmt, index));
}

QByteArray Statement::columnBlob(int index) const
{
    const auto *data = static_cast<const char *>(sqlite3_column_blob(m_stmt, index));
    return QByteArray(data, sqlite3_column_bytes(m_stmt, index));
}

std::optional<double> Statement::columnOptionalDouble(int index) const
{
    if (columnIsNull(index))
        return std::nullopt;
    return columnDouble(index);
}

} // namespace fourfold
