#pragma once
// Checks every reader makes before and while it reads an input: readers read to the end of a
// file, so a device (/dev/zero), a pipe or a folder — named directly or through a symbolic link
// — would keep them reading forever or fail obscurely, and a reader that holds a whole file must
// not take whatever size it is given.

#include "core/model/error.h"

#include <QByteArray>
#include <QString>

namespace fourfold {

// The longest codebook file, in bytes (16 MiB).
inline constexpr qint64 maxCodebookFileSize = qint64(16) << 20;
// The longest file a reader holds whole (an extractor's span file, a reliability matrix), in
// bytes (1 GiB).
inline constexpr qint64 maxWholeFileSize = qint64(1) << 30;

// Fails with Io naming `path` ("this is not a regular file") when it exists and is not a
// regular file; a missing file passes, for the reader's own open error to name it.
Status requireRegularFile(const QString &path);

// Reads the whole of the regular file `path`, which may be at most `maxBytes` long. Fails with
// Io naming the file when it is not a regular file or cannot be read, with InvalidInput naming
// the file and the limit (in MiB) when it is longer; the file's size is checked before reading
// and the reading stops at the limit, so a file that grows meanwhile is refused too.
Result<QByteArray> readWholeFile(const QString &path, qint64 maxBytes);

} // namespace fourfold
