#include "core/results/bar_sizing.h"

#include "core/results/number_text.h"

#include <cmath>

namespace clevis {
namespace {

SectionSizing sectionOf(const Mechanism& doc, const BarSection& s)
{
    SectionSizing out;
    out.width = s.width;
    out.thickness = s.thickness;
    out.area = s.width * s.thickness;
    out.inPlaneInertia = s.thickness * s.width * s.width * s.width / 12.0;
    out.outOfPlaneInertia = s.width * s.thickness * s.thickness * s.thickness / 12.0;
    if (const auto material = namedMaterial(doc.materials, s.material, s.density)) {
        out.material = material->name;
        out.youngsModulus = material->youngsModulus;
        out.yieldStrength = material->yieldStrength;
    }
    if (s.allowableStress) out.allowable = s.allowableStress;
    if (s.safetyFactor && out.yieldStrength) {
        out.safetyFactor = s.safetyFactor;
        out.allowable = *out.yieldStrength / *s.safetyFactor;
    }
    return out;
}

void stressFigures(SectionSizing& s, const BarEnvelope& env, std::vector<std::string>& notes)
{
    s.shearStress = env.shear;
    s.shearStress.value /= s.area;
    s.governing =
        std::abs(env.fibreCompression.value) > env.fibreTension.value ? env.fibreCompression : env.fibreTension;
    if (s.allowable) s.utilisation = std::abs(s.governing.value) / *s.allowable;
    else
        notes.push_back(
            "no utilisation: give the section allowable_stress, or a material with a yield strength "
            "and safety_factor");
}

void bucklingFigures(SectionSizing& s, const BarEnvelope& env, double length, std::vector<std::string>& notes)
{
    const double rMin = std::sqrt(std::min(s.inPlaneInertia, s.outOfPlaneInertia) / s.area);
    s.slenderness = length / rMin;
    if (!s.youngsModulus) {
        notes.push_back("no Euler load: the section's material (with its Young's modulus) is not known");
        return;
    }
    const double e = *s.youngsModulus, k = M_PI * M_PI * e / (length * length);
    s.eulerInPlane = k * s.inPlaneInertia;
    s.eulerOutOfPlane = k * s.outOfPlaneInertia;
    s.bucklingRatio = -env.compression.value / std::min(*s.eulerInPlane, *s.eulerOutOfPlane);
    if (s.yieldStrength) s.eulerLimit = M_PI * std::sqrt(2.0 * e / *s.yieldStrength);
    if (env.compression.step >= 0 && s.eulerLimit && s.slenderness < *s.eulerLimit)
        notes.push_back("slenderness L/r = " + significant(s.slenderness, 3) + " is below " +
                        significant(*s.eulerLimit, 3) +
                        " (common practice: where Johnson's parabola meets Euler's curve for this material): "
                        "Euler's load over-estimates the strength of so stocky a bar; check it by a column curve");
}

}  // namespace

bool nearSingular(const CycleResult& r, const EnvelopePeak& peak)
{
    return peak.step >= 0 && r.steps[std::size_t(peak.step)].nearSingular;
}

SizingResult sizeBars(const Mechanism& doc, const CompiledMechanism& m, const CycleResult& r)
{
    BarList list = findBars(doc, m);
    const std::vector<BarEnvelope> envelopes = barEnvelopes(m, r, list.bars);
    SizingResult out;
    out.others = std::move(list.others);
    for (std::size_t b = 0; b < list.bars.size(); ++b) {
        const BarModel& bar = list.bars[b];
        BarSizing sized;
        sized.body = bar.body;
        sized.name = bar.bodyName;
        sized.length = bar.length;
        sized.envelope = envelopes[b];
        const Body& body = doc.bodies[std::size_t(bar.body)];
        if (body.section) {
            sized.section = sectionOf(doc, *body.section);
            stressFigures(*sized.section, sized.envelope, sized.notes);
            bucklingFigures(*sized.section, sized.envelope, bar.length, sized.notes);
        } else {
            sized.notes.push_back(body.mass || body.inertia ? "no stresses: the body has typed-in mass and no section"
                                                            : "no stresses: the body has no section");
        }
        out.bars.push_back(std::move(sized));
    }
    return out;
}

SizingResult sizeParts(const Mechanism& doc, const CompiledMechanism& m, const CycleResult& r)
{
    SizingResult out = sizeBars(doc, m, r);
    out.pins = sizePins(doc, m, r);
    return out;
}

}  // namespace clevis
