// Normalised rise laws against their standard definitions and the peak
// factors of standard cam-design tables, and driver motions built on them.
#include "core/model/type_names.h"
#include "core/solver/cam_law.h"
#include "core/solver/driver_motion.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>

using namespace clevis;

namespace {

const CamLaw kLaws[] = {CamLaw::Cycloidal, CamLaw::Polynomial345, CamLaw::ModifiedTrapezoid};

struct Peaks {
    double velocity, acceleration;  // largest |s'| and |s''| over [0, 1]
};
Peaks peaksOf(CamLaw law)
{
    Peaks p{0, 0};
    const int n = 200000;
    for (int i = 0; i <= n; ++i) {
        const CamValue v = evaluateCamLaw(law, double(i) / n);
        p.velocity = std::max(p.velocity, std::abs(v.ds));
        p.acceleration = std::max(p.acceleration, std::abs(v.dds));
    }
    return p;
}

// Every rise law: s(0) = 0, s(1) = 1, zero velocity and acceleration at both
// ends (the definition of a full rise between dwells), and rising throughout.
TEST(CamLaw, EndsAndMonotoneRise)
{
    for (CamLaw law : kLaws) {
        SCOPED_TRACE(camLawName(law));
        for (double u : {0.0, 1e-9}) {
            const CamValue v = evaluateCamLaw(law, u);
            EXPECT_NEAR(v.s, 0.0, 1e-9);
            EXPECT_NEAR(v.ds, 0.0, 1e-6);
            EXPECT_NEAR(v.dds, 0.0, 1e-6);
        }
        for (double u : {1.0, 1.0 - 1e-9}) {
            const CamValue v = evaluateCamLaw(law, u);
            EXPECT_NEAR(v.s, 1.0, 1e-9);
            EXPECT_NEAR(v.ds, 0.0, 1e-6);
            EXPECT_NEAR(v.dds, 0.0, 1e-6);
        }
        double previous = 0.0;
        for (int i = 1; i <= 1000; ++i) {
            const double s = evaluateCamLaw(law, i / 1000.0).s;
            EXPECT_GT(s, previous) << "u = " << i / 1000.0;
            previous = s;
        }
    }
}

// Each law is point-symmetric about its midpoint: s(1 − u) = 1 − s(u), so
// s'(1 − u) = s'(u) and s''(1 − u) = −s''(u).
TEST(CamLaw, PointSymmetric)
{
    for (CamLaw law : kLaws) {
        SCOPED_TRACE(camLawName(law));
        for (int i = 0; i <= 100; ++i) {
            const double u = i / 100.0;
            const CamValue a = evaluateCamLaw(law, u), b = evaluateCamLaw(law, 1.0 - u);
            EXPECT_NEAR(b.s, 1.0 - a.s, 1e-12) << "u = " << u;
            EXPECT_NEAR(b.ds, a.ds, 1e-11) << "u = " << u;
            EXPECT_NEAR(b.dds, -a.dds, 1e-10) << "u = " << u;
        }
    }
}

// Velocity and acceleration are the derivatives of position: central
// differences, error O(h²), plus continuity of the acceleration (no jumps,
// which would mean infinite jerk), checked across the modified trapezoid's
// piece boundaries too.
TEST(CamLaw, DerivativesMatchFiniteDifferences)
{
    const double h = 1e-5;
    for (CamLaw law : kLaws) {
        SCOPED_TRACE(camLawName(law));
        double worst = 0.0;
        for (int i = 1; i < 400; ++i) {
            const double u = i / 400.0 + 1e-4;  // off the piece boundaries at multiples of 1/8
            const CamValue lo = evaluateCamLaw(law, u - h), mid = evaluateCamLaw(law, u),
                           hi = evaluateCamLaw(law, u + h);
            worst = std::max(worst, std::abs((hi.s - lo.s) / (2 * h) - mid.ds));
            worst = std::max(worst, std::abs((hi.ds - lo.ds) / (2 * h) - mid.dds) / 10.0);
        }
        EXPECT_LT(worst, 1e-6);
        for (double u : {0.125, 0.375, 0.5, 0.625, 0.875}) {
            const double left = evaluateCamLaw(law, u - 1e-10).dds, right = evaluateCamLaw(law, u + 1e-10).dds;
            EXPECT_NEAR(left, right, 1e-7) << "u = " << u;
        }
    }
}

// Cycloidal, s = u − sin(2πu)/2π: peak velocity 2 at u = ½, peak
// acceleration 2π at u = ¼ (standard cam-design tables).
TEST(CamLaw, CycloidalPeaks)
{
    EXPECT_NEAR(evaluateCamLaw(CamLaw::Cycloidal, 0.5).ds, 2.0, 1e-12);
    EXPECT_NEAR(evaluateCamLaw(CamLaw::Cycloidal, 0.25).dds, 2 * kPi, 1e-12);
    const Peaks p = peaksOf(CamLaw::Cycloidal);
    EXPECT_NEAR(p.velocity, 2.0, 1e-9);
    EXPECT_NEAR(p.acceleration, 2 * kPi, 1e-8);
}

// 3-4-5 polynomial, s = 10u³ − 15u⁴ + 6u⁵: peak velocity 15/8 = 1.875 at u = ½,
// peak acceleration 10/√3 ≈ 5.7735 at u = ½ − √3/6 (standard cam-design tables).
TEST(CamLaw, Polynomial345Peaks)
{
    EXPECT_NEAR(evaluateCamLaw(CamLaw::Polynomial345, 0.5).ds, 1.875, 1e-12);
    EXPECT_NEAR(evaluateCamLaw(CamLaw::Polynomial345, 0.5 - std::sqrt(3.0) / 6).dds, 10 / std::sqrt(3.0), 1e-12);
    const Peaks p = peaksOf(CamLaw::Polynomial345);
    EXPECT_NEAR(p.velocity, 1.875, 1e-9);
    EXPECT_NEAR(p.acceleration, 10 / std::sqrt(3.0), 1e-8);
}

// Modified trapezoid: peak velocity 2.0 and peak acceleration ≈ 4.888, held
// from u = ⅛ to ⅜ (values from memory of standard cam-design tables, which
// quote them to three decimals; hence the tolerance).
TEST(CamLaw, ModifiedTrapezoidPeaks)
{
    const Peaks p = peaksOf(CamLaw::ModifiedTrapezoid);
    EXPECT_NEAR(p.velocity, 2.0, 5e-4);
    EXPECT_NEAR(p.acceleration, 4.888, 5e-4);
    for (double u : {0.125, 0.2, 0.3, 0.375})
        EXPECT_NEAR(evaluateCamLaw(CamLaw::ModifiedTrapezoid, u).dds, p.acceleration, 1e-9) << "u = " << u;
    EXPECT_NEAR(evaluateCamLaw(CamLaw::ModifiedTrapezoid, 0.5).dds, 0.0, 1e-9);
    RecordProperty("peak_velocity", ::testing::PrintToString(p.velocity));
    RecordProperty("peak_acceleration", ::testing::PrintToString(p.acceleration));
}

// A rise from `from` to `to` over [t₀, t₁] scales the law: s = from + h S(u),
// ṡ = h S'(u)/T, s̈ = h S''(u)/T², u = (t − t₀)/T, h = to − from, T = t₁ − t₀
// (chain rule); it dwells before and after.
TEST(DriverMotion, RiseScalesTheLaw)
{
    for (CamLaw law : kLaws) {
        SCOPED_TRACE(camLawName(law));
        const Rise rise{law, 0.2, 1.4, 0.5, 2.0};
        const DriverMotion motion(rise, 0.2, 3.0);
        const double h = 1.2, span = 1.5;
        for (double t : {0.0, 0.5}) {
            const DriveState s = motion(t);
            EXPECT_DOUBLE_EQ(s.position, 0.2);
            EXPECT_EQ(s.rate, 0.0);
            EXPECT_EQ(s.accel, 0.0);
        }
        for (double t : {2.0, 2.7}) {
            const DriveState s = motion(t);
            EXPECT_DOUBLE_EQ(s.position, 1.4);
            EXPECT_EQ(s.rate, 0.0);
            EXPECT_EQ(s.accel, 0.0);
        }
        for (double t = 0.55; t < 2.0; t += 0.1) {
            const CamValue v = evaluateCamLaw(law, (t - 0.5) / span);
            const DriveState s = motion(t);
            EXPECT_NEAR(s.position, 0.2 + h * v.s, 1e-14);
            EXPECT_NEAR(s.rate, h * v.ds / span, 1e-13);
            EXPECT_NEAR(s.accel, h * v.dds / (span * span), 1e-12);
            const double d = 1e-5;
            EXPECT_NEAR((motion(t + d).position - motion(t - d).position) / (2 * d), s.rate, 1e-8);
            EXPECT_NEAR((motion(t + d).rate - motion(t - d).rate) / (2 * d), s.accel, 1e-7);
        }
    }
    // Without an end the rise lasts to the end of the cycle.
    const DriverMotion open(Rise{CamLaw::Cycloidal, 0.0, 1.0, 1.0, std::nullopt}, 0.0, 3.0);
    EXPECT_NEAR(open(2.0).position, 0.5, 1e-15);
    EXPECT_DOUBLE_EQ(open(3.0).position, 1.0);
}

// Constant speed with constant acceleration: s = s₀ + v t + ½ a t².
TEST(DriverMotion, ConstantSpeedFromDrawnPosition)
{
    const DriverMotion motion(ConstantSpeed{2.0, -0.5}, 0.3, 4.0);
    for (double t : {0.0, 0.7, 3.1}) {
        const DriveState s = motion(t);
        EXPECT_NEAR(s.position, 0.3 + 2.0 * t - 0.25 * t * t, 1e-15);
        EXPECT_NEAR(s.rate, 2.0 - 0.5 * t, 1e-15);
        EXPECT_EQ(s.accel, -0.5);
    }
}

// A table of positions over time is interpolated by a cubic spline: it passes
// through every point, its rate and acceleration are the derivatives of its
// position, and the acceleration has no jumps at the points.
TEST(DriverMotion, TableThroughPointsWithContinuousAcceleration)
{
    const MotionTable table{{0.0, 0.4, 1.0, 1.3, 2.0}, {0.58, 0.66, 0.7, 0.64, 0.58}};
    const DriverMotion motion(table, 0.58, 2.0);
    for (std::size_t i = 0; i < table.time.size(); ++i)
        EXPECT_NEAR(motion(table.time[i]).position, table.position[i], 1e-15) << "t = " << table.time[i];
    const double e = 1e-9;
    for (std::size_t i = 1; i + 1 < table.time.size(); ++i) {
        const double t = table.time[i];
        EXPECT_NEAR(motion(t - e).rate, motion(t + e).rate, 1e-7) << "t = " << t;
        EXPECT_NEAR(motion(t - e).accel, motion(t + e).accel, 1e-6) << "t = " << t;
    }
    const double d = 1e-5;
    for (double t = 0.05; t < 2.0; t += 0.1) {
        const DriveState s = motion(t);
        EXPECT_NEAR((motion(t + d).position - motion(t - d).position) / (2 * d), s.rate, 1e-9) << "t = " << t;
        EXPECT_NEAR((motion(t + d).rate - motion(t - d).rate) / (2 * d), s.accel, 1e-8) << "t = " << t;
    }
    // Beyond the table the last position is held.
    EXPECT_DOUBLE_EQ(motion(2.5).position, 0.58);
}

}  // namespace
