// The drive behind the drivers: motor torque and speed through a gearbox,
// regenerated energy, reflected inertia, the gear ratio study, cylinder
// pressure and flow; the drive data in mechanism files. Each check names
// the outside relation it is held against.
#include "core/file/mechanism_file.h"
#include "core/model/model_error.h"
#include "core/results/drive_text.h"
#include "core/results/drive_train.h"
#include "core/results/ratio_study.h"
#include "core/results/results_json.h"
#include "core/solver/compiled_mechanism.h"
#include "core/solver/cycle_sweep.h"
#include "core/solver/motor_drive.h"
#include "tests/mechanism_builders.h"
#include "tests/python_check.h"

#include <gtest/gtest.h>

#include <cmath>
#include <numbers>

using namespace clevis;

namespace {

constexpr double kG = 9.80665;

struct DriveRun {
    Mechanism doc;
    CompiledMechanism m;
    CycleResult r;
    CycleSummary s;
    DriveResults drive;
};

DriveRun run(const Mechanism& doc)
{
    DriveRun out{doc, compile(doc), {}, {}, {}};
    out.r = sweepCycle(out.m);
    out.s = summarize(out.m, out.r);
    out.drive = driveResults(out.doc, out.m, out.r, out.s.unreliable);
    return out;
}

// One bar on a ground pin at the origin, its centre of mass at (d, 0) as drawn,
// turned by the driver "motor" at the pin.
Mechanism bar(double mass, double d, double inertiaG, Motion motion, Vec2 gravity)
{
    Mechanism m;
    m.gravity = gravity;
    m.bodies = {test::pointBody("bar", mass, Vec2(d, 0.0), inertiaG)};
    m.joints = {test::pin("O", kGroundName, "bar", Vec2::Zero())};
    m.drivers = {test::rotary("motor", "O", motion)};
    m.cycle.steps = 360;
    return m;
}

Mechanism withGearbox(Mechanism m, const Gearbox& g)
{
    m.drivers[0].gearbox = g;
    return m;
}

// A massless bar at constant speed against a constant torque load on it:
// the driver's effort is −load. The gear-train relations of machine-design
// texts: driving,
// T_m = T/(i·η); with power flowing back, T_m = T·η/i; ω_m = i·ω.
TEST(DriveTrain, MotorTorqueFollowsTheDirectionOfPowerFlow)
{
    const Gearbox g{12.5, 0.8, 0.0, 0.0};
    for (const double load : {-30.0, 30.0}) {  // opposing the motion (driving), then helping it (regenerating)
        Mechanism doc = withGearbox(bar(0.0, 0.2, 0.0, ConstantSpeed{3.0, 0.0}, Vec2::Zero()), g);
        doc.loads.push_back(TorqueLoad{"load", "bar", load, std::nullopt});
        const DriveRun x = run(doc);
        ASSERT_EQ(x.drive.motors.size(), 1u);
        const MotorDuty& d = x.drive.motors[0];
        const double torque = -load;
        const double expected = torque > 0 ? torque / (g.ratio * g.efficiency) : torque * g.efficiency / g.ratio;
        for (std::size_t i = 0; i < x.r.steps.size(); ++i) {
            EXPECT_NEAR(x.r.steps[i].effort[0], torque, 1e-9);
            EXPECT_NEAR(d.torque[i], expected, 1e-9 * std::abs(expected));
            EXPECT_NEAR(d.speed[i], 3.0 * g.ratio, 1e-9);
        }
        EXPECT_NEAR(d.torqueRms, std::abs(expected), 1e-9 * std::abs(expected));
        EXPECT_NEAR(d.torquePeak.value, expected, 1e-9 * std::abs(expected));
        EXPECT_NEAR(d.speedPeak.value, 3.0 * g.ratio, 1e-9);
        // Regenerating the whole cycle: all of η·|T·ω| comes back at the motor shaft.
        const double expectedRegen = torque < 0 ? g.efficiency * -torque * 3.0 * x.r.duration : 0.0;
        EXPECT_NEAR(d.regenerated, expectedRegen, 1e-9 * (1 + expectedRegen));
    }
}

// A bar accelerated from rest by a cycloidal rise, no gravity: T = I_O·α
// (Euler's equation about a fixed pivot), so with η = 1 the motor needs
// T_m = I_O·α/i + (J_m + J_g)·i·α, the rotor and gearbox turning i times as fast.
TEST(DriveTrain, RotorAndGearboxInertiaAddTheirAcceleratingTorque)
{
    const double mass = 3.0, d = 0.25, inertiaG = 0.02, inertiaO = inertiaG + mass * d * d;
    const Gearbox g{20.0, 1.0, 2e-4, 5e-5};
    Mechanism doc = withGearbox(bar(mass, d, inertiaG, Rise{CamLaw::Cycloidal, 0.0, kPi, 0.0, 1.0}, Vec2::Zero()), g);
    doc.cycle.duration = 1.0;
    const DriveRun x = run(doc);
    const MotorDuty& duty = x.drive.motors.at(0);
    double largestAccel = 0;
    for (std::size_t i = 0; i < x.r.steps.size(); ++i) {
        // Cycloidal rise of h over T (cam-design texts): α = 2πh/T² · sin(2πt/T).
        const double alpha = 2 * kPi * kPi * std::sin(2 * kPi * x.r.steps[i].t);
        largestAccel = std::max(largestAccel, std::abs(alpha));
        const double expected = inertiaO * alpha / g.ratio + (g.motorInertia + g.gearboxInertia) * g.ratio * alpha;
        EXPECT_NEAR(duty.torque[i], expected, 1e-7 * (inertiaO + 0.1) * 2 * kPi * kPi);
    }
    EXPECT_GT(largestAccel, 10.0);  // the inertia terms are exercised
}

// An unbalanced bar turned at constant ω in a vertical plane: the driver holds
// T = m·g·d·cos θ, so its power m·g·d·ω·cos θ is negative over
// θ ∈ (90°, 270°). Returned to the motor shaft through the gearbox over that
// half turn (by hand): η·∫ m·g·d·|cos θ| dθ = η·2·m·g·d.
TEST(DriveTrain, RegeneratedEnergyOverTheNegativePowerSpan)
{
    const double mass = 4.0, d = 0.3, omega = 2 * kPi;
    const Gearbox g{5.0, 0.85, 1e-3, 0.0};
    const DriveRun x = run(withGearbox(bar(mass, d, 0.01, ConstantSpeed{omega, 0.0}, Vec2(0, -kG)), g));
    ASSERT_TRUE(x.r.complete);
    const double expected = g.efficiency * 2 * mass * kG * d;
    // The trapezoid rule over 360 steps (its error ~ (Δθ)²/12 relative).
    EXPECT_NEAR(x.drive.motors.at(0).regenerated, expected, 1e-4 * expected);
    // Without losses and with the loss applied the other way the figure must move.
    const DriveRun lossless =
        run(withGearbox(bar(mass, d, 0.01, ConstantSpeed{omega, 0.0}, Vec2(0, -kG)), Gearbox{5.0, 1.0, 1e-3, 0.0}));
    EXPECT_NEAR(lossless.drive.motors.at(0).regenerated, 2 * mass * kG * d, 1e-4 * expected);
}

// A bar turning about a fixed pivot has the generalised inertia I_O = I_G + m·d²
// (parallel-axis theorem); at the motor shaft J/i² (reflected inertia,
// machine-design texts), and the ratio to the rotor's inertia.
TEST(DriveTrain, ReflectedInertiaOfABarIsItsPivotInertiaOverRatioSquared)
{
    const double mass = 2.0, d = 0.4, inertiaG = 0.05, inertiaO = inertiaG + mass * d * d;
    const Gearbox g{8.0, 0.9, 1e-3, 2e-4};
    const DriveRun x = run(withGearbox(bar(mass, d, inertiaG, ConstantSpeed{5.0, 0.0}, Vec2(0, -kG)), g));
    const auto& j = x.drive.motors.at(0).reflected;
    ASSERT_TRUE(j.has_value());
    EXPECT_NEAR(j->smallest.value, inertiaO / (g.ratio * g.ratio), 1e-12);
    EXPECT_NEAR(j->largest.value, inertiaO / (g.ratio * g.ratio), 1e-12);
    ASSERT_TRUE(j->ratioToRotor.has_value());
    EXPECT_NEAR(*j->ratioToRotor, inertiaO / (g.ratio * g.ratio) / g.motorInertia, 1e-9);
}

// The slider-crank's generalised inertia varies over the turn; its extremes
// at the motor shaft against sympy's J(θ) from the closed-form geometry.
TEST(DriveTrain, ReflectedInertiaOfASliderCrankAgainstSympy)
{
    test::SliderCrankSpec spec;
    spec.crankMass = 1.2, spec.rodMass = 2.1, spec.pistonMass = 3.4, spec.crankInertia = 0.004, spec.rodInertia = 0.03;
    Mechanism doc = test::sliderCrank(spec);
    doc.cycle.steps = 120;
    const Gearbox g{4.0, 0.95, 1e-3, 0.0};
    doc.drivers[0].gearbox = g;
    const DriveRun x = run(doc);
    ASSERT_TRUE(x.r.complete);
    nlohmann::json input = {{"r", spec.r},
                            {"l", spec.l},
                            {"crank_mass", spec.crankMass},
                            {"rod_mass", spec.rodMass},
                            {"piston_mass", spec.pistonMass},
                            {"crank_inertia", spec.crankInertia},
                            {"rod_inertia", spec.rodInertia},
                            {"theta", nlohmann::json::array()}};
    for (const auto& s : x.r.steps) input["theta"].push_back(s.drivePosition[0]);
    const nlohmann::json out = test::runPythonCheck(CLEVIS_SYMPY_REFLECTED_INERTIA, input);
    ASSERT_TRUE(out.contains("J"));
    double lo = 1e300, hi = 0;
    for (const double j : out["J"]) lo = std::min(lo, j), hi = std::max(hi, j);
    ASSERT_GT(hi, 1.5 * lo);  // it does vary
    const auto& j = x.drive.motors.at(0).reflected;
    ASSERT_TRUE(j.has_value());
    EXPECT_NEAR(j->smallest.value * g.ratio * g.ratio, lo, 1e-9 * hi);
    EXPECT_NEAR(j->largest.value * g.ratio * g.ratio, hi, 1e-9 * hi);
}

// A pure inertia load J_L on the output and a rotor J_m, η = 1: T_m = α·(J_L/i + J_m·i),
// least in RMS at i = √(J_L/J_m), the inertia-matching ratio of servo-drive sizing.
TEST(RatioStudy, FindsTheInertiaMatchingRatioWithinTheGridSpacing)
{
    const double inertiaG = 0.5;  // kg·m², a flywheel-like disc on its own axis
    const Gearbox g{1.0, 1.0, 2e-4, 0.0};
    Mechanism doc = withGearbox(bar(10.0, 0.0, inertiaG, Rise{CamLaw::Cycloidal, 0.0, kPi, 0.0, 1.0}, Vec2::Zero()), g);
    doc.cycle.duration = 1.0;
    const DriveRun x = run(doc);
    const RatioRange range{1.0, 200.0, 200};
    const RatioStudy study = ratioStudy(x.m, x.r, x.s.unreliable, 0, g, range);
    ASSERT_EQ(study.points.size(), 200u);
    EXPECT_DOUBLE_EQ(study.points.front().ratio, 1.0);
    EXPECT_DOUBLE_EQ(study.points.back().ratio, 200.0);
    const double matched = std::sqrt(inertiaG / g.motorInertia);  // 50
    const double spacing = std::pow(range.to / range.from, 1.0 / (range.count - 1));
    const double best = study.points[study.best].ratio;
    EXPECT_LE(std::max(best / matched, matched / best), spacing);
    // The study at the gearbox's own ratio gives the duty's RMS and peak.
    for (const double ratio : {1.0, 37.0}) {
        Gearbox own = g;
        own.ratio = ratio;
        const DriveRun at = run(withGearbox(doc, own));
        const MotorDuty& duty = at.drive.motors.at(0);
        const RatioPoint p = ratioStudy(x.m, x.r, x.s.unreliable, 0, g, {ratio, 2 * ratio, 2}).points[0];
        EXPECT_NEAR(p.torqueRms, duty.torqueRms, 1e-12 * duty.torqueRms);
        EXPECT_NEAR(p.torquePeak.value, duty.torquePeak.value, 1e-12 * std::abs(duty.torquePeak.value));
        EXPECT_EQ(p.torquePeak.step, duty.torquePeak.step);
    }
}

// The study holds the output's motion fixed: the prescribed one says so
// plainly; one a motor characteristic sets is named as found at the
// gearbox's own ratio, since at another ratio the motor would give another speed.
TEST(RatioStudy, SaysWhichMotionItHoldsFixed)
{
    const Gearbox g{10.0, 0.9, 2e-4, 0.0};
    const Mechanism prescribed = withGearbox(bar(2.0, 0.3, 0.01, ConstantSpeed{3.0, 0.0}, Vec2(0, -kG)), g);
    const DriveRun x = run(prescribed);
    const RatioStudy s = ratioStudy(x.m, x.r, x.s.unreliable, 0, g, ratioRangeAround(g.ratio));
    EXPECT_EQ(ratioStudyMotionText(x.m, s), "the same motion at the output");

    const Mechanism press = loadMechanismFile(std::string(CLEVIS_SAMPLES_DIR) + "/flywheel_press.json").mechanism;
    const SolvedCycle found = solveCycle(press, compile(press));
    ASSERT_TRUE(found.found.has_value());
    const RatioStudy f = ratioStudy(found.m, found.r, std::vector<bool>(found.r.steps.size(), false),
                                    found.found->driver, Gearbox{20.0, 0.9, 0.0, 0.0}, {5.0, 40.0, 3});
    EXPECT_NE(ratioStudyMotionText(found.m, f).find("found at the gearbox's own ratio"), std::string::npos);
}

// A cylinder lifting a mass up a vertical slider at constant speed, then
// lowering it: it pushes m·g throughout, so the pressure is on the cap side,
// p = m·g/(π·D²/4), and the flow into it v·A_cap (negative while lowering).
// A force pulling the mass up beyond its weight makes the cylinder pull: the
// rod side, p = |F|/(π·(D² − d²)/4). (Definitions of fluid-power texts.)
Mechanism lift(double mass, double pullUp)
{
    Mechanism m;
    m.gravity = Vec2(0, -kG);
    m.bodies = {test::pointBody("ram", mass, Vec2::Zero(), 0.0)};
    m.joints = {test::slider("S", kGroundName, "ram", Vec2::Zero(), 90.0)};
    m.drivers = {test::linearAtSlider("lift", "S", MotionTable{{0.0, 1.0, 2.0}, {0.0, 0.3, 0.0}})};
    m.drivers[0].cylinder = Cylinder{0.05, 0.028, 10e6};
    if (pullUp > 0) m.loads.push_back(ForceLoad{"pull", {"ram", Vec2::Zero()}, Vec2(0, pullUp), false, std::nullopt});
    m.cycle.steps = 40;
    return m;
}

TEST(Cylinder, PressureAndFlowOnTheSideChosenByTheEffort)
{
    const double mass = 500.0;
    const DriveRun pushing = run(lift(mass, 0.0));
    const Cylinder& c = pushing.doc.drivers[0].cylinder.value();
    const double cap = std::numbers::pi / 4 * c.bore * c.bore;
    const double annulus = std::numbers::pi / 4 * (c.bore * c.bore - c.rod * c.rod);
    const CylinderDuty& up = pushing.drive.cylinders.at(0);
    bool lowered = false;
    for (std::size_t i = 0; i < pushing.r.steps.size(); ++i) {
        const StepResult& s = pushing.r.steps[i];
        ASSERT_GT(s.effort[0], 0.0);
        EXPECT_NEAR(up.pressure[i], s.effort[0] / cap, 1e-9 * up.pressure[i]);
        EXPECT_NEAR(up.flow[i], s.driveRate[0] * cap, 1e-12);
        lowered |= up.flow[i] < 0;
    }
    EXPECT_TRUE(lowered);
    EXPECT_NEAR(up.pressure.front(), mass * kG / cap, 1e-6 * up.pressure.front());  // at rest: the weight alone
    const double pull = 3 * mass * kG;
    const DriveRun pulling = run(lift(mass, pull));
    const CylinderDuty& down = pulling.drive.cylinders.at(0);
    for (std::size_t i = 0; i < pulling.r.steps.size(); ++i) {
        const StepResult& s = pulling.r.steps[i];
        ASSERT_LT(s.effort[0], 0.0);
        EXPECT_NEAR(down.pressure[i], -s.effort[0] / annulus, 1e-9 * down.pressure[i]);
        EXPECT_NEAR(down.flow[i], -s.driveRate[0] * annulus, 1e-12);
        // Hydraulic power p·q is the driver's power F·v.
        EXPECT_NEAR(down.pressure[i] * down.flow[i], s.power[0], 1e-6 * (1 + std::abs(s.power[0])));
    }
    EXPECT_NEAR(down.pressure.front(), (pull - mass * kG) / annulus, 1e-6 * down.pressure.front());
    EXPECT_EQ(down.firstOverSupply, -1);
}

TEST(Cylinder, WarnsWherePressureExceedsTheSupply)
{
    Mechanism doc = lift(500.0, 0.0);
    const double needed = 500.0 * kG / (std::numbers::pi / 4 * 0.05 * 0.05);
    doc.drivers[0].cylinder->supplyPressure = 0.9 * needed;
    const DriveRun x = run(doc);
    ASSERT_EQ(x.drive.warnings.size(), 1u);
    EXPECT_EQ(x.drive.warnings[0].code, kCylinderOverSupply);
    EXPECT_EQ(x.drive.warnings[0].step, 0);
    EXPECT_NE(x.drive.warnings[0].message.find("lift = 0.00000 m"), std::string::npos) << x.drive.warnings[0].message;
    EXPECT_NE(driveText(x.m, x.r, x.drive).find("ABOVE THE SUPPLY PRESSURE"), std::string::npos);
    doc.drivers[0].cylinder->supplyPressure = 2 * needed;
    EXPECT_TRUE(run(doc).drive.warnings.empty());
}

TEST(DriveTrain, MotorCharacteristicIsSaidToBeUnusedNotIgnored)
{
    Mechanism doc = bar(1.0, 0.1, 0.0, ConstantSpeed{10.0, 0.0}, Vec2::Zero());
    doc.drivers[0].motor = MotorLine{5.0, 150.0};
    const DriveRun x = run(doc);
    ASSERT_EQ(x.drive.warnings.size(), 1u);
    EXPECT_EQ(x.drive.warnings[0].code, kDriveNotIntegrated);
    EXPECT_NE(x.drive.warnings[0].message.find("motor characteristic"), std::string::npos);
}

// A motor with no gearbox turns the joint itself: its shaft is the output,
// so its torque is the driver's effort and its speed the driver's rate (the
// gear-train relations above at i = 1, η = 1).
TEST(DriveTrain, AMotorWithoutAGearboxDrivesDirectly)
{
    Mechanism doc = bar(2.0, 0.3, 0.01, ConstantSpeed{3.0, 0.0}, Vec2(0, -kG));
    doc.drivers[0].motor = MotorLine{50.0, 150.0};
    const DriveRun x = run(doc);
    ASSERT_EQ(x.drive.motors.size(), 1u);
    const MotorDuty& d = x.drive.motors[0];
    EXPECT_EQ(d.gearbox, Gearbox{});
    for (std::size_t i = 0; i < x.r.steps.size(); ++i) {
        EXPECT_NEAR(d.torque[i], x.r.steps[i].effort[0], 1e-12 * (1.0 + std::abs(x.r.steps[i].effort[0])));
        EXPECT_NEAR(d.speed[i], 3.0, 1e-12);
    }
}

// The summary and step keys the issue fixes (docs/results-format.md).
TEST(DriveTrain, JsonCarriesTheDriveKeys)
{
    const DriveRun motor =
        run(withGearbox(bar(2.0, 0.3, 0.01, ConstantSpeed{3.0, 0.0}, Vec2(0, -kG)), {10, 0.9, 1e-4, 0}));
    const auto j =
        nlohmann::json::parse(resultsJsonText(motor.m, motor.r, motor.s, nlohmann::json::object(), &motor.drive));
    const auto& d = j["summary"]["drivers"]["motor"];
    for (const char* key :
         {"motor_torque_rms_Nm", "motor_torque_peak_Nm", "motor_speed_peak_rpm", "regenerated_J_per_cycle"})
        EXPECT_TRUE(d.contains(key)) << key;
    EXPECT_NEAR(d["motor_speed_peak_rpm"].get<double>(), 3.0 * 10 * 60 / (2 * kPi), 1e-9);
    EXPECT_NEAR(j["steps"][5]["drivers"]["motor"]["motor_torque_Nm"].get<double>(), motor.drive.motors[0].torque[5], 0);
    const DriveRun cylinder = run(lift(500.0, 0.0));
    const auto c = nlohmann::json::parse(
        resultsJsonText(cylinder.m, cylinder.r, cylinder.s, nlohmann::json::object(), &cylinder.drive));
    EXPECT_TRUE(c["summary"]["drivers"]["lift"].contains("pressure_peak_Pa"));
    EXPECT_TRUE(c["summary"]["drivers"]["lift"].contains("flow_peak_m3_s"));
    EXPECT_TRUE(c["steps"][3]["drivers"]["lift"].contains("pressure_Pa"));
    EXPECT_TRUE(c["steps"][3]["drivers"]["lift"].contains("flow_m3_s"));
}

// ---- the file ----

const char* const kRotary = R"({"clevis": 1, "bodies": [{"name": "crank", "mass": 1, "cg": [0.1, 0], "inertia": 0.01}],
  "joints": [{"name": "O", "type": "pin", "bodies": ["ground", "crank"], "at": [0, 0]}],
  "drivers": [{"name": "motor", "type": "rotary", "joint": "O", "speed_rpm": 60, DRIVE}]})";

