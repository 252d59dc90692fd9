#include "core/reliability/krippendorff_alpha.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <numeric>
#include <optional>
#include <random>
#include <sstream>
#include <string>
#include <vector>

using namespace fourfold::reliability;
using Catch::Matchers::WithinAbs;
using Catch::Matchers::WithinRel;

namespace {

// Reliability data from one whitespace-separated row per coder, as the examples print them:
// each token is looked up in `codes` (its index is the value code); "." is missing.
ReliabilityData fromRows(
    const std::vector<std::string> &rows, const std::vector<std::string> &codes)
{
    ReliabilityData data;
    data.coders = int(rows.size());
    data.values = int(codes.size());
    std::vector<std::vector<int>> byCoder;
    for (const std::string &row : rows) {
        std::istringstream in(row);
        std::vector<int> cells;
        std::string token;
        while (in >> token) {
            if (token == ".") {
                cells.push_back(kMissing);
                continue;
            }
            const auto it = std::find(codes.begin(), codes.end(), token);
            REQUIRE(it != codes.end());
            cells.push_back(int(it - codes.begin()));
        }
        byCoder.push_back(cells);
    }
    data.units = int(byCoder.front().size());
    for (int u = 0; u < data.units; ++u) {
        for (int c = 0; c < data.coders; ++c) {
            REQUIRE(byCoder[std::size_t(c)].size() == std::size_t(data.units));
            data.cells.push_back(byCoder[std::size_t(c)][std::size_t(u)]);
        }
    }
    return data;
}

Metric metricOf(Level level, std::vector<double> numeric = {})
{
    Metric metric;
    metric.level = level;
    metric.numeric = std::move(numeric);
    return metric;
}

// Krippendorff (2011) §C–D and Krippendorff (2004), p. 230: 4 coders × 12 units, values 1–5.
ReliabilityData krippendorffC()
{
    return fromRows({"1 2 3 3 2 1 4 1 2 . . .", "1 2 3 3 2 2 4 1 2 5 . 3",
                        ". 3 3 3 2 3 4 2 2 5 1 .", "1 2 3 3 2 4 4 1 2 5 1 ."},
        {"1", "2", "3", "4", "5"});
}
const std::vector<double> kOneToFive {1, 2, 3, 4, 5};

// ---------------------------------------------------------------------------------------------
// A deliberately naive reference, written straight from the definitions of Krippendorff (2011)
// without the coincidence matrix: D_o from every ordered pair of values within a unit, weighted
// 1/(m_u − 1); D_e from every ordered pair of distinct positions among all n pairable values;
// alpha = 1 − (n − 1) Σ_within / Σ_all.
// ---------------------------------------------------------------------------------------------
std::optional<double> naiveAlpha(const ReliabilityData &data, const Metric &metric)
{
    std::vector<int> pooled;
    std::vector<std::vector<int>> units;
    for (int u = 0; u < data.units; ++u) {
        std::vector<int> values;
        for (int c = 0; c < data.coders; ++c) {
            if (data.at(u, c) != kMissing)
                values.push_back(data.at(u, c));
        }
        if (values.size() >= 2) {
            units.push_back(values);
            pooled.insert(pooled.end(), values.begin(), values.end());
        }
    }
    if (pooled.size() < 2)
        return std::nullopt;
    std::vector<double> counted(std::size_t(data.values), 0.0); // n_g among pairable values
    for (const int value : pooled)
        counted[std::size_t(value)] += 1;
    auto howMany = [&](int g) { return counted[std::size_t(g)]; };
    auto delta = [&](int c, int k) -> double {
        if (!metric.custom.empty())
            return metric.custom[std::size_t(c * data.values + k)];
        switch (metric.level) {
        case Level::Nominal:
            return c == k ? 0.0 : 1.0;
        case Level::Ordinal: {
            double sum = 0;
            for (int g = std::min(c, k); g <= std::max(c, k); ++g)
                sum += howMany(g);
            const double d = sum - (howMany(c) + howMany(k)) / 2;
            return d * d;
        }
        case Level::Interval: {
            const double d = metric.numeric[std::size_t(c)] - metric.numeric[std::size_t(k)];
            return d * d;
        }
        case Level::Ratio: {
            const double x = metric.numeric[std::size_t(c)];
            const double y = metric.numeric[std::size_t(k)];
            return x + y == 0 ? 0.0 : ((x - y) / (x + y)) * ((x - y) / (x + y));
        }
        }
        return 0;
    };
    double within = 0;
    for (const std::vector<int> &values : units) {
        for (std::size_t i = 0; i < values.size(); ++i)
            for (std::size_t j = 0; j < values.size(); ++j)
                if (i != j)
                    within += delta(values[i], values[j]) / double(values.size() - 1);
    }
    double all = 0;
    for (std::size_t i = 0; i < pooled.size(); ++i)
        for (std::size_t j = 0; j < pooled.size(); ++j)
            if (i != j)
                all += delta(pooled[i], pooled[j]);
    if (all == 0)
        return std::nullopt;
    return 1.0 - double(pooled.size() - 1) * within / all;
}

ReliabilityData randomData(std::mt19937_64 &random)
{
    ReliabilityData data;
    data.units = std::uniform_int_distribution<int>(0, 25)(random);
    data.coders = std::uniform_int_distribution<int>(1, 6)(random);
    data.values = std::uniform_int_distribution<int>(1, 6)(random);
    const double missing = std::uniform_real_distribution<double>(0.0, 0.6)(random);
    std::bernoulli_distribution isMissing(missing);
    // Skewed value distributions as well as even ones.
    std::vector<double> weights(std::size_t(data.values));
    for (double &w : weights)
        w = std::uniform_real_distribution<double>(0.05, 1.0)(random);
    std::discrete_distribution<int> value(weights.begin(), weights.end());
    for (int i = 0; i < data.units * data.coders; ++i)
        data.cells.push_back(isMissing(random) ? kMissing : value(random));
    return data;
}

} // namespace

