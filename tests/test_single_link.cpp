// One link on a ground pin, driven by a motor at the pin: the pin reaction and
// the drive torque against the Newton–Euler equations of a rigid body turning
// about a fixed point.
#include "core/solver/compiled_mechanism.h"
#include "core/solver/cycle_sweep.h"
#include "tests/mechanism_builders.h"

#include <gtest/gtest.h>

using namespace clevis;

namespace {

// The link: pivot O off the origin, centre of mass G off the line of the
// pivot in both axes, so every term of the closed form is exercised.
constexpr double kMass = 2.5;       // kg
constexpr double kInertiaG = 0.04;  // kg·m² about G
const Vec2 kPivot(0.12, -0.05);     // m
const Vec2 kCentre(0.42, 0.06);     // m

struct LinkCase {
    const char* name;
    ConstantSpeed motion;
    Vec2 gravity;
    bool pinListedGroundFirst;
};

Mechanism singleLink(const LinkCase& c)
{
    Mechanism m;
    m.name = "single link";
    m.gravity = c.gravity;
    m.bodies = {test::pointBody("link", kMass, kCentre, kInertiaG)};
    m.joints = {c.pinListedGroundFirst ? test::pin("O", kGroundName, "link", kPivot)
                                       : test::pin("O", "link", kGroundName, kPivot)};
    m.drivers = {test::rotary("motor", "O", c.motion)};
    m.cycle.steps = 48;
    m.cycle.duration = 1.7;  // s: not a whole revolution, so t covers uneven angles
    return m;
}

class SingleLink : public ::testing::TestWithParam<LinkCase> {};

// Newton–Euler for a rigid body pivoting about a fixed point O (standard
// dynamics texts), with d = G − O turning at ω, α:
//   a_G = α × d − ω² d
//   F   = m a_G − m g                    (force of the pin on the link)
//   T   = I_O α + m g × d,  I_O = I_G + m|d|²   (the motor's torque on the link)
// and the frame receives −F at O and the couple −T.
TEST_P(SingleLink, PinReactionAndTorqueMatchNewtonEuler)
{
    const LinkCase c = GetParam();
    const CompiledMechanism m = compile(singleLink(c));
    const CycleResult r = sweepCycle(m);
    ASSERT_TRUE(r.complete);
    ASSERT_EQ(r.steps.size(), 49u);
    const Vec2 d0 = kCentre - kPivot;
    const double inertiaO = kInertiaG + kMass * d0.squaredNorm();
    const double forceScale = kMass * (c.gravity.norm() + c.motion.speed * c.motion.speed * d0.norm() + 1.0);
    const double torqueScale = forceScale * d0.norm();
    double worstForce = 0.0, worstTorque = 0.0;
    for (const StepResult& s : r.steps) {
        // Listed link-first, the motor's coordinate is the ground's rotation
        // relative to the link, so the link turns the other way.
        const double sense = c.pinListedGroundFirst ? 1.0 : -1.0;
        const double phi = sense * (c.motion.speed * s.t + 0.5 * c.motion.accel * s.t * s.t);
        const double omega = sense * (c.motion.speed + c.motion.accel * s.t), alpha = sense * c.motion.accel;
        const Vec2 d = rotation(phi) * d0;
        const Vec2 aG = alpha * perp(d) - omega * omega * d;
        const Vec2 force = kMass * aG - kMass * c.gravity;
        const double torque = inertiaO * alpha + cross(kMass * c.gravity, d);

        EXPECT_NEAR(s.q[2], phi, 1e-12);
        EXPECT_NEAR(s.qd[2], omega, 1e-12);
        EXPECT_NEAR(s.qdd[2], alpha, 1e-12);
        // The reaction is the first-listed body's force on the second.
        const Vec2 reported = c.pinListedGroundFirst ? s.joints[0].force : Vec2(-s.joints[0].force);
        worstForce = std::max(worstForce, (reported - force).norm());
        EXPECT_NEAR(s.joints[0].moment, 0.0, 1e-9 * torqueScale);
        // The effort acts on the second body along the motor's coordinate.
        worstTorque = std::max(worstTorque, std::abs(s.effort[0] - sense * torque));
        EXPECT_NEAR(s.power[0], torque * omega, 1e-9 * torqueScale * (std::abs(omega) + 1.0));
        // What the frame feels: −F at O, and the motor's reaction −T.
        EXPECT_NEAR((s.groundForce + force).norm(), 0.0, 1e-9 * forceScale);
        EXPECT_NEAR(s.groundMoment, -cross(kPivot, force) - torque, 1e-9 * torqueScale);
    }
    EXPECT_LT(worstForce, 1e-9 * forceScale);
    EXPECT_LT(worstTorque, 1e-9 * torqueScale);
    RecordProperty("max_force_error_N", ::testing::PrintToString(worstForce));
    RecordProperty("max_torque_error_Nm", ::testing::PrintToString(worstTorque));
}

const Vec2 kGravity(0.0, -9.80665);

INSTANTIATE_TEST_SUITE_P(Motions, SingleLink,
                         ::testing::Values(LinkCase{"ConstantSpeed", ConstantSpeed{5.0, 0.0}, Vec2::Zero(), true},
                                           LinkCase{"ConstantSpeedWithGravity", ConstantSpeed{5.0, 0.0}, kGravity,
                                                    true},
                                           LinkCase{"Accelerating", ConstantSpeed{1.5, 7.0}, Vec2::Zero(), true},
                                           LinkCase{"ReversingWithGravity", ConstantSpeed{-2.0, 9.0}, kGravity, true},
                                           LinkCase{"PinListedLinkFirst", ConstantSpeed{1.5, 7.0}, kGravity, false}),
                         [](const auto& info) { return std::string(info.param.name); });

}  // namespace
