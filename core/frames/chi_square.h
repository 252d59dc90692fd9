#pragma once
// Pearson's chi-square test of independence on a frames × groups table (e.g. frames × outlets)
// and Cramér's V (Cramér 1946, Mathematical Methods of Statistics, §21.9):
//   X² = Σ (O − E)² / E, E = row total × column total / n, df = (r − 1)(c − 1),
//   p = Q(df / 2, X² / 2) (the regularised upper incomplete gamma function),
//   V = √(X² / (n · min(r − 1, c − 1))).
// Rows and columns whose total is 0 are left out first (they carry no information and would make
// E = 0). No continuity correction (scipy.stats.chi2_contingency with correction=False).

#include "core/frames/frame_matrix.h"

#include <optional>
#include <string>
#include <vector>

namespace fourfold::frames {

struct ChiSquareResult {
    std::optional<double> statistic; // X²
    std::optional<double> pValue;
    std::optional<double> cramersV;
    int degreesOfFreedom = 0;
    long long n = 0;
    int rowsUsed = 0; // rows and columns with a total above 0
    int columnsUsed = 0;
    // Cells of the used table whose expected count is below 5 (Cochran 1954's rule of thumb).
    int smallExpected = 0;
    std::string reason; // why there is no statistic (fewer than 2 rows or columns with counts)
};

// The test on `counts` (rows × columns, row-major, non-negative). Fails when the array does not
// hold rows × columns counts or a count is negative.
Outcome<ChiSquareResult> chiSquare(const std::vector<long long> &counts, int rows, int columns);

// Q(a, x) = Γ(a, x) / Γ(a) for a > 0, x ≥ 0: by its series for x < a + 1 and by its continued
// fraction otherwise (Press et al. 2007, Numerical Recipes 3rd ed., §6.2, from memory).
double upperRegularizedGamma(double a, double x);

} // namespace fourfold::frames
