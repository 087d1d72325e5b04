// Sizing figures of bars: the exact envelopes of the internal loads (peaks
// between stations found, not sampled), against beam tables and dense
// sampling.
#include "core/file/mechanism_file.h"
#include "core/results/bar_envelope.h"
#include "core/solver/cycle_sweep.h"
#include "tests/mechanism_builders.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <filesystem>

using namespace clevis;

namespace {

constexpr double kL = 0.4, kWidth = 0.03, kThickness = 0.01, kDensity = 7850.0;

struct Solved {
    Mechanism doc;
    CompiledMechanism m;
    CycleResult r;
    BarList bars;
};

Solved solve(const Mechanism& doc)
{
    Solved s{doc, compile(doc), {}, {}};
    s.r = sweepCycle(s.m);
    s.bars = findBars(s.doc, s.m);
    return s;
}

std::size_t barIndex(const Solved& s, const std::string& name)
{
    for (std::size_t b = 0; b < s.bars.bars.size(); ++b)
        if (s.bars.bars[b].bodyName == name) return b;
    throw std::runtime_error("no bar " + name);
}

// Beam tables, simply supported span with a uniform load w and a point load
// P at x = a (superposition): R_A = wL/2 + P(L − a)/L; before the load
// V = R_A − w·x, zero at x* = R_A/w, where M peaks at R_A²/(2w) (if x* < a).
// With P = 0.1·wL at a = 0.7L, x* = 0.53L: between the 21 stations (every
// 0.05L) that sampling would look at.
TEST(ExactEnvelope, MomentPeakBetweenStationsMatchesBeamTable)
{
    Mechanism doc = test::heldSpan(0.15, kL, BarSection{kWidth, kThickness, kDensity, std::nullopt});
    const double w = kDensity * kWidth * kThickness * 9.80665, p = 0.1 * w * kL, a = 0.7 * kL;
    doc.loads.push_back(ForceLoad{"press", {"coupler", Vec2(a, 0.15)}, Vec2(0, -p), false, std::nullopt});
    const Solved s = solve(doc);
    ASSERT_TRUE(s.r.complete);
    const double ra = w * kL / 2 + p * (kL - a) / kL, xPeak = ra / w;
    ASSERT_LT(xPeak, a);
    const BarEnvelope env = barEnvelopes(s.m, s.r, s.bars.bars)[barIndex(s, "coupler")];
    EXPECT_NEAR(env.moment.value, ra * ra / (2 * w), 1e-9 * ra * kL);
    EXPECT_NEAR(env.moment.s, xPeak, 1e-9 * kL);
    const double rb = w * kL / 2 + p * a / kL;  // > R_A: |V| peaks at the right support
    EXPECT_NEAR(env.shear.value, -rb, 1e-9 * rb);
    EXPECT_EQ(env.shear.s, kL);
}

// Every sample, every bar and step: no station of a dense sampling (both
// sides of each) exceeds the envelope, and the sampling comes within one
// station's change of it (the peak lies within h of a station, on the side
// of any jump it sits at).
TEST(ExactEnvelope, DenseSamplingNeverExceedsAndApproachesThePeaks)
{
    int bars = 0;
    for (const auto& entry : std::filesystem::directory_iterator(CLEVIS_SAMPLES_DIR)) {
        if (entry.path().extension() != ".json") continue;
        const Solved s = solve(loadMechanismFile(entry.path().string()).mechanism);
        if (s.r.steps.empty()) continue;
        const auto envelopes = barEnvelopes(s.m, s.r, s.bars.bars);
        std::vector<std::vector<BodyLoad>> loads;
        for (std::size_t b = 0; b < s.bars.bars.size(); ++b) {
            const BarModel& bar = s.bars.bars[b];
            double tension = 0, compression = 0, shear = 0, moment = 0;
            double change[3] = {0, 0, 0};  // largest change of N, V, M from one station to the next
            for (const StepResult& step : s.r.steps) {
                const Pose q(step.q);
                bodyLoads(s.m, step, q, loads);
                BarLoads along;
                along.set(s.m, bar, step, q, loads[std::size_t(bar.body)]);
                constexpr int kStations = 801;
                BarStation last;
                for (int k = 0; k < kStations; ++k)
                    for (const bool before : {true, false}) {
                        const double x = bar.length * k / (kStations - 1);
                        if ((before && k == 0) || (!before && k == kStations - 1)) continue;
                        const BarStation st = along.at(x, before);
                        tension = std::max(tension, st.axial);
                        compression = std::min(compression, st.axial);
                        shear = std::max(shear, std::abs(st.shear));
                        moment = std::max(moment, std::abs(st.moment));
                        if (k > 0 && before) {
                            change[0] = std::max(change[0], std::abs(st.axial - last.axial));
                            change[1] = std::max(change[1], std::abs(st.shear - last.shear));
                            change[2] = std::max(change[2], std::abs(st.moment - last.moment));
                        }
                        last = st;
                    }
            }
            const BarEnvelope& env = envelopes[b];
            const double force = std::max({tension, -compression, shear}), slack = 1e-12 * force;
            const std::string where = entry.path().filename().string() + ", " + bar.bodyName;
            EXPECT_GE(env.tension.value, tension - slack) << where;
            EXPECT_LE(env.compression.value, compression + slack) << where;
            EXPECT_GE(std::abs(env.shear.value), shear - slack) << where;
            EXPECT_GE(std::abs(env.moment.value), moment - 1e-12 * moment) << where;
            EXPECT_LE(env.tension.value - tension, change[0] + slack) << where;
            EXPECT_LE(compression - env.compression.value, change[0] + slack) << where;
            EXPECT_LE(std::abs(env.shear.value) - shear, change[1] + slack) << where;
            EXPECT_LE(std::abs(env.moment.value) - moment, change[2] + 1e-12 * moment) << where;
            ++bars;
        }
    }
    EXPECT_GT(bars, 5);
}

}  // namespace
