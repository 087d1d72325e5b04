// Mass, centre of mass and moment of inertia of bodies built from bars and
// point masses.
#pragma once

#include "core/model/geometry.h"

#include <vector>

namespace clevis {

struct MassProperties {
    double mass = 0.0;       // kg
    Vec2 cg = Vec2::Zero();  // m, global at the drawn pose
    double inertia = 0.0;    // kg·m² about the centre of mass
};

// Solid bar of rectangular section from a to b: m = ρ·w·t·L, centre at the
// midpoint, I_G = m(L² + w²)/12 about the axis normal to the plane.
MassProperties barMassProperties(const Vec2& a, const Vec2& b, double width, double thickness, double density);

// Flat plate of thickness t and density ρ whose outline is the simple
// polygon p₀…pₙ₋₁ (either orientation). With cᵢ = xᵢyᵢ₊₁ − xᵢ₊₁yᵢ (indices
// mod n, coordinates relative to p₀ so that large offsets do not cancel):
//   area         A   = ½ Σ cᵢ
//   centroid     C   = (1 / 6A) Σ (pᵢ + pᵢ₊₁) cᵢ
//   polar moment J₀  = (1/12) Σ cᵢ (xᵢ² + xᵢxᵢ₊₁ + xᵢ₊₁² + yᵢ² + yᵢyᵢ₊₁ + yᵢ₊₁²)
// (Green's theorem over each edge), and m = ρ·t·|A|, I_G = ρ·t·(|J₀| − |A|·|C|²).
MassProperties plateMassProperties(const std::vector<Vec2>& outline, double thickness, double density);

// Point mass: no inertia about its own centre.
MassProperties pointMassProperties(double mass, const Vec2& at);

// Sum of parts: masses add, the centre is the mass-weighted mean and each
// part's inertia moves to the common centre by the parallel-axis theorem
// I = I_G + m·d².
MassProperties combine(const std::vector<MassProperties>& parts);

}  // namespace clevis
