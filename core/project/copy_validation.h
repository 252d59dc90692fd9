#pragma once
// What a returned coder copy may hold, checked against the project's own record of what was
// handed out (see core/project/coder_copies.h). A copy is a file its coder could change with any
// SQLite tool, so nothing in it is believed because it is there: its rows must be the coder's
// own work on the articles handed out in this copy, its log only the coder's editing, dated
// between the hand-out and now, and its coding time no longer than the time since the hand-out.
// Every refusal is an InvalidInput error naming the file and the row or event.

#include "core/model/coder.h"
#include "core/model/error.h"
#include "core/store/copy_tables.h"

#include <QDateTime>
#include <QHash>
#include <QSet>
#include <QString>

#include <vector>

namespace fourfold {

class Database;

// How far a time in a copy may lie outside [hand-out, now] (seconds): the coder's computer
// keeps its own clock. One day (common practice: a tolerance well above the few minutes by
// which unsynchronised clocks drift, far below any backdating that matters).
inline constexpr qint64 kCopyClockAllowanceSeconds = 24 * 60 * 60;

// The project's record of one copy: when it was handed out, to whom, and the base of every
// object (as handed out, or as agreed at the copy's last merge).
struct CopyHandout {
    QString copyUuid;
    Coder coder; // as the project knows the coder
    QDateTime handedOutAt; // UTC, from the project's log
    QHash<QString, store::BaseEntry> base; // by PortableRow::key()
    QSet<QString> articles; // uuids of the articles handed out in this copy

    // The handed-out articles are those of the assignments in `base`.
    void collectArticles();
};

// Parses a stored time (ISO 8601 UTC with or without milliseconds); invalid if it is not one.
QDateTime parseStoredTime(const QString &text);

// Checks every portable row of the copy at `path`: its uuid names nothing else in the project
// `mainDb` (a gold span, another coder's object, an object of another type) nor another row of
// the copy; assignments are those handed out, with active seconds neither negative nor below
// the base, and together no more than the time since the hand-out (plus the allowance); spans
// and answers lie on articles handed out, spans quote their text (`texts`: article uuid → text);
// links join two spans of the copy; a row new or changed in the copy is dated within the
// allowance of [hand-out, `now`]. `externalIds` (article uuid → id) names articles in messages.
Status validateCopyRows(const Database &mainDb, const std::vector<store::PortableRow> &rows,
    const CopyHandout &handout, const QHash<QString, QString> &texts,
    const QHash<QString, QString> &externalIds, const QString &path, const QDateTime &now);

// Checks the events of the copy's log not yet merged: each dated within the allowance of
// [hand-out, `now`]; made by the copy's coder and of a kind coding produces (a span, link,
// answer or status edit, or its undo, with no detail, about an object no one else owns), or
// the program's own "copy.create" of this copy.
Status validateCopyEvents(const Database &mainDb, const std::vector<store::CopyEvent> &events,
    const CopyHandout &handout, const QString &path, const QDateTime &now);

} // namespace fourfold
