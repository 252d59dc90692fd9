#pragma once
// A file read front to back a chunk at a time, for readers that hold one line or one record
// rather than the whole file: the bytes read and not yet consumed are kept in one buffer, which
// grows only as long as the piece the reader is looking at.

#include "core/model/error.h"

#include <QByteArray>
#include <QByteArrayView>
#include <QString>

#include <memory>

class QFile;

namespace fourfold {

// The size of the chunks article files are read in, in bytes (1 MiB).
inline constexpr qsizetype defaultReadChunkSize = qsizetype(1) << 20;

class ChunkedInput
{
public:
    // Opens `path`. Fails with Io naming it when it does not exist, is not a regular file
    // (requireRegularFile) or cannot be opened. `chunkSize` (at least 1) is how many bytes each
    // readMore() asks for.
    static Result<ChunkedInput> open(const QString &path, qsizetype chunkSize);
    ChunkedInput(ChunkedInput &&) noexcept;
    ChunkedInput &operator=(ChunkedInput &&) noexcept;
    ~ChunkedInput();

    const QString &path() const { return m_path; }
    // The file's size when it was opened, in bytes.
    qint64 size() const { return m_size; }
    // The offset in the file of the first pending byte: how far the reader has consumed it.
    qint64 position() const { return m_read - pending().size(); }

    // The bytes read and not yet consumed; valid until the next readMore().
    QByteArrayView pending() const { return QByteArrayView(m_buffer).sliced(m_start); }
    // Drops the first `n` pending bytes (n <= pending().size()).
    void consume(qsizetype n) { m_start += n; }
    // Appends the next chunk of the file to pending(): true if bytes came, false at the end of
    // the file. Fails with Io naming the file if reading fails.
    Result<bool> readMore();
    // Consumes a UTF-8 byte-order mark (EF BB BF) at the very start of the file, if there is one.
    Status dropByteOrderMark();
    // Reads the rest of the file and returns it with the pending bytes in front (all consumed).
    Result<QByteArray> readAll();

private:
    ChunkedInput() = default;

    QString m_path;
    std::unique_ptr<QFile> m_file;
    qint64 m_size = 0;
    qsizetype m_chunkSize = defaultReadChunkSize;
    QByteArray m_buffer;
    qsizetype m_start = 0; // the first pending byte in m_buffer
    qint64 m_read = 0; // bytes read from the file
};

} // namespace fourfold
