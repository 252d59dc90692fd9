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

#include <functional>

namespace fourfold {

class Project;

struct CodingImportReport {
    qint64 spans = 0;
    qint64 judgements = 0;
    qint64 gold = 0;
    qint64 articlesDone = 0; // (article, coder) pairs marked done by the import
    // Lines the project already held (or an earlier line of the file): the same coder, function,
    // range and phase for a span; the same function and range for a gold span; an answer equal
    // to the coder's answer to that item in that phase. Skipped, so importing a file twice adds
    // nothing.
    qint64 skipped = 0;
};

// Reads `path` and adds every span and answer in `phase` that the project does not hold yet
// (see CodingImportReport::skipped), all-or-nothing. Imported codings are
// finished work: every article they cover is marked done for its coder (CodingScope). Fails with
// InvalidInput naming file, line and what is wrong: bad JSON, a missing or mistyped field, an
// unknown article, coder or function, a quote that does not occur (often enough) in the
// article, attributes the codebook does not allow.
Result<CodingImportReport> importQuotedCodings(Project &project, const QString &path, Phase phase);
// The same with each line's phase chosen by its article's external id (build-sample: the study's
// reliability articles in the reliability phase, the others in production).
Result<CodingImportReport> importQuotedCodings(Project &project, const QString &path,
    const std::function<Phase(const QString &article)> &phaseOf);

} // namespace fourfold
