#pragma once
// Runs independent pieces of work on a few threads. Each piece writes only its own outputs, so
// results do not depend on the number of threads.

#include <cstddef>
#include <functional>

namespace fourfold::frames {

// Calls work(i) for every i in 0..count-1 on up to `threads` threads (values below 1 count as 1);
// pieces are handed out in stripes (thread t takes t, t + threads, ...). Runs on the calling
// thread alone when a thread cannot be started.
void parallelFor(std::size_t count, int threads, const std::function<void(std::size_t)> &work);

} // namespace fourfold::frames
