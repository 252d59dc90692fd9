#include "core/store/store_util.h"

namespace fourfold::store {

Result<qint64> scalar(const Database &db, const QString &sql)
{
    auto stmt = db.prepare(sql);
    if (!stmt)
        return std::unexpected(stmt.error());
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    return *row ? stmt->columnInt(0) : 0;
}

} // namespace fourfold::store
