// A process that saves a mechanism over and over, as the desktop's Save does
// (the file's text, written atomically keeping NAME.bak), alternating two
// versions until it is killed: test_killed_save.cpp kills it with SIGKILL and
// looks at what is left on the disk.
//
//   clevis_save_loop TARGET FIRST SECOND
//
// reads the texts of the mechanism files FIRST and SECOND (as the project's
// writer saved them), writes "saving\n" to standard output once it starts to
// save, then saves the version TARGET does not hold over it, then the other,
// and so on, for ever.
//
// With CLEVIS_SAVE_LOOP_KILL_AT=N in the environment the process kills itself
// instead on entering its N-th call (counting from 1) of fsync, unlink, link
// or rename, the calls between which a save changes the disk: a test steps N
// over every point of a save, where a kill at a random moment would hit the
// short gaps between two calls only by chance.
#include "core/file/atomic_file.h"

#include <dlfcn.h>
#include <unistd.h>

#include <csignal>
#include <cstdio>
#include <cstdlib>
#include <fstream>
#include <iterator>
#include <string>

namespace {

long killAt = 0;  // 0: never
long calls = 0;

// The system's own function `name`, behind the one defined here.
template <class Function>
Function* next(const char* name)
{
    return reinterpret_cast<Function*>(::dlsym(RTLD_NEXT, name));
}

std::string fileText(const char* path)
{
    std::ifstream in(path, std::ios::binary);
    return {std::istreambuf_iterator<char>(in), std::istreambuf_iterator<char>()};
}

void countCall()
{
    if (killAt > 0 && ++calls == killAt) ::raise(SIGKILL);
}

}  // namespace

// Defined in the executable, these stand in for the C library's functions
// for every caller in it, the atomic save included.
extern "C" {
int fsync(int fd)
{
    countCall();
    static auto* real = next<int(int)>("fsync");
    return real(fd);
}
int unlink(const char* path)
{
    countCall();
    static auto* real = next<int(const char*)>("unlink");
    return real(path);
}
int link(const char* from, const char* to)
{
    countCall();
    static auto* real = next<int(const char*, const char*)>("link");
    return real(from, to);
}
int rename(const char* from, const char* to)
{
    countCall();
    static auto* real = next<int(const char*, const char*)>("rename");
    return real(from, to);
}
}

int main(int argc, char** argv)
{
    if (argc != 4) {
        std::fprintf(stderr, "usage: clevis_save_loop TARGET FIRST SECOND\n");
        return 2;
    }
    if (const char* n = std::getenv("CLEVIS_SAVE_LOOP_KILL_AT")) killAt = std::atol(n);
    try {
        const std::string texts[2] = {fileText(argv[2]), fileText(argv[3])};
        const std::string onDisk = fileText(argv[1]);
        std::fputs("saving\n", stdout);
        std::fflush(stdout);
        for (unsigned i = onDisk == texts[0] ? 1 : 0;; ++i) clevis::writeFileAtomically(argv[1], texts[i % 2], true);
    } catch (const std::exception& e) {
        std::fprintf(stderr, "clevis_save_loop: %s\n", e.what());
        return 1;
    }
}
