// The clevis-cli command line: a subcommand and its options. Parsing knows
// nothing about mechanisms, so new subcommands only add a case here.
#pragma once

#include <stdexcept>
#include <string>
#include <variant>
#include <vector>

namespace clevis::cli {

// Wrong command line; the message names what is wrong (exit code 2).
class UsageError : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

struct HelpRequest {
    std::string topic;  // empty: the overview; else a subcommand
};
struct VersionRequest {};
struct AnalyzeOptions {
    std::string file;
    int steps = 0;                // 0: the file's own setting
    std::string jsonOut, csvOut;  // empty: not written
};
using Command = std::variant<HelpRequest, VersionRequest, AnalyzeOptions>;

// `args` excludes the program name. Throws UsageError.
Command parseCommandLine(const std::vector<std::string>& args);

std::string helpText(const std::string& topic);

inline constexpr int kExitOk = 0, kExitFailed = 1, kExitUsage = 2;

}  // namespace clevis::cli
