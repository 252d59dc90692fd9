#pragma once
// Indices for choosing the number of clusters k.
// - Mean silhouette width (Rousseeuw 1987, "Silhouettes: a graphical aid to the interpretation and
//   validation of cluster analysis", J. Comput. Appl. Math. 20, eq. (1)–(3)), on Euclidean
//   distances: s(i) = (b(i) − a(i)) / max(a(i), b(i)), a(i) the mean distance of i to the other
//   members of its cluster, b(i) the smallest mean distance of i to another cluster; s(i) = 0 for
//   an article alone in its cluster (Rousseeuw 1987, p. 55). Higher is better.
// - Calinski–Harabasz (1974, "A dendrite method for cluster analysis", Communications in
//   Statistics 3(1)): CH = [B / (k − 1)] / [W / (n − k)], B = Σ_c n_c ‖c_c − x̄‖² and
//   W = Σ_i ‖x_i − c_label(i)‖². Higher is better.
// - Fusion-coefficient elbow (the agglomeration schedule's coefficients; Everitt et al. 2011,
//   Cluster Analysis 5th ed., §4.2, from memory): the jump of Ward's merge height from the merge
//   that leaves k clusters to the next one, h(n−k+1) − h(n−k); a large jump means going from k to
//   k − 1 clusters joins clusters that lie far apart. Larger is better.

#include "core/frames/frame_matrix.h"
#include "core/frames/ward_clustering.h"

#include <optional>
#include <string>
#include <vector>

namespace fourfold::frames {

struct IndexValue {
    std::optional<double> value;
    std::string reason; // why there is no value; empty when there is one
};

// Mean silhouette width of each partition in `partitions` (all of data's rows), computed in one
// pass over the pairs of articles (each distance once per article, O(n² · (variables + number of
// partitions))). Undefined for a partition with fewer than 2 or more than n − 1 non-empty
// clusters (as Rousseeuw's definition needs 2 ≤ k ≤ n − 1).
std::vector<IndexValue> meanSilhouettes(
    const FrameMatrix &data, const std::vector<Partition> &partitions, int threads = 2);

// Calinski–Harabasz index of `partition`. Undefined for fewer than 2 or more than n − 1 non-empty
// clusters, or when W = 0 (every article on its cluster's centre).
IndexValue calinskiHarabasz(const FrameMatrix &data, const Partition &partition);

// Fusion-coefficient jump for k clusters from a Ward schedule of `rows` articles: height of merge
// n − k + 1 minus height of merge n − k (1-based; merge 0 counts as height 0). Undefined unless
// 2 ≤ k ≤ n − 1.
IndexValue fusionJump(const std::vector<WardMerge> &schedule, std::size_t rows, int k);

} // namespace fourfold::frames
