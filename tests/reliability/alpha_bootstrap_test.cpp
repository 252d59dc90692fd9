#include "core/reliability/alpha_bootstrap.h"
#include "core/reliability/krippendorff_alpha.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <numeric>
#include <random>
#include <string>
#include <vector>

using namespace fourfold::reliability;
using Catch::Matchers::WithinAbs;

namespace {

// Reliability data from one row of codes per unit (one entry per coder, kMissing for missing).
ReliabilityData fromUnits(int values, const std::vector<std::vector<int>> &units)
{
    ReliabilityData data;
    data.units = int(units.size());
    data.coders = int(units.front().size());
    data.values = values;
    for (const std::vector<int> &unit : units)
        data.cells.insert(data.cells.end(), unit.begin(), unit.end());
    return data;
}

constexpr int M = kMissing;

// Krippendorff (2011) §C–D: 12 units × 4 coders, values 1–5 as codes 0–4.
ReliabilityData krippendorffC()
{
    return fromUnits(5,
        {{0, 0, M, 0}, {1, 1, 2, 1}, {2, 2, 2, 2}, {2, 2, 2, 2}, {1, 1, 1, 1}, {0, 1, 2, 3},
            {3, 3, 3, 3}, {0, 0, 1, 0}, {1, 1, 1, 1}, {M, 4, 4, 4}, {M, M, 0, 0}, {M, 2, M, M}});
}

// Hayes & Krippendorff (2007), Table 1: 40 units × 5 coders, values 0–3.
ReliabilityData hayesKrippendorff()
{
    return fromUnits(4,
        {{1, 1, 2, M, 2}, {1, 1, 0, 1, M}, {2, 3, 3, 3, M}, {M, 0, 0, M, 0}, {0, 0, 0, M, 0},
            {0, 0, 0, M, 0}, {1, 0, 2, M, 1}, {1, M, 2, 0, M}, {2, 2, 2, M, 2}, {2, 1, 1, 1, M},
            {M, 1, 0, 0, M}, {0, 0, 0, 0, M}, {1, 2, 2, 2, M}, {3, 3, 2, 2, 3}, {1, 1, 1, M, 1},
            {1, 1, 1, M, 1}, {2, 1, 2, M, 2}, {1, 2, 3, 3, M}, {1, 1, 0, 1, M}, {0, 0, 0, M, 0},
            {0, 0, 1, 1, M}, {0, 0, M, 0, 0}, {2, 3, 3, 3, M}, {0, 0, 0, 0, M}, {1, 2, M, 2, 2},
            {0, 1, 1, 1, M}, {0, 0, 0, 1, 0}, {1, 2, 1, 2, M}, {1, 1, 2, 2, M}, {1, 1, 2, M, 2},
            {1, 1, 0, M, 0}, {2, 1, 2, 1, M}, {2, 2, M, 2, 2}, {3, 2, 2, 2, M}, {2, 2, 2, M, 2},
            {2, 2, 3, M, 2}, {2, 2, 2, M, 2}, {2, 2, M, 1, 2}, {2, 2, 2, 2, M}, {1, 1, 1, M, 1}});
}

// Invented data of a typical reliability sample: 200 units × 3 coders, 4 values, each coder
// gives the unit's "true" value with probability 0.8, 5% missing.
ReliabilityData typicalSample()
{
    std::mt19937_64 random(99);
    std::uniform_int_distribution<int> value(0, 3);
    std::bernoulli_distribution agrees(0.8);
    std::bernoulli_distribution missing(0.05);
    std::vector<std::vector<int>> units;
    for (int u = 0; u < 200; ++u) {
        const int truth = value(random);
        std::vector<int> unit;
        for (int c = 0; c < 3; ++c)
            unit.push_back(missing(random) ? M : (agrees(random) ? truth : value(random)));
        units.push_back(unit);
    }
    return fromUnits(4, units);
}

Metric metricOf(Level level)
{
    Metric metric;
    metric.level = level;
    return metric;
}

BootstrapOptions optionsFor(
    BootstrapMethod method, int replicates, std::uint64_t seed = 1, int threads = 2)
{
    BootstrapOptions options;
    options.method = method;
    options.replicates = replicates;
    options.seed = seed;
    options.threads = threads;
    return options;
}

} // namespace

