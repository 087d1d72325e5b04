// Every sized part by how near it comes to a limit: the figure a designer
// sorts by to find the part to look at first. A part's figure is the largest
// of its utilisations: for a bar its peak fibre stress over the allowable and
// its peak compression over the Euler load (so a slender link in compression
// is not hidden behind a low stress); for a pin its shear stress, bearing
// pressure and p·v over the allowables given. Fractions of the user's
// allowables (or of the Euler load), not a verdict of safety.
#pragma once

#include "core/results/bar_sizing.h"

#include <optional>
#include <string>
#include <vector>

namespace clevis {

struct PartUtilisation {
    enum class Kind { Bar, Pin } kind = Kind::Bar;
    int index = -1;       // into SizingResult::bars or ::pins
    std::string name;     // the body or joint
    double value = 0.0;   // the largest figure, a fraction
    std::string governs;  // which figure it is: "stress", "buckling", "pin shear", "bearing pressure", "p·v"
    int step = -1;        // where it peaks
    bool nearSingular = false;
};

// Parts with at least one figure, the largest first (ties keep the order:
// bars, then pins, each in the file's order).
std::vector<PartUtilisation> rankByUtilisation(const CycleResult& r, const SizingResult& s);

// The one figure of bar `b`, or of pin `p`, if it has one.
std::optional<PartUtilisation> barUtilisation(const CycleResult& r, const SizingResult& s, int b);
std::optional<PartUtilisation> pinUtilisation(const CycleResult& r, const SizingResult& s, int p);

}  // namespace clevis
