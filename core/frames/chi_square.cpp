#include "core/frames/chi_square.h"

#include <algorithm>
#include <cmath>
#include <limits>

namespace fourfold::frames {

double upperRegularizedGamma(double a, double x)
{
    if (x <= 0)
        return 1.0;
    const double logPrefix = -x + a * std::log(x) - std::lgamma(a);
    constexpr double kEpsilon = 1e-16;
    constexpr int kMaxTerms = 100000;
    if (x < a + 1) {
        // P(a, x) = e^{−x} x^a / Γ(a) Σ_n x^n / (a (a+1) ... (a+n)).
        double term = 1.0 / a;
        double sum = term;
        for (int n = 1; n < kMaxTerms; ++n) {
            term *= x / (a + n);
            sum += term;
            if (std::abs(term) < std::abs(sum) * kEpsilon)
                break;
        }
        return std::max(0.0, 1.0 - sum * std::exp(logPrefix));
    }
    // Q(a, x) = e^{−x} x^a / Γ(a) · 1/(x+1−a− 1·(1−a)/(x+3−a− 2·(2−a)/(x+5−a− ...))), by the
    // modified Lentz method.
    constexpr double kTiny = std::numeric_limits<double>::min() / kEpsilon;
    double b = x + 1 - a;
    double c = 1 / kTiny;
    double d = 1 / b;
    double h = d;
    for (int i = 1; i < kMaxTerms; ++i) {
        const double an = -i * (i - a);
        b += 2;
        d = an * d + b;
        if (std::abs(d) < kTiny)
            d = kTiny;
        c = b + an / c;
        if (std::abs(c) < kTiny)
            c = kTiny;
        d = 1 / d;
        const double delta = d * c;
        h *= delta;
        if (std::abs(delta - 1) < kEpsilon)
            break;
    }
    return std::exp(logPrefix) * h;
}

Outcome<ChiSquareResult> chiSquare(const std::vector<long long> &counts, int rows, int columns)
{
    if (rows < 0 || columns < 0 || counts.size() != std::size_t(rows) * std::size_t(columns))
        return std::unexpected(std::string("the table does not hold rows × columns counts"));
    std::vector<long long> rowTotals(std::size_t(rows), 0);
    std::vector<long long> columnTotals(std::size_t(columns), 0);
    ChiSquareResult result;
    for (int r = 0; r < rows; ++r)
        for (int c = 0; c < columns; ++c) {
            const long long v = counts[std::size_t(r) * std::size_t(columns) + std::size_t(c)];
            if (v < 0)
                return std::unexpected(std::string("a count is negative"));
            rowTotals[std::size_t(r)] += v;
            columnTotals[std::size_t(c)] += v;
            result.n += v;
        }
    result.rowsUsed =
        int(std::count_if(rowTotals.begin(), rowTotals.end(), [](long long t) { return t > 0; }));
    result.columnsUsed = int(
        std::count_if(columnTotals.begin(), columnTotals.end(), [](long long t) { return t > 0; }));
    if (result.rowsUsed < 2 || result.columnsUsed < 2) {
        result.reason = "chi-square needs at least 2 rows and 2 columns with counts";
        return result;
    }
    // Pearson (1900): X² = Σ (O − E)² / E over the used cells.
    double statistic = 0;
    const double n = double(result.n);
    for (int r = 0; r < rows; ++r) {
        if (rowTotals[std::size_t(r)] == 0)
            continue;
        for (int c = 0; c < columns; ++c) {
            if (columnTotals[std::size_t(c)] == 0)
                continue;
            const double expected =
                double(rowTotals[std::size_t(r)]) * double(columnTotals[std::size_t(c)]) / n;
            const double observed =
                double(counts[std::size_t(r) * std::size_t(columns) + std::size_t(c)]);
            statistic += (observed - expected) * (observed - expected) / expected;
            if (expected < 5)
                ++result.smallExpected;
        }
    }
    result.degreesOfFreedom = (result.rowsUsed - 1) * (result.columnsUsed - 1);
    result.statistic = statistic;
    result.pValue = upperRegularizedGamma(result.degreesOfFreedom / 2.0, statistic / 2.0);
    // Cramér (1946), §21.9.
    result.cramersV =
        std::sqrt(statistic / (n * double(std::min(result.rowsUsed, result.columnsUsed) - 1)));
    return result;
}

} // namespace fourfold::frames
