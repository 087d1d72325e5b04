// The drive in the desktop and the report: the figures of a motor behind a
// gearbox (torque against speed over the characteristic, torque over the
// cycle, the ratio study) and of a cylinder (pressure with the supply, flow)
// hold the drive results' numbers in display units, and none of their texts
// overlap at any width the window or the page gives them; the drive view
// shows the selected or only driver's; the review report has a Drive chapter
// exactly when a driver has a gearbox or a cylinder.
#include "core/file/file_units.h"
#include "core/file/mechanism_file.h"
#include "core/solver/motor_drive.h"
#include "render/chart_style.h"
#include "render/cycle_axis.h"
#include "render/cycle_chart.h"
#include "render/drive_figures.h"
#include "render/review_report.h"
#include "tests/recording_device.h"
#include "tests/sample_file.h"
#include "tests/solved_mechanism.h"
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_document.h"
#include "ui/results/drive_view.h"
#include "ui/shell/display_units.h"

#include <QComboBox>
#include <QPainter>
#include <QProcess>
#include <QTemporaryDir>
#include <QTest>

#include <gtest/gtest.h>

#include <cmath>
#include <memory>
#include <optional>

using namespace clevis;
using namespace clevis::ui;
using test::Solved;

namespace {

Mechanism sample(const std::string& name) { return test::loadSample(name); }

// The press with a motor characteristic given as a line or as a table.
Mechanism pressWithMotor(bool table)
{
    Mechanism m = sample("punch_press");
    if (table) m.drivers[0].motor = MotorTable{{0.0, 100.0, 150.0, 160.0}, {60.0, 50.0, 20.0, 0.0}};
    else m.drivers[0].motor = MotorLine{60.0, toSi(FileUnit::Rpm, 1580.0)};
    return m;
}

struct Drawn {
    QString title;
    QSizeF size;
    std::vector<test::RecordedText> texts;
};

Drawn draw(const Figure& figure, const QString& title)
{
    test::RecordingDevice device(figure.size().toSize() + QSize(1, 1));
    {
        QPainter p(&device);
        figure.paint(p, QRectF(QPointF(0, 0), figure.size()));
    }
    return {title, figure.size(), device.engine.texts};
}

// A mechanism at the motion its motor characteristic gives.
struct Found {
    Solved solved;
    std::optional<FoundMotion> found;
};

Found solveFound(const Mechanism& doc)
{
    SolvedCycle c = solveCycle(doc, compile(doc));
    CycleSummary s = summarize(c.m, c.r);
    BarList bars = findBars(doc, c.m);
    return {{doc, std::move(c.m), std::move(c.r), std::move(s), std::move(bars)}, std::move(c.found)};
}

// Every drive figure of a solved mechanism, built at `width`; with a found
// motion, the speed over the cycle too.
std::vector<Drawn> driveFigures(const Solved& s, double width, const RenderUnits& u = {},
                                const std::optional<FoundMotion>& found = std::nullopt, double plot = kChartPlotHeight)
{
    std::vector<Drawn> out;
    const DriveResults d = driveResultsWithStudies(s.doc, s.m, s.r, s.s.unreliable, found);
    const CycleAxis axis = cycleAxis(s.m, s.r);
    if (found) out.push_back(draw(CycleChart(speedPane(s.m, s.r, *found), axis, s.r, width, plot), "speed"));
    for (const MotorDuty& motor : d.motors) {
        out.push_back(
            draw(XyChart(torqueSpeedContent(s.m, motor, s.doc.drivers[0].motor, u), width, plot), "torque-speed"));
        for (PlotPane& pane : motorPanes(s.m, motor, u))
            out.push_back(draw(CycleChart(pane, axis, s.r, width, plot), pane.title));
    }
    for (const RatioStudy& study : d.studies)
        out.push_back(draw(XyChart(ratioStudyContent(s.m, study, d.motors[0].gearbox.ratio, u), width, plot), "study"));
    for (const CylinderDuty& c : d.cylinders)
        for (PlotPane& pane : cylinderPanes(s.m, c, u))
            out.push_back(draw(CycleChart(pane, axis, s.r, width, plot), pane.title));
    return out;
}

bool overlap(const QRectF& a, const QRectF& b)
{
    const QRectF i = a.intersected(b);
    return i.width() > 0.25 && i.height() > 0.25;
}

TEST(DriveFigures, NoTwoTextsOverlapAndNoneLeavesTheFigureAtAnyWidthOrHeight)
{
    const std::vector<std::pair<const char*, Mechanism>> cases{{"press", sample("punch_press")},
                                                               {"press with a motor line", pressWithMotor(false)},
                                                               {"press with a motor table", pressWithMotor(true)},
                                                               {"tipping bed", sample("tipping_bed")},
                                                               {"flywheel press at its found motion", {}}};
    const Found press = solveFound(sample("flywheel_press"));
    ASSERT_TRUE(press.found.has_value());
    for (const auto& [name, doc] : cases) {
        const bool found = std::string(name) == "flywheel press at its found motion";
        const Solved s = found ? press.solved : test::solve(doc);
        for (const double width : {515.0, 400.0, 300.0, 240.0})
            for (const double plot : {kChartPlotHeight, kChartLeastPlotHeight}) {
                const std::vector<Drawn> figures = driveFigures(s, width, {}, found ? press.found : std::nullopt, plot);
                ASSERT_GE(figures.size(), 2u) << name;
                for (const Drawn& f : figures) {
                    const auto& t = f.texts;
                    ASSERT_GE(t.size(), 8u) << name << ", " << f.title.toStdString() << ": a title, ticks, a legend";
                    const QRectF inside = QRectF(QPointF(0, 0), f.size).adjusted(-0.5, -0.5, 0.5, 0.5);
                    for (std::size_t i = 0; i < t.size(); ++i) {
                        EXPECT_TRUE(inside.contains(t[i].box))
                            << name << " at " << width << " x " << plot << ", " << f.title.toStdString() << ": '"
                            << t[i].text.toStdString() << "' leaves it";
                        for (std::size_t j = i + 1; j < t.size(); ++j)
                            EXPECT_FALSE(overlap(t[i].box, t[j].box))
                                << name << " at " << width << " x " << plot << ", " << f.title.toStdString() << ": '"
                                << t[i].text.toStdString() << "' overlaps '" << t[j].text.toStdString() << "'";
                    }
                }
            }
    }
}

// The dots are the motor's speed (rpm) and torque (display unit) at every
// step; the characteristic runs from the stall torque at rest to nothing at
// the no-load speed; the peak circled is the largest |torque|.
TEST(DriveFigures, TorqueAgainstSpeedHoldsTheDutyInDisplayUnits)
{
    const Solved s = test::solve(pressWithMotor(false));
    const DriveResults d = driveResults(s.doc, s.m, s.r, s.s.unreliable);
    ASSERT_EQ(d.motors.size(), 1u);
    const MotorDuty& motor = d.motors[0];
    RenderUnits u;
    // 1 lbf·in = 0.112 984 8 N·m (NIST SP 811, appendix B).
    u.torquePerNewtonMetre = 1.0 / 0.1129848;
    u.torqueSymbol = "lbf·in";
    const XyChartContent c = torqueSpeedContent(s.m, motor, s.doc.drivers[0].motor, u);
    ASSERT_EQ(c.curves.size(), 2u);
    EXPECT_EQ(c.curves[0].points.size(), 2u);
    EXPECT_NEAR(c.curves[0].points[0].y(), 60.0 / 0.1129848, 1e-3);
    EXPECT_NEAR(c.curves[0].points[1].x(), 1580.0, 1e-9);
    const auto& dots = c.curves[1].points;
    ASSERT_EQ(dots.size(), s.r.steps.size());
    EXPECT_TRUE(c.curves[1].dots);
    for (std::size_t k = 0; k < dots.size(); k += 37) {
        // ω_m = i·ω; 1 rpm = 2π/60 rad/s.
        EXPECT_NEAR(dots[k].x(), 24.0 * s.r.steps[k].driveRate[0] * 60.0 / (2 * M_PI),
                    1e-9 * std::abs(dots[k].x()) + 1e-9);
        EXPECT_NEAR(dots[k].y(), motor.torque[k] / 0.1129848, 1e-9 * std::abs(dots[k].y()) + 1e-12);
    }
    ASSERT_EQ(c.marks.size(), 1u);
    double largest = 0;
    for (const double t : motor.torque) largest = std::max(largest, std::abs(t));
    EXPECT_NEAR(std::abs(c.marks[0].at.y()), largest / 0.1129848, 1e-9 * largest);
    EXPECT_TRUE(c.yTitle.contains("lbf·in"));
}

// ratio/4 … 4·ratio in 41 log-spaced ratios, the gearbox's own the middle
// one; the least RMS torque circled at the smallest RMS of the study.
TEST(DriveFigures, TheRatioStudySpansAFactorOfFourEitherSideOfTheGearbox)
{
    const RatioRange range = ratioRangeAround(24.0);
    const std::vector<double> ratios = studyRatios(range);
    ASSERT_EQ(ratios.size(), 41u);
    EXPECT_DOUBLE_EQ(ratios.front(), 6.0);
    EXPECT_DOUBLE_EQ(ratios.back(), 96.0);
    EXPECT_NEAR(ratios[20], 24.0, 1e-12 * 24);
    for (std::size_t k = 1; k < ratios.size(); ++k)
        EXPECT_NEAR(ratios[k] / ratios[k - 1], std::pow(16.0, 1.0 / 40), 1e-12);

    const Solved s = test::solve(sample("punch_press"));
    const DriveResults d = driveResultsWithStudies(s.doc, s.m, s.r, s.s.unreliable);
    ASSERT_EQ(d.studies.size(), 1u);
    const RatioStudy& study = d.studies[0];
    const XyChartContent c = ratioStudyContent(s.m, study, 24.0, RenderUnits{});
    EXPECT_TRUE(c.logX);
    ASSERT_EQ(c.curves.size(), 2u);
    double least = INFINITY;
    for (const RatioPoint& p : study.points) least = std::min(least, p.torqueRms);
    ASSERT_FALSE(c.marks.empty());
    EXPECT_DOUBLE_EQ(c.marks[0].at.y(), least);
    for (std::size_t k = 0; k < study.points.size(); ++k)
        EXPECT_DOUBLE_EQ(c.curves[1].points[k].y(), std::abs(study.points[k].torquePeak.value));
}

// Pressure in the display unit with the supply across; flow in L/min
// (1 m³/s = 60 000 L/min).
TEST(DriveFigures, CylinderPanesCarryTheSupplyAndTheFlowInLitresPerMinute)
{
    const Solved s = test::solve(sample("tipping_bed"));
    const DriveResults d = driveResults(s.doc, s.m, s.r, s.s.unreliable);
    ASSERT_EQ(d.cylinders.size(), 1u);
    RenderUnits u;
    u.pressurePerPascal = 1e-5;
    u.pressureSymbol = "bar";
    const std::vector<PlotPane> panes = cylinderPanes(s.m, d.cylinders[0], u);
    ASSERT_EQ(panes.size(), 2u);
    EXPECT_EQ(panes[0].unit, "bar");
    ASSERT_EQ(panes[0].levels.size(), 1u);
    EXPECT_DOUBLE_EQ(panes[0].levels[0].value, 180.0);  // 18 MPa
    EXPECT_DOUBLE_EQ(panes[0].curves[0].series.values[100], d.cylinders[0].pressure[100] * 1e-5);
    EXPECT_EQ(panes[1].unit, "L/min");
    EXPECT_NEAR(panes[1].curves[0].series.values[100], d.cylinders[0].flow[100] * 60000.0,
                1e-12 * std::abs(d.cylinders[0].flow[100] * 60000.0));
}

// ---- the drive view ----

struct Window {
    MechanismDocument doc;
    std::unique_ptr<AnalysisState> analysis;
    std::unique_ptr<DriveView> view;

