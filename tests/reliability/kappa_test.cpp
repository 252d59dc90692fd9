#include "core/reliability/kappa.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <numeric>
#include <random>
#include <vector>

using namespace fourfold::reliability;
using Catch::Matchers::WithinAbs;

namespace {

// A small table written out in full (k × k counts, row-major), as the checks below build them.
struct DenseTable {
    int categories = 0;
    std::vector<double> counts;
    operator ContingencyTable() const { return ContingencyTable(categories, counts); }
};

// Φ⁻¹(0.975), the two-sided 95% normal quantile (scipy.stats.norm.ppf(0.975)).
constexpr double kZ975 = 1.959963984540054;

// Cohen (1960), p. 45 (as reproduced by a third party, see checks.md): rows coder 1, N = 200.
const DenseTable kCohen1960 {3, {88, 14, 18, 10, 40, 10, 2, 6, 12}};
// Cohen (1968): disagreement weights used with the Cohen (1960) table (third party, checks.md).
const std::vector<double> kCohen1968Weights {0, 1, 3, 1, 0, 6, 3, 6, 0};
// Fixed tables for the statsmodels comparison (invented).
const DenseTable kFour {4, {22, 5, 2, 1, 4, 18, 6, 2, 1, 3, 15, 7, 0, 2, 4, 11}};
const std::vector<double> kFourWeights {0, 1, 2, 4, 1, 0, 1, 2, 2, 1, 0, 1, 4, 2, 1, 0};
const DenseTable kTwo {2, {20, 5, 10, 15}};

// Fleiss (1971), Table 1: 30 subjects × 6 raters, counts over 5 categories (checks.md).
const std::vector<std::vector<double>> kFleiss1971 {
    {0, 0, 0, 6, 0},
    {0, 3, 0, 0, 3},
    {0, 1, 4, 0, 1},
    {0, 0, 0, 0, 6},
    {0, 3, 0, 3, 0},
    {2, 0, 4, 0, 0},
    {0, 0, 4, 0, 2},
    {2, 0, 3, 1, 0},
    {2, 0, 0, 4, 0},
    {0, 0, 0, 0, 6},
    {1, 0, 0, 5, 0},
    {1, 1, 0, 4, 0},
    {0, 3, 3, 0, 0},
    {1, 0, 0, 5, 0},
    {0, 2, 0, 3, 1},
    {0, 0, 5, 0, 1},
    {3, 0, 0, 1, 2},
    {5, 1, 0, 0, 0},
    {0, 2, 0, 4, 0},
    {1, 0, 2, 0, 3},
    {0, 0, 0, 0, 6},
    {0, 1, 0, 5, 0},
    {0, 2, 0, 1, 3},
    {2, 0, 0, 4, 0},
    {1, 0, 0, 4, 1},
    {0, 5, 0, 1, 0},
    {4, 0, 0, 0, 2},
    {0, 2, 0, 4, 0},
    {1, 0, 5, 0, 0},
    {0, 0, 0, 0, 6},
};

std::size_t cell(int i, int j, int k)
{
    return std::size_t(i) * std::size_t(k) + std::size_t(j);
}

ReliabilityData fromUnits(const std::vector<std::vector<int>> &units, int values)
{
    ReliabilityData d;
    d.units = int(units.size());
    d.coders = units.empty() ? 0 : int(units.front().size());
    d.values = values;
    for (const auto &u : units)
        d.cells.insert(d.cells.end(), u.begin(), u.end());
    return d;
}

ReliabilityData fromCoders(const std::vector<int> &a, const std::vector<int> &b, int values)
{
    std::vector<std::vector<int>> units;
    for (std::size_t u = 0; u < a.size(); ++u)
        units.push_back({a[u], b[u]});
    return fromUnits(units, values);
}

DenseTable transposed(const DenseTable &t)
{
    DenseTable r {t.categories, t.counts};
    for (int i = 0; i < t.categories; ++i)
        for (int j = 0; j < t.categories; ++j)
            r.counts[cell(j, i, t.categories)] = t.counts[cell(i, j, t.categories)];
    return r;
}

// n units: coder 2 copies coder 1 with probability `copy`, else codes at random (invented).
DenseTable randomTable(std::mt19937 &rng, int k, int n, double copy)
{
    std::uniform_int_distribution<int> category(0, k - 1);
    std::bernoulli_distribution copies(copy);
    DenseTable t {k, std::vector<double>(std::size_t(k) * std::size_t(k), 0.0)};
    for (int u = 0; u < n; ++u) {
        const int a = category(rng);
        const int b = copies(rng) ? a : category(rng);
        t.counts[cell(a, b, k)] += 1;
    }
    return t;
}

// Reference implementation, written apart from kappa.cpp: the explicit unweighted formulas of
// Fleiss, Cohen & Everitt (1969) (as also coded in statsmodels), not the weighted general form.
struct NaiveKappa {
    double kappa = 0, se = 0, se0 = 0;
};
NaiveKappa naiveUnweighted(const DenseTable &t)
{
    const int k = t.categories;
    const double n = std::accumulate(t.counts.begin(), t.counts.end(), 0.0);
    std::vector<double> row(std::size_t(k), 0.0), col(std::size_t(k), 0.0);
    for (int i = 0; i < k; ++i)
        for (int j = 0; j < k; ++j) {
            row[std::size_t(i)] += t.counts[cell(i, j, k)] / n;
            col[std::size_t(j)] += t.counts[cell(i, j, k)] / n;
        }
    double po = 0, pe = 0;
    for (int i = 0; i < k; ++i) {
        po += t.counts[cell(i, i, k)] / n;
        pe += row[std::size_t(i)] * col[std::size_t(i)];
    }
    double a = 0, b = 0, c = 0;
    for (int i = 0; i < k; ++i) {
        const double pii = t.counts[cell(i, i, k)] / n;
        const double x = (1 - pe) - (col[std::size_t(i)] + row[std::size_t(i)]) * (1 - po);
        a += pii * x * x;
        c +=
            row[std::size_t(i)] * col[std::size_t(i)] * (row[std::size_t(i)] + col[std::size_t(i)]);
        for (int j = 0; j < k; ++j)
            if (i != j) {
                const double s = col[std::size_t(i)] + row[std::size_t(j)];
                b += t.counts[cell(i, j, k)] / n * s * s;
            }
    }
    b *= (1 - po) * (1 - po);
    const double d = po * pe - 2 * pe + po;
    NaiveKappa r;
    r.kappa = (po - pe) / (1 - pe);
    // At perfect agreement the brackets are 0 and may round below it.
    r.se = std::sqrt(std::max(0.0, (a + b - d * d) / (n * std::pow(1 - pe, 4))));
    r.se0 = std::sqrt(std::max(0.0, (pe + pe * pe - c) / (n * (1 - pe) * (1 - pe))));
    return r;
}

// Weighted kappa from agreement weights w' = 1 − w / w_max, (p_o − p_e) / (1 − p_e) (Cohen 1968;
// Fleiss, Cohen & Everitt 1969), as a check of the disagreement form used in kappa.cpp.
double agreementFormKappa(const DenseTable &t, const std::vector<double> &w)
{
    const int k = t.categories;
    const double n = std::accumulate(t.counts.begin(), t.counts.end(), 0.0);
    const double wMax = *std::max_element(w.begin(), w.end());
    std::vector<double> row(std::size_t(k), 0.0), col(std::size_t(k), 0.0);
    for (int i = 0; i < k; ++i)
        for (int j = 0; j < k; ++j) {
            row[std::size_t(i)] += t.counts[cell(i, j, k)] / n;
            col[std::size_t(j)] += t.counts[cell(i, j, k)] / n;
        }
    double po = 0, pe = 0;
    for (int i = 0; i < k; ++i)
        for (int j = 0; j < k; ++j) {
            const double agree = 1 - w[cell(i, j, k)] / wMax;
            po += agree * t.counts[cell(i, j, k)] / n;
            pe += agree * row[std::size_t(i)] * col[std::size_t(j)];
        }
    return (po - pe) / (1 - pe);
}

// Reference implementation of Fleiss (1971) and the Fleiss, Nee & Landis (1979) null standard
// error, written apart from kappa.cpp: ratings are expanded to one code per rating, and
// agreement is counted over ordered pairs of ratings within a subject.
struct NaiveFleiss {
    double kappa = 0, se0 = 0;
};
NaiveFleiss naiveFleiss(const std::vector<std::vector<double>> &counts)
{
    const std::size_t k = counts.front().size();
    std::vector<double> used(k, 0.0);
    double agreeingPairs = 0, allPairs = 0, ratings = 0;
    for (const auto &row : counts) {
        std::vector<std::size_t> codes;
        for (std::size_t j = 0; j < k; ++j)
            for (int r = 0; r < int(row[j]); ++r)
                codes.push_back(j);
        for (std::size_t x = 0; x < codes.size(); ++x) {
            used[codes[x]] += 1;
            ratings += 1;
            for (std::size_t y = 0; y < codes.size(); ++y)
                if (x != y) {
                    allPairs += 1;
                    agreeingPairs += codes[x] == codes[y] ? 1 : 0;
                }
        }
    }
    const double bigN = double(counts.size());
    const double n = ratings / bigN;
    double pe = 0, pq = 0, pqqp = 0;
    for (double u : used) {
        const double p = u / ratings;
        pe += p * p;
        pq += p * (1 - p);
        pqqp += p * (1 - p) * ((1 - p) - p);
    }
    NaiveFleiss r;
    r.kappa = (agreeingPairs / allPairs - pe) / (1 - pe);
    r.se0 = std::sqrt(2 / (bigN * n * (n - 1)) * (pq * pq - pqqp) / (pq * pq));
    return r;
}

// The subjects × 2 table of category j against all others.
std::vector<std::vector<double>> collapsed(
    const std::vector<std::vector<double>> &counts, std::size_t j)
{
    std::vector<std::vector<double>> r;
    for (const auto &row : counts) {
        const double all = std::accumulate(row.begin(), row.end(), 0.0);
        r.push_back({row[j], all - row[j]});
    }
    return r;
}

} // namespace

