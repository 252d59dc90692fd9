#include "core/team/server_store_rows.h"

#include "core/team/server_store_connection.h"

#include <QString>
#include <QStringList>

#include <algorithm>

namespace fourfold {

namespace {

// The columns a row brings (everything but the change stamp and the event's own id).
const char *columnsOf(ServerTable table)
{
    switch (table) {
    case ServerTable::Person:
        return "uuid, name, pseudonym, role, created_at, deleted, disabled";
    case ServerTable::CodebookVersion:
        return "uuid, number, created_at, created_by, note, content";
    case ServerTable::Article:
        return "uuid, external_id, title, outlet, published, language, text, length, sha256, "
               "metadata, imported_at, deleted, paragraphs, sentences, tokens";
    case ServerTable::Assignment:
        return "uuid, article, coder, phase, status, created_at, deleted, active_seconds";
    case ServerTable::Annotation:
        return "uuid, article, coder, function, start, \"end\", quote, attributes, note, "
               "confidence, codebook_version, phase, created_at, modified_at, deleted";
    case ServerTable::Link:
        return "uuid, source, target, coder, type, created_at, deleted";
    case ServerTable::Judgement:
        return "uuid, article, coder, item, value, codebook_version, phase, created_at, "
               "modified_at, deleted";
    case ServerTable::GoldAnnotation:
        return "uuid, article, function, start, \"end\", quote, attributes, decided_by, "
               "decided_at, rationale, deleted";
    case ServerTable::GoldSource:
        return "gold, annotation";
    case ServerTable::GoldJudgement:
        return "uuid, article, item, value, decided_by, decided_at, rationale, deleted";
    case ServerTable::GoldRejection:
        return "uuid, annotation, decided_by, decided_at, rationale, deleted";
    case ServerTable::Event:
        return "source, source_id, at, person, action, object_type, object_uuid, detail";
    }
    return "";
}

// `rows` (compact JSON objects) as one JSON array: the one parameter a batch statement binds.
QByteArray jsonArrayOf(const QByteArrayList &rows)
{
    qsizetype bytes = 2;
    for (const QByteArray &row : rows)
        bytes += row.size() + 1;
    QByteArray array;
    array.reserve(bytes);
    array += '[';
    for (qsizetype i = 0; i < rows.size(); ++i) {
        if (i)
            array += ',';
        array += rows[i];
    }
    array += ']';
    return array;
}

} // namespace

const char *serverTableName(ServerTable table)
{
    switch (table) {
    case ServerTable::Person:
        return "person";
    case ServerTable::CodebookVersion:
        return "codebook_version";
    case ServerTable::Article:
        return "article";
    case ServerTable::Assignment:
        return "assignment";
    case ServerTable::Annotation:
        return "annotation";
    case ServerTable::Link:
        return "link";
    case ServerTable::Judgement:
        return "judgement";
    case ServerTable::GoldAnnotation:
        return "gold_annotation";
    case ServerTable::GoldSource:
        return "gold_source";
    case ServerTable::GoldJudgement:
        return "gold_judgement";
    case ServerTable::GoldRejection:
        return "gold_rejection";
    case ServerTable::Event:
        return "event";
    }
    return "";
}

Status insertServerRows(ServerConnection &conn, ServerTable table, const QByteArrayList &rows)
{
    if (rows.isEmpty())
        return {};
    // Table and column names come from the lists above, never from data; the rows are one
    // bound parameter (a JSON array) that jsonb_populate_recordset turns into typed rows.
    const QString name = QLatin1String(serverTableName(table));
    const QString columns = QLatin1String(columnsOf(table));
    const QString sql = QStringLiteral("INSERT INTO fourfold.%1 (%2) SELECT %2 FROM "
                                       "jsonb_populate_recordset(NULL::fourfold.%1, $1::jsonb)")
                            .arg(name, columns);
    const QByteArray array = jsonArrayOf(rows);
    return conn.run(sql, {array});
}

Result<QByteArrayList> selectServerRows(
    ServerConnection &conn, ServerTable table, qint64 *lastChange)
{
    const QString name = QLatin1String(serverTableName(table));
    auto r =
        conn.query(QStringLiteral("SELECT (to_jsonb(t) - 'change' - 'change_xact' - 'id')::text, "
                                  "t.change FROM fourfold.%1 t ORDER BY t.change")
                       .arg(name));
    if (!r)
        return std::unexpected(r.error());
    QByteArrayList out;
    out.reserve(r->rows());
    for (int i = 0; i < r->rows(); ++i) {
        out.push_back(r->bytes(i, 0));
        if (lastChange)
            *lastChange = std::max(*lastChange, r->integer(i, 1));
    }
    return out;
}

Status upsertServerObjects(ServerConnection &conn, ServerTable table, const QByteArrayList &rows)
{
    if (rows.isEmpty())
        return {};
    const QString name = QLatin1String(serverTableName(table));
    const QStringList columns = QString::fromLatin1(columnsOf(table)).split(QStringLiteral(", "));
    if (table == ServerTable::GoldSource || table == ServerTable::Event) {
        // Rows without a uuid that never change: what the server has already stays.
        const QByteArray array = jsonArrayOf(rows);
        return conn.run(QStringLiteral("INSERT INTO fourfold.%1 (%2) SELECT %2 FROM "
                                       "jsonb_populate_recordset(NULL::fourfold.%1, $1::jsonb) "
                                       "ON CONFLICT (%3) DO NOTHING")
                            .arg(name, columns.join(QStringLiteral(", ")),
                                table == ServerTable::Event ? QStringLiteral("source, source_id")
                                                            : QStringLiteral("gold, annotation")),
            {array});
    }
    QStringList sets;
    for (const QString &c : columns) {
        if (c == QLatin1String("uuid"))
            continue;
        if (c == QLatin1String("active_seconds"))
            sets << QStringLiteral("active_seconds = fourfold.assignment.active_seconds + "
                                   "excluded.active_seconds");
        else
            sets << QStringLiteral("%1 = excluded.%1").arg(c);
    }
    const QString sql =
        QStringLiteral("INSERT INTO fourfold.%1 (%2) SELECT %2 FROM "
                       "jsonb_populate_recordset(NULL::fourfold.%1, $1::jsonb) "
                       "ON CONFLICT (uuid) DO UPDATE SET %3")
            .arg(name, columns.join(QStringLiteral(", ")), sets.join(QStringLiteral(", ")));
    const QByteArray array = jsonArrayOf(rows);
    if (table == ServerTable::Assignment) {
        // A coder may change its assignments but never insert one, and INSERT ... ON CONFLICT
        // needs the insert policy even where it updates: update first, then insert what is new
        // (only a lead has any). Coding time is not written here but by sendCodingTimes.
        QStringList updates;
        for (const QString &c : columns)
            if (c != QLatin1String("uuid") && c != QLatin1String("active_seconds"))
                updates << QStringLiteral("%1 = r.%1").arg(c);
        FOURFOLD_TRY_STATUS(conn.run(
            QStringLiteral("UPDATE fourfold.assignment a SET %1 FROM "
                           "jsonb_populate_recordset(NULL::fourfold.assignment, $1::jsonb) r "
                           "WHERE a.uuid = r.uuid")
                .arg(updates.join(QStringLiteral(", "))),
            {array}));
        return conn.run(
            QStringLiteral("INSERT INTO fourfold.assignment (%1) SELECT %1 FROM "
                           "jsonb_populate_recordset(NULL::fourfold.assignment, $1::jsonb) r "
                           "WHERE NOT EXISTS (SELECT 1 FROM fourfold.assignment a WHERE a.uuid = "
                           "r.uuid)")
                .arg(columns.join(QStringLiteral(", "))),
            {array});
    }
    return conn.run(sql, {array});
}

Result<QByteArrayList> selectServerRowsSince(ServerConnection &conn, ServerTable table,
    qint64 afterChange, const QString &fromXact, qint64 *lastChange)
{
    const QString name = QLatin1String(serverTableName(table));
    auto r = conn.query(
        QStringLiteral("SELECT (to_jsonb(t) - 'change' - 'change_xact' - 'id')::text, t.change "
                       "FROM fourfold.%1 t WHERE t.change > $1 OR t.change_xact >= $2::xid8 "
                       "ORDER BY t.change")
            .arg(name),
        {QByteArray::number(afterChange), fromXact.toLatin1()});
    if (!r)
        return std::unexpected(r.error());
    QByteArrayList out;
    out.reserve(r->rows());
    for (int i = 0; i < r->rows(); ++i) {
        out.push_back(r->bytes(i, 0));
        if (lastChange)
            *lastChange = std::max(*lastChange, r->integer(i, 1));
    }
    return out;
}

Status sendCodingTimes(ServerConnection &conn, const QByteArrayList &rows)
{
    if (rows.isEmpty())
        return {};
    const QByteArray array = jsonArrayOf(rows);
    return conn.run(
        QStringLiteral("INSERT INTO fourfold.coding_time (assignment, source, seconds) SELECT "
                       "assignment, source, seconds FROM jsonb_populate_recordset(NULL::"
                       "fourfold.coding_time, $1::jsonb) ON CONFLICT (assignment, source) DO "
                       "UPDATE SET seconds = excluded.seconds WHERE excluded.seconds > "
                       "fourfold.coding_time.seconds"),
        {array});
}

Result<QByteArrayList> selectServerRowsByUuid(
    ServerConnection &conn, ServerTable table, const QStringList &uuids)
{
    if (uuids.isEmpty())
        return QByteArrayList {};
    const QString name = QLatin1String(serverTableName(table));
    auto r = conn.query(
        QStringLiteral("SELECT (to_jsonb(t) - 'change' - 'change_xact' - 'id')::text FROM "
                       "fourfold.%1 t WHERE t.uuid = ANY($1::uuid[]) ORDER BY t.change")
            .arg(name),
        {QStringLiteral("{%1}").arg(uuids.join(QLatin1Char(','))).toLatin1()});
    if (!r)
        return std::unexpected(r.error());
    QByteArrayList out;
    out.reserve(r->rows());
    for (int i = 0; i < r->rows(); ++i)
        out.push_back(r->bytes(i, 0));
    return out;
}

Result<QString> serverSnapshotXmin(ServerConnection &conn)
{
    auto r = conn.query(QStringLiteral("SELECT pg_snapshot_xmin(pg_current_snapshot())::text"));
    if (!r)
        return std::unexpected(r.error());
    return r->text(0, 0);
}

Result<qint64> visibleServerRows(ServerConnection &conn, ServerTable table)
{
    auto r = conn.query(QStringLiteral("SELECT count(*) FROM fourfold.%1")
                            .arg(QLatin1String(serverTableName(table))));
    if (!r)
        return std::unexpected(r.error());
    return r->integer(0, 0);
}

} // namespace fourfold
