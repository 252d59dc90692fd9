#include "core/reliability/kappa.h"

#include "core/reliability/sample_size.h"

#include <algorithm>
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <span>
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

bool cellBefore(const TableCell &a, const TableCell &b)
{
    return a.row != b.row ? a.row < b.row : a.column < b.column;
}

// Cell shares p_ij (the table's non-zero cells, in its order) and the marginal shares p_i. (rows)
// and p_.j (columns) of a table.
struct TableShares {
    double n = 0;
    std::vector<TableCell> cells; // count = p_ij
    std::vector<double> rows, columns;
    double diagonal = 0; // Σ p_ii
};

// Validates `table` and returns its shares; on failure sets `reason` and returns nothing.
std::optional<TableShares> tableShares(const ContingencyTable &table, UndefinedReason &reason)
{
    const int k = table.categories;
    if (k < 1 || table.malformed) {
        reason = "the contingency table is malformed: it does not hold k × k counts for k ≥ 1 "
                 "categories";
        return std::nullopt;
    }
    TableShares s;
    for (std::size_t i = 0; i < table.cells.size(); ++i) {
        const TableCell &cell = table.cells[i];
        if (!isCode(cell.row, k) || !isCode(cell.column, k)
            || (i > 0 && !cellBefore(table.cells[i - 1], cell))) {
            reason = "the contingency table is malformed: a cell lies outside the k × k table, "
                     "is given twice or out of order";
            return std::nullopt;
        }
        if (!std::isfinite(cell.count) || cell.count < 0) {
            reason = "the contingency table holds a negative or non-finite count";
            return std::nullopt;
        }
        s.n += cell.count;
    }
    if (s.n <= 0) {
        reason = "no unit was coded by both coders";
        return std::nullopt;
    }
    s.cells.reserve(table.cells.size());
    s.rows.assign(std::size_t(k), 0.0);
    s.columns.assign(std::size_t(k), 0.0);
    for (const TableCell &cell : table.cells) {
        const double p = cell.count / s.n;
        s.cells.push_back({cell.row, cell.column, p});
        s.rows[std::size_t(cell.row)] += p;
        s.columns[std::size_t(cell.column)] += p;
        if (cell.row == cell.column)
            s.diagonal += p;
    }
    return s;
}

// Σ_i Σ_j r_i c_j (i − j)^p for p ≤ 4, from moments about each side's mean (i − j = X − Y + d
// with X = i − μ_r, Y = j − μ_c, d = μ_r − μ_c, expanded binomially), so nothing of the size of
// k^p cancels: O(k) instead of a sum over k² pairs.
double positionMoment(const std::vector<double> &r, const std::vector<double> &c, int p)
{
    const auto mean = [](const std::vector<double> &x) {
        double total = 0, first = 0;
        for (std::size_t i = 0; i < x.size(); ++i) {
            total += x[i];
            first += x[i] * double(i);
        }
        return total > 0 ? first / total : 0.0;
    };
    const double muR = mean(r), muC = mean(c), d = muR - muC;
    std::vector<double> rMoments(std::size_t(p) + 1, 0.0); // Σ r_i X^a
    std::vector<double> cMoments(std::size_t(p) + 1, 0.0); // Σ c_j (d − Y)^b
    for (std::size_t i = 0; i < r.size(); ++i) {
        const double x = double(i) - muR;
        const double y = d - (double(i) - muC);
        double xa = 1, yb = 1;
        for (int a = 0; a <= p; ++a) {
            rMoments[std::size_t(a)] += r[i] * xa;
            cMoments[std::size_t(a)] += c[i] * yb;
            xa *= x;
            yb *= y;
        }
    }
    double sum = 0, binomial = 1;
    for (int a = 0; a <= p; ++a) {
        sum += binomial * rMoments[std::size_t(a)] * cMoments[std::size_t(p - a)];
        binomial = binomial * double(p - a) / double(a + 1);
    }
    return sum;
}

