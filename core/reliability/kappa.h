#pragma once
// Chance-corrected agreement for categorical codes: Cohen's kappa (unweighted and weighted),
// Scott's pi, Bennett–Alpert–Goldstein S, percent agreement, Fleiss' kappa and Light's kappa.
//
// Conventions (all functions): categories are the value codes 0..k−1 of the whole data set
// (ReliabilityData::values), not only those that occur; a cell holding a code outside 0..k−1
// counts as missing. A statistic that cannot be computed has no value and a reason, never NaN.

#include "core/reliability/reliability_data.h"

#include <cstddef>
#include <optional>
#include <utility>
#include <vector>

namespace fourfold::reliability {

// One non-zero cell of a contingency table.
struct TableCell {
    int row = 0;
    int column = 0;
    double count = 0;
    bool operator==(const TableCell &) const = default;
};

// A k × k table of counts (rows: coder 1, columns: coder 2), held as its non-zero cells, so its
// memory grows with the pairs of categories that occur, not with k².
struct ContingencyTable {
    int categories = 0;
    // Sorted by (row, column), each pair at most once. Every statistic checks the cells: a row or
    // column outside 0..k−1, a pair given twice or out of order, or a negative or non-finite
    // count make the table malformed.
    std::vector<TableCell> cells;
    // Set when the table was built from counts that are not k × k.
    bool malformed = false;

    ContingencyTable() = default;
    // From k × k counts, row-major (the zeros left out).
    ContingencyTable(int categories, const std::vector<double> &counts);
    // The k × k counts, row-major; for small tables (tests, display).
    std::vector<double> dense() const;
    double total() const;
};

// The table of coders `coderA` (rows) and `coderB` (columns) over the units where both have a
// value; categories = data.values. Coder indices out of range, or cells whose size is not
// units × coders, give an empty table (which every statistic reports as undefined).
ContingencyTable contingencyTable(const ReliabilityData &data, int coderA, int coderB);
// The tables of every pair of coders a < b, in the order (0,1), (0,2), …, (1,2), …: the same as
// contingencyTable for each pair, counted in one pass over the units.
std::vector<ContingencyTable> pairContingencyTables(const ReliabilityData &data);

enum class KappaWeights { None, Linear, Quadratic, Custom };
// "none", "linear", "quadratic", "custom".
const char *kappaWeightsKey(KappaWeights weights);

struct KappaResult {
    std::optional<double> value;
    UndefinedReason reason;
    KappaWeights weights = KappaWeights::None; // as asked for
    // p_o and p_e. Weighted: in agreement-weight form, 1 − Σ w·p_ij / w_max and
    // 1 − Σ w·p_i.·p_.j / w_max (w: disagreement weights), so value = (p_o − p_e) / (1 − p_e).
    double observedAgreement = 0;
    double chanceAgreement = 0;
    std::optional<double> standardError; // Fleiss, Cohen & Everitt (1969), non-null
    // value ± Φ⁻¹(0.975) · standardError (1.95996…), clipped to [−1, 1].
    std::optional<double> ciLow, ciHigh;
    std::optional<double> nullStandardError; // for the test of kappa = 0
    // Cohen (1960): the largest kappa the marginals allow; unweighted kappa only.
    std::optional<double> kappaMax;
    double n = 0; // the sum of the table's counts
};

// Cohen (1960); weighted per Cohen (1968) with disagreement weights: Linear |i−j|, Quadratic
// (i−j)² by category position (0..k−1), or `customWeights` (k × k, row-major, finite, ≥ 0, zero
// diagonal, not all zero; need not be symmetric). Kappa and its standard errors do not change
// when all weights are multiplied by a positive constant. Undefined (value nothing, reason set,
// no standard errors) when the table is malformed, the custom weights are invalid, n = 0, or
// p_e = 1 (no expected disagreement). Standard errors are the large-sample ones of Fleiss, Cohen
// & Everitt (1969); the non-null one is 0 at perfect agreement. Unweighted, linear and quadratic
// kappa take time and memory in k plus the table's non-zero cells (sums over all k × k pairs are
// taken in closed form); custom weights are a k × k table and cost k².
KappaResult cohenKappa(const ContingencyTable &table, KappaWeights weights = KappaWeights::None,
    const std::vector<double> &customWeights = {});

struct SimpleAgreement {
    std::optional<double> value;
    UndefinedReason reason;
    // The two agreements the index is built from, where it has them (Scott's pi, S: p_o and
    // chance; percent agreement: observedAgreement = value, chanceAgreement 0; Light's kappa:
    // both 0, it is a mean of kappas).
    double observedAgreement = 0;
    double chanceAgreement = 0;
};
// Scott (1955): pi = (p_o − p_e) / (1 − p_e) with p_e = Σ ((p_i. + p_.i) / 2)², chance from
// the pooled marginals of both coders. Undefined for a malformed table, n = 0 or p_e = 1.
SimpleAgreement scottPi(const ContingencyTable &table);
// Bennett, Alpert & Goldstein (1954) S = Brennan & Prediger (1981): (p_o − 1/k) / (1 − 1/k)
// with k = table.categories, the categories of the whole data set (including those that do
// not occur; NLTK's AnnotationTask.S counts only occurring labels). Undefined for k < 2, a
// malformed table or n = 0.
SimpleAgreement bennettS(const ContingencyTable &table);
// Share of agreeing ordered pairs of values within units over all pairable ordered pairs, for
// any number of coders and missing data: Σ_u Σ_v n_uv (n_uv − 1) / Σ_u m_u (m_u − 1), where
// unit u holds m_u values, n_uv of them equal to v; units with fewer than two values drop out.
// Units therefore weigh by their number of pairs. With complete data it is the mean over
// coder pairs of the share of units the pair coded alike; with two coders, the share of units
// both coded alike. Undefined when no unit holds two values.
SimpleAgreement percentAgreement(const ReliabilityData &data);
// The same for two coders from their table: the share of the units both coded that they coded
// alike (its diagonal over its total). Undefined for a malformed table or n = 0.
SimpleAgreement percentAgreement(const ContingencyTable &table);

struct FleissResult {
    std::optional<double> value;
    UndefinedReason reason;
    double meanObservedAgreement = 0; // P̄
    double chanceAgreement = 0; // P̄e = Σ p_j²
    std::optional<double> nullStandardError; // Fleiss, Nee & Landis (1979)
    // κ_j (Fleiss 1971) and its null standard error per category; nothing for a category
    // that no rating or every rating uses (p_j q_j = 0). Empty when the table is malformed.
    std::vector<std::optional<double>> perCategory;
    std::vector<std::optional<double>> perCategoryNullStandardError;
    int subjects = 0; // N
    double ratersPerSubject = 0; // n
    std::vector<double> categoryShares; // p_j, the share of all ratings in category j
};
// The subjects × categories counts of Fleiss (1971), each subject's non-zero counts only:
// subject i's are entries[starts[i] .. starts[i + 1]), as (category, count).
struct SubjectCounts {
    int categories = 0;
    std::vector<std::size_t> starts {0};
    std::vector<std::pair<int, double>> entries;