// --- Published worked examples --------------------------------------------------------------

TEST_CASE("alpha reproduces Krippendorff (2011) §A, binary data, two coders", "[alpha]")
{
    const ReliabilityData data =
        fromRows({"0 1 0 0 0 0 0 0 1 0", "1 1 1 0 0 1 0 0 0 0"}, {"0", "1"});
    const AlphaResult result = krippendorffAlpha(data, metricOf(Level::Nominal));
    REQUIRE(result.value);
    CHECK(result.reason.empty());
    CHECK_THAT(*result.value, WithinAbs(0.095, 5e-4)); // Krippendorff (2011), §A: alpha = 0.095
    CHECK(result.pairableValues == 20); // 2 coders × 10 units, nothing missing
}

TEST_CASE("alpha reproduces Krippendorff (2011) §B, nominal data, two coders", "[alpha]")
{
    const ReliabilityData data =
        fromRows({"a a b b d c c c e d d a", "b a b b b c c c e d d d"}, {"a", "b", "c", "d", "e"});
    const AlphaResult result = krippendorffAlpha(data, metricOf(Level::Nominal));
    REQUIRE(result.value);
    CHECK_THAT(*result.value, WithinAbs(0.692, 5e-4)); // Krippendorff (2011), §B: alpha = 0.692
}

