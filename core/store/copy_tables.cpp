#include "core/store/copy_tables.h"

#include "core/store/store_util.h"

#include <QCoreApplication>
#include <QCryptographicHash>
#include <QJsonValue>

namespace fourfold::store {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct CopyTablesText {
    Q_DECLARE_TR_FUNCTIONS(CopyTablesText)
};

QJsonValue optionalDouble(const Statement &s, int column)
{
    return s.columnIsNull(column) ? QJsonValue(QJsonValue::Null)
                                  : QJsonValue(s.columnDouble(column));
}

// Reads rows of one object type; `columns` name the content keys of columns 1.. (column 0 is the
// uuid). Integer columns are listed in `ints`, nullable reals in `reals`.
Result<std::vector<PortableRow>> readPortable(const Database &db, const QString &type,
    const QString &sql, const QString &coderUuid, const QStringList &columns,
    const QStringList &ints, const QStringList &reals, bool withSeconds)
{
    auto stmt = db.prepare(sql);
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, coderUuid);
    return collectRows(*stmt, [&](const Statement &s) {
        PortableRow row;
        row.type = type;
        row.uuid = s.columnText(0);
        int c = 1;
        for (const QString &key : columns) {
            if (ints.contains(key))
                row.content.insert(key, s.columnInt(c));
            else if (reals.contains(key))
                row.content.insert(key, optionalDouble(s, c));
            else
                row.content.insert(key, s.columnText(c));
            ++c;
        }
        if (withSeconds)
            row.seconds = s.columnInt(c);
        return row;
    });
}

Status requireOneChange(const Database &db, const PortableRow &row)
{
    if (db.changes() != 1)
        return fail(ErrorCode::Constraint,
            CopyTablesText::tr(
                "The %1 %2 of the copy belongs to another coder or article in the project.")
                .arg(row.type, row.uuid));
    return {};
}

Status runStatement(Database &db, const QString &sql, const QString &param)
{
    auto stmt = db.prepare(sql);
    if (!stmt)
        return std::unexpected(stmt.error());
    if (!param.isNull())
        stmt->bind(1, param);
    return stmt->run();
}

MergeConflict readConflict(const Statement &s)
{
    MergeConflict c;
    c.uuid = s.columnText(0);
    c.objectType = s.columnText(1);
    c.objectUuid = s.columnText(2);
    c.copyUuid = s.columnText(3);
    c.mine = fromJsonText(s.columnText(4));
    c.theirs = fromJsonText(s.columnText(5));
    c.detectedAt = s.columnText(6);
    c.resolution = s.columnText(7);
    c.resolvedAt = s.columnText(8);
    return c;
}

} // namespace

QString PortableRow::baseId() const
{
    if (type == QLatin1String("assignment"))
        return content.value(QLatin1String("article")).toString() + QLatin1Char('/')
            + content.value(QLatin1String("phase")).toString();
    return uuid;
}

QString PortableRow::key() const
{
    return type + QLatin1Char('/') + baseId();
}

QString PortableRow::digest() const
{
    QJsonObject compared = content;
    compared.remove(QStringLiteral("modified_at"));
    return QString::fromLatin1(
        QCryptographicHash::hash(toJsonText(compared).toUtf8(), QCryptographicHash::Sha256)
            .toHex());
}

bool PortableRow::isDeleted() const
{
    return content.value(QLatin1String("deleted")).toInteger() != 0;
}

