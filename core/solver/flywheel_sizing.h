// The flywheel that keeps a motor-driven mechanism's speed within an asked
// coefficient of fluctuation C_s = (ω_max − ω_min)/ω_mean.
//
// The energy estimate: I = ΔE_max/(C_s·ω²), ΔE_max the largest swing of the
// energy the flywheel must store and give back while the motor gives its
// mean torque (CycleIntegrator::energySwing at the driver's expected speed),
// ω that speed at the flywheel's shaft. It leaves out the mechanism's own
// inertia, the rotor's and the motor's rise in torque as it slows.
//
// The integrated value: the inertia whose steady cycle has C_s within
// kFluctuationTolerance of the target, found by secant steps on
// 1/C_s − 1/C_target (nearly a straight line in the inertia), kept inside a
// bracket of inertias known to give too much and too little fluctuation
// (bisection where a secant step leaves it). A turn that stalls counts as
// too much fluctuation.
#pragma once

#include "core/solver/steady_cycle.h"

namespace clevis {

inline constexpr double kFluctuationTolerance = 1e-3;  // relative to the target
inline constexpr int kMaxFlywheelTrials = 40;

struct FlywheelSizing {
    double target = 0.0;  // C_s asked for
    FlywheelShaft on = FlywheelShaft::Output;
    double energySwing = 0.0;  // ΔE_max, J
    double speed = 0.0;        // ω of the estimate at the flywheel's shaft, rad/s
    double estimate = 0.0;     // kg·m²
    double integrated = 0.0;   // kg·m²; 0 when the mechanism needs none
    double achieved = 0.0;     // C_s of the steady cycle with `integrated`
    int trials = 0;            // steady cycles integrated in the search
};

struct SizedFlywheel {
    FlywheelSizing sizing;
    SteadyCycle cycle;  // with the integrated flywheel
};

// `d` is the driver with a motor and a fluctuation target that `cycles` integrates.
SizedFlywheel sizeFlywheel(CycleIntegrator& cycles, const Driver& d);

}  // namespace clevis
