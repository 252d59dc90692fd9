#pragma once
// A half-open range [start, end) of Unicode code points into an article's canonical text.
// This is the one unit of text position in Fourfold (design.md §3; W3C Web Annotation
// TextPositionSelector counts code points the same way, as does slicing a Python str).

#include <QtGlobal>

#include <algorithm>
#include <optional>

namespace fourfold {

struct TextRange {
    qint64 start = 0;
    qint64 end = 0;

    constexpr qint64 length() const { return end - start; }
    constexpr bool isEmpty() const { return end <= start; }
    constexpr bool isValid() const { return start >= 0 && end >= start; }
    // True if code point `pos` lies inside [start, end).
    constexpr bool contains(qint64 pos) const { return pos >= start && pos < end; }
    constexpr bool contains(const TextRange &other) const
    {
        return other.start >= start && other.end <= end;
    }
    // True if the two ranges share at least one code point.
    constexpr bool overlaps(const TextRange &other) const
    {
        return start < other.end && other.start < end;
    }
    // The shared code points, or nothing if the ranges do not overlap.
    constexpr std::optional<TextRange> intersect(const TextRange &other) const
    {
        if (!overlaps(other))
            return std::nullopt;
        return TextRange {std::max(start, other.start), std::min(end, other.end)};
    }
    friend constexpr bool operator==(const TextRange &, const TextRange &) = default;
    friend constexpr auto operator<=>(const TextRange &, const TextRange &) = default;
};

} // namespace fourfold
