// LU factorisation with partial pivoting of a band matrix: the Jacobian of a
// long linkage, once its rows and columns are put in band order
// (band_ordering.h), has a few diagonals on each side of the main one, and
// elimination within the band costs n·kl·(kl + ku) instead of the cube of n.
//
// Storage follows LAPACK's xGBTRF: by columns, element (i, j) at
// ab[kl + ku + i − j + j·ld] with ld = 2·kl + ku + 1. The top kl rows of
// each column start empty and take U's fill-in from row swaps, so U has
// kl + ku diagonals above the main one.
#pragma once

#include <vector>

namespace clevis {

class BandLu {
public:
    // An n×n matrix with `lower` diagonals below and `upper` above the main one.
    void reshape(int n, int lower, int upper);
    int size() const { return n_; }
    int lower() const { return kl_; }
    int upper() const { return ku_; }

    // Where element (i, j) of the band (|i − j| within it) is kept in values().
    int slot(int i, int j) const { return kl_ + ku_ + i - j + j * ld_; }
    double* values() { return ab_.data(); }
    const double* values() const { return ab_.data(); }
    void setZero();

    // A = P·L·U in place; false if a pivot is zero (A singular).
    bool factor();
    void solveInPlace(double* b) const;            // A x = b
    void solveTransposedInPlace(double* b) const;  // Aᵀ x = b
    double minPivot() const { return minPivot_; }  // smallest |U_kk|
    double maxPivot() const { return maxPivot_; }
    // Sign of det A: the pivots' signs times (−1) per row swap.
    int determinantSign() const { return sign_; }

private:
    double& at(int i, int j) { return ab_[slot(i, j)]; }
    double at(int i, int j) const { return ab_[slot(i, j)]; }
    int pivotRow(int j, int last) const;
    void swapRows(int j, int p, int lastColumn);

    int n_ = 0, kl_ = 0, ku_ = 0, ld_ = 1;
    std::vector<double> ab_;
    std::vector<int> pivot_;               // row swapped with row k at step k
    std::vector<double> inverseDiagonal_;  // 1/U_kk: the solves multiply
    double minPivot_ = 0.0, maxPivot_ = 0.0;
    int sign_ = 1;
};

}  // namespace clevis
