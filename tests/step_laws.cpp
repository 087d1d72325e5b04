#include "tests/step_laws.h"

#include "core/solver/applied_loads.h"
#include "core/solver/body_state.h"

#include <cmath>
#include <cstdio>

namespace clevis::test {
namespace {

std::string number(double x)
{
    char text[32];
    std::snprintf(text, sizeof text, "%.6g", x);
    return text;
}

// A force system on one body reduced to its centre of mass, and the sums of
// magnitudes it is judged against.
struct Wrench {
    Vec2 force = Vec2::Zero();
    double moment = 0.0;
    double forceScale = 0.0, momentScale = 0.0;
};

class BodyWrenches {
public:
    BodyWrenches(const CompiledMechanism& m, const VectorXd& q) : q_(q), wrenches_(m.bodies.size()) {}

    void add(int body, const Vec2& at, const Vec2& force, double couple)
    {
        if (body == kGround) return;
        const Vec2 arm = at - bodyOrigin(q_, body);
        Wrench& w = wrenches_[body];
        w.force += force;
        w.moment += couple + cross(arm, force);
        w.forceScale += force.norm();
        w.momentScale += std::abs(couple) + arm.norm() * force.norm();
    }
    const Wrench& operator[](std::size_t body) const { return wrenches_[body]; }

private:
    const VectorXd& q_;
    std::vector<Wrench> wrenches_;
};

// A joint's reaction is the force and couple on its second body at the joint
// point there; the first body receives the opposite (core/results.h).
void addJointReactions(const CompiledMechanism& m, const StepResult& s, BodyWrenches& out)
{
    for (std::size_t k = 0; k < m.joints.size(); ++k) {
        const CompiledJoint& j = m.joints[k];
        const Reaction& r = s.joints[k];
        const Vec2 at = pointPosition(s.q, j.point[1]);
        out.add(j.body[1], at, r.force, r.moment);
        out.add(j.body[0], at, -r.force, -r.moment);
    }
}

// A driver's effort acts on its second body in the direction of its
// coordinate, the opposite on its first (core/results.h): a couple at a pin,
// a force along the axis at a slider, a push along the line between a
// cylinder's ends.
void addDriverEfforts(const CompiledMechanism& m, const StepResult& s, BodyWrenches& out)
{
    for (std::size_t d = 0; d < m.drivers.size(); ++d) {
        const CompiledDriver& driver = m.drivers[d];
        const double effort = s.effort[d];
        if (driver.type == DriverType::Rotary) {
            const CompiledJoint& j = m.joints[driver.joint];
            const Vec2 at = pointPosition(s.q, j.point[1]);
            out.add(j.body[1], at, Vec2::Zero(), effort);
            out.add(j.body[0], at, Vec2::Zero(), -effort);
        } else if (driver.joint >= 0) {
            const CompiledJoint& j = m.joints[driver.joint];
            const Vec2 at = pointPosition(s.q, j.point[1]);
            const Vec2 axis = rotation(bodyAngle(s.q, j.body[0])) * j.axisLocal;
            out.add(j.body[1], at, effort * axis, 0.0);
            out.add(j.body[0], at, -effort * axis, 0.0);
        } else {
            const Vec2 from = pointPosition(s.q, driver.ends[0]), to = pointPosition(s.q, driver.ends[1]);
            const Vec2 axis = (to - from).normalized();
            out.add(driver.ends[1].body, to, effort * axis, 0.0);
            out.add(driver.ends[0].body, from, -effort * axis, 0.0);
        }
    }
}

struct LineState {
    double length, rate;  // m, m/s
};
LineState lineState(const StepResult& s, const BodyPoint& a, const BodyPoint& b)
{
    const Vec2 d = pointPosition(s.q, b) - pointPosition(s.q, a);
    const double length = d.norm();
    // Ends together: no line, and no rate along it (the core applies no force there).
    if (length <= 0.0) return {0.0, 0.0};
    return {length, d.dot(pointVelocity(s.q, s.qd, b) - pointVelocity(s.q, s.qd, a)) / length};
}

double relativeRate(const CompiledMechanism& m, const StepResult& s, int joint, double* angle)
{
    const CompiledJoint& j = m.joints[joint];
    *angle = bodyAngle(s.q, j.body[1]) - bodyAngle(s.q, j.body[0]);
    return bodyRate(s.qd, j.body[1]) - bodyRate(s.qd, j.body[0]);
}

}  // namespace

std::vector<std::string> newtonEulerBreaches(const CompiledMechanism& m, const StepResult& s)
{
    std::vector<std::string> breaches;
    BodyWrenches wrenches(m, s.q);
    addJointReactions(m, s, wrenches);
    addDriverEfforts(m, s, wrenches);
    for (const AppliedLoad& l : appliedLoads(m, s.q, s.qd, s.t, s.drivePosition))
        wrenches.add(l.body, l.at, l.force, l.couple);
    for (std::size_t b = 0; b < m.bodies.size(); ++b) {
        const MassProperties& mp = m.bodies[b].mass;
        const Vec2 massTimesAccel = mp.mass * Vec2(s.qdd[3 * b], s.qdd[3 * b + 1]);
        const double inertiaTimesAlpha = mp.inertia * s.qdd[3 * b + 2];
        const Wrench& w = wrenches[b];
        const double forceError = (w.force - massTimesAccel).norm();
        const double forceScale = w.forceScale + massTimesAccel.norm();
        if (forceError > kEquilibriumTolerance * forceScale + kFloor)
            breaches.push_back("force on body \"" + m.bodies[b].name + "\": |ΣF − m·a_G| = " + number(forceError) +
                               " N of " + number(forceScale) + " N");
        const double momentError = std::abs(w.moment - inertiaTimesAlpha);
        const double momentScale = w.momentScale + std::abs(inertiaTimesAlpha);
        if (momentError > kEquilibriumTolerance * momentScale + kFloor)
            breaches.push_back("moment about the centre of mass of body \"" + m.bodies[b].name +
                               "\": |ΣM_G − I_G·α| = " + number(momentError) + " N·m of " + number(momentScale) +
                               " N·m");
    }
    return breaches;
}

PowerTerms powerTerms(const CompiledMechanism& m, const StepResult& s)
{
    PowerTerms p;
    for (const double w : s.power) p.drivers += w;
    for (std::size_t b = 0; b < m.bodies.size(); ++b) {
        const MassProperties& mp = m.bodies[b].mass;
        const Vec2 v = bodyVelocity(s.qd, int(b)), a(s.qdd[3 * b], s.qdd[3 * b + 1]);
        p.kinetic += mp.mass * v.dot(a) + mp.inertia * s.qd[3 * b + 2] * s.qdd[3 * b + 2];  // dT/dt
        p.gravity -= mp.mass * m.gravity.dot(v);                                            // dV/dt, V = −m g·r_G
    }
    for (const auto& spring : m.springs) {
        const LineState l = lineState(s, spring.a, spring.b);
        p.springs += spring.stiffness * (l.length - spring.freeLength) * l.rate;
    }
    for (const auto& spring : m.torsionSprings) {
        double angle = 0.0;
        const double rate = relativeRate(m, s, spring.joint, &angle);
        p.springs += spring.stiffness * (angle - spring.freeAngle) * rate;
    }
    for (const auto& damper : m.dampers)
        p.dampers += damper.damping * std::pow(lineState(s, damper.a, damper.b).rate, 2);
    for (const auto& f : m.forces) {
        const double factor = f.profile ? f.profile->eval(s.t, s.drivePosition) : 1.0;
        const Vec2 force = f.turnsWithBody ? Vec2(rotation(bodyAngle(s.q, f.point.body)) * f.force) : f.force;
        p.loads += factor * force.dot(pointVelocity(s.q, s.qd, f.point));
    }
    for (const auto& c : m.torques) {
        const double factor = c.profile ? c.profile->eval(s.t, s.drivePosition) : 1.0;
        p.loads += factor * c.torque * bodyRate(s.qd, c.body);
    }
    return p;
}

std::vector<std::string> powerBalanceBreaches(const CompiledMechanism& m, const StepResult& s)
{
    std::vector<std::string> breaches;
    const PowerTerms p = powerTerms(m, s);
    const double allowed = kPowerTolerance * p.gross() + kFloor;
    if (std::abs(p.residual()) > allowed)
        breaches.push_back("driver power " + number(p.drivers) + " W against dT/dt " + number(p.kinetic) +
                           " W + dV_g/dt " + number(p.gravity) + " W + dV_s/dt " + number(p.springs) + " W + dampers " +
                           number(p.dampers) + " W − loads " + number(p.loads) + " W");
    if (std::abs(s.damperDissipation - p.dampers) > allowed)
        breaches.push_back("damper dissipation " + number(s.damperDissipation) + " W, not " + number(p.dampers) + " W");
    if (std::abs(s.appliedPower - p.loads) > allowed)
        breaches.push_back("load power " + number(s.appliedPower) + " W, not " + number(p.loads) + " W");
    return breaches;
}

}  // namespace clevis::test
