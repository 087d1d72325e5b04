#include "core/model/materials.h"

#include <algorithm>

namespace clevis {
namespace {

// Typical values; actual grades vary by a few percent.
constexpr Material kMaterials[] = {
    {"steel", 7850.0}, {"stainless_steel", 8000.0}, {"aluminium_alloy", 2700.0}, {"cast_iron", 7200.0},
    {"brass", 8500.0}, {"acetal", 1410.0},          {"nylon", 1140.0},
};

}  // namespace

std::span<const Material> materials() { return kMaterials; }

std::optional<double> materialDensity(std::string_view name)
{
    const auto m =
        std::find_if(std::begin(kMaterials), std::end(kMaterials), [&](const Material& m) { return name == m.name; });
    if (m == std::end(kMaterials)) return std::nullopt;
    return m->density;
}

}  // namespace clevis
