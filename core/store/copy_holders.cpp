#include "core/store/copy_holders.h"

#include "core/store/database.h"
#include "core/store/statement.h"

#include <QJsonArray>
#include <QJsonDocument>

namespace fourfold::store {

Result<std::vector<CopyHolding>> copiesHolding(const Database &db, const QString &phase,
    const QStringList &articleUuids, const QStringList &pseudonyms)
{
    // copy_base keys an assignment by "ARTICLE-UUID/PHASE"; its copy's coder is the one the
    // "copy.handout" event names.
    auto stmt = db.prepare(QStringLiteral(
        "SELECT b.copy_uuid, json_extract(e.detail, '$.coder'), min(e.at), ar.external_id "
        "FROM copy_base b JOIN event_log e ON e.action = 'copy.handout' "
        "AND e.object_type = 'copy' AND e.object_uuid = b.copy_uuid "
        "JOIN article ar ON ar.uuid || '/' || ?1 = b.uuid "
        "WHERE b.object_type = 'assignment' "
        "AND ar.uuid IN (SELECT value FROM json_each(?2)) "
        "AND json_extract(e.detail, '$.coder') IN (SELECT value FROM json_each(?3)) "
        "GROUP BY b.copy_uuid, ar.external_id ORDER BY 3, 1, 4"));
    if (!stmt)
        return std::unexpected(stmt.error());
    const auto jsonList = [](const QStringList &items) {
        return QString::fromUtf8(
            QJsonDocument(QJsonArray::fromStringList(items)).toJson(QJsonDocument::Compact));
    };
    stmt->bind(1, phase).bind(2, jsonList(articleUuids)).bind(3, jsonList(pseudonyms));
    std::vector<CopyHolding> out;
    while (true) {
        auto row = stmt->step();
        if (!row)
            return std::unexpected(row.error());
        if (!*row)
            return out;
        const QString copy = stmt->columnText(0);
        if (out.empty() || out.back().copyUuid != copy)
            out.push_back(CopyHolding {copy, stmt->columnText(1), stmt->columnText(2), {}});
        out.back().articles << stmt->columnText(3);
    }
}

} // namespace fourfold::store
