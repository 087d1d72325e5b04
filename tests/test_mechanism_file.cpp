#include "core/file/file_units.h"
#include "core/file/mechanism_file.h"
#include "core/model/materials.h"
#include "core/model/model_error.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <filesystem>
#include <fstream>
#include <functional>
#include <random>
#include <regex>

namespace clevis {
namespace {

using nlohmann::json;

Body body(const std::string& name)
{
    Body b;
    b.name = name;
    return b;
}

Driver driver(const std::string& name, DriverType type, const std::string& joint, double offset, Motion motion)
{
    Driver d;
    d.name = name;
    d.type = type;
    d.joint = joint;
    d.offset = offset;
    d.motion = std::move(motion);
    return d;
}

// A mechanism using every kind of item the format has, with angles that are
// not exact in radians.
Mechanism richMechanism()
{
    Mechanism m;
    m.name = "press with every part";
    m.gravity = {0.5, -9.81};

    Body crank = body("crank");
    crank.mass = 1.2;
    crank.cg = Vec2(0.05, 0.0);
    crank.inertia = 0.0021;
    crank.pointMasses = {{"clamp", 0.3, {0.1, 0.0}}, {"", 0.05, {0.02, -0.01}}};
    Body coupler = body("coupler");
    coupler.section = BarSection{0.02, 0.008, 7850.0, std::pair{Vec2(0.1, 0.0), Vec2(0.4, 0.1)}};
    Body ram = body("ram");
    ram.section = BarSection{0.05, 0.01, 2700.0, std::nullopt};
    ram.pointMasses = {{"die", 4.0, {0.3, -0.05}}};
    m.bodies = {crank, coupler, ram, body("link")};

    m.joints = {
        {"O", JointType::Pin, {"ground", "crank"}, {0.0, 0.0}, 0.0},
        {"S", JointType::Slider, {"ground", "ram"}, {0.3, 0.0}, 12.5},
        {"K", JointType::PinInSlot, {"link", "coupler"}, {0.2, 0.1}, -30.0},
    };

    Driver lift = driver("lift", DriverType::Linear, "", 0.0, MotionTable{{0.0, 1.0, 2.0}, {0.58, 0.7, 0.58}});
    lift.ends[0] = BodyPointRef{"ground", {0.0, 0.0}};
    lift.ends[1] = BodyPointRef{"ram", {0.5, 0.3}};
    m.drivers = {
        driver("motor", DriverType::Rotary, "O", degToRad(30.0),
               ConstantSpeed{toSi(FileUnit::Rpm, 60.0), toSi(FileUnit::Degree, 12.0)}),
        driver("rise", DriverType::Rotary, "K", 0.0,
               Rise{CamLaw::Cycloidal, degToRad(10.0), degToRad(100.0), 0.25, 1.5}),
        driver("poly", DriverType::Rotary, "O", degToRad(-45.5),
               Rise{CamLaw::Polynomial345, 0.0, degToRad(90.0), 0.0, std::nullopt}),
        driver("table", DriverType::Rotary, "O", 0.0,
               MotionTable{{0.0, 0.5, 2.0}, {0.0, degToRad(33.3), degToRad(7.0)}}),
        lift,
        driver("ram_drive", DriverType::Linear, "S", 0.05, Rise{CamLaw::ModifiedTrapezoid, 0.05, 0.2, 0.1, 0.9}),
    };

    m.cycle = {720, 2.5};

    const LoadProfile overAngle{
        "motor", {degToRad(150.0), degToRad(170.0), degToRad(190.0), degToRad(200.0)}, {0.0, 1.0, 1.0, 0.0}};
    const LoadProfile overStroke{"ram_drive", {0.05, 0.1}, {1.0, 0.5}};
    const LoadProfile overTime{"", {0.0, 1.0}, {0.2, 1.0}};
    m.loads = {
        ForceLoad{"forming", {"ram", {0.3, 0.0}}, {-2000.0, 0.0}, false, overAngle},
        ForceLoad{"wind", {"coupler", {0.2, 0.05}}, {0.0, 15.0}, true, overTime},
        ForceLoad{"steady", {"crank", {0.1, 0.0}}, {1.0, 2.0}, false, std::nullopt},
        TorqueLoad{"brake", "crank", -5.0, overStroke},
        TorqueLoad{"drag", "link", 0.25, std::nullopt},
        SpringLoad{"return", {"ground", {0.0, 0.2}}, {"crank", {0.1, 0.0}}, 5000.0, 0.15},
        DamperLoad{"buffer", {"ground", {0.4, 0.0}}, {"ram", {0.35, 0.0}}, 40.0},
        TorsionSpringLoad{"clock", "O", 2.5, degToRad(15.0)},
    };
    return m;
}

// A small valid file that the error tests below spoil one value at a time.
json baseDocument()
{
    return json::parse(R"({
      "clevis": 1,
      "bodies": [
        {"name": "crank", "mass": 1.2, "cg": [0.05, 0], "inertia": 0.002},
        {"name": "coupler", "section": {"width": 0.02, "thickness": 0.008, "material": "steel"}},
        {"name": "ram"}
      ],
      "joints": [
        {"name": "O", "type": "pin", "bodies": ["ground", "crank"], "at": [0, 0]},
        {"name": "A", "type": "pin", "bodies": ["crank", "coupler"], "at": [0.1, 0]},
        {"name": "S", "type": "slider", "bodies": ["ground", "ram"], "at": [0.4, 0], "axis_deg": 0}
      ],
      "drivers": [
        {"name": "motor", "type": "rotary", "joint": "O", "speed_rpm": 60},
        {"name": "ram_drive", "type": "linear", "joint": "S",
         "motion": {"law": "table", "time_s": [0, 1, 2], "position": [0, 0.1, 0]}}
      ],
      "loads": [
        {"type": "force", "name": "forming", "body": "ram", "at": [0.4, 0], "force": [-100, 0],
         "profile": {"driver": "motor", "at_deg": [0, 90], "factor": [0, 1]}}
      ]
    })");
}

std::string errorFor(const json& document)
{
    try {
        parseMechanism(document.dump());
    } catch (const ModelError& e) {
        return e.what();
    }
    return "(no error)";
}

std::string errorFor(const std::function<void(json&)>& spoil)
{
    json document = baseDocument();
    spoil(document);
    return errorFor(document);
}

std::string errorForText(const std::string& text)
{
    try {
        parseMechanism(text);
    } catch (const ModelError& e) {
        return e.what();
    }
    return "(no error)";
}

testing::AssertionResult contains(const std::string& text, const std::string& part)
{
    if (text.find(part) != std::string::npos) return testing::AssertionSuccess();
    return testing::AssertionFailure() << '"' << text << "\" does not contain \"" << part << '"';
}

bool hasWarning(const LoadedMechanism& loaded, const std::string& warning)
{
    return std::find(loaded.warnings.begin(), loaded.warnings.end(), warning) != loaded.warnings.end();
}

TEST(MechanismFileTest, RoundTripReproducesTheMechanismExactly)
{
    const Mechanism m = richMechanism();
    const LoadedMechanism loaded = parseMechanism(saveMechanismText(m));
    EXPECT_TRUE(loaded.warnings.empty());
    EXPECT_TRUE(loaded.mechanism == m);
    EXPECT_EQ(saveMechanismText(loaded.mechanism), saveMechanismText(m));
}

TEST(MechanismFileTest, JsonAndTextFormsAgree)
{
    const Mechanism m = richMechanism();
    EXPECT_EQ(json::parse(saveMechanismText(m)), mechanismToJson(m));
    EXPECT_EQ(mechanismToJson(m)["clevis"], 1);
}

TEST(MechanismFileTest, SavedTextIsIndentedAndKeepsPointsOnOneLine)
{
    const std::string text = saveMechanismText(richMechanism());
    EXPECT_TRUE(text.starts_with("{\n  \"clevis\": 1,\n  \"name\": "));
    EXPECT_EQ(text.back(), '\n');
    EXPECT_TRUE(contains(text, "\n      \"cg\": [0.05, 0.0],\n"));
}

TEST(MechanismFileTest, AnglesAreSavedAsTheDegreesTheyCameFrom)
{
    const std::string text = saveMechanismText(richMechanism());
    EXPECT_TRUE(contains(text, "\"angle_deg\": 30.0"));
    EXPECT_TRUE(contains(text, "\"speed_rpm\": 60.0"));
    EXPECT_TRUE(contains(text, "\"at_deg\": [150.0, 170.0, 190.0, 200.0]"));
}

TEST(MechanismFileTest, DegreesSurviveTheTripThroughRadians)
{
    for (double deg : {0.1, 1.0, 7.0, 30.0, 33.3, 45.5, 90.0, 123.456, 180.0, 359.99, -720.0}) {
        EXPECT_EQ(fromSi(FileUnit::Degree, toSi(FileUnit::Degree, deg)), deg);
        EXPECT_EQ(fromSi(FileUnit::Rpm, toSi(FileUnit::Rpm, deg)), deg);
    }
}

// Not every double in radians is some double in degrees converted; those
// come back as the nearest value that is.
TEST(MechanismFileTest, AnyRadianValueComesBackWithinOneUlp)
{
    for (double rad = -7.0; rad < 7.0; rad += 0.001237) {
        const double back = toSi(FileUnit::Degree, fromSi(FileUnit::Degree, rad));
        EXPECT_LE(std::abs(back - rad), std::nextafter(std::abs(rad), 10.0) - std::abs(rad)) << rad;
    }
}

TEST(MechanismFileTest, BaseDocumentIsValid)
{
    const LoadedMechanism loaded = parseMechanism(baseDocument().dump());
    EXPECT_TRUE(loaded.warnings.empty());
    EXPECT_EQ(loaded.mechanism.bodies.size(), 3u);
    EXPECT_EQ(loaded.mechanism.gravity, Vec2(0.0, -9.80665));
    EXPECT_EQ(loaded.mechanism.cycle.steps, 360);
    EXPECT_FALSE(loaded.mechanism.cycle.duration);
}

TEST(MechanismFileTest, ShorthandSpeedAndOffsetsConvertToSi)
{
    json doc = baseDocument();
    doc["drivers"][0]["angle_deg"] = 90;
    doc["drivers"][0]["accel_deg_s2"] = 180;
    doc["drivers"][1] = json::parse(R"({"name": "ram_drive", "type": "linear", "joint": "S", "speed": 0.1,
                                        "position": 0.05})");
    const Mechanism m = parseMechanism(doc.dump()).mechanism;
    EXPECT_DOUBLE_EQ(m.drivers[0].offset, kPi / 2);
    const auto& rotary = std::get<ConstantSpeed>(m.drivers[0].motion);
    EXPECT_DOUBLE_EQ(rotary.speed, 2 * kPi);
    EXPECT_DOUBLE_EQ(rotary.accel, kPi);
    EXPECT_DOUBLE_EQ(m.drivers[1].offset, 0.05);
    EXPECT_DOUBLE_EQ(std::get<ConstantSpeed>(m.drivers[1].motion).speed, 0.1);
}

