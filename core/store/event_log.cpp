#include "core/store/event_log.h"

#include "core/store/store_util.h"

namespace fourfold::store {

Status appendEvent(Database &db, CoderId actor, const QString &action, const QString &objectType,
    const QString &objectUuid, const QJsonObject &detail)
{
    auto stmt = db.prepare(QStringLiteral(
        "INSERT INTO event_log (at, coder_id, action, object_type, object_uuid, detail) "
        "VALUES (?1, ?2, ?3, ?4, ?5, ?6)"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, now());
    if (actor.isValid())
        stmt->bind(2, actor.value);
    else
        stmt->bindNull(2);
    stmt->bind(3, action).bind(4, objectType).bind(5, objectUuid).bind(6, toJsonText(detail));
    return stmt->run();
}

} // namespace fourfold::store
