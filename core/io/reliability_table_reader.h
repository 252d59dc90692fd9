#pragma once
// A raw reliability matrix from a CSV file (RFC 4180): a header row `unit,<coder>,<coder>,...`
// and one row per unit; an empty cell is missing (the coder did not code the unit).

#include "core/model/error.h"
#include "core/model/reliability_table.h"

#include <QString>

namespace fourfold {

// Reads `path` into a table whose units carry their ids and lines. Fails with InvalidInput naming
// file and line for: invalid UTF-8, bad quoting, an empty file, a header whose first column is not
// "unit", fewer than two coders, an empty or repeated coder name, a row with the wrong number of
// fields, an empty or repeated unit id, or no rows at all; Io if the file cannot be read.
Result<ReliabilityTable> readReliabilityTable(const QString &path);

} // namespace fourfold
