#include "core/solver/driver_motion.h"

#include "core/solver/cam_law.h"

namespace clevis {

DriverMotion::DriverMotion(const Motion& motion, double drawnPosition, double cycleDuration)
    : motion_(motion), start_(drawnPosition), cycle_(cycleDuration)
{
    if (const auto* table = std::get_if<MotionTable>(&motion_)) table_ = CubicSpline(table->time, table->position);
}

DriveState DriverMotion::operator()(double t) const
{
    if (const auto* c = std::get_if<ConstantSpeed>(&motion_))
        return {start_ + c->speed * t + 0.5 * c->accel * t * t, c->speed + c->accel * t, c->accel};
    if (const auto* r = std::get_if<Rise>(&motion_)) {
        // s(t) = from + (to − from)·S(u), u = (t − t₀)/T, so ṡ = hS'/T and s̈ = hS''/T².
        const double end = r->end.value_or(cycle_);
        const double span = end - r->start, h = r->to - r->from;
        const CamValue v = evaluateCamLaw(r->law, (t - r->start) / span);
        return {r->from + h * v.s, h * v.ds / span, h * v.dds / (span * span)};
    }
    const CubicSpline::Value v = table_(t);
    return {v.y, v.dy, v.ddy};
}

}  // namespace clevis
