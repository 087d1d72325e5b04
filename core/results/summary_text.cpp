#include "core/results/summary_text.h"

#include "core/model/type_names.h"
#include "core/results/drive_units.h"
#include "core/results/number_text.h"
#include "core/results/text_table.h"

#include <cmath>
#include <cstdio>

namespace clevis {
namespace {

using Align = TextTable::Align;

// Below this magnitude an SI force, moment, power or energy is rounding
// noise at the scale of machines and is shown as 0.
constexpr double kNoise = 1e-9;
// Common practice keeps a transmission angle within 40°–140°.
constexpr double kTransmissionLow = 40.0, kTransmissionHigh = 140.0;
// A judgement, not a standard: a residual above 0.1 % of the energy through
// the cycle is more than the trapezoid rule's error at usual step counts.
constexpr double kLargeResidual = 1e-3;

const char* const kCaution =
    "Caution: these results are for rigid bodies and ideal joints (no friction, clearance or\n"
    "elasticity) and include no dynamic or service factors and no fatigue assessment. Check\n"
    "them against the codes that apply where the machine is built and used, and have the\n"
    "design reviewed by a licensed engineer.\n";

std::string quantity(double value, const char* unit)
{
    return (std::abs(value) < kNoise ? std::string("0") : significant(value)) + " " + unit;
}

std::string degrees(double deg)
{
    char text[32];
    std::snprintf(text, sizeof text, "%.1f°", deg);
    return text;
}

std::string seconds(double t) { return significant(t) + " s"; }

// "at motor = 212.00°" (every driver), or blank where there is no such step.
std::string where(const CompiledMechanism& m, const CycleResult& r, int step)
{
    if (step < 0) return "";
    const StepResult& s = r.steps[step];
    if (m.drivers.empty()) return "at t = " + seconds(s.t);
    std::string text = "at ";
    for (std::size_t d = 0; d < m.drivers.size(); ++d)
        text += (d ? ", " : "") + formatDrivePosition(m.drivers[d], s.drivePosition[d]);
    return text;
}

// A peak's value and where it occurs; no place for a peak that is only noise.
std::string at(const CompiledMechanism& m, const CycleResult& r, const PeakAt& peak)
{
    return std::abs(peak.value) < kNoise ? "" : where(m, r, peak.step);
}

std::string heading(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s)
{
    std::string text = "Cycle summary" + (m.name.empty() ? std::string() : ": " + m.name) + "\n";
    const int solved = r.steps.empty() ? 0 : int(r.steps.size()) - 1;
    if (r.complete)
        text += "  " + std::to_string(r.plannedSteps) + " steps over " + seconds(r.duration) + ", cycle complete.\n";
    else
        text += "  THE CYCLE IS INCOMPLETE: solved " + std::to_string(solved) + " of " +
                std::to_string(r.plannedSteps) + " steps (t = 0 to " +
                seconds(r.steps.empty() ? 0.0 : r.steps.back().t) + " of " + seconds(r.duration) +
                "). The figures below cover the solved part only.\n";
    if (s.nearSingularSteps > 0)
        text += "  " + std::to_string(s.nearSingularSteps) + " of " + std::to_string(r.steps.size()) +
                " steps are near a singular position: the reactions there are unreliable.\n";
    return text;
}

std::string jointSection(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s)
{
    TextTable t({Align::Left, Align::Left, Align::Right, Align::Left, Align::Right, Align::Right, Align::Left});
    std::vector<std::string> header{"Joint", "Type", "Peak |F|", "", "RMS |F|"};
    for (const auto& j : m.joints)
        if (j.type == JointType::Slider) {
            header.insert(header.end(), {"Peak |M|", ""});
            break;
        }
    t.addRow(header);
    for (std::size_t j = 0; j < s.joints.size(); ++j) {
        const JointSummary& js = s.joints[j];
        std::vector<std::string> row{js.name, jointTypeName(m.joints[j].type), quantity(js.peak.value, "N"),
                                     at(m, r, js.peak), quantity(js.rms, "N")};
        if (m.joints[j].type == JointType::Slider)
            row.insert(row.end(), {quantity(js.peakMoment.value, "N·m"), at(m, r, js.peakMoment)});
        t.addRow(row);
    }
    return "\nJoint loads (force between the two bodies; RMS weighted over time)\n" + t.render();
}

std::string driverSection(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s)
{
    TextTable effort({Align::Left, Align::Right, Align::Left, Align::Right, Align::Right, Align::Right});
    effort.addRow({"Driver", "Peak effort", "", "RMS", "Mean", "Work"});
    TextTable power({Align::Left, Align::Right, Align::Left, Align::Right, Align::Left});
    power.addRow({"Driver", "Peak power", "", "Peak regenerative", ""});
    for (const auto& d : s.drivers) {
        const char* unit = effortUnit(d.type);
        effort.addRow({d.name, quantity(d.peak.value, unit), at(m, r, d.peak), quantity(d.rms, unit),
                       quantity(d.mean, unit), quantity(d.work, "J")});
        power.addRow({d.name, d.peakPower.step < 0 ? "none" : quantity(d.peakPower.value, "W"), at(m, r, d.peakPower),
                      d.peakRegenerative.step < 0 ? "none" : quantity(d.peakRegenerative.value, "W"),
                      at(m, r, d.peakRegenerative)});
    }
    return "\nDrivers (effort on the driven body, positive along the driver's coordinate)\n" + effort.render() +
           "\nDriver power (regenerative: the mechanism drives the motor)\n" + power.render();
}

std::string groundSection(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s)
{
    TextTable t({Align::Left, Align::Right, Align::Left});
    t.addRow({"Peak shaking force", quantity(s.groundForce.value, "N"), at(m, r, s.groundForce)});
    t.addRow({"Peak shaking moment about the origin", quantity(s.groundMoment.value, "N·m"), at(m, r, s.groundMoment)});
    return "\nLoad on the frame\n" + t.render();
}

std::string transmissionRange()
{
    char text[48];
    std::snprintf(text, sizeof text, "%g°–%g°", kTransmissionLow, kTransmissionHigh);
    return text;
}

std::string transmissionSection(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s)
{
    if (s.transmission.empty()) return "";
    TextTable t({Align::Left, Align::Right, Align::Left, Align::Right, Align::Left, Align::Left});
    t.addRow({"Pin", "Minimum", "", "Maximum", "", ""});
    for (const auto& ts : s.transmission) {
        const bool outside = ts.minimum.value < kTransmissionLow || ts.maximum.value > kTransmissionHigh;
        t.addRow({ts.joint, degrees(ts.minimum.value), where(m, r, ts.minimum.step), degrees(ts.maximum.value),
                  where(m, r, ts.maximum.step), outside ? "outside " + transmissionRange() : ""});
    }
    return "\nTransmission angle (common practice: keep within " + transmissionRange() + ")\n" + t.render();
}

std::string energySection(const CycleSummary& s)
{
    const EnergyBalance& e = s.energy;
    TextTable t({Align::Left, Align::Right});
    t.addRow({"Work done by the drivers", quantity(e.driverWork, "J")});
    t.addRow({"Kinetic energy gained", quantity(e.kineticChange, "J")});
    t.addRow({"Gravity potential gained", quantity(e.gravityChange, "J")});
    t.addRow({"Energy stored in springs", quantity(e.springChange, "J")});
    t.addRow({"Dissipated in dampers", quantity(e.damperWork, "J")});
    t.addRow({"Work done by applied loads", quantity(e.loadWork, "J")});
    t.addRow({"Residual", quantity(e.residual, "J")});
    t.addRow({"Gross energy through the cycle", quantity(e.gross, "J")});
    std::string text = "\nEnergy over the cycle\n" + t.render();
    if (e.gross <= kNegligibleEnergy)
        return text +
               "  No work passes through the mechanism over the cycle: the energy balance has nothing to check.\n";
    text += "  Energy balance closes to " + percent(e.relativeResidual) + " of the work through the cycle.\n";
    if (e.relativeResidual > kLargeResidual)
        text +=
            "  That is more than rounding: use more steps, and see the warnings (a near-singular position or a\n"
            "  jump between assembly branches spoils the balance).\n";
    return text;
}

std::string warningSection(const CycleResult& r)
{
    if (r.warnings.empty()) return "";
    std::string text = "\nWarnings\n";
    for (const auto& w : r.warnings) text += "  - " + w.message + "\n";
    return text;
}

}  // namespace

std::string summaryText(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s)
{
    return heading(m, r, s) + jointSection(m, r, s) + driverSection(m, r, s) + groundSection(m, r, s) +
           transmissionSection(m, r, s) + energySection(s) + warningSection(r) + "\n" + kCaution;
}

}  // namespace clevis
