#include "core/frames/frame_analysis.h"

#include <algorithm>
#include <cmath>
#include <numeric>

namespace fourfold::frames {

namespace {

// Renumbers `result`'s clusters by size, largest first; of equal sizes the cluster holding the
// earlier article first; empty clusters last in their old order.
void numberBySize(KMeansResult &result, std::size_t columns)
{
    const std::size_t k = std::size_t(result.partition.clusters);
    std::vector<std::size_t> size(k, 0);
    std::vector<std::size_t> first(k, result.partition.labels.size());
    for (std::size_t i = 0; i < result.partition.labels.size(); ++i) {
        const std::size_t c = std::size_t(result.partition.labels[i]);
        ++size[c];
        first[c] = std::min(first[c], i);
    }
    std::vector<std::size_t> order(k);
    std::iota(order.begin(), order.end(), 0);
    std::stable_sort(order.begin(), order.end(), [&](std::size_t x, std::size_t y) {
        if (size[x] != size[y])
            return size[x] > size[y];
        return first[x] < first[y];
    });
    std::vector<int> newNumber(k);
    std::vector<double> centres(result.centres.size());
    for (std::size_t position = 0; position < k; ++position) {
        newNumber[order[position]] = int(position);
        std::copy_n(result.centres.begin() + std::ptrdiff_t(order[position] * columns), columns,
            centres.begin() + std::ptrdiff_t(position * columns));
    }
    for (int &label : result.partition.labels)
        label = newNumber[std::size_t(label)];
    result.centres = std::move(centres);
}

int bestK(const std::vector<KChoice> &rows, IndexValue KChoice::*index)
{
    int best = 0;
    double bestValue = 0;
    for (const KChoice &row : rows) {
        const IndexValue &v = row.*index;
        if (v.value && (best == 0 || *v.value > bestValue)) {
            best = row.k;
            bestValue = *v.value;
        }
    }
    return best;
}

} // namespace

Outcome<KMeansResult> twoStepClusters(
    const FrameMatrix &data, const std::vector<WardMerge> &schedule, int k, int threads)
{
    const Partition ward = cutTree(schedule, data.rows, k);
    KMeansOptions options;
    options.threads = threads;
    auto result = kMeans(data, clusterMeans(data, ward), options);
    if (result)
        numberBySize(*result, data.columns);
    return result;
}

std::vector<FrameProfile> frameProfiles(
    const FrameMatrix &data, const Partition &partition, const std::vector<double> &centres)
{
    const std::size_t n = data.rows;
    const std::size_t m = data.columns;
    const std::size_t k = std::size_t(partition.clusters);
    std::vector<FrameProfile> profiles(k);
    std::vector<double> overall(m, 0.0);
    std::vector<char> binary(m, 1);
    for (std::size_t i = 0; i < n; ++i)
        for (std::size_t v = 0; v < m; ++v) {
            overall[v] += data.at(i, v);
            if (data.at(i, v) != 0 && data.at(i, v) != 1)
                binary[v] = 0;
        }
    const Partition &p = partition;
    const std::vector<double> means = clusterMeans(data, p);
    for (std::size_t i = 0; i < n; ++i)
        ++profiles[std::size_t(p.labels[i])].size;
    for (std::size_t c = 0; c < k; ++c) {
        FrameProfile &profile = profiles[c];
        const double nf = profile.size;
        for (std::size_t v = 0; v < m; ++v) {
            VariableProfile vp;
            vp.share = means[c * m + v];
            vp.overall = overall[v] / double(n);
            vp.difference = vp.share - vp.overall;
            if (binary[v]) {
                // Haberman (1973): the adjusted residual of the cell (variable present, frame c).
                const double present = overall[v];
                const double expected = nf * present / double(n);
                const double variance = expected * (1 - nf / double(n)) * (1 - present / double(n));
                if (variance > 0)
                    vp.residual = (vp.share * nf - expected) / std::sqrt(variance);
            }
            profile.variables.push_back(vp);
        }
        std::vector<std::pair<double, std::size_t>> distances;
        for (std::size_t i = 0; i < n; ++i)
            if (std::size_t(p.labels[i]) == c)
                distances.emplace_back(squaredDistance(data.row(i), centres.data() + c * m, m), i);
        const std::size_t shown = std::min<std::size_t>(3, distances.size());
        std::partial_sort(
            distances.begin(), distances.begin() + std::ptrdiff_t(shown), distances.end());
        for (std::size_t s = 0; s < shown; ++s)
            profile.closest.push_back(distances[s].second);
    }
    return profiles;
}

Outcome<FrameAnalysis> analyseFrames(const FrameMatrix &data, const FrameAnalysisOptions &options)
{
    const std::size_t n = data.rows;
    if (n < 3)
        return std::unexpected(std::string("frames need at least 3 articles"));
    if (options.k < 0 || std::size_t(options.k) > n)
        return std::unexpected(
            "k must be between 1 and the number of articles (" + std::to_string(n) + ")");
    WardOptions ward;
    ward.threads = options.threads;
    ward.cancelled = options.cancelled;
    auto schedule = wardLinkage(data, ward);
    if (!schedule)
        return std::unexpected(schedule.error());
    FrameAnalysis analysis;
    analysis.schedule = std::move(*schedule);

    const int largestK = int(std::min<std::size_t>(std::size_t(std::max(options.maxK, 1)), n - 1));
    std::vector<Partition> partitions;
    std::vector<KMeansResult> clusterings;
    for (int k = 2; k <= largestK; ++k) {
        if (options.cancelled && options.cancelled->load())
            return std::unexpected(std::string("cancelled"));
        auto clusters = twoStepClusters(data, analysis.schedule, k, options.threads);
        if (!clusters)
            return std::unexpected(clusters.error());
        partitions.push_back(clusters->partition);
        clusterings.push_back(std::move(*clusters));
    }
    const std::vector<IndexValue> silhouettes = meanSilhouettes(data, partitions, options.threads);
    for (std::size_t q = 0; q < partitions.size(); ++q) {
        KChoice row;
        row.k = int(q) + 2;
        row.silhouette = silhouettes[q];
        row.calinskiHarabasz = calinskiHarabasz(data, partitions[q]);
        row.fusionJump = fusionJump(analysis.schedule, n, row.k);
        analysis.kChoice.push_back(row);
    }
    analysis.kBySilhouette = bestK(analysis.kChoice, &KChoice::silhouette);
    analysis.kByCalinskiHarabasz = bestK(analysis.kChoice, &KChoice::calinskiHarabasz);
    analysis.kByFusion = bestK(analysis.kChoice, &KChoice::fusionJump);

    if (options.k > 0) {
        analysis.k = options.k;
        analysis.kGiven = true;
    } else {
        const int s = analysis.kBySilhouette;
        const int c = analysis.kByCalinskiHarabasz;
        const int f = analysis.kByFusion;
        analysis.k = (c != 0 && c == f) ? c : (s != 0 ? s : (c != 0 ? c : (f != 0 ? f : 1)));
        if (s != 0 && (s == c || s == f))
            analysis.k = s;
    }
    if (analysis.k >= 2 && analysis.k <= largestK) {
        analysis.frames = clusterings[std::size_t(analysis.k - 2)];
    } else {
        auto clusters = twoStepClusters(data, analysis.schedule, analysis.k, options.threads);
        if (!clusters)
            return std::unexpected(clusters.error());
        analysis.frames = std::move(*clusters);
    }
    analysis.ward = cutTree(analysis.schedule, n, analysis.k);
    analysis.profiles = frameProfiles(data, analysis.frames.partition, analysis.frames.centres);
    return analysis;
}

} // namespace fourfold::frames
