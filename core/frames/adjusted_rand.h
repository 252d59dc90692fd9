#pragma once
// Comparing two partitions of the same articles: the cross-table, the adjusted Rand index
// (Hubert & Arabie 1985, "Comparing partitions", Journal of Classification 2, p. 198, eq. (5)) and
// the one-to-one matching of clusters that agrees on the most articles (Kuhn 1955; Munkres 1957,
// "Algorithms for the assignment and transportation problems", J. SIAM 5(1)).

#include "core/frames/frame_matrix.h"

#include <vector>

namespace fourfold::frames {

struct CrossTable {
    int rows = 0; // clusters of the first partition
    int columns = 0; // clusters of the second
    std::vector<long long> counts; // row-major

    long long at(int r, int c) const
    {
        return counts[std::size_t(r) * std::size_t(columns) + std::size_t(c)];
    }
};

// The rows × columns table of how many articles fall in cluster r of `a` and cluster c of `b`.
// Fails when the partitions do not cover the same number of articles or a label is out of range.
Outcome<CrossTable> crossTable(const Partition &a, const Partition &b);

// ARI = [Σ_ij C(n_ij,2) − Σ_i C(a_i,2) Σ_j C(b_j,2) / C(n,2)] /
//       [½(Σ_i C(a_i,2) + Σ_j C(b_j,2)) − Σ_i C(a_i,2) Σ_j C(b_j,2) / C(n,2)]
// (Hubert & Arabie 1985, eq. (5)). When the denominator is 0 (both partitions put every article
// alone, or both put all in one cluster) the partitions are the same and the index is 1, as
// scikit-learn's adjusted_rand_score has it.
double adjustedRandIndex(const CrossTable &table);

// The matching of the table's rows to its columns (each used at most once; min(rows, columns)
// pairs) that maximises the articles on matched cells. matchOfRow[r] is the column matched to row
// r, or −1. Of equally good matchings the one the Hungarian method reaches scanning rows and
// columns in order is taken (deterministic).
std::vector<int> bestMatching(const CrossTable &table);

} // namespace fourfold::frames
