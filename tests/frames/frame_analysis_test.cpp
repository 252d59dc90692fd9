#include "core/frames/adjusted_rand.h"
#include "core/frames/cluster_stability.h"
#include "core/frames/frame_analysis.h"
#include "tests/frames/frame_test_data.h"

#include <catch2/catch.hpp>

#include <cmath>

using namespace fourfold;
using namespace fourfold::frames;

namespace {

double ariWithTruth(const std::vector<int> &truth, int k, const Partition &found)
{
    const auto table = crossTable(Partition {truth, k}, found);
    REQUIRE(table);
    return adjustedRandIndex(*table);
}

} // namespace

TEST_CASE("Planted frames: 400 articles from 4 element profiles are recovered and k is 4")
{
    // Four invented element profiles over 24 elements (6 each); an article has each element of
    // its profile with probability 0.8 and any other with 0.1 (noise). Recovery is measured by the
    // adjusted Rand index (Hubert & Arabie 1985); 0.9 is our bar.
    for (std::uint64_t seed : {11u, 12u, 13u}) {
        std::vector<int> truth;
        const FrameMatrix data = test::plantedFrames(4, 100, 24, 0.8, 0.1, seed, truth);
        const auto analysis = analyseFrames(data);
        REQUIRE(analysis);
        INFO("seed " << seed);
        CHECK(analysis->kBySilhouette == 4);
        CHECK(analysis->kByCalinskiHarabasz == 4);
        CHECK(analysis->kByFusion == 4);
        CHECK(analysis->k == 4);
        CHECK(!analysis->kGiven);
        const double ari = ariWithTruth(truth, 4, analysis->frames.partition);
        INFO("ARI " << ari);
        CHECK(ari > 0.9);
        REQUIRE(analysis->profiles.size() == 4);
        // Frames numbered by size; each frame's six elements characterise it.
        for (std::size_t f = 0; f + 1 < 4; ++f)
            CHECK(analysis->profiles[f].size >= analysis->profiles[f + 1].size);
        for (const FrameProfile &profile : analysis->profiles) {
            int characteristic = 0;
            for (const VariableProfile &v : profile.variables)
                if (v.residual && *v.residual > 1.96 && v.share > 0.6)
                    ++characteristic;
            CHECK(characteristic == 6);
            CHECK(profile.closest.size() == 3);
        }
        REQUIRE(analysis->kChoice.size() == 9);
        CHECK(analysis->kChoice.front().k == 2);
    }
}

TEST_CASE("Frame analysis gives the same figures on one thread and on two")
{
    std::vector<int> truth;
    const FrameMatrix data = test::plantedFrames(3, 40, 12, 0.7, 0.2, 5, truth);
    FrameAnalysisOptions one;
    one.threads = 1;
    FrameAnalysisOptions two;
    two.threads = 2;
    const auto a = analyseFrames(data, one);
    const auto b = analyseFrames(data, two);
    REQUIRE(a);
    REQUIRE(b);
    REQUIRE(a->schedule.size() == b->schedule.size());
    for (std::size_t s = 0; s < a->schedule.size(); ++s)
        CHECK(a->schedule[s].height == b->schedule[s].height);
    CHECK(a->frames.partition.labels == b->frames.partition.labels);
    CHECK(a->frames.inertia == b->frames.inertia);
    for (std::size_t q = 0; q < a->kChoice.size(); ++q) {
        CHECK(a->kChoice[q].silhouette.value == b->kChoice[q].silhouette.value);
        CHECK(a->kChoice[q].calinskiHarabasz.value == b->kChoice[q].calinskiHarabasz.value);
    }
}

