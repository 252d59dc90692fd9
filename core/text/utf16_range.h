#pragma once
// A half-open range [start, end) of UTF-16 code units into a QString: the positions Qt's text
// classes (QString::mid, QTextCursor, QTextLayout) and ICU count in. Fourfold's own unit is the
// code point (TextRange); a Utf16Range lives only where text is handed to Qt or ICU, and
// OffsetMap is the one converter between the two. A type of its own, so that passing one where
// the other is meant does not compile.

#include <QtGlobal>

#include <compare>

namespace fourfold {

struct Utf16Range {
    qint64 start = 0;
    qint64 end = 0;

    constexpr qint64 length() const { return end - start; }
    constexpr bool isEmpty() const { return end <= start; }
    constexpr bool isValid() const { return start >= 0 && end >= start; }
    // True if code unit `pos` lies inside [start, end).
    constexpr bool contains(qint64 pos) const { return pos >= start && pos < end; }
    // True if the two ranges share at least one code unit.
    constexpr bool overlaps(const Utf16Range &other) const
    {
        return start < other.end && other.start < end;
    }
    friend constexpr bool operator==(const Utf16Range &, const Utf16Range &) = default;
    friend constexpr auto operator<=>(const Utf16Range &, const Utf16Range &) = default;
};

} // namespace fourfold
