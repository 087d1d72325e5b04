// The allocator setting the executables share (app/heap_reuse.h): blocks of
// megabytes come from the heap, kept for reuse, and the heap is advised to
// use huge pages where the system offers them on request, from the first
// block made after the setting on.
#include "app/heap_reuse.h"

#include <gtest/gtest.h>

#include <unistd.h>

#include <cstdint>
#include <cstdlib>
#include <fstream>
#include <functional>
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

// The VmFlags lines, one each, of the mappings in /proc/self/smaps whose
// first line (the address range, then the file or "[heap]") `pick` accepts.
std::string vmFlags(const std::function<bool(const std::string&)>& pick)
{
    std::ifstream in("/proc/self/smaps");
    std::string line, flags;
    bool picked = false;
    while (std::getline(in, line)) {
        if (line.find('-') < line.find(' ') && line.find(':') > line.find(' ')) picked = pick(line);  // a mapping
        if (picked && line.rfind("VmFlags:", 0) == 0) flags += line + "\n";
    }
    return flags;
}

std::string heapFlags()
{
    return vmFlags([](const std::string& mapping) { return mapping.find(" [heap]") != std::string::npos; });
}

// The flags of the mapping that holds `address`.
std::string flagsAt(const void* address)
{
    const auto a = reinterpret_cast<std::uintptr_t>(address);
    return vmFlags([a](const std::string& mapping) {
        const std::uintptr_t from = std::stoull(mapping, nullptr, 16);
        const std::uintptr_t to = std::stoull(mapping.substr(mapping.find('-') + 1), nullptr, 16);
        return from <= a && a < to;
    });
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

// A small analysis's results (a few hundred kB) are made after the setting:
// they too lie where huge pages may back them, not in the 4 kB pages below
// the heap's first 2 MB boundary.
TEST(HeapReuse, BlocksMadeAfterTheSettingLieOnMemoryAdvisedToUseHugePages)
{
    if (!hugePagesOnRequest()) GTEST_SKIP() << "this system gives no huge pages on request";
    clevis::app::keepFreedHeapForReuse();
    void* block = std::malloc(64 << 10);
    ASSERT_NE(block, nullptr);
    EXPECT_NE(flagsAt(block).find(" hg"), std::string::npos) << block << "\n" << heapFlags();
    std::free(block);
}