TEST_CASE("Cohen (1960) worked example")
{
    const KappaResult r = cohenKappa(kCohen1960);
    REQUIRE(r.value);
    CHECK(r.reason.empty());
    CHECK(r.n == 200);
    // Cohen (1960), p. 45 (2nd): p_o = 0.70, p_e = 0.41, kappa = 0.492, kappa_max = 0.831.
    CHECK_THAT(r.observedAgreement, WithinAbs(0.70, 5e-3));
    CHECK_THAT(r.chanceAgreement, WithinAbs(0.41, 5e-3));
    CHECK_THAT(*r.value, WithinAbs(0.492, 5e-4));
    REQUIRE(r.kappaMax);
    CHECK_THAT(*r.kappaMax, WithinAbs(0.831, 5e-4));
}

TEST_CASE("Cohen (1968) weighted kappa worked example")
{
    const KappaResult r = cohenKappa(kCohen1960, KappaWeights::Custom, kCohen1968Weights);
    REQUIRE(r.value);
    // Cohen (1968), on the Cohen (1960) table with weights [[0,1,3],[1,0,6],[3,6,0]] (2nd):
    // weighted kappa = 0.348.
    CHECK_THAT(*r.value, WithinAbs(0.348, 5e-4));
    // kappa_max (Cohen 1960) is for unweighted kappa only.
    CHECK_FALSE(r.kappaMax);
    // The contract's agreement-weight form: (p_o − p_e) / (1 − p_e) gives the same value.
    CHECK_THAT((r.observedAgreement - r.chanceAgreement) / (1 - r.chanceAgreement),
        WithinAbs(*r.value, 1e-12));
    CHECK_THAT(agreementFormKappa(kCohen1960, kCohen1968Weights), WithinAbs(*r.value, 1e-12));
}

