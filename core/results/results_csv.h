// The per-step results as a CSV table for spreadsheets: one row per step,
// each column headed by its name and unit, e.g. "O.fx [N]". The columns are
// described in docs/results-format.md.
#pragma once

#include "core/results/drive_train.h"
#include "core/results/text_pieces.h"

#include <string>

namespace clevis {

// Numbers in the shortest form that reads back to the same double, with a
// '.' whatever the locale. With `drive`, its columns follow the others: the
// speed of a driver whose motion was found, the speed and torque of each
// motor behind a gearbox.
std::string resultsCsvText(const CompiledMechanism& m, const CycleResult& r, const DriveResults* drive = nullptr);

// The same text handed to `write` in pieces as it is made.
void writeResultsCsv(const TextPieces& write, const CompiledMechanism& m, const CycleResult& r,
                     const DriveResults* drive = nullptr);

}  // namespace clevis
