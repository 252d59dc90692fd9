#include "core/store/extractor_run_table.h"

#include "core/store/store_util.h"

#include <QCoreApplication>

namespace fourfold::store {

namespace {

const QString kRunColumns = QStringLiteral("id, uuid, name, version, parameters, created_at");

ExtractorRun readRun(const Statement &row)
{
    ExtractorRun r;
    r.id = RunId {row.columnInt(0)};
    r.uuid = row.columnText(1);
    r.name = row.columnText(2);
    r.version = row.columnText(3);
    r.parameters = fromJsonText(row.columnText(4));
    r.createdAt = row.columnText(5);
    return r;
}

ExtractedSpan readSpan(const Statement &row)
{
    ExtractedSpan s;
    s.run = RunId {row.columnInt(0)};
    s.article = ArticleId {row.columnInt(1)};
    s.function = functionFromKey(row.columnText(2)).value_or(FramingFunction::Problem);
    s.range = TextRange {row.columnInt(3), row.columnInt(4)};
    s.score = row.columnOptionalDouble(5);
    s.attributes = fromJsonText(row.columnText(6));
    return s;
}

const QString kSpanColumns =
    QStringLiteral("run_id, article_id, function, start, end, score, attributes");
const QString kSpanOrder = QStringLiteral(
    "ORDER BY article_id, start, end, CASE function WHEN 'problem' THEN 0 WHEN 'cause' THEN 1 "
    "WHEN 'evaluation' THEN 2 ELSE 3 END, id");

} // namespace

Result<RunId> insertRun(Database &db, const ExtractorRun &run)
{
    auto stmt = db.prepare(
        QStringLiteral("INSERT INTO extractor_run (uuid, name, version, parameters, created_at) "
                       "VALUES (?1, ?2, ?3, ?4, ?5)"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, run.uuid)
        .bind(2, run.name)
        .bind(3, run.version)
        .bind(4, toJsonText(run.parameters))
        .bind(5, run.createdAt);
    FOURFOLD_TRY_STATUS(stmt->run());
    return RunId {db.lastInsertRowId()};
}

Status insertExtractedSpans(Database &db, RunId run, const std::vector<ExtractedSpan> &spans)
{
    auto stmt = db.prepare(QStringLiteral(
        "INSERT INTO extracted_span (run_id, article_id, function, start, end, score, attributes) "
        "VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7)"));
    if (!stmt)
        return std::unexpected(stmt.error());
    for (const ExtractedSpan &s : spans) {
        stmt->bind(1, run.value)
            .bind(2, s.article.value)
            .bind(3, functionKey(s.function))
            .bind(4, s.range.start)
            .bind(5, s.range.end)
            .bind(6, s.score)
            .bind(7, toJsonText(s.attributes));
        FOURFOLD_TRY_STATUS(stmt->run());
    }
    return {};
}

Status removeRun(Database &db, RunId run)
{
    auto stmt = db.prepare(QStringLiteral("DELETE FROM extractor_run WHERE id = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, run.value);
    FOURFOLD_TRY_STATUS(stmt->run());
    if (db.changes() != 1)
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("ExtractorRunTable", "There is no extractor run #%1.")
                .arg(run.value));
    return {};
}

Result<std::vector<ExtractorRun>> runs(const Database &db)
{
    auto stmt = db.prepare(
        QStringLiteral("SELECT %1 FROM extractor_run ORDER BY created_at, id").arg(kRunColumns));
    if (!stmt)
        return std::unexpected(stmt.error());
    return collectRows(*stmt, readRun);
}

Result<std::optional<ExtractorRun>> runByName(const Database &db, const QString &name)
{
    auto stmt =
        db.prepare(QStringLiteral("SELECT %1 FROM extractor_run WHERE name = ?1").arg(kRunColumns));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, name);
    auto rows = collectRows(*stmt, readRun);
    if (!rows)
        return std::unexpected(rows.error());
    if (rows->empty())
        return std::optional<ExtractorRun> {};
    return std::optional<ExtractorRun> {std::move(rows->front())};
}

Result<std::vector<ExtractedSpan>> extractedSpans(const Database &db, RunId run, ArticleId article)
{
    auto stmt = article.isValid()
        ? db.prepare(QStringLiteral("SELECT %1 FROM extracted_span WHERE run_id = ?1 AND "
                                    "article_id = ?2 %2")
                         .arg(kSpanColumns, kSpanOrder))
        : db.prepare(QStringLiteral("SELECT %1 FROM extracted_span WHERE run_id = ?1 %2")
                         .arg(kSpanColumns, kSpanOrder));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, run.value);
    if (article.isValid())
        stmt->bind(2, article.value);
    return collectRows(*stmt, readSpan);
}

Status forEachExtractedSpan(
    const Database &db, RunId run, const std::function<Status(ExtractedSpan &&)> &visit)
{
    auto stmt = db.prepare(QStringLiteral("SELECT %1 FROM extracted_span WHERE run_id = ?1 %2")
                               .arg(kSpanColumns, kSpanOrder));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, run.value);
    return forEachRow(*stmt, readSpan, visit);
}

Result<qint64> extractedSpanCount(const Database &db, RunId run)
{
    auto stmt = db.prepare(QStringLiteral("SELECT count(*) FROM extracted_span WHERE run_id = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, run.value);
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    return *row ? stmt->columnInt(0) : qint64(0);
}

} // namespace fourfold::store