TEST_CASE("Cohen's kappa and its standard errors match statsmodels")
{
    struct Case {
        const char *name;
        ContingencyTable table;
        KappaWeights weights;
        std::vector<double> custom;
        double kappa, se, se0;
    };
    // reference: statsmodels 0.13 cohens_kappa, computed offline (Debian python3-statsmodels
    // 0.13.5): cohens_kappa(table) for None, cohens_kappa(table, wt='linear'|'quadratic') (its
    // default scores 0..k−1 are our category positions; it divides the differences by the
    // largest, which kappa and both SEs are invariant to), and for custom weights
    // cohens_kappa(table, weights=W / W.max()) (statsmodels takes a 2-D matrix as disagreement
    // weights and assumes max ≤ 1 for the variance; we pass W unscaled). kappa, std_kappa and
    // std_kappa0.
    const std::vector<Case> cases {
        {"Cohen 1960, none", kCohen1960, KappaWeights::None, {}, 0.49152542372881347,
            0.05100181557607786, 0.051978936356595444},
        {"Cohen 1960, linear", kCohen1960, KappaWeights::Linear, {}, 0.4736842105263158,
            0.054432309177641525, 0.05469634129164873},
        {"Cohen 1960, quadratic", kCohen1960, KappaWeights::Quadratic, {}, 0.4545454545454546,
            0.06645368159107812, 0.06735866746488249},
        {"Cohen 1960, Cohen 1968 weights", kCohen1960, KappaWeights::Custom, kCohen1968Weights,
            0.34782608695652173, 0.07550401525482295, 0.0597199935595261},
        {"4 × 4, none", kFour, KappaWeights::None, {}, 0.5175949367088608, 0.06312082004556703,
            0.05725862724621445},
        {"4 × 4, linear", kFour, KappaWeights::Linear, {}, 0.6268115942028986, 0.0560226845811612,
            0.06959080049519446},
        {"4 × 4, quadratic", kFour, KappaWeights::Quadratic, {}, 0.7221450175754107,
            0.05808750616495756, 0.09792532725791733},
        {"4 × 4, custom", kFour, KappaWeights::Custom, kFourWeights, 0.6488211824446862,
            0.055611817322011974, 0.07664606777167657},
        {"2 × 2, none", kTwo, KappaWeights::None, {}, 0.3999999999999999, 0.12699606293110033,
            0.13856406460551018},
        {"2 × 2, quadratic", kTwo, KappaWeights::Quadratic, {}, 0.4, 0.12699606293110036,
            0.1385640646055102},
    };
    for (const Case &c : cases) {
        INFO(c.name);
        const KappaResult r = cohenKappa(c.table, c.weights, c.custom);
        REQUIRE(r.value);
        REQUIRE(r.standardError);
        REQUIRE(r.nullStandardError);
        CHECK_THAT(*r.value, WithinAbs(c.kappa, 1e-9));
        CHECK_THAT(*r.standardError, WithinAbs(c.se, 1e-9));
        CHECK_THAT(*r.nullStandardError, WithinAbs(c.se0, 1e-9));
        // A Wald interval value ± Φ⁻¹(0.975) SE, as statsmodels computes it (its
        // stats.norm.ppf(0.975) = 1.959963984540054), clipped to [−1, 1].
        REQUIRE(r.ciLow);
        REQUIRE(r.ciHigh);
        CHECK_THAT(*r.ciLow, WithinAbs(std::max(-1.0, c.kappa - kZ975 * c.se), 1e-9));
        CHECK_THAT(*r.ciHigh, WithinAbs(std::min(1.0, c.kappa + kZ975 * c.se), 1e-9));
    }
    // reference: statsmodels 0.13 cohens_kappa, computed offline: kappa_max.
    CHECK_THAT(*cohenKappa(kCohen1960).kappaMax, WithinAbs(0.8305084745762712, 1e-9));
    CHECK_THAT(*cohenKappa(kFour).kappaMax, WithinAbs(0.9348101265822785, 1e-9));
    CHECK_THAT(*cohenKappa(kTwo).kappaMax, WithinAbs(0.8, 1e-9));
}

TEST_CASE("Cohen's kappa on label vectors matches scikit-learn")
{
    // Invented labels (Python random, seed 20240607); every category 0..3 occurs, so
    // scikit-learn's positions in the sorted list of occurring labels are our positions.
    const std::vector<int> a {3, 3, 0, 1, 1, 1, 2, 1, 2, 0, 3, 3, 0, 2, 1, 1, 0, 1, 1, 0, 3, 1, 2,
        1, 2, 2, 3, 0, 2, 1, 2, 3, 3, 0, 3, 3, 1, 2, 2, 3};
    const std::vector<int> b {3, 1, 0, 1, 3, 1, 0, 1, 0, 0, 0, 3, 0, 2, 1, 1, 2, 1, 1, 0, 1, 3, 2,
        1, 2, 1, 3, 0, 2, 1, 3, 3, 3, 3, 3, 3, 2, 3, 2, 3};
    const ContingencyTable t = contingencyTable(fromCoders(a, b, 4), 0, 1);
    REQUIRE(t.categories == 4);
    CHECK(t.total() == 40);
    // reference: scikit-learn 1.2 sklearn.metrics.cohen_kappa_score(a, b, weights=None |
    // 'linear' | 'quadratic'), computed offline (Debian python3-sklearn 1.2.1).
    CHECK_THAT(*cohenKappa(t).value, WithinAbs(0.5619208087615839, 1e-9));
    CHECK_THAT(*cohenKappa(t, KappaWeights::Linear).value, WithinAbs(0.510703363914373, 1e-9));
    CHECK_THAT(*cohenKappa(t, KappaWeights::Quadratic).value, WithinAbs(0.4832041343669251, 1e-9));
}

TEST_CASE("Light's kappa, pi, S and percent agreement match NLTK on three coders")
{
    // Invented: 15 units × 3 coders, values 0..2, complete (Python random, seed 71).
    const ReliabilityData d = fromUnits(
        {{1, 1, 0}, {1, 1, 1}, {2, 1, 1}, {0, 0, 0}, {0, 0, 1}, {1, 1, 0}, {0, 0, 2}, {1, 1, 1},
            {1, 1, 1}, {0, 0, 0}, {1, 1, 1}, {0, 0, 0}, {1, 2, 1}, {0, 2, 2}, {1, 2, 0}},
        3);
    // reference: NLTK 3.8 nltk.metrics.agreement.AnnotationTask(data=[(coder, unit, value)]),
    // computed offline (Debian python3-nltk): .kappa() averages Cohen's kappa over coder pairs
    // (Light 1971); .avg_Ao() is the mean pairwise observed agreement; .pi() is multi-pi, on
    // complete data Fleiss' kappa; .S() uses 1/k with k the labels that occur (all 3 here).
    CHECK_THAT(*lightKappa(d).value, WithinAbs(0.3714798896657899, 1e-9));
    CHECK_THAT(*percentAgreement(d).value, WithinAbs(0.6222222222222222, 1e-9));
    // reference: also statsmodels 0.13 fleiss_kappa on the counts, computed offline: the same.
    const FleissResult f = fleissKappa(categoryCounts(d));
    REQUIRE(f.value);
    CHECK_THAT(*f.value, WithinAbs(0.37088815789473684, 1e-9));
    // NLTK's S is the mean pairwise p_o against 1/k; with complete data that p_o is our
    // percent agreement, so S = (p_o − 1/3) / (1 − 1/3).
    CHECK_THAT((*percentAgreement(d).value - 1.0 / 3) / (1 - 1.0 / 3),
        WithinAbs(0.43333333333333335, 1e-9));
}

