#pragma once
// Segmentation of canonical text with ICU for an article's language (BCP 47 tag): paragraphs,
// sentences (with abbreviation suppression), word tokens and grapheme clusters. Computed once at
// import and stored, so units never move afterwards (design.md §3). The results do not depend on
// the process locale. ICU iterators are created once per thread and language and reused.

#include "core/model/error.h"
#include "core/model/text_range.h"

#include <QString>

#include <vector>

namespace fourfold {

struct Segmentation {
    // Non-empty blocks of text separated by one or more blank lines (a line holding only
    // whitespace counts as blank), trimmed of surrounding whitespace. Code-point ranges.
    std::vector<TextRange> paragraphs;
    // ICU sentences (UAX #29) inside each paragraph (a sentence never crosses a paragraph
    // boundary), trimmed of whitespace; a single line break inside a paragraph counts as a
    // space. Abbreviations such as "Dr.", "z.B." (also "z. B."), "bijv." do not end a sentence:
    // ICU's CLDR list for the language plus Fourfold's own (core/text/abbreviations.cpp),
    // matched against whole words only.
    std::vector<TextRange> sentences;
    // ICU word-boundary segments (UAX #29) that hold visible text: words, numbers, punctuation
    // marks and emoji, each its own token. Segments made only of White_Space and default-
    // ignorable characters (e.g. ZERO WIDTH SPACE) are not tokens. Never crosses a sentence
    // boundary. All three lists are sorted and free of overlaps.
    std::vector<TextRange> tokens;
};

// Segments `text` (must be canonical) for `languageTag` (BCP 47, e.g. "en", "nl", "de-AT"; an
// empty tag means "en"). Fails with InvalidArgument for a tag ICU cannot parse and with Internal
// if ICU cannot create its break iterators.
Result<Segmentation> segmentText(const QString &text, const QString &languageTag);

// Code-point positions of every extended grapheme-cluster boundary of `text` (UAX #29 §3),
// including 0 and the length, ascending.
std::vector<qint64> graphemeBoundaries(const QString &text);

// Widens `range` (code points) to whole grapheme clusters (start rounds down, end rounds up).
// An invalid or out-of-bounds range gives {-1, -1}.
TextRange snapToGraphemes(const QString &text, const TextRange &range);

// Widens `range` to whole word tokens of `segmentation` (computed for `text`) that it touches,
// then trims leading and trailing whitespace; a range touching no token is only snapped to
// grapheme clusters. A non-empty range touches the tokens it overlaps; an empty range (a caret)
// touches the token that contains its position. An invalid or out-of-bounds range gives
// {-1, -1}.
TextRange snapToWords(
    const QString &text, const Segmentation &segmentation, const TextRange &range);

} // namespace fourfold
