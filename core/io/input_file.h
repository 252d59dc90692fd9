#pragma once
// Checks every reader makes before and while it reads an input: readers read to the end of a
// file, so a device (/dev/zero), a pipe or a folder — named directly or through a symbolic link
// — would keep them reading forever or fail obscurely, and a reader that holds a whole file must
// not take whatever size it is given.

#include "core/model/error.h"

#include <QByteArray>
#include <QString>

#include <string_view>

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

// A whole regular file, at most `maxBytes` long, as bytes in memory without a copy: mapped
// read-only from the page cache with its pages loaded at once, or, where a file cannot be
// mapped (an empty file, a file system without mmap), read by readWholeFile. The same checks and
// errors as readWholeFile. A mapped file that another program shortens while it is held ends the
// process (SIGBUS), as with any mapping; readers hold one only while they parse.
class WholeFile
{
public:
    static Result<WholeFile> open(const QString &path, qint64 maxBytes);
    WholeFile(WholeFile &&other) noexcept;
    WholeFile &operator=(WholeFile &&other) noexcept;
    WholeFile(const WholeFile &) = delete;
    WholeFile &operator=(const WholeFile &) = delete;
    ~WholeFile();

    std::string_view bytes() const;
    // The bytes as a QByteArray that does not own them: valid while this lives.
    QByteArray rawData() const;
    bool isMapped() const { return m_address != nullptr; }

private:
    WholeFile() = default;
    void unmap();

    void *m_address = nullptr; // the mapping, or null when read
    size_t m_size = 0;
    QByteArray m_read;
};

} // namespace fourfold
