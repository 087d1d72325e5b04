// A body seen as a straight bar for its internal loads: the line from its
// first end to its second, and its mass laid along that line.
//
// Which bodies are bars: a body with a `section` (the line joins the
// section's ends, as the mass properties take them), or a body with exactly
// two joints (the line joins them, in document order). A plate (three or
// more joints and no section), a body joined at one point only, or one whose
// two joints coincide is not a bar, and says why.
//
// Mass along the line (s from the first end, unit vector e along the bar, n
// = e turned a quarter turn counter-clockwise):
//  - a section bar: its own mass m = ρ·w·t·L uniform over 0 ≤ s ≤ L, and the
//    rotary inertia of the width, m·w²/12, spread as a couple per length
//    (together the solver's I_G = m(L² + w²)/12);
//  - typed-in mass m, centre G and I_G: a uniform bar of the same mass and
//    centre, laid parallel to the line through G (offset d along n), centred
//    at G's station s_G and as long as it can be while staying between the
//    ends and not exceeding the inertia: ℓ = min(2·s_G, 2·(L − s_G),
//    √(12·I_G/m)); the rest of the inertia, I_G − m·ℓ²/12 ≥ 0, spread over it
//    as a couple per length. Same m, G and I_G: the loads close exactly;
//  - point masses stay where they are, as concentrated loads.
#pragma once

#include "core/model/mechanism.h"
#include "core/solver/compiled_mechanism.h"

#include <string>
#include <vector>

namespace clevis {

struct BarEnd {
    BodyPoint point;   // on the bar's body
    std::string name;  // the joint (or cylinder) there; empty: a free end
};

// Mass m spread uniformly over from ≤ s ≤ to (a point when from == to), on a
// line parallel to the bar at `offset` along n, with `rotary` (kg·m²) of
// inertia about each slice's own centre, summed.
struct MassSpread {
    double mass = 0.0;            // kg
    double from = 0.0, to = 0.0;  // m, stations
    double offset = 0.0;          // m, along n
    double rotary = 0.0;          // kg·m²
};

struct BarModel {
    int body = kGround;
    std::string bodyName;
    BarEnd ends[2];
    double length = 0.0;  // m
    MassSpread spread;
    std::vector<std::pair<double, BodyPoint>> pointMasses;  // kg at a body point
    bool idealised = false;                                 // typed-in mass replaced by the uniform equivalent
    // A section bar's A = w·t and elastic section modulus Z = t·w²/6 for
    // bending in the plane (the extreme fibres at ±w/2); 0 without a section.
    double area = 0.0;            // m²
    double sectionModulus = 0.0;  // m³
};

struct NotABar {
    int body = kGround;
    std::string bodyName;
    std::string reason;
};

struct BarList {
    std::vector<BarModel> bars;
    std::vector<NotABar> others;
};

// Every moving body of `m` (compiled from `doc`), as a bar or not, in body order.
BarList findBars(const Mechanism& doc, const CompiledMechanism& m);

}  // namespace clevis
