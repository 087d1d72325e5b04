// One step of the Dormand–Prince 5(4) Runge–Kutta pair: a fifth-order
// solution and, from the embedded fourth-order one, an estimate of its local
// error. Seven stages, the last at the step's end with the new solution, so
// it is the next step's first (first same as last). The tableau
// (c: nodes, a: stage weights, b: fifth order, e = b − b̂: error weights):
//   c = 0, 1/5, 3/10, 4/5, 8/9, 1, 1
//   a₂ = 1/5
//   a₃ = 3/40, 9/40
//   a₄ = 44/45, −56/15, 32/9
//   a₅ = 19372/6561, −25360/2187, 64448/6561, −212/729
//   a₆ = 9017/3168, −355/33, 46732/5247, 49/176, −5103/18656
//   b  = 35/384, 0, 500/1113, 125/192, −2187/6784, 11/84, 0
//   e  = 71/57600, 0, −71/16695, 71/1920, −17253/339200, 22/525, −1/40
#pragma once

#include <array>
#include <cstddef>

namespace clevis {

// The distinct nodes c of the stages (the sixth and seventh share c = 1).
inline constexpr std::array<double, 6> kDormandPrinceNodes = {0.0, 1.0 / 5, 3.0 / 10, 4.0 / 5, 8.0 / 9, 1.0};
// The fifth-order weights b at those nodes: as a quadrature rule, ∫₀¹ f ≈ Σ b·f(c).
inline constexpr std::array<double, 6> kDormandPrinceWeights = {35.0 / 384,     0.0,      500.0 / 1113, 125.0 / 192,
                                                                -2187.0 / 6784, 11.0 / 84};

template <std::size_t N>
struct DormandPrinceStep {
    std::array<double, N> y{};      // the fifth-order solution at the step's end
    std::array<double, N> slope{};  // its derivative there (the seventh stage)
    std::array<double, N> error{};  // fifth- minus fourth-order solution
};

// `f(node, y)` is the derivative at node `node` (an index into
// kDormandPrinceNodes) of the step; `slope` that at its start (node 0).
template <std::size_t N, class F>
DormandPrinceStep<N> dormandPrinceStep(const std::array<double, N>& y0, const std::array<double, N>& slope, double h,
                                       F&& f)
{
    static constexpr double a[6][6] = {{1.0 / 5},
                                       {3.0 / 40, 9.0 / 40},
                                       {44.0 / 45, -56.0 / 15, 32.0 / 9},
                                       {19372.0 / 6561, -25360.0 / 2187, 64448.0 / 6561, -212.0 / 729},
                                       {9017.0 / 3168, -355.0 / 33, 46732.0 / 5247, 49.0 / 176, -5103.0 / 18656},
                                       {35.0 / 384, 0.0, 500.0 / 1113, 125.0 / 192, -2187.0 / 6784, 11.0 / 84}};
    static constexpr double e[7] = {71.0 / 57600,      0.0,        -71.0 / 16695, 71.0 / 1920,
                                    -17253.0 / 339200, 22.0 / 525, -1.0 / 40};
    std::array<std::array<double, N>, 7> k;
    k[0] = slope;
    std::array<double, N> y;
    for (int s = 1; s < 7; ++s) {
        for (std::size_t n = 0; n < N; ++n) {
            double sum = 0.0;
            for (int j = 0; j < s; ++j) sum += a[s - 1][j] * k[j][n];
            y[n] = y0[n] + h * sum;
        }
        k[s] = f(s < 6 ? s : 5, y);  // the seventh stage is at the sixth's node, with the new solution
    }
    DormandPrinceStep<N> out;
    out.y = y;
    out.slope = k[6];
    for (std::size_t n = 0; n < N; ++n) {
        double sum = 0.0;
        for (int s = 0; s < 7; ++s) sum += e[s] * k[s][n];
        out.error[n] = h * sum;
    }
    return out;
}

}  // namespace clevis
