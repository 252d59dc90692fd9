#pragma once
// IOB2 token files (Tjong Kim Sang & Veenstra 1999, "Representing text chunks", EACL: B- opens
// a chunk, I- continues it, O is outside; in IOB2 every chunk starts with B-), one column per
// framing function so that spans of different functions may overlap. Tokens are the article's
// stored ICU word tokens (UAX #29), frozen at import.
//
//   # fourfold iob2: token start end problem cause evaluation remedy
//   # article = f1
//   # sha256 = 3a7b...
//   # source = gold
//   The	0	3	O	O	O	O
//   ferry	4	9	B-problem	O	O	O
//   ...
//   (a blank line ends each article)
//
// Columns are separated by one tab; start and end are the token's half-open code-point range.
// With the text withheld the token column is "_". A token is tagged for a function when a span
// of that function overlaps it by at least one code point; spans of one function that overlap
// each other are merged first (a column holds one chunk at a time), so the file re-assembles
// the same spans exactly when they begin and end on token boundaries and do not overlap within
// their function; otherwise it gives them widened to whole tokens.

#include "core/model/error.h"
#include "core/model/framing_function.h"
#include "core/model/text_range.h"

#include <QByteArray>
#include <QString>

#include <vector>

namespace fourfold {

struct Iob2Span {
    FramingFunction function = FramingFunction::Problem;
    TextRange range;
    friend bool operator==(const Iob2Span &, const Iob2Span &) = default;
};

struct Iob2Document {
    QString externalId;
    QString sha256;
    QString source; // "gold", a pseudonym, "run:NAME"
    QString text; // the canonical text; empty when it is withheld
    std::vector<TextRange> tokens;
    std::vector<Iob2Span> spans;
};

// Writes the documents in the format above (UTF-8, LF). Token texts come from `text` unless
// `withText` is false (or the text is empty).
QByteArray writeIob2(const std::vector<Iob2Document> &documents, bool withText);
// The parts of that file, for writing it a document at a time: the header line, then each
// document (its comment lines, its tokens and the blank line that ends it).
QByteArray iob2Header();
QByteArray writeIob2Document(const Iob2Document &document, bool withText);

// Reads a file written by writeIob2 and re-assembles the spans of each document (text left
// empty; tokens and spans filled, spans in order of function then start). Fails with
// InvalidInput naming `file`, the line and column for: a missing "# article" before tokens, a
// row without 7 tab-separated fields, a start or end that is not a number, a tag other than O,
// B-f or I-f of its column's function, or an I- tag that continues nothing (IOB2 violation).
Result<std::vector<Iob2Document>> readIob2(const QByteArray &bytes, const QString &file);

} // namespace fourfold
