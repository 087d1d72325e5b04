// Finding a pin's peak by its name, for commands that draw or cut a body
// free where a pin carries its largest load. A pin is a joint or a
// cylinder's end pin ("<driver>.cap", "<driver>.rod", cylinder_ends.h).
#pragma once

#include "core/results/cycle_summary.h"

#include <optional>
#include <string>
#include <vector>

namespace clevis {

// The step where the pin named `name` carries its peak load, or nothing when
// no pin has that name.
std::optional<int> pinPeakStep(const CycleSummary& s, const std::string& name);

// Every pin's name, the joints first, then the cylinders' ends: what a
// message lists when a name is not found.
std::vector<std::string> pinNames(const CycleSummary& s);

}  // namespace clevis
