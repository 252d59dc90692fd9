#include "core/team/team_password_files.h"

#include <QCoreApplication>
#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QRandomGenerator>
#include <QRegularExpression>

namespace fourfold {

namespace {

// The sentences of this file (they were team_project.cpp's), under a context that lupdate
// collects.
struct TeamProjectText {
    Q_DECLARE_TR_FUNCTIONS(TeamProjectText)
};

} // namespace

QString newPassword()
{
    static constexpr char kAlphabet[] =
        "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789";
    QString out;
    for (int i = 0; i < 24; ++i)
        out += QLatin1Char(kAlphabet[QRandomGenerator::system()->bounded(62)]);
    return out;
}

QString pgpassField(QString value)
{
    value.replace(QLatin1String("\\"), QLatin1String("\\\\"));
    value.replace(QLatin1String(":"), QLatin1String("\\:"));
    return value;
}

QString passwordFileName(const QString &pseudonym, const QString &role)
{
    static const QRegularExpression plain(QStringLiteral("^[A-Za-z0-9_-][A-Za-z0-9._-]*$"));
    return (plain.match(pseudonym).hasMatch() ? pseudonym : role) + QStringLiteral(".pgpass");
}

Status writePrivateFile(const QString &path, const QByteArray &text)
{
    QFile file(path);
    if (!file.open(QIODevice::WriteOnly | QIODevice::NewOnly)
        || !file.setPermissions(QFileDevice::ReadOwner | QFileDevice::WriteOwner)
        || file.write(text) != text.size() || !file.flush()) {
        file.remove();
        return fail(ErrorCode::Io,
            TeamProjectText::tr("Could not write the password file %1.").arg(path),
            file.errorString());
    }
    return {};
}

Status prepareCredentialsDir(const QString &dir, bool *created, bool mayHoldFiles)
{
    QFileInfo info(dir);
    *created = false;
    if (info.isSymLink())
        return fail(ErrorCode::InvalidArgument,
            TeamProjectText::tr("%1 is a symbolic link; name a new folder for the password files.")
                .arg(dir));
    if (info.exists()) {
        if (!info.isDir()
            || (!mayHoldFiles
                && !QDir(dir).isEmpty(
                    QDir::AllEntries | QDir::NoDotAndDotDot | QDir::Hidden | QDir::System)))
            return fail(ErrorCode::Duplicate,
                TeamProjectText::tr(
                    "%1 is not an empty folder; name a new folder for the password files.")
                    .arg(dir));
    } else {
        if (!QDir().mkpath(dir))
            return fail(
                ErrorCode::Io, TeamProjectText::tr("Could not create the folder %1.").arg(dir));
        *created = true;
    }
    if (!QFile::setPermissions(
            dir, QFileDevice::ReadOwner | QFileDevice::WriteOwner | QFileDevice::ExeOwner))
        return fail(
            ErrorCode::Io, TeamProjectText::tr("Could not make %1 private to its owner.").arg(dir));
    return {};
}

} // namespace fourfold
