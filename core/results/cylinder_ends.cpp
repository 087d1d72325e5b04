#include "core/results/cylinder_ends.h"

#include "core/solver/body_state.h"

#include <cmath>

namespace clevis {
namespace {

// A body point where it was drawn: the body frame is the global one there.
Vec2 drawnPosition(const CompiledMechanism& m, const BodyPoint& p)
{
    return p.body == kGround ? p.local : Vec2(m.bodies[std::size_t(p.body)].mass.cg + p.local);
}

double angleOf(const Vec2& v) { return std::atan2(v.y(), v.x()); }

}  // namespace

std::vector<CylinderEnd> cylinderEnds(const CompiledMechanism& m)
{
    std::vector<CylinderEnd> out;
    for (std::size_t d = 0; d < m.drivers.size(); ++d) {
        const CompiledDriver& driver = m.drivers[d];
        if (driver.type != DriverType::Linear || driver.joint >= 0) continue;
        out.push_back({driver.name + ".cap", int(d), CylinderSide::Cap, driver.ends[0].body});
        out.push_back({driver.name + ".rod", int(d), CylinderSide::Rod, driver.ends[1].body});
    }
    return out;
}

Reaction endReaction(const CompiledMechanism& m, const StepResult& s, const CylinderEnd& end)
{
    const std::size_t k = m.joints.size() + std::size_t(end.driver);  // constraints: joints, then drivers
    const int side = int(end.side);
    const ConstraintAction& own = s.actions[side][k];
    return {own.body != kGround ? own.force : Vec2(-s.actions[1 - side][k].force), 0.0};
}

double cylinderAngle(const CompiledMechanism& m, const StepResult& s, int d)
{
    const CompiledDriver& driver = m.drivers[std::size_t(d)];
    const Vec2 now = pointPosition(s.q, driver.ends[1]) - pointPosition(s.q, driver.ends[0]);
    const Vec2 drawn = drawnPosition(m, driver.ends[1]) - drawnPosition(m, driver.ends[0]);
    return std::remainder(angleOf(now) - angleOf(drawn), 2 * M_PI);
}

double cylinderRate(const CompiledMechanism& m, const StepResult& s, int d)
{
    const CompiledDriver& driver = m.drivers[std::size_t(d)];
    const Vec2 line = pointPosition(s.q, driver.ends[1]) - pointPosition(s.q, driver.ends[0]);
    const Vec2 rate = pointVelocity(s.q, s.qd, driver.ends[1]) - pointVelocity(s.q, s.qd, driver.ends[0]);
    return cross(line, rate) / line.squaredNorm();
}

}  // namespace clevis
