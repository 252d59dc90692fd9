#pragma once
// A raw reliability matrix from a CSV file (RFC 4180): a header row `unit,<coder>,<coder>,...`
// and one row per unit; an empty cell is missing (the coder did not code the unit).

#include "core/model/error.h"

#include <QString>
#include <QStringList>

#include <vector>

namespace fourfold {

struct ReliabilityTable {
    QStringList coders; // from the header, in order
    QStringList units; // first column of each row
    std::vector<QStringList> cells; // per unit, one trimmed cell per coder ("" = missing)
    std::vector<qint64> lines; // the line each unit's row begins on
    QString source; // the file, for messages
    // The text read from the file when the unit ids refer into it rather than holding copies
    // (QString::fromRawData); kept with the table, and shared by its copies, for as long as they
    // live.
    QString storage;
    // More text unit ids refer into (a table built from a project keeps one per article).
    std::vector<QString> storageParts;
};

// Reads `path`. Fails with InvalidInput naming file and line for: invalid UTF-8, bad quoting,
// an empty file, a header whose first column is not "unit", fewer than two coders, an empty or
// repeated coder name, a row with the wrong number of fields, an empty or repeated unit id, or
// no rows at all; Io if the file cannot be read.
Result<ReliabilityTable> readReliabilityTable(const QString &path);

} // namespace fourfold