TEST(MechanismFileTest, LongConstantSpeedFormIsAccepted)
{
    json doc = baseDocument();
    doc["drivers"][0].erase("speed_rpm");
    doc["drivers"][0]["motion"] = {{"law", "constant_speed"}, {"speed_rpm", 30}};
    const Mechanism m = parseMechanism(doc.dump()).mechanism;
    EXPECT_DOUBLE_EQ(std::get<ConstantSpeed>(m.drivers[0].motion).speed, kPi);
}

TEST(MechanismFileTest, BodyWithoutMassOrSectionIsMassless)
{
    const Body& ram = parseMechanism(baseDocument().dump()).mechanism.bodies[2];
    EXPECT_TRUE(ram == body("ram"));
}

TEST(MechanismFileTest, GravityFalseIsZeroAndSavesAsFalse)
{
    json doc = baseDocument();
    doc["gravity"] = false;
    const Mechanism m = parseMechanism(doc.dump()).mechanism;
    EXPECT_EQ(m.gravity, Vec2::Zero());
    EXPECT_TRUE(contains(saveMechanismText(m), "\"gravity\": false,"));
    EXPECT_TRUE(contains(errorFor([](json& d) { d["gravity"] = true; }), "gravity: true is not allowed"));
}

TEST(MechanismFileTest, UnnamedLoadsGetNumberedNamesPerType)
{
    json doc = baseDocument();
    const json force = {{"type", "force"}, {"body", "ram"}, {"at", {0, 0}}, {"force", {1, 0}}};
    const json spring = json::parse(
        R"({"type": "spring", "a": {"body": "ground", "at": [0, 0]}, "b": {"body": "ram", "at": [0.4, 0]},
            "stiffness": 10, "free_length": 0.3})");
    json named = force;
    named["name"] = "force 2";
    doc["loads"] = {force, spring, named, force, force};
    const Mechanism m = parseMechanism(doc.dump()).mechanism;
    const auto name = [&](std::size_t i) { return std::visit([](const auto& l) { return l.name; }, m.loads[i]); };
    EXPECT_EQ(name(0), "force 1");
    EXPECT_EQ(name(1), "spring 1");
    EXPECT_EQ(name(2), "force 2");
    EXPECT_EQ(name(3), "force 3");
    EXPECT_EQ(name(4), "force 4");
}

