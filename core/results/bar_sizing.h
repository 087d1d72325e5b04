// Sizing figures of each bar over the cycle, from its exact internal-load
// envelope (bar_envelope.h), its section and its material:
//
//   normal stress at the extreme fibres    σ = N/A ± M/Z,  A = w·t,  Z = t·w²/6
//   mean shear stress                      τ = V/A  (1.5·τ at the neutral axis of a rectangle)
//   utilisation                            U = max(σ_tension, |σ_compression|) / σ_allow,
//                                          σ_allow = allowable_stress, or yield / safety_factor
//   Euler load, pinned at both ends        P_cr = π²·E·I / L²,
//                                          in plane I = t·w³/12, out of plane I = w·t³/12
//   buckling ratio                         |N_compression| / min(P_cr)
//   slenderness                            λ = L / r,  r = √(I_min / A)
//   Euler's range (common practice)        λ ≥ λ_c = π·√(2E / σ_y), the slenderness where
//                                          Johnson's parabola meets Euler's curve (about 133
//                                          for S235 steel, 74 for 6082-T6 aluminium)
//
// w is the width in the plane of motion, t the thickness out of it, L the
// bar's length between its ends. Utilisations are fractions of the user's
// allowables, not a verdict: they leave out dynamic and service factors,
// fatigue, stress concentrations at holes and the joints themselves.
#pragma once

#include "core/results/bar_envelope.h"
#include "core/results/pin_sizing.h"

#include <optional>
#include <string>
#include <vector>

namespace clevis {

struct SectionSizing {
    double width = 0.0, thickness = 0.0;                   // m
    double area = 0.0;                                     // m²
    double inPlaneInertia = 0.0, outOfPlaneInertia = 0.0;  // m⁴
    std::string material;                                  // empty: given by density only
    std::optional<double> youngsModulus, yieldStrength;    // Pa
    std::optional<double> allowable;                       // Pa
    std::optional<double> safetyFactor;                    // when the allowable is yield / factor
    EnvelopePeak shearStress;                              // Pa, V/A at the |V| peak
    std::optional<double> utilisation;                     // of the governing normal stress
    EnvelopePeak governing;                                // Pa, the fibre stress the utilisation uses
    std::optional<double> eulerInPlane, eulerOutOfPlane;   // N
    std::optional<double> bucklingRatio;                   // 0 when never in compression
    double slenderness = 0.0;                              // L / r_min
    std::optional<double> eulerLimit;                      // λ_c, when the yield strength is known
};

struct BarSizing {
    int body = kGround;
    std::string name;
    double length = 0.0;  // m
    BarEnvelope envelope;
    std::optional<SectionSizing> section;  // none: typed-in mass, no section to stress
    std::vector<std::string> notes;        // why a figure is missing, or a warning on one
};

struct SizingResult {
    std::vector<BarSizing> bars;
    std::vector<NotABar> others;
    std::vector<PinSizing> pins;  // filled by sizePins (pin_sizing.h)
};

// Every bar of `doc` (compiled as `m`, solved as `r`); `pins` left empty.
SizingResult sizeBars(const Mechanism& doc, const CompiledMechanism& m, const CycleResult& r);

// Every bar and every pin: what the CLI, the desktop and the report show.
SizingResult sizeParts(const Mechanism& doc, const CompiledMechanism& m, const CycleResult& r);

// True when the peak comes from a step flagged near a singular position.
bool nearSingular(const CycleResult& r, const EnvelopePeak& peak);

}  // namespace clevis
