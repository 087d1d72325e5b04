#include "core/solver/compiled_mechanism.h"

#include "core/model/body_points.h"
#include "core/model/convex_hull.h"
#include "core/model/mass_properties.h"
#include "core/model/model_error.h"
#include "core/model/model_limits.h"
#include "core/model/type_names.h"
#include "core/solver/degenerate_geometry.h"

#include <Eigen/Geometry>
#include <algorithm>
#include <cmath>
#include <map>

namespace clevis {

namespace {

std::string at(const std::string& list, std::size_t i) { return list + "[" + std::to_string(i) + "]"; }

class Compiler {
public:
    explicit Compiler(const Mechanism& m) : in_(m) {}
    CompiledMechanism run();

private:
    int bodyIndex(const std::string& name, const std::string& path) const;
    int jointIndex(const std::string& name, const std::string& path) const;
    int driverIndex(const std::string& name, const std::string& path) const;
    BodyPoint point(int body, const Vec2& global) const;
    MassProperties massOf(std::size_t b) const;
    void checkAttachmentNames() const;
    void checkNotADuplicatePin(std::size_t k) const;
    void compileJoints();
    void compileDrivers();
    void compileLoads();
    std::optional<CompiledProfile> profile(const std::optional<LoadProfile>& p, const std::string& path) const;
    void chooseDuration();
    void chooseLengthScale();

