#pragma once
// Segmentation of canonical text with ICU for an article's language (BCP 47 tag): paragraphs,
// sentences (with abbreviation suppression), word tokens and grapheme clusters. Computed once at
// import and stored, so units never move afterwards (design.md §3).

#include "core/model/error.h"
#include "core/model/text_range.h"

#include <QString>

#include <vector>

namespace fourfold {

struct Segmentation {
    // Non-empty blocks of text separated by one or more blank lines (a line holding only
    // whitespace counts as blank), trimmed of surrounding whitespace. Code-point ranges.
    std::vector<TextRange> paragraphs;
    // ICU sentences inside each paragraph (a sentence never crosses a paragraph boundary),
    // trimmed of trailing whitespace; abbreviations such as "Dr.", "z.B.", "bijv." do not end a
    // sentence.
    std::vector<TextRange> sentences;
    // ICU word-boundary segments that are not whitespace: words, numbers, punctuation marks and
    // emoji, each its own token. Never crosses a sentence boundary.
    std::vector<TextRange> tokens;
};

// Segments `text` (must be canonical) for `languageTag` (BCP 47, e.g. "en", "nl", "de-AT"; an
// empty tag means "en"). Fails with InvalidArgument for a tag ICU cannot parse and with Internal
// if ICU cannot create its break iterators.
Result<Segmentation> segmentText(const QString &text, const QString &languageTag);

// Code-point positions of every grapheme-cluster boundary of `text`, including 0 and the length.
std::vector<qint64> graphemeBoundaries(const QString &text);

// Widens `range` to whole grapheme clusters (start rounds down, end rounds up).
TextRange snapToGraphemes(const QString &text, const TextRange &range);

// Widens `range` to whole word tokens of `segmentation` that it touches, then trims leading and
// trailing whitespace; a range touching no token is only snapped to grapheme clusters.
TextRange snapToWords(const QString &text, const Segmentation &segmentation,
                      const TextRange &range);

} // namespace fourfold
