// The cycle summary as a plain-text report for people: aligned tables with a
// unit on every number, where each peak occurs, the warnings, the energy
// balance check and the limits of the results. Printed by clevis-cli and
// reused by the GUI and the PDF report.
#pragma once

#include "core/results/cycle_summary.h"

#include <string>

namespace clevis {

std::string summaryText(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s);

}  // namespace clevis
