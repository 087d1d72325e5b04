// Handbook properties of common machine materials, so a bar can be given as
// "steel" instead of numbers, and the materials a file defines itself.
#pragma once

#include <optional>
#include <span>
#include <string>
#include <string_view>
#include <vector>

namespace clevis {

// A built-in material (materials.cpp names the source of each value).
struct Material {
    const char* name;                     // as written in a mechanism file
    double density;                       // kg/m³
    std::optional<double> youngsModulus;  // Pa
    std::optional<double> yieldStrength;  // Pa; none for a brittle material
};

// A material as a mechanism uses it: built in, or defined in its file.
struct MaterialProperties {
    std::string name;
    double density = 0.0;                 // kg/m³
    std::optional<double> youngsModulus;  // Pa
    std::optional<double> yieldStrength;  // Pa

    bool operator==(const MaterialProperties&) const = default;
};

std::span<const Material> materials();
std::optional<double> materialDensity(std::string_view name);

// The material called `name`: one the file defines (`defined`) or else a
// built-in one; none if neither has it.
std::optional<MaterialProperties> findMaterial(const std::vector<MaterialProperties>& defined, std::string_view name);

// The material a section or plate names, if it still counts: found, and
// `density` still its density (an edit of the density alone drops it).
std::optional<MaterialProperties> namedMaterial(const std::vector<MaterialProperties>& defined, const std::string& name,
                                                double density);

}  // namespace clevis
