#include "core/solver/transmission_angle.h"

#include "core/solver/body_state.h"

#include <cmath>

namespace clevis {
namespace {

constexpr double kMinArm = 1e-9;  // m

// Other joint points on `body` (all joints touching it except `skip`).
std::vector<std::pair<BodyPoint, int>> otherJointPoints(const CompiledMechanism& m, int body, int skip)
{
    std::vector<std::pair<BodyPoint, int>> points;
    for (std::size_t k = 0; k < m.joints.size(); ++k) {
        if (int(k) == skip) continue;
        for (int side = 0; side < 2; ++side)
            if (m.joints[k].body[side] == body) points.emplace_back(m.joints[k].point[side], int(k));
    }
    return points;
}

bool chooseLine(const CompiledMechanism& m, int body, const CompiledJoint& pin, BodyPoint& far, int& axisJoint)
{
    const int pinIndex = int(&pin - m.joints.data());
    const BodyPoint& here = pin.point[pin.body[0] == body ? 0 : 1];
    double best = kMinArm;
    bool found = false;
    for (const auto& [p, joint] : otherJointPoints(m, body, pinIndex)) {
        const double arm = (p.local - here.local).norm();
        if (arm > best) {
            best = arm;
            far = p;
            found = true;
        } else if (!found && axisJoint < 0 && m.joints[joint].type != JointType::Pin) axisJoint = joint;
    }
    if (found) axisJoint = -1;
    return found || axisJoint >= 0;
}

Vec2 lineDirection(const CompiledMechanism& m, const TransmissionPin& pin, int side, const Pose& q)
{
    const CompiledJoint& j = m.joints[pin.joint];
    if (pin.axisJoint[side] >= 0) {
        const CompiledJoint& axis = m.joints[pin.axisJoint[side]];
        return perp(q.direction(axis.body[0], axis.axisLocal));
    }
    return q.point(pin.far[side]) - q.point(j.point[side]);
}

// A body turned or pushed by a driver against ground is an input link: the
// angle at its pins says nothing about how well force is passed on, and a
// driven pin has no transmission angle either.
bool isDriven(const CompiledMechanism& m, int joint, int body)
{
    for (const auto& d : m.drivers) {
        if (d.joint == joint) return true;
        if (d.joint < 0) continue;
        const CompiledJoint& driven = m.joints[d.joint];
        if ((driven.body[0] == kGround && driven.body[1] == body) ||
            (driven.body[1] == kGround && driven.body[0] == body))
            return true;
    }
    return false;
}

}  // namespace

std::vector<TransmissionPin> findTransmissionPins(const CompiledMechanism& m)
{
    std::vector<TransmissionPin> pins;
    for (std::size_t k = 0; k < m.joints.size(); ++k) {
        const CompiledJoint& j = m.joints[k];
        if (j.type != JointType::Pin || j.body[0] == kGround || j.body[1] == kGround) continue;
        if (isDriven(m, int(k), j.body[0]) || isDriven(m, int(k), j.body[1])) continue;
        TransmissionPin pin;
        pin.joint = int(k);
        if (chooseLine(m, j.body[0], j, pin.far[0], pin.axisJoint[0]) &&
            chooseLine(m, j.body[1], j, pin.far[1], pin.axisJoint[1]))
            pins.push_back(pin);
    }
    return pins;
}

double transmissionAngleDeg(const CompiledMechanism& m, const TransmissionPin& pin, const Pose& q)
{
    const Vec2 a = lineDirection(m, pin, 0, q), b = lineDirection(m, pin, 1, q);
    double mu = radToDeg(std::atan2(std::abs(cross(a, b)), a.dot(b)));
    if (pin.axisJoint[0] >= 0 || pin.axisJoint[1] >= 0) mu = std::min(mu, 180.0 - mu);
    return mu;
}

}  // namespace clevis