TEST_CASE("Fleiss (1971) Table 1")
{
    const FleissResult r = fleissKappa(kFleiss1971);
    REQUIRE(r.value);
    CHECK(r.reason.empty());
    CHECK(r.subjects == 30);
    CHECK(r.ratersPerSubject == 6);
    // Fleiss (1971), Table 1 example (checks.md): P̄ = 0.5556, kappa = 0.430; the exact P̄e is
    // 0.21994 (the paper's 0.2201 comes from rounded proportions).
    CHECK_THAT(r.meanObservedAgreement, WithinAbs(0.5556, 5e-5));
    CHECK_THAT(r.chanceAgreement, WithinAbs(0.21994, 5e-6));
    CHECK_THAT(*r.value, WithinAbs(0.430, 5e-4));
    // reference: statsmodels 0.13 fleiss_kappa(table), computed offline.
    CHECK_THAT(*r.value, WithinAbs(0.43024452006014074, 1e-9));

    // Per-category kappas of the example, Fleiss (1971), from memory: .245, .245, .520, .471,
    // .566 (they agree with the collapsed-table computation below).
    const std::vector<double> published {0.245, 0.245, 0.520, 0.471, 0.566};
    REQUIRE(r.perCategory.size() == 5);
    REQUIRE(r.perCategoryNullStandardError.size() == 5);
    for (std::size_t j = 0; j < 5; ++j) {
        INFO("category " << j);
        REQUIRE(r.perCategory[j]);
        CHECK_THAT(*r.perCategory[j], WithinAbs(published[j], 5e-4));
    }
    // z = kappa / SE0 as printed by R's irr::kappam.fleiss(diagnoses, detail = TRUE) on the same
    // data, from memory: overall 17.7; per category 5.192, 5.192, 11.031, 9.994, 12.009
    // (Fleiss, Nee & Landis 1979 null variances).
    REQUIRE(r.nullStandardError);
    CHECK_THAT(*r.value / *r.nullStandardError, WithinAbs(17.7, 0.05));
    const std::vector<double> z {5.192, 5.192, 11.031, 9.994, 12.009};
    for (std::size_t j = 0; j < 5; ++j) {
        INFO("category " << j);
        CHECK_THAT(*r.perCategory[j] / *r.perCategoryNullStandardError[j], WithinAbs(z[j], 5e-4));
    }

    // Independent direct computation (naiveFleiss above) of kappa and the null SE.
    const NaiveFleiss naive = naiveFleiss(kFleiss1971);
    CHECK_THAT(*r.value, WithinAbs(naive.kappa, 1e-12));
    CHECK_THAT(*r.nullStandardError, WithinAbs(naive.se0, 1e-12));
}

TEST_CASE("Fleiss' per-category kappa is the kappa of the category against all others")
{
    // Fleiss (1971): κ_j is the kappa of the two-category table {j, not j}; kappa is the
    // p_j q_j-weighted mean of the κ_j. Fleiss, Nee & Landis (1979): with two categories the
    // overall null variance reduces to the per-category one, 2 / (N n (n − 1)).
    std::mt19937 rng(1971);
    std::vector<std::vector<std::vector<double>>> tables {kFleiss1971};
    for (int t = 0; t < 200; ++t) {
        const int k = 2 + int(rng() % 5), n = 2 + int(rng() % 7), subjects = 1 + int(rng() % 40);
        std::uniform_int_distribution<int> category(0, k - 1);
        std::vector<std::vector<double>> counts;
        for (int s = 0; s < subjects; ++s) {
            std::vector<double> row(std::size_t(k), 0.0);
            const int mode = category(rng);
            for (int r = 0; r < n; ++r)
                row[std::size_t(rng() % 2 ? mode : category(rng))] += 1;
            counts.push_back(row);
        }
        tables.push_back(counts);
    }
    int checked = 0;
    for (const auto &counts : tables) {
        const FleissResult r = fleissKappa(counts);
        if (!r.value)
            continue;
        ++checked;
        const NaiveFleiss naive = naiveFleiss(counts);
        CHECK_THAT(*r.value, WithinAbs(naive.kappa, 1e-9));
        CHECK_THAT(*r.nullStandardError, WithinAbs(naive.se0, 1e-9));
        double weighted = 0, weights = 0;
        for (std::size_t j = 0; j < r.perCategory.size(); ++j) {
            const double pq = r.categoryShares[j] * (1 - r.categoryShares[j]);
            const FleissResult one = fleissKappa(collapsed(counts, j));
            CHECK(one.value.has_value() == r.perCategory[j].has_value());
            if (!r.perCategory[j])
                continue;
            CHECK_THAT(*r.perCategory[j], WithinAbs(*one.value, 1e-9));
            CHECK_THAT(
                *r.perCategoryNullStandardError[j], WithinAbs(*one.nullStandardError, 1e-12));
            weighted += pq * *r.perCategory[j];
            weights += pq;
        }
        CHECK_THAT(weighted / weights, WithinAbs(*r.value, 1e-9));
    }
    CHECK(checked > 150);
}

TEST_CASE("Fleiss' kappa with two raters equals Scott's pi")
{
    // Fleiss (1971): for two raters his kappa reduces to Scott's (1955) pi.
    std::mt19937 rng(1955);
    for (int t = 0; t < 500; ++t) {
        const int k = 2 + int(rng() % 5);
        const DenseTable table = randomTable(rng, k, 5 + int(rng() % 60), 0.5);
        std::vector<std::vector<double>> counts;
        for (int i = 0; i < k; ++i)
            for (int j = 0; j < k; ++j)
                for (int c = 0; c < int(table.counts[cell(i, j, k)]); ++c) {
                    std::vector<double> row(std::size_t(k), 0.0);
                    row[std::size_t(i)] += 1;
                    row[std::size_t(j)] += 1;
                    counts.push_back(row);
                }
        const SimpleAgreement pi = scottPi(table);
        const FleissResult fleiss = fleissKappa(counts);
        REQUIRE(pi.value.has_value() == fleiss.value.has_value());
        if (!pi.value)
            continue;
        CHECK_THAT(*fleiss.value, WithinAbs(*pi.value, 1e-12));
        CHECK_THAT(fleiss.meanObservedAgreement, WithinAbs(pi.observedAgreement, 1e-12));
        CHECK_THAT(fleiss.chanceAgreement, WithinAbs(pi.chanceAgreement, 1e-12));
    }
}

TEST_CASE("Scott's pi, S and percent agreement by their definitions")
{
    // Scott (1955) on the Cohen (1960) table, by hand: pooled shares .55, .30, .15, p_e = .415,
    // pi = (.70 − .415) / .585.
    const SimpleAgreement pi = scottPi(kCohen1960);
    REQUIRE(pi.value);
    CHECK_THAT(pi.chanceAgreement, WithinAbs(0.415, 1e-12));
    CHECK_THAT(*pi.value, WithinAbs((0.70 - 0.415) / 0.585, 1e-12));

    // Bennett, Alpert & Goldstein (1954) / Brennan & Prediger (1981) with k = 4 categories of
    // the data although only two occur: p_o = 15/20, S = (0.75 − 0.25) / 0.75.
    const ContingencyTable twoUsed {4, {10, 2, 0, 0, 3, 5, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0}};
    const SimpleAgreement s = bennettS(twoUsed);
    REQUIRE(s.value);
    CHECK_THAT(*s.value, WithinAbs(2.0 / 3.0, 1e-12));
    CHECK_THAT(s.chanceAgreement, WithinAbs(0.25, 1e-15));
    CHECK_THAT(*bennettS(kCohen1960).value, WithinAbs((0.70 - 1.0 / 3) / (1 - 1.0 / 3), 1e-12));

    // Percent agreement (definition in kappa.h): two coders, complete: units coded alike.
    CHECK_THAT(
        *percentAgreement(fromCoders({0, 1, 2, 0}, {0, 1, 1, 0}, 3)).value, WithinAbs(0.75, 1e-15));
    // Three coders with missing cells: ordered pairs (0,0,0) 6 of 6, (0,1,·) 0 of 2, (1,·,·)
    // none, (2,2,1) 2 of 6 → 8 / 14.
    const ReliabilityData missing =
        fromUnits({{0, 0, 0}, {0, 1, kMissing}, {1, kMissing, kMissing}, {2, 2, 1}}, 3);
    const SimpleAgreement p = percentAgreement(missing);
    REQUIRE(p.value);
    CHECK_THAT(*p.value, WithinAbs(8.0 / 14.0, 1e-15));
    CHECK(p.observedAgreement == *p.value);
}