    explicit Window(const Mechanism& m)
    {
        doc.reset(m, {});
        analysis = std::make_unique<AnalysisState>(&doc);
        view = std::make_unique<DriveView>(&doc, analysis.get());
        view->resize(1200, 300);
        view->show();
        analysis->waitForIdle();
        QCoreApplication::processEvents();
    }
};

TEST(DriveView, ShowsTheOnlyMotorsThreeFiguresAndTheDrivesWarnings)
{
    Mechanism m = sample("punch_press");
    m.drivers[0].flywheel = Flywheel{0.2, FlywheelShaft::Motor};
    Window w(m);
    ASSERT_GE(w.view->driver(), 0) << w.view->message().toStdString();
    EXPECT_EQ(w.view->figures().size(), 3u);
    EXPECT_TRUE(w.view->motionText().isEmpty());
    // A flywheel without a motor characteristic is not used: the view says what driveResults says.
    const DriveResults d =
        driveResults(w.doc.mechanism(), w.analysis->compiled(), w.analysis->result(), w.analysis->summary().unreliable);
    ASSERT_FALSE(d.warnings.empty());
    EXPECT_TRUE(w.view->warningText().contains(QString::fromStdString(d.warnings[0].message)));
}

TEST(DriveView, ACylinderHasItsTwoFiguresAndNoDriveDataSaysHowToGiveIt)
{
    Window bed(sample("tipping_bed"));
    EXPECT_EQ(bed.view->figures().size(), 2u);
    EXPECT_TRUE(bed.view->driverChoice()->currentText().contains("cylinder"));
    EXPECT_TRUE(bed.view->driverChoice()->isVisible());

    Window sixBar(sample("dwell_six_bar"));
    EXPECT_LT(sixBar.view->driver(), 0);
    EXPECT_TRUE(sixBar.view->figures().empty());
    EXPECT_TRUE(sixBar.view->message().contains("gearbox")) << sixBar.view->message().toStdString();
    EXPECT_FALSE(sixBar.view->driverChoice()->isVisible()) << "no drive to choose: no empty choice shown";
}

TEST(DriveView, FollowsTheSelectedDriverAndAnEditedGearbox)
{
    Mechanism m = sample("tote_arm");
    for (Driver& d : m.drivers) d.gearbox = Gearbox{50.0, 0.9, 1e-4, 0.0};
    Window w(m);
    ASSERT_EQ(w.view->driverChoice()->count(), 2);
    const std::string second = w.analysis->compiled().drivers[1].name;
    w.doc.setSelection({Selection::Kind::Driver, QString::fromStdString(second), -1});
    EXPECT_EQ(w.view->driver(), 1);
    // Without a gearbox on the selected driver, the other one's drive is shown.
    w.doc.apply("no gearbox", [&](Mechanism& doc) { doc.drivers[1].gearbox.reset(); });
    w.analysis->waitForIdle();
    QCoreApplication::processEvents();
    EXPECT_EQ(w.view->driverChoice()->count(), 1);
    EXPECT_EQ(w.view->driver(), 0);
}

// Hidden, the view leaves a new result alone; shown, it has the newest one.
TEST(DriveView, HiddenItWaitsAndShownItHasTheNewestResult)
{
    Mechanism m = sample("tote_arm");
    for (Driver& d : m.drivers) d.gearbox = Gearbox{50.0, 0.9, 1e-4, 0.0};
    Window w(m);
    ASSERT_EQ(w.view->driverChoice()->count(), 2);
    w.view->hide();
    w.doc.apply("no gearbox", [&](Mechanism& doc) { doc.drivers[1].gearbox.reset(); });
    w.analysis->waitForIdle();
    QCoreApplication::processEvents();
    EXPECT_EQ(w.view->driverChoice()->count(), 2);  // not worked out while unseen
    w.view->show();
    QCoreApplication::processEvents();
    EXPECT_EQ(w.view->driverChoice()->count(), 1);
    EXPECT_EQ(w.view->driver(), 0);
    EXPECT_EQ(w.view->figures().size(), 3u);
}

// Never seen before its result came (a panel behind another's tab at start),
// shown, it has that result's figures.
TEST(DriveView, FirstShownAfterItsResultItHasItsFigures)
{
    MechanismDocument doc;
    doc.reset(sample("tipping_bed"), {});
    AnalysisState analysis(&doc);
    DriveView view(&doc, &analysis);
    view.resize(1200, 300);
    analysis.waitForIdle();
    QCoreApplication::processEvents();
    EXPECT_TRUE(view.figures().empty());  // not worked out while unseen
    view.show();
    QCoreApplication::processEvents();
    EXPECT_GE(view.driver(), 0) << view.message().toStdString();
    EXPECT_EQ(view.figures().size(), 2u);
}

// ---- the report ----

QString reportText(const Mechanism& doc)
{
    const Solved s = test::solve(doc);
    QTemporaryDir dir;
    const QString pdf = dir.filePath("review.pdf");
    QString error;
    const ReviewReportInput in{s.m, s.r, s.s, "sample.json", RenderUnits{}, &s.doc};
    EXPECT_TRUE(writeReviewReport(in, pdf, &error)) << error.toStdString();
    QProcess p;
    p.start("pdftotext", {"-layout", pdf, "-"});
    EXPECT_TRUE(p.waitForFinished(60000));
    return QString::fromUtf8(p.readAllStandardOutput());
}

TEST(ReviewReportDrive, AChapterWithTheMotorDutyStudyAndCautionsWhenThereIsAGearbox)
{
    const QString text = reportText(sample("punch_press"));
    for (const QString& section : reviewReportSections(true))
        EXPECT_TRUE(text.contains(section)) << section.toStdString();
    EXPECT_FALSE(text.contains("7 Energy balance"));
    const Solved s = test::solve(sample("punch_press"));
    const DriveResults d = driveResults(s.doc, s.m, s.r, s.s.unreliable);
    const RenderUnits u;
    for (const QString& expected :
         {QString("Motor of main_motor through a gearbox"), QString("Gear ratio study for main_motor"),
          "RMS torque " + u.torque(d.motors[0].torqueRms), "Mean torque " + u.torque(d.motors[0].torqueMean),
          formatQuantity(d.motors[0].regenerated, "J"), QString("least RMS torque"), QString("the gearbox's ratio"),
          QString("common practice, a rule of thumb"), QString("service factor for shock"),
          QString("Torque against speed at the motor shaft of main_motor"), QString("licensed engineer")})
        EXPECT_TRUE(text.simplified().contains(expected.simplified())) << expected.toStdString();
    // The study is named once: as its heading, not again as its chart's title.
    EXPECT_EQ(text.count("Gear ratio study for main_motor"), 1);
}

TEST(ReviewReportDrive, ACylinderHasItsTableAndNoDriveDataNoChapter)
{
    const QString bed = reportText(sample("tipping_bed"));
    EXPECT_TRUE(bed.contains("7 Drive"));
    EXPECT_TRUE(bed.contains("Cylinder of lift_cylinder"));
    EXPECT_TRUE(bed.simplified().contains("seal friction"));
    EXPECT_FALSE(bed.contains("Gear ratio study"));

    const QString sixBar = reportText(sample("dwell_six_bar"));
    for (const QString& section : reviewReportSections(false))
        EXPECT_TRUE(sixBar.contains(section)) << section.toStdString();
    EXPECT_FALSE(sixBar.contains("Drive\n")) << "no Drive chapter without a gearbox or a cylinder";
    EXPECT_FALSE(sixBar.contains("7 Drive"));
}

}  // namespace
