// Geometry that leaves a part without meaning is refused with the part and
// its joints named (core/solver/degenerate_geometry.h); a compound hinge and
// a spring of zero free length, which only look alike, still solve.
#include "core/model/model_error.h"
#include "core/solver/compiled_mechanism.h"
#include "core/solver/cycle_sweep.h"
#include "tests/mechanism_builders.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <string>

using namespace clevis;

namespace {

bool contains(const std::string& text, const std::string& part) { return text.find(part) != std::string::npos; }

// The ModelError compile throws, or a test failure if it throws none.
ModelError compileError(const Mechanism& mech)
{
    try {
        compile(mech);
    } catch (const ModelError& e) {
        return e;
    }
    ADD_FAILURE() << "\"" << mech.name << "\" was compiled without complaint";
    return ModelError("", "");
}

Mechanism withLoad(Mechanism m, Load load)
{
    m.loads.push_back(std::move(load));
    return m;
}

}  // namespace

// A crank drawn with its pin A on its ground pivot O2 (a = 0): it turns
// about O2 and carries nothing round; it used to solve as if it were a crank.
TEST(DegenerateGeometry, ZeroLengthCrankIsRefusedNamingItsJoints)
{
    const Mechanism mech = test::fourBar({.a = 0.0});
    const ModelError e = compileError(mech);
    EXPECT_EQ(e.path(), "bodies[0]");
    const std::string message = e.what();
    EXPECT_TRUE(contains(message, "body \"crank\" has all its joints, \"O2\" and \"A\", at one point")) << message;
    EXPECT_TRUE(contains(message, "zero length")) << message;
}

// A coupler whose two pins are drawn at one point; it used to be reported as
// a dead centre or toggle without naming its joints.
TEST(DegenerateGeometry, ZeroLengthCouplerIsRefusedNamingItsJoints)
{
    const Vec2 o2(0, 0), a(0.1, 0.05), o4(0.4, 0);
    Mechanism mech;
    mech.name = "zero-length coupler";
    mech.bodies = {test::pointBody("crank", 1, 0.5 * a, 0.01), test::pointBody("coupler", 1, a, 0.01),
                   test::pointBody("rocker", 1, 0.5 * (a + o4), 0.01)};
    mech.joints = {test::pin("O2", kGroundName, "crank", o2), test::pin("A", "crank", "coupler", a),
                   test::pin("B", "coupler", "rocker", a), test::pin("O4", kGroundName, "rocker", o4)};
    mech.drivers = {test::rotary("motor", "O2", ConstantSpeed{1.0, 0.0})};
    const ModelError e = compileError(mech);
    EXPECT_EQ(e.path(), "bodies[1]");
    const std::string message = e.what();
    EXPECT_TRUE(contains(message, "body \"coupler\" has all its joints, \"A\" and \"B\", at one point")) << message;
}

// A compound hinge: the rocker of a crank-rocker carries, at its pin B, a
// second coupler as well as the first (two of its joints at one point, its
// pivot O4 elsewhere); the second coupler drives a second rocker on O6.
// Three bodies meet at B, which is a legitimate design: it solves.
TEST(DegenerateGeometry, CompoundHingeStillSolves)
{
    const test::FourBarSpec spec{.mass = {1, 1, 1}, .inertia = {0.01, 0.01, 0.01}};
    Mechanism mech = test::fourBar(spec);
    const Vec2 b = test::fourBarPoints(spec).b;
    const Vec2 c = b + Vec2(0.25, 0.1), o6 = c + Vec2(0.05, -0.3);
    mech.bodies.push_back(test::pointBody("second coupler", 1, 0.5 * (b + c), 0.01));
    mech.bodies.push_back(test::pointBody("second rocker", 1, 0.5 * (c + o6), 0.01));
    mech.joints.push_back(test::pin("B2", "rocker", "second coupler", b));
    mech.joints.push_back(test::pin("C", "second coupler", "second rocker", c));
    mech.joints.push_back(test::pin("O6", kGroundName, "second rocker", o6));
    const CycleResult r = sweepCycle(compile(mech), {.steps = 72});
    EXPECT_TRUE(r.complete);
    for (const auto& w : r.warnings) ADD_FAILURE() << w.code << ": " << w.message;
}

// A spring between the crank and the coupler, both ends at their pin A:
// with a free length its force has a size but no line to act along.
TEST(DegenerateGeometry, SpringWithCoincidentEndsIsRefused)
{
    const test::FourBarSpec spec;
    const Vec2 a = test::fourBarPoints(spec).a;
    const Mechanism mech =
        withLoad(test::fourBar(spec), SpringLoad{"return spring", {"crank", a}, {"coupler", a}, 500.0, 0.05});
    const ModelError e = compileError(mech);
    EXPECT_EQ(e.path(), "loads[0]");
    const std::string message = e.what();
    EXPECT_TRUE(contains(message, "spring \"return spring\" has both its ends, on \"crank\" and \"coupler\", at one"))
        << message;
}

TEST(DegenerateGeometry, DamperWithCoincidentEndsIsRefused)
{
    const test::FourBarSpec spec;
    const Vec2 b = test::fourBarPoints(spec).b;
    const Mechanism mech = withLoad(test::fourBar(spec), DamperLoad{"dashpot", {kGroundName, b}, {"rocker", b}, 20.0});
    const ModelError e = compileError(mech);
    EXPECT_EQ(e.path(), "loads[0]");
    EXPECT_TRUE(contains(e.what(), "damper \"dashpot\" has both its ends")) << e.what();
}

// A spring of zero free length pulls with k·(b − a), defined even where its
// ends meet: drawn with its ends together it is accepted, and its force is
// zero there.
TEST(DegenerateGeometry, ZeroFreeLengthSpringWithEndsTogetherSolves)
{
    const test::FourBarSpec spec;
    const Vec2 b = test::fourBarPoints(spec).b;
    const Mechanism mech =
        withLoad(test::fourBar(spec), SpringLoad{"balancer", {kGroundName, b}, {"rocker", b}, 500.0, 0.0});
    const CycleResult r = sweepCycle(compile(mech), {.steps = 36});
    EXPECT_TRUE(r.complete);
    EXPECT_EQ(r.steps.front().springPotential, 0.0);
    EXPECT_GT(r.steps[9].springPotential, 0.0);
}
