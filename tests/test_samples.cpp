// The bundled sample mechanisms, and generated four-bar chains, solved over
// their whole cycle and checked at every step against two laws the reported
// results must obey whatever the mechanism:
//  - Newton–Euler for each body: the reported joint reactions and driver
//    efforts plus the applied loads on it add up to m·a_G, and their moment
//    about its centre of mass to I_G·α;
//  - the work–energy theorem for the whole mechanism, in rate form: the
//    drivers' power equals dT/dt + dV_gravity/dt + dV_springs/dt + the damper
//    dissipation − the power of the applied forces and torques, every rate
//    computed analytically from q, q̇ and q̈ at that step.
#include "core/file/mechanism_file.h"
#include "core/results/cycle_summary.h"
#include "core/solver/applied_loads.h"
#include "core/solver/cycle_sweep.h"
#include "tests/chain_generator.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <filesystem>
#include <map>

using namespace clevis;

namespace {

// Residuals are compared with the sum of the magnitudes of the terms that
// make them up, so the checks scale from a 30 N flap folder to a 40 kN press.
constexpr double kEquilibriumTolerance = 1e-8;
constexpr double kPowerTolerance = 1e-6;
constexpr double kFloor = 1e-9;  // N, N·m or W: below this a residual is zero

struct Solved {
    CompiledMechanism mechanism;
    CycleResult result;
    std::vector<std::string> fileWarnings;
};

Solved solve(const Mechanism& mechanism, std::vector<std::string> fileWarnings = {})
{
    Solved s{compile(mechanism), {}, std::move(fileWarnings)};
    s.result = sweepCycle(s.mechanism);
    return s;
}

std::vector<std::string> samplePaths()
{
    std::vector<std::string> paths;
    for (const auto& entry : std::filesystem::directory_iterator(CLEVIS_SAMPLES_DIR))
        if (entry.path().extension() == ".json") paths.push_back(entry.path().string());
    std::sort(paths.begin(), paths.end());
    return paths;
}

// Each sample is loaded and solved once, whichever test asks first.
const Solved& solvedSample(const std::string& path)
{
    static std::map<std::string, Solved> cache;
    auto it = cache.find(path);
    if (it == cache.end()) {
        LoadedMechanism loaded = loadMechanismFile(path);
        it = cache.emplace(path, solve(loaded.mechanism, loaded.warnings)).first;
    }
    return it->second;
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

// Newton–Euler for every moving body at one step.
void expectNewtonEuler(const CompiledMechanism& m, const StepResult& s, const std::string& where)
{
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
        EXPECT_LE((w.force - massTimesAccel).norm(),
                  kEquilibriumTolerance * (w.forceScale + massTimesAccel.norm()) + kFloor)
            << where << ", force on body \"" << m.bodies[b].name << "\" (N)";
        EXPECT_LE(std::abs(w.moment - inertiaTimesAlpha),
                  kEquilibriumTolerance * (w.momentScale + std::abs(inertiaTimesAlpha)) + kFloor)
            << where << ", moment about the centre of mass of body \"" << m.bodies[b].name << "\" (N·m)";
    }
}

struct LineState {
    double length, rate;  // m, m/s
};
LineState lineState(const StepResult& s, const BodyPoint& a, const BodyPoint& b)
{
    const Vec2 d = pointPosition(s.q, b) - pointPosition(s.q, a);
    const double length = d.norm();
    return {length, d.dot(pointVelocity(s.q, s.qd, b) - pointVelocity(s.q, s.qd, a)) / length};
}

double relativeRate(const CompiledMechanism& m, const StepResult& s, int joint, double* angle)
{
    const CompiledJoint& j = m.joints[joint];
    *angle = bodyAngle(s.q, j.body[1]) - bodyAngle(s.q, j.body[0]);
    return bodyRate(s.qd, j.body[1]) - bodyRate(s.qd, j.body[0]);
}

// The terms of the work–energy theorem at one step, W.
struct PowerTerms {
    double drivers = 0, kinetic = 0, gravity = 0, springs = 0, dampers = 0, loads = 0;
    double residual() const { return drivers - (kinetic + gravity + springs + dampers - loads); }
    double gross() const
    {
        return std::abs(drivers) + std::abs(kinetic) + std::abs(gravity) + std::abs(springs) + std::abs(dampers) +
               std::abs(loads);
    }
};

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

void expectPowerBalance(const CompiledMechanism& m, const StepResult& s, const std::string& where)
{
    const PowerTerms p = powerTerms(m, s);
    EXPECT_LE(std::abs(p.residual()), kPowerTolerance * p.gross() + kFloor)
        << where << ": driver power " << p.drivers << " W against dT/dt " << p.kinetic << " W + dV_g/dt " << p.gravity
        << " W + dV_s/dt " << p.springs << " W + dampers " << p.dampers << " W − loads " << p.loads << " W";
    EXPECT_NEAR(s.damperDissipation, p.dampers, kPowerTolerance * p.gross() + kFloor) << where << " (W)";
    EXPECT_NEAR(s.appliedPower, p.loads, kPowerTolerance * p.gross() + kFloor) << where << " (W)";
}

std::string stepLabel(const CompiledMechanism& m, std::size_t k, const StepResult& s)
{
    return m.name + ", step " + std::to_string(k) + " (t = " + std::to_string(s.t) + " s)";
}

void expectLawsAtEveryStep(const Solved& solved)
{
    const auto& steps = solved.result.steps;
    for (std::size_t k = 0; k < steps.size(); ++k) {
        expectNewtonEuler(solved.mechanism, steps[k], stepLabel(solved.mechanism, k, steps[k]));
        expectPowerBalance(solved.mechanism, steps[k], stepLabel(solved.mechanism, k, steps[k]));
    }
}

void expectWholeCycle(const Solved& solved)
{
    const CycleResult& r = solved.result;
    EXPECT_TRUE(r.complete) << solved.mechanism.name;
    EXPECT_EQ(r.steps.size(), std::size_t(r.plannedSteps) + 1) << solved.mechanism.name;
    for (const Warning& w : r.warnings) ADD_FAILURE() << solved.mechanism.name << ": " << w.code << ": " << w.message;
    for (std::size_t k = 0; k < r.steps.size(); ++k)
        EXPECT_FALSE(r.steps[k].nearSingular) << stepLabel(solved.mechanism, k, r.steps[k]);
}

// Common practice keeps a transmission angle within 40°–140° (the bound the
// printed summary flags, core/summary_text.cpp); the samples are designed to.
void expectPracticalTransmission(const Solved& solved)
{
    const CompiledMechanism& m = solved.mechanism;
    const CycleResult& r = solved.result;
    for (std::size_t p = 0; p < r.transmissionPins.size(); ++p) {
        const CompiledJoint& j = m.joints[r.transmissionPins[p].joint];
        for (std::size_t k = 0; k < r.steps.size(); ++k) {
            EXPECT_GE(r.steps[k].transmissionDeg[p], 40.0)
                << stepLabel(m, k, r.steps[k]) << ", pin " << j.name << " (°)";
            EXPECT_LE(r.steps[k].transmissionDeg[p], 140.0)
                << stepLabel(m, k, r.steps[k]) << ", pin " << j.name << " (°)";
        }
    }
}

bool finite(const PeakAt& p) { return std::isfinite(p.value) && p.step >= 0; }

class Sample : public ::testing::TestWithParam<std::string> {};

TEST(Samples, TheFiveBundledSamplesArePresent)
{
    std::vector<std::string> stems;
    for (const auto& path : samplePaths()) stems.push_back(std::filesystem::path(path).stem().string());
    for (const char* name : {"dwell_six_bar", "flap_folder", "punch_press", "tipping_bed", "tote_arm"})
        EXPECT_NE(std::find(stems.begin(), stems.end(), name), stems.end())
            << name << ".json missing from " << CLEVIS_SAMPLES_DIR;
}

TEST_P(Sample, LoadsWithoutWarningsAndSolvesTheWholeCycle)
{
    const Solved& s = solvedSample(GetParam());
    EXPECT_FALSE(s.mechanism.name.empty()) << GetParam() << " has no name";
    for (const auto& w : s.fileWarnings) ADD_FAILURE() << GetParam() << ": " << w;
    expectWholeCycle(s);
}

TEST_P(Sample, SummaryIsFinite)
{
    const Solved& s = solvedSample(GetParam());
    const CycleSummary summary = summarize(s.mechanism, s.result);
    ASSERT_EQ(summary.joints.size(), s.mechanism.joints.size());
    ASSERT_EQ(summary.drivers.size(), s.mechanism.drivers.size());
    for (const auto& j : summary.joints) EXPECT_TRUE(finite(j.peak) && std::isfinite(j.rms)) << j.name;
    for (const auto& d : summary.drivers)
        EXPECT_TRUE(finite(d.peak) && std::isfinite(d.rms) && std::isfinite(d.mean) && std::isfinite(d.work)) << d.name;
    EXPECT_TRUE(finite(summary.groundForce) && finite(summary.groundMoment));
    for (const auto& t : summary.transmission) EXPECT_TRUE(finite(t.minimum) && finite(t.maximum)) << t.joint;
    EXPECT_TRUE(std::isfinite(summary.energy.relativeResidual));
    EXPECT_EQ(summary.nearSingularSteps, 0);
}

TEST_P(Sample, EveryBodyObeysNewtonEulerAndDriverPowerBalancesTheEnergyRates)
{
    expectLawsAtEveryStep(solvedSample(GetParam()));
}

TEST_P(Sample, TransmissionAnglesStayWithinPracticalBounds) { expectPracticalTransmission(solvedSample(GetParam())); }

INSTANTIATE_TEST_SUITE_P(Bundled, Sample, ::testing::ValuesIn(samplePaths()),
                         [](const auto& info) { return std::filesystem::path(info.param).stem().string(); });

// Odd counts are pure four-bar ladders; even ones end in the slotted lever.
TEST(FourBarChain, SolvesAndObeysTheLawsWithAndWithoutTheSlottedLever)
{
    for (const int bodies : {10, 11}) {
        const Solved s = solve(test::fourBarChain(bodies));
        ASSERT_EQ(s.mechanism.bodies.size(), std::size_t(bodies));
        expectWholeCycle(s);
        expectLawsAtEveryStep(s);
        expectPracticalTransmission(s);
    }
}

// The rockers' swing shrinks along the chain but must not die out, or a long
// chain would time a mechanism that barely moves.
TEST(FourBarChain, LastBodyOfALongChainStillSwings)
{
    const Solved s = solve(test::fourBarChain(101));
    ASSERT_TRUE(s.result.complete);
    const int last = int(s.mechanism.bodies.size()) - 1;
    double low = 0.0, high = 0.0;
    for (const auto& step : s.result.steps) {
        low = std::min(low, step.q[3 * last + 2]);
        high = std::max(high, step.q[3 * last + 2]);
    }
    EXPECT_GT(radToDeg(high - low), 5.0) << "swing of " << s.mechanism.bodies[last].name << " (°)";
}

}  // namespace
