// The stated size limits: refused beyond them with a message naming the
// limit and the figure asked for, at the point where the request is made
// (compile for the file's own settings, sweepCycle for a step count passed in).
#include "core/model/model_error.h"
#include "core/model/model_limits.h"
#include "core/solver/analysis_error.h"
#include "core/solver/compiled_mechanism.h"
#include "core/solver/cycle_sweep.h"
#include "tests/chain_generator.h"

#include <gtest/gtest.h>

#include <string>

namespace clevis {
namespace {

bool contains(const std::string& text, const std::string& part) { return text.find(part) != std::string::npos; }

ModelSize largestAllowed()
{
    ModelSize s;
    s.bodies = kMaxBodies;
    s.joints = kMaxJoints / 2;
    s.drivers = kMaxJoints - s.joints;
    s.loads = kMaxLoads;
    s.steps = kMaxBodySteps / (long long)kMaxBodies - 1;
    return s;
}

TEST(ModelLimitsTest, EverythingAtItsLimitIsAllowed)
{
    EXPECT_FALSE(exceededLimit(largestAllowed()));
    ModelSize fewBodies{1, 1, 1, 0, kMaxSteps};
    EXPECT_FALSE(exceededLimit(fewBodies));
}

TEST(ModelLimitsTest, EachLimitIsNamedWithTheFigureAskedFor)
{
    ModelSize s = largestAllowed();
    s.bodies += 1;
    auto e = exceededLimit(s);
    ASSERT_TRUE(e);
    EXPECT_EQ(e->kind, LimitKind::Bodies);
    EXPECT_TRUE(contains(e->message, std::to_string(kMaxBodies + 1) + " moving bodies")) << e->message;
    EXPECT_TRUE(contains(e->message, "the " + std::to_string(kMaxBodies))) << e->message;

    s = largestAllowed();
    s.drivers += 1;
    e = exceededLimit(s);
    ASSERT_TRUE(e);
    EXPECT_EQ(e->kind, LimitKind::Joints);
    EXPECT_TRUE(contains(e->message, std::to_string(kMaxJoints + 1) + " joints and drivers")) << e->message;

    s = largestAllowed();
    s.loads += 1;
    e = exceededLimit(s);
    ASSERT_TRUE(e);
    EXPECT_EQ(e->kind, LimitKind::Loads);

    s = ModelSize{1, 1, 1, 0, kMaxSteps + 1};
    e = exceededLimit(s);
    ASSERT_TRUE(e);
    EXPECT_EQ(e->kind, LimitKind::Steps);
    EXPECT_TRUE(contains(e->message, std::to_string(kMaxSteps + 1) + " steps")) << e->message;

    s = largestAllowed();
    s.steps += 1;
    e = exceededLimit(s);
    ASSERT_TRUE(e);
    EXPECT_EQ(e->kind, LimitKind::Steps);
    EXPECT_TRUE(contains(e->message, "use at most " + std::to_string(largestAllowed().steps) + " steps")) << e->message;
}

TEST(ModelLimitsTest, CompileRefusesTooManyBodiesWithThePath)
{
    const Mechanism m = test::fourBarChain(int(kMaxBodies) + 1);
    try {
        compile(m);
        FAIL() << "compiled " << m.bodies.size() << " bodies";
    } catch (const ModelError& e) {
        EXPECT_EQ(e.path(), "bodies");
    }
}

TEST(ModelLimitsTest, CompileRefusesTheFilesStepCountWithThePath)
{
    Mechanism m = test::fourBarChain(100);
    m.cycle.steps = int(kMaxBodySteps / 100);
    try {
        compile(m);
        FAIL() << "compiled " << m.cycle.steps << " steps of 100 bodies";
    } catch (const ModelError& e) {
        EXPECT_EQ(e.path(), "cycle.steps");
        EXPECT_TRUE(contains(e.what(), std::to_string(m.cycle.steps) + " steps of 100 moving bodies")) << e.what();
    }
}

TEST(ModelLimitsTest, SweepRefusesARequestedStepCountBeforeSolving)
{
    const CompiledMechanism m = compile(test::fourBarChain(100));
    SweepOptions options;
    options.steps = int(kMaxBodySteps / 100);
    int progressCalls = 0;
    options.progress = [&](int, int) { return ++progressCalls > 0; };
    try {
        sweepCycle(m, options);
        FAIL() << "swept " << options.steps << " steps of 100 bodies";
    } catch (const AnalysisError& e) {
        EXPECT_TRUE(contains(e.what(), std::to_string(options.steps) + " steps of 100 moving bodies")) << e.what();
    }
    EXPECT_EQ(progressCalls, 0);
}

// The largest mechanism allowed is solved (a few steps keep the test short).
TEST(ModelLimitsTest, TheLargestMechanismIsSolved)
{
    const CompiledMechanism m = compile(test::fourBarChain(int(kMaxBodies)));
    SweepOptions options;
    options.steps = 4;
    const CycleResult r = sweepCycle(m, options);
    EXPECT_TRUE(r.complete);
    EXPECT_EQ(r.steps.size(), 5u);
}

}  // namespace
}  // namespace clevis
