// Numbers that mean what they say: a peak from a step near a singular
// position is kept apart from the design peak and marked in the summary, its
// text and its JSON; the part that locks is named; the transmission angle is
// reported only where a coupler drives an output link on the frame.
#include "core/file/mechanism_file.h"
#include "core/results/cycle_summary.h"
#include "core/results/number_text.h"
#include "core/results/results_json.h"
#include "core/results/summary_text.h"
#include "core/solver/cycle_sweep.h"
#include "core/solver/transmission_angle.h"
#include "tests/mechanism_builders.h"
#include "tests/solved_mechanism.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <set>

using namespace clevis;
using namespace clevis::test;

namespace {

FourBarSpec withMasses(FourBarSpec spec)
{
    for (int i = 0; i < 3; ++i) {
        spec.mass[i] = 1.0;
        spec.inertia[i] = 0.01;
    }
    return spec;
}

// Change-point four-bar (s + l = p + q: 0.1 + 0.3 = 0.2 + 0.2): once a turn,
// at crank angle 0, A = (0.1, 0) lies |b − c| = 0.1 from O4 = (0.2, 0), so
// coupler and rocker fold onto one line through B.
const FourBarSpec kChangePoint = withMasses({.a = 0.1, .b = 0.3, .c = 0.2, .d = 0.2, .theta2 = 1.0});
// Non-Grashof four-bar (s + l = 0.6 > p + q = 0.55): the crank cannot turn
// fully; driven at constant speed it reaches the position where coupler and
// rocker line up (|AO4| = b + c) and the cycle stops there.
const FourBarSpec kNonGrashof = withMasses({.a = 0.2, .b = 0.3, .c = 0.25, .d = 0.4, .theta2 = 0.5});

std::string bodyName(const Solved& x, int b) { return x.m.bodyName(b); }

// sin of the angle at B between B→A and B→O4 from the pin positions: zero
// when coupler and rocker are in line (independent of the solver's naming).
double inLine(const Solved& x, int step)
{
    const auto at = [&](const char* joint) {
        for (const auto& j : x.m.joints)
            if (j.name == joint) return pointPosition(x.r.steps[step].q, j.point[1]);
        return Vec2(Vec2::Zero());
    };
    const Vec2 ba = at("A") - at("B"), bo = at("O4") - at("B");
    return std::abs(cross(ba, bo)) / (ba.norm() * bo.norm());
}

void expectCouplerAndRockerAtB(const Solved& x)
{
    ASSERT_FALSE(x.s.toggles.empty()) << summaryText(x.m, x.r, x.s);
    for (const auto& t : x.s.toggles) {
        EXPECT_EQ((std::set<std::string>{bodyName(x, t.bodies[0]), bodyName(x, t.bodies[1])}),
                  (std::set<std::string>{"coupler", "rocker"}));
        ASSERT_GE(t.joint, 0);
        EXPECT_EQ(x.m.joints[t.joint].name, "B");
        EXPECT_LT(inLine(x, t.worst), 0.1) << "the named links are not in line at step " << t.worst;
        const std::string text = toggleText(x.m, t);
        EXPECT_NE(text.find("line up at pin B"), std::string::npos) << text;
    }
}

// Every peak is from an unreliable step only if it is marked so, and a larger
// value from such a step is kept apart, marked, and really larger.
void expectPeaksKeptApart(const Solved& x, const Peak& p)
{
    ASSERT_GE(p.step, 0);
    EXPECT_EQ(p.nearSingular, bool(x.s.unreliable[p.step]));
    if (p.flagged.step >= 0) {
        EXPECT_TRUE(x.s.unreliable[p.flagged.step]);
        EXPECT_TRUE(p.flagged.nearSingular);
        EXPECT_GT(std::abs(p.flagged.value), std::abs(p.value));
    }
}

int joint(const Solved& x, const std::string& name)
{
    for (std::size_t j = 0; j < x.m.joints.size(); ++j)
        if (x.m.joints[j].name == name) return int(j);
    return -1;
}

}  // namespace

TEST(FlaggedNumbers, ChangePointFourBarNamesCouplerAndRockerAtPinB)
{
    const Solved x = solve(fourBar(kChangePoint));
    ASSERT_TRUE(x.r.complete);
    expectCouplerAndRockerAtB(x);
    for (const auto& j : x.s.joints) expectPeaksKeptApart(x, j.peak);
    for (const auto& d : x.s.drivers) expectPeaksKeptApart(x, d.peak);
    expectPeaksKeptApart(x, x.s.groundForce);
}

// The lock-up artefact must not be the design peak: at the end of reach the
// reactions run to tens of kN while away from it they stay near 100 N.
TEST(FlaggedNumbers, LimitOfANonGrashofFourBarIsKeptApartFromThePeak)
{
    const Solved x = solve(fourBar(kNonGrashof));
    ASSERT_FALSE(x.r.complete);
    expectCouplerAndRockerAtB(x);
    EXPECT_EQ(x.s.toggles.back().last, int(x.r.steps.size()) - 1);
    const Peak& b = x.s.joints[joint(x, "B")].peak;
    expectPeaksKeptApart(x, b);
    ASSERT_GE(b.flagged.step, 0) << "the lock-up value is not kept apart";
    EXPECT_FALSE(b.nearSingular);
    EXPECT_GT(b.flagged.value, 100 * b.value);
    for (const auto& d : x.s.drivers) expectPeaksKeptApart(x, d.peak);
}

