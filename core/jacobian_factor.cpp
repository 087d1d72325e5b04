#include "jacobian_factor.h"

#include <algorithm>
#include <cmath>

namespace clevis {

JacobianFactor::JacobianFactor(const Eigen::VectorXd& rowScale, const Eigen::VectorXd& columnScale)
    : rowScale_(rowScale), columnScale_(columnScale), dense_(columnScale.size() <= kDenseLimit)
{
}

bool JacobianFactor::factor(int size, const std::vector<Eigen::Triplet<double>>& entries)
{
    columnSums_.setZero(size);
    if (dense_) {
        denseMatrix_.setZero(size, size);
        for (const auto& e : entries) denseMatrix_(e.row(), e.col()) += e.value();
        columnSums_ = denseMatrix_.cwiseAbs().colwise().sum();
        if (!denseLu_.compute(denseMatrix_) || !(denseLu_.minPivot() > 1e-14 * denseLu_.maxPivot())) return false;
    } else {
        fillSparse(size, entries);
        for (int k = 0; k < sparseMatrix_.outerSize(); ++k)
            for (Eigen::SparseMatrix<double>::InnerIterator it(sparseMatrix_, k); it; ++it)
                columnSums_[it.col()] += std::abs(it.value());
        sparseLu_.factorize(sparseMatrix_);
        if (sparseLu_.info() != Eigen::Success) return false;
    }
    norm1_ = size ? columnSums_.maxCoeff() : 0.0;
    return std::isfinite(norm1_);
}

// The constraints write the same entries in the same order at every pose, so
// after the first assembly each entry's place among the stored nonzeros is
// known and the values are written straight there; a different pattern
// (another size or order) is assembled and analysed afresh.
void JacobianFactor::fillSparse(int size, const std::vector<Eigen::Triplet<double>>& entries)
{
    if (!samePattern(size, entries)) {
        sparseMatrix_.resize(size, size);
        sparseMatrix_.setFromTriplets(entries.begin(), entries.end());
        sparseMatrix_.makeCompressed();
        pattern_.clear();
        for (const auto& e : entries) {
            const int* begin = sparseMatrix_.innerIndexPtr() + sparseMatrix_.outerIndexPtr()[e.col()];
            const int* end = sparseMatrix_.innerIndexPtr() + sparseMatrix_.outerIndexPtr()[e.col() + 1];
            pattern_.push_back({e.row(), e.col(), int(std::lower_bound(begin, end, e.row()) - sparseMatrix_.innerIndexPtr())});
        }
        sparseLu_.analyzePattern(sparseMatrix_);
        return;
    }
    double* values = sparseMatrix_.valuePtr();
    std::fill(values, values + sparseMatrix_.nonZeros(), 0.0);
    for (std::size_t i = 0; i < entries.size(); ++i) values[pattern_[i].slot] += entries[i].value();
}

bool JacobianFactor::samePattern(int size, const std::vector<Eigen::Triplet<double>>& entries) const
{
    if (sparseMatrix_.rows() != size || pattern_.size() != entries.size()) return false;
    for (std::size_t i = 0; i < entries.size(); ++i)
        if (pattern_[i].row != entries[i].row() || pattern_[i].col != entries[i].col()) return false;
    return true;
}

void JacobianFactor::solveScaledInPlace(Eigen::VectorXd& b) const
{
    if (dense_) denseLu_.solveInPlace(b);
    else b = sparseLu_.solve(b);
}

void JacobianFactor::solveScaledTransposedInPlace(Eigen::VectorXd& b) const
{
    if (dense_) denseLu_.solveTransposedInPlace(b);
    else b = sparseLu_.transpose().solve(b);
}

// Φ_q = D_r⁻¹ J̃ D_c⁻¹, so Φ_q x = b gives x = D_c J̃⁻¹ (D_r b) ...
void JacobianFactor::solveInPlace(Eigen::VectorXd& b) const
{
    b.array() *= rowScale_.array();
    solveScaledInPlace(b);
    b.array() *= columnScale_.array();
}

Eigen::VectorXd JacobianFactor::solve(const Eigen::VectorXd& b) const
{
    Eigen::VectorXd x = b;
    solveInPlace(x);
    return x;
}

// ... and Φ_qᵀ y = f gives y = D_r J̃⁻ᵀ (D_c f).
Eigen::VectorXd JacobianFactor::solveTransposed(const Eigen::VectorXd& f) const
{
    Eigen::VectorXd y = f.cwiseProduct(columnScale_);
    solveScaledTransposedInPlace(y);
    y.array() *= rowScale_.array();
    return y;
}

int JacobianFactor::determinantSign() const
{
    return dense_ ? denseLu_.determinantSign() : int(sparseLu_.signDeterminant());
}

// Estimate of ‖J̃⁻¹‖₁ by Hager's method as refined by Higham (the estimator
// LAPACK's xGECON uses): at most five solve pairs, then 1/(‖J̃‖₁ ‖J̃⁻¹‖₁).
// Each iterate ‖J̃⁻¹x‖₁ with ‖x‖₁ = 1 is a lower bound of ‖J̃⁻¹‖₁ whatever
// the start, so the largest one seen is kept.
double JacobianFactor::reciprocalCondition()
{
    const Eigen::Index n = columnScale_.size();
    if (n == 0 || norm1_ == 0.0) return 0.0;
    if (worstColumn_ >= 0 && worstColumn_ < n) {
        x_.setZero(n);
        x_[worstColumn_] = 1.0;
    } else {
        x_.setConstant(n, 1.0 / double(n));
    }
    double estimate = 0.0;
    for (int iteration = 0; iteration < 5; ++iteration) {
        y_ = x_;
        solveScaledInPlace(y_);
        estimate = std::max(estimate, y_.lpNorm<1>());
        z_ = y_.unaryExpr([](double v) { return v < 0 ? -1.0 : 1.0; });
        solveScaledTransposedInPlace(z_);
        Eigen::Index j = 0;
        if (z_.cwiseAbs().maxCoeff(&j) <= z_.dot(x_)) break;
        x_.setZero();
        x_[j] = 1.0;
        worstColumn_ = j;
    }
    if (!std::isfinite(estimate)) return 0.0;
    return estimate > 0.0 ? 1.0 / (norm1_ * estimate) : 0.0;
}

}  // namespace clevis
