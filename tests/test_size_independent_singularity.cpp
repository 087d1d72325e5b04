// The near-singular test judges a step by a measure that does not depend on
// the size of the mechanism: many healthy loops on one shaft, or a long
// chain of them, solve clean up to the stated limit of 500 bodies, copies of
// a loop leave the measure as it is, and a real toggle is caught the same
// whether or not healthy loops run beside it.
#include "core/model/model_limits.h"
#include "core/solver/compiled_mechanism.h"
#include "core/solver/constraint_system.h"
#include "core/solver/cycle_sweep.h"
#include "core/solver/diagonal_blocks.h"
#include "core/solver/step_solver.h"
#include "tests/chain_generator.h"
#include "tests/mechanism_builders.h"

#include <gtest/gtest.h>
#include <Eigen/Dense>

#include <algorithm>
#include <cmath>
#include <string>

using namespace clevis;

namespace {

// Steps of 4°: enough to pass close to any dead centre of these loops, few
// enough to sweep 500 bodies quickly.
constexpr int kSteps = 90;

const Warning* warningCoded(const CycleResult& r, const std::string& code)
{
    const auto w = std::find_if(r.warnings.begin(), r.warnings.end(), [&](const Warning& x) { return x.code == code; });
    return w == r.warnings.end() ? nullptr : &*w;
}

void expectClean(const Mechanism& mech)
{
    const CycleResult r = sweepCycle(compile(mech), {.steps = kSteps});
    EXPECT_TRUE(r.complete) << mech.name;
    ASSERT_EQ(r.steps.size(), std::size_t(kSteps + 1)) << mech.name;
    int flagged = 0;
    for (const StepResult& s : r.steps) flagged += s.nearSingular ? 1 : 0;
    EXPECT_EQ(flagged, 0) << mech.name << ": " << flagged << " steps flagged near singular";
    const Warning* w = warningCoded(r, "near_singular");
    EXPECT_EQ(w, nullptr) << mech.name << ": " << (w ? w->message : "");
}

// `copies` loops of the generator's one-loop fan, all drawn in the same place
// on the one hub: a hundred copies of one four-bar, each exactly the first.
Mechanism copiesOnOneHub(int copies)
{
    const Mechanism one = test::fourBarFan(1);
    Mechanism m = one;
    m.name = std::to_string(copies) + " copies of one loop on a hub";
    for (int k = 1; k < copies; ++k) {
        const std::string suffix = " #" + std::to_string(k);
        const auto renamed = [&](const std::string& name) { return name == "hub" ? name : name + suffix; };
        for (std::size_t b = 1; b < one.bodies.size(); ++b) {
            Body body = one.bodies[b];
            body.name += suffix;
            m.bodies.push_back(body);
        }
        for (std::size_t j = 1; j < one.joints.size(); ++j) {
            Joint joint = one.joints[j];
            joint.name += suffix;
            for (auto& body : joint.bodies)
                if (body != kGroundName) body = renamed(body);
            m.joints.push_back(joint);
        }
    }
    return m;
}

// Adds `loops` healthy crank-rocker loops of the generator's fan to `body`,
// which turns about a ground pin at the origin.
void addHealthyLoops(Mechanism& m, const std::string& body, int loops)
{
    const Mechanism fan = test::fourBarFan(loops);
    for (std::size_t b = 1; b < fan.bodies.size(); ++b) m.bodies.push_back(fan.bodies[b]);
    for (std::size_t j = 1; j < fan.joints.size(); ++j) {
        Joint joint = fan.joints[j];
        for (auto& name : joint.bodies)
            if (name == "hub") name = body;
        m.joints.push_back(joint);
    }
}

// The balanced Jacobian at the drawn pose, dense, and its diagonal blocks.
struct BlockedJacobian {
    Eigen::MatrixXd j;
    DiagonalBlocks blocks;
};

BlockedJacobian blockedJacobian(const Mechanism& mech)
{
    const CompiledMechanism m = compile(mech);
    const ConstraintSystem system(m);
    Eigen::VectorXd phi;
    std::vector<Eigen::Triplet<double>> entries;
    system.position(Pose(StepSolver(m).drawnPose()), 0.0, phi, &entries);
    BlockedJacobian out{Eigen::MatrixXd::Zero(system.rows(), system.coordinates()), {}};
    std::vector<std::pair<int, int>> positions;
    for (const auto& e : entries) {
        out.j(e.row(), e.col()) += e.value();
        positions.emplace_back(e.row(), e.col());
    }
    out.blocks = diagonalBlocks(int(out.j.rows()), positions);
    return out;
}

}  // namespace

