// `clevis-cli analyze`: load, solve the cycle, print the summary and write
// the requested result files.
#pragma once

#include "app/cli_options.h"

#include <ostream>

namespace clevis::cli {

// Returns the exit code (kExitOk or kExitFailed); reports on `out` and `err`.
int runAnalyze(const AnalyzeOptions& options, std::ostream& out, std::ostream& err);

}  // namespace clevis::cli
