#include "core/reliability/unitizing_alpha.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <optional>
#include <random>
#include <vector>

using namespace fourfold::reliability;
using Catch::Matchers::Contains;
using Catch::Matchers::WithinAbs;
using Catch::Matchers::WithinRel;

namespace {

// The worked example of Krippendorff (2004), Content Analysis 2nd ed., §11.6, p. 254 *(2nd)*:
// continuum 150–450, categories c (0) and k (1), units given as (begin, length).
std::vector<ContinuumUnit> bookExample(int coderI, int coderJ)
{
    auto unit = [](int coder, int category, std::int64_t begin, std::int64_t length) {
        return ContinuumUnit {coder, category, begin, begin + length};
    };
    return {
        unit(coderI, 0, 225, 70),
        unit(coderI, 0, 370, 30),
        unit(coderI, 1, 180, 60),
        unit(coderI, 1, 300, 50),
        unit(coderJ, 0, 220, 80),
        unit(coderJ, 0, 355, 20),
        unit(coderJ, 0, 400, 20),
        unit(coderJ, 1, 180, 60),
        unit(coderJ, 1, 300, 50),
    };
}

double round4(double x)
{
    return std::round(x * 1e4) / 1e4;
}

// Nominal alpha written out directly from Krippendorff (2011), "Computing Krippendorff's
// Alpha-Reliability", §B (no missing values): coincidences o_ck = Σ_u Σ_{i≠j} [v_iu = c][v_ju = k]
// / (m − 1), D_o = Σ_{c≠k} o_ck / n, D_e = Σ_{c≠k} n_c n_k / (n (n − 1)). Kept here so that this
// test does not depend on core/reliability/krippendorff_alpha.cpp.
struct NominalAlpha {
    std::optional<double> value;
    double observed = 0;
    double expected = 0;
};

NominalAlpha nominalAlpha(const std::vector<std::vector<int>> &valuesByCoder, int values)
{
    const std::size_t m = valuesByCoder.size();
    const std::size_t units = valuesByCoder.front().size();
    const auto v = std::size_t(values);
    std::vector<double> o(v * v, 0);
    for (std::size_t u = 0; u < units; ++u)
        for (std::size_t i = 0; i < m; ++i)
            for (std::size_t j = 0; j < m; ++j)
                if (i != j)
                    o[std::size_t(valuesByCoder[i][u]) * v + std::size_t(valuesByCoder[j][u])] +=
                        1.0 / double(m - 1);
    std::vector<double> marginal(v, 0);
    double n = 0;
    for (std::size_t c = 0; c < v; ++c)
        for (std::size_t k = 0; k < v; ++k) {
            marginal[c] += o[c * v + k];
            n += o[c * v + k];
        }
    double observed = 0, expected = 0;
    for (std::size_t c = 0; c < v; ++c)
        for (std::size_t k = 0; k < v; ++k)
            if (c != k) {
                observed += o[c * v + k];
                expected += marginal[c] * marginal[k];
            }
    NominalAlpha a;
    a.observed = observed / n;
    a.expected = expected / (n * (n - 1));
    if (a.expected > 0)
        a.value = 1 - a.observed / a.expected;
    return a;
}

// Each position p that coder i gave value `category` becomes a unit [p, p + 1) of that category
// for coder i: every position is its own unit of length one (adjacent marked positions stay
// separate units, they are not merged into one longer unit).
std::vector<ContinuumUnit> unitsOfLengthOne(
    const std::vector<std::vector<int>> &valuesByCoder, const std::vector<int> &categories)
{
    std::vector<ContinuumUnit> units;
    for (std::size_t i = 0; i < valuesByCoder.size(); ++i)
        for (std::size_t p = 0; p < valuesByCoder[i].size(); ++p)
            for (std::size_t c = 0; c < categories.size(); ++c)
                if (valuesByCoder[i][p] == categories[c])
                    units.push_back({int(i), int(c), std::int64_t(p), std::int64_t(p) + 1});
    return units;
}

// A deliberately naive D_o and D_e: every coder's continuum is cut into explicit sections
// (begin b, length l, w = 1 for a unit, 0 for a gap) and Krippendorff's (2004, §11.6) δ² and D_e
// are applied literally to every pair of sections, in exact integer arithmetic.
struct Section {
    std::int64_t b = 0, l = 0;
    int w = 0;
};

struct NaiveParts {
    double observed = 0;
    double expected = 0;
};

NaiveParts naiveDisagreements(std::int64_t begin, std::int64_t end, int coders, int category,
    const std::vector<ContinuumUnit> &units)
{
    std::vector<std::vector<Section>> sections(static_cast<std::size_t>(coders));
    for (int i = 0; i < coders; ++i) {
        std::vector<ContinuumUnit> mine;
        for (const ContinuumUnit &u : units)
            if (u.coder == i && u.category == category)
                mine.push_back(u);
        std::sort(mine.begin(), mine.end(),
            [](const ContinuumUnit &a, const ContinuumUnit &b) { return a.begin < b.begin; });
        std::int64_t cursor = begin;
        for (const ContinuumUnit &u : mine) {
            if (u.begin > cursor)
                sections[std::size_t(i)].push_back({cursor, u.begin - cursor, 0});
            sections[std::size_t(i)].push_back({u.begin, u.end - u.begin, 1});
            cursor = u.end;
        }
        if (end > cursor)
            sections[std::size_t(i)].push_back({cursor, end - cursor, 0});
    }
    const std::int64_t L = end - begin;
    const std::int64_t m = coders;

    std::int64_t deltaSum = 0;
    for (int i = 0; i < coders; ++i)
        for (int j = 0; j < coders; ++j) {
            if (i == j)
                continue;
            for (const Section &g : sections[std::size_t(i)])
                for (const Section &h : sections[std::size_t(j)]) {
                    const std::int64_t d = g.b - h.b;
                    if (g.w == 1 && h.w == 1 && -g.l < d && d < h.l)
                        deltaSum += d * d + (d + g.l - h.l) * (d + g.l - h.l);
                    else if (g.w == 1 && h.w == 0 && 0 <= d && d <= h.l - g.l)
                        deltaSum += g.l * g.l;
                    else if (g.w == 0 && h.w == 1 && 0 <= -d && -d <= g.l - h.l)
                        deltaSum += h.l * h.l;
                }
        }

    std::int64_t nUnits = 0;
    for (const auto &list : sections)
        for (const Section &s : list)
            nUnits += s.w;
    // Numerator times 3 so that (N − 1)/3 stays an integer expression.
    std::int64_t numerator3 = 0;
    std::int64_t withinUnits = 0;
    for (const auto &list : sections)
        for (const Section &g : list) {
            if (g.w == 0)
                continue;
            std::int64_t gapPositions = 0;
            for (const auto &other : sections)
                for (const Section &h : other)
                    if (h.w == 0 && h.l >= g.l)
                        gapPositions += h.l - g.l + 1;
            numerator3 += (nUnits - 1) * (2 * g.l * g.l * g.l - 3 * g.l * g.l + g.l)
                + 3 * g.l * g.l * gapPositions;
            withinUnits += g.l * (g.l - 1);
        }
    NaiveParts parts;
    parts.observed = double(deltaSum) / double(m * (m - 1) * L * L);
    parts.expected =
        2.0 / double(L) * (double(numerator3) / 3.0) / double(m * L * (m * L - 1) - withinUnits);
    return parts;
}

// Random valid units: per coder and category, units of length 1..maxLength separated by gaps of
// 0..maxGap positions (0: touching units).
std::vector<ContinuumUnit> randomUnits(std::mt19937 &rng, std::int64_t begin, std::int64_t end,
    int coders, int categories, int maxLength, int maxGap)
{
    std::uniform_int_distribution<int> lengthDist(1, maxLength), gapDist(0, maxGap);
    std::vector<ContinuumUnit> units;
    for (int i = 0; i < coders; ++i)
        for (int c = 0; c < categories; ++c) {
            std::int64_t cursor = begin + gapDist(rng);
            while (true) {
                const std::int64_t unitEnd = cursor + lengthDist(rng);
                if (unitEnd > end)
                    break;
                units.push_back({i, c, cursor, unitEnd});
                cursor = unitEnd + gapDist(rng);
            }
        }
    return units;
}

} // namespace