// Block triangular form (Dulmage–Mendelsohn): no entry lies above the
// diagonal blocks in an order of the blocks, each block is square, and
// det J = ± ∏ det A_bb (checked against Eigen's dense LU of the whole).
// A driven crank comes apart into single equations; each coupler–rocker pair
// of a fan or chain is one block of six.
TEST(SizeIndependentSingularity, DiagonalBlocksOfTheJacobian)
{
    for (const Mechanism& mech : {test::fourBarFan(3), test::fourBarChain(7), test::sliderCrank({})}) {
        const BlockedJacobian b = blockedJacobian(mech);
        const int n = int(b.j.rows());
        ASSERT_EQ(b.j.cols(), n);
        std::vector<std::vector<int>> rows(b.blocks.count), columns(b.blocks.count);
        for (int k = 0; k < n; ++k) {
            rows[b.blocks.ofRow[k]].push_back(k);
            columns[b.blocks.ofColumn[k]].push_back(k);
        }
        double product = 1.0;
        for (int blk = 0; blk < b.blocks.count; ++blk) {
            ASSERT_EQ(rows[blk].size(), columns[blk].size()) << mech.name << " block " << blk;
            product *= b.j(rows[blk], columns[blk]).determinant();
        }
        const double whole = b.j.determinant();
        EXPECT_NEAR(std::abs(product), std::abs(whole), 1e-9 * std::abs(whole)) << mech.name;
        // Block lower triangular: an entry's row block never comes before its
        // column block in the order Tarjan's search closes them.
        for (int r = 0; r < n; ++r)
            for (int c = 0; c < n; ++c)
                if (b.j(r, c) != 0.0) EXPECT_GE(b.blocks.ofRow[r], b.blocks.ofColumn[c]) << mech.name;
        if (mech.name.find("fan") != std::string::npos) {
            int sixes = 0;
            for (const auto& blockRows : rows) sixes += blockRows.size() == 6 ? 1 : 0;
            EXPECT_EQ(sixes, 3) << mech.name;
        }
    }
}

// The generator's fans of crank-rocker loops round one driven hub: with the
// old measure (the condition number of the whole Jacobian) 80 loops and more
// were flagged over the whole cycle. 249 loops make 499 bodies, the limit.
TEST(SizeIndependentSingularity, HealthyFansSolveCleanAtAnySize)
{
    for (const int loops : {1, 60, 80, 100, 249}) expectClean(test::fourBarFan(loops));
    EXPECT_LE(std::size_t(2 * 249 + 1), kMaxBodies);
}

TEST(SizeIndependentSingularity, HealthyChainsSolveCleanUpTo500Bodies)
{
    for (const int bodies : {10, 101, 250, 500}) expectClean(test::fourBarChain(bodies));
    EXPECT_EQ(std::size_t(500), kMaxBodies);
}