TEST_CASE("pair resampling draws as many pairs as there are pairs within units", "[bootstrap]")
{
    // Krippendorff §C data: units with 3, 4, 4, 4, 4, 4, 4, 4, 4, 3, 2 values → 55 pairs.
    const BootstrapResult c = bootstrapAlpha(
        krippendorffC(), metricOf(Level::Nominal), optionsFor(BootstrapMethod::PairResampling, 10));
    CHECK(c.draws == 55);
    // Hayes & Krippendorff (2007): "a random sample of 239 pairs of judgments" for their Table 1
    // data *(2nd)*: as quoted by Gwet (2015, Inter-Rater Reliability Blog).
    const BootstrapResult h = bootstrapAlpha(hayesKrippendorff(), metricOf(Level::Ordinal),
        optionsFor(BootstrapMethod::PairResampling, 10));
    CHECK(h.draws == 239);
    // Unit resampling draws the pairable units.
    const BootstrapResult u = bootstrapAlpha(
        krippendorffC(), metricOf(Level::Nominal), optionsFor(BootstrapMethod::UnitResampling, 10));
    CHECK(u.draws == 11);
}

TEST_CASE(
    "bootstrap results are reproducible from the seed, whatever the thread count", "[bootstrap]")
{
    for (const BootstrapMethod method :
        {BootstrapMethod::PairResampling, BootstrapMethod::UnitResampling}) {
        const ReliabilityData data = hayesKrippendorff();
        const Metric metric = metricOf(Level::Ordinal);
        const BootstrapResult one = bootstrapAlpha(data, metric, optionsFor(method, 500, 42, 1));
        const BootstrapResult two = bootstrapAlpha(data, metric, optionsFor(method, 500, 42, 2));
        const BootstrapResult three = bootstrapAlpha(data, metric, optionsFor(method, 500, 42, 3));
        const BootstrapResult again = bootstrapAlpha(data, metric, optionsFor(method, 500, 42, 2));
        const BootstrapResult other = bootstrapAlpha(data, metric, optionsFor(method, 500, 43, 2));
        REQUIRE(one.alphas.size() == 500);
        CHECK(one.alphas == two.alphas);
        CHECK(one.alphas == three.alphas);
        CHECK(one.alphas == again.alphas);
        CHECK(one.ciLow == two.ciLow);
        CHECK(one.ciHigh == two.ciHigh);
        CHECK(one.qBelow == two.qBelow);
        CHECK(one.alphas != other.alphas);
        CHECK(one.seed == 42);
        CHECK(one.method == method);
    }
}

TEST_CASE("the bootstrap interval contains alpha for typical data", "[bootstrap]")
{
    struct Case {
        const char *name;
        ReliabilityData data;
        Level level;
    };
    const std::vector<Case> cases {{"Krippendorff §C nominal", krippendorffC(), Level::Nominal},
        {"Hayes & Krippendorff ordinal", hayesKrippendorff(), Level::Ordinal},
        {"typical sample nominal", typicalSample(), Level::Nominal}};
    for (const Case &c : cases) {
        for (const BootstrapMethod method :
            {BootstrapMethod::PairResampling, BootstrapMethod::UnitResampling}) {
            INFO(c.name << ", " << bootstrapMethodName(method));
            const BootstrapResult r =
                bootstrapAlpha(c.data, metricOf(c.level), optionsFor(method, 1000, 7));
            REQUIRE(r.reason.empty());
            REQUIRE(r.ciLow);
            REQUIRE(r.ciHigh);
            REQUIRE(r.alpha);
            CHECK(*r.alpha == *krippendorffAlpha(c.data, metricOf(c.level)).value);
            CHECK(*r.ciLow < *r.alpha);
            CHECK(*r.alpha < *r.ciHigh);
            CHECK(*r.ciHigh <= 1.0);
            CHECK(*r.ciLow >= -1.0);
            CHECK(r.replicates == 1000);
            CHECK(std::is_sorted(r.alphas.begin(), r.alphas.end()));
            // The interval is the 25th smallest and 25th largest of 1000.
            CHECK(*r.ciLow == r.alphas[24]);
            CHECK(*r.ciHigh == r.alphas[975]);
        }
    }
}

