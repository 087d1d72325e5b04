// What the solved cycle asks of each driver's drive: the motor of a rotary
// driver with a gearbox (speed and torque at the motor shaft, their peaks
// and RMS, the energy it must take back, the inertia it sees), and the
// cylinder of a linear driver (pressure, flow), at the motion the cycle was
// solved at (prescribed, or found for a motor: core/solver/motor_drive.h);
// the equations are above the code in drive_train.cpp.
#pragma once

#include "core/results/cycle_summary.h"
#include "core/results/ratio_study.h"
#include "core/solver/motor_drive.h"

#include <optional>
#include <vector>

namespace clevis {

// Common practice for servo and stepper drives (a rule of thumb, not a
// standard): keep the load inertia reflected to the motor shaft within about
// 10 times the rotor's, nearer 1–5 for quick, stiff positioning.
inline constexpr double kInertiaRatioGuide = 10.0;

// The mechanism's generalised inertia at the driver, J = Σ (m v_G² + I ω²)/θ̇²,
// reflected to the motor shaft (J/i²), at its smallest and largest over the
// cycle (values in kg·m²), and the largest over the rotor's inertia J_m.
struct ReflectedInertia {
    PeakAt smallest, largest;            // kg·m² at the motor shaft
    std::optional<double> ratioToRotor;  // largest / J_m; none when J_m = 0
};

struct MotorDuty {
    int driver = -1;  // index into CompiledMechanism::drivers
    Gearbox gearbox;
    std::optional<Flywheel> flywheel;      // with the inertia used (a sized one if sized)
    std::vector<double> speed, torque;     // per step at the motor shaft: rad/s, N·m
    Peak torquePeak;                       // N·m, signed, largest magnitude
    double torqueRms = 0, torqueMean = 0;  // N·m, over time
    Peak speedPeak;                        // rad/s, |ω_m|
    Peak powerPeak;                        // W at the motor shaft, largest (none if never positive)
    double powerRms = 0;                   // W
    double regenerated = 0;                // J per cycle returned to the motor shaft, ≥ 0
    // Only for a mechanism with this one driver, which alone sets its speed.
    std::optional<ReflectedInertia> reflected;
};

struct CylinderDuty {
    int driver = -1;
    Cylinder cylinder;
    std::vector<double> pressure, flow;  // per step: Pa on the working side; m³/s into it
    Peak pressurePeak;                   // Pa
    Peak flowPeak;                       // m³/s, signed, largest magnitude
    int firstOverSupply = -1;            // first step whose pressure exceeds the supply, or -1
    int stepsOverSupply = 0;
};

// The warning codes of DriveResults.
inline constexpr const char* kDriveNotIntegrated = "drive_not_integrated";
inline constexpr const char* kCylinderOverSupply = "cylinder_over_supply";

struct DriveResults {
    // The motion found for a driver with a motor characteristic (the cycle
    // was solved at it), with the flywheel sizing when asked for.
    std::optional<FoundMotion> found;
    std::vector<MotorDuty> motors;
    std::vector<CylinderDuty> cylinders;
    std::vector<RatioStudy> studies;  // when asked for (ratioStudy)
    // Drive data this analysis could not use (a flywheel or fluctuation
    // target without a motor characteristic, a motor whose motion was not
    // found), and cylinders short of pressure.
    std::vector<Warning> warnings;
};

// `doc` is the mechanism `m` was compiled from; `unreliable` as in the
// summary (unreliableSteps); `found` the motion `r` was solved at, if it was
// found rather than prescribed (solveCycle).
DriveResults driveResults(const Mechanism& doc, const CompiledMechanism& m, const CycleResult& r,
                          const std::vector<bool>& unreliable, const std::optional<FoundMotion>& found = std::nullopt);

// The motor-shaft torque at one step for a gearbox of ratio `ratio` (the
// rest of `g` as given): see drive_train.cpp.
double motorTorque(const Gearbox& g, double ratio, double torque, double speed, double accel);

// The driver's angular acceleration at a step (rad/s²): its second body's
// relative to its first.
double driverAcceleration(const CompiledMechanism& m, int driver, const StepResult& s);

// The cylinder's areas: the full bore (pushing) and the annulus round the rod (pulling), m².
double capArea(const Cylinder& c);
double annulusArea(const Cylinder& c);

}  // namespace clevis
