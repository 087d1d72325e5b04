// The whole cycle: check mobility, assemble at t = 0 from the drawn pose,
// then step through time, each step starting Newton from the previous pose
// extrapolated with its velocity, acceleration and change of acceleration,
// so the assembly branch the user drew is kept.
#pragma once

#include "core/results/results.h"

#include <functional>
#include <vector>

namespace clevis {

struct SweepOptions {
    int steps = 0;  // intervals over the cycle; 0: the mechanism's own setting
    // The times of the steps (s, from 0 to the cycle's duration, increasing)
    // when they are not evenly spaced: then `steps` is one fewer than these.
    std::vector<double> times;
    // Called after each step with (steps done, steps planned); return false to stop.
    std::function<bool(int, int)> progress;
};

// Throws AnalysisError when the mechanism cannot be analysed at all (wrong
// degrees of freedom, redundant joints, does not assemble at the drawn pose).
// A cycle that cannot be completed returns the steps up to the reachable end
// with `complete == false` and a warning naming the reachable range.
CycleResult sweepCycle(const CompiledMechanism& m, const SweepOptions& options = {});

}  // namespace clevis
