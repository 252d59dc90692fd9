#include "core/store/shared_rows.h"

#include "core/store/store_util.h"

#include <QCoreApplication>
#include <QJsonArray>
#include <QJsonDocument>
#include <QJsonValue>

#include <cctype>
#include <optional>

namespace fourfold::store {

namespace {

// Each query selects two columns: the row's key (its uuid; a gold source's "GOLD/ANNOTATION"; an
// event's row id) and the row as a JSON object built by SQLite (JSON columns of the file are
// embedded with json() so they stay objects, not strings). `light` leaves an article's text and
// units out (its sha256 stands for them); `filtered` keeps the rows whose key is in the JSON
// array bound as ?1.
QString sharedRowSql(SharedKind kind, bool light, bool filtered)
{
    auto where = [&](const char *key) {
        return filtered ? QStringLiteral(" WHERE %1 IN (SELECT value FROM json_each(?1))")
                              .arg(QLatin1String(key))
                        : QString();
    };
    switch (kind) {
    case SharedKind::Person:
        return QStringLiteral(
            "SELECT uuid, json_object('uuid', uuid, 'name', name, 'pseudonym', pseudonym, "
            "'role', role, 'created_at', created_at, 'deleted', deleted, 'disabled', "
            "disabled) FROM coder%1 "
            "ORDER BY id")
            .arg(where("uuid"));
    case SharedKind::CodebookVersion:
        return QStringLiteral(
            "SELECT v.uuid, json_object('uuid', v.uuid, 'number', v.number, 'created_at', "
            "v.created_at, 'created_by', c.uuid, 'note', v.note, 'content', "
            "json(v.content)) FROM codebook_version v LEFT JOIN coder c ON c.id = "
            "v.created_by%1 ORDER BY v.number")
            .arg(where("v.uuid"));
    case SharedKind::Article:
        return QStringLiteral(
            "SELECT a.uuid, json_object('uuid', a.uuid, 'external_id', a.external_id, "
            "'title', a.title, 'outlet', a.outlet, 'published', a.published, 'language', "
            "a.language, %1'length', a.length, 'sha256', a.sha256, 'metadata', "
            "json(a.metadata), 'imported_at', a.imported_at, 'deleted', a.deleted, "
            "'paragraphs', json((SELECT json_group_array(json_object('start', p.start, "
            "'end', p.end, 'role', p.role)) FROM (SELECT * FROM paragraph WHERE "
            "article_id = a.id ORDER BY idx) p))%2) FROM article a LEFT JOIN article_units u ON "
            "u.article_id = a.id%3 ORDER BY a.id")
            .arg(light ? QString() : QStringLiteral("'text', a.text, "),
                light ? QString()
                      : QStringLiteral(
                          ", 'sentences', '\\x' || lower(hex(coalesce(u.sentences, x''))), "
                          "'tokens', '\\x' || lower(hex(coalesce(u.tokens, x'')))"),
                where("a.uuid"));
    case SharedKind::GoldAnnotation:
        return QStringLiteral(
            "SELECT g.uuid, json_object('uuid', g.uuid, 'article', a.uuid, 'function', "
            "g.function, 'start', g.start, 'end', g.end, 'quote', g.quote, 'attributes', "
            "g.attributes, 'decided_by', c.uuid, 'decided_at', g.decided_at, 'rationale', "
            "g.rationale, 'deleted', g.deleted) FROM gold_annotation g JOIN article a ON "
            "a.id = g.article_id JOIN coder c ON c.id = g.decided_by%1 ORDER BY g.id")
            .arg(where("g.uuid"));
    case SharedKind::GoldSource:
        return QStringLiteral(
            "SELECT g.uuid || '/' || n.uuid, json_object('gold', g.uuid, 'annotation', "
            "n.uuid) FROM gold_source s JOIN gold_annotation g ON g.id = s.gold_id JOIN "
            "annotation n ON n.id = s.annotation_id%1 ORDER BY g.id, n.id")
            .arg(where("g.uuid || '/' || n.uuid"));
    case SharedKind::GoldJudgement:
        return QStringLiteral(
            "SELECT g.uuid, json_object('uuid', g.uuid, 'article', a.uuid, 'item', "
            "g.item_key, 'value', g.value, 'decided_by', c.uuid, 'decided_at', "
            "g.decided_at, 'rationale', g.rationale, 'deleted', g.deleted) FROM "
            "gold_judgement g JOIN article a ON a.id = g.article_id JOIN coder c ON c.id = "
            "g.decided_by%1 ORDER BY g.id")
            .arg(where("g.uuid"));
    case SharedKind::GoldRejection:
        return QStringLiteral(
            "SELECT r.uuid, json_object('uuid', r.uuid, 'annotation', n.uuid, "
            "'decided_by', c.uuid, 'decided_at', r.decided_at, 'rationale', r.rationale, "
            "'deleted', r.deleted) FROM gold_rejection r JOIN annotation n ON n.id = "
            "r.annotation_id JOIN coder c ON c.id = r.decided_by%1 ORDER BY r.id")
            .arg(where("r.uuid"));
    case SharedKind::Event:
        return QStringLiteral(
            "SELECT e.id, json_object('source', '', 'source_id', e.id, 'at', e.at, "
            "'person', c.uuid, 'action', e.action, 'object_type', e.object_type, "
            "'object_uuid', e.object_uuid, 'detail', json(e.detail)) FROM event_log e "
            "LEFT JOIN coder c ON c.id = e.coder_id%1 ORDER BY e.id")
            .arg(where("e.id"));
    }
    return {};
}

// "\x" + hex, as PostgreSQL writes a bytea and sharedRowSql reads a blob.
std::optional<QByteArray> fromHexBytes(const QJsonValue &value)
{
    const QString text = value.toString();
    if (!text.startsWith(QLatin1String("\\x")))
        return std::nullopt;
    const QByteArray hex = text.mid(2).toLatin1();
    if (hex.size() % 2 != 0)
        return std::nullopt;
    for (char c : hex)
        if (!std::isxdigit(static_cast<unsigned char>(c)))
            return std::nullopt;
    return QByteArray::fromHex(hex);
}

Status runJson(Database &db, const QString &sql, const QByteArray &json)
{
    auto stmt = db.prepare(sql);
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, QString::fromUtf8(json));
    return stmt->run();
}

} // namespace