std::string rotaryWith(const std::string& drive)
{
    std::string text = kRotary;
    return text.replace(text.find("DRIVE"), 5, drive);
}

std::string errorOf(const std::string& text)
{
    try {
        parseMechanism(text);
    } catch (const ModelError& e) {
        return e.what();
    }
    return "(no error)";
}

TEST(DriveFile, BadDriveDataIsRefusedNamingThePlace)
{
    const std::pair<std::string, std::string> cases[] = {
        {R"("gearbox": {"ratio": 0})", "drivers[0].gearbox.ratio: must be a finite number > 0"},
        {R"("gearbox": {"ratio": -3})", "drivers[0].gearbox.ratio: must be a finite number > 0"},
        {R"("gearbox": {"ratio": 3, "efficiency": 1.05})", "drivers[0].gearbox.efficiency: must be in (0, 1]"},
        {R"("gearbox": {"ratio": 3, "efficiency": 0})", "drivers[0].gearbox.efficiency: must be a finite number > 0"},
        {R"("gearbox": {"ratio": 3, "motor_inertia": -1e-4})",
         "drivers[0].gearbox.motor_inertia: must be a finite number >= 0"},
        {R"("flywheel": {"inertia": -2})", "drivers[0].flywheel.inertia: must be a finite number >= 0"},
        {R"("flywheel": {"inertia": 2, "on": "crank"})",
         "drivers[0].flywheel.on: \"crank\" is not one of: output, motor"},
        {R"("motor": {"table": {"rpm": [0, 1500, 1400], "torque": [5, 3, 1]}})", "drivers[0].motor.table.rpm"},
        {R"("motor": {"table": {"rpm": [0, 1500], "torque": [5]}})",
         "drivers[0].motor.table.torque: has 1 values but rpm has 2"},
        {R"("motor": {"stall_torque": 5, "no_load_rpm": 0})",
         "drivers[0].motor.no_load_rpm: must be a finite number > 0"},
        {R"("motor": {"stall_torque": 5, "no_load_rpm": 1500}, "accel_deg_s2": 10)",
         "drivers[0].motor: a motor sets its own speed"},
        {R"("fluctuation_target": 2)", "drivers[0].fluctuation_target: must be below 2"},
        {R"("cylinder": {"bore": 0.05, "rod": 0.02})", "drivers[0].cylinder: applies only to a linear driver"},
    };
    for (const auto& [drive, message] : cases)
        EXPECT_NE(errorOf(rotaryWith(drive)).find(message), std::string::npos)
            << drive << "\n  gave: " << errorOf(rotaryWith(drive));
}