TEST_CASE("unitizing alpha reproduces Krippendorff's worked example")
{
    const UnitizingResult r = unitizingAlpha(150, 450, 2, 2, bookExample(0, 1));
    REQUIRE(r.inputError.empty());
    REQUIRE(r.perCategory.size() == 2);

    // Krippendorff (2004), Content Analysis 2nd ed., p. 254 *(2nd)*: category c.
    const UnitizingCategoryResult &c = r.perCategory[0];
    CHECK_THAT(c.observedDisagreement, WithinAbs(0.0144, 5e-5));
    CHECK_THAT(c.expectedDisagreement, WithinAbs(0.0532, 5e-5));
    REQUIRE(c.value);
    CHECK_THAT(*c.value, WithinAbs(0.7286, 5e-5));

    // Ibid.: category k, coded identically by both coders.
    const UnitizingCategoryResult &k = r.perCategory[1];
    CHECK(k.observedDisagreement == 0);
    REQUIRE(k.value);
    CHECK_THAT(*k.value, WithinAbs(1.000, 5e-4));

    // Ibid.: the pooled alpha = 1 − (D_o(c) + D_o(k)) / (D_e(c) + D_e(k)) is printed as 0.8591;
    // the unrounded parts give 0.8587. The printed figure is what the rounded parts give:
    // 1 − 0.0144 / (0.0532 + 0.0490) = 0.8591, checked below from our own parts.
    REQUIRE(r.overall.value);
    CHECK_THAT(*r.overall.value, WithinAbs(0.8587, 5e-5));
    CHECK_THAT(r.overall.observedDisagreement,
        WithinRel(c.observedDisagreement + k.observedDisagreement, 1e-12));
    CHECK_THAT(r.overall.expectedDisagreement,
        WithinRel(c.expectedDisagreement + k.expectedDisagreement, 1e-12));
    const double fromRoundedParts = 1
        - round4(c.observedDisagreement)
            / (round4(c.expectedDisagreement) + round4(k.expectedDisagreement));
    CHECK_THAT(fromRoundedParts, WithinAbs(0.8591, 5e-5));
}