Result<std::vector<PortableRow>> portableRows(const Database &db, const QString &coderUuid)
{
    std::vector<PortableRow> out;
    auto assignments = readPortable(db, QStringLiteral("assignment"),
        QStringLiteral(
            "SELECT s.uuid, ar.uuid, c.uuid, s.phase, s.status, s.created_at, s.deleted, "
            "s.active_seconds FROM assignment s JOIN article ar ON ar.id = s.article_id "
            "JOIN coder c ON c.id = s.coder_id WHERE c.uuid = ?1 ORDER BY s.uuid"),
        coderUuid,
        {QStringLiteral("article"), QStringLiteral("coder"), QStringLiteral("phase"),
            QStringLiteral("status"), QStringLiteral("created_at"), QStringLiteral("deleted")},
        {QStringLiteral("deleted")}, {}, true);
    if (!assignments)
        return std::unexpected(assignments.error());
    auto annotations = readPortable(db, QStringLiteral("annotation"),
        QStringLiteral(
            "SELECT a.uuid, ar.uuid, c.uuid, a.function, a.start, a.end, a.quote, a.attributes, "
            "a.note, a.confidence, cv.uuid, a.phase, a.created_at, a.modified_at, a.deleted "
            "FROM annotation a JOIN article ar ON ar.id = a.article_id "
            "JOIN coder c ON c.id = a.coder_id "
            "JOIN codebook_version cv ON cv.id = a.codebook_version_id "
            "WHERE c.uuid = ?1 ORDER BY a.uuid"),
        coderUuid,
        {QStringLiteral("article"), QStringLiteral("coder"), QStringLiteral("function"),
            QStringLiteral("start"), QStringLiteral("end"), QStringLiteral("quote"),
            QStringLiteral("attributes"), QStringLiteral("note"), QStringLiteral("confidence"),
            QStringLiteral("codebook_version"), QStringLiteral("phase"),
            QStringLiteral("created_at"), QStringLiteral("modified_at"), QStringLiteral("deleted")},
        {QStringLiteral("start"), QStringLiteral("end"), QStringLiteral("deleted")},
        {QStringLiteral("confidence")}, false);
    if (!annotations)
        return std::unexpected(annotations.error());
    auto judgements = readPortable(db, QStringLiteral("judgement"),
        QStringLiteral("SELECT j.uuid, ar.uuid, c.uuid, j.item_key, j.value, cv.uuid, j.phase, "
                       "j.created_at, j.modified_at, j.deleted FROM judgement j "
                       "JOIN article ar ON ar.id = j.article_id JOIN coder c ON c.id = j.coder_id "
                       "JOIN codebook_version cv ON cv.id = j.codebook_version_id "
                       "WHERE c.uuid = ?1 ORDER BY j.uuid"),
        coderUuid,
        {QStringLiteral("article"), QStringLiteral("coder"), QStringLiteral("item"),
            QStringLiteral("value"), QStringLiteral("codebook_version"), QStringLiteral("phase"),
            QStringLiteral("created_at"), QStringLiteral("modified_at"), QStringLiteral("deleted")},
        {QStringLiteral("deleted")}, {}, false);
    if (!judgements)
        return std::unexpected(judgements.error());
    auto links = readPortable(db, QStringLiteral("link"),
        QStringLiteral("SELECT l.uuid, s.uuid, t.uuid, l.type, l.created_at, l.deleted "
                       "FROM annotation_link l JOIN annotation s ON s.id = l.source_id "
                       "JOIN annotation t ON t.id = l.target_id JOIN coder c ON c.id = s.coder_id "
                       "WHERE c.uuid = ?1 ORDER BY l.uuid"),
        coderUuid,
        {QStringLiteral("source"), QStringLiteral("target"), QStringLiteral("type"),
            QStringLiteral("created_at"), QStringLiteral("deleted")},
        {QStringLiteral("deleted")}, {}, false);
    if (!links)
        return std::unexpected(links.error());
    for (auto *part : {&*assignments, &*annotations, &*judgements, &*links})
        out.insert(out.end(), part->begin(), part->end());
    return out;
}

