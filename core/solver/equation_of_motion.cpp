#include "core/solver/equation_of_motion.h"

#include "core/solver/motor_characteristic.h"

namespace clevis {

DriveTrain driveTrainOf(const Driver& d, double flywheelInertia)
{
    DriveTrain out;
    out.motor = *d.motor;
    if (d.gearbox) {
        out.ratio = d.gearbox->ratio;
        out.efficiency = d.gearbox->efficiency;
        out.motorInertia = d.gearbox->motorInertia + d.gearbox->gearboxInertia;
    }
    const bool onMotor = d.flywheel && d.flywheel->on == FlywheelShaft::Motor;
    (onMotor ? out.motorInertia : out.outputInertia) += flywheelInertia;
    const auto& c = std::get<ConstantSpeed>(d.motion);  // the file reader asks a motor's driver for one
    out.direction = c.speed < 0.0 ? -1 : 1;
    return out;
}

DriveAcceleration driveAcceleration(const DriveTrain& d, const ReducedTerms& terms, double speed)
{
    const double i = d.ratio, eta = d.efficiency;
    const double motorSpeed = i * speed * d.direction;  // ≥ 0 while the motor turns its own way
    const double torque = d.direction * characteristicTorque(d.motor, motorSpeed);
    const double load = 0.5 * terms.inertiaSlope * speed * speed - terms.force - terms.damping * speed;
    const double output = terms.inertia + d.outputInertia;
    double accel = (torque - load / (eta * i)) / (d.motorInertia * i + output / (eta * i));
    if ((output * accel + load) * speed < 0.0)  // the mechanism drives the motor
        accel = (torque - load * eta / i) / (d.motorInertia * i + output * eta / i);
    return {accel, torque};
}

}  // namespace clevis
