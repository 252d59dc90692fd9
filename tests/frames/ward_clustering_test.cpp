#include "core/frames/ward_clustering.h"
#include "tests/frames/frame_test_data.h"
#include "tests/frames/python_reference.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>

using namespace fourfold;
using namespace fourfold::frames;
using fourfold::test::jsonRows;

namespace {

// A deliberately naive Ward (O(n³) per data set): every step recomputes every pair's cost from the
// clusters' centroids, D(A, B) = 2 |A||B| / (|A| + |B|) ‖c_A − c_B‖² (Ward 1963; the form of
// Lance & Williams' recurrence in Müllner 2011, §2), takes the smallest, and breaks ties by the
// documented rule (costs within the tolerance tie; the pair of clusters whose first articles are
// lexicographically smallest wins). Returns the partition at every k = n..1, each numbered by
// first article.
std::vector<std::vector<int>> naiveWardPartitions(const FrameMatrix &data)
{
    const std::size_t n = data.rows;
    const std::size_t m = data.columns;
    std::vector<std::vector<std::size_t>> clusters;
    for (std::size_t i = 0; i < n; ++i)
        clusters.push_back({i});
    double largest = 0;
    for (std::size_t i = 0; i < n; ++i)
        for (std::size_t j = i + 1; j < n; ++j)
            largest = std::max(largest, squaredDistance(data.row(i), data.row(j), m));
    auto labelsOf = [&] {
        std::vector<int> labels(n, -1);
        std::vector<std::size_t> order(clusters.size());
        for (std::size_t c = 0; c < clusters.size(); ++c)
            order[c] = c;
        std::sort(order.begin(), order.end(), [&](std::size_t x, std::size_t y) {
            return clusters[x].front() < clusters[y].front();
        });
        for (std::size_t position = 0; position < order.size(); ++position)
            for (std::size_t i : clusters[order[position]])
                labels[i] = int(position);
        return labels;
    };
    std::vector<std::vector<int>> partitions {labelsOf()};
    while (clusters.size() > 1) {
        std::vector<std::vector<double>> centroid(clusters.size(), std::vector<double>(m, 0.0));
        for (std::size_t c = 0; c < clusters.size(); ++c) {
            for (std::size_t i : clusters[c])
                for (std::size_t v = 0; v < m; ++v)
                    centroid[c][v] += data.at(i, v);
            for (double &x : centroid[c])
                x /= double(clusters[c].size());
        }
        struct Pair {
            double cost;
            std::size_t x, y; // indices into clusters
        };
        std::vector<Pair> pairs;
        for (std::size_t x = 0; x < clusters.size(); ++x)
            for (std::size_t y = x + 1; y < clusters.size(); ++y) {
                const double a = double(clusters[x].size());
                const double b = double(clusters[y].size());
                double d = 0;
                for (std::size_t v = 0; v < m; ++v)
                    d += (centroid[x][v] - centroid[y][v]) * (centroid[x][v] - centroid[y][v]);
                pairs.push_back({2 * a * b / (a + b) * d, x, y});
            }
        double smallest = pairs.front().cost;
        for (const Pair &p : pairs)
            smallest = std::min(smallest, p.cost);
        const Pair *chosen = nullptr;
        auto key = [&](const Pair &p) {
            return std::minmax(clusters[p.x].front(), clusters[p.y].front());
        };
        for (const Pair &p : pairs) {
            const bool tie = std::abs(p.cost - smallest)
                <= kTieRelative * std::max(std::abs(p.cost), std::abs(smallest))
                    + kTieAbsoluteShare * largest;
            if (tie && (!chosen || key(p) < key(*chosen)))
                chosen = &p;
        }
        const std::size_t x = chosen->x;
        const std::size_t y = chosen->y;
        clusters[x].insert(clusters[x].end(), clusters[y].begin(), clusters[y].end());
        std::sort(clusters[x].begin(), clusters[x].end());
        clusters.erase(clusters.begin() + std::ptrdiff_t(y));
        partitions.push_back(labelsOf());
    }
    return partitions;
}

} // namespace