// For every position i: Σ_j x_j |i − j|, from running sums (O(k)).
std::vector<double> absoluteDistances(const std::vector<double> &x)
{
    double total = 0, moment = 0;
    for (std::size_t j = 0; j < x.size(); ++j) {
        total += x[j];
        moment += x[j] * double(j);
    }
    std::vector<double> out(x.size(), 0.0);
    double below = 0, belowMoment = 0; // Σ_{j<i} x_j and Σ_{j<i} j x_j
    for (std::size_t i = 0; i < x.size(); ++i) {
        const double position = double(i);
        const double above = total - below - x[i];
        const double aboveMoment = moment - belowMoment - x[i] * position;
        out[i] = (position * below - belowMoment) + (aboveMoment - position * above);
        below += x[i];
        belowMoment += x[i] * position;
    }
    return out;
}

// The disagreement weights w_ij of Cohen (1968): 1 − δ_ij for unweighted kappa (Cohen 1960 is
// the special case), |i − j| or (i − j)² by category position, or a custom k × k matrix.
class DisagreementWeights
{
public:
    // What kappa and its standard errors need of the weights, given the marginal shares r (rows)
    // and c (columns); w' = 1 − w / w_max are the agreement weights.
    struct Sums {
        double wMax = 0;
        double expected = 0; // Σ_ij w_ij r_i c_j
        std::vector<double> byRow; // Σ_j c_j w_ij, per row i
        std::vector<double> byColumn; // Σ_i r_i w_ij, per column j
        double agreementSquares = 0; // Σ_ij r_i c_j w'_ij²
    };

    // A reason when the custom weights are unusable for k categories, else empty.
    UndefinedReason set(int k, KappaWeights kind, const std::vector<double> &custom)
    {
        m_k = k;
        m_kind = kind;
        if (kind != KappaWeights::Custom)
            return {};
        if (custom.size() != std::size_t(k) * std::size_t(k))
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
        m_custom = &custom;
        return {};
    }

    double operator()(int i, int j) const
    {
        const double d = std::abs(double(i - j));
        switch (m_kind) {
        case KappaWeights::None:
            return i == j ? 0.0 : 1.0;
        case KappaWeights::Linear:
            return d;
        case KappaWeights::Quadratic:
            return d * d;
        case KappaWeights::Custom:
            return (*m_custom)[at(i, j, m_k)];
        }
        return 0;
    }

    Sums sums(const std::vector<double> &r, const std::vector<double> &c) const
    {
        Sums s;
        const std::size_t k = std::size_t(m_k);
        double rTotal = 0, cTotal = 0;
        for (std::size_t i = 0; i < k; ++i) {
            rTotal += r[i];
            cTotal += c[i];
        }
        const double both = rTotal * cTotal; // Σ_ij r_i c_j, 1 up to rounding
        switch (m_kind) {
        case KappaWeights::None: {
            double same = 0;
            s.byRow.resize(k);
            s.byColumn.resize(k);
            for (std::size_t i = 0; i < k; ++i) {
                same += r[i] * c[i];
                s.byRow[i] = cTotal - c[i];
                s.byColumn[i] = rTotal - r[i];
            }
            s.wMax = 1;
            s.expected = both - same;
            s.agreementSquares = same;
            break;
        }
        case KappaWeights::Linear: {
            s.wMax = double(m_k - 1);
            s.byRow = absoluteDistances(c);
            s.byColumn = absoluteDistances(r);
            for (std::size_t i = 0; i < k; ++i)
                s.expected += r[i] * s.byRow[i];
            // (1 − |i − j|/W)² = 1 − 2|i − j|/W + (i − j)²/W².
            s.agreementSquares =
                both - 2 * s.expected / s.wMax + positionMoment(r, c, 2) / (s.wMax * s.wMax);
            break;
        }
        case KappaWeights::Quadratic: {
            s.wMax = double(m_k - 1) * double(m_k - 1);
            // Σ_j c_j (i − j)² = C (i − μ_c)² + Σ_j c_j (j − μ_c)², likewise for the columns.
            const auto spread = [&](const std::vector<double> &x, double total) {
                double mu = 0;
                for (std::size_t i = 0; i < k; ++i)
                    mu += x[i] * double(i);
                mu = total > 0 ? mu / total : 0.0;
                double variance = 0;
                for (std::size_t i = 0; i < k; ++i)
                    variance += x[i] * (double(i) - mu) * (double(i) - mu);
                std::vector<double> out(k);
                for (std::size_t i = 0; i < k; ++i)
                    out[i] = total * (double(i) - mu) * (double(i) - mu) + variance;
                return out;
            };
            s.byRow = spread(c, cTotal);
            s.byColumn = spread(r, rTotal);
            for (std::size_t i = 0; i < k; ++i)
                s.expected += r[i] * s.byRow[i];
            // (1 − (i − j)²/W)² = 1 − 2(i − j)²/W + (i − j)⁴/W².
            s.agreementSquares =
                both - 2 * s.expected / s.wMax + positionMoment(r, c, 4) / (s.wMax * s.wMax);
            break;
        }
        case KappaWeights::Custom: {
            const std::vector<double> &w = *m_custom;
            s.wMax = *std::max_element(w.begin(), w.end());
            s.byRow.assign(k, 0.0);
            s.byColumn.assign(k, 0.0);
            for (std::size_t i = 0; i < k; ++i) {
                for (std::size_t j = 0; j < k; ++j) {
                    const double x = w[i * k + j];
                    const double agree = 1 - x / s.wMax;
                    s.byRow[i] += c[j] * x;
                    s.byColumn[j] += r[i] * x;
                    s.expected += r[i] * c[j] * x;
                    s.agreementSquares += r[i] * c[j] * agree * agree;
                }
            }
            break;
        }
        }
        return s;
    }

private:
    int m_k = 0;
    KappaWeights m_kind = KappaWeights::None;
    const std::vector<double> *m_custom = nullptr;
};

} // namespace

