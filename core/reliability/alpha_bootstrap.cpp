#include "core/reliability/alpha_bootstrap.h"

#include "core/reliability/krippendorff_alpha.h"

#include <algorithm>
#include <cmath>
#include <map>
#include <random>
#include <system_error>
#include <thread>

namespace fourfold::reliability {

namespace {

// SplitMix64 (Steele, Lea & Flood 2014, "Fast splittable pseudorandom number generators",
// OOPSLA; constants of Vigna's reference code): output r of the generator started at `seed`.
// Seeds one std::mt19937_64 per replicate, so a replicate's draws depend on (seed, r) only.
std::uint64_t replicateSeed(std::uint64_t seed, std::uint64_t r)
{
    std::uint64_t z = seed + (r + 1) * 0x9E3779B97F4A7C15ULL;
    z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9ULL;
    z = (z ^ (z >> 27)) * 0x94D049BB133111EBULL;
    return z ^ (z >> 31);
}

// M independent draws from cells with probabilities p_1..p_K, recorded as how many draws fell
// into each cell: the counts are multinomial (M; p_1..p_K), and are drawn as such, cell by cell,
// count_i ~ Binomial(M − Σ_{j<i} count_j, p_i / Σ_{j≥i} p_j) (the conditional method; Devroye
// 1986, Non-Uniform Random Variate Generation, ch. XI, from memory). The counts have exactly the
// distribution of M separate draws, at a cost that does not grow with M.
class DrawCounts
{
public:
    explicit DrawCounts(const std::vector<double> &weights)
        : m_conditional(weights.size(), 0.0)
    {
        double rest = 0; // Σ_{j≥i} weight_j, summed from the end so no cell loses its share
        for (std::size_t i = weights.size(); i-- > 0;) {
            rest += weights[i];
            m_conditional[i] = rest > 0 ? std::min(1.0, weights[i] / rest) : 0.0;
        }
    }

