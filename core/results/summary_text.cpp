#include "core/results/summary_text.h"

#include "core/model/type_names.h"
#include "core/results/cylinder_ends.h"
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

// A peak's value with its unit, marked when its step is near a singular position.
std::string peakValue(const PeakAt& peak, const char* unit)
{
    return quantity(peak.value, unit) + (peak.nearSingular ? std::string(" ") + kNearToggleMark : "");
}

// The larger value at a flagged step, with where it occurs, or blanks.
std::vector<std::string> flaggedCells(const CompiledMechanism& m, const CycleResult& r, const Peak& p, const char* unit)
{
    if (p.flagged.step < 0) return {"", ""};
    return {peakValue(p.flagged, unit), at(m, r, p.flagged)};
}

bool anyFlagged(std::initializer_list<const Peak*> peaks)
{
    for (const Peak* p : peaks)
        if (p->flagged.step >= 0) return true;
    return false;
}

const char* const kFlaggedHeading = "Larger, near a toggle";

// An RMS, mean or work integrates over every solved step, the unreliable ones
// included: marked whenever there are any.
std::string overCycle(const CycleSummary& s, double value, const char* unit)
{
    return quantity(value, unit) + (s.nearSingularSteps > 0 ? std::string(" ") + kNearToggleMark : "");
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
                " steps are near a singular position: the reactions there are unreliable. Peaks below are\n"
                "  taken over the other steps; a larger value at a flagged step is shown apart and marked " +
                kNearToggleMark + ".\n  RMS, mean and work include those steps and are marked " + kNearToggleMark +
                " too.\n";
    for (const auto& t : s.toggles) text += "  " + std::string(kNearToggleMark) + " " + toggleText(m, t) + ".\n";
    return text;
}

// The joints, then the pins at cylinders' ends (cylinder_ends.h), which
// carry a force only.
std::string jointSection(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s)
{
    TextTable t({Align::Left, Align::Left, Align::Right, Align::Left, Align::Right, Align::Right, Align::Left});
    std::vector<std::string> header{"Joint", "Type", "Peak |F|", "", "RMS |F|"};
    bool sliders = false, flagged = false;
    for (std::size_t j = 0; j < s.joints.size(); ++j) {
        sliders |= m.joints[j].type == JointType::Slider;
        flagged |= anyFlagged({&s.joints[j].peak, &s.joints[j].peakMoment});
    }
    for (const JointSummary& end : s.cylinderEnds) flagged |= anyFlagged({&end.peak});
    if (sliders) header.insert(header.end(), {"Peak |M|", ""});
    if (flagged) header.insert(header.end(), {kFlaggedHeading, ""});
    t.addRow(header);
    const auto addRow = [&](const JointSummary& js, const std::string& type, bool slider) {
        std::vector<std::string> row{js.name, type, peakValue(js.peak, "N"), at(m, r, js.peak),
                                     overCycle(s, js.rms, "N")};
        if (slider) row.insert(row.end(), {peakValue(js.peakMoment, "N·m"), at(m, r, js.peakMoment)});
        else if (sliders) row.insert(row.end(), {"", ""});
        if (flagged) {
            const auto cells = js.peak.flagged.step >= 0 || !slider ? flaggedCells(m, r, js.peak, "N")
                                                                    : flaggedCells(m, r, js.peakMoment, "N·m");
            row.insert(row.end(), cells.begin(), cells.end());
        }
        t.addRow(row);
    };
    for (std::size_t j = 0; j < s.joints.size(); ++j)
        addRow(s.joints[j], jointTypeName(m.joints[j].type), m.joints[j].type == JointType::Slider);
    for (const JointSummary& end : s.cylinderEnds) addRow(end, kCylinderEndType, false);
    std::string text = "\nJoint loads (force between the two bodies; RMS weighted over time)\n" + t.render();
    if (!s.cylinderEnds.empty())
        text +=
            "  A cylinder end is the pin between the cylinder and the body there (.cap: the driver's first point).\n";
    return text;
}

