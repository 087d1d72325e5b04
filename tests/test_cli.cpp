// clevis-cli as a user runs it: the built binary on mechanism files written
// to a scratch directory, checked for exit codes, messages and output files.
#include "tests/cli_runner.h"

#include <gtest/gtest.h>
#include <nlohmann/json.hpp>

#include <unistd.h>

#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <sstream>

namespace fs = std::filesystem;

namespace {

using clevis::test::CliRun;
using clevis::test::contains;
using clevis::test::quoted;
using clevis::test::readFile;

// A slider-crank press, drawn at the crank's dead centre: crank O→A 0.1 m,
// rod A→B 0.35 m (a steel bar), ram sliding along +x. "colour" is a key the
// reader does not know.
const char* const kPress = R"({
  "clevis": 1, "name": "press",
  "bodies": [
    {"name": "crank", "mass": 1.0, "cg": [0.05, 0], "inertia": 0.001, "colour": "red"},
    {"name": "rod", "section": {"width": 0.02, "thickness": 0.01, "material": "steel"}},
    {"name": "ram", "mass": 2.0, "cg": [0.45, 0]}
  ],
  "joints": [
    {"name": "O", "type": "pin", "bodies": ["ground", "crank"], "at": [0, 0]},
    {"name": "A", "type": "pin", "bodies": ["crank", "rod"], "at": [0.1, 0]},
    {"name": "B", "type": "pin", "bodies": ["rod", "ram"], "at": [0.45, 0]},
    {"name": "S", "type": "slider", "bodies": ["ground", "ram"], "at": [0.45, 0], "axis_deg": 0}
  ],
  "drivers": [{"name": "motor", "type": "rotary", "joint": "O", "speed_rpm": 60}],
  "loads": [{"type": "force", "name": "forming", "body": "ram", "at": [0.45, 0], "force": [-500, 0]}],
  "cycle": {"steps": 36}
})";

class CliTest : public ::testing::Test {
protected:
    void SetUp() override
    {
        std::string pattern = (fs::temp_directory_path() / "clevis-cli-test-XXXXXX").string();
        ASSERT_NE(mkdtemp(pattern.data()), nullptr);
        dir_ = pattern;
    }
    void TearDown() override { fs::remove_all(dir_); }

    fs::path write(const std::string& name, const std::string& text)
    {
        const fs::path path = dir_ / name;
        std::ofstream(path, std::ios::binary) << text;
        return path;
    }

    CliRun run(const std::string& args) { return clevis::test::runCli(dir_, args); }

    fs::path dir_;
};

TEST_F(CliTest, AnalyzePrintsASummaryWithUnits)
{
    const fs::path file = write("press.json", kPress);
    const CliRun r = run("analyze " + quoted(file));
    EXPECT_EQ(r.exitCode, 0) << r.err;
    EXPECT_TRUE(contains(r.out, " N ") || contains(r.out, " N\n")) << r.out;
    EXPECT_TRUE(contains(r.out, " N·m")) << r.out;
    EXPECT_TRUE(contains(r.out, " J")) << r.out;
    EXPECT_TRUE(contains(r.out, "at motor = ")) << r.out;
    EXPECT_TRUE(contains(r.out, "36 steps")) << r.out;
    EXPECT_TRUE(contains(r.out, "Energy balance closes to")) << r.out;
    // The unknown key is reported but does not fail the run.
    EXPECT_TRUE(contains(r.err, "colour")) << r.err;
    EXPECT_TRUE(contains(r.err, file.string())) << r.err;
}

TEST_F(CliTest, JsonOutputHasTheDocumentedKeysAndOneEntryPerPosition)
{
    const fs::path file = write("press.json", kPress), out = dir_ / "press-results.json";
    const CliRun r = run("analyze " + quoted(file) + " --steps 24 --json " + quoted(out));
    ASSERT_EQ(r.exitCode, 0) << r.err;
    const nlohmann::json j = nlohmann::json::parse(readFile(out));
    for (const char* key : {"steps", "summary", "warnings", "complete", "duration_s", "planned_steps"})
        EXPECT_TRUE(j.contains(key)) << key;
    EXPECT_EQ(j["steps"].size(), 25u);
    EXPECT_EQ(j["planned_steps"], 24);
    EXPECT_NEAR(j["duration_s"].get<double>(), 1.0, 1e-12);  // one turn at 60 rpm
    for (const char* joint : {"O", "A", "B", "S"}) EXPECT_TRUE(j["steps"][0]["joints"].contains(joint)) << joint;
    EXPECT_TRUE(j["summary"]["joints"]["S"].contains("peak_moment_nm"));
    EXPECT_EQ(j["summary"]["drivers"]["motor"]["unit"], "N·m");
    EXPECT_TRUE(j["summary"]["energy_balance"].contains("relative_residual"));
}

