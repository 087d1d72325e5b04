// Handbook densities of common machine materials, so a bar can be given as
// "steel" instead of a number.
#pragma once

#include <optional>
#include <span>
#include <string_view>

namespace clevis {

struct Material {
    const char* name;  // as written in a mechanism file
    double density;    // kg/m³
};

std::span<const Material> materials();
std::optional<double> materialDensity(std::string_view name);

}  // namespace clevis
