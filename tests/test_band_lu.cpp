// The band LU and its ordering, checked against Eigen's dense
// partial-pivoting LU (an independent, general implementation), and the
// Jacobian factorisation's two paths on generated mechanisms: a chain (band)
// and a fan round one hub (sparse), the fan also against its loops solved
// one at a time.
#include "core/solver/band_lu.h"
#include "core/solver/band_ordering.h"
#include "core/solver/compiled_mechanism.h"
#include "core/solver/constraint_system.h"
#include "core/solver/cycle_sweep.h"
#include "core/solver/jacobian_factor.h"
#include "core/solver/step_solver.h"
#include "tests/chain_generator.h"

#include <gtest/gtest.h>
#include <Eigen/Dense>

#include <algorithm>
#include <numeric>
#include <random>
#include <string>
#include <tuple>

namespace clevis {
namespace {

bool inBand(int i, int j, int kl, int ku) { return j - i <= ku && i - j <= kl; }

// Random entries within the band; the main diagonal made a thousand times
// smaller, so that nearly every column needs a row swap.
Eigen::MatrixXd randomBand(int n, int kl, int ku, unsigned seed)
{
    std::mt19937 rng(seed);
    std::uniform_real_distribution<double> u(-1.0, 1.0);
    Eigen::MatrixXd a = Eigen::MatrixXd::Zero(n, n);
    for (int i = 0; i < n; ++i)
        for (int j = 0; j < n; ++j)
            if (inBand(i, j, kl, ku)) a(i, j) = i == j ? 1e-3 * u(rng) : u(rng);
    return a;
}

BandLu bandOf(const Eigen::MatrixXd& a, int kl, int ku)
{
    BandLu lu;
    lu.reshape(int(a.rows()), kl, ku);
    for (int i = 0; i < a.rows(); ++i)
        for (int j = 0; j < a.cols(); ++j)
            if (inBand(i, j, kl, ku)) lu.values()[lu.slot(i, j)] = a(i, j);
    return lu;
}

int denseDeterminantSign(const Eigen::MatrixXd& a)
{
    const Eigen::PartialPivLU<Eigen::MatrixXd> lu(a);
    int sign = int(lu.permutationP().determinant());
    for (Eigen::Index k = 0; k < a.rows(); ++k)
        if (lu.matrixLU()(k, k) < 0.0) sign = -sign;
    return sign;
}

TEST(BandLu, SolvesAndDeterminantSignMatchDenseLuThroughRowSwaps)
{
    const std::tuple<int, int, int> shapes[] = {{1, 0, 0}, {7, 2, 1}, {30, 3, 3}, {40, 1, 5}, {25, 6, 1}, {12, 11, 11}};
    for (const auto& [n, kl, ku] : shapes)
        for (unsigned seed = 1; seed <= 5; ++seed) {
            SCOPED_TRACE("n = " + std::to_string(n) + ", kl = " + std::to_string(kl) + ", ku = " + std::to_string(ku) +
                         ", seed " + std::to_string(seed));
            const Eigen::MatrixXd a = randomBand(n, kl, ku, seed);
            BandLu lu = bandOf(a, kl, ku);
            ASSERT_TRUE(lu.factor());
            const Eigen::VectorXd b = Eigen::VectorXd::LinSpaced(n, 1.0, 2.0);
            Eigen::VectorXd x = b, y = b;
            lu.solveInPlace(x.data());
            lu.solveTransposedInPlace(y.data());
            const double scale = a.cwiseAbs().colwise().sum().maxCoeff();
            EXPECT_LE((a * x - b).norm(), 1e-13 * scale * x.norm());
            EXPECT_LE((a.transpose() * y - b).norm(), 1e-13 * scale * y.norm());
            const Eigen::VectorXd xDense = a.partialPivLu().solve(b);
            const Eigen::VectorXd yDense = a.transpose().partialPivLu().solve(b);
            EXPECT_LE((x - xDense).norm(), 1e-9 * xDense.norm());
            EXPECT_LE((y - yDense).norm(), 1e-9 * yDense.norm());
            EXPECT_EQ(lu.determinantSign(), denseDeterminantSign(a));
        }
}

TEST(BandLu, ReportsASingularMatrix)
{
    Eigen::MatrixXd a = randomBand(10, 2, 2, 7);
    a.col(4).setZero();
    BandLu lu = bandOf(a, 2, 2);
    EXPECT_FALSE(lu.factor());
}

std::vector<std::pair<int, int>> pattern(const Eigen::MatrixXd& a)
{
    std::vector<std::pair<int, int>> entries;
    for (int j = 0; j < a.cols(); ++j)
        for (int i = 0; i < a.rows(); ++i)
            if (a(i, j) != 0.0) entries.emplace_back(i, j);
    return entries;
}

std::vector<int> shuffled(int n, unsigned seed)
{
    std::vector<int> order(n);
    std::iota(order.begin(), order.end(), 0);
    std::shuffle(order.begin(), order.end(), std::mt19937(seed));
    return order;
}

// A band matrix with its rows and columns shuffled comes back as a band
// about as narrow, and the reported sign is that of the two permutations.
TEST(BandOrdering, GathersAShuffledBandBackIntoANarrowBand)
{
    const int n = 60;
    const Eigen::MatrixXd band = randomBand(n, 2, 2, 3);
    const std::vector<int> rows = shuffled(n, 11), columns = shuffled(n, 12);
    Eigen::MatrixXd a(n, n);
    for (int i = 0; i < n; ++i)
        for (int j = 0; j < n; ++j) a(rows[i], columns[j]) = band(i, j);

    const BandOrdering o = orderIntoBand(n, pattern(a));
    EXPECT_LE(o.lower, 6);
    EXPECT_LE(o.upper, 6);
    Eigen::MatrixXd b(n, n);
    for (int i = 0; i < n; ++i)
        for (int k = 0; k < n; ++k) {
            EXPECT_EQ(o.rowPlace[o.rowAt[i]], i);
            EXPECT_EQ(o.columnPlace[o.columnAt[k]], k);
            b(i, k) = a(o.rowAt[i], o.columnAt[k]);
            if (b(i, k) != 0.0) EXPECT_TRUE(inBand(i, k, o.lower, o.upper)) << i << ", " << k;
        }
    EXPECT_EQ(denseDeterminantSign(b) * o.sign, denseDeterminantSign(a));
}

// Φ_q of a mechanism at its drawn pose, and the scaled entries J̃ the solver factors.
struct DrawnJacobian {
    std::vector<Eigen::Triplet<double>> scaled;
    Eigen::MatrixXd phiQ, scaledDense;
};

DrawnJacobian drawnJacobian(const StepSolver& solver)
{
    const ConstraintSystem& system = solver.system();
    const Eigen::VectorXd q = solver.drawnPose();
    Eigen::VectorXd phi;
    DrawnJacobian j;
    system.position(Pose(q), 0.0, phi, &j.scaled);
    const int n = system.coordinates();
    j.phiQ = j.scaledDense = Eigen::MatrixXd::Zero(n, n);
    for (const auto& e : j.scaled) {
        j.scaledDense(e.row(), e.col()) += e.value();
        j.phiQ(e.row(), e.col()) += e.value() / (system.rowScale()[e.row()] * system.columnScale()[e.col()]);
    }
    return j;
}

void expectSolvesMatchDense(const Mechanism& mechanism, JacobianFactor::Method method)
{
    const CompiledMechanism m = compile(mechanism);
    const StepSolver solver(m);
    const DrawnJacobian j = drawnJacobian(solver);
    JacobianFactor factor(solver.system().rowScale(), solver.system().columnScale());
    const int n = solver.system().coordinates();
    ASSERT_TRUE(factor.factor(n, j.scaled));
    EXPECT_EQ(factor.method(), method);
    const Eigen::VectorXd b = Eigen::VectorXd::LinSpaced(n, -1.0, 3.0);
    const Eigen::VectorXd x = factor.solve(b), xDense = j.phiQ.partialPivLu().solve(b);
    const Eigen::VectorXd y = factor.solveTransposed(b), yDense = j.phiQ.transpose().partialPivLu().solve(b);
    EXPECT_LE((x - xDense).norm(), 1e-10 * xDense.norm());
    EXPECT_LE((y - yDense).norm(), 1e-10 * yDense.norm());
    EXPECT_EQ(factor.determinantSign(), denseDeterminantSign(j.scaledDense));
}

TEST(JacobianFactor, ChainTakesTheBandPathAndMatchesDenseLu)
{
    expectSolvesMatchDense(test::fourBarChain(10), JacobianFactor::Method::Band);
    expectSolvesMatchDense(test::fourBarChain(201), JacobianFactor::Method::Band);
}

TEST(JacobianFactor, FanTakesTheSparsePathAndMatchesDenseLu)
{
    expectSolvesMatchDense(test::fourBarFan(3), JacobianFactor::Method::Band);
    expectSolvesMatchDense(test::fourBarFan(20), JacobianFactor::Method::Sparse);
}

// What makes the band path's cost linear: the chain's band does not widen
// as the chain grows.
TEST(BandOrdering, ChainBandStaysNarrowAtAnyLength)
{
    for (int bodies : {10, 50, 200, 201}) {
        const CompiledMechanism m = compile(test::fourBarChain(bodies));
        const DrawnJacobian j = drawnJacobian(StepSolver(m));
        std::vector<std::pair<int, int>> entries;
        for (const auto& e : j.scaled) entries.emplace_back(e.row(), e.col());
        const BandOrdering o = orderIntoBand(int(j.phiQ.rows()), entries);
        EXPECT_LE(o.lower, 4) << bodies << " bodies";
        EXPECT_LE(o.upper, 4) << bodies << " bodies";
    }
}

// The fan with loop i alone: the hub and its pin O, coupler i, rocker i and
// their pins Hi, Ri, Pi (names as in test::fourBarFan).
Mechanism oneLoop(const Mechanism& fan, int i)
{
    const auto kept = [&](const std::string& name) {
        if (name == "hub" || name == "O") return true;
        for (const char* prefix : {"coupler", "rocker", "H", "R", "P"})
            if (name == prefix + std::to_string(i)) return true;
        return false;
    };
    Mechanism m = fan;
    std::erase_if(m.bodies, [&](const Body& b) { return !kept(b.name); });
    std::erase_if(m.joints, [&](const Joint& j) { return !kept(j.name); });
    return m;
}

// The hub's centre of mass is on its pivot and it turns at constant speed,
// so it needs no torque of its own: the fan's drive torque is the sum of its
// loops' torques, and each loop's pins carry what they carry alone. The fan
// is solved by the sparse path, each loop by the band path.
TEST(FanOfFourBars, EqualsItsLoopsSolvedOneAtATime)
{
    const int loops = 20;
    const Mechanism fanMechanism = test::fourBarFan(loops);
    const CompiledMechanism fan = compile(fanMechanism);
    SweepOptions options;
    options.steps = 72;
    const CycleResult all = sweepCycle(fan, options);
    ASSERT_TRUE(all.complete);
    std::vector<double> sum(all.steps.size(), 0.0);
    double peak = 0.0;
    for (int i = 0; i < loops; ++i) {
        const CompiledMechanism single = compile(oneLoop(fanMechanism, i));
        ASSERT_EQ(single.bodies.size(), 3u);
        const CycleResult alone = sweepCycle(single, options);
        ASSERT_TRUE(alone.complete);
        ASSERT_EQ(alone.steps.size(), all.steps.size());
        for (std::size_t k = 0; k < all.steps.size(); ++k) {
            sum[k] += alone.steps[k].effort[0];
            for (std::size_t jl = 0; jl < single.joints.size(); ++jl) {
                const std::string& name = single.joints[jl].name;
                if (name == "O") continue;
                const auto inFan = std::find_if(fan.joints.begin(), fan.joints.end(),
                                                [&](const CompiledJoint& j) { return j.name == name; });
                const Vec2 f = all.steps[k].joints[std::size_t(inFan - fan.joints.begin())].force;
                const Vec2 g = alone.steps[k].joints[jl].force;
                EXPECT_LE((f - g).norm(), 1e-9 * std::max(1.0, g.norm())) << name << " at step " << k;
            }
        }
    }
    for (double t : sum) peak = std::max(peak, std::abs(t));
    ASSERT_GT(peak, 0.0);
    for (std::size_t k = 0; k < all.steps.size(); ++k)
        EXPECT_NEAR(all.steps[k].effort[0], sum[k], 1e-9 * peak) << "step " << k;
}

}  // namespace
}  // namespace clevis
