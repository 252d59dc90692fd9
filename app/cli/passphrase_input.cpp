#include "app/cli/passphrase_input.h"

#include <QCoreApplication>
#include <QFile>

#include <cstdio>

namespace fourfold::cli {

Result<QString> readPassphrase(const QString &path)
{
    QFile file;
    bool opened = false;
    if (path == QLatin1String("-"))
        opened = file.open(stdin, QIODevice::ReadOnly);
    else {
        file.setFileName(path);
        opened = file.open(QIODevice::ReadOnly);
    }
    if (!opened)
        return fail(ErrorCode::Io,
            QCoreApplication::translate("cli", "The passphrase file %1 could not be read.")
                .arg(path),
            file.errorString());
    QByteArray line = file.readLine(4096);
    while (line.endsWith('\n') || line.endsWith('\r'))
        line.chop(1);
    auto text = QString::fromUtf8(line);
    if (text.contains(QChar::ReplacementCharacter))
        return fail(ErrorCode::InvalidInput,
            QCoreApplication::translate("cli", "The passphrase in %1 is not UTF-8.").arg(path));
    return text;
}

} // namespace fourfold::cli
