#pragma once
// Krippendorff's alpha for unitizing a continuum (Krippendorff 2004, Content Analysis 2nd ed.,
// §11.6; Krippendorff 2004, Quality & Quantity 38: 787–800): each coder cuts the continuum into
// units of each category and gaps; disagreement is measured on the lengths of overlapping
// sections.
//
// The continuum is discrete (code points): a section [b, e) has length e − b, and a unit of
// length l fits into a gap of length g at g − l + 1 positions, as in Krippendorff's D_e.
// Several articles coded by the same coders are laid end to end as sections of one continuum,
// with a break at each boundary: no unit and no gap crosses a break, so a gap at the end of one
// article does not join a gap at the start of the next, and the result does not depend on the
// order in which the articles are laid out.
//
// More than two coders: the 2004 definition sums the distances over all ordered pairs of coders
// and divides by m(m − 1), so D_o is the mean of the pairwise D_o; D_e pools the units and gaps
// of all coders. Krippendorff, Mathet, Bouvry & Widlöcher (2016, Quality & Quantity 50) later
// revised the coefficient because the 2004 form behaves unexpectedly with more than two coders;
// this file computes the 2004 form, not that revision.

#include "core/reliability/reliability_data.h"

#include <cstdint>
#include <optional>
#include <string>
#include <vector>

namespace fourfold::reliability {

// One coder's unit: category and the half-open range [begin, end) on the continuum.
struct ContinuumUnit {
    int coder = 0;
    int category = 0;
    std::int64_t begin = 0;
    std::int64_t end = 0;
};

struct UnitizingCategoryResult {
    std::optional<double> value; // alpha; nothing when undefined, see reason
    UndefinedReason reason;
    double observedDisagreement = 0; // D_o (for `overall`: the sum over categories)
    double expectedDisagreement = 0; // D_e (for `overall`: the sum over categories)
};

struct UnitizingResult {
    std::vector<UnitizingCategoryResult> perCategory; // one per category 0..categories−1
    // Pooled over categories: alpha = 1 − Σ_c D_o(c) / Σ_c D_e(c) (Krippendorff 2004, §11.6).
    UnitizingCategoryResult overall;
    // Empty when the input is valid; otherwise one sentence naming the offending unit (by its
    // index in `units`) and what is wrong; then `perCategory` is empty and nothing is computed.
    std::string inputError;
};

// All `coders` are taken to have coded the whole continuum [begin, end) (code points or any
// integer positions). Every unit must have 0 ≤ coder < coders, 0 ≤ category < categories and
// begin ≤ unit.begin < unit.end ≤ end; units of one coder and category must not overlap each
// other (they may touch). Invalid input gives `inputError` and no values. A category (or the
// pooled value) is undefined, with a reason and never NaN, when there are fewer than two coders,
// no coder marked a unit of it, or its expected disagreement is 0.
UnitizingResult unitizingAlpha(std::int64_t begin, std::int64_t end, int coders, int categories,
    const std::vector<ContinuumUnit> &units);
// The same on a continuum cut into sections at `breaks` (positions strictly inside (begin, end),
// ascending): every gap ends at a break, and a unit that crosses one is invalid input.
UnitizingResult unitizingAlpha(std::int64_t begin, std::int64_t end, int coders, int categories,
    const std::vector<ContinuumUnit> &units, const std::vector<std::int64_t> &breaks);

} // namespace fourfold::reliability