TEST_F(CliTest, CsvOutputHasUnitsInItsHeaderAndOneRowPerPosition)
{
    const fs::path file = write("press.json", kPress), out = dir_ / "press.csv";
    const CliRun r = run("analyze " + quoted(file) + " --steps=24 --csv=" + quoted(out));
    ASSERT_EQ(r.exitCode, 0) << r.err;
    std::istringstream csv(readFile(out));
    std::string header, line;
    std::getline(csv, header);
    for (const char* column : {"t [s]", "motor [deg]", "ram.x [m]", "S.moment [N·m]", "motor.effort [N·m]",
                               "motor.power [W]", "B.transmission [deg]"})
        EXPECT_TRUE(contains(header, column)) << column << " in " << header;
    int rows = 0;
    while (std::getline(csv, line)) ++rows;
    EXPECT_EQ(rows, 25);
}

// kPress with a motor characteristic (and more) on its driver.
std::string pressWithMotor(const std::string& drive)
{
    std::string text = kPress;
    const std::string driver = R"("speed_rpm": 60})";
    text.replace(text.find(driver), driver.size(), R"("speed_rpm": 60, )" + drive + "}");
    return text;
}

// The motion found: time and speed per step, the fluctuation and mean speed,
// the flywheel sizing, the CSV's drive columns after the old ones, and the
// figures in the text with their units.
TEST_F(CliTest, MotorDrivenPressReportsItsRealSpeed)
{
    const fs::path file = write("press.json", pressWithMotor(R"("motor": {"stall_torque": 300, "no_load_rpm": 75},
        "gearbox": {"ratio": 1, "efficiency": 0.9}, "flywheel": {"inertia": 0.5}, "fluctuation_target": 0.04)"));
    const fs::path json = dir_ / "out.json", csv = dir_ / "out.csv";
    const CliRun r = run("analyze " + quoted(file) + " --json " + quoted(json) + " --csv " + quoted(csv));
    ASSERT_EQ(r.exitCode, 0) << r.err;
    const nlohmann::json j = nlohmann::json::parse(readFile(json));
    const auto& d = j["summary"]["drivers"]["motor"];
    EXPECT_NEAR(d["speed_fluctuation"].get<double>(), 0.04, 0.04 * 1e-3);
    EXPECT_GT(d["mean_speed_rpm"].get<double>(), 60.0);
    EXPECT_LT(d["mean_speed_rpm"].get<double>(), 75.0);
    for (const char* key : {"energy_estimate_kgm2", "integrated_kgm2"})
        EXPECT_GT(j["summary"]["flywheel"][key].get<double>(), 0.0) << key;
    const auto& steps = j["steps"];
    ASSERT_EQ(steps.size(), 37u);
    for (std::size_t k = 1; k < steps.size(); ++k) {
        EXPECT_GT(steps[k]["t"].get<double>(), steps[k - 1]["t"].get<double>());
        EXPECT_NEAR(steps[k]["drive"]["motor"].get<double>(), 10.0 * double(k), 1e-9);
        EXPECT_GT(steps[k]["drivers"]["motor"]["speed_rpm"].get<double>(), 0.0);
    }
    std::istringstream table(readFile(csv));
    std::string header;
    std::getline(table, header);
    EXPECT_TRUE(contains(header, "near_singular,motor.speed [rpm],motor.motor_speed [rpm],motor.motor_torque [N·m]"))
        << header;
    for (const char* shown : {"Speed fluctuation (max − min)/mean", "rpm", "Energy estimate", "kg·m²"})
        EXPECT_TRUE(contains(r.out, shown)) << shown;
    EXPECT_FALSE(contains(r.err, "drive_not_integrated")) << r.err;
}

// A motor too weak for the press: a clear message naming the driver and where
// it stops, exit status 1, and no result file written.
TEST_F(CliTest, MotorThatStallsStopsCleanly)
{
    const fs::path file = write("press.json", pressWithMotor(R"("motor": {"stall_torque": 10, "no_load_rpm": 100})"));
    const fs::path json = dir_ / "out.json";
    const CliRun r = run("analyze " + quoted(file) + " --json " + quoted(json));
    EXPECT_EQ(r.exitCode, 1);
    EXPECT_TRUE(contains(r.err, "driver motor: the motor cannot keep the mechanism turning: it stalls at motor = "))
        << r.err;
    EXPECT_FALSE(fs::exists(json));
    EXPECT_EQ(readFile(file), pressWithMotor(R"("motor": {"stall_torque": 10, "no_load_rpm": 100})"));
}

TEST_F(CliTest, BadUsageExitsWithTwoAndPointsToHelp)
{
    const fs::path file = write("press.json", kPress);
    for (const std::string args : {std::string(""), std::string("analyze"), "analyze " + quoted(file) + " --steps 0",
                                   "analyze " + quoted(file) + " --steps 1.5", "analyze " + quoted(file) + " --steps",
                                   "analyze " + quoted(file) + " --frobnicate", std::string("simulate x.json")}) {
        const CliRun r = run(args);
        EXPECT_EQ(r.exitCode, 2) << args;
        EXPECT_TRUE(contains(r.err, "--help")) << args << ": " << r.err;
        EXPECT_TRUE(r.out.empty()) << args;
    }
}

TEST_F(CliTest, HelpAndVersion)
{
    const CliRun help = run("--help");
    EXPECT_EQ(help.exitCode, 0);
    EXPECT_TRUE(contains(help.out, "analyze FILE"));
    const CliRun analyzeHelp = run("analyze --help");
    EXPECT_EQ(analyzeHelp.exitCode, 0);
    for (const char* part : {"--steps", "--json", "--csv", "Exit status", "N·m", "docs/results-format.md"})
        EXPECT_TRUE(contains(analyzeHelp.out, part)) << part;
    const CliRun version = run("--version");
    EXPECT_EQ(version.exitCode, 0);
    EXPECT_TRUE(contains(version.out, "clevis-cli ")) << version.out;
}

TEST_F(CliTest, AMissingBodyIsReportedWithTheFileAndPath)
{
    std::string text = kPress;
    text.replace(text.find(R"(["rod", "ram"])"), 14, R"(["rod", "coupler"])");
    const fs::path file = write("broken.json", text);
    const CliRun r = run("analyze " + quoted(file));
    EXPECT_EQ(r.exitCode, 1);
    EXPECT_TRUE(contains(r.err, file.string() + ": joints[2].bodies[1]: no body named \"coupler\"")) << r.err;
}

TEST_F(CliTest, AFileThatCannotBeOpenedIsAModelError)
{
    const CliRun r = run("analyze " + quoted(dir_ / "absent.json"));
    EXPECT_EQ(r.exitCode, 1);
    EXPECT_TRUE(contains(r.err, (dir_ / "absent.json").string())) << r.err;
}

// Links 0.3 (ground), 0.2 (crank), 0.15, 0.15: the shortest plus the longest
// exceed the other two (0.45 > 0.35), so by Grashof's criterion no link turns
// fully; the crank reaches only where |A − O4| ≤ 0.3 m, i.e. cos θ ≥ 1/3.
TEST_F(CliTest, AnIncompleteCycleFailsButStillWritesItsResults)
{
    const double theta = 60.0 * 3.14159265358979323846 / 180.0;
    const double ax = 0.2 * std::cos(theta), ay = 0.2 * std::sin(theta), dx = 0.3;
    // B on circles of 0.15 m about A and about O4 = (0.3, 0), above the line A–O4.
    const double ux = (dx - ax), uy = -ay, z = std::hypot(ux, uy);
    const double along = z / 2, across = std::sqrt(0.15 * 0.15 - along * along);
    const double bx = ax + along * ux / z - across * uy / z, by = ay + along * uy / z + across * ux / z;
    char text[1024];
    std::snprintf(text, sizeof text, R"({
  "clevis": 1, "name": "non-Grashof", "gravity": false,
  "bodies": [{"name": "crank", "mass": 0.5, "cg": [%.9f, %.9f]}, {"name": "coupler"}, {"name": "rocker"}],
  "joints": [
    {"name": "O2", "type": "pin", "bodies": ["ground", "crank"], "at": [0, 0]},
    {"name": "A", "type": "pin", "bodies": ["crank", "coupler"], "at": [%.9f, %.9f]},
    {"name": "B", "type": "pin", "bodies": ["coupler", "rocker"], "at": [%.9f, %.9f]},
    {"name": "O4", "type": "pin", "bodies": ["ground", "rocker"], "at": [0.3, 0]}
  ],
  "drivers": [{"name": "motor", "type": "rotary", "joint": "O2", "speed_rpm": 30, "angle_deg": 60}],
  "cycle": {"steps": 72}
})",
                  ax / 2, ay / 2, ax, ay, bx, by);
    const fs::path file = write("nongrashof.json", text), out = dir_ / "partial.json";
    const CliRun r = run("analyze " + quoted(file) + " --json " + quoted(out));
    EXPECT_EQ(r.exitCode, 1) << r.out << r.err;
    EXPECT_TRUE(contains(r.out, "INCOMPLETE")) << r.out;
    EXPECT_TRUE(contains(r.err, "not trustworthy")) << r.err;
    ASSERT_TRUE(fs::exists(out));
    const nlohmann::json j = nlohmann::json::parse(readFile(out));
    EXPECT_FALSE(j["complete"].get<bool>());
    EXPECT_GT(j["steps"].size(), 1u);
    EXPECT_LT(j["steps"].size(), 73u);
    // The crank stops before cos θ falls below 1/3 (θ ≈ 70.5°).
    EXPECT_LE(j["steps"].back()["drive"]["motor"].get<double>(), std::acos(1.0 / 3.0) * 180 / 3.14159265358979323846);
    bool unreachable = false;
    for (const auto& w : j["warnings"]) unreachable |= w["code"] == "out_of_reach";
    EXPECT_TRUE(unreachable);
}

