// Mass properties of bars and point masses against handbook formulas, and a
// body compiled from a bar section plus point masses.
#include "core/model/mass_properties.h"
#include "core/model/model_error.h"
#include "core/solver/compiled_mechanism.h"
#include "tests/mechanism_builders.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>

using namespace clevis;

namespace {

constexpr double kSteel = 7850.0;  // kg/m³, handbook density of carbon steel

// Rectangular bar of length L, width w (in the plane) and thickness t
// (handbook formulas): m = ρ w t L, centre at mid-length,
// I_G = m (L² + w²)/12 about the axis normal to the plane.
TEST(MassProperties, BarMatchesHandbook)
{
    const Vec2 a(0.1, -0.2), b(0.4, 0.2);  // L = 0.5 m
    const double w = 0.03, t = 0.01;
    const MassProperties p = barMassProperties(a, b, w, t, kSteel);
    const double length = 0.5;
    const double mass = kSteel * w * t * length;
    EXPECT_NEAR(p.mass, mass, 1e-14);
    EXPECT_NEAR((p.cg - Vec2(0.25, 0.0)).norm(), 0.0, 1e-15);
    EXPECT_NEAR(p.inertia, mass * (length * length + w * w) / 12.0, 1e-15);
}

// Parallel-axis theorem (handbook): I = I_G + m d². The same bar as two
// halves of length L/2, each I_G = (m/2)((L/2)² + w²)/12 at d = L/4 from
// the whole bar's centre, must combine to the whole bar's m (L² + w²)/12.
TEST(MassProperties, CombineHalvesGivesWholeBar)
{
    const Vec2 a(0.0, 0.0), mid(0.3, 0.4), b(0.6, 0.8);  // L = 1 m
    const double w = 0.05, t = 0.02;
    const MassProperties whole = barMassProperties(a, b, w, t, kSteel);
    const MassProperties halves =
        combine({barMassProperties(a, mid, w, t, kSteel), barMassProperties(mid, b, w, t, kSteel)});
    EXPECT_NEAR(halves.mass, whole.mass, 1e-12);
    EXPECT_NEAR((halves.cg - whole.cg).norm(), 0.0, 1e-15);
    EXPECT_NEAR(halves.inertia, whole.inertia, 1e-12 * whole.inertia);
}

// Point masses m1 at r1 and m2 at r2 (handbook): centre (m1 r1 + m2 r2)/(m1 + m2),
// I_G = m1 m2 |r1 − r2|² / (m1 + m2).
TEST(MassProperties, TwoPointMasses)
{
    const double m1 = 2.0, m2 = 3.0;
    const Vec2 r1(0.1, 0.2), r2(-0.3, 0.5);
    const MassProperties p = combine({pointMassProperties(m1, r1), pointMassProperties(m2, r2)});
    EXPECT_DOUBLE_EQ(p.mass, 5.0);
    EXPECT_NEAR((p.cg - (m1 * r1 + m2 * r2) / 5.0).norm(), 0.0, 1e-15);
    EXPECT_NEAR(p.inertia, m1 * m2 * (r1 - r2).squaredNorm() / 5.0, 1e-14);
}

TEST(MassProperties, NothingHasNoMass)
{
    const MassProperties p = combine({});
    EXPECT_EQ(p.mass, 0.0);
    EXPECT_EQ(p.inertia, 0.0);
}

// A crank cut from steel bar between its two joints, with a clamp and a
// counterweight as point masses. By hand: the bar as above, then
//   m = m_bar + Σ m_k,  G = (m_bar G_bar + Σ m_k r_k)/m,
//   I_G = I_bar + m_bar|G_bar − G|² + Σ m_k |r_k − G|²     (parallel axis).
TEST(MassProperties, CompiledBodyFromSectionAndPointMasses)
{
    const Vec2 o(0.0, 0.0), a(0.12, 0.05);  // joint points: the bar's ends
    const double w = 0.025, t = 0.012;
    Mechanism mech;
    Body crank;
    crank.name = "crank";
    crank.section = BarSection{w, t, kSteel, std::nullopt};
    crank.pointMasses = {PointMass{"clamp", 0.35, Vec2(0.12, 0.05)},
                         PointMass{"counterweight", 0.8, Vec2(-0.04, -0.03)}};
    mech.bodies = {crank, test::pointBody("rod", 0.0, Vec2(0.3, 0.0), 0.0)};
    mech.joints = {test::pin("O", kGroundName, "crank", o), test::pin("A", "crank", "rod", a),
                   test::slider("S", kGroundName, "rod", Vec2(0.4, 0.0), 0.0)};
    mech.drivers = {test::rotary("motor", "O", ConstantSpeed{1.0, 0.0})};
    const CompiledMechanism m = compile(mech);

    const double length = (a - o).norm();
    const double barMass = kSteel * w * t * length;
    const Vec2 barCentre = 0.5 * (o + a);
    const double barInertia = barMass * (length * length + w * w) / 12.0;
    const double mass = barMass + 0.35 + 0.8;
    const Vec2 centre = (barMass * barCentre + 0.35 * Vec2(0.12, 0.05) + 0.8 * Vec2(-0.04, -0.03)) / mass;
    const double inertia = barInertia + barMass * (barCentre - centre).squaredNorm() +
                           0.35 * (Vec2(0.12, 0.05) - centre).squaredNorm() +
                           0.8 * (Vec2(-0.04, -0.03) - centre).squaredNorm();
    const MassProperties& p = m.bodies[0].mass;
    EXPECT_NEAR(p.mass, mass, 1e-14);
    EXPECT_NEAR((p.cg - centre).norm(), 0.0, 1e-15);
    EXPECT_NEAR(p.inertia, inertia, 1e-15);
    // Joint points are stored relative to the centre of mass.
    EXPECT_NEAR((m.joints[1].point[0].local - (a - centre)).norm(), 0.0, 1e-15);
    // A massless body keeps the centre it was given.
    EXPECT_EQ(m.bodies[1].mass.mass, 0.0);
    EXPECT_NEAR((m.bodies[1].mass.cg - Vec2(0.3, 0.0)).norm(), 0.0, 1e-15);
}

// A section with explicit ends overrides the joints; a section on a body with
// fewer than two attachments and no ends is refused, naming the body's path.
TEST(MassProperties, SectionEnds)
{
    Mechanism mech;
    Body arm;
    arm.name = "arm";
    arm.section = BarSection{0.02, 0.01, kSteel, std::make_pair(Vec2(-0.1, 0.0), Vec2(0.3, 0.0))};
    mech.bodies = {arm};
    mech.joints = {test::pin("O", kGroundName, "arm", Vec2::Zero())};
    mech.drivers = {test::rotary("motor", "O", ConstantSpeed{1.0, 0.0})};
    const CompiledMechanism m = compile(mech);
    const double mass = kSteel * 0.02 * 0.01 * 0.4;
    EXPECT_NEAR(m.bodies[0].mass.mass, mass, 1e-14);
    EXPECT_NEAR((m.bodies[0].mass.cg - Vec2(0.1, 0.0)).norm(), 0.0, 1e-15);
    EXPECT_NEAR(m.bodies[0].mass.inertia, mass * (0.16 + 0.0004) / 12.0, 1e-15);

    mech.bodies[0].section->ends.reset();
    try {
        compile(mech);
        ADD_FAILURE() << "a bar with one joint and no ends was accepted";
    } catch (const ModelError& e) {
        EXPECT_EQ(e.path(), "bodies[0].section");
    }
}

// A rectangular plate a × b, thickness t (handbook): m = ρ t a b, centre at
// the middle, polar I_G = m (a² + b²)/12. Far from the origin and in either
// corner order, so the shift to the first corner and the sign are exercised.
TEST(MassProperties, RectangularPlateMatchesHandbook)
{
    const double a = 0.3, b = 0.12, t = 0.008;
    const Vec2 o(10.0, -20.0);
    std::vector<Vec2> corners{o, o + Vec2(a, 0), o + Vec2(a, b), o + Vec2(0, b)};
    const double mass = kSteel * t * a * b;
    for (int order = 0; order < 2; ++order) {
        const MassProperties p = plateMassProperties(corners, t, kSteel);
        EXPECT_NEAR(p.mass, mass, 1e-12 * mass);
        EXPECT_NEAR((p.cg - (o + Vec2(a / 2, b / 2))).norm(), 0.0, 1e-9);
        EXPECT_NEAR(p.inertia, mass * (a * a + b * b) / 12.0, 1e-8 * p.inertia);
        std::reverse(corners.begin(), corners.end());
    }
}

// A triangular plate with sides a, b, c (handbook, polar moment of a
// triangular lamina about its centroid): I_G = m (a² + b² + c²)/36, centre at
// the mean of the corners.
TEST(MassProperties, TriangularPlateMatchesHandbook)
{
    const Vec2 p0(0.02, 0.01), p1(0.25, -0.04), p2(0.11, 0.19);
    const double t = 0.006, rho = 2700.0;
    const double area = 0.5 * std::abs(cross(p1 - p0, p2 - p0));
    const double mass = rho * t * area;
    const double sides = (p1 - p0).squaredNorm() + (p2 - p1).squaredNorm() + (p0 - p2).squaredNorm();
    const MassProperties p = plateMassProperties({p0, p1, p2}, t, rho);
    EXPECT_NEAR(p.mass, mass, 1e-12 * mass);
    EXPECT_NEAR((p.cg - (p0 + p1 + p2) / 3.0).norm(), 0.0, 1e-15);
    EXPECT_NEAR(p.inertia, mass * sides / 36.0, 1e-12 * p.inertia);
}

// A non-convex L-shaped plate weighs what its two rectangles weigh together
// (the rectangles as bars, combined by the parallel-axis theorem).
TEST(MassProperties, LShapedPlateIsTwoRectangles)
{
    const double t = 0.01;
    const std::vector<Vec2> l{{0, 0}, {0.4, 0}, {0.4, 0.1}, {0.1, 0.1}, {0.1, 0.3}, {0, 0.3}};
    const MassProperties plate = plateMassProperties(l, t, kSteel);
    const MassProperties parts = combine({barMassProperties({0, 0.05}, {0.4, 0.05}, 0.1, t, kSteel),
                                          barMassProperties({0.05, 0.1}, {0.05, 0.3}, 0.1, t, kSteel)});
    EXPECT_NEAR(plate.mass, parts.mass, 1e-12 * parts.mass);
    EXPECT_NEAR((plate.cg - parts.cg).norm(), 0.0, 1e-15);
    EXPECT_NEAR(plate.inertia, parts.inertia, 1e-12 * parts.inertia);
}

// A plate body without an outline is the polygon through its joints; three
// joints on one line make no plate, and the message names the plate.
TEST(MassProperties, CompiledPlateThroughItsJoints)
{
    const Vec2 a(0.0, 0.0), b(0.2, 0.0), c(0.05, 0.15);
    Mechanism mech;
    Body rocker;
    rocker.name = "rocker";
    rocker.plate = PlateSection{0.008, kSteel, std::nullopt};
    mech.bodies = {rocker, test::pointBody("rod", 0.0, Vec2(0.3, 0.0), 0.0),
                   test::pointBody("arm", 0.0, Vec2(0.0, 0.3), 0.0)};
    mech.joints = {test::pin("O", kGroundName, "rocker", a), test::pin("A", "rocker", "rod", b),
                   test::pin("B", "rocker", "arm", c), test::slider("S", kGroundName, "rod", Vec2(0.4, 0.0), 0.0),
                   test::slider("T", kGroundName, "arm", Vec2(0.0, 0.4), 90.0)};
    mech.drivers = {test::rotary("motor", "O", ConstantSpeed{1.0, 0.0})};
    const MassProperties expected = plateMassProperties({a, b, c}, 0.008, kSteel);
    const MassProperties& p = compile(mech).bodies[0].mass;
    EXPECT_GT(expected.mass, 0.0);
    EXPECT_EQ(p.mass, expected.mass);
    EXPECT_EQ(p.cg, expected.cg);
    EXPECT_EQ(p.inertia, expected.inertia);

    mech.joints[2].at = Vec2(0.1, 0.0);  // on the line through the other two
    try {
        compile(mech);
        ADD_FAILURE() << "a plate with its joints on one line was accepted";
    } catch (const ModelError& e) {
        EXPECT_EQ(e.path(), "bodies[0].plate");
    }
}

}  // namespace
