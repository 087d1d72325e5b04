// The mechanism drawn at a solved step: its joints sit where the closed-form
// slider-crank kinematics put them.
#include "core/results/body_points_at_step.h"
#include "core/results/posed_mechanism.h"
#include "core/solver/compiled_mechanism.h"
#include "core/solver/cycle_sweep.h"
#include "tests/mechanism_builders.h"

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

// The points the canvas draws a body round (from the document) and those the
// figures draw it round (from the solved step) are the same points.
TEST(BodyPoints, DocumentAndSolvedStepAgree)
{
    const Mechanism drawn = test::sliderCrank({});
    const CompiledMechanism m = compile(drawn);
    const CycleResult r = sweepCycle(m, {.steps = 12});
    for (const auto& step : r.steps) {
        const Mechanism posed = posedMechanism(drawn, m, step);
        for (std::size_t b = 0; b < m.bodies.size(); ++b) {
            const auto document = bodyPoints(posed, m.bodies[b].name);
            const auto solved = bodyPointsAt(m, step, int(b));
            ASSERT_EQ(document.size(), solved.size()) << m.bodies[b].name;
            for (std::size_t i = 0; i < solved.size(); ++i) {
                EXPECT_EQ(document[i].kind, solved[i].kind) << m.bodies[b].name << " point " << i;
                EXPECT_NEAR((document[i].at - solved[i].at).norm(), 0.0, 1e-9) << m.bodies[b].name << " point " << i;
            }
        }
    }
    const auto piston = bodyPoints(drawn, "piston");
    ASSERT_EQ(piston.size(), 3u);
    EXPECT_EQ(piston[1].kind, BodyPointKind::SlideBlock);
    // Its wrist pin and its slide block are at one point: one pin of the body.
    EXPECT_EQ(bodyPins(drawn, "piston").size(), 1u);
}

}  // namespace