    const Mechanism& in_;
    CompiledMechanism out_;
    std::map<std::string, int> bodies_, joints_, drivers_;
};

int Compiler::bodyIndex(const std::string& name, const std::string& path) const
{
    if (name == kGroundName) return kGround;
    const auto it = bodies_.find(name);
    if (it == bodies_.end()) throw ModelError(path, "no body named \"" + name + "\"");
    return it->second;
}

int Compiler::jointIndex(const std::string& name, const std::string& path) const
{
    const auto it = joints_.find(name);
    if (it == joints_.end()) throw ModelError(path, "no joint named \"" + name + "\"");
    return it->second;
}

int Compiler::driverIndex(const std::string& name, const std::string& path) const
{
    const auto it = drivers_.find(name);
    if (it == drivers_.end()) throw ModelError(path, "no driver named \"" + name + "\"");
    return it->second;
}

BodyPoint Compiler::point(int body, const Vec2& global) const
{
    return {body, body == kGround ? global : Vec2(global - out_.bodies[body].mass.cg)};
}

MassProperties Compiler::massOf(std::size_t b) const
{
    const Body& body = in_.bodies[b];
    const std::string path = at("bodies", b);
    std::vector<MassProperties> parts;
    const std::vector<Vec2> attachments = bodyAttachments(in_, body.name);
    if (body.section) {
        const auto found = sectionEnds(in_, body);
        if (!found) throw ModelError(path + ".section", "a bar needs two joints on the body, or explicit \"ends\"");
        const auto& ends = *found;
        if ((ends.second - ends.first).norm() < 1e-9)
            throw ModelError(path + ".section", "the bar has zero length (its ends coincide)");
        const BarSection& s = *body.section;
        parts.push_back(barMassProperties(ends.first, ends.second, s.width, s.thickness, s.density));
    } else if (body.plate) {
        const PlateSection& plate = *body.plate;
        const std::vector<Vec2> outline = plate.outline ? *plate.outline : convexHull(attachments);
        const MassProperties p = plateMassProperties(outline, plate.thickness, plate.density);
        if (p.mass <= 0.0)
            throw ModelError(path + ".plate",
                             plate.outline ? "the outline encloses no area"
                                           : "a plate needs three joints not on one line, or an explicit \"outline\"");
        parts.push_back(p);
    } else if (body.mass) {
        parts.push_back({*body.mass, body.cg.value_or(Vec2::Zero()), body.inertia.value_or(0.0)});
    }
    for (const auto& pm : body.pointMasses) parts.push_back(pointMassProperties(pm.mass, pm.at));
    MassProperties total = combine(parts);
    if (parts.empty() || total.mass <= 0.0) {
        // A massless body still needs a reference point: its given centre, or
        // the centroid of its attachments.
        if (body.cg) total.cg = *body.cg;
        else if (!attachments.empty()) {
            total.cg = Vec2::Zero();
            for (const auto& p : attachments) total.cg += p / double(attachments.size());
        } else throw ModelError(path, "body \"" + body.name + "\" is not attached to anything");
    }
    return total;
}

// A joint still being drawn (an empty side, which the file keeps so that a
// sketch saves as it is) cannot be analysed: say which and what it lacks.
void checkJointsComplete(const Mechanism& m)
{
    for (std::size_t k = 0; k < m.joints.size(); ++k) {
        const Joint& j = m.joints[k];
        const bool open0 = j.bodies[0].empty(), open1 = j.bodies[1].empty();
        if (!open0 && !open1) continue;
        const std::string joint = std::string(jointKindWord(j.type)) + " \"" + j.name + "\"";
        if (open0 && open1)
            throw ModelError(at("joints", k),
                             joint + " joins no part yet: connect it to two parts, or to a part and ground");
        throw ModelError(at("joints", k), joint + " joins only \"" + j.bodies[open0 ? 1 : 0] +
                                              "\": connect it to a second part or to ground");
    }
}

// Bars find their ends from the joints that name them, so a misspelt body
// name must be reported as such before any mass is worked out.
void Compiler::checkAttachmentNames() const
{
    for (std::size_t k = 0; k < in_.joints.size(); ++k)
        for (int side = 0; side < 2; ++side)
            bodyIndex(in_.joints[k].bodies[side], at("joints", k) + ".bodies[" + std::to_string(side) + "]");
    for (std::size_t k = 0; k < in_.drivers.size(); ++k)
        for (int side = 0; side < 2; ++side)
            if (const auto& end = in_.drivers[k].ends[side])
                bodyIndex(end->body, at("drivers", k) + ".between[" + std::to_string(side) + "].body");
}

// Two pins joining the same pair of bodies at the same point are one hinge
// entered twice: always a slip, and it would make both pins' reactions
// indeterminate, so it is refused here with the fix spelled out.
void Compiler::checkNotADuplicatePin(std::size_t k) const
{
    const Joint& j = in_.joints[k];
    if (j.type != JointType::Pin) return;
    const auto samePair = [&](const Joint& o) {
        return (o.bodies[0] == j.bodies[0] && o.bodies[1] == j.bodies[1]) ||
               (o.bodies[0] == j.bodies[1] && o.bodies[1] == j.bodies[0]);
    };
    for (std::size_t i = 0; i < k; ++i) {
        const Joint& o = in_.joints[i];
        if (o.type == JointType::Pin && samePair(o) && (o.at - j.at).norm() < 1e-9)
            throw ModelError(at("joints", k), "pin \"" + j.name + "\" joins \"" + j.bodies[0] + "\" and \"" +
                                                  j.bodies[1] + "\" at the same point as pin \"" + o.name + "\" (" +
                                                  at("joints", i) +
                                                  "): it is the same hinge twice; delete one of them");
    }
}

void Compiler::compileJoints()
{
    for (std::size_t k = 0; k < in_.joints.size(); ++k) {
        const Joint& j = in_.joints[k];
        const std::string path = at("joints", k);
        CompiledJoint c{j.name, j.type, {}, {}, unitFromDeg(j.axisDeg)};
        for (int side = 0; side < 2; ++side) {
            c.body[side] = bodyIndex(j.bodies[side], path + ".bodies[" + std::to_string(side) + "]");
            c.point[side] = point(c.body[side], j.at);
        }
        if (c.body[0] == c.body[1])
            throw ModelError(path + ".bodies", "a joint needs two different bodies (both are \"" + j.bodies[0] + "\")");
        checkNotADuplicatePin(k);
        joints_[j.name] = int(k);
        out_.joints.push_back(c);
    }
}

void Compiler::compileDrivers()
{
    for (std::size_t k = 0; k < in_.drivers.size(); ++k) {
        const Driver& d = in_.drivers[k];
        const std::string path = at("drivers", k);
        CompiledDriver c{d.name, d.type, -1, {}, d.offset, d.motion};
        if (!d.joint.empty()) {
            c.joint = jointIndex(d.joint, path + ".joint");
            const CompiledJoint& j = out_.joints[c.joint];
            const JointType needed = d.type == DriverType::Rotary ? JointType::Pin : JointType::Slider;
            if (j.type != needed)
                throw ModelError(path + ".joint", std::string(d.type == DriverType::Rotary ? "a rotary" : "a linear") +
                                                      " driver needs a " + jointTypeName(needed) + " joint; \"" +
                                                      j.name + "\" is a " + jointTypeName(j.type));
        } else if (d.type == DriverType::Linear && d.ends[0] && d.ends[1]) {
            for (int side = 0; side < 2; ++side) {
                const std::string endPath = path + ".between[" + std::to_string(side) + "]";
                c.ends[side] = point(bodyIndex(d.ends[side]->body, endPath + ".body"), d.ends[side]->at);
            }
            if (c.ends[0].body == c.ends[1].body)
                throw ModelError(path + ".between", "a cylinder needs two different bodies");
            const double length = (d.ends[1]->at - d.ends[0]->at).norm();
            if (length < 1e-9) throw ModelError(path + ".between", "the cylinder's ends coincide");
            c.offset = length;
        } else
            throw ModelError(path, d.type == DriverType::Rotary ? "a rotary driver needs \"joint\""
                                                                : "a linear driver needs \"joint\" or \"between\"");
        drivers_[d.name] = int(k);
        out_.drivers.push_back(c);
    }
}

std::optional<CompiledProfile> Compiler::profile(const std::optional<LoadProfile>& p, const std::string& path) const
{
    if (!p) return std::nullopt;
    CompiledProfile c;
    if (!p->driver.empty()) {
        c.driver = driverIndex(p->driver, path + ".driver");
        if (out_.drivers[c.driver].type == DriverType::Rotary) c.period = 2.0 * kPi;
    }
    c.at = p->at;
    c.factor = p->factor;
    if (c.at.empty() || c.at.size() != c.factor.size())
        throw ModelError(path, "a profile needs matching, non-empty position and factor lists");
    return c;
}

void Compiler::compileLoads()
{
    for (std::size_t k = 0; k < in_.loads.size(); ++k) {
        const std::string path = at("loads", k);
        std::visit(
            [&](const auto& load) {
                using T = std::decay_t<decltype(load)>;
                if constexpr (std::is_same_v<T, ForceLoad>) {
                    const int b = bodyIndex(load.point.body, path + ".body");
                    if (b == kGround)
                        throw ModelError(path + ".body", "a force on ground does not act on the mechanism");
                    out_.forces.push_back({load.name, point(b, load.point.at), load.force, load.turnsWithBody,
                                           profile(load.profile, path + ".profile")});
                } else if constexpr (std::is_same_v<T, TorqueLoad>) {
                    const int b = bodyIndex(load.body, path + ".body");
                    if (b == kGround)
                        throw ModelError(path + ".body", "a torque on ground does not act on the mechanism");
                    out_.torques.push_back({load.name, b, load.torque, profile(load.profile, path + ".profile")});
                } else if constexpr (std::is_same_v<T, SpringLoad> || std::is_same_v<T, DamperLoad>) {
                    const BodyPoint a = point(bodyIndex(load.a.body, path + ".a.body"), load.a.at);
                    const BodyPoint b = point(bodyIndex(load.b.body, path + ".b.body"), load.b.at);
                    if (a.body == b.body) throw ModelError(path, "both ends are on body \"" + load.a.body + "\"");
                    if constexpr (std::is_same_v<T, SpringLoad>)
                        out_.springs.push_back({load.name, a, b, load.stiffness, load.freeLength});
                    else out_.dampers.push_back({load.name, a, b, load.damping});
                } else {
                    const int j = jointIndex(load.joint, path + ".joint");
                    if (out_.joints[j].type != JointType::Pin)
                        throw ModelError(path + ".joint", "a torsion spring needs a pin joint");
                    out_.torsionSprings.push_back({load.name, j, load.stiffness, load.freeAngle});
                }
            },
            in_.loads[k]);
    }
}

// The cycle lasts `cycle.duration_s` if given; else one revolution of the
// first constant-speed rotary driver; else until the last timed motion ends.
void Compiler::chooseDuration()
{
    if (in_.cycle.duration) {
        out_.duration = *in_.cycle.duration;
        return;
    }
    for (const auto& d : in_.drivers) {
        const auto* c = std::get_if<ConstantSpeed>(&d.motion);
        if (d.type == DriverType::Rotary && c && c->speed != 0.0 && c->accel == 0.0) {
            out_.duration = 2.0 * kPi / std::abs(c->speed);
            return;
        }
    }
    double end = 0.0;
    for (const auto& d : in_.drivers) {
        if (const auto* r = std::get_if<Rise>(&d.motion); r && r->end) end = std::max(end, *r->end);
        if (const auto* t = std::get_if<MotionTable>(&d.motion); t && !t->time.empty())
            end = std::max(end, t->time.back());
    }
    if (end <= 0.0)
        throw ModelError("cycle.duration_s",
                         "needed: no constant-speed rotary driver or timed motion sets the cycle's length");
    out_.duration = end;
}

void Compiler::chooseLengthScale()
{
    Eigen::AlignedBox2d box;
    for (const auto& j : in_.joints) box.extend(j.at);
    for (const auto& b : out_.bodies) box.extend(b.mass.cg);
    out_.lengthScale = box.isEmpty() ? 1.0 : std::max(box.diagonal().norm(), 1e-3);
}

// Before any work that grows with the size: checking that a huge file is too
// large must not itself take long.
void checkSize(const Mechanism& m)
{
    const ModelSize size{m.bodies.size(), m.joints.size(), m.drivers.size(), m.loads.size(), m.cycle.steps};
    if (const auto exceeded = exceededLimit(size)) {
        const char* path = exceeded->kind == LimitKind::Bodies   ? "bodies"
                           : exceeded->kind == LimitKind::Joints ? "joints"
                           : exceeded->kind == LimitKind::Loads  ? "loads"
                                                                 : "cycle.steps";
        throw ModelError(path, exceeded->message);
    }
}

CompiledMechanism Compiler::run()
{
    checkSize(in_);
    out_.name = in_.name;
    out_.gravity = in_.gravity;
    out_.steps = in_.cycle.steps;
    for (std::size_t b = 0; b < in_.bodies.size(); ++b) {
        bodies_[in_.bodies[b].name] = int(b);
        out_.bodies.push_back({in_.bodies[b].name, {}, {}, {}, 0});
    }
    checkJointsComplete(in_);
    checkAttachmentNames();
    for (std::size_t b = 0; b < in_.bodies.size(); ++b) {
        out_.bodies[b].mass = massOf(b);
        out_.bodies[b].section = in_.bodies[b].section;
        out_.bodies[b].plate = in_.bodies[b].plate;
        out_.bodies[b].pointMasses = in_.bodies[b].pointMasses.size();
    }
    compileJoints();
    compileDrivers();
    compileLoads();
    checkGeometryDefined(in_, out_);
    chooseDuration();
    chooseLengthScale();
    return out_;
}

}  // namespace

CompiledMechanism compile(const Mechanism& mechanism) { return Compiler(mechanism).run(); }

}  // namespace clevis
