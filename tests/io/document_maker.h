#pragma once
// Test documents made by tools outside Fourfold: Debian's python3-docx, python3-odf and
// python3-reportlab run by /usr/bin/python3 (so that another python3 earlier on PATH cannot
// hide them), and zip archives built entry by entry with libzip.

#include "tests/support/test_support.h"

#include <QByteArray>
#include <QProcess>
#include <QString>
#include <QStringList>
#include <QTemporaryDir>

#include <zip.h>

#include <utility>
#include <vector>

namespace fourfold::test {

// Runs the Python `script` with the path `dir/name` as sys.argv[1] and returns that path; the
// test fails (with Python's output) unless the script succeeds and writes the file.
inline QString makeWithPython(const QTemporaryDir &dir, const QString &name, const char *script)
{
    const QString path = dir.filePath(name);
    QProcess python;
    python.start(QStringLiteral("/usr/bin/python3"),
        {QStringLiteral("-c"), QString::fromUtf8(script), path});
    REQUIRE(python.waitForStarted(10000));
    REQUIRE(python.waitForFinished(60000));
    INFO("python: " << python.readAllStandardError().toStdString());
    REQUIRE(python.exitStatus() == QProcess::NormalExit);
    REQUIRE(python.exitCode() == 0);
    REQUIRE(QFile::exists(path));
    return path;
}

// One entry of a zip archive made in a test.
struct ZipEntry {
    QString name;
    QByteArray bytes;
    bool encrypted = false; // with a password (AES-256 where libzip can write it, else PKWARE)
    bool stored = false; // without compression (a mimetype entry)
};

// The bytes of a zip archive holding `entries`, in order, written by libzip.
inline QByteArray zipOf(const std::vector<ZipEntry> &entries)
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QByteArray path = dir.filePath(QStringLiteral("made.zip")).toUtf8();
    int error = 0;
    zip_t *archive = zip_open(path.constData(), ZIP_CREATE | ZIP_TRUNCATE, &error);
    REQUIRE(archive != nullptr);
    for (const ZipEntry &entry : entries) {
        zip_source_t *source = zip_source_buffer(
            archive, entry.bytes.constData(), zip_uint64_t(entry.bytes.size()), 0);
        REQUIRE(source != nullptr);
        const zip_int64_t index =
            zip_file_add(archive, entry.name.toUtf8().constData(), source, ZIP_FL_ENC_UTF_8);
        REQUIRE(index >= 0);
        if (entry.stored)
            REQUIRE(zip_set_file_compression(archive, zip_uint64_t(index), ZIP_CM_STORE, 0) == 0);
        if (entry.encrypted) {
            const zip_uint16_t method = zip_encryption_method_supported(ZIP_EM_AES_256, 1)
                ? ZIP_EM_AES_256
                : ZIP_EM_TRAD_PKWARE;
            REQUIRE(zip_file_set_encryption(archive, zip_uint64_t(index), method, "secret") == 0);
        }
    }
    // The buffers must live until zip_close, which writes the archive.
    REQUIRE(zip_close(archive) == 0);
    return readFile(QString::fromUtf8(path));
}

} // namespace fourfold::test
