#include "core/io/input_file.h"

#include <QCoreApplication>
#include <QFile>
#include <QFileInfo>

#include <algorithm>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct InputFileText {
    Q_DECLARE_TR_FUNCTIONS(InputFileText)
};

} // namespace

Status requireRegularFile(const QString &path)
{
    const QFileInfo info(path); // follows symbolic links
    if (info.exists() && !info.isFile())
        return failAt(ErrorCode::Io, path, 0, 0, InputFileText::tr("this is not a regular file"));
    return {};
}

Result<QByteArray> readWholeFile(const QString &path, qint64 maxBytes)
{
    FOURFOLD_TRY_STATUS(requireRegularFile(path));
    QFile file(path);
    if (!file.open(QIODevice::ReadOnly)) {
        auto error = failAt(
            ErrorCode::Io, path, 0, 0, InputFileText::tr("the file cannot be opened for reading"));
        error.error().cause = file.errorString();
        return error;
    }
    const auto tooLong = [&] {
        return failAt(ErrorCode::InvalidInput, path, 0, 0,
            InputFileText::tr("the file is longer than %1 MiB, the most this reader takes")
                .arg(maxBytes >> 20));
    };
    if (file.size() > maxBytes)
        return tooLong();
    // Read into a buffer the size the file has now, plus one step of room for the read that
    // finds the end: QIODevice::read(maxBytes + 1) would allocate the whole cap (1 GiB) first,
    // for any file. A file that grows while it is read is read on in steps, up to the limit.
    constexpr qint64 step = qint64(1) << 20;
    QByteArray bytes;
    bytes.reserve(qsizetype(std::min(file.size(), maxBytes) + step));
    while (bytes.size() <= maxBytes) {
        const qsizetype at = bytes.size();
        const qint64 want = std::min(maxBytes + 1 - at, at < file.size() ? file.size() - at : step);
        bytes.resize(at + qsizetype(want));
        const qint64 got = file.read(bytes.data() + at, want);
        if (got < 0) {
            auto error =
                failAt(ErrorCode::Io, path, 0, 0, InputFileText::tr("the file cannot be read"));
            error.error().cause = file.errorString();
            return error;
        }
        bytes.resize(at + qsizetype(got));
        if (got == 0)
            break;
    }
    if (bytes.size() > maxBytes)
        return tooLong();
    return bytes;
}

} // namespace fourfold