TEST_CASE("properties of Cohen's kappa on random tables")
{
    std::mt19937 rng(1960);
    const std::vector<KappaWeights> kinds {
        KappaWeights::None, KappaWeights::Linear, KappaWeights::Quadratic};
    int checked = 0;
    for (int t = 0; t < 1000; ++t) {
        const int k = 2 + int(rng() % 5);
        const DenseTable table = randomTable(rng, k, 10 + int(rng() % 200), 0.6);
        const KappaResult plain = cohenKappa(table);
        if (!plain.value)
            continue;
        ++checked;

        // Against the explicit unweighted formulas of Fleiss, Cohen & Everitt (1969).
        const NaiveKappa naive = naiveUnweighted(table);
        CHECK_THAT(*plain.value, WithinAbs(naive.kappa, 1e-12));
        CHECK_THAT(*plain.standardError, WithinAbs(naive.se, 1e-12));
        CHECK_THAT(*plain.nullStandardError, WithinAbs(naive.se0, 1e-12));

        // Swapping the two coders changes nothing (common practice; symmetric formulas).
        for (KappaWeights kind : kinds) {
            const KappaResult r = cohenKappa(table, kind);
            const KappaResult swapped = cohenKappa(transposed(table), kind);
            REQUIRE(swapped.value);
            CHECK_THAT(*swapped.value, WithinAbs(*r.value, 1e-12));
            CHECK_THAT(*swapped.standardError, WithinAbs(*r.standardError, 1e-12));
            CHECK_THAT(*swapped.nullStandardError, WithinAbs(*r.nullStandardError, 1e-12));
        }

        // Relabelling categories (rows and columns together) leaves unweighted kappa unchanged.
        std::vector<int> perm(static_cast<std::size_t>(k));
        std::iota(perm.begin(), perm.end(), 0);
        std::shuffle(perm.begin(), perm.end(), rng);
        DenseTable relabelled {k, table.counts};
        for (int i = 0; i < k; ++i)
            for (int j = 0; j < k; ++j)
                relabelled.counts[cell(perm[std::size_t(i)], perm[std::size_t(j)], k)] =
                    table.counts[cell(i, j, k)];
        const KappaResult r = cohenKappa(relabelled);
        CHECK_THAT(*r.value, WithinAbs(*plain.value, 1e-12));
        CHECK_THAT(*r.standardError, WithinAbs(*plain.standardError, 1e-12));
        CHECK_THAT(*r.nullStandardError, WithinAbs(*plain.nullStandardError, 1e-12));
        CHECK_THAT(*r.kappaMax, WithinAbs(*plain.kappaMax, 1e-12));

        // Custom |i − j| equals Linear; scaling the weights changes nothing; an asymmetric
        // custom matrix gives the agreement-weight form of Cohen (1968).
        std::vector<double> linear(std::size_t(k * k)), scaled(std::size_t(k * k)),
            asymmetric(std::size_t(k * k));
        std::uniform_real_distribution<double> weight(0.1, 5.0);
        for (int i = 0; i < k; ++i)
            for (int j = 0; j < k; ++j) {
                linear[cell(i, j, k)] = std::abs(i - j);
                scaled[cell(i, j, k)] = 7.5 * std::abs(i - j);
                asymmetric[cell(i, j, k)] = i == j ? 0 : weight(rng);
            }
        const KappaResult lin = cohenKappa(table, KappaWeights::Linear);
        for (const auto &w : {linear, scaled}) {
            const KappaResult custom = cohenKappa(table, KappaWeights::Custom, w);
            CHECK_THAT(*custom.value, WithinAbs(*lin.value, 1e-12));
            CHECK_THAT(*custom.standardError, WithinAbs(*lin.standardError, 1e-12));
            CHECK_THAT(*custom.nullStandardError, WithinAbs(*lin.nullStandardError, 1e-12));
        }
        const KappaResult asym = cohenKappa(table, KappaWeights::Custom, asymmetric);
        REQUIRE(asym.value);
        CHECK_THAT(*asym.value, WithinAbs(agreementFormKappa(table, asymmetric), 1e-12));

        // The interval is value ± Φ⁻¹(0.975) SE clipped to [−1, 1], kappa ≤ kappa_max
        // (Cohen 1960).
        CHECK_THAT(*plain.ciHigh,
            WithinAbs(std::min(1.0, *plain.value + kZ975 * *plain.standardError), 1e-12));
        CHECK_THAT(*plain.ciLow,
            WithinAbs(std::max(-1.0, *plain.value - kZ975 * *plain.standardError), 1e-12));
        CHECK(*plain.value <= *plain.kappaMax + 1e-12);
    }
    CHECK(checked > 950);
}

TEST_CASE("perfect agreement gives 1")
{
    // Common practice: a diagonal table with two or more categories in use.
    std::mt19937 rng(1);
    for (int t = 0; t < 100; ++t) {
        const int k = 2 + int(rng() % 5);
        DenseTable table {k, std::vector<double>(std::size_t(k * k), 0.0)};
        for (int i = 0; i < k; ++i)
            table.counts[cell(i, i, k)] = double(rng() % 20);
        table.counts[cell(0, 0, k)] += 1;
        table.counts[cell(k - 1, k - 1, k)] += 1;
        for (KappaWeights kind :
            {KappaWeights::None, KappaWeights::Linear, KappaWeights::Quadratic}) {
            const KappaResult r = cohenKappa(table, kind);
            REQUIRE(r.value);
            CHECK_THAT(*r.value, WithinAbs(1.0, 1e-12));
            CHECK_THAT(*r.standardError, WithinAbs(0.0, 1e-7));
            CHECK_FALSE(std::isnan(*r.standardError));
        }
        CHECK_THAT(*cohenKappa(table).kappaMax, WithinAbs(1.0, 1e-12));
        CHECK_THAT(*scottPi(table).value, WithinAbs(1.0, 1e-12));
        CHECK_THAT(*bennettS(table).value, WithinAbs(1.0, 1e-12));
    }
    // Fleiss (1971): every subject rated alike by all raters, two categories used.
    const FleissResult f = fleissKappa({{3, 0}, {0, 3}, {3, 0}});
    REQUIRE(f.value);
    CHECK_THAT(*f.value, WithinAbs(1.0, 1e-12));
}

