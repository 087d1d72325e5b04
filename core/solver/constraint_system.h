// All constraint rows of a mechanism (joints first, then drivers) and their
// assembly into Φ, Φ_q, ν and γ.
//
// Units are balanced for the linear algebra: the solver works with the
// scaled Jacobian J̃ = D_r Φ_q D_c, where D_c divides each body's φ column by
// that body's size L_b (so rotations count as arc lengths) and D_r
// multiplies each angular row by the size of the bodies it turns. Every
// entry of J̃ is then dimensionless and of order one, which makes its
// condition number a fair measure of how close the mechanism is to a
// singular position.
#pragma once

#include "core/solver/constraints/constraint.h"
#include "core/solver/driver_motion.h"

#include <vector>

namespace clevis {

class ConstraintSystem {
public:
    explicit ConstraintSystem(const CompiledMechanism& mechanism, bool includeDrivers = true);

    int coordinates() const { return coordinates_; }
    int rows() const { return rows_; }
    const std::vector<std::unique_ptr<Constraint>>& constraints() const { return constraints_; }
    int firstRow(std::size_t constraint) const { return firstRow_[constraint]; }
    const std::vector<DriverMotion>& motions() const { return motions_; }

    // Φ into `phi` and the scaled Jacobian J̃ into `jacobian` (may be null).
    void position(const Pose& q, double t, VectorXd& phi, std::vector<Eigen::Triplet<double>>* jacobian) const;
    // ν and γ, unscaled.
    void rates(const Pose& q, const VectorXd& qd, double t, VectorXd& nu, VectorXd& gamma) const;

    const VectorXd& rowScale() const { return rowScale_; }
    const VectorXd& columnScale() const { return columnScale_; }

private:
    void balanceUnits(const CompiledMechanism& m);

    std::vector<std::unique_ptr<Constraint>> constraints_;
    std::vector<int> firstRow_;
    std::vector<DriverMotion> motions_;
    VectorXd rowScale_, columnScale_;
    int coordinates_ = 0, rows_ = 0;
};

}  // namespace clevis