    int subjects() const { return int(starts.size()) - 1; }
    // Appends a subject from its counts per category (zeros left out).
    void addSubject(const std::vector<double> &counts);
};

// Fleiss (1971) on subjects × categories counts (non-negative, finite; need not be integers);
// every subject must have the same number n ≥ 2 of ratings (complete data), else undefined with
// a reason. Also undefined when there are no subjects or only one category is used (P̄e = 1).
// With n = 2 it equals Scott's pi of the two raters (Fleiss 1971). Time and memory grow with the
// non-zero counts and the categories, not with subjects × categories.
FleissResult fleissKappa(const SubjectCounts &counts);
// The same from a dense table (one row per subject, one column per category).
FleissResult fleissKappa(const std::vector<std::vector<double>> &counts);
// Fleiss' kappa of the complete units of `data` (units with a missing cell are left out), read
// unit by unit: memory in the categories, not in the units. The same as
// fleissKappa(categoryCounts(data)).
FleissResult fleissKappa(const ReliabilityData &data);
// The counts (data.values categories) of the complete units of `data` (units with a missing
// cell are left out). No subjects for malformed data.
SubjectCounts categoryCounts(const ReliabilityData &data);

// Light (1971): the mean of Cohen's (unweighted) kappa over all pairs of coders, each pair
// over the units both coded. Undefined with fewer than two coders or when any pair's kappa is
// undefined (the reason names the pair by coder index, from 0).
SimpleAgreement lightKappa(const ReliabilityData &data);
// The same from the tables of every pair, as pairContingencyTables gives them.
SimpleAgreement lightKappa(const std::vector<ContingencyTable> &pairTables, int coders);

} // namespace fourfold::reliability