TEST_CASE("Light's kappa with two coders equals Cohen's kappa")
{
    // Light (1971): the mean over the single pair is that pair's kappa.
    std::mt19937 rng(1971);
    std::uniform_int_distribution<int> value(0, 3);
    std::bernoulli_distribution missing(0.1), copies(0.6);
    for (int t = 0; t < 200; ++t) {
        std::vector<std::vector<int>> units;
        for (int u = 0; u < 40; ++u) {
            const int a = value(rng);
            const int b = copies(rng) ? a : value(rng);
            units.push_back({missing(rng) ? kMissing : a, missing(rng) ? kMissing : b});
        }
        const ReliabilityData d = fromUnits(units, 4);
        const KappaResult cohen = cohenKappa(contingencyTable(d, 0, 1));
        const SimpleAgreement light = lightKappa(d);
        REQUIRE(cohen.value.has_value() == light.value.has_value());
        if (cohen.value)
            CHECK(*light.value == *cohen.value);
        // Two coders: percent agreement is the share of units coded alike (kappa.h).
        const ContingencyTable table = contingencyTable(d, 0, 1);
        const SimpleAgreement agreement = percentAgreement(d);
        const SimpleAgreement pi = scottPi(table);
        const FleissResult fleiss = fleissKappa(categoryCounts(d));
        REQUIRE(agreement.value);
        REQUIRE(pi.value.has_value() == fleiss.value.has_value());
        double alike = 0, both = 0;
        for (int i = 0; i < 4; ++i)
            for (int j = 0; j < 4; ++j) {
                both += table.dense()[cell(i, j, 4)];
                alike += i == j ? table.dense()[cell(i, j, 4)] : 0;
            }
        CHECK_THAT(*agreement.value, WithinAbs(alike / both, 1e-15));
        // From the pair's table it is the same share.
        const SimpleAgreement fromTable = percentAgreement(table);
        REQUIRE(fromTable.value);
        CHECK_THAT(*fromTable.value, WithinAbs(*agreement.value, 1e-15));
        // Fleiss' kappa on the complete units is Scott's pi of the same units (Fleiss 1971).
        if (pi.value)
            CHECK_THAT(*fleiss.value, WithinAbs(*pi.value, 1e-12));
    }
}

TEST_CASE("every pair's table counted in one pass equals the table of each pair")
{
    // The one-pass count (kappa.h) against the pair-by-pair count on random data with missing
    // cells, codes outside 0..k-1 and, for the sorted path, more categories than units allow
    // dense counting; Light's kappa from the tables equals the kappa from the data.
    std::mt19937 rng(1971);
    for (int t = 0; t < 200; ++t) {
        const int coders = 2 + int(rng() % 4);
        const int k = t % 20 == 0 ? 300 : 2 + int(rng() % 5);
        std::vector<std::vector<int>> units;
        for (int u = 0; u < 30; ++u) {
            std::vector<int> row;
            for (int c = 0; c < coders; ++c) {
                const int r = int(rng() % 12);
                row.push_back(r == 0 ? kMissing : r == 1 ? k + 3 : int(rng() % unsigned(k)));
            }
            units.push_back(row);
        }
        const ReliabilityData d = fromUnits(units, k);
        const std::vector<ContingencyTable> tables = pairContingencyTables(d);
        REQUIRE(tables.size() == std::size_t(coders * (coders - 1) / 2));
        std::size_t pair = 0;
        for (int a = 0; a < coders; ++a)
            for (int b = a + 1; b < coders; ++b, ++pair) {
                const ContingencyTable one = contingencyTable(d, a, b);
                CHECK(tables[pair].categories == one.categories);
                CHECK(tables[pair].cells == one.cells);
            }
        const SimpleAgreement fromData = lightKappa(d);
        const SimpleAgreement fromTables = lightKappa(tables, coders);
        REQUIRE(fromData.value.has_value() == fromTables.value.has_value());
        if (fromData.value)
            CHECK(*fromData.value == *fromTables.value);
        CHECK(fromData.reason == fromTables.reason);
    }
    CHECK(lightKappa(std::vector<ContingencyTable>(2), 3).reason
        == "Light's kappa needs the table of every pair of coders");
}

TEST_CASE("contingency table and category counts from reliability data")
{
    const ReliabilityData d = fromUnits({{0, 1, 1}, {2, kMissing, 2}, {1, 1, 7}, {0, 0, 0}}, 3);
    const ContingencyTable t = contingencyTable(d, 0, 2);
    REQUIRE(t.categories == 3);
    // Unit 3's code 7 is outside 0..2 and counts as missing (kappa.h).
    CHECK(t.dense() == std::vector<double> {1, 1, 0, 0, 0, 0, 0, 0, 1});
    CHECK(t.cells == std::vector<TableCell> {{0, 0, 1}, {0, 1, 1}, {2, 2, 1}});
    CHECK(contingencyTable(d, 0, 3).cells.empty());
    CHECK(contingencyTable(d, -1, 0).cells.empty());
    // Only complete units: 1 and 4, their non-zero counts by category.
    const SubjectCounts counts = categoryCounts(d);
    CHECK(counts.subjects() == 2);
    CHECK(counts.starts == std::vector<std::size_t> {0, 2, 3});
    CHECK(counts.entries == std::vector<std::pair<int, double>> {{0, 1}, {1, 2}, {0, 3}});
    ReliabilityData broken = d;
    broken.cells.pop_back();
    CHECK(categoryCounts(broken).subjects() == 0);
    const ContingencyTable none = contingencyTable(broken, 0, 1);
    CHECK(none.cells.empty());
    CHECK(lightKappa(broken).reason
        == "the reliability data are malformed: the number of cells is not units × coders");
}

