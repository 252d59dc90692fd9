#include "core/frames/ward_clustering.h"

#include "core/frames/parallel_rows.h"

#include <algorithm>
#include <cmath>
#include <limits>
#include <numeric>

namespace fourfold::frames {

namespace {

constexpr double kInfinity = std::numeric_limits<double>::infinity();

// The condensed upper triangle: pair (i, j), i < j, of n rows.
class CondensedMatrix
{
public:
    explicit CondensedMatrix(std::size_t n)
        : m_n(n)
        , m_values(n * (n - 1) / 2)
    { }
    double &at(std::size_t i, std::size_t j)
    {
        return m_values[offset(std::min(i, j), std::max(i, j))];
    }
    double *row(std::size_t i) { return m_values.data() + offset(i, i + 1); }
    std::size_t offset(std::size_t i, std::size_t j) const
    {
        return i * m_n - i * (i + 1) / 2 + (j - i - 1);
    }

private:
    std::size_t m_n;
    std::vector<double> m_values;
};

} // namespace

Outcome<std::vector<WardMerge>> wardLinkage(const FrameMatrix &data, const WardOptions &options)
{
    const std::size_t n = data.rows;
    if (n < 2)
        return std::unexpected(std::string("Ward's method needs at least 2 articles"));
    if (n > options.maxRows)
        return std::unexpected("Ward's method keeps n(n−1)/2 distances and takes at most "
            + std::to_string(options.maxRows) + " articles, not " + std::to_string(n));
    for (double v : data.values)
        if (!std::isfinite(v))
            return std::unexpected(std::string("a value is not a finite number"));

    CondensedMatrix distance(n);
    parallelFor(n - 1, options.threads, [&](std::size_t i) {
        double *row = distance.row(i);
        for (std::size_t j = i + 1; j < n; ++j)
            row[j - i - 1] = squaredDistance(data.row(i), data.row(j), data.columns);
    });
    double largest = 0;
    for (std::size_t i = 0; i + 1 < n; ++i) {
        const double *row = distance.row(i);
        for (std::size_t j = 0; j < n - i - 1; ++j)
            largest = std::max(largest, row[j]);
    }
    const double absolute = kTieAbsoluteShare * largest;
    auto tied = [&](double x, double y) {
        return std::abs(x - y) <= kTieRelative * std::max(std::abs(x), std::abs(y)) + absolute;
    };

    std::vector<char> active(n, 1);
    std::vector<int> size(n, 1);
    std::vector<int> id(n); // SciPy's cluster number of the cluster held in each slot
    std::iota(id.begin(), id.end(), 0);
    // Each active slot i's nearest neighbour among the active slots j > i: the smallest D, and of
    // the D tied with it the smallest j.
    std::vector<double> nearestCost(n, kInfinity);
    std::vector<std::size_t> nearest(n, n);
    auto rescan = [&](std::size_t i) {
        const double *row = distance.row(i) - (i + 1); // row[j] is D(i, j)
        double best = kInfinity;
        for (std::size_t j = i + 1; j < n; ++j)
            if (active[j])
                best = std::min(best, row[j]);
        nearestCost[i] = best;
        nearest[i] = n;
        if (best == kInfinity)
            return;
        for (std::size_t j = i + 1; j < n; ++j)
            if (active[j] && tied(row[j], best)) {
                nearest[i] = j;
                return;
            }
    };
    for (std::size_t i = 0; i + 1 < n; ++i)
        rescan(i);

    std::vector<WardMerge> schedule;
    schedule.reserve(n - 1);
    for (std::size_t step = 0; step + 1 < n; ++step) {
        if (options.cancelled && step % 256 == 0 && options.cancelled->load())
            return std::unexpected(std::string("cancelled"));
        double smallest = kInfinity;
        for (std::size_t i = 0; i < n; ++i)
            if (active[i])
                smallest = std::min(smallest, nearestCost[i]);
        std::size_t a = 0;
        while (!(active[a] && nearest[a] < n && tied(nearestCost[a], smallest)))
            ++a;
        const std::size_t b = nearest[a];
        const double cost = distance.at(a, b);
        WardMerge merge;
        merge.first = std::min(id[a], id[b]);
        merge.second = std::max(id[a], id[b]);
        merge.height = std::sqrt(std::max(cost, 0.0));
        merge.size = size[a] + size[b];
        schedule.push_back(merge);

        // Lance & Williams (1967) for Ward: the merged cluster takes slot a.
        const double na = size[a];
        const double nb = size[b];
        for (std::size_t k = 0; k < n; ++k) {
            if (!active[k] || k == a || k == b)
                continue;
            const double nk = size[k];
            double &dak = distance.at(a, k);
            dak = ((na + nk) * dak + (nb + nk) * distance.at(b, k) - nk * cost) / (na + nb + nk);
        }
        active[b] = 0;
        size[a] += size[b];
        id[a] = int(n + step);
        nearestCost[b] = kInfinity;
        nearest[b] = n;
        rescan(a);
        for (std::size_t i = 0; i < b; ++i) {
            if (!active[i] || i == a)
                continue;
            if (nearest[i] == a || nearest[i] == b) {
                rescan(i);
            } else if (i < a) {
                const double d = distance.at(i, a);
                if (d < nearestCost[i] && !tied(d, nearestCost[i])) {
                    nearestCost[i] = d;
                    nearest[i] = a;
                } else if (tied(d, nearestCost[i])) {
                    rescan(i);
                }
            }
        }
    }
    return schedule;
}

Partition cutTree(const std::vector<WardMerge> &schedule, std::size_t rows, int k)
{
    const std::size_t n = rows;
    const std::size_t clusters =
        std::clamp<std::size_t>(std::size_t(std::max(k, 1)), 1, std::max<std::size_t>(n, 1));
    // Union–find over SciPy's cluster numbers 0..2n−2.
    std::vector<std::size_t> parent(2 * n);
    std::iota(parent.begin(), parent.end(), 0);
    auto root = [&](std::size_t x) {
        while (parent[x] != x) {
            parent[x] = parent[parent[x]];
            x = parent[x];
        }
        return x;
    };
    const std::size_t merges = std::min(schedule.size(), n - clusters);
    for (std::size_t s = 0; s < merges; ++s) {
        parent[root(std::size_t(schedule[s].first))] = n + s;
        parent[root(std::size_t(schedule[s].second))] = n + s;
    }
    Partition partition;
    partition.labels.assign(n, -1);
    std::vector<int> number(2 * n, -1);
    for (std::size_t i = 0; i < n; ++i) {
        const std::size_t r = root(i);
        if (number[r] < 0)
            number[r] = partition.clusters++;
        partition.labels[i] = number[r];
    }
    return partition;
}

std::vector<double> clusterMeans(const FrameMatrix &data, const Partition &partition)
{
    std::vector<double> means(std::size_t(partition.clusters) * data.columns, 0.0);
    std::vector<double> counts(std::size_t(partition.clusters), 0.0);
    for (std::size_t i = 0; i < data.rows; ++i) {
        const std::size_t c = std::size_t(partition.labels[i]);
        counts[c] += 1;
        for (std::size_t v = 0; v < data.columns; ++v)
            means[c * data.columns + v] += data.at(i, v);
    }
    for (std::size_t c = 0; c < counts.size(); ++c)
        if (counts[c] > 0)
            for (std::size_t v = 0; v < data.columns; ++v)
                means[c * data.columns + v] /= counts[c];
    return means;
}

} // namespace fourfold::frames
