#include "tests/random_edits.h"

#include "ui/document/mechanism_edits.h"

#include <gtest/gtest.h>

#include <limits>

namespace clevis::test {

using ui::Selection;
namespace edits = ui::edits;

double RandomEdits::number()
{
    // Now and then a value no form should let through, or one at the edge of what a double holds.
    static const double odd[] = {std::numeric_limits<double>::quiet_NaN(),
                                 std::numeric_limits<double>::infinity(),
                                 -std::numeric_limits<double>::infinity(),
                                 1e308,
                                 5e-324,
                                 -0.0};
    if (pick(40) == 0) return odd[pick(6)];
    return std::uniform_real_distribution<double>(-0.5, 2.0)(rng_);
}

Vec2 RandomEdits::point()
{
    if (pick(60) == 0) return {number(), number()};
    return {0.01 * pick(30), 0.01 * pick(30)};
}

std::string RandomEdits::someName()
{
    // Names in use, names of the frame or of nothing, and text the file must escape.
    static const char* const names[] = {"crank",     "rocker",     "pin 3",   "link 1",       "motor 1",
                                        "",          "ground",     "pin 1",   "say \"when\"", "back\\slash",
                                        "tab\there", "two\nlines", "Ø 20 µm", " spaced ",     "\x01"};
    return names[pick(int(std::size(names)))];
}

std::string RandomEdits::bodyOrGround(const Mechanism& m)
{
    return m.bodies.empty() || pick(4) == 0 ? std::string(kGroundName) : nameIn(m.bodies);
}

std::string RandomEdits::step()
{
    switch (pick(22)) {
    case 0: return apply("Add ground pin", [p = point()](Mechanism& m) { edits::addGroundPin(m, p); });
    case 1: return apply("Add pin", [p = point()](Mechanism& m) { edits::addPin(m, p); });
    case 2: return addBody();
    case 3:
        return apply("Add slider", [g = bodyOrGround(doc_.mechanism()), p = point(), a = angle()](Mechanism& m) {
            edits::addSlider(m, g, p, a);
        });
    case 4:
        return apply("Add pin in slot", [g = bodyOrGround(doc_.mechanism()), p = point(), a = angle()](Mechanism& m) {
            edits::addPinInSlot(m, g, p, a);
        });
    case 5: return addDriver();
    case 6: return addLoad();
    case 7:
    case 8: return moveJoint();
    case 9: return removePart();
    case 10: return rename();
    case 11: return setValue();
    case 12: return setJointValue();
    case 13: return setDriverValue();
    case 14: return setLoadValue();
    case 15:
        return apply("Add point mass", [b = bodyOrGround(doc_.mechanism()), p = point(), v = number()](Mechanism& m) {
            edits::addPointMass(m, b, p, v);
        });
    case 16:
    case 17:
    case 18: doc_.undoStack()->undo(); return "undo";
    default: doc_.undoStack()->redo(); return "redo";
    }
}

std::string RandomEdits::apply(const std::string& what, const std::function<void(Mechanism&)>& edit)
{
    const Mechanism before = doc_.mechanism();
    const QString why = doc_.apply(QString::fromStdString(what), edit, what == "Move pin" ? 1 : -1);
    if (!why.isEmpty()) EXPECT_EQ(doc_.mechanism(), before) << "refused, yet changed: " << what;
    return what + (why.isEmpty() ? "" : " (refused: " + why.toStdString() + ")");
}

std::string RandomEdits::addBody()
{
    const Mechanism& m = doc_.mechanism();
    if (m.joints.size() < 2) return "add link (too few pins)";
    std::vector<std::string> joints{nameIn(m.joints), nameIn(m.joints)};
    if (pick(3) == 0) joints.push_back(nameIn(m.joints));
    if (joints[0] == joints[1]) return "add link (one pin)";
    return apply("Add link", [joints](Mechanism& m) { edits::addBody(m, joints); });
}

std::string RandomEdits::addDriver()
{
    const std::string joint = nameIn(doc_.mechanism().joints);
    if (joint.empty()) return "add motor (no pin)";
    if (pick(2)) return apply("Add motor", [joint](Mechanism& m) { edits::addRotaryMotor(m, joint); });
    return apply("Add drive", [joint](Mechanism& m) { edits::addSliderDrive(m, joint); });
}

std::string RandomEdits::addLoad()
{
    const Mechanism& m = doc_.mechanism();
    const BodyPointRef a{bodyOrGround(m), point()}, b{bodyOrGround(m), point()};
    switch (pick(6)) {
    case 0: return apply("Add force", [=](Mechanism& m) { edits::addForce(m, a, {0.0, -100.0}); });
    case 1: return apply("Add torque", [=](Mechanism& m) { edits::addTorque(m, a.body, 2.0); });
    case 2: return apply("Add spring", [=](Mechanism& m) { edits::addSpring(m, a, b); });
    case 3: return apply("Add damper", [=](Mechanism& m) { edits::addDamper(m, a, b); });
    case 4: return apply("Add cylinder", [=](Mechanism& m) { edits::addCylinder(m, a, b); });
    default:
        if (m.joints.empty()) return "add torsion spring (no pin)";
        return apply("Add torsion spring", [j = nameIn(m.joints), k = 10.0 * number()](Mechanism& m) {
            m.loads.push_back(TorsionSpringLoad{"torsion spring", j, k, 0.0});
        });
    }
}

std::string RandomEdits::moveJoint()
{
    if (doc_.mechanism().joints.empty()) return "move (no pin)";
    const int j = pick(int(doc_.mechanism().joints.size()));
    const Vec2 to = point();
    if (pick(3) == 0) doc_.closeMergeRun();  // a drag ends
    return apply("Move pin", [=](Mechanism& m) { edits::moveJoint(m, j, to); });
}

std::string RandomEdits::removePart()
{
    const Mechanism& m = doc_.mechanism();
    Selection s;
    switch (pick(4)) {
    case 0: s = {Selection::Kind::Body, QString::fromStdString(nameIn(m.bodies)), -1}; break;
    case 1: s = {Selection::Kind::Joint, QString::fromStdString(nameIn(m.joints)), -1}; break;
    case 2: s = {Selection::Kind::Driver, QString::fromStdString(nameIn(m.drivers)), -1}; break;
    default: s = {Selection::Kind::Load, {}, m.loads.empty() ? -1 : pick(int(m.loads.size()))}; break;
    }
    return apply("Delete", [s](Mechanism& m) { edits::remove(m, s); });
}

std::string RandomEdits::rename()
{
    const Mechanism& m = doc_.mechanism();
    const std::string to = someName();
    switch (pick(5)) {
    case 0:
        if (m.bodies.empty()) return "rename (no body)";
        return apply("Rename body", [from = nameIn(m.bodies), to](Mechanism& m) { edits::renameBody(m, from, to); });
    case 1:
        if (m.joints.empty()) return "rename (no joint)";
        return apply("Rename joint", [from = nameIn(m.joints), to](Mechanism& m) { edits::renameJoint(m, from, to); });
    case 2:
        if (m.drivers.empty()) return "rename (no driver)";
        return apply("Rename driver",
                     [from = nameIn(m.drivers), to](Mechanism& m) { edits::renameDriver(m, from, to); });
    case 3:
        if (m.loads.empty()) return "rename (no load)";
        return apply("Rename load", [k = pick(int(m.loads.size())), to](Mechanism& m) {
            std::visit([&](auto& l) { l.name = to; }, m.loads[k]);
        });
    default: return apply("Rename mechanism", [to](Mechanism& m) { m.name = to; });
    }
}

// A field of the property editor, set as its setter does (any number the form parses).
std::string RandomEdits::setValue()
{
    const Mechanism& m = doc_.mechanism();
    const double v = number();
    const int body = m.bodies.empty() ? -1 : pick(int(m.bodies.size()));
    switch (pick(7)) {
    case 0:
        if (body < 0) return "set mass (no body)";
        return apply("Set mass", [=](Mechanism& m) { m.bodies[body].section.reset(), m.bodies[body].mass = v; });
    case 1:
        if (body < 0) return "set width (no body)";
        return apply("Set width", [=](Mechanism& m) {
            m.bodies[body].mass.reset(), m.bodies[body].cg.reset(), m.bodies[body].inertia.reset();
            m.bodies[body].section = BarSection{v / 10.0, 0.008, 7850.0, std::nullopt};
        });
    case 2:
        if (body < 0 || m.bodies[body].pointMasses.empty()) return "set point mass (none)";
        return apply("Set point mass", [=](Mechanism& m) { m.bodies[body].pointMasses.back().mass = v; });
    case 3:
        return apply("Set steps", [steps = pick(3) == 0 ? 0 : 1 + pick(720)](Mechanism& m) { m.cycle.steps = steps; });
    case 4: return apply("Set duration", [=](Mechanism& m) { m.cycle.duration = v; });
    case 5:
        if (m.loads.empty()) return "set stiffness (no load)";
        return apply("Set stiffness", [=, k = pick(int(m.loads.size()))](Mechanism& m) {
            if (auto* s = std::get_if<SpringLoad>(&m.loads[k])) s->stiffness = 1000.0 * v;
        });
    default: return apply("Set gravity", [=](Mechanism& m) { m.gravity = Vec2(0.0, -9.8 * v); });
    }
}

// The joint form: pin size, slide axis, the bodies it joins, its position typed in.
std::string RandomEdits::setJointValue()
{
    const Mechanism& m = doc_.mechanism();
    if (m.joints.empty()) return "set joint (none)";
    const int j = pick(int(m.joints.size()));
    const double v = number();
    switch (pick(5)) {
    case 0:
        return apply("Set pin", [=, on = pick(3) != 0](Mechanism& m) {
            if (!on) m.joints[j].pin.reset();
            else if (!m.joints[j].pin) m.joints[j].pin = PinData{0.01};
        });
    case 1:
        return apply("Set pin", [=](Mechanism& m) {
            if (m.joints[j].pin) m.joints[j].pin->diameter = v / 50.0;
        });
    case 2: return apply("Set axis", [=, a = pick(2) ? angle() : 100.0 * v](Mechanism& m) { m.joints[j].axisDeg = a; });
    case 3:
        return apply("Set joined body", [=, side = pick(2), b = pick(4) == 0 ? "" : bodyOrGround(m)](Mechanism& m) {
            m.joints[j].bodies[side] = b;
        });
    default: return apply("Move", [=](Mechanism& m) { m.joints[j].at.x() = v; });
    }
}

// The driver form: speed, position as drawn, motion law, gearbox.
std::string RandomEdits::setDriverValue()
{
    const Mechanism& m = doc_.mechanism();
    if (m.drivers.empty()) return "set driver (none)";
    const int d = pick(int(m.drivers.size()));
    const double v = number();
    switch (pick(4)) {
    case 0:
        return apply("Set motion", [=](Mechanism& m) {
            if (auto* c = std::get_if<ConstantSpeed>(&m.drivers[d].motion)) c->speed = 10.0 * v;
        });
    case 1: return apply("Set motion", [=](Mechanism& m) { m.drivers[d].offset = v; });
    case 2:
        return apply("Set motion", [=, law = pick(3)](Mechanism& m) {
            if (law == 0) m.drivers[d].motion = ConstantSpeed{v, 0.0};
            else if (law == 1) m.drivers[d].motion = Rise{CamLaw::Polynomial345, 0.0, v, 0.0, std::nullopt};
            else m.drivers[d].motion = MotionTable{{0.0, 1.0}, {0.0, v}};
        });
    default:
        return apply("Set gearbox", [=, on = pick(2)](Mechanism& m) {
            if (on) m.drivers[d].gearbox = Gearbox{10.0 * v, 0.9, 0.0, 0.0};
            else m.drivers[d].gearbox.reset();
        });
    }
}

// The load form: its value, a spring's free length, a damper's rate, a profile.
std::string RandomEdits::setLoadValue()
{
    const Mechanism& m = doc_.mechanism();
    if (m.loads.empty()) return "set load (none)";
    const int k = pick(int(m.loads.size()));
    const double v = number();
    const std::string driver = pick(2) ? nameIn(m.drivers) : std::string();
    switch (pick(4)) {
    case 0:
        return apply("Set load", [=](Mechanism& m) {
            if (auto* f = std::get_if<ForceLoad>(&m.loads[k])) f->force.x() = 100.0 * v;
            if (auto* t = std::get_if<TorqueLoad>(&m.loads[k])) t->torque = v;
            if (auto* d = std::get_if<DamperLoad>(&m.loads[k])) d->damping = 100.0 * v;
        });
    case 1:
        return apply("Set load", [=](Mechanism& m) {
            if (auto* s = std::get_if<SpringLoad>(&m.loads[k])) s->freeLength = v / 10.0;
            if (auto* f = std::get_if<ForceLoad>(&m.loads[k])) f->turnsWithBody = !f->turnsWithBody;
        });
    default:
        return apply("Set profile", [=, on = pick(3) != 0](Mechanism& m) {
            std::visit(
                [&](auto& l) {
                    if constexpr (requires { l.profile; }) {
                        if (on) l.profile = LoadProfile{driver, {0.0, 1.0}, {1.0, v}};
                        else l.profile.reset();
                    }
                },
                m.loads[k]);
        });
    }
}

}  // namespace clevis::test
