// The internal loads along a bar at one step: axial force N, shear force V
// and bending moment M at stations from its first end to its second.
//
// Sign conventions (docs/method.md, "Internal loads along a bar"): s runs
// from the first end (s = 0) to the second (s = L) along e; n is e turned a
// quarter turn counter-clockwise. Cut the bar at s; on the near part
// (0 … s) the far part acts with N·e − V·n and a couple M
// (counter-clockwise positive). So N > 0 is tension; V > 0 pushes the near
// part's cut face towards −n; M > 0 sags the bar towards −n (fibres on the n
// side in compression). Looking along the bar with n up, these are the
// beam-table signs: V = +R at a left support, M = +wL²/8 at mid-span of a
// simply supported beam under a downward load w.
//
// What loads the bar (d'Alembert: each mass element dm adds dm·(g − a) at its
// point, a the acceleration of that point of the rigid body):
//   concentrated — joint reactions and driver actions, applied forces,
//     torques, springs, dampers, torsion springs, point masses; each moved
//     onto the line at the foot s_i of its point (clamped to the ends) as the
//     force F_i and the couple C_i + (P_i − foot) × F_i;
//   distributed — the spread mass of bar_model.h, μ = m/ℓ per length on
//     from ≤ s ≤ to at offset d along n:
//       q(s) = μ·(g − a₀ − s·(α·n − ω²·e)),   a₀ = a(A + d·n),
//       c(s) = −(J/ℓ)·α − d·(q(s)·e),          J the spread's rotary inertia,
//     where a(P) = a_G + α·(P − G)⊥ − ω²·(P − G).
// Near-side sums at a cut x (items with s_i ≤ x; at the second end, s_i < L):
//   F(x) = Σ F_i + ∫ q ds,
//   M_x(x) = Σ [C_i + (s_i − x)·(F_i·n)] + ∫ [(s − x)·(q·n) + c] ds,
// and N = −F·e, V = F·n, M = −M_x. The integrals of the linear q are taken
// in closed form (see internal_loads.cpp).
#pragma once

#include "core/results/bar_model.h"
#include "core/results/free_body.h"

#include <vector>

namespace clevis {

struct BarStation {
    double s = 0.0;       // m from the first end
    double axial = 0.0;   // N, tension positive
    double shear = 0.0;   // N
    double moment = 0.0;  // N·m
};

// N equally spaced stations (N ≥ 2, both ends included) of `bar` at step
// `s`; `items` is what acts on the bar's body there (freeBodyItems(m, s)
// [bar.body]), whose weight item gives way to the mass along the line. At a
// station where a concentrated load sits, the value just beyond it (towards
// the second end); at the second end, the value just before it. Throws
// std::invalid_argument for fewer than two stations.
std::vector<BarStation> internalLoads(const CompiledMechanism& m, const BarModel& bar, const StepResult& s,
                                      const std::vector<FreeBodyItem>& items, int stations);

}  // namespace clevis
