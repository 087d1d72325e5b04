// The real speed of a motor-driven mechanism: the integrator, the equation of
// motion through a gearbox, the steady cycle against a closed form and an
// independent scipy integration, the energy over a steady cycle, the
// reactions as the flywheel grows, the flywheel sizing and the stall. Each
// check names the outside relation it is held against.
#include "core/file/mechanism_file.h"
#include "core/results/cycle_summary.h"
#include "core/results/drive_train.h"
#include "core/solver/dormand_prince.h"
#include "core/solver/motor_characteristic.h"
#include "core/solver/motor_drive.h"
#include "tests/mechanism_builders.h"
#include "tests/python_check.h"

#include <gtest/gtest.h>

#include <cmath>
#include <iostream>

using namespace clevis;

namespace {

// ---- the integrator ----

// y' = y from 0 to 1 in n steps of the pair; the global error of a p-th order
// method falls as hᵖ: halving h divides it by 2⁵ = 32 for the fifth-order
// solution (the order conditions of Runge–Kutta methods).
double exponentialError(int n)
{
    std::array<double, 1> y{1.0}, slope{1.0};
    const double h = 1.0 / n;
    for (int k = 0; k < n; ++k) {
        const auto step = dormandPrinceStep<1>(y, slope, h, [](int, const std::array<double, 1>& v) { return v; });
        y = step.y;
        slope = step.slope;
    }
    return std::abs(y[0] - std::exp(1.0));
}

TEST(DormandPrince, FifthOrderOnTheExponential)
{
    const double ratio = exponentialError(8) / exponentialError(16);
    EXPECT_GT(ratio, 28.0);
    EXPECT_LT(ratio, 36.0);
    // The error estimate of one step is of the fourth-order solution: it falls as h⁵.
    const auto estimate = [](double h) {
        const std::array<double, 1> y{1.0};
        return std::abs(dormandPrinceStep<1>(y, y, h, [](int, const std::array<double, 1>& v) { return v; }).error[0]);
    };
    EXPECT_NEAR(estimate(0.1) / estimate(0.05), 32.0, 3.0);
}

TEST(MotorCharacteristic, LineAndTable)
{
    EXPECT_DOUBLE_EQ(characteristicTorque(MotorLine{10.0, 100.0}, 25.0), 7.5);
    EXPECT_DOUBLE_EQ(characteristicTorque(MotorLine{10.0, 100.0}, 120.0), -2.0);  // braking above no-load
    const MotorTable t{{0.0, 50.0, 100.0}, {20.0, 16.0, 0.0}};
    EXPECT_DOUBLE_EQ(characteristicTorque(t, 75.0), 8.0);
    EXPECT_DOUBLE_EQ(characteristicTorque(t, 110.0), -3.2);
    EXPECT_DOUBLE_EQ(noLoadSpeed(t), 100.0);
    EXPECT_DOUBLE_EQ(noLoadSpeed(MotorLine{10.0, 100.0}), 100.0);
}

// ---- a single bar spun up by a motor ----

// A balanced bar (centre of mass on the pin) of inertia I, no load.
Mechanism spinningBar(double inertia, double expectedSpeed)
{
    Mechanism m;
    m.gravity = Vec2(0, -9.80665);
    m.bodies = {test::pointBody("bar", 3.0, Vec2::Zero(), inertia)};
    m.joints = {test::pin("O", kGroundName, "bar", Vec2::Zero())};
    m.drivers = {test::rotary("motor", "O", ConstantSpeed{expectedSpeed, 0.0})};
    m.cycle.steps = 72;
    return m;
}

// I·θ̇' = T_s·(1 − θ̇/ω₀) from θ̇(0) = ω_s: θ̇(t) = ω₀ + (ω_s − ω₀)·e^{−t/τ},
// τ = I·ω₀/T_s (a first-order linear equation). Through a gearbox of ratio i
// and efficiency η (always driving here), with the rotor J_m:
// (J_m·i + I/(η·i))·θ̈ = T_s·(1 − i·θ̇/ω₀): the same with ω₀/i and
// τ = (J_m·i + I/(η·i))·ω₀/(T_s·i).
void expectExponentialApproach(const Mechanism& doc, double tau, double noLoad, double start)
{
    const CompiledMechanism m = compile(doc);
    CycleIntegrator cycles(m, 72, 1);
    const CycleIntegrator::Turn turn = cycles.turn(driveTrainOf(doc.drivers[0], 0.0), start);
    ASSERT_EQ(turn.speed.size(), 73u);
    for (std::size_t k = 0; k < turn.speed.size(); ++k) {
        const double closed = noLoad + (start - noLoad) * std::exp(-turn.time[k] / tau);
        EXPECT_NEAR(turn.speed[k], closed, 1e-9 * noLoad) << "step " << k;
        // θ(t) = ω₀·t − (ω₀ − ω_s)·τ·(1 − e^{−t/τ}) must be the step's position.
        const double angle = noLoad * turn.time[k] - (noLoad - start) * tau * (1 - std::exp(-turn.time[k] / tau));
        EXPECT_NEAR(angle, 2 * kPi * double(k) / 72.0, 1e-9) << "step " << k;
    }
    // Left to run, it settles at the no-load speed with no fluctuation.
    const SteadyCycle steady = cycles.steady(driveTrainOf(doc.drivers[0], 0.0), start);
    EXPECT_NEAR(steady.meanSpeed, noLoad, 1e-9 * noLoad);
    EXPECT_LT(steady.fluctuation, 1e-9);
}

TEST(MotorDrivenBar, SpeedApproachesNoLoadAlongTheExponential)
{
    Mechanism doc = spinningBar(0.05, 10.0);
    doc.drivers[0].motor = MotorLine{2.0, 40.0};
    expectExponentialApproach(doc, 0.05 * 40.0 / 2.0, 40.0, 4.0);
}

TEST(MotorDrivenBar, ThroughAGearboxTheInertiaAndSpeedAreReflected)
{
    Mechanism doc = spinningBar(0.05, 10.0);
    const double i = 4.0, eta = 0.8, rotor = 2e-3, ts = 2.0, w0 = 160.0;
    doc.drivers[0].motor = MotorLine{ts, w0};
    doc.drivers[0].gearbox = Gearbox{i, eta, rotor, 0.0};
    expectExponentialApproach(doc, (rotor * i + 0.05 / (eta * i)) * w0 / (ts * i), w0 / i, 4.0);
}

// ---- a slider-crank with a flywheel ----

struct Press {
    double force = -200.0, damping = 300.0, flywheel = 0.3;
    double ratio = 3.0, efficiency = 1.0, rotor = 2e-3, stall = 60.0, noLoad = 75.0;
    int steps = 120;
};

test::SliderCrankSpec pressSpec()
{
    test::SliderCrankSpec s;
    s.crankMass = 2.0, s.crankInertia = 0.004, s.rodMass = 3.0, s.rodInertia = 0.03, s.pistonMass = 4.0;
    s.omega = 20.0;  // the expected speed: where the integration starts
    return s;
}

// A constant force along x on the piston and a damper on its x-velocity (to a
// ground point far along the axis); motor, gearbox and flywheel on the crank.
Mechanism press(const Press& p)
{
    const test::SliderCrankSpec s = pressSpec();
    Mechanism doc = test::sliderCrank(s);
    const Vec2 b = doc.bodies[2].cg.value();
    doc.loads.push_back(ForceLoad{"push", {"piston", b}, Vec2(p.force, 0.0), false, std::nullopt});
    doc.loads.push_back(DamperLoad{"damper", {kGroundName, Vec2(2.0, 0.0)}, {"piston", b}, p.damping});
    Driver& d = doc.drivers[0];
    d.motor = MotorLine{p.stall, p.noLoad};
    d.gearbox = Gearbox{p.ratio, p.efficiency, p.rotor, 0.0};
    d.flywheel = Flywheel{p.flywheel, FlywheelShaft::Output};
    doc.cycle.steps = p.steps;
    return doc;
}

SolvedCycle solvePress(const Mechanism& doc) { return solveCycle(doc, compile(doc)); }

TEST(MotorDrivenSliderCrank, SteadyCycleMatchesScipy)
{
    const Press p;
    const SolvedCycle solved = solvePress(press(p));
    ASSERT_TRUE(solved.found);
    ASSERT_TRUE(solved.r.complete);
    const test::SliderCrankSpec s = pressSpec();
    const nlohmann::json out = test::runPythonCheck(CLEVIS_SCIPY_SLIDER_CRANK, {{"r", s.r},
                                                                                {"l", s.l},
                                                                                {"theta0", s.theta0},
                                                                                {"m1", s.crankMass},
                                                                                {"I1", s.crankInertia},
                                                                                {"m2", s.rodMass},
                                                                                {"I2", s.rodInertia},
                                                                                {"m3", s.pistonMass},
                                                                                {"ratio", p.ratio},
                                                                                {"stall_torque", p.stall},
                                                                                {"no_load", p.noLoad},
                                                                                {"flywheel", p.flywheel},
                                                                                {"motor_inertia", p.rotor},
                                                                                {"force", p.force},
                                                                                {"damping", p.damping},
                                                                                {"steps", p.steps},
                                                                                {"turns", 40},
                                                                                {"start_speed", s.omega}});
    ASSERT_FALSE(out.is_null());
    ASSERT_LT(out["start_mismatch"].get<double>(), 1e-11);  // scipy's last turn is steady
    const SteadyCycle& c = solved.found->cycle;
    const auto speeds = out["speeds"].get<std::vector<double>>();
    ASSERT_EQ(speeds.size(), solved.r.steps.size());
    for (std::size_t k = 0; k < speeds.size(); ++k) {
        EXPECT_NEAR(solved.r.steps[k].driveRate[0], speeds[k], 1e-8 * speeds[k]) << "step " << k;
        EXPECT_NEAR(solved.r.steps[k].t, out["times"][k].get<double>(), 1e-9) << "step " << k;
    }
    EXPECT_NEAR(c.period, out["period"].get<double>(), 1e-9);
    EXPECT_NEAR(c.fluctuation, out["fluctuation"].get<double>(), 1e-7);
    EXPECT_GT(c.fluctuation, 0.01);  // a fluctuation worth checking
}

// The motor's torque at every step, found back from the reactions of the
// step-by-step solve through the gearbox (drive_train.cpp), is what its
// characteristic gives at that step's speed: the equation of motion and the
// step solve agree, in both directions of power flow.
TEST(MotorDrivenSliderCrank, MotorTorqueOfTheStepsIsOnTheCharacteristic)
{
    Press p;
    p.efficiency = 0.85;
    p.force = -600.0;  // enough for the mechanism to drive the motor back in part of the turn
    const Mechanism doc = press(p);
    const SolvedCycle solved = solvePress(doc);
    ASSERT_TRUE(solved.found);
    const CycleSummary s = summarize(solved.m, solved.r);
    const DriveResults drive = driveResults(doc, solved.m, solved.r, s.unreliable, solved.found);
    ASSERT_EQ(drive.motors.size(), 1u);
    const MotorDuty& motor = drive.motors[0];
    int braking = 0;
    for (std::size_t k = 0; k < solved.r.steps.size(); ++k) {
        const double expected = p.stall * (1 - motor.speed[k] / p.noLoad);
        EXPECT_NEAR(motor.torque[k], expected, 1e-8 * p.stall) << "step " << k;
        braking += solved.r.steps[k].power[0] < 0.0;
    }
    EXPECT_GT(braking, 0);
}

// Over one steady cycle the motor's work equals the work the loads take plus
// what the damper dissipates, all else (kinetic energy, the potentials of
// gravity and the spring) returning to where it started: the work–energy
// theorem. The integrals are taken over the crank angle, in which the steps
// are evenly spaced and every integrand is smooth and periodic, so the
// trapezoid rule converges faster than any power of the step.
TEST(MotorDrivenSliderCrank, EnergyBalancesOverTheSteadyCycle)
{
    Press p;
    p.steps = 360;
    Mechanism doc = press(p);
    doc.gravity = Vec2(0, -9.80665);
    const Vec2 b = doc.bodies[2].cg.value();
    doc.loads.push_back(SpringLoad{"spring", {kGroundName, Vec2(b.x(), 0.3)}, {"piston", b}, 4000.0, 0.2});
    const SolvedCycle solved = solvePress(doc);
    ASSERT_TRUE(solved.found);
    const auto& steps = solved.r.steps;
    const double h = 2 * kPi / p.steps;
    double motor = 0, loads = 0, damper = 0;
    for (std::size_t k = 0; k < steps.size(); ++k) {
        const double w = (k == 0 || k + 1 == steps.size()) ? 0.5 * h : h;
        const double omega = steps[k].driveRate[0];
        motor += w * p.ratio * characteristicTorque(MotorLine{p.stall, p.noLoad}, p.ratio * omega);
        loads += w * steps[k].appliedPower / omega;
        damper += w * steps[k].damperDissipation / omega;
    }
    const StepResult &first = steps.front(), &last = steps.back();
    const double drive = 0.5 * (p.flywheel + p.rotor * p.ratio * p.ratio);
    const double stored =
        (last.kinetic - first.kinetic) + drive * (std::pow(last.driveRate[0], 2) - std::pow(first.driveRate[0], 2)) +
        (last.gravityPotential - first.gravityPotential) + (last.springPotential - first.springPotential);
    const double residual = motor + loads - damper - stored;
    std::cout << "motor work " << motor << " J, loads " << loads << " J, damper " << damper << " J, residual "
              << residual << " J\n";
    EXPECT_LT(std::abs(residual), 1e-8 * motor);
    EXPECT_GT(damper, 0.1 * motor);
}

// As the flywheel grows the speed evens out and the reactions approach those
// of the constant speed the motor then turns at (the limit of the equation of
// motion as J_f → ∞: θ̈ → 0); the gap shrinks about tenfold per tenfold inertia.
TEST(MotorDrivenSliderCrank, ReactionsApproachConstantSpeedOnesAsTheFlywheelGrows)
{
    double previous = std::numeric_limits<double>::infinity(), first = 0;
    for (const double flywheel : {0.03, 0.3, 3.0, 30.0}) {
        Press p;
        p.flywheel = flywheel;
        Mechanism doc = press(p);
        const SolvedCycle real = solvePress(doc);
        ASSERT_TRUE(real.found);
        doc.drivers[0].motor.reset();
        doc.drivers[0].motion = ConstantSpeed{real.found->cycle.meanSpeed, 0.0};
        const SolvedCycle constant = solvePress(doc);
        double gap = 0, scale = 0;
        for (std::size_t k = 0; k < real.r.steps.size(); ++k)
            for (std::size_t j = 0; j < real.r.steps[k].joints.size(); ++j) {
                gap = std::max(gap, (real.r.steps[k].joints[j].force - constant.r.steps[k].joints[j].force).norm());
                scale = std::max(scale, constant.r.steps[k].joints[j].force.norm());
            }
        const double relative = gap / scale;
        std::cout << "flywheel " << flywheel << " kg·m²: fluctuation " << real.found->cycle.fluctuation
                  << ", largest reaction gap " << relative << " of the largest reaction\n";
        if (first == 0) first = relative;
        EXPECT_LT(relative, previous);
        previous = relative;
    }
    EXPECT_LT(previous, 0.02 * first);
}

// ---- flywheel sizing on the bundled press ----

// By hand: the effort at the constant expected speed, step by step; the
// energy E(θ) = ∫(T − T̄)dθ by the trapezoid rule; ΔE_max = max E − min E;
// I = ΔE_max/(C_s·ω²), ω at the flywheel's (motor) shaft: the classical
// flywheel estimate of machine-design texts.
TEST(FlywheelSizing, EnergyEstimateMatchesTheHandComputationAndTheSearchMeetsTheTarget)
{
    const Mechanism doc = loadMechanismFile(std::string(CLEVIS_SAMPLES_DIR) + "/flywheel_press.json").mechanism;
    const SolvedCycle solved = solveCycle(doc, compile(doc));
    ASSERT_TRUE(solved.found && solved.found->sizing);
    const FlywheelSizing& f = *solved.found->sizing;

    SweepOptions fine;
    fine.steps = 7200;
    const CycleResult prescribed = sweepCycle(compile(doc), fine);
    const double h = 2 * kPi / fine.steps;
    double total = 0;
    std::vector<double> e{0.0};
    for (std::size_t k = 1; k < prescribed.steps.size(); ++k) {
        total += 0.5 * h * (prescribed.steps[k - 1].effort[0] + prescribed.steps[k].effort[0]);
        e.push_back(total);
    }
    double high = 0, low = 0;
    for (std::size_t k = 0; k < e.size(); ++k) {
        const double swing = e[k] - total * double(k) / fine.steps;
        high = std::max(high, swing);
        low = std::min(low, swing);
    }
    const Driver& d = doc.drivers[0];
    const double omega = std::get<ConstantSpeed>(d.motion).speed * d.gearbox->ratio;
    const double hand = (high - low) / (*d.fluctuationTarget * omega * omega);
    std::cout << "ΔE_max " << high - low << " J by hand, " << f.energySwing << " J; estimate " << hand
              << " kg·m² by hand, " << f.estimate << " kg·m²; integrated " << f.integrated << " kg·m²\n";
    EXPECT_NEAR(f.estimate, hand, 1e-3 * hand);
    EXPECT_NEAR(f.achieved, f.target, kFluctuationTolerance * f.target);
    EXPECT_NEAR(solved.found->cycle.fluctuation, f.target, kFluctuationTolerance * f.target);
    EXPECT_EQ(solved.found->flywheelInertia, f.integrated);
}

// ---- bad input ----

// A heavy bar lifted from the horizontal against a steady 20 N·m by a motor
// of 30 N·m at stall: the motor gives 20 N·m only below 3.3 rad/s, where the
// bar stores 14 J, too little to lift its weight (m·g·d = 49 N·m) over the top.
TEST(MotorStall, NamesTheDriverAndWhereItStops)
{
    Mechanism doc;
    doc.bodies = {test::pointBody("arm", 10.0, Vec2(0.5, 0.0), 0.1)};
    doc.joints = {test::pin("O", kGroundName, "arm", Vec2::Zero())};
    doc.drivers = {test::rotary("lifter", "O", ConstantSpeed{2.0, 0.0})};
    doc.drivers[0].motor = MotorLine{30.0, 10.0};
    doc.loads.push_back(TorqueLoad{"load", "arm", -20.0, std::nullopt});
    doc.cycle.steps = 72;
    try {
        solveCycle(doc, compile(doc));
        FAIL() << "no stall";
    } catch (const MotorStall& e) {
        EXPECT_NE(std::string(e.what()).find("driver lifter: the motor cannot keep the mechanism turning: it "
                                             "stalls at lifter = "),
                  std::string::npos)
            << e.what();
        EXPECT_EQ(e.items(), std::vector<std::string>{"lifter"});
        // Past the start, before the arm is upright (where the weight stops resisting).
        EXPECT_GT(e.position(), 0.0);
        EXPECT_LT(e.position(), kPi / 2);
    }
}

TEST(MotorDrive, LoadProfileOverTimeIsRefused)
{
    Mechanism doc = spinningBar(0.05, 10.0);
    doc.drivers[0].motor = MotorLine{2.0, 40.0};
    doc.loads.push_back(TorqueLoad{"brake", "bar", -0.5, LoadProfile{"", {0.0, 1.0}, {1.0, 0.0}}});
    try {
        solveCycle(doc, compile(doc));
        FAIL() << "accepted";
    } catch (const AnalysisError& e) {
        EXPECT_NE(std::string(e.what()).find("load brake: its profile is over time"), std::string::npos) << e.what();
    }
}

}  // namespace
