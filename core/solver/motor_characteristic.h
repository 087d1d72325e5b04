// A motor's torque against its speed, both at its shaft, in the motor's own
// sense of turning (the speed is ≥ 0 while it drives forward).
#pragma once

#include "core/model/mechanism.h"

namespace clevis {

// The line T = T_s·(1 − ω/ω₀), or the table joined by straight lines; both
// continue straight beyond their ends (above the no-load speed the motor
// brakes, as an induction motor does above its synchronous speed).
double characteristicTorque(const MotorCharacteristic& c, double speed);

// The speed at which the motor no longer gives torque: the line's no-load
// speed; a table's first fall to zero, or its last speed if it never falls.
double noLoadSpeed(const MotorCharacteristic& c);

}  // namespace clevis
