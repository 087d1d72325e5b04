#include "small_lu.h"

#include <cmath>
#include <utility>

namespace clevis {

// Raw column-major loops: element (i, j) is a[i + j·n]. Going through pointers
// lets the compiler keep them in registers instead of reloading the matrix's
// data pointer on every access.
bool SmallLu::compute(const Eigen::MatrixXd& matrix)
{
    lu_ = matrix;
    const int n = int(matrix.rows());
    pivot_.resize(n);
    inverseDiagonal_.resize(n);
    double* a = lu_.data();
    minPivot_ = n ? INFINITY : 0.0;
    maxPivot_ = 0.0;
    sign_ = 1;
    for (int k = 0; k < n; ++k) {
        double* colK = a + k * n;
        int p = k;
        for (int i = k + 1; i < n; ++i)
            if (std::abs(colK[i]) > std::abs(colK[p])) p = i;
        pivot_[k] = p;
        if (p != k) {
            for (int j = 0; j < n; ++j) std::swap(a[k + j * n], a[p + j * n]);
            sign_ = -sign_;
        }
        const double ukk = colK[k];
        if (ukk < 0.0) sign_ = -sign_;
        minPivot_ = std::min(minPivot_, std::abs(ukk));
        maxPivot_ = std::max(maxPivot_, std::abs(ukk));
        if (ukk == 0.0) return false;
        const double inverse = 1.0 / ukk;
        inverseDiagonal_[k] = inverse;
        for (int i = k + 1; i < n; ++i) colK[i] *= inverse;
        for (int j = k + 1; j < n; ++j) {
            double* colJ = a + j * n;
            const double ukj = colJ[k];
            if (ukj == 0.0) continue;
            for (int i = k + 1; i < n; ++i) colJ[i] -= colK[i] * ukj;
        }
    }
    return true;
}

// x = U⁻¹ L⁻¹ P b.
void SmallLu::solveInPlace(Eigen::VectorXd& rhs) const
{
    const int n = int(lu_.rows());
    const double* a = lu_.data();
    double* b = rhs.data();
    for (int k = 0; k < n; ++k) std::swap(b[k], b[pivot_[k]]);
    for (int j = 0; j < n; ++j) {
        const double bj = b[j];
        for (int i = j + 1; i < n; ++i) b[i] -= a[i + j * n] * bj;
    }
    const double* inverseDiagonal = inverseDiagonal_.data();
    for (int j = n - 1; j >= 0; --j) {
        const double bj = b[j] * inverseDiagonal[j];
        b[j] = bj;
        for (int i = 0; i < j; ++i) b[i] -= a[i + j * n] * bj;
    }
}

// Aᵀ = Uᵀ Lᵀ P, so x = Pᵀ L⁻ᵀ U⁻ᵀ b.
void SmallLu::solveTransposedInPlace(Eigen::VectorXd& rhs) const
{
    const int n = int(lu_.rows());
    const double* a = lu_.data();
    double* b = rhs.data();
    const double* inverseDiagonal = inverseDiagonal_.data();
    for (int i = 0; i < n; ++i) {
        double s = b[i];
        for (int k = 0; k < i; ++k) s -= a[k + i * n] * b[k];
        b[i] = s * inverseDiagonal[i];
    }
    for (int i = n - 1; i >= 0; --i) {
        double s = b[i];
        for (int k = i + 1; k < n; ++k) s -= a[k + i * n] * b[k];
        b[i] = s;
    }
    for (int k = n - 1; k >= 0; --k) std::swap(b[k], b[pivot_[k]]);
}

}  // namespace clevis
