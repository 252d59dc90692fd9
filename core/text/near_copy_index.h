#pragma once
// Locality-sensitive hashing over MinHash signatures (banding: Indyk and Motwani 1998; Leskovec,
// Rajaraman and Ullman, Mining of Massive Datasets, §3.4): the 128 minima are cut into bands of
// r rows; two texts are candidates when all r minima of at least one band agree, and only
// candidates are compared in full. A pair of true Jaccard similarity s becomes a candidate with
// probability 1 - (1 - s^r)^(128/r). The index takes the largest r (fewest candidates) for which
// that probability is at least 0.999 at s = threshold - 0.1, so a pair at the threshold is missed
// by the banding less than once in a thousand (threshold 0.8: r = 4, 32 bands, and a pair at
// s = 0.8 is missed with probability 5e-8). Each lookup costs the bands' hash look-ups and
// the candidates found, not the number of texts held: checking n texts is linear in n.

#include "core/text/minhash.h"

#include <QHash>

#include <cstdint>
#include <vector>

namespace fourfold {

struct NearCopyMatch {
    qint64 id = 0; // as given to add()
    double similarity = 0.0; // estimatedJaccard
};

class NearCopyIndex
{
public:
    // `threshold` in (0, 1]: the least estimated Jaccard similarity that is a near copy.
    explicit NearCopyIndex(double threshold);

    double threshold() const { return m_threshold; }
    int rowsPerBand() const { return m_rows; }
    qsizetype size() const { return qsizetype(m_ids.size()); }

    // Holds `signature` under `id` (an empty signature is not held: it matches nothing).
    void add(qint64 id, const MinHashSignature &signature);
    // The texts held whose estimated similarity to `signature` reaches the threshold, most
    // similar first (equal similarity: smaller id first).
    std::vector<NearCopyMatch> matches(const MinHashSignature &signature) const;
    // How many candidates (texts sharing a band) the lookups so far compared in full.
    qint64 candidatesCompared() const { return m_compared; }

private:
    std::uint64_t bandKey(const MinHashSignature &signature, int band) const;

    double m_threshold;
    int m_rows;
    int m_bands;
    std::vector<qint64> m_ids;
    std::vector<MinHashSignature> m_signatures;
    // Per band: band key → the last entry with that key; m_next chains the earlier ones.
    std::vector<QHash<std::uint64_t, qint32>> m_heads;
    std::vector<std::vector<qint32>> m_next;
    mutable qint64 m_compared = 0;
};

} // namespace fourfold
