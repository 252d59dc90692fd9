#include "core/frames/cluster_indices.h"

#include "core/frames/parallel_rows.h"

#include <algorithm>
#include <cmath>

namespace fourfold::frames {

namespace {

IndexValue undefined(std::string reason)
{
    IndexValue v;
    v.reason = std::move(reason);
    return v;
}

// Cluster sizes of `partition` and the number of non-empty clusters.
std::pair<std::vector<double>, int> clusterSizes(const Partition &partition)
{
    std::vector<double> sizes(std::size_t(std::max(partition.clusters, 0)), 0.0);
    for (int label : partition.labels)
        sizes[std::size_t(label)] += 1;
    const int nonEmpty =
        int(std::count_if(sizes.begin(), sizes.end(), [](double s) { return s > 0; }));
    return {sizes, nonEmpty};
}

} // namespace

std::vector<IndexValue> meanSilhouettes(
    const FrameMatrix &data, const std::vector<Partition> &partitions, int threads)
{
    const std::size_t n = data.rows;
    const std::size_t p = partitions.size();
    std::vector<IndexValue> result(p);
    std::vector<std::vector<double>> sizes(p);
    std::vector<char> defined(p, 0);
    std::vector<std::size_t> offsets(p + 1, 0); // each partition's first slot in a row's sums
    for (std::size_t q = 0; q < p; ++q) {
        auto [s, nonEmpty] = clusterSizes(partitions[q]);
        sizes[q] = std::move(s);
        offsets[q + 1] = offsets[q] + sizes[q].size();
        if (nonEmpty < 2 || std::size_t(nonEmpty) > n - 1)
            result[q] = undefined("the silhouette needs between 2 and n − 1 non-empty clusters");
        else
            defined[q] = 1;
    }
    // s(i) for every partition, each article's row of distances summed in article order on
    // whichever thread takes it: the same figures on any number of threads.
    std::vector<double> widths(n * p, 0.0);
    parallelFor(n, threads, [&](std::size_t i) {
        std::vector<double> sums(offsets[p], 0.0);
        for (std::size_t j = 0; j < n; ++j) {
            if (j == i)
                continue;
            const double d = std::sqrt(squaredDistance(data.row(i), data.row(j), data.columns));
            for (std::size_t q = 0; q < p; ++q)
                sums[offsets[q] + std::size_t(partitions[q].labels[j])] += d;
        }
        for (std::size_t q = 0; q < p; ++q) {
            if (!defined[q])
                continue;
            const std::size_t own = std::size_t(partitions[q].labels[i]);
            if (sizes[q][own] <= 1) {
                widths[i * p + q] = 0; // Rousseeuw (1987), p. 55: s(i) = 0 when i is alone
                continue;
            }
            const double a = sums[offsets[q] + own] / (sizes[q][own] - 1);
            double b = std::numeric_limits<double>::infinity();
            for (std::size_t c = 0; c < sizes[q].size(); ++c)
                if (c != own && sizes[q][c] > 0)
                    b = std::min(b, sums[offsets[q] + c] / sizes[q][c]);
            const double larger = std::max(a, b);
            widths[i * p + q] = larger > 0 ? (b - a) / larger : 0.0;
        }
    });
    for (std::size_t q = 0; q < p; ++q) {
        if (!defined[q])
            continue;
        double sum = 0;
        for (std::size_t i = 0; i < n; ++i)
            sum += widths[i * p + q];
        result[q].value = sum / double(n);
    }
    return result;
}

IndexValue calinskiHarabasz(const FrameMatrix &data, const Partition &partition)
{
    const std::size_t n = data.rows;
    const auto [sizes, k] = clusterSizes(partition);
    if (k < 2 || std::size_t(k) > n - 1)
        return undefined("Calinski–Harabasz needs between 2 and n − 1 non-empty clusters");
    const std::vector<double> means = clusterMeans(data, partition);
    std::vector<double> overall(data.columns, 0.0);
    for (std::size_t i = 0; i < n; ++i)
        for (std::size_t v = 0; v < data.columns; ++v)
            overall[v] += data.at(i, v);
    for (double &v : overall)
        v /= double(n);
    double between = 0;
    for (std::size_t c = 0; c < sizes.size(); ++c)
        if (sizes[c] > 0)
            between += sizes[c]
                * squaredDistance(means.data() + c * data.columns, overall.data(), data.columns);
    double within = 0;
    for (std::size_t i = 0; i < n; ++i)
        within += squaredDistance(data.row(i),
            means.data() + std::size_t(partition.labels[i]) * data.columns, data.columns);
    if (within <= 0)
        return undefined("every article lies on its cluster's centre (W = 0)");
    IndexValue v;
    v.value = (between / double(k - 1)) / (within / double(n - std::size_t(k)));
    return v;
}

IndexValue fusionJump(const std::vector<WardMerge> &schedule, std::size_t rows, int k)
{
    if (k < 2 || std::size_t(k) > rows - 1 || schedule.size() + 1 != rows)
        return undefined("the fusion-coefficient jump needs 2 ≤ k ≤ n − 1");
    const std::size_t next = rows - std::size_t(k); // 0-based index of merge n − k + 1
    const double before = next == 0 ? 0.0 : schedule[next - 1].height;
    IndexValue v;
    v.value = schedule[next].height - before;
    return v;
}

} // namespace fourfold::frames
