#include "core/reliability/krippendorff_alpha.h"
#include "core/reliability/set_distance.h"

#include <catch2/catch.hpp>

#include <vector>

using namespace fourfold::reliability;
using Catch::Matchers::WithinAbs;

namespace {

using Set = std::vector<int>;

// All 16 subsets of the four framing functions {0, 1, 2, 3}, each sorted.
std::vector<Set> allSubsetsOfFour()
{
    std::vector<Set> sets;
    for (int mask = 0; mask < 16; ++mask) {
        Set s;
        for (int f = 0; f < 4; ++f)
            if (mask & (1 << f))
                s.push_back(f);
        sets.push_back(s);
    }
    return sets;
}

} // namespace

TEST_CASE("Jaccard distance follows its definition", "[setdistance]")
{
    // Jaccard distance 1 − |A∩B| / |A∪B| (Artstein & Poesio 2008, §5); values by hand.
    CHECK(jaccardDistance({1, 2}, {1, 2}) == 0.0);
    CHECK_THAT(jaccardDistance({1, 2}, {2, 3}), WithinAbs(2.0 / 3.0, 1e-15)); // 1 − 1/3
    CHECK_THAT(jaccardDistance({1}, {1, 2}), WithinAbs(0.5, 1e-15)); // 1 − 1/2
    CHECK_THAT(jaccardDistance({0, 1, 2}, {1, 2, 3}), WithinAbs(0.5, 1e-15)); // 1 − 2/4
    CHECK(jaccardDistance({1}, {2}) == 1.0);
    // Input is taken as sets: order and repeats do not matter.
    CHECK(jaccardDistance({2, 1, 1}, {1, 2}) == 0.0);
    CHECK_THAT(jaccardDistance({3, 2, 2}, {2, 1}), WithinAbs(2.0 / 3.0, 1e-15));
}

TEST_CASE("MASI distance uses exact thirds", "[setdistance]")
{
    // MASI = 1 − J·M (Passonneau 2006): M = 1 equal, 2/3 subset, 1/3 overlap, 0 disjoint.
    CHECK(masiDistance({1, 2}, {1, 2}) == 0.0);
    // Subset: J = 1/2, M = 2/3 → 1 − 1/3. NLTK's rounded 0.67 would give 0.665.
    CHECK_THAT(masiDistance({1}, {1, 2}), WithinAbs(2.0 / 3.0, 1e-15));
    CHECK_THAT(masiDistance({1, 2}, {1}), WithinAbs(2.0 / 3.0, 1e-15));
    // Subset: J = 2/3, M = 2/3 → 1 − 4/9.
    CHECK_THAT(masiDistance({0, 1}, {0, 1, 2}), WithinAbs(5.0 / 9.0, 1e-15));
    // Overlap without containment: J = 1/3, M = 1/3 → 1 − 1/9.
    CHECK_THAT(masiDistance({1, 2}, {2, 3}), WithinAbs(8.0 / 9.0, 1e-15));
    // Disjoint: M = 0.
    CHECK(masiDistance({1, 2}, {3}) == 1.0);
}

TEST_CASE("set distances treat the empty set by the documented convention", "[setdistance]")
{
    // Fourfold's convention (checks.md): d(∅, ∅) = 0, d(∅, A) = 1.
    CHECK(jaccardDistance({}, {}) == 0.0);
    CHECK(masiDistance({}, {}) == 0.0);
    CHECK(jaccardDistance({}, {2}) == 1.0);
    CHECK(jaccardDistance({0, 3}, {}) == 1.0);
    CHECK(masiDistance({}, {2}) == 1.0);
    CHECK(masiDistance({0, 3}, {}) == 1.0);
}

TEST_CASE("set distances are symmetric, in [0, 1], zero only for equal sets, MASI ≥ Jaccard",
    "[setdistance]")
{
    // Properties of both definitions (Passonneau 2006): M ≤ 1, so J·M ≤ J.
    const std::vector<Set> sets = allSubsetsOfFour();
    for (const Set &a : sets) {
        for (const Set &b : sets) {
            const double j = jaccardDistance(a, b);
            const double m = masiDistance(a, b);
            CHECK(j == jaccardDistance(b, a));
            CHECK(m == masiDistance(b, a));
            CHECK(j >= 0.0);
            CHECK(m <= 1.0);
            CHECK(m >= j);
            CHECK((j == 0.0) == (a == b));
            CHECK((m == 0.0) == (a == b));
        }
    }
}

