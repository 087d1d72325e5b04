#include "core/solver/row_dependence.h"

#include <algorithm>
#include <cmath>

namespace clevis {
namespace {

constexpr double kRankTolerance = 1e-9;  // relative to the largest row norm
constexpr double kCoefficientTolerance = 1e-7;
constexpr double kNullSpaceTolerance = 1e-7;

// A dense vector that is zero outside rows [lo, hi].
struct Span {
    std::vector<double>& x;
    int lo, hi;
};

// Jᵀ = Q R built one column of Jᵀ (one row of J) at a time. Rows of Jᵀ are
// J's columns in the order of `place`. Reflector p, H_p = I − τ_p v vᵀ with v_p = 1,
// acts on rows [p, end_p]; column p of R holds rows [first_p, p].
class ColumnByColumnQr {
public:
    int rank() const { return int(reflectors_.size()); }

    // Applies Qᵀ (H_0 first) to the column in `s`, widening its span.
    void applyTransposeQ(Span& s) const
    {
        const auto begin = reachEnd_.begin();
        const int first = int(std::lower_bound(begin, begin + rank(), s.lo) - begin);
        for (int p = first; p < rank() && p <= s.hi; ++p) reflect(p, s);
    }

    // Applies Q (H_{r−1} first).
    void applyQ(Span& s) const
    {
        for (int p = rank() - 1; p >= 0; --p)
            if (p <= s.hi && reflectors_[p].end >= s.lo) reflect(p, s);
    }

    // Keeps the column (after applyTransposeQ) as the next pivot, its part
    // below the rank folded onto that row.
    void keep(const Span& s)
    {
        const int p = rank();
        const double c0 = s.x[p];
        double below = 0.0;
        for (int i = p + 1; i <= s.hi; ++i) below += s.x[i] * s.x[i];
        double beta = c0, tau = 0.0;
        const std::size_t at = householder_.size();
        householder_.push_back(1.0);
        if (below > 0.0) {
            beta = c0 >= 0.0 ? -std::sqrt(c0 * c0 + below) : std::sqrt(c0 * c0 + below);
            tau = (beta - c0) / beta;
            for (int i = p + 1; i <= s.hi; ++i) householder_.push_back(s.x[i] / (c0 - beta));
        }
        const int end = below > 0.0 ? s.hi : p;
        reflectors_.push_back({end, tau, at});
        reachEnd_.push_back(std::max(end, reachEnd_.empty() ? end : reachEnd_.back()));
        const int first = std::min(s.lo, p);
        rColumns_.push_back({first, r_.size()});
        for (int i = first; i < p; ++i) r_.push_back(s.x[i]);
        r_.push_back(beta);
    }

    // y with R₁₁ y = (the column's rows above the rank), by back
    // substitution; `s` is overwritten. Calls `take(p, y_p)` for each y_p.
    template <typename Take>
    void solveR(Span& s, Take take) const
    {
        for (int p = std::min(rank() - 1, s.hi); p >= 0 && p >= s.lo; --p) {
            if (s.x[p] == 0.0) continue;
            const RColumn& c = rColumns_[p];
            const double y = s.x[p] / r_[c.at + std::size_t(p - c.first)];
            s.x[p] = 0.0;
            for (int i = c.first; i < p; ++i) s.x[i] -= y * r_[c.at + std::size_t(i - c.first)];
            s.lo = std::min(s.lo, c.first);
            take(p, y);
        }
    }

private:
    struct Reflector {
        int end;
        double tau;
        std::size_t at;  // of v_p in householder_
    };
    struct RColumn {
        int first;
        std::size_t at;  // of R(first, p) in r_
    };

    void reflect(int p, Span& s) const
    {
        const Reflector& h = reflectors_[p];
        const int a = std::max(p, s.lo), b = std::min(h.end, s.hi);
        if (h.tau == 0.0 || a > b) return;
        const double* v = householder_.data() + h.at;  // v[i − p] for rows i in [p, end]
        double dot = 0.0;
        for (int i = a; i <= b; ++i) dot += v[i - p] * s.x[i];
        if (dot == 0.0) return;
        dot *= h.tau;
        for (int i = p; i <= h.end; ++i) s.x[i] -= dot * v[i - p];
        s.lo = std::min(s.lo, p);
        s.hi = std::max(s.hi, h.end);
    }

