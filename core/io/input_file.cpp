#include "core/io/input_file.h"

#include <QCoreApplication>
#include <QFile>
#include <QFileInfo>

namespace fourfold {

namespace {

QString tr(const char *text)
{
    return QCoreApplication::translate("InputFile", text);
}

} // namespace

Status requireRegularFile(const QString &path)
{
    const QFileInfo info(path); // follows symbolic links
    if (info.exists() && !info.isFile())
        return failAt(ErrorCode::Io, path, 0, 0, tr("this is not a regular file"));
    return {};
}

Result<QByteArray> readWholeFile(const QString &path, qint64 maxBytes)
{
    FOURFOLD_TRY_STATUS(requireRegularFile(path));
    QFile file(path);
    if (!file.open(QIODevice::ReadOnly)) {
        auto error = failAt(ErrorCode::Io, path, 0, 0, tr("the file cannot be opened for reading"));
        error.error().cause = file.errorString();
        return error;
    }
    const auto tooLong = [&] {
        return failAt(ErrorCode::InvalidInput, path, 0, 0,
            tr("the file is longer than %1 MiB, the most this reader takes").arg(maxBytes >> 20));
    };
    if (file.size() > maxBytes)
        return tooLong();
    QByteArray bytes = file.read(maxBytes + 1);
    if (file.error() != QFileDevice::NoError) {
        auto error = failAt(ErrorCode::Io, path, 0, 0, tr("the file cannot be read"));
        error.error().cause = file.errorString();
        return error;
    }
    if (bytes.size() > maxBytes)
        return tooLong();
    return bytes;
}

} // namespace fourfold
