// LU factorisation with partial pivoting for the small dense Jacobians of
// everyday linkages (a four-bar has 9 coordinates). For such sizes Eigen's
// general blocked LU spends most of its time on bookkeeping; these plain
// loops measure several times faster (see clevis-bench).
#pragma once

#include <Eigen/Core>
#include <vector>

namespace clevis {

class SmallLu {
public:
    // P·A = L·U; false if a pivot is zero (A singular).
    bool compute(const Eigen::MatrixXd& a);
    void solveInPlace(Eigen::VectorXd& b) const;            // A x = b
    void solveTransposedInPlace(Eigen::VectorXd& b) const;  // Aᵀ x = b
    // Smallest and largest |U_kk|.
    double minPivot() const { return minPivot_; }
    double maxPivot() const { return maxPivot_; }
    // Sign of det A: the pivots' signs times (−1) per row swap.
    int determinantSign() const { return sign_; }

private:
    Eigen::MatrixXd lu_;
    std::vector<int> pivot_;                // row swapped with row k at step k
    std::vector<double> inverseDiagonal_;  // 1/U_kk: the solves multiply
    double minPivot_ = 0.0, maxPivot_ = 0.0;
    int sign_ = 1;
};

}  // namespace clevis
