#pragma once
// Krippendorff's minimum number of values for a reliability sample (Krippendorff 2004, §11.4,
// after Bloch & Kraemer 1989): the number of pairable values needed so that alpha can be shown
// to exceed alpha_min at significance level p when the rarest value has proportion pc.

namespace fourfold::reliability {

// Returns the smallest whole number of values, for two coders:
// N = 2 z² ((1 + α_min)(3 − α_min) / (4 (1 − α_min) p_c (1 − p_c)) − α_min), z the one-tailed
// standard normal quantile for `significance` (e.g. 0.05 → 1.645). 0 for arguments outside
// (0,1), or when N does not fit in an int.
int minimumReliabilityValues(double alphaMin, double significance, double rarestProportion);

// The standard normal quantile Φ⁻¹(p) for 0 < p < 1 (about 1e-15 relative error); NaN outside.
double normalQuantile(double p);

} // namespace fourfold::reliability
