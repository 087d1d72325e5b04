// Rotary driver at a pin: the rotation of body j relative to body i follows θ(t).
//
//   Φ   = φ_j − φ_i + θ₀ − θ(t) = 0      (θ₀: driver position at the drawn pose)
//   Φ_q = [0, 0, −1 | 0, 0, 1]
//   ν   = θ̇(t)
//   γ   = θ̈(t)
#include "core/solver/constraints/constraint.h"
#include "core/solver/driver_motion.h"

namespace clevis {
namespace {

class RotaryDriver final : public Constraint {
public:
    RotaryDriver(const CompiledDriver& d, const CompiledJoint& pin, int index, const DriverMotion& motion)
        : Constraint(ConstraintOwner::Driver, index)
        , i_(pin.body[0])
        , j_(pin.body[1])
        , offset_(d.offset)
        , motion_(motion)
    {}

    int rows() const override { return 1; }
    bool angularRow(int) const override { return true; }

    void position(const Pose& q, double t, const RowWriter& out) const override
    {
        out.value(0, q.angle(j_) - q.angle(i_) + offset_ - motion_(t).position);
        out.partial(0, i_, 2, -1.0);
        out.partial(0, j_, 2, 1.0);
    }

    void rates(const Pose&, const VectorXd&, double t, const RowWriter& nu, const RowWriter& gamma) const override
    {
        const DriveState s = motion_(t);
        nu.value(0, s.rate);
        gamma.value(0, s.accel);
    }

private:
    int i_, j_;
    double offset_;
    DriverMotion motion_;
};

}  // namespace

std::unique_ptr<Constraint> makeRotaryDriver(const CompiledDriver& driver, const CompiledJoint& pin, int index,
                                             const DriverMotion& motion)
{
    return std::make_unique<RotaryDriver>(driver, pin, index, motion);
}

}  // namespace clevis