TEST_CASE("q(alpha < alpha_min) falls as alpha_min falls", "[bootstrap]")
{
    // Hayes & Krippendorff (2007): q is the share of bootstrapped alphas below alpha_min.
    for (const BootstrapMethod method :
        {BootstrapMethod::PairResampling, BootstrapMethod::UnitResampling}) {
        const BootstrapResult r = bootstrapAlpha(
            hayesKrippendorff(), metricOf(Level::Ordinal), optionsFor(method, 2000, 3));
        REQUIRE(r.qBelow.size() == 6);
        const std::vector<double> mins {0.9, 0.8, 0.7, 0.667, 0.6, 0.5};
        for (std::size_t i = 0; i < mins.size(); ++i) {
            CHECK(r.qBelow[i].first == mins[i]);
            CHECK(r.qBelow[i].second >= 0.0);
            CHECK(r.qBelow[i].second <= 1.0);
            if (i > 0)
                CHECK(r.qBelow[i].second <= r.qBelow[i - 1].second);
            const auto below = std::count_if(
                r.alphas.begin(), r.alphas.end(), [&](double a) { return a < mins[i]; });
            CHECK(r.qBelow[i].second == double(below) / double(r.alphas.size()));
        }
        // alpha = 0.760: nearly every replicate is below 0.9, few are below 0.5.
        CHECK(r.qBelow.front().second > 0.9);
        CHECK(r.qBelow.back().second < 0.1);
    }
}

TEST_CASE(
    "pair resampling scatters around alpha with the spread of M independent pairs", "[bootstrap]")
{
    // With D_e fixed, α* = 1 − mean(δ²)/D_e over M pairs drawn with p_ck = o_ck/n: its mean is
    // alpha and its standard deviation sd(δ²)/(√M · D_e) (follows from the algorithm; common
    // practice for a mean of independent draws).
    const ReliabilityData data = hayesKrippendorff();
    const Metric metric = metricOf(Level::Ordinal);
    const AlphaResult alpha = krippendorffAlpha(data, metric);
    REQUIRE(alpha.value);
    const CoincidenceMatrix &c = alpha.coincidences;
    double mean = 0;
    double square = 0;
    for (const Coincidence &cell : c.cells) {
        const double p = cell.o / c.total;
        const double delta = alpha.difference(cell.c, cell.k);
        mean += p * delta;
        square += p * delta * delta;
    }
    const double expectedSd =
        std::sqrt(square - mean * mean) / (std::sqrt(239.0) * alpha.expectedDisagreement);

    const int replicates = 4000;
    const BootstrapResult r =
        bootstrapAlpha(data, metric, optionsFor(BootstrapMethod::PairResampling, replicates, 11));
    const double average =
        std::accumulate(r.alphas.begin(), r.alphas.end(), 0.0) / double(r.alphas.size());
    double variance = 0;
    for (const double a : r.alphas)
        variance += (a - average) * (a - average);
    const double sd = std::sqrt(variance / double(r.alphas.size() - 1));
    CHECK(r.noVariationReplicates == 0);
    // Tolerances: 5 standard errors of the mean; 10% for the standard deviation (its relative
    // standard error is about 1/√(2 · 4000) ≈ 1.1%).
    CHECK_THAT(average, WithinAbs(*alpha.value, 5 * expectedSd / std::sqrt(double(replicates))));
    CHECK_THAT(sd, WithinAbs(expectedSd, 0.1 * expectedSd));
}

