#pragma once
// One check every reader makes before it opens an input: readers read to the end of a file, so
// a device (/dev/zero), a pipe or a folder — named directly or through a symbolic link — would
// keep them reading forever or fail obscurely.

#include "core/model/error.h"

#include <QString>

namespace fourfold {

// Fails with Io naming `path` ("this is not a regular file") when it exists and is not a
// regular file; a missing file passes, for the reader's own open error to name it.
Status requireRegularFile(const QString &path);

} // namespace fourfold
