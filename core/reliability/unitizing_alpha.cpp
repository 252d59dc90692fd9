#include "core/reliability/unitizing_alpha.h"

#include <algorithm>
#include <cstddef>
#include <numeric>
#include <string>
#include <vector>

// Notation of Krippendorff (2004), Content Analysis 2nd ed., §11.6 (pp. 251–256), for one
// category c: coder i's continuum [B, B + L) is cut into sections g with begin b_ig, length l_ig
// and w_ig = 1 for a unit of c, 0 for a gap; m coders, N_c units of c over all coders.
//
// Distance between sections g of coder i and h of coder j (ibid.; Krippendorff 2004, Quality &
// Quantity 38: 787–800):
//   δ²(ig, jh) = (b_ig − b_jh)² + (b_ig + l_ig − b_jh − l_jh)²   both units and they overlap
//                                                                 (−l_ig < b_ig − b_jh < l_jh)
//              = l_ig²   unit ig lies wholly inside gap jh  (0 ≤ b_ig − b_jh ≤ l_jh − l_ig)
//              = l_jh²   unit jh lies wholly inside gap ig  (0 ≤ b_jh − b_ig ≤ l_ig − l_jh)
//              = 0       otherwise
//   D_o(c) = Σ_i Σ_{j≠i} Σ_g Σ_h δ²(ig, jh) / (m (m − 1) L²)
//   D_e(c) = (2/L) Σ_i Σ_g w_ig [ (N_c − 1)/3 · (2 l_ig³ − 3 l_ig² + l_ig)
//                                 + l_ig² Σ_j Σ_h (1 − w_jh) · max(0, l_jh − l_ig + 1) ]
//            / ( mL (mL − 1) − Σ_i Σ_g w_ig l_ig (l_ig − 1) )
//   alpha(c) = 1 − D_o(c) / D_e(c);  alpha = 1 − Σ_c D_o(c) / Σ_c D_e(c)
// In D_e, j runs over all coders, i included. The equations are written here from memory of the
// book; the worked example on p. 254 (tests/reliability/unitizing_alpha_test.cpp) reproduces
// every printed digit with them, and with units of length one they reduce to the nominal alpha
// of Krippendorff (2011), also checked in the tests.

