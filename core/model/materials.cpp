#include "core/model/materials.h"

#include <algorithm>

namespace clevis {
namespace {

// Typical values at room temperature; actual grades vary. Densities are
// handbook values; Young's moduli and yield strengths (0.2 % proof stress,
// minimum values of the grade named) are given from memory of these sources:
//  steel            — S235 (EN 10025-2, t ≤ 16 mm): R_eH 235 MPa; E 210 GPa (EN 1993-1-1, 3.2.6);
//  stainless_steel  — 1.4301 / 304 hot-rolled plate (EN 10088-2): R_p0.2 210 MPa; E 200 GPa (EN 1993-1-4);
//  aluminium_alloy  — EN AW-6082-T6 extrusion, t ≤ 5 mm (EN 1999-1-1, table 3.2b): f_0 250 MPa; E 70 GPa;
//  cast_iron        — grey iron EN-GJL-250 (EN 1561): E about 110 GPa; brittle, no yield point, so no
//                     yield strength: give such a bar an allowable stress;
//  brass            — CuZn39Pb3 / CW614N, R430 (EN 12164): R_p0.2 about 250 MPa; E about 97 GPa;
//  acetal           — POM copolymer, makers' data sheets (ISO 527, 23 °C, short term): yield 65 MPa; E 2.8 GPa;
//  nylon            — PA 6 conditioned (23 °C, 50 % RH), makers' data sheets: yield 50 MPa; E 1.4 GPa.
// Plastics creep and soften with heat and moisture: their figures hold for short loads at room temperature.
constexpr Material kMaterials[] = {
    {"steel", 7850.0, 210e9, 235e6},          {"stainless_steel", 8000.0, 200e9, 210e6},
    {"aluminium_alloy", 2700.0, 70e9, 250e6}, {"cast_iron", 7200.0, 110e9, std::nullopt},
    {"brass", 8500.0, 97e9, 250e6},           {"acetal", 1410.0, 2.8e9, 65e6},
    {"nylon", 1140.0, 1.4e9, 50e6},
};

const Material* builtIn(std::string_view name)
{
    const auto m =
        std::find_if(std::begin(kMaterials), std::end(kMaterials), [&](const Material& m) { return name == m.name; });
    return m == std::end(kMaterials) ? nullptr : m;
}

}  // namespace

std::span<const Material> materials() { return kMaterials; }

std::optional<double> materialDensity(std::string_view name)
{
    const Material* m = builtIn(name);
    if (!m) return std::nullopt;
    return m->density;
}

std::optional<MaterialProperties> findMaterial(const std::vector<MaterialProperties>& defined, std::string_view name)
{
    for (const auto& m : defined)
        if (m.name == name) return m;
    const Material* m = builtIn(name);
    if (!m) return std::nullopt;
    return MaterialProperties{m->name, m->density, m->youngsModulus, m->yieldStrength};
}

std::optional<MaterialProperties> namedMaterial(const std::vector<MaterialProperties>& defined, const std::string& name,
                                                double density)
{
    if (name.empty()) return std::nullopt;
    for (const auto& m : defined)
        if (m.name == name) return m.density == density ? std::optional(m) : std::nullopt;
    const Material* m = builtIn(name);
    if (!m || m->density != density) return std::nullopt;
    return MaterialProperties{m->name, m->density, m->youngsModulus, m->yieldStrength};
}

}  // namespace clevis
