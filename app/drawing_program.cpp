#include "app/drawing_program.h"

#include "app/cli_options.h"

#include <unistd.h>

#include <cerrno>
#include <filesystem>
#include <string>
#include <system_error>

namespace clevis::cli {

int handOverToDrawingProgram(char** argv, std::ostream& err)
{
    // The folder of this executable, not of argv[0]: clevis-cli may have
    // been found on PATH or through a symbolic link.
    std::error_code failed;
    const std::filesystem::path self = std::filesystem::read_symlink("/proc/self/exe", failed);
    const std::filesystem::path program = self.parent_path() / kDrawingProgram;
    if (!failed) {
        const std::string path = program.string();
        argv[0] = const_cast<char*>(path.c_str());
        execv(path.c_str(), argv);
        failed = std::error_code(errno, std::generic_category());
    }
    err << "clevis-cli: " << argv[1] << " is drawn by " << kDrawingProgram
        << ", which cannot be run: " << (program.has_parent_path() ? program.string() : std::string("/proc/self/exe"))
        << ": " << failed.message() << " (" << kDrawingProgram
        << " is built with the desktop app and installed beside clevis-cli)\n";
    return kExitFailed;
}

}  // namespace clevis::cli
