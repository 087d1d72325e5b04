// The energy over a cycle as a designer uses it: what each driver puts in and
// takes back, what the dampers lose, and the residual against the energy
// passing through, checked against closed forms for a single link turned at
// constant speed.
#include "core/results/cycle_summary.h"
#include "core/results/number_text.h"
#include "core/results/results_json.h"
#include "core/results/summary_text.h"
#include "core/solver/cycle_sweep.h"
#include "tests/mechanism_builders.h"

#include <gtest/gtest.h>

#include <cmath>

using namespace clevis;
using namespace clevis::test;

namespace {

constexpr double kOmega = 4.0;  // rad/s
constexpr double kG = 9.81;     // m/s²

// A link pinned to the frame at the origin and turned at constant speed ω
// for one revolution, drawn at angle 0; its centre of mass `arm` along it.
Mechanism turnedLink(double mass, double arm, Vec2 gravity, int steps)
{
    Mechanism m;
    m.name = "turned link";
    m.gravity = gravity;
    m.bodies = {pointBody("link", mass, Vec2(arm, 0.0), 0.002)};
    m.joints = {pin("O", kGroundName, "link", Vec2::Zero())};
    m.drivers = {rotary("motor", "O", ConstantSpeed{kOmega, 0.0})};
    m.cycle.steps = steps;
    return m;
}

CycleSummary summarized(const Mechanism& mechanism)
{
    const CompiledMechanism m = compile(mechanism);
    const CycleResult r = sweepCycle(m);
    EXPECT_TRUE(r.complete);
    return summarize(m, r);
}

}  // namespace

// Lifting and lowering a weight: at constant ω the motor holds the weight's
// moment, T = m g d cos θ (θ = ωt; statics of the link, I_O θ̈ = 0), so its
// power P = m g d ω cos ωt is a sinusoid. Over a turn (elementary calculus,
// ∫ from −π/2 to π/2 of cos θ dθ = 2):
//   ∫ max(P, 0) dt = 2 m g d,   ∫ min(P, 0) dt = −2 m g d,   ∫ P dt = 0.
TEST(EnergyTerms, SinusoidalTorqueOfAWeightPutsInAndTakesBackTwoMgd)
{
    const double mass = 3.0, arm = 0.2;
    const CycleSummary s = summarized(turnedLink(mass, arm, Vec2(0.0, -kG), 720));
    ASSERT_EQ(s.drivers.size(), 1u);
    const DriverSummary& d = s.drivers[0];
    const double lifted = 2 * mass * kG * arm;
    // The trapezoid rule's error on a sinusoid is of order (ωh)²/12 relative.
    EXPECT_NEAR(d.workIn, lifted, 1e-4 * lifted);
    EXPECT_NEAR(d.workOut, -lifted, 1e-4 * lifted);
    EXPECT_NEAR(d.workIn + d.workOut, d.work, 1e-12 * lifted);
    EXPECT_NEAR(s.energy.throughput, lifted, 1e-4 * lifted);
    // Net work, kinetic and potential change are all rounding noise over a
    // turn: each is shown as ≈ 0, none is scaled up to a full bar.
    EXPECT_TRUE(negligibleEnergy(d.work, s.energy));
    EXPECT_TRUE(negligibleEnergy(s.energy.gravityChange, s.energy));
    EXPECT_TRUE(negligibleEnergy(s.energy.residual, s.energy));
    EXPECT_FALSE(negligibleEnergy(d.workIn, s.energy));
}

// A damper c from the crank pin (radius r) to a frame point at distance D on
// the line of the crank: L² = r² + D² − 2rD cos θ, L̇ = rDω sin θ / L, so the
// energy it takes over a turn is
//   W = c r² D² ω ∫₀^{2π} sin²θ / (r² + D² − 2rD cos θ) dθ = π c r² ω,
// from the standard integral ∫₀^{2π} sin²θ/(a − b cos θ) dθ = 2π(a − √(a² − b²))/b²
// with a = r² + D², b = 2rD (checked numerically with sympy for r = 0.1,
// D = 0.5). With a massless crank the motor puts all of it in and takes none back.
TEST(EnergyTerms, DamperOnACrankLosesPiCR2OmegaPerTurn)
{
    const double r = 0.1, D = 0.5, c = 30.0;
    Mechanism mech = turnedLink(0.0, 0.5 * r, Vec2::Zero(), 720);
    mech.loads = {DamperLoad{"dashpot", {"link", Vec2(r, 0.0)}, {kGroundName, Vec2(D, 0.0)}, c}};
    const CycleSummary s = summarized(mech);
    const double loss = kPi * c * r * r * kOmega;
    EXPECT_NEAR(s.energy.damperWork, loss, 1e-4 * loss);
    EXPECT_NEAR(s.drivers[0].workIn, loss, 1e-4 * loss);
    EXPECT_NEAR(s.drivers[0].workOut, 0.0, 1e-9 * loss);
    EXPECT_NEAR(s.energy.throughput, loss, 1e-4 * loss);
    EXPECT_LT(s.energy.relativeResidual, 1e-4);
}

// The same figures in the CLI text and the JSON.
TEST(EnergyTerms, TextAndJsonCarryThePutInAndTakenBackWork)
{
    const Mechanism mech = turnedLink(3.0, 0.2, Vec2(0.0, -kG), 360);
    const CompiledMechanism m = compile(mech);
    const CycleResult r = sweepCycle(m);
    const CycleSummary s = summarize(m, r);
    const std::string text = summaryText(m, r, s);
    EXPECT_NE(text.find("Put in"), std::string::npos) << text;
    EXPECT_NE(text.find(significant(s.drivers[0].workIn) + " J"), std::string::npos) << text;
    EXPECT_NE(text.find(significant(s.drivers[0].workOut) + " J"), std::string::npos) << text;
    EXPECT_NE(text.find("Kinetic energy gained           ≈ 0 J"), std::string::npos) << text;
    const nlohmann::json json = summaryToJson(m, r, s);
    EXPECT_DOUBLE_EQ(json["drivers"]["motor"]["work_in_j"].get<double>(), s.drivers[0].workIn);
    EXPECT_DOUBLE_EQ(json["drivers"]["motor"]["work_out_j"].get<double>(), s.drivers[0].workOut);
    EXPECT_DOUBLE_EQ(json["energy_balance"]["throughput_j"].get<double>(), s.energy.throughput);
}
