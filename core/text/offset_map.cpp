#include "core/text/offset_map.h"

#include <algorithm>

namespace fourfold {

OffsetMap::OffsetMap(const QString &text)
{
    const auto *s = reinterpret_cast<const char16_t *>(text.utf16());
    const qsizetype n = text.size();
    qint64 codePoint = 0;
    qint64 extra16 = 0;
    qint64 extra8 = 0;
    for (qsizetype i = 0; i < n; ++codePoint) {
        const char16_t c = s[i];
        if (c < 0x80) {
            ++i;
            continue;
        }
        if (QChar::isHighSurrogate(c) && i + 1 < n && QChar::isLowSurrogate(s[i + 1])) {
            extra16 += 1;
            m_utf16Wide.push_back({codePoint, extra16});
            extra8 += 3;
            m_utf8Wide.push_back({codePoint, extra8});
            i += 2;
            continue;
        }
        // RFC 3629 §3: one byte below U+0080, two below U+0800, three for the rest of the BMP.
        // An unpaired surrogate (never in canonical text) counts as one code point and as the
        // single '?' that QString::toUtf8() writes for it.
        if (!QChar::isSurrogate(c)) {
            extra8 += c < 0x800 ? 1 : 2;
            m_utf8Wide.push_back({codePoint, extra8});
        }
        ++i;
    }
    m_codePointCount = codePoint;
    m_utf16Length = n;
    m_utf8Length = codePoint + extra8;
}

qint64 OffsetMap::unitsFromCodePoint(const std::vector<Wide> &wide, qint64 codePoint)
{
    // Extra units of the wide code points strictly before `codePoint`.
    const auto it = std::lower_bound(wide.begin(), wide.end(), codePoint,
        [](const Wide &w, qint64 cp) { return w.codePoint < cp; });
    return codePoint + (it == wide.begin() ? 0 : std::prev(it)->extraThrough);
}

qint64 OffsetMap::codePointFromUnits(const std::vector<Wide> &wide, qint64 units)
{
    // Wide code point j starts at unit codePoint_j + extraThrough_{j-1}, which grows with j:
    // find the last one that starts before `units`.
    auto startOf = [&](size_t j) {
        return wide[j].codePoint + (j == 0 ? 0 : wide[j - 1].extraThrough);
    };
    size_t low = 0;
    size_t high = wide.size();
    while (low < high) {
        const size_t mid = low + (high - low) / 2;
        if (startOf(mid) < units)
            low = mid + 1;
        else
            high = mid;
    }
    if (low == 0)
        return units;
    const size_t j = low - 1;
    const qint64 endOfJ = wide[j].codePoint + 1 + wide[j].extraThrough;
    if (units < endOfJ)
        return wide[j].codePoint; // inside code point j: round down to its start
    return units - wide[j].extraThrough;
}

qint64 OffsetMap::codePointCount() const
{
    return m_codePointCount;
}

qint64 OffsetMap::utf16Length() const
{
    return m_utf16Length;
}

qint64 OffsetMap::utf8Length() const
{
    return m_utf8Length;
}

qint64 OffsetMap::utf16FromCodePoint(qint64 codePoint) const
{
    if (codePoint < 0 || codePoint > m_codePointCount)
        return -1;
    return m_utf16Wide.empty() ? codePoint : unitsFromCodePoint(m_utf16Wide, codePoint);
}

qint64 OffsetMap::codePointFromUtf16(qint64 utf16) const
{
    if (utf16 < 0 || utf16 > m_utf16Length)
        return -1;
    return m_utf16Wide.empty() ? utf16 : codePointFromUnits(m_utf16Wide, utf16);
}

qint64 OffsetMap::utf8FromCodePoint(qint64 codePoint) const
{
    if (codePoint < 0 || codePoint > m_codePointCount)
        return -1;
    return m_utf8Wide.empty() ? codePoint : unitsFromCodePoint(m_utf8Wide, codePoint);
}

qint64 OffsetMap::codePointFromUtf8(qint64 utf8) const
{
    if (utf8 < 0 || utf8 > m_utf8Length)
        return -1;
    return m_utf8Wide.empty() ? utf8 : codePointFromUnits(m_utf8Wide, utf8);
}

Utf16Range OffsetMap::utf16Range(const TextRange &codePoints) const
{
    if (!codePoints.isValid() || codePoints.end > m_codePointCount)
        return {-1, -1};
    return {utf16FromCodePoint(codePoints.start), utf16FromCodePoint(codePoints.end)};
}

TextRange OffsetMap::codePointRange(const Utf16Range &utf16) const
{
    if (utf16.start < 0 || utf16.end < utf16.start || utf16.end > m_utf16Length)
        return {-1, -1};
    const qint64 start = codePointFromUtf16(utf16.start);
    qint64 end = codePointFromUtf16(utf16.end);
    if (utf16FromCodePoint(end) < utf16.end)
        ++end;
    return {start, end};
}

QString OffsetMap::slice(const QString &text, const TextRange &codePoints)
{
    if (!codePoints.isValid())
        return {};
    const auto *s = reinterpret_cast<const char16_t *>(text.utf16());
    const qsizetype n = text.size();
    // Walks the text once, stopping at the end of the range: O(end), no map needed.
    auto advance = [&](qsizetype from, qint64 count) {
        qsizetype i = from;
        for (; count > 0 && i < n; --count) {
            if (QChar::isHighSurrogate(s[i]) && i + 1 < n && QChar::isLowSurrogate(s[i + 1]))
                i += 2;
            else
                ++i;
        }
        return count == 0 ? i : qsizetype(-1);
    };
    const qsizetype start = advance(0, codePoints.start);
    if (start < 0)
        return {};
    const qsizetype end = advance(start, codePoints.length());
    if (end < 0)
        return {};
    return text.mid(start, end - start);
}

} // namespace fourfold
