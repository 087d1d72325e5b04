#include "core/solver/cycle_sweep.h"

#include "core/model/model_limits.h"
#include "core/results/drive_units.h"
#include "core/solver/analysis_error.h"
#include "core/solver/grashof_note.h"
#include "core/solver/mobility_check.h"
#include "core/solver/step_solver.h"

#include <algorithm>
#include <cmath>
#include <sstream>

namespace clevis {
namespace {

constexpr int kMaxBisections = 8;
// A converged pose this far from the extrapolated one (as a fraction of a
// body's size, or in radians) suggests Newton jumped to another assembly branch.
constexpr double kJumpFraction = 0.05;

// The largest move of any body from `from` to `to`, as a fraction of its own
// size L_b: the φ entries of the column scale hold 1/L_b (constraint_system.h).
double largestRelativeMove(const Eigen::VectorXd& from, const Eigen::VectorXd& to, const Eigen::VectorXd& columnScale)
{
    double largest = 0.0;
    for (Eigen::Index b = 0; 3 * b < to.size(); ++b) {
        const double inverseSize = columnScale[3 * b + 2];
        largest = std::max({largest, std::abs(to[3 * b] - from[3 * b]) * inverseSize,
                            std::abs(to[3 * b + 1] - from[3 * b + 1]) * inverseSize,
                            std::abs(to[3 * b + 2] - from[3 * b + 2])});
    }
    return largest;
}

bool finiteStep(const StepResult& s)
{
    if (!s.qd.allFinite() || !s.qdd.allFinite() || !s.lambda.allFinite()) return false;
    return true;
}

class Sweeper {
public:
    Sweeper(const CompiledMechanism& m, const SweepOptions& o)
        : mechanism_(m), options_(o), solver_(m), grashofNote_(grashofNote(m))
    {}
    CycleResult run();

private:
    void assembleDrawnPose(Eigen::VectorXd& q);
    Eigen::VectorXd predict(const StepResult& from, double t) const;
    bool advance(const StepResult& from, double t, StepResult& to, int depth);
    void flagCrossings();
    void warnNearSingular();
    void warnUnreachable(double tFail);
    void warnMassless();
    std::string drivePositions(const StepResult& s) const;
    std::string withGrashofNote(const std::string& message) const;

