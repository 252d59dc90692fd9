#pragma once
// Where an export is written: a hidden folder beside the target, moved into place whole once
// every file is written, so that the target never holds part of an export (a failure or a kill
// leaves the target as it was).

#include "core/model/error.h"

#include <QString>
#include <QTemporaryDir>

#include <memory>

namespace fourfold {

class ExportFolder
{
public:
    // Checks `target` and makes the folder the files are written into. Fails with Io when the
    // target (or its parent) is a symbolic link or not a folder, when the parent cannot be
    // created or the hidden folder not made; with Duplicate when the target holds anything and
    // `replace` is not set, or when `replace` is set but the target holds something an export
    // does not write (a folder, a link, a file of another kind), naming it — an export replaces
    // only a folder of export files.
    static Result<ExportFolder> prepare(const QString &target, bool replace);

    // The hidden folder to write into (a sibling of the target).
    QString path() const;

    // Moves the written folder into place: the target is replaced whole (an earlier export and
    // its stale files go). Fails with Io naming the target; the target is then as it was and the
    // written folder is removed.
    Status commit();

private:
    ExportFolder() = default;

    QString m_target;
    std::unique_ptr<QTemporaryDir> m_written;
};

} // namespace fourfold