Status writeSharedRow(Database &db, SharedKind kind, const QByteArray &json)
{
    const QJsonObject row = QJsonDocument::fromJson(json).object();
    if (row.isEmpty())
        return fail(ErrorCode::InvalidInput,
            QCoreApplication::translate("SharedRows", "A shared row is not a JSON object."));
    switch (kind) {
    case SharedKind::Person:
        return runJson(db,
            QStringLiteral(
                "INSERT INTO coder (uuid, name, pseudonym, role, created_at, deleted, disabled) "
                "SELECT j->>'uuid', j->>'name', j->>'pseudonym', j->>'role', j->>'created_at', "
                "j->>'deleted', coalesce(j->>'disabled', 0) FROM (SELECT ?1 AS j) WHERE true ON "
                "CONFLICT (uuid) DO UPDATE SET name = excluded.name, pseudonym = "
                "excluded.pseudonym, role = excluded.role, deleted = excluded.deleted, disabled = "
                "excluded.disabled"),
            json);
    case SharedKind::CodebookVersion:
        return runJson(db,
            QStringLiteral("INSERT INTO codebook_version (uuid, number, created_at, created_by, "
                           "note, content) SELECT j->>'uuid', j->>'number', j->>'created_at', "
                           "(SELECT id FROM coder WHERE uuid = j->>'created_by'), j->>'note', "
                           "j->'content' FROM (SELECT ?1 AS j) WHERE true ON CONFLICT (uuid) "
                           "DO UPDATE SET note = excluded.note"),
            json);
    case SharedKind::Article: {
        const auto sentences = fromHexBytes(row.value(QLatin1String("sentences")));
        const auto tokens = fromHexBytes(row.value(QLatin1String("tokens")));
        if (!sentences || !tokens || sentences->size() % 8 != 0 || tokens->size() % 8 != 0)
            return fail(ErrorCode::InvalidInput,
                QCoreApplication::translate(
                    "SharedRows", "The units of the article %1 are not pairs of 32-bit offsets.")
                    .arg(row.value(QLatin1String("uuid")).toString()));
        // An article the file holds already: its text and units never change; what may is
        // written over (title, outlet, date, language, metadata, removal, paragraph roles).
        auto present = db.prepare(QStringLiteral("SELECT id FROM article WHERE uuid = ?1"));
        if (!present)
            return std::unexpected(present.error());
        present->bind(1, row.value(QLatin1String("uuid")).toString());
        auto found = present->step();
        if (!found)
            return std::unexpected(found.error());
        if (*found) {
            const qint64 existing = present->columnInt(0);
            FOURFOLD_TRY_STATUS(runJson(db,
                QStringLiteral("UPDATE article SET title = j->>'title', outlet = j->>'outlet', "
                               "published = j->>'published', language = j->>'language', "
                               "metadata = j->'metadata', deleted = j->>'deleted' FROM (SELECT ?1 "
                               "AS j) WHERE id = %1")
                    .arg(existing),
                json));
            return runJson(db,
                QStringLiteral("UPDATE paragraph SET role = p.value->>'role' FROM json_each(?1, "
                               "'$.paragraphs') p WHERE paragraph.article_id = %1 AND "
                               "paragraph.idx = p.key")
                    .arg(existing),
                json);
        }
        FOURFOLD_TRY_STATUS(runJson(db,
            QStringLiteral("INSERT INTO article (uuid, external_id, title, outlet, published, "
                           "language, text, length, sha256, metadata, imported_at, deleted) "
                           "SELECT j->>'uuid', j->>'external_id', j->>'title', j->>'outlet', "
                           "j->>'published', j->>'language', j->>'text', j->>'length', "
                           "j->>'sha256', j->'metadata', j->>'imported_at', j->>'deleted' "
                           "FROM (SELECT ?1 AS j)"),
            json));
        const qint64 id = db.lastInsertRowId();
        FOURFOLD_TRY_STATUS(runJson(db,
            QStringLiteral("INSERT INTO paragraph (article_id, idx, start, end, role) SELECT "
                           "%1, p.key, p.value->>'start', p.value->>'end', p.value->>'role' "
                           "FROM json_each(?1, '$.paragraphs') p")
                .arg(id),
            json));
        auto units = db.prepare(
            QStringLiteral("INSERT INTO article_units (article_id, sentence_count, token_count, "
                           "sentences, tokens) VALUES (?1, ?2, ?3, ?4, ?5)"));
        if (!units)
            return std::unexpected(units.error());
        units->bind(1, id)
            .bind(2, qint64(sentences->size() / 8))
            .bind(3, qint64(tokens->size() / 8))
            .bind(4, *sentences)
            .bind(5, *tokens);
        return units->run();
    }
    case SharedKind::GoldAnnotation:
        return runJson(db,
            QStringLiteral(
                "INSERT INTO gold_annotation (uuid, article_id, function, start, end, quote, "
                "attributes, decided_by, decided_at, rationale, deleted) SELECT j->>'uuid', "
                "(SELECT id FROM article WHERE uuid = j->>'article'), j->>'function', "
                "j->>'start', j->>'end', j->>'quote', j->>'attributes', (SELECT id FROM coder "
                "WHERE uuid = j->>'decided_by'), j->>'decided_at', j->>'rationale', j->>'deleted' "
                "FROM (SELECT ?1 AS j) WHERE true ON CONFLICT (uuid) DO UPDATE SET function = "
                "excluded.function, start = excluded.start, end = excluded.end, quote = "
                "excluded.quote, attributes = excluded.attributes, decided_by = "
                "excluded.decided_by, decided_at = excluded.decided_at, rationale = "
                "excluded.rationale, deleted = excluded.deleted"),
            json);
    case SharedKind::GoldSource:
        return runJson(db,
            QStringLiteral(
                "INSERT OR IGNORE INTO gold_source (gold_id, annotation_id) SELECT (SELECT id "
                "FROM gold_annotation WHERE uuid = j->>'gold'), (SELECT id FROM "
                "annotation WHERE uuid = j->>'annotation') FROM (SELECT ?1 AS j)"),
            json);
    case SharedKind::GoldJudgement:
        return runJson(db,
            QStringLiteral(
                "INSERT INTO gold_judgement (uuid, article_id, item_key, value, "
                "decided_by, decided_at, rationale, deleted) SELECT j->>'uuid', "
                "(SELECT id FROM article WHERE uuid = j->>'article'), j->>'item', "
                "j->>'value', (SELECT id FROM coder WHERE uuid = j->>'decided_by'), "
                "j->>'decided_at', j->>'rationale', j->>'deleted' FROM (SELECT ?1 AS j) WHERE "
                "true ON CONFLICT (uuid) DO UPDATE SET value = excluded.value, decided_by = "
                "excluded.decided_by, decided_at = excluded.decided_at, rationale = "
                "excluded.rationale, deleted = excluded.deleted"),
            json);
    case SharedKind::GoldRejection:
        return runJson(db,
            QStringLiteral("INSERT INTO gold_rejection (uuid, annotation_id, decided_by, "
                           "decided_at, rationale, deleted) SELECT j->>'uuid', (SELECT id FROM "
                           "annotation WHERE uuid = j->>'annotation'), (SELECT id FROM coder "
                           "WHERE uuid = j->>'decided_by'), j->>'decided_at', j->>'rationale', "
                           "j->>'deleted' FROM (SELECT ?1 AS j) WHERE true ON CONFLICT (uuid) DO "
                           "UPDATE SET decided_by = excluded.decided_by, decided_at = "
                           "excluded.decided_at, rationale = excluded.rationale, deleted = "
                           "excluded.deleted"),
            json);
    case SharedKind::Event:
        return {};
    }
    return {};
}

