#include "core/frames/cluster_stability.h"

#include "core/frames/parallel_rows.h"

#include <algorithm>
#include <atomic>
#include <mutex>
#include <random>

namespace fourfold::frames {

namespace {

// SplitMix64 (Steele, Lea & Flood 2014, OOPSLA; constants of Vigna's reference code): output r of
// the generator started at `seed`.
std::uint64_t replicateSeed(std::uint64_t seed, std::uint64_t r)
{
    std::uint64_t z = seed + (r + 1) * 0x9E3779B97F4A7C15ULL;
    z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9ULL;
    z = (z ^ (z >> 27)) * 0x94D049BB133111EBULL;
    return z ^ (z >> 31);
}

} // namespace

std::vector<std::size_t> bootstrapDraw(std::size_t n, std::uint64_t seed, std::uint64_t r)
{
    // std::mt19937_64's output is fixed by the standard; the integer in 0..n−1 is taken by
    // rejection (no modulo bias) instead of a distribution whose algorithm the library chooses.
    std::mt19937_64 generator(replicateSeed(seed, r));
    const std::uint64_t range = std::uint64_t(n);
    const std::uint64_t limit = std::numeric_limits<std::uint64_t>::max()
        - std::numeric_limits<std::uint64_t>::max() % range;
    std::vector<std::size_t> rows(n);
    for (std::size_t &row : rows) {
        std::uint64_t x = 0;
        do
            x = generator();
        while (x >= limit);
        row = std::size_t(x % range);
    }
    return rows;
}

Outcome<std::vector<ClusterStability>> clusterStability(const FrameMatrix &data,
    const Partition &original, const ClusterMethod &method, const StabilityOptions &options)
{
    const std::size_t n = data.rows;
    if (n < 2)
        return std::unexpected(std::string("the bootstrap needs at least 2 articles"));
    const std::size_t k = std::size_t(std::max(original.clusters, 0));
    const std::size_t replicates = std::size_t(std::max(options.replicates, 0));
    // best[r * k + c]: γ of cluster c in replicate r, or −1 when none of its articles was drawn.
    std::vector<double> best(replicates * k, -1.0);
    std::vector<std::string> failures(replicates);
    std::atomic<int> done {0};
    std::mutex progressMutex;
    parallelFor(replicates, options.threads, [&](std::size_t r) {
        if (options.cancelled && options.cancelled->load())
            return;
        const std::vector<std::size_t> drawn = bootstrapDraw(n, options.seed, r);
        FrameMatrix sample;
        sample.rows = n;
        sample.columns = data.columns;
        sample.values.reserve(n * data.columns);
        for (std::size_t row : drawn)
            sample.values.insert(sample.values.end(), data.row(row), data.row(row) + data.columns);
        auto clusters = method(sample);
        if (!clusters) {
            failures[r] = clusters.error();
            return;
        }
        // Each distinct drawn article once, with the cluster of its first draw (identical rows
        // fall into one cluster).
        std::vector<int> clusterOf(n, -1);
        for (std::size_t s = 0; s < n; ++s)
            if (clusterOf[drawn[s]] < 0)
                clusterOf[drawn[s]] = clusters->labels[s];
        const std::size_t q = std::size_t(clusters->clusters);
        std::vector<long long> both(k * q, 0);
        std::vector<long long> originalSize(k, 0);
        std::vector<long long> replicateSize(q, 0);
        for (std::size_t i = 0; i < n; ++i) {
            if (clusterOf[i] < 0)
                continue;
            const std::size_t c = std::size_t(original.labels[i]);
            const std::size_t d = std::size_t(clusterOf[i]);
            ++both[c * q + d];
            ++originalSize[c];
            ++replicateSize[d];
        }
        for (std::size_t c = 0; c < k; ++c) {
            if (originalSize[c] == 0)
                continue;
            double top = 0;
            for (std::size_t d = 0; d < q; ++d) {
                const double common = double(both[c * q + d]);
                top = std::max(top, common / (double(originalSize[c] + replicateSize[d]) - common));
            }
            best[r * k + c] = top;
        }
        const int count = ++done;
        if (options.progress) {
            std::lock_guard lock(progressMutex);
            options.progress(count);
        }
    });
    if (options.cancelled && options.cancelled->load())
        return std::unexpected(std::string("cancelled"));
    for (const std::string &failure : failures)
        if (!failure.empty())
            return std::unexpected(failure);
    std::vector<ClusterStability> result(k);
    for (std::size_t c = 0; c < k; ++c) {
        ClusterStability &s = result[c];
        double sum = 0;
        for (std::size_t r = 0; r < replicates; ++r) {
            const double g = best[r * k + c];
            if (g < 0)
                continue;
            sum += g;
            ++s.replicatesUsed;
            if (g <= kDissolvedJaccard)
                ++s.dissolved;
            if (g >= kRecoveredJaccard)
                ++s.recovered;
        }
        s.meanJaccard = s.replicatesUsed > 0 ? sum / s.replicatesUsed : 0.0;
        s.flagged = s.replicatesUsed > 0 && s.meanJaccard <= kDissolvedJaccard;
    }
    return result;
}

} // namespace fourfold::frames
