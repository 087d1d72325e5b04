// LU factorisation of the square, scaled constraint Jacobian J̃, with solves
// of Φ_q x = b and Φ_qᵀ y = f in the original units (see constraint_system.h).
//
// Two ways, chosen once per pattern of nonzeros:
// - a band LU (band_lu.h) after a bandwidth-reducing order (band_ordering.h)
//   when the rows and columns gather into a narrow band, as the Jacobian of
//   a chain of links does, so the cost per step grows linearly with the
//   number of bodies. Everyday linkages of a few bodies take this path too:
//   a dense LU measured no faster there (flap folder, 10-body chain);
// - otherwise (many bodies tied to one, say) Eigen's sparse LU.
#pragma once

#include "core/solver/band_lu.h"
#include "core/solver/band_ordering.h"

#include <Eigen/Dense>
#include <Eigen/SparseCore>
#include <Eigen/SparseLU>
#include <vector>

namespace clevis {

class JacobianFactor {
public:
    enum class Method { Band, Sparse };

    // The band path is taken while its elimination work per column,
    // kl·(kl + ku + 1) multiply-adds, stays under this: on clevis-bench's fan
    // of four-bars the two paths cost the same at 14 loops (kl = 29, ku = 26).
    static constexpr int kBandWorkLimit = 1500;

    JacobianFactor(const Eigen::VectorXd& rowScale, const Eigen::VectorXd& columnScale);

    // False when the factorisation breaks down (a numerically singular matrix).
    bool factor(int size, const std::vector<Eigen::Triplet<double>>& scaledEntries);
    Method method() const { return method_; }

    Eigen::VectorXd solve(const Eigen::VectorXd& b) const;            // x with Φ_q x = b
    Eigen::VectorXd solveTransposed(const Eigen::VectorXd& f) const;  // y with Φ_qᵀ y = f
    void solveInPlace(Eigen::VectorXd& b) const;
    // Estimate of ‖J̃⁻¹‖₁ (Hager–Higham), a lower bound good to a small
    // factor. It starts from the column that was worst in the previous
    // estimate: from one step of a cycle to the next that column rarely
    // changes, and the estimate then needs one solve pair instead of two.
    double inverseNorm1();
    // Sign of det J̃ (the scaling is positive, so also of det Φ_q): it flips
    // only where the Jacobian passes through a singular position.
    int determinantSign() const;

private:
    bool factorBand(const std::vector<Eigen::Triplet<double>>& entries);
    bool factorSparse(const std::vector<Eigen::Triplet<double>>& entries);
    void learnPattern(int size, const std::vector<Eigen::Triplet<double>>& entries);
    bool samePattern(int size, const std::vector<Eigen::Triplet<double>>& entries) const;
    void solveScaledInPlace(Eigen::VectorXd& b) const;
    void solveScaledTransposedInPlace(Eigen::VectorXd& b) const;
    void gather(const Eigen::VectorXd& b, const std::vector<int>& at) const;  // permuted_[i] = b[at[i]]
    void scatter(Eigen::VectorXd& b, const std::vector<int>& at) const;       // b[at[i]] = permuted_[i]

    // Where each written entry lands among the band's or the sparse matrix's values.
    struct EntrySlot {
        int row, col, slot;
    };

    Eigen::VectorXd rowScale_, columnScale_;
    Method method_ = Method::Band;
    Eigen::Index worstColumn_ = -1;  // of the last estimate of ‖J̃⁻¹‖₁
    Eigen::VectorXd x_, y_, z_;      // scratch, kept to avoid allocations
    int patternSize_ = -1;
    std::vector<EntrySlot> pattern_;
    BandOrdering order_;
    BandLu bandLu_;
    mutable Eigen::VectorXd permuted_;  // the band solves' right-hand side, in band order
    mutable Eigen::SparseLU<Eigen::SparseMatrix<double>, Eigen::COLAMDOrdering<int>> sparseLu_;
    Eigen::SparseMatrix<double> sparseMatrix_;
};

}  // namespace clevis
