// Which rows of a sparse m×N matrix J (a constraint Jacobian) are linear
// combinations of others, and which columns its null space reaches: the
// degrees-of-freedom diagnosis (mobility_check.h) at a cost that grows with
// the mechanism as the solve's does.
//
// Householder QR of Jᵀ, its columns (the rows of J) taken one at a time,
// the leading rows first, each part in band order (band_ordering.h):
//
//   Jᵀ Π = Q R,   R = [R₁₁ R₁₂; 0 0],   R₁₁ upper triangular of order r = rank J.
//
// A row whose part orthogonal to the rows kept so far has a norm of at most
// τ = 10⁻⁹ × (the largest row norm) is dependent: it is the combination
// R₁₁⁻¹ R₁₂ of the rows kept before it, and the rows with a coefficient
// above 10⁻⁷ are those it repeats. The rows kept are the first independent
// ones in that order, so the leading rows (the joints) are judged among
// themselves alone: their rank and dependencies are those of the leading
// block. The null space of J is spanned by the last N − r columns Q₂ of Q;
// it reaches column c when ‖Q₂ᵀ e_c‖ (the length of e_c projected on it)
// exceeds 10⁻⁷.
//
// In band order each Householder vector and each column of R spans a few
// band widths w, so n bodies in a chain cost O(n·w²); each dependent row
// widens the later ones by one.
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

// `entries` are J's nonzeros (repeats are summed); rows [0, leadingRows)
// are the leading ones.
RowDependence rowDependence(int rows, int columns, const std::vector<Eigen::Triplet<double>>& entries, int leadingRows);

}  // namespace clevis
