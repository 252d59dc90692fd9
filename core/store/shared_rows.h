#pragma once
// The rows of a project file that a team shares on a server (core/team), read in portable form:
// one JSON object per row whose keys are the server's column names and whose references are
// uuids, never row ids. The coder's own objects (assignments, annotations, answers, links) come
// from portableRows (copy_tables.h), the form coder copies compare and merge.

#include "core/model/error.h"

#include <QByteArray>
#include <QHash>
#include <QString>

#include <functional>

namespace fourfold {
class Database;
namespace store {

// The kinds of shared rows read here, in the order a server must receive them (a row's
// references come before it).
enum class SharedKind {
    Person, // coder: uuid, name, pseudonym, role, created_at, deleted
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

// Writes one shared row (JSON as forEachSharedRow hands it, or as a team project's server sends
// it) into this file, mapping uuids to row ids; references the file lacks become NULL where the
// column allows it (a codebook version's author) and fail with Constraint otherwise. Events are
// not written. InvalidInput for a row that is not a JSON object or an article whose units are
// not "\x" + hex.
Status writeSharedRow(Database &db, SharedKind kind, const QByteArray &json);

// Every project setting whose key starts with `prefix`, by key (a team working file keeps the
// last synced version of each object as "team.base:" settings).
Result<QHash<QString, QString>> settingsWithPrefix(const Database &db, const QString &prefix);

} // namespace store
} // namespace fourfold
