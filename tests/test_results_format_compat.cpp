// The --json result file keeps its documented shape across writers: files
// written by the document-tree writer that came before the streaming one
// (tests/data/results_before_streaming/, from `clevis-cli analyze SAMPLE
// --steps 12 --json OUT`) are compared key by key and value by value with what
// clevis-cli writes now. New keys may appear; none may go or change.
#include "tests/cli_runner.h"

#include <nlohmann/json.hpp>

#include <gtest/gtest.h>

#include <cmath>

using nlohmann::json;
using namespace clevis::test;

namespace {

// Every value of `before` is in `now` at the same path. Numbers may differ
// in the last bits only (the solve is the same; the tolerance is there so a
// change of compiler or flags does not fail a format check).
void expectContains(const json& before, const json& now, const std::string& path)
{
    if (before.is_number()) {
        ASSERT_TRUE(now.is_number()) << path;
        const double a = before.get<double>(), b = now.get<double>();
        EXPECT_NEAR(a, b, 1e-9 * std::max(1.0, std::abs(a))) << path;
        return;
    }
    ASSERT_EQ(before.type(), now.type()) << path;
    if (before.is_object()) {
        for (const auto& [key, value] : before.items()) {
            ASSERT_TRUE(now.contains(key)) << path << "." << key;
            expectContains(value, now[key], path + "." + key);
        }
    } else if (before.is_array()) {
        ASSERT_EQ(before.size(), now.size()) << path;
        for (std::size_t i = 0; i < before.size(); ++i)
            expectContains(before[i], now[i], path + "[" + std::to_string(i) + "]");
    } else {
        EXPECT_EQ(before, now) << path;
    }
}

class ResultsFormat : public ::testing::TestWithParam<const char*> {};

TEST_P(ResultsFormat, EveryValueOfTheFormerWriterIsWrittenAgain)
{
    const std::filesystem::path scratch = std::filesystem::path(::testing::TempDir()) / "results_format" / GetParam();
    std::filesystem::create_directories(scratch);
    const std::string sample = std::string(CLEVIS_SAMPLES_DIR) + "/" + GetParam() + ".json";
    const CliRun run =
        runCli(scratch, "analyze " + quoted(std::filesystem::path(sample)) + " --steps 12 --json " + quoted(scratch / "now.json"));
    ASSERT_EQ(run.exitCode, 0) << run.err;
    const json before = json::parse(readFile(std::string(CLEVIS_FORMAT_DATA_DIR) + "/" + GetParam() + ".json"));
    const json now = json::parse(readFile(scratch / "now.json"));
    expectContains(before, now, "$");
}

INSTANTIATE_TEST_SUITE_P(Samples, ResultsFormat, ::testing::Values("tipping_bed", "punch_press"));

}  // namespace
