#include "core/io/input_file.h"

#include <QCoreApplication>
#include <QFileInfo>

namespace fourfold {

Status requireRegularFile(const QString &path)
{
    const QFileInfo info(path); // follows symbolic links
    if (info.exists() && !info.isFile())
        return failAt(ErrorCode::Io, path, 0, 0,
            QCoreApplication::translate("InputFile", "this is not a regular file"));
    return {};
}

} // namespace fourfold
