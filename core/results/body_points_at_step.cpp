#include "core/results/body_points_at_step.h"

#include "core/solver/body_state.h"

namespace clevis {

std::vector<BodyPointOf> bodyPointsAt(const CompiledMechanism& m, const StepResult& step, int body)
{
    const Eigen::VectorXd& q = step.q;
    std::vector<BodyPointOf> points;
    for (const auto& j : m.joints)
        for (int side = 0; side < 2; ++side) {
            if (j.body[side] != body) continue;
            const Vec2 axis = rotation(bodyAngle(q, j.body[0])) * j.axisLocal;
            const Vec2 at = pointPosition(q, j.point[side]);
            points.push_back({jointPointKind(j.type, side), at, axis, pointPosition(q, j.point[1])});
        }
    const auto add = [&](BodyPointKind kind, const BodyPoint& p) {
        if (p.body == body) points.push_back({kind, pointPosition(q, p)});
    };
    for (const auto& d : m.drivers)
        if (d.joint < 0)
            for (const auto& end : d.ends) add(BodyPointKind::CylinderEnd, end);
    for (const auto& f : m.forces) add(BodyPointKind::LoadPoint, f.point);
    for (const auto& s : m.springs) add(BodyPointKind::LoadPoint, s.a), add(BodyPointKind::LoadPoint, s.b);
    for (const auto& d : m.dampers) add(BodyPointKind::LoadPoint, d.a), add(BodyPointKind::LoadPoint, d.b);
    points.push_back({BodyPointKind::Centre, bodyOrigin(q, body)});
    return points;
}

}  // namespace clevis