ContingencyTable::ContingencyTable(int k, const std::vector<double> &counts)
    : categories(k)
{
    if (k < 0 || counts.size() != std::size_t(k) * std::size_t(k)) {
        malformed = true;
        return;
    }
    for (int i = 0; i < k; ++i)
        for (int j = 0; j < k; ++j)
            if (const double count = counts[at(i, j, k)]; count != 0)
                cells.push_back({i, j, count});
}

std::vector<double> ContingencyTable::dense() const
{
    const int k = std::max(categories, 0);
    std::vector<double> out(std::size_t(k) * std::size_t(k), 0.0);
    for (const TableCell &cell : cells)
        if (isCode(cell.row, k) && isCode(cell.column, k))
            out[at(cell.row, cell.column, k)] += cell.count;
    return out;
}

double ContingencyTable::total() const
{
    double sum = 0;
    for (const TableCell &cell : cells)
        sum += cell.count;
    return sum;
}

ContingencyTable contingencyTable(const ReliabilityData &data, int coderA, int coderB)
{
    ContingencyTable table;
    table.categories = std::max(data.values, 0);
    const int k = table.categories;
    if (!wellFormed(data) || coderA < 0 || coderA >= data.coders || coderB < 0
        || coderB >= data.coders)
        return table;
    const std::size_t kk = std::size_t(k) * std::size_t(k);
    if (kk <= (std::size_t(1) << 16) && kk <= 4 * std::size_t(data.units)) {
        std::vector<double> counts(kk, 0.0);
        for (int u = 0; u < data.units; ++u) {
            const int a = data.at(u, coderA);
            const int b = data.at(u, coderB);
            if (isCode(a, k) && isCode(b, k))
                counts[at(a, b, k)] += 1.0;
        }
        return ContingencyTable(k, counts);
    }
    // Many categories: the pairs that occur, sorted and counted.
    std::vector<std::uint64_t> pairs;
    for (int u = 0; u < data.units; ++u) {
        const int a = data.at(u, coderA);
        const int b = data.at(u, coderB);
        if (isCode(a, k) && isCode(b, k))
            pairs.push_back(std::uint64_t(a) << 32 | std::uint32_t(b));
    }
    std::sort(pairs.begin(), pairs.end());
    for (std::size_t i = 0; i < pairs.size();) {
        std::size_t j = i;
        while (j < pairs.size() && pairs[j] == pairs[i])
            ++j;
        table.cells.push_back({int(pairs[i] >> 32), int(pairs[i] & 0xFFFFFFFFu), double(j - i)});
        i = j;
    }
    return table;
}

