#include "core/results/free_body.h"

#include "core/solver/applied_loads.h"

#include <optional>
#include <stdexcept>

namespace clevis {
namespace {

// The applied load's kind, found by which of the mechanism's names its source
// view points into (names can repeat across kinds; the storage cannot).
template <class List>
bool ownedBy(const List& list, std::string_view source)
{
    for (const auto& item : list)
        if (item.name.data() == source.data()) return true;
    return false;
}

Vec2 axisOf(const StepResult& s, const CompiledJoint& j)
{
    return j.type == JointType::Pin ? Vec2::Zero() : Vec2(rotation(bodyAngle(s.q, j.body[0])) * j.axisLocal);
}

std::optional<Vec2> actionPoint(const CompiledMechanism& m, const Pose& q, std::size_t k)
{
    const BodyPoint* contact = contactOf(m, k);
    if (!contact) return std::nullopt;
    return q.point(*contact);
}

FreeBodyItem fromAction(const ConstraintAction& a)
{
    FreeBodyItem item;
    item.at = a.at;
    item.force = a.force;
    item.couple = a.couple;
    return item;
}

using ItemsPerBody = std::vector<std::vector<FreeBodyItem>>;

void addJointReactions(const CompiledMechanism& m, const StepResult& s, const Pose& q, ItemsPerBody& out)
{
    for (std::size_t k = 0; k < m.joints.size(); ++k) {
        const CompiledJoint& j = m.joints[k];
        for (int side = 0; side < 2; ++side) {
            if (j.body[side] == kGround) continue;
            FreeBodyItem item = fromAction(placedAction(m, s, q, k, side));
            item.kind = FreeBodyItemKind::JointReaction;
            item.name = j.name;
            item.otherBody = m.bodyName(j.body[1 - side]);
            item.jointType = j.type;
            item.axis = axisOf(s, j);
            out[j.body[side]].push_back(std::move(item));
        }
    }
}

void addDriverActions(const CompiledMechanism& m, const StepResult& s, const Pose& q, ItemsPerBody& out)
{
    for (std::size_t d = 0; d < m.drivers.size(); ++d) {
        const CompiledDriver& driver = m.drivers[d];
        const std::size_t k = m.joints.size() + d;
        for (int side = 0; side < 2; ++side) {
            const ConstraintAction& a = s.actions[side][k];
            if (a.body == kGround) continue;
            FreeBodyItem item = fromAction(placedAction(m, s, q, k, side));
            int other = s.actions[1 - side][k].body;
            if (driver.joint >= 0) {
                const CompiledJoint& j = m.joints[driver.joint];
                item.jointType = j.type;
                item.axis = axisOf(s, j);
                other = j.body[1 - side];
            } else {
                item.axis = (pointPosition(s.q, driver.ends[1]) - pointPosition(s.q, driver.ends[0])).normalized();
            }
            item.kind = FreeBodyItemKind::DriverAction;
            item.name = driver.name;
            item.otherBody = m.bodyName(other);
            out[a.body].push_back(std::move(item));
        }
    }
}

void addAppliedLoads(const CompiledMechanism& m, const StepResult& s, const Pose& q, ItemsPerBody& out)
{
    for (const AppliedLoad& l : appliedLoads(m, q, s.qd, s.t, s.drivePosition)) {
        if (l.body == kGround) continue;
        FreeBodyItem item;
        item.kind = loadKind(m, l.source);
        item.name = std::string(l.source);
        item.at = l.at;
        item.force = l.force;
        item.couple = l.couple;
        out[l.body].push_back(std::move(item));
    }
}

FreeBodyEquation equation(double sum, double kinetic) { return {sum, kinetic, sum - kinetic}; }

}  // namespace

const BodyPoint* contactOf(const CompiledMechanism& m, std::size_t k)
{
    const std::size_t joints = m.joints.size();  // constraints: joints, then drivers
    const int joint = k < joints ? int(k) : m.drivers[k - joints].joint;
    return joint < 0 ? nullptr : &m.joints[std::size_t(joint)].point[1];
}

ConstraintAction placedAt(const ConstraintAction& a, const std::optional<Vec2>& at)
{
    if (!at) return a;
    return {*at, a.force, a.couple + cross(a.at - *at, a.force), a.body};
}

ConstraintAction placedAction(const CompiledMechanism& m, const StepResult& s, const Pose& q, std::size_t k, int side)
{
    return placedAt(s.actions[side][k], actionPoint(m, q, k));
}

FreeBodyItemKind loadKind(const CompiledMechanism& m, std::string_view source)
{
    if (ownedBy(m.forces, source)) return FreeBodyItemKind::Force;
    if (ownedBy(m.torques, source)) return FreeBodyItemKind::Torque;
    if (ownedBy(m.springs, source)) return FreeBodyItemKind::Spring;
    if (ownedBy(m.dampers, source)) return FreeBodyItemKind::Damper;
    if (ownedBy(m.torsionSprings, source)) return FreeBodyItemKind::TorsionSpring;
    return FreeBodyItemKind::Weight;
}

std::vector<std::vector<FreeBodyItem>> freeBodyItems(const CompiledMechanism& m, const StepResult& s)
{
    ItemsPerBody items(m.bodies.size());
    const Pose q(s.q);
    addJointReactions(m, s, q, items);
    addDriverActions(m, s, q, items);
    addAppliedLoads(m, s, q, items);
    return items;
}

FreeBodyDiagram freeBodyDiagram(const CompiledMechanism& m, const CycleResult& r, int body, int step)
{
    if (body < 0 || body >= int(m.bodies.size()))
        throw std::out_of_range("free-body diagram: body index " + std::to_string(body) + " is not a moving body");
    if (step < 0 || step >= int(r.steps.size()))
        throw std::out_of_range("free-body diagram: step " + std::to_string(step) + " is outside the solved cycle");
    const StepResult& s = r.steps[step];
    FreeBodyDiagram d;
    d.body = body;
    d.bodyName = m.bodies[body].name;
    d.step = step;
    d.t = s.t;
    d.cg = bodyOrigin(s.q, body);
    d.angle = bodyAngle(s.q, body);
    d.mass = m.bodies[body].mass.mass;
    d.inertia = m.bodies[body].mass.inertia;
    d.accel = s.qdd.segment<2>(3 * body);
    d.alpha = s.qdd[3 * body + 2];
    d.items = std::move(freeBodyItems(m, s)[body]);

    Vec2 force = Vec2::Zero();
    double moment = 0.0;
    for (const auto& item : d.items) {
        force += item.force;
        moment += item.couple + cross(item.at - d.cg, item.force);
    }
    d.fx = equation(force.x(), d.inertiaForce().x());
    d.fy = equation(force.y(), d.inertiaForce().y());
    d.moment = equation(moment, d.inertiaCouple());
    return d;
}

int findBody(const CompiledMechanism& m, const std::string& name)
{
    if (name == kGroundName) return kGround;
    for (std::size_t b = 0; b < m.bodies.size(); ++b)
        if (m.bodies[b].name == name) return int(b);
    return -2;
}

const char* freeBodyItemKindName(FreeBodyItemKind kind)
{
    switch (kind) {
    case FreeBodyItemKind::JointReaction: return "joint";
    case FreeBodyItemKind::DriverAction: return "driver";
    case FreeBodyItemKind::Weight: return "weight";
    case FreeBodyItemKind::Force: return "force";
    case FreeBodyItemKind::Torque: return "torque";
    case FreeBodyItemKind::Spring: return "spring";
    case FreeBodyItemKind::Damper: return "damper";
    case FreeBodyItemKind::TorsionSpring: return "torsion spring";
    }
    return "load";
}

}  // namespace clevis
