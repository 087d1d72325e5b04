#include "core/solver/mobility_check.h"

#include "core/solver/row_dependence.h"
#include "core/solver/step_solver.h"

#include <set>
#include <sstream>

namespace clevis {
namespace {

std::string ownerName(const CompiledMechanism& m, const ConstraintSystem& s, int row)
{
    for (std::size_t k = s.constraints().size(); k-- > 0;)
        if (s.firstRow(k) <= row) {
            const Constraint& c = *s.constraints()[k];
            return c.owner() == ConstraintOwner::Joint ? m.joints[c.ownerIndex()].name : m.drivers[c.ownerIndex()].name;
        }
    return "?";
}

// The rows of the joints, which come before the drivers' (constraint_system.h).
int jointRows(const ConstraintSystem& s)
{
    for (std::size_t k = 0; k < s.constraints().size(); ++k)
        if (s.constraints()[k]->owner() == ConstraintOwner::Driver) return s.firstRow(k);
    return s.rows();
}

std::set<std::string> ownerNames(const CompiledMechanism& m, const ConstraintSystem& s, const DependentRow& d)
{
    std::set<std::string> names{ownerName(m, s, d.row)};
    for (const int row : d.repeats) names.insert(ownerName(m, s, row));
    return names;
}

int grueblerCount(const CompiledMechanism& m)
{
    int dof = 3 * int(m.bodies.size());
    for (const auto& j : m.joints) dof -= j.type == JointType::PinInSlot ? 1 : 2;
    return dof;
}

std::string joinNames(const std::vector<std::string>& names)
{
    std::string s;
    for (std::size_t i = 0; i < names.size(); ++i) s += (i ? ", " : "") + names[i];
    return s;
}

}  // namespace

// Where the drivers' square Jacobian factors and is well conditioned (the
// test that starts every cycle, step_solver.h), every row is independent: no
// joint is redundant, no body free and no driver in conflict, and the
// joints' rank is their row count. Only otherwise are the dependent rows and
// the null space sought (row_dependence.h).
MobilityReport checkMobility(const CompiledMechanism& m, const Eigen::VectorXd& q)
{
    MobilityReport r;
    r.gruebler = grueblerCount(m);
    r.drivers = int(m.drivers.size());

    StepSolver solver(m);
    const ConstraintSystem& all = solver.system();
    const int joints = jointRows(all);
    if (solver.regularAt(q, 0.0)) {
        r.mobility = all.coordinates() - joints;
        return r;
    }
    Eigen::VectorXd phi;
    std::vector<Eigen::Triplet<double>> entries;
    all.position(q, 0.0, phi, &entries);
    const RowDependence d = rowDependence(all.rows(), all.coordinates(), entries, joints);

    std::set<std::string> conflicting;
    for (const DependentRow& dependent : d.dependent) {
        const std::set<std::string> names = ownerNames(m, all, dependent);
        if (dependent.row < joints) r.redundantGroups.emplace_back(names.begin(), names.end());
        for (const auto& name : names)
            for (const auto& driver : m.drivers)
                if (driver.name == name) conflicting.insert(name);
    }
    r.redundantEquations = joints - d.leadingRank;
    r.mobility = all.coordinates() - d.leadingRank;
    if (r.redundantGroups.empty()) r.conflictingDrivers.assign(conflicting.begin(), conflicting.end());
    for (std::size_t b = 0; b < m.bodies.size(); ++b)
        if (d.nullSpaceReaches[3 * b] || d.nullSpaceReaches[3 * b + 1] || d.nullSpaceReaches[3 * b + 2])
            r.freeBodies.push_back(m.bodies[b].name);
    r.singularPose = r.redundantGroups.empty() && r.mobility == r.drivers && d.rank < all.coordinates();
    return r;
}

std::string MobilityReport::describe() const
{
    std::ostringstream s;
    s << "Degrees of freedom: " << mobility << " (Gruebler's count " << gruebler << "), drivers: " << drivers << ".";
    if (mobility != gruebler && redundantGroups.empty())
        s << " The count and the Jacobian's rank differ: the drawn geometry is special (parallel or aligned links).";
    for (const auto& g : redundantGroups)
        s << "\nRedundant constraint: joints " << joinNames(g)
          << " fix the same motion twice, so their reactions are statically indeterminate;"
             " free one of them (for example, a pin in a slot instead of a pin).";
    if (singularPose) {
        s << "\nThe drawn pose is a dead centre or toggle for driver(s) " << joinNames(conflictingDrivers)
          << ": there they cannot control " << joinNames(freeBodies)
          << ", and which way the mechanism would go is undetermined. Draw it a little away from that position"
             " or start the drivers elsewhere.";
        return s.str();
    }
    if (!freeBodies.empty())
        s << "\n"
          << (mobility - drivers > 0 ? mobility - drivers : 1)
          << " degree(s) of freedom not driven: with every driver held, " << joinNames(freeBodies)
          << " can still move. Add a driver or a joint.";
    if (!conflictingDrivers.empty())
        s << "\nDrivers " << joinNames(conflictingDrivers)
          << " over-constrain the mechanism: they prescribe motion the joints already fix or that another driver sets."
             " Remove one or drive another joint.";
    return s.str();
}

}  // namespace clevis
