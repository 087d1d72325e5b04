// The allocator setting the executables share (app/heap_reuse.h): blocks of
// megabytes come from the heap, kept for reuse, and the heap is advised to
// use huge pages where the system offers them on request.
#include "app/heap_reuse.h"

#include <gtest/gtest.h>

#include <unistd.h>

#include <cstdint>
#include <cstdlib>
#include <fstream>
#include <string>

namespace {

// Whether the system gives huge pages to memory that asks for them.
bool hugePagesOnRequest()
{
    std::ifstream in("/sys/kernel/mm/transparent_hugepage/enabled");
    std::string modes;
    std::getline(in, modes);
    return !modes.empty() && modes.find("[never]") == std::string::npos;
}

// The flags of the heap's mappings in /proc/self/smaps, one line each.
std::string heapFlags()
{
    std::ifstream in("/proc/self/smaps");
    std::string line, flags;
    bool inHeap = false;
    while (std::getline(in, line)) {
        if (line.find(" [heap]") != std::string::npos) inHeap = true;
        else if (line.find('-') < line.find(' ') && line.find(':') > line.find(' ')) inHeap = false;  // another mapping
        if (inHeap && line.rfind("VmFlags:", 0) == 0) flags += line + "\n";
    }
    return flags;
}

TEST(HeapReuse, LargeBlocksComeFromTheHeapAdvisedToUseHugePages)
{
    clevis::app::keepFreedHeapForReuse();
    void* block = std::malloc(8 << 20);
    ASSERT_NE(block, nullptr);
    EXPECT_LT(reinterpret_cast<std::uintptr_t>(block), reinterpret_cast<std::uintptr_t>(sbrk(0)))
        << "an 8 MB block was mapped on its own, above the heap";
    std::free(block);
    if (!hugePagesOnRequest()) GTEST_SKIP() << "this system gives no huge pages on request";
    EXPECT_NE(heapFlags().find(" hg"), std::string::npos) << heapFlags();
}

}  // namespace