TEST(MechanismFileTest, MaterialGivesTheTableDensity)
{
    EXPECT_EQ(materialDensity("steel"), 7850.0);
    EXPECT_EQ(materialDensity("aluminium_alloy"), 2700.0);
    EXPECT_FALSE(materialDensity("unobtainium"));
    json doc = baseDocument();
    doc["bodies"][1]["section"]["material"] = "nylon";
    EXPECT_EQ(parseMechanism(doc.dump()).mechanism.bodies[1].section->density, 1140.0);
}

TEST(MechanismFileTest, MalformedJsonIsLocatedByLineAndColumn)
{
    const std::string text = "{\n  \"clevis\": 1,\n  \"bodies\": [\n    {\"name\": \"a\",}\n  ]\n}\n";
    EXPECT_TRUE(contains(errorForText(text), "line 4, column 18: "));
    EXPECT_TRUE(contains(errorForText("{\"clevis\": 1,\n \"name\": \"\xc3\xa9t\xc3\xa9\" x}"), "line 2, column 16: "));
    EXPECT_TRUE(contains(errorForText(""), "line 1, column 1: "));
}

TEST(MechanismFileTest, OverflowingNumberIsRejected)
{
    std::string text = baseDocument().dump(2);
    const std::size_t at = text.find("1.2");
    text.replace(at, 3, "1e999");
    const auto line = 1 + std::count(text.begin(), text.begin() + at, '\n');
    const std::string error = errorForText(text);
    EXPECT_TRUE(contains(error, "line " + std::to_string(line) + ", column "));
    EXPECT_TRUE(contains(error, "1e999"));
}

