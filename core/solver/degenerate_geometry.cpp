#include "core/solver/degenerate_geometry.h"

#include "core/model/model_error.h"

#include <string>
#include <variant>
#include <vector>

namespace clevis {
namespace {

// Points this close are one point: the tolerance of compile's other
// coincidence checks (a repeated pin, a cylinder's ends).
constexpr double kSamePoint = 1e-9;  // m

std::string quoted(const std::string& name) { return "\"" + name + "\""; }

// "\"O2\" and \"A\"", "\"O2\", \"A\" and \"B\"".
std::string listed(const std::vector<std::string>& names)
{
    std::string text;
    for (std::size_t k = 0; k < names.size(); ++k)
        text += (k == 0 ? "" : k + 1 == names.size() ? " and " : ", ") + quoted(names[k]);
    return text;
}

struct Attachments {
    std::vector<std::string> names;  // joints and cylinders fixed at a point of the body
    std::vector<Vec2> points;        // where, at the drawn pose
    bool directed = false;           // a slider or a slot the body carries sets its direction
};

std::vector<Attachments> attachmentsOfBodies(const Mechanism& in, const CompiledMechanism& c)
{
    std::vector<Attachments> of(c.bodies.size());
    for (std::size_t k = 0; k < c.joints.size(); ++k) {
        const CompiledJoint& j = c.joints[k];
        for (int side = 0; side < 2; ++side) {
            if (j.body[side] == kGround) continue;
            Attachments& a = of[j.body[side]];
            // The slot is cut in the first body of a pin-in-slot; the pin is
            // fixed in the second.
            if (j.type == JointType::Slider || (j.type == JointType::PinInSlot && side == 0)) {
                a.directed = true;
                continue;
            }
            a.names.push_back(j.name);
            a.points.push_back(in.joints[k].at);
        }
    }
    for (std::size_t k = 0; k < c.drivers.size(); ++k)
        for (int side = 0; side < 2; ++side)
            if (const auto& end = in.drivers[k].ends[side]; end && c.drivers[k].ends[side].body != kGround) {
                of[c.drivers[k].ends[side].body].names.push_back(c.drivers[k].name);
                of[c.drivers[k].ends[side].body].points.push_back(end->at);
            }
    return of;
}

bool allAtOnePoint(const std::vector<Vec2>& points)
{
    for (const Vec2& p : points)
        if ((p - points.front()).norm() > kSamePoint) return false;
    return true;
}

void checkBodies(const Mechanism& in, const CompiledMechanism& c)
{
    const std::vector<Attachments> of = attachmentsOfBodies(in, c);
    for (std::size_t b = 0; b < of.size(); ++b) {
        const Attachments& a = of[b];
        if (a.directed || a.points.size() < 2 || !allAtOnePoint(a.points)) continue;
        throw ModelError("bodies[" + std::to_string(b) + "]",
                         "body " + quoted(c.bodies[b].name) + " has all its joints, " + listed(a.names) +
                             ", at one point, so it is a link of zero length: it turns about that point and "
                             "carries nothing round with it. Draw its joints apart (bodies that share one pin "
                             "each need their other joints elsewhere).");
    }
}

void checkLoads(const Mechanism& in)
{
    for (std::size_t k = 0; k < in.loads.size(); ++k) {
        const auto* spring = std::get_if<SpringLoad>(&in.loads[k]);
        const auto* damper = std::get_if<DamperLoad>(&in.loads[k]);
        if (!(spring && spring->freeLength != 0.0) && !damper) continue;
        const BodyPointRef& a = spring ? spring->a : damper->a;
        const BodyPointRef& b = spring ? spring->b : damper->b;
        if ((b.at - a.at).norm() > kSamePoint) continue;
        const std::string kind = spring ? "spring" : "damper";
        throw ModelError("loads[" + std::to_string(k) + "]",
                         kind + " " + quoted(spring ? spring->name : damper->name) + " has both its ends, on " +
                             quoted(a.body) + " and " + quoted(b.body) +
                             ", at one point, so the line its force acts along is undefined there. Draw its "
                             "ends apart.");
    }
}

}  // namespace

void checkGeometryDefined(const Mechanism& in, const CompiledMechanism& compiled)
{
    checkBodies(in, compiled);
    checkLoads(in);
}

}  // namespace clevis
