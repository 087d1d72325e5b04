// The projection g = eᵀd of the gap d = P_j − P_i between a point on body i
// and a point on body j onto a direction e = A_i e' fixed in body i. Sliders,
// pin-in-slot joints and linear drivers at a slider are all built from it.
//
//   g    = eᵀ(r_j + A_j s_j − r_i − A_i s_i)
//   g_q  = [ −eᵀ,  (B_i e')ᵀd − eᵀB_i s_i  |  eᵀ,  eᵀB_j s_j ]
//   g̈    = g_q q̈ + quadratic, with
//   quadratic = −φ̇_i² eᵀd + 2φ̇_i (B_i e')ᵀḋ + eᵀ(A_i s_i φ̇_i² − A_j s_j φ̇_j²)
//
// so a row g − c(t) = 0 has γ = c̈ − quadratic.
#pragma once

#include "core/solver/constraints/constraint.h"

namespace clevis {

struct LineGap {
    BodyPoint onI, onJ;
    Vec2 directionLocal;  // e' in body i

    double value(const Pose& q) const;
    void partials(const Pose& q, int row, const RowWriter& out) const;
    double quadratic(const Pose& q, const VectorXd& qd) const;
};

}  // namespace clevis