TEST_CASE("unitizing alpha: the book example's sums worked by hand")
{
    // Our own hand computation from Krippendorff's (2004, §11.6) definitions, L = 300, m = 2.
    // Category c, pair (i, j): overlapping units (225,70)/(220,80): 5² + 5² = 50;
    // (370,30)/(355,20): 15² + 25² = 850; j's unit (400,20) lies in i's gap [400,450): 20² = 400.
    // Sum 1300, and the same for (j, i): D_o = 2600 / (2 · 1 · 300²). D_e: N = 5 units; gaps i: 75,
    // 75, 50; j: 70, 55, 25, 30. Per unit (4/3)(2l³ − 3l² + l)
    // + l² Σ_{gaps ≥ l}(gap − l + 1): l = 70: 895160 + 4900·13 = 958860; l = 30: 68440 + 900·181
    // = 231340; l = 80: 1339840 + 0; l = 20 (twice): 19760 + 400·247 = 118560. Sum 2767160.
    // Denominator 600·599 − (70·69 + 30·29 + 80·79 + 2·20·19) = 346620.
    const UnitizingResult r = unitizingAlpha(150, 450, 2, 2, bookExample(0, 1));
    const UnitizingCategoryResult &c = r.perCategory[0];
    CHECK_THAT(c.observedDisagreement, WithinRel(2600.0 / 180000.0, 1e-12));
    CHECK_THAT(c.expectedDisagreement, WithinRel(2.0 / 300.0 * 2767160.0 / 346620.0, 1e-12));
    // Category k: N = 4; gaps 30, 60, 100 for each coder. l = 60 (twice): 421260 + 3600·84;
    // l = 50 (twice): 242550 + 2500·124. Denominator 359400 − 2(60·59 + 50·49) = 347420.
    const UnitizingCategoryResult &k = r.perCategory[1];
    CHECK_THAT(k.expectedDisagreement,
        WithinRel(2.0 / 300.0 * (2 * 723660.0 + 2 * 552550.0) / 347420.0, 1e-12));
}

