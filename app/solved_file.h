// What every command that analyses a file starts and ends with: read the
// file (its warnings go to `err`), compile it and sweep its cycle (at the
// motion a motor gives, where a driver has one); write a result file atomically.
#pragma once

#include "core/file/atomic_file.h"
#include "core/model/mechanism.h"
#include "core/results/results.h"
#include "core/solver/compiled_mechanism.h"
#include "core/solver/motor_drive.h"

#include <ostream>
#include <string>

namespace clevis::cli {

struct SolvedFile {
    Mechanism mechanism;
    CompiledMechanism m;  // with a motor's found motion, if any (core/solver/motor_drive.h)
    CycleResult r;
    std::optional<FoundMotion> found;
};

// `steps` intervals over the cycle (0: the file's own setting). Throws the
// reader's ModelError or the solver's AnalysisError.
SolvedFile solveFile(const std::string& file, int steps, std::ostream& err);

// Writes atomically, so a failed run never leaves half a file in place of the
// last good one; false (with a message naming it and the reason) if it cannot.
bool writeOutputFile(const std::string& path, const std::string& text, std::ostream& err);
// The same for text made in pieces (core/file/atomic_file.h).
bool writeOutputFile(const std::string& path, const TextProducer& produce, std::ostream& err);

}  // namespace clevis::cli
