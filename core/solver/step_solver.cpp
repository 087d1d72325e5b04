#include "core/solver/step_solver.h"

#include "core/solver/transmission_angle.h"

#include <algorithm>
#include <array>
#include <cmath>
#include <limits>

namespace clevis {
namespace {

constexpr int kMaxNewtonIterations = 30;
// A step with a kept (older) Jacobian must cut the residual at least this much.
constexpr double kChordContraction = 0.1;
// A residual this far inside the tolerance needs no further chord step (at a
// tenth, the hand-method check of the four-bar missed 1e-12 rad).
constexpr double kWellInside = 0.01;

// The two bodies a constraint acts on and, for each, the point through which
// its force is reported: for both bodies the second body's joint point (where
// the pair touches; on a slider it moves along the first body), or for a
// cylinder each body's own end.
using ActionPoint = StepSolver::ActionPoint;

std::array<ActionPoint, 2> actionPoints(const CompiledMechanism& m, const Constraint& c)
{
    if (c.owner() == ConstraintOwner::Joint) {
        const CompiledJoint& j = m.joints[c.ownerIndex()];
        return {ActionPoint{j.body[0], j.point[1]}, ActionPoint{j.body[1], j.point[1]}};
    }
    const CompiledDriver& d = m.drivers[c.ownerIndex()];
    if (d.joint < 0) return {ActionPoint{d.ends[0].body, d.ends[0]}, ActionPoint{d.ends[1].body, d.ends[1]}};
    const CompiledJoint& j = m.joints[d.joint];
    return {ActionPoint{j.body[0], j.point[1]}, ActionPoint{j.body[1], j.point[1]}};
}

}  // namespace

StepSolver::StepSolver(const CompiledMechanism& mechanism)
    : mechanism_(mechanism)
    , system_(mechanism)
    , factor_(system_.rowScale(), system_.columnScale())
    , nearSingular_(system_.coordinates())
    , transmission_(findTransmissionPins(mechanism))
    , tolerance_(1e-11 * mechanism.lengthScale)
{
    const auto& constraints = system_.constraints();
    ownerOfRow_.resize(system_.rows());
    for (std::size_t k = 0; k < constraints.size(); ++k) {
        actionPoints_.push_back(actionPoints(mechanism_, *constraints[k]));
        for (int row = 0; row < constraints[k]->rows(); ++row) ownerOfRow_[system_.firstRow(k) + row] = int(k);
    }
}

VectorXd StepSolver::drawnPose() const
{
    VectorXd q(system_.coordinates());
    for (std::size_t b = 0; b < mechanism_.bodies.size(); ++b) q.segment<3>(3 * b) << mechanism_.bodies[b].mass.cg, 0.0;
    return q;
}

// Φ and the scaled Jacobian entries at (q, t), remembering where they were
// taken: analyse() right after a converged assemble() finds them ready.
void StepSolver::evaluate(const Pose& q, double t)
{
    system_.position(q, t, phi_, &entries_);
    entriesPose_ = q.q();
    entriesTime_ = t;
}

bool StepSolver::regularAt(const VectorXd& q, double t)
{
    if (system_.rows() != system_.coordinates()) return false;
    evaluate(Pose(q, rotations_), t);
    return factor_.factor(system_.coordinates(), entries_) &&
           nearSingular_.reciprocalCondition(entries_) >= nearSingular_.threshold();
}

double StepSolver::residual(const VectorXd& q, double t, int* worstRow) const
{
    VectorXd phi;
    system_.position(q, t, phi, nullptr);
    if (phi.size() == 0) return 0.0;
    Eigen::Index row = 0;
    const double worst = phi.cwiseProduct(system_.rowScale()).cwiseAbs().maxCoeff(&row);
    if (worstRow) *worstRow = int(row);
    return worst;
}

// Newton–Raphson that keeps the last factorisation (normally the Jacobian of
// the previous step, which analyse() left) while the residual falls at least
// tenfold per iteration, and refactors at the current pose when it does not
// (or when that Jacobian was near singular, or the last assembly failed):
// one step of a cycle then costs one factorisation instead of two.
bool StepSolver::assemble(double t, VectorXd& q)
{
    if (newton(t, q)) return true;
    keepFactor_ = false;  // a retry from another pose starts afresh
    return false;
}

// Chord steps converge linearly, so when the residual reaches the tolerance
// after one of them, one more is taken (unless it is already well inside),
// which keeps the closed-form and hand-method checks at 1e-12; after a true
// Newton step the pose is already far inside, and near a singular position
// another step would only add noise.
bool StepSolver::newton(double t, VectorXd& q)
{
    const int n = system_.coordinates();
    double previous = std::numeric_limits<double>::infinity();
    bool chord = keepFactor_;
    for (int iteration = 0; iteration < kMaxNewtonIterations; ++iteration) {
        evaluate(Pose(q, rotations_), t);
        const double r = phi_.cwiseProduct(system_.rowScale()).cwiseAbs().maxCoeff();
        if (!std::isfinite(r) || r > 1e3 * mechanism_.lengthScale) return false;
        const bool converged = r <= tolerance_;
        if (converged && iteration > 0 && (!chord || r <= kWellInside * tolerance_)) return true;
        if (!keepFactor_ || (!converged && r > kChordContraction * previous)) {
            keepFactor_ = factor_.factor(n, entries_);
            if (!keepFactor_) return false;
            chord = false;
        }
        previous = r;
        phi_ = -phi_;
        factor_.solveInPlace(phi_);  // Newton step Δq = −Φ_q⁻¹Φ
        if (!phi_.allFinite()) return false;
        q += phi_;
        if (converged) return true;
    }
    return false;
}

StepResult StepSolver::analyse(double t, const VectorXd& q)
{
    const int n = system_.coordinates();
    StepResult r;
    r.t = t;
    r.q = q;
    for (const auto& motion : system_.motions()) {
        const DriveState s = motion(t);
        r.drivePosition.push_back(s.position);
        r.driveRate.push_back(s.rate);
    }
    const Pose pose(q, rotations_);
    if (!(t == entriesTime_ && q == entriesPose_)) evaluate(pose, t);
    const bool factored = factor_.factor(n, entries_);
    r.reciprocalCondition = factored ? nearSingular_.reciprocalCondition(entries_) : 0.0;
    r.jacobianSign = factored ? factor_.determinantSign() : 0;
    r.nearSingular = r.reciprocalCondition < nearSingular_.threshold();
    keepFactor_ = factored && !r.nearSingular;  // a near-singular Jacobian would mislead the next assembly

    solveRates(pose, t, r.qd, r.qdd);

    const std::vector<AppliedLoad> loads = appliedLoads(mechanism_, pose, r.qd, t, r.drivePosition);
    VectorXd rhs = generalizedForces(mechanism_, q, loads);
    for (std::size_t b = 0; b < mechanism_.bodies.size(); ++b) {
        const auto& mp = mechanism_.bodies[b].mass;
        rhs.segment<2>(3 * b) -= mp.mass * r.qdd.segment<2>(3 * b);
        rhs[3 * b + 2] -= mp.inertia * r.qdd[3 * b + 2];
    }
    r.lambda = factor_.solveTransposed(rhs);  // Φ_qᵀ λ = Q − M q̈

    fillActions(pose, r);
    fillReactionsAndEfforts(r);
    fillGroundLoad(loads, r);

    r.kinetic = kineticEnergy(mechanism_, r.qd);
    const LoadEnergies e = loadEnergies(mechanism_, pose, r.qd, t, r.drivePosition);
    r.gravityPotential = e.gravityPotential;
    r.springPotential = e.springPotential;
    r.damperDissipation = e.damperDissipation;
    r.appliedPower = e.appliedPower;
    for (const auto& pin : transmission_) r.transmissionDeg.push_back(transmissionAngleDeg(mechanism_, pin, pose));
    return r;
}

bool StepSolver::rates(double t, const VectorXd& q, VectorXd& qd, VectorXd& qdd)
{
    const Pose pose(q, rotations_);
    if (!(t == entriesTime_ && q == entriesPose_)) evaluate(pose, t);
    keepFactor_ = factor_.factor(system_.coordinates(), entries_);
    if (!keepFactor_) return false;
    solveRates(pose, t, qd, qdd);
    return qd.allFinite() && qdd.allFinite();
}

// With Φ_q factored at the pose.
void StepSolver::solveRates(const Pose& pose, double t, VectorXd& qd, VectorXd& qdd)
{
    zeroRates_.setZero(system_.coordinates());
    system_.rates(pose, zeroRates_, t, nu_, gamma_);  // ν does not depend on q̇; γ is recomputed below
    qd = factor_.solve(nu_);
    system_.rates(pose, qd, t, nu_, gamma_);
    qdd = factor_.solve(gamma_);
}

// The generalised constraint force on the bodies of constraint k is
// −Φ_q,kᵀ λ_k; on each body it is a force F and a moment about the centre of
// mass, reported as F through the action point plus the remaining couple.
// The Jacobian entries are those analyse() just factored, unscaled.
void StepSolver::fillActions(const Pose& q, StepResult& r) const
{
    const std::size_t count = system_.constraints().size();
    std::vector<std::array<Eigen::Vector3d, 2>> gen(count, {Eigen::Vector3d::Zero(), Eigen::Vector3d::Zero()});
    const auto& points = actionPoints_;
    const VectorXd& rowScale = system_.rowScale();
    const VectorXd& columnScale = system_.columnScale();
    for (const auto& e : entries_) {
        const int k = ownerOfRow_[e.row()];
        const int side = e.col() / 3 == points[k][0].body ? 0 : 1;
        const double partial = e.value() / (rowScale[e.row()] * columnScale[e.col()]);
        gen[k][side][e.col() % 3] -= partial * r.lambda[e.row()];
    }
    r.actions[0].resize(count);
    r.actions[1].resize(count);
    for (std::size_t k = 0; k < count; ++k)
        for (int side = 0; side < 2; ++side) {
            ConstraintAction& a = r.actions[side][k];
            a.body = points[k][side].body;
            a.at = q.point(points[k][side].at);
            if (a.body == kGround) continue;
            a.force = gen[k][side].head<2>();
            a.couple = gen[k][side][2] - cross(a.at - q.origin(a.body), a.force);
        }
}

void StepSolver::fillReactionsAndEfforts(StepResult& r) const
{
    const auto& constraints = system_.constraints();
    r.joints.reserve(mechanism_.joints.size());
    r.effort.reserve(mechanism_.drivers.size());
    r.power.reserve(mechanism_.drivers.size());
    for (std::size_t k = 0; k < constraints.size(); ++k) {
        const Constraint& c = *constraints[k];
        if (c.owner() == ConstraintOwner::Joint) {
            const bool secondMoves = r.actions[1][k].body != kGround;
            const ConstraintAction& a = secondMoves ? r.actions[1][k] : r.actions[0][k];
            const double sign = secondMoves ? 1.0 : -1.0;
            r.joints.push_back({sign * a.force, sign * a.couple});
        } else {
            // Φ = coordinate − s(t): the driver's push on its second body is −λ.
            const double effort = -r.lambda[system_.firstRow(k)];
            const int d = c.ownerIndex();
            r.effort.push_back(effort);
            r.power.push_back(effort * r.driveRate[d]);
        }
    }
}

void StepSolver::fillGroundLoad(const std::vector<AppliedLoad>& loads, StepResult& r) const
{
    for (std::size_t k = 0; k < system_.constraints().size(); ++k)
        for (int side = 0; side < 2; ++side) {
            if (r.actions[side][k].body != kGround) continue;
            const ConstraintAction& other = r.actions[1 - side][k];
            if (other.body == kGround) continue;
            r.groundForce -= other.force;
            r.groundMoment -= cross(other.at, other.force) + other.couple;
        }
    for (const auto& l : loads) {
        if (l.body != kGround) continue;
        r.groundForce += l.force;
        r.groundMoment += cross(l.at, l.force) + l.couple;
    }
}

}  // namespace clevis
