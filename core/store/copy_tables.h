#pragma once
// The SQL of coder copies (see core/project/coder_copies.h): writing a copy's rows from its
// project, the portable form of a coder's objects (row ids replaced by uuids, so that a copy and
// its project can be compared), the common base of both, merge records and merge conflicts.

#include "core/model/error.h"
#include "core/model/ids.h"
#include "core/model/merge_conflict.h"

#include <QHash>
#include <QJsonObject>
#include <QString>
#include <QStringList>

#include <optional>
#include <vector>

namespace fourfold {
class Database;
namespace store {

// One object of a coder in portable form: references are uuids (article, coder, codebook
// version, annotation), never row ids. `content` holds every column that a merge compares and
// writes; assignments are identified by (article, coder, phase), so `key` is "assignment/"
// + article uuid + "/" + phase for them and "TYPE/UUID" for the rest.
struct PortableRow {
    QString type; // "annotation", "link", "judgement", "assignment"
    QString uuid;
    QJsonObject content;
    qint64 seconds = 0; // assignments: active coding time (merged by adding, not compared)

    // "TYPE/ID", where ID is the uuid, or "ARTICLE-UUID/PHASE" for an assignment.
    QString key() const;
    QString baseId() const; // ID alone, as copy_base stores it
    // SHA-256 (lower-case hex) of the compact JSON of `content` without "modified_at", so two
    // rows with the same values have the same digest wherever they live.
    QString digest() const;
    bool isDeleted() const;
};

// The portable rows of one coder, tombstones included: assignments, annotations, judgements,
// and links whose source annotation is the coder's; in that order (the order a merge writes
// them: a link needs its annotations first), then by uuid.
Result<std::vector<PortableRow>> portableRows(const Database &db, const QString &coderUuid);
// How many annotations, judgements, assignments and links of `db` are not `coderUuid`'s.
Result<qint64> rowsOfOtherCoders(const Database &db, const QString &coderUuid);

// Inserts or overwrites (by uuid; assignments by article, coder and phase) the object `row`,
// mapping its uuids to this file's row ids. An assignment's active time is set only when it is
// inserted. Constraint if a reference is missing or the uuid belongs to another coder's object.
Status writePortableRow(Database &db, const PortableRow &row);
// Adds `seconds` of active time to the assignment `row` names (article, coder, phase).
Status addPortableSeconds(Database &db, const PortableRow &row, qint64 seconds);
// The live judgement with the same article, coder, item and phase as `row` but another uuid.
Result<std::optional<QString>> otherLiveJudgement(const Database &db, const PortableRow &row);
// Tombstones the judgement `uuid` (modified now).
Status tombstoneJudgement(Database &db, const QString &uuid);
// Tombstones the judgement `uuid` keeping its modification time: a merge that sets aside an
// answer writes the same row whatever the order of the copies.
Status setAsideJudgement(Database &db, const QString &uuid);
// What the uuid `uuid` already names in this file other than a `type` object of the coder
// `coderUuid` (for assignments: of that coder): e.g. "gold span", "annotation of another coder",
// "article"; empty if nothing else. Looks in every table whose rows have a uuid.
Result<QString> otherUseOfUuid(
    const Database &db, const QString &uuid, const QString &type, const QString &coderUuid);

// --- the common base ------------------------------------------------------------------------
struct BaseEntry {
    QString digest;
    qint64 seconds = 0;
};
// The base rows of `copyUuid`, by PortableRow::key().
Result<QHash<QString, BaseEntry>> copyBase(const Database &db, const QString &copyUuid);
// Sets the base entry of the object `row` names (its type and baseId()) for `copyUuid`.
Status setCopyBase(
    Database &db, const QString &copyUuid, const PortableRow &row, const BaseEntry &entry);
// The smallest copy uuid other than `exceptCopy` whose base entry for the object `row` names has
// the digest `digest`; empty if none.
Result<QString> copyWithBase(
    const Database &db, const PortableRow &row, const QString &digest, const QString &exceptCopy);
// The time (ISO 8601 UTC) of this project's "copy.handout" event for `copyUuid`, if there is one.
Result<std::optional<QString>> handoutTime(const Database &db, const QString &copyUuid);

// --- writing a copy -------------------------------------------------------------------------
// Attaches the project file `sourcePath` as schema "src" of `copyDb` (outside a transaction).
Status attachSource(Database &copyDb, const QString &sourcePath);
Status detachSource(Database &copyDb);
// Copies from "src" into the (empty, current-schema) main schema of `copyDb`: the name and
// default-language settings, the coder `coderUuid` alone, every codebook version (without who
// made it), the live articles assigned to the coder (text, units, paragraphs; not the import
// source path), the coder's assignments, annotations, judgements on them and links between
// them. Nothing else: no other coder, gold, extractor run, event or setting.
Status copyHandoutRows(Database &copyDb, const QString &coderUuid);

// --- articles -------------------------------------------------------------------------------
struct ArticleFingerprint {
    QString uuid;
    QString externalId;
    QString text;
    QString sha256;
};
// Every article row (live or not) with its text and stored SHA-256.
Result<std::vector<ArticleFingerprint>> articleFingerprints(const Database &db);
// The stored SHA-256 of the article `uuid`, if there is one.
Result<std::optional<QString>> articleSha256(const Database &db, const QString &uuid);
// The uuid of every codebook version.
Result<QStringList> codebookVersionUuids(const Database &db);

// --- the copy's event log ---------------------------------------------------------------------
struct CopyEvent {
    qint64 id = 0; // in the copy's log
    QString at;
    bool byCoder = false; // made by a person (the copy's coder), not by the program
    QString coderUuid; // that person's uuid in the copy ("" if unknown or by the program)
    QString action;
    QString objectType;
    QString objectUuid;
    QJsonObject detail;
};
// The events of a copy's log after `afterId`, oldest first.
Result<std::vector<CopyEvent>> copyEvents(const Database &db, qint64 afterId);
// The id of the last event of copy `copyUuid` taken into this project's log (0 if none), as
// recorded in copy_merge.
Result<qint64> lastMergedCopyEvent(const Database &db, const QString &copyUuid);
// Appends `event` of copy `copyUuid` to this project's log, keeping its time; `actor` is the
// coder in this project. Its detail gains {"copy": copyUuid}.
Status appendCopyEvent(
    Database &db, const CopyEvent &event, CoderId actor, const QString &copyUuid);

// --- merge records and conflicts -------------------------------------------------------------
// Records a merge of copy `copyUuid`; `detail` may hold "events_through" (see
// lastMergedCopyEvent).
Status insertCopyMerge(
    Database &db, const QString &copyUuid, CoderId coder, const QJsonObject &detail);

// Conflicts ordered by detection; open ones only unless `all`.
Result<std::vector<MergeConflict>> mergeConflicts(const Database &db, bool all);
// Marks the conflict `uuid` resolved with "mine" or "theirs" (now). NotFound if not open.
Status setConflictResolution(Database &db, const QString &uuid, const QString &resolution);
// Opens the resolved conflict `uuid` again (the undo of a decision). NotFound if not resolved.
Status reopenConflict(Database &db, const QString &uuid);
// The object `type`/`uuid` of any coder in portable form (tombstones included); none if no such
// object. Reads the rows of the coder it belongs to.
Result<std::optional<PortableRow>> portableRowOf(
    const Database &db, const QString &type, const QString &uuid);
// The open conflicts of the object `objectType`/`objectUuid` (of any copy), by detection.
Result<std::vector<MergeConflict>> openConflictsOf(
    const Database &db, const QString &objectType, const QString &objectUuid);
// Adds the open conflict `conflict` (uuid made here, detected now).
Status insertConflict(Database &db, const MergeConflict &conflict);
// Replaces the versions of the open conflict `uuid`.
Status updateConflict(
    Database &db, const QString &uuid, const QJsonObject &mine, const QJsonObject &theirs);
// Removes the open conflict `uuid`, whose losing version a later copy superseded.
Status removeConflict(Database &db, const QString &uuid);

} // namespace store
} // namespace fourfold
