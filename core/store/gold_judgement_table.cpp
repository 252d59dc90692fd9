#include "core/store/gold_judgement_table.h"

#include "core/store/store_util.h"

#include <QCoreApplication>

namespace fourfold::store {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct GoldJudgementTableText {
    Q_DECLARE_TR_FUNCTIONS(GoldJudgementTableText)
};

const QString kColumns = QStringLiteral(
    "id, uuid, article_id, item_key, value, decided_by, decided_at, rationale, deleted");

GoldJudgement readRow(const Statement &row)
{
    GoldJudgement g;
    g.id = GoldJudgementId {row.columnInt(0)};
    g.uuid = row.columnText(1);
    g.article = ArticleId {row.columnInt(2)};
    g.itemKey = row.columnText(3);
    g.value = row.columnText(4);
    g.decidedBy = CoderId {row.columnInt(5)};
    g.decidedAt = row.columnText(6);
    g.rationale = row.columnText(7);
    g.deleted = row.columnInt(8) != 0;
    return g;
}

std::unexpected<Error> notFound(GoldJudgementId id)
{
    return fail(ErrorCode::NotFound,
        GoldJudgementTableText::tr("There is no gold answer #%1 in the project.").arg(id.value));
}

} // namespace

Result<GoldJudgementId> insertGoldJudgement(Database &db, const GoldJudgement &g)
{
    auto stmt = db.prepare(QStringLiteral(
        "INSERT INTO gold_judgement (uuid, article_id, item_key, value, decided_by, decided_at, "
        "rationale, deleted) VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8)"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, g.uuid)
        .bind(2, g.article.value)
        .bind(3, g.itemKey)
        .bind(4, g.value)
        .bind(5, g.decidedBy.value)
        .bind(6, g.decidedAt)
        .bind(7, g.rationale)
        .bind(8, qint64(g.deleted));
    FOURFOLD_TRY_STATUS(stmt->run());
    return GoldJudgementId {db.lastInsertRowId()};
}

Status setGoldJudgementDeleted(Database &db, GoldJudgementId id, bool deleted)
{
    auto stmt = db.prepare(QStringLiteral("UPDATE gold_judgement SET deleted = ?2 WHERE id = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, id.value).bind(2, qint64(deleted));
    FOURFOLD_TRY_STATUS(stmt->run());
    if (db.changes() != 1)
        return notFound(id);
    return {};
}

Status removeGoldJudgement(Database &db, GoldJudgementId id)
{
    auto stmt = db.prepare(QStringLiteral("DELETE FROM gold_judgement WHERE id = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, id.value);
    FOURFOLD_TRY_STATUS(stmt->run());
    if (db.changes() != 1)
        return notFound(id);
    return {};
}

Result<GoldJudgement> goldJudgement(const Database &db, GoldJudgementId id)
{
    auto stmt =
        db.prepare(QStringLiteral("SELECT %1 FROM gold_judgement WHERE id = ?1").arg(kColumns));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, id.value);
    auto rows = collectRows(*stmt, readRow);
    if (!rows)
        return std::unexpected(rows.error());
    if (rows->empty())
        return notFound(id);
    return rows->front();
}

Result<std::optional<GoldJudgement>> liveGoldJudgement(
    const Database &db, ArticleId article, const QString &itemKey)
{
    auto stmt = db.prepare(QStringLiteral("SELECT %1 FROM gold_judgement WHERE article_id = ?1 "
                                          "AND item_key = ?2 AND deleted = 0 ORDER BY id DESC")
                               .arg(kColumns));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, article.value).bind(2, itemKey);
    auto rows = collectRows(*stmt, readRow);
    if (!rows)
        return std::unexpected(rows.error());
    if (rows->empty())
        return std::optional<GoldJudgement> {};
    return std::optional<GoldJudgement> {rows->front()};
}

Result<std::vector<GoldJudgement>> goldJudgements(const Database &db, ArticleId article)
{
    // One statement per case, so that an article's rows come from the index on article_id.
    auto stmt = db.prepare((article.isValid()
            ? QStringLiteral("SELECT %1 FROM gold_judgement WHERE deleted = 0 AND article_id = ?1 "
                             "ORDER BY item_key, id")
            : QStringLiteral("SELECT %1 FROM gold_judgement WHERE deleted = 0 "
                             "ORDER BY article_id, item_key, id"))
                               .arg(kColumns));
    if (!stmt)
        return std::unexpected(stmt.error());
    if (article.isValid())
        stmt->bind(1, article.value);
    return collectRows(*stmt, readRow);
}

} // namespace fourfold::store
