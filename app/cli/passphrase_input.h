#pragma once
// Passphrases for the command line: read from a file or standard input, never taken from the
// command line itself (where other users of the machine could read them).

#include "core/model/error.h"

#include <QString>

namespace fourfold::cli {

// The first line of `path` ("-" = standard input), without its line end. Io when it cannot be
// read, InvalidInput when it is not UTF-8.
Result<QString> readPassphrase(const QString &path);

} // namespace fourfold::cli
