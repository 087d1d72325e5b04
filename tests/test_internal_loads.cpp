// Internal loads along bars (axial force N, shear V, bending moment M) and
// their envelopes over the cycle, against closed forms from rigid-body
// dynamics and beam tables, equilibrium of either side of every cut on every
// sample, and an independent symbolic integration (tests/sympy_internal_loads.py).
// Signs: core/results/internal_loads.h (N > 0 tension; beam-table V and M
// with n, the bar's left, taken as up).
#include "core/file/mechanism_file.h"
#include "core/model/mass_properties.h"
#include "core/results/bar_envelope.h"
#include "core/results/internal_loads.h"
#include "core/solver/body_state.h"
#include "core/solver/cycle_sweep.h"
#include "core/solver/exact_position.h"
#include "tests/mechanism_builders.h"
#include "tests/solved_mechanism.h"
#include "tests/sympy_bar_loads.h"

#include <gtest/gtest.h>
#include <nlohmann/json.hpp>

#include <filesystem>

using namespace clevis;

namespace {

constexpr double kL = 0.4, kWidth = 0.03, kThickness = 0.01, kDensity = 7850.0;
constexpr double kMu = kDensity * kWidth * kThickness;  // kg/m
constexpr double kMass = kMu * kL;

// A steel bar from the origin to (L, 0), pinned to ground at the origin and
// driven there; no gravity; nothing at its far end.
Mechanism bar(Motion motion, double duration)
{
    Mechanism m;
    m.gravity = Vec2::Zero();
    Body b;
    b.name = "arm";
    b.section = BarSection{kWidth, kThickness, kDensity, std::pair{Vec2(0, 0), Vec2(kL, 0)}};
    m.bodies = {b};
    m.joints = {test::pin("O", kGroundName, "arm", Vec2(0, 0))};
    m.drivers = {test::rotary("motor", "O", motion)};
    m.cycle.duration = duration;
    m.cycle.steps = 6;
    return m;
}

using test::solve;
using test::Solved;

const BarModel& barOf(const Solved& s, const std::string& name) { return s.bars.bars[test::barIndex(s, name)]; }

std::vector<BarStation> loadsAt(const Solved& s, const BarModel& b, int step, int stations)
{
    return internalLoads(s.m, b, s.r.steps[step], freeBodyItems(s.m, s.r.steps[step])[b.body], stations);
}

// Closed forms for a uniform bar of mass per length μ, length L, width w,
// pivoted at x = 0 and turning at ω with angular acceleration α, nothing at
// its far end (standard rigid-body dynamics with distributed inertia). The
// part beyond the cut, x ≤ ξ ≤ L, has accelerations −ω²ξ along the bar and
// αξ across it, and the far part's equations of motion give the loads the
// near part puts on it, which are those of the cut:
//   N(x) = ∫ μω²ξ dξ            = mω²(L² − x²)/(2L)          (tension),
//   V(x) = ∫ μαξ dξ             = mα(L² − x²)/(2L),
//   M(x) = −∫ (ξ − x)·μαξ dξ − ∫ μw²α/12 dξ
//        = −mα(L − x)²(2L + x)/(6L) − μw²α(L − x)/12,
// the last term being each slice's own rotary inertia μ·dξ·w²/12 (the width's
// share of I = m(L² + w²)/12). M < 0: the inertia load −μαξ·n hogs the bar,
// in the beam-table sign of internal_loads.h.
TEST(InternalLoads, SpinningBarTensionMatchesClosedForm)
{
    const double omega = 30.0;  // rad/s
    const Solved s = solve(bar(ConstantSpeed{omega, 0.0}, 2 * kPi / omega));
    ASSERT_TRUE(s.r.complete);
    const BarModel& b = barOf(s, "arm");
    EXPECT_EQ(b.ends[0].name, "O");
    EXPECT_EQ(b.ends[1].name, "");
    for (int step : {0, 2, 5}) {
        for (const auto& st : loadsAt(s, b, step, 9)) {
            const double x = st.s;
            const double n = kMass * omega * omega * (kL * kL - x * x) / (2 * kL);
            EXPECT_NEAR(st.axial, n, 1e-9 * kMass * omega * omega * kL) << "x = " << x << " at step " << step;
            EXPECT_NEAR(st.shear, 0.0, 1e-9 * kMass * omega * omega * kL);
            EXPECT_NEAR(st.moment, 0.0, 1e-9 * kMass * omega * omega * kL * kL);
        }
    }
}

TEST(InternalLoads, AcceleratingBarShearAndMomentMatchClosedForm)
{
    const double alpha = 40.0;  // rad/s², from rest
    const Solved s = solve(bar(ConstantSpeed{0.0, alpha}, 0.3));
    ASSERT_TRUE(s.r.complete);
    const BarModel& b = barOf(s, "arm");
    for (int step : {0, 3, 6}) {
        const double omega = s.r.steps[step].qd[2];
        const double scale = kMass * (alpha + omega * omega) * kL;
        for (const auto& st : loadsAt(s, b, step, 11)) {
            const double x = st.s;
            const double n = kMass * omega * omega * (kL * kL - x * x) / (2 * kL);
            const double v = kMass * alpha * (kL * kL - x * x) / (2 * kL);
            const double m = -kMass * alpha * (kL - x) * (kL - x) * (2 * kL + x) / (6 * kL) -
                             kMu * kWidth * kWidth * alpha * (kL - x) / 12.0;
            EXPECT_NEAR(st.axial, n, 1e-9 * scale) << "x = " << x;
            EXPECT_NEAR(st.shear, v, 1e-9 * scale) << "x = " << x;
            EXPECT_NEAR(st.moment, m, 1e-9 * scale * kL) << "x = " << x;
        }
    }
}

Mechanism heldSpan(double h) { return test::heldSpan(h, kL, BarSection{kWidth, kThickness, kDensity, std::nullopt}); }

// Beam tables, simply supported span under a uniform load w:
// V(x) = w(L/2 − x), M(x) = wx(L − x)/2, M_max = wL²/8 at mid-span.
TEST(InternalLoads, SpanUnderOwnWeightIsTheSimplySupportedBeam)
{
    const Solved s = solve(heldSpan(0.15));
    ASSERT_TRUE(s.r.complete);
    const BarModel& b = barOf(s, "coupler");
    EXPECT_EQ(b.ends[0].name, "A");
    EXPECT_EQ(b.ends[1].name, "B");
    const double w = kMu * -s.m.gravity.y();
    const auto st = loadsAt(s, b, 1, 21);
    EXPECT_NEAR(st[10].moment, w * kL * kL / 8, 1e-9 * w * kL * kL);
    for (const auto& p : st) {
        EXPECT_NEAR(p.shear, w * (kL / 2 - p.s), 1e-9 * w * kL) << "x = " << p.s;
        EXPECT_NEAR(p.moment, w * p.s * (kL - p.s) / 2, 1e-9 * w * kL * kL) << "x = " << p.s;
        EXPECT_NEAR(p.axial, 0.0, 1e-9 * w * kL);
    }
}

// Beam tables, simply supported span with a point load P at x = a:
// R_A = P(L − a)/L, R_B = Pa/L; V = R_A before the load, −R_B after;
// M = R_A·x before, R_B·(L − x) after.
TEST(InternalLoads, PointLoadOnSpanMatchesBeamTable)
{
    Mechanism doc = heldSpan(0.15);
    doc.gravity = Vec2::Zero();
    const double p = 500.0, a = 0.13;  // N, m: between stations
    doc.loads.push_back(ForceLoad{"press", {"coupler", Vec2(a, 0.15)}, Vec2(0, -p), false, std::nullopt});
    const Solved s = solve(doc);
    ASSERT_TRUE(s.r.complete);
    const double ra = p * (kL - a) / kL, rb = p * a / kL;
    for (const auto& st : loadsAt(s, barOf(s, "coupler"), 0, 11)) {
        const bool before = st.s < a;
        EXPECT_NEAR(st.shear, before ? ra : -rb, 1e-9 * p) << "x = " << st.s;
        EXPECT_NEAR(st.moment, before ? ra * st.s : rb * (kL - st.s), 1e-9 * p * kL) << "x = " << st.s;
    }
}

// The far part's loads (stations beyond x; at the second end, those at it),
// integrated by three-point Gauss–Legendre (exact for the cubic moment
// integrand), act on the near part as N·e − V·n and M: an independent sum.
BarStation fromFarSide(const CompiledMechanism& m, const BarModel& b, const StepResult& s,
                       const std::vector<FreeBodyItem>& items, double x, bool last)
{
    const Vec2 a = pointPosition(s.q, b.ends[0].point), e = (pointPosition(s.q, b.ends[1].point) - a) / b.length;
    const Vec2 n = perp(e), cut = a + x * e, g = bodyOrigin(s.q, b.body), ag = s.qdd.segment<2>(3 * b.body);
    const double w = s.qd[3 * b.body + 2], al = s.qdd[3 * b.body + 2];
    const auto accel = [&](const Vec2& p) { return Vec2(ag + al * perp(p - g) - w * w * (p - g)); };
    const auto far = [&](const Vec2& p) {
        double at = std::clamp((p - a).dot(e), 0.0, b.length);
        if (at < 1e-9 * b.length) at = 0.0;
        if (at > b.length * (1 - 1e-9)) at = b.length;
        return last ? at >= b.length : at > x;
    };
    Vec2 force = Vec2::Zero();
    double moment = 0.0;
    const auto add = [&](const Vec2& p, const Vec2& f, double c) {
        force += f;
        moment += c + cross(p - cut, f);
    };
    for (const auto& item : items)
        if (item.kind != FreeBodyItemKind::Weight && far(item.at)) add(item.at, item.force, item.couple);
    for (const auto& [mass, point] : b.pointMasses) {
        const Vec2 p = pointPosition(s.q, point);
        if (far(p)) add(p, mass * (m.gravity - accel(p)), 0.0);
    }
    const MassSpread& sp = b.spread;
    if (sp.to <= sp.from) {
        const Vec2 p = a + sp.from * e + sp.offset * n;
        if (sp.mass > 0 && far(p)) add(p, sp.mass * (m.gravity - accel(p)), -sp.rotary * al);
    } else if (std::max(x, sp.from) < sp.to && !last) {
        const double lo = std::max(x, sp.from), half = 0.5 * (sp.to - lo), mid = 0.5 * (sp.to + lo);
        const double mu = sp.mass / (sp.to - sp.from), j = sp.rotary / (sp.to - sp.from);
        const double nodes[3] = {-std::sqrt(0.6), 0.0, std::sqrt(0.6)}, weights[3] = {5.0 / 9, 8.0 / 9, 5.0 / 9};
        for (int k = 0; k < 3; ++k) {
            const double ds = weights[k] * half;
            const Vec2 p = a + (mid + nodes[k] * half) * e + sp.offset * n;
            add(p, mu * ds * (m.gravity - accel(p)), -j * ds * al);
        }
    }
    return {x, force.dot(e), -force.dot(n), moment};
}

TEST(InternalLoads, EveryCutOfEverySampleIsInEquilibriumWithBothSides)
{
    int checked = 0;
    for (const auto& entry : std::filesystem::directory_iterator(CLEVIS_SAMPLES_DIR)) {
        const Solved s = solve(loadMechanismFile(entry.path().string()).mechanism);
        ASSERT_FALSE(s.r.steps.empty()) << entry.path();
        for (const auto& b : s.bars.bars) {
            std::vector<std::vector<BarStation>> near;
            double forceScale = 0.0, momentScale = 0.0;
            for (const auto& step : s.r.steps) {
                near.push_back(internalLoads(s.m, b, step, freeBodyItems(s.m, step)[b.body], 11));
                for (const auto& st : near.back()) {
                    forceScale = std::max({forceScale, std::abs(st.axial), std::abs(st.shear)});
                    momentScale = std::max(momentScale, std::abs(st.moment));
                }
            }
            momentScale = std::max(momentScale, forceScale * b.length);
            for (std::size_t i = 0; i < s.r.steps.size(); ++i) {
                const auto items = freeBodyItems(s.m, s.r.steps[i])[b.body];
                for (std::size_t k = 0; k < near[i].size(); ++k) {
                    const BarStation& st = near[i][k];
                    const BarStation far = fromFarSide(s.m, b, s.r.steps[i], items, st.s, k + 1 == near[i].size());
                    const std::string where = entry.path().filename().string() + " " + b.bodyName + " step " +
                                              std::to_string(i) + " s = " + std::to_string(st.s);
                    EXPECT_NEAR(st.axial, far.axial, 1e-9 * forceScale) << where;
                    EXPECT_NEAR(st.shear, far.shear, 1e-9 * forceScale) << where;
                    EXPECT_NEAR(st.moment, far.moment, 1e-9 * momentScale) << where;
                    ++checked;
                }
            }
        }
    }
    EXPECT_GT(checked, 1000);
}

// At the first end the loads are those of its joint resolved along and
// across the bar: N = −F·e, V = F·n, M = −(couple there), the driver's torque
// included; at the second end N = F·e, V = −F·n for the force there.
TEST(InternalLoads, EndsCarryTheirPinForcesResolvedAlongAndAcross)
{
    const Solved s = solve(loadMechanismFile(std::string(CLEVIS_SAMPLES_DIR) + "/punch_press.json").mechanism);
    const BarModel& rod = barOf(s, "connecting_rod");
    ASSERT_EQ(rod.ends[0].name, "crank_pin");
    ASSERT_EQ(rod.ends[1].name, "wrist_pin");
    for (int i : {0, 90, 150, 300}) {
        const StepResult& step = s.r.steps[i];
        const auto st = loadsAt(s, rod, i, 5);
        const Vec2 a = pointPosition(step.q, rod.ends[0].point);
        const Vec2 e = (pointPosition(step.q, rod.ends[1].point) - a) / rod.length, n = perp(e);
        const Vec2 atA = step.joints[1].force, atB = -step.joints[2].force;  // on the rod: second, first body
        const double scale = atA.norm() + atB.norm();
        EXPECT_NEAR(st.front().axial, -atA.dot(e), 1e-9 * scale);
        EXPECT_NEAR(st.front().shear, atA.dot(n), 1e-9 * scale);
        EXPECT_NEAR(st.back().axial, atB.dot(e), 1e-9 * scale);
        EXPECT_NEAR(st.back().shear, -atB.dot(n), 1e-9 * scale);
        EXPECT_NEAR(st.front().moment, 0.0, 1e-9 * scale * rod.length);
        EXPECT_NEAR(st.back().moment, 0.0, 1e-9 * scale * rod.length);
    }
}

// Typed-in mass properties become a uniform bar with the same mass, centre
// and inertia (bar_model.h): summed as parts (mass_properties.h) they give
// back the body's own.
TEST(InternalLoads, TypedMassIdealisationKeepsMassCentreAndInertia)
{
    const Solved s = solve(loadMechanismFile(std::string(CLEVIS_SAMPLES_DIR) + "/dwell_six_bar.json").mechanism);
    const BarModel& crank = barOf(s, "crank");
    ASSERT_TRUE(crank.idealised);
    const MassSpread& sp = crank.spread;
    const Vec2 a = s.doc.joints[0].at, b = s.doc.joints[1].at, e = (b - a).normalized();
    const Vec2 from = a + sp.from * e + sp.offset * perp(e), to = a + sp.to * e + sp.offset * perp(e);
    // A slender uniform bar: I_G = mℓ²/12 (standard), plus the spread's rotary inertia.
    const double l = sp.to - sp.from;
    const MassProperties total = combine({{sp.mass, 0.5 * (from + to), sp.mass * l * l / 12}, {0.0, from, sp.rotary}});
    EXPECT_GT(l, 0.0);
    EXPECT_NEAR(total.mass, 0.6, 1e-12);
    EXPECT_NEAR((total.cg - Vec2(0.01, 0)).norm(), 0.0, 1e-12);
    EXPECT_NEAR(total.inertia, 0.0006, 1e-12);
}

TEST(InternalLoads, PlatesAndCoincidentJointsAreNotBars)
{
    const Solved six = solve(loadMechanismFile(std::string(CLEVIS_SAMPLES_DIR) + "/dwell_six_bar.json").mechanism);
    ASSERT_EQ(six.bars.others.size(), 1u);
    EXPECT_EQ(six.bars.others[0].bodyName, "coupler_plate");
    EXPECT_NE(six.bars.others[0].reason.find("plate with 3 joints"), std::string::npos);
    const Solved press = solve(loadMechanismFile(std::string(CLEVIS_SAMPLES_DIR) + "/punch_press.json").mechanism);
    ASSERT_EQ(press.bars.others.size(), 1u);
    EXPECT_EQ(press.bars.others[0].bodyName, "ram");
    EXPECT_NE(press.bars.others[0].reason.find("same point"), std::string::npos);
    EXPECT_THROW(loadsAt(press, press.bars.bars[0], 0, 1), std::invalid_argument);
}

// The envelope is at least the largest of every station at every step,
// found by brute force here, and each peak is a value the bar takes there
// (just before or beyond its station) at its step.
TEST(BarEnvelope, PeaksAreTheLargestOverStationsAndSteps)
{
    const Solved s = solve(loadMechanismFile(std::string(CLEVIS_SAMPLES_DIR) + "/flap_folder.json").mechanism);
    const auto envelopes = barEnvelopes(s.m, s.r, s.bars.bars);
    ASSERT_EQ(envelopes.size(), s.bars.bars.size());
    for (std::size_t b = 0; b < envelopes.size(); ++b) {
        double tension = 0, compression = 0, shear = 0, moment = 0;
        for (std::size_t i = 0; i < s.r.steps.size(); ++i)
            for (const auto& st : loadsAt(s, s.bars.bars[b], int(i), 7)) {
                tension = std::max(tension, st.axial);
                compression = std::min(compression, st.axial);
                shear = std::max(shear, std::abs(st.shear));
                moment = std::max(moment, std::abs(st.moment));
            }
        const BarEnvelope& env = envelopes[b];
        const double slack = 1e-12 * std::max({tension, -compression, shear, moment});
        EXPECT_GE(env.tension.value, tension - slack);
        EXPECT_LE(env.compression.value, compression + slack);
        EXPECT_GE(std::abs(env.shear.value), shear - slack);
        EXPECT_GE(std::abs(env.moment.value), moment - slack);
        EXPECT_GT(moment, 0.0);
        const StepResult& step = s.r.steps[std::size_t(env.moment.step)];
        BarLoads along;
        std::vector<BodyLoad> loads;
        const auto items = freeBodyItems(s.m, step);
        for (const auto& item : items[std::size_t(s.bars.bars[b].body)])
            if (item.kind != FreeBodyItemKind::Weight) loads.push_back({item.at, item.force, item.couple});
        along.set(s.m, s.bars.bars[b], step, Pose(step.q), loads);
        const double beyond = along.at(env.moment.s, false).moment, before = along.at(env.moment.s, true).moment;
        EXPECT_NEAR(std::min(std::abs(beyond - env.moment.value), std::abs(before - env.moment.value)), 0.0,
                    1e-12 * moment)
            << "the moment peak's station and step reproduce it";
    }
}

// Asked for a drive angle between stored steps, the solve lands on it exactly
// and agrees with a cycle whose steps fall on it.
TEST(ExactPosition, DriveAngleBetweenStepsIsSolvedExactly)
{
    Mechanism doc = test::fourBar({});
    doc.cycle.steps = 36;  // every 10°
    const CompiledMechanism m = compile(doc);
    const CycleResult coarse = sweepCycle(m);
    const double target = degToRad(47.0);
    const auto t = timeAtDrivePosition(m, coarse, 0, target);
    ASSERT_TRUE(t.has_value());
    const StepResult exact = solveAtTime(m, coarse, *t);
    EXPECT_NEAR(std::remainder(exact.drivePosition[0] - target, 2 * kPi), 0.0, 1e-14);
    // On the branch of the cycle: next to the nearest pose of a ten times finer one.
    Mechanism fine = doc;
    fine.cycle.steps = 3600;
    const CycleResult r = sweepCycle(compile(fine));
    std::size_t nearest = 0;
    for (std::size_t i = 0; i < r.steps.size(); ++i)
        if (std::abs(r.steps[i].t - *t) < std::abs(r.steps[nearest].t - *t)) nearest = i;
    EXPECT_NEAR((exact.q - r.steps[nearest].q).norm(), 0.0, 1e-3);
    EXPECT_FALSE(timeAtDrivePosition(m, CycleResult{}, 0, target).has_value());
    CycleResult copy = coarse;
    const int at = insertStep(copy, exact);
    EXPECT_EQ(copy.steps.size(), coarse.steps.size() + 1);
    EXPECT_EQ(copy.steps[at].t, *t);
    EXPECT_LT(copy.steps[at - 1].t, *t);
    EXPECT_GT(copy.steps[at + 1].t, *t);
}

// The coupler of a loaded, accelerating four-bar whose mass centre is off
// its line (typed-in mass: the idealised uniform bar, offset), with a force
// on it off the line, at one step: symbolic integration agrees.
TEST(InternalLoads, FourBarCouplerMatchesSympyIntegration)
{
    test::FourBarSpec spec;
    spec.mass[0] = 1.2;
    spec.mass[1] = 2.3;
    spec.mass[2] = 1.7;
    spec.inertia[0] = 0.0011;
    spec.inertia[1] = 0.026;
    spec.inertia[2] = 0.014;
    spec.cgOffset[1] = Vec2(-0.03, 0.045);
    spec.motion = ConstantSpeed{5.0, 3.0};
    Mechanism doc = test::fourBar(spec);
    doc.gravity = Vec2(0.0, -9.80665);
    doc.loads.push_back(ForceLoad{"push", {"coupler", Vec2(0.18, 0.26)}, Vec2(35.0, -60.0), false, std::nullopt});
    doc.cycle.duration = 1.2;
    doc.cycle.steps = 40;
    const Solved s = solve(doc);
    ASSERT_TRUE(s.r.complete);
    const BarModel& b = barOf(s, "coupler");
    ASSERT_GT(b.spread.to, b.spread.from);
    ASSERT_NE(b.spread.offset, 0.0);
    const int stepIndex = 17;
    const StepResult& step = s.r.steps[stepIndex];
    const auto items = freeBodyItems(s.m, step)[b.body];
    const auto ours = internalLoads(s.m, b, step, items, 9);

    std::vector<double> stations;
    for (const auto& st : ours) stations.push_back(st.s);
    const nlohmann::json rows = test::sympyBarLoads(s.m, b, step, items, stations);
    ASSERT_EQ(rows.size(), ours.size());
    double scale = 0.0;
    for (const auto& st : ours) scale = std::max({scale, std::abs(st.axial), std::abs(st.shear)});
    for (std::size_t k = 0; k < ours.size(); ++k) {
        const auto& row = rows[k];
        EXPECT_NEAR(ours[k].axial, row[1].get<double>(), 1e-9 * scale) << "s = " << ours[k].s;
        EXPECT_NEAR(ours[k].shear, row[2].get<double>(), 1e-9 * scale) << "s = " << ours[k].s;
        EXPECT_NEAR(ours[k].moment, row[3].get<double>(), 1e-9 * scale * b.length) << "s = " << ours[k].s;
    }
}

}  // namespace
