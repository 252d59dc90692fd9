#pragma once
// Large buffers filled once from start to end (a reliability table's cells and ids) are backed by
// 2 MiB pages where the system allows it: the first write to each 4 KiB page is otherwise a page
// fault of its own, which under virtualisation costs more than filling the page. Linux
// transparent huge pages in "madvise" mode (the Debian default) take the advice; elsewhere, or
// when they are off, it is a no-op.

#include <cstddef>

namespace fourfold {

// Advises huge pages for the whole 2 MiB pages inside [data, data + bytes). Buffers smaller than
// 4 MiB are left alone. Call it before the memory is first written.
void adviseHugePages(const void *data, std::size_t bytes);

// The same for the capacity of a std::vector (after reserve).
template<typename Vector>
void adviseHugePagesFor(const Vector &vector)
{
    adviseHugePages(vector.data(), vector.capacity() * sizeof(typename Vector::value_type));
}

} // namespace fourfold
