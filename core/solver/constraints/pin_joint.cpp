// Pin (revolute) joint: the joint point on body i and on body j coincide.
//
//   Φ   = r_j + A_j s_j − r_i − A_i s_i = 0                 (2 rows)
//   Φ_q = [ −I, −B_i s_i  |  I, B_j s_j ]
//   ν   = 0
//   γ   = A_j s_j φ̇_j² − A_i s_i φ̇_i²
#include "core/solver/constraints/constraint.h"

namespace clevis {
namespace {

class PinJoint final : public Constraint {
public:
    PinJoint(const CompiledJoint& j, int index)
        : Constraint(ConstraintOwner::Joint, index), i_(j.point[0]), j_(j.point[1])
    {}

    int rows() const override { return 2; }
    bool angularRow(int) const override { return false; }

    void position(const Pose& q, double, const RowWriter& out) const override
    {
        const Vec2 phi = q.point(j_) - q.point(i_);
        out.value(0, phi.x());
        out.value(1, phi.y());
        const Vec2 bi = perp(q.arm(i_)), bj = perp(q.arm(j_));
        for (int r = 0; r < 2; ++r) {
            out.partial(r, i_.body, r, -1.0);
            out.partial(r, i_.body, 2, -bi[r]);
            out.partial(r, j_.body, r, 1.0);
            out.partial(r, j_.body, 2, bj[r]);
        }
    }

    void rates(const Pose& q, const VectorXd& qd, double, const RowWriter& nu, const RowWriter& gamma) const override
    {
        const double wi = bodyRate(qd, i_.body), wj = bodyRate(qd, j_.body);
        const Vec2 g = q.arm(j_) * wj * wj - q.arm(i_) * wi * wi;
        for (int r = 0; r < 2; ++r) {
            nu.value(r, 0.0);
            gamma.value(r, g[r]);
        }
    }

private:
    BodyPoint i_, j_;
};

}  // namespace

std::unique_ptr<Constraint> makePinJoint(const CompiledJoint& joint, int index)
{
    return std::make_unique<PinJoint>(joint, index);
}

}  // namespace clevis
