#include "core/solver/band_lu.h"

#include <algorithm>
#include <cmath>
#include <utility>

namespace clevis {

void BandLu::reshape(int n, int lower, int upper)
{
    n_ = n;
    kl_ = lower;
    ku_ = upper;
    ld_ = 2 * kl_ + ku_ + 1;
    ab_.assign(std::size_t(ld_) * std::size_t(n_), 0.0);
    pivot_.assign(n_, 0);
    inverseDiagonal_.assign(n_, 0.0);
}

void BandLu::setZero() { std::fill(ab_.begin(), ab_.end(), 0.0); }

// Column j holds rows j … last below its diagonal, one after another.
int BandLu::pivotRow(int j, int last) const
{
    const double* column = &ab_[slot(j, j)];
    int best = 0;
    for (int i = 1; i <= last - j; ++i)
        if (std::abs(column[i]) > std::abs(column[best])) best = i;
    return j + best;
}

void BandLu::swapRows(int j, int p, int lastColumn)
{
    for (int c = j; c <= lastColumn; ++c) std::swap(at(j, c), at(p, c));
}

// Gaussian elimination by columns as in LAPACK's xGBTF2. Row swaps are
// applied to the columns right of the pivot only, so the multipliers of
// column j stay where they were computed and the solves apply each swap
// just before its column's elimination. `reach` is the last column any
// swapped row extends to (a row swapped up brings its ku diagonals along).
bool BandLu::factor()
{
    minPivot_ = n_ ? INFINITY : 0.0;
    maxPivot_ = 0.0;
    sign_ = 1;
    int reach = 0;
    for (int j = 0; j < n_; ++j) {
        const int last = std::min(j + kl_, n_ - 1);
        const int p = pivotRow(j, last);
        pivot_[j] = p;
        reach = std::max(reach, std::min(p + ku_, n_ - 1));
        if (p != j) {
            swapRows(j, p, reach);
            sign_ = -sign_;
        }
        double* columnJ = &ab_[slot(j, j)];  // columnJ[i] is element (j + i, j)
        const double ujj = columnJ[0];
        if (ujj < 0.0) sign_ = -sign_;
        minPivot_ = std::min(minPivot_, std::abs(ujj));
        maxPivot_ = std::max(maxPivot_, std::abs(ujj));
        if (ujj == 0.0) return false;
        const double inverse = 1.0 / ujj;
        inverseDiagonal_[j] = inverse;
        const int below = last - j;
        for (int i = 1; i <= below; ++i) columnJ[i] *= inverse;
        for (int c = j + 1; c <= reach; ++c) {
            double* columnC = &ab_[slot(j, c)];  // columnC[i] is element (j + i, c)
            const double ujc = columnC[0];
            if (ujc == 0.0) continue;
            for (int i = 1; i <= below; ++i) columnC[i] -= columnJ[i] * ujc;
        }
    }
    return true;
}

// x = U⁻¹ L_{n−1}⁻¹ P_{n−1} … L_0⁻¹ P_0 b, each swap just before its column.
void BandLu::solveInPlace(double* b) const
{
    for (int j = 0; j < n_; ++j) {
        if (pivot_[j] != j) std::swap(b[j], b[pivot_[j]]);
        const double* columnJ = &ab_[slot(j, j)];
        const double bj = b[j];
        const int below = std::min(j + kl_, n_ - 1) - j;
        for (int i = 1; i <= below; ++i) b[j + i] -= columnJ[i] * bj;
    }
    const int kv = kl_ + ku_;
    for (int j = n_ - 1; j >= 0; --j) {
        const double bj = b[j] * inverseDiagonal_[j];
        b[j] = bj;
        const int first = std::max(0, j - kv);
        const double* columnJ = &ab_[slot(first, j)];  // columnJ[i − first] is U(i, j)
        for (int i = first; i < j; ++i) b[i] -= columnJ[i - first] * bj;
    }
}

// Aᵀ x = b: forward with Uᵀ, then back through the columns with Lᵀ, undoing
// each swap after its column.
void BandLu::solveTransposedInPlace(double* b) const
{
    const int kv = kl_ + ku_;
    for (int j = 0; j < n_; ++j) {
        const int first = std::max(0, j - kv);
        const double* columnJ = &ab_[slot(first, j)];
        double s = b[j];
        for (int i = first; i < j; ++i) s -= columnJ[i - first] * b[i];
        b[j] = s * inverseDiagonal_[j];
    }
    for (int j = n_ - 1; j >= 0; --j) {
        const double* columnJ = &ab_[slot(j, j)];
        const int below = std::min(j + kl_, n_ - 1) - j;
        double s = b[j];
        for (int i = 1; i <= below; ++i) s -= columnJ[i] * b[j + i];
        b[j] = s;
        if (pivot_[j] != j) std::swap(b[j], b[pivot_[j]]);
    }
}

}  // namespace clevis
