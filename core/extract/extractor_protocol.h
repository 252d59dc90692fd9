#pragma once
// The JSON Lines protocol between Fourfold and an external extractor, and the span file of a
// finished run. Offsets are half-open ranges [start, end) of Unicode code points into the
// article's canonical text (design.md §3), as a Python str slices.
//
// To the extractor, one line per article:
//   {"id": "a1", "title": "...", "language": "en", "text": "...",
//    "paragraphs": [{"start": 0, "end": 120, "role": "intro"}, ...],
//    "sentences": [[0, 57], [58, 120], ...], "tokens": [[0, 3], [4, 9], ...]}
// From the extractor, one line per article (any order, each article exactly once):
//   {"id": "a1", "spans": [{"function": "cause", "start": 58, "end": 120,
//                           "score": 0.8, "attributes": {"actor": "the council"}}]}
// "score" (a number or null) and "attributes" (an object) may be left out. A span file holds
// one span per line: {"article": "a1", "function": ..., "start": ..., "end": ..., "score": ...,
// "attributes": ...}. Unknown fields are errors; blank lines are ignored.

#include "core/model/article.h"
#include "core/model/error.h"
#include "core/model/extractor_run.h"

#include <QByteArray>
#include <QHash>
#include <QJsonObject>
#include <QString>

#include <expected>
#include <vector>

namespace fourfold {

// The protocol line for `article` (compact JSON and a final '\n').
QByteArray articleProtocolLine(const Article &article);

// What an article is to a reader of spans: its id and length in code points.
struct SpanTarget {
    ArticleId id;
    qint64 length = 0;
};

// Reads one span object of the protocol (the fields function, start, end, score, attributes,
// plus those in `extraFields`, which the caller reads) for an article of `length` code points.
// Returns the sentence that says what is wrong otherwise.
std::expected<ExtractedSpan, QString> spanFromJson(
    const QJsonObject &object, qint64 length, const QStringList &extraFields = {});

// Parses the complete output of an external extractor: one object per line, `file` naming it in
// messages. `articles` maps each external id sent to the extractor to its target; every one
// must be answered exactly once. InvalidInput with the line (and, for syntax errors, the column
// in code points) otherwise.
Result<std::vector<ExtractedSpan>> readExtractorOutput(
    const QByteArray &output, const QString &file, const QHash<QString, SpanTarget> &articles);

// Parses a span file (see above); `articles` maps external ids to targets. InvalidInput naming
// `file`, the line and what is wrong; an empty file is an error.
Result<std::vector<ExtractedSpan>> readSpanFile(
    const QByteArray &bytes, const QString &file, const QHash<QString, SpanTarget> &articles);

} // namespace fourfold
