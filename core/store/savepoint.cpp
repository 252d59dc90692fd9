#include "core/store/savepoint.h"

#include "core/store/database.h"

#include <utility>

namespace fourfold {

Result<Savepoint> Savepoint::begin(Database &db)
{
    if (auto st = db.exec(QStringLiteral("SAVEPOINT fourfold_edit")); !st)
        return std::unexpected(st.error());
    return Savepoint(&db);
}

Savepoint::~Savepoint()
{
    if (m_db && !m_done)
        (void)m_db->exec(QStringLiteral("ROLLBACK TO fourfold_edit; RELEASE fourfold_edit"));
}

Savepoint::Savepoint(Savepoint &&other) noexcept
    : m_db(std::exchange(other.m_db, nullptr))
    , m_done(other.m_done)
{ }

Status Savepoint::commit()
{
    auto st = m_db->exec(QStringLiteral("RELEASE fourfold_edit"));
    if (st)
        m_done = true;
    return st;
}

} // namespace fourfold
