#include "render/drive_figures.h"

#include "core/file/file_units.h"
#include "core/results/drive_text.h"

#include <cmath>

namespace clevis::ui {
namespace {

// The first driver's pen, as in the plots over the cycle (plot_panes.cpp).
constexpr int kDriverPen = 1, kCharacteristicPen = 0, kPeakPen = 2;

QString qs(const std::string& s) { return QString::fromStdString(s); }

double rpm(double radPerSecond) { return fromSi(FileUnit::Rpm, radPerSecond); }

QString rpmText(double radPerSecond) { return formatQuantity(rpm(radPerSecond), "rpm"); }

std::vector<double> scaled(const std::vector<double>& v, double k)
{
    std::vector<double> out;
    out.reserve(v.size());
    for (const double x : v) out.push_back(k * x);
    return out;
}

}  // namespace

DriveResults driveResultsWithStudies(const Mechanism& doc, const CompiledMechanism& m, const CycleResult& r,
                                     const std::vector<bool>& unreliable, const std::optional<FoundMotion>& found)
{
    DriveResults d = driveResults(doc, m, r, unreliable, found);
    for (const MotorDuty& motor : d.motors)
        d.studies.push_back(
            ratioStudy(m, r, unreliable, motor.driver, motor.gearbox, ratioRangeAround(motor.gearbox.ratio)));
    return d;
}

bool hasDriveFigures(const DriveResults& d) { return !d.motors.empty() || !d.cylinders.empty(); }

std::vector<PlotPane> motorPanes(const CompiledMechanism& m, const MotorDuty& d, const RenderUnits& u)
{
    const QString name = qs(m.drivers[d.driver].name);
    return {{QString("Torque at the motor shaft of %1").arg(name),
             u.torqueSymbol,
             {{{name + " motor torque", u.torqueSymbol, scaled(d.torque, u.torquePerNewtonMetre)}, kDriverPen}},
             {}}};
}

PlotPane speedPane(const CompiledMechanism& m, const CycleResult& r, const FoundMotion& found)
{
    const QString name = qs(m.drivers[found.driver].name);
    std::vector<double> speed;
    speed.reserve(r.steps.size());
    for (const StepResult& s : r.steps) speed.push_back(rpm(s.driveRate[std::size_t(found.driver)]));
    return {QString("Speed of %1 (C_s = %2)").arg(name).arg(found.cycle.fluctuation, 0, 'f', 4),
            "rpm",
            {{{name + " speed", "rpm", std::move(speed)}, kDriverPen}},
            {{"mean " + rpmText(found.cycle.meanSpeed), rpm(found.cycle.meanSpeed), kCharacteristicPen}},
            false};
}

QString flywheelText(const CompiledMechanism& m, const FoundMotion& found)
{
    QString text = QString(
                       "Speed of %1 found from its motor characteristic: mean %2, fluctuation C_s = %3; "
                       "flywheel %4 kg·m².")
                       .arg(qs(m.drivers[found.driver].name), rpmText(std::abs(found.cycle.meanSpeed)))
                       .arg(found.cycle.fluctuation, 0, 'f', 4)
                       .arg(found.flywheelInertia, 0, 'g', 4);
    if (const auto& f = found.sizing)
        text += QString(
                    " Sized for C_s = %1 on the %2 shaft: energy estimate ΔE/(C_s·ω²) = %3 kg·m² (ΔE = %4 J), "
                    "integrated %5 kg·m² reaching C_s = %6.")
                    .arg(f->target, 0, 'g', 3)
                    .arg(f->on == FlywheelShaft::Motor ? "motor" : "output")
                    .arg(f->estimate, 0, 'g', 4)
                    .arg(f->energySwing, 0, 'g', 4)
                    .arg(f->integrated, 0, 'g', 4)
                    .arg(f->achieved, 0, 'f', 4);
    return text;
}

std::vector<PlotPane> cylinderPanes(const CompiledMechanism& m, const CylinderDuty& c, const RenderUnits& u)
{
    const QString name = qs(m.drivers[c.driver].name);
    PlotPane pressure{QString("Cylinder pressure of %1 (working side)").arg(name),
                      u.pressureSymbol,
                      {{{name + " pressure", u.pressureSymbol, scaled(c.pressure, u.pressurePerPascal)}, kDriverPen}},
                      {}};
    if (c.cylinder.supplyPressure)
        pressure.levels.push_back({"supply", *c.cylinder.supplyPressure * u.pressurePerPascal, kCharacteristicPen});
    PlotPane flow{QString("Flow into the working side of %1").arg(name),
                  "L/min",
                  {{{name + " flow", "L/min", scaled(c.flow, litresPerMinute(1.0))}, kDriverPen}},
                  {}};
    return {std::move(pressure), std::move(flow)};
}

XyChartContent torqueSpeedContent(const CompiledMechanism& m, const MotorDuty& d,
                                  const std::optional<MotorCharacteristic>& motor, const RenderUnits& u)
{
    XyChartContent c;
    c.title = QString("Torque against speed at the motor shaft of %1").arg(qs(m.drivers[d.driver].name));
    c.xTitle = "motor speed (rpm)";
    c.yTitle = QString("motor torque (%1)").arg(u.torqueSymbol);
    const double k = u.torquePerNewtonMetre;
    // The characteristic first, so the points of the cycle are drawn over it.
    if (motor) {
        XyCurve line{"motor characteristic", {}, kCharacteristicPen, false};
        if (const auto* l = std::get_if<MotorLine>(&*motor)) {
            line.name = QString("motor characteristic: %1 at stall, none at %2")
                            .arg(u.torque(l->stallTorque), rpmText(l->noLoadSpeed));
            line.points = {{0.0, k * l->stallTorque}, {rpm(l->noLoadSpeed), 0.0}};
        } else {
            const auto& t = std::get<MotorTable>(*motor);
            for (std::size_t i = 0; i < t.speed.size(); ++i) line.points.push_back({rpm(t.speed[i]), k * t.torque[i]});
            line.name = QString("motor characteristic (a table of %1 points)").arg(t.speed.size());
        }
        c.curves.push_back(std::move(line));
    }
    XyCurve points{"the cycle, one dot per step", {}, kDriverPen, true};
    for (std::size_t i = 0; i < d.speed.size() && i < d.torque.size(); ++i)
        points.points.push_back({rpm(d.speed[i]), k * d.torque[i]});
    c.curves.push_back(std::move(points));
    if (const int s = d.torquePeak.step; s >= 0 && s < int(d.speed.size()))
        c.marks.push_back({{rpm(d.speed[s]), k * d.torque[s]},
                           QString("peak torque %1 at %2").arg(u.torque(d.torque[s]), rpmText(d.speed[s])),
                           kPeakPen});
    return c;
}

XyChartContent ratioStudyContent(const CompiledMechanism& m, const RatioStudy& s, double givenRatio,
                                 const RenderUnits& u)
{
    XyChartContent c;
    c.title = QString(m.drivers[std::size_t(s.driver)].found.empty() ? "Gear ratio study for %1"
                                                                     : "Gear ratio study for %1 (at the found motion)")
                  .arg(qs(m.drivers[s.driver].name));
    c.xTitle = "gear ratio, motor turns per output turn (log scale)";
    c.yTitle = QString("motor torque (%1)").arg(u.torqueSymbol);
    c.logX = true;
    const double k = u.torquePerNewtonMetre;
    XyCurve rms{"RMS motor torque", {}, kDriverPen, false}, peak{"peak motor torque", {}, kPeakPen, false};
    std::size_t given = 0;  // the studied ratio nearest the gearbox's own
    for (std::size_t i = 0; i < s.points.size(); ++i) {
        const RatioPoint& p = s.points[i];
        rms.points.push_back({p.ratio, k * p.torqueRms});
        peak.points.push_back({p.ratio, k * std::abs(p.torquePeak.value)});
        if (std::abs(std::log(p.ratio / givenRatio)) < std::abs(std::log(s.points[given].ratio / givenRatio)))
            given = i;
    }
    c.curves = {std::move(rms), std::move(peak)};
    if (s.points.empty()) return c;
    const RatioPoint& best = s.points[s.best];
    c.marks.push_back(
        {{best.ratio, k * best.torqueRms},
         QString("least RMS torque %1 at ratio %2").arg(u.torque(best.torqueRms)).arg(best.ratio, 0, 'g', 4),
         kDriverPen});
    const RatioPoint& own = s.points[given];
    if (given != s.best)
        c.marks.push_back(
            {{own.ratio, k * own.torqueRms},
             QString("the gearbox's ratio %1: RMS %2").arg(own.ratio, 0, 'g', 4).arg(u.torque(own.torqueRms)),
             kCharacteristicPen});
    return c;
}

}  // namespace clevis::ui
