// The cycle summary as a plain-text report for people: aligned tables with a
// unit on every number, where each peak occurs, the warnings, the energy
// balance check and the limits of the results. A value from a step near a
// singular position carries kNearToggleMark and a note naming the part that
// locks. Printed by clevis-cli and
// reused by the GUI and the PDF report.
#pragma once

#include "core/results/cycle_summary.h"

#include <string>

namespace clevis {

std::string summaryText(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s);

// The mark beside a value from a step flagged near a singular position.
inline constexpr const char* kNearToggleMark = "⚠";

// "near a toggle: coupler and rocker line up at pin B (steps 170–190)".
std::string toggleText(const CompiledMechanism& m, const NearToggle& t);

// The toggle a flagged step belongs to, or null.
const NearToggle* toggleAt(const CycleSummary& s, int step);

}  // namespace clevis
