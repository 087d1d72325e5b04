#include "core/model/mass_properties.h"

namespace clevis {

MassProperties barMassProperties(const Vec2& a, const Vec2& b, double width, double thickness, double density)
{
    const double length = (b - a).norm();
    MassProperties p;
    p.mass = density * width * thickness * length;
    p.cg = 0.5 * (a + b);
    p.inertia = p.mass * (length * length + width * width) / 12.0;
    return p;
}

MassProperties pointMassProperties(double mass, const Vec2& at) { return {mass, at, 0.0}; }

MassProperties combine(const std::vector<MassProperties>& parts)
{
    MassProperties total;
    Vec2 moment = Vec2::Zero();
    for (const auto& part : parts) {
        total.mass += part.mass;
        moment += part.mass * part.cg;
    }
    if (total.mass <= 0.0) {
        if (!parts.empty()) total.cg = parts.front().cg;
        return total;
    }
    total.cg = moment / total.mass;
    for (const auto& part : parts) total.inertia += part.inertia + part.mass * (part.cg - total.cg).squaredNorm();
    return total;
}

}  // namespace clevis
