// The clevis-cli command line: a subcommand and its options. Parsing knows
// nothing about mechanisms, so new subcommands only add a case here. Core
// only: clevis-cli and clevis-draw (the drawing commands) share it, so both
// accept and refuse the same words and --help describes both.
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
    std::string peakOfPin;          // the stored step where this pin's load peaks (pin_peak.h)
};
struct InternalLoadsOptions {
    std::string file, body;
    PositionChoice at;
    int stations = 21;  // equally spaced, both ends included
    int steps = 0;      // 0: the file's own setting
    std::string jsonOut, csvOut;
};
// The commands that draw with Qt; clevis-draw runs them.
enum class Drawing { FreeBody, BarDiagram, BearingPolar, Report };
struct DrawOptions {
    Drawing drawing = Drawing::FreeBody;
    std::string file;
    std::string out;         // .svg, .pdf or .png (the report: .pdf)
    std::string body;        // fbd, bar-diagram: the body; bearing-polar: the side (empty: the joint's second body)
    std::string joint;       // bearing-polar
    PositionChoice at;       // fbd, bar-diagram
    int steps = 0;           // 0: the file's own setting
    bool dalembert = false;  // fbd
};
using Command = std::variant<HelpRequest, VersionRequest, AnalyzeOptions, InternalLoadsOptions, DrawOptions>;

// `args` excludes the program name. Throws UsageError.
Command parseCommandLine(const std::vector<std::string>& args);

std::string helpText(const std::string& topic);

// What a UsageError prints: the message and where help is
// ("clevis-cli COMMAND --help" when the command has a help of its own).
std::string usageErrorText(const std::vector<std::string>& args, const UsageError& error);

inline constexpr int kExitOk = 0, kExitFailed = 1, kExitUsage = 2;

}  // namespace clevis::cli
