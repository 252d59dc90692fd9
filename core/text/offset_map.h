#pragma once
// The one converter between text positions: Unicode code points (Fourfold's unit everywhere),
// UTF-16 code units (QString, QTextCursor) and UTF-8 bytes (files, SQLite). No other code
// converts offsets (design.md §3).

#include "core/model/text_range.h"

#include <QString>

#include <vector>

namespace fourfold {

class OffsetMap
{
public:
    // Builds the map for `text` in O(n). The map keeps no reference to `text`.
    explicit OffsetMap(const QString &text);

    qint64 codePointCount() const;
    qint64 utf16Length() const;
    qint64 utf8Length() const;

    // Position conversions. Positions are boundaries (0..length inclusive). A code-point
    // position outside [0, codePointCount()] returns -1. A UTF-16 position inside a surrogate
    // pair (or a UTF-8 position inside a multi-byte sequence) maps to the code point it splits,
    // rounded down to that code point's start.
    qint64 utf16FromCodePoint(qint64 codePoint) const;
    qint64 codePointFromUtf16(qint64 utf16) const;
    qint64 utf8FromCodePoint(qint64 codePoint) const;
    qint64 codePointFromUtf8(qint64 utf8) const;

    // Range conversions; the start rounds down and the end rounds up to a whole code point.
    // An invalid or out-of-bounds range gives an empty range {-1, -1}.
    TextRange utf16Range(const TextRange &codePoints) const;
    TextRange codePointRangeFromUtf16(qint64 start16, qint64 end16) const;

    // The substring of `text` (the same text the map was built from) at a code-point range.
    static QString slice(const QString &text, const TextRange &codePoints);

private:
    // UTF-16 and UTF-8 offsets of every code point boundary, codePointCount()+1 entries each.
    std::vector<qint64> m_utf16;
    std::vector<qint64> m_utf8;
};

} // namespace fourfold
