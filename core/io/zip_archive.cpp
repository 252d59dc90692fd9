#include "core/io/zip_archive.h"

#include "core/io/xml_document.h"

#include <QCoreApplication>
#include <QUrl>

#include <zip.h>

#include <array>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ArticleReaderText {
    Q_DECLARE_TR_FUNCTIONS(ArticleReaderText)
};

QString mebibytes(qint64 bytes)
{
    // Limits are whole MiB; a test's smaller limit is said in bytes.
    if (bytes % (qint64(1) << 20) == 0)
        return ArticleReaderText::tr("%1 MiB").arg(bytes >> 20);
    return ArticleReaderText::tr("%1 bytes").arg(bytes);
}

struct FileClose {
    void operator()(zip_file_t *file) const { zip_fclose(file); }
};

} // namespace

void ZipArchive::Close::operator()(zip *archive) const
{
    zip_discard(archive); // opened read-only: nothing to write back
}

ZipArchive::ZipArchive(ZipArchive &&) noexcept = default;
ZipArchive &ZipArchive::operator=(ZipArchive &&) noexcept = default;
ZipArchive::~ZipArchive() = default;

Result<ZipArchive> ZipArchive::open(QByteArray bytes, const QString &file, ZipLimits limits)
{
    ZipArchive archive;
    archive.m_file = file;
    archive.m_limits = limits;
    archive.m_bytes = std::make_unique<QByteArray>(std::move(bytes));
    zip_error_t error;
    zip_error_init(&error);
    zip_source_t *source = zip_source_buffer_create(
        archive.m_bytes->constData(), zip_uint64_t(archive.m_bytes->size()), 0, &error);
    if (!source) {
        zip_error_fini(&error);
        return failAt(ErrorCode::Internal, file, 0, 0,
            ArticleReaderText::tr("the zip reader could not be started"));
    }
    // ZIP_CHECKCONS: the central directory is checked against the local headers, so a cut-off
    // or patched archive is refused here rather than half read.
    zip_t *opened = zip_open_from_source(source, ZIP_RDONLY | ZIP_CHECKCONS, &error);
    if (!opened) {
        zip_source_free(source);
        const int code = zip_error_code_zip(&error);
        const QString cause = QString::fromUtf8(zip_error_strerror(&error));
        zip_error_fini(&error);
        auto failed = failAt(ErrorCode::InvalidInput, file, 0, 0,
            code == ZIP_ER_NOZIP
                ? ArticleReaderText::tr(
                    "the file is not a readable zip archive (not one at all, or cut off or "
                    "damaged): %1")
                      .arg(cause)
                : ArticleReaderText::tr("the file is a damaged zip archive: %1").arg(cause));
        failed.error().cause = cause;
        return failed;
    }
    zip_error_fini(&error);
    archive.m_zip.reset(opened);
    return archive;
}

bool ZipArchive::contains(const QString &name) const
{
    return zip_name_locate(m_zip.get(), name.toUtf8().constData(), 0) >= 0;
}

QStringList ZipArchive::names() const
{
    QStringList names;
    const zip_int64_t count = zip_get_num_entries(m_zip.get(), 0);
    for (zip_int64_t i = 0; i < count; ++i) {
        if (const char *name = zip_get_name(m_zip.get(), zip_uint64_t(i), 0))
            names.append(QString::fromUtf8(name));
    }
    return names;
}

