// Two laws the reported results of any solved step must obey, whatever the
// mechanism:
//  - Newton–Euler for each body: the reported joint reactions and driver
//    efforts plus the applied loads on it add up to m·a_G, and their moment
//    about its centre of mass to I_G·α;
//  - the work–energy theorem for the whole mechanism, in rate form: the
//    drivers' power equals dT/dt + dV_gravity/dt + dV_springs/dt + the damper
//    dissipation − the power of the applied forces and torques, every rate
//    computed analytically from q, q̇ and q̈ at that step.
// Residuals are compared with the sum of the magnitudes of the terms that
// make them up, so the checks scale from a 30 N flap folder to a 40 kN press.
#pragma once

#include "core/results/results.h"

#include <cmath>
#include <string>
#include <vector>

namespace clevis::test {

inline constexpr double kEquilibriumTolerance = 1e-8;
inline constexpr double kPowerTolerance = 1e-6;
inline constexpr double kFloor = 1e-9;  // N, N·m or W: below this a residual is zero

// The terms of the work–energy theorem at one step, W.
struct PowerTerms {
    double drivers = 0, kinetic = 0, gravity = 0, springs = 0, dampers = 0, loads = 0;
    double residual() const { return drivers - (kinetic + gravity + springs + dampers - loads); }
    double gross() const
    {
        return std::abs(drivers) + std::abs(kinetic) + std::abs(gravity) + std::abs(springs) + std::abs(dampers) +
               std::abs(loads);
    }
};

PowerTerms powerTerms(const CompiledMechanism& m, const StepResult& s);

// Each law broken at the step, described with its figures; empty when all hold.
std::vector<std::string> newtonEulerBreaches(const CompiledMechanism& m, const StepResult& s);
std::vector<std::string> powerBalanceBreaches(const CompiledMechanism& m, const StepResult& s);

}  // namespace clevis::test
