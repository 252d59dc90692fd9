#pragma once
// Cluster-wise stability by the bootstrap (Hennig 2007, "Cluster-wise assessment of cluster
// stability", Computational Statistics & Data Analysis 52(1), §2–3): each replicate draws n
// articles with replacement, clusters the drawn rows (duplicates included) with the same method
// and k, and for every original cluster C takes the Jaccard similarity of C ∩ drawn with its
// best-matching replicate cluster D (both as sets of distinct articles):
//   γ(C, D) = |C ∩ D| / |C ∪ D|.
// A cluster's stability is the mean over the replicates in which any of its articles was drawn.
// Hennig (2007, §3) reads a mean Jaccard of 0.5 or less as a cluster that dissolves; 0.75 or more
// as a stable one (we count replicates with γ ≤ 0.5 as dissolved and γ ≥ 0.75 as recovered).
// Seeded: replicate r draws from its own generator seeded from (seed, r) by SplitMix64, so the
// figures do not depend on the number of threads or on the standard library.

#include "core/frames/frame_matrix.h"

#include <atomic>
#include <cstdint>
#include <functional>
#include <vector>

namespace fourfold::frames {

inline constexpr double kDissolvedJaccard = 0.5; // Hennig (2007), §3
inline constexpr double kRecoveredJaccard = 0.75; // Hennig (2007), §3

struct StabilityOptions {
    int replicates = 100;
    std::uint64_t seed = 1;
    int threads = 2;
    const std::atomic<bool> *cancelled = nullptr;
    // Called on the calling thread's turn after each replicate it ran with the replicates done so
    // far (any thread may call; keep it cheap and thread-safe). May be empty.
    std::function<void(int)> progress;
};

struct ClusterStability {
    double meanJaccard = 0;
    int replicatesUsed = 0; // replicates in which the cluster had a drawn article
    int dissolved = 0; // replicates with γ ≤ 0.5
    int recovered = 0; // replicates with γ ≥ 0.75
    bool flagged = false; // mean Jaccard ≤ 0.5: the cluster dissolves on resampling
};

// How to cluster a replicate's rows into k clusters (labels 0..k−1 for each row).
using ClusterMethod = std::function<Outcome<Partition>(const FrameMatrix &)>;

// Stability of each cluster of `original` (a partition of `data`'s rows) under `method`. Fails
// when the method fails on a replicate, when cancelled ("cancelled"), or for fewer than 2 rows.
Outcome<std::vector<ClusterStability>> clusterStability(const FrameMatrix &data,
    const Partition &original, const ClusterMethod &method, const StabilityOptions &options = {});

// The n row numbers (0..n−1, with repeats) replicate `r` of `seed` draws.
std::vector<std::size_t> bootstrapDraw(std::size_t n, std::uint64_t seed, std::uint64_t r);

} // namespace fourfold::frames
