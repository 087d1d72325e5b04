// The bundled sample mechanisms, and generated four-bar chains, solved over
// their whole cycle and checked at every step against the two laws the
// reported results must obey whatever the mechanism (tests/step_laws.h):
// Newton–Euler for each body, and the work–energy theorem in rate form.
#include "core/file/mechanism_file.h"
#include "core/results/cycle_summary.h"
#include "core/solver/cycle_sweep.h"
#include "tests/chain_generator.h"
#include "tests/step_laws.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <filesystem>
#include <map>

using namespace clevis;

namespace {

struct Solved {
    CompiledMechanism mechanism;
    CycleResult result;
    std::vector<std::string> fileWarnings;
};

Solved solve(const Mechanism& mechanism, std::vector<std::string> fileWarnings = {})
{
    Solved s{compile(mechanism), {}, std::move(fileWarnings)};
    s.result = sweepCycle(s.mechanism);
    return s;
}

std::vector<std::string> samplePaths()
{
    std::vector<std::string> paths;
    for (const auto& entry : std::filesystem::directory_iterator(CLEVIS_SAMPLES_DIR))
        if (entry.path().extension() == ".json") paths.push_back(entry.path().string());
    std::sort(paths.begin(), paths.end());
    return paths;
}

// Each sample is loaded and solved once, whichever test asks first.
const Solved& solvedSample(const std::string& path)
{
    static std::map<std::string, Solved> cache;
    auto it = cache.find(path);
    if (it == cache.end()) {
        LoadedMechanism loaded = loadMechanismFile(path);
        it = cache.emplace(path, solve(loaded.mechanism, loaded.warnings)).first;
    }
    return it->second;
}

// Newton–Euler for every moving body at one step.
void expectNewtonEuler(const CompiledMechanism& m, const StepResult& s, const std::string& where)
{
    for (const auto& breach : test::newtonEulerBreaches(m, s)) ADD_FAILURE() << where << ", " << breach;
}

void expectPowerBalance(const CompiledMechanism& m, const StepResult& s, const std::string& where)
{
    for (const auto& breach : test::powerBalanceBreaches(m, s)) ADD_FAILURE() << where << ": " << breach;
}

std::string stepLabel(const CompiledMechanism& m, std::size_t k, const StepResult& s)
{
    return m.name + ", step " + std::to_string(k) + " (t = " + std::to_string(s.t) + " s)";
}

void expectLawsAtEveryStep(const Solved& solved)
{
    const auto& steps = solved.result.steps;
    for (std::size_t k = 0; k < steps.size(); ++k) {
        expectNewtonEuler(solved.mechanism, steps[k], stepLabel(solved.mechanism, k, steps[k]));
        expectPowerBalance(solved.mechanism, steps[k], stepLabel(solved.mechanism, k, steps[k]));
    }
}

void expectWholeCycle(const Solved& solved)
{
    const CycleResult& r = solved.result;
    EXPECT_TRUE(r.complete) << solved.mechanism.name;
    EXPECT_EQ(r.steps.size(), std::size_t(r.plannedSteps) + 1) << solved.mechanism.name;
    for (const Warning& w : r.warnings) ADD_FAILURE() << solved.mechanism.name << ": " << w.code << ": " << w.message;
    for (std::size_t k = 0; k < r.steps.size(); ++k)
        EXPECT_FALSE(r.steps[k].nearSingular) << stepLabel(solved.mechanism, k, r.steps[k]);
}

// Common practice keeps a transmission angle within 40°–140° (the bound the
// printed summary flags, core/summary_text.cpp); the samples are designed to.
void expectPracticalTransmission(const Solved& solved)
{
    const CompiledMechanism& m = solved.mechanism;
    const CycleResult& r = solved.result;
    for (std::size_t p = 0; p < r.transmissionPins.size(); ++p) {
        const CompiledJoint& j = m.joints[r.transmissionPins[p].joint];
        for (std::size_t k = 0; k < r.steps.size(); ++k) {
            EXPECT_GE(r.steps[k].transmissionDeg[p], 40.0)
                << stepLabel(m, k, r.steps[k]) << ", pin " << j.name << " (°)";
            EXPECT_LE(r.steps[k].transmissionDeg[p], 140.0)
                << stepLabel(m, k, r.steps[k]) << ", pin " << j.name << " (°)";
        }
    }
}

bool finite(const PeakAt& p) { return std::isfinite(p.value) && p.step >= 0; }

class Sample : public ::testing::TestWithParam<std::string> {};

TEST(Samples, TheFiveBundledSamplesArePresent)
{
    std::vector<std::string> stems;
    for (const auto& path : samplePaths()) stems.push_back(std::filesystem::path(path).stem().string());
    for (const char* name : {"dwell_six_bar", "flap_folder", "punch_press", "tipping_bed", "tote_arm"})
        EXPECT_NE(std::find(stems.begin(), stems.end(), name), stems.end())
            << name << ".json missing from " << CLEVIS_SAMPLES_DIR;
}

TEST_P(Sample, LoadsWithoutWarningsAndSolvesTheWholeCycle)
{
    const Solved& s = solvedSample(GetParam());
    EXPECT_FALSE(s.mechanism.name.empty()) << GetParam() << " has no name";
    for (const auto& w : s.fileWarnings) ADD_FAILURE() << GetParam() << ": " << w;
    expectWholeCycle(s);
}

TEST_P(Sample, SummaryIsFinite)
{
    const Solved& s = solvedSample(GetParam());
    const CycleSummary summary = summarize(s.mechanism, s.result);
    ASSERT_EQ(summary.joints.size(), s.mechanism.joints.size());
    ASSERT_EQ(summary.drivers.size(), s.mechanism.drivers.size());
    for (const auto& j : summary.joints) EXPECT_TRUE(finite(j.peak) && std::isfinite(j.rms)) << j.name;
    for (const auto& d : summary.drivers)
        EXPECT_TRUE(finite(d.peak) && std::isfinite(d.rms) && std::isfinite(d.mean) && std::isfinite(d.work)) << d.name;
    EXPECT_TRUE(finite(summary.groundForce) && finite(summary.groundMoment));
    for (const auto& t : summary.transmission) EXPECT_TRUE(finite(t.minimum) && finite(t.maximum)) << t.joint;
    EXPECT_TRUE(std::isfinite(summary.energy.relativeResidual));
    EXPECT_EQ(summary.nearSingularSteps, 0);
}

TEST_P(Sample, EveryBodyObeysNewtonEulerAndDriverPowerBalancesTheEnergyRates)
{
    expectLawsAtEveryStep(solvedSample(GetParam()));
}

TEST_P(Sample, TransmissionAnglesStayWithinPracticalBounds) { expectPracticalTransmission(solvedSample(GetParam())); }

INSTANTIATE_TEST_SUITE_P(Bundled, Sample, ::testing::ValuesIn(samplePaths()),
                         [](const auto& info) { return std::filesystem::path(info.param).stem().string(); });

// Odd counts are pure four-bar ladders; even ones end in the slotted lever.
TEST(FourBarChain, SolvesAndObeysTheLawsWithAndWithoutTheSlottedLever)
{
    for (const int bodies : {10, 11}) {
        const Solved s = solve(test::fourBarChain(bodies));
        ASSERT_EQ(s.mechanism.bodies.size(), std::size_t(bodies));
        expectWholeCycle(s);
        expectLawsAtEveryStep(s);
        expectPracticalTransmission(s);
    }
}

// The rockers' swing shrinks along the chain but must not die out, or a long
// chain would time a mechanism that barely moves.
TEST(FourBarChain, LastBodyOfALongChainStillSwings)
{
    const Solved s = solve(test::fourBarChain(101));
    ASSERT_TRUE(s.result.complete);
    const int last = int(s.mechanism.bodies.size()) - 1;
    double low = 0.0, high = 0.0;
    for (const auto& step : s.result.steps) {
        low = std::min(low, step.q[3 * last + 2]);
        high = std::max(high, step.q[3 * last + 2]);
    }
    EXPECT_GT(radToDeg(high - low), 5.0) << "swing of " << s.mechanism.bodies[last].name << " (°)";
}

}  // namespace
