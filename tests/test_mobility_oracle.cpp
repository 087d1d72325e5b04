// The degrees-of-freedom check (core/solver/mobility_check.h) against the
// dense diagnosis it replaced (tests/dense_mobility.h), on the samples,
// generated chains and fans, small textbook linkages, and broken variants of
// each: a joint repeated, a pin to ground added, a driver removed or added,
// a loose body, a body swinging on one pin. Both must give the same degrees
// of freedom, redundant equations and groups of joints, free bodies,
// conflicting drivers and dead-centre verdict, and so the same message.
#include "core/file/mechanism_file.h"
#include "core/model/model_error.h"
#include "core/solver/mobility_check.h"
#include "core/solver/step_solver.h"
#include "tests/chain_generator.h"
#include "tests/dense_mobility.h"
#include "tests/mechanism_builders.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cstdio>
#include <functional>
#include <set>

using namespace clevis;

namespace {

struct Named {
    std::string what;
    Mechanism mechanism;
};

std::vector<Named> baseMechanisms()
{
    std::vector<Named> all;
    for (const char* file :
         {"dwell_six_bar.json", "flap_folder.json", "punch_press.json", "tipping_bed.json", "tote_arm.json"})
        all.push_back({file, loadMechanismFile(std::string(CLEVIS_SAMPLES_DIR "/") + file).mechanism});
    for (const int bodies : {2, 3, 4, 5, 9, 10, 21, 40, 101})
        all.push_back({"chain of " + std::to_string(bodies), test::fourBarChain(bodies)});
    for (const int loops : {1, 2, 3, 6, 14})
        all.push_back({"fan of " + std::to_string(loops), test::fourBarFan(loops)});
    all.push_back({"four-bar", test::fourBar(test::FourBarSpec{})});
    test::SliderCrankSpec sliderCrank;
    all.push_back({"slider-crank", test::sliderCrank(sliderCrank)});
    // Driven by its piston from dead centre: a singular pose (test_diagnostics.cpp).
    sliderCrank.theta0 = 0.0;
    Mechanism pistonDriven = test::sliderCrank(sliderCrank);
    pistonDriven.drivers = {test::linearAtSlider("ram", "S", Rise{CamLaw::Cycloidal, 0.0, -0.1, 0.0, 1.0})};
    all.push_back({"piston-driven slider-crank at dead centre", pistonDriven});
    // A parallelogram with a third parallel crank: a redundant constraint
    // that only the geometry makes (test_diagnostics.cpp).
    const Vec2 crank = 0.1 * Vec2(std::cos(1.0), std::sin(1.0)), o2(0, 0), o6(0.15, 0), o4(0.3, 0);
    Mechanism parallelogram;
    parallelogram.name = "parallelogram";
    parallelogram.bodies = {
        test::pointBody("crank", 0, o2 + 0.5 * crank, 0), test::pointBody("middle crank", 0, o6 + 0.5 * crank, 0),
        test::pointBody("rocker", 0, o4 + 0.5 * crank, 0), test::pointBody("coupler", 0, o6 + crank, 0)};
    parallelogram.joints = {
        test::pin("O2", kGroundName, "crank", o2),        test::pin("A", "crank", "coupler", o2 + crank),
        test::pin("O6", kGroundName, "middle crank", o6), test::pin("C", "middle crank", "coupler", o6 + crank),
        test::pin("O4", kGroundName, "rocker", o4),       test::pin("B", "rocker", "coupler", o4 + crank)};
    parallelogram.drivers = {test::rotary("motor", "O2", ConstantSpeed{1.0, 0.0})};
    all.push_back({"parallelogram", parallelogram});
    return all;
}

// A joint between two moving bodies, or failing that any joint.
const Joint& middleJoint(const Mechanism& m)
{
    for (std::size_t k = m.joints.size() / 2; k < m.joints.size(); ++k)
        if (m.joints[k].bodies[0] != kGroundName && m.joints[k].bodies[1] != kGroundName) return m.joints[k];
    return m.joints[m.joints.size() / 2];
}

std::vector<Named> withBrokenVariants(const Named& base)
{
    const Mechanism& m = base.mechanism;
    std::vector<Named> all{base};
    const auto add = [&](const std::string& what, const std::function<void(Mechanism&)>& change) {
        Mechanism v = m;
        change(v);
        all.push_back({base.what + ", " + what, std::move(v)});
    };
    // The same pair of bodies held again where they are pinned, by a pin in
    // a slot (the file rules refuse a second pin there as the same hinge).
    add("a joint repeated", [](Mechanism& v) {
        const Joint& j = middleJoint(v);
        v.joints.push_back(test::pinInSlot(j.name + " again", j.bodies[0], j.bodies[1], j.at, 30.0));
    });
    add("a pin to ground added", [](Mechanism& v) {
        const Joint& j = middleJoint(v);
        v.joints.push_back(test::pin("anchor", kGroundName, j.bodies[1] == kGroundName ? j.bodies[0] : j.bodies[1],
                                     j.at + Vec2(0.013, 0.007)));
    });
    if (!m.drivers.empty())
        add("a driver removed", [](Mechanism& v) {
            v.drivers.pop_back();
            v.cycle.duration = 1.0;  // which the driver may have set
        });
    add("a second driver", [](Mechanism& v) {
        for (auto j = v.joints.rbegin(); j != v.joints.rend(); ++j) {
            const bool driven =
                std::any_of(v.drivers.begin(), v.drivers.end(), [&](const Driver& d) { return d.joint == j->name; });
            if (j->type == JointType::Pin && !driven) {
                v.drivers.push_back(test::rotary("extra motor", j->name, ConstantSpeed{1.0, 0.0}));
                return;
            }
        }
    });
    add("a loose body",
        [](Mechanism& v) { v.bodies.push_back(test::pointBody("loose", 1.0, Vec2(0.123, 0.456), 0.01)); });
    add("a pendulum", [](Mechanism& v) {
        v.bodies.push_back(test::pointBody("pendulum", 1.0, Vec2(-0.2, -0.3), 0.01));
        v.joints.push_back(test::pin("hanger", kGroundName, "pendulum", Vec2(-0.2, -0.1)));
    });
    return all;
}

std::vector<std::vector<std::string>> sorted(std::vector<std::vector<std::string>> groups)
{
    std::sort(groups.begin(), groups.end());
    return groups;
}

std::set<std::string> named(const std::vector<std::vector<std::string>>& groups)
{
    std::set<std::string> names;
    for (const auto& g : groups) names.insert(g.begin(), g.end());
    return names;
}

bool shareJoints(const std::vector<std::vector<std::string>>& groups)
{
    std::size_t total = 0;
    for (const auto& g : groups) total += g.size();
    return named(groups).size() < total;
}

TEST(MobilityOracle, SameDiagnosisAsTheDenseCheck)
{
    int compared = 0, broken = 0;
    for (const Named& base : baseMechanisms())
        for (const Named& v : withBrokenVariants(base)) {
            SCOPED_TRACE(v.what);
            CompiledMechanism m;
            try {
                m = compile(v.mechanism);
            } catch (const ModelError&) {
                continue;  // a variant the file rules refuse before any check
            }
            const Eigen::VectorXd q = StepSolver(m).drawnPose();
            MobilityReport sparse = checkMobility(m, q);
            MobilityReport dense = test::denseMobility(m, q);
            EXPECT_EQ(sparse.mobility, dense.mobility);
            EXPECT_EQ(sparse.drivers, dense.drivers);
            EXPECT_EQ(sparse.redundantEquations, dense.redundantEquations);
            EXPECT_EQ(sparse.freeBodies, dense.freeBodies);
            EXPECT_EQ(sparse.conflictingDrivers, dense.conflictingDrivers);
            EXPECT_EQ(sparse.singularPose, dense.singularPose);
            // The dense check listed its groups in pivot order.
            sparse.redundantGroups = sorted(sparse.redundantGroups);
            dense.redundantGroups = sorted(dense.redundantGroups);
            if (sparse.redundantGroups != dense.redundantGroups) {
                // Where two groups share joints, which rows count as the
                // repeats is a choice of basis: the same joints must be
                // named in as many groups.
                EXPECT_TRUE(shareJoints(dense.redundantGroups))
                    << ::testing::PrintToString(sparse.redundantGroups) << " against "
                    << ::testing::PrintToString(dense.redundantGroups);
                EXPECT_EQ(sparse.redundantGroups.size(), dense.redundantGroups.size());
                EXPECT_EQ(named(sparse.redundantGroups), named(dense.redundantGroups));
                std::printf("[ basis    ] %s: %s against %s\n", v.what.c_str(),
                            ::testing::PrintToString(sparse.redundantGroups).c_str(),
                            ::testing::PrintToString(dense.redundantGroups).c_str());
                sparse.redundantGroups = dense.redundantGroups;
            }
            dense.gruebler = sparse.gruebler;
            EXPECT_EQ(sparse.describe(), dense.describe());
            ++compared;
            broken += !dense.ok();
        }
    EXPECT_GT(compared, 150);
    EXPECT_GT(broken, 100);
}

}  // namespace
