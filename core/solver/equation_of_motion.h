// The equation of motion of a mechanism driven by a motor through a gearbox,
// with flywheels on either shaft, in the driver's coordinate θ.
//
// The motor gives T_e(ω_m) at ω_m = i·θ̇ (its characteristic). On the motor
// shaft the rotor, the gearbox (referred there) and a flywheel there, J_mo
// in all, take J_mo·i·θ̈; the rest, T_in, enters the gearbox. The gearbox
// loses (1 − η) of the power in the direction it flows, so the output
// torque is T_o = η·i·T_in while the motor drives (T_o·θ̇ ≥ 0) and
// T_o = i·T_in/η while the mechanism drives the motor. A flywheel on the
// output takes J_fo·θ̈ of T_o; the mechanism (reduced_mechanism.h) the rest:
//   T_o = (J + J_fo)·θ̈ + c,  c = ½·J'·θ̇² − A − B·θ̇,
//   T_e − J_mo·i·θ̈ = T_o/(η·i)  (driving)  or  T_o·η/i  (braking).
// Each side is a straight line in θ̈, falling on the left and rising on the
// right, so exactly one θ̈ meets both:
//   θ̈ = (T_e − c/(η·i)) / (J_mo·i + (J + J_fo)/(η·i))   while driving,
//   θ̈ = (T_e − c·η/i) / (J_mo·i + (J + J_fo)·η/i)       while braking.
#pragma once

#include "core/model/mechanism.h"
#include "core/solver/reduced_mechanism.h"

namespace clevis {

struct DriveTrain {
    MotorCharacteristic motor;
    double ratio = 1.0;          // i, motor turns per output turn
    double efficiency = 1.0;     // η
    double motorInertia = 0.0;   // J_mo, kg·m² at the motor shaft: rotor, gearbox, a flywheel there
    double outputInertia = 0.0;  // J_fo, kg·m², a flywheel on the output
    int direction = 1;           // +1 or −1: the sense in which the motor turns the driver
};

// The drive train of a rotary driver with a motor, its flywheel (if any)
// given the inertia `flywheelInertia` on its shaft.
DriveTrain driveTrainOf(const Driver& d, double flywheelInertia);

struct DriveAcceleration {
    double accel = 0.0;        // θ̈, rad/s²
    double motorTorque = 0.0;  // T_e at the motor shaft, N·m (signed with the driver's coordinate)
};

// θ̈ at speed θ̇ = `speed` (rad/s, signed) where the mechanism has `terms`.
DriveAcceleration driveAcceleration(const DriveTrain& d, const ReducedTerms& terms, double speed);

}  // namespace clevis
