// `clevis-cli fbd`, `bar-diagram`, `bearing-polar` and `report`: the
// free-body diagram of one body or the N/V/M diagram of one bar at one
// position, the polar diagram of one joint's load in one of its bodies'
// frames over the cycle (SVG, PDF or PNG), and the design-review PDF,
// rendered headless with Qt. They run in clevis-draw, which clevis-cli
// starts for them, so that the analysis never loads Qt. Exit codes: 0 done,
// 1 the model cannot be analysed (or its results are not trustworthy),
// 2 wrong command line; messages on stderr name the offending item.
#pragma once

#include <string>
#include <vector>

namespace clevis::cli {

// `args` are the words after the program name, the command first
// ("fbd FILE --body NAME ..."), read by clevis-cli's own parser; --help
// prints the command's help. Other commands are refused (exit 2).
int runDrawCommand(const std::vector<std::string>& args);

}  // namespace clevis::cli
