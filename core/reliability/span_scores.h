#pragma once
// Scores of predicted spans against reference spans, after the MUC scheme (Chinchor & Sundheim
// 1993) as used in the SemEval-2013 Task 9.1 evaluation: COR, INC, PAR, MIS, SPU; strict, exact,
// partial and type matching; precision, recall and F1 per category, micro and macro. Between
// two coders, span F1 equals positive specific agreement (Hripcsak & Rothschild 2005).
//
// Matching (our convention, deterministic and one-to-one): within each document, every pair of a
// reference and a predicted span that overlap (share at least one position) is a candidate.
// Candidates are taken greedily in this order, skipping a pair when either span is already
// matched:
//   1. by tier — Strict, Exact, Partial: identical boundaries and category, identical boundaries,
//      overlap and same category, any other overlap; Type (where boundaries do not decide the
//      outcome): identical boundaries and category, overlap and same category, identical
//      boundaries, any other overlap;
//   2. larger overlap first;
//   3. smaller |Δbegin| + |Δend| first;
//   4. reference, then predicted span in (begin, end, category) order, then input order.
// Every reference span thus gets one outcome (COR, INC, PAR or MIS) and every predicted span one
// (COR, INC, PAR or SPU, the first three shared with its reference), so POS = number of reference
// spans and ACT = number of predicted spans. The outcome of a matched pair by mode (SemEval-2013
// Task 9.1):
//   Strict   COR if identical boundaries and category, else INC
//   Exact    COR if identical boundaries, else INC
//   Partial  COR if identical boundaries, else PAR (category ignored)
//   Type     COR if same category, else INC (boundaries ignored beyond overlapping)
// A predicted span that overlaps a reference span already matched to another prediction is SPU.

#include "core/reliability/reliability_data.h"

#include <cstdint>
#include <optional>
#include <string>
#include <vector>

namespace fourfold::reliability {

struct LabelledSpan {
    int document = 0; // spans only match within one document
    int category = 0;
    std::int64_t begin = 0; // [begin, end) on the document's text
    std::int64_t end = 0;
};

enum class MatchMode {
    Strict, // same boundaries and category
    Exact, // same boundaries, any category
    Partial, // overlap counts half (PAR), same boundaries count whole
    Type, // same category, any overlap
};

// Counts of one category (or pooled). precision = (COR + ½·PAR) / ACT, recall = (COR + ½·PAR) /
// POS (SemEval-2013 Task 9.1; PAR occurs only in Partial mode, so elsewhere these are COR/ACT and
// COR/POS). f1 = 2·(COR + ½·PAR) / (POS + ACT): the harmonic mean of precision and recall when
// both are defined, and positive specific agreement 2a / (2a + b + c) (Hripcsak & Rothschild
// 2005); it is 0, not undefined, when there are reference spans but no predictions.
struct SpanCounts {
    double correct = 0, incorrect = 0, partial = 0, missing = 0, spurious = 0;
    double possible() const { return correct + incorrect + partial + missing; }
    double actual() const { return correct + incorrect + partial + spurious; }
    std::optional<double> precision, recall, f1; // nothing when the denominator is 0
};

enum class SpanOutcome { Correct, Incorrect, Partial, Missing, Spurious };

// One outcome of the matching: indices into the `reference` and `predicted` arguments, −1 when
// there is none (Missing has no predicted span, Spurious no reference span).
struct SpanMatch {
    int reference = -1;
    int predicted = -1;
    SpanOutcome outcome = SpanOutcome::Missing;
};

struct SpanScores {
    // Per category: COR, INC, PAR and MIS count under the reference span's category, SPU under
    // the predicted span's category (so a wrong-category prediction costs its reference
    // category recall and precision, not the category it predicted).
    std::vector<SpanCounts> perCategory;
    SpanCounts micro; // the counts summed over categories, scored once
    // Unweighted means over the categories whose value is defined (each of the three on its own:
    // a category with reference spans but no predictions enters recall and F1, not precision);
    // nothing when no category has a value.
    std::optional<double> macroPrecision, macroRecall, macroF1;
    // One entry per reference span in input order, then one per unmatched predicted span.
    std::vector<SpanMatch> matches;
    // Empty when the input is valid; otherwise one sentence naming the offending span (which
    // list, its index) and what is wrong; then `perCategory` and `matches` are empty and nothing
    // is scored.
    std::string inputError;
};

// Scores `predicted` against `reference` with the matching described above. Every span must have
// 0 ≤ category < categories and begin < end. Invalid input gives `inputError` and no scores.
SpanScores scoreSpans(const std::vector<LabelledSpan> &reference,
    const std::vector<LabelledSpan> &predicted, int categories, MatchMode mode);

} // namespace fourfold::reliability
