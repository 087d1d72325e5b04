#include "ui/canvas/driver_symbol.h"

#include "core/model/geometry.h"
#include "ui/canvas/sketch_style.h"
#include "ui/document/sketch_geometry.h"

#include <cmath>

namespace clevis::ui {
namespace {

constexpr double kArcSpanDeg = 250;
constexpr double kDefaultGapCentreDeg = 65;  // where the gap is when no body shows a direction

// The way the driver first turns: the sign of its speed (or of its
// acceleration from rest), of its rise, or of its table's first change.
bool turnsClockwise(const Driver& d)
{
    if (const auto* c = std::get_if<ConstantSpeed>(&d.motion)) return c->speed < 0 || (c->speed == 0 && c->accel < 0);
    if (const auto* r = std::get_if<Rise>(&d.motion)) return r->to < r->from;
    const auto& t = std::get<MotionTable>(d.motion);
    for (const double p : t.position)
        if (p != t.position.front()) return p < t.position.front();
    return false;
}

double screenAngleDeg(const QPointF& v) { return std::atan2(-v.y(), v.x()) * 180 / kPi; }

}  // namespace

std::optional<MotorArc> motorArc(const Mechanism& m, const ViewTransform& view, const Driver& d)
{
    const int j = jointIndex(m, d.joint);
    if (d.type != DriverType::Rotary || j < 0) return std::nullopt;
    const Joint& joint = m.joints[std::size_t(j)];
    const QPointF centre = view.toScreen(joint.at);
    // The driven body's outline seen from the pin: its mean point.
    const std::string& driven = joint.bodies[1] != kGroundName ? joint.bodies[1] : joint.bodies[0];
    double gapCentre = kDefaultGapCentreDeg;
    if (driven != kGroundName) {
        QPointF mean;
        const std::vector<Vec2> outline = bodyOutline(m, driven);
        for (const Vec2& p : outline) mean += view.toScreen(p);
        if (!outline.empty()) mean /= double(outline.size());
        if (QLineF(centre, mean).length() > 1) gapCentre = screenAngleDeg(mean - centre);
    }
    // The arc starts at one side of the gap and goes round to the other. The
    // driver turns the second body against the first; drawn on the first
    // (the second being ground), the turn is the other way.
    const double halfGap = (360 - kArcSpanDeg) / 2;
    if (turnsClockwise(d) != (driven == joint.bodies[0])) return MotorArc{centre, gapCentre - halfGap, -kArcSpanDeg};
    return MotorArc{centre, gapCentre + halfGap, kArcSpanDeg};
}

bool nearMotorArc(const MotorArc& arc, const QPointF& s, double reach)
{
    const QPointF v = s - arc.centre;
    if (std::abs(std::hypot(v.x(), v.y()) - style::kMotorRadius) > reach) return false;
    // How far round from the start, in the arc's own sense, 0 to 360°.
    const double along = std::fmod((screenAngleDeg(v) - arc.startDeg) * (arc.spanDeg < 0 ? -1 : 1) + 720, 360);
    return along <= std::abs(arc.spanDeg);
}

std::optional<QLineF> slideArrow(const Mechanism& m, const ViewTransform& view, const Driver& d)
{
    const int j = jointIndex(m, d.joint);
    if (d.type != DriverType::Linear || j < 0) return std::nullopt;
    const Joint& joint = m.joints[std::size_t(j)];
    const double a = joint.axisDeg * kPi / 180;
    const QPointF u(std::cos(a), -std::sin(a)), n(-u.y(), u.x());
    const QPointF mid = view.toScreen(joint.at) + n * (style::kBlockSize * 0.9);
    return QLineF(mid - u * 22, mid + u * 22);
}

}  // namespace clevis::ui
