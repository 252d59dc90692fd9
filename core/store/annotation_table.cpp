#include "core/store/annotation_table.h"

#include "core/store/store_util.h"

#include <QCoreApplication>

namespace fourfold::store {

namespace {

const QString kAnnotationColumns = QStringLiteral(
    "id, uuid, article_id, coder_id, function, start, end, quote, attributes, note, confidence, "
    "codebook_version_id, phase, created_at, modified_at, deleted");

Annotation readAnnotation(const Statement &s)
{
    Annotation a;
    a.id = AnnotationId {s.columnInt(0)};
    a.uuid = s.columnText(1);
    a.article = ArticleId {s.columnInt(2)};
    a.coder = CoderId {s.columnInt(3)};
    a.content.function = storedFunction(s.columnUtf8(4)).value_or(FramingFunction::Problem);
    a.content.range = TextRange {s.columnInt(5), s.columnInt(6)};
    a.quote = s.columnText(7);
    a.content.attributes = fromJsonText(s.columnUtf8(8));
    a.content.note = s.columnText(9);
    a.content.confidence = s.columnOptionalDouble(10);
    a.codebookVersion = CodebookVersionId {s.columnInt(11)};
    a.phase = storedPhase(s.columnUtf8(12)).value_or(Phase::Production);
    a.createdAt = s.columnText(13);
    a.modifiedAt = s.columnText(14);
    a.deleted = s.columnInt(15) != 0;
    return a;
}

// Binds ?2..?16 of an annotation in kAnnotationColumns order (after id).
void bindAnnotation(Statement &s, const Annotation &a)
{
    s.bind(2, a.uuid)
        .bind(3, a.article.value)
        .bind(4, a.coder.value)
        .bind(5, functionKey(a.content.function))
        .bind(6, a.content.range.start)
        .bind(7, a.content.range.end)
        .bind(8, a.quote)
        .bind(9, toJsonText(a.content.attributes))
        .bind(10, a.content.note)
        .bind(11, a.content.confidence)
        .bind(12, a.codebookVersion.value)
        .bind(13, phaseKey(a.phase))
        .bind(14, a.createdAt)
        .bind(15, a.modifiedAt)
        .bind(16, qint64(a.deleted ? 1 : 0));
}

Status requireOneChange(const Database &db, const char *what, qint64 id)
{
    if (db.changes() != 1)
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("AnnotationTable", "There is no %1 #%2 in the project.")
                .arg(QLatin1String(what))
                .arg(id));
    return {};
}

AnnotationLink readLink(const Statement &s)
{
    AnnotationLink l;
    l.id = LinkId {s.columnInt(0)};
    l.uuid = s.columnText(1);
    l.source = AnnotationId {s.columnInt(2)};
    l.target = AnnotationId {s.columnInt(3)};
    l.type = s.columnText(4);
    l.createdAt = s.columnText(5);
    l.deleted = s.columnInt(6) != 0;
    return l;
}

Judgement readJudgement(const Statement &s)
{
    Judgement j;
    j.id = JudgementId {s.columnInt(0)};
    j.uuid = s.columnText(1);
    j.article = ArticleId {s.columnInt(2)};
    j.coder = CoderId {s.columnInt(3)};
    j.itemKey = s.columnText(4);
    j.value = s.columnText(5);
    j.codebookVersion = CodebookVersionId {s.columnInt(6)};
    j.phase = phaseFromKey(s.columnText(7)).value_or(Phase::Production);
    j.createdAt = s.columnText(8);
    j.modifiedAt = s.columnText(9);
    j.deleted = s.columnInt(10) != 0;
    return j;
}

const QString kJudgementColumns = QStringLiteral(
    "id, uuid, article_id, coder_id, item_key, value, codebook_version_id, phase, created_at, "
    "modified_at, deleted");

} // namespace

Result<AnnotationId> insertAnnotation(Database &db, const Annotation &a)
{
    auto stmt = db.prepare(QStringLiteral(
        "INSERT INTO annotation (uuid, article_id, coder_id, function, start, end, quote, "
        "attributes, "
        "note, confidence, codebook_version_id, phase, created_at, modified_at, deleted) "
        "VALUES (?2, ?3, ?4, ?5, ?6, ?7, ?8, ?9, ?10, ?11, ?12, ?13, ?14, ?15, ?16)"));
    if (!stmt)
        return std::unexpected(stmt.error());
    bindAnnotation(*stmt, a);
    FOURFOLD_TRY_STATUS(stmt->run());
    return AnnotationId {db.lastInsertRowId()};
}