TEST(DriveFile, LinearAndTwoDriverRules)
{
    const std::string linear = R"({"clevis": 1, "bodies": [{"name": "ram", "mass": 1, "cg": [0, 0], "inertia": 0}],
      "joints": [{"name": "S", "type": "slider", "bodies": ["ground", "ram"], "at": [0, 0]}],
      "drivers": [{"name": "lift", "type": "linear", "joint": "S", "speed": 0.1, DRIVE}]})";
    const auto with = [&](const std::string& drive) {
        std::string t = linear;
        return t.replace(t.find("DRIVE"), 5, drive);
    };
    EXPECT_NE(errorOf(with(R"("cylinder": {"bore": 0.05, "rod": 0.05})"))
                  .find("drivers[0].cylinder.rod: must be smaller than the bore"),
              std::string::npos);
    EXPECT_NE(errorOf(with(R"("gearbox": {"ratio": 3})")).find("drivers[0].gearbox: applies only to a rotary driver"),
              std::string::npos);
    EXPECT_NE(errorOf(with(R"("cylinder": {"bore": 0.05, "rod": 0.02, "supply_pressure": 0})"))
                  .find("drivers[0].cylinder.supply_pressure: must be a finite number > 0"),
              std::string::npos);
    const std::string two = R"({"clevis": 1, "bodies": [{"name": "a", "mass": 1, "cg": [0.1, 0], "inertia": 0.01},
        {"name": "b", "mass": 1, "cg": [1.1, 0], "inertia": 0.01}],
      "joints": [{"name": "O", "type": "pin", "bodies": ["ground", "a"], "at": [0, 0]},
                 {"name": "P", "type": "pin", "bodies": ["ground", "b"], "at": [1, 0]}],
      "drivers": [{"name": "m1", "type": "rotary", "joint": "O", "speed_rpm": 60},
                  {"name": "m2", "type": "rotary", "joint": "P", "speed_rpm": 60, "flywheel": {"inertia": 1}}]})";
    EXPECT_NE(errorOf(two).find("drivers[1].flywheel: needs the driver to be the mechanism's only one (there are 2)"),
              std::string::npos)
        << errorOf(two);
}

