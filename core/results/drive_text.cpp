#include "core/results/drive_text.h"

#include "core/file/file_units.h"
#include "core/results/drive_units.h"
#include "core/results/number_text.h"
#include "core/results/summary_text.h"
#include "core/results/text_table.h"

#include <cmath>

namespace clevis {

const char* const kMotorCaution =
    "  Motor figures follow the motion of rigid bodies with ideal joints. They include no\n"
    "  service factor for shock and no gearbox maker's rating; check the motor's thermal rating against\n"
    "  the RMS torque at the speeds of the cycle and its peak torque against the peak. The duty cycle\n"
    "  (starts per hour, pauses between cycles) is not covered.\n";
const char* const kCylinderCaution =
    "  Cylinder figures leave out seal friction, pressure lost in pipes and valves, and the buckling of\n"
    "  the rod; the supply must cover those too.\n";

namespace {

using Align = TextTable::Align;

std::string quantity(double value, const char* unit) { return significant(value) + " " + unit; }

std::string rpm(double radPerSecond) { return quantity(fromSi(FileUnit::Rpm, radPerSecond), "rpm"); }

std::string megapascals(double pa) { return quantity(pa * 1e-6, "MPa"); }

std::string millimetres(double m) { return quantity(m * 1e3, "mm"); }

// "at crank = 123.40°", marked where the step is near a singular position.
std::string at(const CompiledMechanism& m, const CycleResult& r, int driver, const PeakAt& p)
{
    if (p.step < 0) return "";
    return "at " + formatDrivePosition(m.drivers[driver], r.steps[p.step].drivePosition[driver]) +
           (p.nearSingular ? std::string(" ") + kNearToggleMark : "");
}

// A peak, where it is, and a larger one near a toggle apart.
std::vector<std::string> peakCells(const CompiledMechanism& m, const CycleResult& r, int driver, const Peak& p,
                                   const std::string& value)
{
    std::vector<std::string> cells{value, at(m, r, driver, p)};
    if (p.flagged.step >= 0) cells.push_back("larger near a toggle: " + at(m, r, driver, p.flagged));
    return cells;
}

std::string gearboxLine(const Gearbox& g)
{
    return "ratio " + significant(g.ratio) + " (motor turns per output turn), efficiency " +
           significant(100.0 * g.efficiency) + " %, rotor " + quantity(g.motorInertia, "kg·m²") + ", gearbox " +
           quantity(g.gearboxInertia, "kg·m²") + " at the motor shaft";
}

std::string inertiaText(const CompiledMechanism& m, const CycleResult& r, const MotorDuty& duty)
{
    if (!duty.reflected)
        return "  Load inertia at the motor shaft: not given for a mechanism with more than one driver\n";
    const ReflectedInertia& j = *duty.reflected;
    std::string text =
        "  Load inertia at the motor shaft (the mechanism's, over i²): " + quantity(j.smallest.value, "kg·m²") + " " +
        at(m, r, duty.driver, j.smallest) + " to " + quantity(j.largest.value, "kg·m²") + " " +
        at(m, r, duty.driver, j.largest) + "\n";
    if (!j.ratioToRotor) return text + "  No rotor inertia given: no inertia ratio.\n";
    text += "  Largest load inertia / rotor inertia: " + significant(*j.ratioToRotor) + " (" + inertiaGuideText() + ")";
    return text + (*j.ratioToRotor > kInertiaRatioGuide ? ": ABOVE THE GUIDE\n" : "\n");
}

std::string motorText(const CompiledMechanism& m, const CycleResult& r, const MotorDuty& d)
{
    std::string text =
        "\nMotor of " + m.drivers[d.driver].name + " through a gearbox: " + gearboxLine(d.gearbox) + "\n";
    TextTable t({Align::Left, Align::Right, Align::Left, Align::Left});
    const auto row = [&](const char* name, const Peak& p, const std::string& value) {
        std::vector<std::string> cells{name};
        for (auto& c : peakCells(m, r, d.driver, p, value)) cells.push_back(std::move(c));
        t.addRow(cells);
    };
    row("Peak motor torque", d.torquePeak, quantity(d.torquePeak.value, "N·m"));
    t.addRow({"RMS motor torque", quantity(d.torqueRms, "N·m")});
    t.addRow({"Mean motor torque", quantity(d.torqueMean, "N·m")});
    row("Peak motor speed", d.speedPeak, rpm(d.speedPeak.value));
    if (d.powerPeak.step >= 0) row("Peak power at the motor shaft", d.powerPeak, quantity(d.powerPeak.value, "W"));
    else t.addRow({"Peak power at the motor shaft", "none delivered"});
    t.addRow({"RMS power at the motor shaft", quantity(d.powerRms, "W")});
    t.addRow({"Regenerated per cycle", quantity(d.regenerated, "J"),
              "returned to the motor shaft after gearbox losses: a brake resistor or regenerative drive takes it"});
    return text + t.render() + inertiaText(m, r, d);
}

// Where the speed was found rather than prescribed: how it varies over the
// steady cycle, how it was reached, and the flywheel sizing.
std::string foundText(const CompiledMechanism& m, const FoundMotion& f)
{
    const SteadyCycle& c = f.cycle;
    const CompiledDriver& d = m.drivers[std::size_t(f.driver)];
    std::string text = "\nSpeed of " + d.name +
                       " as its motor turns it (the equation of motion integrated turn after turn to the steady "
                       "cycle)\n";
    TextTable t({Align::Left, Align::Right, Align::Left});
    t.addRow(
        {"Mean speed (one turn over its period)", rpm(std::abs(c.meanSpeed)), "period " + quantity(c.period, "s")});
    t.addRow({"Highest speed", rpm(c.speedMax), "at " + formatDrivePosition(d, c.maxAt)});
    t.addRow({"Lowest speed", rpm(c.speedMin), "at " + formatDrivePosition(d, c.minAt)});
    t.addRow({"Speed fluctuation (max − min)/mean", significant(c.fluctuation), ""});
    t.addRow({"Flywheel", quantity(f.flywheelInertia, "kg·m²"),
              f.sizing                  ? std::string("sized, below")
              : f.flywheelInertia > 0.0 ? "as given"
                                        : "none"});
    text += t.render();
    text += "  Steady after " + std::to_string(c.turns) +
            " turns (a turn ends within 1e-10 of the squared speed it started with). Every figure of this\n"
            "  analysis is at this speed, not at the speed_rpm given.\n";
    if (!f.sizing) return text;
    const FlywheelSizing& s = *f.sizing;
    const std::string shaft = s.on == FlywheelShaft::Motor ? "motor shaft" : "output shaft";
    text += "\nFlywheel on the " + shaft + " for a speed fluctuation of " + significant(s.target) + "\n";
    TextTable z({Align::Left, Align::Right, Align::Left});
    z.addRow({"Energy estimate ΔE_max/(C_s·ω²)", quantity(s.estimate, "kg·m²"),
              "ΔE_max " + quantity(s.energySwing, "J") + " at " + rpm(s.speed) +
                  "; leaves out the mechanism's and the rotor's inertia and the motor's slope"});
    z.addRow({"Integrated (steady cycle)", quantity(s.integrated, "kg·m²"),
              "fluctuation " + significant(s.achieved) + " after " + std::to_string(s.trials) + " trials"});
    text += z.render();
    if (s.integrated == 0.0) text += "  The mechanism keeps within the target without a flywheel.\n";
    return text;
}

std::string studyText(const CompiledMechanism& m, const RatioStudy& s)
{
    TextTable t({Align::Right, Align::Right, Align::Right, Align::Left});
    t.addRow({"Ratio", "RMS motor torque", "Peak motor torque", ""});
    for (std::size_t k = 0; k < s.points.size(); ++k) {
        const RatioPoint& p = s.points[k];
        t.addRow({significant(p.ratio), quantity(p.torqueRms, "N·m"), quantity(std::abs(p.torquePeak.value), "N·m"),
                  k == s.best ? "<- least RMS torque" : ""});
    }
    std::string text = "\nGear ratio study for " + m.drivers[s.driver].name +
                       " (the gearbox's efficiency and inertias at each ratio; " + ratioStudyMotionText(m, s) + ")\n" +
                       t.render();
    if (s.best == 0 || s.best + 1 == s.points.size())
        text += "  The least RMS torque is at an end of the range: the best ratio may lie beyond it.\n";
    return text;
}

std::string cylinderText(const CompiledMechanism& m, const CycleResult& r, const CylinderDuty& c)
{
    const Cylinder& cyl = c.cylinder;
    std::string text = "\nCylinder of " + m.drivers[c.driver].name + ": bore " + millimetres(cyl.bore) + ", rod " +
                       millimetres(cyl.rod) + " (cap area " + quantity(capArea(cyl) * 1e6, "mm²") + ", annulus " +
                       quantity(annulusArea(cyl) * 1e6, "mm²") + ")" +
                       (cyl.supplyPressure ? ", supply " + megapascals(*cyl.supplyPressure) : "") + "\n";
    TextTable t({Align::Left, Align::Right, Align::Left, Align::Left});
    const auto row = [&](const char* name, const Peak& p, const std::string& value) {
        std::vector<std::string> cells{name};
        for (auto& cell : peakCells(m, r, c.driver, p, value)) cells.push_back(std::move(cell));
        t.addRow(cells);
    };
    const bool pushing = c.pressurePeak.step >= 0 && r.steps[c.pressurePeak.step].effort[c.driver] >= 0.0;
    row(pushing ? "Peak pressure (cap side, pushing)" : "Peak pressure (rod side, pulling)", c.pressurePeak,
        megapascals(c.pressurePeak.value));
    row("Peak flow into the working side", c.flowPeak, quantity(litresPerMinute(c.flowPeak.value), "L/min"));
    text += t.render() + "  Hydraulic power p·q is the driver's power above.\n";
    if (c.firstOverSupply >= 0)
        text += "  ABOVE THE SUPPLY PRESSURE at " + std::to_string(c.stepsOverSupply) + " steps, first " +
                at(m, r, c.driver, {0.0, c.firstOverSupply, false}) + ".\n";
    return text;
}

}  // namespace

std::string inertiaGuideText()
{
    return "common practice, a rule of thumb: within about " + significant(kInertiaRatioGuide) +
           ", nearer 1–5 for quick, stiff positioning";
}

double litresPerMinute(double cubicMetresPerSecond) { return cubicMetresPerSecond * 60e3; }

std::string driveText(const CompiledMechanism& m, const CycleResult& r, const DriveResults& d)
{
    if (d.motors.empty() && d.cylinders.empty() && d.studies.empty() && d.warnings.empty() && !d.found) return "";
    std::string text = "\nDrive (what the motion asks of each motor and cylinder)\n";
    for (const auto& w : d.warnings) text += "  - " + w.message + "\n";
    if (d.found) text += foundText(m, *d.found);
    for (const auto& motor : d.motors) text += motorText(m, r, motor);
    for (const auto& study : d.studies) text += studyText(m, study);
    for (const auto& cylinder : d.cylinders) text += cylinderText(m, r, cylinder);
    if (!d.motors.empty()) text += std::string("\n") + kMotorCaution;
    if (!d.cylinders.empty()) text += std::string("\n") + kCylinderCaution;
    return text;
}

}  // namespace clevis
