#pragma once
// Krippendorff's alpha for any number of coders with missing data, in the coincidence-matrix
// form of Krippendorff (2011), "Computing Krippendorff's Alpha-Reliability", and Krippendorff
// (2004), Content Analysis, 2nd ed., ch. 11.

#include "core/reliability/reliability_data.h"

#include <optional>
#include <vector>

namespace fourfold::reliability {

struct CoincidenceMatrix {
    int values = 0;
    std::vector<double> o; // values × values, row-major: o_ck
    std::vector<double> marginals; // n_c
    double total = 0; // n: the number of pairable values
    int units = 0; // pairable units: units holding at least two values
};

// Coincidences within units that hold at least two values (units with fewer are not pairable
// and drop out): o_ck = Σ_u Σ_{i≠j} [v_ui = c][v_uj = k] / (m_u − 1) (Krippendorff 2011, §C).
// Malformed data (see dataProblem()) give an empty matrix (values = 0).
CoincidenceMatrix coincidences(const ReliabilityData &data);

struct AlphaResult {
    std::optional<double> value; // nothing when undefined; see reason
    UndefinedReason reason;
    // D_o = Σ_ck o_ck δ²_ck / n and D_e = Σ_ck n_c n_k δ²_ck / (n(n − 1)), the normalisation of
    // Krippendorff (2011), §C–D (e.g. nominal D_o 0.200, D_e 0.779 in his 4 × 12 example).
    double observedDisagreement = 0; // D_o
    double expectedDisagreement = 0; // D_e
    int pairableUnits = 0;
    double pairableValues = 0; // n
    CoincidenceMatrix coincidences;
    std::vector<double> delta; // the δ² used, values × values
    // D_o, D_e and delta are in units of 2^scaleExponent: interval values beyond 2^200 (or all
    // below 2^-200) in magnitude are first divided by a power of two (exactly, without rounding)
    // so that no squared difference overflows or vanishes; alpha is the same either way. 0 for
    // other data.
    int scaleExponent = 0;
    double observedUnscaled() const;
    double expectedUnscaled() const;
};

// alpha = 1 − D_o / D_e. Undefined (with a reason, never NaN and never 1) when there are fewer
// than two pairable values or D_e = 0 (only one value occurs among the pairable values).
// Malformed data or an unusable metric (dataProblem(), metricProblem()) also give no value, with
// the problem as the reason.
AlphaResult krippendorffAlpha(const ReliabilityData &data, const Metric &metric);

// The same from coincidences already counted (e.g. pooled over variables). `c` must be
// consistent (marginals are the row sums of o); undefined as above.
AlphaResult krippendorffAlpha(const CoincidenceMatrix &c, const Metric &metric);

// The δ² matrix for `metric` given the coincidence marginals (the ordinal difference needs them).
// Empty if the metric is unusable for c.values (see metricProblem()). Interval and ratio numbers
// of extreme magnitude are divided by 2^k first (see differenceScale()).
std::vector<double> differenceMatrix(const Metric &metric, const CoincidenceMatrix &c);
// The k of that division: 0 unless the largest interval or ratio magnitude lies outside
// [2^-200, 2^200].
int differenceScale(const Metric &metric);

} // namespace fourfold::reliability
