#include "core/solver/reduced_mechanism.h"

#include "core/results/drive_units.h"
#include "core/solver/analysis_error.h"

namespace clevis {
namespace {

constexpr int kMaxHalvings = 8;

CompiledMechanism atUnitSpeed(const CompiledMechanism& m)
{
    CompiledMechanism unit = m;
    unit.drivers.front().motion = ConstantSpeed{1.0, 0.0};
    unit.drivers.front().found.clear();
    return unit;
}

}  // namespace

ReducedMechanism::ReducedMechanism(const CompiledMechanism& m)
    : unit_(atUnitSpeed(m)), solver_(unit_), q_(solver_.drawnPose()), theta_(unit_.drivers.front().offset)
{
    if (!solver_.assemble(0.0, q_) || !solver_.rates(0.0, q_, qd_, qdd_))
        throw AnalysisError("The mechanism does not assemble at the start of the cycle.", {unit_.drivers.front().name});
}

// Newton from the last pose carried on by Taylor's series in θ; where that
// fails, the way is halved.
bool ReducedMechanism::reach(double theta, int depth)
{
    const double t0 = unit_.drivers.front().offset;
    const double h = theta - theta_;
    guess_ = q_ + h * qd_ + 0.5 * h * h * qdd_;
    if (solver_.assemble(theta - t0, guess_)) {
        VectorXd qd, qdd;
        if (!solver_.rates(theta - t0, guess_, qd, qdd)) return false;
        q_.swap(guess_);
        qd_.swap(qd);
        qdd_.swap(qdd);
        theta_ = theta;
        return true;
    }
    if (depth >= kMaxHalvings) return false;
    return reach(theta_ + 0.5 * h, depth + 1) && reach(theta, depth + 1);
}

ReducedTerms ReducedMechanism::at(double theta)
{
    const CompiledDriver& d = unit_.drivers.front();
    if (theta != theta_ && !reach(theta, 0))
        throw AnalysisError("The mechanism cannot be assembled at " + formatDrivePosition(d, theta) +
                                ": a motor can drive only a mechanism whose driver turns fully.",
                            {d.name});
    ReducedTerms out;
    for (std::size_t b = 0; b < unit_.bodies.size(); ++b) {
        const auto& mp = unit_.bodies[b].mass;
        const auto v = qd_.segment<3>(3 * Eigen::Index(b));
        const auto a = qdd_.segment<3>(3 * Eigen::Index(b));
        out.inertia += mp.mass * v.head<2>().squaredNorm() + mp.inertia * v[2] * v[2];
        out.inertiaSlope += 2.0 * (mp.mass * v.head<2>().dot(a.head<2>()) + mp.inertia * v[2] * a[2]);
    }
    const Pose pose(q_);
    const std::vector<double> position{theta};
    const VectorXd still = VectorXd::Zero(q_.size());
    out.force = qd_.dot(generalizedForces(unit_, q_, appliedLoads(unit_, pose, still, 0.0, position)));
    if (!unit_.dampers.empty())
        out.damping = qd_.dot(generalizedForces(unit_, q_, appliedLoads(unit_, pose, qd_, 0.0, position))) - out.force;
    return out;
}

}  // namespace clevis
