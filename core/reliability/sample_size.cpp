#include "core/reliability/sample_size.h"

#include <array>
#include <climits>
#include <cmath>
#include <limits>

namespace fourfold::reliability {

double normalQuantile(double p)
{
    if (!(p > 0.0 && p < 1.0))
        return std::numeric_limits<double>::quiet_NaN();

    // Starting value: P. J. Acklam (2003), "An algorithm for computing the inverse normal
    // cumulative distribution function": rational approximations in a central region and two
    // tails, relative error below 1.15e-9.
    constexpr std::array<double, 6> a {-3.969683028665376e+01, 2.209460984245205e+02,
        -2.759285104469687e+02, 1.383577518672690e+02, -3.066479806614716e+01,
        2.506628277459239e+00};
    constexpr std::array<double, 5> b {-5.447609879822406e+01, 1.615858368580409e+02,
        -1.556989798598866e+02, 6.680131188771972e+01, -1.328068155288572e+01};
    constexpr std::array<double, 6> c {-7.784894002430293e-03, -3.223964580411365e-01,
        -2.400758277161838e+00, -2.549732539343734e+00, 4.374664141464968e+00,
        2.938163982698783e+00};
    constexpr std::array<double, 4> d {
        7.784695709041462e-03, 3.224671290700398e-01, 2.445134137142996e+00, 3.754408661907416e+00};
    constexpr double pLow = 0.02425;

    double x = 0;
    if (p < pLow) {
        const double q = std::sqrt(-2.0 * std::log(p));
        x = (((((c[0] * q + c[1]) * q + c[2]) * q + c[3]) * q + c[4]) * q + c[5])
            / ((((d[0] * q + d[1]) * q + d[2]) * q + d[3]) * q + 1.0);
    } else if (p <= 1.0 - pLow) {
        const double q = p - 0.5;
        const double r = q * q;
        x = (((((a[0] * r + a[1]) * r + a[2]) * r + a[3]) * r + a[4]) * r + a[5]) * q
            / (((((b[0] * r + b[1]) * r + b[2]) * r + b[3]) * r + b[4]) * r + 1.0);
    } else {
        const double q = std::sqrt(-2.0 * std::log(1.0 - p));
        x = -(((((c[0] * q + c[1]) * q + c[2]) * q + c[3]) * q + c[4]) * q + c[5])
            / ((((d[0] * q + d[1]) * q + d[2]) * q + d[3]) * q + 1.0);
    }

    // Refinement to full double precision (Acklam 2003, "refinement using Halley's rational
    // method"): Φ(x) = erfc(−x/√2)/2, e = Φ(x) − p, u = e √(2π) exp(x²/2),
    // x ← x − u / (1 + x u / 2). Two steps make the result independent of the starting error.
    constexpr double sqrt2 = 1.41421356237309504880;
    constexpr double sqrt2Pi = 2.50662827463100050242;
    for (int step = 0; step < 2; ++step) {
        const double e = 0.5 * std::erfc(-x / sqrt2) - p;
        const double u = e * sqrt2Pi * std::exp(x * x / 2.0);
        x = x - u / (1.0 + x * u / 2.0);
    }
    return x;
}

int minimumReliabilityValues(double alphaMin, double significance, double rarestProportion)
{
    auto inside = [](double value) { return value > 0.0 && value < 1.0; };
    if (!inside(alphaMin) || !inside(significance) || !inside(rarestProportion))
        return 0;
    // One-tailed: alpha_min is a lower bound to be exceeded.
    const double z = normalQuantile(1.0 - significance);
    const double pc = rarestProportion;
    // Krippendorff (2004), §11.4, after Bloch & Kraemer (1989), for two coders:
    // N = 2 z² ((1 + α)(3 − α) / (4 (1 − α) p_c (1 − p_c)) − α).
    const double n = 2.0 * z * z
        * ((1.0 + alphaMin) * (3.0 - alphaMin) / (4.0 * (1.0 - alphaMin) * pc * (1.0 - pc))
            - alphaMin);
    // Rounded up; the tiny allowance keeps an exactly whole N from rounding up by 1 through
    // floating-point error.
    const double whole = std::ceil(n * (1.0 - 1e-12));
    if (!(whole >= 0.0) || whole > double(INT_MAX))
        return 0;
    return int(whole);
}

} // namespace fourfold::reliability