    void draw(std::int64_t m, std::mt19937_64 &generator, std::vector<std::int64_t> &counts) const
    {
        counts.assign(m_conditional.size(), 0);
        std::int64_t left = m;
        for (std::size_t i = 0; i < m_conditional.size() && left > 0; ++i) {
            const double p = m_conditional[i];
            if (p >= 1.0) {
                counts[i] = left; // the last cell with any weight takes all that is left
            } else if (p > 0.0) {
                std::binomial_distribution<std::int64_t> binomial(left, p);
                counts[i] = binomial(generator);
            }
            left -= counts[i];
        }
    }

private:
    std::vector<double> m_conditional; // p_i / Σ_{j≥i} p_j
};

// Runs replicate(r) for r = 0..count-1 on `threads` threads; replicate(r) must only write to
// slots of its own r.
template<typename Replicate>
void runReplicates(int count, int threads, const Replicate &replicate)
{
    const int workers = std::clamp(threads, 1, std::max(count, 1));
    auto work = [&](int first) {
        for (int r = first; r < count; r += workers)
            replicate(r);
    };
    std::vector<std::thread> pool;
    pool.reserve(std::size_t(workers - 1));
    for (int t = 1; t < workers; ++t) {
        try {
            pool.emplace_back(work, t);
        } catch (const std::system_error &) {
            // No thread to be had: this stripe runs here; the results are the same.
            work(t);
        }
    }
    work(0);
    for (std::thread &thread : pool)
        thread.join();
}

struct PairCell {
    double delta = 0;
    bool diagonal = false;
};

// Krippendorff's bootstrap note, steps one to four (see alpha_bootstrap.h).
void pairResampling(const ReliabilityData &data, const AlphaResult &alpha,
    const BootstrapOptions &options, BootstrapResult &result, std::vector<double> &replicateAlphas,
    std::vector<char> &kept)
{
    const CoincidenceMatrix &c = alpha.coincidences;

    // Step one: the segments p_cc = o_cc / n and p_ck = 2 o_ck / n for c < k.
    std::vector<double> weights;
    std::vector<PairCell> cells;
    for (const Coincidence &cell : c.cells) {
        if (cell.c > cell.k || !(cell.o > 0))
            continue;
        weights.push_back(cell.c == cell.k ? cell.o / c.total : 2.0 * cell.o / c.total);
        cells.push_back({alpha.difference(cell.c, cell.k), cell.c == cell.k});
    }
    const DrawCounts sampler(weights);

    // Step two: M, the number of pairs of values within the pairable units.
    std::int64_t draws = options.pairDraws;
    if (draws <= 0) {
        draws = 0;
        const std::size_t coders = std::size_t(data.coders);
        for (std::size_t u = 0; u < std::size_t(data.units); ++u) {
            std::int64_t m = 0;
            for (std::size_t i = 0; i < coders; ++i)
                m += data.cells[u * coders + i] != kMissing ? 1 : 0;
            draws += m * (m - 1) / 2;
        }
    }
    result.draws = draws;

    // Step three, per replicate: M pairs, α* = 1 − (Σ δ² / M) / D_e with D_e held fixed.
    const double expected = alpha.expectedDisagreement;
    std::vector<char> noVariation(replicateAlphas.size(), 0);
    runReplicates(options.replicates, options.threads, [&](int r) {
        std::mt19937_64 generator(replicateSeed(options.seed, std::uint64_t(r)));
        std::vector<std::int64_t> counts;
        sampler.draw(draws, generator, counts);
        double sum = 0;
        bool oneValue = false;
        for (std::size_t i = 0; i < cells.size(); ++i) {
            sum += double(counts[i]) * cells[i].delta;
            if (counts[i] == draws && cells[i].diagonal)
                oneValue = true;
        }
        double value = 1.0 - (sum / double(draws)) / expected;
        // Step four (see alpha_bootstrap.h): no variation scores 0; alpha is not below −1.
        if (oneValue)
            value = 0.0;
        value = std::max(value, -1.0);
        replicateAlphas[std::size_t(r)] = value;
        noVariation[std::size_t(r)] = oneValue ? 1 : 0;
        kept[std::size_t(r)] = 1;
    });
    result.noVariationReplicates = int(std::count(noVariation.begin(), noVariation.end(), 1));
}

// The pairable units grouped by the values they hold: units with the same counts of each value
// add the same to the coincidences, so drawing a unit is drawing its group with probability
// (units in the group) / (pairable units).
struct UnitPattern {
    std::vector<std::pair<std::size_t, double>> cells; // (slot of (c, k), contribution to o_ck)
    double values = 0; // m_u
};

void unitResampling(const ReliabilityData &data, const Metric &metric, const AlphaResult &alpha,
    const BootstrapOptions &options, BootstrapResult &result, std::vector<double> &replicateAlphas,
    std::vector<char> &kept)
{
    const std::size_t coders = std::size_t(data.coders);
    // The (c, k) entries of the coincidence matrix that any unit adds to, in the matrix's order:
    // a replicate's matrix holds at most these.
    const std::vector<Coincidence> &slots = alpha.coincidences.cells;
    const auto slotOf = [&](int c, int k) {
        const Coincidence key {c, k, 0};
        return std::size_t(std::lower_bound(slots.begin(), slots.end(), key,
                               [](const Coincidence &a, const Coincidence &b) {
                                   return a.c != b.c ? a.c < b.c : a.k < b.k;
                               })
            - slots.begin());
    };
    std::map<std::vector<int>, std::size_t> index;
    std::vector<UnitPattern> patterns;
    std::vector<double> weights;
    std::vector<int> present;
    std::vector<std::pair<int, int>> runs; // (value, how many coders gave it), by value
    std::vector<int> key;
    for (std::size_t u = 0; u < std::size_t(data.units); ++u) {
        present.clear();
        for (std::size_t i = 0; i < coders; ++i) {
            if (const int value = data.cells[u * coders + i]; value != kMissing)
                present.push_back(value);
        }
        const int m = int(present.size());
        if (m < 2)
            continue;
        std::sort(present.begin(), present.end());
        runs.clear();
        key.clear();
        for (const int value : present) {
            if (!runs.empty() && runs.back().first == value)
                ++runs.back().second;
            else
                runs.emplace_back(value, 1);
        }
        for (const auto &[value, n] : runs) {
            key.push_back(value);
            key.push_back(n);
        }
        auto [it, inserted] = index.try_emplace(key, patterns.size());
        if (inserted) {
            // n_uc n_uk − [c = k] n_uc, weighted 1 / (m_u − 1) (Krippendorff 2011, §C).
            UnitPattern pattern;
            pattern.values = m;
            for (const auto &[a, na] : runs) {
                for (const auto &[b, nb] : runs) {
                    const double pairs = double(na) * nb - (a == b ? na : 0);
                    if (pairs > 0)
                        pattern.cells.emplace_back(slotOf(a, b), pairs / double(m - 1));
                }
            }
            patterns.push_back(std::move(pattern));
            weights.push_back(0);
        }
        weights[it->second] += 1;
    }
    const DrawCounts sampler(weights);
    const std::int64_t units = alpha.pairableUnits;
    result.draws = units;

    runReplicates(options.replicates, options.threads, [&](int r) {
        std::mt19937_64 generator(replicateSeed(options.seed, std::uint64_t(r)));
        std::vector<std::int64_t> drawn;
        sampler.draw(units, generator, drawn);
        std::vector<double> o(slots.size(), 0.0);
        CoincidenceMatrix c;
        c.values = data.values;
        for (std::size_t p = 0; p < patterns.size(); ++p) {
            if (drawn[p] == 0)
                continue;
            const double times = double(drawn[p]);
            for (const auto &[slot, contribution] : patterns[p].cells)
                o[slot] += times * contribution;
            c.total += times * patterns[p].values;
            c.units += int(drawn[p]);
        }
        c.marginals.assign(std::size_t(data.values), 0.0);
        for (std::size_t slot = 0; slot < slots.size(); ++slot) {
            if (o[slot] == 0)
                continue;
            c.cells.push_back({slots[slot].c, slots[slot].k, o[slot]});
            c.marginals[std::size_t(slots[slot].c)] += o[slot];
        }
        const AlphaResult replicate = krippendorffAlpha(c, metric);
        if (replicate.value) {
            replicateAlphas[std::size_t(r)] = *replicate.value;
            kept[std::size_t(r)] = 1;
        }
    });
}

} // namespace

BootstrapResult bootstrapAlpha(
    const ReliabilityData &data, const Metric &metric, const BootstrapOptions &options)
{
    BootstrapResult result;
    result.method = options.method;
    result.seed = options.seed;
    const AlphaResult alpha = krippendorffAlpha(data, metric);
    if (!alpha.value) {
        result.reason = alpha.reason;
        return result;
    }
    result.alpha = alpha.value;
    if (options.replicates < 1) {
        result.reason = "no bootstrap replicates were requested";
        return result;
    }

    std::vector<double> replicateAlphas(std::size_t(options.replicates), 0.0);
    std::vector<char> kept(std::size_t(options.replicates), 0);
    if (options.method == BootstrapMethod::PairResampling)
        pairResampling(data, alpha, options, result, replicateAlphas, kept);
    else
        unitResampling(data, metric, alpha, options, result, replicateAlphas, kept);
    result.replicates = options.replicates;

    for (std::size_t r = 0; r < replicateAlphas.size(); ++r) {
        if (kept[r])
            result.alphas.push_back(replicateAlphas[r]);
    }
    result.droppedReplicates = options.replicates - int(result.alphas.size());
    if (result.alphas.empty()) {
        result.reason = "alpha is undefined in every bootstrap replicate";
        return result;
    }
    std::sort(result.alphas.begin(), result.alphas.end());

    // Percentile interval: the k-th smallest and k-th largest of the K replicates kept.
    const std::size_t k =
        std::max<std::size_t>(1, std::size_t(std::floor(0.025 * double(result.alphas.size()))));
    result.ciLow = result.alphas[k - 1];
    result.ciHigh = result.alphas[result.alphas.size() - k];

    // q(alpha < alpha_min) (Hayes & Krippendorff 2007): the share of replicates below alpha_min.
    for (const double alphaMin : options.alphaMins) {
        const auto below = std::lower_bound(result.alphas.begin(), result.alphas.end(), alphaMin);
        result.qBelow.emplace_back(
            alphaMin, double(below - result.alphas.begin()) / double(result.alphas.size()));
    }
    return result;
}

const char *bootstrapMethodName(BootstrapMethod method)
{
    switch (method) {
    case BootstrapMethod::PairResampling:
        return "pair-resampling (Hayes & Krippendorff 2007)";
    case BootstrapMethod::UnitResampling:
        return "unit-resampling percentile";
    }
    return "";
}

} // namespace fourfold::reliability
