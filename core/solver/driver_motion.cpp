#include "core/solver/driver_motion.h"

#include "core/solver/cam_law.h"

#include <algorithm>
#include <cmath>

namespace clevis {

DriverMotion::DriverMotion(const Motion& motion, double drawnPosition, double cycleDuration)
    : motion_(motion), start_(drawnPosition), cycle_(cycleDuration)
{
    if (const auto* table = std::get_if<MotionTable>(&motion_)) table_ = CubicSpline(table->time, table->position);
}

DriverMotion::DriverMotion(const CompiledDriver& driver, double cycleDuration)
    : DriverMotion(driver.motion, driver.offset, cycleDuration)
{
    found_ = driver.found;
}

// Between two samples, the quintic s(x), x = (t − t₀)/h, that matches
// position, rate and acceleration at both:
//   s = Σ c_k x^k,  c₀ = s₀, c₁ = h·ṡ₀, c₂ = h²·s̈₀/2,
//   c₃ = 10P − 4V + A/2,  c₄ = −15P + 7V − A,  c₅ = 6P − 3V + A/2,
// with P = s₁ − c₀ − c₁ − c₂, V = h·ṡ₁ − c₁ − 2c₂, A = h²·s̈₁ − 2c₂.
// Beyond the samples the cycle repeats: one period later the position has
// moved on by what it moved over the cycle.
DriveState DriverMotion::found(double t) const
{
    const MotionSample& first = found_.front();
    const MotionSample& last = found_.back();
    const double period = last.t - first.t;
    double shift = 0.0;
    if (period > 0.0 && (t < first.t || t > last.t)) {
        const double turns = std::floor((t - first.t) / period);
        t -= turns * period;
        shift = turns * (last.position - first.position);
    }
    if (found_.size() == 1) return {first.position + shift, first.rate, first.accel};
    const auto after = std::upper_bound(found_.begin() + 1, found_.end() - 1, t,
                                        [](double x, const MotionSample& s) { return x < s.t; });
    const MotionSample& a = *(after - 1);
    const MotionSample& b = *after;
    const double h = b.t - a.t, x = (t - a.t) / h;
    const double c0 = a.position, c1 = h * a.rate, c2 = 0.5 * h * h * a.accel;
    const double P = b.position - c0 - c1 - c2, V = h * b.rate - c1 - 2.0 * c2, A = h * h * b.accel - 2.0 * c2;
    const double c3 = 10.0 * P - 4.0 * V + 0.5 * A, c4 = -15.0 * P + 7.0 * V - A, c5 = 6.0 * P - 3.0 * V + 0.5 * A;
    const double s = c0 + x * (c1 + x * (c2 + x * (c3 + x * (c4 + x * c5))));
    const double ds = c1 + x * (2.0 * c2 + x * (3.0 * c3 + x * (4.0 * c4 + x * 5.0 * c5)));
    const double dds = 2.0 * c2 + x * (6.0 * c3 + x * (12.0 * c4 + x * 20.0 * c5));
    return {s + shift, ds / h, dds / (h * h)};
}

DriveState DriverMotion::operator()(double t) const
{
    if (!found_.empty()) return found(t);
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