TEST(MechanismFileTest, RootMustBeAnObject) { EXPECT_EQ(errorForText("[1, 2]"), "expected an object, got an array"); }

TEST(MechanismFileTest, NegativeZeroIsSavedAsZero)
{
    Mechanism m = richMechanism();
    m.joints[0].at = {-0.0, -0.0};
    m.bodies[0].cg = Vec2(-0.0, 0.0);
    m.joints[1].axisDeg = -0.0;
    const std::string text = saveMechanismText(m);
    EXPECT_FALSE(std::regex_search(text, std::regex(R"(-0(\.0*[^0-9]|[^.0-9]))"))) << text;
    EXPECT_EQ(parseMechanism(text).mechanism, validateMechanism(m));  // and reads back as before
}

TEST(MechanismFileTest, WrongTypeNamesThePath)
{
    EXPECT_TRUE(contains(errorFor([](json& d) { d["joints"][2]["bodies"][1] = 5; }),
                         "joints[2].bodies[1]: expected a string, got a number"));
    EXPECT_TRUE(
        contains(errorFor([](json& d) { d["bodies"] = json::object(); }), "bodies: expected an array, got an object"));
    EXPECT_TRUE(
        contains(errorFor([](json& d) { d["joints"][0]["at"] = {1}; }), "joints[0].at: expected 2 values, got 1"));
}

TEST(MechanismFileTest, MissingRequiredKeyNamesThePath)
{
    EXPECT_TRUE(contains(errorFor([](json& d) { d["joints"][1].erase("at"); }), "joints[1].at: required key missing"));
    EXPECT_TRUE(contains(errorFor([](json& d) { d["drivers"][0].erase("speed_rpm"); }),
                         "drivers[0]: needs one of: speed_rpm, motion"));
    EXPECT_TRUE(contains(errorFor([](json& d) { d["bodies"][1]["section"].erase("material"); }),
                         "bodies[1].section: needs one of: density, material"));
}

TEST(MechanismFileTest, UnknownEnumListsTheAllowedValues)
{
    EXPECT_TRUE(contains(errorFor([](json& d) { d["joints"][1]["type"] = "hinge"; }),
                         "joints[1].type: \"hinge\" is not one of: pin, slider, pin_in_slot"));
    EXPECT_TRUE(contains(errorFor([](json& d) { d["drivers"][1]["motion"]["law"] = "sine"; }),
                         "drivers[1].motion.law: \"sine\" is not one of: constant_speed, cycloidal, polynomial_345, "
                         "modified_trapezoid, table"));
    EXPECT_TRUE(contains(errorFor([](json& d) { d["bodies"][1]["section"]["material"] = "oak"; }),
                         "bodies[1].section.material: \"oak\" is not one of: steel, stainless_steel"));
}

