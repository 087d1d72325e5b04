// Four-bar linkage: rocker angle against Freudenstein's equation, transmission
// angle against the law of cosines, and Grashof's classification, both on its
// own and as the solver meets it (full cycle, or a stop at the toggle, which
// the solver explains by the class).
#include "core/model/grashof.h"
#include "core/solver/compiled_mechanism.h"
#include "core/solver/cycle_sweep.h"
#include "core/solver/grashof_note.h"
#include "tests/mechanism_builders.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <stdexcept>

using namespace clevis;

namespace {

constexpr int kCrank = 0, kCoupler = 1, kRocker = 2;
constexpr int kJointB = 2;  // coupler–rocker pin in test::fourBar

double wrapAngle(double a) { return std::remainder(a, 2 * kPi); }

double absoluteAngle(const Vec2& from, const Vec2& to) { return std::atan2(to.y() - from.y(), to.x() - from.x()); }

// Freudenstein's equation for a four-bar with ground d, crank a, coupler b,
// rocker c, angles from the ground line O2→O4 (standard kinematics texts):
//   K1 cos θ4 − K2 cos θ2 + K3 = cos(θ2 − θ4),
//   K1 = d/a, K2 = d/c, K3 = (a² − b² + c² + d²)/(2ac),
// and its closed-form solution by the half-angle substitution
//   θ4 = 2 atan2(−B + σ√(B² − 4AC), 2A),  σ = ±1 for the two branches,
//   A = cos θ2 − K1 − K2 cos θ2 + K3,  B = −2 sin θ2,  C = K1 − (K2 + 1) cos θ2 + K3.
struct Freudenstein {
    double k1, k2, k3;
    explicit Freudenstein(const test::FourBarSpec& s)
        : k1(s.d / s.a), k2(s.d / s.c), k3((s.a * s.a - s.b * s.b + s.c * s.c + s.d * s.d) / (2 * s.a * s.c))
    {}
    double residual(double theta2, double theta4) const
    {
        return k1 * std::cos(theta4) - k2 * std::cos(theta2) + k3 - std::cos(theta2 - theta4);
    }
    double rocker(double theta2, double sigma) const
    {
        const double A = std::cos(theta2) - k1 - k2 * std::cos(theta2) + k3;
        const double B = -2 * std::sin(theta2);
        const double C = k1 - (k2 + 1) * std::cos(theta2) + k3;
        return 2 * std::atan2(-B + sigma * std::sqrt(B * B - 4 * A * C), 2 * A);
    }
};

// A crank-rocker (s + l = 0.1 + 0.4 < p + q = 0.35 + 0.3, shortest link the crank).
test::FourBarSpec crankRocker()
{
    test::FourBarSpec s;
    s.a = 0.1;
    s.b = 0.35;
    s.c = 0.3;
    s.d = 0.4;
    s.theta2 = 0.3;
    s.motion = ConstantSpeed{2 * kPi, 0.0};
    return s;
}

// A body with neither mass nor inertia is named in a warning for the whole
// analysis (a forgotten section would otherwise leave its loads out
// silently); one given a mass is not.
TEST(FourBar, MasslessBodiesAreNamed)
{
    Mechanism doc = test::fourBar(crankRocker());
    ASSERT_EQ(doc.bodies.size(), 3u);
    doc.bodies[1].mass = 1.5;
    doc.bodies[1].inertia = 0.01;
    const CycleResult r = sweepCycle(compile(doc), {.steps = 36});
    ASSERT_EQ(r.warnings.size(), 1u);
    const Warning& w = r.warnings[0];
    EXPECT_EQ(w.code, "massless_bodies");
    EXPECT_EQ(w.step, -1);
    const std::string expected = "No mass is given for " + doc.bodies[0].name + " and " + doc.bodies[2].name + ":";
    EXPECT_EQ(w.message.rfind(expected, 0), 0u) << w.message;
    for (Body& b : doc.bodies) b.mass = 1.0;
    EXPECT_TRUE(sweepCycle(compile(doc), {.steps = 36}).warnings.empty());
}

TEST(FourBar, CrankRockerFollowsFreudenstein)
{
    const test::FourBarSpec spec = crankRocker();
    const test::FourBarPoints p = test::fourBarPoints(spec);
    const CompiledMechanism m = compile(test::fourBar(spec));
    const CycleResult r = sweepCycle(m, {.steps = 360});
    ASSERT_TRUE(r.complete);
    ASSERT_EQ(r.steps.size(), 361u);
    // Its bodies are massless (kinematics only): that is the one warning.
    ASSERT_EQ(r.warnings.size(), 1u);
    EXPECT_EQ(r.warnings[0].code, "massless_bodies");

    const Freudenstein f(spec);
    const double theta3Drawn = absoluteAngle(p.a, p.b), theta4Drawn = absoluteAngle(p.o4, p.b);
    // The drawn branch: the closed form's σ that gives the drawn rocker angle.
    const double sigma = std::abs(wrapAngle(f.rocker(spec.theta2, 1.0) - theta4Drawn)) < 1e-9 ? 1.0 : -1.0;
    ASSERT_LT(std::abs(wrapAngle(f.rocker(spec.theta2, sigma) - theta4Drawn)), 1e-9);

    double worstResidual = 0.0, worstAngle = 0.0, worstRate = 0.0;
    for (const StepResult& s : r.steps) {
        const double omega2 = 2 * kPi;
        const double theta2 = spec.theta2 + omega2 * s.t;
        const double theta3 = theta3Drawn + s.q[3 * kCoupler + 2];
        const double theta4 = theta4Drawn + s.q[3 * kRocker + 2];
        EXPECT_NEAR(wrapAngle(s.q[3 * kCrank + 2] - omega2 * s.t), 0.0, 1e-12);
        worstResidual = std::max(worstResidual, std::abs(f.residual(theta2, theta4)));
        worstAngle = std::max(worstAngle, std::abs(wrapAngle(theta4 - f.rocker(theta2, sigma))));
        // Rocker speed from the differentiated loop closure (standard texts):
        // ω4 = a ω2 sin(θ2 − θ3) / (c sin(θ4 − θ3)).
        const double omega4 = spec.a * omega2 * std::sin(theta2 - theta3) / (spec.c * std::sin(theta4 - theta3));
        worstRate = std::max(worstRate, std::abs(s.qd[3 * kRocker + 2] - omega4));
    }
    EXPECT_LT(worstResidual, 1e-10);
    EXPECT_LT(worstAngle, 1e-10);  // rad
    EXPECT_LT(worstRate, 1e-9);    // rad/s, with ω2 = 2π rad/s
    RecordProperty("freudenstein_residual", ::testing::PrintToString(worstResidual));
    RecordProperty("rocker_angle_error_rad", ::testing::PrintToString(worstAngle));
    RecordProperty("rocker_rate_error_rad_s", ::testing::PrintToString(worstRate));
}

// Law of cosines on the diagonal A–O4, z² = a² + d² − 2ad cos θ2 = b² + c² − 2bc cos μ
// (standard kinematics texts), gives the transmission angle μ between coupler
// and rocker at B:  cos μ = (b² + c² − a² − d² + 2ad cos θ2) / (2bc).
TEST(FourBar, TransmissionAngleMatchesLawOfCosines)
{
    const test::FourBarSpec spec = crankRocker();
    const CompiledMechanism m = compile(test::fourBar(spec));
    const CycleResult r = sweepCycle(m, {.steps = 120});
    ASSERT_TRUE(r.complete);
    const auto pin = std::find_if(r.transmissionPins.begin(), r.transmissionPins.end(),
                                  [](const TransmissionPin& t) { return t.joint == kJointB; });
    ASSERT_NE(pin, r.transmissionPins.end()) << "no transmission angle reported at the coupler-rocker pin B";
    const std::size_t index = std::size_t(pin - r.transmissionPins.begin());
    double worst = 0.0;
    for (const StepResult& s : r.steps) {
        const double theta2 = spec.theta2 + 2 * kPi * s.t;
        const double cosMu = (spec.b * spec.b + spec.c * spec.c - spec.a * spec.a - spec.d * spec.d +
                              2 * spec.a * spec.d * std::cos(theta2)) /
                             (2 * spec.b * spec.c);
        ASSERT_EQ(s.transmissionDeg.size(), r.transmissionPins.size());
        worst = std::max(worst, std::abs(s.transmissionDeg[index] - radToDeg(std::acos(cosMu))));
    }
    EXPECT_LT(worst, 1e-8);  // degrees
    RecordProperty("transmission_angle_error_deg", ::testing::PrintToString(worst));
}

// Grashof's criterion (standard kinematics texts): with s, l the shortest and
// longest links and p, q the others, s + l < p + q lets the shortest link
// turn fully; the shortest as ground gives a double crank, as a side link a
// crank-rocker, as the coupler a double rocker; s + l = p + q is a change
// point; s + l > p + q a triple rocker. Lengths in the order ground, input,
// coupler, output.
TEST(Grashof, ClassifiesEachKind)
{
    struct Case {
        std::array<double, 4> lengths;
        GrashofClass kind;
        FourBarLink shortest, longest;
    };
    const Case cases[] = {
        {{0.4, 0.1, 0.35, 0.3}, GrashofClass::CrankRocker, FourBarLink::Input, FourBarLink::Ground},
        {{0.4, 0.3, 0.35, 0.1}, GrashofClass::CrankRocker, FourBarLink::Output, FourBarLink::Ground},
        {{0.1, 0.3, 0.35, 0.4}, GrashofClass::DoubleCrank, FourBarLink::Ground, FourBarLink::Output},
        {{0.4, 0.3, 0.1, 0.35}, GrashofClass::DoubleRocker, FourBarLink::Coupler, FourBarLink::Ground},
        {{0.3, 0.2, 0.4, 0.3}, GrashofClass::ChangePoint, FourBarLink::Input, FourBarLink::Coupler},
        {{0.3, 0.3, 0.3, 0.3}, GrashofClass::ChangePoint, FourBarLink::Ground, FourBarLink::Ground},  // rhombus
        {{1.0, 0.75, 0.8, 0.9}, GrashofClass::TripleRocker, FourBarLink::Input, FourBarLink::Ground},
    };
    for (const Case& c : cases) {
        const GrashofResult g = classifyFourBar(c.lengths);
        const double sorted[4] = {c.lengths[0], c.lengths[1], c.lengths[2], c.lengths[3]};
        const double s = *std::min_element(sorted, sorted + 4), l = *std::max_element(sorted, sorted + 4);
        const double sum = sorted[0] + sorted[1] + sorted[2] + sorted[3];
        EXPECT_EQ(g.kind, c.kind) << grashofClassName(g.kind) << " for " << c.lengths[0] << ", " << c.lengths[1] << ", "
                                  << c.lengths[2] << ", " << c.lengths[3];
        EXPECT_EQ(g.shortest, c.shortest) << fourBarLinkName(g.shortest);
        EXPECT_EQ(g.longest, c.longest) << fourBarLinkName(g.longest);
        EXPECT_NEAR(g.margin, (sum - s - l) - (s + l), 1e-15);
    }
    // A change point computed with rounding still counts as one.
    EXPECT_EQ(classifyFourBar({0.1 + 0.2, 0.1, 0.4, 0.2}).kind, GrashofClass::ChangePoint);  // 0.1 + 0.4 = 0.3 + 0.2
    EXPECT_THROW(classifyFourBar({1.0, 0.2, 0.3, 0.5}), std::invalid_argument);  // l = s + p + q: cannot close
    EXPECT_THROW(classifyFourBar({1.0, 0.0, 0.3, 0.5}), std::invalid_argument);
    try {
        classifyFourBar({0.3, 0.2, 2.0, 0.5});
        ADD_FAILURE() << "a coupler longer than the other three together was accepted";
    } catch (const std::invalid_argument& e) {
        EXPECT_NE(std::string(e.what()).find("coupler"), std::string::npos) << e.what();
    }
}

// As the solver meets it: a drag link's driven crank and its output both turn
// a full revolution.
TEST(Grashof, DoubleCrankOutputTurnsFully)
{
    test::FourBarSpec spec{.a = 0.3, .b = 0.35, .c = 0.4, .d = 0.1, .theta2 = 0.5};
    ASSERT_EQ(classifyFourBar({spec.d, spec.a, spec.b, spec.c}).kind, GrashofClass::DoubleCrank);
    const CompiledMechanism m = compile(test::fourBar(spec));
    const CycleResult r = sweepCycle(m, {.steps = 360});
    ASSERT_TRUE(r.complete);
    EXPECT_NEAR(r.steps.back().q[3 * kRocker + 2], 2 * kPi, 1e-9);
    for (const StepResult& s : r.steps) EXPECT_GT(s.qd[3 * kRocker + 2], 0.0);  // never reverses
}

// A non-Grashof four-bar (s + l = 0.75 + 1.0 > p + q = 0.8 + 0.9) cannot turn
// its input fully: it reaches a toggle where coupler and rocker fall into
// line, at the crank angle where the diagonal A–O4 equals b + c:
//   cos θ2,lim = (a² + d² − (b + c)²) / (2ad)        (law of cosines).
// The sweep stops there with `complete == false` and an "out_of_reach"
// warning. At a fold the Jacobian's smallest singular value vanishes like
// √(θ2,lim − θ2), and so does its reciprocal condition whatever the units
// balancing: measured here, rcond ≈ 0.1·√Δθ2 (rad). A step is therefore
// flagged only within about (threshold/0.1)² rad of the toggle (1e-4 rad for
// a threshold of 1e-3), so the drawn crank angle puts step 135 that close on
// purpose; an ordinary sweep stops up to a step short of the toggle without
// a near_singular flag.
TEST(FourBar, NonGrashofStopsAtToggle)
{
    test::FourBarSpec spec{.a = 0.75, .b = 0.8, .c = 0.9, .d = 1.0};
    ASSERT_EQ(classifyFourBar({spec.d, spec.a, spec.b, spec.c}).kind, GrashofClass::TripleRocker);
    const double limit =
        std::acos((spec.a * spec.a + spec.d * spec.d - std::pow(spec.b + spec.c, 2)) / (2 * spec.a * spec.d));
    // Steps of 1°; the toggle lies 2e-7 rad beyond step 135.
    const double stepAngle = degToRad(1.0);
    spec.theta2 = limit - 135 * stepAngle - 2e-7;
    spec.motion = ConstantSpeed{2 * kPi, 0.0};
    const CompiledMechanism m = compile(test::fourBar(spec));
    const CycleResult r = sweepCycle(m, {.steps = 360});

    EXPECT_FALSE(r.complete);
    ASSERT_EQ(r.steps.size(), 136u);
    const auto reach =
        std::find_if(r.warnings.begin(), r.warnings.end(), [](const Warning& w) { return w.code == "out_of_reach"; });
    ASSERT_NE(reach, r.warnings.end());
    EXPECT_NE(reach->message.find("motor"), std::string::npos) << reach->message;
    const std::string why =
        "It is a non-Grashof four-bar (s + l = 1.75 m > p + q = 1.7 m): no link turns fully, so "
        "the driven link \"crank\" only swings between two toggle positions: a crank driven at "
        "constant speed cannot complete the cycle.";
    EXPECT_NE(reach->message.find(why), std::string::npos) << reach->message;

    const double lastCrank = spec.theta2 + r.steps.back().q[3 * kCrank + 2];
    EXPECT_LT(lastCrank, limit);
    EXPECT_GT(lastCrank, limit - stepAngle);

    // From the step 1° short of the toggle to the last, 2e-7 rad short, the
    // reciprocal condition falls as √(distance), within a factor of 2 (the
    // estimate of rcond is itself good to a small factor), and the last step
    // is the worst conditioned of the sweep.
    const auto distance = [&](const StepResult& s) { return limit - (spec.theta2 + s.q[3 * kCrank + 2]); };
    const StepResult& last = r.steps.back();
    const StepResult& before = r.steps[r.steps.size() - 2];
    const double fall = last.reciprocalCondition / before.reciprocalCondition;
    const double law = std::sqrt(distance(last) / distance(before));
    EXPECT_GT(fall, 0.5 * law);
    EXPECT_LT(fall, 2.0 * law);
    for (std::size_t k = 0; k + 1 < r.steps.size(); ++k)
        EXPECT_GT(r.steps[k].reciprocalCondition, 10 * last.reciprocalCondition) << "step " << k;
    EXPECT_TRUE(r.steps.back().nearSingular) << "reciprocal condition " << r.steps.back().reciprocalCondition;
    EXPECT_FALSE(r.steps.front().nearSingular);  // 135° from the toggle
    const auto singular =
        std::find_if(r.warnings.begin(), r.warnings.end(), [](const Warning& w) { return w.code == "near_singular"; });
    ASSERT_NE(singular, r.warnings.end());
    EXPECT_GT(singular->step, 100);
    EXPECT_NE(singular->message.find(why), std::string::npos) << singular->message;
    RecordProperty("last_reciprocal_condition", ::testing::PrintToString(r.steps.back().reciprocalCondition));
}

// Grashof's condition (F. Grashof, Theoretische Maschinenlehre, vol. 2, 1883):
// with s, l the shortest and longest links and p, q the others, s + l < p + q
// lets the shortest link turn fully against the others. Ground 0.4, input
// 0.3, coupler 0.35, output 0.1: 0.1 + 0.4 < 0.3 + 0.35, and the shortest is
// the output, so it is the crank and the driven input only rocks, within
// |A − O4| ≤ b + c, i.e. cos θ2 ≥ (a² + d² − (b + c)²)/(2ad) (θ2 ≤ 78.6°). The
// stop there is explained by the class; a driven crank has nothing to explain.
TEST(Grashof, DiagnosisNamesTheClassAndTheFullyTurningLink)
{
    test::FourBarSpec spec{.a = 0.3, .b = 0.35, .c = 0.1, .d = 0.4, .theta2 = 1.0};
    ASSERT_EQ(classifyFourBar({spec.d, spec.a, spec.b, spec.c}).kind, GrashofClass::CrankRocker);
    const CompiledMechanism m = compile(test::fourBar(spec));
    const CycleResult r = sweepCycle(m, {.steps = 360});
    EXPECT_FALSE(r.complete);
    const auto reach =
        std::find_if(r.warnings.begin(), r.warnings.end(), [](const Warning& w) { return w.code == "out_of_reach"; });
    ASSERT_NE(reach, r.warnings.end());
    EXPECT_NE(reach->message.find("It is a Grashof crank-rocker (s + l = 0.5 m < p + q = 0.65 m) whose fully turning "
                                  "link is the output \"rocker\", so the driven link \"crank\" only swings between "
                                  "two toggle positions: a crank driven at constant speed cannot complete the cycle."),
              std::string::npos)
        << reach->message;

    spec.motion = Rise{CamLaw::Cycloidal, 1.0, 1.2, 0.0, 1.0};
    EXPECT_NE(grashofNote(compile(test::fourBar(spec))).find("the driver's motion must stay between them."),
              std::string::npos);

    EXPECT_EQ(grashofNote(compile(test::fourBar(crankRocker()))), "");
    const test::FourBarSpec dragLink{.a = 0.3, .b = 0.35, .c = 0.4, .d = 0.1};
    EXPECT_EQ(grashofNote(compile(test::fourBar(dragLink))), "");
}

}  // namespace
