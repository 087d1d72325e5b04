// The non-SI units a mechanism file uses for angles and rotary speeds, and
// their conversion to and from the SI values of the model.
#pragma once

#include <string>

namespace clevis {

enum class FileUnit {
    Si,      // stored as is: m, m/s, m/s², s
    Degree,  // angles in degrees, angular accelerations in degrees per s²
    Rpm,     // rotary speed in revolutions per minute
};

double toSi(FileUnit unit, double fileValue);

// The file value that reads back as exactly `si`: of the nearby candidates
// the one with the shortest decimal form, so 30° stays "30" after a round
// trip through radians. Falls back to the plain conversion when no candidate
// reads back exactly.
double fromSi(FileUnit unit, double si);

// The shortest decimal text that reads back as exactly `v`.
std::string shortestDecimal(double v);

}  // namespace clevis