TEST_CASE(
    "alpha reproduces Krippendorff (2011) §C–D, 4 coders × 12 units with missing values", "[alpha]")
{
    const ReliabilityData data = krippendorffC();

    SECTION("coincidences")
    {
        const CoincidenceMatrix c = coincidences(data);
        // Krippendorff (2011), §C: n = 40 pairable values, unit 12 (one value) drops out.
        CHECK(c.total == 40);
        CHECK(c.units == 11);
        // Krippendorff (2011), §C, the coincidence matrix and its marginals 9, 13, 10, 5, 3
        // (from memory of the printed table).
        const std::vector<double> marginals {9, 13, 10, 5, 3};
        for (std::size_t i = 0; i < 5; ++i)
            CHECK_THAT(c.marginals[i], WithinAbs(marginals[i], 1e-12));
        CHECK_THAT(c.at(0, 0), WithinAbs(7.0, 1e-12));
        CHECK_THAT(c.at(0, 1), WithinAbs(4.0 / 3.0, 1e-12));
        CHECK_THAT(c.at(1, 0), WithinAbs(4.0 / 3.0, 1e-12));
        CHECK_THAT(c.at(1, 1), WithinAbs(10.0, 1e-12));
        CHECK_THAT(c.at(2, 3), WithinAbs(1.0 / 3.0, 1e-12));
        CHECK_THAT(c.at(4, 4), WithinAbs(3.0, 1e-12));
        CHECK(c.at(0, 4) == 0);
        // Only the non-zero entries are held, in (c, k) order.
        CHECK(std::is_sorted(c.cells.begin(), c.cells.end(),
            [](const auto &a, const auto &b) { return a.c != b.c ? a.c < b.c : a.k < b.k; }));
        CHECK(std::none_of(c.cells.begin(), c.cells.end(), [](const auto &x) { return x.o == 0; }));
    }
    SECTION("nominal")
    {
        const AlphaResult r = krippendorffAlpha(data, metricOf(Level::Nominal));
        REQUIRE(r.value);
        CHECK_THAT(*r.value, WithinAbs(0.743, 5e-4)); // Krippendorff (2011), §C: 0.743
        // Krippendorff (2011), §C: D_o = 0.200 (= Σ o_ck δ / n), D_e = 0.779
        // (= Σ n_c n_k δ / (n(n − 1))).
        CHECK_THAT(r.observedDisagreement, WithinAbs(0.200, 5e-4));
        CHECK_THAT(r.expectedDisagreement, WithinAbs(0.779, 5e-4));
        CHECK(r.pairableValues == 40); // Krippendorff (2011), §C: n = 40
        CHECK(r.pairableUnits == 11);
    }
    SECTION("ordinal")
    {
        const AlphaResult r = krippendorffAlpha(data, metricOf(Level::Ordinal));
        REQUIRE(r.value);
        CHECK_THAT(*r.value, WithinAbs(0.815, 5e-4)); // Krippendorff (2011), §D: 0.815
    }
    SECTION("interval")
    {
        const AlphaResult r = krippendorffAlpha(data, metricOf(Level::Interval, kOneToFive));
        REQUIRE(r.value);
        CHECK_THAT(*r.value, WithinAbs(0.849, 5e-4)); // Krippendorff (2011), §D: 0.849
        CHECK_THAT(r.observedDisagreement, WithinAbs(0.433, 5e-4)); // Krippendorff (2011), §D
        CHECK_THAT(r.expectedDisagreement, WithinAbs(2.872, 5e-4)); // Krippendorff (2011), §D
    }
    SECTION("ratio")
    {
        const AlphaResult r = krippendorffAlpha(data, metricOf(Level::Ratio, kOneToFive));
        REQUIRE(r.value);
        CHECK_THAT(*r.value, WithinAbs(0.797, 5e-4)); // Krippendorff (2011), §D: 0.797
    }
}