TEST_CASE("unitizing alpha does not depend on which coder is which")
{
    // Property: alpha is symmetric in the coders (style.md §10; δ² is symmetric).
    const UnitizingResult a = unitizingAlpha(150, 450, 2, 2, bookExample(0, 1));
    const UnitizingResult b = unitizingAlpha(150, 450, 2, 2, bookExample(1, 0));
    for (std::size_t c = 0; c < 2; ++c) {
        CHECK_THAT(b.perCategory[c].observedDisagreement,
            WithinRel(a.perCategory[c].observedDisagreement, 1e-12));
        CHECK_THAT(b.perCategory[c].expectedDisagreement,
            WithinRel(a.perCategory[c].expectedDisagreement, 1e-12));
    }
    REQUIRE(b.overall.value);
    CHECK_THAT(*b.overall.value, WithinAbs(*a.overall.value, 1e-12));

    // Three coders, every permutation of them.
    std::mt19937 rng(20240611);
    const std::vector<ContinuumUnit> units = randomUnits(rng, 0, 200, 3, 2, 25, 30);
    const UnitizingResult reference = unitizingAlpha(0, 200, 3, 2, units);
    REQUIRE(reference.overall.value);
    std::vector<int> perm = {0, 1, 2};
    while (std::next_permutation(perm.begin(), perm.end())) {
        std::vector<ContinuumUnit> permuted = units;
        for (ContinuumUnit &u : permuted)
            u.coder = perm[std::size_t(u.coder)];
        const UnitizingResult p = unitizingAlpha(0, 200, 3, 2, permuted);
        REQUIRE(p.overall.value);
        CHECK_THAT(*p.overall.value, WithinAbs(*reference.overall.value, 1e-12));
    }
}

TEST_CASE("unitizing alpha is 1 under perfect agreement")
{
    // Property (Krippendorff 2004, §11.6: D_o = 0 when all coders unitize alike).
    std::mt19937 rng(7);
    for (int coders = 2; coders <= 4; ++coders) {
        std::vector<ContinuumUnit> units = randomUnits(rng, 10, 310, 1, 3, 40, 20);
        const std::size_t one = units.size();
        for (int i = 1; i < coders; ++i)
            for (std::size_t k = 0; k < one; ++k) {
                ContinuumUnit u = units[k];
                u.coder = i;
                units.push_back(u);
            }
        const UnitizingResult r = unitizingAlpha(10, 310, coders, 3, units);
        REQUIRE(r.inputError.empty());
        for (const UnitizingCategoryResult &c : r.perCategory) {
            CHECK(c.observedDisagreement == 0);
            REQUIRE(c.value);
            CHECK(*c.value == 1.0);
        }
        REQUIRE(r.overall.value);
        CHECK(*r.overall.value == 1.0);
    }
}

