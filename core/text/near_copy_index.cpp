#include "core/text/near_copy_index.h"

#include <algorithm>
#include <cmath>

namespace fourfold {

namespace {

constexpr std::uint64_t mix64(std::uint64_t z)
{
    z = (z ^ (z >> 30)) * 0xbf58476d1ce4e5b9ULL;
    z = (z ^ (z >> 27)) * 0x94d049bb133111ebULL;
    return z ^ (z >> 31);
}

// The largest number of rows per band (a divisor of 128) for which a pair of similarity
// max(threshold - 0.1, 0.01) becomes a candidate with probability at least 0.999.
int rowsFor(double threshold)
{
    const double s = std::max(threshold - 0.1, 0.01);
    int best = 1;
    for (int rows = 1; rows <= kMinHashPermutations; rows *= 2) {
        const double bands = double(kMinHashPermutations / rows);
        const double found = 1.0 - std::pow(1.0 - std::pow(s, rows), bands);
        if (found >= 0.999)
            best = rows;
    }
    return best;
}

} // namespace

NearCopyIndex::NearCopyIndex(double threshold)
    : m_threshold(threshold)
    , m_rows(rowsFor(threshold))
    , m_bands(kMinHashPermutations / m_rows)
    , m_heads(size_t(m_bands))
    , m_next(size_t(m_bands))
{ }

std::uint64_t NearCopyIndex::bandKey(const MinHashSignature &signature, int band) const
{
    std::uint64_t h = std::uint64_t(band);
    for (int r = 0; r < m_rows; ++r)
        h = mix64(h ^ signature.minima[size_t(band * m_rows + r)]) + std::uint64_t(r);
    return h;
}

void NearCopyIndex::add(qint64 id, const MinHashSignature &signature)
{
    if (signature.empty)
        return;
    const auto entry = qint32(m_ids.size());
    m_ids.push_back(id);
    m_signatures.push_back(signature);
    for (int band = 0; band < m_bands; ++band) {
        auto &heads = m_heads[size_t(band)];
        const auto it = heads.find(bandKey(signature, band));
        if (it == heads.end()) {
            m_next[size_t(band)].push_back(-1);
            heads.insert(bandKey(signature, band), entry);
        } else {
            m_next[size_t(band)].push_back(it.value());
            it.value() = entry;
        }
    }
}

std::vector<NearCopyMatch> NearCopyIndex::matches(const MinHashSignature &signature) const
{
    std::vector<NearCopyMatch> found;
    if (signature.empty)
        return found;
    std::vector<qint32> candidates;
    for (int band = 0; band < m_bands; ++band) {
        const auto &heads = m_heads[size_t(band)];
        const auto it = heads.constFind(bandKey(signature, band));
        if (it == heads.cend())
            continue;
        for (qint32 e = it.value(); e >= 0; e = m_next[size_t(band)][size_t(e)])
            candidates.push_back(e);
    }
    std::ranges::sort(candidates);
    const auto [first, last] = std::ranges::unique(candidates);
    candidates.erase(first, last);
    m_compared += qint64(candidates.size());
    for (const qint32 e : candidates) {
        const double similarity = estimatedJaccard(signature, m_signatures[size_t(e)]);
        if (similarity >= m_threshold - 1e-12)
            found.push_back(NearCopyMatch {m_ids[size_t(e)], similarity});
    }
    std::ranges::sort(found, [](const NearCopyMatch &a, const NearCopyMatch &b) {
        return a.similarity != b.similarity ? a.similarity > b.similarity : a.id < b.id;
    });
    return found;
}

} // namespace fourfold
