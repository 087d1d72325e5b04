// Random mechanisms at scale (tests/random_mechanisms.h), each either solved
// with every law holding or refused / stopped / flagged with the part named
// (tests/random_mechanism_check.h). ctest runs a quick subset; the full run
// is the same test with a count in the environment:
//
//   CLEVIS_RANDOM_MECHANISMS=10000 build/tests/clevis_random_mechanism_tests \
//       --gtest_filter='RandomMechanisms.EachIsSolvedWithItsLawsOrDiagnosed'
//
// CLEVIS_RANDOM_SEED sets the seed and CLEVIS_RANDOM_FIRST the first index,
// so a finding printed as "seed S, mechanism K" is replayed with
// CLEVIS_RANDOM_SEED=S CLEVIS_RANDOM_FIRST=K CLEVIS_RANDOM_MECHANISMS=1.
#include "core/file/mechanism_file.h"
#include "core/model/grashof.h"
#include "core/solver/cycle_sweep.h"
#include "tests/mechanism_builders.h"
#include "tests/random_mechanism_check.h"
#include "tests/random_mechanisms.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cstdio>
#include <cstdlib>
#include <ctime>
#include <filesystem>
#include <fstream>
#include <iostream>
#include <map>
#include <set>

using namespace clevis;
using namespace clevis::test;

