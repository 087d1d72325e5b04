#include "core/solver/diagonal_blocks.h"

#include <algorithm>

namespace clevis {
namespace {

using Adjacency = std::vector<std::vector<int>>;

// Kuhn's algorithm: each row in turn looks for a free column along an
// augmenting path. A cheap first pass gives every row a free column of its
// own where it has one, which leaves few paths to search.
class Matching {
public:
    explicit Matching(const Adjacency& columnsOfRow)
        : columns_(columnsOfRow), rowOfColumn_(columnsOfRow.size(), -1), seen_(columnsOfRow.size(), -1)
    {}

    // The row paired with each column, or empty when some row finds none.
    std::vector<int> perfect()
    {
        const int n = int(columns_.size());
        std::vector<char> matched(n, 0);
        for (int r = 0; r < n; ++r)
            for (int c : columns_[r])
                if (rowOfColumn_[c] < 0) {
                    rowOfColumn_[c] = r;
                    matched[r] = 1;
                    break;
                }
        for (int r = 0; r < n; ++r)
            if (!matched[r] && !augment(r, r)) return {};
        return rowOfColumn_;
    }

private:
    bool augment(int row, int stamp)
    {
        for (int c : columns_[row]) {
            if (seen_[c] == stamp) continue;
            seen_[c] = stamp;
            if (rowOfColumn_[c] < 0 || augment(rowOfColumn_[c], stamp)) {
                rowOfColumn_[c] = row;
                return true;
            }
        }
        return false;
    }

    const Adjacency& columns_;
    std::vector<int> rowOfColumn_;
    std::vector<int> seen_;  // the search (by its first row) that last visited each column
};

// Tarjan's strongly connected components of the row graph r → rowOfColumn[c]
// for each column c that row r holds.
class Components {
public:
    Components(const Adjacency& columnsOfRow, const std::vector<int>& rowOfColumn)
        : columns_(columnsOfRow)
        , rowOfColumn_(rowOfColumn)
        , index_(columnsOfRow.size(), -1)
        , low_(columnsOfRow.size(), 0)
        , onStack_(columnsOfRow.size(), 0)
        , block_(columnsOfRow.size(), -1)
    {}

    std::vector<int> blockOfRow(int& count)
    {
        for (int r = 0; r < int(columns_.size()); ++r)
            if (index_[r] < 0) visit(r);
        count = count_;
        return block_;
    }

private:
    void visit(int r)
    {
        index_[r] = low_[r] = next_++;
        stack_.push_back(r);
        onStack_[r] = 1;
        for (int c : columns_[r]) {
            const int s = rowOfColumn_[c];
            if (index_[s] < 0) {
                visit(s);
                low_[r] = std::min(low_[r], low_[s]);
            } else if (onStack_[s]) {
                low_[r] = std::min(low_[r], index_[s]);
            }
        }
        if (low_[r] != index_[r]) return;
        for (int s = -1; s != r;) {
            s = stack_.back();
            stack_.pop_back();
            onStack_[s] = 0;
            block_[s] = count_;
        }
        ++count_;
    }

    const Adjacency& columns_;
    const std::vector<int>& rowOfColumn_;
    std::vector<int> index_, low_;
    std::vector<char> onStack_;
    std::vector<int> block_, stack_;
    int next_ = 0, count_ = 0;
};

}  // namespace

DiagonalBlocks diagonalBlocks(int n, const std::vector<std::pair<int, int>>& entries)
{
    Adjacency columnsOfRow(n);
    for (const auto& [r, c] : entries) columnsOfRow[r].push_back(c);
    for (auto& columns : columnsOfRow) {
        std::sort(columns.begin(), columns.end());
        columns.erase(std::unique(columns.begin(), columns.end()), columns.end());
    }
    DiagonalBlocks blocks;
    const std::vector<int> rowOfColumn = Matching(columnsOfRow).perfect();
    if (rowOfColumn.empty()) {
        blocks.ofRow.assign(n, 0);
        blocks.ofColumn.assign(n, 0);
        blocks.count = n > 0 ? 1 : 0;
        return blocks;
    }
    blocks.ofRow = Components(columnsOfRow, rowOfColumn).blockOfRow(blocks.count);
    blocks.ofColumn.resize(n);
    for (int c = 0; c < n; ++c) blocks.ofColumn[c] = blocks.ofRow[rowOfColumn[c]];
    return blocks;
}

}  // namespace clevis
