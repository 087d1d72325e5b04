// clevis-cli against the hand method done outside it: tools/four_bar_by_hand.py
// works a four-bar's pin forces and crank torque step by step in plain Python
// (closed-form loop kinematics, then ΣF = m·a_G and ΣM_G = I_G·α for each
// body, solved together), and writes the same four-bar as a mechanism file.
// Every step of `clevis-cli analyze --json` must agree with it.
#include "tests/cli_runner.h"

#include <gtest/gtest.h>
#include <nlohmann/json.hpp>

#include <cmath>
#include <filesystem>
#include <fstream>

#include <unistd.h>

namespace {

using namespace clevis::test;

TEST(HandMethod, EveryStepOfAFourBarAgreesWithThePlainScript)
{
    const std::filesystem::path scratch =
        std::filesystem::temp_directory_path() / ("clevis_hand_" + std::to_string(::getpid()));
    std::filesystem::create_directories(scratch);
    const CliRun file = runProgram("/usr/bin/python3", scratch, quoted(CLEVIS_HAND_SCRIPT) + " --mechanism");
    ASSERT_EQ(file.exitCode, 0) << file.err;
    std::ofstream(scratch / "four_bar.json") << file.out;
    const CliRun hand = runProgram("/usr/bin/python3", scratch, quoted(CLEVIS_HAND_SCRIPT) + " --steps");
    ASSERT_EQ(hand.exitCode, 0) << hand.err;
    const auto byHand = nlohmann::json::parse(hand.out);
    const CliRun cli =
        runCli(scratch, "analyze " + quoted(scratch / "four_bar.json") + " --json " + quoted(scratch / "out.json"));
    ASSERT_EQ(cli.exitCode, 0) << cli.err;
    const auto steps = nlohmann::json::parse(readFile(scratch / "out.json")).at("steps");
    std::filesystem::remove_all(scratch);

    ASSERT_EQ(steps.size(), byHand.size());
    double largest = 0.0;  // the scale of the forces, N
    for (const auto& h : byHand)
        for (const char* joint : {"O", "A", "B", "Q"})
            largest = std::max(largest, std::hypot(h.at(joint)[0].get<double>(), h.at(joint)[1].get<double>()));
    ASSERT_GT(largest, 1.0);
    for (std::size_t k = 0; k < steps.size(); ++k) {
        const auto& c = steps[k];
        const auto& h = byHand[k];
        EXPECT_NEAR(c.at("t").get<double>(), h.at("t").get<double>(), 1e-12);
        for (const char* joint : {"O", "A", "B", "Q"}) {
            EXPECT_NEAR(c.at("joints").at(joint).at("fx").get<double>(), h.at(joint)[0].get<double>(), 1e-10 * largest)
                << joint << " at step " << k;
            EXPECT_NEAR(c.at("joints").at(joint).at("fy").get<double>(), h.at(joint)[1].get<double>(), 1e-10 * largest)
                << joint << " at step " << k;
        }
        // The torque's scale: the largest force times the crank's length, 0.05 m.
        EXPECT_NEAR(c.at("drivers").at("motor").at("effort").get<double>(), h.at("motor").get<double>(),
                    1e-10 * largest * 0.05)
            << "step " << k;
    }
}

}  // namespace
