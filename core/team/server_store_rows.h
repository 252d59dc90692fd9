#pragma once
// Writing shared rows to a team project's server: each row is a JSON object whose keys are the
// server table's column names (core/store/shared_rows.h and the coder objects of
// core/store/copy_tables.h, in portable form). Rows go in batches, one statement per batch.

#include "core/model/error.h"

#include <QByteArray>
#include <QByteArrayList>
#include <QStringList>

namespace fourfold {

class ServerConnection;

// The server's tables of shared rows.
enum class ServerTable {
    Person,
    CodebookVersion,
    Article,
    Assignment,
    Annotation,
    Link,
    Judgement,
    GoldAnnotation,
    GoldSource,
    GoldJudgement,
    GoldRejection,
    Event,
};

// The table's name in the schema "fourfold".
const char *serverTableName(ServerTable table);

// Inserts `rows` (compact JSON objects, UTF-8) into `table` in one statement. Keys the table does
// not have are ignored, missing ones take the column's default; the change number is the
// server's. Fails with the server's error (Constraint, NotAllowed …).
Status insertServerRows(ServerConnection &conn, ServerTable table, const QByteArrayList &rows);

// Every row of `table` the connected role may see, as compact JSON objects with the same keys
// insertServerRows takes (no change stamp, no event id), in change order; `*lastChange` is
// raised to the highest change number among them. Fails with the server's error.
Result<QByteArrayList> selectServerRows(
    ServerConnection &conn, ServerTable table, qint64 *lastChange);

// Inserts or overwrites by uuid `rows` of `table` in one statement; an assignment's
// "active_seconds" is written only with a new assignment (coding time goes by sendCodingTimes);
// gold sources and events the server has already are left as they are. Fails with the server's
// error (NotAllowed when a row is not the role's to write).
Status upsertServerObjects(ServerConnection &conn, ServerTable table, const QByteArrayList &rows);

// The rows of `table` the role may see that changed after `afterChange` or were written by a
// transaction at or after `fromXact` (one that may have been running when the last pull took
// its snapshot, holding a lower change number), in change order; `*lastChange` is raised as in
// selectServerRows.
Result<QByteArrayList> selectServerRowsSince(ServerConnection &conn, ServerTable table,
    qint64 afterChange, const QString &fromXact, qint64 *lastChange);

// Records each working file's total coding time on an assignment: `rows` are JSON objects
// {"assignment": UUID, "source": FILE MARK, "seconds": TOTAL}; a total only grows, and what it
// grew by is added to the assignment's active_seconds (by the server's trigger). Sending the same
// totals again changes nothing. Fails with the server's error.
Status sendCodingTimes(ServerConnection &conn, const QByteArrayList &rows);

// The rows of `table` (one with a uuid) the role may see whose uuid is in `uuids` (lower-case
// uuid text), in change order.
Result<QByteArrayList> selectServerRowsByUuid(
    ServerConnection &conn, ServerTable table, const QStringList &uuids);

// The oldest transaction still running as this one sees it (pg_snapshot_xmin of the current
// snapshot), as text: the next pull reads again whatever such transactions wrote.
Result<QString> serverSnapshotXmin(ServerConnection &conn);

// How many rows of `table` the connected role may see.
Result<qint64> visibleServerRows(ServerConnection &conn, ServerTable table);

} // namespace fourfold