std::string driverSection(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s)
{
    bool flaggedEffort = false, flaggedPower = false, flaggedRegen = false;
    for (const auto& d : s.drivers) {
        flaggedEffort |= anyFlagged({&d.peak});
        flaggedPower |= anyFlagged({&d.peakPower});
        flaggedRegen |= anyFlagged({&d.peakRegenerative});
    }
    TextTable effort(
        {Align::Left, Align::Right, Align::Left, Align::Right, Align::Right, Align::Right, Align::Right, Align::Left});
    std::vector<std::string> effortHeader{"Driver", "Peak effort", "", "RMS", "Mean", "Work"};
    if (flaggedEffort) effortHeader.insert(effortHeader.end(), {kFlaggedHeading, ""});
    effort.addRow(effortHeader);
    TextTable power({Align::Left, Align::Right, Align::Left, Align::Right, Align::Left, Align::Right, Align::Left,
                     Align::Right, Align::Left});
    std::vector<std::string> powerHeader{"Driver", "Peak power", "", "Peak regenerative", ""};
    if (flaggedPower) powerHeader.insert(powerHeader.end(), {"Larger power, near a toggle", ""});
    if (flaggedRegen) powerHeader.insert(powerHeader.end(), {"Larger regenerative, near a toggle", ""});
    power.addRow(powerHeader);
    for (const auto& d : s.drivers) {
        const char* unit = effortUnit(d.type);
        std::vector<std::string> e{d.name,
                                   peakValue(d.peak, unit),
                                   at(m, r, d.peak),
                                   overCycle(s, d.rms, unit),
                                   overCycle(s, d.mean, unit),
                                   overCycle(s, d.work, "J")};
        if (flaggedEffort) {
            const auto cells = flaggedCells(m, r, d.peak, unit);
            e.insert(e.end(), cells.begin(), cells.end());
        }
        effort.addRow(e);
        std::vector<std::string> p{
            d.name, d.peakPower.step < 0 ? "none" : peakValue(d.peakPower, "W"), at(m, r, d.peakPower),
            d.peakRegenerative.step < 0 ? "none" : peakValue(d.peakRegenerative, "W"), at(m, r, d.peakRegenerative)};
        for (const auto& [shown, peak] : {std::pair{flaggedPower, &d.peakPower}, {flaggedRegen, &d.peakRegenerative}})
            if (shown) {
                const auto cells = flaggedCells(m, r, *peak, "W");
                p.insert(p.end(), cells.begin(), cells.end());
            }
        power.addRow(p);
    }
    return "\nDrivers (effort on the driven body, positive along the driver's coordinate)\n" + effort.render() +
           "\nDriver power (regenerative: the mechanism drives the motor)\n" + power.render();
}

std::string groundSection(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s)
{
    TextTable t({Align::Left, Align::Right, Align::Left, Align::Right, Align::Left});
    const auto row = [&](const char* name, const Peak& p, const char* unit) {
        std::vector<std::string> cells{name, peakValue(p, unit), at(m, r, p)};
        if (p.flagged.step >= 0)
            cells.insert(cells.end(), {"larger near a toggle: " + peakValue(p.flagged, unit), at(m, r, p.flagged)});
        t.addRow(cells);
    };
    row("Peak shaking force", s.groundForce, "N");
    row("Peak shaking moment about the origin", s.groundMoment, "N·m");
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

// A term of the energy balance, or "≈ 0 J" below a small share of the
// energy passing through (the same terms the report's figure leaves out).
std::string energyTerm(double value, const EnergyBalance& e)
{
    return negligibleEnergy(value, e) ? "≈ 0 J" : quantity(value, "J");
}

std::string energySection(const CycleSummary& s)
{
    const EnergyBalance& e = s.energy;
    TextTable drivers({Align::Left, Align::Right, Align::Right, Align::Right});
    drivers.addRow({"Driver", "Put in", "Taken back", "Net work"});
    for (const auto& d : s.drivers)
        drivers.addRow({d.name, energyTerm(d.workIn, e), energyTerm(d.workOut, e), energyTerm(d.work, e)});
    TextTable t({Align::Left, Align::Right});
    t.addRow({"Lost in dampers", energyTerm(e.damperWork, e)});
    t.addRow({"Work done by applied loads", energyTerm(e.loadWork, e)});
    t.addRow({"Kinetic energy gained", energyTerm(e.kineticChange, e)});
    t.addRow({"Gravity potential gained", energyTerm(e.gravityChange, e)});
    t.addRow({"Energy stored in springs", energyTerm(e.springChange, e)});
    t.addRow({"Energy through the mechanism", quantity(e.throughput, "J")});
    t.addRow({"Residual", quantity(e.residual, "J")});
    std::string text =
        "\nEnergy over the cycle (put in: where a driver's power is positive; taken back: where it is negative)\n" +
        drivers.render() + t.render();
    if (e.throughput <= kNegligibleEnergy)
        return text +
               "  No work passes through the mechanism over the cycle: the energy balance has nothing to check.\n";
    text += "  Energy balance closes to " + percent(e.relativeResidual) +
            " of the work through the cycle (terms under " + percent(kNegligibleEnergyShare) +
            " of it are shown as ≈ 0).\n";
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

std::string toggleText(const CompiledMechanism& m, const NearToggle& t)
{
    std::string text = "near a toggle: ";
    if (t.bodies[0] == kGround) text += "the mechanism locks";
    else if (t.bodies[1] == kGround) text += m.bodyName(t.bodies[0]) + " locks";
    else text += m.bodyName(t.bodies[0]) + " and " + m.bodyName(t.bodies[1]) + " line up";
    if (t.joint >= 0)
        text += std::string(" at ") + jointTypeName(m.joints[t.joint].type) + " " + m.joints[t.joint].name;
    text += t.first == t.last ? " (step " + std::to_string(t.first) + ")"
                              : " (steps " + std::to_string(t.first) + "–" + std::to_string(t.last) + ")";
    return text;
}

const NearToggle* toggleAt(const CycleSummary& s, int step)
{
    for (const auto& t : s.toggles)
        if (step >= t.first && step <= t.last) return &t;
    return nullptr;
}

std::string summaryText(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s)
{
    return heading(m, r, s) + jointSection(m, r, s) + driverSection(m, r, s) + groundSection(m, r, s) +
           transmissionSection(m, r, s) + energySection(s) + warningSection(r) + "\n" + kCaution;
}

}  // namespace clevis
