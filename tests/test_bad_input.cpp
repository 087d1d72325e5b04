// Malformed and oversized mechanism files through `clevis-cli analyze`, as a
// user meets them: each must exit with 1 and say on stderr which file and
// which place in it is wrong — never crash, hang or print results.
#include "core/model/model_limits.h"
#include "tests/cli_runner.h"

#include <gtest/gtest.h>
#include <nlohmann/json.hpp>

#include <unistd.h>

#include <algorithm>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <functional>
#include <sstream>
#include <string>
#include <vector>

namespace fs = std::filesystem;
using nlohmann::json;

namespace {

using clevis::test::CliRun;
using clevis::test::contains;
using clevis::test::quoted;
using clevis::test::readFile;

// A crank–rocker four-bar that analyses cleanly: ground pivots O (0, 0) and
// C (0.4, 0), crank O→A 0.1 m, coupler A→B, rocker C→B.
json fourBar()
{
    return json::parse(R"({
      "clevis": 1, "name": "four-bar",
      "bodies": [
        {"name": "crank", "mass": 0.5, "cg": [0.05, 0], "inertia": 0.0005},
        {"name": "coupler", "section": {"width": 0.02, "thickness": 0.005, "material": "steel"}},
        {"name": "rocker", "mass": 0.8, "cg": [0.4, 0.15], "inertia": 0.002}
      ],
      "joints": [
        {"name": "O", "type": "pin", "bodies": ["ground", "crank"], "at": [0, 0]},
        {"name": "A", "type": "pin", "bodies": ["crank", "coupler"], "at": [0.1, 0]},
        {"name": "B", "type": "pin", "bodies": ["coupler", "rocker"], "at": [0.4, 0.3]},
        {"name": "C", "type": "pin", "bodies": ["rocker", "ground"], "at": [0.4, 0]}
      ],
      "drivers": [{"name": "motor", "type": "rotary", "joint": "O", "speed_rpm": 60}],
      "cycle": {"steps": 12}
    })");
}

class BadInputTest : public ::testing::Test {
protected:
    void SetUp() override
    {
        std::string pattern = (fs::temp_directory_path() / "clevis-bad-input-XXXXXX").string();
        ASSERT_NE(::mkdtemp(pattern.data()), nullptr);
        dir_ = pattern;
    }
    void TearDown() override { fs::remove_all(dir_); }

    fs::path write(const std::string& text)
    {
        const fs::path path = dir_ / "bad.json";
        std::ofstream(path, std::ios::binary) << text;
        return path;
    }

    CliRun run(const std::string& args, const std::string& stdinFrom = "/dev/null")
    {
        return clevis::test::runCli(dir_, args, stdinFrom);
    }

    // Runs `analyze` on `text`; expects exit 1, no summary, and stderr naming
    // the file and containing each of `parts`.
    void expectRejected(const std::string& text, const std::vector<std::string>& parts)
    {
        const fs::path file = write(text);
        const CliRun r = run("analyze " + quoted(file));
        EXPECT_EQ(r.exitCode, 1) << r.err;
        EXPECT_TRUE(r.out.empty()) << r.out;
        EXPECT_TRUE(contains(r.err, file.string() + ": ")) << r.err;
        for (const auto& part : parts) EXPECT_TRUE(contains(r.err, part)) << "\"" << part << "\" not in: " << r.err;
    }
    void expectRejected(const std::function<void(json&)>& edit, const std::vector<std::string>& parts)
    {
        json doc = fourBar();
        edit(doc);
        expectRejected(doc.dump(2), parts);
    }

    fs::path dir_;
};

TEST_F(BadInputTest, TheBaseDocumentAnalyses)
{
    const CliRun r = run("analyze " + quoted(write(fourBar().dump(2))));
    EXPECT_EQ(r.exitCode, 0) << r.err;
}

TEST_F(BadInputTest, BarWithCoincidentExplicitEnds)
{
    expectRejected(
        [](json& d) {
            d["bodies"][1]["section"]["ends"] = {{0.1, 0}, {0.1, 0}};
        },
        {"bodies[1].section: ", "zero length"});
}

// With no explicit ends the bar runs between its joints: here both are at A.
TEST_F(BadInputTest, BarBetweenJointsAtTheSamePoint)
{
    expectRejected([](json& d) { d["joints"][2]["at"] = {0.1, 0}; }, {"bodies[1].section: ", "zero length"});
}

TEST_F(BadInputTest, CylinderWithCoincidentEnds)
{
    expectRejected(
        [](json& d) {
            d["drivers"][0] = {
                {"name", "ram"},
                {"type", "linear"},
                {"speed", 0.1},
                {"between", {{{"body", "ground"}, {"at", {0.2, -0.1}}}, {{"body", "rocker"}, {"at", {0.2, -0.1}}}}}};
        },
        {"drivers[0].between: ", "ends coincide"});
}

