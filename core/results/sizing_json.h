// The sizing of every bar and pin as JSON (docs/results-format.md, "Sizing"): SI
// values with the unit in each key, and for every peak its station, time,
// drive positions and whether it comes from a near-singular position.
#pragma once

#include "core/results/bar_sizing.h"

#include <nlohmann/json.hpp>

namespace clevis {

nlohmann::json sizingToJson(const CompiledMechanism& m, const CycleResult& r, const SizingResult& s);

// {"motor": {"position": 12.5, "unit": "deg"}, …} at step `s`.
nlohmann::json drivePositionsJson(const CompiledMechanism& m, const StepResult& s);

// A peak's value under `key` with its place; null when there is none.
nlohmann::json peakJson(const CompiledMechanism& m, const CycleResult& r, const EnvelopePeak& p, const char* key,
                        double scale = 1.0);

}  // namespace clevis
