// A loaded four-bar solved twice: by the solver, and by an independent hand
// method in python3-sympy (tests/sympy_four_bar.py: its own loop closure,
// differentiation in time, and Newton–Euler for each link with equal and
// opposite pin forces). Every pin reaction component and the crank torque
// must agree.
#include "core/solver/compiled_mechanism.h"
#include "core/solver/cycle_sweep.h"
#include "tests/mechanism_builders.h"
#include "tests/python_check.h"

#include <gtest/gtest.h>
#include <nlohmann/json.hpp>

using namespace clevis;

namespace {

#ifndef CLEVIS_SYMPY_SCRIPT
#error "CLEVIS_SYMPY_SCRIPT must name tests/sympy_four_bar.py"
#endif

// Masses, inertias and centres of mass off the link lines; gravity; a point
// force on the coupler off its line and a torque on the rocker; a crank that
// speeds up, so every inertia term is exercised.
test::FourBarSpec loadedSpec()
{
    test::FourBarSpec s;
    s.a = 0.1;
    s.b = 0.35;
    s.c = 0.3;
    s.d = 0.4;
    s.theta2 = 0.3;
    s.mass[0] = 1.2;
    s.mass[1] = 2.3;
    s.mass[2] = 1.7;
    s.inertia[0] = 0.0011;
    s.inertia[1] = 0.026;
    s.inertia[2] = 0.014;
    s.cgOffset[0] = Vec2(0.01, -0.02);
    s.cgOffset[1] = Vec2(-0.03, 0.045);
    s.cgOffset[2] = Vec2(0.025, 0.03);
    s.motion = ConstantSpeed{5.0, 3.0};
    return s;
}

const Vec2 kLoadAt(0.18, 0.26);         // m, on the coupler
const Vec2 kLoad(35.0, -60.0);          // N
constexpr double kRockerTorque = -4.5;  // N·m
const Vec2 kGravity(0.0, -9.80665);

nlohmann::json toJson(const Vec2& v) { return nlohmann::json::array({v.x(), v.y()}); }

nlohmann::json scriptInput(const Mechanism& mech, const test::FourBarSpec& spec, const std::vector<double>& times)
{
    nlohmann::json in;
    for (const auto& j : mech.joints) in["pins"][j.name] = toJson(j.at);
    for (const auto& b : mech.bodies)
        in["bodies"].push_back({{"name", b.name}, {"mass", *b.mass}, {"cg", toJson(*b.cg)}, {"inertia", *b.inertia}});
    in["gravity"] = toJson(mech.gravity);
    const auto& motion = std::get<ConstantSpeed>(spec.motion);
    in["crank"] = {{"speed", motion.speed}, {"accel", motion.accel}};
    in["force"] = {{"at", toJson(kLoadAt)}, {"force", toJson(kLoad)}};
    in["rocker_torque"] = kRockerTorque;
    in["times"] = times;
    return in;
}

nlohmann::json runScript(const nlohmann::json& input) { return test::runPythonCheck(CLEVIS_SYMPY_SCRIPT, input); }

TEST(SympyFourBar, ReactionsAndTorqueMatchHandMethod)
{
    const test::FourBarSpec spec = loadedSpec();
    Mechanism mech = test::fourBar(spec);
    mech.gravity = kGravity;
    mech.loads.push_back(ForceLoad{"push", {"coupler", kLoadAt}, kLoad, false, std::nullopt});
    mech.loads.push_back(TorqueLoad{"brake", "rocker", kRockerTorque, std::nullopt});
    mech.cycle.duration = 1.2;  // s: the crank turns about 190° and speeds up
    mech.cycle.steps = 40;
    const CompiledMechanism m = compile(mech);
    const CycleResult r = sweepCycle(m);
    ASSERT_TRUE(r.complete);

    const std::vector<int> picked = {0, 5, 11, 18, 26, 33, 40};
    std::vector<double> times;
    for (int k : picked) times.push_back(r.steps[k].t);
    const nlohmann::json out = runScript(scriptInput(mech, spec, times));
    ASSERT_TRUE(out.contains("steps"));
    ASSERT_EQ(out["steps"].size(), picked.size());

    double worstRelative = 0.0;
    for (std::size_t i = 0; i < picked.size(); ++i) {
        const StepResult& s = r.steps[picked[i]];
        const nlohmann::json& e = out["steps"][i];
        ASSERT_DOUBLE_EQ(e["t"].get<double>(), s.t);
        for (int b = 0; b < 3; ++b)
            EXPECT_NEAR(s.q[3 * b + 2], e["phi"][b].get<double>(), 1e-12) << "body " << b << " at t = " << s.t;
        // Scale: the largest force at this step, and that force over the crank.
        double scale = 0.0;
        for (const auto& j : mech.joints)
            for (int c = 0; c < 2; ++c) scale = std::max(scale, std::abs(e["reactions"][j.name][c].get<double>()));
        for (std::size_t j = 0; j < mech.joints.size(); ++j)
            for (int c = 0; c < 2; ++c) {
                const double expected = e["reactions"][mech.joints[j].name][c].get<double>();
                const double error = std::abs(s.joints[j].force[c] - expected);
                worstRelative = std::max(worstRelative, error / scale);
                EXPECT_LE(error, 1e-6 * std::max(std::abs(expected), 1e-3 * scale))
                    << mech.joints[j].name << (c ? ".y" : ".x") << " at t = " << s.t << ": solver "
                    << s.joints[j].force[c] << " N, sympy " << expected << " N";
            }
        const double torque = e["torque"].get<double>();
        const double torqueError = std::abs(s.effort[0] - torque);
        worstRelative = std::max(worstRelative, torqueError / (scale * spec.a));
        EXPECT_LE(torqueError, 1e-6 * std::max(std::abs(torque), 1e-3 * scale * spec.a))
            << "crank torque at t = " << s.t << ": solver " << s.effort[0] << " N·m, sympy " << torque << " N·m";
    }
    RecordProperty("max_relative_error", ::testing::PrintToString(worstRelative));
    std::printf("sympy %s: largest difference %.3g of the step's largest pin force\n",
                out.value("sympy", std::string("?")).c_str(), worstRelative);
}

}  // namespace