TEST_CASE("setDistanceMatrix is a usable custom metric", "[setdistance]")
{
    const std::vector<Set> sets = allSubsetsOfFour();
    for (const SetDistance kind : {SetDistance::Jaccard, SetDistance::Masi}) {
        Metric metric;
        metric.custom = setDistanceMatrix(sets, kind);
        REQUIRE(metric.custom.size() == 16 * 16);
        CHECK(metricProblem(metric, 16).empty());
        CHECK_THAT(metric.custom[0b0011 * 16 + 0b0110], // {0,1} vs {1,2}
            WithinAbs(kind == SetDistance::Jaccard ? 2.0 / 3.0 : 8.0 / 9.0, 1e-15));
    }
}

TEST_CASE("alpha with a set distance on singleton sets equals nominal alpha", "[setdistance]")
{
    // With one label per unit both distances are 0 for equal and 1 for different labels, the
    // nominal δ² (Artstein & Poesio 2008, §5); Krippendorff (2011) §B data: alpha = 0.692.
    ReliabilityData data;
    data.units = 12;
    data.coders = 2;
    data.values = 5;
    const std::vector<int> a {0, 0, 1, 1, 3, 2, 2, 2, 4, 3, 3, 0};
    const std::vector<int> b {1, 0, 1, 1, 1, 2, 2, 2, 4, 3, 3, 3};
    for (std::size_t u = 0; u < 12; ++u) {
        data.cells.push_back(a[u]);
        data.cells.push_back(b[u]);
    }
    const std::vector<Set> singletons {{0}, {1}, {2}, {3}, {4}};
    for (const SetDistance kind : {SetDistance::Jaccard, SetDistance::Masi}) {
        Metric metric;
        metric.custom = setDistanceMatrix(singletons, kind);
        const AlphaResult r = krippendorffAlpha(data, metric);
        REQUIRE(r.value);
        CHECK_THAT(*r.value, WithinAbs(0.692, 5e-4)); // Krippendorff (2011), §B
        Metric nominal;
        CHECK_THAT(*r.value, WithinAbs(*krippendorffAlpha(data, nominal).value, 1e-15));
    }
}

TEST_CASE("alpha with MASI counts partial agreement between label sets", "[setdistance]")
{
    // Two coders, three units coded with sets of functions. Codes: 0 = {0}, 1 = {0,1}, 2 = {2}.
    // Unit values: ({0}, {0,1}), ({2}, {2}), ({0,1}, {0,1}). By hand from the definitions
    // (Krippendorff 2011, §C; Passonneau 2006): d({0},{0,1}) = 2/3 (MASI), 1/2 (Jaccard),
    // d({0},{2}) = d({0,1},{2}) = 1. n = 6, o_01 = o_10 = 1, o_11 = 2, o_22 = 2; n_0 = 1,
    // n_1 = 3, n_2 = 2. D_o = 2 d01 / 6; D_e = 2 (3 d01 + 2 + 6) / 30.
    ReliabilityData data;
    data.units = 3;
    data.coders = 2;
    data.values = 3;
    data.cells = {0, 1, 2, 2, 1, 1};
    const std::vector<Set> sets {{0}, {0, 1}, {2}};
    for (const SetDistance kind : {SetDistance::Jaccard, SetDistance::Masi}) {
        const double d01 = kind == SetDistance::Masi ? 2.0 / 3.0 : 0.5;
        const double expected = 1.0 - (2.0 * d01 / 6.0) / (2.0 * (3.0 * d01 + 8.0) / 30.0);
        Metric metric;
        metric.custom = setDistanceMatrix(sets, kind);
        const AlphaResult r = krippendorffAlpha(data, metric);
        REQUIRE(r.value);
        CHECK_THAT(*r.value, WithinAbs(expected, 1e-12));
    }
}
