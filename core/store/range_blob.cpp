#include "core/store/range_blob.h"

#include <QCoreApplication>
#include <QtEndian>

namespace fourfold {

QByteArray encodeRanges(const std::vector<TextRange> &ranges)
{
    QByteArray blob(qsizetype(ranges.size() * 8), Qt::Uninitialized);
    char *p = blob.data();
    for (const TextRange &r : ranges) {
        qToLittleEndian<qint32>(qint32(r.start), p);
        qToLittleEndian<qint32>(qint32(r.end), p + 4);
        p += 8;
    }
    return blob;
}

Result<std::vector<TextRange>> decodeRanges(const QByteArray &blob)
{
    if (blob.size() % 8 != 0)
        return fail(ErrorCode::Corrupt,
            QCoreApplication::translate(
                "RangeBlob", "A stored list of text ranges is damaged (%1 bytes).")
                .arg(blob.size()));
    std::vector<TextRange> ranges;
    ranges.reserve(size_t(blob.size() / 8));
    const char *p = blob.constData();
    for (qsizetype i = 0; i < blob.size(); i += 8)
        ranges.push_back(
            TextRange {qFromLittleEndian<qint32>(p + i), qFromLittleEndian<qint32>(p + i + 4)});
    return ranges;
}

} // namespace fourfold
