#include "core/solver/band_ordering.h"

#include <algorithm>
#include <numeric>

namespace clevis {
namespace {

using Graph = std::vector<std::vector<int>>;  // neighbours of each column, ascending

Graph columnGraph(int n, const std::vector<std::vector<int>>& columnsOfRow)
{
    Graph g(n);
    for (const auto& columns : columnsOfRow)
        for (int a : columns)
            for (int b : columns)
                if (a != b) g[a].push_back(b);
    for (auto& neighbours : g) {
        std::sort(neighbours.begin(), neighbours.end());
        neighbours.erase(std::unique(neighbours.begin(), neighbours.end()), neighbours.end());
    }
    return g;
}

struct FarLevel {
    std::vector<int> nodes;
    int depth = 0;
};

// Breadth-first search from `start`; `distance` is all −1 on entry and on return.
FarLevel farthestLevel(const Graph& g, int start, std::vector<int>& distance)
{
    std::vector<int> queue{start};
    distance[start] = 0;
    for (std::size_t k = 0; k < queue.size(); ++k)
        for (int v : g[queue[k]])
            if (distance[v] < 0) {
                distance[v] = distance[queue[k]] + 1;
                queue.push_back(v);
            }
    FarLevel far;
    far.depth = distance[queue.back()];
    for (int v : queue)
        if (distance[v] == far.depth) far.nodes.push_back(v);
    for (int v : queue) distance[v] = -1;
    return far;
}

// George and Liu's pseudo-peripheral node: move to the least-connected node
// of the farthest level while that makes the graph look deeper. Starting
// the ordering there makes the levels, and so the band, narrow.
int peripheralNode(const Graph& g, int start, std::vector<int>& distance)
{
    FarLevel far = farthestLevel(g, start, distance);
    for (;;) {
        const int candidate = *std::min_element(far.nodes.begin(), far.nodes.end(),
                                                [&](int a, int b) { return g[a].size() < g[b].size(); });
        FarLevel next = farthestLevel(g, candidate, distance);
        if (next.depth <= far.depth) return start;
        start = candidate;
        far = std::move(next);
    }
}

// Cuthill–McKee: breadth first from `start`, each node's unplaced neighbours
// taken in order of increasing degree.
void appendCuthillMcKee(const Graph& g, int start, std::vector<char>& placed, std::vector<int>& order)
{
    std::size_t k = order.size();
    order.push_back(start);
    placed[start] = 1;
    std::vector<int> next;
    for (; k < order.size(); ++k) {
        next.clear();
        for (int v : g[order[k]])
            if (!placed[v]) {
                placed[v] = 1;
                next.push_back(v);
            }
        std::stable_sort(next.begin(), next.end(), [&](int a, int b) { return g[a].size() < g[b].size(); });
        order.insert(order.end(), next.begin(), next.end());
    }
}

std::vector<int> inverse(const std::vector<int>& order)
{
    std::vector<int> place(order.size());
    for (std::size_t k = 0; k < order.size(); ++k) place[order[k]] = int(k);
    return place;
}

// (−1)^(n − number of cycles).
int parity(const std::vector<int>& order)
{
    std::vector<char> seen(order.size(), 0);
    int sign = 1;
    for (std::size_t start = 0; start < order.size(); ++start) {
        if (seen[start]) continue;
        for (std::size_t k = start; !seen[k]; k = std::size_t(order[k])) {
            seen[k] = 1;
            if (k != start) sign = -sign;
        }
    }
    return sign;
}

std::vector<int> columnOrder(int n, const Graph& g)
{
    std::vector<int> byDegree(n);
    std::iota(byDegree.begin(), byDegree.end(), 0);
    std::stable_sort(byDegree.begin(), byDegree.end(), [&](int a, int b) { return g[a].size() < g[b].size(); });
    std::vector<char> placed(n, 0);
    std::vector<int> distance(n, -1), order;
    order.reserve(n);
    for (int c : byDegree)
        if (!placed[c]) appendCuthillMcKee(g, peripheralNode(g, c, distance), placed, order);
    return order;
}

// Rows by the place of their first column, then of their last; empty rows last.
std::vector<int> rowOrder(int n, const std::vector<std::vector<int>>& columnsOfRow, const std::vector<int>& columnPlace)
{
    std::vector<std::pair<int, int>> span(n, {n, -1});
    for (int r = 0; r < n; ++r)
        for (int c : columnsOfRow[r])
            span[r] = {std::min(span[r].first, columnPlace[c]), std::max(span[r].second, columnPlace[c])};
    std::vector<int> order(n);
    std::iota(order.begin(), order.end(), 0);
    std::stable_sort(order.begin(), order.end(), [&](int a, int b) { return span[a] < span[b]; });
    return order;
}

}  // namespace

BandOrdering orderIntoBand(int n, const std::vector<std::pair<int, int>>& entries)
{
    std::vector<std::vector<int>> columnsOfRow(n);
    for (const auto& [r, c] : entries) columnsOfRow[r].push_back(c);
    BandOrdering o;
    o.columnAt = columnOrder(n, columnGraph(n, columnsOfRow));
    o.columnPlace = inverse(o.columnAt);
    o.rowAt = rowOrder(n, columnsOfRow, o.columnPlace);
    o.rowPlace = inverse(o.rowAt);
    for (const auto& [r, c] : entries) {
        const int offset = o.rowPlace[r] - o.columnPlace[c];
        o.lower = std::max(o.lower, offset);
        o.upper = std::max(o.upper, -offset);
    }
    o.sign = parity(o.rowAt) * parity(o.columnAt);
    return o;
}

}  // namespace clevis
