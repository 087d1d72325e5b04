// The ranking of parts by utilisation that the peak table and the report's
// sizing chapter show: each part's figure is the largest of its own
// utilisations as bar_sizing and pin_sizing give them (recomputed here from
// those fields, not through the ranking), the most loaded part first.
#include "core/file/mechanism_file.h"
#include "core/results/utilisation_ranking.h"
#include "tests/solved_mechanism.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <map>

using namespace clevis;

namespace {

TEST(UtilisationRanking, EachPartsLargestFigureTheLargestFirst)
{
    Mechanism doc = loadMechanismFile(std::string(CLEVIS_SAMPLES_DIR) + "/punch_press.json").mechanism;
    for (auto& b : doc.bodies)
        if (b.section) b.section->safetyFactor = 1.5;  // the rod gets a stress figure too
    const test::Solved x = test::solve(doc);
    const SizingResult sizing = sizeParts(x.doc, x.m, x.r);

    std::map<std::string, double> expected;  // "link NAME" / "pin NAME" -> largest figure
    for (const BarSizing& b : sizing.bars) {
        if (!b.section) continue;
        double u = b.section->utilisation.value_or(0.0);
        if (b.section->bucklingRatio) u = std::max(u, *b.section->bucklingRatio);
        if (b.section->utilisation || b.section->bucklingRatio.value_or(0.0) > 0.0) expected["link " + b.name] = u;
    }
    for (const PinSizing& p : sizing.pins) {
        const std::optional<double> figures[] = {p.shearUtilisation, p.pressureUtilisation, p.pvUtilisation};
        double u = -1.0;
        for (const auto& f : figures)
            if (f) u = std::max(u, *f);
        if (u >= 0.0) expected["pin " + p.name] = u;
    }
    ASSERT_GE(expected.size(), 4u);  // the rod and the three sized pins of the sample

    const std::vector<PartUtilisation> ranked = rankByUtilisation(x.r, sizing);
    ASSERT_EQ(ranked.size(), expected.size());
    for (std::size_t i = 0; i < ranked.size(); ++i) {
        const PartUtilisation& p = ranked[i];
        const std::string key = (p.kind == PartUtilisation::Kind::Bar ? "link " : "pin ") + p.name;
        ASSERT_TRUE(expected.count(key)) << key;
        EXPECT_DOUBLE_EQ(p.value, expected[key]) << key;
        if (i > 0) EXPECT_GE(ranked[i - 1].value, p.value);
        EXPECT_GE(p.step, 0) << key;
        EXPECT_FALSE(p.governs.empty()) << key;
    }
}

// A pin without allowables, or without pin data, has no figure and is not ranked.
TEST(UtilisationRanking, APartWithoutAllowablesIsNotRanked)
{
    Mechanism doc = loadMechanismFile(std::string(CLEVIS_SAMPLES_DIR) + "/punch_press.json").mechanism;
    for (auto& j : doc.joints)
        if (j.pin) j.pin->allowableShear.reset(), j.pin->allowablePressure.reset(), j.pin->allowablePv.reset();
    const test::Solved x = test::solve(doc);
    for (const PartUtilisation& p : rankByUtilisation(x.r, sizeParts(x.doc, x.m, x.r)))
        EXPECT_EQ(p.kind, PartUtilisation::Kind::Bar) << p.name;
}

}  // namespace
