// Slider-crank kinematics and crank torque against closed forms.
#include "core/solver/compiled_mechanism.h"
#include "core/solver/cycle_sweep.h"
#include "tests/mechanism_builders.h"

#include <gtest/gtest.h>

using namespace clevis;

namespace {

// Piston position, velocity and acceleration of an in-line slider-crank at
// constant crank speed ω, exact (not the series approximation), as derived in
// standard kinematics texts from x = r cos θ + √(l² − r² sin² θ):
//   ẋ = −rω sin θ − r²ω sin θ cos θ / S
//   ẍ = −rω² cos θ − r²ω² [cos 2θ / S + r² sin² θ cos² θ / S³],  S = √(l² − r² sin² θ)
struct PistonMotion {
    double x, v, a;
};
PistonMotion closedForm(double r, double l, double theta, double w)
{
    const double s = std::sin(theta), c = std::cos(theta);
    const double S = std::sqrt(l * l - r * r * s * s);
    return {r * c + S, -r * w * s - r * r * w * s * c / S,
            -r * w * w * c - r * r * w * w * (std::cos(2 * theta) / S + r * r * s * s * c * c / (S * S * S))};
}

TEST(SliderCrank, PistonKinematicsMatchClosedForm)
{
    test::SliderCrankSpec spec;
    const CompiledMechanism m = compile(test::sliderCrank(spec));
    const CycleResult result = sweepCycle(m, {.steps = 72});
    ASSERT_TRUE(result.complete);
    ASSERT_EQ(result.steps.size(), 73u);
    const int piston = 2;
    for (const auto& step : result.steps) {
        const double theta = spec.theta0 + spec.omega * step.t;
        const PistonMotion expected = closedForm(spec.r, spec.l, theta, spec.omega);
        EXPECT_NEAR(step.q[3 * piston], expected.x, 1e-10);
        EXPECT_NEAR(step.qd[3 * piston], expected.v, 1e-9);
        EXPECT_NEAR(step.qdd[3 * piston], expected.a, 1e-8);
    }
}

// Massless links and a constant force F opposing the piston's +x direction:
// virtual work gives the crank torque T = −F r sin(θ + β) / cos β with
// sin β = r sin θ / l (the magnitude formula of standard machine-dynamics
// texts; the sign follows from T ω + (−F) ẋ = 0).
TEST(SliderCrank, CrankTorqueMatchesVirtualWork)
{
    test::SliderCrankSpec spec;
    Mechanism mech = test::sliderCrank(spec);
    const double force = 1500.0;
    mech.loads.push_back(ForceLoad{"gas", {"piston", mech.joints[2].at}, Vec2(-force, 0.0), false, std::nullopt});
    const CompiledMechanism m = compile(mech);
    const CycleResult result = sweepCycle(m, {.steps = 90});
    ASSERT_TRUE(result.complete);
    for (const auto& step : result.steps) {
        const double theta = spec.theta0 + spec.omega * step.t;
        const double beta = std::asin(spec.r * std::sin(theta) / spec.l);
        const double expected = -force * spec.r * std::sin(theta + beta) / std::cos(beta);
        EXPECT_NEAR(step.effort[0], expected, 1e-7 * force * spec.r);
    }
}

}  // namespace
