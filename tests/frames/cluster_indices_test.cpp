#include "core/frames/cluster_indices.h"
#include "tests/frames/frame_test_data.h"
#include "tests/frames/python_reference.h"

#include <catch2/catch.hpp>

#include <cmath>

using namespace fourfold;
using namespace fourfold::frames;
using fourfold::test::jsonInts;
using fourfold::test::jsonRows;

TEST_CASE("Mean silhouette and Calinski–Harabasz equal sklearn.metrics")
{
    // Reference: sklearn.metrics.silhouette_score (metric="euclidean") and
    // calinski_harabasz_score (Debian python3-sklearn).
    std::vector<FrameMatrix> data;
    std::vector<Partition> partitions;
    QJsonArray requests;
    for (std::uint64_t seed = 1; seed <= 10; ++seed) {
        const std::size_t n = 20 + 31 * seed;
        const int k = 2 + int(seed % 7);
        data.push_back(seed % 3 == 0 ? test::randomBinary(n, 9, 0.3, seed)
                                     : test::randomContinuous(n, 1 + seed % 6, seed));
        Partition p;
        p.labels = test::randomLabels(n, k, 77 + seed);
        p.clusters = k;
        if (seed == 4) {
            // A cluster of one article: its silhouette is 0 (Rousseeuw 1987, p. 55).
            p.clusters = k + 1;
            p.labels[n - 1] = k;
        }
        partitions.push_back(p);
        requests.append(QJsonObject {
            {"op", "silhouette"}, {"data", jsonRows(data.back())}, {"labels", jsonInts(p.labels)}});
        requests.append(QJsonObject {
            {"op", "ch"}, {"data", jsonRows(data.back())}, {"labels", jsonInts(p.labels)}});
    }
    const QJsonArray reference = test::referenceResults(requests);
    for (int threads : {1, 2}) {
        for (std::size_t s = 0; s < data.size(); ++s) {
            INFO("case " << s << ", threads " << threads);
            const std::vector<IndexValue> silhouettes =
                meanSilhouettes(data[s], {partitions[s]}, threads);
            REQUIRE(silhouettes.size() == 1);
            REQUIRE(silhouettes[0].value);
            CHECK(std::abs(*silhouettes[0].value - reference[qsizetype(2 * s)].toDouble()) <= 1e-9);
            const IndexValue ch = calinskiHarabasz(data[s], partitions[s]);
            REQUIRE(ch.value);
            const double expected = reference[qsizetype(2 * s + 1)].toDouble();
            CHECK(std::abs(*ch.value - expected) <= 1e-9 * std::max(1.0, expected));
        }
    }
    // All partitions in one pass give what each gives alone.
    const std::vector<IndexValue> together =
        meanSilhouettes(data[2], {partitions[2], partitions[2]}, 2);
    CHECK(together[0].value == together[1].value);
}

TEST_CASE(
    "Silhouette and Calinski–Harabasz are undefined for one cluster or one article per cluster")
{
    const FrameMatrix data = test::randomContinuous(5, 2, 3);
    Partition one {{0, 0, 0, 0, 0}, 1};
    Partition each {{0, 1, 2, 3, 4}, 5};
    const auto s = meanSilhouettes(data, {one, each});
    CHECK(!s[0].value);
    CHECK(!s[1].value);
    CHECK(!s[0].reason.empty());
    CHECK(!calinskiHarabasz(data, one).value);
    CHECK(!calinskiHarabasz(data, each).value);
}

TEST_CASE("Fusion-coefficient jump is the step in Ward's heights from k to k minus one clusters")
{
    // Heights 1, 2, 5, 6 for five articles: k = 2 leaves after merge 3 (height 5); the next merge
    // is at 6: jump 1. k = 3: 5 − 2 = 3. k = 4: 2 − 1 = 1.
    const std::vector<WardMerge> schedule {{0, 1, 1, 2}, {2, 3, 2, 2}, {5, 6, 5, 4}, {4, 7, 6, 5}};
    CHECK(*fusionJump(schedule, 5, 2).value == 1);
    CHECK(*fusionJump(schedule, 5, 3).value == 3);
    CHECK(*fusionJump(schedule, 5, 4).value == 1);
    CHECK(!fusionJump(schedule, 5, 1).value);
    CHECK(!fusionJump(schedule, 5, 5).value);
}