TEST_CASE("pair resampling applies the note's corrections", "[bootstrap]")
{
    // Units (0,0), (0,0), (0,1): o_00 = 4, o_01 = o_10 = 1, n = 6, D_e = 1/3, M = 3 pairs.
    // A replicate with k disagreeing pairs has α* = 1 − k; k = 0 means all three pairs hold the
    // value 0 only: no variation, scored 0 (probability (4/6)³ = 8/27); k = 3 gives −2, which is
    // set to −1 (Krippendorff's bootstrap note, step four, as read in alpha_bootstrap.h).
    const ReliabilityData data = fromUnits(2, {{0, 0}, {0, 0}, {0, 1}});
    const int replicates = 4000;
    const BootstrapResult r = bootstrapAlpha(
        data, metricOf(Level::Nominal), optionsFor(BootstrapMethod::PairResampling, replicates, 5));
    REQUIRE(r.alpha);
    CHECK_THAT(*r.alpha, WithinAbs(0.0, 1e-12));
    CHECK(r.draws == 3);
    CHECK_THAT(double(r.noVariationReplicates) / replicates, WithinAbs(8.0 / 27.0, 0.03));
    CHECK(r.alphas.front() == -1.0);
    CHECK(r.alphas.back() == 0.0); // never 1
    CHECK(std::all_of(
        r.alphas.begin(), r.alphas.end(), [](double a) { return a == 0.0 || a == -1.0; }));
    // P(α* = −1) = P(k ≥ 2) = 3 (1/3)² (2/3) + (1/3)³ = 7/27.
    const auto minusOne = std::count(r.alphas.begin(), r.alphas.end(), -1.0);
    CHECK_THAT(double(minusOne) / replicates, WithinAbs(7.0 / 27.0, 0.03));
    CHECK(r.droppedReplicates == 0);
}

TEST_CASE("pair resampling draws each pair with its coincidence probability", "[bootstrap]")
{
    // Units (0,0), (1,1), (0,1): o_00 = o_11 = 2, o_01 = o_10 = 1, n = 6; the pairs {0,0},
    // {0,1}, {1,1} each have probability 1/3; M = 3; D_e = 2 · 3 · 3 / 30 = 0.6, so a replicate
    // with k pairs {0,1} has α* = 1 − (k/3)/0.6. By enumeration: all three pairs {0,0} or all
    // {1,1} (no variation, α* = 0): 2/27; k = 0 otherwise (α* = 1): 6/27; k = 1: 12/27;
    // k = 2: 6/27; k = 3: 1/27.
    const ReliabilityData data = fromUnits(2, {{0, 0}, {1, 1}, {0, 1}});
    const int replicates = 6000;
    const BootstrapResult r = bootstrapAlpha(data, metricOf(Level::Nominal),
        optionsFor(BootstrapMethod::PairResampling, replicates, 17));
    REQUIRE(r.draws == 3);
    auto share = [&](double alpha) {
        const auto n = std::count_if(
            r.alphas.begin(), r.alphas.end(), [&](double a) { return std::abs(a - alpha) < 1e-9; });
        return double(n) / replicates;
    };
    CHECK_THAT(double(r.noVariationReplicates) / replicates, WithinAbs(2.0 / 27.0, 0.02));
    CHECK_THAT(share(0.0), WithinAbs(2.0 / 27.0, 0.02));
    CHECK_THAT(share(1.0), WithinAbs(6.0 / 27.0, 0.025));
    CHECK_THAT(share(1.0 - 1.0 / 1.8), WithinAbs(12.0 / 27.0, 0.025));
    CHECK_THAT(share(1.0 - 2.0 / 1.8), WithinAbs(6.0 / 27.0, 0.025));
    CHECK_THAT(share(1.0 - 3.0 / 1.8), WithinAbs(1.0 / 27.0, 0.015));
}