TEST_CASE("unitizing alpha with units of length one equals nominal alpha: published example")
{
    // Krippendorff (2011), "Computing Krippendorff's Alpha-Reliability", §A: binary data, two
    // coders, ten units → alpha = 0.095. Each unit becomes one position of a continuum of length
    // 10; a coder's value 1 is a unit [p, p + 1) of the one category, value 0 a gap.
    const std::vector<std::vector<int>> values = {
        {0, 1, 0, 0, 0, 0, 0, 0, 1, 0},
        {1, 1, 1, 0, 0, 1, 0, 0, 0, 0},
    };
    const UnitizingResult r = unitizingAlpha(0, 10, 2, 1, unitsOfLengthOne(values, {1}));
    REQUIRE(r.perCategory[0].value);
    CHECK_THAT(*r.perCategory[0].value, WithinAbs(0.095, 5e-4));

    // The direct nominal alpha of this test agrees with the same source.
    const NominalAlpha n = nominalAlpha(values, 2);
    REQUIRE(n.value);
    CHECK_THAT(*n.value, WithinAbs(0.095, 5e-4));

    // Taking the positions coded 0 as the units, or both values as two categories, changes
    // nothing (binary nominal alpha is symmetric in its two values).
    const UnitizingResult zeros = unitizingAlpha(0, 10, 2, 1, unitsOfLengthOne(values, {0}));
    REQUIRE(zeros.perCategory[0].value);
    CHECK_THAT(*zeros.perCategory[0].value, WithinAbs(*n.value, 1e-12));
    const UnitizingResult both = unitizingAlpha(0, 10, 2, 2, unitsOfLengthOne(values, {0, 1}));
    REQUIRE(both.overall.value);
    CHECK_THAT(*both.overall.value, WithinAbs(*n.value, 1e-12));
}

TEST_CASE("unitizing alpha with units of length one equals nominal alpha: random data")
{
    // The property named in checks.md ("Unitizing alpha on a continuum"): when every position
    // is its own unit of length one, unitizing alpha is nominal alpha on the positions. Why: a
    // unit of length one either coincides with the other coder's unit (δ² = 0) or lies in the
    // other coder's gap (δ² = 1), so D_o counts disagreeing ordered pairs, /L² instead of /n;
    // 2l³ − 3l² + l = 0 for l = 1 and Σ_gaps (gap − 1 + 1) is the number of unmarked positions,
    // so D_e = 2 n_1 n_0 / (L n (n − 1)). Both are the nominal D_o and D_e divided by L.
    std::mt19937 rng(12345);
    int defined = 0;
    for (int trial = 0; trial < 2000; ++trial) {
        const int coders = std::uniform_int_distribution<int>(2, 5)(rng);
        const int length = std::uniform_int_distribution<int>(1, 30)(rng);
        const double density = std::uniform_real_distribution<double>(0.0, 1.0)(rng);
        std::bernoulli_distribution mark(density);
        std::vector<std::vector<int>> values(
            static_cast<std::size_t>(coders), std::vector<int>(static_cast<std::size_t>(length)));
        for (auto &row : values)
            for (int &v : row)
                v = mark(rng) ? 1 : 0;
        const NominalAlpha n = nominalAlpha(values, 2);

        const UnitizingResult ones =
            unitizingAlpha(0, length, coders, 1, unitsOfLengthOne(values, {1}));
        const UnitizingResult both =
            unitizingAlpha(0, length, coders, 2, unitsOfLengthOne(values, {0, 1}));
        REQUIRE(ones.inputError.empty());
        REQUIRE(ones.perCategory[0].value.has_value() == n.value.has_value());
        REQUIRE(both.overall.value.has_value() == n.value.has_value());
        if (!n.value)
            continue;
        ++defined;
        CHECK_THAT(*ones.perCategory[0].value, WithinAbs(*n.value, 1e-9));
        CHECK_THAT(*both.overall.value, WithinAbs(*n.value, 1e-9));
        CHECK_THAT(ones.perCategory[0].observedDisagreement * length, WithinAbs(n.observed, 1e-12));
        CHECK_THAT(ones.perCategory[0].expectedDisagreement * length, WithinAbs(n.expected, 1e-12));
    }
    CHECK(defined > 1500);
}