// A hundred copies of one loop are judged as the one loop is, at every step.
// The measure is the same number for both; what is compared is its estimate
// (Hager–Higham), a lower bound usually exact and otherwise within a small
// factor, which starts its search differently when there are more columns:
// a factor of 1.5 either way. The condition number of the whole Jacobian,
// the measure before, was 2600 times smaller among the copies.
TEST(SizeIndependentSingularity, CopiesOfALoopKeepItsMeasure)
{
    const CycleResult one = sweepCycle(compile(copiesOnOneHub(1)), {.steps = kSteps});
    const CycleResult hundred = sweepCycle(compile(copiesOnOneHub(100)), {.steps = kSteps});
    ASSERT_EQ(one.steps.size(), hundred.steps.size());
    for (std::size_t k = 0; k < one.steps.size(); ++k) {
        const double a = one.steps[k].reciprocalCondition, b = hundred.steps[k].reciprocalCondition;
        EXPECT_GT(b / a, 1 / 1.5) << "step " << k << ": " << a << " alone, " << b << " among copies";
        EXPECT_LT(b / a, 1.5) << "step " << k << ": " << a << " alone, " << b << " among copies";
        EXPECT_FALSE(hundred.steps[k].nearSingular) << "step " << k;
    }
}

// A non-Grashof four-bar driven at constant speed runs into the toggle where
// coupler and rocker line up (|AO4| = b + c; the geometry of the end-of-reach
// test in test_four_bar.cpp). The same steps are flagged near singular when
// 99 healthy loops are driven from its crank as well.
TEST(SizeIndependentSingularity, ToggleIsCaughtAmongHealthyLoops)
{
    test::FourBarSpec spec{.a = 0.75, .b = 0.8, .c = 0.9, .d = 1.0};
    const double limit =
        std::acos((spec.a * spec.a + spec.d * spec.d - std::pow(spec.b + spec.c, 2)) / (2 * spec.a * spec.d));
    spec.theta2 = limit - degToRad(135.0) - 2e-7;  // the toggle lies 2e-7 rad beyond step 135 of 360
    spec.motion = ConstantSpeed{2 * kPi, 0.0};
    const Mechanism alone = test::fourBar(spec);
    Mechanism among = alone;
    addHealthyLoops(among, "crank", 99);
    const CycleResult a = sweepCycle(compile(alone), {.steps = 360});
    const CycleResult b = sweepCycle(compile(among), {.steps = 360});
    EXPECT_FALSE(a.complete);
    EXPECT_FALSE(b.complete);
    ASSERT_EQ(a.steps.size(), 136u);
    ASSERT_EQ(b.steps.size(), a.steps.size());
    EXPECT_TRUE(a.steps.back().nearSingular);
    EXPECT_FALSE(a.steps.front().nearSingular);
    for (std::size_t k = 0; k < a.steps.size(); ++k)
        EXPECT_EQ(a.steps[k].nearSingular, b.steps[k].nearSingular) << "step " << k;
    ASSERT_NE(warningCoded(b, "near_singular"), nullptr);
    EXPECT_NE(warningCoded(b, "near_singular")->message.find("motor"), std::string::npos);
}

// A slider-crank driven by its piston and held at dead centre (the ram does
// not move) is near singular at every step: the warning says so in words
// rather than giving a range from one position to the same one.
TEST(SizeIndependentSingularity, WholeCycleFlaggedSaysSo)
{
    test::SliderCrankSpec spec;
    spec.theta0 = 1e-5;
    Mechanism mech = test::sliderCrank(spec);
    mech.drivers = {test::linearAtSlider("ram", "S", ConstantSpeed{0.0, 0.0})};
    mech.cycle.duration = 1.0;
    const CycleResult r = sweepCycle(compile(mech), {.steps = 20});
    ASSERT_TRUE(r.complete);
    for (const StepResult& s : r.steps) EXPECT_TRUE(s.nearSingular) << "t = " << s.t;
    const Warning* w = warningCoded(r, "near_singular");
    ASSERT_NE(w, nullptr);
    EXPECT_NE(w->message.find("over the whole cycle (steps 0–20)"), std::string::npos) << w->message;
    EXPECT_EQ(w->message.find(" to ram"), std::string::npos) << w->message;
}