TEST_CASE("unit resampling drops and counts replicates where alpha is undefined", "[bootstrap]")
{
    // Units (0,0), (0,0), (0,1): a replicate without the unit (0,1) holds the value 0 only, so
    // alpha is undefined there; that happens with probability (2/3)³ = 8/27.
    const ReliabilityData data = fromUnits(2, {{0, 0}, {0, 0}, {0, 1}});
    const int replicates = 4000;
    const BootstrapResult r = bootstrapAlpha(
        data, metricOf(Level::Nominal), optionsFor(BootstrapMethod::UnitResampling, replicates, 5));
    REQUIRE(r.reason.empty());
    CHECK(r.replicates == replicates);
    CHECK_THAT(double(r.droppedReplicates) / replicates, WithinAbs(8.0 / 27.0, 0.03));
    CHECK(int(r.alphas.size()) == replicates - r.droppedReplicates);
    CHECK(std::all_of(
        r.alphas.begin(), r.alphas.end(), [](double a) { return std::isfinite(a) && a < 1.0; }));
    CHECK(r.noVariationReplicates == 0);
}

TEST_CASE("a bootstrap without variation to draw returns alpha itself", "[bootstrap]")
{
    // Every unit holds 0 and 1: every drawn pair and every drawn unit is alike, so every
    // replicate equals alpha. o_01 = o_10 = 4, n = 8, D_o = 1, D_e = 2 · 4 · 4 / (8 · 7) = 4/7,
    // alpha = 1 − 7/4 = −0.75 (Krippendorff 2011, §C definitions, by hand).
    const ReliabilityData data = fromUnits(2, {{0, 1}, {1, 0}, {0, 1}, {0, 1}});
    for (const BootstrapMethod method :
        {BootstrapMethod::PairResampling, BootstrapMethod::UnitResampling}) {
        const BootstrapResult r =
            bootstrapAlpha(data, metricOf(Level::Nominal), optionsFor(method, 200, 1));
        REQUIRE(r.alpha);
        CHECK_THAT(*r.alpha, WithinAbs(-0.75, 1e-12));
        REQUIRE(r.ciLow);
        CHECK_THAT(*r.ciLow, WithinAbs(*r.alpha, 1e-12));
        CHECK_THAT(*r.ciHigh, WithinAbs(*r.alpha, 1e-12));
    }
}

TEST_CASE("the bootstrap is undefined when alpha is", "[bootstrap]")
{
    const ReliabilityData oneValue = fromUnits(2, {{0, 0}, {0, 0}, {1, M}});
    for (const BootstrapMethod method :
        {BootstrapMethod::PairResampling, BootstrapMethod::UnitResampling}) {
        const BootstrapResult r =
            bootstrapAlpha(oneValue, metricOf(Level::Nominal), optionsFor(method, 100));
        CHECK_FALSE(r.ciLow);
        CHECK_FALSE(r.ciHigh);
        CHECK_FALSE(r.alpha);
        CHECK(r.reason.find("only one value") != std::string::npos);
        CHECK(r.replicates == 0);
        CHECK(r.qBelow.empty());
    }
    const BootstrapResult none = bootstrapAlpha(
        krippendorffC(), metricOf(Level::Nominal), optionsFor(BootstrapMethod::PairResampling, 0));
    CHECK_FALSE(none.ciLow);
    CHECK(none.reason == "no bootstrap replicates were requested");
}

TEST_CASE("bootstrap methods are named for reports", "[bootstrap]")
{
    CHECK(std::string(bootstrapMethodName(BootstrapMethod::PairResampling))
        == "pair-resampling (Hayes & Krippendorff 2007)");
    CHECK(std::string(bootstrapMethodName(BootstrapMethod::UnitResampling))
        == "unit-resampling percentile");
}
