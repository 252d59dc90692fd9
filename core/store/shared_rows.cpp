#include "core/store/shared_rows.h"

#include "core/store/store_util.h"

namespace fourfold::store {

namespace {

// Each query selects one column: the row as a JSON object built by SQLite (JSON columns of the
// file are embedded with json() so they stay objects, not strings).
QString sharedRowSql(SharedKind kind)
{
    switch (kind) {
    case SharedKind::Person:
        return QStringLiteral(
            "SELECT json_object('uuid', uuid, 'name', name, 'pseudonym', pseudonym, 'role', role, "
            "'created_at', created_at, 'deleted', deleted) FROM coder ORDER BY uuid");
    case SharedKind::CodebookVersion:
        return QStringLiteral(
            "SELECT json_object('uuid', v.uuid, 'number', v.number, 'created_at', v.created_at, "
            "'created_by', c.uuid, 'note', v.note, 'content', json(v.content)) "
            "FROM codebook_version v LEFT JOIN coder c ON c.id = v.created_by ORDER BY v.number");
    case SharedKind::Article:
        return QStringLiteral(
            "SELECT json_object('uuid', a.uuid, 'external_id', a.external_id, 'title', a.title, "
            "'outlet', a.outlet, 'published', a.published, 'language', a.language, 'text', "
            "a.text, 'length', a.length, 'sha256', a.sha256, 'metadata', json(a.metadata), "
            "'imported_at', a.imported_at, 'deleted', a.deleted, 'paragraphs', "
            "json((SELECT json_group_array(json_object('start', p.start, 'end', p.end, 'role', "
            "p.role)) FROM (SELECT * FROM paragraph WHERE article_id = a.id ORDER BY idx) p)), "
            "'sentences', '\\x' || lower(hex(coalesce(u.sentences, x''))), "
            "'tokens', '\\x' || lower(hex(coalesce(u.tokens, x'')))) "
            "FROM article a LEFT JOIN article_units u ON u.article_id = a.id ORDER BY a.uuid");
    case SharedKind::GoldAnnotation:
        return QStringLiteral(
            "SELECT json_object('uuid', g.uuid, 'article', a.uuid, 'function', g.function, "
            "'start', g.start, 'end', g.end, 'quote', g.quote, 'attributes', g.attributes, "
            "'decided_by', c.uuid, 'decided_at', g.decided_at, 'rationale', g.rationale, "
            "'deleted', g.deleted) FROM gold_annotation g JOIN article a ON a.id = g.article_id "
            "JOIN coder c ON c.id = g.decided_by ORDER BY g.uuid");
    case SharedKind::GoldSource:
        return QStringLiteral(
            "SELECT json_object('gold', g.uuid, 'annotation', n.uuid) FROM gold_source s "
            "JOIN gold_annotation g ON g.id = s.gold_id JOIN annotation n ON n.id = "
            "s.annotation_id ORDER BY g.uuid, n.uuid");
    case SharedKind::GoldJudgement:
        return QStringLiteral(
            "SELECT json_object('uuid', g.uuid, 'article', a.uuid, 'item', g.item_key, 'value', "
            "g.value, 'decided_by', c.uuid, 'decided_at', g.decided_at, 'rationale', "
            "g.rationale, 'deleted', g.deleted) FROM gold_judgement g JOIN article a ON a.id = "
            "g.article_id JOIN coder c ON c.id = g.decided_by ORDER BY g.uuid");
    case SharedKind::GoldRejection:
        return QStringLiteral(
            "SELECT json_object('uuid', r.uuid, 'annotation', n.uuid, 'decided_by', c.uuid, "
            "'decided_at', r.decided_at, 'rationale', r.rationale, 'deleted', r.deleted) "
            "FROM gold_rejection r JOIN annotation n ON n.id = r.annotation_id "
            "JOIN coder c ON c.id = r.decided_by ORDER BY r.uuid");
    case SharedKind::Event:
        return QStringLiteral(
            "SELECT json_object('source', '', 'source_id', e.id, 'at', e.at, 'person', c.uuid, "
            "'action', "
            "e.action, 'object_type', e.object_type, 'object_uuid', e.object_uuid, 'detail', "
            "json(e.detail)) FROM event_log e LEFT JOIN coder c ON c.id = e.coder_id "
            "ORDER BY e.id");
    }
    return {};
}

} // namespace

Status forEachSharedRow(
    const Database &db, SharedKind kind, const std::function<Status(const QByteArray &)> &visit)
{
    auto stmt = db.prepare(sharedRowSql(kind));
    if (!stmt)
        return std::unexpected(stmt.error());
    return forEachRow(
        *stmt,
        [](const Statement &s) {
            const QByteArrayView json = s.columnUtf8(0);
            return QByteArray(json.data(), json.size());
        },
        visit);
}

} // namespace fourfold::store
