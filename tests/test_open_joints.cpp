// A drawing in progress saves and reopens as it is: a joint with an open side
// reads back unchanged, and analysing it (in the core and through
// `clevis-cli analyze`) fails with a message naming the joint and what it lacks.
#include "core/file/mechanism_file.h"
#include "core/model/model_error.h"
#include "core/solver/compiled_mechanism.h"
#include "tests/cli_runner.h"

#include <gtest/gtest.h>

#include <unistd.h>

#include <filesystem>
#include <fstream>
#include <string>

namespace fs = std::filesystem;
using namespace clevis;

namespace {

// A crank on a ground pin, with a second pin drawn on its far end and not yet
// joined to anything else.
const char* kHalfDrawn = R"({
  "clevis": 1,
  "bodies": [{"name": "crank"}],
  "joints": [
    {"name": "O1", "type": "pin", "bodies": ["ground", "crank"], "at": [0, 0]},
    {"name": "P3", "type": "pin", "bodies": ["crank", ""], "at": [0.05, 0]}
  ],
  "drivers": [{"name": "motor", "type": "rotary", "joint": "O1", "speed_rpm": 60}]
})";

std::string compileError(const Mechanism& m)
{
    try {
        compile(m);
    } catch (const ModelError& e) {
        return e.what();
    }
    return "(compiled)";
}

TEST(OpenJoints, AHalfDrawnPinReadsSavesAndReadsBackUnchanged)
{
    const Mechanism m = parseMechanism(kHalfDrawn).mechanism;
    ASSERT_EQ(m.joints.size(), 2u);
    EXPECT_EQ(m.joints[1].bodies[0], "crank");
    EXPECT_EQ(m.joints[1].bodies[1], "");
    EXPECT_EQ(parseMechanism(saveMechanismText(m)).mechanism, m);
}

TEST(OpenJoints, AOneNameListLeavesTheSecondSideOpen)
{
    std::string text = kHalfDrawn;
    text.replace(text.find(R"(["crank", ""])"), 13, R"(["crank"])");
    EXPECT_EQ(parseMechanism(text).mechanism, parseMechanism(kHalfDrawn).mechanism);
}

TEST(OpenJoints, APinJoinedToNothingYetReadsBack)
{
    Mechanism m = parseMechanism(kHalfDrawn).mechanism;
    m.joints.push_back({"P4", JointType::Pin, {"", ""}, Vec2(0.1, 0.0), 0.0});
    EXPECT_EQ(parseMechanism(saveMechanismText(m)).mechanism, m);
    m.joints.erase(m.joints.begin() + 1);
    EXPECT_EQ(compileError(m),
              "joints[1]: pin \"P4\" joins no part yet: connect it to two parts, or to a part and ground");
}

TEST(OpenJoints, ABodyJoinedToItselfOrAnEmptyListIsStillRefused)
{
    std::string itself = kHalfDrawn;
    itself.replace(itself.find(R"(["crank", ""])"), 13, R"(["crank", "crank"])");
    EXPECT_THROW(parseMechanism(itself), ModelError);
    std::string none = kHalfDrawn;
    none.replace(none.find(R"(["crank", ""])"), 13, "[]");
    EXPECT_THROW(parseMechanism(none), ModelError);
}

TEST(OpenJoints, AnalysingSaysWhichPinIsOpenAndWhatToDo)
{
    const Mechanism m = parseMechanism(kHalfDrawn).mechanism;
    EXPECT_EQ(compileError(m), "joints[1]: pin \"P3\" joins only \"crank\": connect it to a second part or to ground");
}

TEST(OpenJoints, TheCommandLineExitsWithOneNamingThePin)
{
    std::string pattern = (fs::temp_directory_path() / "clevis-open-joint-XXXXXX").string();
    ASSERT_NE(::mkdtemp(pattern.data()), nullptr);
    const fs::path dir = pattern;
    const fs::path file = dir / "half_drawn.json";
    std::ofstream(file, std::ios::binary) << kHalfDrawn;
    const test::CliRun r = test::runCli(dir, "analyze " + test::quoted(file));
    EXPECT_EQ(r.exitCode, 1) << r.err;
    EXPECT_TRUE(r.out.empty()) << r.out;
    EXPECT_TRUE(test::contains(r.err, "pin \"P3\" joins only \"crank\": connect it to a second part or to ground"))
        << r.err;
    fs::remove_all(dir);
}

}  // namespace
