#include "core/store/coder_table.h"

#include "core/store/store_util.h"

#include <QCoreApplication>

#include <functional>

namespace fourfold::store {

Result<CoderId> insertCoder(Database &db, const Coder &coder, const QString &passphraseHash)
{
    auto stmt = db.prepare(
        QStringLiteral("INSERT INTO coder (id, uuid, name, pseudonym, role, created_at, "
                       "passphrase_hash, disabled) VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8)"));
    if (!stmt)
        return std::unexpected(stmt.error());
    if (coder.id.isValid())
        stmt->bind(1, coder.id.value);
    else
        stmt->bindNull(1);
    stmt->bind(2, coder.uuid.isEmpty() ? newUuid() : coder.uuid)
        .bind(3, coder.name)
        .bind(4, coder.pseudonym)
        .bind(5, coderRoleKey(coder.role))
        .bind(6, now())
        .bind(7, passphraseHash)
        .bind(8, coder.disabled ? 1 : 0);
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

Status removeCoder(Database &db, CoderId id)
{
    auto stmt = db.prepare(QStringLiteral("DELETE FROM coder WHERE id = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, id.value);
    FOURFOLD_TRY_STATUS(stmt->run());
    if (db.changes() != 1)
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("CoderTable", "There is no person #%1.").arg(id.value));
    return {};
}

namespace {

// Runs an UPDATE of one live coder row (?1 = its id); NotFound when none changed.
Status updateCoder(
    Database &db, CoderId id, const QString &sql, const std::function<void(Statement &)> &bindRest)
{
    auto stmt = db.prepare(sql);
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, id.value);
    bindRest(*stmt);
    FOURFOLD_TRY_STATUS(stmt->run());
    if (db.changes() != 1)
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("CoderTable", "There is no person #%1.").arg(id.value));
    return {};
}

} // namespace

Result<QString> coderPassphraseHash(const Database &db, CoderId id)
{
    auto stmt = db.prepare(
        QStringLiteral("SELECT passphrase_hash FROM coder WHERE id = ?1 AND deleted = 0"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, id.value);
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    if (!*row)
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("CoderTable", "There is no person #%1.").arg(id.value));
    return stmt->columnText(0);
}

Status setCoderPassphraseHash(Database &db, CoderId id, const QString &hash)
{
    return updateCoder(db, id,
        QStringLiteral("UPDATE coder SET passphrase_hash = ?2 WHERE id = ?1 AND deleted = 0"),
        [&](Statement &s) { s.bind(2, hash); });
}

Status setCoderName(Database &db, CoderId id, const QString &name)
{
    return updateCoder(db, id,
        QStringLiteral("UPDATE coder SET name = ?2 WHERE id = ?1 AND deleted = 0"),
        [&](Statement &s) { s.bind(2, name); });
}

Status setCoderDisabled(Database &db, CoderId id, bool disabled)
{
    return updateCoder(db, id,
        QStringLiteral("UPDATE coder SET disabled = ?2 WHERE id = ?1 AND deleted = 0"),
        [&](Statement &s) { s.bind(2, disabled ? 1 : 0); });
}

Result<std::vector<Coder>> coders(const Database &db)
{
    auto stmt = db.prepare(QStringLiteral("SELECT id, uuid, name, pseudonym, role, disabled FROM "
                                          "coder WHERE deleted = 0 ORDER BY pseudonym"));
    if (!stmt)
        return std::unexpected(stmt.error());
    return collectRows(*stmt, [](const Statement &row) {
        Coder c;
        c.id = CoderId {row.columnInt(0)};
        c.uuid = row.columnText(1);
        c.name = row.columnText(2);
        c.pseudonym = row.columnText(3);
        c.role = coderRoleFromKey(row.columnText(4)).value_or(CoderRole::Coder);
        c.disabled = row.columnInt(5) != 0;
        return c;
    });
}

} // namespace fourfold::store
