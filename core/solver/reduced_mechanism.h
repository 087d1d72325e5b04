// A mechanism with one rotary driver, reduced to that driver's coordinate θ.
//
// With q(θ) the pose and q' = ∂q/∂θ, q'' = ∂²q/∂θ² (the velocities and
// accelerations of a solve at θ̇ = 1, θ̈ = 0), so that q̇ = q'θ̇ and
// q̈ = q'θ̈ + q''θ̇², the kinetic energy is ½·J(θ)·θ̇² with
//   J = q'ᵀ M q',   J' = dJ/dθ = 2·q'ᵀ M q'',
// and the applied loads do the virtual work Q_θ·δθ, Q_θ = q'ᵀ Q(q, q̇).
// Weight, forces, torques and springs depend on the pose only (A); dampers
// pull in proportion to the velocities (B·θ̇, B ≤ 0):
//   Q_θ = A(θ) + B(θ)·θ̇,  A = q'ᵀ Q(q, 0),  B = q'ᵀ Q(q, q') − A.
// Lagrange's equation for θ, with T the driver's effort on the mechanism:
//   J·θ̈ + ½·J'·θ̇² = A + B·θ̇ + T.
// None of the four depends on the speed, so they are found once per position.
#pragma once

#include "core/solver/step_solver.h"

namespace clevis {

struct ReducedTerms {
    double inertia = 0.0;       // J, kg·m²
    double inertiaSlope = 0.0;  // J' = dJ/dθ, kg·m²/rad
    double force = 0.0;         // A, N·m
    double damping = 0.0;       // B, N·m·s/rad, ≤ 0
};

class ReducedMechanism {
public:
    // `m` has one driver, rotary, and no load that changes over time (the
    // time of a position is not known before the motion is found).
    explicit ReducedMechanism(const CompiledMechanism& m);
    ReducedMechanism(const ReducedMechanism&) = delete;
    ReducedMechanism& operator=(const ReducedMechanism&) = delete;

    // The terms at driver position θ (rad, as the driver's positions are
    // given). Throws AnalysisError where the mechanism cannot be assembled.
    ReducedTerms at(double theta);

private:
    bool reach(double theta, int depth);

    CompiledMechanism unit_;  // the mechanism with its driver at θ̇ = 1, θ̈ = 0: time t is θ − θ₀
    StepSolver solver_;
    VectorXd q_, qd_, qdd_, guess_;
    double theta_ = 0.0;  // where q_ was solved; the next pose is predicted from it
};

}  // namespace clevis
