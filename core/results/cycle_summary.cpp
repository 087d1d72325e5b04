#include "core/results/cycle_summary.h"

#include "core/results/cylinder_ends.h"
#include "core/results/step_integral.h"
#include "core/solver/constraint_system.h"

#include <Eigen/SVD>
#include <Eigen/SparseCore>

#include <algorithm>
#include <cmath>
#include <functional>
#include <tuple>

namespace clevis {
namespace {

// The step among those flagged (or not) where `key` is largest (first such
// step); value is f there.
PeakAt peakAmong(const Steps& in, const StepValue& f, const StepValue& key, bool flagged)
{
    const auto& steps = in.all;
    PeakAt p;
    double best = 0.0;
    for (std::size_t i = 0; i < steps.size(); ++i) {
        if (in.flagged[i] != flagged) continue;
        const double k = key(steps[i]);
        if (p.step < 0 || k > best) {
            best = k;
            p = {f(steps[i]), int(i), flagged};
        }
    }
    return p;
}

// The peak over the unflagged steps, and a larger one at a flagged step
// apart; with every step flagged, the flagged peak is the only one.
Peak peakBy(const Steps& steps, const StepValue& f, const StepValue& key)
{
    Peak p;
    static_cast<PeakAt&>(p) = peakAmong(steps, f, key, false);
    const PeakAt flagged = peakAmong(steps, f, key, true);
    if (p.step < 0) static_cast<PeakAt&>(p) = flagged;
    else if (flagged.step >= 0 && key(steps.all[flagged.step]) > key(steps.all[p.step])) p.flagged = flagged;
    return p;
}

}  // namespace

Peak largest(const Steps& steps, const StepValue& f) { return peakBy(steps, f, f); }

Peak smallest(const Steps& steps, const StepValue& f)
{
    return peakBy(steps, f, [&](const StepResult& s) { return -f(s); });
}

Peak largestMagnitude(const Steps& steps, const StepValue& f)
{
    return peakBy(steps, f, [&](const StepResult& s) { return std::abs(f(s)); });
}

std::pair<double, double> positiveAndNegative(const std::vector<StepResult>& steps, const StepValue& f)
{
    double positive = 0.0, negative = 0.0;
    for (std::size_t i = 1; i < steps.size(); ++i) {
        const double dt = steps[i].t - steps[i - 1].t, a = f(steps[i - 1]), b = f(steps[i]);
        if (a * b >= 0.0) {
            (a + b >= 0.0 ? positive : negative) += 0.5 * dt * (a + b);
            continue;
        }
        const double toZero = dt * a / (a - b);  // time from the interval's start to f = 0
        (a > 0.0 ? positive : negative) += 0.5 * toZero * a;
        (b > 0.0 ? positive : negative) += 0.5 * (dt - toZero) * b;
    }
    return {positive, negative};
}

namespace {

// The peak and RMS of a load's magnitude |F| over the cycle.
JointSummary summarizeLoad(std::string name, const Steps& steps, const StepValue& force)
{
    JointSummary out;
    out.name = std::move(name);
    out.peak = largest(steps, force);
    out.rms = timeRms(steps.all, force);
    return out;
}

JointSummary summarizeJoint(const CompiledMechanism& m, const Steps& steps, std::size_t j)
{
    JointSummary out =
        summarizeLoad(m.joints[j].name, steps, [j](const StepResult& s) { return s.joints[j].force.norm(); });
    if (m.joints[j].type == JointType::Slider)
        out.peakMoment = largest(steps, [j](const StepResult& s) { return std::abs(s.joints[j].moment); });
    return out;
}

// A cylinder's end is a pin: its load is summed up as a pin joint's.
JointSummary summarizeEnd(const CompiledMechanism& m, const Steps& steps, const CylinderEnd& end)
{
    return summarizeLoad(end.name, steps,
                         [&m, end](const StepResult& s) { return endReaction(m, s, end).force.norm(); });
}

// Only a value of the right sign is a peak power or a peak regenerative power.
Peak ofSign(Peak p, double sign)
{
    if (p.flagged.value * sign <= 0.0) p.flagged = {};
    if (p.value * sign <= 0.0) static_cast<PeakAt&>(p) = {};
    return p;
}

DriverSummary summarizeDriver(const CompiledMechanism& m, const Steps& steps, std::size_t d)
{
    const StepValue effort = [d](const StepResult& s) { return s.effort[d]; };
    const StepValue power = [d](const StepResult& s) { return s.power[d]; };
    DriverSummary out;
    out.name = m.drivers[d].name;
    out.type = m.drivers[d].type;
    out.peak = largestMagnitude(steps, effort);
    out.rms = timeRms(steps.all, effort);
    out.mean = timeMean(steps.all, effort);
    // Power delivered and regenerated are reported only where they occur.
    out.peakPower = ofSign(largest(steps, power), 1.0);
    out.peakRegenerative = ofSign(smallest(steps, power), -1.0);
    out.work = trapezoid(steps.all, power);
    std::tie(out.workIn, out.workOut) = positiveAndNegative(steps.all, power);
    return out;
}

TransmissionSummary summarizeTransmission(const CompiledMechanism& m, const CycleResult& r,
                                          const std::vector<bool>& flagged, std::size_t k)
{
    const auto extreme = [&](double sign) {
        PeakAt p;
        for (std::size_t i = 0; i < r.steps.size(); ++i)
            if (const double v = r.steps[i].transmissionDeg[k]; p.step < 0 || sign * v > sign * p.value)
                p = {v, int(i), flagged[i]};
        return p;
    };
    return {m.joints[r.transmissionPins[k].joint].name, extreme(-1.0), extreme(1.0)};
}

double totalDriverPower(const StepResult& s)
{
    double sum = 0.0;
    for (const double p : s.power) sum += p;
    return sum;
}

EnergyBalance balanceEnergy(const std::vector<StepResult>& steps, const std::vector<DriverSummary>& drivers)
{
    EnergyBalance e;
    if (steps.empty()) return e;
    const StepResult &first = steps.front(), &last = steps.back();
    e.driverWork = trapezoid(steps, totalDriverPower);
    e.kineticChange = last.kinetic - first.kinetic;
    e.gravityChange = last.gravityPotential - first.gravityPotential;
    e.springChange = last.springPotential - first.springPotential;
    e.damperWork = trapezoid(steps, [](const StepResult& s) { return s.damperDissipation; });
    e.loadWork = trapezoid(steps, [](const StepResult& s) { return s.appliedPower; });
    e.residual = e.driverWork - (e.kineticChange + e.gravityChange + e.springChange + e.damperWork - e.loadWork);
    for (const auto& d : drivers) e.throughput += d.workIn;
    e.throughput += positiveAndNegative(steps, [](const StepResult& s) { return s.appliedPower; }).first;
    e.throughput += std::max(0.0, -(e.kineticChange + e.gravityChange + e.springChange));
    e.relativeResidual = e.throughput > kNegligibleEnergy ? std::abs(e.residual) / e.throughput : 0.0;
    return e;
}

// The locking part at `step`: the right singular vector v of the smallest
// singular value of the balanced Jacobian J̃ (J̃ v ≈ 0) is the motion the
// drivers no longer control; the bodies with the largest share of it,
// |v_body| = ‖(v_x, v_y, v_φ)‖ (lengths and arcs alike, J̃ being balanced),
// are the ones that line up.
void nameLockingPart(const CompiledMechanism& m, const StepResult& step, NearToggle& toggle)
{
    const ConstraintSystem system(m);
    if (system.rows() == 0 || system.coordinates() == 0) return;
    Eigen::VectorXd phi(system.rows());
    std::vector<Eigen::Triplet<double>> entries;
    system.position(Pose(step.q), step.t, phi, &entries);
    Eigen::SparseMatrix<double> sparse(system.rows(), system.coordinates());
    sparse.setFromTriplets(entries.begin(), entries.end());
    const Eigen::MatrixXd jacobian(sparse);
    // Divide and conquer: the same vectors as one-sided Jacobi, far faster on large machines.
    const Eigen::BDCSVD<Eigen::MatrixXd> svd(jacobian, Eigen::ComputeFullV);
    const Eigen::VectorXd v = svd.matrixV().col(std::min(jacobian.rows(), jacobian.cols()) - 1);
    std::vector<std::pair<double, int>> share;
    for (std::size_t b = 0; b < m.bodies.size(); ++b)
        share.emplace_back(v.segment<3>(3 * Eigen::Index(b)).norm(), int(b));
    std::sort(share.begin(), share.end(), std::greater<>());
    for (std::size_t k = 0; k < 2 && k < share.size(); ++k) toggle.bodies[k] = share[k].second;
    for (std::size_t k = 0; k < m.joints.size() && toggle.bodies[1] != kGround; ++k) {
        const auto& j = m.joints[k];
        if ((j.body[0] == toggle.bodies[0] && j.body[1] == toggle.bodies[1]) ||
            (j.body[1] == toggle.bodies[0] && j.body[0] == toggle.bodies[1])) {
            toggle.joint = int(k);
            break;
        }
    }
}

std::vector<NearToggle> findToggles(const CompiledMechanism& m, const Steps& in)
{
    const auto& steps = in.all;
    std::vector<NearToggle> toggles;
    for (std::size_t i = 0; i < steps.size(); ++i) {
        if (!in.flagged[i]) continue;
        NearToggle t;
        t.first = t.worst = int(i);
        while (i + 1 < steps.size() && in.flagged[i + 1]) ++i;
        t.last = int(i);
        for (int k = t.first; k <= t.last; ++k)
            if (steps[k].reciprocalCondition < steps[t.worst].reciprocalCondition) t.worst = k;
        nameLockingPart(m, steps[t.worst], t);
        toggles.push_back(t);
    }
    return toggles;
}

}  // namespace

// A step flagged near singular by the solver is unreliable. So are the last
// steps of a cycle that stops where the links cannot be joined: that end is a
// limit (toggle) position, and approaching it the reactions grow far faster
// than the near-singular measure falls, so they can be huge before any step
// is flagged. The steps from the end back to where the measure is still at
// least half its median over the cycle are taken as ill-conditioned
// (a judgement: half the mechanism's own typical conditioning).
std::vector<bool> unreliableSteps(const CycleResult& r)
{
    const auto& steps = r.steps;
    std::vector<bool> flagged(steps.size());
    for (std::size_t i = 0; i < steps.size(); ++i) flagged[i] = steps[i].nearSingular;
    if (r.complete || steps.empty()) return flagged;
    std::vector<double> condition;
    for (const auto& s : steps) condition.push_back(s.reciprocalCondition);
    std::nth_element(condition.begin(), condition.begin() + condition.size() / 2, condition.end());
    const double half = 0.5 * condition[condition.size() / 2];
    for (std::size_t i = steps.size(); i-- > 0 && steps[i].reciprocalCondition < half;) flagged[i] = true;
    return flagged;
}

CycleSummary summarize(const CompiledMechanism& m, const CycleResult& r)
{
    CycleSummary out;
    out.unreliable = unreliableSteps(r);
    const Steps steps{r.steps, out.unreliable};
    for (std::size_t j = 0; j < m.joints.size(); ++j) out.joints.push_back(summarizeJoint(m, steps, j));
    for (const CylinderEnd& end : cylinderEnds(m)) out.cylinderEnds.push_back(summarizeEnd(m, steps, end));
    for (std::size_t d = 0; d < m.drivers.size(); ++d) out.drivers.push_back(summarizeDriver(m, steps, d));
    out.groundForce = largest(steps, [](const StepResult& s) { return s.groundForce.norm(); });
    out.groundMoment = largest(steps, [](const StepResult& s) { return std::abs(s.groundMoment); });
    for (std::size_t k = 0; k < r.transmissionPins.size(); ++k)
        out.transmission.push_back(summarizeTransmission(m, r, out.unreliable, k));
    out.energy = balanceEnergy(r.steps, out.drivers);
    for (const bool f : out.unreliable) out.nearSingularSteps += f ? 1 : 0;
    out.toggles = findToggles(m, steps);
    return out;
}

}  // namespace clevis