TEST_CASE("Ward heights and merge order equal SciPy's linkage on random continuous data")
{
    // Reference: scipy.cluster.hierarchy.linkage(X, method="ward") (Debian python3-scipy), whose
    // rows are [first, second, height, size] with clusters n + s for merge s, as WardMerge.
    struct Shape {
        std::size_t n, m;
    };
    const std::vector<Shape> shapes {
        {2, 1}, {3, 2}, {10, 3}, {31, 2}, {64, 5}, {150, 8}, {257, 12}};
    QJsonArray cases;
    std::vector<FrameMatrix> data;
    for (std::size_t s = 0; s < shapes.size(); ++s) {
        data.push_back(test::randomContinuous(shapes[s].n, shapes[s].m, 1000 + s));
        cases.append(QJsonObject {{"op", "linkage"}, {"data", jsonRows(data.back())}});
    }
    const QJsonArray reference = test::referenceResults(cases);
    for (std::size_t s = 0; s < data.size(); ++s) {
        INFO("n = " << data[s].rows << ", variables = " << data[s].columns);
        for (int threads : {1, 2}) {
            WardOptions options;
            options.threads = threads;
            const auto schedule = wardLinkage(data[s], options);
            REQUIRE(schedule);
            const QJsonArray z = reference[qsizetype(s)].toArray();
            REQUIRE(std::size_t(z.size()) == schedule->size());
            for (std::size_t r = 0; r < schedule->size(); ++r) {
                const QJsonArray row = z[qsizetype(r)].toArray();
                INFO("merge " << r);
                CHECK((*schedule)[r].first == row[0].toInt());
                CHECK((*schedule)[r].second == row[1].toInt());
                CHECK(std::abs((*schedule)[r].height - row[2].toDouble()) <= 1e-9);
                CHECK((*schedule)[r].size == row[3].toInt());
            }
        }
    }
}

TEST_CASE("Ward on 0/1 data with ties gives the naive implementation's partition at every k")
{
    // Ward (1963) with the documented tie rule against naiveWardPartitions above.
    for (std::uint64_t seed = 1; seed <= 40; ++seed) {
        const std::size_t n = 12 + seed % 29;
        const std::size_t m = 3 + seed % 6;
        const FrameMatrix data = test::randomBinary(n, m, 0.2 + 0.015 * double(seed), seed);
        const auto schedule = wardLinkage(data);
        REQUIRE(schedule);
        const std::vector<std::vector<int>> naive = naiveWardPartitions(data);
        for (std::size_t k = 1; k <= n; ++k) {
            INFO("seed " << seed << ", n " << n << ", k " << k);
            const Partition cut = cutTree(*schedule, n, int(k));
            CHECK(cut.clusters == int(k));
            CHECK(cut.labels == naive[n - k]);
        }
        for (std::size_t s = 1; s < schedule->size(); ++s)
            CHECK((*schedule)[s].height >= (*schedule)[s - 1].height - 1e-12);
    }
}

TEST_CASE("Ward on identical articles merges them at height 0 first")
{
    FrameMatrix data;
    data.rows = 4;
    data.columns = 2;
    data.values = {1, 0, 0, 1, 1, 0, 0, 1};
    const auto schedule = wardLinkage(data);
    REQUIRE(schedule);
    REQUIRE(schedule->size() == 3);
    // Ties at 0: the pair whose first articles are smallest, (0, 2), then (1, 3).
    CHECK((*schedule)[0].first == 0);
    CHECK((*schedule)[0].second == 2);
    CHECK((*schedule)[0].height == 0);
    CHECK((*schedule)[1].first == 1);
    CHECK((*schedule)[1].second == 3);
    // Two pairs of two at squared distance 2 apart: D = 2·2·2/4 · 2 = 4, height 2.
    CHECK((*schedule)[2].height == Approx(2.0).epsilon(1e-12));
    CHECK(cutTree(*schedule, 4, 2).labels == std::vector<int> {0, 1, 0, 1});
}

TEST_CASE("Ward refuses too few or too many articles and values that are not numbers")
{
    FrameMatrix one;
    one.rows = 1;
    one.columns = 1;
    one.values = {0};
    CHECK(wardLinkage(one).error().find("at least 2") != std::string::npos);
    const FrameMatrix data = test::randomContinuous(11, 2, 7);
    WardOptions options;
    options.maxRows = 10;
    CHECK(wardLinkage(data, options).error().find("at most 10 articles, not 11")
        != std::string::npos);
    FrameMatrix nan = data;
    nan.values[5] = std::nan("");
    CHECK(wardLinkage(nan).error().find("finite") != std::string::npos);
    std::atomic<bool> cancelled {true};
    options.maxRows = kWardMaxRows;
    options.cancelled = &cancelled;
    CHECK(wardLinkage(data, options).error() == "cancelled");
}
