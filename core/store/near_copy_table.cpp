#include "core/store/near_copy_table.h"

#include "core/store/store_util.h"

namespace fourfold::store {

Status insertNearCopy(Database &db, ArticleId article, ArticleId other, double similarity)
{
    auto stmt = db.prepare(QStringLiteral(
        "INSERT OR IGNORE INTO article_near_copy (article_id, other_id, similarity, found_at) "
        "VALUES (?1, ?2, ?3, ?4)"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, article.value).bind(2, other.value).bind(3, similarity).bind(4, now());
    return stmt->run();
}

Result<std::vector<NearCopy>> nearCopies(const Database &db)
{
    auto stmt = db.prepare(QStringLiteral(
        "SELECT n.article_id, a.external_id, a.title, n.other_id, o.external_id, o.title, "
        "n.similarity, n.found_at FROM article_near_copy n JOIN article a ON a.id = n.article_id "
        "JOIN article o ON o.id = n.other_id WHERE a.deleted = 0 AND o.deleted = 0 "
        "ORDER BY n.article_id, n.other_id"));
    if (!stmt)
        return std::unexpected(stmt.error());
    return collectRows(*stmt, [](const Statement &s) {
        return NearCopy {ArticleId {s.columnInt(0)}, s.columnText(1), s.columnText(2),
            ArticleId {s.columnInt(3)}, s.columnText(4), s.columnText(5), s.columnDouble(6),
            s.columnText(7)};
    });
}

Result<NearCopyCounts> nearCopyCounts(const Database &db)
{
    auto stmt = db.prepare(
        QStringLiteral("SELECT count(*), count(DISTINCT n.article_id) FROM article_near_copy n "
                       "JOIN article a ON a.id = n.article_id JOIN article o ON o.id = n.other_id "
                       "WHERE a.deleted = 0 AND o.deleted = 0"));
    if (!stmt)
        return std::unexpected(stmt.error());
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    return NearCopyCounts {stmt->columnInt(0), stmt->columnInt(1)};
}

Status forEachArticleText(
    const Database &db, const std::function<Status(ArticleId, QString &&text)> &visit)
{
    auto stmt =
        db.prepare(QStringLiteral("SELECT id, text FROM article WHERE deleted = 0 ORDER BY id"));
    if (!stmt)
        return std::unexpected(stmt.error());
    while (true) {
        auto row = stmt->step();
        if (!row)
            return std::unexpected(row.error());
        if (!*row)
            return {};
        FOURFOLD_TRY_STATUS(visit(ArticleId {stmt->columnInt(0)}, stmt->columnText(1)));
    }
}

} // namespace fourfold::store
