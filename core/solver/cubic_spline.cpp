#include "core/solver/cubic_spline.h"

#include <algorithm>

namespace clevis {

// Second derivatives from the tridiagonal system
// h₀m₀' ... : h_{i-1} ddy_{i-1} + 2(h_{i-1}+h_i) m_i + h_i ddy_{i+1} = 6(Δ_i − Δ_{i-1}),
// with m₀ = m_n = 0 (natural ends), solved by the Thomas algorithm.
CubicSpline::CubicSpline(std::vector<double> x, std::vector<double> y)
    : x_(std::move(x)), y_(std::move(y)), ddy_(x_.size(), 0.0)
{
    const std::size_t n = x_.size();
    if (n < 3) return;
    std::vector<double> c(n, 0.0), d(n, 0.0);
    for (std::size_t i = 1; i + 1 < n; ++i) {
        const double h0 = x_[i] - x_[i - 1], h1 = x_[i + 1] - x_[i];
        const double rhs = 6.0 * ((y_[i + 1] - y_[i]) / h1 - (y_[i] - y_[i - 1]) / h0);
        const double diag = 2.0 * (h0 + h1) - h0 * c[i - 1];
        c[i] = h1 / diag;
        d[i] = (rhs - h0 * d[i - 1]) / diag;
    }
    for (std::size_t i = n - 2; i >= 1; --i) ddy_[i] = d[i] - c[i] * ddy_[i + 1];
}

CubicSpline::Value CubicSpline::operator()(double x) const
{
    if (x_.empty()) return {0, 0, 0};
    if (x <= x_.front()) return {y_.front(), 0, 0};
    if (x >= x_.back()) return {y_.back(), 0, 0};
    const std::size_t i = std::upper_bound(x_.begin(), x_.end(), x) - x_.begin() - 1;
    const double h = x_[i + 1] - x_[i];
    const double a = (x_[i + 1] - x) / h, b = (x - x_[i]) / h;
    const double y =
        a * y_[i] + b * y_[i + 1] + ((a * a * a - a) * ddy_[i] + (b * b * b - b) * ddy_[i + 1]) * h * h / 6.0;
    const double dy = (y_[i + 1] - y_[i]) / h + ((1 - 3 * a * a) * ddy_[i] + (3 * b * b - 1) * ddy_[i + 1]) * h / 6.0;
    const double ddy = a * ddy_[i] + b * ddy_[i + 1];
    return {y, dy, ddy};
}

}  // namespace clevis
