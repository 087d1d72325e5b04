// The analysis results as a JSON document for other programs: every step and
// the cycle summary, SI units except angles in degrees. The keys and units
// are described in docs/results-format.md.
#pragma once

#include "core/results/cycle_summary.h"

#include <nlohmann/json.hpp>

#include <string>

namespace clevis {

// The figures over the cycle (the "summary" key).
nlohmann::json summaryToJson(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& summary);

// The whole results file, streamed step by step. `sections` (an object)
// adds top-level keys after the summary, e.g. "sizing".
std::string resultsJsonText(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& summary,
                            const nlohmann::json& sections = nlohmann::json::object());

}  // namespace clevis
