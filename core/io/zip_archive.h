#pragma once
// A zip archive held in memory (libzip), read entry by entry for the container formats (DOCX,
// ODT, EPUB), with the defences an archive from outside needs: a cap on the bytes unpacked from
// one entry and from the whole archive (a zip bomb is refused, whatever sizes its directory
// claims), encrypted entries refused, a damaged archive named as such.

#include "core/model/error.h"

#include <QByteArray>
#include <QString>
#include <QStringList>

#include <memory>

struct zip;
struct _xmlNode;

namespace fourfold {

class XmlDocument;

// The most bytes unpacked from one entry of an archive (64 MiB).
inline constexpr qint64 maxZipEntrySize = qint64(64) << 20;
// The most bytes unpacked from all the entries an import reads from one archive (256 MiB).
inline constexpr qint64 maxZipTotalSize = qint64(256) << 20;

struct ZipLimits {
    qint64 entry = maxZipEntrySize;
    qint64 total = maxZipTotalSize;
};

class ZipArchive
{
public:
    // Opens the archive held in `bytes` (the whole of `file`, which errors name). Fails with
    // InvalidInput naming `file`: not a zip archive, or a damaged one (libzip's consistency
    // check; its message as the cause).
    static Result<ZipArchive> open(QByteArray bytes, const QString &file, ZipLimits limits = {});

    ZipArchive(ZipArchive &&) noexcept;
    ZipArchive &operator=(ZipArchive &&) noexcept;
    ~ZipArchive();

    const QString &file() const { return m_file; }
    // Whether the archive has an entry of exactly this name.
    bool contains(const QString &name) const;
    // The names of the entries, in the archive's order.
    QStringList names() const;
    // Unpacks the entry `name` whole. Fails with InvalidInput naming the file and the entry: no
    // such entry; an encrypted entry; more than limits.entry bytes, or more than limits.total
    // bytes unpacked from this archive so far (counted as the bytes come out, not from the sizes
    // the archive states); a damaged entry (a CRC or inflate error).
    Result<QByteArray> read(const QString &name);
    // The bytes unpacked so far, over every read.
    qint64 unpacked() const { return m_unpacked; }

private:
    struct Close {
        void operator()(zip *archive) const;
    };
    ZipArchive() = default;

    QString m_file;
    ZipLimits m_limits;
    std::unique_ptr<QByteArray> m_bytes; // libzip reads from it: its address must stay put
    std::unique_ptr<zip, Close> m_zip;
    qint64 m_unpacked = 0;
};

// A path inside an archive resolved against the folder of the entry `base` ("OEBPS/c1.xhtml"
// from "OEBPS/content.opf" and "c1.xhtml"; "../" climbs, a fragment "#..." is dropped,
// percent-escapes are decoded); empty if it climbs out of the archive.
QString resolveZipPath(const QString &base, const QString &relative);

// An error about the part `part` of the archive `file` made from an error the XML parser gave
// with the part as its file: "FILE: PART, line N: sentence", with the cause kept.
Error inZipPart(Error error, const QString &file, const QString &part);

// The entry `part` unpacked and parsed as XML (XmlDocument: nothing fetched); errors name the
// archive's file and the part (inZipPart).
Result<XmlDocument> parseZipPart(ZipArchive &archive, const QString &part);
// An InvalidInput error about the element `node` of the part `part` of `archive`.
std::unexpected<Error> zipPartFailed(
    const ZipArchive &archive, const QString &part, const _xmlNode *node, const QString &what);

} // namespace fourfold
