// `clevis-cli fbd`, `bar-diagram`, `bearing-polar` and `report`: the
// free-body diagram of one body or the N/V/M diagram of one bar at one
// position, the polar diagram of one joint's load in one of its bodies'
// frames over the cycle (SVG, PDF or PNG), and the design-review PDF,
// rendered headless. `args` are the words after the subcommand. Exit codes: 0 done,
// 1 the model cannot be analysed (or its results are not trustworthy),
// 2 wrong command line; messages on stderr name the offending item.
#pragma once

#include <string>
#include <vector>

namespace clevis::cli {

int runFbdCommand(const std::vector<std::string>& args);
int runBarDiagramCommand(const std::vector<std::string>& args);
int runReportCommand(const std::vector<std::string>& args);
int runBearingPolarCommand(const std::vector<std::string>& args);

extern const char* const kFbdUsage;
extern const char* const kBarDiagramUsage;
extern const char* const kReportUsage;
extern const char* const kBearingPolarUsage;

}  // namespace clevis::cli
