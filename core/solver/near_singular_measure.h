// How close a pose is to a singular position (a dead centre or toggle), by
// a measure that does not grow with the size of the mechanism.
//
// The balanced Jacobian J̃ (constraint_system.h) is block lower triangular
// with diagonal blocks A_bb (diagonal_blocks.h): the groups of bodies placed
// together, such as each coupler–rocker pair of a four-bar driven from a
// crank. J̃ is singular exactly when one block is, so each block is judged
// on its own:
//
//   κ_b = ν_b ‖A_bb⁻¹‖_∞,   ν_b = max over the block's rows r of Σ_c |J̃_rc|,
//   μ   = 1 / max_b κ_b,
//
// ν_b being the size of the block's equations with their coupling to the
// bodies the block hangs from. ‖A_bb⁻¹‖_∞ is the largest change of one of the
// block's coordinates (in its body's lengths) per unit error in all its
// equations. Neither a hundred copies of a loop on one crank nor a long
// chain of loops changes any block, so μ does not fall with size; the
// condition number of the whole of J̃ grows with the number of loops a crank
// drives (its columns gather them all) and with the length of a chain.
//
// μ is computed as 1/‖M⁻¹‖₁ for M = D̃ᵀ, D̃ the block diagonal of J̃ with each
// block's rows divided by ν_b (so ‖D̃⁻¹‖_∞ = max_b κ_b): one more LU of a
// matrix at most as wide as J̃ per step, and the Hager–Higham estimate of
// ‖M⁻¹‖₁ (good to a small factor, usually exact).
#pragma once

#include "core/solver/diagonal_blocks.h"
#include "core/solver/jacobian_factor.h"

#include <Eigen/SparseCore>
#include <vector>

namespace clevis {

class NearSingularMeasure {
public:
    explicit NearSingularMeasure(int size);

    // μ at the scaled Jacobian entries J̃ (the pattern the constraints write
    // at every pose, learned at the first call); 0 where a block is singular.
    double reciprocalCondition(const std::vector<Eigen::Triplet<double>>& scaledEntries);

    // A step with μ below this is flagged near singular: 10⁻³ for blocks of
    // up to ten bodies (a slider-crank driven by its piston is then flagged
    // within about 0.3° of dead centre), falling in proportion to the bodies
    // of the largest block, within which a long loop's condition can grow
    // with its length. Known once the pattern has been learned.
    double threshold() const { return threshold_; }

private:
    void learn(const std::vector<Eigen::Triplet<double>>& entries);

    int size_;
    DiagonalBlocks blocks_;
    std::vector<char> inBlock_;  // per entry: row and column in the same block
    double threshold_ = 1e-3;
    Eigen::VectorXd rowSums_, blockSize_;
    std::vector<Eigen::Triplet<double>> transposed_;  // scratch, kept to avoid allocations
    JacobianFactor factor_;
};

}  // namespace clevis
