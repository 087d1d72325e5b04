// The sizing of every bar as plain text for people: peak N, V and M, the
// fibre stresses, utilisation and buckling figures, each with the drive
// position of its peak, a mark on any figure from a near-singular position,
// and the cautions that go with sizing figures; then a table of the pins and
// bearings (pin_sizing.h).
#pragma once

#include "core/results/bar_sizing.h"

#include <string>

namespace clevis {

std::string sizingText(const CompiledMechanism& m, const CycleResult& r, const SizingResult& s);

}  // namespace clevis
