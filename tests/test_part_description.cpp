// The desktop tells a model error by the part it concerns, not by the path
// into the file: bodies, joints, drivers and loads by kind and name, their
// fields in words.
#include "core/file/part_description.h"

#include <gtest/gtest.h>

using namespace clevis;

namespace {

Mechanism sample()
{
    Mechanism m;
    m.bodies.push_back({"crank", {}, {}, {}, {}, {}});
    Body rocker;
    rocker.name = "rocker";
    rocker.pointMasses.push_back({"counterweight", 0.4, Vec2(0.1, 0.0)});
    rocker.pointMasses.push_back({"", 0.1, Vec2(0.2, 0.0)});
    m.bodies.push_back(rocker);
    m.joints.push_back({"O", JointType::Pin, {kGroundName, "crank"}, Vec2::Zero(), 0.0});
    m.joints.push_back({"S", JointType::Slider, {kGroundName, "rocker"}, Vec2(0.3, 0.0), 0.0});
    m.joints.push_back({"K", JointType::PinInSlot, {"crank", "rocker"}, Vec2(0.1, 0.0), 0.0});
    Driver motor;
    motor.name = "motor";
    m.drivers.push_back(motor);
    Driver cylinder;
    cylinder.name = "lift";
    cylinder.type = DriverType::Linear;
    m.drivers.push_back(cylinder);
    m.loads.push_back(ForceLoad{"press", {"rocker", Vec2::Zero()}, Vec2::Zero(), false, std::nullopt});
    m.loads.push_back(SpringLoad{"return", {"crank", Vec2::Zero()}, {kGroundName, Vec2::Zero()}, 100.0, 0.1});
    m.loads.push_back(TorqueLoad{"", "crank", 1.0, std::nullopt});
    return m;
}

std::string described(const std::string& path, const std::string& message)
{
    return describeModelError(sample(), ModelError(path, message));
}

TEST(PartDescription, BodiesAndTheirFields)
{
    EXPECT_EQ(describePath(sample(), "bodies[1]"), "Body “rocker”");
    EXPECT_EQ(described("bodies[1].section", "a bar needs two joints on the body, or explicit \"ends\""),
              "Body “rocker”, section: a bar needs two joints on the body, or explicit “ends”");
    EXPECT_EQ(described("bodies[0].mass", "must be a finite number >= 0 (got -1)"),
              "Body “crank”, mass: must be a finite number >= 0 (got -1)");
    EXPECT_EQ(describePath(sample(), "bodies[0].cg[1]"), "Body “crank”, centre of mass, y");
    EXPECT_EQ(describePath(sample(), "bodies[1].point_masses[0].mass"),
              "Body “rocker”, point mass “counterweight”, mass");
    EXPECT_EQ(describePath(sample(), "bodies[1].point_masses[1].at"),
              "Body “rocker”, unnamed point mass (no. 2), position");
    EXPECT_EQ(describePath(sample(), "bodies[1].section.ends[1][0]"), "Body “rocker”, section, second end, x");
}

TEST(PartDescription, JointsByTheirKind)
{
    EXPECT_EQ(describePath(sample(), "joints[0].bodies[1]"), "Pin “O”, second body");
    EXPECT_EQ(describePath(sample(), "joints[1].axis_deg"), "Slider “S”, axis");
    EXPECT_EQ(describePath(sample(), "joints[2]"), "Pin in slot “K”");
}

TEST(PartDescription, AMessageThatNamesItsPartIsNotPrefixedTwice)
{
    EXPECT_EQ(described("joints[0]", "pin \"O\" joins only \"crank\": connect it to a second part or to ground"),
              "Pin “O” joins only “crank”: connect it to a second part or to ground");
}

TEST(PartDescription, DriversByTheirKind)
{
    EXPECT_EQ(describePath(sample(), "drivers[0].motion.speed_rpm"), "Motor “motor”, motion, speed");
    EXPECT_EQ(describePath(sample(), "drivers[0].motion.time_s[2]"), "Motor “motor”, motion, time, value 3");
    EXPECT_EQ(describePath(sample(), "drivers[1].between[0].body"), "Linear drive “lift”, first end, body");
}

TEST(PartDescription, LoadsByTheirKindNamedOrNot)
{
    EXPECT_EQ(described("loads[0].profile.factor", "has 2 values but time_s has 3"),
              "Force “press”, profile, factor: has 2 values but time_s has 3");
    EXPECT_EQ(describePath(sample(), "loads[0].at[0]"), "Force “press”, position, x");
    EXPECT_EQ(describePath(sample(), "loads[0].profile.at[1]"), "Force “press”, profile, position, value 2");
    EXPECT_EQ(describePath(sample(), "loads[1].b.body"), "Spring “return”, end b, body");
    EXPECT_EQ(describePath(sample(), "loads[2].torque"), "Unnamed torque (no. 3), torque");
}

TEST(PartDescription, PathsOutsideThePartsReadAsWords)
{
    EXPECT_EQ(described("cycle.duration_s", "must be a finite number > 0 (got 0)"),
              "Cycle, duration: must be a finite number > 0 (got 0)");
    EXPECT_EQ(describePath(sample(), "name"), "Mechanism name");
    EXPECT_EQ(describePath(sample(), "bodies[9].mass"), "Bodies, mass") << "an index the mechanism does not have";
    EXPECT_EQ(described("line 3, column 5", "syntax error"), "line 3, column 5: syntax error");
    EXPECT_EQ(described("", "\"x.json\" is too large"), "“x.json” is too large");
}

}  // namespace