TEST_CASE("alpha reproduces Hayes & Krippendorff (2007), 5 coders × 40 units", "[alpha]")
{
    // Hayes & Krippendorff (2007), Table 1 (40 units × 5 coders, here one row per coder); values
    // 0–3. The alphas are *(2nd)*: asserted by the
    // tests of the R package icr (Staudt), which cite the paper.
    const ReliabilityData data = fromRows(
        {"1 1 2 . 0 0 1 1 2 2 . 0 1 3 1 1 2 1 1 0 0 0 2 0 1 0 0 1 1 1 1 2 2 3 2 2 2 2 2 1",
            "1 1 3 0 0 0 0 . 2 1 1 0 2 3 1 1 1 2 1 0 0 0 3 0 2 1 0 2 1 1 1 1 2 2 2 2 2 2 2 1",
            "2 0 3 0 0 0 2 2 2 1 0 0 2 2 1 1 2 3 0 0 1 . 3 0 . 1 0 1 2 2 0 2 . 2 2 3 2 . 2 1",
            ". 1 3 . . . . 0 . 1 0 0 2 2 . . . 3 1 . 1 0 3 0 2 1 1 2 2 . . 1 2 2 . . . 1 2 .",
            "2 . . 0 0 0 1 . 2 . . . . 3 1 1 2 . . 0 . 0 . . 2 . 0 . . 2 0 . 2 . 2 2 2 2 . 1"},
        {"0", "1", "2", "3"});
    const AlphaResult ordinal = krippendorffAlpha(data, metricOf(Level::Ordinal));
    REQUIRE(ordinal.value);
    CHECK_THAT(*ordinal.value, WithinAbs(0.7598, 5e-5)); // Hayes & Krippendorff (2007) (2nd)
    const AlphaResult nominal = krippendorffAlpha(data, metricOf(Level::Nominal));
    REQUIRE(nominal.value);
    CHECK_THAT(*nominal.value, WithinAbs(0.4765, 5e-5)); // Hayes & Krippendorff (2007) (2nd)
}

// --- Undefined and malformed input ----------------------------------------------------------

TEST_CASE("alpha is undefined, with a reason, when it cannot be computed", "[alpha]")
{
    const Metric nominal = metricOf(Level::Nominal);

    SECTION("no units at all")
    {
        ReliabilityData data;
        data.coders = 2;
        data.values = 2;
        const AlphaResult r = krippendorffAlpha(data, nominal);
        CHECK_FALSE(r.value);
        CHECK(r.reason.find("fewer than two pairable values") != std::string::npos);
    }
    SECTION("no unit holds two values")
    {
        const AlphaResult r =
            krippendorffAlpha(fromRows({"0 . 1 .", ". 1 . ."}, {"0", "1"}), nominal);
        CHECK_FALSE(r.value);
        CHECK(r.reason.find("fewer than two pairable values") != std::string::npos);
        CHECK(r.pairableValues == 0);
    }
    SECTION("only one value among the pairable values, at every level")
    {
        // The 1 stands alone in its unit, so it is not pairable and cannot make alpha defined.
        const ReliabilityData data = fromRows({"0 0 1", "0 0 ."}, {"0", "1"});
        for (const Metric &metric : {nominal, metricOf(Level::Ordinal),
                 metricOf(Level::Interval, {1, 2}), metricOf(Level::Ratio, {1, 2})}) {
            const AlphaResult r = krippendorffAlpha(data, metric);
            CHECK_FALSE(r.value);
            CHECK(r.reason.find("only one value") != std::string::npos);
            CHECK(r.pairableValues == 4);
            CHECK(r.expectedDisagreement == 0);
        }
    }
    SECTION("two values that do not differ under the metric")
    {
        const AlphaResult r = krippendorffAlpha(
            fromRows({"0 1", "0 1"}, {"0", "1"}), metricOf(Level::Interval, {5, 5}));
        CHECK_FALSE(r.value);
        CHECK(r.reason.find("expected disagreement is 0") != std::string::npos);
    }
    SECTION("a single coder")
    {
        const AlphaResult r = krippendorffAlpha(fromRows({"0 1 1"}, {"0", "1"}), nominal);
        CHECK_FALSE(r.value);
        CHECK_FALSE(r.reason.empty());
    }
}

