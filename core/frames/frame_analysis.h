#pragma once
// Frames as clusters of articles by their element variables: the two-step procedure of Matthes &
// Kohring (2008, Journal of Communication 58(2), pp. 267–268): Ward's hierarchical clustering on
// squared Euclidean distances, then k-means started from the centroids of Ward's k clusters.
// Around it: the indices for choosing k (cluster_indices.h) and each frame's profile.

#include "core/frames/cluster_indices.h"
#include "core/frames/frame_matrix.h"
#include "core/frames/kmeans.h"
#include "core/frames/ward_clustering.h"

#include <atomic>
#include <optional>
#include <vector>

namespace fourfold::frames {

struct FrameAnalysisOptions {
    int k = 0; // the number of frames; 0: the one the k-choice indices point at (see below)
    int maxK = 10; // k-choice indices for k = 2..maxK (at most n − 1)
    int threads = 2;
    const std::atomic<bool> *cancelled = nullptr;
};

// The indices for one k, computed on the two-step partition with k clusters (the elbow on Ward's
// schedule).
struct KChoice {
    int k = 0;
    IndexValue silhouette;
    IndexValue calinskiHarabasz;
    IndexValue fusionJump;
};

// One variable in one frame.
struct VariableProfile {
    double share = 0; // the frame's mean of the variable (share of articles for 0/1 variables)
    double overall = 0; // the mean over all articles
    double difference = 0; // share − overall
    // For a 0/1 variable: the adjusted standardised residual of the frame's count in the
    // variable × frame table (Haberman 1973, "The analysis of residuals in cross-classified
    // tables", Biometrics 29, p. 207): (O − E) / √(E (1 − n_f / n)(1 − m / n)), E = n_f m / n,
    // m the articles with the variable; |r| > 1.96 marks a variable that characterises the frame
    // at the 5% level. None for other variables or when the denominator is 0.
    std::optional<double> residual;
};

struct FrameProfile {
    int size = 0;
    std::vector<VariableProfile> variables; // in the matrix's column order
    std::vector<std::size_t> closest; // up to 3 rows nearest the frame's centre, nearest first
};

struct FrameAnalysis {
    std::vector<WardMerge> schedule;
    std::vector<KChoice> kChoice; // k = 2..min(maxK, n − 1)
    // The k each index points at (the largest value; of equal values the smaller k); 0 if none.
    int kBySilhouette = 0;
    int kByCalinskiHarabasz = 0;
    int kByFusion = 0;
    int k = 0; // the k used
    bool kGiven = false;
    // Whether at least two of the three indices point at k (when k was not given): if not, k is
    // the silhouette's (or, without one, the next index's) and the indices disagree.
    bool indicesAgree() const
    {
        return int(kBySilhouette == k) + int(kByCalinskiHarabasz == k) + int(kByFusion == k) >= 2;
    }
    // The final frames: labels 0..k−1 numbered by size (largest first; of equal sizes the one
    // holding the earlier article first); centres as k-means left them.
    KMeansResult frames;
    Partition ward; // Ward's k clusters before k-means, numbered by first article (cutTree)
    std::vector<FrameProfile> profiles;
};

// The two-step clusters for `k` from a Ward schedule of `data`: Ward's k clusters, their
// centroids, k-means from those; numbered by size as FrameAnalysis::frames.
Outcome<KMeansResult> twoStepClusters(
    const FrameMatrix &data, const std::vector<WardMerge> &schedule, int k, int threads = 2);

// The whole analysis. Without a given k, the k is the one most of the three indices point at; if
// they all differ, the silhouette's (Rousseeuw 1987 proposes the largest mean silhouette). Fails
// for fewer than 3 articles, a given k outside 1..n, or as wardLinkage does.
Outcome<FrameAnalysis> analyseFrames(
    const FrameMatrix &data, const FrameAnalysisOptions &options = {});

// The profiles of `partition`'s clusters (see VariableProfile), closest rows to `centres`.
std::vector<FrameProfile> frameProfiles(
    const FrameMatrix &data, const Partition &partition, const std::vector<double> &centres);

} // namespace fourfold::frames