TEST_CASE("unitizing alpha agrees with a naive section-by-section computation")
{
    // Oracle: the literal δ² and D_e of Krippendorff (2004, §11.6) over explicit sections in
    // integer arithmetic (naiveDisagreements above) against the sweep of unitizing_alpha.cpp.
    std::mt19937 rng(99);
    for (int trial = 0; trial < 1000; ++trial) {
        const int coders = std::uniform_int_distribution<int>(2, 4)(rng);
        const int categories = std::uniform_int_distribution<int>(1, 3)(rng);
        const std::int64_t begin = std::uniform_int_distribution<int>(-50, 50)(rng);
        const std::int64_t end = begin + std::uniform_int_distribution<int>(1, 120)(rng);
        const int maxLength = std::uniform_int_distribution<int>(1, 40)(rng);
        const int maxGap = std::uniform_int_distribution<int>(0, 40)(rng);
        const std::vector<ContinuumUnit> units =
            randomUnits(rng, begin, end, coders, categories, maxLength, maxGap);
        const UnitizingResult r = unitizingAlpha(begin, end, coders, categories, units);
        REQUIRE(r.inputError.empty());
        for (int c = 0; c < categories; ++c) {
            const NaiveParts naive = naiveDisagreements(begin, end, coders, c, units);
            const UnitizingCategoryResult &got = r.perCategory[std::size_t(c)];
            CHECK_THAT(got.observedDisagreement, WithinAbs(naive.observed, 1e-12));
            CHECK_THAT(got.expectedDisagreement, WithinAbs(naive.expected, 1e-12));
            CHECK_THAT(got.expectedDisagreement, WithinRel(naive.expected, 1e-9));
            if (got.value) {
                CHECK(std::isfinite(*got.value));
                CHECK_THAT(*got.value, WithinAbs(1 - naive.observed / naive.expected, 1e-9));
            }
        }
    }
}

TEST_CASE("unitizing alpha with more than two coders: D_o is the mean of the pairwise D_o")
{
    // Our generalisation (documented in unitizing_alpha.h): Σ over ordered coder pairs divided by
    // m(m − 1), as in Krippendorff's (2004, §11.6) D_o, makes D_o the mean over the pairs.
    std::mt19937 rng(4242);
    for (int trial = 0; trial < 200; ++trial) {
        const int coders = std::uniform_int_distribution<int>(3, 5)(rng);
        const std::vector<ContinuumUnit> units = randomUnits(rng, 0, 150, coders, 1, 30, 25);
        const UnitizingResult all = unitizingAlpha(0, 150, coders, 1, units);
        double pairSum = 0;
        int pairs = 0;
        for (int i = 0; i < coders; ++i)
            for (int j = i + 1; j < coders; ++j) {
                std::vector<ContinuumUnit> two;
                for (ContinuumUnit u : units) {
                    if (u.coder != i && u.coder != j)
                        continue;
                    u.coder = u.coder == i ? 0 : 1;
                    two.push_back(u);
                }
                pairSum += unitizingAlpha(0, 150, 2, 1, two).perCategory[0].observedDisagreement;
                ++pairs;
            }
        CHECK_THAT(all.perCategory[0].observedDisagreement, WithinAbs(pairSum / pairs, 1e-12));
    }
}

