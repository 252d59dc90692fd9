#pragma once
// The shuffle behind the subsample draw and the dealing of the rest: reproducible from its seed
// on every platform, so a draw recorded with its seed can be redone anywhere. Internal to
// core/project.

#include <cstdint>
#include <random>
#include <utility>
#include <vector>

namespace fourfold::study {

// A uniform integer in [0, n) from the 64-bit generator, by rejection so that no value is
// favoured: values below 2^64 mod n are redrawn (the method of OpenBSD's arc4random_uniform;
// common practice). std::uniform_int_distribution is not used: its output differs between
// standard libraries, and the draw must be reproducible from its seed everywhere.
inline std::uint64_t uniformBelow(std::mt19937_64 &engine, std::uint64_t n)
{
    const std::uint64_t threshold = (std::uint64_t(0) - n) % n; // 2^64 mod n
    while (true) {
        const std::uint64_t r = engine();
        if (r >= threshold)
            return r % n;
    }
}

// Fisher–Yates shuffle in Durstenfeld's form (Knuth, TAOCP vol. 2, §3.4.2, Algorithm P).
template<typename T>
void shuffle(std::vector<T> &items, std::mt19937_64 &engine)
{
    for (std::size_t i = items.size(); i > 1; --i) {
        const auto j = std::size_t(uniformBelow(engine, std::uint64_t(i)));
        std::swap(items[i - 1], items[j]);
    }
}
} // namespace fourfold::study
