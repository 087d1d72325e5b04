#include "core/solver/mobility_check.h"

#include "core/solver/constraint_system.h"

#include <Eigen/Dense>
#include <set>
#include <sstream>

namespace clevis {
namespace {

constexpr double kRankTolerance = 1e-9;

Eigen::MatrixXd denseJacobian(const ConstraintSystem& s, const Eigen::VectorXd& q)
{
    Eigen::VectorXd phi;
    std::vector<Eigen::Triplet<double>> entries;
    s.position(q, 0.0, phi, &entries);
    Eigen::MatrixXd j = Eigen::MatrixXd::Zero(s.rows(), s.coordinates());
    for (const auto& e : entries) j(e.row(), e.col()) += e.value();
    return j;
}

std::string ownerName(const CompiledMechanism& m, const ConstraintSystem& s, int row)
{
    for (std::size_t k = s.constraints().size(); k-- > 0;)
        if (s.firstRow(k) <= row) {
            const Constraint& c = *s.constraints()[k];
            return c.owner() == ConstraintOwner::Joint ? m.joints[c.ownerIndex()].name : m.drivers[c.ownerIndex()].name;
        }
    return "?";
}

// Rows of J that depend on earlier-chosen ones, each with the rows it is a
// combination of: column-pivoted QR of Jᵀ picks the independent rows first.
std::vector<std::set<std::string>> dependentGroups(const CompiledMechanism& m, const ConstraintSystem& s,
                                                   const Eigen::MatrixXd& j, int& rank)
{
    std::vector<std::set<std::string>> groups;
    // Eigen's decompositions read past an empty matrix: no constraints, no rank.
    rank = 0;
    if (j.rows() == 0) return groups;
    Eigen::ColPivHouseholderQR<Eigen::MatrixXd> qr(j.transpose());
    qr.setThreshold(kRankTolerance);
    rank = int(qr.rank());
    if (rank == j.rows()) return groups;
    const auto& perm = qr.colsPermutation().indices();
    if (rank == 0) {  // every row is zero: each depends on nothing else
        for (int d = 0; d < j.rows(); ++d) groups.push_back({ownerName(m, s, perm[d])});
        return groups;
    }
    Eigen::MatrixXd independent(j.cols(), rank);
    for (int i = 0; i < rank; ++i) independent.col(i) = j.row(perm[i]).transpose();
    const Eigen::ColPivHouseholderQR<Eigen::MatrixXd> basis(independent);
    for (int d = rank; d < j.rows(); ++d) {
        const Eigen::VectorXd coeff = basis.solve(Eigen::VectorXd(j.row(perm[d]).transpose()));
        std::set<std::string> group{ownerName(m, s, perm[d])};
        for (int i = 0; i < rank; ++i)
            if (std::abs(coeff[i]) > 1e-7) group.insert(ownerName(m, s, perm[i]));
        groups.push_back(group);
    }
    return groups;
}

std::vector<std::string> movingBodies(const CompiledMechanism& m, const Eigen::MatrixXd& j)
{
    std::vector<std::string> bodies;
    if (j.rows() == 0) {  // nothing holds any body (and Eigen cannot factor an empty matrix)
        for (const auto& b : m.bodies) bodies.push_back(b.name);
        return bodies;
    }
    const Eigen::FullPivLU<Eigen::MatrixXd> lu = Eigen::FullPivLU<Eigen::MatrixXd>(j).setThreshold(kRankTolerance);
    const Eigen::MatrixXd kernel = lu.kernel();
    if (lu.rank() == j.cols()) return bodies;
    for (std::size_t b = 0; b < m.bodies.size(); ++b)
        if (kernel.middleRows(3 * b, 3).cwiseAbs().maxCoeff() > 1e-7) bodies.push_back(m.bodies[b].name);
    return bodies;
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

MobilityReport checkMobility(const CompiledMechanism& m, const Eigen::VectorXd& q)
{
    MobilityReport r;
    r.gruebler = grueblerCount(m);
    r.drivers = int(m.drivers.size());

    const ConstraintSystem joints(m, false);
    int jointRank = 0;
    for (const auto& g : dependentGroups(m, joints, denseJacobian(joints, q), jointRank))
        r.redundantGroups.emplace_back(g.begin(), g.end());
    r.redundantEquations = joints.rows() - jointRank;
    r.mobility = joints.coordinates() - jointRank;

    const ConstraintSystem all(m, true);
    const Eigen::MatrixXd full = denseJacobian(all, q);
    int fullRank = 0;
    std::set<std::string> conflicting;
    for (const auto& g : dependentGroups(m, all, full, fullRank))
        for (const auto& name : g)
            for (const auto& d : m.drivers)
                if (d.name == name) conflicting.insert(name);
    if (r.redundantGroups.empty()) r.conflictingDrivers.assign(conflicting.begin(), conflicting.end());
    r.freeBodies = movingBodies(m, full);
    r.singularPose = r.redundantGroups.empty() && r.mobility == r.drivers && fullRank < all.coordinates();
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
