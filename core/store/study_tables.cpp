#include "core/store/study_tables.h"

#include "core/store/store_util.h"

namespace fourfold::store {

Result<std::vector<FrameArticle>> frameArticles(const Database &db)
{
    // json_extract gives NULL for a missing key; a non-string topic is not a stratum name.
    auto stmt = db.prepare(QStringLiteral(
        "SELECT a.id, a.external_id, a.outlet, a.language, "
        "  CASE WHEN json_valid(a.metadata) AND json_type(a.metadata, '$.topic') = 'text' "
        "       THEN json_extract(a.metadata, '$.topic') ELSE '' END, "
        "  (SELECT count(*) FROM paragraph p WHERE p.article_id = a.id), "
        "  coalesce((SELECT u.sentence_count FROM article_units u WHERE u.article_id = a.id), 0) "
        "FROM article a WHERE a.deleted = 0 ORDER BY CAST(a.external_id AS BLOB)"));
    if (!stmt)
        return std::unexpected(stmt.error());
    return collectRows(*stmt, [](const Statement &row) {
        return FrameArticle {ArticleId {row.columnInt(0)}, row.columnText(1), row.columnText(2),
            row.columnText(3), row.columnText(4), row.columnInt(5), row.columnInt(6)};
    });
}

Result<std::vector<Assignment>> coderAssignments(
    const Database &db, ArticleId article, CoderId coder)
{
    auto stmt = db.prepare(QStringLiteral("SELECT article_id, coder_id, phase, status, "
                                          "active_seconds FROM assignment WHERE deleted = 0 "
                                          "AND article_id = ?1 AND coder_id = ?2 ORDER BY phase"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, article.value).bind(2, coder.value);
    return collectRows(*stmt, [](const Statement &row) {
        return Assignment {ArticleId {row.columnInt(0)}, CoderId {row.columnInt(1)},
            phaseFromKey(row.columnText(2)).value_or(Phase::Production), row.columnText(3),
            row.columnInt(4)};
    });
}

} // namespace fourfold::store
