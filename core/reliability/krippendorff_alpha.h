#pragma once
// Krippendorff's alpha for any number of coders with missing data, in the coincidence-matrix
// form of Krippendorff (2011), "Computing Krippendorff's Alpha-Reliability", and Krippendorff
// (2004), Content Analysis, 2nd ed., ch. 11.

#include "core/reliability/reliability_data.h"

#include <optional>
#include <vector>

namespace fourfold::reliability {

// One non-zero entry o_ck of a coincidence matrix.
struct Coincidence {
    int c = 0;
    int k = 0;
    double o = 0;
    bool operator==(const Coincidence &) const = default;
};

// The coincidences held as their non-zero entries, so memory grows with the pairs of values that
// occur within units, not with the square of the number of values.
struct CoincidenceMatrix {
    int values = 0;
    // The non-zero o_ck, sorted by (c, k); the matrix is symmetric, so o_ck and o_kc are both
    // present.
    std::vector<Coincidence> cells;
    std::vector<double> marginals; // n_c, one per value
    double total = 0; // n: the number of pairable values
    int units = 0; // pairable units: units holding at least two values

    double at(int c, int k) const; // o_ck; 0 where nothing coincides
};

// Coincidences within units that hold at least two values (units with fewer are not pairable
// and drop out): o_ck = Σ_u Σ_{i≠j} [v_ui = c][v_uj = k] / (m_u − 1) (Krippendorff 2011, §C).
// Malformed data (see dataProblem()) give an empty matrix (values = 0).
CoincidenceMatrix coincidences(const ReliabilityData &data);

// The coincidences of `whole` without those of `part`, a subset of its units: coincidences add
// over units (Krippendorff 2011, §C). What rounding leaves of an emptied entry is dropped.
CoincidenceMatrix withoutPart(const CoincidenceMatrix &whole, const CoincidenceMatrix &part);

// δ²_ck of a metric for the values of one coincidence matrix, computed pair by pair (no
// values × values table, unless the metric brings its own `custom` one). Interval and ratio
// numbers of extreme magnitude are divided by 2^scaleExponent() first (see differenceScale());
// ordinal differences come from the marginals given at construction (Krippendorff 2011, §E).
class Difference
{
public:
    Difference() = default;
    // `metric` must be usable for c.values (metricProblem() empty).
    Difference(const Metric &metric, const CoincidenceMatrix &c);

    double operator()(int c, int k) const;
    // Σ_c Σ_k n_c n_k δ²_ck over the marginals n of the matrix given at construction: in O(values)
    // for nominal, ordinal and interval, from the pairs of occurring values for ratio, from the
    // table for a custom metric.
    double expectedSum() const;
    // The exponent k of the division by 2^k of interval and ratio numbers (0 otherwise).
    int scaleExponent() const { return m_scale; }

private:
    Level m_level = Level::Nominal;
    bool m_custom = false;
    int m_values = 0;
    int m_scale = 0;
    std::vector<double> m_numbers; // interval, ratio: scaled numbers; ordinal: mid-ranks
    std::vector<double> m_table; // custom: values × values
    std::vector<double> m_marginals;
};

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
    Difference difference; // the δ² used
    // D_o, D_e and the difference are in units of 2^scaleExponent: interval values beyond 2^200
    // (or all below 2^-200) in magnitude are first divided by a power of two (exactly, without
    // rounding) so that no squared difference overflows or vanishes; alpha is the same either
    // way. 0 for other data.
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

// The k of the division of interval and ratio numbers by 2^k: 0 unless the largest magnitude
// lies outside [2^-200, 2^200].
int differenceScale(const Metric &metric);

} // namespace fourfold::reliability
