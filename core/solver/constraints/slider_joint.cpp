// Slider (prismatic) joint: body j keeps its angle relative to body i and its
// joint point stays on the axis through body i's joint point.
//
//   row 0:  Φ = φ_j − φ_i = 0            Φ_q = [0, 0, −1 | 0, 0, 1]   ν = 0   γ = 0
//   row 1:  Φ = nᵀ(P_j − P_i) = 0        n = A_i n', n' normal to the axis in body i;
//           Jacobian and γ = −quadratic as in line_gap.h
#include "core/solver/constraints/constraint.h"
#include "core/solver/constraints/line_gap.h"

namespace clevis {
namespace {

class SliderJoint final : public Constraint {
public:
    SliderJoint(const CompiledJoint& j, int index)
        : Constraint(ConstraintOwner::Joint, index), gap_{j.point[0], j.point[1], perp(j.axisLocal)}
    {}

    int rows() const override { return 2; }
    bool angularRow(int row) const override { return row == 0; }

    void position(const Pose& q, double, const RowWriter& out) const override
    {
        const int bi = gap_.onI.body, bj = gap_.onJ.body;
        out.value(0, q.angle(bj) - q.angle(bi));
        out.partial(0, bi, 2, -1.0);
        out.partial(0, bj, 2, 1.0);
        out.value(1, gap_.value(q));
        gap_.partials(q, 1, out);
    }

    void rates(const Pose& q, const VectorXd& qd, double, const RowWriter& nu, const RowWriter& gamma) const override
    {
        nu.value(0, 0.0);
        nu.value(1, 0.0);
        gamma.value(0, 0.0);
        gamma.value(1, -gap_.quadratic(q, qd));
    }

private:
    LineGap gap_;
};

}  // namespace

std::unique_ptr<Constraint> makeSliderJoint(const CompiledJoint& joint, int index)
{
    return std::make_unique<SliderJoint>(joint, index);
}

}  // namespace clevis
