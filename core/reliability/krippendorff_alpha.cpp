#include "core/reliability/krippendorff_alpha.h"

#include <cmath>
#include <cstdint>

namespace fourfold::reliability {

namespace {

// Above this many cells per matrix the exact integer accumulation (one matrix per distinct
// number of values in a unit) would cost too much memory; sums are then taken in doubles.
constexpr std::size_t kMaxExactCells = std::size_t(1) << 16;

// One pass over the units. Per unit: the number of values m_u and the count n_uc of each value;
// a unit adds n_uc n_uk − [c = k] n_uc to o_ck, weighted 1 / (m_u − 1) (Krippendorff 2011,
// §C; Krippendorff 2004, ch. 11). The unweighted sums are integers and are kept apart per m_u,
// so o_ck is exact up to the final division.
CoincidenceMatrix countCoincidences(const ReliabilityData &data)
{
    CoincidenceMatrix result;
    const std::size_t v = std::size_t(data.values);
    const std::size_t coders = std::size_t(data.coders);
    result.values = data.values;
    result.o.assign(v * v, 0.0);
    result.marginals.assign(v, 0.0);
    if (v == 0 || coders < 2)
        return result;

    const bool exact = v * v <= kMaxExactCells;
    std::vector<std::vector<std::int64_t>> sums(exact ? coders + 1 : 0); // by m_u
    std::vector<int> count(v, 0);
    std::vector<int> seen;
    seen.reserve(coders);
    std::int64_t pairableValues = 0;
    int pairableUnits = 0;

    const int *cell = data.cells.data();
    for (int u = 0; u < data.units; ++u, cell += coders) {
        seen.clear();
        for (std::size_t i = 0; i < coders; ++i) {
            const int value = cell[i];
            if (value == kMissing)
                continue;
            if (count[std::size_t(value)]++ == 0)
                seen.push_back(value);
        }
        std::size_t m = 0;
        for (const int value : seen)
            m += std::size_t(count[std::size_t(value)]);
        if (m >= 2) {
            ++pairableUnits;
            pairableValues += std::int64_t(m);
            if (exact) {
                std::vector<std::int64_t> &s = sums[m];
                if (s.empty())
                    s.assign(v * v, 0);
                for (const int c : seen) {
                    const std::int64_t nc = count[std::size_t(c)];
                    std::int64_t *row = s.data() + std::size_t(c) * v;
                    for (const int k : seen)
                        row[k] += nc * count[std::size_t(k)];
                    row[c] -= nc;
                }
            } else {
                const double weight = 1.0 / double(m - 1);
                for (const int c : seen) {
                    const double nc = count[std::size_t(c)];
                    double *row = result.o.data() + std::size_t(c) * v;
                    for (const int k : seen)
                        row[k] += weight * nc * count[std::size_t(k)];
                    row[c] -= weight * nc;
                }
            }
        }
        for (const int value : seen)
            count[std::size_t(value)] = 0;
    }

    if (exact) {
        for (std::size_t m = 2; m < sums.size(); ++m) {
            if (sums[m].empty())
                continue;
            const double denominator = double(m - 1);
            for (std::size_t i = 0; i < v * v; ++i)
                result.o[i] += double(sums[m][i]) / denominator;
        }
    }
    for (std::size_t c = 0; c < v; ++c) {
        double sum = 0;
        for (std::size_t k = 0; k < v; ++k)
            sum += result.o[c * v + k];
        result.marginals[c] = sum;
    }
    result.total = double(pairableValues);
    result.units = pairableUnits;
    return result;
}

} // namespace

CoincidenceMatrix coincidences(const ReliabilityData &data)
{
    if (!dataProblem(data).empty())
        return {};
    return countCoincidences(data);
}

double AlphaResult::observedUnscaled() const
{
    return std::ldexp(observedDisagreement, scaleExponent);
}

double AlphaResult::expectedUnscaled() const
{
    return std::ldexp(expectedDisagreement, scaleExponent);
}

int differenceScale(const Metric &metric)
{
    if (metric.level != Level::Interval && metric.level != Level::Ratio)
        return 0;
    double largest = 0;
    for (double v : metric.numeric)
        largest = std::max(largest, std::abs(v));
    // Between 2^-200 and 2^200 every δ² stays below 2^402 (sums of up to 2^500 of them stay
    // finite) and no difference of distinct numbers squares to 0.
    const bool outside =
        largest > std::ldexp(1.0, 200) || (largest > 0 && largest < std::ldexp(1.0, -200));
    return outside ? std::ilogb(largest) : 0;
}

std::vector<double> differenceMatrix(const Metric &metric, const CoincidenceMatrix &c)
{
    if (!metricProblem(metric, c.values).empty())
        return {};
    const std::size_t v = std::size_t(c.values);
    if (!metric.custom.empty())
        return metric.custom;

    std::vector<double> delta(v * v, 0.0);
    const int scale = differenceScale(metric);
    auto number = [&](std::size_t code) {
        return metric.numeric.empty() ? double(code) : std::ldexp(metric.numeric[code], -scale);
    };
    switch (metric.level) {
    case Level::Nominal:
        // δ²_ck = 0 if c = k, else 1 (Krippendorff 2011, §E).
        for (std::size_t a = 0; a < v; ++a)
            for (std::size_t b = 0; b < v; ++b)
                delta[a * v + b] = a == b ? 0.0 : 1.0;
        break;
    case Level::Ordinal: {
        // δ²_ck = (Σ_{g=c..k} n_g − (n_c + n_k)/2)² for c ≤ k, from the marginals of the
        // pairable values, codes in rank order (Krippendorff 2011, §E).
        if (c.marginals.size() != v)
            return {};
        std::vector<double> prefix(v + 1, 0.0); // prefix[i] = Σ_{g<i} n_g
        for (std::size_t g = 0; g < v; ++g)
            prefix[g + 1] = prefix[g] + c.marginals[g];
        for (std::size_t a = 0; a < v; ++a) {
            for (std::size_t b = a + 1; b < v; ++b) {
                const double d =
                    (prefix[b + 1] - prefix[a]) - (c.marginals[a] + c.marginals[b]) / 2.0;
                delta[a * v + b] = delta[b * v + a] = d * d;
            }
        }
        break;
    }
    case Level::Interval:
        // δ²_ck = (c − k)² (Krippendorff 2011, §E).
        for (std::size_t a = 0; a < v; ++a) {
            for (std::size_t b = 0; b < v; ++b) {
                const double d = number(a) - number(b);
                delta[a * v + b] = d * d;
            }
        }
        break;
    case Level::Ratio:
        // δ²_ck = ((c − k)/(c + k))² (Krippendorff 2011, §E); two codes with the number 0 do
        // not differ.
        for (std::size_t a = 0; a < v; ++a) {
            for (std::size_t b = 0; b < v; ++b) {
                const double sum = number(a) + number(b);
                const double d = sum == 0 ? 0.0 : (number(a) - number(b)) / sum;
                delta[a * v + b] = d * d;
            }
        }
        break;
    }
    return delta;
}

AlphaResult krippendorffAlpha(const CoincidenceMatrix &c, const Metric &metric)
{
    AlphaResult result;
    result.coincidences = c;
    result.pairableUnits = c.units;
    result.pairableValues = c.total;
    const std::size_t v = std::size_t(c.values);
    if (c.values < 0 || c.o.size() != v * v || c.marginals.size() != v) {
        result.reason = "the coincidence matrix is malformed";
        return result;
    }
    if (UndefinedReason problem = metricProblem(metric, c.values); !problem.empty()) {
        result.reason = problem;
        return result;
    }
    if (c.total < 2) {
        result.reason = "fewer than two pairable values: no unit holds values from two or "
                        "more coders";
        return result;
    }
    result.delta = differenceMatrix(metric, c);
    // The ratio metric is free of units; the interval metric's δ² scales with the square.
    if (metric.level == Level::Interval && metric.custom.empty())
        result.scaleExponent = 2 * differenceScale(metric);

    // D_o = (1/n) Σ_c Σ_k o_ck δ²_ck and D_e = 1/(n(n − 1)) Σ_c Σ_k n_c n_k δ²_ck
    // (Krippendorff 2011, §C–D).
    const double n = c.total;
    double observed = 0;
    double expected = 0;
    int occurring = 0;
    for (std::size_t a = 0; a < v; ++a) {
        if (c.marginals[a] > 0)
            ++occurring;
        double rowObserved = 0;
        double rowExpected = 0;
        for (std::size_t b = 0; b < v; ++b) {
            rowObserved += c.o[a * v + b] * result.delta[a * v + b];
            rowExpected += c.marginals[b] * result.delta[a * v + b];
        }
        observed += rowObserved;
        expected += c.marginals[a] * rowExpected;
    }
    result.observedDisagreement = observed / n;
    result.expectedDisagreement = expected / (n * (n - 1));
    if (!std::isfinite(result.observedDisagreement)
        || !std::isfinite(result.expectedDisagreement)) {
        result.reason = "the differences between the values are too large to compute";
        return result;
    }
    if (occurring < 2) {
        result.reason = "only one value occurs among the pairable values (expected "
                        "disagreement is 0)";
        return result;
    }
    if (!(result.expectedDisagreement > 0)) {
        result.reason = "expected disagreement is 0: the values that occur do not differ "
                        "under this metric";
        return result;
    }
    // alpha = 1 − D_o / D_e (Krippendorff 2011, §A; 2004, ch. 11).
    result.value = 1.0 - result.observedDisagreement / result.expectedDisagreement;
    return result;
}

AlphaResult krippendorffAlpha(const ReliabilityData &data, const Metric &metric)
{
    if (UndefinedReason problem = dataProblem(data); !problem.empty()) {
        AlphaResult result;
        result.reason = problem;
        return result;
    }
    if (UndefinedReason problem = metricProblem(metric, data.values); !problem.empty()) {
        AlphaResult result;
        result.reason = problem;
        return result;
    }
    return krippendorffAlpha(countCoincidences(data), metric);
}

} // namespace fourfold::reliability
