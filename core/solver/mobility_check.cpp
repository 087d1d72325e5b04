#include "core/solver/mobility_check.h"

#include "core/solver/constraint_system.h"
#include "core/solver/row_dependence.h"

#include <set>
#include <sstream>

namespace clevis {
namespace {

// The joint or driver that writes `row`: the last constraint starting at or before it.
std::string ownerName(const CompiledMechanism& m, const ConstraintSystem& s, int row)
{
    std::size_t lo = 0, hi = s.constraints().size();  // constraint lo starts at or before row; hi after
    while (hi - lo > 1) {
        const std::size_t mid = (lo + hi) / 2;
        (s.firstRow(mid) <= row ? lo : hi) = mid;
    }
    const Constraint& c = *s.constraints()[lo];
    return c.owner() == ConstraintOwner::Joint ? m.joints[c.ownerIndex()].name : m.drivers[c.ownerIndex()].name;
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

// One factorisation of the whole Jacobian, the joints' rows first
// (row_dependence.h): their rank and dependent rows are the joints' own, the
// rest the drivers', and its null space names the bodies left free.
MobilityReport checkMobility(const CompiledMechanism& m, const Eigen::VectorXd& q)
{
    MobilityReport r;
    r.gruebler = grueblerCount(m);
    r.drivers = int(m.drivers.size());

    const ConstraintSystem all(m, true);
    const int joints = jointRows(all);
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
