#pragma once
// k-means by Lloyd's algorithm (Lloyd 1982, "Least squares quantization in PCM", IEEE Trans.
// Information Theory 28(2); MacQueen 1967 for the name) from given starting centres: in the
// two-step procedure of Matthes & Kohring (2008, Journal of Communication 58(2), p. 268) the
// centroids of Ward's clusters.
//
// Each iteration assigns every article to its nearest centre (squared Euclidean distance; of
// equally near centres the lowest-numbered) and moves each centre to the mean of its articles.
// It stops when no article changes its cluster (as scikit-learn's "lloyd" with tol=0) or after
// maxIterations. A centre left without articles stays where it was (scikit-learn would move it
// to the farthest articles instead). Inertia = Σ ‖x − c_label(x)‖².

#include "core/frames/frame_matrix.h"

#include <vector>

namespace fourfold::frames {

struct KMeansOptions {
    int maxIterations = 300;
    int threads = 2;
};

struct KMeansResult {
    Partition partition; // labels index the centres as given; clusters = number of centres
    std::vector<double> centres; // clusters × columns, row-major
    double inertia = 0;
    int iterations = 0; // assignments made
    bool converged = false; // the last assignment changed nothing
};

// Lloyd's algorithm on `data` from `centres` (k × data.columns, row-major). Fails for no centres,
// a centre array of the wrong size, or no rows.
Outcome<KMeansResult> kMeans(
    const FrameMatrix &data, std::vector<double> centres, const KMeansOptions &options = {});

} // namespace fourfold::frames
