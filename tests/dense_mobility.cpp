#include "tests/dense_mobility.h"

#include "core/solver/constraint_system.h"

#include <Eigen/Dense>
#include <set>

namespace clevis::test {
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

}  // namespace

MobilityReport denseMobility(const CompiledMechanism& m, const Eigen::VectorXd& q)
{
    MobilityReport r;
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

}  // namespace clevis::test