std::vector<ContingencyTable> pairContingencyTables(const ReliabilityData &data)
{
    const int coders = std::max(data.coders, 0);
    const int k = std::max(data.values, 0);
    const std::size_t kk = std::size_t(k) * std::size_t(k);
    std::vector<std::pair<int, int>> pairs;
    for (int a = 0; a < coders; ++a)
        for (int b = a + 1; b < coders; ++b)
            pairs.emplace_back(a, b);
    std::vector<ContingencyTable> out;
    // Many categories (or malformed data): pair by pair, as contingencyTable counts them.
    if (!wellFormed(data) || kk > (std::size_t(1) << 16) || kk > 4 * std::size_t(data.units)) {
        for (const auto &[a, b] : pairs)
            out.push_back(contingencyTable(data, a, b));
        return out;
    }
    std::vector<double> counts(pairs.size() * kk, 0.0);
    std::vector<int> row(static_cast<std::size_t>(coders));
    for (int u = 0; u < data.units; ++u) {
        for (int c = 0; c < coders; ++c)
            row[std::size_t(c)] = data.at(u, c);
        double *table = counts.data();
        for (int a = 0; a < coders; ++a)
            for (int b = a + 1; b < coders; ++b, table += kk) {
                const int x = row[std::size_t(a)];
                const int y = row[std::size_t(b)];
                if (isCode(x, k) && isCode(y, k))
                    table[at(x, y, k)] += 1.0;
            }
    }
    for (std::size_t p = 0; p < pairs.size(); ++p)
        out.emplace_back(k,
            std::vector<double>(counts.begin() + std::ptrdiff_t(p * kk),
                counts.begin() + std::ptrdiff_t((p + 1) * kk)));
    return out;
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
    DisagreementWeights w;
    if (UndefinedReason bad = w.set(k, weights, customWeights); !bad.empty()) {
        r.reason = std::move(bad);
        return r;
    }
    const DisagreementWeights::Sums sums = w.sums(s->rows, s->columns);
    const double wMax = sums.wMax;

    // Cohen (1968): observed and chance-expected weighted disagreement, Σ w_ij p_ij and
    // Σ w_ij p_i. p_.j; with w_ij = 1 − δ_ij they are 1 − p_o and 1 − p_e of Cohen (1960).
    double dObserved = 0;
    for (const TableCell &cell : s->cells)
        dObserved += w(cell.row, cell.column) * cell.count;
    const double dExpected = sums.expected;
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
    // p_i. p_.j, so each bracket is a variance. The first runs over the table's non-zero cells,
    // about its mean (no cancellation; 0 at perfect agreement). The second runs over all k²
    // pairs; expanded with Σ_j p_.j w'_ij = w̄_i. and Σ_i p_i. w̄_i. = Σ_j p_.j w̄_.j = p_e it is
    // Σ p_i. p_.j w'_ij² − Σ p_i. w̄_i.² − Σ p_.j w̄_.j² + p_e², which needs O(k) sums only.
    std::vector<double> rowMean(static_cast<std::size_t>(k));
    std::vector<double> columnMean(static_cast<std::size_t>(k));
    double rTotal = 0, cTotal = 0;
    for (std::size_t i = 0; i < std::size_t(k); ++i) {
        rTotal += s->rows[i];
        cTotal += s->columns[i];
    }
    for (std::size_t i = 0; i < std::size_t(k); ++i) {
        rowMean[i] = cTotal - sums.byRow[i] / wMax;
        columnMean[i] = rTotal - sums.byColumn[i] / wMax;
    }
    auto nonNull = [&](const TableCell &cell) {
        const double agree = 1 - w(cell.row, cell.column) / wMax;
        return agree * qExpected
            - (rowMean[std::size_t(cell.row)] + columnMean[std::size_t(cell.column)]) * qObserved;
    };
    double meanNonNull = 0;
    for (const TableCell &cell : s->cells)
        meanNonNull += cell.count * nonNull(cell);
    double sumNonNull = 0;
    for (const TableCell &cell : s->cells) {
        const double a = nonNull(cell) - meanNonNull;
        sumNonNull += cell.count * a * a;
    }
    double rowSquares = 0, columnSquares = 0;
    for (std::size_t i = 0; i < std::size_t(k); ++i) {
        rowSquares += s->rows[i] * rowMean[i] * rowMean[i];
        columnSquares += s->columns[i] * columnMean[i] * columnMean[i];
    }
    const double pe = r.chanceAgreement;
    const double sumNull = sums.agreementSquares - rowSquares - columnSquares + pe * pe;
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
    const double pObserved = s->diagonal;
    double pExpected = 0;
    for (int i = 0; i < table.categories; ++i) {
        const double pooled = (s->rows[std::size_t(i)] + s->columns[std::size_t(i)]) / 2;
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
    const double pObserved = s->diagonal;
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
    const double alike = s->diagonal;
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

void SubjectCounts::addSubject(const std::vector<double> &counts)
{
    for (std::size_t j = 0; j < counts.size(); ++j)
        if (counts[j] != 0)
            entries.emplace_back(int(j), counts[j]);
    starts.push_back(entries.size());
}

// The sums Fleiss (1971) needs, subject by subject, so that a subject's counts are read once
// and never stored: Σ_i n_ij per category, Σ_i n_ij (n − n_ij) per category and Σ_i P_i.
class FleissSums
{
public:
    FleissSums(std::size_t categories, double raters)
        : m_n(raters)
        , m_shares(categories, 0.0)
        , m_disagreeing(categories, 0.0)
    { }

    // One subject's non-zero counts as (category, count); zero counts add nothing.
    template<typename Entries>
    void add(const Entries &entries)
    {
        double squares = 0;
        for (const auto &[category, c] : entries) {
            m_shares[std::size_t(category)] += c;
            m_disagreeing[std::size_t(category)] += c * (m_n - c);
            squares += c * c;
        }
        m_pBar += (squares - m_n) / (m_n * (m_n - 1));
        ++m_subjects;
    }

    FleissResult result()
    {
        FleissResult r;
        r.subjects = m_subjects;
        r.ratersPerSubject = m_n;
        if (m_subjects == 0) {
            r.reason = "there are no subjects";
            return r;
        }
        const double bigN = m_subjects, n = m_n;
        const std::size_t k = m_shares.size();
        // Fleiss (1971): p_j = Σ_i n_ij / (N n); P_i = (Σ_j n_ij² − n) / (n (n − 1));
        // P̄ = Σ P_i / N; P̄e = Σ p_j²; κ = (P̄ − P̄e) / (1 − P̄e).
        r.categoryShares = std::move(m_shares);
        const double pBar = m_pBar / bigN;
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
            r.perCategory[j] = 1 - m_disagreeing[j] / (bigN * n * (n - 1) * pq);
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
        const double nullVariance =
            nullVarianceJ * (sumPQ * sumPQ - sumPQQminusP) / (sumPQ * sumPQ);
        r.nullStandardError = std::sqrt(std::max(nullVariance, 0.0));
        return r;
    }

private:
    double m_n;
    std::vector<double> m_shares;
    std::vector<double> m_disagreeing;
    double m_pBar = 0;
    int m_subjects = 0;
};

FleissResult fleissKappa(const SubjectCounts &counts)
{
    FleissResult r;
    const int subjects = counts.subjects();
    if (subjects <= 0) {
        r.reason = "there are no subjects";
        return r;
    }
    const std::size_t k = std::size_t(std::max(counts.categories, 0));
    if (k == 0) {
        r.reason = "there are no categories";
        return r;
    }
    const auto row = [&](int i) {
        return std::span(counts.entries.data() + counts.starts[std::size_t(i)],
            counts.starts[std::size_t(i) + 1] - counts.starts[std::size_t(i)]);
    };
    double raters = 0;
    for (int i = 0; i < subjects; ++i) {
        double sum = 0;
        for (const auto &[category, c] : row(i)) {
            if (category < 0 || std::size_t(category) >= k) {
                r.reason = "subject " + std::to_string(i + 1) + " has a count for category "
                    + std::to_string(category) + ", outside 0.." + std::to_string(k - 1);
                return r;
            }
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
    if (raters < 2) {
        r.reason = "Fleiss' kappa needs at least two ratings per subject";
        return r;
    }
    FleissSums sums(k, raters);
    for (int i = 0; i < subjects; ++i)
        sums.add(row(i));
    return sums.result();
}

FleissResult fleissKappa(const std::vector<std::vector<double>> &counts)
{
    SubjectCounts sparse;
    sparse.categories = counts.empty() ? 0 : int(counts.front().size());
    for (std::size_t i = 0; i < counts.size(); ++i) {
        if (counts[i].size() != std::size_t(sparse.categories)) {
            FleissResult r;
            r.reason = "subject " + std::to_string(i + 1) + " has "
                + std::to_string(counts[i].size()) + " categories, subject 1 has "
                + std::to_string(sparse.categories);
            return r;
        }
        sparse.addSubject(counts[i]);
    }
    return fleissKappa(sparse);
}

FleissResult fleissKappa(const ReliabilityData &data)
{
    if (!wellFormed(data) || data.coders == 0) {
        FleissResult r;
        r.reason = data.coders == 0 && wellFormed(data) ? "there are no subjects" : kMalformedData;
        return r;
    }
    if (data.values <= 0) {
        FleissResult r;
        r.reason = "there are no categories";
        return r;
    }
    if (data.coders < 2) {
        FleissResult r;
        r.reason = "Fleiss' kappa needs at least two ratings per subject";
        return r;
    }
    FleissSums sums(std::size_t(data.values), double(data.coders));
    std::vector<int> row;
    std::vector<std::pair<int, double>> entries;
    for (int u = 0; u < data.units; ++u) {
        row.clear();
        bool complete = true;
        for (int c = 0; c < data.coders && complete; ++c) {
            const int v = data.at(u, c);
            complete = isCode(v, data.values);
            row.push_back(v);
        }
        if (!complete)
            continue;
        std::sort(row.begin(), row.end());
        entries.clear();
        for (std::size_t i = 0; i < row.size();) {
            std::size_t j = i;
            while (j < row.size() && row[j] == row[i])
                ++j;
            entries.emplace_back(row[i], double(j - i));
            i = j;
        }
        sums.add(entries);
    }
    return sums.result();
}

SubjectCounts categoryCounts(const ReliabilityData &data)
{
    SubjectCounts counts;
    counts.categories = std::max(data.values, 0);
    if (!wellFormed(data) || data.coders == 0)
        return counts;
    std::vector<int> row;
    for (int u = 0; u < data.units; ++u) {
        row.clear();
        bool complete = true;
        for (int c = 0; c < data.coders && complete; ++c) {
            const int v = data.at(u, c);
            complete = isCode(v, data.values);
            if (complete)
                row.push_back(v);
        }
        if (!complete)
            continue;
        std::sort(row.begin(), row.end());
        for (std::size_t i = 0; i < row.size();) {
            std::size_t j = i;
            while (j < row.size() && row[j] == row[i])
                ++j;
            counts.entries.emplace_back(row[i], double(j - i));
            i = j;
        }
        counts.starts.push_back(counts.entries.size());
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
    return lightKappa(pairContingencyTables(data), data.coders);
}

SimpleAgreement lightKappa(const std::vector<ContingencyTable> &pairTables, int coders)
{
    SimpleAgreement r;
    if (coders < 2) {
        r.reason = "Light's kappa needs at least two coders";
        return r;
    }
    if (pairTables.size() != std::size_t(coders) * std::size_t(coders - 1) / 2) {
        r.reason = "Light's kappa needs the table of every pair of coders";
        return r;
    }
    // Light (1971): the unweighted mean of the pairwise Cohen's kappas.
    double sum = 0;
    std::size_t pair = 0;
    for (int a = 0; a < coders; ++a) {
        for (int b = a + 1; b < coders; ++b, ++pair) {
            const KappaResult kappa = cohenKappa(pairTables[pair]);
            if (!kappa.value) {
                r.reason = "Cohen's kappa of coders " + std::to_string(a) + " and "
                    + std::to_string(b) + " is undefined: " + kappa.reason;
                return r;
            }
            sum += *kappa.value;
        }
    }
    r.value = sum / double(pair);
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
