#include "core/store/gold_table.h"

#include "core/store/store_util.h"

#include <QCoreApplication>
#include <QHash>

namespace fourfold::store {

namespace {

const QString kGoldColumns =
    QStringLiteral("id, uuid, article_id, function, start, end, quote, attributes, decided_by, "
                   "decided_at, rationale, deleted");

GoldAnnotation readGold(const Statement &row)
{
    GoldAnnotation g;
    g.id = GoldId {row.columnInt(0)};
    g.uuid = row.columnText(1);
    g.article = ArticleId {row.columnInt(2)};
    g.content.function = functionFromKey(row.columnText(3)).value_or(FramingFunction::Problem);
    g.content.range = TextRange {row.columnInt(4), row.columnInt(5)};
    g.quote = row.columnText(6);
    g.content.attributes = fromJsonText(row.columnText(7));
    g.decidedBy = CoderId {row.columnInt(8)};
    g.decidedAt = row.columnText(9);
    g.rationale = row.columnText(10);
    g.deleted = row.columnInt(11) != 0;
    return g;
}

Status readSources(const Database &db, GoldAnnotation &g)
{
    auto stmt = db.prepare(QStringLiteral(
        "SELECT annotation_id FROM gold_source WHERE gold_id = ?1 ORDER BY annotation_id"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, g.id.value);
    auto ids =
        collectRows(*stmt, [](const Statement &row) { return AnnotationId {row.columnInt(0)}; });
    if (!ids)
        return std::unexpected(ids.error());
    g.sources = std::move(*ids);
    return {};
}

Status requireOne(const Database &db, GoldId id)
{
    if (db.changes() != 1)
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("GoldTable", "There is no gold span #%1 in the project.")
                .arg(id.value));
    return {};
}

} // namespace

Result<GoldId> insertGold(Database &db, const GoldAnnotation &g)
{
    auto stmt = db.prepare(QStringLiteral(
        "INSERT INTO gold_annotation (uuid, article_id, function, start, end, quote, attributes, "
        "decided_by, "
        "decided_at, rationale, deleted) VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8, ?9, ?10, ?11)"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, g.uuid)
        .bind(2, g.article.value)
        .bind(3, functionKey(g.content.function))
        .bind(4, g.content.range.start)
        .bind(5, g.content.range.end)
        .bind(6, g.quote)
        .bind(7, toJsonText(g.content.attributes))
        .bind(8, g.decidedBy.value)
        .bind(9, g.decidedAt)
        .bind(10, g.rationale)
        .bind(11, qint64(g.deleted));
    FOURFOLD_TRY_STATUS(stmt->run());
    const GoldId id {db.lastInsertRowId()};
    auto source = db.prepare(
        QStringLiteral("INSERT INTO gold_source (gold_id, annotation_id) VALUES (?1, ?2)"));
    if (!source)
        return std::unexpected(source.error());
    for (AnnotationId a : g.sources) {
        source->bind(1, id.value).bind(2, a.value);
        FOURFOLD_TRY_STATUS(source->run());
    }
    return id;
}

Status setGoldDeleted(Database &db, GoldId id, bool deleted)
{
    auto stmt = db.prepare(QStringLiteral("UPDATE gold_annotation SET deleted = ?2 WHERE id = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, id.value).bind(2, qint64(deleted));
    FOURFOLD_TRY_STATUS(stmt->run());
    return requireOne(db, id);
}

Status removeGold(Database &db, GoldId id)
{
    auto sources = db.prepare(QStringLiteral("DELETE FROM gold_source WHERE gold_id = ?1"));
    if (!sources)
        return std::unexpected(sources.error());
    sources->bind(1, id.value);
    FOURFOLD_TRY_STATUS(sources->run());
    auto stmt = db.prepare(QStringLiteral("DELETE FROM gold_annotation WHERE id = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, id.value);
    FOURFOLD_TRY_STATUS(stmt->run());
    return requireOne(db, id);
}

Result<GoldAnnotation> gold(const Database &db, GoldId id)
{
    auto stmt = db.prepare(
        QStringLiteral("SELECT %1 FROM gold_annotation WHERE id = ?1").arg(kGoldColumns));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, id.value);
    auto rows = collectRows(*stmt, readGold);
    if (!rows)
        return std::unexpected(rows.error());
    if (rows->empty())
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("GoldTable", "There is no gold span #%1 in the project.")
                .arg(id.value));
    GoldAnnotation g = rows->front();
    FOURFOLD_TRY_STATUS(readSources(db, g));
    return g;
}

Result<std::vector<GoldAnnotation>> goldAnnotations(const Database &db, ArticleId article)
{
    // Two statements rather than "?1 = 0 OR article_id = ?1", which SQLite cannot answer from
    // the index on article_id.
    auto stmt = db.prepare((article.isValid()
            ? QStringLiteral("SELECT %1 FROM gold_annotation WHERE deleted = 0 AND article_id = "
                             "?1 ORDER BY start, end, id")
            : QStringLiteral("SELECT %1 FROM gold_annotation WHERE deleted = 0 "
                             "ORDER BY article_id, start, end, id"))
                               .arg(kGoldColumns));
    if (!stmt)
        return std::unexpected(stmt.error());
    if (article.isValid())
        stmt->bind(1, article.value);
    auto rows = collectRows(*stmt, readGold);
    if (!rows)
        return std::unexpected(rows.error());
    // Every row's sources in one more query, not one query per gold span.
    auto sources = db.prepare(article.isValid()
            ? QStringLiteral("SELECT s.gold_id, s.annotation_id FROM gold_annotation g JOIN "
                             "gold_source s ON s.gold_id = g.id WHERE g.article_id = ?1 AND "
                             "g.deleted = 0 ORDER BY s.gold_id, s.annotation_id")
            : QStringLiteral("SELECT gold_id, annotation_id FROM gold_source "
                             "ORDER BY gold_id, annotation_id"));
    if (!sources)
        return std::unexpected(sources.error());
    if (article.isValid())
        sources->bind(1, article.value);
    auto pairs = collectRows(*sources, [](const Statement &row) {
        return std::pair {row.columnInt(0), AnnotationId {row.columnInt(1)}};
    });
    if (!pairs)
        return std::unexpected(pairs.error());
    QHash<qint64, std::vector<AnnotationId>> byGold;
    for (const auto &[gold, annotation] : *pairs)
        byGold[gold].push_back(annotation);
    for (GoldAnnotation &g : *rows)
        g.sources = byGold.value(g.id.value);
    return rows;
}

Result<qint64> insertRejection(Database &db, const GoldRejection &r)
{
    auto stmt = db.prepare(QStringLiteral(
        "INSERT INTO gold_rejection (uuid, annotation_id, decided_by, decided_at, rationale, "
        "deleted) VALUES (?1, ?2, ?3, ?4, ?5, ?6)"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, r.uuid)
        .bind(2, r.annotation.value)
        .bind(3, r.decidedBy.value)
        .bind(4, r.decidedAt)
        .bind(5, r.rationale)
        .bind(6, qint64(r.deleted));
    FOURFOLD_TRY_STATUS(stmt->run());
    return db.lastInsertRowId();
}

Status removeRejection(Database &db, qint64 id)
{
    auto stmt = db.prepare(QStringLiteral("DELETE FROM gold_rejection WHERE id = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, id);
    FOURFOLD_TRY_STATUS(stmt->run());
    if (db.changes() != 1)
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("GoldTable", "There is no rejection #%1 in the project.")
                .arg(id));
    return {};
}

Result<std::vector<GoldRejection>> goldRejections(const Database &db, ArticleId article)
{
    // As goldAnnotations(): one statement per case, so the article's rows come from indexes.
    auto stmt = db.prepare(article.isValid()
            ? QStringLiteral("SELECT r.id, r.uuid, r.annotation_id, r.decided_by, r.decided_at, "
                             "r.rationale, r.deleted FROM annotation a JOIN gold_rejection r ON "
                             "r.annotation_id = a.id WHERE a.article_id = ?1 AND r.deleted = 0 "
                             "ORDER BY r.annotation_id, r.id")
            : QStringLiteral("SELECT r.id, r.uuid, r.annotation_id, r.decided_by, r.decided_at, "
                             "r.rationale, r.deleted FROM gold_rejection r WHERE r.deleted = 0 "
                             "ORDER BY r.annotation_id, r.id"));
    if (!stmt)
        return std::unexpected(stmt.error());
    if (article.isValid())
        stmt->bind(1, article.value);
    return collectRows(*stmt, [](const Statement &row) {
        GoldRejection r;
        r.id = row.columnInt(0);
        r.uuid = row.columnText(1);
        r.annotation = AnnotationId {row.columnInt(2)};
        r.decidedBy = CoderId {row.columnInt(3)};
        r.decidedAt = row.columnText(4);
        r.rationale = row.columnText(5);
        r.deleted = row.columnInt(6) != 0;
        return r;
    });
}

Status forEachGoldAnnotation(
    const Database &db, const std::function<Status(GoldAnnotation &&)> &visit)
{
    auto stmt = db.prepare(QStringLiteral("SELECT %1 FROM gold_annotation WHERE deleted = 0 "
                                          "ORDER BY article_id, start, end, id")
                               .arg(kGoldColumns));
    if (!stmt)
        return std::unexpected(stmt.error());
    return forEachRow(*stmt, readGold, visit);
}

} // namespace fourfold::store