TEST_CASE("unitizing alpha is undefined, with a reason, when it cannot be computed")
{
    SECTION("no units at all")
    {
        const UnitizingResult r = unitizingAlpha(0, 100, 3, 2, {});
        REQUIRE(r.inputError.empty());
        REQUIRE(r.perCategory.size() == 2);
        for (const UnitizingCategoryResult &c : r.perCategory) {
            CHECK_FALSE(c.value);
            CHECK_THAT(c.reason, Contains("no coder marked a unit"));
            CHECK(c.expectedDisagreement == 0);
        }
        CHECK_FALSE(r.overall.value);
        CHECK_THAT(r.overall.reason, Contains("no coder marked any unit"));
    }
    SECTION("one category unused: it is undefined, the others and the pooled value are not")
    {
        const UnitizingResult r = unitizingAlpha(0, 100, 2, 2, {{0, 0, 10, 20}, {1, 0, 12, 20}});
        CHECK(r.perCategory[0].value);
        CHECK_FALSE(r.perCategory[1].value);
        CHECK(r.overall.value);
    }
    SECTION("D_e = 0: every coder marked every position as a unit of length one")
    {
        // Nominal analogue: only one value occurs, so alpha is undefined (checks.md).
        std::vector<ContinuumUnit> units;
        for (int i = 0; i < 2; ++i)
            for (std::int64_t p = 0; p < 5; ++p)
                units.push_back({i, 0, p, p + 1});
        const UnitizingResult r = unitizingAlpha(0, 5, 2, 1, units);
        REQUIRE(r.inputError.empty());
        CHECK_FALSE(r.perCategory[0].value);
        CHECK_THAT(r.perCategory[0].reason, Contains("expected disagreement is 0"));
        CHECK_FALSE(std::isnan(r.perCategory[0].expectedDisagreement));
        CHECK_FALSE(r.overall.value);
        CHECK_THAT(r.overall.reason, Contains("expected disagreement is 0"));
    }
    SECTION("fewer than two coders")
    {
        const UnitizingResult r = unitizingAlpha(0, 100, 1, 1, {{0, 0, 10, 20}});
        REQUIRE(r.inputError.empty());
        CHECK_FALSE(r.perCategory[0].value);
        CHECK_THAT(r.perCategory[0].reason, Contains("fewer than two coders"));
        CHECK_FALSE(r.overall.value);
    }
    SECTION("a single unit over the whole continuum per coder is defined")
    {
        // Not a degenerate case: units longer than one position give D_e > 0.
        const UnitizingResult r = unitizingAlpha(0, 10, 2, 1, {{0, 0, 0, 10}, {1, 0, 0, 10}});
        REQUIRE(r.overall.value);
        CHECK(*r.overall.value == 1.0);
    }
}

TEST_CASE("unitizing alpha rejects invalid units, naming the unit")
{
    struct Case {
        std::int64_t begin, end;
        int coders, categories;
        std::vector<ContinuumUnit> units;
        const char *message;
    };
    const std::vector<Case> cases = {
        {10, 10, 2, 1, {}, "the continuum [10, 10) is empty"},
        {0, 100, 2, 1, {{0, 0, 5, 9}, {2, 0, 5, 9}}, "unit 1 (coder 2, category 0, [5, 9)): coder"},
        {0, 100, 2, 1, {{0, 1, 5, 9}}, "unit 0 (coder 0, category 1, [5, 9)): category"},
        {0, 100, 2, 1, {{0, 0, 9, 9}}, "unit 0 (coder 0, category 0, [9, 9)): the unit is empty"},
        {0, 100, 2, 1, {{0, 0, 95, 101}}, "unit 0 (coder 0, category 0, [95, 101)): the unit lies"},
        {0, 100, 2, 1, {{0, 0, -1, 5}}, "outside the continuum [0, 100)"},
        {0, 100, 2, 1, {{0, 0, 10, 20}, {1, 0, 0, 50}, {0, 0, 19, 30}},
            "unit 2 (coder 0, category 0, [19, 30)) overlaps unit 0"},
    };
    for (const Case &c : cases) {
        const UnitizingResult r = unitizingAlpha(c.begin, c.end, c.coders, c.categories, c.units);
        CHECK_THAT(r.inputError, Contains(c.message));
        CHECK(r.perCategory.empty());
        CHECK_FALSE(r.overall.value);
    }
    // Touching units of one coder and units of different categories may share positions.
    const UnitizingResult ok =
        unitizingAlpha(0, 100, 2, 2, {{0, 0, 10, 20}, {0, 0, 20, 30}, {0, 1, 15, 25}});
    CHECK(ok.inputError.empty());
}