TEST(DriveFile, RoundTripKeepsEveryItemAndOldFilesGainNoKeys)
{
    const std::string text = rotaryWith(
        R"("gearbox": {"ratio": 12.5, "efficiency": 0.93, "motor_inertia": 1.2e-4, "gearbox_inertia": 3e-5},
           "motor": {"table": {"rpm": [0, 1000, 1450, 1500], "torque": [14, 11, 8, 0]}},
           "flywheel": {"inertia": 0.8, "on": "motor"}, "fluctuation_target": 0.05)");
    const LoadedMechanism loaded = parseMechanism(text);
    EXPECT_TRUE(loaded.warnings.empty());
    const Driver& d = loaded.mechanism.drivers[0];
    ASSERT_TRUE(d.gearbox && d.motor && d.flywheel && d.fluctuationTarget);
    EXPECT_EQ(d.flywheel->on, FlywheelShaft::Motor);
    EXPECT_NEAR(std::get<MotorTable>(*d.motor).speed[1], 1000 * 2 * kPi / 60, 1e-12);
    EXPECT_EQ(parseMechanism(saveMechanismText(loaded.mechanism)).mechanism, loaded.mechanism);
    Mechanism line = loaded.mechanism;
    line.drivers[0].motor = MotorLine{9.5, 1480 * 2 * kPi / 60};
    EXPECT_EQ(parseMechanism(saveMechanismText(line)).mechanism, line);
    Mechanism lifted = lift(100, 0);
    EXPECT_EQ(parseMechanism(saveMechanismText(lifted)).mechanism, lifted);
    lifted.drivers[0].cylinder->supplyPressure.reset();
    EXPECT_EQ(parseMechanism(saveMechanismText(lifted)).mechanism, lifted);

    const std::string plain = saveMechanismText(bar(1.0, 0.1, 0.0, ConstantSpeed{1.0, 0.0}, Vec2::Zero()));
    for (const char* key : {"\"gearbox\":", "\"motor\":", "\"flywheel\":", "\"fluctuation_target\":", "\"cylinder\":"})
        EXPECT_EQ(plain.find(key), std::string::npos) << key;
}

}  // namespace
