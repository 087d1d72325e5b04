// The "Drive" section of the analysis text: for each motor behind a gearbox
// its torque, speed, power, regenerated energy and the inertia it sees, the
// ratio studies asked for, each cylinder's pressure and flow, and what these
// figures leave out. Empty when no driver has drive data.
#pragma once

#include "core/results/drive_train.h"

#include <string>

namespace clevis {

std::string driveText(const CompiledMechanism& m, const CycleResult& r, const DriveResults& d);

// What the motor and cylinder figures leave out, as printed under them
// (indented, wrapped lines); the report sets the same words as paragraphs.
extern const char* const kMotorCaution;
extern const char* const kCylinderCaution;

// The rule of thumb the inertia ratio is read against, said to be one:
// "common practice, a rule of thumb: within about 10, …".
std::string inertiaGuideText();

// Flows are shown in L/min, the unit of pump and valve data sheets.
double litresPerMinute(double cubicMetresPerSecond);

}  // namespace clevis