// Decided as an error, not a redundancy diagnosis: two pins on the same two
// bodies at the same point are one hinge typed twice.
TEST_F(BadInputTest, CoincidentPinsBetweenTheSameBodies)
{
    expectRejected(
        [](json& d) {
            d["joints"].push_back(
                {{"name", "A2"}, {"type", "pin"}, {"bodies", {"coupler", "crank"}}, {"at", {0.1, 0}}});
        },
        {"joints[4]: ", "\"A2\"", "same point as pin \"A\" (joints[1])", "delete one of them"});
}

TEST_F(BadInputTest, NonFiniteNumbersWrittenAsStrings)
{
    for (const char* word : {"NaN", "nan", "Infinity", "-inf"})
        expectRejected([&](json& d) { d["bodies"][0]["mass"] = word; },
                       {"bodies[0].mass: ", "expected a number, got a string"});
}

TEST_F(BadInputTest, NonFiniteNumberLiterals)
{
    for (const char* word : {"NaN", "Infinity", "-Infinity"}) {
        std::string text = fourBar().dump(2);
        text.replace(text.find("0.0005"), 6, word);
        expectRejected(text, {"line ", ", column "});
    }
}

TEST_F(BadInputTest, HugeExponents)
{
    for (const char* number : {"1e400", "-1e999", "1E+99999"}) {
        std::string text = fourBar().dump(2);
        const std::size_t at = text.find("0.0005");
        text.replace(at, 6, number);
        const auto line = 1 + std::count(text.begin(), text.begin() + at, '\n');
        expectRejected(text, {"line " + std::to_string(line) + ", column ", number});
    }
}

// Far beyond the 16 MiB the reader accepts, from a file and from a pipe
// (whose size is not known before it is read).
TEST_F(BadInputTest, FiftyMegabyteFile)
{
    const std::string text = fourBar().dump() + std::string(50'000'000, ' ');
    expectRejected(text, {"larger than 16 MiB"});
    const fs::path file = dir_ / "bad.json";
    const CliRun r = run("analyze /dev/stdin", quoted(file));
    EXPECT_EQ(r.exitCode, 1) << r.err;
    EXPECT_TRUE(contains(r.err, "/dev/stdin: ") && contains(r.err, "larger than 16 MiB")) << r.err;
}

TEST_F(BadInputTest, DeeplyNestedFile)
{
    // The name is an array nested 100 000 deep; the refusal points at the
    // bracket that opens level 65 (the root object is level 1), on line 1.
    const std::string text = "{\"clevis\": 1, \"name\": " + std::string(100000, '[') + std::string(100000, ']') + "}";
    const std::size_t column = text.find('[') + 63 + 1;
    expectRejected(text, {"line 1, column " + std::to_string(column) + ": ", "nested more than 64 levels"});
}

TEST_F(BadInputTest, NestingWithinTheLimitIsJudgedByTheFormat)
{
    const std::string text = "{\"clevis\": 1, \"name\": " + std::string(63, '[') + std::string(63, ']') + "}";
    expectRejected(text, {"name: expected a string, got an array"});
}

// Result files are saved atomically: one that cannot be written is named
// with the reason, and the run fails.
TEST_F(BadInputTest, UnwritableResultFileIsNamedWithTheReason)
{
    const fs::path file = write(fourBar().dump(2));
    const fs::path notAFolder = dir_ / "notes.txt";
    std::ofstream(notAFolder) << "keep";
    const fs::path out = notAFolder / "results.json";
    const CliRun r = run("analyze " + quoted(file) + " --json " + quoted(out));
    EXPECT_EQ(r.exitCode, 1) << r.err;
    EXPECT_TRUE(contains(r.err, "cannot save \"" + out.string() + "\"")) << r.err;
    EXPECT_TRUE(contains(r.err, "Not a directory")) << r.err;
    EXPECT_EQ(readFile(notAFolder), "keep");
}

void addUnconnectedBodies(json& d, std::size_t total)
{
    for (std::size_t k = d["bodies"].size(); k < total; ++k)
        d["bodies"].push_back({{"name", "extra" + std::to_string(k)}});
}

// Refused by count before anything is computed for the bodies (here they are
// not even connected), in a file well under 16 MiB.
TEST_F(BadInputTest, TooManyBodies)
{
    const std::size_t bodies = clevis::kMaxBodies + 1;
    expectRejected([&](json& d) { addUnconnectedBodies(d, bodies); },
                   {"bodies: " + std::to_string(bodies) + " moving bodies is more than the " +
                    std::to_string(clevis::kMaxBodies)});
}

TEST_F(BadInputTest, TooManyBodyPositions)
{
    const std::size_t bodies = std::size_t(clevis::kMaxBodySteps / clevis::kMaxSteps) + 1;
    ASSERT_LE(bodies, clevis::kMaxBodies);
    expectRejected(
        [&](json& d) {
            addUnconnectedBodies(d, bodies);
            d["cycle"]["steps"] = clevis::kMaxSteps;
        },
        {"cycle.steps: ", "body positions", "use at most"});
}

}  // namespace
