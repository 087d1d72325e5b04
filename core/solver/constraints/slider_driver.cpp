// Linear driver at a slider: the displacement of body j along the axis fixed
// in body i follows s(t).
//
//   Φ   = uᵀ(P_j − P_i) + s₀ − s(t) = 0,   u = A_i u', the axis in body i
//   Φ_q as in line_gap.h with e' = u'
//   ν   = ṡ(t)
//   γ   = s̈(t) − quadratic (line_gap.h)
#include "core/solver/constraints/constraint.h"
#include "core/solver/constraints/line_gap.h"
#include "core/solver/driver_motion.h"

namespace clevis {
namespace {

class SliderDriver final : public Constraint {
public:
    SliderDriver(const CompiledDriver& d, const CompiledJoint& slider, int index, const DriverMotion& motion)
        : Constraint(ConstraintOwner::Driver, index)
        , gap_{slider.point[0], slider.point[1], slider.axisLocal}
        , offset_(d.offset)
        , motion_(motion)
    {}

    int rows() const override { return 1; }
    bool angularRow(int) const override { return false; }

    void position(const Pose& q, double t, const RowWriter& out) const override
    {
        out.value(0, gap_.value(q) + offset_ - motion_(t).position);
        gap_.partials(q, 0, out);
    }

    void rates(const Pose& q, const VectorXd& qd, double t, const RowWriter& nu, const RowWriter& gamma) const override
    {
        const DriveState s = motion_(t);
        nu.value(0, s.rate);
        gamma.value(0, s.accel - gap_.quadratic(q, qd));
    }

private:
    LineGap gap_;
    double offset_;
    DriverMotion motion_;
};

}  // namespace

std::unique_ptr<Constraint> makeSliderDriver(const CompiledDriver& driver, const CompiledJoint& slider, int index,
                                             const DriverMotion& motion)
{
    return std::make_unique<SliderDriver>(driver, slider, index, motion);
}

}  // namespace clevis
