// Runs one of the tests' Python check scripts (sympy or scipy, from the
// system's python3) on a JSON input and returns the JSON it prints. A script
// that cannot run fails the test, never skips it: the check would prove nothing.
#pragma once

#include <gtest/gtest.h>
#include <nlohmann/json.hpp>

#include <sys/wait.h>
#include <unistd.h>

#include <cstdio>
#include <filesystem>
#include <fstream>
#include <string>

namespace clevis::test {

inline nlohmann::json runPythonCheck(const std::string& script, const nlohmann::json& input)
{
    const auto path =
        std::filesystem::temp_directory_path() /
        ("clevis_check_" + std::filesystem::path(script).stem().string() + "_" + std::to_string(::getpid()) + ".json");
    std::ofstream(path) << input.dump();
    const std::string command = "/usr/bin/python3 '" + script + "' '" + path.string() + "'";
    std::string output;
    int status = -1;
    if (FILE* pipe = ::popen(command.c_str(), "r")) {
        char buffer[4096];
        while (std::size_t n = std::fread(buffer, 1, sizeof buffer, pipe)) output.append(buffer, n);
        status = ::pclose(pipe);
    }
    std::filesystem::remove(path);
    if (status != 0 || !WIFEXITED(status) || WEXITSTATUS(status) != 0) {
        ADD_FAILURE() << "the check could not run (" << command << " exited with status " << status
                      << "); it needs /usr/bin/python3 with python3-sympy and python3-scipy installed";
        return {};
    }
    return nlohmann::json::parse(output);
}

}  // namespace clevis::test
