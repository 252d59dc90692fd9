#pragma once
// The rows of a project file that a team shares on a server (core/team), read in portable form:
// one JSON object per row whose keys are the server's column names and whose references are
// uuids, never row ids. The coder's own objects (assignments, annotations, answers, links) come
// from portableRows (copy_tables.h), the form coder copies compare and merge.

#include "core/model/error.h"

#include <QByteArray>
#include <QByteArrayList>
#include <QHash>
#include <QString>
#include <QStringList>

#include <functional>

namespace fourfold {
class Database;
namespace store {

// The kinds of shared rows read here, in the order a server must receive them (a row's
// references come before it).
enum class SharedKind {
    Person, // coder: uuid, name, pseudonym, role, created_at, deleted, disabled
    CodebookVersion, // uuid, number, created_at, created_by (person uuid or null), note, content
    Article, // uuid, external_id, title, outlet, published, language, text, length, sha256,
             // metadata, imported_at, deleted, paragraphs [{start,end,role}], sentences and
             // tokens ("\x" + hex of the stored little-endian int32 pairs)
    GoldAnnotation, // uuid, article, function, start, end, quote, attributes, decided_by,
                    // decided_at, rationale, deleted
    GoldSource, // gold, annotation: which coders' spans a gold span was decided from
    GoldJudgement, // uuid, article, item, value, decided_by, decided_at, rationale, deleted
    GoldRejection, // uuid, annotation, decided_by, decided_at, rationale, deleted
    Event, // source_id (the row id in this file), at, person (uuid or null), action,
           // object_type, object_uuid, detail
};

// Hands every row of `kind` to `visit` as compact JSON text (UTF-8), one row held at a time, in
// the file's row order (so a file written from them numbers its rows in the same order). Fails
// with the store's error, or the first failed visit's.
Status forEachSharedRow(
    const Database &db, SharedKind kind, const std::function<Status(const QByteArray &)> &visit);

// Hands every row of `kind` to `visit` with its key (its uuid; a gold source's
// "GOLD_UUID/ANNOTATION_UUID"; an event's row id) in the file's row order, an article without
// its text and units (its sha256 stands for them): what a team sync compares.
Status forEachSharedRowKey(const Database &db, SharedKind kind,
    const std::function<Status(const QString &key, const QByteArray &json)> &visit);

// The rows of `kind` whose keys (as forEachSharedRowKey gives them) are in `keys`, whole, in the
// file's row order.
Result<QByteArrayList> sharedRowsOf(const Database &db, SharedKind kind, const QStringList &keys);

// Hands the events of the file's log after the row id `afterId` to `visit` with their row ids,
// in order (JSON as forEachSharedRow hands it).
Status forEachEventAfter(const Database &db, qint64 afterId,
    const std::function<Status(qint64 id, const QByteArray &json)> &visit);

// Writes one shared row (JSON as forEachSharedRow hands it, or as a team project's server sends
// it) into this file, mapping uuids to row ids; references the file lacks become NULL where the
// column allows it (a codebook version's author) and fail with Constraint otherwise. A row the
// file holds already (by uuid) is written over where it may change (an article's text and units
// never do; a gold source is there or not). Events are not written. InvalidInput for a row that is
// not a JSON object or an article whose units are not "\x" + hex.
Status writeSharedRow(Database &db, SharedKind kind, const QByteArray &json);

// Every project setting whose key starts with `prefix`, by key (a team working file keeps the
// last synced version of each object as "team.base:" settings).
Result<QHash<QString, QString>> settingsWithPrefix(const Database &db, const QString &prefix);

} // namespace store
} // namespace fourfold
