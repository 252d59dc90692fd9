#include "core/store/codebook_table.h"

#include "core/store/store_util.h"

#include <QCoreApplication>
#include <QHash>
#include <QMutex>

#include <atomic>

namespace fourfold::store {

Result<CodebookVersionId> insertCodebookVersion(Database &db, const Codebook &codebook,
    const QString &note, CoderId author, const QString &uuid)
{
    auto next =
        scalar(db, QStringLiteral("SELECT coalesce(max(number), 0) + 1 FROM codebook_version"));
    if (!next)
        return std::unexpected(next.error());
    auto stmt = db.prepare(QStringLiteral("INSERT INTO codebook_version (uuid, number, created_at, "
                                          "note, content, created_by) VALUES (?1, ?2, ?3, ?4, ?5, "
                                          "nullif(?6, 0))"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, uuid.isEmpty() ? newUuid() : uuid)
        .bind(2, *next)
        .bind(3, now())
        .bind(4, note)
        .bind(5, toJsonText(codebook.toJson()))
        .bind(6, author.value);
    FOURFOLD_TRY_STATUS(stmt->run());
    return CodebookVersionId {db.lastInsertRowId()};
}

Result<qint64> codebookVersionUses(const Database &db, const QString &uuid)
{
    auto stmt = db.prepare(QStringLiteral(
        "SELECT (SELECT count(*) FROM annotation WHERE codebook_version_id = v.id) + "
        "(SELECT count(*) FROM judgement WHERE codebook_version_id = v.id) "
        "FROM codebook_version v WHERE v.uuid = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, uuid);
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    return *row ? stmt->columnInt(0) : qint64(0);
}

Status deleteCodebookVersion(Database &db, const QString &uuid)
{
    auto stmt = db.prepare(QStringLiteral("DELETE FROM codebook_version WHERE uuid = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, uuid);
    return stmt->run();
}

namespace {

// Reads the codebook in the current row of `stmt` (columns id, number, content, uuid).
// Parsed codebooks by their version's uuid: a version's content never changes once stored (a
// copy of the project keeps the uuid with the same content), and every span edit validates
// against the current codebook, so an import of many spans parses it once and reads its
// content once. Shared by the connections of all threads.
QMutex cacheMutex;
QHash<QString, Codebook> parsedCache;
std::atomic<qint64> parses {0};

Result<Codebook> readCodebook(Statement &stmt)
{
    const QString uuid = stmt.columnText(3);
    Codebook book;
    {
        QMutexLocker lock(&cacheMutex);
        auto cached = parsedCache.constFind(uuid);
        if (cached != parsedCache.constEnd()) {
            book = *cached;
        } else {
            auto parsed = Codebook::fromJson(stmt.columnBlob(2),
                QCoreApplication::translate("CodebookTable", "codebook version %1")
                    .arg(stmt.columnInt(1)),
                CodebookCheck::Stored);
            if (!parsed)
                return std::unexpected(parsed.error());
            ++parses;
            if (parsedCache.size() >= 32)
                parsedCache.clear();
            parsedCache.insert(uuid, *parsed);
            book = std::move(*parsed);
        }
    }
    book.versionId = CodebookVersionId {stmt.columnInt(0)};
    book.number = int(stmt.columnInt(1));
    return book;
}

} // namespace

qint64 codebookParses()
{
    return parses.load();
}

Result<Codebook> currentCodebook(const Database &db)
{
    auto stmt = db.prepare(QStringLiteral(
        "SELECT id, number, content, uuid FROM codebook_version ORDER BY number DESC LIMIT 1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    if (!*row)
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("CodebookTable", "The project has no codebook."));
    return readCodebook(*stmt);
}

Result<Codebook> codebookByNumber(const Database &db, int number)
{
    auto stmt = db.prepare(
        QStringLiteral("SELECT id, number, content, uuid FROM codebook_version WHERE number = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, number);
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    if (!*row)
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("CodebookTable", "The project has no codebook version %1.")
                .arg(number));
    return readCodebook(*stmt);
}

Result<std::vector<CodebookVersionRow>> codebookVersionRows(const Database &db)
{
    auto stmt = db.prepare(QStringLiteral(
        "SELECT v.id, v.number, v.created_at, coalesce(c.pseudonym, ''), v.note "
        "FROM codebook_version v LEFT JOIN coder c ON c.id = v.created_by ORDER BY v.number"));
    if (!stmt)
        return std::unexpected(stmt.error());
    return collectRows(*stmt, [](const Statement &row) {
        return CodebookVersionRow {CodebookVersionId {row.columnInt(0)}, int(row.columnInt(1)),
            row.columnText(2), row.columnText(3), row.columnText(4)};
    });
}

namespace {

Result<std::vector<ValueInUse>> valuesInUse(Statement &stmt)
{
    return collectRows(stmt, [](const Statement &row) {
        return ValueInUse {row.columnText(0), row.columnInt(1)};
    });
}

} // namespace

Result<std::vector<ValueInUse>> attributeValuesInUse(
    const Database &db, FramingFunction function, const QString &key)
{
    auto stmt = db.prepare(
        QStringLiteral("SELECT value, count(*) FROM ("
                       " SELECT e.value AS value FROM annotation a, json_each(a.attributes) e"
                       "  WHERE a.deleted = 0 AND a.function = ?1 AND e.key = ?2"
                       " UNION ALL"
                       " SELECT e.value FROM gold_annotation g, json_each(g.attributes) e"
                       "  WHERE g.deleted = 0 AND g.function = ?1 AND e.key = ?2"
                       ") GROUP BY value ORDER BY value"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, functionKey(function)).bind(2, key);
    return valuesInUse(*stmt);
}

Result<QStringList> attributeTextValues(
    const Database &db, const QString &key, std::optional<CoderId> coder)
{
    // ?3 = -1 stands for "every coder, and gold".
    auto stmt = db.prepare(
        QStringLiteral("SELECT value, count(*) AS uses FROM ("
                       " SELECT e.value AS value FROM annotation a, json_each(a.attributes) e"
                       "  WHERE a.deleted = 0 AND e.key = ?1 AND e.type = 'text'"
                       "    AND (?2 = -1 OR a.coder_id = ?2)"
                       " UNION ALL"
                       " SELECT e.value FROM gold_annotation g, json_each(g.attributes) e"
                       "  WHERE g.deleted = 0 AND e.key = ?1 AND e.type = 'text' AND ?2 = -1"
                       ") WHERE trim(value) <> '' GROUP BY value ORDER BY uses DESC, value"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, key).bind(2, coder ? coder->value : qint64(-1));
    auto values = collectRows(*stmt, [](const Statement &row) { return row.columnText(0); });
    if (!values)
        return std::unexpected(values.error());
    return QStringList(values->begin(), values->end());
}

Result<std::vector<ValueInUse>> itemValuesInUse(const Database &db, const QString &key)
{
    auto stmt = db.prepare(
        QStringLiteral("SELECT value, count(*) FROM ("
                       " SELECT value FROM judgement WHERE deleted = 0 AND item_key = ?1"
                       " UNION ALL"
                       " SELECT value FROM gold_judgement WHERE deleted = 0 AND item_key = ?1"
                       ") GROUP BY value ORDER BY value"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, key);
    return valuesInUse(*stmt);
}

} // namespace fourfold::store
