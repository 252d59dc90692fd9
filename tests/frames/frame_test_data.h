#pragma once
// Generated data for the frame kernels' tests (seeded; invented numbers).

#include "core/frames/frame_matrix.h"

#include <random>
#include <vector>

namespace fourfold::test {

// n × m values drawn uniformly from [0, 1): no ties among distances (almost surely).
inline frames::FrameMatrix randomContinuous(std::size_t n, std::size_t m, std::uint64_t seed)
{
    std::mt19937_64 generator(seed);
    std::uniform_real_distribution<double> uniform(0.0, 1.0);
    frames::FrameMatrix data;
    data.rows = n;
    data.columns = m;
    for (std::size_t i = 0; i < n * m; ++i)
        data.values.push_back(uniform(generator));
    return data;
}

// n × m indicators, each 1 with probability `p`: many tied distances and repeated rows.
inline frames::FrameMatrix randomBinary(std::size_t n, std::size_t m, double p, std::uint64_t seed)
{
    std::mt19937_64 generator(seed);
    std::bernoulli_distribution one(p);
    frames::FrameMatrix data;
    data.rows = n;
    data.columns = m;
    for (std::size_t i = 0; i < n * m; ++i)
        data.values.push_back(one(generator) ? 1.0 : 0.0);
    return data;
}

// Planted frames: `perFrame` articles from each of `profiles` element profiles over `m` elements.
// Profile f holds elements f·m/profiles .. (f+1)·m/profiles − 1; an article has each element of
// its profile with probability `inside` and any other element with probability `outside` (the
// noise). `truth` receives each article's profile.
inline frames::FrameMatrix plantedFrames(std::size_t profiles, std::size_t perFrame, std::size_t m,
    double inside, double outside, std::uint64_t seed, std::vector<int> &truth)
{
    std::mt19937_64 generator(seed);
    std::uniform_real_distribution<double> uniform(0.0, 1.0);
    frames::FrameMatrix data;
    data.rows = profiles * perFrame;
    data.columns = m;
    truth.clear();
    // Articles interleaved (frame 0, 1, 2, 3, 0, ...) so row order says nothing.
    for (std::size_t a = 0; a < data.rows; ++a) {
        const std::size_t f = a % profiles;
        truth.push_back(int(f));
        for (std::size_t e = 0; e < m; ++e) {
            const bool own = e * profiles / m == f;
            data.values.push_back(uniform(generator) < (own ? inside : outside) ? 1.0 : 0.0);
        }
    }
    return data;
}

// `n` labels 0..k−1, every label used at least once (the first k articles take 0..k−1).
inline std::vector<int> randomLabels(std::size_t n, int k, std::uint64_t seed)
{
    std::mt19937_64 generator(seed);
    std::uniform_int_distribution<int> label(0, k - 1);
    std::vector<int> labels(n);
    for (std::size_t i = 0; i < n; ++i)
        labels[i] = i < std::size_t(k) ? int(i) : label(generator);
    return labels;
}

} // namespace fourfold::test
