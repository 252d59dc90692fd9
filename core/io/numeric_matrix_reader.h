#pragma once
// An articles × variables matrix of numbers from a CSV file (RFC 4180), for `frames --data`: a
// header row `<id column>,<variable>,<variable>,...` and one row per article, its id first. Every
// cell is a number (element indicators are 0 or 1); an empty cell is an error, not a zero.

#include "core/model/error.h"

#include <QString>
#include <QStringList>

#include <vector>

namespace fourfold {

struct NumericMatrix {
    QString source; // the file
    QStringList variables; // the header's names after the id column
    QStringList rows; // the article ids, in file order
    std::vector<double> values; // row-major: values[r * variables.size() + c]
};

// Reads `path`. Fails with InvalidInput made by failAt naming file and line for: invalid UTF-8,
// bad quoting, an empty file, a header without variables, an empty or repeated variable name, a
// row with the wrong number of fields, an empty or repeated article id, a cell that is empty or
// not a finite number (naming its column by number and variable), or no rows; Io if the file
// cannot be read.
Result<NumericMatrix> readNumericMatrix(const QString &path);

} // namespace fourfold