Status updateAnnotation(Database &db, const Annotation &a)
{
    auto stmt = db.prepare(QStringLiteral(
        "UPDATE annotation SET uuid = ?2, article_id = ?3, coder_id = ?4, function = ?5, start = "
        "?6, "
        "end = ?7, quote = ?8, attributes = ?9, note = ?10, confidence = ?11, codebook_version_id "
        "= ?12, "
        "phase = ?13, created_at = ?14, modified_at = ?15, deleted = ?16 WHERE id = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, a.id.value);
    bindAnnotation(*stmt, a);
    FOURFOLD_TRY_STATUS(stmt->run());
    return requireOneChange(db, "annotation", a.id.value);
}

Status removeAnnotationRow(Database &db, AnnotationId id)
{
    auto stmt = db.prepare(QStringLiteral("DELETE FROM annotation WHERE id = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, id.value);
    FOURFOLD_TRY_STATUS(stmt->run());
    return requireOneChange(db, "annotation", id.value);
}

Result<Annotation> annotation(const Database &db, AnnotationId id)
{
    auto stmt = db.prepare(
        QStringLiteral("SELECT %1 FROM annotation WHERE id = ?1").arg(kAnnotationColumns));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, id.value);
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    if (!*row)
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate(
                "AnnotationTable", "There is no annotation #%1 in the project.")
                .arg(id.value));
    return readAnnotation(*stmt);
}

Result<std::vector<Annotation>> annotations(
    const Database &db, ArticleId article, std::optional<CoderId> coder)
{
    auto stmt =
        db.prepare(QStringLiteral("SELECT %1 FROM annotation WHERE article_id = ?1 AND deleted = 0 "
                                  "AND (?2 IS NULL OR coder_id = ?2) ORDER BY start, end, id")
                       .arg(kAnnotationColumns));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, article.value);
    if (coder)
        stmt->bind(2, coder->value);
    else
        stmt->bindNull(2);
    return collectRows(*stmt, readAnnotation);
}

Result<std::vector<Annotation>> allAnnotations(const Database &db)
{
    auto stmt = db.prepare(QStringLiteral("SELECT %1 FROM annotation WHERE deleted = 0 "
                                          "ORDER BY article_id, coder_id, start, end, id")
                               .arg(kAnnotationColumns));
    if (!stmt)
        return std::unexpected(stmt.error());
    return collectRows(*stmt, readAnnotation);
}

Status forEachAnnotation(const Database &db, const std::function<Status(Annotation &&)> &visit)
{
    auto stmt = db.prepare(QStringLiteral("SELECT %1 FROM annotation WHERE deleted = 0 "
                                          "ORDER BY article_id, coder_id, start, end, id")
                               .arg(kAnnotationColumns));
    if (!stmt)
        return std::unexpected(stmt.error());
    return forEachRow(*stmt, readAnnotation, visit);
}

Status forEachAnnotationOutline(
    const Database &db, const std::function<Status(Annotation &&)> &visit)
{
    auto stmt = db.prepare(
        QStringLiteral("SELECT id, article_id, coder_id, function, start, end, attributes, phase, "
                       "created_at FROM annotation WHERE deleted = 0 ORDER BY article_id, "
                       "coder_id, start, end, id"));
    if (!stmt)
        return std::unexpected(stmt.error());
    return forEachRow(
        *stmt,
        [](const Statement &s) {
            Annotation a;
            a.id = AnnotationId {s.columnInt(0)};
            a.article = ArticleId {s.columnInt(1)};
            a.coder = CoderId {s.columnInt(2)};
            a.content.function = storedFunction(s.columnUtf8(3)).value_or(FramingFunction::Problem);
            a.content.range = TextRange {s.columnInt(4), s.columnInt(5)};
            a.content.attributes = fromJsonText(s.columnUtf8(6));
            a.phase = storedPhase(s.columnUtf8(7)).value_or(Phase::Production);
            a.createdAt = s.columnText(8);
            return a;
        },
        visit);
}

Result<LinkId> insertLink(Database &db, const AnnotationLink &l)
{
    auto stmt = db.prepare(QStringLiteral(
        "INSERT INTO annotation_link (uuid, source_id, target_id, type, created_at, deleted) "
        "VALUES (?1, ?2, ?3, ?4, ?5, ?6)"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, l.uuid)
        .bind(2, l.source.value)
        .bind(3, l.target.value)
        .bind(4, l.type)
        .bind(5, l.createdAt)
        .bind(6, qint64(l.deleted));
    FOURFOLD_TRY_STATUS(stmt->run());
    return LinkId {db.lastInsertRowId()};
}

Status updateLinkDeleted(Database &db, LinkId id, bool deleted)
{
    auto stmt = db.prepare(QStringLiteral("UPDATE annotation_link SET deleted = ?2 WHERE id = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, id.value).bind(2, qint64(deleted));
    FOURFOLD_TRY_STATUS(stmt->run());
    return requireOneChange(db, "link", id.value);
}

Status removeLinkRow(Database &db, LinkId id)
{
    auto stmt = db.prepare(QStringLiteral("DELETE FROM annotation_link WHERE id = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, id.value);
    FOURFOLD_TRY_STATUS(stmt->run());
    return requireOneChange(db, "link", id.value);
}

Result<AnnotationLink> link(const Database &db, LinkId id)
{
    auto stmt =
        db.prepare(QStringLiteral("SELECT id, uuid, source_id, target_id, type, created_at, "
                                  "deleted FROM annotation_link WHERE id = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, id.value);
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    if (!*row)
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("AnnotationTable", "There is no link #%1 in the project.")
                .arg(id.value));
    return readLink(*stmt);
}

Result<std::vector<AnnotationLink>> links(const Database &db, ArticleId article)
{
    auto stmt = db.prepare(QStringLiteral(
        "SELECT l.id, l.uuid, l.source_id, l.target_id, l.type, l.created_at, l.deleted "
        "FROM annotation_link l JOIN annotation a ON a.id = l.source_id "
        "JOIN annotation b ON b.id = l.target_id "
        "WHERE a.article_id = ?1 AND l.deleted = 0 AND a.deleted = 0 AND b.deleted = 0 ORDER BY "
        "l.id"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, article.value);
    return collectRows(*stmt, readLink);
}

Result<std::optional<Judgement>> judgement(
    const Database &db, ArticleId article, CoderId coder, const QString &itemKey, Phase phase)
{
    auto stmt = db.prepare(
        QStringLiteral("SELECT %1 FROM judgement WHERE article_id = ?1 AND coder_id = ?2 "
                       "AND item_key = ?3 AND phase = ?4 AND deleted = 0")
            .arg(kJudgementColumns));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, article.value).bind(2, coder.value).bind(3, itemKey).bind(4, phaseKey(phase));
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    if (!*row)
        return std::optional<Judgement> {};
    return std::optional<Judgement> {readJudgement(*stmt)};
}

Result<std::vector<Judgement>> judgements(const Database &db, ArticleId article)
{
    auto stmt =
        db.prepare(QStringLiteral("SELECT %1 FROM judgement WHERE article_id = ?1 AND deleted = 0 "
                                  "ORDER BY coder_id, item_key, id")
                       .arg(kJudgementColumns));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, article.value);
    return collectRows(*stmt, readJudgement);
}

Result<std::vector<Judgement>> allJudgements(const Database &db)
{
    auto stmt = db.prepare(QStringLiteral(
        "SELECT %1 FROM judgement WHERE deleted = 0 ORDER BY article_id, coder_id, item_key, id")
                               .arg(kJudgementColumns));
    if (!stmt)
        return std::unexpected(stmt.error());
    return collectRows(*stmt, readJudgement);
}

Result<JudgementId> insertJudgement(Database &db, const Judgement &j)
{
    auto stmt = db.prepare(QStringLiteral(
        "INSERT INTO judgement (uuid, article_id, coder_id, item_key, value, codebook_version_id, "
        "phase, "
        "created_at, modified_at, deleted) VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8, ?9, ?10)"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, j.uuid)
        .bind(2, j.article.value)
        .bind(3, j.coder.value)
        .bind(4, j.itemKey)
        .bind(5, j.value)
        .bind(6, j.codebookVersion.value)
        .bind(7, phaseKey(j.phase))
        .bind(8, j.createdAt)
        .bind(9, j.modifiedAt)
        .bind(10, qint64(j.deleted));
    FOURFOLD_TRY_STATUS(stmt->run());
    return JudgementId {db.lastInsertRowId()};
}

Status updateJudgement(Database &db, const Judgement &j)
{
    auto stmt = db.prepare(QStringLiteral("UPDATE judgement SET value = ?2, codebook_version_id = "
                                          "?3, modified_at = ?4, deleted = ?5 WHERE id = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, j.id.value)
        .bind(2, j.value)
        .bind(3, j.codebookVersion.value)
        .bind(4, j.modifiedAt)
        .bind(5, qint64(j.deleted));
    FOURFOLD_TRY_STATUS(stmt->run());
    return requireOneChange(db, "judgement", j.id.value);
}

Status removeJudgementRow(Database &db, JudgementId id)
{
    auto stmt = db.prepare(QStringLiteral("DELETE FROM judgement WHERE id = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, id.value);
    FOURFOLD_TRY_STATUS(stmt->run());
    return requireOneChange(db, "judgement", id.value);
}

} // namespace fourfold::store
