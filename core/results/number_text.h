// Numbers as people read them: a set number of significant figures in plain
// decimal notation (scientific only for very small or very large values).
#pragma once

#include <string>

namespace clevis {

// 1234.5 → "1235", 0.012345 → "0.01235", 1.2e-7 → "1.200e-07" (4 digits).
std::string significant(double value, int digits = 4);

// A fraction as a percentage to two significant figures: 1.2e-5 → "0.0012 %".
std::string percent(double fraction);

}  // namespace clevis
