#pragma once
// A textual dump of every row of every table of a project file, for tests that prove an edit
// and its revert leave the file as it was.

#include "core/store/database.h"

#include <QString>
#include <QStringList>

namespace fourfold::test {

// Every row of every ordinary table (by name, then by rowid/primary key), one line a row,
// leaving out the tables in `skip` and FTS5's shadow tables.
QString dumpDatabase(const Database &db, const QStringList &skip = {QStringLiteral("event_log")});

// `dump` with every ISO 8601 time blanked: what a redo must restore exactly (it writes the same
// rows, at another time).
QString withoutTimes(QString dump);

} // namespace fourfold::test
