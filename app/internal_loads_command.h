// `clevis-cli internal-loads`: the axial force, shear force and bending
// moment along one bar at one position (solved exactly there), and their
// envelope over the cycle; printed, and written as JSON or CSV on request.
#pragma once

#include "app/cli_options.h"

#include <ostream>

namespace clevis::cli {

// Returns the exit code (kExitOk or kExitFailed); reports on `out` and `err`.
int runInternalLoads(const InternalLoadsOptions& options, std::ostream& out, std::ostream& err);

}  // namespace clevis::cli
