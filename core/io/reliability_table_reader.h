#pragma once
// A raw reliability matrix from a CSV file (RFC 4180): a header row `unit,<coder>,<coder>,...`
// and one row per unit; an empty cell is missing (the coder did not code the unit).

#include "core/model/error.h"
#include "core/model/reliability_table.h"

#include <QByteArray>
#include <QString>

namespace fourfold {

// Reads `path` into a table whose units carry their ids and lines. Fails with InvalidInput naming
// file and line for: invalid UTF-8, bad quoting, an empty file, a header whose first column is not
// "unit", fewer than two coders, an empty or repeated coder name, a row with the wrong number of
// fields, an empty or repeated unit id, or no rows at all; Io if the file cannot be read.
Result<ReliabilityTable> readReliabilityTable(const QString &path);

// The same reading of a file's bytes through the decoded text, checking everything and saying
// what is wrong. readReliabilityTable first reads the bytes directly (without a string per
// cell, see reliability_table_bytes.h) and comes here only when that reading finds something it
// does not take; both give the same table (a test and the fuzz target compare them).
Result<ReliabilityTable> readReliabilityTableDecoded(const QByteArray &bytes, const QString &path);

} // namespace fourfold
