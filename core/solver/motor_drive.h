// The cycle of a mechanism as its drive turns it: at the prescribed motion,
// or, where its one driver has a motor characteristic, at the motion found by
// integrating the equation of motion to the steady cycle (steady_cycle.h),
// with the flywheel sized first where a fluctuation target asks for one
// (flywheel_sizing.h). The found motion is then solved like a prescribed
// one, step by step, for every reaction at the real speed.
#pragma once

#include "core/solver/cycle_sweep.h"
#include "core/solver/flywheel_sizing.h"

#include <optional>

namespace clevis {

struct FoundMotion {
    int driver = 0;
    SteadyCycle cycle;
    double flywheelInertia = 0.0;  // kg·m² on its shaft: the file's, or the sized one
    std::optional<FlywheelSizing> sizing;
};

struct SolvedCycle {
    CompiledMechanism m;  // with a found motion: the driver's `found` samples, the cycle's duration one turn
    CycleResult r;
    std::optional<FoundMotion> found;
};

// `doc` is the mechanism `m` was compiled from. The steps of a found motion
// are evenly spaced in the driver's position over one turn (options.steps,
// or the mechanism's own count). Throws AnalysisError as sweepCycle does, and
// MotorStall (an AnalysisError naming the driver and the position) where the
// motor cannot keep the mechanism turning.
SolvedCycle solveCycle(const Mechanism& doc, const CompiledMechanism& m, const SweepOptions& options = {});

// The driver of `doc` whose motion is to be found (one with a motor), if any.
const Driver* motorDriver(const Mechanism& doc);

}  // namespace clevis
