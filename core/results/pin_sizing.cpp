#include "core/results/pin_sizing.h"

#include <cmath>

namespace clevis {
namespace {

// The thickness of a body's section or plate; none for ground, a massless
// body or typed-in mass.
std::optional<double> thicknessOf(const Mechanism& doc, const std::string& name)
{
    for (const Body& b : doc.bodies) {
        if (b.name != name) continue;
        if (b.section) return b.section->thickness;
        if (b.plate) return b.plate->thickness;
    }
    return std::nullopt;
}

double angularVelocity(const StepResult& s, int body) { return body == kGround ? 0.0 : s.qd[3 * body + 2]; }

// The larger of `value` at `step` and the peak so far.
void keepLarger(EnvelopePeak& peak, double value, int step)
{
    if (peak.step < 0 || value > peak.value) peak = {value, 0.0, step};
}

void utilisationNotes(PinSizing& p)
{
    std::string missing;
    const auto need = [&](bool given, const char* key) {
        if (!given) missing += (missing.empty() ? "" : ", ") + std::string(key);
    };
    need(p.pin->allowableShear.has_value(), "allowable_shear_stress");
    need(p.pin->allowablePressure.has_value(), "allowable_pressure");
    need(p.pin->allowablePv.has_value(), "allowable_pv");
    if (!missing.empty()) p.notes.push_back("no utilisation where no allowable is given (" + missing + ")");
}

void sizeOne(PinSizing& p, const CompiledMechanism& m, const CycleResult& r)
{
    const CompiledJoint& joint = m.joints[std::size_t(p.joint)];
    const double d = p.pin ? p.pin->diameter : 0.0;
    const double shearArea = p.pin ? p.pin->shearPlanes * M_PI * d * d / 4.0 : 0.0;
    const double projected = p.bearing ? d * p.bearing->length : 0.0;
    for (std::size_t k = 0; k < r.steps.size(); ++k) {
        const StepResult& s = r.steps[k];
        const double f = s.joints[std::size_t(p.joint)].force.norm();
        keepLarger(p.force, f, int(k));
        if (!p.pin) continue;
        const double v = std::abs(angularVelocity(s, joint.body[1]) - angularVelocity(s, joint.body[0])) * d / 2.0;
        keepLarger(p.slidingSpeed, v, int(k));
        if (!p.bearing) continue;
        const double pv = f / projected * v;
        if (p.pv.step < 0 || pv > p.pv.value) p.speedAtPv = v;
        keepLarger(p.pv, pv, int(k));
    }
    if (!p.pin || p.force.step < 0) return;
    p.shearStress = {p.force.value / shearArea, 0.0, p.force.step};
    if (p.bearing) p.pressure = {p.force.value / projected, 0.0, p.force.step};
    if (p.pin->allowableShear) p.shearUtilisation = p.shearStress.value / *p.pin->allowableShear;
    if (p.bearing && p.pin->allowablePressure) p.pressureUtilisation = p.pressure.value / *p.pin->allowablePressure;
    if (p.bearing && p.pin->allowablePv) p.pvUtilisation = p.pv.value / *p.pin->allowablePv;
}

}  // namespace

std::optional<BearingLength> bearingLengthOf(const Mechanism& doc, const Joint& joint)
{
    if (joint.pin && joint.pin->bearingLength) return BearingLength{*joint.pin->bearingLength, ""};
    std::optional<BearingLength> thinnest;
    for (const std::string& body : joint.bodies)
        if (const auto t = thicknessOf(doc, body); t && (!thinnest || *t < thinnest->length))
            thinnest = BearingLength{*t, body};
    return thinnest;
}

std::vector<PinSizing> sizePins(const Mechanism& doc, const CompiledMechanism& m, const CycleResult& r)
{
    std::vector<PinSizing> out;
    for (std::size_t j = 0; j < doc.joints.size(); ++j) {
        const Joint& joint = doc.joints[j];
        if (joint.type == JointType::Slider) continue;
        PinSizing p;
        p.joint = int(j);
        p.name = joint.name;
        p.pin = joint.pin;
        if (p.pin) {
            p.bearing = bearingLengthOf(doc, joint);
            if (!p.bearing)
                p.notes.push_back(
                    "no bearing pressure or p·v: give the pin a bearing_length (neither body has a section or "
                    "plate whose thickness would give it)");
            utilisationNotes(p);
        } else {
            p.notes.push_back("no pin data: give the joint a pin (diameter, allowables) to size it");
        }
        sizeOne(p, m, r);
        out.push_back(std::move(p));
    }
    return out;
}

}  // namespace clevis
