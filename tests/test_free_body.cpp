// Free-body diagrams: each body's loads balance its m·a_G and I_G·α, and a
// pin pushes its two bodies equally and oppositely.
#include "core/results/free_body.h"
#include "core/solver/compiled_mechanism.h"
#include "core/solver/cycle_sweep.h"
#include "tests/mechanism_builders.h"

#include <gtest/gtest.h>

using namespace clevis;

namespace {

// A slider-crank with every kind of load, so each contributes to the sums.
Mechanism loadedSliderCrank()
{
    test::SliderCrankSpec spec;
    spec.crankMass = 1.5;
    spec.rodMass = 2.0;
    spec.pistonMass = 3.0;
    spec.crankInertia = 0.004;
    spec.rodInertia = 0.02;
    spec.omega = 12.0;
    Mechanism m = test::sliderCrank(spec);
    m.gravity = Vec2(0.0, -9.80665);
    const Vec2 a = m.joints[1].at, b = m.joints[2].at;
    m.loads.push_back(ForceLoad{"press", {"piston", b}, Vec2(-800.0, 120.0), false, std::nullopt});
    m.loads.push_back(TorqueLoad{"brake", "rod", -3.0, std::nullopt});
    m.loads.push_back(SpringLoad{"return", {kGroundName, Vec2(0.2, 0.15)}, {"rod", 0.5 * (a + b)}, 4000.0, 0.1});
    m.loads.push_back(DamperLoad{"buffer", {kGroundName, Vec2(0.6, 0.0)}, {"piston", b}, 60.0});
    m.loads.push_back(TorsionSpringLoad{"wind", "O", 2.0, 0.0});
    m.cycle.steps = 24;
    return m;
}

struct Solved {
    CompiledMechanism m;
    CycleResult r;
};

Solved solve(const Mechanism& mech)
{
    Solved s{compile(mech), {}};
    s.r = sweepCycle(s.m);
    return s;
}

const FreeBodyItem& item(const FreeBodyDiagram& d, FreeBodyItemKind kind, const std::string& name)
{
    for (const auto& i : d.items)
        if (i.kind == kind && i.name == name) return i;
    throw std::runtime_error("no item " + name + " on " + d.bodyName);
}

TEST(FreeBody, EveryBodyBalancesItsInertiaAtEveryStep)
{
    const Solved s = solve(loadedSliderCrank());
    ASSERT_TRUE(s.r.complete);
    for (int step = 0; step < int(s.r.steps.size()); ++step)
        for (int body = 0; body < int(s.m.bodies.size()); ++body) {
            const FreeBodyDiagram d = freeBodyDiagram(s.m, s.r, body, step);
            // The kinetic side is not trivially zero, so the balance means something.
            const double scale = std::abs(d.fx.sum) + std::abs(d.fy.sum) + 1.0;
            EXPECT_NEAR(d.fx.residual, 0.0, 1e-7 * scale) << d.bodyName << " step " << step;
            EXPECT_NEAR(d.fy.residual, 0.0, 1e-7 * scale) << d.bodyName << " step " << step;
            EXPECT_NEAR(d.moment.residual, 0.0, 1e-7 * scale) << d.bodyName << " step " << step;
        }
    const FreeBodyDiagram rod = freeBodyDiagram(s.m, s.r, 1, 5);
    EXPECT_GT(rod.inertiaForce().norm(), 1.0);
    EXPECT_GT(std::abs(rod.inertiaCouple()), 0.01);
}

TEST(FreeBody, SharedPinPushesBothBodiesEquallyAndOppositely)
{
    const Solved s = solve(loadedSliderCrank());
    for (int step = 0; step < int(s.r.steps.size()); step += 5) {
        const FreeBodyDiagram crank = freeBodyDiagram(s.m, s.r, 0, step), rod = freeBodyDiagram(s.m, s.r, 1, step);
        const FreeBodyItem& onCrank = item(crank, FreeBodyItemKind::JointReaction, "A");
        const FreeBodyItem& onRod = item(rod, FreeBodyItemKind::JointReaction, "A");
        EXPECT_GT(onRod.force.norm(), 1.0);
        EXPECT_NEAR((onCrank.force + onRod.force).norm(), 0.0, 1e-9 * onRod.force.norm());
        EXPECT_NEAR((onCrank.at - onRod.at).norm(), 0.0, 1e-9);
        // A pin carries no moment: drawn through the pin, both couples vanish.
        EXPECT_NEAR(onCrank.couple, 0.0, 1e-9 * onRod.force.norm());
        EXPECT_NEAR(onRod.couple, 0.0, 1e-9 * onRod.force.norm());
        // The second body (rod) receives the joint's reported reaction.
        EXPECT_NEAR((onRod.force - s.r.steps[step].joints[1].force).norm(), 0.0, 1e-9 * onRod.force.norm());
        EXPECT_EQ(onCrank.otherBody, "rod");
    }
}

TEST(FreeBody, ListsDriverWeightAndLoadsOnTheirBodies)
{
    const Solved s = solve(loadedSliderCrank());
    const int step = 7;
    const FreeBodyDiagram crank = freeBodyDiagram(s.m, s.r, 0, step);
    const FreeBodyItem& motor = item(crank, FreeBodyItemKind::DriverAction, "motor");
    EXPECT_NEAR(motor.couple, s.r.steps[step].effort[0], 1e-9 * std::abs(motor.couple));
    EXPECT_NEAR(motor.force.norm(), 0.0, 1e-9);
    const FreeBodyItem& weight = item(crank, FreeBodyItemKind::Weight, "weight");
    EXPECT_NEAR(weight.force.y(), -1.5 * 9.80665, 1e-12);
    EXPECT_NEAR((weight.at - crank.cg).norm(), 0.0, 1e-12);
    EXPECT_NO_THROW(item(crank, FreeBodyItemKind::TorsionSpring, "wind"));

    const FreeBodyDiagram piston = freeBodyDiagram(s.m, s.r, 2, step);
    EXPECT_NEAR(item(piston, FreeBodyItemKind::Force, "press").force.x(), -800.0, 1e-12);
    EXPECT_NO_THROW(item(piston, FreeBodyItemKind::Damper, "buffer"));
    const FreeBodyItem& guide = item(piston, FreeBodyItemKind::JointReaction, "S");
    EXPECT_NEAR(guide.axis.x(), 1.0, 1e-12);
    EXPECT_EQ(guide.otherBody, kGroundName);
    EXPECT_NO_THROW(item(freeBodyDiagram(s.m, s.r, 1, step), FreeBodyItemKind::Spring, "return"));
    EXPECT_THROW(freeBodyDiagram(s.m, s.r, kGround, step), std::out_of_range);
}

}  // namespace
