#include "core/reliability/set_distance.h"

#include <algorithm>
#include <iterator>

namespace fourfold::reliability {

namespace {

struct Overlap {
    std::size_t sizeA = 0;
    std::size_t sizeB = 0;
    std::size_t common = 0;
    std::size_t all() const { return sizeA + sizeB - common; }
};

// Callers may pass unsorted sets with repeats: both are normalised first.
Overlap overlap(std::vector<int> a, std::vector<int> b)
{
    std::sort(a.begin(), a.end());
    a.erase(std::unique(a.begin(), a.end()), a.end());
    std::sort(b.begin(), b.end());
    b.erase(std::unique(b.begin(), b.end()), b.end());
    std::vector<int> common;
    std::set_intersection(a.begin(), a.end(), b.begin(), b.end(), std::back_inserter(common));
    return {a.size(), b.size(), common.size()};
}

} // namespace

double jaccardDistance(const std::vector<int> &a, const std::vector<int> &b)
{
    const Overlap o = overlap(a, b);
    // Convention chosen for Fourfold: two empty sets (a unit coded with no function by both
    // coders) agree; the ratio would be 0/0.
    if (o.all() == 0)
        return 0.0;
    // Jaccard distance 1 − |A∩B| / |A∪B| (Artstein & Poesio 2008, §5).
    return 1.0 - double(o.common) / double(o.all());
}

double masiDistance(const std::vector<int> &a, const std::vector<int> &b)
{
    const Overlap o = overlap(a, b);
    if (o.all() == 0)
        return 0.0; // same convention as jaccardDistance
    // MASI = 1 − J·M (Passonneau 2006): M = 1 if A = B, 2/3 if one contains the other, 1/3 if
    // they overlap otherwise, 0 if disjoint; exact thirds.
    double monotonicity = 0.0;
    if (o.common == o.sizeA && o.common == o.sizeB)
        monotonicity = 1.0;
    else if (o.common == o.sizeA || o.common == o.sizeB)
        monotonicity = 2.0 / 3.0;
    else if (o.common > 0)
        monotonicity = 1.0 / 3.0;
    const double jaccard = double(o.common) / double(o.all());
    return 1.0 - jaccard * monotonicity;
}

std::vector<double> setDistanceMatrix(const std::vector<std::vector<int>> &sets, SetDistance kind)
{
    const std::size_t v = sets.size();
    std::vector<double> matrix(v * v, 0.0);
    for (std::size_t a = 0; a < v; ++a) {
        for (std::size_t b = a + 1; b < v; ++b) {
            const double d = kind == SetDistance::Jaccard ? jaccardDistance(sets[a], sets[b])
                                                          : masiDistance(sets[a], sets[b]);
            matrix[a * v + b] = matrix[b * v + a] = d;
        }
    }
    return matrix;
}

} // namespace fourfold::reliability
