// One position of the cycle: assemble (Newton–Raphson on Φ(q, t) = 0), then
// velocities Φ_q q̇ = ν, accelerations Φ_q q̈ = γ and the multipliers of
// M q̈ + Φ_qᵀ λ = Q, from which every reaction and driver effort follows.
#pragma once

#include "core/results/results.h"
#include "core/solver/applied_loads.h"
#include "core/solver/constraint_system.h"
#include "core/solver/jacobian_factor.h"
#include "core/solver/near_singular_measure.h"

#include <array>
#include <limits>

namespace clevis {

class StepSolver {
public:
    explicit StepSolver(const CompiledMechanism& mechanism);

    // The drawn pose: each body's centre where drawn, angle zero.
    VectorXd drawnPose() const;

    // Newton–Raphson from `q` (updated in place). False if it does not
    // converge: the mechanism cannot be assembled at time t near that pose.
    bool assemble(double t, VectorXd& q);

    // True when the constraint Jacobian at q is square and not near singular:
    // then no joint is redundant, no body moves freely and no driver
    // conflicts, and the full mobility diagnosis (checkMobility) can be skipped.
    bool regularAt(const VectorXd& q, double t);

    // Constraint residual at q in balanced units; the index of the worst row.
    double residual(const VectorXd& q, double t, int* worstRow = nullptr) const;

    // Everything at an assembled pose.
    StepResult analyse(double t, const VectorXd& q);

    // Only the velocities and accelerations at an assembled pose
    // (Φ_q q̇ = ν, Φ_q q̈ = γ); false where Φ_q cannot be factored.
    bool rates(double t, const VectorXd& q, VectorXd& qd, VectorXd& qdd);

    const ConstraintSystem& system() const { return system_; }
    const std::vector<TransmissionPin>& transmissionPins() const { return transmission_; }

    // A body a constraint acts on and the point (possibly fixed in the other
    // body) through which its force on that body is reported.
    struct ActionPoint {
        int body;
        BodyPoint at;
    };

private:
    void evaluate(const Pose& q, double t);
    void solveRates(const Pose& pose, double t, VectorXd& qd, VectorXd& qdd);
    bool newton(double t, VectorXd& q);
    void fillActions(const Pose& q, StepResult& r) const;
    void fillReactionsAndEfforts(StepResult& r) const;
    void fillGroundLoad(const std::vector<AppliedLoad>& loads, StepResult& r) const;

    const CompiledMechanism& mechanism_;
    ConstraintSystem system_;
    JacobianFactor factor_;
    NearSingularMeasure nearSingular_;  // judges each step (flagged below its threshold)
    std::vector<Eigen::Triplet<double>> entries_;
    VectorXd phi_, nu_, gamma_, zeroRates_;   // scratch, kept to avoid allocations
    std::vector<Eigen::Matrix2d> rotations_;  // of the one Pose alive at a time (evaluate, analyse)
    VectorXd entriesPose_;                    // where entries_ were taken
    double entriesTime_ = std::numeric_limits<double>::quiet_NaN();
    bool keepFactor_ = false;  // the held factorisation may start the next assembly
    std::vector<TransmissionPin> transmission_;
    std::vector<std::array<ActionPoint, 2>> actionPoints_;  // per constraint
    std::vector<int> ownerOfRow_;                           // constraint of each row
    double tolerance_;
};

}  // namespace clevis
