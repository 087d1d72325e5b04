// Row and column order that gathers a sparse square matrix into a narrow
// band, for BandLu. The columns (body coordinates) are put in Cuthill–McKee
// order of the graph in which two columns are neighbours when a row (a
// constraint equation) holds both; the rows then follow their first column.
// In a linkage each joint ties two neighbouring bodies, so a chain of links
// comes out with a few diagonals on either side however its parts were
// numbered.
#pragma once

#include <utility>
#include <vector>

namespace clevis {

struct BandOrdering {
    std::vector<int> rowAt, columnAt;        // original row / column at each place
    std::vector<int> rowPlace, columnPlace;  // place of each original row / column
    int lower = 0, upper = 0;                // diagonals below / above the main one
    int sign = 1;                            // sign of det P_r · det P_c
};

// `entries` are the (row, column) positions of the nonzeros of an n×n matrix;
// repeats are allowed.
BandOrdering orderIntoBand(int n, const std::vector<std::pair<int, int>>& entries);

}  // namespace clevis