Result<qint64> rowsOfOtherCoders(const Database &db, const QString &coderUuid)
{
    auto stmt = db.prepare(QStringLiteral(
        "WITH me AS (SELECT id FROM coder WHERE uuid = ?1) SELECT "
        "(SELECT count(*) FROM annotation WHERE coder_id NOT IN (SELECT id FROM me)) + "
        "(SELECT count(*) FROM judgement WHERE coder_id NOT IN (SELECT id FROM me)) + "
        "(SELECT count(*) FROM assignment WHERE coder_id NOT IN (SELECT id FROM me)) + "
        "(SELECT count(*) FROM annotation_link l JOIN annotation s ON s.id = l.source_id "
        "JOIN annotation t ON t.id = l.target_id WHERE s.coder_id NOT IN (SELECT id FROM me) "
        "OR t.coder_id NOT IN (SELECT id FROM me))"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, coderUuid);
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    return *row ? stmt->columnInt(0) : 0;
}

Status writePortableRow(Database &db, const PortableRow &row)
{
    const QJsonObject &c = row.content;
    auto text = [&](const char *key) { return c.value(QLatin1String(key)).toString(); };
    auto integer = [&](const char *key) { return c.value(QLatin1String(key)).toInteger(); };
    Result<Statement> stmt = fail(ErrorCode::Internal, QString());
    if (row.type == QLatin1String("annotation")) {
        stmt = db.prepare(QStringLiteral(
            "INSERT INTO annotation (uuid, article_id, coder_id, function, start, end, quote, "
            "attributes, note, confidence, codebook_version_id, phase, created_at, modified_at, "
            "deleted) VALUES (?1, (SELECT id FROM article WHERE uuid = ?2), "
            "(SELECT id FROM coder WHERE uuid = ?3), ?4, ?5, ?6, ?7, ?8, ?9, ?10, "
            "(SELECT id FROM codebook_version WHERE uuid = ?11), ?12, ?13, ?14, ?15) "
            "ON CONFLICT (uuid) DO UPDATE SET function = excluded.function, "
            "start = excluded.start, end = excluded.end, quote = excluded.quote, "
            "attributes = excluded.attributes, note = excluded.note, "
            "confidence = excluded.confidence, codebook_version_id = excluded.codebook_version_id, "
            "phase = excluded.phase, created_at = excluded.created_at, "
            "modified_at = excluded.modified_at, deleted = excluded.deleted "
            "WHERE annotation.coder_id = excluded.coder_id "
            "AND annotation.article_id = excluded.article_id"));
        if (!stmt)
            return std::unexpected(stmt.error());
        const QJsonValue confidence = c.value(QLatin1String("confidence"));
        stmt->bind(1, row.uuid)
            .bind(2, text("article"))
            .bind(3, text("coder"))
            .bind(4, text("function"))
            .bind(5, integer("start"))
            .bind(6, integer("end"))
            .bind(7, text("quote"))
            .bind(8, text("attributes"))
            .bind(9, text("note"))
            .bind(10,
                confidence.isDouble() ? std::optional<double>(confidence.toDouble()) : std::nullopt)
            .bind(11, text("codebook_version"))
            .bind(12, text("phase"))
            .bind(13, text("created_at"))
            .bind(14, text("modified_at"))
            .bind(15, integer("deleted"));
    } else if (row.type == QLatin1String("judgement")) {
        stmt = db.prepare(QStringLiteral(
            "INSERT INTO judgement (uuid, article_id, coder_id, item_key, value, "
            "codebook_version_id, phase, created_at, modified_at, deleted) VALUES (?1, "
            "(SELECT id FROM article WHERE uuid = ?2), (SELECT id FROM coder WHERE uuid = ?3), "
            "?4, ?5, (SELECT id FROM codebook_version WHERE uuid = ?6), ?7, ?8, ?9, ?10) "
            "ON CONFLICT (uuid) DO UPDATE SET item_key = excluded.item_key, "
            "value = excluded.value, codebook_version_id = excluded.codebook_version_id, "
            "phase = excluded.phase, created_at = excluded.created_at, "
            "modified_at = excluded.modified_at, deleted = excluded.deleted "
            "WHERE judgement.coder_id = excluded.coder_id "
            "AND judgement.article_id = excluded.article_id"));
        if (!stmt)
            return std::unexpected(stmt.error());
        stmt->bind(1, row.uuid)
            .bind(2, text("article"))
            .bind(3, text("coder"))
            .bind(4, text("item"))
            .bind(5, text("value"))
            .bind(6, text("codebook_version"))
            .bind(7, text("phase"))
            .bind(8, text("created_at"))
            .bind(9, text("modified_at"))
            .bind(10, integer("deleted"));
    } else if (row.type == QLatin1String("link")) {
        stmt = db.prepare(QStringLiteral(
            "INSERT INTO annotation_link (uuid, source_id, target_id, type, created_at, deleted) "
            "VALUES (?1, (SELECT id FROM annotation WHERE uuid = ?2), "
            "(SELECT id FROM annotation WHERE uuid = ?3), ?4, ?5, ?6) "
            "ON CONFLICT (uuid) DO UPDATE SET type = excluded.type, "
            "created_at = excluded.created_at, deleted = excluded.deleted "
            "WHERE annotation_link.source_id = excluded.source_id "
            "AND annotation_link.target_id = excluded.target_id"));
        if (!stmt)
            return std::unexpected(stmt.error());
        stmt->bind(1, row.uuid)
            .bind(2, text("source"))
            .bind(3, text("target"))
            .bind(4, text("type"))
            .bind(5, text("created_at"))
            .bind(6, integer("deleted"));
    } else if (row.type == QLatin1String("assignment")) {
        stmt = db.prepare(QStringLiteral(
            "INSERT INTO assignment (uuid, article_id, coder_id, phase, status, created_at, "
            "deleted, active_seconds) VALUES (?1, (SELECT id FROM article WHERE uuid = ?2), "
            "(SELECT id FROM coder WHERE uuid = ?3), ?4, ?5, ?6, ?7, ?8) "
            "ON CONFLICT (article_id, coder_id, phase) DO UPDATE SET status = excluded.status, "
            "created_at = excluded.created_at, deleted = excluded.deleted"));
        if (!stmt)
            return std::unexpected(stmt.error());
        stmt->bind(1, row.uuid)
            .bind(2, text("article"))
            .bind(3, text("coder"))
            .bind(4, text("phase"))
            .bind(5, text("status"))
            .bind(6, text("created_at"))
            .bind(7, integer("deleted"))
            .bind(8, row.seconds);
    } else {
        return fail(
            ErrorCode::Internal, CopyTablesText::tr("Unknown object type %1.").arg(row.type));
    }
    if (auto st = stmt->run(); !st) {
        Error e = st.error();
        if (e.code == ErrorCode::Constraint)
            e.message = CopyTablesText::tr(
                "The %1 %2 of the copy refers to an object that is not in the project.")
                            .arg(row.type, row.uuid);
        return std::unexpected(e);
    }
    return requireOneChange(db, row);
}

Status addPortableSeconds(Database &db, const PortableRow &row, qint64 seconds)
{
    auto stmt = db.prepare(
        QStringLiteral("UPDATE assignment SET active_seconds = active_seconds + ?4 "
                       "WHERE article_id = (SELECT id FROM article WHERE uuid = ?1) "
                       "AND coder_id = (SELECT id FROM coder WHERE uuid = ?2) AND phase = ?3"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, row.content.value(QLatin1String("article")).toString())
        .bind(2, row.content.value(QLatin1String("coder")).toString())
        .bind(3, row.content.value(QLatin1String("phase")).toString())
        .bind(4, seconds);
    FOURFOLD_TRY_STATUS(stmt->run());
    return requireOneChange(db, row);
}

Result<std::optional<QString>> otherLiveJudgement(const Database &db, const PortableRow &row)
{
    auto stmt = db.prepare(
        QStringLiteral("SELECT j.uuid FROM judgement j JOIN article ar ON ar.id = j.article_id "
                       "JOIN coder c ON c.id = j.coder_id WHERE ar.uuid = ?1 AND c.uuid = ?2 "
                       "AND j.item_key = ?3 AND j.phase = ?4 AND j.deleted = 0 AND j.uuid <> ?5"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, row.content.value(QLatin1String("article")).toString())
        .bind(2, row.content.value(QLatin1String("coder")).toString())
        .bind(3, row.content.value(QLatin1String("item")).toString())
        .bind(4, row.content.value(QLatin1String("phase")).toString())
        .bind(5, row.uuid);
    auto found = stmt->step();
    if (!found)
        return std::unexpected(found.error());
    if (!*found)
        return std::optional<QString> {};
    return std::optional<QString> {stmt->columnText(0)};
}

Status tombstoneJudgement(Database &db, const QString &uuid)
{
    auto stmt = db.prepare(
        QStringLiteral("UPDATE judgement SET deleted = 1, modified_at = ?2 WHERE uuid = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, uuid).bind(2, now());
    return stmt->run();
}

Status setAsideJudgement(Database &db, const QString &uuid)
{
    auto stmt = db.prepare(QStringLiteral("UPDATE judgement SET deleted = 1 WHERE uuid = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, uuid);
    return stmt->run();
}

Result<QString> otherUseOfUuid(
    const Database &db, const QString &uuid, const QString &type, const QString &coderUuid)
{
    // ?2 is the row's type, ?3 its coder: the one use that is not another object.
    auto stmt = db.prepare(
        QStringLiteral("WITH me AS (SELECT id FROM coder WHERE uuid = ?3) "
                       "SELECT 'coder' FROM coder WHERE uuid = ?1 "
                       "UNION ALL SELECT 'article' FROM article WHERE uuid = ?1 "
                       "UNION ALL SELECT 'codebook version' FROM codebook_version WHERE uuid = ?1 "
                       "UNION ALL SELECT 'gold span' FROM gold_annotation WHERE uuid = ?1 "
                       "UNION ALL SELECT 'gold answer' FROM gold_judgement WHERE uuid = ?1 "
                       "UNION ALL SELECT 'gold rejection' FROM gold_rejection WHERE uuid = ?1 "
                       "UNION ALL SELECT 'extractor run' FROM extractor_run WHERE uuid = ?1 "
                       "UNION ALL SELECT 'merge conflict' FROM merge_conflict WHERE uuid = ?1 "
                       "UNION ALL SELECT CASE WHEN ?2 <> 'assignment' THEN 'assignment' "
                       "ELSE 'assignment of another coder' END FROM assignment WHERE uuid = ?1 "
                       "AND (?2 <> 'assignment' OR coder_id NOT IN (SELECT id FROM me)) "
                       "UNION ALL SELECT CASE WHEN ?2 <> 'annotation' THEN 'span' "
                       "ELSE 'span of another coder' END FROM annotation WHERE uuid = ?1 "
                       "AND (?2 <> 'annotation' OR coder_id NOT IN (SELECT id FROM me)) "
                       "UNION ALL SELECT CASE WHEN ?2 <> 'judgement' THEN 'answer' "
                       "ELSE 'answer of another coder' END FROM judgement WHERE uuid = ?1 "
                       "AND (?2 <> 'judgement' OR coder_id NOT IN (SELECT id FROM me)) "
                       "UNION ALL SELECT CASE WHEN ?2 <> 'link' THEN 'link' "
                       "ELSE 'link of another coder' END FROM annotation_link l "
                       "JOIN annotation s ON s.id = l.source_id WHERE l.uuid = ?1 "
                       "AND (?2 <> 'link' OR s.coder_id NOT IN (SELECT id FROM me)) LIMIT 1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, uuid).bind(2, type).bind(3, coderUuid);
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    return *row ? stmt->columnText(0) : QString();
}

Result<QHash<QString, BaseEntry>> copyBase(const Database &db, const QString &copyUuid)
{
    auto stmt = db.prepare(QStringLiteral(
        "SELECT object_type, uuid, digest, seconds FROM copy_base WHERE copy_uuid = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, copyUuid);
    QHash<QString, BaseEntry> out;
    while (true) {
        auto row = stmt->step();
        if (!row)
            return std::unexpected(row.error());
        if (!*row)
            return out;
        out.insert(stmt->columnText(0) + QLatin1Char('/') + stmt->columnText(1),
            BaseEntry {stmt->columnText(2), stmt->columnInt(3)});
    }
}

Status setCopyBase(
    Database &db, const QString &copyUuid, const PortableRow &row, const BaseEntry &entry)
{
    auto stmt = db.prepare(
        QStringLiteral("INSERT INTO copy_base (copy_uuid, object_type, uuid, digest, seconds) "
                       "VALUES (?1, ?2, ?3, ?4, ?5) ON CONFLICT (copy_uuid, object_type, uuid) "
                       "DO UPDATE SET digest = excluded.digest, seconds = excluded.seconds"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, copyUuid)
        .bind(2, row.type)
        .bind(3, row.baseId())
        .bind(4, entry.digest)
        .bind(5, entry.seconds);
    return stmt->run();
}

Result<QString> copyWithBase(
    const Database &db, const PortableRow &row, const QString &digest, const QString &exceptCopy)
{
    auto stmt = db.prepare(
        QStringLiteral("SELECT min(copy_uuid) FROM copy_base WHERE object_type = ?1 AND uuid = ?2 "
                       "AND digest = ?3 AND copy_uuid <> ?4"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, row.type).bind(2, row.baseId()).bind(3, digest).bind(4, exceptCopy);
    auto found = stmt->step();
    if (!found)
        return std::unexpected(found.error());
    return *found && !stmt->columnIsNull(0) ? stmt->columnText(0) : QString();
}

Result<std::optional<QString>> handoutTime(const Database &db, const QString &copyUuid)
{
    auto stmt =
        db.prepare(QStringLiteral("SELECT min(at) FROM event_log WHERE action = 'copy.handout' "
                                  "AND object_type = 'copy' AND object_uuid = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, copyUuid);
    auto found = stmt->step();
    if (!found)
        return std::unexpected(found.error());
    if (!*found || stmt->columnIsNull(0))
        return std::optional<QString> {};
    return std::optional<QString> {stmt->columnText(0)};
}

Status attachSource(Database &copyDb, const QString &sourcePath)
{
    return runStatement(copyDb, QStringLiteral("ATTACH DATABASE ?1 AS src"), sourcePath);
}

Status detachSource(Database &copyDb)
{
    return copyDb.exec(QStringLiteral("DETACH DATABASE src"));
}

Status copyHandoutRows(Database &copyDb, const QString &coderUuid)
{
    // The articles handed out: those with a live assignment of the coder.
    const QString articles = QStringLiteral(
        "(SELECT s.article_id FROM src.assignment s JOIN src.coder c ON c.id = s.coder_id "
        "JOIN src.article a ON a.id = s.article_id "
        "WHERE c.uuid = ?1 AND s.deleted = 0 AND a.deleted = 0)");
    const QString coder = QStringLiteral("(SELECT id FROM src.coder WHERE uuid = ?1)");
    const QStringList statements {
        QStringLiteral("INSERT INTO main.project_setting (key, value) SELECT key, value "
                       "FROM src.project_setting WHERE key IN ('name', 'default_language') "
                       "AND ?1 IS NOT NULL"),
        QStringLiteral("INSERT INTO main.coder (id, uuid, name, pseudonym, role, created_at, "
                       "deleted) SELECT id, uuid, name, pseudonym, role, created_at, deleted "
                       "FROM src.coder WHERE uuid = ?1"),
        // Who wrote a codebook version is another person: left out (NULL).
        QStringLiteral("INSERT INTO main.codebook_version (id, uuid, number, created_at, "
                       "created_by, note, content) SELECT id, uuid, number, created_at, NULL, "
                       "note, content FROM src.codebook_version WHERE ?1 IS NOT NULL"),
        // The import source is a path on the lead's machine: left out.
        QStringLiteral("INSERT INTO main.article (id, uuid, external_id, title, outlet, "
                       "published, language, text, length, sha256, metadata, source, "
                       "imported_at, deleted) SELECT id, uuid, external_id, title, outlet, "
                       "published, language, text, length, sha256, metadata, '', imported_at, "
                       "deleted FROM src.article WHERE id IN %1")
            .arg(articles),
        QStringLiteral("INSERT INTO main.paragraph (article_id, idx, start, end, role) "
                       "SELECT article_id, idx, start, end, role FROM src.paragraph "
                       "WHERE article_id IN %1")
            .arg(articles),
        QStringLiteral("INSERT INTO main.article_units (article_id, sentence_count, token_count, "
                       "sentences, tokens) SELECT article_id, sentence_count, token_count, "
                       "sentences, tokens FROM src.article_units WHERE article_id IN %1")
            .arg(articles),
        QStringLiteral("INSERT INTO main.assignment (id, uuid, article_id, coder_id, phase, "
                       "status, created_at, deleted, active_seconds) SELECT id, uuid, "
                       "article_id, coder_id, phase, status, created_at, deleted, active_seconds "
                       "FROM src.assignment WHERE coder_id = %1 AND deleted = 0 "
                       "AND article_id IN %2")
            .arg(coder, articles),
        QStringLiteral("INSERT INTO main.annotation (id, uuid, article_id, coder_id, function, "
                       "start, end, quote, attributes, note, confidence, codebook_version_id, "
                       "phase, created_at, modified_at, deleted) SELECT id, uuid, article_id, "
                       "coder_id, function, start, end, quote, attributes, note, confidence, "
                       "codebook_version_id, phase, created_at, modified_at, deleted "
                       "FROM src.annotation WHERE coder_id = %1 AND article_id IN %2")
            .arg(coder, articles),
        QStringLiteral("INSERT INTO main.judgement (id, uuid, article_id, coder_id, item_key, "
                       "value, codebook_version_id, phase, created_at, modified_at, deleted) "
                       "SELECT id, uuid, article_id, coder_id, item_key, value, "
                       "codebook_version_id, phase, created_at, modified_at, deleted "
                       "FROM src.judgement WHERE coder_id = %1 AND article_id IN %2")
            .arg(coder, articles),
        // Links between two of the annotations just copied (both the coder's).
        QStringLiteral("INSERT INTO main.annotation_link (id, uuid, source_id, target_id, type, "
                       "created_at, deleted) SELECT id, uuid, source_id, target_id, type, "
                       "created_at, deleted FROM src.annotation_link "
                       "WHERE source_id IN (SELECT id FROM main.annotation) "
                       "AND target_id IN (SELECT id FROM main.annotation) AND ?1 IS NOT NULL"),
    };
    for (const QString &sql : statements)
        FOURFOLD_TRY_STATUS(runStatement(copyDb, sql, coderUuid));
    return {};
}

Result<std::vector<ArticleFingerprint>> articleFingerprints(const Database &db)
{
    auto stmt = db.prepare(
        QStringLiteral("SELECT uuid, external_id, text, sha256 FROM article ORDER BY id"));
    if (!stmt)
        return std::unexpected(stmt.error());
    return collectRows(*stmt, [](const Statement &s) {
        return ArticleFingerprint {
            s.columnText(0), s.columnText(1), s.columnText(2), s.columnText(3)};
    });
}

Result<std::optional<QString>> articleSha256(const Database &db, const QString &uuid)
{
    auto stmt = db.prepare(QStringLiteral("SELECT sha256 FROM article WHERE uuid = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, uuid);
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    if (!*row)
        return std::optional<QString> {};
    return std::optional<QString> {stmt->columnText(0)};
}

Result<QStringList> codebookVersionUuids(const Database &db)
{
    auto stmt = db.prepare(QStringLiteral("SELECT uuid FROM codebook_version ORDER BY number"));
    if (!stmt)
        return std::unexpected(stmt.error());
    auto rows = collectRows(*stmt, [](const Statement &s) { return s.columnText(0); });
    if (!rows)
        return std::unexpected(rows.error());
    return QStringList(rows->begin(), rows->end());
}

Result<std::vector<CopyEvent>> copyEvents(const Database &db, qint64 afterId)
{
    auto stmt = db.prepare(
        QStringLiteral("SELECT e.id, e.at, e.coder_id IS NOT NULL, coalesce(c.uuid, ''), e.action, "
                       "e.object_type, e.object_uuid, e.detail FROM event_log e "
                       "LEFT JOIN coder c ON c.id = e.coder_id WHERE e.id > ?1 ORDER BY e.id"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, afterId);
    return collectRows(*stmt, [](const Statement &s) {
        return CopyEvent {s.columnInt(0), s.columnText(1), s.columnInt(2) != 0, s.columnText(3),
            s.columnText(4), s.columnText(5), s.columnText(6), fromJsonText(s.columnText(7))};
    });
}

Result<qint64> lastMergedCopyEvent(const Database &db, const QString &copyUuid)
{
    auto stmt = db.prepare(
        QStringLiteral("SELECT coalesce(max(json_extract(detail, '$.events_through')), 0) "
                       "FROM copy_merge WHERE copy_uuid = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, copyUuid);
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    return *row ? stmt->columnInt(0) : 0;
}

Status appendCopyEvent(Database &db, const CopyEvent &event, CoderId actor, const QString &copyUuid)
{
    auto stmt = db.prepare(QStringLiteral(
        "INSERT INTO event_log (at, coder_id, action, object_type, object_uuid, detail) "
        "VALUES (?1, ?2, ?3, ?4, ?5, ?6)"));
    if (!stmt)
        return std::unexpected(stmt.error());
    QJsonObject detail = event.detail;
    detail.insert(QStringLiteral("copy"), copyUuid);
    stmt->bind(1, event.at);
    if (event.byCoder && actor.isValid())
        stmt->bind(2, actor.value);
    else
        stmt->bindNull(2);
    stmt->bind(3, event.action)
        .bind(4, event.objectType)
        .bind(5, event.objectUuid)
        .bind(6, toJsonText(detail));
    return stmt->run();
}

Status insertCopyMerge(
    Database &db, const QString &copyUuid, CoderId coder, const QJsonObject &detail)
{
    auto stmt = db.prepare(QStringLiteral("INSERT INTO copy_merge (copy_uuid, coder_id, "
                                          "merged_at, detail) VALUES (?1, ?2, ?3, ?4)"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, copyUuid).bind(2, coder.value).bind(3, now()).bind(4, toJsonText(detail));
    return stmt->run();
}

Result<std::vector<MergeConflict>> mergeConflicts(const Database &db, bool all)
{
    auto stmt = db.prepare(QStringLiteral(
        "SELECT uuid, object_type, object_uuid, copy_uuid, mine, theirs, detected_at, "
        "resolution, resolved_at FROM merge_conflict WHERE ?1 OR resolution = '' ORDER BY id"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, qint64(all ? 1 : 0));
    return collectRows(*stmt, readConflict);
}

Status setConflictResolution(Database &db, const QString &uuid, const QString &resolution)
{
    auto stmt = db.prepare(QStringLiteral("UPDATE merge_conflict SET resolution = ?2, "
                                          "resolved_at = ?3 WHERE uuid = ?1 AND resolution = ''"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, uuid).bind(2, resolution).bind(3, now());
    FOURFOLD_TRY_STATUS(stmt->run());
    if (db.changes() != 1)
        return fail(
            ErrorCode::NotFound, CopyTablesText::tr("There is no open conflict %1.").arg(uuid));
    return {};
}

Status reopenConflict(Database &db, const QString &uuid)
{
    auto stmt = db.prepare(QStringLiteral("UPDATE merge_conflict SET resolution = '', "
                                          "resolved_at = '' WHERE uuid = ?1 AND resolution <> ''"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, uuid);
    FOURFOLD_TRY_STATUS(stmt->run());
    if (db.changes() != 1)
        return fail(
            ErrorCode::NotFound, CopyTablesText::tr("There is no decided conflict %1.").arg(uuid));
    return {};
}

Result<std::optional<PortableRow>> portableRowOf(
    const Database &db, const QString &type, const QString &uuid)
{
    QString sql;
    if (type == QLatin1String("annotation"))
        sql = QStringLiteral("SELECT c.uuid FROM annotation o JOIN coder c ON c.id = o.coder_id "
                             "WHERE o.uuid = ?1");
    else if (type == QLatin1String("judgement"))
        sql = QStringLiteral("SELECT c.uuid FROM judgement o JOIN coder c ON c.id = o.coder_id "
                             "WHERE o.uuid = ?1");
    else if (type == QLatin1String("assignment"))
        sql = QStringLiteral("SELECT c.uuid FROM assignment o JOIN coder c ON c.id = o.coder_id "
                             "WHERE o.uuid = ?1");
    else if (type == QLatin1String("link"))
        sql = QStringLiteral("SELECT c.uuid FROM annotation_link l JOIN annotation s "
                             "ON s.id = l.source_id JOIN coder c ON c.id = s.coder_id "
                             "WHERE l.uuid = ?1");
    else
        return std::optional<PortableRow> {};
    auto stmt = db.prepare(sql);
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, uuid);
    auto found = stmt->step();
    if (!found)
        return std::unexpected(found.error());
    if (!*found)
        return std::optional<PortableRow> {};
    auto rows = portableRows(db, stmt->columnText(0));
    if (!rows)
        return std::unexpected(rows.error());
    for (PortableRow &row : *rows)
        if (row.type == type && row.uuid == uuid)
            return std::optional<PortableRow> {std::move(row)};
    return std::optional<PortableRow> {};
}

Result<std::vector<MergeConflict>> openConflictsOf(
    const Database &db, const QString &objectType, const QString &objectUuid)
{
    auto stmt = db.prepare(QStringLiteral(
        "SELECT uuid, object_type, object_uuid, copy_uuid, mine, theirs, detected_at, "
        "resolution, resolved_at FROM merge_conflict WHERE object_type = ?1 "
        "AND object_uuid = ?2 AND resolution = '' ORDER BY id"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, objectType).bind(2, objectUuid);
    return collectRows(*stmt, readConflict);
}

Status insertConflict(Database &db, const MergeConflict &conflict)
{
    auto stmt = db.prepare(QStringLiteral(
        "INSERT INTO merge_conflict (uuid, object_type, object_uuid, copy_uuid, mine, theirs, "
        "detected_at) VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7)"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, newUuid())
        .bind(2, conflict.objectType)
        .bind(3, conflict.objectUuid)
        .bind(4, conflict.copyUuid)
        .bind(5, toJsonText(conflict.mine))
        .bind(6, toJsonText(conflict.theirs))
        .bind(7, now());
    return stmt->run();
}

Status updateConflict(
    Database &db, const QString &uuid, const QJsonObject &mine, const QJsonObject &theirs)
{
    auto stmt = db.prepare(QStringLiteral("UPDATE merge_conflict SET mine = ?2, theirs = ?3 "
                                          "WHERE uuid = ?1 AND resolution = ''"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, uuid).bind(2, toJsonText(mine)).bind(3, toJsonText(theirs));
    return stmt->run();
}

Status removeConflict(Database &db, const QString &uuid)
{
    auto stmt = db.prepare(
        QStringLiteral("DELETE FROM merge_conflict WHERE uuid = ?1 AND resolution = ''"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, uuid);
    return stmt->run();
}

} // namespace fourfold::store
