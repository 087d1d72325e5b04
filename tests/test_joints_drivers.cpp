// Each constraint's analytic derivatives against finite differences of its
// own Φ, then joints and drivers at work in small mechanisms checked against
// closed forms: a slider's reaction moment, a piston-driven slider-crank, a
// cylinder-driven arm, and a two-link arm with a motor at each joint.
#include "core/solver/compiled_mechanism.h"
#include "core/solver/constraints/constraint.h"
#include "core/solver/cycle_sweep.h"
#include "core/solver/driver_motion.h"
#include "tests/mechanism_builders.h"

#include <gtest/gtest.h>

#include <Eigen/Dense>
#include <functional>
#include <random>

using namespace clevis;

namespace {

// ---- Derivatives of Φ -------------------------------------------------------

constexpr int kBodies = 3;
constexpr double kTimes[] = {0.31, 0.55, 0.67, 0.78, 1.03, 1.27};  // s

VectorXd phiAt(const Constraint& c, const VectorXd& q, double t)
{
    VectorXd phi(c.rows());
    c.position(q, t, RowWriter(0, &phi, nullptr));
    return phi;
}

Eigen::MatrixXd jacobianAt(const Constraint& c, const VectorXd& q, double t)
{
    VectorXd phi(c.rows());
    std::vector<Eigen::Triplet<double>> entries;
    c.position(q, t, RowWriter(0, &phi, &entries));
    Eigen::MatrixXd j = Eigen::MatrixXd::Zero(c.rows(), q.size());
    for (const auto& e : entries) j(e.row(), e.col()) += e.value();
    return j;
}

// Central differences at steps d and d/2 combined by Richardson
// extrapolation, which cancels their O(d²) error (large where Φ is strongly
// curved, as for a short cylinder).
VectorXd extrapolated(const std::function<VectorXd(double)>& difference, double d)
{
    return (4 * difference(d / 2) - difference(d)) / 3;
}

// For any motion q(τ) = q₀ + v τ through time t₀ + τ (consistent with the
// constraint or not), the chain rule gives
//   dΦ/dτ  = Φ_q v + Φ_t            = Φ_q v − ν
//   d²Φ/dτ² = (Φ_q v)_q v + 2Φ_qt v + Φ_tt = −γ
// so ν and γ can be checked against central differences of Φ alone; on a
// consistent motion (Φ ≡ 0) these reduce to Φ_q q̇ = ν and Φ_q q̈ = γ.
struct DerivativeErrors {
    double jacobian = 0, nu = 0, gamma = 0;
    void include(const DerivativeErrors& e)
    {
        jacobian = std::max(jacobian, e.jacobian);
        nu = std::max(nu, e.nu);
        gamma = std::max(gamma, e.gamma);
    }
    void record() const
    {
        ::testing::Test::RecordProperty("max_jacobian_error", ::testing::PrintToString(jacobian));
        ::testing::Test::RecordProperty("max_nu_error", ::testing::PrintToString(nu));
        ::testing::Test::RecordProperty("max_gamma_error", ::testing::PrintToString(gamma));
    }
};

DerivativeErrors checkDerivatives(const Constraint& c, std::mt19937& random, const std::string& what)
{
    SCOPED_TRACE(what);
    DerivativeErrors worst;
    std::uniform_real_distribution<double> u(-1.0, 1.0);
    for (int trial = 0; trial < 20; ++trial) {
        VectorXd q(3 * kBodies), v(3 * kBodies);
        for (int i = 0; i < q.size(); ++i) {
            q[i] = (i % 3 == 2 ? 3.0 : 0.5) * u(random);
            v[i] = (i % 3 == 2 ? 2.0 : 0.7) * u(random);
        }
        // Times clear of the motions' knots, where Φ_ttt jumps and the
        // second difference would be spoiled.
        const double t = kTimes[trial % std::size(kTimes)];

        const Eigen::MatrixXd jac = jacobianAt(c, q, t);
        for (int k = 0; k < q.size(); ++k) {
            const VectorXd column = extrapolated(
                [&](double h) {
                    VectorXd plus = q, minus = q;
                    plus[k] += h;
                    minus[k] -= h;
                    return VectorXd((phiAt(c, plus, t) - phiAt(c, minus, t)) / (2 * h));
                },
                1e-5);
            const double error = (column - jac.col(k)).cwiseAbs().maxCoeff();
            EXPECT_LT(error, 1e-8) << "column " << k << ", trial " << trial;
            worst.jacobian = std::max(worst.jacobian, error);
        }

        VectorXd nu(c.rows()), gamma(c.rows());
        c.rates(q, v, t, RowWriter(0, &nu, nullptr), RowWriter(0, &gamma, nullptr));
        const auto along = [&](double tau) { return phiAt(c, q + tau * v, t + tau); };
        const VectorXd rate = extrapolated([&](double d) { return VectorXd((along(d) - along(-d)) / (2 * d)); }, 2e-4);
        const VectorXd second =
            extrapolated([&](double d) { return VectorXd((along(d) - 2 * along(0) + along(-d)) / (d * d)); }, 2e-4);
        const DerivativeErrors e{0.0, (rate - (jac * v - nu)).cwiseAbs().maxCoeff(),
                                 (second + gamma).cwiseAbs().maxCoeff()};
        EXPECT_LT(e.nu, 1e-7) << "ν, trial " << trial;
        EXPECT_LT(e.gamma, 1e-5) << "γ, trial " << trial;
        worst.include(e);
    }
    return worst;
}

BodyPoint somePoint(int body, std::mt19937& random)
{
    std::uniform_real_distribution<double> u(-0.4, 0.4);
    return {body, Vec2(u(random), u(random))};
}

CompiledJoint someJoint(JointType type, int first, int second, std::mt19937& random)
{
    std::uniform_real_distribution<double> angle(-kPi, kPi);
    return CompiledJoint{"J",
                         type,
                         {first, second},
                         {somePoint(first, random), somePoint(second, random)},
                         unitFromDeg(radToDeg(angle(random)))};
}

// Body pairs: two moving bodies, ground first, ground second.
const std::pair<int, int> kPairs[] = {{0, 2}, {kGround, 1}, {2, kGround}};

std::string pairName(const std::string& type, const std::pair<int, int>& p)
{
    return type + " between " + std::to_string(p.first) + " and " + std::to_string(p.second);
}

TEST(ConstraintDerivatives, Joints)
{
    std::mt19937 random(20240611);
    DerivativeErrors worst;
    for (const auto& pair : kPairs) {
        worst.include(checkDerivatives(*makePinJoint(someJoint(JointType::Pin, pair.first, pair.second, random), 0),
                                       random, pairName("pin", pair)));
        worst.include(
            checkDerivatives(*makeSliderJoint(someJoint(JointType::Slider, pair.first, pair.second, random), 0), random,
                             pairName("slider", pair)));
        worst.include(
            checkDerivatives(*makePinInSlotJoint(someJoint(JointType::PinInSlot, pair.first, pair.second, random), 0),
                             random, pairName("pin_in_slot", pair)));
    }
    worst.record();
}

// Drivers under motions with non-zero rate and acceleration, so Φ_t and Φ_tt
// are exercised.
TEST(ConstraintDerivatives, Drivers)
{
    std::mt19937 random(77);
    DerivativeErrors worst;
    const Motion motions[] = {ConstantSpeed{0.7, 1.3}, Rise{CamLaw::Cycloidal, 0.1, 0.9, 0.2, 1.1},
                              MotionTable{{0.0, 0.4, 0.9, 1.5}, {0.3, 0.5, 0.2, 0.6}}};
    for (const Motion& motion : motions) {
        const DriverMotion drive(motion, 0.25, 1.5);
        for (const auto& pair : kPairs) {
            CompiledDriver d{"D", DriverType::Rotary, 0, {}, 0.25, motion};
            const CompiledJoint pinJoint = someJoint(JointType::Pin, pair.first, pair.second, random);
            worst.include(
                checkDerivatives(*makeRotaryDriver(d, pinJoint, 0, drive), random, pairName("rotary driver", pair)));
            d.type = DriverType::Linear;
            const CompiledJoint sliderJoint = someJoint(JointType::Slider, pair.first, pair.second, random);
            worst.include(
                checkDerivatives(*makeSliderDriver(d, sliderJoint, 0, drive), random, pairName("slider driver", pair)));
            d.joint = -1;
            d.ends[0] = somePoint(pair.first, random);
            d.ends[1] = somePoint(pair.second, random);
            worst.include(
                checkDerivatives(*makeCylinderDriver(d, 0, drive), random, pairName("cylinder driver", pair)));
        }
    }
    worst.record();
}

// ---- A slider's reaction moment ----------------------------------------------

// A block on a frictionless slider inclined at 30°, pushed along it by a
// linear driver with a rising motion, carrying a load F at a point Q off the
// slide and its weight at G. For a translating body, Newton–Euler about the
// joint point P (standard dynamics texts):
//   R + F + m g + E u = m a,          R·u = 0 (no friction)
//   M + (Q − P) × F + (G − P) × m g = (G − P) × m a
// so E = u·(m a − F − m g), R = n n·(m a − F − m g) and
//   M = (G − P) × m (a − g) − (Q − P) × F,
// with a = s̈ u and P moving with the block.
class SliderMoment : public ::testing::TestWithParam<bool> {};

TEST_P(SliderMoment, ReactionMomentMatchesNewtonEuler)
{
    const bool groundFirst = GetParam();
    const double mass = 4.0, axisDeg = 30.0;
    const Vec2 p0(0.2, 0.1), g0(0.35, 0.22), q0(0.5, 0.05), load(-150.0, 80.0);
    const Vec2 gravity(0.0, -9.80665);
    Mechanism mech;
    mech.name = "block";
    mech.gravity = gravity;
    mech.bodies = {test::pointBody("block", mass, g0, 0.03)};
    mech.joints = {groundFirst ? test::slider("S", kGroundName, "block", p0, axisDeg)
                               : test::slider("S", "block", kGroundName, p0, axisDeg)};
    const Rise rise{CamLaw::Polynomial345, 0.0, 0.25, 0.0, 1.0};
    mech.drivers = {test::linearAtSlider("ram", "S", rise)};
    mech.loads = {ForceLoad{"tool", {"block", q0}, load, false, std::nullopt}};
    mech.cycle.steps = 20;
    const CompiledMechanism m = compile(mech);
    const CycleResult r = sweepCycle(m);
    ASSERT_TRUE(r.complete);

    const Vec2 u = unitFromDeg(axisDeg), n = perp(u);
    // Listed block-first, the axis and the coordinate belong to the block:
    // the driver sets the ground's displacement along it, so the block moves
    // the other way, and the effort on the ground is the push on the block
    // reversed.
    const double sense = groundFirst ? 1.0 : -1.0;
    const DriverMotion motion(rise, 0.0, 1.0);
    double worstMoment = 0.0;
    for (const StepResult& s : r.steps) {
        const DriveState drive = motion(s.t);
        const Vec2 shift = sense * drive.position * u, accel = sense * drive.accel * u;
        EXPECT_NEAR((Vec2(s.q[0], s.q[1]) - (g0 + shift)).norm(), 0.0, 1e-12);
        EXPECT_NEAR(s.q[2], 0.0, 1e-12);
        const Vec2 P = p0 + shift, G = g0 + shift, Q = q0 + shift;
        const Vec2 net = mass * accel - load - mass * gravity;
        const Vec2 normal = n * n.dot(net);
        const double moment = cross(G - P, mass * (accel - gravity)) - cross(Q - P, load);
        EXPECT_NEAR(s.effort[0], sense * u.dot(net), 1e-9);
        if (groundFirst) {
            // On the block, about its own joint point P.
            EXPECT_NEAR((s.joints[0].force - normal).norm(), 0.0, 1e-9);
            worstMoment = std::max(worstMoment, std::abs(s.joints[0].moment - moment));
        } else {
            // On the ground, about the ground's joint point p0: the block's
            // push −R and couple −M, moved from P to p0.
            EXPECT_NEAR((s.joints[0].force + normal).norm(), 0.0, 1e-9);
            worstMoment = std::max(worstMoment, std::abs(s.joints[0].moment + moment + cross(P - p0, normal)));
        }
    }
    EXPECT_LT(worstMoment, 1e-9);
    EXPECT_GT(std::abs(r.steps[10].joints[0].moment), 1.0);  // the moment is really there
    RecordProperty("max_moment_error_Nm", ::testing::PrintToString(worstMoment));
}

INSTANTIATE_TEST_SUITE_P(Listing, SliderMoment, ::testing::Bool(),
                         [](const auto& info) { return info.param ? "GroundFirst" : "BlockFirst"; });

// ---- A slider driver moving a mechanism ---------------------------------------

// A slider-crank driven by its piston, kept clear of the dead centres. The
// crank angle follows from the law of cosines in the triangle O–A–B,
// l² = r² + x² − 2 r x cos θ (standard kinematics texts):
//   cos θ = (x² + r² − l²) / (2 r x),  θ > 0 on the drawn branch.
// With massless links and a torque T on the crank, virtual work gives the
// piston force the driver supplies, E ẋ + T θ̇ = 0.
TEST(SliderDriver, PistonDrivesSliderCrank)
{
    test::SliderCrankSpec spec;
    spec.theta0 = 1.2;
    Mechanism mech = test::sliderCrank(spec);
    const double x0 = mech.joints[2].at.x();
    const Rise stroke{CamLaw::Cycloidal, 0.0, -0.1, 0.0, 1.0};  // θ from 69° to about 133°
    mech.drivers = {test::linearAtSlider("ram", "S", stroke)};
    const double torque = 7.5;
    mech.loads = {TorqueLoad{"load", "crank", torque, std::nullopt}};
    mech.cycle.steps = 50;
    const CompiledMechanism m = compile(mech);
    const CycleResult r = sweepCycle(m);
    ASSERT_TRUE(r.complete);
    const DriverMotion motion(stroke, 0.0, 1.0);
    for (const StepResult& s : r.steps) {
        const double x = x0 + motion(s.t).position;
        EXPECT_NEAR(s.q[3 * 2], x, 1e-12);
        const double theta = std::acos((x * x + spec.r * spec.r - spec.l * spec.l) / (2 * spec.r * x));
        EXPECT_NEAR(spec.theta0 + s.q[2], theta, 1e-10) << "t = " << s.t;
        const double xd = motion(s.t).rate;
        if (std::abs(xd) > 1e-3) EXPECT_NEAR(s.effort[0], -torque * s.qd[2] / xd, 1e-7 * torque / spec.r);
    }
}

// ---- A cylinder driver ----------------------------------------------------------

// A boom pinned to ground at O, lifted by a cylinder from C on the ground to
// D on the boom. The boom's angle from the law of cosines in triangle O–C–D,
//   ℓ² = |OC|² + |OD|² − 2|OC||OD| cos ∠COD,
// and, with a massless boom carrying a torque T, the cylinder force from
// virtual work, E ℓ̇ + T φ̇ = 0.
TEST(CylinderDriver, LiftsBoomAsPrescribed)
{
    const Vec2 o(0.0, 0.0), c(0.3, -0.2), dPoint(0.5, 0.1);
    const double torque = -40.0;
    Mechanism mech;
    mech.name = "boom";
    mech.gravity = Vec2::Zero();
    mech.bodies = {test::pointBody("boom", 0.0, Vec2(0.4, 0.06), 0.0)};
    mech.joints = {test::pin("O", kGroundName, "boom", o)};
    const double l0 = (dPoint - c).norm();
    const MotionTable table{{0.0, 0.5, 1.0, 1.5}, {l0, l0 + 0.05, l0 + 0.12, l0 + 0.08}};
    mech.drivers = {test::cylinder("lift", {kGroundName, c}, {"boom", dPoint}, table)};
    mech.loads = {TorqueLoad{"payload", "boom", torque, std::nullopt}};
    mech.cycle.steps = 30;
    const CompiledMechanism m = compile(mech);
    const CycleResult r = sweepCycle(m);
    ASSERT_TRUE(r.complete);
    const DriverMotion motion(table, l0, 1.5);
    const double oc = (c - o).norm(), od = (dPoint - o).norm();
    const double drawnAngle = std::acos((oc * oc + od * od - l0 * l0) / (2 * oc * od));
    for (const StepResult& s : r.steps) {
        const DriveState drive = motion(s.t);
        const double angle = std::acos((oc * oc + od * od - drive.position * drive.position) / (2 * oc * od));
        // D lies counter-clockwise of C about O, so a longer cylinder turns the boom counter-clockwise.
        EXPECT_NEAR(s.q[2], angle - drawnAngle, 1e-10) << "t = " << s.t;
        const Vec2 tip = rotation(s.q[2]) * dPoint;
        EXPECT_NEAR((tip - c).norm(), drive.position, 1e-12);
        if (std::abs(drive.rate) > 1e-3)
            EXPECT_NEAR(s.effort[0], -torque * s.qd[2] / drive.rate, 1e-7 * std::abs(torque));
    }
}

// ---- Two drivers at once: a two-link arm ---------------------------------------

// Forward kinematics and joint torques of a planar two-link arm with a motor
// at the shoulder (ground–link 1) and one at the elbow (link 1–link 2), joint
// angles q1 (absolute) and q2 (relative), centres of mass on the link lines at
// lc1, lc2 (standard robotics texts):
//   tip = l1 (cos q1, sin q1) + l2 (cos(q1 + q2), sin(q1 + q2))
//   M(q) q̈ + C(q, q̇) q̇ + g(q) = τ with
//   M11 = m1 lc1² + m2 (l1² + lc2² + 2 l1 lc2 cos q2) + I1 + I2
//   M12 = M21 = m2 (lc2² + l1 lc2 cos q2) + I2,   M22 = m2 lc2² + I2
//   h = −m2 l1 lc2 sin q2
//   τ1 = M11 q̈1 + M12 q̈2 + 2h q̇1 q̇2 + h q̇2² + (m1 lc1 + m2 l1) g cos q1 + m2 lc2 g cos(q1 + q2)
//   τ2 = M21 q̈1 + M22 q̈2 − h q̇1² + m2 lc2 g cos(q1 + q2)
TEST(TwoDrivers, PlanarArmMatchesManipulatorDynamics)
{
    const double l1 = 0.45, l2 = 0.35, lc1 = 0.2, lc2 = 0.15;
    const double m1 = 3.0, m2 = 1.8, i1 = 0.06, i2 = 0.025, g = 9.80665;
    const double q10 = 0.4, q20 = 0.7;  // drawn pose
    const Vec2 elbow = l1 * Vec2(std::cos(q10), std::sin(q10));
    const Vec2 along2(std::cos(q10 + q20), std::sin(q10 + q20));
    const Vec2 tip0 = elbow + l2 * along2;
    Mechanism mech;
    mech.name = "arm";
    mech.gravity = Vec2(0.0, -g);
    mech.bodies = {test::pointBody("upper", m1, lc1 / l1 * elbow, i1),
                   test::pointBody("fore", m2, elbow + lc2 * along2, i2)};
    mech.joints = {test::pin("shoulder", kGroundName, "upper", Vec2::Zero()),
                   test::pin("elbow", "upper", "fore", elbow)};
    const ConstantSpeed shoulderMotion{1.1, 2.5};
    const Rise elbowMotion{CamLaw::Cycloidal, q20, q20 + 1.6, 0.2, 1.2};
    mech.drivers = {test::rotary("m1", "shoulder", shoulderMotion, q10), test::rotary("m2", "elbow", elbowMotion, q20)};
    mech.cycle.steps = 60;
    mech.cycle.duration = 1.5;
    const CompiledMechanism m = compile(mech);
    const CycleResult r = sweepCycle(m);
    ASSERT_TRUE(r.complete);

    const DriverMotion shoulder(shoulderMotion, q10, 1.5), elbowDrive(elbowMotion, q20, 1.5);
    const BodyPoint tipOnFore{1, tip0 - m.bodies[1].mass.cg};
    double worstTip = 0.0, worstTorque = 0.0;
    for (const StepResult& s : r.steps) {
        const DriveState a = shoulder(s.t), b = elbowDrive(s.t);
        const double q1 = a.position, q2 = b.position, qd1 = a.rate, qd2 = b.rate, qdd1 = a.accel, qdd2 = b.accel;
        const Vec2 tip = l1 * Vec2(std::cos(q1), std::sin(q1)) + l2 * Vec2(std::cos(q1 + q2), std::sin(q1 + q2));
        worstTip = std::max(worstTip, (pointPosition(s.q, tipOnFore) - tip).norm());

        const double c2 = std::cos(q2), h = -m2 * l1 * lc2 * std::sin(q2);
        const double M11 = m1 * lc1 * lc1 + m2 * (l1 * l1 + lc2 * lc2 + 2 * l1 * lc2 * c2) + i1 + i2;
        const double M12 = m2 * (lc2 * lc2 + l1 * lc2 * c2) + i2, M22 = m2 * lc2 * lc2 + i2;
        const double tau1 = M11 * qdd1 + M12 * qdd2 + 2 * h * qd1 * qd2 + h * qd2 * qd2 +
                            (m1 * lc1 + m2 * l1) * g * std::cos(q1) + m2 * lc2 * g * std::cos(q1 + q2);
        const double tau2 = M12 * qdd1 + M22 * qdd2 - h * qd1 * qd1 + m2 * lc2 * g * std::cos(q1 + q2);
        worstTorque = std::max({worstTorque, std::abs(s.effort[0] - tau1), std::abs(s.effort[1] - tau2)});
    }
    EXPECT_LT(worstTip, 1e-11 * m.lengthScale);  // positions converge to 1e-11 of the mechanism's size
    EXPECT_LT(worstTorque, 1e-9);
    RecordProperty("max_tip_error_m", ::testing::PrintToString(worstTip));
    RecordProperty("max_torque_error_Nm", ::testing::PrintToString(worstTorque));
}

}  // namespace
