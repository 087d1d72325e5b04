// Materials in mechanism files: the file's own materials with Young's
// modulus and yield strength, a section's material kept by name, the
// allowables of a bar, and the reader's refusals, each naming its path.
#include "core/file/mechanism_file.h"
#include "core/model/model_error.h"

#include <gtest/gtest.h>
#include <nlohmann/json.hpp>

namespace clevis {
namespace {

using nlohmann::json;

// A crank and a rod of a slider-crank, the rod a named-material bar.
json document()
{
    return json::parse(R"({
      "clevis": 1,
      "materials": [{"name": "S355", "density": 7850, "youngs_modulus": 2.1e11, "yield_strength": 3.55e8}],
      "bodies": [
        {"name": "crank", "mass": 1, "cg": [0, 0], "inertia": 0.001},
        {"name": "rod", "section": {"width": 0.02, "thickness": 0.008, "material": "S355", "safety_factor": 2}}
      ],
      "joints": [
        {"name": "O", "type": "pin", "bodies": ["ground", "crank"], "at": [0, 0]},
        {"name": "A", "type": "pin", "bodies": ["crank", "rod"], "at": [0.05, 0]},
        {"name": "B", "type": "pin_in_slot", "bodies": ["ground", "rod"], "at": [0.25, 0]}
      ],
      "drivers": [{"name": "motor", "type": "rotary", "joint": "O", "speed_rpm": 60}]
    })");
}

std::string errorFor(const std::function<void(json&)>& spoil)
{
    json d = document();
    spoil(d);
    try {
        parseMechanism(d.dump());
    } catch (const ModelError& e) {
        return e.what();
    }
    return "(no error)";
}

TEST(MaterialsFile, DefinedMaterialGivesDensityAndIsKeptByName)
{
    const Mechanism m = parseMechanism(document().dump()).mechanism;
    ASSERT_EQ(m.materials.size(), 1u);
    EXPECT_EQ(m.materials[0].yieldStrength, 3.55e8);
    EXPECT_EQ(m.materials[0].youngsModulus, 2.1e11);
    const BarSection& s = *m.bodies[1].section;
    EXPECT_EQ(s.density, 7850.0);
    EXPECT_EQ(s.material, "S355");
    EXPECT_EQ(s.safetyFactor, 2.0);
    EXPECT_FALSE(s.allowableStress);
    // Saved and read again: the same mechanism, the material still named.
    const std::string saved = saveMechanismText(m);
    EXPECT_NE(saved.find("\"material\": \"S355\""), std::string::npos) << saved;
    EXPECT_EQ(parseMechanism(saved).mechanism, m);
}

TEST(MaterialsFile, BuiltInMaterialsCarryHandbookStrengths)
{
    const auto steel = findMaterial({}, "steel");
    ASSERT_TRUE(steel);
    EXPECT_EQ(steel->youngsModulus, 210e9);  // EN 1993-1-1, 3.2.6
    EXPECT_EQ(steel->yieldStrength, 235e6);  // S235, EN 10025-2
    EXPECT_FALSE(findMaterial({}, "cast_iron")->yieldStrength) << "grey iron is brittle: no yield point";
    EXPECT_FALSE(findMaterial({}, "unobtainium"));
}

// A file of before this change (density only, or a built-in name, no
// allowables) reads as before.
TEST(MaterialsFile, OldFilesLoadUnchanged)
{
    json d = document();
    d.erase("materials");
    d["bodies"][1]["section"] = {{"width", 0.02}, {"thickness", 0.008}, {"density", 7850}};
    const Mechanism m = parseMechanism(d.dump()).mechanism;
    EXPECT_TRUE(m.materials.empty());
    EXPECT_EQ(m.bodies[1].section->density, 7850.0);
    EXPECT_TRUE(m.bodies[1].section->material.empty());
    EXPECT_EQ(saveMechanismText(m).find("\"material\""), std::string::npos);
    EXPECT_TRUE(parseMechanism(d.dump()).warnings.empty());
}

// An edit of the density alone (the desktop's density field) drops the
// name, so another material's strength is never kept with it.
TEST(MaterialsFile, ChangedDensityDropsTheMaterialName)
{
    Mechanism m = parseMechanism(document().dump()).mechanism;
    m.bodies[1].section->safetyFactor.reset();
    m.bodies[1].section->density = 2700.0;
    const Mechanism back = validateMechanism(m);
    EXPECT_TRUE(back.bodies[1].section->material.empty());
    EXPECT_EQ(back.bodies[1].section->density, 2700.0);
}

TEST(MaterialsFile, BadAllowablesAndMaterialsAreRefusedNamingThePath)
{
    const auto section = [](json& d) -> json& { return d["bodies"][1]["section"]; };
    EXPECT_EQ(errorFor([&](json& d) {
                  section(d).erase("safety_factor");
                  section(d)["allowable_stress"] = 0;
              }),
              "bodies[1].section.allowable_stress: must be a finite number > 0 (got 0)");
    EXPECT_EQ(errorFor([&](json& d) {
                  section(d).erase("safety_factor");
                  section(d)["allowable_stress"] = -1e8;
              }),
              "bodies[1].section.allowable_stress: must be a finite number > 0 (got -1e+08)");
    EXPECT_NE(errorFor([&](json& d) {
                  section(d)["allowable_stress"] = 1e8;
              }).find("bodies[1].section: give either allowable_stress or safety_factor"),
              std::string::npos);
    EXPECT_NE(errorFor([&](json& d) {
                  section(d)["safety_factor"] = 0.8;
              }).find("bodies[1].section.safety_factor: must be at least 1"),
              std::string::npos);
    EXPECT_NE(errorFor([&](json& d) {
                  section(d).erase("material");
                  section(d)["density"] = 7850;
              }).find("bodies[1].section.safety_factor: a safety factor on yield needs the section's \"material\""),
              std::string::npos);
    EXPECT_NE(errorFor([&](json& d) {
                  section(d)["material"] = "cast_iron";
              }).find("bodies[1].section.safety_factor: material \"cast_iron\" has no yield strength"),
              std::string::npos);
    EXPECT_NE(errorFor([&](json& d) {
                  d["materials"][0].erase("yield_strength");
              }).find("bodies[1].section.safety_factor: material \"S355\" has no yield strength"),
              std::string::npos);
    EXPECT_NE(errorFor([&](json& d) {
                  section(d)["material"] = "S235JR";
              }).find("bodies[1].section.material: \"S235JR\" is not one of: steel,"),
              std::string::npos);
    EXPECT_NE(errorFor([&](json& d) {
                  d["materials"][0]["name"] = "steel";
              }).find("materials[0].name: \"steel\" is a built-in material"),
              std::string::npos);
    EXPECT_NE(errorFor([&](json& d) {
                  d["materials"].push_back(d["materials"][0]);
              }).find("materials[1].name: duplicate name \"S355\""),
              std::string::npos);
    EXPECT_EQ(errorFor([&](json& d) { d["materials"][0]["youngs_modulus"] = -2e11; }),
              "materials[0].youngs_modulus: must be a finite number > 0 (got -2e+11)");
    EXPECT_EQ(errorFor([&](json& d) { section(d)["thickness"] = 0; }),
              "bodies[1].section.thickness: must be a finite number > 0 (got 0)");
}

// The editor's rule is the reader's: a refused value in memory throws and
// leaves the caller's mechanism as it was.
TEST(MaterialsFile, RefusedEditLeavesTheMechanismWhole)
{
    const Mechanism before = parseMechanism(document().dump()).mechanism;
    Mechanism edited = before;
    edited.bodies[1].section->safetyFactor = 0.5;
    EXPECT_THROW(validateMechanism(edited), ModelError);
    edited.bodies[1].section->safetyFactor = 2.0;
    EXPECT_EQ(validateMechanism(edited), before);
}

}  // namespace
}  // namespace clevis
