#pragma once
// A team sync's shared rows: people, codebook versions, articles and gold, which leads write and
// everyone reads as far as the server lets them, and the event log, to which each working file
// adds its own events. team_sync.cpp moves the coders' objects and calls this inside the same
// two transactions (the file's and the server's).

#include "core/model/error.h"
#include "core/store/shared_rows.h"
#include "core/team/server_store_rows.h"

#include <QHash>
#include <QMap>
#include <QString>
#include <QStringList>

#include <array>
#include <vector>

namespace fourfold {

class Database;
class ServerConnection;

// A shared row's digest as a sync compares it (hex SHA-1 of its JSON with sorted keys, an
// article without its text and units, which never change): the same whether the row comes from
// the file (store::forEachSharedRowKey) or from the server.
QString sharedRowDigest(const QByteArray &json);

// The kinds a sync moves, references first: `before` ones go ahead of the coders' objects, the
// gold after them (it refers to coders' spans).
struct SharedPart {
    store::SharedKind kind;
    ServerTable table;
    const char *name; // in base keys: "team.base:NAME/KEY"
    bool before;
};
inline constexpr std::array<SharedPart, 7> kSharedParts {{
    {store::SharedKind::Person, ServerTable::Person, "person", true},
    {store::SharedKind::CodebookVersion, ServerTable::CodebookVersion, "codebook_version", true},
    {store::SharedKind::Article, ServerTable::Article, "article", true},
    {store::SharedKind::GoldAnnotation, ServerTable::GoldAnnotation, "gold_annotation", false},
    {store::SharedKind::GoldSource, ServerTable::GoldSource, "gold_source", false},
    {store::SharedKind::GoldJudgement, ServerTable::GoldJudgement, "gold_judgement", false},
    {store::SharedKind::GoldRejection, ServerTable::GoldRejection, "gold_rejection", false},
}};

// The shared rows of a lead's file changed since their last sync (or never synced), by kind
// name; what the next sync sends of them. `bases` are the file's "team.base:" settings.
Result<QMap<QString, qint64>> sharedRowsWaiting(
    const Database &db, const QHash<QString, QString> &bases);

// Records every shared row of the file as synced in its present state (publish and join).
Status recordSharedBases(Database &db);
// Records the row `key` of `kind` as synced in its present state (a row sent outside a sync).
Status recordSharedBase(Database &db, store::SharedKind kind, const QString &key);

class SharedRowSync
{
public:
    // `lead`: the file's person may write shared rows (a coder's file only receives them).
    SharedRowSync(
        Database &db, ServerConnection &conn, bool lead, const QHash<QString, QString> &bases);

    // Reads the file's rows with their digests and the server's rows changed after
    // `afterChange` or written by transactions from `fromXact` on; `*lastChange` is raised to the
    // highest change number read.
    Status read(qint64 afterChange, const QString &fromXact, qint64 *lastChange);
    // Fetches the articles named in `articleUuids` that neither the file nor this pull holds: a
    // coder's newly assigned articles (their rows did not change; the coder's right to read
    // them did).
    Status fetchMissingArticles(const QStringList &articleUuids);
    // Decides each row: changed only here → sent (a lead's file); only on the server → written
    // here; on both → for gold the later decision wins (ties by the higher digest), for people,
    // codebook versions and articles the server's; the version that lost is kept in this file's
    // event log ("team.sync.overwritten", its JSON in the detail). Counts conflicts.
    Status decide(qint64 *conflicts);
    // Sends the decided rows of the `before` kinds or of the others, in batches.
    Status push(bool before, qint64 *pushed);
    // Writes the decided server rows of the `before` kinds or of the others into the file.
    Status writeHere(bool before, qint64 *pulled);
    // Records the synced version of every row sent, received or found equal.
    Status recordBases();

private:
    struct ServerRow {
        QString key;
        QByteArray json;
        QString digest;
    };
    struct Part {
        QHash<QString, QString> local; // key → digest (the file's rows)
        std::vector<ServerRow> pulled;
        QStringList send; // keys
        std::vector<const ServerRow *> write;
        QHash<QString, QString> synced; // key → digest known to be on both sides
    };
    bool changedHere(const SharedPart &part, const QString &key, const QString &digest) const;

    Database &m_db;
    ServerConnection &m_conn;
    bool m_lead;
    const QHash<QString, QString> &m_bases;
    std::array<Part, kSharedParts.size()> m_parts;
};

// Sends the file's events after `*lastEvent` (a coder's file: only those of `personUuid`, the
// server takes no other) as coming from `source`, and raises `*lastEvent` to the last one. An
// event the server has already (a sync cut off after the server's commit) stays as it is.
Status pushEvents(Database &db, ServerConnection &conn, const QString &source,
    const QString &personUuid, qint64 *lastEvent, qint64 *pushed);

} // namespace fourfold