TEST_CASE("alpha rejects malformed data and metrics with a reason", "[alpha]")
{
    ReliabilityData data = fromRows({"0 1 1", "0 1 0"}, {"0", "1"});
    SECTION("a code outside 0..values-1 is named by unit and coder")
    {
        data.cells[3] = 7; // unit 2, coder 2
        const AlphaResult r = krippendorffAlpha(data, metricOf(Level::Nominal));
        CHECK_FALSE(r.value);
        CHECK(r.reason
            == "unit 2, coder 2 holds the code 7, which is neither missing nor one of 0..1");
        CHECK(coincidences(data).values == 0);
    }
    SECTION("a cell count other than units × coders")
    {
        data.cells.pop_back();
        const AlphaResult r = krippendorffAlpha(data, metricOf(Level::Nominal));
        CHECK_FALSE(r.value);
        CHECK(r.reason == "the data hold 5 cells, not units × coders = 6");
    }
    SECTION("numbers of the wrong count")
    {
        const AlphaResult r = krippendorffAlpha(data, metricOf(Level::Interval, {1, 2, 3}));
        CHECK_FALSE(r.value);
        CHECK(r.reason == "the metric gives 3 numbers for 2 values");
    }
    SECTION("a negative ratio number")
    {
        const AlphaResult r = krippendorffAlpha(data, metricOf(Level::Ratio, {-1, 2}));
        CHECK_FALSE(r.value);
        CHECK(r.reason.find("non-negative") != std::string::npos);
    }
    SECTION("an asymmetric custom matrix")
    {
        Metric metric;
        metric.custom = {0, 1, 0.5, 0};
        const AlphaResult r = krippendorffAlpha(data, metric);
        CHECK_FALSE(r.value);
        CHECK(r.reason.find("not symmetric") != std::string::npos);
    }
    SECTION("a custom matrix with a non-zero diagonal")
    {
        Metric metric;
        metric.custom = {0.1, 1, 1, 0};
        CHECK_FALSE(krippendorffAlpha(data, metric).value);
    }
}

// --- Properties -----------------------------------------------------------------------------

TEST_CASE("perfect agreement gives alpha = 1 at every level", "[alpha]")
{
    // Common practice (Krippendorff 2004, ch. 11: D_o = 0 means alpha = 1 whenever D_e > 0).
    const ReliabilityData data =
        fromRows({"0 1 2 2 . 1 0", "0 1 2 2 1 1 .", "0 . 2 2 1 . 0"}, {"0", "1", "2"});
    Metric custom;
    custom.custom = {0, 0.3, 1, 0.3, 0, 0.6, 1, 0.6, 0};
    for (const Metric &metric : {metricOf(Level::Nominal), metricOf(Level::Ordinal),
             metricOf(Level::Interval, {1, 4, 9}), metricOf(Level::Ratio, {0, 4, 9}), custom}) {
        const AlphaResult r = krippendorffAlpha(data, metric);
        REQUIRE(r.value);
        CHECK(*r.value == 1.0);
        CHECK(r.observedDisagreement == 0);
    }
}

TEST_CASE("alpha does not change when coders, units or nominal labels are permuted", "[alpha]")
{
    std::mt19937_64 random(20240611);
    int compared = 0;
    for (int trial = 0; trial < 300; ++trial) {
        const ReliabilityData data = randomData(random);
        const Metric metric = metricOf(trial % 2 ? Level::Nominal : Level::Ordinal);
        const AlphaResult original = krippendorffAlpha(data, metric);

        std::vector<int> coderOrder(std::size_t(data.coders));
        std::iota(coderOrder.begin(), coderOrder.end(), 0);
        std::shuffle(coderOrder.begin(), coderOrder.end(), random);
        std::vector<int> unitOrder(std::size_t(data.units));
        std::iota(unitOrder.begin(), unitOrder.end(), 0);
        std::shuffle(unitOrder.begin(), unitOrder.end(), random);

        ReliabilityData permuted = data;
        for (int u = 0; u < data.units; ++u)
            for (int c = 0; c < data.coders; ++c)
                permuted.cells[std::size_t(u * data.coders + c)] =
                    data.at(unitOrder[std::size_t(u)], coderOrder[std::size_t(c)]);
        const AlphaResult shuffled = krippendorffAlpha(permuted, metric);
        REQUIRE(bool(shuffled.value) == bool(original.value));
        if (original.value)
            CHECK_THAT(*shuffled.value, WithinAbs(*original.value, 1e-12));

        if (metric.level == Level::Nominal) {
            std::vector<int> relabel(std::size_t(data.values));
            std::iota(relabel.begin(), relabel.end(), 0);
            std::shuffle(relabel.begin(), relabel.end(), random);
            ReliabilityData renamed = data;
            for (int &cell : renamed.cells)
                if (cell != kMissing)
                    cell = relabel[std::size_t(cell)];
            const AlphaResult r = krippendorffAlpha(renamed, metric);
            REQUIRE(bool(r.value) == bool(original.value));
            if (original.value)
                CHECK_THAT(*r.value, WithinAbs(*original.value, 1e-12));
        }
        compared += original.value ? 1 : 0;
    }
    CHECK(compared > 100);
}

