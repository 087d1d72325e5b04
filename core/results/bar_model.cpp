#include "core/results/bar_model.h"

#include "core/model/body_points.h"

#include <algorithm>
#include <cmath>

namespace clevis {
namespace {

// Ends closer than this are one point, as the mass properties take them.
constexpr double kSamePoint = 1e-9;  // m

std::vector<const Joint*> jointsOn(const Mechanism& doc, const std::string& body)
{
    std::vector<const Joint*> joints;
    for (const auto& j : doc.joints)
        if (j.bodies[0] == body || j.bodies[1] == body) joints.push_back(&j);
    return joints;
}

// The joint, or else the cylinder, attached to `body` at `at`; empty if none.
std::string attachmentAt(const Mechanism& doc, const std::string& body, const Vec2& at)
{
    for (const Joint* j : jointsOn(doc, body))
        if ((j->at - at).norm() < kSamePoint) return j->name;
    for (const auto& d : doc.drivers)
        for (const auto& end : d.ends)
            if (end && end->body == body && (end->at - at).norm() < kSamePoint) return d.name;
    return {};
}

MassSpread sectionSpread(const BarSection& s, double length)
{
    MassSpread spread;
    spread.mass = s.density * s.width * s.thickness * length;
    spread.to = length;
    spread.rotary = spread.mass * s.width * s.width / 12.0;
    return spread;
}

// The uniform equivalent of typed-in mass properties (see the header).
MassSpread typedSpread(const Body& body, const Vec2& a, const Vec2& e, double length)
{
    MassSpread spread;
    spread.mass = body.mass.value_or(0.0);
    const Vec2 g = body.cg.value_or(Vec2::Zero()) - a;
    const double at = g.dot(e), inertia = body.inertia.value_or(0.0);
    spread.offset = cross(e, g);
    double half = 0.0;
    if (spread.mass > 0.0) half = std::max(0.0, std::min({at, length - at, std::sqrt(3.0 * inertia / spread.mass)}));
    spread.from = at - half;
    spread.to = at + half;
    spread.rotary = std::max(0.0, inertia - spread.mass * half * half / 3.0);
    return spread;
}

std::string notABarReason(const Mechanism& doc, const Body& body)
{
    const auto joints = jointsOn(doc, body.name);
    if (joints.size() >= 3)
        return "a plate with " + std::to_string(joints.size()) +
               " joints and no section: its load paths between the joints are not one line, so statics alone "
               "does not give internal loads along an edge";
    if (joints.size() < 2) return "joined at one point only: give it a section to treat it as a bar";
    return "its two joints, \"" + joints[0]->name + "\" and \"" + joints[1]->name + "\", are at the same point";
}

}  // namespace

BarList findBars(const Mechanism& doc, const CompiledMechanism& m)
{
    BarList list;
    for (std::size_t b = 0; b < doc.bodies.size(); ++b) {
        const Body& body = doc.bodies[b];
        const auto joints = jointsOn(doc, body.name);
        std::optional<std::pair<Vec2, Vec2>> ends = sectionEnds(doc, body);
        if (!body.section && joints.size() == 2) ends = {{joints[0]->at, joints[1]->at}};
        if (!ends || (ends->second - ends->first).norm() < kSamePoint) {
            list.others.push_back({int(b), body.name, notABarReason(doc, body)});
            continue;
        }
        BarModel bar;
        bar.body = int(b);
        bar.bodyName = body.name;
        const Vec2 cg = m.bodies[b].mass.cg;
        const Vec2 at[2] = {ends->first, ends->second};
        for (int k = 0; k < 2; ++k) bar.ends[k] = {{int(b), Vec2(at[k] - cg)}, attachmentAt(doc, body.name, at[k])};
        bar.length = (at[1] - at[0]).norm();
        const Vec2 e = (at[1] - at[0]) / bar.length;
        bar.idealised = !body.section;
        bar.spread = body.section ? sectionSpread(*body.section, bar.length) : typedSpread(body, at[0], e, bar.length);
        if (body.section) {
            bar.area = body.section->width * body.section->thickness;
            bar.sectionModulus = body.section->thickness * body.section->width * body.section->width / 6.0;
        }
        for (const auto& pm : body.pointMasses) bar.pointMasses.push_back({pm.mass, {int(b), Vec2(pm.at - cg)}});
        list.bars.push_back(std::move(bar));
    }
    return list;
}

}  // namespace clevis
