#include "jacobian_factor.h"

#include <cmath>

namespace clevis {

JacobianFactor::JacobianFactor(const Eigen::VectorXd& rowScale, const Eigen::VectorXd& columnScale)
    : rowScale_(rowScale), columnScale_(columnScale), dense_(columnScale.size() <= kDenseLimit)
{
}

bool JacobianFactor::factor(int size, const std::vector<Eigen::Triplet<double>>& entries)
{
    Eigen::VectorXd columnSums = Eigen::VectorXd::Zero(size);
    if (dense_) {
        denseMatrix_.setZero(size, size);
        for (const auto& e : entries) denseMatrix_(e.row(), e.col()) += e.value();
        columnSums = denseMatrix_.cwiseAbs().colwise().sum();
        if (!denseLu_.compute(denseMatrix_) || !(denseLu_.minPivot() > 1e-14 * denseLu_.maxPivot())) return false;
    } else {
        sparseMatrix_.resize(size, size);
        sparseMatrix_.setFromTriplets(entries.begin(), entries.end());
        for (int k = 0; k < sparseMatrix_.outerSize(); ++k)
            for (Eigen::SparseMatrix<double>::InnerIterator it(sparseMatrix_, k); it; ++it)
                columnSums[it.col()] += std::abs(it.value());
        if (!patternAnalysed_) {
            sparseLu_.analyzePattern(sparseMatrix_);
            patternAnalysed_ = true;
        }
        sparseLu_.factorize(sparseMatrix_);
        if (sparseLu_.info() != Eigen::Success) return false;
    }
    norm1_ = size ? columnSums.maxCoeff() : 0.0;
    return std::isfinite(norm1_);
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
double JacobianFactor::reciprocalCondition() const
{
    const Eigen::Index n = columnScale_.size();
    if (n == 0 || norm1_ == 0.0) return 0.0;
    Eigen::VectorXd x = Eigen::VectorXd::Constant(n, 1.0 / double(n));
    Eigen::VectorXd y, z;
    double estimate = 0.0;
    for (int iteration = 0; iteration < 5; ++iteration) {
        y = x;
        solveScaledInPlace(y);
        estimate = y.lpNorm<1>();
        z = y.unaryExpr([](double v) { return v < 0 ? -1.0 : 1.0; });
        solveScaledTransposedInPlace(z);
        Eigen::Index j = 0;
        if (z.cwiseAbs().maxCoeff(&j) <= z.dot(x)) break;
        x.setZero();
        x[j] = 1.0;
    }
    if (!std::isfinite(estimate)) return 0.0;
    return estimate > 0.0 ? 1.0 / (norm1_ * estimate) : 0.0;
}

}  // namespace clevis
