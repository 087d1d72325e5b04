#include "app/heap_reuse.h"

#include <cstdlib>  // defines __GLIBC__ on glibc systems
#if defined(__GLIBC__)
#include <malloc.h>
#endif

namespace clevis::app {

void keepFreedHeapForReuse()
{
#if defined(__GLIBC__)
    mallopt(M_TRIM_THRESHOLD, 64 << 20);
    // Setting the trim threshold turns off glibc's sliding mmap threshold, so
    // every block over 128 kB would be mapped and unmapped afresh: the report's
    // page buffers (a few hundred kB each, hundreds of pages) were faulted in
    // page by page, over and over. 32 MB is glibc's largest.
    mallopt(M_MMAP_THRESHOLD, 32 << 20);
#endif
}

}  // namespace clevis::app
