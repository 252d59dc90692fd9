#include "core/store/savepoint.h"

#include "core/store/database.h"

#include <sqlite3.h>

#include <utility>

namespace fourfold {

Result<Savepoint> Savepoint::begin(Database &db)
{
    // Outside a transaction, the outermost savepoint takes the write lock at once: a SAVEPOINT
    // would start a deferred transaction that fails with "database is locked" at its first write
    // when another process writes, without waiting for the busy timeout. BEGIN IMMEDIATE waits.
    const bool outermost = sqlite3_get_autocommit(db.handle()) != 0;
    if (auto st = db.exec(outermost ? QStringLiteral("BEGIN IMMEDIATE")
                                    : QStringLiteral("SAVEPOINT fourfold_edit"));
        !st)
        return std::unexpected(st.error());
    Savepoint sp(&db);
    sp.m_outermost = outermost;
    return sp;
}

Savepoint::~Savepoint()
{
    if (m_db && !m_done)
        (void)m_db->exec(m_outermost
                ? QStringLiteral("ROLLBACK")
                : QStringLiteral("ROLLBACK TO fourfold_edit; RELEASE fourfold_edit"));
}

Savepoint::Savepoint(Savepoint &&other) noexcept
    : m_db(std::exchange(other.m_db, nullptr))
    , m_done(other.m_done)
    , m_outermost(other.m_outermost)
{ }

Status Savepoint::commit()
{
    auto st = m_db->exec(
        m_outermost ? QStringLiteral("COMMIT") : QStringLiteral("RELEASE fourfold_edit"));
    if (st)
        m_done = true;
    return st;
}

} // namespace fourfold
