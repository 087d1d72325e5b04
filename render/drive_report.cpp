#include "render/drive_report.h"

#include "core/file/file_units.h"
#include "core/file/mechanism_file_format.h"
#include "core/results/drive_text.h"
#include "render/cycle_chart.h"
#include "render/drive_figures.h"
#include "render/palette.h"

#include <cmath>
#include <utility>

namespace clevis::ui {
namespace {

// Every fourth ratio of a study fills a table a reader takes in; the least
// RMS torque is always among the rows.
constexpr std::size_t kStudyRowEvery = 4;

QString qs(const std::string& s) { return QString::fromStdString(s); }

QString rpm(double radPerSecond) { return formatQuantity(fromSi(FileUnit::Rpm, radPerSecond), "rpm"); }

// Peaks a step near a singular position would exceed are listed apart, as in the peak table.
void peakRows(std::vector<QStringList>& rows, const QString& name, const Peak& p, const CycleAxis& axis,
              const std::function<QString(double)>& format)
{
    rows.push_back({name, markedValue(format(p.value), p), stepPlace(axis, p.step)});
    if (p.flagged.step >= 0)
        rows.push_back({name + ", larger near a toggle", markedValue(format(p.flagged.value), p.flagged),
                        stepPlace(axis, p.flagged.step)});
}

void motorSection(PageFlow& f, const ReviewReportInput& in, const CycleAxis& axis, const MotorDuty& d,
                  const Driver* driver, const std::optional<FoundMotion>& found)
{
    const auto& u = in.units;
    const Gearbox& g = d.gearbox;
    f.subheading(QString("Motor of %1 through a gearbox").arg(qs(in.mechanism.drivers[d.driver].name)));
    f.paragraph(QString("Gear ratio %1 (motor turns per output turn), efficiency %2 %, rotor %3, gearbox %4 at the "
                        "motor shaft.")
                    .arg(g.ratio, 0, 'g', 6)
                    .arg(100.0 * g.efficiency, 0, 'g', 4)
                    .arg(formatQuantity(g.motorInertia, "kg·m²"), formatQuantity(g.gearboxInertia, "kg·m²")));
    const auto torque = [&](double v) { return u.torque(v); };
    const auto watts = [](double v) { return formatQuantity(v, "W"); };
    const PeakAt overCycle{0.0, -1, in.summary.nearSingularSteps > 0};
    std::vector<QStringList> rows{{"At the motor shaft", "Value", "Where"}};
    peakRows(rows, "Peak torque", d.torquePeak, axis, torque);
    rows.push_back({"RMS torque", markedValue(u.torque(d.torqueRms), overCycle), "over the cycle"});
    rows.push_back({"Mean torque", markedValue(u.torque(d.torqueMean), overCycle), "over the cycle"});
    peakRows(rows, "Peak speed", d.speedPeak, axis, rpm);
    if (d.powerPeak.step >= 0) peakRows(rows, "Peak power", d.powerPeak, axis, watts);
    else rows.push_back({"Peak power", "none delivered", "–"});
    rows.push_back({"RMS power", markedValue(watts(d.powerRms), overCycle), "over the cycle"});
    rows.push_back(
        {"Regenerated per cycle", markedValue(formatQuantity(d.regenerated, "J"), overCycle), "after gearbox losses"});
    if (d.reflected) {
        rows.push_back({"Load inertia (the mechanism's over i²), least",
                        formatQuantity(d.reflected->smallest.value, "kg·m²"),
                        stepPlace(axis, d.reflected->smallest.step)});
        rows.push_back({"Load inertia, greatest", formatQuantity(d.reflected->largest.value, "kg·m²"),
                        stepPlace(axis, d.reflected->largest.step)});
        if (d.reflected->ratioToRotor)
            rows.push_back(
                {"Greatest load inertia / rotor inertia", QString::number(*d.reflected->ratioToRotor, 'g', 3), "–"});
    }
    f.table(rows, {0.44, 0.22, 0.34});
    f.paragraph(
        "The regenerated energy is what the motor shaft gets back each cycle: a brake resistor or a "
        "regenerative drive must take it.");
    if (!d.reflected)
        f.paragraph(
            "The load inertia is not given for a mechanism with more than one driver: the others set its "
            "motion too.");
    else if (!d.reflected->ratioToRotor) f.paragraph("No rotor inertia is given: no inertia ratio.");
    else
        f.paragraph(QString("The inertia ratio is read against %1.").arg(qs(inertiaGuideText())),
                    *d.reflected->ratioToRotor > kInertiaRatioGuide ? palette::problem() : QColor(),
                    *d.reflected->ratioToRotor > kInertiaRatioGuide);
    if (found && found->driver == d.driver) {
        f.paragraph(flywheelText(in.mechanism, *found));
        f.figure(CycleChart(speedPane(in.mechanism, in.result, *found), axis, in.result), f.width());
    }
    for (PlotPane& pane : motorPanes(in.mechanism, d, u))
        f.figure(CycleChart(std::move(pane), axis, in.result), f.width());
    f.figure(XyChart(torqueSpeedContent(in.mechanism, d, driver ? driver->motor : std::nullopt, u)), f.width());
}

void studySection(PageFlow& f, const ReviewReportInput& in, const RatioStudy& s, const Gearbox& g)
{
    const auto& u = in.units;
    // The study's name heads it once, as the subheading, not again over its chart.
    XyChartContent content = ratioStudyContent(in.mechanism, s, g.ratio, u);
    const QString title = std::exchange(content.title, QString());
    const XyChart chart(std::move(content));
    f.keep(chart.size().height() * f.width() / chart.size().width() + 90);  // the heading and words with the plot
    f.subheading(title);
    f.paragraph(QString("The RMS and peak torque the motor needs at %1 gear ratios from %2 to %3 (a quarter to four "
                        "times the gearbox's %4, spaced evenly on a log scale), with the gearbox's efficiency and "
                        "inertias at each and %5. A larger ratio divides the load torque but multiplies the "
                        "torque that accelerates the rotor and gearbox.")
                    .arg(s.points.size())
                    .arg(s.points.empty() ? 0.0 : s.points.front().ratio, 0, 'g', 4)
                    .arg(s.points.empty() ? 0.0 : s.points.back().ratio, 0, 'g', 4)
                    .arg(g.ratio, 0, 'g', 6)
                    .arg(qs(ratioStudyMotionText(in.mechanism, s))));
    f.figure(chart, f.width());
    std::vector<QStringList> rows{{"Ratio", "RMS motor torque", "Peak motor torque", ""}};
    for (std::size_t k = 0; k < s.points.size(); ++k) {
        const bool own = std::abs(std::log(s.points[k].ratio / g.ratio)) < 1e-9;
        if (k % kStudyRowEvery != 0 && k + 1 != s.points.size() && k != s.best && !own) continue;
        const RatioPoint& p = s.points[k];
        rows.push_back({QString::number(p.ratio, 'g', 4), u.torque(p.torqueRms), u.torque(std::abs(p.torquePeak.value)),
                        k == s.best ? "least RMS torque"
                        : own       ? "the gearbox's ratio"
                                    : ""});
    }
    f.table(rows, {0.18, 0.27, 0.27, 0.28});
    if (s.best == 0 || s.best + 1 == s.points.size())
        f.paragraph("The least RMS torque is at an end of the range: the best ratio may lie beyond it.");
}

void cylinderSection(PageFlow& f, const ReviewReportInput& in, const CycleAxis& axis, const CylinderDuty& c)
{
    const auto& u = in.units;
    const Cylinder& cyl = c.cylinder;
    f.subheading(QString("Cylinder of %1").arg(qs(in.mechanism.drivers[c.driver].name)));
    f.paragraph(QString("Bore %1, rod %2: it pushes on the full bore (%3) and pulls on the ring round the rod (%4)%5.")
                    .arg(u.length(cyl.bore), u.length(cyl.rod), formatQuantity(capArea(cyl) * 1e6, "mm²"),
                         formatQuantity(annulusArea(cyl) * 1e6, "mm²"),
                         cyl.supplyPressure ? QString("; supply %1").arg(u.pressure(*cyl.supplyPressure)) : QString()));
    const bool pushing =
        c.pressurePeak.step >= 0 && in.result.steps[std::size_t(c.pressurePeak.step)].effort[c.driver] >= 0.0;
    std::vector<QStringList> rows{{"Quantity", "Value", "Where"}};
    peakRows(rows, pushing ? "Peak pressure (cap side, pushing)" : "Peak pressure (rod side, pulling)", c.pressurePeak,
             axis, [&](double v) { return u.pressure(v); });
    peakRows(rows, "Peak flow into the working side", c.flowPeak, axis,
             [](double v) { return formatQuantity(litresPerMinute(v), "L/min"); });
    f.table(rows, {0.44, 0.22, 0.34});
    f.paragraph("Hydraulic power p·q is the driver's power in the peak table.");
    if (c.firstOverSupply >= 0)
        f.paragraph(QString("The cylinder needs more than its supply pressure at %1 steps, first at %2.")
                        .arg(c.stepsOverSupply)
                        .arg(stepPlace(axis, c.firstOverSupply)),
                    palette::problem(), true);
    for (PlotPane& pane : cylinderPanes(in.mechanism, c, u))
        f.figure(CycleChart(std::move(pane), axis, in.result), f.width());
}

}  // namespace

void driveChapter(PageFlow& f, const ReviewReportInput& in, const CycleAxis& axis, const DriveResults& d)
{
    f.paragraph(
        QString(d.found ? "What the motion its motor characteristic gives (found by integrating the equation of "
                          "motion to the steady cycle) asks of each motor behind a gearbox, and what the prescribed "
                          "motion asks of each cylinder."
                        : "What the prescribed motion asks of each motor behind a gearbox and each cylinder.") +
        " A motor turns i times as "
        "fast as its driver; its torque is the driver's divided by i·η while power flows to the mechanism and "
        "multiplied by η/i while it flows back, plus the torque that accelerates its rotor and the gearbox.");
    for (const Warning& w : d.warnings) f.paragraph(QString("Warning: %1").arg(qs(w.message)), palette::problem());
    for (const MotorDuty& motor : d.motors) {
        const Driver* driver =
            in.document ? findDriver(in.document->drivers, in.mechanism.drivers[motor.driver].name) : nullptr;
        motorSection(f, in, axis, motor, driver, d.found);
        for (const RatioStudy& s : d.studies)
            if (s.driver == motor.driver) studySection(f, in, s, motor.gearbox);
    }
    for (const CylinderDuty& c : d.cylinders) cylinderSection(f, in, axis, c);
    f.subheading("What these figures leave out");
    if (!d.motors.empty()) f.paragraph(QString::fromUtf8(kMotorCaution).simplified());
    if (!d.cylinders.empty()) f.paragraph(QString::fromUtf8(kCylinderCaution).simplified());
}

}  // namespace clevis::ui