TEST_CASE("interval alpha is unchanged by a linear change of scale", "[alpha]")
{
    // Common practice: (c − k)² scales with the square of the unit, D_o/D_e does not.
    const ReliabilityData data = krippendorffC();
    const AlphaResult a = krippendorffAlpha(data, metricOf(Level::Interval, kOneToFive));
    const AlphaResult b = krippendorffAlpha(data, metricOf(Level::Interval, {7, 4, 1, -2, -5}));
    REQUIRE(a.value);
    REQUIRE(b.value);
    CHECK_THAT(*b.value, WithinAbs(*a.value, 1e-12));
}

TEST_CASE("ordinal alpha ignores codes that no pairable value takes", "[alpha]")
{
    // Krippendorff (2011), §E: the ordinal difference sums the marginals between two ranks, so a
    // rank nobody used adds nothing.
    const ReliabilityData data = krippendorffC();
    ReliabilityData spread = data;
    spread.values = 7;
    for (int &cell : spread.cells)
        if (cell >= 2)
            cell += 2; // codes 2 and 3 stay unused
    const AlphaResult a = krippendorffAlpha(data, metricOf(Level::Ordinal));
    const AlphaResult b = krippendorffAlpha(spread, metricOf(Level::Ordinal));
    REQUIRE(b.value);
    CHECK_THAT(*b.value, WithinAbs(*a.value, 1e-12));
}

TEST_CASE("alpha agrees with a naive pairwise reference on random data", "[alpha]")
{
    std::mt19937_64 random(7);
    int defined = 0;
    int undefined = 0;
    for (int trial = 0; trial < 3000; ++trial) {
        const ReliabilityData data = randomData(random);
        const std::size_t v = std::size_t(data.values);
        std::vector<double> numbers(v);
        for (double &x : numbers)
            x = std::uniform_real_distribution<double>(0.0, 10.0)(random);
        Metric custom;
        custom.custom.assign(v * v, 0.0);
        for (std::size_t a = 0; a < v; ++a)
            for (std::size_t b = a + 1; b < v; ++b)
                custom.custom[a * v + b] = custom.custom[b * v + a] =
                    std::uniform_real_distribution<double>(0.1, 3.0)(random);

        for (const Metric &metric : {metricOf(Level::Nominal), metricOf(Level::Ordinal),
                 metricOf(Level::Interval, numbers), metricOf(Level::Ratio, numbers), custom}) {
            const AlphaResult fast = krippendorffAlpha(data, metric);
            const std::optional<double> naive = naiveAlpha(data, metric);
            INFO("trial " << trial << ", level " << int(metric.level) << ", custom "
                          << !metric.custom.empty());
            REQUIRE(bool(fast.value) == bool(naive));
            if (naive) {
                CHECK_THAT(*fast.value, WithinAbs(*naive, 1e-12));
                ++defined;
            } else {
                CHECK_FALSE(fast.reason.empty());
                ++undefined;
            }
        }
    }
    // The random data must exercise both outcomes.
    CHECK(defined > 5000);
    CHECK(undefined > 500);
}

