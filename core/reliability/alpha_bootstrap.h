#pragma once
// Bootstrap intervals for Krippendorff's alpha.
// - Pair resampling (Hayes & Krippendorff 2007, Communication Methods and Measures 1(1); and
//   Krippendorff's 2011 bootstrap note): pairs of values are drawn from the observed
//   coincidence matrix with the expected disagreement held fixed. Known to be narrow: it ignores
//   dependence within units.
// - Unit resampling: units are drawn with replacement and alpha recomputed (percentile method).
// Both are seeded; replicate r uses its own generator seeded from (seed, r), so results do not
// depend on the number of threads (they do depend on the standard library's
// std::binomial_distribution: the same seed gives the same figures with libstdc++).
//
// Pair resampling, exactly (Krippendorff, "Algorithm for bootstrapping a distribution of α",
// 2006, revised 2011; Hayes & Krippendorff 2007):
//   1. The cells {c, k}, c ≤ k, of the observed coincidence matrix are drawn with probability
//      p_cc = o_cc / n and p_ck = 2 o_ck / n (c < k): a pair of values within a unit, weighted
//      1 / (m_u − 1) as in o_ck (the note's segments of a uniform R in [0, 1)).
//   2. Each replicate draws M such pairs, independently and with replacement. M is the number of
//      pairs of values within the pairable units, Σ_u m_u (m_u − 1) / 2 (n/2 for two coders
//      without missing values; 239 in Hayes & Krippendorff's 2007 example), unless
//      BootstrapOptions::pairDraws sets it. Only how many of the M pairs fall into each cell
//      matters, so those counts are drawn directly: they are multinomial (M; p), drawn as
//      conditional binomials. That is the same distribution as M separate draws, at a cost that
//      does not grow with M.
//   3. The replicate's observed disagreement is the mean δ² of its M pairs; the expected
//      disagreement D_e and δ² (ordinal: from the original marginals) are held fixed:
//      α* = 1 − (Σ_j δ²_j / M) / D_e.
//   4. Corrections of the note, step four, as we read it: α* below −1 is set to −1; a replicate
//      whose M pairs all hold one and the same value (no variation) scores α* = 0 rather than 1.
//      The note estimates how many such replicates to expect; we recognise each one exactly and
//      count them in BootstrapResult::noVariationReplicates.
// Unit resampling: each replicate draws as many units as there are pairable units, with
// replacement, from the pairable units (again as multinomial counts of the distinct kinds of
// unit, which is the same distribution), and recomputes coincidences, δ² (ordinal: from the
// replicate's marginals), D_o, D_e and alpha. Replicates where alpha is undefined (one value
// only) are dropped and counted in BootstrapResult::droppedReplicates.
// Interval (both methods): of the K replicates kept, sorted, the k-th smallest and k-th largest,
// k = max(1, ⌊0.025 K⌋). q(alpha < alpha_min) is the share of the K kept replicates strictly
// below alpha_min.

#include "core/reliability/reliability_data.h"

#include <cstdint>
#include <optional>
#include <utility>
#include <vector>

namespace fourfold::reliability {

enum class BootstrapMethod { PairResampling, UnitResampling };

struct BootstrapOptions {
    BootstrapMethod method = BootstrapMethod::PairResampling;
    int replicates = 1000;
    std::uint64_t seed = 1;
    int threads = 2; // values below 1 count as 1
    std::vector<double> alphaMins {0.9, 0.8, 0.7, 0.667, 0.6, 0.5};
    // Pair resampling: the number M of pairs per replicate; 0 takes the number of pairs of values
    // within the pairable units (see above). Ignored by unit resampling.
    std::int64_t pairDraws = 0;
};

struct BootstrapResult {
    BootstrapMethod method = BootstrapMethod::PairResampling;
    int replicates = 0; // replicates computed (0 when alpha is undefined)
    std::uint64_t seed = 0;
    std::optional<double> ciLow; // 2.5th percentile; nothing if alpha is undefined
    std::optional<double> ciHigh; // 97.5th percentile
    // q(alpha < alpha_min): the share of replicates below each alpha_min, in options' order.
    std::vector<std::pair<double, double>> qBelow;
    UndefinedReason reason;

    std::optional<double> alpha; // the point estimate the replicates scatter around
    // Pair resampling: M, the pairs drawn per replicate; unit resampling: the units drawn per
    // replicate.
    std::int64_t draws = 0;
    // Unit resampling: replicates where alpha was undefined, left out of the interval and q.
    int droppedReplicates = 0;
    // Pair resampling: replicates whose pairs all held one value, scored 0 (step four above).
    int noVariationReplicates = 0;
    // The replicates kept (replicates − droppedReplicates of them), ascending: the bootstrap
    // distribution, e.g. for a histogram.
    std::vector<double> alphas;
};

// Runs options.replicates replicates of `method` on options.threads threads. Undefined (reason
// set, no interval, replicates = 0) when alpha itself is undefined for data and metric (see
// krippendorffAlpha()), when fewer than one replicate is requested, or when every unit-resampling
// replicate is undefined. Cost per replicate: one binomial draw per non-empty coincidence cell
// (pair) or per distinct kind of pairable unit plus one alpha over the values (unit), whatever
// M or the number of units.
BootstrapResult bootstrapAlpha(
    const ReliabilityData &data, const Metric &metric, const BootstrapOptions &options);

// "pair-resampling (Hayes & Krippendorff 2007)" / "unit-resampling percentile".
const char *bootstrapMethodName(BootstrapMethod method);

} // namespace fourfold::reliability
