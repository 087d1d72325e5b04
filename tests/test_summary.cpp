// The cycle summary: trapezoid integrals, peaks, RMS and the energy balance
// on mechanisms whose answers are known in closed form, and the readable
// summary text built from them.
#include "core/results/cycle_summary.h"
#include "core/results/number_text.h"
#include "core/results/step_integral.h"
#include "core/results/summary_text.h"
#include "core/results/text_table.h"
#include "core/solver/compiled_mechanism.h"
#include "core/solver/cycle_sweep.h"
#include "tests/mechanism_builders.h"

#include <gtest/gtest.h>

#include <cmath>

using namespace clevis;

namespace {

// Steps at the given times carrying f(t) in `kinetic`, for the integral helpers.
std::vector<StepResult> sampled(const std::vector<double>& times, double (*f)(double))
{
    std::vector<StepResult> steps(times.size());
    for (std::size_t i = 0; i < times.size(); ++i) {
        steps[i].t = times[i];
        steps[i].kinetic = f(times[i]);
    }
    return steps;
}

std::vector<double> uniform(double a, double b, int intervals)
{
    std::vector<double> t;
    for (int i = 0; i <= intervals; ++i) t.push_back(a + (b - a) * i / intervals);
    return t;
}

double carried(const StepResult& s) { return s.kinetic; }

TEST(StepIntegral, TrapezoidIsExactForStraightLinesOnUnevenSteps)
{
    // ∫₀² (2t + 1) dt = [t² + t]₀² = 6.
    const auto steps = sampled({0.0, 0.3, 0.5, 1.2, 1.25, 2.0}, [](double t) { return 2 * t + 1; });
    EXPECT_NEAR(trapezoid(steps, carried), 6.0, 1e-13);
    EXPECT_NEAR(timeMean(steps, carried), 3.0, 1e-13);
}

TEST(StepIntegral, TrapezoidErrorOnAParabolaIsTheTextbookTerm)
{
    // The composite trapezoid rule's error is (b − a) h² f''(ξ) / 12; for
    // f = t² (f'' = 2 everywhere) it is exactly h²/6 on [0, 1].
    const int n = 10;
    const double h = 1.0 / n;
    const auto steps = sampled(uniform(0.0, 1.0, n), [](double t) { return t * t; });
    EXPECT_NEAR(trapezoid(steps, carried), 1.0 / 3.0 + h * h / 6.0, 1e-14);
}

TEST(StepIntegral, MeanAndRmsOfASineOverWholePeriods)
{
    // Mean 0 and RMS 1/√2; the trapezoid rule is exact for sin² = (1 − cos 4πt)/2
    // sampled 64 times per period.
    const auto steps = sampled(uniform(0.0, 1.0, 64), [](double t) { return std::sin(2 * kPi * t); });
    EXPECT_NEAR(timeMean(steps, carried), 0.0, 1e-14);
    EXPECT_NEAR(timeRms(steps, carried), 1.0 / std::sqrt(2.0), 1e-14);
}

TEST(StepIntegral, ASingleStepIsItsOwnMean)
{
    const auto steps = sampled({0.4}, [](double) { return -3.0; });
    EXPECT_EQ(trapezoid(steps, carried), 0.0);
    EXPECT_EQ(timeMean(steps, carried), -3.0);
    EXPECT_EQ(timeRms(steps, carried), 3.0);
}

// One link on a ground pin at the origin, its centre of mass at distance d
// along +x at the drawn pose, driven by a motor at the pin.
constexpr double kMass = 1.8;       // kg
constexpr double kInertiaG = 0.03;  // kg·m² about G
constexpr double kArm = 0.25;       // m, pin to G
constexpr double kG = 9.80665;      // m/s²

Mechanism link(Motion motion, Vec2 gravity, int steps)
{
    Mechanism m;
    m.name = "link";
    m.gravity = gravity;
    m.bodies = {test::pointBody("link", kMass, Vec2(kArm, 0.0), kInertiaG)};
    m.joints = {test::pin("O", kGroundName, "link", Vec2::Zero())};
    m.drivers = {test::rotary("motor", "O", motion)};
    m.cycle.steps = steps;
    return m;
}

// Constant speed ω, no gravity: the pin only supplies the centripetal force
// m ω² d (Newton's second law for G on a circle), constant, so RMS = peak,
// and the motor supplies nothing (I_O α = 0).
TEST(CycleSummary, SpinningLinkWithoutGravityHasConstantPinLoad)
{
    const double omega = 3.0;
    const CompiledMechanism m = compile(link(ConstantSpeed{omega, 0.0}, Vec2::Zero(), 72));
    const CycleResult r = sweepCycle(m);
    ASSERT_TRUE(r.complete);
    const CycleSummary s = summarize(m, r);
    const double expected = kMass * omega * omega * kArm;
    ASSERT_EQ(s.joints.size(), 1u);
    EXPECT_EQ(s.joints[0].name, "O");
    EXPECT_NEAR(s.joints[0].peak.value, expected, 1e-9 * expected);
    EXPECT_NEAR(s.joints[0].rms, expected, 1e-9 * expected);
    EXPECT_EQ(s.joints[0].peakMoment.step, -1);  // a pin has no contact moment
    ASSERT_EQ(s.drivers.size(), 1u);
    EXPECT_NEAR(s.drivers[0].peak.value, 0.0, 1e-9 * expected * kArm);
    EXPECT_NEAR(s.drivers[0].work, 0.0, 1e-9);
    EXPECT_NEAR(s.groundForce.value, expected, 1e-9 * expected);
    // Nothing passes through the mechanism: the balance has nothing to measure.
    EXPECT_LT(s.energy.throughput, kNegligibleEnergy);
    EXPECT_EQ(s.energy.relativeResidual, 0.0);
    EXPECT_EQ(s.nearSingularSteps, 0);
}

// Constant speed ω with gravity −g ŷ, G at angle θ = ωt: Newton–Euler about
// the fixed pin (I_O θ̈ = T − m g d cos θ, θ̈ = 0) gives the motor torque
// T = m g d cos θ and the pin force F = m a_G − m g = m(−ω² d cos θ, g − ω² d sin θ),
// so |F| peaks at m(ω² d + g) where sin θ = −1 and, since sin θ averages to
// zero over a turn, RMS |F| = m √(ω⁴ d² + g²). T has RMS m g d/√2, mean 0,
// power T ω between ±m g d ω and no net work over the turn.
TEST(CycleSummary, SpinningLinkUnderGravityMatchesNewtonEuler)
{
    const double omega = 2.0;
    const int n = 360;  // a multiple of 4: θ = 0, π/2, π, 3π/2 are on the grid
    const CompiledMechanism m = compile(link(ConstantSpeed{omega, 0.0}, Vec2(0.0, -kG), n));
    const CycleResult r = sweepCycle(m);
    ASSERT_TRUE(r.complete);
    const CycleSummary s = summarize(m, r);

    const JointSummary& pin = s.joints[0];
    const double peakForce = kMass * (omega * omega * kArm + kG);
    EXPECT_NEAR(pin.peak.value, peakForce, 1e-9 * peakForce);
    EXPECT_EQ(pin.peak.step, 3 * n / 4);
    const double rmsForce = kMass * std::hypot(omega * omega * kArm, kG);
    EXPECT_NEAR(pin.rms, rmsForce, 1e-9 * rmsForce);

    const DriverSummary& motor = s.drivers[0];
    const double torque = kMass * kG * kArm;
    EXPECT_EQ(motor.type, DriverType::Rotary);
    EXPECT_NEAR(std::abs(motor.peak.value), torque, 1e-9 * torque);
    EXPECT_NEAR(std::abs(std::cos(omega * r.steps[motor.peak.step].t)), 1.0, 1e-12);
    EXPECT_NEAR(motor.rms, torque / std::sqrt(2.0), 1e-9 * torque);
    EXPECT_NEAR(motor.mean, 0.0, 1e-9 * torque);
    EXPECT_NEAR(motor.work, 0.0, 1e-9 * torque);
    EXPECT_NEAR(motor.peakPower.value, torque * omega, 1e-9 * torque * omega);
    EXPECT_NEAR(motor.peakRegenerative.value, -torque * omega, 1e-9 * torque * omega);
    EXPECT_NEAR(std::cos(omega * r.steps[motor.peakRegenerative.step].t), -1.0, 1e-12);
}

// Accelerating from ω₀ at α with gravity, over part of a turn: the motor's
// work must equal ½ I_O (ω₁² − ω₀²) + m g d (sin θ₁ − sin θ₀), the kinetic
// and potential energy changes of a body turning about a fixed pin.
TEST(CycleSummary, EnergyBalanceClosesForAnAcceleratingLink)
{
    const double omega0 = 1.5, alpha = 4.0, duration = 0.9;
    Mechanism mech = link(ConstantSpeed{omega0, alpha}, Vec2(0.0, -kG), 400);
    mech.cycle.duration = duration;
    const CompiledMechanism m = compile(mech);
    const CycleResult r = sweepCycle(m);
    ASSERT_TRUE(r.complete);
    const EnergyBalance e = summarize(m, r).energy;

    const double inertiaO = kInertiaG + kMass * kArm * kArm;  // parallel-axis theorem
    const double omega1 = omega0 + alpha * duration;
    const double theta1 = omega0 * duration + 0.5 * alpha * duration * duration;
    const double kinetic = 0.5 * inertiaO * (omega1 * omega1 - omega0 * omega0);
    const double gravity = kMass * kG * kArm * std::sin(theta1);
    EXPECT_NEAR(e.kineticChange, kinetic, 1e-9 * kinetic);
    EXPECT_NEAR(e.gravityChange, gravity, 1e-9 * std::abs(gravity));
    EXPECT_NEAR(e.driverWork, kinetic + gravity, 1e-4 * (kinetic + std::abs(gravity)));
    EXPECT_EQ(e.springChange, 0.0);
    EXPECT_EQ(e.damperWork, 0.0);
    EXPECT_EQ(e.loadWork, 0.0);
    EXPECT_GT(e.throughput, kinetic);
    EXPECT_LT(e.relativeResidual, 1e-5);
    EXPECT_NEAR(e.residual, e.driverWork - e.kineticChange - e.gravityChange, 1e-12);
}

// A brake torque −T₀ and a torsion spring k at the pin, constant speed, no
// gravity: the motor holds T₀ + k θ (moment balance about the pin, α = 0),
// the brake absorbs T₀·2π and the spring stores ½ k (2π)² over one turn.
TEST(CycleSummary, LoadAndSpringWorkEnterTheBalanceWithTheirSigns)
{
    const double omega = 2 * kPi, brake = 3.0, k = 0.8;
    Mechanism mech = link(ConstantSpeed{omega, 0.0}, Vec2::Zero(), 120);
    mech.loads = {TorqueLoad{"brake", "link", -brake, std::nullopt}, TorsionSpringLoad{"coil", "O", k, 0.0}};
    const CompiledMechanism m = compile(mech);
    const CycleResult r = sweepCycle(m);
    ASSERT_TRUE(r.complete);
    const CycleSummary s = summarize(m, r);
    const EnergyBalance& e = s.energy;
    const double turn = 2 * kPi;
    EXPECT_NEAR(e.loadWork, -brake * turn, 1e-9);
    EXPECT_NEAR(e.springChange, 0.5 * k * turn * turn, 1e-9);
    // Power T₀ω + kω²t is linear in t, so the trapezoid rule is exact here.
    EXPECT_NEAR(e.driverWork, brake * turn + 0.5 * k * turn * turn, 1e-9);
    EXPECT_LT(e.relativeResidual, 1e-10);
    EXPECT_NEAR(s.drivers[0].peak.value, brake + k * turn, 1e-9);
    EXPECT_EQ(s.drivers[0].peak.step, 120);
    EXPECT_NEAR(s.drivers[0].mean, brake + k * kPi, 1e-9);
    EXPECT_EQ(s.drivers[0].peakRegenerative.step, -1);  // the motor never receives power
}

// A damper from a ground point to the link dissipates c L̇² ≥ 0; the
// balance must book it on the dissipation side.
TEST(CycleSummary, DamperDissipationIsBalancedByDriverWork)
{
    Mechanism mech = link(ConstantSpeed{3.0, 0.0}, Vec2::Zero(), 720);
    mech.loads = {DamperLoad{"shock", {kGroundName, Vec2(0.6, 0.2)}, {"link", Vec2(kArm, 0.0)}, 25.0}};
    const CompiledMechanism m = compile(mech);
    const CycleResult r = sweepCycle(m);
    ASSERT_TRUE(r.complete);
    const EnergyBalance e = summarize(m, r).energy;
    EXPECT_GT(e.damperWork, 0.0);
    EXPECT_NEAR(e.driverWork, e.damperWork, 1e-9 * e.damperWork);
    EXPECT_LT(e.relativeResidual, 1e-9);
}

// Four-bar crank-rocker: the transmission angle at the coupler–rocker pin
// follows from the law of cosines, cos μ = (b² + c² − z²)/(2bc) with z the
// distance from the crank pin to the rocker's ground pin; z is shortest (μ
// smallest) with the crank along the ground line towards the rocker, and
// longest (μ largest) opposite.
TEST(CycleSummary, FourBarTransmissionExtremesMatchLawOfCosines)
{
    test::FourBarSpec spec;
    spec.theta2 = 0.0;  // the grid (360 steps) then holds θ = 0 and θ = π
    Mechanism mech = test::fourBar(spec);
    mech.cycle.steps = 360;
    const CompiledMechanism m = compile(mech);
    const CycleResult r = sweepCycle(m);
    ASSERT_TRUE(r.complete);
    const CycleSummary s = summarize(m, r);
    const TransmissionSummary* b = nullptr;
    for (const auto& t : s.transmission)
        if (t.joint == "B") b = &t;
    ASSERT_NE(b, nullptr);
    const auto mu = [&](double z) {
        return radToDeg(std::acos((spec.b * spec.b + spec.c * spec.c - z * z) / (2 * spec.b * spec.c)));
    };
    EXPECT_NEAR(b->minimum.value, mu(spec.d - spec.a), 1e-8);
    EXPECT_TRUE(b->minimum.step == 0 || b->minimum.step == 360) << b->minimum.step;  // the same pose
    EXPECT_NEAR(b->maximum.value, mu(spec.d + spec.a), 1e-8);
    EXPECT_EQ(b->maximum.step, 180);
}

// In-line slider-crank with the piston's centre of mass a height h above the
// slide: the piston only translates, so moments about the pin B give the
// guide's couple M = −h m ẍ; |ẍ| is largest at the dead centre θ = 0, where
// ẍ = −r ω² (1 + r/l) (the exact piston acceleration of the slider-crank,
// as in standard kinematics texts).
TEST(CycleSummary, SliderPeakMomentMatchesPistonInertia)
{
    test::SliderCrankSpec spec;
    spec.theta0 = 0.0;  // the grid then holds the dead centre
    spec.pistonMass = 0.8;
    const double h = 0.05;
    Mechanism mech = test::sliderCrank(spec);
    mech.bodies[2].cg = Vec2(spec.r + spec.l, h);
    const CompiledMechanism m = compile(mech);
    SweepOptions options;
    options.steps = 90;
    const CycleResult r = sweepCycle(m, options);
    ASSERT_TRUE(r.complete);
    const CycleSummary s = summarize(m, r);
    const double expected = h * spec.pistonMass * spec.r * spec.omega * spec.omega * (1 + spec.r / spec.l);
    for (std::size_t j = 0; j < s.joints.size(); ++j) {
        if (m.joints[j].type == JointType::Slider) {
            EXPECT_NEAR(s.joints[j].peakMoment.value, expected, 1e-9 * expected);
            EXPECT_TRUE(s.joints[j].peakMoment.step == 0 || s.joints[j].peakMoment.step == 90);
        } else EXPECT_EQ(s.joints[j].peakMoment.step, -1) << s.joints[j].name;  // pins have no contact moment
    }
}

TEST(NumberText, SignificantFiguresInPlainDecimals)
{
    EXPECT_EQ(significant(1234.56), "1235");
    EXPECT_EQ(significant(0.0123456), "0.01235");
    EXPECT_EQ(significant(-87.654), "-87.65");
    EXPECT_EQ(significant(9999.7), "10000");
    EXPECT_EQ(significant(2.0), "2.000");
    EXPECT_EQ(significant(1.2e-7), "1.200e-07");
    EXPECT_EQ(significant(0.0), "0");
    EXPECT_EQ(percent(1.2e-5), "0.0012 %");
    EXPECT_EQ(percent(0.25), "25 %");
    EXPECT_EQ(percent(0.0), "0 %");
}

TEST(TextTable, ColumnsLineUpWithMultiByteUnits)
{
    EXPECT_EQ(displayWidth("12.5°"), 5u);
    TextTable t({TextTable::Align::Left, TextTable::Align::Right, TextTable::Align::Left});
    t.addRow({"A", "12.5 N·m", "x"});
    t.addRow({"long name", "3°", "y"});
    const std::string text = t.render("");
    const std::size_t cut = text.find('\n');
    const std::string first = text.substr(0, cut), second = text.substr(cut + 1, text.size() - cut - 2);
    EXPECT_EQ(displayWidth(first), displayWidth(second));
    EXPECT_EQ(first.back(), 'x');
    EXPECT_EQ(second.back(), 'y');
}

TEST(SummaryText, ShowsUnitsPeakPositionsBalanceAndCaution)
{
    const CompiledMechanism m = compile(link(ConstantSpeed{2.0, 0.0}, Vec2(0.0, -kG), 360));
    const CycleResult r = sweepCycle(m);
    const CycleSummary s = summarize(m, r);
    const std::string text = summaryText(m, r, s);
    const auto contains = [&](const std::string& part) { return text.find(part) != std::string::npos; };
    EXPECT_TRUE(contains(significant(s.joints[0].peak.value) + " N")) << text;
    EXPECT_TRUE(contains("at motor = 270.00°")) << text;  // |F| peaks where sin θ = −1
    EXPECT_TRUE(contains(significant(s.drivers[0].rms) + " N·m")) << text;
    EXPECT_TRUE(contains("Energy balance closes to " + percent(s.energy.relativeResidual) + " of the work")) << text;
    EXPECT_TRUE(contains("licensed engineer")) << text;
    EXPECT_TRUE(contains("cycle complete")) << text;
    EXPECT_FALSE(contains("Warnings")) << text;
}

TEST(SummaryText, IncompleteCycleAndWarningsAreStated)
{
    const CompiledMechanism m = compile(link(ConstantSpeed{2.0, 0.0}, Vec2::Zero(), 36));
    CycleResult r = sweepCycle(m);
    r.steps.resize(10);
    r.complete = false;
    r.warnings.push_back({"out_of_reach", "The cycle cannot be completed (test).", 10});
    const std::string text = summaryText(m, r, summarize(m, r));
    EXPECT_NE(text.find("INCOMPLETE: solved 9 of 36 steps"), std::string::npos) << text;
    EXPECT_NE(text.find("  - The cycle cannot be completed (test)."), std::string::npos) << text;
}

}  // namespace
