// Linear driver between two points (a cylinder): the distance between a
// point on body i and a point on body j follows ℓ(t).
//
//   Φ   = |d| − ℓ(t) = 0,   d = P_j − P_i,  u = d/|d|
//   Φ_q = [ −uᵀ, −uᵀB_i s_i  |  uᵀ, uᵀB_j s_j ]
//   ν   = ℓ̇(t)
//   γ   = ℓ̈(t) − (ḋᵀḋ − (uᵀḋ)²)/|d| − uᵀ(A_i s_i φ̇_i² − A_j s_j φ̇_j²)
#include "core/solver/constraints/constraint.h"
#include "core/solver/driver_motion.h"

namespace clevis {
namespace {

class CylinderDriver final : public Constraint {
public:
    CylinderDriver(const CompiledDriver& d, int index, const DriverMotion& motion)
        : Constraint(ConstraintOwner::Driver, index), i_(d.ends[0]), j_(d.ends[1]), motion_(motion)
    {}

    int rows() const override { return 1; }
    bool angularRow(int) const override { return false; }

    void position(const Pose& q, double t, const RowWriter& out) const override
    {
        const Vec2 d = q.point(j_) - q.point(i_);
        const double length = d.norm();
        const Vec2 u = d / length;
        out.value(0, length - motion_(t).position);
        out.partial(0, i_.body, -u);
        out.partial(0, i_.body, 2, -u.dot(perp(q.arm(i_))));
        out.partial(0, j_.body, u);
        out.partial(0, j_.body, 2, u.dot(perp(q.arm(j_))));
    }

    void rates(const Pose& q, const VectorXd& qd, double t, const RowWriter& nu, const RowWriter& gamma) const override
    {
        const Vec2 d = q.point(j_) - q.point(i_);
        const double length = d.norm();
        const Vec2 u = d / length;
        const Vec2 dd = q.velocity(qd, j_) - q.velocity(qd, i_);
        const double wi = bodyRate(qd, i_.body), wj = bodyRate(qd, j_.body);
        const double along = u.dot(dd);
        const double quadratic =
            (dd.squaredNorm() - along * along) / length + u.dot(q.arm(i_) * wi * wi - q.arm(j_) * wj * wj);
        const DriveState s = motion_(t);
        nu.value(0, s.rate);
        gamma.value(0, s.accel - quadratic);
    }

private:
    BodyPoint i_, j_;
    DriverMotion motion_;
};

}  // namespace

std::unique_ptr<Constraint> makeCylinderDriver(const CompiledDriver& driver, int index, const DriverMotion& motion)
{
    return std::make_unique<CylinderDriver>(driver, index, motion);
}

}  // namespace clevis
