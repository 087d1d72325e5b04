#include "app/heap_reuse.h"

#include <cstdint>
#include <cstdlib>  // defines __GLIBC__ on glibc systems
#if defined(__GLIBC__)
#include <malloc.h>
#include <sys/mman.h>
#include <unistd.h>
#endif

namespace clevis::app {
namespace {

// The block kept below the heap's first huge-page boundary; never read, but
// volatile so that the compiler keeps the allocation (and leak checkers see
// it reachable).
void* volatile belowHugePages = nullptr;

}  // namespace

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
    constexpr std::uintptr_t kChunkHeader = 2 * sizeof(std::size_t);
    constexpr std::uintptr_t kGrow = 256 << 10;
    void* grow = std::malloc(kGrow);
    const auto top = reinterpret_cast<std::uintptr_t>(grow) - kChunkHeader;  // where its block starts
    std::free(grow);
    // Huge pages start on 2 MB boundaries, and new blocks are cut from the
    // low end of the heap's free top, where `grow` was cut (nothing freed is
    // that big yet) and to which it returned. One block from there to a
    // boundary, kept and never touched (address space only), puts every
    // block after it on memory that can use huge pages: a small analysis's
    // few hundred kB of results would otherwise fault in 4 kB at a time
    // below the boundary. The boundary is the first one past the rest of the
    // heap that `grow` left behind, whose start was written to: memory
    // touched before the advice keeps its 4 kB pages.
    constexpr std::uintptr_t kHugePage = 2 << 20;
    const auto start = (top + kGrow + 2 * kChunkHeader + kHugePage - 1) & ~(kHugePage - 1);
    const auto end = reinterpret_cast<std::uintptr_t>(sbrk(0)) & ~(kHugePage - 1);
    if (end <= start) return;
    madvise(reinterpret_cast<void*>(start), end - start, MADV_HUGEPAGE);  // best effort
    belowHugePages = std::malloc(start - top - kChunkHeader);
#endif
}

}  // namespace clevis::app
