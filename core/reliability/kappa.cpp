#include "core/reliability/kappa.h"

#include "core/reliability/sample_size.h"

#include <algorithm>
#include <cmath>
#include <cstddef>
#include <string>

namespace fourfold::reliability {

namespace {

// The two-sided 95% normal quantile Φ⁻¹(0.975) = 1.95996…, exact to double precision.
const double kZ95 = normalQuantile(0.975);

std::size_t at(int row, int column, int k)
{
    return std::size_t(row) * std::size_t(k) + std::size_t(column);
}

bool wellFormed(const ReliabilityData &data)
{
    return data.units >= 0 && data.coders >= 0 && data.values >= 0
        && data.cells.size() == std::size_t(data.units) * std::size_t(data.coders);
}

const char *const kMalformedData =
    "the reliability data are malformed: the number of cells is not units × coders";

bool isCode(int value, int values)
{
    return value >= 0 && value < values;
}

std::string number(double x)
{
    std::string s = std::to_string(x);
    // to_string prints six decimals; trim the zeros of whole counts.
    while (!s.empty() && s.back() == '0')
        s.pop_back();
    if (!s.empty() && s.back() == '.')
        s.pop_back();
    return s;
}

// Cell shares p_ij and the marginal shares p_i. (rows) and p_.j (columns) of a table.
struct TableShares {
    double n = 0;
    std::vector<double> cells, rows, columns;
};

// Validates `table` and returns its shares; on failure sets `reason` and returns nothing.
std::optional<TableShares> tableShares(const ContingencyTable &table, UndefinedReason &reason)
{
    const int k = table.categories;
    if (k < 1 || table.counts.size() != std::size_t(k) * std::size_t(k)) {
        reason = "the contingency table is malformed: it does not hold k × k counts for k ≥ 1 "
                 "categories";
        return std::nullopt;
    }
    TableShares s;
    for (double c : table.counts) {
        if (!std::isfinite(c) || c < 0) {
            reason = "the contingency table holds a negative or non-finite count";
            return std::nullopt;
        }
        s.n += c;
    }
    if (s.n <= 0) {
        reason = "no unit was coded by both coders";
        return std::nullopt;
    }
    s.cells.resize(table.counts.size());
    s.rows.assign(std::size_t(k), 0.0);
    s.columns.assign(std::size_t(k), 0.0);
    for (int i = 0; i < k; ++i) {
        for (int j = 0; j < k; ++j) {
            const double p = table.counts[at(i, j, k)] / s.n;
            s.cells[at(i, j, k)] = p;
            s.rows[std::size_t(i)] += p;
            s.columns[std::size_t(j)] += p;
        }
    }
    return s;
}

// The k × k disagreement weights of Cohen (1968): 1 − δ_ij for unweighted kappa (Cohen 1960 is
// the special case), |i − j| or (i − j)² by category position, or the validated custom matrix.
// Returns a reason when the custom weights are unusable, else an empty string.
UndefinedReason disagreementWeights(
    int k, KappaWeights kind, const std::vector<double> &custom, std::vector<double> &w)
{
    w.assign(std::size_t(k) * std::size_t(k), 0.0);
    if (kind == KappaWeights::Custom) {
        if (custom.size() != w.size())
            return "the custom kappa weights are not a k × k matrix for the table's "
                + std::to_string(k) + " categories";
        for (int i = 0; i < k; ++i) {
            for (int j = 0; j < k; ++j) {
                const double x = custom[at(i, j, k)];
                if (!std::isfinite(x) || x < 0)
                    return "the custom kappa weights hold a negative or non-finite weight";
                if (i == j && x != 0)
                    return "the custom kappa weights are disagreement weights: the diagonal "
                           "must be 0";
            }
        }
        if (*std::max_element(custom.begin(), custom.end()) <= 0)
            return "the custom kappa weights are all 0: no disagreement is weighted";
        w = custom;
        return {};
    }
    for (int i = 0; i < k; ++i) {
        for (int j = 0; j < k; ++j) {
            const double d = std::abs(double(i - j));
            switch (kind) {
            case KappaWeights::None:
            case KappaWeights::Custom:
                w[at(i, j, k)] = i == j ? 0.0 : 1.0;
                break;
            case KappaWeights::Linear:
                w[at(i, j, k)] = d;
                break;
            case KappaWeights::Quadratic:
                w[at(i, j, k)] = d * d;
                break;
            }
        }
    }
    return {};
}

} // namespace

ContingencyTable contingencyTable(const ReliabilityData &data, int coderA, int coderB)
{
    ContingencyTable table;
    table.categories = std::max(data.values, 0);
    const int k = table.categories;
    table.counts.assign(std::size_t(k) * std::size_t(k), 0.0);
    if (!wellFormed(data) || coderA < 0 || coderA >= data.coders || coderB < 0
        || coderB >= data.coders)
        return table;
    for (int u = 0; u < data.units; ++u) {
        const int a = data.at(u, coderA);
        const int b = data.at(u, coderB);
        if (isCode(a, k) && isCode(b, k))
            table.counts[at(a, b, k)] += 1.0;
    }
    return table;
}

KappaResult cohenKappa(
    const ContingencyTable &table, KappaWeights weights, const std::vector<double> &customWeights)
{
    KappaResult r;
    r.weights = weights;
    const auto s = tableShares(table, r.reason);
    if (!s)
        return r;
    r.n = s->n;
    const int k = table.categories;
    if (k < 2) {
        r.chanceAgreement = 1;
        r.observedAgreement = 1;
        r.reason = "the table has a single category: chance agreement is 1, so kappa is undefined";
        return r;
    }
    std::vector<double> w;
    if (UndefinedReason bad = disagreementWeights(k, weights, customWeights, w); !bad.empty()) {
        r.reason = std::move(bad);
        return r;
    }
    const double wMax = *std::max_element(w.begin(), w.end());

    // Cohen (1968): observed and chance-expected weighted disagreement, Σ w_ij p_ij and
    // Σ w_ij p_i. p_.j; with w_ij = 1 − δ_ij they are 1 − p_o and 1 − p_e of Cohen (1960).
    double dObserved = 0, dExpected = 0;
    for (int i = 0; i < k; ++i) {
        for (int j = 0; j < k; ++j) {
            const double wij = w[at(i, j, k)];
            dObserved += wij * s->cells[at(i, j, k)];
            dExpected += wij * s->rows[std::size_t(i)] * s->columns[std::size_t(j)];
        }
    }
    // Agreement-weight form w' = 1 − w / w_max (Cohen 1968; Fleiss, Cohen & Everitt 1969):
    // p_o = Σ w'_ij p_ij, p_e = Σ w'_ij p_i. p_.j, so 1 − p_o and 1 − p_e are the scaled
    // disagreements (kept as such: they are exactly 0 when no disagreement is expected).
    const double qObserved = dObserved / wMax;
    const double qExpected = dExpected / wMax;
    r.observedAgreement = 1 - qObserved;
    r.chanceAgreement = 1 - qExpected;
    if (dExpected <= 0) {
        r.reason = weights == KappaWeights::None
            ? "chance agreement is 1 (both coders used the same single category), so kappa is "
              "undefined"
            : "the expected weighted disagreement is 0 (the coders used no pair of categories "
              "with a positive weight), so weighted kappa is undefined";
        return r;
    }
    // Cohen (1960) κ = (p_o − p_e) / (1 − p_e); Cohen (1968) κ_w = 1 − Σ w p_o / Σ w p_e. The
    // two agree, and κ does not change under w' = 1 − w / w_max.
    const double kappa = 1 - dObserved / dExpected;
    r.value = kappa;

    if (weights == KappaWeights::None) {
        // Cohen (1960): p_max = Σ min(p_i., p_.i), κ_max = (p_max − p_e) / (1 − p_e).
        double pMax = 0;
        for (int i = 0; i < k; ++i)
            pMax += std::min(s->rows[std::size_t(i)], s->columns[std::size_t(i)]);
        r.kappaMax = (pMax - r.chanceAgreement) / qExpected;
    }

    // Fleiss, Cohen & Everitt (1969), with agreement weights w'_ij, w̄_i. = Σ_j p_.j w'_ij and
    // w̄_.j = Σ_i p_i. w'_ij:
    //   var(κ)  = [Σ p_ij (w'_ij (1 − p_e) − (w̄_i. + w̄_.j)(1 − p_o))²
    //              − (p_o p_e − 2 p_e + p_o)²] / (n (1 − p_e)⁴)
    //   var0(κ) = [Σ p_i. p_.j (w'_ij − (w̄_i. + w̄_.j))² − p_e²] / (n (1 − p_e)²)
    // The subtracted terms are the squared means of the bracketed quantities under p_ij and
    // p_i. p_.j, so each bracket is a variance; it is computed about its mean to avoid
    // cancellation, which keeps it ≥ 0 (0 at perfect agreement).
    std::vector<double> agree(w.size());
    for (std::size_t c = 0; c < w.size(); ++c)
        agree[c] = 1 - w[c] / wMax;
    std::vector<double> rowMean(std::size_t(k), 0.0), columnMean(std::size_t(k), 0.0);
    for (int i = 0; i < k; ++i) {
        for (int j = 0; j < k; ++j) {
            rowMean[std::size_t(i)] += s->columns[std::size_t(j)] * agree[at(i, j, k)];
            columnMean[std::size_t(j)] += s->rows[std::size_t(i)] * agree[at(i, j, k)];
        }
    }
    auto nonNull = [&](int i, int j) {
        return agree[at(i, j, k)] * qExpected
            - (rowMean[std::size_t(i)] + columnMean[std::size_t(j)]) * qObserved;
    };
    auto null = [&](int i, int j) {
        return agree[at(i, j, k)] - (rowMean[std::size_t(i)] + columnMean[std::size_t(j)]);
    };
    double meanNonNull = 0, meanNull = 0;
    for (int i = 0; i < k; ++i) {
        for (int j = 0; j < k; ++j) {
            meanNonNull += s->cells[at(i, j, k)] * nonNull(i, j);
            meanNull += s->rows[std::size_t(i)] * s->columns[std::size_t(j)] * null(i, j);
        }
    }
    double sumNonNull = 0, sumNull = 0;
    for (int i = 0; i < k; ++i) {
        for (int j = 0; j < k; ++j) {
            const double a = nonNull(i, j) - meanNonNull;
            const double b = null(i, j) - meanNull;
            sumNonNull += s->cells[at(i, j, k)] * a * a;
            sumNull += s->rows[std::size_t(i)] * s->columns[std::size_t(j)] * b * b;
        }
    }
    const double q2 = qExpected * qExpected;
    const double variance = sumNonNull / (s->n * q2 * q2);
    const double nullVariance = sumNull / (s->n * q2);
    r.standardError = std::sqrt(std::max(variance, 0.0));
    r.nullStandardError = std::sqrt(std::max(nullVariance, 0.0));
    // Kappa lies in [−1, 1]: the normal interval is clipped to it (common practice).
    r.ciLow = std::max(-1.0, kappa - kZ95 * *r.standardError);
    r.ciHigh = std::min(1.0, kappa + kZ95 * *r.standardError);
    return r;
}

SimpleAgreement scottPi(const ContingencyTable &table)
{
    SimpleAgreement r;
    const auto s = tableShares(table, r.reason);
    if (!s)
        return r;
    // Scott (1955): p_e = Σ_i ((p_i. + p_.i) / 2)², the squared pooled shares of both coders.
    double pObserved = 0, pExpected = 0;
    for (int i = 0; i < table.categories; ++i) {
        const double pooled = (s->rows[std::size_t(i)] + s->columns[std::size_t(i)]) / 2;
        pObserved += s->cells[at(i, i, table.categories)];
        pExpected += pooled * pooled;
    }
    r.observedAgreement = pObserved;
    r.chanceAgreement = pExpected;
    if (pExpected >= 1) {
        r.reason = "chance agreement is 1 (both coders used the same single category), so "
                   "Scott's pi is undefined";
        return r;
    }
    r.value = (pObserved - pExpected) / (1 - pExpected);
    return r;
}

SimpleAgreement bennettS(const ContingencyTable &table)
{
    SimpleAgreement r;
    const auto s = tableShares(table, r.reason);
    if (!s)
        return r;
    const int k = table.categories;
    if (k < 2) {
        r.reason = "S needs at least two categories";
        return r;
    }
    double pObserved = 0;
    for (int i = 0; i < k; ++i)
        pObserved += s->cells[at(i, i, k)];
    // Bennett, Alpert & Goldstein (1954); Brennan & Prediger (1981): chance agreement 1/k.
    const double pChance = 1.0 / k;
    r.observedAgreement = pObserved;
    r.chanceAgreement = pChance;
    r.value = (pObserved - pChance) / (1 - pChance);
    return r;
}

SimpleAgreement percentAgreement(const ContingencyTable &table)
{
    SimpleAgreement r;
    const auto s = tableShares(table, r.reason);
    if (!s)
        return r;
    double alike = 0;
    for (int i = 0; i < table.categories; ++i)
        alike += s->cells[at(i, i, table.categories)];
    r.value = alike;
    r.observedAgreement = alike;
    return r;
}

SimpleAgreement percentAgreement(const ReliabilityData &data)
{
    SimpleAgreement r;
    if (!wellFormed(data)) {
        r.reason = kMalformedData;
        return r;
    }
    // Ordered pairs within units (the pairing of Krippendorff 2004, ch. 11, unweighted by
    // 1/(m_u − 1)): a unit with m_u values has m_u (m_u − 1) pairs, n_uv (n_uv − 1) agreeing on v.
    std::vector<double> tally(std::size_t(data.values), 0.0);
    double pairs = 0, agreeing = 0;
    for (int u = 0; u < data.units; ++u) {
        double m = 0;
        for (int c = 0; c < data.coders; ++c) {
            const int v = data.at(u, c);
            if (isCode(v, data.values)) {
                tally[std::size_t(v)] += 1;
                m += 1;
            }
        }
        for (int c = 0; c < data.coders; ++c) {
            const int v = data.at(u, c);
            if (!isCode(v, data.values))
                continue;
            double &t = tally[std::size_t(v)];
            if (t > 0) {
                agreeing += t * (t - 1);
                t = 0;
            }
        }
        if (m >= 2)
            pairs += m * (m - 1);
    }
    if (pairs <= 0) {
        r.reason = "no unit holds values from two coders";
        return r;
    }
    r.value = agreeing / pairs;
    r.observedAgreement = *r.value;
    return r;
}

FleissResult fleissKappa(const std::vector<std::vector<double>> &counts)
{
    FleissResult r;
    if (counts.empty()) {
        r.reason = "there are no subjects";
        return r;
    }
    const std::size_t k = counts.front().size();
    if (k == 0) {
        r.reason = "there are no categories";
        return r;
    }
    const int subjects = int(counts.size());
    double raters = 0;
    for (int i = 0; i < subjects; ++i) {
        const auto &row = counts[std::size_t(i)];
        if (row.size() != k) {
            r.reason = "subject " + std::to_string(i + 1) + " has " + std::to_string(row.size())
                + " categories, subject 1 has " + std::to_string(k);
            return r;
        }
        double sum = 0;
        for (double c : row) {
            if (!std::isfinite(c) || c < 0) {
                r.reason =
                    "subject " + std::to_string(i + 1) + " has a negative or non-finite count";
                return r;
            }
            sum += c;
        }
        if (i == 0)
            raters = sum;
        else if (std::abs(sum - raters) > 1e-9 * std::max(1.0, raters)) {
            r.reason = "subject " + std::to_string(i + 1) + " has " + number(sum)
                + " ratings, subject 1 has " + number(raters)
                + ": Fleiss' kappa needs the same number of ratings for every subject";
            return r;
        }
    }
    r.subjects = subjects;
    r.ratersPerSubject = raters;
    if (raters < 2) {
        r.reason = "Fleiss' kappa needs at least two ratings per subject";
        return r;
    }
    const double bigN = subjects, n = raters;

    // Fleiss (1971): p_j = Σ_i n_ij / (N n); P_i = (Σ_j n_ij² − n) / (n (n − 1));
    // P̄ = Σ P_i / N; P̄e = Σ p_j²; κ = (P̄ − P̄e) / (1 − P̄e).
    r.categoryShares.assign(k, 0.0);
    double pBar = 0;
    for (const auto &row : counts) {
        double squares = 0;
        for (std::size_t j = 0; j < k; ++j) {
            r.categoryShares[j] += row[j];
            squares += row[j] * row[j];
        }
        pBar += (squares - n) / (n * (n - 1));
    }
    pBar /= bigN;
    double pExpected = 0, sumPQ = 0, sumPQQminusP = 0;
    for (double &p : r.categoryShares) {
        p /= bigN * n;
        const double q = 1 - p;
        pExpected += p * p;
        sumPQ += p * q;
        sumPQQminusP += p * q * (q - p);
    }
    r.meanObservedAgreement = pBar;
    r.chanceAgreement = pExpected;

    // Fleiss (1971), per category: κ_j = 1 − Σ_i n_ij (n − n_ij) / (N n (n − 1) p_j q_j).
    // Fleiss, Nee & Landis (1979): under κ_j = 0, var0(κ_j) = 2 / (N n (n − 1)).
    const double nullVarianceJ = 2 / (bigN * n * (n - 1));
    r.perCategory.assign(k, std::nullopt);
    r.perCategoryNullStandardError.assign(k, std::nullopt);
    for (std::size_t j = 0; j < k; ++j) {
        const double pq = r.categoryShares[j] * (1 - r.categoryShares[j]);
        if (pq <= 0)
            continue;
        double disagreeing = 0;
        for (const auto &row : counts)
            disagreeing += row[j] * (n - row[j]);
        r.perCategory[j] = 1 - disagreeing / (bigN * n * (n - 1) * pq);
        r.perCategoryNullStandardError[j] = std::sqrt(nullVarianceJ);
    }

    if (sumPQ <= 0) {
        r.reason = "only one category is used: chance agreement is 1, so Fleiss' kappa is "
                   "undefined";
        return r;
    }
    r.value = (pBar - pExpected) / (1 - pExpected);
    // Fleiss, Nee & Landis (1979), the corrected null variance of Fleiss (1971):
    //   var0(κ) = 2 / (N n (n − 1)) · [(Σ p_j q_j)² − Σ p_j q_j (q_j − p_j)] / (Σ p_j q_j)².
    const double nullVariance = nullVarianceJ * (sumPQ * sumPQ - sumPQQminusP) / (sumPQ * sumPQ);
    r.nullStandardError = std::sqrt(std::max(nullVariance, 0.0));
    return r;
}

std::vector<std::vector<double>> categoryCounts(const ReliabilityData &data)
{
    std::vector<std::vector<double>> counts;
    if (!wellFormed(data) || data.coders == 0)
        return counts;
    for (int u = 0; u < data.units; ++u) {
        std::vector<double> row(std::size_t(data.values), 0.0);
        bool complete = true;
        for (int c = 0; c < data.coders && complete; ++c) {
            const int v = data.at(u, c);
            complete = isCode(v, data.values);
            if (complete)
                row[std::size_t(v)] += 1;
        }
        if (complete)
            counts.push_back(std::move(row));
    }
    return counts;
}

SimpleAgreement lightKappa(const ReliabilityData &data)
{
    SimpleAgreement r;
    if (!wellFormed(data)) {
        r.reason = kMalformedData;
        return r;
    }
    if (data.coders < 2) {
        r.reason = "Light's kappa needs at least two coders";
        return r;
    }
    // Light (1971): the unweighted mean of the pairwise Cohen's kappas.
    double sum = 0;
    int pairs = 0;
    for (int a = 0; a < data.coders; ++a) {
        for (int b = a + 1; b < data.coders; ++b) {
            const KappaResult pair = cohenKappa(contingencyTable(data, a, b));
            if (!pair.value) {
                r.reason = "Cohen's kappa of coders " + std::to_string(a) + " and "
                    + std::to_string(b) + " is undefined: " + pair.reason;
                return r;
            }
            sum += *pair.value;
            ++pairs;
        }
    }
    r.value = sum / pairs;
    return r;
}

const char *kappaWeightsKey(KappaWeights weights)
{
    switch (weights) {
    case KappaWeights::None:
        return "none";
    case KappaWeights::Linear:
        return "linear";
    case KappaWeights::Quadratic:
        return "quadratic";
    case KappaWeights::Custom:
        return "custom";
    }
    return "none";
}

} // namespace fourfold::reliability