Result<QByteArray> ZipArchive::read(const QString &name)
{
    const auto failed = [&](const QString &what) {
        return failAt(ErrorCode::InvalidInput, m_file, 0, 0, what);
    };
    const zip_int64_t index = zip_name_locate(m_zip.get(), name.toUtf8().constData(), 0);
    if (index < 0)
        return failed(ArticleReaderText::tr("the archive holds no %1").arg(name));
    zip_stat_t stat;
    zip_stat_init(&stat);
    if (zip_stat_index(m_zip.get(), zip_uint64_t(index), 0, &stat) != 0)
        return failed(ArticleReaderText::tr("the entry %1 of the archive cannot be read: %2")
                          .arg(name, QString::fromUtf8(zip_strerror(m_zip.get()))));
    // APPNOTE.TXT §4.4.4 (general purpose bit 0) and the strong-encryption header: libzip
    // reports either as an encryption method.
    if ((stat.valid & ZIP_STAT_ENCRYPTION_METHOD) && stat.encryption_method != ZIP_EM_NONE)
        return failed(ArticleReaderText::tr(
            "the entry %1 of the archive is encrypted; save the document without a "
            "password first")
                          .arg(name));
    std::unique_ptr<zip_file_t, FileClose> entry(
        zip_fopen_index(m_zip.get(), zip_uint64_t(index), 0));
    if (!entry)
        return failed(ArticleReaderText::tr("the entry %1 of the archive cannot be opened: %2")
                          .arg(name, QString::fromUtf8(zip_strerror(m_zip.get()))));
    QByteArray bytes;
    std::array<char, 64 * 1024> buffer {};
    for (;;) {
        const zip_int64_t n = zip_fread(entry.get(), buffer.data(), buffer.size());
        if (n < 0) {
            const QString cause = QString::fromUtf8(zip_file_strerror(entry.get()));
            auto error = failed(ArticleReaderText::tr("the entry %1 of the archive is damaged: %2")
                                    .arg(name, cause));
            error.error().cause = cause;
            return error;
        }
        if (n == 0)
            break;
        m_unpacked += n;
        if (bytes.size() + n > m_limits.entry)
            return failed(ArticleReaderText::tr(
                "the entry %1 unpacks to more than %2; Fourfold unpacks at most %2 "
                "from one entry (is it a zip bomb?)")
                              .arg(name, mebibytes(m_limits.entry)));
        if (m_unpacked > m_limits.total)
            return failed(ArticleReaderText::tr(
                "the archive unpacks to more than %1 in all; Fourfold unpacks at most "
                "%1 from one archive (is it a zip bomb?)")
                              .arg(mebibytes(m_limits.total)));
        bytes.append(buffer.data(), qsizetype(n));
    }
    return bytes;
}

QString resolveZipPath(const QString &base, const QString &relative)
{
    QString target = relative;
    const qsizetype hash = target.indexOf(u'#');
    if (hash >= 0)
        target.truncate(hash);
    target = QUrl::fromPercentEncoding(target.toUtf8());
    QStringList parts;
    if (!target.startsWith(u'/')) {
        parts = base.split(u'/');
        parts.removeLast(); // the base entry's own name
    }
    for (const QString &part : target.split(u'/', Qt::SkipEmptyParts)) {
        if (part == u".")
            continue;
        if (part == u"..") {
            if (parts.isEmpty())
                return {};
            parts.removeLast();
            continue;
        }
        parts.append(part);
    }
    return parts.join(u'/');
}

Error inZipPart(Error error, const QString &file, const QString &part)
{
    QString prefix = error.file;
    if (error.line > 0)
        prefix += QStringLiteral(":%1").arg(error.line);
    if (error.line > 0 && error.column > 0)
        prefix += QStringLiteral(":%1").arg(error.column);
    prefix += QStringLiteral(": ");
    const QString sentence =
        error.message.startsWith(prefix) ? error.message.sliced(prefix.size()) : error.message;
    const QString where =
        error.line > 0 ? ArticleReaderText::tr("%1, line %2").arg(part).arg(error.line) : part;
    Error moved = failAt(error.code, file, 0, 0, where + QStringLiteral(": ") + sentence).error();
    moved.cause = error.cause;
    return moved;
}

Result<XmlDocument> parseZipPart(ZipArchive &archive, const QString &part)
{
    Result<QByteArray> bytes = archive.read(part);
    if (!bytes)
        return std::unexpected(bytes.error());
    Result<XmlDocument> document = XmlDocument::parse(*bytes, part);
    if (!document)
        return std::unexpected(inZipPart(document.error(), archive.file(), part));
    return document;
}

std::unexpected<Error> zipPartFailed(
    const ZipArchive &archive, const QString &part, const _xmlNode *node, const QString &what)
{
    return std::unexpected(
        inZipPart(failAt(ErrorCode::InvalidInput, part, xmlLine(node), 0, what).error(),
            archive.file(), part));
}

} // namespace fourfold