TEST_CASE("alpha agrees with the naive reference for more than 256 values", "[alpha]")
{
    // Above 256 values (or with few units per value) the coincidences are counted in a hash table
    // of the pairs that occur rather than in dense tables.
    std::mt19937_64 random(31);
    int defined = 0;
    for (int trial = 0; trial < 200; ++trial) {
        ReliabilityData data = randomData(random);
        data.values = std::uniform_int_distribution<int>(257, 300)(random);
        for (int &cell : data.cells)
            if (cell != kMissing && std::bernoulli_distribution(0.3)(random))
                cell = std::uniform_int_distribution<int>(0, data.values - 1)(random);
        std::vector<double> numbers(std::size_t(data.values));
        for (std::size_t g = 0; g < numbers.size(); ++g)
            numbers[g] = double(g) * 0.5 + 1.0;
        for (const Metric &metric : {metricOf(Level::Nominal), metricOf(Level::Ordinal),
                 metricOf(Level::Interval, numbers), metricOf(Level::Ratio, numbers)}) {
            const AlphaResult fast = krippendorffAlpha(data, metric);
            const std::optional<double> naive = naiveAlpha(data, metric);
            REQUIRE(bool(fast.value) == bool(naive));
            if (naive) {
                CHECK_THAT(*fast.value, WithinAbs(*naive, 1e-12));
                ++defined;
            }
        }
    }
    CHECK(defined > 400);
}

TEST_CASE("twenty thousand distinct values take memory in the pairs that occur", "[alpha]")
{
    // 20,000 units × 2 coders, each unit its own value, the second coder agreeing 80% of the time
    // (invented). A dense table would hold 20,000² = 4·10^8 entries.
    const int units = 20000;
    std::mt19937_64 random(2011);
    std::bernoulli_distribution agrees(0.8);
    std::uniform_int_distribution<int> anyValue(0, units - 1);
    ReliabilityData data;
    data.units = units;
    data.coders = 2;
    data.values = units;
    for (int u = 0; u < units; ++u) {
        data.cells.push_back(u);
        data.cells.push_back(agrees(random) ? u : anyValue(random));
    }
    const CoincidenceMatrix c = coincidences(data);
    // Each unit adds at most two entries (o_ab and o_ba, or o_aa): the matrix holds no more.
    CHECK(c.cells.size() <= std::size_t(2 * units));
    CHECK(c.values == units);
    CHECK(c.marginals.size() == std::size_t(units));
    // Krippendorff (2011), §E, nominal alpha from the coincidences' diagonal and marginals:
    // α = [(n − 1) Σ_c o_cc − Σ_c n_c (n_c − 1)] / [n (n − 1) − Σ_c n_c (n_c − 1)], here counted
    // from the units directly (two values per unit, o_cc = 2 per agreeing unit).
    std::vector<double> perValue(std::size_t(units), 0.0);
    double agreeing = 0;
    for (int u = 0; u < units; ++u) {
        perValue[std::size_t(data.at(u, 0))] += 1;
        perValue[std::size_t(data.at(u, 1))] += 1;
        agreeing += data.at(u, 0) == data.at(u, 1) ? 2 : 0;
    }
    const double n = 2.0 * units;
    double same = 0;
    for (const double nc : perValue)
        same += nc * (nc - 1);
    const double expected = ((n - 1) * agreeing - same) / (n * (n - 1) - same);
    const AlphaResult alpha = krippendorffAlpha(data, metricOf(Level::Nominal));
    REQUIRE(alpha.value);
    CHECK_THAT(*alpha.value, WithinAbs(expected, 1e-12));
    // Interval on the values' own codes: the same as the naive definition on a tenth of it.
    ReliabilityData tenth = data;
    tenth.units = units / 10;
    tenth.cells.resize(std::size_t(tenth.units) * 2);
    std::vector<double> numbers(static_cast<std::size_t>(units));
    std::iota(numbers.begin(), numbers.end(), 0.0);
    const Metric byNumber = metricOf(Level::Interval, numbers);
    const AlphaResult interval = krippendorffAlpha(tenth, byNumber);
    REQUIRE(interval.value);
    CHECK_THAT(*interval.value, WithinAbs(*naiveAlpha(tenth, byNumber), 1e-12));
}

