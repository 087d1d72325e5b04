#include "core/results/sizing_text.h"

#include "core/results/drive_units.h"
#include "core/results/number_text.h"

#include <cmath>

namespace clevis {
namespace {

const char* const kSizingCaution =
    "Utilisation is the peak stress over the cycle divided by the allowable you gave: a figure to\n"
    "compare, not a verdict that a part is safe. It is for rigid bodies and ideal joints, leaves out\n"
    "dynamic and service factors, fatigue, stress concentrations at holes and the pins and bearings\n"
    "themselves. Check each part under the codes that apply where the machine is built and used,\n"
    "and have the design reviewed by a licensed engineer.\n";

// "at s = 0.12 m, motor = 212.00°", marked when the step is near singular.
std::string where(const CompiledMechanism& m, const CycleResult& r, const EnvelopePeak& p)
{
    const StepResult& s = r.steps[std::size_t(p.step)];
    std::string text = "at s = " + significant(p.s) + " m, ";
    if (m.drivers.empty()) text += "t = " + significant(s.t) + " s";
    for (std::size_t d = 0; d < m.drivers.size(); ++d)
        text += (d ? ", " : "") + formatDrivePosition(m.drivers[d], s.drivePosition[d]);
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
    return text + kSizingCaution;
}

}  // namespace clevis
