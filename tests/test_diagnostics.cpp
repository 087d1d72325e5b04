// What the solver says about mechanisms it cannot analyse as drawn: too few
// or too many drivers, redundant joints, links that cannot be joined, and
// dead centres.
#include "core/solver/analysis_error.h"
#include "core/solver/compiled_mechanism.h"
#include "core/solver/cycle_sweep.h"
#include "core/solver/mobility_check.h"
#include "core/solver/step_solver.h"
#include "tests/mechanism_builders.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <set>

using namespace clevis;

namespace {

bool contains(const std::string& text, const std::string& part) { return text.find(part) != std::string::npos; }

// The AnalysisError a sweep throws, or a test failure if it throws none.
AnalysisError sweepError(const Mechanism& mech)
{
    const CompiledMechanism m = compile(mech);
    try {
        sweepCycle(m);
    } catch (const AnalysisError& e) {
        return e;
    }
    ADD_FAILURE() << "\"" << mech.name << "\" was analysed without complaint";
    return AnalysisError("", {});
}

MobilityReport mobilityAtDrawnPose(const Mechanism& mech)
{
    const CompiledMechanism m = compile(mech);
    return checkMobility(m, StepSolver(m).drawnPose());
}

std::set<std::string> asSet(const std::vector<std::string>& names) { return {names.begin(), names.end()}; }

// A five-bar: ground pins O1 and O5, four moving links. Gruebler's count
// 3·4 − 2·5 = 2 degrees of freedom (standard kinematics texts); one motor
// leaves one undriven, and the three links beyond the motor can move.
TEST(Diagnostics, UnderDrivenFiveBarNamesFreeBodies)
{
    const Vec2 o1(0, 0), a(0.05, 0.12), c(0.22, 0.2), b(0.38, 0.1), o5(0.4, 0);
    Mechanism mech;
    mech.name = "five-bar";
    mech.gravity = Vec2::Zero();
    mech.bodies = {
        test::pointBody("left crank", 0, 0.5 * (o1 + a), 0), test::pointBody("left link", 0, 0.5 * (a + c), 0),
        test::pointBody("right link", 0, 0.5 * (c + b), 0), test::pointBody("right crank", 0, 0.5 * (b + o5), 0)};
    mech.joints = {test::pin("O1", kGroundName, "left crank", o1), test::pin("A", "left crank", "left link", a),
                   test::pin("C", "left link", "right link", c), test::pin("B", "right link", "right crank", b),
                   test::pin("O5", kGroundName, "right crank", o5)};
    mech.drivers = {test::rotary("motor", "O1", ConstantSpeed{1.0, 0.0})};

    const MobilityReport report = mobilityAtDrawnPose(mech);
    EXPECT_EQ(report.gruebler, 2);
    EXPECT_EQ(report.mobility, 2);
    EXPECT_EQ(report.drivers, 1);

    const AnalysisError e = sweepError(mech);
    const std::string message = e.what();
    EXPECT_TRUE(contains(message, "1 degree(s) of freedom not driven")) << message;
    for (const char* body : {"left link", "right link", "right crank"}) EXPECT_TRUE(contains(message, body)) << message;
    EXPECT_FALSE(contains(message, "left crank")) << message;
    EXPECT_EQ(asSet(e.items()), (std::set<std::string>{"left link", "right link", "right crank"}));
}

// Two motors on a four-bar, which has one degree of freedom: the second
// fights the first.
TEST(Diagnostics, OverDrivenFourBarNamesTheDrivers)
{
    Mechanism mech = test::fourBar(test::FourBarSpec{});
    mech.drivers.push_back(test::rotary("second motor", "O4", ConstantSpeed{1.0, 0.0}));
    const MobilityReport report = mobilityAtDrawnPose(mech);
    EXPECT_EQ(report.mobility, 1);
    EXPECT_EQ(report.drivers, 2);
    EXPECT_TRUE(report.freeBodies.empty());

    const AnalysisError e = sweepError(mech);
    const std::string message = e.what();
    EXPECT_TRUE(contains(message, "over-constrain")) << message;
    EXPECT_TRUE(contains(message, "motor")) << message;
    EXPECT_TRUE(contains(message, "second motor")) << message;
    EXPECT_EQ(asSet(e.items()), (std::set<std::string>{"motor", "second motor"}));
}

// A parallelogram with a third parallel crank: Gruebler's count gives
// 3·4 − 2·6 = 0, yet it moves (one degree of freedom) because the third
// crank repeats a constraint the other two already impose. Its reactions are
// statically indeterminate, and the joints involved must be named.
TEST(Diagnostics, RedundantParallelogramNamesTheJoints)
{
    const double r = 0.1, theta = 1.0;
    const Vec2 crank = r * Vec2(std::cos(theta), std::sin(theta));
    const Vec2 o2(0, 0), o6(0.15, 0), o4(0.3, 0);
    Mechanism mech;
    mech.name = "parallelogram";
    mech.gravity = Vec2::Zero();
    mech.bodies = {test::pointBody("crank", 0, o2 + 0.5 * crank, 0),
                   test::pointBody("middle crank", 0, o6 + 0.5 * crank, 0),
                   test::pointBody("rocker", 0, o4 + 0.5 * crank, 0), test::pointBody("coupler", 0, o6 + crank, 0)};
    mech.joints = {
        test::pin("O2", kGroundName, "crank", o2),        test::pin("A", "crank", "coupler", o2 + crank),
        test::pin("O6", kGroundName, "middle crank", o6), test::pin("C", "middle crank", "coupler", o6 + crank),
        test::pin("O4", kGroundName, "rocker", o4),       test::pin("B", "rocker", "coupler", o4 + crank)};
    mech.drivers = {test::rotary("motor", "O2", ConstantSpeed{1.0, 0.0})};

    const MobilityReport report = mobilityAtDrawnPose(mech);
    EXPECT_EQ(report.gruebler, 0);
    EXPECT_EQ(report.mobility, 1);
    EXPECT_EQ(report.redundantEquations, 1);
    ASSERT_EQ(report.redundantGroups.size(), 1u);

    const AnalysisError e = sweepError(mech);
    const std::string message = e.what();
    EXPECT_TRUE(contains(message, "Redundant constraint: joints")) << message;
    EXPECT_TRUE(contains(message, "Gruebler's count 0")) << message;
    const std::set<std::string> joints{"O2", "A", "O6", "C", "O4", "B"};
    ASSERT_GE(e.items().size(), 2u);
    for (const auto& item : e.items()) {
        EXPECT_TRUE(joints.count(item)) << "\"" << item << "\" is not a joint";
        EXPECT_TRUE(contains(message, item)) << message;
    }
}

// Links that cannot be joined at the start of the cycle. Every joint is
// drawn where it is, so the drawn pose itself always closes; it cannot close
// once the driver asks for another start: here a non-Grashof four-bar
// (s + l = 0.75 + 1.0 > p + q = 0.8 + 0.9) whose motion starts the crank at
// 170°, beyond its toggle at cos⁻¹((a² + d² − (b + c)²)/(2ad)) ≈ 152°. The
// error must name a joint where the links fail to meet, and say why by the
// four-bar's Grashof class.
TEST(Diagnostics, LinksThatCannotCloseNameAJoint)
{
    test::FourBarSpec spec;
    spec.a = 0.75;
    spec.b = 0.8;
    spec.c = 0.9;
    spec.d = 1.0;
    spec.theta2 = 0.3;
    spec.motion = Rise{CamLaw::Cycloidal, degToRad(170), degToRad(200), 0.0, 1.0};
    const Mechanism mech = test::fourBar(spec);
    const AnalysisError e = sweepError(mech);
    const std::string message = e.what();
    EXPECT_TRUE(contains(message, "does not assemble")) << message;
    EXPECT_TRUE(contains(message, "non-Grashof four-bar (s + l = 1.75 m > p + q = 1.7 m): no link turns fully"))
        << message;
    EXPECT_TRUE(contains(message, "the driver's motion must stay between them.")) << message;
    ASSERT_EQ(e.items().size(), 1u);
    const std::set<std::string> joints{"O2", "A", "B", "O4"};
    EXPECT_TRUE(joints.count(e.items()[0])) << "named \"" << e.items()[0] << "\", not a joint: " << message;
    EXPECT_TRUE(contains(message, "\"" + e.items()[0] + "\"")) << message;
}

// A slider-crank drawn at dead centre (crank and rod in line, θ = 0). Driven
// at the crank it is not singular: the piston simply stops there, x = r + l,
// ẋ = 0 (closed form of test_slider_crank.cpp at θ = 0).
TEST(Diagnostics, CrankDrivesFromDeadCentre)
{
    test::SliderCrankSpec spec;
    spec.theta0 = 0.0;
    spec.crankMass = 1.0;
    spec.rodMass = 2.0;
    spec.pistonMass = 3.0;
    spec.crankInertia = 0.003;
    spec.rodInertia = 0.02;
    const CompiledMechanism m = compile(test::sliderCrank(spec));
    const CycleResult r = sweepCycle(m, {.steps = 36});
    ASSERT_TRUE(r.complete);
    EXPECT_TRUE(r.warnings.empty());
    for (const StepResult& s : r.steps) EXPECT_FALSE(s.nearSingular) << "t = " << s.t;
    EXPECT_NEAR(r.steps[0].q[3 * 2], spec.r + spec.l, 1e-12);
    EXPECT_NEAR(r.steps[0].qd[3 * 2], 0.0, 1e-12);
    EXPECT_TRUE(std::isfinite(r.steps[0].effort[0]));
}

// Driven by the piston, the same slider-crank is singular at dead centre:
// there the piston's motion no longer determines the crank's. A piston that
// rises to x = r + l and falls again (a symmetric table, top at t = 1 s)
// drives it through dead centre; the step there must be flagged.
TEST(Diagnostics, PistonDrivesThroughDeadCentre)
{
    test::SliderCrankSpec spec;
    spec.theta0 = 0.5;
    Mechanism mech = test::sliderCrank(spec);
    const double rise = spec.r + spec.l - mech.joints[2].at.x();
    mech.drivers = {test::linearAtSlider("ram", "S", MotionTable{{0.0, 1.0, 2.0}, {0.0, rise, 0.0}})};
    mech.loads = {TorqueLoad{"load", "crank", 5.0, std::nullopt}};
    const CompiledMechanism m = compile(mech);
    const CycleResult r = sweepCycle(m, {.steps = 40});  // step 20 at t = 1 s
    ASSERT_TRUE(r.complete);
    EXPECT_TRUE(r.steps[20].nearSingular) << "reciprocal condition " << r.steps[20].reciprocalCondition;
    EXPECT_FALSE(r.steps[0].nearSingular);
    EXPECT_FALSE(r.steps[40].nearSingular);
    EXPECT_NEAR(spec.theta0 + r.steps[20].q[2], 0.0, 1e-5);  // the crank is in line with the rod
    const auto w =
        std::find_if(r.warnings.begin(), r.warnings.end(), [](const Warning& x) { return x.code == "near_singular"; });
    ASSERT_NE(w, r.warnings.end());
    EXPECT_EQ(w->step, 20);
    EXPECT_TRUE(contains(w->message, "ram")) << w->message;
}

// Drawn at dead centre and driven by the piston, the direction the crank
// would take is undetermined: the analysis refuses, saying so, rather than
// calling the mechanism both under- and over-driven.
TEST(Diagnostics, PistonDrivenFromDeadCentreIsRefusedClearly)
{
    test::SliderCrankSpec spec;
    spec.theta0 = 0.0;
    Mechanism mech = test::sliderCrank(spec);
    mech.drivers = {test::linearAtSlider("ram", "S", Rise{CamLaw::Cycloidal, 0.0, -0.1, 0.0, 1.0})};
    const MobilityReport report = mobilityAtDrawnPose(mech);
    EXPECT_EQ(report.mobility, 1);
    EXPECT_EQ(report.drivers, 1);
    EXPECT_TRUE(report.singularPose);
    const AnalysisError e = sweepError(mech);
    const std::string message = e.what();
    EXPECT_TRUE(contains(message, "dead centre")) << message;
    EXPECT_TRUE(contains(message, "ram")) << message;
    EXPECT_FALSE(contains(message, "Add a driver")) << message;
    EXPECT_FALSE(contains(message, "Remove one")) << message;
    // Drawn a little off dead centre it runs, flagging the start (there
    // the near-singular measure is proportional to the crank's angle, about 2e-6 at 1e-5 rad).
    spec.theta0 = 1e-5;
    mech = test::sliderCrank(spec);
    mech.drivers = {test::linearAtSlider("ram", "S", Rise{CamLaw::Cycloidal, 0.0, -0.1, 0.0, 1.0})};
    const CycleResult r = sweepCycle(compile(mech), {.steps = 20});
    EXPECT_TRUE(r.complete);
    EXPECT_TRUE(r.steps[0].nearSingular);
}

}  // namespace
