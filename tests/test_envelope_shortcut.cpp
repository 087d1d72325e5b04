// The envelope pass skips a piece's fibre-stress search when a bound shows
// it cannot beat the envelope so far (BarLoads::peaks with a FibreFloor).
// The envelopes must stay exactly those of the plain search: every step's
// peaks found in full and kept when larger, the first of equal values
// staying (bar_envelope.h), compared here bit for bit on every sample and
// on generated chains and a fan.
#include "core/file/mechanism_file.h"
#include "core/results/bar_envelope.h"
#include "core/results/internal_loads.h"
#include "tests/chain_generator.h"
#include "tests/solved_mechanism.h"

#include <gtest/gtest.h>

#include <bit>
#include <cmath>
#include <cstdint>
#include <filesystem>

using namespace clevis;

namespace {

// The plain path: the full peaks at every step, folded as the envelope
// folds them (strictly larger replaces, so the first of equals stays).
std::vector<BarEnvelope> plainEnvelopes(const test::Solved& s)
{
    std::vector<BarEnvelope> out;
    std::vector<std::vector<BodyLoad>> loads;
    for (const BarModel& bar : s.bars.bars) {
        BarEnvelope env;
        env.body = bar.body;
        BarLoads along(bar);
        for (std::size_t i = 0; i < s.r.steps.size(); ++i) {
            const Pose q(s.r.steps[i].q);
            bodyLoads(s.m, s.r.steps[i], q, loads);
            along.set(s.m, s.r.steps[i], q, loads[std::size_t(bar.body)]);
            const BarPeaks p = along.peaks();
            const auto fold = [&](EnvelopePeak& e, const PeakAlong& a, auto larger) {
                if (larger(a.value, e.value)) e = {a.value, a.s, int(i)};
            };
            const auto above = [](double v, double best) { return v > best; };
            const auto below = [](double v, double best) { return v < best; };
            const auto bigger = [](double v, double best) { return std::abs(v) > std::abs(best); };
            fold(env.tension, p.tension, above);
            fold(env.compression, p.compression, below);
            fold(env.shear, p.shear, bigger);
            fold(env.moment, p.moment, bigger);
            fold(env.fibreTension, p.fibreTension, above);
            fold(env.fibreCompression, p.fibreCompression, below);
        }
        out.push_back(env);
    }
    return out;
}

void expectSame(const EnvelopePeak& got, const EnvelopePeak& plain, const std::string& where)
{
    // Bit for bit: == would let −0 pass for +0.
    EXPECT_EQ(std::bit_cast<std::uint64_t>(got.value), std::bit_cast<std::uint64_t>(plain.value))
        << where << ": " << got.value << " against " << plain.value;
    EXPECT_EQ(std::bit_cast<std::uint64_t>(got.s), std::bit_cast<std::uint64_t>(plain.s)) << where;
    EXPECT_EQ(got.step, plain.step) << where;
}

// Returns how many bars carry fibre stresses, so a caller can tell the
// comparison covered some.
int expectEnvelopesArePlain(const test::Solved& s, const std::string& name)
{
    const auto got = barEnvelopes(s.m, s.r, s.bars.bars);
    const auto plain = plainEnvelopes(s);
    EXPECT_EQ(got.size(), plain.size()) << name;
    int sections = 0;
    for (std::size_t b = 0; b < std::min(got.size(), plain.size()); ++b) {
        const std::string where = name + ", " + s.bars.bars[b].bodyName;
        EXPECT_EQ(got[b].body, plain[b].body) << where;
        expectSame(got[b].tension, plain[b].tension, where + ", tension");
        expectSame(got[b].compression, plain[b].compression, where + ", compression");
        expectSame(got[b].shear, plain[b].shear, where + ", shear");
        expectSame(got[b].moment, plain[b].moment, where + ", moment");
        expectSame(got[b].fibreTension, plain[b].fibreTension, where + ", fibre tension");
        expectSame(got[b].fibreCompression, plain[b].fibreCompression, where + ", fibre compression");
        if (s.bars.bars[b].area > 0.0) ++sections;
    }
    return sections;
}

}  // namespace

TEST(EnvelopeShortcut, EnvelopesAreThePlainSearchsOnEverySample)
{
    int sections = 0;
    for (const auto& entry : std::filesystem::directory_iterator(CLEVIS_SAMPLES_DIR)) {
        if (entry.path().extension() != ".json") continue;
        const test::Solved s = test::solve(loadMechanismFile(entry.path().string()).mechanism);
        if (s.r.steps.empty()) continue;
        sections += expectEnvelopesArePlain(s, entry.path().filename().string());
    }
    EXPECT_GT(sections, 0);
}

TEST(EnvelopeShortcut, EnvelopesAreThePlainSearchsOnChainsAndAFan)
{
    for (const auto& [name, doc] : {std::pair{std::string("chain of 9"), test::fourBarChain(9)},
                                    std::pair{std::string("chain of 200"), test::fourBarChain(200)},
                                    std::pair{std::string("fan of 14"), test::fourBarFan(14)}}) {
        const test::Solved s = test::solve(doc);
        ASSERT_TRUE(s.r.complete) << name;
        EXPECT_GT(expectEnvelopesArePlain(s, name), 0) << name;
    }
}

// The bound is not idle: a floor beyond twice a step's fibre peaks (|σ| ≤
// |N|/A + |M|/Z ≤ 2·max|σ| on every piece) leaves the fibre search out,
// while a floor just short of them finds the same peaks; N, V and M are
// searched in full either way.
TEST(EnvelopeShortcut, LeavesOutOnlyFibresThatCannotBeatTheFloor)
{
    const test::Solved s = test::solve(test::fourBarChain(9));
    std::vector<std::vector<BodyLoad>> loads;
    int skipped = 0;
    for (const BarModel& bar : s.bars.bars) {
        if (bar.area == 0.0) continue;  // no section, no fibre stresses
        BarLoads along(bar);
        for (std::size_t i = 0; i < s.r.steps.size(); i += 7) {
            const Pose q(s.r.steps[i].q);
            bodyLoads(s.m, s.r.steps[i], q, loads);
            along.set(s.m, s.r.steps[i], q, loads[std::size_t(bar.body)]);
            const BarPeaks plain = along.peaks();
            const double most = std::max(plain.fibreTension.value, -plain.fibreCompression.value);
            ASSERT_GT(most, 0.0) << bar.bodyName;
            const BarPeaks high = along.peaks({3.0 * most, -3.0 * most});
            EXPECT_EQ(high.fibreTension.value, 0.0) << bar.bodyName << ", step " << i;
            EXPECT_EQ(high.fibreCompression.value, 0.0) << bar.bodyName << ", step " << i;
            const BarPeaks low = along.peaks(
                {std::nextafter(plain.fibreTension.value, 0.0), std::nextafter(plain.fibreCompression.value, 0.0)});
            EXPECT_EQ(low.fibreTension.value, plain.fibreTension.value);
            EXPECT_EQ(low.fibreTension.s, plain.fibreTension.s);
            EXPECT_EQ(low.fibreCompression.value, plain.fibreCompression.value);
            EXPECT_EQ(low.fibreCompression.s, plain.fibreCompression.s);
            for (const BarPeaks* p : {&high, &low}) {
                EXPECT_EQ(p->tension.value, plain.tension.value);
                EXPECT_EQ(p->compression.value, plain.compression.value);
                EXPECT_EQ(p->shear.value, plain.shear.value);
                EXPECT_EQ(p->moment.value, plain.moment.value);
            }
            ++skipped;
        }
    }
    EXPECT_GT(skipped, 0);
}
