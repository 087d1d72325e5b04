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
#endif
}

}  // namespace clevis::app
