#include "core/frames/parallel_rows.h"

#include <algorithm>
#include <system_error>
#include <thread>
#include <vector>

namespace fourfold::frames {

void parallelFor(std::size_t count, int threads, const std::function<void(std::size_t)> &work)
{
    const std::size_t workers =
        std::min<std::size_t>(std::size_t(std::max(threads, 1)), std::max<std::size_t>(count, 1));
    auto stripe = [&](std::size_t first) {
        for (std::size_t i = first; i < count; i += workers)
            work(i);
    };
    std::vector<std::thread> pool;
    std::vector<std::size_t> leftOver;
    for (std::size_t t = 1; t < workers; ++t) {
        try {
            pool.emplace_back(stripe, t);
        } catch (const std::system_error &) {
            leftOver.push_back(t); // no thread to be had: this stripe runs here
        }
    }
    stripe(0);
    for (std::size_t t : leftOver)
        stripe(t);
    for (std::thread &thread : pool)
        thread.join();
}

} // namespace fourfold::frames
