// Running the built clevis-cli as a user would, for the tests that check its
// exit codes, messages and output files. CLEVIS_CLI_PATH is set by CMake.
#pragma once

#include "tests/file_text.h"

#include <sys/wait.h>

#include <cstdlib>
#include <filesystem>
#include <string>

namespace clevis::test {

struct CliRun {
    int exitCode = -1;
    std::string out, err;
};

inline std::string quoted(const std::filesystem::path& path) { return "'" + path.string() + "'"; }

inline bool contains(const std::string& text, const std::string& part) { return text.find(part) != std::string::npos; }

// Runs `PROGRAM ARGS` with stdin from `stdinFrom`, keeping its stdout and
// stderr in files under `scratch`.
inline CliRun runProgram(const std::filesystem::path& program, const std::filesystem::path& scratch,
                         const std::string& args, const std::string& stdinFrom = "/dev/null")
{
    const std::filesystem::path out = scratch / "stdout.txt", err = scratch / "stderr.txt";
    const std::string command =
        quoted(program) + " " + args + " <" + stdinFrom + " >" + quoted(out) + " 2>" + quoted(err);
    const int status = std::system(command.c_str());
    CliRun r;
    r.exitCode = WIFEXITED(status) ? WEXITSTATUS(status) : -1;
    r.out = readFile(out);
    r.err = readFile(err);
    return r;
}

// Runs the built `clevis-cli ARGS`.
inline CliRun runCli(const std::filesystem::path& scratch, const std::string& args,
                     const std::string& stdinFrom = "/dev/null")
{
    return runProgram(CLEVIS_CLI_PATH, scratch, args, stdinFrom);
}

}  // namespace clevis::test
