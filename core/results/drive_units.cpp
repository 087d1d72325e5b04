#include "core/results/drive_units.h"

#include <cmath>
#include <cstdio>

namespace clevis {

double driveDisplayValue(DriverType type, double si) { return type == DriverType::Rotary ? radToDeg(si) : si; }

double driveSiValue(DriverType type, double shown) { return type == DriverType::Rotary ? degToRad(shown) : shown; }

const char* driveDisplayUnit(DriverType type) { return type == DriverType::Rotary ? "°" : "m"; }

const char* effortUnit(DriverType type) { return type == DriverType::Rotary ? "N·m" : "N"; }

std::string formatDrivePosition(const CompiledDriver& d, double si)
{
    char text[96];
    if (d.type == DriverType::Rotary) {
        // A crank turning whole revolutions is read as a crank angle, 0°–360°.
        double deg = radToDeg(si);
        if (std::holds_alternative<ConstantSpeed>(d.motion)) deg -= 360.0 * std::floor(deg / 360.0);
        std::snprintf(text, sizeof text, "%s = %.2f°", d.name.c_str(), deg);
    } else std::snprintf(text, sizeof text, "%s = %.5f m", d.name.c_str(), si);
    return text;
}

}  // namespace clevis
