#include "core/results/sizing_text.h"

#include "core/results/drive_units.h"
#include "core/results/number_text.h"
#include "core/results/summary_text.h"
#include "core/results/text_table.h"

#include <cmath>

namespace clevis {
namespace {

const char* const kSizingCaution =
    "Utilisation is the peak stress over the cycle divided by the allowable you gave: a figure to\n"
    "compare, not a verdict that a part is safe. It is for rigid bodies and ideal joints, leaves out\n"
    "dynamic and service factors, fatigue and stress concentrations at holes; for pins, the bending\n"
    "of the pin, the lug round it, fit and clearance, lubrication and wear life. Check each part\n"
    "under the codes that apply where the machine is built and used, and have the design reviewed\n"
    "by a licensed engineer.\n";

// "motor = 212.00°" (every driver), or the time when nothing drives.
std::string drivePlace(const CompiledMechanism& m, const StepResult& s)
{
    if (m.drivers.empty()) return "t = " + significant(s.t) + " s";
    std::string text;
    for (std::size_t d = 0; d < m.drivers.size(); ++d)
        text += (d ? ", " : "") + formatDrivePosition(m.drivers[d], s.drivePosition[d]);
    return text;
}

// "at s = 0.12 m, motor = 212.00°", marked when the step is near singular.
std::string where(const CompiledMechanism& m, const CycleResult& r, const EnvelopePeak& p)
{
    const StepResult& s = r.steps[std::size_t(p.step)];
    std::string text = "at s = " + significant(p.s) + " m, " + drivePlace(m, s);
    if (s.nearSingular) text += "  [near a singular position: not trustworthy]";
    return text;
}

std::string line(const CompiledMechanism& m, const CycleResult& r, const char* what, const EnvelopePeak& p,
                 double scale, const char* unit)
{
    std::string text = "    " + std::string(what);
    text.resize(std::max<std::size_t>(text.size(), 34), ' ');
    if (p.step < 0) return text + "none\n";
    return text + significant(p.value * scale) + " " + unit + "  " + where(m, r, p) + "\n";
}

std::string materialText(const SectionSizing& s)
{
    std::string text = significant(s.width * 1e3) + " × " + significant(s.thickness * 1e3) + " mm, ";
    if (s.material.empty()) return text + "material not named (density only)";
    text += s.material;
    if (s.youngsModulus) text += ", E = " + significant(*s.youngsModulus * 1e-9) + " GPa";
    text += s.yieldStrength ? ", yield " + significant(*s.yieldStrength * 1e-6) + " MPa" : ", no yield strength";
    return text;
}

std::string allowableText(const SectionSizing& s)
{
    if (!s.allowable) return "";
    std::string text = "allowable " + significant(*s.allowable * 1e-6) + " MPa";
    if (s.safetyFactor)
        text += " (yield " + significant(*s.yieldStrength * 1e-6) + " MPa / " + significant(*s.safetyFactor) + ")";
    return text;
}

// ---- pins ----

const char* const kPinHeading =
    "Sizing of pins and bearings (mean pin shear τ = |F|/(n·π·d²/4), projected bearing pressure\n"
    "p = |F|/(d·l), p·v with sliding speed v = |ω₂ − ω₁|·d/2; utilisation U = figure / your allowable)\n";

// A peak's value in `unit` (scaled from SI), marked when its step is near singular.
std::string pinValue(const CycleResult& r, const EnvelopePeak& p, double scale, const char* unit)
{
    if (p.step < 0) return "–";
    return significant(p.value * scale) + " " + unit + (nearSingular(r, p) ? std::string(" ") + kNearToggleMark : "");
}

std::string utilisationCell(const std::optional<double>& u) { return u ? significant(*u, 3) : "–"; }

std::string stepPlace(const CompiledMechanism& m, const CycleResult& r, const EnvelopePeak& p)
{
    return p.step < 0 ? "" : "at " + drivePlace(m, r.steps[std::size_t(p.step)]);
}

std::string lengthCell(const PinSizing& p)
{
    if (!p.bearing) return "–";
    const std::string mm = significant(p.bearing->length * 1e3) + " mm";
    return p.bearing->fromBody.empty() ? mm : mm + " (" + p.bearing->fromBody + ")";
}

// Two tables: the pin and its load (τ and p peak with |F|), then p·v, which
// peaks where the product does; one wide table would not fit a terminal.
std::string pinsText(const CompiledMechanism& m, const CycleResult& r, const std::vector<PinSizing>& pins)
{
    using Align = TextTable::Align;
    const Align L = Align::Left, R = Align::Right;
    TextTable load({L, R, L, L, R, L, R, R, R, R});
    load.addRow({"Joint", "d", "Shear", "l", "Peak |F|", "", "τ", "U τ", "p", "U p"});
    TextTable pv({L, R, R, R, L});
    pv.addRow({"Joint", "Peak p·v", "U p·v", "v there", ""});
    bool bare = false, sized = false, flagged = false;
    std::string notes;
    for (const PinSizing& p : pins) {
        flagged |= nearSingular(r, p.force) || nearSingular(r, p.pv);
        if (!p.pin) {
            bare = true;
            load.addRow({p.name, "no pin data", "", "", pinValue(r, p.force, 1.0, "N"), stepPlace(m, r, p.force)});
            continue;
        }
        sized = true;
        load.addRow({p.name, significant(p.pin->diameter * 1e3) + " mm", p.pin->shearPlanes == 2 ? "double" : "single",
                     lengthCell(p), pinValue(r, p.force, 1.0, "N"), stepPlace(m, r, p.force),
                     pinValue(r, p.shearStress, 1e-6, "MPa"), utilisationCell(p.shearUtilisation),
                     pinValue(r, p.pressure, 1e-6, "MPa"), utilisationCell(p.pressureUtilisation)});
        pv.addRow({p.name, pinValue(r, p.pv, 1e-6, "MPa·m/s"), utilisationCell(p.pvUtilisation),
                   p.pv.step < 0 ? "–" : significant(p.speedAtPv) + " m/s", stepPlace(m, r, p.pv)});
        for (const auto& note : p.notes) notes += "  note, \"" + p.name + "\": " + note + "\n";
    }
    std::string text = std::string(kPinHeading) + load.render();
    if (sized) text += "\n" + pv.render();
    text += notes;
    if (bare)
        text +=
            "  A joint with no pin data shows its peak force only: give it a \"pin\" (diameter, allowables) "
            "to size it\n  (a cylinder's end: in its \"between\" point).\n";
    if (flagged)
        text +=
            "  " + std::string(kNearToggleMark) + " the peak is at a step near a singular position: not trustworthy.\n";
    text +=
        "  l: the bearing length given, or (in brackets) the body whose section or plate thickness it is;\n"
        "  τ and p peak with |F|; v is the sliding speed where p·v peaks.\n";
    return text;
}

}  // namespace

std::string sizingText(const CompiledMechanism& m, const CycleResult& r, const SizingResult& s)
{
    std::string text = "Sizing of bars (internal loads, fibre stress σ = N/A ± M/Z, Euler buckling with pinned ends)\n";
    for (const BarSizing& b : s.bars) {
        text += "  \"" + b.name + "\", L = " + significant(b.length) + " m";
        text += b.section ? ": " + materialText(*b.section) + "\n" : "\n";
        const BarEnvelope& e = b.envelope;
        text += line(m, r, "largest tension N", e.tension, 1.0, "N");
        text += line(m, r, "largest compression N", e.compression, 1.0, "N");
        text += line(m, r, "largest |V|", e.shear, 1.0, "N");
        text += line(m, r, "largest |M|", e.moment, 1.0, "N·m");
        if (const auto& sec = b.section) {
            text += line(m, r, "largest fibre stress, tension", e.fibreTension, 1e-6, "MPa");
            text += line(m, r, "largest fibre stress, compr.", e.fibreCompression, 1e-6, "MPa");
            text += line(m, r, "largest mean shear stress V/A", sec->shearStress, 1e-6, "MPa");
            if (sec->utilisation) {
                std::string u = "    utilisation                   " + significant(*sec->utilisation, 3) + " of " +
                                allowableText(*sec);
                if (sec->governing.step >= 0) u += ", " + where(m, r, sec->governing);
                text += u + "\n";
            }
            if (sec->eulerInPlane) {
                text += "    Euler load, pinned ends       " + significant(*sec->eulerInPlane * 1e-3) +
                        " kN in plane, " + significant(*sec->eulerOutOfPlane * 1e-3) +
                        " kN out of plane; slenderness L/r = " + significant(sec->slenderness, 3) + "\n";
                text += "    compression / Euler load      ";
                if (b.envelope.compression.step < 0) text += "0 (never in compression)";
                else text += significant(*sec->bucklingRatio, 3) + "  " + where(m, r, b.envelope.compression);
                text += "\n";
            }
        }
        for (const auto& note : b.notes) text += "    note: " + note + "\n";
    }
    for (const NotABar& o : s.others) text += "  \"" + o.bodyName + "\": not a bar: " + o.reason + "\n";
    if (!s.pins.empty()) text += "\n" + pinsText(m, r, s.pins);
    return text + kSizingCaution;
}

}  // namespace clevis
