#include "core/solver/jacobian_factor.h"

#include <algorithm>
#include <cmath>
#include <limits>

namespace clevis {

JacobianFactor::JacobianFactor(const Eigen::VectorXd& rowScale, const Eigen::VectorXd& columnScale)
    : rowScale_(rowScale), columnScale_(columnScale)
{}

bool JacobianFactor::factor(int size, const std::vector<Eigen::Triplet<double>>& entries)
{
    if (!samePattern(size, entries)) learnPattern(size, entries);
    double sum = 0.0;  // not finite when an entry is not
    for (const auto& e : entries) sum += std::abs(e.value());
    return std::isfinite(sum) && (method_ == Method::Band ? factorBand(entries) : factorSparse(entries));
}

bool JacobianFactor::factorBand(const std::vector<Eigen::Triplet<double>>& entries)
{
    bandLu_.setZero();
    double* values = bandLu_.values();
    for (std::size_t i = 0; i < entries.size(); ++i) values[pattern_[i].slot] += entries[i].value();
    return bandLu_.factor() && bandLu_.minPivot() > 1e-14 * bandLu_.maxPivot();
}

bool JacobianFactor::factorSparse(const std::vector<Eigen::Triplet<double>>& entries)
{
    double* values = sparseMatrix_.valuePtr();
    std::fill(values, values + sparseMatrix_.nonZeros(), 0.0);
    for (std::size_t i = 0; i < entries.size(); ++i) values[pattern_[i].slot] += entries[i].value();
    sparseLu_.factorize(sparseMatrix_);
    return sparseLu_.info() == Eigen::Success;
}

// The constraints write the same entries in the same order at every pose, so
// the band order, the choice between band and sparse LU and each entry's
// place among the stored values are worked out when a pattern is first seen
// (or changes: another size or order), and the values are then written
// straight to their places.
void JacobianFactor::learnPattern(int size, const std::vector<Eigen::Triplet<double>>& entries)
{
    std::vector<std::pair<int, int>> positions;
    positions.reserve(entries.size());
    for (const auto& e : entries) positions.emplace_back(e.row(), e.col());
    order_ = orderIntoBand(size, positions);
    method_ = order_.lower * (order_.lower + order_.upper + 1) <= kBandWorkLimit ? Method::Band : Method::Sparse;
    patternSize_ = size;
    pattern_.clear();
    if (method_ == Method::Band) {
        bandLu_.reshape(size, order_.lower, order_.upper);
        for (const auto& e : entries)
            pattern_.push_back({e.row(), e.col(), bandLu_.slot(order_.rowPlace[e.row()], order_.columnPlace[e.col()])});
        return;
    }
    sparseMatrix_.resize(size, size);
    sparseMatrix_.setFromTriplets(entries.begin(), entries.end());
    sparseMatrix_.makeCompressed();
    for (const auto& e : entries) {
        const int* begin = sparseMatrix_.innerIndexPtr() + sparseMatrix_.outerIndexPtr()[e.col()];
        const int* end = sparseMatrix_.innerIndexPtr() + sparseMatrix_.outerIndexPtr()[e.col() + 1];
        pattern_.push_back(
            {e.row(), e.col(), int(std::lower_bound(begin, end, e.row()) - sparseMatrix_.innerIndexPtr())});
    }
    sparseLu_.analyzePattern(sparseMatrix_);
}

bool JacobianFactor::samePattern(int size, const std::vector<Eigen::Triplet<double>>& entries) const
{
    if (patternSize_ != size || pattern_.size() != entries.size()) return false;
    for (std::size_t i = 0; i < entries.size(); ++i)
        if (pattern_[i].row != entries[i].row() || pattern_[i].col != entries[i].col()) return false;
    return true;
}

// In band order the system reads B y = b′ with B(i, k) = J̃(rowAt[i], columnAt[k]),
// b′_i = b_rowAt[i] and x_columnAt[k] = y_k; transposed, rows and columns trade places.
void JacobianFactor::gather(const Eigen::VectorXd& b, const std::vector<int>& at) const
{
    permuted_.resize(b.size());
    for (Eigen::Index i = 0; i < b.size(); ++i) permuted_[i] = b[at[i]];
}

void JacobianFactor::scatter(Eigen::VectorXd& b, const std::vector<int>& at) const
{
    for (Eigen::Index i = 0; i < b.size(); ++i) b[at[i]] = permuted_[i];
}

void JacobianFactor::solveScaledInPlace(Eigen::VectorXd& b) const
{
    if (method_ == Method::Sparse) {
        b = sparseLu_.solve(b);
        return;
    }
    gather(b, order_.rowAt);
    bandLu_.solveInPlace(permuted_.data());
    scatter(b, order_.columnAt);
}

void JacobianFactor::solveScaledTransposedInPlace(Eigen::VectorXd& b) const
{
    if (method_ == Method::Sparse) {
        b = sparseLu_.transpose().solve(b);
        return;
    }
    gather(b, order_.columnAt);
    bandLu_.solveTransposedInPlace(permuted_.data());
    scatter(b, order_.rowAt);
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
    return method_ == Method::Band ? bandLu_.determinantSign() * order_.sign : int(sparseLu_.signDeterminant());
}

// Estimate of ‖J̃⁻¹‖₁ by Hager's method as refined by Higham (the estimator
// LAPACK's xGECON uses): at most five solve pairs. Each iterate ‖J̃⁻¹x‖₁
// with ‖x‖₁ = 1 is a lower bound of ‖J̃⁻¹‖₁ whatever the start, so the
// largest one seen is kept.
double JacobianFactor::inverseNorm1()
{
    const Eigen::Index n = columnScale_.size();
    if (n == 0) return 0.0;
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
    return std::isfinite(estimate) ? estimate : std::numeric_limits<double>::infinity();
}

}  // namespace clevis