namespace fourfold::reliability {
namespace {

struct Interval {
    std::int64_t begin = 0;
    std::int64_t end = 0;
    double length() const { return double(end) - double(begin); }
};

double squared(double x)
{
    return x * x;
}

std::string describe(const ContinuumUnit &u, std::size_t index)
{
    return "unit " + std::to_string(index) + " (coder " + std::to_string(u.coder) + ", category "
        + std::to_string(u.category) + ", [" + std::to_string(u.begin) + ", "
        + std::to_string(u.end) + "))";
}

std::string validate(std::int64_t begin, std::int64_t end, int coders, int categories,
    const std::vector<ContinuumUnit> &units, const std::vector<std::int64_t> &breaks)
{
    if (end <= begin)
        return "the continuum [" + std::to_string(begin) + ", " + std::to_string(end)
            + ") is empty";
    if (coders < 0)
        return "the number of coders is negative (" + std::to_string(coders) + ")";
    if (categories < 0)
        return "the number of categories is negative (" + std::to_string(categories) + ")";
    for (std::size_t k = 0; k < units.size(); ++k) {
        const ContinuumUnit &u = units[k];
        if (u.coder < 0 || u.coder >= coders)
            return describe(u, k) + ": coder must be in 0.." + std::to_string(coders - 1);
        if (u.category < 0 || u.category >= categories)
            return describe(u, k) + ": category must be in 0.." + std::to_string(categories - 1);
        if (u.end <= u.begin)
            return describe(u, k) + ": the unit is empty (end must be after begin)";
        if (u.begin < begin || u.end > end)
            return describe(u, k) + ": the unit lies outside the continuum ["
                + std::to_string(begin) + ", " + std::to_string(end) + ")";
    }
    for (std::size_t k = 0; k < breaks.size(); ++k) {
        if (breaks[k] <= begin || breaks[k] >= end)
            return "section break " + std::to_string(breaks[k]) + " lies outside ("
                + std::to_string(begin) + ", " + std::to_string(end) + ")";
        if (k > 0 && breaks[k] <= breaks[k - 1])
            return "section breaks must be ascending (" + std::to_string(breaks[k - 1]) + ", "
                + std::to_string(breaks[k]) + ")";
    }
    for (std::size_t k = 0; k < units.size(); ++k) {
        const ContinuumUnit &u = units[k];
        const auto next = std::upper_bound(breaks.begin(), breaks.end(), u.begin);
        if (next != breaks.end() && *next < u.end)
            return describe(u, k) + ": the unit crosses the section break at "
                + std::to_string(*next);
    }
    std::vector<std::size_t> order(units.size());
    std::iota(order.begin(), order.end(), std::size_t(0));
    std::sort(order.begin(), order.end(), [&](std::size_t a, std::size_t b) {
        const ContinuumUnit &x = units[a], &y = units[b];
        if (x.coder != y.coder)
            return x.coder < y.coder;
        if (x.category != y.category)
            return x.category < y.category;
        if (x.begin != y.begin)
            return x.begin < y.begin;
        return a < b;
    });
    for (std::size_t k = 1; k < order.size(); ++k) {
        const ContinuumUnit &prev = units[order[k - 1]], &cur = units[order[k]];
        if (prev.coder == cur.coder && prev.category == cur.category && cur.begin < prev.end)
            return describe(cur, order[k]) + " overlaps " + describe(prev, order[k - 1])
                + ": one coder's units of one category must not overlap";
    }
    return {};
}

// Σ_g Σ_h δ²(ig, jh) for one ordered pair of coders; `a` and `b` are the two coders' units of one
// category, sorted and not overlapping. The pair (j, i) gives the same sum since δ² is symmetric.
// A unit overlapping no unit of the other coder lies wholly inside one of that coder's gaps,
// because the gaps are the complement of the units on the continuum.
double pairDisagreement(const std::vector<Interval> &a, const std::vector<Interval> &b)
{
    double sum = 0;
    std::vector<char> bOverlapped(b.size(), 0);
    std::size_t first = 0;
    for (const Interval &u : a) {
        while (first < b.size() && b[first].end <= u.begin)
            ++first;
        bool overlapped = false;
        for (std::size_t k = first; k < b.size() && b[k].begin < u.end; ++k) {
            overlapped = true;
            bOverlapped[k] = 1;
            sum += squared(double(u.begin) - double(b[k].begin))
                + squared(double(u.end) - double(b[k].end));
        }
        if (!overlapped)
            sum += squared(u.length());
    }
    for (std::size_t k = 0; k < b.size(); ++k) {
        if (!bOverlapped[k])
            sum += squared(b[k].length());
    }
    return sum;
}

struct Disagreements {
    double observed = 0;
    double expected = 0;
    std::size_t units = 0;
};

// D_o(c) and D_e(c) of Krippendorff (2004), §11.6 (see the equations at the top of this file).
Disagreements categoryDisagreements(const std::vector<std::vector<Interval>> &byCoder,
    std::int64_t begin, std::int64_t end, const std::vector<std::int64_t> &breaks)
{
    Disagreements d;
    const double length = double(end) - double(begin);
    const double m = double(byCoder.size());

    double pairSum = 0;
    for (std::size_t i = 0; i < byCoder.size(); ++i)
        for (std::size_t j = i + 1; j < byCoder.size(); ++j)
            pairSum += pairDisagreement(byCoder[i], byCoder[j]);
    // Both ordered pairs (i, j) and (j, i) count: factor 2 over the unordered pairs.
    d.observed = 2 * pairSum / (m * (m - 1) * length * length);

    // Each coder's gaps: the complement of their units, cut at every section break.
    std::vector<double> gaps;
    const auto addGaps = [&](std::int64_t from, std::int64_t to) {
        auto cut = std::upper_bound(breaks.begin(), breaks.end(), from);
        for (; cut != breaks.end() && *cut < to; ++cut) {
            gaps.push_back(double(*cut) - double(from));
            from = *cut;
        }
        if (to > from)
            gaps.push_back(double(to) - double(from));
    };
    for (const std::vector<Interval> &units : byCoder) {
        std::int64_t cursor = begin;
        for (const Interval &u : units) {
            if (u.begin > cursor)
                addGaps(cursor, u.begin);
            cursor = u.end;
        }
        if (end > cursor)
            addGaps(cursor, end);
        d.units += units.size();
    }
    std::sort(gaps.begin(), gaps.end());
    // suffix[k] = Σ gaps[k..]: Σ_{gaps ≥ l} (l_jh − l + 1) = suffix − (l − 1) · count.
    std::vector<double> suffix(gaps.size() + 1, 0);
    for (std::size_t k = gaps.size(); k-- > 0;)
        suffix[k] = suffix[k + 1] + gaps[k];

    const double otherUnits = double(d.units) - 1;
    double numerator = 0;
    double withinUnitPairs = 0;
    for (const std::vector<Interval> &units : byCoder) {
        for (const Interval &u : units) {
            const double l = u.length();
            // 2l³ − 3l² + l = l(l − 1)(2l − 1), written factored to keep the terms small.
            double term = otherUnits / 3 * l * (l - 1) * (2 * l - 1);
            const auto from = std::lower_bound(gaps.begin(), gaps.end(), l);
            const auto index = std::size_t(from - gaps.begin());
            const double count = double(gaps.size() - index);
            term += l * l * (suffix[index] - (l - 1) * count);
            numerator += term;
            withinUnitPairs += l * (l - 1);
        }
    }
    const double mL = m * length;
    // mL(mL − 1) > Σ l(l − 1) whenever m ≥ 2, since every unit is at most L long.
    d.expected = (2 / length) * numerator / (mL * (mL - 1) - withinUnitPairs);
    return d;
}

UnitizingCategoryResult undefinedResult(UndefinedReason reason)
{
    UnitizingCategoryResult r;
    r.reason = std::move(reason);
    return r;
}

} // namespace

UnitizingResult unitizingAlpha(std::int64_t begin, std::int64_t end, int coders, int categories,
    const std::vector<ContinuumUnit> &units)
{
    return unitizingAlpha(begin, end, coders, categories, units, {});
}

UnitizingResult unitizingAlpha(std::int64_t begin, std::int64_t end, int coders, int categories,
    const std::vector<ContinuumUnit> &units, const std::vector<std::int64_t> &breaks)
{
    UnitizingResult result;
    result.inputError = validate(begin, end, coders, categories, units, breaks);
    if (!result.inputError.empty()) {
        result.overall = undefinedResult("invalid input: " + result.inputError);
        return result;
    }
    if (coders < 2) {
        const UndefinedReason reason = "fewer than two coders";
        result.perCategory.assign(std::size_t(categories), undefinedResult(reason));
        result.overall = undefinedResult(reason);
        return result;
    }

    // byCategory[c][i]: coder i's units of category c, sorted by begin.
    using ByCoder = std::vector<std::vector<Interval>>;
    std::vector<ByCoder> byCategory(
        static_cast<std::size_t>(categories), ByCoder(static_cast<std::size_t>(coders)));
    for (const ContinuumUnit &u : units)
        byCategory[std::size_t(u.category)][std::size_t(u.coder)].push_back({u.begin, u.end});
    for (auto &byCoder : byCategory)
        for (auto &list : byCoder)
            std::sort(list.begin(), list.end(),
                [](const Interval &a, const Interval &b) { return a.begin < b.begin; });

    double observedSum = 0;
    double expectedSum = 0;
    for (const auto &byCoder : byCategory) {
        const Disagreements d = categoryDisagreements(byCoder, begin, end, breaks);
        UnitizingCategoryResult r;
        r.observedDisagreement = d.observed;
        r.expectedDisagreement = d.expected;
        if (d.units == 0)
            r.reason = "no coder marked a unit of this category";
        else if (d.expected <= 0)
            r.reason = "the expected disagreement is 0 (every coder marked every position as a "
                       "unit of length one)";
        else
            r.value = 1 - d.observed / d.expected;
        observedSum += d.observed;
        expectedSum += d.expected;
        result.perCategory.push_back(std::move(r));
    }

    // Pooled over categories as sums of D_o and D_e (Krippendorff 2004, §11.6): with the example
    // of p. 254 this gives 0.8587; the printed 0.8591 comes from the rounded parts.
    result.overall.observedDisagreement = observedSum;
    result.overall.expectedDisagreement = expectedSum;
    if (units.empty())
        result.overall.reason = "no coder marked any unit";
    else if (expectedSum <= 0)
        result.overall.reason = "the expected disagreement is 0 (every coder marked every "
                                "position as a unit of length one)";
    else
        result.overall.value = 1 - observedSum / expectedSum;
    return result;
}

} // namespace fourfold::reliability
