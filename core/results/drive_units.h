// How a driver's position and effort are shown to people: degrees and N·m
// for rotary drivers, metres and N for linear ones (the core keeps radians
// and metres).
#pragma once

#include "core/solver/compiled_mechanism.h"

#include <string>

namespace clevis {

double driveDisplayValue(DriverType type, double si);
double driveSiValue(DriverType type, double shown);  // the inverse: degrees back to radians
const char* driveDisplayUnit(DriverType type);
const char* effortUnit(DriverType type);  // "N·m" or "N"
// e.g. "motor = 123.40°"; constant-speed cranks are shown modulo one revolution.
std::string formatDrivePosition(const CompiledDriver& d, double si);

}  // namespace clevis
