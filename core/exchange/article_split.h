#pragma once
// Train/dev/test splits by article: no article in two splits, stratified by which framing
// functions an article carries, reproducible from a seed.
//
// Method (stratified random assignment; common practice): the stratum of an article is the set
// of functions present in it (16 possible). Within each stratum, articles are put in a seeded
// random order (Fisher–Yates with std::mt19937_64, bounded draws by rejection, so the result
// does not depend on the standard library). Each stratum of n articles gives split s
// ⌊n·ratio_s⌋ articles; the leftover articles go one by one to the split furthest below its
// share of all articles assigned so far (ties: the earlier split). The first articles of the
// stratum's order go to the first split, and so on.

#include "core/model/error.h"

#include <QString>
#include <QStringList>

#include <cstdint>
#include <vector>

namespace fourfold {

struct SplitRatios {
    QStringList names; // e.g. train, dev, test
    std::vector<double> ratios; // shares, summing to 1

    // Parses "80/10/10" (train/dev/test) or "90/10" (train/test): whole numbers summing to 100.
    // Fails with InvalidArgument naming the text otherwise.
    static Result<SplitRatios> parse(const QString &text);
    // "80/10/10".
    QString text() const;
};

// The split (index into ratios.names) of each article. `strata[i]` is article i's stratum
// (e.g. its function-presence mask); articles are identified by position, and the result does
// not depend on the order in which they are given as long as `keys` (unique per article, e.g.
// the external id) are the same: articles are sorted by key before shuffling.
std::vector<int> splitArticles(const std::vector<unsigned> &strata, const QStringList &keys,
    const SplitRatios &ratios, std::uint64_t seed);

} // namespace fourfold