// A parallelogram four-bar (crank 0.1, coupler 0.3, rocker 0.1, ground 0.3):
// at θ = 0° and 180° all four pins lie on one line, a change point where the
// constraint equations are singular. The grid of 360 steps from 45° hits both.
TEST_F(CliTest, NearSingularPositionsFailButStillWriteTheResults)
{
    const double theta = 45.0 * 3.14159265358979323846 / 180.0;
    const double ax = 0.1 * std::cos(theta), ay = 0.1 * std::sin(theta);
    char text[1400];
    std::snprintf(text, sizeof text, R"({
  "clevis": 1, "name": "parallelogram", "gravity": false,
  "bodies": [{"name": "crank", "mass": 0.5, "cg": [%.12f, %.12f], "inertia": 0.001},
             {"name": "coupler", "mass": 1.0, "cg": [%.12f, %.12f], "inertia": 0.01},
             {"name": "rocker", "mass": 0.5, "cg": [%.12f, %.12f], "inertia": 0.001}],
  "joints": [
    {"name": "O2", "type": "pin", "bodies": ["ground", "crank"], "at": [0, 0]},
    {"name": "A", "type": "pin", "bodies": ["crank", "coupler"], "at": [%.12f, %.12f]},
    {"name": "B", "type": "pin", "bodies": ["coupler", "rocker"], "at": [%.12f, %.12f]},
    {"name": "O4", "type": "pin", "bodies": ["ground", "rocker"], "at": [0.3, 0]}
  ],
  "drivers": [{"name": "motor", "type": "rotary", "joint": "O2", "speed_rpm": 60, "angle_deg": 45}],
  "cycle": {"steps": 360}
})",
                  ax / 2, ay / 2, ax + 0.15, ay, 0.3 + ax / 2, ay / 2, ax, ay, ax + 0.3, ay);
    const fs::path file = write("parallelogram.json", text), json = dir_ / "p.json", csv = dir_ / "p.csv";
    const CliRun r = run("analyze " + quoted(file) + " --json " + quoted(json) + " --csv " + quoted(csv));
    EXPECT_EQ(r.exitCode, 1) << r.out << r.err;
    EXPECT_TRUE(contains(r.err, "near singular")) << r.err;
    EXPECT_TRUE(contains(r.out, "Cycle summary")) << r.out;
    ASSERT_TRUE(fs::exists(json));
    ASSERT_TRUE(fs::exists(csv));
    const nlohmann::json j = nlohmann::json::parse(readFile(json));
    EXPECT_GT(j["summary"]["near_singular_steps"].get<int>(), 0);
    bool flagged = false;
    for (const auto& w : j["warnings"])
        if (w["code"] == "near_singular") {
            flagged = true;
            // s + l = p + q = 0.1 + 0.3: the change point explains the flag.
            EXPECT_TRUE(contains(w["message"].get<std::string>(), "change-point four-bar (s + l = p + q = 0.4 m)"))
                << w["message"];
        }
    EXPECT_TRUE(flagged);
}

}  // namespace
