#include "core/store/project_tables.h"

#include "core/store/coder_table.h"
#include "core/store/store_util.h"

#include <QCoreApplication>

#include <sqlite3.h>

namespace fourfold::store {

Result<std::optional<QString>> setting(const Database &db, const QString &key)
{
    auto stmt = db.prepare(QStringLiteral("SELECT value FROM project_setting WHERE key = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, key);
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    if (!*row)
        return std::optional<QString> {};
    return std::optional<QString> {stmt->columnText(0)};
}

Status setSetting(Database &db, const QString &key, const QString &value)
{
    auto stmt =
        db.prepare(QStringLiteral("INSERT INTO project_setting (key, value) VALUES (?1, ?2) "
                                  "ON CONFLICT (key) DO UPDATE SET value = excluded.value"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, key).bind(2, value);
    return stmt->run();
}

Status removeSetting(Database &db, const QString &key)
{
    auto stmt = db.prepare(QStringLiteral("DELETE FROM project_setting WHERE key = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, key);
    return stmt->run();
}

Status insertAssignment(
    Database &db, ArticleId article, CoderId coder, Phase phase, const QString &uuid)
{
    // A live row stays as it is (the WHERE), which shows as no change.
    auto stmt = db.prepare(QStringLiteral(
        "INSERT INTO assignment (uuid, article_id, coder_id, phase, created_at) VALUES (?1, ?2, "
        "?3, ?4, ?5) ON CONFLICT (article_id, coder_id, phase) DO UPDATE SET uuid = excluded.uuid, "
        "status = 'assigned', created_at = excluded.created_at, deleted = 0, active_seconds = 0 "
        "WHERE assignment.deleted = 1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, uuid.isEmpty() ? newUuid() : uuid)
        .bind(2, article.value)
        .bind(3, coder.value)
        .bind(4, phaseKey(phase))
        .bind(5, now());
    const QString duplicate = QCoreApplication::translate("ProjectTables",
        "The article is already assigned to this coder in this phase, or one of them does "
        "not exist.");
    if (auto st = stmt->run(); !st) {
        Error e = st.error();
        if (e.code == ErrorCode::Constraint)
            e.message = duplicate;
        return std::unexpected(e);
    }
    if (db.changes() == 0)
        return fail(ErrorCode::Constraint, duplicate);
    return {};
}

Result<std::optional<AssignmentRecord>> assignmentRecord(
    const Database &db, ArticleId article, CoderId coder, Phase phase)
{
    auto stmt = db.prepare(QStringLiteral(
        "SELECT s.uuid, s.status, s.created_at, s.deleted, s.active_seconds, "
        "(SELECT count(*) FROM annotation a WHERE a.article_id = s.article_id AND a.coder_id = "
        "s.coder_id AND a.phase = s.phase AND a.deleted = 0), "
        "(SELECT count(*) FROM judgement j WHERE j.article_id = s.article_id AND j.coder_id = "
        "s.coder_id AND j.phase = s.phase AND j.deleted = 0) "
        "FROM assignment s WHERE s.article_id = ?1 AND s.coder_id = ?2 AND s.phase = ?3"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, article.value).bind(2, coder.value).bind(3, phaseKey(phase));
    auto rows = collectRows(*stmt, [](const Statement &row) {
        return AssignmentRecord {row.columnText(0), row.columnText(1), row.columnText(2),
            row.columnInt(3) != 0, row.columnInt(4), row.columnInt(5), row.columnInt(6)};
    });
    if (!rows)
        return std::unexpected(rows.error());
    if (rows->empty())
        return std::optional<AssignmentRecord> {};
    return std::optional<AssignmentRecord> {rows->front()};
}

Status writeAssignmentRecord(
    Database &db, ArticleId article, CoderId coder, Phase phase, const AssignmentRecord &record)
{
    auto stmt = db.prepare(QStringLiteral(
        "UPDATE assignment SET uuid = ?4, status = ?5, created_at = ?6, deleted = ?7, "
        "active_seconds = ?8 WHERE article_id = ?1 AND coder_id = ?2 AND phase = ?3"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, article.value)
        .bind(2, coder.value)
        .bind(3, phaseKey(phase))
        .bind(4, record.uuid)
        .bind(5, record.status)
        .bind(6, record.createdAt)
        .bind(7, qint64(record.deleted))
        .bind(8, record.activeSeconds);
    FOURFOLD_TRY_STATUS(stmt->run());
    if (db.changes() == 0)
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("ProjectTables", "The assignment is not in the project."));
    return {};
}

Result<std::vector<Assignment>> assignments(const Database &db, ArticleId article)
{
    auto stmt = db.prepare(article.isValid()
            ? QStringLiteral("SELECT article_id, coder_id, phase, status, active_seconds FROM "
                             "assignment WHERE deleted = 0 AND article_id = ?1 "
                             "ORDER BY coder_id, phase")
            : QStringLiteral("SELECT article_id, coder_id, phase, status, active_seconds FROM "
                             "assignment WHERE deleted = 0 ORDER BY article_id, coder_id, phase"));
    if (!stmt)
        return std::unexpected(stmt.error());
    if (article.isValid())
        stmt->bind(1, article.value);
    return collectRows(*stmt, [](const Statement &row) {
        return Assignment {ArticleId {row.columnInt(0)}, CoderId {row.columnInt(1)},
            storedPhase(row.columnUtf8(2)).value_or(Phase::Production), row.columnText(3),
            row.columnInt(4)};
    });
}

Result<std::vector<std::pair<CoderId, Phase>>> spanCoderPhases(const Database &db)
{
    auto stmt = db.prepare(
        QStringLiteral("SELECT DISTINCT coder_id, phase FROM annotation WHERE deleted = 0"));
    if (!stmt)
        return std::unexpected(stmt.error());
    return collectRows(*stmt, [](const Statement &row) {
        return std::pair {
            CoderId {row.columnInt(0)}, storedPhase(row.columnUtf8(1)).value_or(Phase::Production)};
    });
}

Result<std::vector<CodedTriple>> codedTriples(const Database &db, ArticleId article)
{
    // Two statements rather than "?1 IS NULL OR article_id = ?1", which SQLite cannot answer
    // from the indexes on article_id.
    auto stmt = db.prepare(article.isValid()
            ? QStringLiteral("SELECT article_id, coder_id, phase FROM annotation WHERE deleted = 0 "
                             "AND article_id = ?1 UNION SELECT article_id, coder_id, phase FROM "
                             "judgement WHERE deleted = 0 AND article_id = ?1 ORDER BY 1, 2, 3")
            : QStringLiteral("SELECT article_id, coder_id, phase FROM annotation WHERE deleted = 0 "
                             "UNION SELECT article_id, coder_id, phase FROM judgement WHERE "
                             "deleted = 0 ORDER BY 1, 2, 3"));
    if (!stmt)
        return std::unexpected(stmt.error());
    if (article.isValid())
        stmt->bind(1, article.value);
    return collectRows(*stmt, [](const Statement &row) {
        return CodedTriple {ArticleId {row.columnInt(0)}, CoderId {row.columnInt(1)},
            storedPhase(row.columnUtf8(2)).value_or(Phase::Production)};
    });
}

Result<qint64> setAssignmentStatus(
    Database &db, ArticleId article, CoderId coder, Phase phase, const QString &status)
{
    auto stmt = db.prepare(QStringLiteral("UPDATE assignment SET status = ?4 WHERE article_id = ?1 "
                                          "AND coder_id = ?2 AND phase = ?3 AND deleted = 0"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, article.value).bind(2, coder.value).bind(3, phaseKey(phase)).bind(4, status);
    FOURFOLD_TRY_STATUS(stmt->run());
    return db.changes();
}

Status addAssignmentSeconds(
    Database &db, ArticleId article, CoderId coder, Phase phase, qint64 seconds)
{
    auto stmt = db.prepare(QStringLiteral("UPDATE assignment SET active_seconds = active_seconds + "
                                          "?4 WHERE article_id = ?1 AND coder_id = ?2 "
                                          "AND phase = ?3 AND deleted = 0"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, article.value).bind(2, coder.value).bind(3, phaseKey(phase)).bind(4, seconds);
    return stmt->run();
}

Status removeAssignment(Database &db, ArticleId article, CoderId coder, Phase phase)
{
    auto stmt = db.prepare(QStringLiteral(
        "DELETE FROM assignment WHERE article_id = ?1 AND coder_id = ?2 AND phase = ?3"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, article.value).bind(2, coder.value).bind(3, phaseKey(phase));
    return stmt->run();
}

Result<ProjectCounts> projectCounts(const Database &db)
{
    ProjectCounts t;
    struct Count {
        qint64 *target;
        const char *sql;
    };
    const Count counts[] = {
        {&t.articles, "SELECT count(*) FROM article WHERE deleted = 0"},
        {&t.codePoints, "SELECT coalesce(sum(length), 0) FROM article WHERE deleted = 0"},
        {&t.paragraphs,
            "SELECT count(*) FROM paragraph p JOIN article a ON a.id = p.article_id WHERE "
            "a.deleted = 0"},
        {&t.sentences,
            "SELECT coalesce(sum(u.sentence_count), 0) FROM article_units u JOIN article a ON a.id "
            "= u.article_id WHERE a.deleted = 0"},
        {&t.tokens,
            "SELECT coalesce(sum(u.token_count), 0) FROM article_units u JOIN article a ON a.id = "
            "u.article_id WHERE a.deleted = 0"},
        {&t.coders, "SELECT count(*) FROM coder WHERE deleted = 0"},
        {&t.assignments, "SELECT count(*) FROM assignment WHERE deleted = 0"},
        {&t.annotations, "SELECT count(*) FROM annotation WHERE deleted = 0"},
        {&t.links, "SELECT count(*) FROM annotation_link WHERE deleted = 0"},
        {&t.judgements, "SELECT count(*) FROM judgement WHERE deleted = 0"},
        {&t.goldAnnotations, "SELECT count(*) FROM gold_annotation WHERE deleted = 0"},
        {&t.extractorRuns, "SELECT count(*) FROM extractor_run"},
        {&t.codebookVersion, "SELECT coalesce(max(number), 0) FROM codebook_version"},
        {&t.events, "SELECT count(*) FROM event_log"},
    };
    for (const Count &c : counts) {
        auto v = scalar(db, QString::fromLatin1(c.sql));
        if (!v)
            return std::unexpected(v.error());
        *c.target = *v;
    }

    auto allCoders = coders(db);
    if (!allCoders)
        return std::unexpected(allCoders.error());
    for (const Coder &c : *allCoders)
        t.perCoder.push_back(CoderCounts {c, 0, {}});
    auto stmt = db.prepare(QStringLiteral("SELECT coder_id, function, count(*) FROM annotation "
                                          "WHERE deleted = 0 GROUP BY coder_id, function"));
    if (!stmt)
        return std::unexpected(stmt.error());
    auto rows = collectRows(*stmt, [](const Statement &row) {
        return std::tuple(
            CoderId {row.columnInt(0)}, functionFromKey(row.columnText(1)), row.columnInt(2));
    });
    if (!rows)
        return std::unexpected(rows.error());
    for (const auto &[coder, function, n] : *rows) {
        if (!function)
            continue;
        t.perFunction[size_t(*function)] += n;
        for (CoderCounts &c : t.perCoder)
            if (c.coder.id == coder) {
                c.perFunction[size_t(*function)] += n;
                c.annotations += n;
            }
    }
    return t;
}

Result<std::vector<StoredSpan>> allStoredSpans(const Database &db)
{
    auto stmt = db.prepare(QStringLiteral(
        "SELECT 'annotation', id, article_id, start, end, quote FROM annotation "
        "UNION ALL SELECT 'gold', id, article_id, start, end, quote FROM gold_annotation "
        "UNION ALL SELECT 'extracted', id, article_id, start, end, NULL FROM extracted_span"));
    if (!stmt)
        return std::unexpected(stmt.error());
    return collectRows(*stmt, [](const Statement &row) {
        StoredSpan span;
        span.layer = row.columnText(0);
        span.rowId = row.columnInt(1);
        span.article = ArticleId {row.columnInt(2)};
        span.range = TextRange {row.columnInt(3), row.columnInt(4)};
        if (!row.columnIsNull(5))
            span.quote = row.columnText(5);
        return span;
    });
}

Result<std::vector<StoredArticle>> allStoredArticles(const Database &db)
{
    auto stmt = db.prepare(
        QStringLiteral("SELECT id, external_id, text, length, sha256 FROM article ORDER BY id"));
    if (!stmt)
        return std::unexpected(stmt.error());
    return collectRows(*stmt, [](const Statement &row) {
        return StoredArticle {ArticleId {row.columnInt(0)}, row.columnText(1), row.columnText(2),
            row.columnInt(3), row.columnText(4)};
    });
}

Status quickCheck(const Database &db)
{
    auto check = db.prepare(QStringLiteral("PRAGMA quick_check(1)"));
    if (!check)
        return std::unexpected(check.error());
    auto row = check->step();
    if (!row) {
        // SQLite itself may stop at the damage (SQLITE_CORRUPT) instead of reporting it.
        if (row.error().code != ErrorCode::Corrupt)
            return std::unexpected(row.error());
    } else if (*row && check->columnText(0) == QLatin1String("ok")) {
        return {};
    }
    const QString problem = row && *row ? check->columnText(0) : row.error().cause;
    return fail(ErrorCode::Corrupt,
        QCoreApplication::translate("ProjectTables",
            "The project file %1 is damaged, so nothing was added to it; `fourfold-cli check` "
            "lists the damage. Restore it from a backup.")
            .arg(db.path()),
        problem);
}

Result<QStringList> sqliteChecks(const Database &db)
{
    QStringList problems;
    auto integrity = db.prepare(QStringLiteral("PRAGMA integrity_check"));
    if (!integrity)
        return std::unexpected(integrity.error());
    while (true) {
        auto row = integrity->step();
        if (!row)
            return std::unexpected(row.error());
        if (!*row)
            break;
        const QString line = integrity->columnText(0);
        if (line != QLatin1String("ok"))
            problems << QStringLiteral("integrity_check: %1").arg(line);
    }
    auto fk = db.prepare(QStringLiteral("PRAGMA foreign_key_check"));
    if (!fk)
        return std::unexpected(fk.error());
    while (true) {
        auto row = fk->step();
        if (!row)
            return std::unexpected(row.error());
        if (!*row)
            break;
        problems << QCoreApplication::translate(
            "ProjectTables", "foreign_key_check: row %1 of %2 refers to a missing row of %3")
                        .arg(fk->columnInt(1))
                        .arg(fk->columnText(0), fk->columnText(2));
    }
    // FTS5's own consistency check raises SQLITE_CORRUPT_VTAB when the index is off. It is
    // asked for with an INSERT, which a read-only file (opened read-only) cannot take: there the
    // index is left unchecked (the README's "check" says so).
    if (sqlite3_db_readonly(db.handle(), "main") == 1)
        return problems;
    auto fts = db.prepare(
        QStringLiteral("INSERT INTO article_fts(article_fts, rank) VALUES ('integrity-check', 1)"));
    if (!fts)
        return std::unexpected(fts.error());
    if (auto st = fts->run(); !st)
        problems << QStringLiteral("full-text index: %1").arg(st.error().cause);
    return problems;
}

} // namespace fourfold::store