TEST(MechanismFileTest, DuplicateNameNamesBothPlaces)
{
    EXPECT_TRUE(contains(errorFor([](json& d) { d["bodies"][2]["name"] = "crank"; }),
                         "bodies[2].name: duplicate name \"crank\" (also bodies[0])"));
    EXPECT_TRUE(contains(errorFor([](json& d) { d["loads"].push_back(d["loads"][0]); }),
                         "loads[1].name: duplicate name \"forming\" (also loads[0])"));
}

TEST(MechanismFileTest, GroundCannotBeDeclared)
{
    EXPECT_TRUE(contains(errorFor([](json& d) { d["bodies"][1]["name"] = "ground"; }), "bodies[1].name: \"ground\""));
}

TEST(MechanismFileTest, JointCannotJoinABodyToItself)
{
    EXPECT_TRUE(contains(errorFor([](json& d) {
                             d["joints"][1]["bodies"] = {"crank", "crank"};
                         }),
                         "joints[1].bodies: joins \"crank\" to itself"));
}

TEST(MechanismFileTest, OutOfRangeNumbersAreRejected)
{
    EXPECT_TRUE(contains(errorFor([](json& d) { d["bodies"][0]["mass"] = -1; }),
                         "bodies[0].mass: must be a finite number >= 0 (got -1)"));
    EXPECT_TRUE(contains(errorFor([](json& d) { d["bodies"][1]["section"]["width"] = 0; }),
                         "bodies[1].section.width: must be a finite number > 0 (got 0)"));
    EXPECT_TRUE(contains(errorFor([](json& d) {
                             d["cycle"] = {{"steps", 0}};
                         }),
                         "cycle.steps: must be a whole number from 1 to 100000 (got 0)"));
    EXPECT_TRUE(contains(errorFor([](json& d) {
                             d["cycle"] = {{"steps", 36.5}};
                         }),
                         "cycle.steps: must be a whole number"));
    EXPECT_TRUE(contains(errorFor([](json& d) {
                             d["cycle"] = {{"duration_s", 0}};
                         }),
                         "cycle.duration_s: must be a finite number > 0"));
}

TEST(MechanismFileTest, UnsupportedVersionIsRefused)
{
    EXPECT_TRUE(contains(errorFor([](json& d) { d["clevis"] = 2; }),
                         "clevis: unsupported file version 2; this program reads version 1"));
    EXPECT_TRUE(contains(errorFor([](json& d) { d.erase("clevis"); }), "clevis: required key missing"));
}

TEST(MechanismFileTest, TablesMustIncreaseAndPairUp)
{
    EXPECT_TRUE(contains(errorFor([](json& d) {
                             d["drivers"][1]["motion"]["time_s"] = {0, 1, 1};
                         }),
                         "drivers[1].motion.time_s[2]: must be greater than the value before it (1)"));
    EXPECT_TRUE(contains(errorFor([](json& d) {
                             d["drivers"][1]["motion"]["position"] = {0, 1};
                         }),
                         "drivers[1].motion.position: has 2 values but time_s has 3"));
    EXPECT_TRUE(contains(errorFor([](json& d) { d["loads"][0]["profile"]["at_deg"] = {0}; }),
                         "loads[0].profile.at_deg: needs at least 2 values, got 1"));
}

TEST(MechanismFileTest, ProfileUnitMustMatchItsDriver)
{
    EXPECT_TRUE(contains(errorFor([](json& d) { d["loads"][0]["profile"]["driver"] = "ram_drive"; }),
                         "loads[0].profile.at_deg: driver \"ram_drive\" is linear: give its positions as \"at\""));
    EXPECT_TRUE(contains(errorFor([](json& d) { d["loads"][0]["profile"]["driver"] = "spindle"; }),
                         "loads[0].profile.driver: no driver named \"spindle\""));
}

