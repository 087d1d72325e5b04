// The mechanism drawn at a solved step: its joints sit where the closed-form
// slider-crank kinematics put them.
#include "core/solver/compiled_mechanism.h"
#include "core/solver/cycle_sweep.h"
#include "tests/mechanism_builders.h"
#include "core/results/posed_mechanism.h"

#include <gtest/gtest.h>

using namespace clevis;

namespace {

TEST(PosedMechanism, JointsFollowTheSliderCrank)
{
    test::SliderCrankSpec spec;
    const Mechanism drawn = test::sliderCrank(spec);
    const CompiledMechanism m = compile(drawn);
    const CycleResult r = sweepCycle(m, {.steps = 12});
    for (const auto& step : r.steps) {
        const Mechanism posed = posedMechanism(drawn, m, step);
        // Crank pin at r(cos θ, sin θ); piston at x = r cos θ + √(l² − r² sin² θ) (standard kinematics texts).
        const double theta = spec.theta0 + spec.omega * step.t;
        const double x = spec.r * std::cos(theta) + std::sqrt(spec.l * spec.l - std::pow(spec.r * std::sin(theta), 2));
        EXPECT_NEAR((posed.joints[0].at - Vec2::Zero()).norm(), 0.0, 1e-12);
        EXPECT_NEAR((posed.joints[1].at - spec.r * Vec2(std::cos(theta), std::sin(theta))).norm(), 0.0, 1e-9);
        EXPECT_NEAR((posed.joints[2].at - Vec2(x, 0.0)).norm(), 0.0, 1e-9);
        EXPECT_NEAR(posed.joints[3].axisDeg, 0.0, 1e-12);  // the slide is fixed in ground
        EXPECT_EQ(posed.bodies[0].mass, drawn.bodies[0].mass);
    }
}

}  // namespace
