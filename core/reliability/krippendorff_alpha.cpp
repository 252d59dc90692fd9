#include "core/reliability/krippendorff_alpha.h"

#include <algorithm>
#include <cmath>
#include <cstdint>
#include <unordered_map>

namespace fourfold::reliability {

namespace {

// Up to this many cells per matrix (and no more than a few per cell of the data) the
// coincidences are counted in dense tables; beyond, in a hash table of the pairs that occur.
// Both count exact integers per distinct number of values in a unit and give the same result.
constexpr std::size_t kMaxDenseCells = std::size_t(1) << 16;

// An entry of the sparse count: the pair of values (c, k) within units of m values.
struct PairKey {
    int c = 0;
    int k = 0;
    std::size_t m = 0;
    bool operator==(const PairKey &) const = default;
};

struct PairKeyHash {
    std::size_t operator()(const PairKey &key) const
    {
        std::uint64_t h = std::uint64_t(std::uint32_t(key.c)) << 32 | std::uint32_t(key.k);
        h ^= std::uint64_t(key.m) * 0x9E3779B97F4A7C15ULL;
        h ^= h >> 29;
        return std::size_t(h * 0xBF58476D1CE4E5B9ULL);
    }
};

// Marginals n_c = Σ_k o_ck from the sorted entries.
void addMarginals(CoincidenceMatrix &result)
{
    result.marginals.assign(std::size_t(result.values), 0.0);
    for (const Coincidence &cell : result.cells)
        result.marginals[std::size_t(cell.c)] += cell.o;
}

// One pass over the units. Per unit: the number of values m_u and the count n_uc of each value;
// a unit adds n_uc n_uk − [c = k] n_uc to o_ck, weighted 1 / (m_u − 1) (Krippendorff 2011,
// §C; Krippendorff 2004, ch. 11). The unweighted sums are integers kept apart per m_u, so o_ck
// is exact up to the final division, summed over m_u in ascending order.
CoincidenceMatrix countCoincidences(const ReliabilityData &data)
{
    CoincidenceMatrix result;
    const std::size_t v = std::size_t(data.values);
    const std::size_t coders = std::size_t(data.coders);
    result.values = data.values;
    result.marginals.assign(v, 0.0);
    if (v == 0 || coders < 2)
        return result;

    const bool dense = v * v <= kMaxDenseCells
        && v * v <= 4 * std::size_t(data.units) * std::max<std::size_t>(coders, 1);
    std::vector<std::vector<std::int64_t>> sums(dense ? coders + 1 : 0); // by m_u
    std::unordered_map<PairKey, std::int64_t, PairKeyHash> sparse;
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
            if (dense) {
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
                for (const int c : seen) {
                    const std::int64_t nc = count[std::size_t(c)];
                    for (const int k : seen) {
                        const std::int64_t pairs = nc * count[std::size_t(k)] - (c == k ? nc : 0);
                        if (pairs > 0)
                            sparse[PairKey {c, k, m}] += pairs;
                    }
                }
            }
        }
        for (const int value : seen)
            count[std::size_t(value)] = 0;
    }

    if (dense) {
        std::vector<double> o(v * v, 0.0);
        for (std::size_t m = 2; m < sums.size(); ++m) {
            if (sums[m].empty())
                continue;
            const double denominator = double(m - 1);
            for (std::size_t i = 0; i < v * v; ++i)
                o[i] += double(sums[m][i]) / denominator;
        }
        for (std::size_t i = 0; i < v * v; ++i)
            if (o[i] != 0)
                result.cells.push_back({int(i / v), int(i % v), o[i]});
    } else {
        std::vector<std::pair<PairKey, std::int64_t>> entries(sparse.begin(), sparse.end());
        sparse = {};
        std::sort(entries.begin(), entries.end(), [](const auto &a, const auto &b) {
            const PairKey &x = a.first;
            const PairKey &y = b.first;
            return x.c != y.c ? x.c < y.c : x.k != y.k ? x.k < y.k : x.m < y.m;
        });
        for (const auto &[key, sum] : entries) {
            const double o = double(sum) / double(key.m - 1);
            if (!result.cells.empty() && result.cells.back().c == key.c
                && result.cells.back().k == key.k)
                result.cells.back().o += o;
            else
                result.cells.push_back({key.c, key.k, o});
        }
    }
    addMarginals(result);
    result.total = double(pairableValues);
    result.units = pairableUnits;
    return result;
}

