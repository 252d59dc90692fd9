#pragma once
// Distances between sets of labels for alpha on set-valued units (a unit carrying several
// framing functions): Jaccard and MASI (Passonneau 2006; Artstein & Poesio 2008, §5).

#include <vector>

namespace fourfold::reliability {

enum class SetDistance { Jaccard, Masi };

// 1 − |A∩B| / |A∪B|, in [0, 1]. Convention: d(∅, ∅) = 0 and d(∅, A) = 1 for a non-empty A.
// The sets may be unsorted and hold repeats; they are taken as sets.
double jaccardDistance(const std::vector<int> &a, const std::vector<int> &b);
// 1 − J·M with M = 1 if A = B, 2/3 if one contains the other, 1/3 if they overlap otherwise, 0
// if disjoint (exact thirds, not NLTK's rounded 0.67/0.33), in [0, 1]. Same empty-set
// convention and input rules as jaccardDistance().
double masiDistance(const std::vector<int> &a, const std::vector<int> &b);

// The custom metric matrix between the given distinct sets (each sorted, without repeats):
// sets.size() × sets.size(), row-major, symmetric with a zero diagonal, ready for
// Metric::custom when value code i stands for sets[i].
std::vector<double> setDistanceMatrix(const std::vector<std::vector<int>> &sets, SetDistance kind);

} // namespace fourfold::reliability
