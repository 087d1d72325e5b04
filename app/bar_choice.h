// The bar a command asks for by name, for `internal-loads` and
// `bar-diagram` alike: a body that is not a bar, the frame or an unknown name
// is refused with the reason (exit 1), naming the bars there are.
#pragma once

#include "core/results/bar_model.h"

#include <stdexcept>
#include <string>
#include <vector>

namespace clevis::cli {

// A request that names something the file does not have, or a position the
// cycle never reaches: exit 1 with this message.
struct Refused : std::runtime_error {
    using std::runtime_error::runtime_error;
};

// "a, b, c"
std::string listOf(const std::vector<std::string>& names);

// Throws Refused.
const BarModel& chooseBar(const BarList& bars, const std::string& name);

}  // namespace clevis::cli
