#include "app/heap_reuse.h"

#include <cstdint>
#include <cstdlib>  // defines __GLIBC__ on glibc systems
#if defined(__GLIBC__)
#include <malloc.h>
#include <sys/mman.h>
#include <unistd.h>
#endif

namespace clevis::app {

void keepFreedHeapForReuse()
{
#if defined(__GLIBC__)
    constexpr int kKept = 64 << 20;
    mallopt(M_TRIM_THRESHOLD, kKept);
    // Setting the trim threshold turns off glibc's sliding mmap threshold, so
    // every block over 128 kB would be mapped and unmapped afresh (the
    // report's page buffers, hundreds of them, faulted in page by page):
    // blocks of up to 32 MB (glibc's largest setting) come from the heap.
    mallopt(M_MMAP_THRESHOLD, 32 << 20);
    // The heap grows by 64 MB at once, here, so that the whole of it can be
    // advised to use huge pages (untouched, it costs address space only).
    mallopt(M_TOP_PAD, kKept);
    void* grow = std::malloc(256 << 10);
    constexpr std::uintptr_t kHugePage = 2 << 20;
    const auto start = (reinterpret_cast<std::uintptr_t>(grow) + kHugePage - 1) & ~(kHugePage - 1);
    const auto end = reinterpret_cast<std::uintptr_t>(sbrk(0)) & ~(kHugePage - 1);
    if (end > start) madvise(reinterpret_cast<void*>(start), end - start, MADV_HUGEPAGE);  // best effort
    std::free(grow);
#endif
}

}  // namespace clevis::app
