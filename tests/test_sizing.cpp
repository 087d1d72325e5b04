// Sizing figures of bars: the exact envelopes of the internal loads (peaks
// between stations found, not sampled), against beam tables and dense
// sampling; fibre stresses, utilisation and Euler loads against hand
// calculations; one stress peak of a sample against symbolic integration.
#include "core/file/mechanism_file.h"
#include "core/results/bar_envelope.h"
#include "core/results/bar_sizing.h"
#include "core/results/sizing_json.h"
#include "core/results/sizing_text.h"
#include "core/solver/cycle_sweep.h"
#include "tests/mechanism_builders.h"
#include "tests/solved_mechanism.h"
#include "tests/sympy_bar_loads.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <filesystem>

using namespace clevis;

namespace {

constexpr double kL = 0.4, kWidth = 0.03, kThickness = 0.01, kDensity = 7850.0;

using test::barIndex;
using test::solve;
using test::Solved;

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

// The held span (simply supported, its own weight w per length) pulled along
// its line by P at its far pin, worked by hand (beam tables and σ = N/A ±
// M/Z): N = P everywhere, M peaks at mid-span, wL²/8, so the fibre stresses
// peak there at P/A ± wL²/(8Z), with A = w·t = 3e-4 m², Z = t·w²/6 = 1.5e-6 m³:
//   w = 7850 · 0.03 · 0.01 · 9.80665 = 23.0947 N/m,  wL²/8 = 0.461894 N·m,
//   P/A = 50 / 3e-4 = 0.166667 MPa,  M/Z = 0.307929 MPa,
//   σ_tension = 0.474596 MPa, σ_compression = −0.141263 MPa;
// allowable 1 MPa: utilisation 0.474596.
TEST(BarSizing, FibreStressesAndUtilisationMatchAHandCalculation)
{
    BarSection section{kWidth, kThickness, kDensity, std::nullopt};
    section.allowableStress = 1e6;
    Mechanism doc = test::heldSpan(0.15, kL, section);
    doc.loads.push_back(ForceLoad{"pull", {"coupler", Vec2(kL, 0.15)}, Vec2(50.0, 0), false, std::nullopt});
    const Solved s = solve(doc);
    ASSERT_TRUE(s.r.complete);
    const SizingResult sized = sizeBars(s.doc, s.m, s.r);
    const BarSizing& bar = sized.bars[barIndex(s, "coupler")];
    ASSERT_TRUE(bar.section);
    const SectionSizing& sec = *bar.section;
    EXPECT_NEAR(bar.envelope.fibreTension.value, 0.474596e6, 1.0);
    EXPECT_NEAR(bar.envelope.fibreTension.s, kL / 2, 1e-9);
    EXPECT_NEAR(bar.envelope.fibreCompression.value, -0.141263e6, 1.0);
    EXPECT_NEAR(bar.envelope.fibreCompression.s, kL / 2, 1e-9);
    ASSERT_TRUE(sec.utilisation);
    EXPECT_NEAR(*sec.utilisation, 0.474596, 1e-6);
    EXPECT_EQ(*sec.utilisation, std::abs(sec.governing.value) / *sec.allowable);  // peak / allowable
    // Mean shear: the supports carry wL/2 each (the pull adds none): 4.61894 N / 3e-4 m².
    EXPECT_NEAR(std::abs(sec.shearStress.value), 23.0947 * kL / 2 / 3e-4, 0.1);
}

// Euler's load for pinned ends, P = π²EI/L², worked by hand for a 30 × 10 mm
// steel bar 0.4 m long (E = 210 GPa):
//   in plane I = 0.01 · 0.03³/12 = 2.25e-8 m⁴,   P = 9.8696 · 210e9 · 2.25e-8 / 0.16 = 291 462 N,
//   out of plane I = 0.03 · 0.01³/12 = 2.5e-9 m⁴, P = 32 384.6 N;
// slenderness L/r, r = 0.01/√12: 138.56; Johnson–Euler limit π√(2E/σ_y) =
// π√(2 · 210e9 / 235e6) = 132.81 for S235, so Euler's range holds. Safety
// factor 2 on yield: allowable 117.5 MPa.
TEST(BarSizing, EulerLoadsAndSafetyFactorMatchAHandCalculation)
{
    BarSection section{kWidth, kThickness, kDensity, std::nullopt};
    section.material = "steel";
    section.safetyFactor = 2.0;
    Mechanism doc = test::heldSpan(0.15, kL, section);
    doc.loads.push_back(ForceLoad{"push", {"coupler", Vec2(kL, 0.15)}, Vec2(-1000.0, 0), false, std::nullopt});
    const Solved s = solve(doc);
    const SizingResult sized = sizeBars(s.doc, s.m, s.r);
    const SectionSizing& sec = *sized.bars[barIndex(s, "coupler")].section;
    ASSERT_TRUE(sec.eulerInPlane && sec.eulerOutOfPlane && sec.bucklingRatio && sec.eulerLimit);
    EXPECT_NEAR(*sec.eulerInPlane, 291462.0, 1.0);
    EXPECT_NEAR(*sec.eulerOutOfPlane, 32384.6, 0.1);
    EXPECT_NEAR(sec.slenderness, 138.564, 1e-3);
    EXPECT_NEAR(*sec.eulerLimit, 132.813, 1e-3);
    EXPECT_NEAR(*sec.bucklingRatio, 1000.0 / 32384.6, 1e-6);
    EXPECT_NEAR(*sec.allowable, 117.5e6, 1e-6);
    EXPECT_TRUE(sized.bars[barIndex(s, "coupler")].notes.empty()) << "slender enough for Euler";
}

// A stocky bar (L/r below the Johnson–Euler limit) in compression is warned
// about; a bar without a material gets no Euler load and says why.
TEST(BarSizing, StockyBarsAreWarnedAndMissingFiguresExplained)
{
    BarSection stocky{0.03, 0.03, kDensity, std::nullopt};
    stocky.material = "steel";
    Mechanism doc = test::heldSpan(0.15, kL, stocky);
    doc.loads.push_back(ForceLoad{"push", {"coupler", Vec2(kL, 0.15)}, Vec2(-1000.0, 0), false, std::nullopt});
    const Solved s = solve(doc);
    const auto notes = sizeBars(s.doc, s.m, s.r).bars[barIndex(s, "coupler")].notes;
    const auto has = [&](const std::vector<std::string>& list, const char* text) {
        return std::any_of(list.begin(), list.end(), [&](const std::string& n) { return n.find(text) != n.npos; });
    };
    EXPECT_TRUE(has(notes, "over-estimates")) << ::testing::PrintToString(notes);
    EXPECT_TRUE(has(notes, "no utilisation"));

    Mechanism unnamed = test::heldSpan(0.15, kL, BarSection{kWidth, kThickness, kDensity, std::nullopt});
    const Solved u = solve(unnamed);
    const auto sized = sizeBars(u.doc, u.m, u.r).bars[barIndex(u, "coupler")];
    EXPECT_FALSE(sized.section->eulerInPlane);
    EXPECT_TRUE(has(sized.notes, "no Euler load"));
}

// One stress peak of a sample, checked by symbolic integration: the punch
// press's connecting rod at the step of its largest fibre compression. The
// script's N and M at the peak's station give the same σ = N/A − |M|/Z, and
// at stations just either side it is no more compressive.
TEST(BarSizing, SamplePeakStressAgreesWithSympy)
{
    const Solved s = solve(loadMechanismFile(std::string(CLEVIS_SAMPLES_DIR) + "/punch_press.json").mechanism);
    const SizingResult sized = sizeBars(s.doc, s.m, s.r);
    const std::size_t b = barIndex(s, "connecting_rod");
    const BarSizing& rod = sized.bars[b];
    ASSERT_TRUE(rod.section);
    const EnvelopePeak& peak = rod.envelope.fibreCompression;
    ASSERT_GE(peak.step, 0);
    const double h = 1e-4 * rod.length;
    const StepResult& step = s.r.steps[std::size_t(peak.step)];
    const auto items = freeBodyItems(s.m, step);
    const nlohmann::json rows =
        test::sympyBarLoads(s.m, s.bars.bars[b], step, items[std::size_t(rod.body)], {peak.s - h, peak.s, peak.s + h});
    ASSERT_EQ(rows.size(), 3u);
    const double area = rod.section->area,
                 modulus = rod.section->width * rod.section->width * rod.section->thickness / 6.0;
    const auto sigma = [&](const nlohmann::json& row) {
        return row[1].get<double>() / area - std::abs(row[3].get<double>()) / modulus;
    };
    EXPECT_NEAR(sigma(rows[1]), peak.value, 1e-9 * std::abs(peak.value));
    EXPECT_GE(sigma(rows[0]), peak.value - 1e-9 * std::abs(peak.value));
    EXPECT_GE(sigma(rows[2]), peak.value - 1e-9 * std::abs(peak.value));
}

// A figure whose peak falls on a position flagged near singular carries the
// flag, in the text and in the JSON.
TEST(BarSizing, FiguresFromNearSingularPositionsAreMarked)
{
    Solved s = solve(loadMechanismFile(std::string(CLEVIS_SAMPLES_DIR) + "/punch_press.json").mechanism);
    const auto clean = sizeBars(s.doc, s.m, s.r);
    const std::size_t b = barIndex(s, "connecting_rod");
    const int flagged = clean.bars[b].envelope.fibreCompression.step;
    EXPECT_EQ(sizingText(s.m, s.r, clean).find("near a singular position"), std::string::npos);
    s.r.steps[std::size_t(flagged)].nearSingular = true;
    const auto sized = sizeBars(s.doc, s.m, s.r);
    EXPECT_TRUE(nearSingular(s.r, sized.bars[b].envelope.fibreCompression));
    EXPECT_NE(sizingText(s.m, s.r, sized).find("near a singular position: not trustworthy"), std::string::npos);
    const nlohmann::json j = sizingToJson(s.m, s.r, sized);
    EXPECT_TRUE(j["bars"][b]["section"]["fibre_compression"]["near_singular"].get<bool>());
    EXPECT_TRUE(j["bars"][b]["compression"]["near_singular"].get<bool>() ==
                (sized.bars[b].envelope.compression.step == flagged));
}

}  // namespace
