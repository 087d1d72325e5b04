// LU factorisation of the square, scaled constraint Jacobian J̃, with solves
// of Φ_q x = b and Φ_qᵀ y = f in the original units (see constraint_system.h).
//
// Small systems use a dense partial-pivoting LU (small_lu.h), which measures faster there;
// larger ones a sparse LU whose pattern is analysed once, so the cost per step
// grows about linearly with the number of bodies.
#pragma once

#include "small_lu.h"

#include <Eigen/Dense>
#include <Eigen/SparseCore>
#include <Eigen/SparseLU>
#include <vector>

namespace clevis {

class JacobianFactor {
public:
    // Systems up to this many coordinates take the dense path.
    static constexpr int kDenseLimit = 60;

    JacobianFactor(const Eigen::VectorXd& rowScale, const Eigen::VectorXd& columnScale);

    // False when the factorisation breaks down (a numerically singular matrix).
    bool factor(int size, const std::vector<Eigen::Triplet<double>>& scaledEntries);

    Eigen::VectorXd solve(const Eigen::VectorXd& b) const;            // x with Φ_q x = b
    Eigen::VectorXd solveTransposed(const Eigen::VectorXd& f) const;  // y with Φ_qᵀ y = f
    void solveInPlace(Eigen::VectorXd& b) const;
    // Reciprocal 1-norm condition number estimate of J̃ (Hager–Higham).
    // It starts from the column that was worst in the previous estimate: from
    // one step of a cycle to the next that column rarely changes, and the
    // estimate then needs one solve pair instead of two.
    double reciprocalCondition();
    // Sign of det J̃ (the scaling is positive, so also of det Φ_q): it flips
    // only where the Jacobian passes through a singular position.
    int determinantSign() const;

private:
    void solveScaledInPlace(Eigen::VectorXd& b) const;
    void solveScaledTransposedInPlace(Eigen::VectorXd& b) const;
    void fillSparse(int size, const std::vector<Eigen::Triplet<double>>& entries);
    bool samePattern(int size, const std::vector<Eigen::Triplet<double>>& entries) const;

    // Where each written entry lands among the sparse matrix's nonzeros.
    struct EntrySlot {
        int row, col, slot;
    };

    Eigen::VectorXd rowScale_, columnScale_;
    bool dense_ = true;
    double norm1_ = 0.0;
    Eigen::Index worstColumn_ = -1;          // of the last condition estimate
    Eigen::VectorXd columnSums_, x_, y_, z_;  // scratch, kept to avoid allocations
    SmallLu denseLu_;
    Eigen::MatrixXd denseMatrix_;
    mutable Eigen::SparseLU<Eigen::SparseMatrix<double>, Eigen::COLAMDOrdering<int>> sparseLu_;
    Eigen::SparseMatrix<double> sparseMatrix_;
    std::vector<EntrySlot> pattern_;
};

}  // namespace clevis
