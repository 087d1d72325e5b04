// Prescribed position, rate and acceleration of a driver's coordinate.
#pragma once

#include "core/solver/compiled_mechanism.h"
#include "core/solver/cubic_spline.h"

namespace clevis {

struct DriveState {
    double position, rate, accel;  // rad or m, per s, per s²
};

class DriverMotion {
public:
    // A prescribed motion starting from `drawnPosition`.
    DriverMotion(const Motion& motion, double drawnPosition, double cycleDuration);
    // The driver's found motion if it has one, else its prescribed motion.
    DriverMotion(const CompiledDriver& driver, double cycleDuration);
    DriveState operator()(double t) const;

private:
    DriveState found(double t) const;

    Motion motion_;
    double start_;  // constant speed: position at t = 0
    double cycle_;
    CubicSpline table_;
    std::vector<MotionSample> found_;
};

}  // namespace clevis
