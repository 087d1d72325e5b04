#include "core/solver/near_singular_measure.h"

#include <algorithm>
#include <cmath>
#include <set>

namespace clevis {
namespace {

constexpr double kThreshold = 1e-3;
constexpr int kThresholdBodies = 10;

}  // namespace

NearSingularMeasure::NearSingularMeasure(int size)
    : size_(size), factor_(Eigen::VectorXd::Ones(size), Eigen::VectorXd::Ones(size))
{}

// The constraints write the same entries in the same order at every pose
// (jacobian_factor.h relies on it too), so the blocks are found once.
void NearSingularMeasure::learn(const std::vector<Eigen::Triplet<double>>& entries)
{
    std::vector<std::pair<int, int>> positions;
    positions.reserve(entries.size());
    for (const auto& e : entries) positions.emplace_back(e.row(), e.col());
    blocks_ = diagonalBlocks(size_, positions);
    inBlock_.resize(entries.size());
    for (std::size_t i = 0; i < entries.size(); ++i)
        inBlock_[i] = blocks_.ofRow[entries[i].row()] == blocks_.ofColumn[entries[i].col()];
    // The columns of a body are its x, y and φ.
    std::vector<std::set<int>> bodies(blocks_.count);
    for (int c = 0; c < size_; ++c) bodies[blocks_.ofColumn[c]].insert(c / 3);
    std::size_t largest = 0;
    for (const auto& b : bodies) largest = std::max(largest, b.size());
    threshold_ = kThreshold * std::min(1.0, double(kThresholdBodies) / double(std::max<std::size_t>(largest, 1)));
}

double NearSingularMeasure::reciprocalCondition(const std::vector<Eigen::Triplet<double>>& entries)
{
    if (size_ == 0) return 1.0;
    if (inBlock_.size() != entries.size()) learn(entries);
    rowSums_.setZero(size_);
    for (const auto& e : entries) rowSums_[e.row()] += std::abs(e.value());
    blockSize_.setZero(blocks_.count);
    for (int r = 0; r < size_; ++r) blockSize_[blocks_.ofRow[r]] = std::max(blockSize_[blocks_.ofRow[r]], rowSums_[r]);
    if (!(blockSize_.array() > 0.0).all()) return 0.0;  // a block with no entries left: singular
    transposed_.clear();
    for (std::size_t i = 0; i < entries.size(); ++i) {
        if (!inBlock_[i]) continue;
        const auto& e = entries[i];
        transposed_.emplace_back(e.col(), e.row(), e.value() / blockSize_[blocks_.ofRow[e.row()]]);
    }
    if (!factor_.factor(size_, transposed_)) return 0.0;
    const double inverseNorm = factor_.inverseNorm1();
    return std::isfinite(inverseNorm) && inverseNorm > 0.0 ? 1.0 / inverseNorm : 0.0;
}

}  // namespace clevis
