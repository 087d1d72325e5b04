// Sizing figures of each pin and its bearing over the cycle, from the joint's
// reaction and the bodies' angular velocities at every step:
//
//   pin shear stress (mean)       τ = |F| / (n·π·d²/4)     n shear planes (1 single, 2 double shear)
//   bearing pressure (projected)  p = |F| / (d·l)          l the bearing length
//   sliding speed at the bore     v = |ω₂ − ω₁|·d/2        ω of each body, 0 for ground; for a pin in a
//                                                          slot, the pin's turning relative to the slot
//   pressure × sliding speed      p·v                      (the figure plain-bearing selection uses)
//   utilisations                  τ/τ_allow, p/p_allow, p·v/(p·v)_allow, each at its peak
//
// |F| is the magnitude of the joint's reaction (results.h). τ and p peak
// where |F| does; p·v peaks where their product does. l is the user's
// bearing length, or by default the thickness of the thinner section or
// plate the pin goes through (ground's is not known, so a pin on ground takes
// the moving body's). Utilisations are fractions of the user's allowables,
// not a verdict: they leave out bending of the pin, the lug's edge distance
// and tear-out, fit and clearance, lubrication and wear life.
#pragma once

#include "core/results/bar_envelope.h"
#include "core/results/results.h"

#include <optional>
#include <string>
#include <vector>

namespace clevis {

// The length a pin bears on, and the body whose thickness gave it (empty:
// given by the user).
struct BearingLength {
    double length = 0.0;  // m
    std::string fromBody;
};

// The bearing length a pin through `bodies` (in `doc`) takes when none is
// typed: the thinnest thickness among their sections and plates; none when
// no body has one.
std::optional<BearingLength> thinnestThickness(const Mechanism& doc, const std::vector<std::string>& bodies);

// Peaks use EnvelopePeak for their step (its station `s` is not used).
struct PinSizing {
    int joint = -1;        // index into the joints, or -1 for a cylinder's end
    int cylinderEnd = -1;  // index into cylinderEnds(m) (cylinder_ends.h), or -1 for a joint
    std::string name;
    EnvelopePeak force;                    // N, the largest |F|
    std::optional<PinData> pin;            // none: only the force is reported
    std::optional<BearingLength> bearing;  // none: no bearing length known
    EnvelopePeak shearStress;              // Pa, at the |F| peak
    EnvelopePeak pressure;                 // Pa, at the |F| peak (with a bearing length)
    EnvelopePeak slidingSpeed;             // m/s, the largest v
    EnvelopePeak pv;                       // Pa·m/s, the largest p·v (with a bearing length)
    double speedAtPv = 0.0;                // m/s, v where p·v peaks
    std::optional<double> shearUtilisation, pressureUtilisation, pvUtilisation;
    std::vector<std::string> notes;  // why a figure is missing
};

// Every pin and pin-in-slot joint of `doc` (compiled as `m`, solved as `r`),
// in the file's order, then the pins at cylinders' ends (cylinder_ends.h),
// whose sliding speed is the body's turning against the cylinder's line,
// |ω_body − ω_c|, and whose bearing length defaults to the body's thickness
// alone; sliders have no pin and are left out.
std::vector<PinSizing> sizePins(const Mechanism& doc, const CompiledMechanism& m, const CycleResult& r);

}  // namespace clevis
