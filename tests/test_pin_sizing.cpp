// Sizing of pins and bearings: pin shear stress and projected bearing
// pressure against their definitions, p·v against a hand computation on the
// punch press (a slider-crank), the relative angular velocity at a four-bar's
// coupler–rocker pin against an independent sympy solution; the file keys:
// bad input refused by item and key, the round trip, old files unchanged.
#include "core/file/mechanism_file.h"
#include "core/model/model_error.h"
#include "core/results/bar_sizing.h"
#include "core/results/pin_sizing.h"
#include "core/results/sizing_json.h"
#include "core/results/sizing_text.h"
#include "core/solver/cycle_sweep.h"
#include "tests/mechanism_builders.h"
#include "tests/python_check.h"
#include "tests/sample_file.h"
#include "tests/solved_mechanism.h"

#include <gtest/gtest.h>

#include <cmath>
#include <string>

using namespace clevis;

namespace {

using test::solve;
using test::Solved;

Mechanism punchPress() { return test::loadSample("punch_press"); }

std::size_t jointIndex(const Mechanism& m, const std::string& name)
{
    for (std::size_t j = 0; j < m.joints.size(); ++j)
        if (m.joints[j].name == name) return j;
    throw std::runtime_error("no joint " + name);
}

const PinSizing& pinNamed(const std::vector<PinSizing>& pins, const std::string& name)
{
    for (const PinSizing& p : pins)
        if (p.name == name) return p;
    throw std::runtime_error("no pin " + name);
}

// The step where the reaction at joint `j` is largest, and its magnitude.
std::pair<int, double> largestReaction(const CycleResult& r, std::size_t j)
{
    std::pair<int, double> best{-1, -1.0};
    for (std::size_t k = 0; k < r.steps.size(); ++k)
        if (const double f = r.steps[k].joints[j].force.norm(); f > best.second) best = {int(k), f};
    return best;
}

// The punch press with pins sized at its crank pin (double shear, bearing
// length given) and its wrist pin (single shear, length from the rod).
Mechanism pressWithPins()
{
    Mechanism doc = punchPress();
    for (Joint& j : doc.joints) j.pin.reset();  // whatever the sample says, these tests set their own
    doc.joints[jointIndex(doc, "crank_pin")].pin = PinData{0.045, 2, 0.06, 90e6, 25e6, 3e6};
    doc.joints[jointIndex(doc, "wrist_pin")].pin = PinData{0.035, 1, std::nullopt, 90e6, std::nullopt, std::nullopt};
    doc.joints[jointIndex(doc, "main_bearing")].pin = PinData{0.08, 1, std::nullopt, std::nullopt, std::nullopt, 2e6};
    return doc;
}

// τ = |F| / (n·π·d²/4), mean shear over the pin's n cross-sections; p =
// |F| / (d·l), the load over the projected area (machine-element texts' plain
// bearing pressure). |F| is the reaction at the step where it is largest.
TEST(PinSizing, ShearAndPressureFollowTheirDefinitions)
{
    const Solved s = solve(pressWithPins());
    const std::vector<PinSizing> pins = sizePins(s.doc, s.m, s.r);

    const auto [crankStep, crankForce] = largestReaction(s.r, jointIndex(s.doc, "crank_pin"));
    const PinSizing& crank = pinNamed(pins, "crank_pin");
    ASSERT_GT(crankForce, 30e3);  // the 40 kN forming stroke
    EXPECT_EQ(crank.force.step, crankStep);
    EXPECT_DOUBLE_EQ(crank.force.value, crankForce);
    EXPECT_NEAR(crank.shearStress.value, crankForce / (2 * M_PI * 0.045 * 0.045 / 4), 1e-9 * crank.shearStress.value);
    EXPECT_EQ(crank.shearStress.step, crankStep);
    EXPECT_NEAR(crank.pressure.value, crankForce / (0.045 * 0.06), 1e-9 * crank.pressure.value);
    ASSERT_TRUE(crank.shearUtilisation && crank.pressureUtilisation && crank.pvUtilisation);
    EXPECT_NEAR(*crank.shearUtilisation, crank.shearStress.value / 90e6, 1e-12);
    EXPECT_NEAR(*crank.pressureUtilisation, crank.pressure.value / 25e6, 1e-12);
    EXPECT_NEAR(*crank.pvUtilisation, crank.pv.value / 3e6, 1e-12);
    EXPECT_TRUE(crank.notes.empty());

    // Single shear; the bearing length defaults to the rod's 30 mm thickness
    // (the ram has typed-in mass, no thickness).
    const auto [wristStep, wristForce] = largestReaction(s.r, jointIndex(s.doc, "wrist_pin"));
    const PinSizing& wrist = pinNamed(pins, "wrist_pin");
    ASSERT_TRUE(wrist.bearing);
    EXPECT_EQ(wrist.bearing->length, 0.03);
    EXPECT_EQ(wrist.bearing->fromBody, "connecting_rod");
    EXPECT_NEAR(wrist.shearStress.value, wristForce / (M_PI * 0.035 * 0.035 / 4), 1e-9 * wrist.shearStress.value);
    EXPECT_NEAR(wrist.pressure.value, wristForce / (0.035 * 0.03), 1e-9 * wrist.pressure.value);
    EXPECT_EQ(wrist.pressure.step, wristStep);
    EXPECT_FALSE(wrist.pressureUtilisation);  // no allowable given: no figure, and a note says so
    ASSERT_EQ(wrist.notes.size(), 1u);
    EXPECT_NE(wrist.notes[0].find("allowable_pressure, allowable_pv"), std::string::npos) << wrist.notes[0];
}

// A pin on ground through a body of typed-in mass has no bearing length to
// default to: shear is sized, pressure and p·v are not, and a note says why.
TEST(PinSizing, NoBearingLengthNoPressure)
{
    const Solved s = solve(pressWithPins());
    const std::vector<PinSizing> pins = sizePins(s.doc, s.m, s.r);
    const PinSizing& main = pinNamed(pins, "main_bearing");
    EXPECT_FALSE(main.bearing);
    EXPECT_GE(main.shearStress.step, 0);
    EXPECT_LT(main.pressure.step, 0);
    EXPECT_LT(main.pv.step, 0);
    EXPECT_FALSE(main.pvUtilisation);
    ASSERT_FALSE(main.notes.empty());
    EXPECT_NE(main.notes[0].find("bearing_length"), std::string::npos) << main.notes[0];
}

// Hand computation on the punch press's crank pin: at every step, the crank's
// and the rod's angular velocities read from the results' qd (ω = φ̇ of
// each body), v = |ω_rod − ω_crank|·d/2, p = |F|/(d·l), and the largest p·v.
// The rod's ω is also checked against the slider-crank's closed-form velocity
// analysis (crank r, rod L, slide through the crank centre along y):
// L·cos φ = −r·cos θ gives φ̇ = −r·sin θ·θ̇ / (L·sin φ), sin φ = −√(1 − (r·cos θ/L)²)
// with the ram below the crank.
TEST(PinSizing, PvMatchesHandComputationOnSliderCrank)
{
    const Solved s = solve(pressWithPins());
    const std::size_t j = jointIndex(s.doc, "crank_pin");
    const int crank = s.m.joints[j].body[0], rod = s.m.joints[j].body[1];
    ASSERT_EQ(s.m.bodyName(crank), "crankshaft");
    ASSERT_EQ(s.m.bodyName(rod), "connecting_rod");
    constexpr double d = 0.045, l = 0.06, r = 0.04, rodLength = 0.22;
    const double omega = 2 * M_PI;  // 60 rpm
    double bestPv = -1, speedThere = 0;
    int bestStep = -1;
    for (std::size_t k = 0; k < s.r.steps.size(); ++k) {
        const StepResult& step = s.r.steps[k];
        const double wCrank = step.qd[3 * crank + 2], wRod = step.qd[3 * rod + 2];
        const double theta = M_PI / 2 + step.drivePosition[0];  // the crank is drawn pointing up
        const double sinPhi = -std::sqrt(1 - std::pow(r * std::cos(theta) / rodLength, 2));
        ASSERT_NEAR(wCrank, omega, 1e-9);
        ASSERT_NEAR(wRod, -r * std::sin(theta) * omega / (rodLength * sinPhi), 1e-9) << "step " << k;
        const double v = std::abs(wRod - wCrank) * d / 2, p = step.joints[j].force.norm() / (d * l);
        if (p * v > bestPv) bestPv = p * v, speedThere = v, bestStep = int(k);
    }
    const std::vector<PinSizing> pins = sizePins(s.doc, s.m, s.r);
    const PinSizing& pin = pinNamed(pins, "crank_pin");
    EXPECT_EQ(pin.pv.step, bestStep);
    EXPECT_NEAR(pin.pv.value, bestPv, 1e-9 * bestPv);
    EXPECT_NEAR(pin.speedAtPv, speedThere, 1e-12);
}

// The sliding speed at a four-bar's coupler–rocker pin B from an independent
// solution (tests/sympy_four_bar.py: loop closure solved by nsolve and
// differentiated in time, nothing from the solver): v = |φ̇_rocker − φ̇_coupler|·d/2
// at each step; the largest must be the sizing's peak.
TEST(PinSizing, RelativeAngularVelocityMatchesSympyFourBar)
{
    test::FourBarSpec spec;
    spec.motion = ConstantSpeed{5.0, 3.0};  // speeding up, so ω differs step by step
    Mechanism doc = test::fourBar(spec);
    doc.cycle.duration = 0.9;
    doc.cycle.steps = 6;
    constexpr double d = 0.02;
    doc.joints[2].pin = PinData{d, 1, 0.01, std::nullopt, std::nullopt, std::nullopt};
    const Solved s = solve(doc);
    ASSERT_TRUE(s.r.complete);

    nlohmann::json in;
    for (const auto& j : doc.joints) in["pins"][j.name] = {j.at.x(), j.at.y()};
    for (const auto& b : doc.bodies)
        in["bodies"].push_back({{"name", b.name}, {"mass", *b.mass}, {"cg", {b.cg->x(), b.cg->y()}}, {"inertia", 0.0}});
    in["gravity"] = {0.0, 0.0};
    in["crank"] = {{"speed", 5.0}, {"accel", 3.0}};
    in["force"] = {{"at", {0.0, 0.0}}, {"force", {0.0, 0.0}}};
    in["rocker_torque"] = 0.0;
    in["march_steps"] = 30;  // the branch is followed from one step's solution to the next
    for (const StepResult& step : s.r.steps) in["times"].push_back(step.t);
    const nlohmann::json out = test::runPythonCheck(CLEVIS_SYMPY_FOUR_BAR, in);
    ASSERT_EQ(out["steps"].size(), s.r.steps.size());
    double best = -1;
    int bestStep = -1;
    for (std::size_t k = 0; k < s.r.steps.size(); ++k) {
        const auto& rates = out["steps"][k]["rates"];  // φ̇ of crank, coupler, rocker
        const double v = std::abs(rates[2].get<double>() - rates[1].get<double>()) * d / 2;
        if (v > best) best = v, bestStep = int(k);
    }
    const std::vector<PinSizing> pins = sizePins(s.doc, s.m, s.r);
    const PinSizing& b = pinNamed(pins, "B");
    EXPECT_EQ(b.slidingSpeed.step, bestStep);
    EXPECT_NEAR(b.slidingSpeed.value, best, 1e-9 * best);
}

TEST(PinSizing, JointsWithoutPinDataShowTheirForceAndSlidersAreLeftOut)
{
    Mechanism doc = punchPress();
    for (Joint& j : doc.joints) j.pin.reset();
    const Solved s = solve(doc);
    const std::vector<PinSizing> pins = sizePins(s.doc, s.m, s.r);
    ASSERT_EQ(pins.size(), 3u);  // the ram's guide is a slider
    for (const PinSizing& p : pins) {
        EXPECT_FALSE(p.pin);
        EXPECT_EQ(p.force.value, largestReaction(s.r, std::size_t(p.joint)).second);
        EXPECT_LT(p.shearStress.step, 0);
    }
}

TEST(PinSizing, TextAndJsonCarryUnitsAndPlaces)
{
    const Solved s = solve(pressWithPins());
    SizingResult sized = sizeBars(s.doc, s.m, s.r);
    sized.pins = sizePins(s.doc, s.m, s.r);
    const std::string text = sizingText(s.m, s.r, sized);
    for (const char* expected : {"Sizing of pins and bearings", "45.00 mm", "double", "60.00 mm",
                                 "30.00 mm (connecting_rod)", " MPa", " MPa·m/s", " m/s", "main_motor = "})
        EXPECT_NE(text.find(expected), std::string::npos) << expected << "\n" << text;
    const nlohmann::json j = sizingToJson(s.m, s.r, sized);
    const nlohmann::json& crank = j["pins"][1];
    EXPECT_EQ(crank["joint"], "crank_pin");
    EXPECT_EQ(crank["pin"]["diameter_m"], 0.045);
    EXPECT_EQ(crank["pin"]["shear_planes"], 2);
    EXPECT_EQ(crank["pin"]["bearing_length_from_body"], nullptr);
    const PinSizing& p = pinNamed(sized.pins, "crank_pin");
    EXPECT_EQ(crank["shear_stress"]["stress_Pa"], p.shearStress.value);
    EXPECT_EQ(crank["pv"]["pv_Pa_m_s"], p.pv.value);
    EXPECT_EQ(crank["pv"]["speed_m_s"], p.speedAtPv);
    EXPECT_EQ(crank["utilisation"]["pressure"], *p.pressureUtilisation);
    EXPECT_TRUE(crank["force"]["drive"].contains("main_motor"));
    EXPECT_FALSE(crank["force"].contains("s_m"));
    EXPECT_EQ(j["pins"][2]["pin"]["bearing_length_from_body"], "connecting_rod");
}

// ---- the file ----

// A crank and rod whose second joint, A, carries `pinJson` (none if empty).
std::string pressText(const std::string& pinJson, const std::string& type = "pin")
{
    return R"({"clevis": 1, "bodies": [{"name": "crank", "mass": 1, "cg": [0, 0], "inertia": 0.01},
               {"name": "rod", "section": {"width": 0.02, "thickness": 0.01, "material": "steel"}}],
    "joints": [{"name": "O", "type": "pin", "bodies": ["ground", "crank"], "at": [0, 0]},
               {"name": "A", "type": ")" +
           type + R"(", "bodies": ["crank", "rod"], "at": [0, 0.05])" +
           (pinJson.empty() ? "" : ", \"pin\": " + pinJson) + "}]}";
}

std::string refusal(const std::string& text)
{
    try {
        parseMechanism(text);
    } catch (const ModelError& e) {
        return e.what();
    }
    return "(read without complaint)";
}

TEST(PinFile, BadPinDataIsRefusedNamingItemAndKey)
{
    const struct {
        const char* pin;
        const char* type;
        const char* says;
    } cases[] = {
        {R"({"diameter": 0})", "pin", "joints[1].pin.diameter: must be a finite number > 0 (got 0)"},
        {R"({"diameter": -0.01})", "pin", "joints[1].pin.diameter: must be a finite number > 0 (got -0.01)"},
        {R"({"shear_planes": 2})", "pin", "joints[1].pin.diameter: required key missing"},
        {R"({"diameter": 0.01, "shear_planes": 3})", "pin",
         "joints[1].pin.shear_planes: must be 1 (single shear) or 2 (double shear) (got 3)"},
        {R"({"diameter": 0.01, "shear_planes": 1.5})", "pin", "joints[1].pin.shear_planes: must be 1"},
        {R"({"diameter": 0.01, "bearing_length": 0})", "pin",
         "joints[1].pin.bearing_length: must be a finite number > 0"},
        {R"({"diameter": 0.01, "allowable_shear_stress": 0})", "pin",
         "joints[1].pin.allowable_shear_stress: must be a finite number > 0"},
        {R"({"diameter": 0.01, "allowable_pressure": -2e7})", "pin",
         "joints[1].pin.allowable_pressure: must be a finite number > 0"},
        {R"({"diameter": 0.01, "allowable_pv": 0})", "pin", "joints[1].pin.allowable_pv: must be a finite number > 0"},
        {R"({"diameter": 0.01})", "slider", "joints[1].pin: a slider has no pin"},
        {R"(0.01)", "pin", "joints[1].pin: expected an object"},
    };
    for (const auto& c : cases) {
        const std::string why = refusal(pressText(c.pin, c.type));
        EXPECT_NE(why.find(c.says), std::string::npos) << c.pin << " → " << why;
    }
    // A pin in a slot has a pin: its data is taken.
    const Mechanism slot = parseMechanism(pressText(R"({"diameter": 0.01})", "pin_in_slot")).mechanism;
    ASSERT_TRUE(slot.joints[1].pin);
    EXPECT_EQ(slot.joints[1].pin->diameter, 0.01);
}

TEST(PinFile, RoundTripKeepsEveryValueAndWritesNoAbsentOne)
{
    Mechanism doc = pressWithPins();
    doc.joints[jointIndex(doc, "wrist_pin")].pin->allowablePressure = 1.5e7;
    const std::string text = saveMechanismText(doc);
    EXPECT_EQ(parseMechanism(text).mechanism, doc);
    EXPECT_TRUE(parseMechanism(text).warnings.empty());
    // The wrist pin's bearing length follows the rod: not written.
    const nlohmann::json j = nlohmann::json::parse(text);
    const nlohmann::json& wrist = j["joints"][jointIndex(doc, "wrist_pin")]["pin"];
    EXPECT_FALSE(wrist.contains("bearing_length"));
    EXPECT_FALSE(wrist.contains("allowable_pv"));
    EXPECT_EQ(wrist["shear_planes"], 1);
    EXPECT_EQ(j["joints"][jointIndex(doc, "crank_pin")]["pin"]["shear_planes"], 2);
    EXPECT_FALSE(j["joints"][jointIndex(doc, "ram_guide")].contains("pin"));
}

// A file without pin data reads with no pin on any joint and saves without
// the key, as before.
TEST(PinFile, OldFilesLoadUnchanged)
{
    const LoadedMechanism old = parseMechanism(pressText(""));
    EXPECT_TRUE(old.warnings.empty());
    for (const Joint& j : old.mechanism.joints) EXPECT_FALSE(j.pin);
    EXPECT_EQ(saveMechanismText(old.mechanism).find("\"pin\":"), std::string::npos);
}

}  // namespace