TEST_CASE("degenerate input is undefined with a reason, never NaN")
{
    const ContingencyTable empty {3, std::vector<double>(9, 0.0)};
    for (KappaWeights kind : {KappaWeights::None, KappaWeights::Linear, KappaWeights::Quadratic}) {
        const KappaResult r = cohenKappa(empty, kind);
        CHECK_FALSE(r.value);
        CHECK_FALSE(r.standardError);
        CHECK(r.reason == "no unit was coded by both coders");
    }
    CHECK(scottPi(empty).reason == "no unit was coded by both coders");
    CHECK_FALSE(bennettS(empty).value);

    // Both coders used one category only: p_e = 1.
    const ContingencyTable one {3, {0, 0, 0, 0, 9, 0, 0, 0, 0}};
    const KappaResult r = cohenKappa(one);
    CHECK_FALSE(r.value);
    CHECK_FALSE(r.kappaMax);
    CHECK(r.reason
        == "chance agreement is 1 (both coders used the same single category), so kappa is "
           "undefined");
    CHECK(r.chanceAgreement == 1);
    CHECK_FALSE(cohenKappa(one, KappaWeights::Quadratic).value);
    CHECK_FALSE(cohenKappa(one, KappaWeights::Custom, kCohen1968Weights).value);
    CHECK_FALSE(scottPi(one).value);
    // S has a fixed chance 1/k and stays defined: all units agree.
    CHECK(*bennettS(one).value == 1);
    CHECK_FALSE(cohenKappa({1, {5}}).value);
    CHECK_FALSE(bennettS({1, {5}}).value);

    // Malformed tables and weights.
    CHECK(cohenKappa({3, {1, 2, 3}}).reason.starts_with("the contingency table is malformed"));
    CHECK(cohenKappa({2, {1, -2, 3, 4}}).reason
        == "the contingency table holds a negative or non-finite count");
    CHECK(cohenKappa({2, {1, NAN, 3, 4}}).reason
        == "the contingency table holds a negative or non-finite count");
    CHECK(cohenKappa(kCohen1960, KappaWeights::Custom).reason
        == "the custom kappa weights are not a k × k matrix for the table's 3 categories");
    CHECK(cohenKappa(kCohen1960, KappaWeights::Custom, {1, 1, 3, 1, 0, 6, 3, 6, 0}).reason
        == "the custom kappa weights are disagreement weights: the diagonal must be 0");
    CHECK(cohenKappa(kCohen1960, KappaWeights::Custom, {0, -1, 3, 1, 0, 6, 3, 6, 0}).reason
        == "the custom kappa weights hold a negative or non-finite weight");
    CHECK(cohenKappa(kCohen1960, KappaWeights::Custom, std::vector<double>(9, 0.0)).reason
        == "the custom kappa weights are all 0: no disagreement is weighted");
    // Weights that give no expected disagreement between the categories in use.
    CHECK(cohenKappa(
              {3, {4, 2, 0, 1, 3, 0, 0, 0, 0}}, KappaWeights::Custom, {0, 0, 1, 0, 0, 1, 1, 1, 0})
              .reason
        == "the expected weighted disagreement is 0 (the coders used no pair of categories "
           "with a positive weight), so weighted kappa is undefined");

    // Percent agreement and Light's kappa.
    CHECK(percentAgreement(fromUnits({{0, kMissing}, {kMissing, 1}}, 2)).reason
        == "no unit holds values from two coders");
    CHECK(lightKappa(fromUnits({{0}, {1}}, 2)).reason == "Light's kappa needs at least two coders");
    CHECK(lightKappa(fromUnits({{1, 1, 0}, {1, 1, 1}, {1, 1, 0}}, 2)).reason
        == "Cohen's kappa of coders 0 and 1 is undefined: chance agreement is 1 (both coders "
           "used the same single category), so kappa is undefined");
}

TEST_CASE("Fleiss' kappa on degenerate input")
{
    CHECK(fleissKappa(std::vector<std::vector<double>> {}).reason == "there are no subjects");
    CHECK(fleissKappa(SubjectCounts {}).reason == "there are no subjects");
    SubjectCounts outside;
    outside.categories = 2;
    outside.addSubject({1, 1});
    outside.entries.emplace_back(2, 2.0);
    outside.starts.push_back(outside.entries.size());
    CHECK(fleissKappa(outside).reason == "subject 2 has a count for category 2, outside 0..1");
    CHECK(fleissKappa(std::vector<std::vector<double>>(1)).reason == "there are no categories");
    CHECK(fleissKappa({{1, 2}, {1, 2, 0}}).reason == "subject 2 has 3 categories, subject 1 has 2");
    CHECK(fleissKappa({{1, 2}, {2, 2}}).reason
        == "subject 2 has 4 ratings, subject 1 has 3: Fleiss' kappa needs the same number of "
           "ratings for every subject");
    CHECK(fleissKappa({{1, 2}, {-1, 4}}).reason == "subject 2 has a negative or non-finite count");
    CHECK(fleissKappa({{1, 0}, {0, 1}}).reason
        == "Fleiss' kappa needs at least two ratings per subject");
    const FleissResult single = fleissKappa({{0, 4, 0}, {0, 4, 0}});
    CHECK_FALSE(single.value);
    CHECK_FALSE(single.nullStandardError);
    CHECK(single.reason
        == "only one category is used: chance agreement is 1, so Fleiss' kappa is undefined");
    CHECK(single.perCategory == std::vector<std::optional<double>>(3, std::nullopt));
    // An unused category has no kappa of its own; the others do.
    const FleissResult unused = fleissKappa({{2, 1, 0}, {0, 3, 0}, {3, 0, 0}});
    REQUIRE(unused.value);
    CHECK(unused.perCategory[0].has_value());
    CHECK(unused.perCategory[1].has_value());
    CHECK_FALSE(unused.perCategory[2].has_value());
    CHECK_FALSE(unused.perCategoryNullStandardError[2].has_value());
}

TEST_CASE("a small table's kappa interval is clipped to 1")
{
    // n = 5: kappa = (0.8 − 0.48) / 0.52 = 0.6154 (Cohen 1960's formula by hand); its standard
    // error is large enough that value + 1.96 SE passes 1, which no kappa can reach.
    const ContingencyTable t {2, {2, 0, 1, 2}};
    const KappaResult r = cohenKappa(t);
    REQUIRE(r.value);
    CHECK_THAT(*r.value, WithinAbs(0.32 / 0.52, 1e-12));
    REQUIRE(r.standardError);
    REQUIRE(*r.value + kZ975 * *r.standardError > 1.0);
    CHECK(*r.ciHigh == 1.0);
    CHECK_THAT(*r.ciLow, WithinAbs(*r.value - kZ975 * *r.standardError, 1e-12));
    CHECK(r.weights == KappaWeights::None);
    CHECK(std::string(kappaWeightsKey(cohenKappa(t, KappaWeights::Quadratic).weights))
        == "quadratic");
}

