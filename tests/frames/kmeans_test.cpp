#include "core/frames/kmeans.h"
#include "core/frames/ward_clustering.h"
#include "tests/frames/frame_test_data.h"
#include "tests/frames/python_reference.h"

#include <catch2/catch.hpp>

#include <cmath>

using namespace fourfold;
using namespace fourfold::frames;
using fourfold::test::jsonRows;

TEST_CASE("k-means from given centres equals scikit-learn's Lloyd KMeans")
{
    // Reference: sklearn.cluster.KMeans(init=centres, n_init=1, algorithm="lloyd", tol=0)
    // (Debian python3-sklearn): labels and inertia after convergence.
    struct Case {
        FrameMatrix data;
        std::vector<double> centres;
    };
    std::vector<Case> cases;
    QJsonArray requests;
    for (std::uint64_t seed = 1; seed <= 12; ++seed) {
        const std::size_t n = 40 + 23 * seed;
        const std::size_t m = 2 + seed % 5;
        const int k = 2 + int(seed % 6);
        Case c;
        c.data = test::randomContinuous(n, m, 500 + seed);
        if (seed % 2 == 0) {
            // The two-step start (Matthes & Kohring 2008): the centroids of Ward's k clusters.
            const auto schedule = wardLinkage(c.data);
            REQUIRE(schedule);
            c.centres = clusterMeans(c.data, cutTree(*schedule, n, k));
        } else {
            // The first k articles as centres.
            c.centres.assign(
                c.data.values.begin(), c.data.values.begin() + std::ptrdiff_t(std::size_t(k) * m));
        }
        requests.append(QJsonObject {
            {"op", "kmeans"}, {"data", jsonRows(c.data)}, {"centres", jsonRows(c.centres, m)}});
        cases.push_back(std::move(c));
    }
    const QJsonArray reference = test::referenceResults(requests);
    for (std::size_t s = 0; s < cases.size(); ++s) {
        INFO("case " << s);
        for (int threads : {1, 2}) {
            KMeansOptions options;
            options.threads = threads;
            const auto result = kMeans(cases[s].data, cases[s].centres, options);
            REQUIRE(result);
            CHECK(result->converged);
            const QJsonObject expected = reference[qsizetype(s)].toObject();
            const QJsonArray labels = expected.value("labels").toArray();
            REQUIRE(std::size_t(labels.size()) == result->partition.labels.size());
            for (std::size_t i = 0; i < result->partition.labels.size(); ++i)
                CHECK(result->partition.labels[i] == labels[qsizetype(i)].toInt());
            const double inertia = expected.value("inertia").toDouble();
            CHECK(std::abs(result->inertia - inertia) <= 1e-9 * std::max(1.0, inertia));
        }
    }
}

TEST_CASE("k-means keeps an empty cluster's centre and refuses centres of the wrong size")
{
    FrameMatrix data;
    data.rows = 3;
    data.columns = 1;
    data.values = {0, 1, 2};
    // The centre at 100 draws no article and stays where it was.
    const auto result = kMeans(data, {0.5, 100});
    REQUIRE(result);
    CHECK(result->partition.labels == std::vector<int> {0, 0, 0});
    CHECK(result->centres == std::vector<double> {1, 100});
    CHECK(result->inertia == Approx(2.0));
    CHECK(!kMeans(data, {}).has_value());
    data.columns = 3;
    data.rows = 1;
    CHECK(kMeans(data, {1, 2}).error() == "the starting centres do not match the variables");
}