TEST_CASE("articles laid end to end as sections give the same unitizing alpha in any order")
{
    // Property: each article is its own section (no gap crosses a break), so the order in which
    // articles are laid out cannot matter: observed disagreement is local to overlapping units
    // and the expected disagreement sums over a multiset of units and gaps.
    std::mt19937 rng(20261204);
    std::uniform_int_distribution<int> lengthDist(60, 160);
    struct Section {
        std::int64_t length;
        std::vector<ContinuumUnit> units; // on [0, length)
    };
    std::vector<Section> sections;
    for (int s = 0; s < 5; ++s) {
        Section section;
        section.length = lengthDist(rng);
        section.units = randomUnits(rng, 0, section.length, 3, 2, 20, 25);
        sections.push_back(std::move(section));
    }
    auto layOut = [&](const std::vector<int> &order, bool withBreaks) {
        std::vector<ContinuumUnit> units;
        std::vector<std::int64_t> breaks;
        std::int64_t offset = 0;
        for (int s : order) {
            if (offset > 0 && withBreaks)
                breaks.push_back(offset);
            for (ContinuumUnit u : sections[std::size_t(s)].units) {
                u.begin += offset;
                u.end += offset;
                units.push_back(u);
            }
            offset += sections[std::size_t(s)].length;
        }
        return unitizingAlpha(0, offset, 3, 2, units, breaks);
    };
    std::vector<int> order = {0, 1, 2, 3, 4};
    const UnitizingResult reference = layOut(order, true);
    REQUIRE(reference.inputError.empty());
    REQUIRE(reference.overall.value);
    bool plainDiffers = false;
    const UnitizingResult plainReference = layOut(order, false);
    for (int round = 0; round < 12; ++round) {
        std::shuffle(order.begin(), order.end(), rng);
        const UnitizingResult r = layOut(order, true);
        REQUIRE(r.overall.value);
        CHECK_THAT(*r.overall.value, WithinAbs(*reference.overall.value, 1e-12));
        for (std::size_t c = 0; c < 2; ++c)
            CHECK_THAT(r.perCategory[c].expectedDisagreement,
                WithinRel(reference.perCategory[c].expectedDisagreement, 1e-12));
        // Without breaks, gaps at the ends of articles join across boundaries, so some order
        // changes the figure: the defect the sections remove.
        const UnitizingResult plain = layOut(order, false);
        plainDiffers =
            plainDiffers || std::abs(*plain.overall.value - *plainReference.overall.value) > 1e-9;
    }
    CHECK(plainDiffers);
}

TEST_CASE("a unit crossing a section break, or breaks out of order, are invalid input")
{
    const std::vector<ContinuumUnit> units {{0, 0, 10, 30}, {1, 0, 12, 28}};
    const UnitizingResult crossing = unitizingAlpha(0, 100, 2, 1, units, {20});
    CHECK_THAT(crossing.inputError, Contains("crosses the section break at 20"));
    CHECK_FALSE(crossing.overall.value);
    const UnitizingResult descending = unitizingAlpha(0, 100, 2, 1, units, {60, 40});
    CHECK_THAT(descending.inputError, Contains("ascending"));
    const UnitizingResult outside = unitizingAlpha(0, 100, 2, 1, units, {100});
    CHECK_THAT(outside.inputError, Contains("outside"));
    // A break where the units touch it is fine.
    const UnitizingResult touching = unitizingAlpha(0, 100, 2, 1, units, {30, 50});
    CHECK(touching.inputError.empty());
    REQUIRE(touching.overall.value);
}
