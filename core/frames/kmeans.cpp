#include "core/frames/kmeans.h"

#include "core/frames/parallel_rows.h"

namespace fourfold::frames {

namespace {

// The nearest of `k` centres to `row` (the lowest-numbered of equally near ones) and its squared
// distance.
std::pair<int, double> nearestCentre(
    const double *row, const std::vector<double> &centres, std::size_t k, std::size_t columns)
{
    int best = 0;
    double bestDistance = squaredDistance(row, centres.data(), columns);
    for (std::size_t c = 1; c < k; ++c) {
        const double d = squaredDistance(row, centres.data() + c * columns, columns);
        if (d < bestDistance) {
            bestDistance = d;
            best = int(c);
        }
    }
    return {best, bestDistance};
}

} // namespace

Outcome<KMeansResult> kMeans(
    const FrameMatrix &data, std::vector<double> centres, const KMeansOptions &options)
{
    if (data.rows == 0)
        return std::unexpected(std::string("k-means needs at least one article"));
    if (data.columns == 0 || centres.empty() || centres.size() % data.columns != 0)
        return std::unexpected(std::string("the starting centres do not match the variables"));
    const std::size_t k = centres.size() / data.columns;
    const std::size_t n = data.rows;
    const std::size_t m = data.columns;
    KMeansResult result;
    result.partition.clusters = int(k);
    result.partition.labels.assign(n, -1);
    std::vector<int> labels(n, -1);
    std::vector<double> distances(n, 0.0);
    for (int iteration = 0; iteration < std::max(options.maxIterations, 1); ++iteration) {
        parallelFor(n, options.threads, [&](std::size_t i) {
            const auto [label, d] = nearestCentre(data.row(i), centres, k, m);
            labels[i] = label;
            distances[i] = d;
        });
        ++result.iterations;
        if (labels == result.partition.labels) {
            result.converged = true;
            break;
        }
        result.partition.labels = labels;
        // The means, summed in row order so the result is the same on any number of threads.
        std::vector<double> sums(k * m, 0.0);
        std::vector<double> counts(k, 0.0);
        for (std::size_t i = 0; i < n; ++i) {
            const std::size_t c = std::size_t(labels[i]);
            counts[c] += 1;
            for (std::size_t v = 0; v < m; ++v)
                sums[c * m + v] += data.at(i, v);
        }
        for (std::size_t c = 0; c < k; ++c)
            if (counts[c] > 0)
                for (std::size_t v = 0; v < m; ++v)
                    centres[c * m + v] = sums[c * m + v] / counts[c];
    }
    if (!result.converged) {
        // The last centres moved after the last assignment: assign once more so labels, centres
        // and inertia belong together (as scikit-learn does when it stops without converging).
        parallelFor(n, options.threads, [&](std::size_t i) {
            const auto [label, d] = nearestCentre(data.row(i), centres, k, m);
            result.partition.labels[i] = label;
            distances[i] = d;
        });
    }
    for (std::size_t i = 0; i < n; ++i)
        result.inertia += distances[i];
    result.centres = std::move(centres);
    return result;
}

} // namespace fourfold::frames