TEST_CASE("units with fewer than two values do not change alpha", "[alpha]")
{
    // Krippendorff (2011), §C: units with one value are not pairable and drop out.
    const ReliabilityData data = krippendorffC();
    ReliabilityData more = data;
    more.units += 3;
    for (const int cell : {4, kMissing, kMissing, kMissing, kMissing, kMissing, kMissing, kMissing,
             kMissing, kMissing, 0, kMissing})
        more.cells.push_back(cell);
    const AlphaResult a = krippendorffAlpha(data, metricOf(Level::Ordinal));
    const AlphaResult b = krippendorffAlpha(more, metricOf(Level::Ordinal));
    REQUIRE(b.value);
    CHECK(*b.value == *a.value);
    CHECK(b.pairableValues == 40);
}

TEST_CASE("the ordinal difference comes from the marginals", "[alpha]")
{
    // Krippendorff (2011), §E: δ²_ck = (Σ_{g=c..k} n_g − (n_c + n_k)/2)², here with the marginals
    // 9, 13, 10, 5, 3 of the §C example: δ²_12 = (9 + 13 − 11)² = 121, δ²_15 = (40 − 6)² = 1156.
    const CoincidenceMatrix c = coincidences(krippendorffC());
    const Difference delta(metricOf(Level::Ordinal), c);
    CHECK_THAT(delta(0, 1), WithinAbs(121.0, 1e-9));
    CHECK_THAT(delta(1, 0), WithinAbs(121.0, 1e-9));
    CHECK_THAT(delta(0, 4), WithinAbs(1156.0, 1e-9));
    CHECK(delta(2, 2) == 0);
    // Σ_ck n_c n_k δ²_ck in closed form equals the sum over all 25 pairs.
    double pairs = 0;
    for (int a = 0; a < 5; ++a)
        for (int b = 0; b < 5; ++b)
            pairs += c.marginals[std::size_t(a)] * c.marginals[std::size_t(b)] * delta(a, b);
    CHECK_THAT(delta.expectedSum(), WithinRel(pairs, 1e-13));
}

TEST_CASE("interval and ratio alpha hold for values whose squares overflow or vanish", "[alpha]")
{
    // Krippendorff (2011), §D: interval 0.849 (D_o 0.433, D_e 2.872) and ratio 0.797 on values
    // 1–5. Interval alpha does not change when every value is multiplied by the same number
    // (δ² and so D_o and D_e scale with its square); the ratio metric has no unit at all.
    const ReliabilityData data = krippendorffC();
    for (double factor : {1e160, 1e200, 1e300, 1e-300}) {
        INFO("factor " << factor);
        std::vector<double> scaled;
        for (double v : kOneToFive)
            scaled.push_back(v * factor);
        const AlphaResult interval = krippendorffAlpha(data, metricOf(Level::Interval, scaled));
        REQUIRE(interval.value);
        CHECK_THAT(*interval.value, WithinAbs(0.849, 5e-4));
        CHECK(std::isfinite(interval.observedDisagreement));
        // D_o in the data's units, 0.433 × factor², where that is a normal double.
        const double published = 0.433 * factor * factor;
        if (std::isnormal(published))
            CHECK_THAT(interval.observedUnscaled(), Catch::Matchers::WithinRel(published, 2e-3));
        const AlphaResult ratio = krippendorffAlpha(data, metricOf(Level::Ratio, scaled));
        REQUIRE(ratio.value);
        CHECK_THAT(*ratio.value, WithinAbs(0.797, 5e-4));
    }
    // 1e300: D_o in the data's units (about 4e599) is beyond a double, alpha is not.
    std::vector<double> huge;
    for (double v : kOneToFive)
        huge.push_back(v * 1e300);
    const AlphaResult r = krippendorffAlpha(data, metricOf(Level::Interval, huge));
    REQUIRE(r.value);
    CHECK(std::isinf(r.observedUnscaled()));
    CHECK(r.scaleExponent > 0);
    // Ordinary values are not rescaled: the published D_o and D_e stay as they are.
    CHECK(krippendorffAlpha(data, metricOf(Level::Interval, kOneToFive)).scaleExponent == 0);
}
