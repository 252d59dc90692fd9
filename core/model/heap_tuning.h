#pragma once
// The C library's heap kept warm. glibc returns freed memory at the top of the heap to the
// system once more than 128 KiB is free (and maps every allocation above a threshold that it
// raises only as it goes), so a program that parses one document after another — thousands of
// DOCX or PDF files in one import — asks for the same pages again and again, and under
// virtualisation every first touch of a page is a costly fault: importing 200 word-processor
// documents took 7.4 s, 1.9 s with the heap kept (bench/import-formats). Programs call this once
// at start; memory above 4 MiB per allocation is still mapped and returned at once.

namespace fourfold {

// Keeps up to 128 MiB of freed heap for reuse and grows the heap 16 MiB at a time; allocations
// of 4 MiB and more are mapped on their own. A no-op where the C library has no mallopt.
void keepFreedHeapMemory();

} // namespace fourfold
