#include "core/reliability/sample_size.h"

#include <catch2/catch.hpp>

#include <cmath>

using namespace fourfold::reliability;
using Catch::Matchers::WithinAbs;
using Catch::Matchers::WithinRel;

TEST_CASE("normalQuantile matches printed normal tables", "[samplesize]")
{
    // Normal quantiles of the usual statistical tables (1.645, 1.960, 2.326, 2.576); the full
    // digits are from memory and agree with Python's statistics.NormalDist (Wichura 1988, AS 241).
    CHECK_THAT(normalQuantile(0.95), WithinAbs(1.6448536269514722, 1e-13));
    CHECK_THAT(normalQuantile(0.975), WithinAbs(1.9599639845400540, 1e-13));
    CHECK_THAT(normalQuantile(0.99), WithinAbs(2.3263478740408408, 1e-13));
    CHECK_THAT(normalQuantile(0.995), WithinAbs(2.5758293035489004, 1e-13));
    CHECK(normalQuantile(0.5) == 0.0);
    CHECK_THAT(normalQuantile(0.05), WithinAbs(-1.6448536269514722, 1e-13));
    // Far tails (Acklam's lower region and its mirror): Φ⁻¹(1e-10) = −6.3613409...
    CHECK_THAT(normalQuantile(1e-10), WithinRel(-6.361340902404056, 1e-12));
    CHECK(std::isnan(normalQuantile(0.0)));
    CHECK(std::isnan(normalQuantile(1.0)));
    CHECK(std::isnan(normalQuantile(-0.5)));
}

TEST_CASE("normalQuantile inverts the normal distribution function", "[samplesize]")
{
    // Φ(x) = erfc(−x/√2)/2 (common practice); round trip over the range.
    for (double p = 1e-6; p < 1.0; p += 0.0137) {
        const double x = normalQuantile(p);
        CHECK_THAT(0.5 * std::erfc(-x / std::sqrt(2.0)), WithinRel(p, 1e-13));
    }
}

TEST_CASE("minimumReliabilityValues reproduces Krippendorff's table", "[samplesize]")
{
    // Krippendorff (2004), §11.4, after Bloch & Kraemer (1989); two coders, rarest value
    // proportion 0.25, p = 0.05. *(2nd)*: reproduced by a third party, not seen on the page.
    CHECK(minimumReliabilityValues(0.800, 0.05, 0.25) == 139); // Krippendorff (2004) (2nd)
    CHECK(minimumReliabilityValues(0.667, 0.05, 0.25) == 81); // Krippendorff (2004) (2nd)
}

TEST_CASE("minimumReliabilityValues grows with stricter demands", "[samplesize]")
{
    // From the formula's shape: a higher alpha_min, a smaller significance level and a rarer
    // value each need more values.
    CHECK(minimumReliabilityValues(0.9, 0.05, 0.25) > minimumReliabilityValues(0.8, 0.05, 0.25));
    CHECK(minimumReliabilityValues(0.8, 0.01, 0.25) > minimumReliabilityValues(0.8, 0.05, 0.25));
    CHECK(minimumReliabilityValues(0.8, 0.05, 0.10) > minimumReliabilityValues(0.8, 0.05, 0.25));
    // p_c (1 − p_c) is symmetric about 1/2.
    CHECK(minimumReliabilityValues(0.8, 0.05, 0.25) == minimumReliabilityValues(0.8, 0.05, 0.75));
}

TEST_CASE("minimumReliabilityValues returns 0 for arguments outside (0, 1)", "[samplesize]")
{
    CHECK(minimumReliabilityValues(1.0, 0.05, 0.25) == 0);
    CHECK(minimumReliabilityValues(0.0, 0.05, 0.25) == 0);
    CHECK(minimumReliabilityValues(0.8, 0.0, 0.25) == 0);
    CHECK(minimumReliabilityValues(0.8, 1.5, 0.25) == 0);
    CHECK(minimumReliabilityValues(0.8, 0.05, 0.0) == 0);
    CHECK(minimumReliabilityValues(0.8, 0.05, 1.0) == 0);
    CHECK(minimumReliabilityValues(std::nan(""), 0.05, 0.25) == 0);
    // Too many values for an int.
    CHECK(minimumReliabilityValues(0.999999, 1e-12, 1e-9) == 0);
}
