// Frames: Ward + k-means on ARTICLES × VARIABLES invented 0/1 element indicators, the k-choice
// indices for k = 2..10, and bootstrap stability with REPLICATES replicates on STABILITY articles.
// usage: frames_benchmark [ARTICLES=10000] [VARIABLES=60] [STABILITY=2000] [REPLICATES=100]
#include "core/frames/cluster_indices.h"
#include "core/frames/cluster_stability.h"
#include "core/frames/frame_analysis.h"

#include <sys/resource.h>

#include <chrono>
#include <cstdio>
#include <cstdlib>
#include <random>

using namespace fourfold::frames;

namespace {

double peakMiB()
{
    rusage usage {};
    getrusage(RUSAGE_SELF, &usage);
    return double(usage.ru_maxrss) / 1024.0;
}

double secondsSince(std::chrono::steady_clock::time_point start)
{
    return std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
}

// CPU seconds this process has used on all its threads (on a busy machine the wall clock says
// more about the other programs).
double cpuSeconds()
{
    rusage usage {};
    getrusage(RUSAGE_SELF, &usage);
    return double(usage.ru_utime.tv_sec + usage.ru_stime.tv_sec)
        + double(usage.ru_utime.tv_usec + usage.ru_stime.tv_usec) / 1e6;
}

// 8 invented element profiles; an article holds each element of its profile with probability
// 0.7 and any other with 0.08.
FrameMatrix planted(std::size_t n, std::size_t m, std::uint64_t seed)
{
    std::mt19937_64 generator(seed);
    std::uniform_real_distribution<double> uniform(0.0, 1.0);
    FrameMatrix data;
    data.rows = n;
    data.columns = m;
    for (std::size_t a = 0; a < n; ++a)
        for (std::size_t e = 0; e < m; ++e)
            data.values.push_back(uniform(generator) < (e * 8 / m == a % 8 ? 0.7 : 0.08) ? 1 : 0);
    return data;
}

[[noreturn]] void stop(const std::string &what)
{
    std::fprintf(stderr, "frames_benchmark: %s\n", what.c_str());
    std::exit(1);
}

} // namespace

int main(int argc, char *argv[])
{
    const std::size_t n = argc > 1 ? std::strtoull(argv[1], nullptr, 10) : 10000;
    const std::size_t m = argc > 2 ? std::strtoull(argv[2], nullptr, 10) : 60;
    const std::size_t stabilityRows = argc > 3 ? std::strtoull(argv[3], nullptr, 10) : 2000;
    const int replicates = argc > 4 ? std::atoi(argv[4]) : 100;
    const int threads = 2;

    const FrameMatrix data = planted(n, m, 1);
    auto start = std::chrono::steady_clock::now();
    double cpu = cpuSeconds();
    WardOptions wardOptions;
    wardOptions.threads = threads;
    const auto schedule = wardLinkage(data, wardOptions);
    if (!schedule)
        stop(schedule.error());
    const double ward = secondsSince(start);
    const double wardCpu = cpuSeconds() - cpu;
    start = std::chrono::steady_clock::now();
    cpu = cpuSeconds();
    const auto frames = twoStepClusters(data, *schedule, 8, threads);
    if (!frames)
        stop(frames.error());
    const double kmeans = secondsSince(start);
    const double kmeansCpu = cpuSeconds() - cpu;
    std::printf(
        "Ward            %zu articles × %zu variables: %.2f s (CPU %.2f s; peak %.0f MiB)\n", n, m,
        ward, wardCpu, peakMiB());
    std::printf("k-means (k = 8) from Ward's centroids: %.2f s (CPU %.2f s), %d iterations\n",
        kmeans, kmeansCpu, frames->iterations);
    std::printf("Ward + k-means  %.2f s (CPU %.2f s)\n", ward + kmeans, wardCpu + kmeansCpu);

    start = std::chrono::steady_clock::now();
    std::vector<Partition> partitions;
    for (int k = 2; k <= 10; ++k) {
        const auto clusters = twoStepClusters(data, *schedule, k, threads);
        if (!clusters)
            stop(clusters.error());
        partitions.push_back(clusters->partition);
    }
    const double twoStep = secondsSince(start);
    start = std::chrono::steady_clock::now();
    const auto silhouettes = meanSilhouettes(data, partitions, threads);
    const double silhouette = secondsSince(start);
    std::printf("k = 2..10       two-step clusters %.2f s, silhouettes %.2f s (k = 8: %.3f)\n",
        twoStep, silhouette, silhouettes[6].value.value_or(-2));

    const FrameMatrix sample = planted(stabilityRows, m, 2);
    const auto schedule2 = wardLinkage(sample, wardOptions);
    if (!schedule2)
        stop(schedule2.error());
    const auto original = twoStepClusters(sample, *schedule2, 8, threads);
    if (!original)
        stop(original.error());
    const ClusterMethod method = [](const FrameMatrix &rows) -> Outcome<Partition> {
        WardOptions options;
        options.threads = 1;
        const auto s = wardLinkage(rows, options);
        if (!s)
            return std::unexpected(s.error());
        auto c = twoStepClusters(rows, *s, 8, 1);
        if (!c)
            return std::unexpected(c.error());
        return c->partition;
    };
    StabilityOptions options;
    options.replicates = replicates;
    options.threads = threads;
    start = std::chrono::steady_clock::now();
    cpu = cpuSeconds();
    const auto stability = clusterStability(sample, original->partition, method, options);
    if (!stability)
        stop(stability.error());
    double lowest = 1;
    for (const ClusterStability &s : *stability)
        lowest = std::min(lowest, s.meanJaccard);
    std::printf("Stability       %d replicates on %zu articles: %.2f s (CPU %.2f s on %d threads; "
                "lowest mean Jaccard %.3f; peak %.0f MiB)\n",
        replicates, stabilityRows, secondsSince(start), cpuSeconds() - cpu, threads, lowest,
        peakMiB());
    return 0;
}
