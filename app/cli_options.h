// The clevis-cli command line: a subcommand and its options. Parsing knows
// nothing about mechanisms, so new subcommands only add a case here.
#pragma once

#include <optional>
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
// --ratio-study FROM:TO:N: N gear ratios from FROM to TO, spaced evenly on
// a logarithmic scale.
struct RatioStudyOption {
    double from = 0, to = 0;
    int count = 0;
};
struct AnalyzeOptions {
    std::string file;
    int steps = 0;                // 0: the file's own setting
    std::string jsonOut, csvOut;  // empty: not written
    std::optional<RatioStudyOption> ratioStudy;
};
// Where `internal-loads` looks: exactly one of the three is set.
struct PositionChoice {
    std::optional<double> degrees;  // first rotary driver's angle, solved exactly
    std::optional<double> time;     // s, solved exactly
    std::string peakOfJoint;        // the stored step where this joint's load peaks
};
struct InternalLoadsOptions {
    std::string file, body;
    PositionChoice at;
    int stations = 21;  // equally spaced, both ends included
    int steps = 0;      // 0: the file's own setting
    std::string jsonOut, csvOut;
};
using Command = std::variant<HelpRequest, VersionRequest, AnalyzeOptions, InternalLoadsOptions>;

// `args` excludes the program name. Throws UsageError.
Command parseCommandLine(const std::vector<std::string>& args);

std::string helpText(const std::string& topic);

inline constexpr int kExitOk = 0, kExitFailed = 1, kExitUsage = 2;

}  // namespace clevis::cli
