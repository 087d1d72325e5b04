// `clevis-cli internal-loads` run as a user would: the stations it prints and
// writes, the exact position it solves, and its refusals.
#include "tests/cli_runner.h"

#include <gtest/gtest.h>
#include <nlohmann/json.hpp>

#include <unistd.h>
#include <cmath>
#include <filesystem>

using namespace clevis::test;

namespace {

const std::string kSixBar = std::string(CLEVIS_SAMPLES_DIR) + "/dwell_six_bar.json";

class CliInternalLoads : public ::testing::Test {
protected:
    void SetUp() override
    {
        scratch_ = std::filesystem::temp_directory_path() / ("clevis_cli_internal_loads_" + std::to_string(::getpid()));
        std::filesystem::create_directories(scratch_);
    }
    void TearDown() override { std::filesystem::remove_all(scratch_); }
    CliRun run(const std::string& args) { return runCli(scratch_, args); }
    std::filesystem::path scratch_;
};

// 90.5° lies between the stored 1° steps of the sample: the position shown
// and written must be 90.5° itself.
TEST_F(CliInternalLoads, WritesStationsAtExactlyTheAskedAngle)
{
    const auto json = scratch_ / "rocker.json", csv = scratch_ / "rocker.csv";
    const CliRun r = run("internal-loads '" + kSixBar + "' --body rocker --at-deg 90.5 --stations 7 --json " +
                         quoted(json) + " --csv " + quoted(csv));
    ASSERT_EQ(r.exitCode, 0) << r.err;
    EXPECT_TRUE(contains(r.out, "index_motor = 90.50°")) << r.out;
    EXPECT_TRUE(contains(r.out, "Envelope over the cycle")) << r.out;
    const auto j = nlohmann::json::parse(readFile(json));
    EXPECT_EQ(j["body"], "rocker");
    EXPECT_EQ(j["from_joint"], "B");
    EXPECT_EQ(j["to_joint"], "R");
    EXPECT_NEAR(j["drive"]["index_motor"]["position"].get<double>(), 90.5, 1e-9);
    // 90 rpm: 90.5° is reached at t = 90.5/360/1.5 s.
    EXPECT_NEAR(j["t"].get<double>(), 90.5 / 360.0 / 1.5, 1e-12);
    const double length = j["length_m"].get<double>();
    ASSERT_EQ(j["stations"].size(), 7u);
    for (std::size_t k = 0; k < 7; ++k) {
        const auto& st = j["stations"][k];
        EXPECT_NEAR(st["s_m"].get<double>(), length * double(k) / 6.0, 1e-15);
        for (const char* key : {"axial_N", "shear_N", "moment_Nm"}) EXPECT_TRUE(st[key].is_number()) << key;
    }
    // A pinned end carries no moment.
    EXPECT_NEAR(j["stations"][0]["moment_Nm"].get<double>(), 0.0, 1e-12);
    EXPECT_NEAR(j["stations"][6]["moment_Nm"].get<double>(), 0.0, 1e-12);
    EXPECT_TRUE(j["envelope"]["moment"]["s_m"].is_number());
    const std::string text = readFile(csv);
    EXPECT_EQ(text.rfind("s_m,axial_N,shear_N,moment_Nm\n", 0), 0u) << text;
    EXPECT_EQ(std::count(text.begin(), text.end(), '\n'), 8);
}

TEST_F(CliInternalLoads, NamesTheIdealisationOfTypedInMass)
{
    const CliRun r = run("internal-loads '" + kSixBar + "' --body crank --at-peak A");
    ASSERT_EQ(r.exitCode, 0) << r.err;
    EXPECT_TRUE(contains(r.out, "typed-in mass as a uniform bar")) << r.out;
}

TEST_F(CliInternalLoads, RefusesAPlateNamingItAndWhy)
{
    const CliRun r = run("internal-loads '" + kSixBar + "' --body coupler_plate --at-deg 90");
    EXPECT_EQ(r.exitCode, 1);
    EXPECT_TRUE(contains(r.err, "\"coupler_plate\" is not a bar: a plate with 3 joints")) << r.err;
    EXPECT_TRUE(r.out.empty()) << r.out;
}

TEST_F(CliInternalLoads, RefusesUnknownBodyAndJointNamingThem)
{
    CliRun r = run("internal-loads '" + kSixBar + "' --body rockr --at-deg 90");
    EXPECT_EQ(r.exitCode, 1);
    EXPECT_TRUE(contains(r.err, "no body \"rockr\"")) << r.err;
    EXPECT_TRUE(contains(r.err, "rocker")) << r.err;
    r = run("internal-loads '" + kSixBar + "' --body rocker --at-peak Q");
    EXPECT_EQ(r.exitCode, 1);
    EXPECT_TRUE(contains(r.err, "no pin \"Q\"")) << r.err;
}

TEST_F(CliInternalLoads, RefusesFewerThanTwoStationsAndAmbiguousPositions)
{
    CliRun r = run("internal-loads '" + kSixBar + "' --body rocker --at-deg 90 --stations 1");
    EXPECT_EQ(r.exitCode, 2);
    EXPECT_TRUE(contains(r.err, "--stations")) << r.err;
    r = run("internal-loads '" + kSixBar + "' --body rocker --at-deg 90 --at-t 0.1");
    EXPECT_EQ(r.exitCode, 2);
    EXPECT_TRUE(contains(r.err, "exactly one of --at-deg, --at-t, --at-peak")) << r.err;
    r = run("internal-loads '" + kSixBar + "' --body rocker --at-t 9");
    EXPECT_EQ(r.exitCode, 1);
    EXPECT_TRUE(contains(r.err, "outside the solved cycle")) << r.err;
}

}  // namespace
