// The mechanism solved at exactly a given time or drive position, not at the
// nearest stored step of the cycle: what a designer who asks for 90° expects
// to see. Newton starts from the stored step nearest in time, extrapolated to
// the asked time, so the assembly branch of the solved cycle is kept.
#pragma once

#include "core/results/results.h"

#include <optional>

namespace clevis {

// Everything at time t (0 ≤ t ≤ the solved cycle's last step). Throws
// AnalysisError if the mechanism cannot be assembled there, std::out_of_range
// for a time outside the solved steps.
StepResult solveAtTime(const CompiledMechanism& m, const CycleResult& r, double t);

// The first time in the solved cycle at which driver `driver` is exactly at
// `position` (rad or m; rotary drivers modulo one turn); none if its solved
// range never reaches it.
std::optional<double> timeAtDrivePosition(const CompiledMechanism& m, const CycleResult& r, int driver,
                                          double position);

// `r` with `step` inserted in time order (replacing a stored step at the same
// time); returns its index. Lets views that read a cycle show an exact position.
int insertStep(CycleResult& r, StepResult step);

}  // namespace clevis