    const CompiledMechanism& mechanism_;
    const SweepOptions& options_;
    StepSolver solver_;
    CycleResult result_;
    bool branchWarned_ = false;
    const std::string grashofNote_;  // why a four-bar's drive cannot turn fully; empty otherwise
};

std::string Sweeper::withGrashofNote(const std::string& message) const
{
    return grashofNote_.empty() ? message : message + " " + grashofNote_;
}

std::string Sweeper::drivePositions(const StepResult& s) const
{
    std::string text;
    for (std::size_t d = 0; d < mechanism_.drivers.size(); ++d)
        text += (d ? ", " : "") + formatDrivePosition(mechanism_.drivers[d], s.drivePosition[d]);
    return text;
}

void Sweeper::assembleDrawnPose(Eigen::VectorXd& q)
{
    const Eigen::VectorXd drawn = q;
    if (solver_.assemble(0.0, q)) return;
    // Every joint is closed at the drawn pose by construction, so only a
    // driver can be open there; the gap that cannot be closed shows where
    // Newton stopped, with the drivers' positions (nearly) met.
    int row = 0;
    solver_.residual(q.allFinite() ? q : drawn, 0.0, &row);
    const auto& constraints = solver_.system().constraints();
    std::size_t k = constraints.size() - 1;
    while (k > 0 && solver_.system().firstRow(k) > row) --k;
    const Constraint& c = *constraints[k];
    const std::string name = c.owner() == ConstraintOwner::Joint ? mechanism_.joints[c.ownerIndex()].name
                                                                 : mechanism_.drivers[c.ownerIndex()].name;
    throw AnalysisError(withGrashofNote("The mechanism does not assemble at the start of the cycle: the links cannot "
                                        "all be joined near the drawn pose (largest gap at \"" +
                                        name + "\"). Check the link lengths and where the drivers start."),
                        {name});
}

// The pose at t from Taylor's series about `from` to third order, the jerk
// taken from the change of acceleration since the step before (which puts
// the first Newton residual about thirty times lower than second order does
// on the flap folder). At a near-singular pose velocities and accelerations
// are unreliable (Φ_q hardly determines them): from one, the secant through
// the step before is followed instead, which keeps the drawn branch through
// a change point; after one, the jerk is left out.
Eigen::VectorXd Sweeper::predict(const StepResult& from, double t) const
{
    const double h = t - from.t;
    const auto& steps = result_.steps;
    const bool fromStored = !steps.empty() && &from == &steps.back();
    const StepResult* before = fromStored ? (steps.size() >= 2 ? &steps[steps.size() - 2] : nullptr)
                                          : (steps.empty() ? nullptr : &steps.back());
    if (from.nearSingular && before && before->t < from.t)
        return from.q + (h / (from.t - before->t)) * (from.q - before->q);
    Eigen::VectorXd q = from.q + h * from.qd + 0.5 * h * h * from.qdd;
    if (before && before->t < from.t && !before->nearSingular)
        q += (h * h * h / (6.0 * (from.t - before->t))) * (from.qdd - before->qdd);
    return q;
}

// Newton from the previous step's pose extrapolated to t; on failure or a
// suspicious jump, reach t in two halves.
bool Sweeper::advance(const StepResult& from, double t, StepResult& to, int depth)
{
    const Eigen::VectorXd guess = predict(from, t);
    const double h = t - from.t;
    Eigen::VectorXd q = guess;
    const bool converged = solver_.assemble(t, q);
    const bool suspicious = converged && largestRelativeMove(guess, q, solver_.system().columnScale()) > kJumpFraction;
    if (converged && (!suspicious || depth >= kMaxBisections)) {
        to = solver_.analyse(t, q);
        if (suspicious && !branchWarned_) {
            branchWarned_ = true;
            result_.warnings.push_back(
                {"branch_jump",
                 "The pose changed abruptly near " + drivePositions(to) +
                     ": the mechanism may have snapped to another assembly branch. Use more steps.",
                 int(result_.steps.size())});
        }
        return finiteStep(to);
    }
    if (depth >= kMaxBisections) return false;
    StepResult middle;
    if (!advance(from, from.t + 0.5 * h, middle, depth + 1)) return false;
    return advance(middle, t, to, depth + 1);
}

// Steps can land on either side of a toggle without coming near it; the
// sign of det Φ_q still tells that a singular position lies between two
// steps, and both are flagged (unless one of them is already flagged as
// being at it).
void Sweeper::flagCrossings()
{
    auto& steps = result_.steps;
    for (std::size_t i = 1; i < steps.size(); ++i) {
        StepResult& before = steps[i - 1];
        StepResult& after = steps[i];
        if (before.jacobianSign != after.jacobianSign && !before.nearSingular && !after.nearSingular)
            before.nearSingular = after.nearSingular = true;
    }
}

void Sweeper::warnNearSingular()
{
    flagCrossings();
    const auto& steps = result_.steps;
    for (std::size_t i = 0; i < steps.size(); ++i) {
        if (!steps[i].nearSingular) continue;
        std::size_t last = i;
        while (last + 1 < steps.size() && steps[last + 1].nearSingular) ++last;
        // From the first step to the last of a full cycle both ends show the
        // same drive position, which would read as a range of nothing.
        const bool everyStep = i == 0 && last + 1 == steps.size();
        std::ostringstream s;
        s << "Near a singular position (dead centre or toggle) ";
        if (everyStep) s << (result_.complete ? "over the whole cycle" : "at every step solved");
        else s << "from " << drivePositions(steps[i]) << " to " << drivePositions(steps[last]);
        s << " (steps " << i << "–" << last
          << "): the linkage locks up or loses control there and the reactions are unreliable.";
        result_.warnings.push_back({"near_singular", withGrashofNote(s.str()), int(i)});
        i = last;
    }
}

// A body drawn but not yet given a section, a plate or a mass moves with no
// weight and no inertia: the reactions leave it out, which is right for a
// light link chosen so, and wrong for one forgotten.
void Sweeper::warnMassless()
{
    constexpr std::size_t kNamed = 5;
    std::vector<std::string> names;
    for (const CompiledBody& b : mechanism_.bodies)
        if (b.mass.mass == 0.0 && b.mass.inertia == 0.0) names.push_back(b.name);
    if (names.empty()) return;
    std::string list;
    for (std::size_t i = 0; i < std::min(names.size(), kNamed); ++i)
        list += (i == 0 ? "" : i + 1 == names.size() ? " and " : ", ") + names[i];
    if (names.size() > kNamed) list += " and " + std::to_string(names.size() - kNamed) + " more";
    result_.warnings.push_back(
        {"massless_bodies",
         (names.size() == 1 ? "No mass is given for " + list + ": it carries"
                            : "No mass is given for " + list + ": they carry") +
             " no weight and no inertia load, and the reactions and drive effort leave them out. Give each a bar "
             "section, a plate or its mass properties, unless it is light enough to neglect.",
         -1});
}

void Sweeper::warnUnreachable(double tFail)
{
    const StepResult& last = result_.steps.back();
    std::ostringstream s;
    s << "The cycle cannot be completed: the mechanism can be assembled only from "
      << drivePositions(result_.steps.front()) << " to " << drivePositions(last) << " (t = " << last.t << " s of "
      << mechanism_.duration << " s); beyond, near t = " << tFail
      << " s, the links cannot be joined. Results stop there.";
    result_.warnings.push_back({"out_of_reach", withGrashofNote(s.str()), int(result_.steps.size())});
}

CycleResult Sweeper::run()
{
    if (mechanism_.bodies.empty())
        throw AnalysisError(
            "There is nothing to analyse: the mechanism has no moving bodies. Add a body and join it "
            "to ground.",
            {});
    const int steps = !options_.times.empty() ? int(options_.times.size()) - 1
                      : options_.steps > 0    ? options_.steps
                                              : mechanism_.steps;
    const ModelSize size{mechanism_.bodies.size(), mechanism_.joints.size(), mechanism_.drivers.size(), 0, steps};
    if (const auto exceeded = exceededLimit(size))
        throw AnalysisError("Cannot analyse: " + exceeded->message + ".", {});
    result_.plannedSteps = steps;
    result_.duration = mechanism_.duration;
    result_.transmissionPins = solver_.transmissionPins();
    Eigen::VectorXd q = solver_.drawnPose();
    const MobilityReport mobility = solver_.regularAt(q, 0.0) ? MobilityReport{} : checkMobility(mechanism_, q);
    if (!mobility.ok()) {
        std::vector<std::string> items = mobility.freeBodies;
        for (const auto& g : mobility.redundantGroups) items.insert(items.end(), g.begin(), g.end());
        items.insert(items.end(), mobility.conflictingDrivers.begin(), mobility.conflictingDrivers.end());
        throw AnalysisError(mobility.describe(), items);
    }
    assembleDrawnPose(q);
    warnMassless();
    result_.steps.reserve(steps + 1);
    result_.steps.push_back(solver_.analyse(0.0, q));
    if (!finiteStep(result_.steps.back()))
        throw AnalysisError(
            "The mechanism is locked at the start of the cycle: its constraint equations are singular there.", {});
    result_.complete = true;
    for (int k = 1; k <= steps; ++k) {
        const double t = options_.times.empty() ? mechanism_.duration * double(k) / double(steps) : options_.times[k];
        StepResult next;
        if (!advance(result_.steps.back(), t, next, 0)) {
            result_.complete = false;
            warnUnreachable(t);
            break;
        }
        result_.steps.push_back(std::move(next));
        if (options_.progress && !options_.progress(k, steps)) {
            result_.complete = false;
            result_.warnings.push_back({"stopped", "Stopped before the end of the cycle.", k});
            break;
        }
    }
    warnNearSingular();
    return std::move(result_);
}

}  // namespace

CycleResult sweepCycle(const CompiledMechanism& m, const SweepOptions& options) { return Sweeper(m, options).run(); }

}  // namespace clevis
