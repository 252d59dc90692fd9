#include "core/store/codebook_table.h"

#include "core/store/store_util.h"

#include <QCoreApplication>

namespace fourfold::store {

Result<CodebookVersionId> insertCodebookVersion(
    Database &db, const Codebook &codebook, const QString &note)
{
    auto next =
        scalar(db, QStringLiteral("SELECT coalesce(max(number), 0) + 1 FROM codebook_version"));
    if (!next)
        return std::unexpected(next.error());
    auto stmt = db.prepare(QStringLiteral("INSERT INTO codebook_version (uuid, number, created_at, "
                                          "note, content) VALUES (?1, ?2, ?3, ?4, ?5)"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, newUuid())
        .bind(2, *next)
        .bind(3, now())
        .bind(4, note)
        .bind(5, toJsonText(codebook.toJson()));
    FOURFOLD_TRY_STATUS(stmt->run());
    return CodebookVersionId {db.lastInsertRowId()};
}

Result<Codebook> currentCodebook(const Database &db)
{
    auto stmt = db.prepare(QStringLiteral(
        "SELECT id, number, content FROM codebook_version ORDER BY number DESC LIMIT 1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    if (!*row)
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("CodebookTable", "The project has no codebook."));
    auto book = Codebook::fromJson(stmt->columnText(2).toUtf8(),
        QCoreApplication::translate("CodebookTable", "codebook version %1")
            .arg(stmt->columnInt(1)));
    if (!book)
        return std::unexpected(book.error());
    book->versionId = CodebookVersionId {stmt->columnInt(0)};
    book->number = int(stmt->columnInt(1));
    return book;
}

} // namespace fourfold::store
