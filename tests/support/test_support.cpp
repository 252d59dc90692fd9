#include "tests/support/test_support.h"

#include <QDir>
#include <QFile>
#include <QFileInfo>

namespace fourfold::test {

QString writeFile(const QTemporaryDir &dir, const QString &name, const QByteArray &bytes)
{
    const QString path = dir.filePath(name);
    QDir().mkpath(QFileInfo(path).absolutePath());
    QFile f(path);
    REQUIRE(f.open(QIODevice::WriteOnly));
    REQUIRE(f.write(bytes) == bytes.size());
    return path;
}

QByteArray readFile(const QString &path)
{
    QFile f(path);
    REQUIRE(f.open(QIODevice::ReadOnly));
    return f.readAll();
}

QString dataPath(const QString &name)
{
    return QStringLiteral(FOURFOLD_TEST_DATA_DIR "/") + name;
}

} // namespace fourfold::test