TEST_CASE("Frame profile residuals are Haberman's adjusted residuals")
{
    // Six articles, one 0/1 variable, frames {0,1,2} and {3,4,5}; the variable is present in
    // articles 0, 1, 2 and 3. Frame 0: O = 3, n_f = 3, m = 4, n = 6, E = 2,
    // r = (3 − 2) / √(2 · (1 − 1/2) · (1 − 4/6)) = 1 / √(1/3) = √3 (Haberman 1973).
    FrameMatrix data;
    data.rows = 6;
    data.columns = 2;
    data.values = {1, 0.5, 1, 2, 1, 3, 1, 4, 0, 5, 0, 6};
    const Partition partition {{0, 0, 0, 1, 1, 1}, 2};
    const auto profiles = frameProfiles(data, partition, clusterMeans(data, partition));
    REQUIRE(profiles.size() == 2);
    CHECK(profiles[0].variables[0].share == Approx(1.0));
    CHECK(profiles[0].variables[0].overall == Approx(4.0 / 6.0));
    CHECK(*profiles[0].variables[0].residual == Approx(std::sqrt(3.0)));
    CHECK(*profiles[1].variables[0].residual == Approx(-std::sqrt(3.0)));
    CHECK(!profiles[0].variables[1].residual); // not a 0/1 variable
    CHECK(profiles[0].closest == std::vector<std::size_t> {1, 2, 0}); // centre 11/6 on variable 2
}

TEST_CASE("Bootstrap stability: planted frames are stable and noise clusters dissolve")
{
    // Hennig (2007): mean Jaccard ≤ 0.5 reads as dissolved, ≥ 0.75 as stable.
    std::vector<int> truth;
    const FrameMatrix data = test::plantedFrames(4, 50, 24, 0.8, 0.1, 21, truth);
    const int k = 4;
    const ClusterMethod method = [k](const FrameMatrix &sample) -> Outcome<Partition> {
        const auto schedule = wardLinkage(sample, WardOptions {1, kWardMaxRows, nullptr});
        if (!schedule)
            return std::unexpected(schedule.error());
        auto clusters = twoStepClusters(sample, *schedule, k, 1);
        if (!clusters)
            return std::unexpected(clusters.error());
        return clusters->partition;
    };
    const auto analysis = analyseFrames(data, FrameAnalysisOptions {4, 6, 2, nullptr});
    REQUIRE(analysis);
    StabilityOptions options;
    options.replicates = 30;
    options.seed = 9;
    options.threads = 1;
    const auto stable = clusterStability(data, analysis->frames.partition, method, options);
    REQUIRE(stable);
    REQUIRE(stable->size() == 4);
    for (const ClusterStability &s : *stable) {
        CHECK(s.meanJaccard >= 0.75);
        CHECK(!s.flagged);
        CHECK(s.replicatesUsed == 30);
    }
    options.threads = 2;
    const auto again = clusterStability(data, analysis->frames.partition, method, options);
    REQUIRE(again);
    for (std::size_t c = 0; c < 4; ++c)
        CHECK((*again)[c].meanJaccard == (*stable)[c].meanJaccard);

    // Pure noise cut into 8 clusters: at least one of them dissolves on resampling.
    const FrameMatrix noise = test::randomBinary(150, 10, 0.5, 4);
    const int noiseK = 8;
    const ClusterMethod noiseMethod = [noiseK](const FrameMatrix &sample) -> Outcome<Partition> {
        const auto schedule = wardLinkage(sample);
        if (!schedule)
            return std::unexpected(schedule.error());
        auto clusters = twoStepClusters(sample, *schedule, noiseK, 1);
        if (!clusters)
            return std::unexpected(clusters.error());
        return clusters->partition;
    };
    const auto noiseFrames = noiseMethod(noise);
    REQUIRE(noiseFrames);
    const auto unstable = clusterStability(noise, *noiseFrames, noiseMethod, options);
    REQUIRE(unstable);
    int flagged = 0;
    for (const ClusterStability &s : *unstable)
        flagged += s.flagged ? 1 : 0;
    CHECK(flagged >= 1);
}

TEST_CASE("Bootstrap draws depend only on the seed and the replicate")
{
    CHECK(bootstrapDraw(50, 3, 7) == bootstrapDraw(50, 3, 7));
    CHECK(bootstrapDraw(50, 3, 7) != bootstrapDraw(50, 3, 8));
    CHECK(bootstrapDraw(50, 3, 7) != bootstrapDraw(50, 4, 7));
    for (std::size_t row : bootstrapDraw(5, 1, 0))
        CHECK(row < 5);
}
