#pragma once
// The one converter between text positions: Unicode code points (Fourfold's unit everywhere),
// UTF-16 code units (QString, QTextCursor) and UTF-8 bytes (files, SQLite). No other code
// converts offsets (design.md §3).

#include "core/model/text_range.h"
#include "core/text/utf16_range.h"

#include <QString>

#include <vector>

namespace fourfold {

class OffsetMap
{
public:
    // Builds the map for `text` in O(n) time. The map keeps no reference to `text`; it stores
    // only the code points that are not one unit wide, so a map of ASCII-only text is a few
    // bytes and one of European text a few bytes per accented letter.
    // An unpaired surrogate (never in canonical text) counts as one code point and as one UTF-8
    // byte, the '?' that QString::toUtf8() writes for it.
    explicit OffsetMap(const QString &text);

    qint64 codePointCount() const;
    qint64 utf16Length() const;
    qint64 utf8Length() const;

    // Position conversions. Positions are boundaries (0..length inclusive). A position outside
    // [0, length] of its unit returns -1. A UTF-16 position inside a surrogate pair (or a UTF-8
    // position inside a multi-byte sequence) maps to the code point it splits, rounded down to
    // that code point's start. O(1) when no code point is wider than one unit, else O(log k)
    // for k wide code points.
    qint64 utf16FromCodePoint(qint64 codePoint) const;
    qint64 codePointFromUtf16(qint64 utf16) const;
    qint64 utf8FromCodePoint(qint64 codePoint) const;
    qint64 codePointFromUtf8(qint64 utf8) const;

    // Range conversions; the start rounds down and the end rounds up to a whole code point.
    // An invalid or out-of-bounds range gives an empty range {-1, -1}.
    Utf16Range utf16Range(const TextRange &codePoints) const;
    TextRange codePointRange(const Utf16Range &utf16) const;

    // The substring of `text` at a code-point range, walking `text` in O(range end); an invalid
    // or out-of-bounds range gives an empty string.
    static QString slice(const QString &text, const TextRange &codePoints);

private:
    // A code point wider than one unit, with the extra units of all wide code points up to and
    // including it: its UTF-16 (or UTF-8) offset is codePoint + extraBefore, where extraBefore
    // is the previous entry's extraThrough.
    struct Wide {
        qint64 codePoint;
        qint64 extraThrough;
    };
    static qint64 unitsFromCodePoint(const std::vector<Wide> &wide, qint64 codePoint);
    static qint64 codePointFromUnits(const std::vector<Wide> &wide, qint64 units);

    qint64 m_codePointCount = 0;
    qint64 m_utf16Length = 0;
    qint64 m_utf8Length = 0;
    std::vector<Wide> m_utf16Wide; // supplementary code points (surrogate pairs)
    std::vector<Wide> m_utf8Wide; // code points from U+0080 up
};

} // namespace fourfold
