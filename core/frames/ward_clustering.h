#pragma once
// Ward's hierarchical clustering (Ward 1963, "Hierarchical grouping to optimize an objective
// function", JASA 58(301)) on squared Euclidean distances.
//
// Algorithm: the stored-matrix ("generic") agglomeration with a cached nearest neighbour per row
// (Müllner 2011, "Modern hierarchical, agglomerative clustering algorithms", arXiv:1109.2378,
// §3.1, without the priority queue). The matrix holds n(n−1)/2 doubles, updated after each merge
// by the Lance–Williams formula for Ward (Lance & Williams 1967; Wishart 1969):
//   D(k, i∪j) = [(n_i + n_k) D(k,i) + (n_j + n_k) D(k,j) − n_k D(i,j)] / (n_i + n_j + n_k),
// starting from D(x, y) = ‖x − y‖². D(A, B) = 2 n_A n_B / (n_A + n_B) ‖c_A − c_B‖² is twice the
// increase of the within-cluster sum of squares when A and B merge.
// Memory: 8 n(n−1)/2 bytes (10,000 articles: 400 MB; 20,000: 1.6 GB). Time: O(n² · variables)
// for the first distances, then typically O(n²).
//
// Heights follow SciPy's convention (scipy.cluster.hierarchy.linkage, method="ward"): the height
// of a merge is √D(A, B), which for two articles is their Euclidean distance; the increase of the
// within-cluster sum of squares is height² / 2.
//
// Tie rule (deterministic, independent of input order only through the articles' row numbers):
// a cluster is named by its first article (lowest row). Each step merges the pair of clusters with
// the smallest D; costs within kTieTolerance of the smallest count as equal, and among them the
// pair (i, j), i < j by first article, that is smallest in lexicographic order wins.

#include "core/frames/frame_matrix.h"

#include <atomic>
#include <cstddef>
#include <vector>

namespace fourfold::frames {

// Two merge costs x, y count as tied when |x − y| ≤ 1e-10 · max(|x|, |y|) + 1e-13 · the largest
// first distance (the second term catches costs that are zero but for rounding).
inline constexpr double kTieRelative = 1e-10;
inline constexpr double kTieAbsoluteShare = 1e-13;

// The largest number of articles Ward's method takes: its matrix would need 1.6 GB at 20,000.
inline constexpr std::size_t kWardMaxRows = 20000;

// One row of the agglomeration schedule in SciPy's linkage layout: clusters 0..n−1 are the
// articles, merge s (0-based) makes cluster n + s; first < second.
struct WardMerge {
    int first = 0;
    int second = 0;
    double height = 0; // √D, SciPy's convention
    int size = 0; // articles in the new cluster
};

struct WardOptions {
    int threads = 2; // for the first distances only
    std::size_t maxRows = kWardMaxRows;
    const std::atomic<bool> *cancelled = nullptr; // checked every few hundred merges
};

// The agglomeration schedule of `data` (n − 1 merges in the order made; Ward's heights never
// decrease). Fails (a sentence) for fewer than 2 rows, more than options.maxRows, a value that is
// not finite, or when cancelled ("cancelled").
Outcome<std::vector<WardMerge>> wardLinkage(
    const FrameMatrix &data, const WardOptions &options = {});

// The partition after the first n − k merges of `schedule` (k clusters), numbered by first
// article: cluster 0 holds row 0, cluster 1 the first row not in cluster 0, and so on.
// `rows` is n; k is clamped to 1..n.
Partition cutTree(const std::vector<WardMerge> &schedule, std::size_t rows, int k);

// The mean of each cluster's rows (clusters × columns, row-major); an empty cluster gets zeros.
std::vector<double> clusterMeans(const FrameMatrix &data, const Partition &partition);

} // namespace fourfold::frames
