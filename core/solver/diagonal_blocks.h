// The diagonal blocks of the finest block triangular form of a square sparse
// matrix (Dulmage and Mendelsohn): with rows and columns suitably permuted,
// J is block lower triangular and no diagonal block A_bb can be split
// further. Then
//
//   det J = ± ∏_b det A_bb,
//
// so J is singular exactly when one of its diagonal blocks is. For a
// constraint Jacobian each block is a group of bodies that must be placed
// together once the bodies it hangs from are placed: a driven crank, then
// each coupler–rocker pair of a four-bar chain or fan in turn.
//
// Found from the pattern alone: a perfect matching pairs each row with a
// column it holds (Kuhn's augmenting paths), then the blocks are the
// strongly connected components (Tarjan) of the graph with an edge r → r′
// when row r holds the column paired with row r′. The blocks do not depend
// on which perfect matching is found.
#pragma once

#include <utility>
#include <vector>

namespace clevis {

struct DiagonalBlocks {
    std::vector<int> ofRow, ofColumn;  // the block of each row and column
    int count = 0;
};

// `entries` are the (row, column) positions of the nonzeros of an n×n
// matrix; repeats are allowed. A matrix with no perfect matching (singular
// whatever its values) is one block.
DiagonalBlocks diagonalBlocks(int n, const std::vector<std::pair<int, int>>& entries);

}  // namespace clevis