namespace {

constexpr std::uint64_t kDefaultSeed = 20261202;
constexpr int kQuickCount = 300;

std::uint64_t environmentNumber(const char* name, std::uint64_t fallback)
{
    const char* text = std::getenv(name);
    return text && *text ? std::strtoull(text, nullptr, 10) : fallback;
}

// Writes a mechanism whose check failed where it can be opened and replayed.
std::string keep(const RandomMechanism& r)
{
    const auto path = std::filesystem::temp_directory_path() /
                      ("clevis-random-" + std::to_string(r.seed) + "-" + std::to_string(r.index) + ".json");
    std::ofstream(path) << saveMechanismText(r.mechanism);
    return path.string();
}

TEST(RandomMechanisms, TheSameSeedAndIndexGiveTheSameMechanism)
{
    for (int k = 0; k < 50; ++k) {
        EXPECT_EQ(randomMechanism(7, k).mechanism, randomMechanism(7, k).mechanism) << k;
        EXPECT_NE(randomMechanism(7, k).mechanism, randomMechanism(8, k).mechanism) << k;
    }
}

// Grashof's criterion (any kinematics text, e.g. Uicker, Pennock and
// Shigley, "Theory of Machines and Mechanisms", on four-bar linkages; cited
// from memory): with s and l the shortest and longest links and p, q the
// others, s + l < p + q lets the shortest turn fully; it is a crank-rocker
// with the shortest beside ground, a double crank with the shortest the
// ground, a double rocker with the shortest the coupler; s + l = p + q is a
// change point, s + l > p + q a triple rocker. Decided here from the lengths
// alone, and by the core's classifier.
TEST(RandomMechanisms, FourBarLengthsAreOfTheClassAskedFor)
{
    for (int k = 0; k < 200; ++k) {
        for (int c = 0; c < 5; ++c) {
            const auto cls = GrashofClass(c);
            const auto len = randomFourBarLengths(std::uint64_t(k), cls);
            auto sorted = len;
            std::sort(sorted.begin(), sorted.end());
            const double margin = (sorted[1] + sorted[2]) - (sorted[0] + sorted[3]);
            const auto shortest = FourBarLink(std::min_element(len.begin(), len.end()) - len.begin());
            switch (cls) {
            case GrashofClass::ChangePoint: EXPECT_NEAR(margin, 0.0, 1e-12) << k; break;
            case GrashofClass::TripleRocker: EXPECT_LT(margin, 0.0) << k; break;
            default: EXPECT_GT(margin, 0.0) << k;
            }
            if (cls == GrashofClass::CrankRocker)
                EXPECT_TRUE(shortest == FourBarLink::Input || shortest == FourBarLink::Output) << k;
            if (cls == GrashofClass::DoubleCrank) EXPECT_EQ(shortest, FourBarLink::Ground) << k;
            if (cls == GrashofClass::DoubleRocker) EXPECT_EQ(shortest, FourBarLink::Coupler) << k;
            EXPECT_EQ(classifyFourBar(len, 1e-9).kind, cls) << k << ": " << grashofClassName(cls);
        }
    }
}

// The quick subset already holds every family, every fault, every Grashof
// class and both kinds of six-bar, and a large machine.
TEST(RandomMechanisms, TheQuickSubsetCoversEveryKind)
{
    std::set<std::string> families, kinds;
    std::set<Fault> faults;
    std::size_t largest = 0;
    for (int k = 0; k < kQuickCount; ++k) {
        const RandomMechanism r = randomMechanism(kDefaultSeed, k);
        families.insert(r.family);
        kinds.insert(r.kind);
        faults.insert(r.fault);
        largest = std::max(largest, r.mechanism.bodies.size());
    }
    for (const char* f : {"four-bar", "slider-crank", "Watt six-bar", "Stephenson six-bar", "five-bar", "chain",
                          "long chain", "fan", "faulty"})
        EXPECT_TRUE(families.count(f)) << f;
    EXPECT_EQ(faults.size(), 5u);
    for (const char* words :
         {"crank-rocker", "double-crank", "double-rocker", "change point", "triple rocker", "rocker-crank", "Watt I ",
          "Watt II", "Stephenson I ", "Stephenson III", "piston-driven", "crank-driven", "cam rise", "constant speed"})
        EXPECT_TRUE(std::any_of(kinds.begin(), kinds.end(), [&](const std::string& k) {
            return k.find(words) != std::string::npos;
        })) << words;
    EXPECT_GT(largest, 100u);
}

// The check itself can fail: a healthy four-bar labelled as missing its
// driver is solved, which the check reports as a fault that went unnamed.
TEST(RandomMechanisms, TheCheckReportsAFaultThatIsNotRefused)
{
    RandomMechanism r{fourBar(FourBarSpec{}), "four-bar", "crank-rocker", Fault::DriverMissing, true, 0, 0};
    const Verdict v = checkMechanism(r);
    EXPECT_EQ(v.outcome, Outcome::Solved);
    ASSERT_EQ(v.rules.size(), 1u);
    EXPECT_NE(v.rules[0].find("not refused"), std::string::npos) << v.rules[0];
    r.fault = Fault::None;
    EXPECT_TRUE(checkMechanism(r).rules.empty());
}

// And a mechanism said to turn fully that stops: this four-bar is not
// Grashof (0.3 + 0.4 > 0.3 + 0.35), so its crank cannot turn.
TEST(RandomMechanisms, TheCheckReportsAStopOfAMechanismThatShouldTurnFully)
{
    FourBarSpec spec;
    spec.a = 0.3, spec.b = 0.35, spec.c = 0.3, spec.d = 0.4;
    const RandomMechanism r{fourBar(spec), "four-bar", "triple rocker", Fault::None, true, 0, 0};
    const Verdict v = checkMechanism(r);
    EXPECT_EQ(v.outcome, Outcome::CannotComplete);
    ASSERT_EQ(v.rules.size(), 1u);
    EXPECT_NE(v.rules[0].find("turns fully is stopped"), std::string::npos) << v.rules[0];
}

// And it reports a step at a toggle whose flag is lost: a parallelogram
// (crank = rocker, coupler = ground) drawn at 30° and stepped by 1° lands on
// its change points at 180° and 360°, where all four pins line up.
TEST(RandomMechanisms, TheCheckReportsAnIllConditionedStepThatIsNotFlagged)
{
    FourBarSpec spec;
    spec.a = spec.c = 0.1, spec.b = spec.d = 0.4, spec.theta2 = degToRad(30.0);
    spec.mass[1] = 1.0, spec.inertia[1] = 0.01;
    const RandomMechanism r{fourBar(spec), "four-bar", "parallelogram", Fault::None, false, 0, 0};
    const CompiledMechanism cm = compile(r.mechanism);
    CycleResult result = sweepCycle(cm, {.steps = 360});
    ASSERT_TRUE(std::any_of(result.steps.begin(), result.steps.end(), [](const auto& s) { return s.nearSingular; }));
    EXPECT_TRUE(checkResult(r, cm, result).rules.empty());
    for (auto& s : result.steps) s.nearSingular = false;
    result.warnings.clear();
    const Verdict v = checkResult(r, cm, result);
    EXPECT_TRUE(std::any_of(v.rules.begin(), v.rules.end(), [](const std::string& rule) {
        return rule.find("an ill-conditioned step is not flagged") != std::string::npos;
    })) << testing::PrintToString(v.rules);
}

struct Tally {
    std::map<std::string, std::map<std::string, int>> byFamily;  // family → outcome → count
    std::map<std::string, int> diagnoses;
    std::map<std::string, double> seconds;  // CPU time per family
    int maxBodies = 0, steps = 0, failed = 0, energyWarned = 0;
    double largestResidual = 0.0;
};

void print(const Tally& t, int count, std::uint64_t seed, double seconds)
{
    std::printf("%d random mechanisms, seed %llu: %.1f s of CPU (%d steps, up to %d bodies)\n", count,
                static_cast<unsigned long long>(seed), seconds, t.steps, t.maxBodies);
    const std::vector<std::string> outcomes = {"solved", "solved, toggle flagged", "cannot complete", "refused",
                                               "broken"};
    std::printf("%-20s", "family");
    for (const auto& o : outcomes) std::printf(" %23s", o.c_str());
    std::printf(" %9s\n", "CPU (s)");
    for (const auto& [family, counts] : t.byFamily) {
        std::printf("%-20s", family.c_str());
        for (const auto& o : outcomes) std::printf(" %23d", counts.count(o) ? counts.at(o) : 0);
        std::printf(" %9.1f\n", t.seconds.at(family));
    }
    std::printf("diagnoses:");
    for (const auto& [d, n] : t.diagnoses) std::printf(" %s %d;", d.c_str(), n);
    std::printf("\nenergy balance above 0.1 %% (said in the summary): %d; largest residual of the others: %.2g\n",
                t.energyWarned, t.largestResidual);
    std::printf("mechanisms breaking a rule: %d\n", t.failed);
}

TEST(RandomMechanisms, EachIsSolvedWithItsLawsOrDiagnosed)
{
    const std::uint64_t seed = environmentNumber("CLEVIS_RANDOM_SEED", kDefaultSeed);
    const int count = int(environmentNumber("CLEVIS_RANDOM_MECHANISMS", kQuickCount));
    const int first = int(environmentNumber("CLEVIS_RANDOM_FIRST", 0));
    Tally tally;
    // CPU time of this process, not wall time: the figures hold on a busy machine.
    const auto cpu = [] { return double(std::clock()) / CLOCKS_PER_SEC; };
    const double start = cpu();
    for (int k = first; k < first + count; ++k) {
        const double begin = cpu();
        const RandomMechanism r = randomMechanism(seed, k);
        const Verdict v = checkMechanism(r);
        const double took = cpu() - begin;
        tally.byFamily[r.family][outcomeName(v.outcome)]++;
        tally.seconds[r.family] += took;
        if (!v.diagnosis.empty()) tally.diagnoses[v.diagnosis]++;
        tally.steps += v.steps;
        tally.maxBodies = std::max(tally.maxBodies, int(r.mechanism.bodies.size()));
        if (v.energyWarned) ++tally.energyWarned;
        else tally.largestResidual = std::max(tally.largestResidual, v.relativeResidual);
        if (v.rules.empty() && v.outcome != Outcome::Broken) continue;
        ++tally.failed;
        std::string rules;
        for (const auto& rule : v.rules) rules += "\n  " + rule;
        ADD_FAILURE() << "seed " << seed << ", mechanism " << k << " (" << r.kind << ", " << r.mechanism.bodies.size()
                      << " bodies), " << outcomeName(v.outcome) << ":" << rules << "\n  saved as " << keep(r);
    }
    print(tally, count, seed, cpu() - start);
}

}  // namespace
