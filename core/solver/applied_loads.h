// Everything that pushes on the bodies besides the joints and drivers:
// weight, point forces, torques, springs, dampers and torsion springs, as
// individual forces (for free-body diagrams) and summed into the generalised
// force vector Q, together with the energies and powers used for checks.
#pragma once

#include "core/solver/body_state.h"

#include <string_view>
#include <vector>

namespace clevis {

// A force through a point plus a couple, acting on one body (or ground).
struct AppliedLoad {
    std::string_view source;  // the load's name (owned by the mechanism), or "weight"
    int body = kGround;
    Vec2 at = Vec2::Zero();     // m, global
    Vec2 force = Vec2::Zero();  // N, global
    double couple = 0.0;        // N·m, counter-clockwise
};

struct LoadEnergies {
    double gravityPotential = 0.0;   // J, −Σ m g·r_G
    double springPotential = 0.0;    // J, linear and torsion springs
    double damperDissipation = 0.0;  // W, Σ c·L̇², always ≥ 0
    double appliedPower = 0.0;       // W, forces and torques (not weight, springs, dampers)
};

std::vector<AppliedLoad> appliedLoads(const CompiledMechanism& m, const Pose& q, const VectorXd& qd, double t,
                                      const std::vector<double>& drivePositions);

// Q = Σ over loads on moving bodies of [F; couple + (P − r_G) × F].
VectorXd generalizedForces(const CompiledMechanism& m, const VectorXd& q, const std::vector<AppliedLoad>& loads);

// Kinetic energy ½ Σ (m|v_G|² + I_G ω²).
double kineticEnergy(const CompiledMechanism& m, const VectorXd& qd);

LoadEnergies loadEnergies(const CompiledMechanism& m, const Pose& q, const VectorXd& qd, double t,
                          const std::vector<double>& drivePositions);

}  // namespace clevis
