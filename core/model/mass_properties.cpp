#include "core/model/mass_properties.h"

#include <cmath>

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

MassProperties plateMassProperties(const std::vector<Vec2>& outline, double thickness, double density)
{
    double area2 = 0.0, polar12 = 0.0;  // 2A and 12·J₀
    Vec2 first6 = Vec2::Zero();         // 6A·C
    const std::size_t n = outline.size();
    for (std::size_t i = 0; i < n; ++i) {
        const Vec2 a = outline[i] - outline[0], b = outline[(i + 1) % n] - outline[0];
        const double c = cross(a, b);
        area2 += c;
        first6 += (a + b) * c;
        polar12 += c * (a.x() * a.x() + a.x() * b.x() + b.x() * b.x() + a.y() * a.y() + a.y() * b.y() + b.y() * b.y());
    }
    MassProperties p;
    if (area2 == 0.0) {
        p.cg = n ? outline[0] : Vec2::Zero();
        return p;
    }
    const double area = area2 / 2.0;
    const Vec2 centroid = first6 / (3.0 * area2);
    const double surface = density * thickness;  // kg/m²
    p.mass = surface * std::abs(area);
    p.cg = outline[0] + centroid;
    p.inertia = surface * (std::abs(polar12 / 12.0) - std::abs(area) * centroid.squaredNorm());
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
