// The analysis results as a JSON document for other programs: every step and
// the cycle summary, SI units except angles in degrees. The keys and units
// are described in docs/results-format.md.
#pragma once

#include "core/results/cycle_summary.h"
#include "core/results/drive_train.h"
#include "core/results/text_pieces.h"

#include <nlohmann/json.hpp>

#include <string>

namespace clevis {

// The figures over the cycle (the "summary" key), with the drive's figures
// under each driver's name when `drive` is given.
nlohmann::json summaryToJson(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& summary,
                             const DriveResults* drive = nullptr);

// The whole results file, streamed step by step. `sections` (an object)
// adds top-level keys after the summary, e.g. "sizing"; `drive` adds the
// motor and cylinder figures to the summary, each step and the warnings.
std::string resultsJsonText(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& summary,
                            const nlohmann::json& sections = nlohmann::json::object(),
                            const DriveResults* drive = nullptr);

// The same text handed to `write` in pieces as it is made, so that a file of
// tens of megabytes is written without being held whole.
void writeResultsJson(const TextPieces& write, const CompiledMechanism& m, const CycleResult& r,
                      const CycleSummary& summary, const nlohmann::json& sections = nlohmann::json::object(),
                      const DriveResults* drive = nullptr);

}  // namespace clevis
