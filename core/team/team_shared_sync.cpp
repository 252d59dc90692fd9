#include "core/team/team_shared_sync.h"

#include "core/store/database.h"
#include "core/store/event_log.h"
#include "core/store/project_tables.h"
#include "core/store/store_util.h"
#include "core/team/server_store_connection.h"
#include "core/team/team_rows.h"

#include <QCryptographicHash>
#include <QJsonDocument>
#include <QJsonObject>

#include <algorithm>

namespace fourfold {

namespace {

// The JSON of a row without the columns that never change after import (an article's text and
// units) and with its keys sorted (QJsonObject keeps them sorted).
QJsonObject comparable(const QByteArray &json)
{
    QJsonObject row = QJsonDocument::fromJson(json).object();
    for (const char *key : {"text", "sentences", "tokens"})
        row.remove(QLatin1String(key));
    return row;
}

QString keyOf(const SharedPart &part, const QJsonObject &row)
{
    if (part.kind == store::SharedKind::GoldSource)
        return row.value(QLatin1String("gold")).toString() + QLatin1Char('/')
            + row.value(QLatin1String("annotation")).toString();
    return row.value(QLatin1String("uuid")).toString();
}

QString baseKey(const SharedPart &part, const QString &key)
{
    return QLatin1String(kTeamBasePrefix) + QLatin1String(part.name) + QLatin1Char('/') + key;
}

QString baseValue(const QString &digest)
{
    return digest + QStringLiteral(" 0");
}

bool isGold(const SharedPart &part)
{
    return !part.before;
}

// Rows go up in batches of about a megabyte of JSON (an article carries its text and units).
Status upsertInBatches(ServerConnection &conn, ServerTable table, const QByteArrayList &rows)
{
    QByteArrayList batch;
    qint64 bytes = 0;
    for (const QByteArray &row : rows) {
        batch.push_back(row);
        bytes += row.size();
        if (bytes > (1 << 20) || batch.size() >= 2000) {
            FOURFOLD_TRY_STATUS(upsertServerObjects(conn, table, batch));
            batch.clear();
            bytes = 0;
        }
    }
    return upsertServerObjects(conn, table, batch);
}

} // namespace

QString sharedRowDigest(const QByteArray &json)
{
    return QString::fromLatin1(QCryptographicHash::hash(
        QJsonDocument(comparable(json)).toJson(QJsonDocument::Compact), QCryptographicHash::Sha1)
                                   .toHex());
}

Result<QMap<QString, qint64>> sharedRowsWaiting(
    const Database &db, const QHash<QString, QString> &bases)
{
    QMap<QString, qint64> waiting;
    for (const SharedPart &part : kSharedParts) {
        FOURFOLD_TRY_STATUS(store::forEachSharedRowKey(
            db, part.kind, [&](const QString &key, const QByteArray &json) -> Status {
                const auto base = parseTeamBase(bases.value(baseKey(part, key)));
                if (!base || base->digest != sharedRowDigest(json))
                    ++waiting[QLatin1String(part.name)];
                return {};
            }));
    }
    return waiting;
}

Status recordSharedBases(Database &db)
{
    for (const SharedPart &part : kSharedParts) {
        std::vector<std::pair<QString, QString>> bases;
        FOURFOLD_TRY_STATUS(store::forEachSharedRowKey(
            db, part.kind, [&](const QString &key, const QByteArray &json) -> Status {
                bases.emplace_back(baseKey(part, key), baseValue(sharedRowDigest(json)));
                return {};
            }));
        for (const auto &[key, value] : bases)
            FOURFOLD_TRY_STATUS(store::setSetting(db, key, value));
    }
    return {};
}

Status recordSharedBase(Database &db, store::SharedKind kind, const QString &key)
{
    const auto part = std::ranges::find(kSharedParts, kind, &SharedPart::kind);
    auto rows = store::sharedRowsOf(db, kind, {key});
    if (!rows)
        return std::unexpected(rows.error());
    for (const QByteArray &json : *rows)
        FOURFOLD_TRY_STATUS(
            store::setSetting(db, baseKey(*part, key), baseValue(sharedRowDigest(json))));
    return {};
}

SharedRowSync::SharedRowSync(
    Database &db, ServerConnection &conn, bool lead, const QHash<QString, QString> &bases)
    : m_db(db)
    , m_conn(conn)
    , m_lead(lead)
    , m_bases(bases)
{ }

bool SharedRowSync::changedHere(
    const SharedPart &part, const QString &key, const QString &digest) const
{
    const auto base = parseTeamBase(m_bases.value(baseKey(part, key)));
    return !base || base->digest != digest;
}

Status SharedRowSync::read(qint64 afterChange, const QString &fromXact, qint64 *lastChange)
{
    for (size_t i = 0; i < kSharedParts.size(); ++i) {
        const SharedPart &part = kSharedParts[i];
        Part &state = m_parts[i];
        FOURFOLD_TRY_STATUS(store::forEachSharedRowKey(
            m_db, part.kind, [&](const QString &key, const QByteArray &json) -> Status {
                state.local.insert(key, sharedRowDigest(json));
                return {};
            }));
        auto rows = selectServerRowsSince(m_conn, part.table, afterChange, fromXact, lastChange);
        if (!rows)
            return std::unexpected(rows.error());
        state.pulled.reserve(rows->size());
        for (QByteArray &json : *rows) {
            const QJsonObject row = comparable(json);
            QString key = keyOf(part, row);
            QString digest = sharedRowDigest(json);
            state.pulled.push_back({std::move(key), std::move(json), std::move(digest)});
        }
    }
    return {};
}

Status SharedRowSync::fetchMissingArticles(const QStringList &articleUuids)
{
    constexpr size_t kArticle = 2;
    static_assert(kSharedParts[kArticle].kind == store::SharedKind::Article);
    Part &state = m_parts[kArticle];
    QSet<QString> have(state.local.keyBegin(), state.local.keyEnd());
    for (const ServerRow &row : state.pulled)
        have.insert(row.key);
    QStringList missing;
    for (const QString &uuid : articleUuids)
        if (!have.contains(uuid)) {
            missing.push_back(uuid);
            have.insert(uuid);
        }
    auto rows = selectServerRowsByUuid(m_conn, ServerTable::Article, missing);
    if (!rows)
        return std::unexpected(rows.error());
    for (QByteArray &json : *rows) {
        QString key = keyOf(kSharedParts[kArticle], comparable(json));
        QString digest = sharedRowDigest(json);
        state.pulled.push_back({std::move(key), std::move(json), std::move(digest)});
    }
    return {};
}

Status SharedRowSync::decide(qint64 *conflicts)
{
    for (size_t i = 0; i < kSharedParts.size(); ++i) {
        const SharedPart &part = kSharedParts[i];
        Part &state = m_parts[i];
        QSet<QString> pulledKeys;
        for (const ServerRow &row : state.pulled) {
            pulledKeys.insert(row.key);
            const auto local = state.local.constFind(row.key);
            if (local != state.local.cend() && *local == row.digest) {
                state.synced.insert(row.key, row.digest);
                continue;
            }
            if (!m_lead || local == state.local.cend() || !changedHere(part, row.key, *local)) {
                state.write.push_back(&row);
                continue;
            }
            // Changed on both sides.
            ++*conflicts;
            auto mine = store::sharedRowsOf(m_db, part.kind, {row.key});
            if (!mine)
                return std::unexpected(mine.error());
            const QJsonObject here = comparable(mine->value(0));
            const QJsonObject there = comparable(row.json);
            bool keepMine = false;
            if (isGold(part)) {
                const QString a = here.value(QLatin1String("decided_at")).toString();
                const QString b = there.value(QLatin1String("decided_at")).toString();
                keepMine = a != b ? a > b : *local > row.digest;
            }
            const QJsonObject &lost = keepMine ? there : here;
            QJsonObject detail {{QStringLiteral("lost"), lost},
                {QStringLiteral("kept"),
                    keepMine ? QStringLiteral("file") : QStringLiteral("server")}};
            FOURFOLD_TRY_STATUS(
                store::appendEvent(m_db, CoderId {}, QStringLiteral("team.sync.overwritten"),
                    QLatin1String(part.name), row.key, detail));
            if (keepMine)
                state.send.push_back(row.key);
            else
                state.write.push_back(&row);
        }
        if (!m_lead)
            continue;
        for (auto it = state.local.cbegin(); it != state.local.cend(); ++it)
            if (!pulledKeys.contains(it.key()) && changedHere(part, it.key(), it.value()))
                state.send.push_back(it.key());
    }
    return {};
}

Status SharedRowSync::push(bool before, qint64 *pushed)
{
    for (size_t i = 0; i < kSharedParts.size(); ++i) {
        const SharedPart &part = kSharedParts[i];
        Part &state = m_parts[i];
        if (part.before != before || state.send.isEmpty())
            continue;
        auto rows = store::sharedRowsOf(m_db, part.kind, state.send);
        if (!rows)
            return std::unexpected(rows.error());
        FOURFOLD_TRY_STATUS(upsertInBatches(m_conn, part.table, *rows));
        *pushed += rows->size();
        for (const QString &key : std::as_const(state.send))
            state.synced.insert(key, state.local.value(key));
    }
    return {};
}

Status SharedRowSync::writeHere(bool before, qint64 *pulled)
{
    for (size_t i = 0; i < kSharedParts.size(); ++i) {
        const SharedPart &part = kSharedParts[i];
        Part &state = m_parts[i];
        if (part.before != before)
            continue;
        for (const ServerRow *row : state.write) {
            FOURFOLD_TRY_STATUS(store::writeSharedRow(m_db, part.kind, row->json));
            ++*pulled;
        }
    }
    return {};
}

Status SharedRowSync::recordBases()
{
    for (size_t i = 0; i < kSharedParts.size(); ++i) {
        const SharedPart &part = kSharedParts[i];
        Part &state = m_parts[i];
        // A row written here is recorded as the file now holds it.
        QStringList written;
        for (const ServerRow *row : state.write)
            written.push_back(row->key);
        auto rows = store::sharedRowsOf(m_db, part.kind, written);
        if (!rows)
            return std::unexpected(rows.error());
        for (const QByteArray &json : *rows)
            state.synced.insert(keyOf(part, comparable(json)), sharedRowDigest(json));
        for (auto it = state.synced.cbegin(); it != state.synced.cend(); ++it)
            FOURFOLD_TRY_STATUS(
                store::setSetting(m_db, baseKey(part, it.key()), baseValue(it.value())));
    }
    return {};
}

Status pushEvents(Database &db, ServerConnection &conn, const QString &source,
    const QString &personUuid, qint64 *lastEvent, qint64 *pushed)
{
    QByteArrayList rows;
    qint64 last = *lastEvent;
    FOURFOLD_TRY_STATUS(
        store::forEachEventAfter(db, *lastEvent, [&](qint64 id, const QByteArray &json) -> Status {
            last = std::max(last, id);
            QJsonObject event = QJsonDocument::fromJson(json).object();
            if (!personUuid.isEmpty()
                && event.value(QLatin1String("person")).toString() != personUuid)
                return {};
            event.insert(QStringLiteral("source"), source);
            rows.push_back(QJsonDocument(event).toJson(QJsonDocument::Compact));
            return {};
        }));
    FOURFOLD_TRY_STATUS(upsertInBatches(conn, ServerTable::Event, rows));
    *pushed += rows.size();
    *lastEvent = last;
    return {};
}

} // namespace fourfold
