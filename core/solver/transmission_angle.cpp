#include "core/solver/transmission_angle.h"

#include "core/solver/body_state.h"

#include <algorithm>
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

// The frame joint of a body (the first joint between it and ground), or -1.
int frameJoint(const CompiledMechanism& m, int body)
{
    for (std::size_t k = 0; k < m.joints.size(); ++k) {
        const CompiledJoint& j = m.joints[k];
        if ((j.body[0] == kGround && j.body[1] == body) || (j.body[1] == kGround && j.body[0] == body)) return int(k);
    }
    return -1;
}

// The bodies a driver moves: both ends of a driven joint or cylinder.
std::vector<int> drivenBodies(const CompiledMechanism& m)
{
    std::vector<int> bodies;
    for (const auto& d : m.drivers) {
        const int ends[2] = {d.joint >= 0 ? m.joints[d.joint].body[0] : d.ends[0].body,
                             d.joint >= 0 ? m.joints[d.joint].body[1] : d.ends[1].body};
        for (const int b : ends)
            if (b != kGround) bodies.push_back(b);
    }
    return bodies;
}

// Number of joints between each body and the nearest driven body, counted
// through joints between moving bodies only (through the frame every
// grounded body would be next to every other); -1 where no path exists.
std::vector<int> distanceFromDrivers(const CompiledMechanism& m)
{
    std::vector<int> distance(m.bodies.size(), -1);
    std::vector<int> queue = drivenBodies(m);
    for (const int b : queue) distance[b] = 0;
    for (std::size_t head = 0; head < queue.size(); ++head) {
        const int b = queue[head];
        for (const auto& j : m.joints) {
            if (j.body[0] == kGround || j.body[1] == kGround || (j.body[0] != b && j.body[1] != b)) continue;
            const int other = j.body[0] == b ? j.body[1] : j.body[0];
            if (distance[other] >= 0) continue;
            distance[other] = distance[b] + 1;
            queue.push_back(other);
        }
    }
    return distance;
}

bool isDriven(const std::vector<int>& driven, int body)
{
    return std::find(driven.begin(), driven.end(), body) != driven.end();
}

// The output's line runs from its frame pivot to the pin; on a slide it is
// the slide's normal.
bool chooseOutputLine(const CompiledMechanism& m, int body, const CompiledJoint& pin, int frame, BodyPoint& far,
                      int& axisJoint)
{
    const CompiledJoint& f = m.joints[frame];
    if (f.type != JointType::Pin) {
        axisJoint = frame;
        return true;
    }
    const BodyPoint& pivot = f.point[f.body[0] == body ? 0 : 1];
    const BodyPoint& here = pin.point[pin.body[0] == body ? 0 : 1];
    if ((pivot.local - here.local).norm() <= kMinArm) return false;
    far = pivot;
    return true;
}

}  // namespace

std::vector<TransmissionPin> findTransmissionPins(const CompiledMechanism& m)
{
    const std::vector<int> distance = distanceFromDrivers(m), driven = drivenBodies(m);
    std::vector<TransmissionPin> pins;
    for (std::size_t k = 0; k < m.joints.size(); ++k) {
        const CompiledJoint& j = m.joints[k];
        if (j.type != JointType::Pin || j.body[0] == kGround || j.body[1] == kGround) continue;
        for (int out = 0; out < 2; ++out) {
            const int coupler = j.body[1 - out], output = j.body[out];
            const int frame = frameJoint(m, output);
            if (frame < 0 || frameJoint(m, coupler) >= 0 || isDriven(driven, output)) continue;
            if (distance[coupler] < 0 || distance[output] <= distance[coupler]) continue;
            TransmissionPin pin;
            pin.joint = int(k);
            if (chooseLine(m, coupler, j, pin.far[1 - out], pin.axisJoint[1 - out]) &&
                chooseOutputLine(m, output, j, frame, pin.far[out], pin.axisJoint[out]))
                pins.push_back(pin);
            break;
        }
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
