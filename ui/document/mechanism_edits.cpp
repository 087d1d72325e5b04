#include "ui/document/mechanism_edits.h"

#include "core/file/file_units.h"
#include "ui/document/part_references.h"
#include "ui/document/sketch_geometry.h"

#include <algorithm>
#include <vector>

namespace clevis::ui::edits {
namespace {

// Two points closer than this are the same place on the drawing.
constexpr double kSamePoint = 1e-9;

std::string addJoint(Mechanism& m, JointType type, const std::string& first, const std::string& second, const Vec2& at,
                     double axisDeg, NewPart kind)
{
    Joint j;
    j.name = freshName(m, kind);
    j.type = type;
    j.bodies[0] = first;
    j.bodies[1] = second;
    j.at = at;
    j.axisDeg = axisDeg;
    m.joints.push_back(j);
    return j.name;
}

bool hasBody(const Joint& j, const std::string& body) { return j.bodies[0] == body || j.bodies[1] == body; }

// The body a new pin at an occupied point hangs from, whichever of the joints
// stacked there was clicked: the frame where one of them is a ground pin, else
// the first body of the first pin there (the pin's own body for a slot, the
// block at a slider). The file keeps joints between two bodies, so a third
// body at a point gets a pin of its own to this one.
std::string baseAt(const Mechanism& m, const std::vector<int>& here)
{
    for (int i : here)
        if (m.joints[i].type == JointType::Pin && hasBody(m.joints[i], kGroundName)) return kGroundName;
    for (int i : here) {
        const Joint& j = m.joints[i];
        if (j.type != JointType::Slider) return j.type == JointType::Pin ? j.bodies[0] : j.bodies[1];
    }
    return m.joints[here.front()].bodies[1];  // a slider alone: its block
}

// Fills the joint's open slot with `body`, or adds a pin beside it.
void attach(Mechanism& m, const std::string& jointName, const std::string& body)
{
    const Vec2 at = m.joints[jointIndex(m, jointName)].at;
    const std::vector<int> here = jointsAt(m, at, kSamePoint);
    for (int i : here)
        if (hasBody(m.joints[i], body)) return;
    for (int i : here) {
        Joint& j = m.joints[i];
        if (j.type == JointType::Slider) continue;  // a link rides on the block's pin, not the guide
        if (j.bodies[0].empty() && j.type == JointType::Pin) {
            j.bodies[0] = body;
            return;
        }
        if (j.bodies[1].empty() && !j.bodies[0].empty()) {
            j.bodies[1] = body;
            return;
        }
    }
    addJoint(m, JointType::Pin, baseAt(m, here), body, at, 0.0, NewPart::Pin);
}

template <class List>
void renameAll(List& list, PartKind kind, const std::string& from, const std::string& to)
{
    for (auto& item : list) renameReferences(item, kind, from, to);
}

template <class List>
void eraseReferring(List& list, PartKind kind, const std::string& name)
{
    std::erase_if(list, [&](const auto& item) { return refersTo(item, kind, name); });
}

}  // namespace

std::string addGroundPin(Mechanism& m, const Vec2& at)
{
    return addJoint(m, JointType::Pin, kGroundName, "", at, 0.0, NewPart::Pin);
}

std::string addPin(Mechanism& m, const Vec2& at) { return addJoint(m, JointType::Pin, "", "", at, 0.0, NewPart::Pin); }

std::string addBody(Mechanism& m, const std::vector<std::string>& joints)
{
    Body b;
    b.name = freshName(m, joints.size() > 2 ? NewPart::Plate : NewPart::Link);
    m.bodies.push_back(b);
    for (const auto& j : joints) attach(m, j, b.name);
    return b.name;
}

std::string addSlider(Mechanism& m, const std::string& guide, const Vec2& at, double axisDeg)
{
    Body block;
    block.name = freshName(m, NewPart::Block);
    m.bodies.push_back(block);
    const std::string slider = addJoint(m, JointType::Slider, guide, block.name, at, axisDeg, NewPart::Slider);
    addJoint(m, JointType::Pin, block.name, "", at, 0.0, NewPart::Pin);
    return slider;
}

std::string addPinInSlot(Mechanism& m, const std::string& slotBody, const Vec2& at, double axisDeg)
{
    return addJoint(m, JointType::PinInSlot, slotBody, "", at, axisDeg, NewPart::Slot);
}

std::string addRotaryMotor(Mechanism& m, const std::string& pinJoint)
{
    Driver d;
    d.name = freshName(m, NewPart::Motor);
    d.type = DriverType::Rotary;
    d.joint = pinJoint;
    d.motion = ConstantSpeed{toSi(FileUnit::Rpm, 60.0), 0.0};  // as a file's "speed_rpm": 60 reads
    m.drivers.push_back(d);
    return d.name;
}

std::string addSliderDrive(Mechanism& m, const std::string& sliderJoint)
{
    Driver d;
    d.name = freshName(m, NewPart::Drive);
    d.type = DriverType::Linear;
    d.joint = sliderJoint;
    d.motion = MotionTable{{0.0, 1.0, 2.0}, {0.0, 0.05, 0.0}};
    m.drivers.push_back(d);
    return d.name;
}

std::string addCylinder(Mechanism& m, const BodyPointRef& a, const BodyPointRef& b)
{
    Driver d;
    d.name = freshName(m, NewPart::Cylinder);
    d.type = DriverType::Linear;
    d.ends[0] = a;
    d.ends[1] = b;
    const double length = (b.at - a.at).norm();
    // Extends by a fifth of its drawn length and retracts over two seconds.
    d.motion = MotionTable{{0.0, 1.0, 2.0}, {length, 1.2 * length, length}};
    m.drivers.push_back(d);
    return d.name;
}

void addForce(Mechanism& m, const BodyPointRef& at, const Vec2& force)
{
    ForceLoad f;
    f.name = freshName(m, NewPart::Force);
    f.point = at;
    f.force = force;
    m.loads.push_back(f);
}

void addTorque(Mechanism& m, const std::string& body, double torque)
{
    TorqueLoad t;
    t.name = freshName(m, NewPart::Torque);
    t.body = body;
    t.torque = torque;
    m.loads.push_back(t);
}

void addSpring(Mechanism& m, const BodyPointRef& a, const BodyPointRef& b)
{
    SpringLoad s;
    s.name = freshName(m, NewPart::Spring);
    s.a = a;
    s.b = b;
    s.stiffness = 1000.0;
    s.freeLength = (b.at - a.at).norm();
    m.loads.push_back(s);
}

void addDamper(Mechanism& m, const BodyPointRef& a, const BodyPointRef& b)
{
    DamperLoad d;
    d.name = freshName(m, NewPart::Damper);
    d.a = a;
    d.b = b;
    d.damping = 50.0;
    m.loads.push_back(d);
}

void addPointMass(Mechanism& m, const std::string& body, const Vec2& at, double mass)
{
    const int b = bodyIndex(m, body);
    if (b < 0) return;
    Body& target = m.bodies[b];
    target.pointMasses.push_back({freshName(m, NewPart::Mass), mass, at});
}

void moveJoint(Mechanism& m, int joint, const Vec2& to)
{
    const Vec2 from = m.joints[joint].at;
    const auto follow = [&](Vec2& p) {
        if ((p - from).norm() <= kSamePoint) p = to;
    };
    const auto followPoint = [&](PartKind, std::string&, Vec2* at) {
        if (at) follow(*at);
    };
    for (auto& j : m.joints) follow(j.at);
    for (auto& d : m.drivers) visitReferences(d, followPoint);
    for (auto& load : m.loads) visitReferences(load, followPoint);
}

namespace {

void removePart(Mechanism& m, const Selection& s)
{
    const std::string name = s.name.toStdString();
    switch (s.kind) {
    case Selection::Kind::None: return;
    case Selection::Kind::Load:
        if (s.loadIndex >= 0 && s.loadIndex < int(m.loads.size())) m.loads.erase(m.loads.begin() + s.loadIndex);
        return;
    case Selection::Kind::Driver: std::erase_if(m.drivers, [&](const Driver& d) { return d.name == name; }); return;
    case Selection::Kind::Joint: {
        std::erase_if(m.joints, [&](const Joint& j) { return j.name == name; });
        eraseReferring(m.drivers, PartKind::Joint, name);
        eraseReferring(m.loads, PartKind::Joint, name);
        // A body left with nothing holding it is no longer part of the drawing,
        // nor are the drivers and loads on it, which would name nothing.
        std::vector<std::string> unheld;
        for (const Body& b : m.bodies)
            if (bodyPins(m, b.name).empty()) unheld.push_back(b.name);
        for (const std::string& b : unheld) removePart(m, {Selection::Kind::Body, QString::fromStdString(b), -1});
        return;
    }
    case Selection::Kind::Body:
        std::erase_if(m.bodies, [&](const Body& b) { return b.name == name; });
        for (auto& j : m.joints)
            for (auto& b : j.bodies)
                if (b == name) b.clear();
        eraseReferring(m.drivers, PartKind::Body, name);
        eraseReferring(m.loads, PartKind::Body, name);
        return;
    }
}

// A profile that follows a driver no longer there cannot be evaluated (the
// file reader refuses it); the load keeps its nominal value instead.
std::vector<std::string> releaseOrphanProfiles(Mechanism& m)
{
    std::vector<std::string> released;
    for (auto& load : m.loads)
        std::visit(
            [&](auto& l) {
                if constexpr (requires { l.profile; }) {
                    if (l.profile && !l.profile->driver.empty() &&
                        std::none_of(m.drivers.begin(), m.drivers.end(),
                                     [&](const Driver& d) { return d.name == l.profile->driver; })) {
                        l.profile.reset();
                        released.push_back(l.name);
                    }
                }
            },
            load);
    return released;
}

}  // namespace

std::vector<std::string> remove(Mechanism& m, const Selection& s)
{
    removePart(m, s);
    return releaseOrphanProfiles(m);
}

void renameBody(Mechanism& m, const std::string& from, const std::string& to)
{
    const auto swap = [&](std::string& s) {
        if (s == from) s = to;
    };
    for (auto& b : m.bodies) swap(b.name);
    for (auto& j : m.joints) swap(j.bodies[0]), swap(j.bodies[1]);
    renameAll(m.drivers, PartKind::Body, from, to);
    renameAll(m.loads, PartKind::Body, from, to);
}

void renameJoint(Mechanism& m, const std::string& from, const std::string& to)
{
    for (auto& j : m.joints)
        if (j.name == from) j.name = to;
    renameAll(m.drivers, PartKind::Joint, from, to);
    renameAll(m.loads, PartKind::Joint, from, to);
}

void renameDriver(Mechanism& m, const std::string& from, const std::string& to)
{
    for (auto& d : m.drivers)
        if (d.name == from) d.name = to;
    renameAll(m.loads, PartKind::Driver, from, to);
}

}  // namespace clevis::ui::edits
