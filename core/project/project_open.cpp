// Project::openForReading: a project opened read-only by the commands that only read it.

#include "core/project/project.h"
#include "core/store/database.h"
#include "core/store/schema.h"

#include <QCoreApplication>
#include <QFile>
#include <QFileInfo>

#include <unistd.h>

namespace fourfold {

Result<Project> Project::openForReading(const QString &path)
{
    if (!QFileInfo::exists(path))
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("Project", "There is no project file %1.").arg(path));
    // Where the file and its folder may be written, it is opened as open() opens it: a
    // read-only connection to a file in WAL mode would leave its -wal and -shm files behind.
    // access() answers for this process, a read-only mount included.
    const QByteArray file = QFile::encodeName(path);
    const QByteArray folder = QFile::encodeName(QFileInfo(path).absolutePath());
    if (::access(file.constData(), W_OK) == 0 && ::access(folder.constData(), W_OK) == 0)
        return open(path);
    auto db = Database::open(path, Database::OpenMode::ReadOnly);
    if (!db)
        return std::unexpected(db.error());
    auto current = schemaIsCurrent(*db);
    if (!current)
        return std::unexpected(current.error());
    if (!*current) {
        // An older file is upgraded first, as open() does; that is the one write a reading
        // command makes.
        *db = Database();
        return open(path);
    }
    Project project(std::move(*db));
    FOURFOLD_TRY_STATUS(project.loadSettings());
    return project;
}

bool Project::isReadOnly() const
{
    return db().isReadOnly();
}

} // namespace fourfold
