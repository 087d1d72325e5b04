// The analysis results as a JSON document for other programs: every step and
// the cycle summary, SI units except angles in degrees. The keys and units
// are described in docs/results-format.md.
#pragma once

#include "core/results/cycle_summary.h"

#include <nlohmann/json.hpp>

namespace clevis {

nlohmann::json resultsToJson(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& summary);

}  // namespace clevis
