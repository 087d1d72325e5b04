// Pin in a straight slot: the pin on body j stays on the slot line fixed in
// body i; the pin may slide along it and turn freely.
//
//   Φ = nᵀ(P_j − P_i) = 0,   n = A_i n', n' normal to the slot in body i   (1 row)
//   Jacobian and γ = −quadratic as in line_gap.h; ν = 0
#include "core/solver/constraints/constraint.h"
#include "core/solver/constraints/line_gap.h"

namespace clevis {
namespace {

class PinInSlotJoint final : public Constraint {
public:
    PinInSlotJoint(const CompiledJoint& j, int index)
        : Constraint(ConstraintOwner::Joint, index), gap_{j.point[0], j.point[1], perp(j.axisLocal)}
    {}

    int rows() const override { return 1; }
    bool angularRow(int) const override { return false; }

    void position(const Pose& q, double, const RowWriter& out) const override
    {
        out.value(0, gap_.value(q));
        gap_.partials(q, 0, out);
    }

    void rates(const Pose& q, const VectorXd& qd, double, const RowWriter& nu, const RowWriter& gamma) const override
    {
        nu.value(0, 0.0);
        gamma.value(0, -gap_.quadratic(q, qd));
    }

private:
    LineGap gap_;
};

}  // namespace

std::unique_ptr<Constraint> makePinInSlotJoint(const CompiledJoint& joint, int index)
{
    return std::make_unique<PinInSlotJoint>(joint, index);
}

}  // namespace clevis
