// keepFreedHeapMemory: after it, a freed 2 MiB block stays in the heap for the next allocation
// instead of going back to the system (mallopt(3), mallinfo2(3) of the GNU C library: fordblks is
// the free space the main arena holds). Without it glibc maps a block that large on its own
// (the default mmap threshold is 128 KiB) and returns it at once.

#include "core/model/heap_tuning.h"

#include <catch2/catch.hpp>

#include <cstdlib>
#include <cstring>

#if defined(__GLIBC__)
#include <malloc.h>
#endif

TEST_CASE("A freed block of 2 MiB stays in the heap once it is kept warm")
{
#if defined(__GLIBC__)
    fourfold::keepFreedHeapMemory();
    const std::size_t before = mallinfo2().fordblks;
    constexpr std::size_t kBlock = 2 * 1024 * 1024;
    void *block = std::malloc(kBlock);
    REQUIRE(block != nullptr);
    std::memset(block, 1, kBlock); // touched, as a parser's buffer is
    std::free(block);
    CHECK(mallinfo2().fordblks >= before + kBlock);
    // A block of 4 MiB and more is still mapped on its own and returned at once.
    const std::size_t kept = mallinfo2().fordblks;
    void *large = std::malloc(8 * 1024 * 1024);
    REQUIRE(large != nullptr);
    std::free(large);
    CHECK(mallinfo2().fordblks < kept + 8 * 1024 * 1024);
#else
    FAIL("these tests run on the GNU C library (Debian)");
#endif
}