Result<QHash<QString, QString>> settingsWithPrefix(const Database &db, const QString &prefix)
{
    auto stmt = db.prepare(QStringLiteral(
        "SELECT key, value FROM project_setting WHERE substr(key, 1, length(?1)) = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, prefix);
    QHash<QString, QString> out;
    FOURFOLD_TRY_STATUS(forEachRow(
        *stmt,
        [](const Statement &st) {
            return std::pair {st.columnText(0), st.columnText(1)};
        },
        [&](std::pair<QString, QString> &&kv) -> Status {
            out.insert(kv.first, kv.second);
            return {};
        }));
    return out;
}

Status forEachSharedRow(
    const Database &db, SharedKind kind, const std::function<Status(const QByteArray &)> &visit)
{
    auto stmt = db.prepare(sharedRowSql(kind, false, false));
    if (!stmt)
        return std::unexpected(stmt.error());
    return forEachRow(
        *stmt,
        [](const Statement &s) {
            const QByteArrayView json = s.columnUtf8(1);
            return QByteArray(json.data(), json.size());
        },
        visit);
}

Status forEachSharedRowKey(const Database &db, SharedKind kind,
    const std::function<Status(const QString &, const QByteArray &)> &visit)
{
    auto stmt = db.prepare(sharedRowSql(kind, true, false));
    if (!stmt)
        return std::unexpected(stmt.error());
    return forEachRow(
        *stmt,
        [](const Statement &s) {
            const QByteArrayView json = s.columnUtf8(1);
            return std::pair {s.columnText(0), QByteArray(json.data(), json.size())};
        },
        [&](std::pair<QString, QByteArray> &&row) { return visit(row.first, row.second); });
}

Status forEachEventAfter(const Database &db, qint64 afterId,
    const std::function<Status(qint64, const QByteArray &)> &visit)
{
    auto stmt = db.prepare(sharedRowSql(SharedKind::Event, false, false)
                               .replace(QLatin1String(" ORDER BY e.id"),
                                   QLatin1String(" WHERE e.id > ?1 ORDER BY e.id")));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, afterId);
    return forEachRow(
        *stmt,
        [](const Statement &s) {
            const QByteArrayView json = s.columnUtf8(1);
            return std::pair {s.columnInt(0), QByteArray(json.data(), json.size())};
        },
        [&](std::pair<qint64, QByteArray> &&row) { return visit(row.first, row.second); });
}

Result<QByteArrayList> sharedRowsOf(const Database &db, SharedKind kind, const QStringList &keys)
{
    QByteArrayList out;
    if (keys.isEmpty())
        return out;
    auto stmt = db.prepare(sharedRowSql(kind, false, true));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1,
        QString::fromUtf8(
            QJsonDocument(QJsonArray::fromStringList(keys)).toJson(QJsonDocument::Compact)));
    FOURFOLD_TRY_STATUS(forEachRow(
        *stmt,
        [](const Statement &s) {
            const QByteArrayView json = s.columnUtf8(1);
            return QByteArray(json.data(), json.size());
        },
        [&](QByteArray &&json) -> Status {
            out.push_back(std::move(json));
            return {};
        }));
    return out;
}

} // namespace fourfold::store
