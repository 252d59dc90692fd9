#include "core/frames/adjusted_rand.h"
#include "tests/frames/frame_test_data.h"
#include "tests/frames/python_reference.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <numeric>

using namespace fourfold;
using namespace fourfold::frames;
using fourfold::test::jsonInts;

TEST_CASE("Adjusted Rand index equals sklearn's adjusted_rand_score")
{
    // Reference: sklearn.metrics.adjusted_rand_score (Debian python3-sklearn), which implements
    // Hubert & Arabie (1985).
    std::vector<std::pair<Partition, Partition>> pairs;
    QJsonArray requests;
    for (std::uint64_t seed = 1; seed <= 300; ++seed) {
        const std::size_t n = 2 + seed % 50;
        const int ka = 1 + int(seed % 5);
        const int kb = 1 + int((seed / 5) % 6);
        Partition a {
            test::randomLabels(n, std::min<int>(ka, int(n)), seed), std::min<int>(ka, int(n))};
        Partition b {test::randomLabels(n, std::min<int>(kb, int(n)), seed + 1000),
            std::min<int>(kb, int(n))};
        if (seed % 7 == 0)
            b = a; // identical partitions
        if (seed % 11 == 0) { // a relabelled copy with one article moved
            b = a;
            for (int &l : b.labels)
                l = a.clusters - 1 - l;
            b.labels[0] = 0;
        }
        requests.append(
            QJsonObject {{"op", "ari"}, {"a", jsonInts(a.labels)}, {"b", jsonInts(b.labels)}});
        pairs.emplace_back(a, b);
    }
    const QJsonArray reference = test::referenceResults(requests);
    for (std::size_t s = 0; s < pairs.size(); ++s) {
        INFO("case " << s);
        const auto table = crossTable(pairs[s].first, pairs[s].second);
        REQUIRE(table);
        CHECK(std::abs(adjustedRandIndex(*table) - reference[qsizetype(s)].toDouble()) <= 1e-12);
    }
}

TEST_CASE("Best matching of clusters equals the best of all permutations")
{
    // Brute force over every assignment of rows to distinct columns as the oracle.
    for (std::uint64_t seed = 1; seed <= 200; ++seed) {
        const int rows = 1 + int(seed % 5);
        const int columns = 1 + int((seed / 5) % 5);
        std::mt19937_64 generator(seed);
        std::uniform_int_distribution<int> count(0, 9);
        CrossTable table;
        table.rows = rows;
        table.columns = columns;
        for (int i = 0; i < rows * columns; ++i)
            table.counts.push_back(count(generator));
        const std::vector<int> match = bestMatching(table);
        long long total = 0;
        std::vector<char> used(std::size_t(columns), 0);
        int matched = 0;
        for (int r = 0; r < rows; ++r)
            if (match[std::size_t(r)] >= 0) {
                REQUIRE(!used[std::size_t(match[std::size_t(r)])]);
                used[std::size_t(match[std::size_t(r)])] = 1;
                total += table.at(r, match[std::size_t(r)]);
                ++matched;
            }
        CHECK(matched == std::min(rows, columns));
        // Oracle: every injective map of the smaller side.
        std::vector<int> order(std::size_t(std::max(rows, columns)));
        std::iota(order.begin(), order.end(), 0);
        long long best = 0;
        do {
            long long sum = 0;
            for (int r = 0; r < rows; ++r)
                if (order[std::size_t(r)] < columns)
                    sum += table.at(r, order[std::size_t(r)]);
            best = std::max(best, sum);
        } while (std::next_permutation(order.begin(), order.end()));
        INFO("seed " << seed);
        CHECK(total == best);
    }
}

TEST_CASE("Cross-table refuses partitions of different lengths")
{
    CHECK(!crossTable(Partition {{0, 1}, 2}, Partition {{0}, 1}).has_value());
    CHECK(!crossTable(Partition {{0, 2}, 2}, Partition {{0, 0}, 1}).has_value());
}
