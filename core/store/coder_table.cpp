#include "core/store/coder_table.h"

#include "core/store/store_util.h"

#include <QCoreApplication>

namespace fourfold::store {

Result<CoderId> insertCoder(Database &db, const Coder &coder)
{
    auto stmt = db.prepare(QStringLiteral(
        "INSERT INTO coder (uuid, name, pseudonym, role, created_at) VALUES (?1, ?2, ?3, ?4, ?5)"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, coder.uuid.isEmpty() ? newUuid() : coder.uuid)
        .bind(2, coder.name)
        .bind(3, coder.pseudonym)
        .bind(4, coderRoleKey(coder.role))
        .bind(5, now());
    if (auto st = stmt->run(); !st) {
        Error e = st.error();
        if (e.code == ErrorCode::Constraint) {
            e.code = ErrorCode::Duplicate;
            e.message =
                QCoreApplication::translate("CoderTable", "The pseudonym \"%1\" is already taken.")
                    .arg(coder.pseudonym);
        }
        return std::unexpected(e);
    }
    return CoderId {db.lastInsertRowId()};
}

Result<std::vector<Coder>> coders(const Database &db)
{
    auto stmt = db.prepare(QStringLiteral(
        "SELECT id, uuid, name, pseudonym, role FROM coder WHERE deleted = 0 ORDER BY pseudonym"));
    if (!stmt)
        return std::unexpected(stmt.error());
    return collectRows(*stmt, [](const Statement &row) {
        Coder c;
        c.id = CoderId {row.columnInt(0)};
        c.uuid = row.columnText(1);
        c.name = row.columnText(2);
        c.pseudonym = row.columnText(3);
        c.role = coderRoleFromKey(row.columnText(4)).value_or(CoderRole::Coder);
        return c;
    });
}

} // namespace fourfold::store