TEST(MechanismFileTest, ConflictingAlternativesAreRejected)
{
    EXPECT_TRUE(contains(errorFor([](json& d) { d["bodies"][1]["mass"] = 1.0; }),
                         "bodies[1].section: a body takes either mass, cg and inertia or a section, not both"));
    EXPECT_TRUE(contains(errorFor([](json& d) { d["drivers"][1]["between"] = json::array(); }),
                         "drivers[1].between: cannot be given together with joint"));
    EXPECT_TRUE(contains(errorFor([](json& d) { d["drivers"][0]["motion"] = json::object(); }),
                         "drivers[0].motion: cannot be given together with speed_rpm"));
}

TEST(MechanismFileTest, APlateReadsAndSavesBack)
{
    json doc = baseDocument();
    doc["bodies"][2]["plate"] = json::parse(R"({"thickness": 0.006, "material": "aluminium_alloy",
                                                 "outline": [[0.35, -0.02], [0.45, -0.02], [0.4, 0.05]]})");
    const Mechanism m = parseMechanism(doc.dump()).mechanism;
    ASSERT_TRUE(m.bodies[2].plate);
    EXPECT_EQ(m.bodies[2].plate->thickness, 0.006);
    EXPECT_EQ(m.bodies[2].plate->density, *materialDensity("aluminium_alloy"));
    ASSERT_TRUE(m.bodies[2].plate->outline);
    EXPECT_EQ(m.bodies[2].plate->outline->size(), 3u);
    EXPECT_EQ(parseMechanism(saveMechanismText(m)).mechanism, m);

    EXPECT_TRUE(contains(errorFor([](json& d) {
                             d["bodies"][1]["plate"] = {{"thickness", 0.01}, {"density", 1.0}};
                         }),
                         "bodies[1].plate: a body takes one of: mass, cg and inertia; a section; a plate"));
    EXPECT_TRUE(
        contains(errorFor([](json& d) {
                     d["bodies"][2]["plate"] = {{"thickness", 0.01}, {"density", 1.0}, {"outline", {{0, 0}, {1, 0}}}};
                 }),
                 "bodies[2].plate.outline: a plate outline needs at least three corners"));
    EXPECT_TRUE(contains(errorFor([](json& d) {
                             d["bodies"][2]["plate"] = {{"thickness", -0.01}, {"density", 1.0}};
                         }),
                         "bodies[2].plate.thickness"));
}

TEST(MechanismFileTest, UnknownKeysWarnWithTheirPath)
{
    json doc = baseDocument();
    doc["author"] = "me";
    doc["bodies"][1]["colour"] = "red";
    doc["drivers"][1]["motion"]["smooth"] = true;
    doc["joints"][0]["axis_deg"] = 10;
    const LoadedMechanism loaded = parseMechanism(doc.dump());
    EXPECT_EQ(loaded.warnings.size(), 4u);
    EXPECT_TRUE(hasWarning(loaded, "author: unknown key (ignored)"));
    EXPECT_TRUE(hasWarning(loaded, "bodies[1].colour: unknown key (ignored)"));
    EXPECT_TRUE(hasWarning(loaded, "drivers[1].motion.smooth: unknown key (ignored)"));
    EXPECT_TRUE(hasWarning(loaded, "joints[0].axis_deg: applies only to slider and pin_in_slot joints (ignored)"));
}

class MechanismFileOnDiskTest : public testing::Test {
protected:
    std::filesystem::path path_ = std::filesystem::temp_directory_path() /
                                  ("clevis_file_test_" + std::to_string(std::random_device{}()) + ".json");
    void TearDown() override { std::filesystem::remove(path_); }
};

TEST_F(MechanismFileOnDiskTest, LoadsWhatWasSaved)
{
    std::ofstream(path_) << saveMechanismText(richMechanism());
    EXPECT_TRUE(loadMechanismFile(path_.string()).mechanism == richMechanism());
}

TEST_F(MechanismFileOnDiskTest, MissingFileIsNamed)
{
    try {
        loadMechanismFile(path_.string());
        FAIL() << "no error";
    } catch (const ModelError& e) {
        EXPECT_TRUE(contains(e.what(), "cannot open \"" + path_.string() + "\""));
    }
}

TEST_F(MechanismFileOnDiskTest, HugeFileIsRefused)
{
    std::ofstream(path_) << "{}";
    std::filesystem::resize_file(path_, 17 * 1024 * 1024);
    try {
        loadMechanismFile(path_.string());
        FAIL() << "no error";
    } catch (const ModelError& e) {
        EXPECT_TRUE(contains(e.what(), "larger than 16 MiB"));
    }
}

}  // namespace
}  // namespace clevis
