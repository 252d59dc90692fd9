#pragma once
// Importing codings anchored by quote rather than by offset: each span names its article, coder,
// function and the exact quote (and which occurrence of it), so that hand-written or
// spreadsheet-made codings can be loaded without counting characters. Used to build the sample
// project. One JSON object per line:
//   {"article": ID, "coder": PSEUDONYM, "function": "cause", "quote": "...", "occurrence": 1,
//    "attributes": {...}, "note": "...", "confidence": 0.8}
//   {"article": ID, "coder": PSEUDONYM, "item": "dominant_function", "value": "problem"}
//   {"article": ID, "coder": LEAD, "gold": true, "function": "cause", "quote": "...",
//    "rationale": "..."}   (a gold span; its sources are the overlapping spans of that function
//                          already in the project, so gold lines come after the codings)

#include "core/model/annotation.h"
#include "core/model/error.h"

#include <QString>

namespace fourfold {

class Project;

struct CodingImportReport {
    qint64 spans = 0;
    qint64 judgements = 0;
    qint64 gold = 0;
    qint64 articlesDone = 0; // (article, coder) pairs marked done by the import
};

// Reads `path` and adds every span and answer in `phase`, all-or-nothing. Imported codings are
// finished work: every article they cover is marked done for its coder (CodingScope). Fails with
// InvalidInput naming file, line and what is wrong: bad JSON, a missing or mistyped field, an
// unknown article, coder or function, a quote that does not occur (often enough) in the
// article, attributes the codebook does not allow.
Result<CodingImportReport> importQuotedCodings(Project &project, const QString &path, Phase phase);

} // namespace fourfold