    std::vector<Reflector> reflectors_;
    std::vector<int> reachEnd_;  // largest end of reflectors 0..p, for the search of the first that applies
    std::vector<double> householder_;
    std::vector<RColumn> rColumns_;
    std::vector<double> r_;
};

}  // namespace

RowDependence rowDependence(int rows, int columns, const std::vector<Eigen::Triplet<double>>& entries, int leadingRows)
{
    // Each row's entries, by columns in the order the rows first reach
    // them (those no row holds last): row k then reaches little beyond the
    // columns of rows before it, and the QR stays within a band.
    std::vector<int> start(rows + 1, 0);
    for (const auto& e : entries) ++start[e.row() + 1];
    for (int r = 0; r < rows; ++r) start[r + 1] += start[r];
    std::vector<std::pair<int, double>> rowEntries(entries.size());
    std::vector<int> fill(start.begin(), start.end() - 1);
    for (const auto& e : entries) rowEntries[fill[e.row()]++] = {e.col(), e.value()};
    std::vector<int> place(columns, -1);
    int placed = 0;
    for (auto& [column, value] : rowEntries) {
        if (place[column] < 0) place[column] = placed++;
        column = place[column];
    }
    for (int& p : place)
        if (p < 0) p = placed++;

    std::vector<double> x(columns, 0.0);
    double largest = 0.0;  // row norm
    for (int r = 0; r < rows; ++r) {
        for (int k = start[r]; k < start[r + 1]; ++k) x[rowEntries[k].first] += rowEntries[k].second;
        double norm2 = 0.0;
        for (int k = start[r]; k < start[r + 1]; ++k) {
            norm2 += x[rowEntries[k].first] * x[rowEntries[k].first];
            x[rowEntries[k].first] = 0.0;
        }
        largest = std::max(largest, std::sqrt(norm2));
    }
    const double tolerance = kRankTolerance * largest;

    RowDependence d;
    ColumnByColumnQr qr;
    std::vector<int> keptRow;  // J's row of each pivot
    for (int row = 0; row < rows; ++row) {
        if (row == leadingRows) d.leadingRank = qr.rank();
        Span s{x, columns, -1};
        for (int k = start[row]; k < start[row + 1]; ++k) {
            x[rowEntries[k].first] += rowEntries[k].second;
            s.lo = std::min(s.lo, rowEntries[k].first);
            s.hi = std::max(s.hi, rowEntries[k].first);
        }
        if (s.hi >= 0) qr.applyTransposeQ(s);
        double residual = 0.0;
        for (int i = std::max(qr.rank(), s.lo); i <= s.hi; ++i) residual += x[i] * x[i];
        if (s.hi >= 0 && std::sqrt(residual) > tolerance) {
            qr.keep(s);
            keptRow.push_back(row);
        } else {
            DependentRow dependent{row, {}};
            for (int i = std::max(qr.rank(), s.lo); i <= s.hi; ++i) x[i] = 0.0;
            if (s.hi >= 0)
                qr.solveR(s, [&](int p, double y) {
                    if (std::abs(y) > kCoefficientTolerance) dependent.repeats.push_back(keptRow[p]);
                });
            std::sort(dependent.repeats.begin(), dependent.repeats.end());
            d.dependent.push_back(std::move(dependent));
        }
        for (int i = std::max(s.lo, 0); i <= s.hi; ++i) x[i] = 0.0;
    }
    if (leadingRows >= rows) d.leadingRank = qr.rank();
    d.rank = qr.rank();

    // The null space, spanned by Q e_j for j ≥ rank: how far each column moves in it.
    std::vector<double> reach2(columns, 0.0);
    for (int j = qr.rank(); j < columns; ++j) {
        Span s{x, j, j};
        x[j] = 1.0;
        qr.applyQ(s);
        for (int i = s.lo; i <= s.hi; ++i) {
            reach2[i] += x[i] * x[i];
            x[i] = 0.0;
        }
    }
    d.nullSpaceReaches.assign(columns, 0);
    for (int c = 0; c < columns; ++c)
        d.nullSpaceReaches[c] = reach2[place[c]] > kNullSpaceTolerance * kNullSpaceTolerance;
    return d;
}

}  // namespace clevis