bool before(const Coincidence &a, const Coincidence &b)
{
    return a.c != b.c ? a.c < b.c : a.k < b.k;
}

} // namespace

double CoincidenceMatrix::at(int c, int k) const
{
    const Coincidence key {c, k, 0};
    const auto it = std::lower_bound(cells.begin(), cells.end(), key, before);
    return it != cells.end() && it->c == c && it->k == k ? it->o : 0.0;
}

CoincidenceMatrix coincidences(const ReliabilityData &data)
{
    if (!dataProblem(data).empty())
        return {};
    return countCoincidences(data);
}

CoincidenceMatrix withoutPart(const CoincidenceMatrix &whole, const CoincidenceMatrix &part)
{
    // Sums of multiples of 1/(m_u − 1): what is left of an emptied entry is rounding only.
    const auto minus = [](double x, double y) {
        const double left = x - y;
        return std::abs(left) < 1e-9 ? 0.0 : left;
    };
    CoincidenceMatrix rest;
    rest.values = whole.values;
    rest.cells.reserve(whole.cells.size());
    auto p = part.cells.begin();
    for (const Coincidence &cell : whole.cells) {
        while (p != part.cells.end() && before(*p, cell))
            ++p;
        const bool matched = p != part.cells.end() && p->c == cell.c && p->k == cell.k;
        const double o = matched ? minus(cell.o, p->o) : cell.o;
        if (o != 0)
            rest.cells.push_back({cell.c, cell.k, o});
    }
    rest.marginals = whole.marginals;
    for (std::size_t i = 0; i < rest.marginals.size() && i < part.marginals.size(); ++i)
        rest.marginals[i] = minus(rest.marginals[i], part.marginals[i]);
    rest.total = minus(whole.total, part.total);
    rest.units = whole.units - part.units;
    return rest;
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

Difference::Difference(const Metric &metric, const CoincidenceMatrix &c)
    : m_level(metric.level)
    , m_custom(!metric.custom.empty())
    , m_values(c.values)
    , m_marginals(c.marginals)
{
    const std::size_t v = std::size_t(c.values);
    if (m_custom) {
        m_table = metric.custom;
        return;
    }
    switch (m_level) {
    case Level::Nominal:
        break;
    case Level::Ordinal: {
        // δ²_ck = (Σ_{g=c..k} n_g − (n_c + n_k)/2)² for c ≤ k (Krippendorff 2011, §E), which is
        // (r_k − r_c)² with the mid-rank r_g = Σ_{h<g} n_h + n_g / 2 of each code in rank order.
        m_numbers.assign(v, 0.0);
        double below = 0;
        for (std::size_t g = 0; g < v && g < m_marginals.size(); ++g) {
            m_numbers[g] = below + m_marginals[g] / 2.0;
            below += m_marginals[g];
        }
        break;
    }
    case Level::Interval:
    case Level::Ratio:
        m_scale = differenceScale(metric);
        m_numbers.assign(v, 0.0);
        for (std::size_t g = 0; g < v; ++g)
            m_numbers[g] =
                metric.numeric.empty() ? double(g) : std::ldexp(metric.numeric[g], -m_scale);
        break;
    }
}

double Difference::operator()(int c, int k) const
{
    if (m_custom)
        return m_table[std::size_t(c) * std::size_t(m_values) + std::size_t(k)];
    switch (m_level) {
    case Level::Nominal:
        // δ²_ck = 0 if c = k, else 1 (Krippendorff 2011, §E).
        return c == k ? 0.0 : 1.0;
    case Level::Ordinal:
    case Level::Interval: {
        // Interval: δ²_ck = (c − k)² (Krippendorff 2011, §E); ordinal: of the mid-ranks.
        const double d = m_numbers[std::size_t(c)] - m_numbers[std::size_t(k)];
        return d * d;
    }
    case Level::Ratio: {
        // δ²_ck = ((c − k)/(c + k))² (Krippendorff 2011, §E); two codes with the number 0 do
        // not differ.
        const double a = m_numbers[std::size_t(c)];
        const double b = m_numbers[std::size_t(k)];
        const double d = a + b == 0 ? 0.0 : (a - b) / (a + b);
        return d * d;
    }
    }
    return 0;
}

double Difference::expectedSum() const
{
    std::vector<int> occurring;
    double n = 0;
    for (std::size_t g = 0; g < m_marginals.size(); ++g) {
        if (m_marginals[g] > 0) {
            occurring.push_back(int(g));
            n += m_marginals[g];
        }
    }
    // Σ_c Σ_k n_c n_k δ²_ck over the pairs of occurring codes, for metrics without a shortcut.
    const auto byPairs = [&] {
        double sum = 0;
        for (std::size_t a = 0; a < occurring.size(); ++a) {
            const int c = occurring[a];
            double row = 0;
            for (std::size_t b = 0; b < occurring.size(); ++b)
                row += m_marginals[std::size_t(occurring[b])] * (*this)(c, occurring[b]);
            sum += m_marginals[std::size_t(c)] * row;
        }
        return sum;
    };
    if (m_custom)
        return byPairs();
    if (m_level == Level::Nominal) {
        // Σ_{c≠k} n_c n_k = n² − Σ n_c².
        double squares = 0;
        for (const int c : occurring)
            squares += m_marginals[std::size_t(c)] * m_marginals[std::size_t(c)];
        return n * n - squares;
    }
    // Codes whose numbers are all equal do not differ (exactly 0, whatever the rounding).
    const bool oneNumber = std::all_of(occurring.begin(), occurring.end(),
        [&](int c) { return m_numbers[std::size_t(c)] == m_numbers[std::size_t(occurring[0])]; });
    if (occurring.empty() || oneNumber)
        return 0;
    if (m_level == Level::Ratio)
        return byPairs();
    // Interval and ordinal: Σ_c Σ_k n_c n_k (x_c − x_k)² = 2 n Σ_c n_c (x_c − x̄)² with x̄ the
    // mean of the pairable values, taken about the mean so that nothing cancels.
    double mean = 0;
    for (const int c : occurring)
        mean += m_marginals[std::size_t(c)] * m_numbers[std::size_t(c)];
    mean /= n;
    double squares = 0;
    for (const int c : occurring) {
        const double d = m_numbers[std::size_t(c)] - mean;
        squares += m_marginals[std::size_t(c)] * d * d;
    }
    return 2.0 * n * squares;
}

AlphaResult krippendorffAlpha(const CoincidenceMatrix &c, const Metric &metric)
{
    AlphaResult result;
    result.coincidences = c;
    result.pairableUnits = c.units;
    result.pairableValues = c.total;
    const std::size_t v = std::size_t(c.values);
    const bool inRange = std::all_of(c.cells.begin(), c.cells.end(), [&](const Coincidence &x) {
        return x.c >= 0 && x.k >= 0 && x.c < c.values && x.k < c.values;
    });
    if (c.values < 0 || c.marginals.size() != v || !inRange) {
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
    result.difference = Difference(metric, c);
    // The ratio metric is free of units; the interval metric's δ² scales with the square.
    if (metric.level == Level::Interval && metric.custom.empty())
        result.scaleExponent = 2 * result.difference.scaleExponent();

    // D_o = (1/n) Σ_c Σ_k o_ck δ²_ck and D_e = 1/(n(n − 1)) Σ_c Σ_k n_c n_k δ²_ck
    // (Krippendorff 2011, §C–D).
    const double n = c.total;
    double observed = 0;
    for (const Coincidence &cell : c.cells)
        observed += cell.o * result.difference(cell.c, cell.k);
    const int occurring =
        int(std::count_if(c.marginals.begin(), c.marginals.end(), [](double m) { return m > 0; }));
    result.observedDisagreement = observed / n;
    result.expectedDisagreement = result.difference.expectedSum() / (n * (n - 1));
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
