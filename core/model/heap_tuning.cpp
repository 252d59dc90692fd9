#include "core/model/heap_tuning.h"

#include <cstdlib> // defines __GLIBC__ with the GNU C library

#if defined(__GLIBC__)
#include <malloc.h>
#endif

namespace fourfold {

void keepFreedHeapMemory()
{
#if defined(__GLIBC__)
    // mallopt(3): setting these also fixes the mmap threshold, which glibc would otherwise raise
    // as large blocks are freed.
    mallopt(M_TRIM_THRESHOLD, 128 * 1024 * 1024);
    mallopt(M_TOP_PAD, 16 * 1024 * 1024);
    mallopt(M_MMAP_THRESHOLD, 4 * 1024 * 1024);
#endif
}

} // namespace fourfold
