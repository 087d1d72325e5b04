// A constraint contributes rows Φ(q, t) = 0 to the system, with Jacobian
// Φ_q, velocity right side ν = −Φ_t and acceleration right side
// γ = −(Φ_q q̇)_q q̇ − 2Φ_qt q̇ − Φ_tt, so that Φ_q q̇ = ν and Φ_q q̈ = γ.
#pragma once

#include "core/solver/body_state.h"

#include <Eigen/SparseCore>
#include <memory>
#include <string>
#include <vector>

namespace clevis {

class DriverMotion;

// Writes one constraint's rows into the global arrays at its row offset.
class RowWriter {
public:
    RowWriter(int firstRow, VectorXd* values, std::vector<Eigen::Triplet<double>>* jacobian)
        : first_(firstRow), values_(values), jacobian_(jacobian)
    {}
    void value(int row, double v) const { (*values_)[first_ + row] = v; }
    // ∂Φ_row/∂q for one body's x (0), y (1) or φ (2); ground columns are dropped.
    void partial(int row, int body, int component, double v) const
    {
        if (body != kGround && jacobian_) jacobian_->emplace_back(first_ + row, coordinateIndex(body, component), v);
    }
    // ∂Φ_row/∂(x, y) of a body.
    void partial(int row, int body, const Vec2& v) const
    {
        partial(row, body, 0, v.x());
        partial(row, body, 1, v.y());
    }

private:
    int first_;
    VectorXd* values_;
    std::vector<Eigen::Triplet<double>>* jacobian_;
};

enum class ConstraintOwner { Joint, Driver };

class Constraint {
public:
    Constraint(ConstraintOwner owner, int index) : owner_(owner), index_(index) {}
    virtual ~Constraint() = default;

    virtual int rows() const = 0;
    // Rows that constrain an angle rather than a length (for unit balancing).
    virtual bool angularRow(int row) const = 0;
    // Φ and, when the writer carries one, the Jacobian.
    virtual void position(const Pose& q, double t, const RowWriter& out) const = 0;
    // ν = −Φ_t into `nu`, γ into `gamma`.
    virtual void rates(const Pose& q, const VectorXd& qd, double t, const RowWriter& nu,
                       const RowWriter& gamma) const = 0;

    ConstraintOwner owner() const { return owner_; }
    int ownerIndex() const { return index_; }

private:
    ConstraintOwner owner_;
    int index_;
};

std::unique_ptr<Constraint> makePinJoint(const CompiledJoint& joint, int index);
std::unique_ptr<Constraint> makeSliderJoint(const CompiledJoint& joint, int index);
std::unique_ptr<Constraint> makePinInSlotJoint(const CompiledJoint& joint, int index);
std::unique_ptr<Constraint> makeRotaryDriver(const CompiledDriver& driver, const CompiledJoint& pin, int index,
                                             const DriverMotion& motion);
std::unique_ptr<Constraint> makeSliderDriver(const CompiledDriver& driver, const CompiledJoint& slider, int index,
                                             const DriverMotion& motion);
std::unique_ptr<Constraint> makeCylinderDriver(const CompiledDriver& driver, int index, const DriverMotion& motion);

}  // namespace clevis
