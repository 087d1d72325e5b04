// The desktop and the report at the motion a motor characteristic gives:
// the solve worker finds it as clevis-cli analyze does (the same speed at
// every step), a stall is refused with the driver named and nothing kept;
// the drive view adds the speed over the cycle and the flywheel figures;
// the report describes the driver by its motor and draws the speed.
#include "core/file/file_units.h"
#include "core/file/mechanism_file.h"
#include "core/solver/motor_drive.h"
#include "render/drive_figures.h"
#include "render/review_report.h"
#include "tests/cli_runner.h"
#include "ui/analysis/analysis_state.h"
#include "ui/analysis/solve_worker.h"
#include "ui/document/mechanism_document.h"
#include "ui/results/drive_scrubber.h"
#include "ui/results/drive_view.h"

#include <QCoreApplication>
#include <QDoubleSpinBox>
#include <QProcess>
#include <QTemporaryDir>

#include <gtest/gtest.h>
#include <nlohmann/json.hpp>

#include <algorithm>
#include <cmath>
#include <filesystem>

using namespace clevis;
using namespace clevis::ui;

namespace {

const std::string kPress = std::string(CLEVIS_SAMPLES_DIR) + "/flywheel_press.json";

Mechanism press() { return loadMechanismFile(kPress).mechanism; }

SolveOutcome solved(const Mechanism& m)
{
    return solveMechanism(m, [] { return true; });
}

TEST(FoundMotionWorker, TheStepSpeedsVaryAndEqualTheCommandLines)
{
    const SolveOutcome out = solved(press());
    ASSERT_TRUE(out.error.isEmpty()) << out.error.toStdString();
    ASSERT_TRUE(out.found.has_value());
    const int d = out.found->driver;
    const std::string name = out.compiled->drivers[std::size_t(d)].name;
    double least = 1e300, most = 0.0;
    for (const StepResult& s : out.result.steps) {
        least = std::min(least, std::abs(s.driveRate[std::size_t(d)]));
        most = std::max(most, std::abs(s.driveRate[std::size_t(d)]));
    }
    // At the prescribed speed every step turns at the same rate; the found one slows under the punch.
    EXPECT_GT((most - least) / std::abs(out.found->cycle.meanSpeed), 0.01);

    QTemporaryDir dir;
    const std::filesystem::path scratch = dir.path().toStdString();
    const test::CliRun run =
        test::runCli(scratch, "analyze " + test::quoted(kPress) + " --json " + test::quoted(scratch / "out.json"));
    ASSERT_EQ(run.exitCode, 0) << run.err;
    const auto json = nlohmann::json::parse(test::readFile(scratch / "out.json"));
    const auto& steps = json.at("steps");
    ASSERT_EQ(steps.size(), out.result.steps.size());
    for (std::size_t k = 0; k < steps.size(); ++k) {
        const double cli = steps[k].at("drivers").at(name).at("speed_rpm").get<double>();
        const double desk = fromSi(FileUnit::Rpm, out.result.steps[k].driveRate[std::size_t(d)]);
        EXPECT_NEAR(desk, cli, 1e-9 * std::abs(cli)) << "step " << k;
    }
}

TEST(FoundMotionWorker, AStallIsRefusedNamingTheDriverWithNothingKept)
{
    Mechanism m = press();
    for (Driver& d : m.drivers)
        if (d.motor) d.motor = MotorLine{0.5, toSi(FileUnit::Rpm, 1500.0)};
    const SolveOutcome out = solved(m);
    EXPECT_FALSE(out.compiled.has_value());
    EXPECT_TRUE(out.result.steps.empty());
    EXPECT_TRUE(out.error.contains("main_motor")) << out.error.toStdString();
    EXPECT_TRUE(out.offendingItems.contains("main_motor")) << out.offendingItems.join(",").toStdString();
}

TEST(FoundMotionView, TheSpeedPaneAndTheFlywheelFiguresAreShown)
{
    MechanismDocument doc;
    doc.reset(press(), {});
    AnalysisState analysis(&doc);
    DriveView view(&doc, &analysis);
    view.resize(1366, 500);
    view.show();
    analysis.waitForIdle();
    QCoreApplication::processEvents();
    ASSERT_GE(view.driver(), 0) << view.message().toStdString();
    ASSERT_TRUE(analysis.found().has_value());
    // Torque against speed, the speed over the cycle, the torque over the cycle, the ratio study.
    EXPECT_EQ(view.figures().size(), 4u);
    const FoundMotion& f = *analysis.found();
    ASSERT_TRUE(f.sizing.has_value());
    const QString text = view.motionText();
    EXPECT_TRUE(text.contains(QString("C_s = %1").arg(f.cycle.fluctuation, 0, 'f', 4))) << text.toStdString();
    EXPECT_TRUE(text.contains(QString("%1 kg·m²").arg(f.sizing->estimate, 0, 'g', 4))) << text.toStdString();
    EXPECT_TRUE(text.contains(QString("integrated %1 kg·m²").arg(f.sizing->integrated, 0, 'g', 4)))
        << text.toStdString();
    // The speed pane carries the step speeds in rpm and the time-average speed across.
    const PlotPane pane = speedPane(analysis.compiled(), analysis.result(), f);
    ASSERT_EQ(pane.curves.size(), 1u);
    ASSERT_EQ(pane.levels.size(), 1u);
    EXPECT_FALSE(pane.fromZero);  // a few per cent about the mean would be a flat line on an axis from zero
    EXPECT_DOUBLE_EQ(pane.levels[0].value, fromSi(FileUnit::Rpm, f.cycle.meanSpeed));
    const std::size_t k = analysis.result().steps.size() / 3;
    EXPECT_DOUBLE_EQ(pane.curves[0].series.values[k],
                     fromSi(FileUnit::Rpm, analysis.result().steps[k].driveRate[std::size_t(f.driver)]));
}

// A position typed between two steps is solved there at the found motion, not
// at the prescribed one: the step added matches the one a finer cycle
// (720 steps, so that 100.5° is one of them) finds at the same position, to
// the precision with which the found motion is interpolated between its samples.
TEST(FoundMotionView, APositionTypedBetweenStepsIsSolvedAtTheFoundMotion)
{
    MechanismDocument doc;
    doc.reset(press(), {});
    AnalysisState analysis(&doc);
    DriveScrubber scrubber(&analysis);
    analysis.waitForIdle();
    QCoreApplication::processEvents();
    ASSERT_TRUE(analysis.found().has_value());
    const int d = analysis.found()->driver;
    const std::size_t before = analysis.result().steps.size();
    ASSERT_EQ(before, 361u);
    const double start = analysis.result().steps.front().drivePosition[std::size_t(d)];
    auto* typed = scrubber.findChild<QDoubleSpinBox*>("scrubPosition");
    ASSERT_NE(typed, nullptr);
    typed->setValue(100.5);
    QCoreApplication::processEvents();
    ASSERT_EQ(analysis.result().steps.size(), before + 1) << "no step added at the typed position";
    const StepResult& at = analysis.result().steps[std::size_t(analysis.currentStep())];
    EXPECT_NEAR(std::remainder(at.drivePosition[std::size_t(d)] - start - 100.5 * kPi / 180.0, 2 * kPi), 0.0, 1e-9);

    const Mechanism m = press();
    const SolvedCycle fine = solveCycle(m, compile(m), SweepOptions{.steps = 720});
    ASSERT_TRUE(fine.found.has_value());
    const StepResult& ref = fine.r.steps[201];
    ASSERT_NEAR(std::remainder(ref.drivePosition[std::size_t(d)] - start - 100.5 * kPi / 180.0, 2 * kPi), 0.0, 1e-9);
    EXPECT_NEAR(at.t, ref.t, 1e-6 * fine.r.steps.back().t);
    EXPECT_NEAR(at.driveRate[std::size_t(d)], ref.driveRate[std::size_t(d)],
                1e-6 * std::abs(ref.driveRate[std::size_t(d)]));
    double largest = 0.0;
    for (const Reaction& j : ref.joints) largest = std::max(largest, j.force.norm());
    ASSERT_EQ(at.joints.size(), ref.joints.size());
    for (std::size_t j = 0; j < ref.joints.size(); ++j)
        EXPECT_LT((at.joints[j].force - ref.joints[j].force).norm(), 1e-6 * largest) << "joint " << j;
    // The prescribed speed would not do: the found motion is slower or faster than the mean there.
    const double prescribed = std::get<ConstantSpeed>(analysis.compiled().drivers[std::size_t(d)].motion).speed;
    EXPECT_GT(std::abs(at.driveRate[std::size_t(d)] - prescribed), 1e-4 * std::abs(prescribed));
}

TEST(FoundMotionReport, TheDriverIsDescribedByItsMotorAndTheSpeedIsDrawn)
{
    const SolveOutcome out = solved(press());
    ASSERT_TRUE(out.found.has_value());
    const Mechanism doc = press();
    QTemporaryDir dir;
    const QString pdf = dir.filePath("review.pdf");
    QString error;
    const ReviewReportInput in{*out.compiled, out.result, out.summary, "flywheel_press.json",
                               RenderUnits{}, &doc,       &*out.found};
    ASSERT_TRUE(writeReviewReport(in, pdf, &error)) << error.toStdString();
    QProcess p;
    p.start("pdftotext", {"-layout", pdf, "-"});
    ASSERT_TRUE(p.waitForFinished(60000));
    const QString text = QString::fromUtf8(p.readAllStandardOutput()).simplified();
    const FoundMotion& f = *out.found;
    for (const QString& expected :
         {QString("driven by a motor characteristic (below)"),
          QString("main_motor is driven by a motor characteristic: stall torque ") + RenderUnits{}.torque(60.0),
          QString("no-load speed 1500 rpm"),
          QString("Speed of main_motor (C_s = %1)").arg(f.cycle.fluctuation, 0, 'f', 4),
          QString("energy estimate ΔE/(C_s·ω²) = %1 kg·m²").arg(f.sizing->estimate, 0, 'g', 4),
          QString("integrated %1 kg·m²").arg(f.sizing->integrated, 0, 'g', 4)})
        EXPECT_TRUE(text.contains(expected.simplified())) << expected.toStdString();
    EXPECT_FALSE(text.contains("constant speed 60")) << "the motor driver described as prescribed";
}

}  // namespace