TEST(FlaggedNumbers, TextAndJsonMarkTheFlaggedValueAndNameThePart)
{
    const Solved x = solve(fourBar(kNonGrashof));
    const std::string text = summaryText(x.m, x.r, x.s);
    EXPECT_NE(text.find("coupler and rocker line up at pin B (steps "), std::string::npos) << text;
    // The value at the flagged step carries the mark.
    const std::string lockUp = significant(x.s.joints[joint(x, "B")].peak.flagged.value) + " N " + kNearToggleMark;
    EXPECT_NE(text.find(lockUp), std::string::npos) << lockUp << "\n" << text;

    const nlohmann::json json = summaryToJson(x.m, x.r, x.s);
    const auto& b = json["joints"]["B"];
    EXPECT_EQ(b["peak_near_singular"], false);
    ASSERT_TRUE(b["peak_near_toggle"].is_object());
    EXPECT_EQ(b["peak_near_toggle"]["step"], x.s.joints[joint(x, "B")].peak.flagged.step);
    ASSERT_FALSE(json["toggles"].empty());
    EXPECT_EQ(json["toggles"][0]["joint"], "B");
    EXPECT_TRUE(json["drivers"]["motor"].contains("peak_near_singular"));
}

// A slider-crank driven by its piston locks at dead centre, where crank and
// rod line up at the crank pin A.
TEST(FlaggedNumbers, PistonDrivenSliderCrankLocksAtTheCrankPin)
{
    SliderCrankSpec spec{
        .theta0 = 0.3, .crankMass = 1, .rodMass = 1, .pistonMass = 1, .crankInertia = 0.01, .rodInertia = 0.01};
    Mechanism mech = sliderCrank(spec);
    // From the drawn pose the piston moves out by 0.1 m over the cycle: the
    // outer dead centre (crank and rod in line, B at r + l) lies on the way.
    const double b0 = mech.joints[2].at.x();
    mech.drivers = {linearAtSlider("ram", "S", ConstantSpeed{0.1, 0.0}, 0.0)};
    mech.cycle.duration = 1.0;
    const Solved x = solve(mech);
    ASSERT_GT(b0 + 0.1, spec.r + spec.l) << "the test must pass the dead centre";
    ASSERT_FALSE(x.s.toggles.empty()) << summaryText(x.m, x.r, x.s);
    const NearToggle& t = x.s.toggles.front();
    EXPECT_EQ((std::set<std::string>{bodyName(x, t.bodies[0]), bodyName(x, t.bodies[1])}),
              (std::set<std::string>{"crank", "rod"}))
        << toggleText(x.m, t);
    ASSERT_GE(t.joint, 0);
    EXPECT_EQ(x.m.joints[t.joint].name, "A");
}

namespace {

std::vector<std::string> transmissionPins(const CompiledMechanism& m)
{
    std::vector<std::string> names;
    for (const auto& p : findTransmissionPins(m)) names.push_back(m.joints[p.joint].name);
    return names;
}

}  // namespace

// Only where a coupler drives an output link on the frame: B (coupler → rocker)
// in a four-bar, the wrist pin B (rod → piston) in a slider-crank.
TEST(TransmissionPins, FourBarAndSliderCrankReportTheOutputPin)
{
    EXPECT_EQ(transmissionPins(compile(fourBar({}))), std::vector<std::string>{"B"});
    EXPECT_EQ(transmissionPins(compile(sliderCrank({}))), std::vector<std::string>{"B"});
}

// The six-bar sample: the crank drives the coupler plate, which drives the
// rocker at B and, through the dwell link, the finger lever at D. P joins the
// plate to the dwell link, neither of them on the frame: no output there.
TEST(TransmissionPins, SixBarSampleReportsOnlyPinsIntoOutputsOnTheFrame)
{
    const CompiledMechanism m = compile(loadMechanismFile(CLEVIS_SAMPLES_DIR "/dwell_six_bar.json").mechanism);
    EXPECT_EQ(transmissionPins(m), (std::vector<std::string>{"B", "D"}));
    // At D the angle is between the dwell link's line D→P and the finger
    // lever's line D→F from its frame pivot (angle between two vectors from
    // their dot and cross products).
    const CycleResult r = sweepCycle(m);
    ASSERT_EQ(r.transmissionPins.size(), 2u);
    const auto point = [&](const StepResult& s, const std::string& name) {
        for (const auto& j : m.joints)
            if (j.name == name) return pointPosition(s.q, j.point[1]);
        return Vec2(Vec2::Zero());
    };
    double worst = 0.0;
    for (const auto& s : r.steps) {
        const Vec2 dp = point(s, "P") - point(s, "D"), df = point(s, "F") - point(s, "D");
        const double expected = radToDeg(std::atan2(std::abs(cross(dp, df)), dp.dot(df)));
        worst = std::max(worst, std::abs(s.transmissionDeg[1] - expected));
    }
    EXPECT_LT(worst, 1e-9);
}
