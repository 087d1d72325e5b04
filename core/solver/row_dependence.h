// Which rows of a sparse m×N matrix J (a constraint Jacobian) are linear
// combinations of others, and which columns its null space reaches: the
// degrees-of-freedom diagnosis (mobility_check.h) at a cost that grows with
// the mechanism as the solve's does.
//
// Householder QR of Jᵀ, its columns (the rows of J) taken one at a time in
// their order, its rows (J's columns) in the order the rows first reach them:
//
//   Jᵀ Π = Q R,   R = [R₁₁ R₁₂; 0 0],   R₁₁ upper triangular of order r = rank J.
//
// A row whose part orthogonal to the rows kept so far has a norm of at most
// τ = 10⁻⁹ × (the largest row norm) is dependent: it is the combination
// R₁₁⁻¹ R₁₂ of the rows kept before it, and the rows with a coefficient
// above 10⁻⁷ are those it repeats. The rows kept are the first independent
// ones, so a row is called dependent only on rows before it: the joints,
// listed before the drivers, are judged among themselves alone (their rank
// and dependencies are those of the joints' Jacobian), and of two joints
// that fix the same motion the later one is the repeat. The null space of J
// is spanned by the last N − r columns Q₂ of Q; it reaches column c when
// ‖Q₂ᵀ e_c‖ (the length of e_c projected on it) exceeds 10⁻⁷.
//
// A constraint ties the bodies of one joint, so when the parts are listed
// joint by joint along the mechanism (as drawn or generated) each
// Householder vector and each column of R spans a few rows, and n bodies
// cost O(n); parts listed far from their neighbours widen the spans, up to
// the dense cost, O(n³), at worst.
#pragma once

#include <Eigen/SparseCore>
#include <vector>

namespace clevis {

struct DependentRow {
    int row = 0;
    std::vector<int> repeats;  // the rows, kept before it, of which it is a combination
};

struct RowDependence {
    int leadingRank = 0;                  // rank of the leading rows alone
    int rank = 0;                         // rank of all the rows
    std::vector<DependentRow> dependent;  // by ascending row
    std::vector<char> nullSpaceReaches;   // per column: some x with J x = 0 moves it
};

// `entries` are J's nonzeros (repeats are summed); the rank of rows
// [0, leadingRows) alone is also given.
RowDependence rowDependence(int rows, int columns, const std::vector<Eigen::Triplet<double>>& entries, int leadingRows);

}  // namespace clevis
