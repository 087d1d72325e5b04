#include "core/solver/applied_loads.h"

#include <algorithm>
#include <cmath>

namespace clevis {

double CompiledProfile::eval(double t, const std::vector<double>& drivePositions) const
{
    double x = driver < 0 ? t : drivePositions[driver];
    if (period > 0.0) x -= period * std::floor(x / period);
    if (x <= at.front()) return factor.front();
    if (x >= at.back()) return factor.back();
    const std::size_t i = std::upper_bound(at.begin(), at.end(), x) - at.begin() - 1;
    const double w = (x - at[i]) / (at[i + 1] - at[i]);
    return factor[i] + w * (factor[i + 1] - factor[i]);
}

namespace {

double profileFactor(const std::optional<CompiledProfile>& p, double t, const std::vector<double>& drive)
{
    return p ? p->eval(t, drive) : 1.0;
}

// Spring or damper along the line from a to b: a force of magnitude `tension`
// pulling the two ends together.
void addTension(std::vector<AppliedLoad>& out, std::string_view source, const Pose& q, const BodyPoint& a,
                const BodyPoint& b, double tension)
{
    const Vec2 pa = q.point(a), pb = q.point(b);
    const Vec2 d = pb - pa;
    const double length = d.norm();
    if (length <= 0.0) return;
    const Vec2 f = tension * d / length;
    out.push_back({source, a.body, pa, f, 0.0});
    out.push_back({source, b.body, pb, -f, 0.0});
}

double lineRate(const Pose& q, const VectorXd& qd, const BodyPoint& a, const BodyPoint& b)
{
    const Vec2 d = q.point(b) - q.point(a);
    const double length = d.norm();
    return length > 0.0 ? d.dot(q.velocity(qd, b) - q.velocity(qd, a)) / length : 0.0;
}

Vec2 forceDirection(const Pose& q, const CompiledForce& f)
{
    return f.turnsWithBody ? q.direction(f.point.body, f.force) : f.force;
}

double relativeAngle(const CompiledMechanism& m, const Pose& q, int joint)
{
    const CompiledJoint& j = m.joints[joint];
    return q.angle(j.body[1]) - q.angle(j.body[0]);
}

}  // namespace

std::vector<AppliedLoad> appliedLoads(const CompiledMechanism& m, const Pose& q, const VectorXd& qd, double t,
                                      const std::vector<double>& drive)
{
    std::vector<AppliedLoad> out;
    out.reserve(m.bodies.size() + m.forces.size() + m.torques.size() +
                2 * (m.springs.size() + m.dampers.size() + m.torsionSprings.size()));
    for (std::size_t b = 0; b < m.bodies.size(); ++b)
        if (m.bodies[b].mass.mass > 0.0)
            out.push_back({"weight", int(b), q.origin(int(b)), m.bodies[b].mass.mass * m.gravity, 0.0});
    for (const auto& f : m.forces)
        out.push_back(
            {f.name, f.point.body, q.point(f.point), forceDirection(q, f) * profileFactor(f.profile, t, drive), 0.0});
    for (const auto& c : m.torques)
        out.push_back({c.name, c.body, q.origin(c.body), Vec2::Zero(), c.torque * profileFactor(c.profile, t, drive)});
    for (const auto& s : m.springs) {
        const double length = (q.point(s.b) - q.point(s.a)).norm();
        addTension(out, s.name, q, s.a, s.b, s.stiffness * (length - s.freeLength));
    }
    for (const auto& d : m.dampers) addTension(out, d.name, q, d.a, d.b, d.damping * lineRate(q, qd, d.a, d.b));
    for (const auto& s : m.torsionSprings) {
        // Moment k(θ − θ₀) resisting the relative rotation θ = φ_j − φ_i.
        const CompiledJoint& j = m.joints[s.joint];
        const double moment = s.stiffness * (relativeAngle(m, q, s.joint) - s.freeAngle);
        out.push_back({s.name, j.body[0], q.point(j.point[0]), Vec2::Zero(), moment});
        out.push_back({s.name, j.body[1], q.point(j.point[1]), Vec2::Zero(), -moment});
    }
    return out;
}

VectorXd generalizedForces(const CompiledMechanism& m, const VectorXd& q, const std::vector<AppliedLoad>& loads)
{
    VectorXd gen = VectorXd::Zero(3 * Eigen::Index(m.bodies.size()));
    for (const auto& l : loads) {
        if (l.body == kGround) continue;
        gen[3 * l.body] += l.force.x();
        gen[3 * l.body + 1] += l.force.y();
        gen[3 * l.body + 2] += l.couple + cross(l.at - bodyOrigin(q, l.body), l.force);
    }
    return gen;
}

double kineticEnergy(const CompiledMechanism& m, const VectorXd& qd)
{
    double e = 0.0;
    for (std::size_t b = 0; b < m.bodies.size(); ++b) {
        const auto& mp = m.bodies[b].mass;
        e += 0.5 * (mp.mass * bodyVelocity(qd, int(b)).squaredNorm() + mp.inertia * std::pow(bodyRate(qd, int(b)), 2));
    }
    return e;
}

LoadEnergies loadEnergies(const CompiledMechanism& m, const Pose& q, const VectorXd& qd, double t,
                          const std::vector<double>& drive)
{
    LoadEnergies e;
    for (std::size_t b = 0; b < m.bodies.size(); ++b)
        e.gravityPotential -= m.bodies[b].mass.mass * m.gravity.dot(q.origin(int(b)));
    for (const auto& s : m.springs) {
        const double stretch = (q.point(s.b) - q.point(s.a)).norm() - s.freeLength;
        e.springPotential += 0.5 * s.stiffness * stretch * stretch;
    }
    for (const auto& s : m.torsionSprings)
        e.springPotential += 0.5 * s.stiffness * std::pow(relativeAngle(m, q, s.joint) - s.freeAngle, 2);
    for (const auto& d : m.dampers) e.damperDissipation += d.damping * std::pow(lineRate(q, qd, d.a, d.b), 2);
    for (const auto& f : m.forces)
        e.appliedPower += (forceDirection(q, f) * profileFactor(f.profile, t, drive)).dot(q.velocity(qd, f.point));
    for (const auto& c : m.torques)
        e.appliedPower += c.torque * profileFactor(c.profile, t, drive) * bodyRate(qd, c.body);
    return e;
}

}  // namespace clevis