namespace {

// Weighted kappa and both standard errors of Fleiss, Cohen & Everitt (1969) written out over all
// k × k pairs, with agreement weights w' = 1 − w / w_max: the check of the closed-form sums
// kappa.cpp uses for the unweighted, linear and quadratic weights.
NaiveKappa naiveWeighted(const DenseTable &t, KappaWeights kind)
{
    const int k = t.categories;
    const double n = std::accumulate(t.counts.begin(), t.counts.end(), 0.0);
    auto w = [&](int i, int j) {
        const double d = std::abs(double(i - j));
        return kind == KappaWeights::Linear ? d : kind == KappaWeights::Quadratic ? d * d : d > 0;
    };
    const double wMax = kind == KappaWeights::None ? 1.0
        : kind == KappaWeights::Linear             ? double(k - 1)
                                                   : double(k - 1) * double(k - 1);
    auto agree = [&](int i, int j) { return 1 - w(i, j) / wMax; };
    std::vector<double> row(std::size_t(k), 0.0), col(std::size_t(k), 0.0);
    for (int i = 0; i < k; ++i)
        for (int j = 0; j < k; ++j) {
            row[std::size_t(i)] += t.counts[cell(i, j, k)] / n;
            col[std::size_t(j)] += t.counts[cell(i, j, k)] / n;
        }
    double po = 0, pe = 0;
    std::vector<double> rowBar(std::size_t(k), 0.0), colBar(std::size_t(k), 0.0);
    for (int i = 0; i < k; ++i)
        for (int j = 0; j < k; ++j) {
            po += agree(i, j) * t.counts[cell(i, j, k)] / n;
            pe += agree(i, j) * row[std::size_t(i)] * col[std::size_t(j)];
            rowBar[std::size_t(i)] += col[std::size_t(j)] * agree(i, j);
            colBar[std::size_t(j)] += row[std::size_t(i)] * agree(i, j);
        }
    double a = 0, b = 0;
    for (int i = 0; i < k; ++i)
        for (int j = 0; j < k; ++j) {
            const double bars = rowBar[std::size_t(i)] + colBar[std::size_t(j)];
            const double x = agree(i, j) * (1 - pe) - bars * (1 - po);
            a += t.counts[cell(i, j, k)] / n * x * x;
            const double y = agree(i, j) - bars;
            b += row[std::size_t(i)] * col[std::size_t(j)] * y * y;
        }
    const double d = po * pe - 2 * pe + po;
    NaiveKappa r;
    r.kappa = (po - pe) / (1 - pe);
    r.se = std::sqrt(std::max(0.0, (a - d * d) / (n * std::pow(1 - pe, 4))));
    r.se0 = std::sqrt(std::max(0.0, (b - pe * pe) / (n * (1 - pe) * (1 - pe))));
    return r;
}

} // namespace

TEST_CASE("kappa with hundreds of categories matches the sums over all pairs")
{
    // Random tables with 50–400 categories (invented); the closed-form sums of kappa.cpp against
    // Fleiss, Cohen & Everitt (1969) summed over every pair of categories.
    std::mt19937 rng(1969);
    for (int t = 0; t < 30; ++t) {
        const int k = 50 + int(rng() % 350);
        const DenseTable table = randomTable(rng, k, 200 + int(rng() % 2000), 0.6);
        for (KappaWeights kind :
            {KappaWeights::None, KappaWeights::Linear, KappaWeights::Quadratic}) {
            const KappaResult r = cohenKappa(table, kind);
            const NaiveKappa naive = naiveWeighted(table, kind);
            REQUIRE(r.value);
            CHECK_THAT(*r.value, WithinAbs(naive.kappa, 1e-10));
            CHECK_THAT(*r.standardError, WithinAbs(naive.se, 1e-10));
            CHECK_THAT(*r.nullStandardError, WithinAbs(naive.se0, 1e-10));
        }
    }
}

TEST_CASE("twenty thousand categories take memory in the pairs that occur")
{
    // 20,000 units × 2 coders, each unit its own label, the second coder agreeing 80% of the time
    // (invented). A dense table would hold 4·10^8 counts.
    const int units = 20000;
    std::mt19937 rng(20000);
    std::bernoulli_distribution agrees(0.8);
    std::uniform_int_distribution<int> anyLabel(0, units - 1);
    std::vector<int> a, b;
    for (int u = 0; u < units; ++u) {
        a.push_back(u);
        b.push_back(agrees(rng) ? u : anyLabel(rng));
    }
    const ReliabilityData data = fromCoders(a, b, units);
    const ContingencyTable table = contingencyTable(data, 0, 1);
    CHECK(table.cells.size() <= std::size_t(units));
    CHECK(table.total() == units);
    // Cohen (1960) from the label vectors directly: p_o the share alike, p_e Σ p_i. p_.i.
    std::vector<double> rows(std::size_t(units), 0.0), columns(std::size_t(units), 0.0);
    double alike = 0;
    for (int u = 0; u < units; ++u) {
        rows[std::size_t(a[std::size_t(u)])] += 1.0 / units;
        columns[std::size_t(b[std::size_t(u)])] += 1.0 / units;
        alike += a[std::size_t(u)] == b[std::size_t(u)] ? 1.0 / units : 0.0;
    }
    double chance = 0;
    for (int i = 0; i < units; ++i)
        chance += rows[std::size_t(i)] * columns[std::size_t(i)];
    const KappaResult kappa = cohenKappa(table);
    REQUIRE(kappa.value);
    CHECK_THAT(*kappa.value, WithinAbs((alike - chance) / (1 - chance), 1e-12));
    // Fleiss' kappa holds each unit's non-zero counts only: at most two per unit.
    const SubjectCounts counts = categoryCounts(data);
    CHECK(counts.subjects() == units);
    CHECK(counts.entries.size() <= std::size_t(2 * units));
    const FleissResult fleiss = fleissKappa(counts);
    REQUIRE(fleiss.value);
    CHECK_THAT(*fleiss.value, WithinAbs(*scottPi(table).value, 1e-12));
    CHECK(fleiss.perCategory.size() == std::size_t(units));
}

TEST_CASE("Fleiss' kappa read unit by unit equals the one from the table of counts")
{
    // The same sums in the same order (kappa.h): the two must agree exactly, per category too.
    std::mt19937 rng(1971);
    for (int t = 0; t < 300; ++t) {
        const int coders = 2 + int(rng() % 5);
        const int values = 1 + int(rng() % 6);
        std::vector<std::vector<int>> units;
        for (int u = 0; u < int(rng() % 40); ++u) {
            std::vector<int> row;
            for (int c = 0; c < coders; ++c)
                row.push_back(rng() % 10 == 0 ? kMissing : int(rng() % unsigned(values)));
            units.push_back(row);
        }
        const ReliabilityData d = fromUnits(units, values);
        const FleissResult streamed = fleissKappa(d);
        const FleissResult tabled = fleissKappa(categoryCounts(d));
        CHECK(streamed.reason == tabled.reason);
        REQUIRE(streamed.value.has_value() == tabled.value.has_value());
        if (streamed.value) {
            CHECK(*streamed.value == *tabled.value);
            CHECK(*streamed.nullStandardError == *tabled.nullStandardError);
            CHECK(streamed.perCategory == tabled.perCategory);
            CHECK(streamed.subjects == tabled.subjects);
        }
    }
}
