// Process-wide allocator setting shared by the executables.
#pragma once

namespace clevis::app {

// Keep up to 64 MB of freed heap for reuse instead of handing it back to the
// system as soon as it is free. Every edit (and every clevis-bench
// iteration) frees the last cycle's results and allocates the next one's;
// at 200 bodies they take about 25 MB, and with glibc's default (trim above
// 128 kB) giving those pages back and faulting them in again cost more than
// the solving: 274 µs per step against 119 µs on clevis-bench's 200-body
// chain. Blocks up to 32 MB come from the heap too, for the same reason.
// The heap is also backed by huge pages (2 MB) where the system allows it
// (transparent huge pages on request, "madvise"): each page of memory touched
// for the first time costs a fault, and on a virtual machine a costly one;
// the 100-loop fan's 360 steps (about 23 MB of results) took 5 900 faults
// with 4 kB pages and about 400 with huge pages, and a third less CPU time
// (README, "Speed and limits"). Every block made after this call lies on such
// memory, so a small analysis's results take one huge page rather than a
// hundred-odd faults. No effect outside glibc.
void keepFreedHeapForReuse();

}  // namespace clevis::app
