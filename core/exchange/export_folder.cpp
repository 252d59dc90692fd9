#include "core/exchange/export_folder.h"

#include <QCoreApplication>
#include <QDir>
#include <QFileInfo>

#include <fcntl.h>
#include <sys/stat.h>

#include <cerrno>
#include <cstdio>
#include <cstring>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ExportFolderText {
    Q_DECLARE_TR_FUNCTIONS(ExportFolderText)
};

// The names an export writes (layer_export.h): anything else in a folder is not ours to delete.
bool isExportFileName(const QString &name)
{
    return name == QLatin1String("manifest.json") || name.endsWith(QLatin1String(".jsonl"))
        || name.endsWith(QLatin1String(".jsonld")) || name.endsWith(QLatin1String(".bio"))
        || name.endsWith(QLatin1String(".csv"));
}

QString systemError(int error)
{
    return QString::fromLocal8Bit(std::strerror(error));
}

} // namespace

Result<ExportFolder> ExportFolder::prepare(const QString &target, bool replace)
{
    const QString clean = QDir::cleanPath(QDir::current().absoluteFilePath(target));
    const QFileInfo info(clean);
    if (info.isSymLink())
        return fail(ErrorCode::Io,
            ExportFolderText::tr("The export folder %1 is a symbolic link; name a real folder.")
                .arg(target));
    if (info.exists() && !info.isDir())
        return fail(
            ErrorCode::Io, ExportFolderText::tr("%1 exists and is not a folder.").arg(target));
    if (info.isDir()) {
        const QStringList names = QDir(clean).entryList(
            QDir::AllEntries | QDir::Hidden | QDir::System | QDir::NoDotAndDotDot, QDir::Name);
        if (!names.isEmpty() && !replace)
            return fail(ErrorCode::Duplicate,
                ExportFolderText::tr(
                    "The folder %1 is not empty (%2 entries); choose a new or empty folder, or "
                    "ask to replace an earlier export in it (--force).")
                    .arg(target)
                    .arg(names.size()));
        for (const QString &name : names) {
            const QFileInfo entry(QDir(clean).filePath(name));
            if (entry.isSymLink() || !entry.isFile() || !isExportFileName(name))
                return fail(ErrorCode::Duplicate,
                    ExportFolderText::tr(
                        "The folder %1 holds %2, which is not a file an export writes; it was "
                        "left alone. Choose a new or empty folder.")
                        .arg(target, name));
        }
    }
    const QString parent = info.absolutePath();
    if (!QDir().mkpath(parent))
        return fail(
            ErrorCode::Io, ExportFolderText::tr("The folder %1 could not be created.").arg(parent));

    ExportFolder folder;
    folder.m_target = clean;
    folder.m_written = std::make_unique<QTemporaryDir>(QDir(parent).filePath(
        QLatin1Char('.') + info.fileName() + QLatin1String(".partial-XXXXXX")));
    if (!folder.m_written->isValid())
        return fail(ErrorCode::Io,
            ExportFolderText::tr("A folder to write the export into could not be made in %1: %2.")
                .arg(parent, folder.m_written->errorString()));
    // QTemporaryDir makes its folder private (0700); an export folder gets the usual
    // permissions (0777 less the umask), as mkdir would give it.
    const mode_t mask = ::umask(0);
    ::umask(mask);
    ::chmod(QFile::encodeName(folder.m_written->path()).constData(), 0777 & ~mask);
    return folder;
}

QString ExportFolder::path() const
{
    return m_written ? m_written->path() : QString();
}

Status ExportFolder::commit()
{
    const QByteArray from = QFile::encodeName(m_written->path());
    const QByteArray to = QFile::encodeName(m_target);
    const QFileInfo target(m_target);
    if (target.isSymLink() || (target.exists() && !target.isDir()))
        return fail(ErrorCode::Io,
            ExportFolderText::tr(
                "%1 was replaced by something other than a folder while the export was written; "
                "nothing was written.")
                .arg(QDir::toNativeSeparators(m_target)));
    if (!target.exists()) {
        if (std::rename(from.constData(), to.constData()) != 0)
            return fail(ErrorCode::Io,
                ExportFolderText::tr("The export could not be moved into %1: %2.")
                    .arg(QDir::toNativeSeparators(m_target), systemError(errno)));
        m_written->setAutoRemove(false);
        return {};
    }
    // Swap the two folders in one step (Linux renameat2): the target holds the old export or
    // the new one, never a mixture. The old one is then at the hidden path and goes with it.
    if (::renameat2(AT_FDCWD, from.constData(), AT_FDCWD, to.constData(), RENAME_EXCHANGE) == 0)
        return {};
    if (errno != EINVAL && errno != ENOSYS)
        return fail(ErrorCode::Io,
            ExportFolderText::tr("The export could not be moved into %1: %2.")
                .arg(QDir::toNativeSeparators(m_target), systemError(errno)));
    // A file system without the exchange: move the old folder aside, then the new one in.
    QTemporaryDir aside(m_written->path() + QLatin1String(".old-XXXXXX"));
    if (!aside.isValid() || !QDir().rmdir(aside.path())
        || std::rename(to.constData(), QFile::encodeName(aside.path()).constData()) != 0)
        return fail(ErrorCode::Io,
            ExportFolderText::tr("The earlier export in %1 could not be moved aside: %2.")
                .arg(QDir::toNativeSeparators(m_target), systemError(errno)));
    if (std::rename(from.constData(), to.constData()) != 0) {
        const int error = errno;
        std::rename(QFile::encodeName(aside.path()).constData(), to.constData());
        return fail(ErrorCode::Io,
            ExportFolderText::tr("The export could not be moved into %1: %2.")
                .arg(QDir::toNativeSeparators(m_target), systemError(error)));
    }
    m_written->setAutoRemove(false);
    return {};
}

} // namespace fourfold
