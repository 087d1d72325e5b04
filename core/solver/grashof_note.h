// For the solver's diagnosis of a four-bar (three moving links, four pins,
// one rotary driver at a ground pin): its Grashof class, from the link
// lengths at the drawn pose, and what that class means for the driven link,
// in one sentence. It explains why the drive cannot turn a full revolution
// or meets a toggle, so it is empty for a four-bar whose driven link turns
// fully and for any other mechanism.
#pragma once

#include "core/solver/compiled_mechanism.h"

#include <string>

namespace clevis {

std::string grashofNote(const CompiledMechanism& m);

}  // namespace clevis
