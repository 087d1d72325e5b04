#include "core/results/pin_sizing.h"

#include "core/results/cylinder_ends.h"

#include <cmath>
#include <functional>

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

// |F| and the pin's turning in its bore, |ω₂ − ω₁|, at a step.
struct PinMotion {
    std::function<double(const StepResult&)> force, relativeRate;
};

void sizeOne(PinSizing& p, const CycleResult& r, const PinMotion& at)
{
    const double d = p.pin ? p.pin->diameter : 0.0;
    const double shearArea = p.pin ? p.pin->shearPlanes * M_PI * d * d / 4.0 : 0.0;
    const double projected = p.bearing ? d * p.bearing->length : 0.0;
    for (std::size_t k = 0; k < r.steps.size(); ++k) {
        const StepResult& s = r.steps[k];
        const double f = at.force(s);
        keepLarger(p.force, f, int(k));
        if (!p.pin) continue;
        const double v = at.relativeRate(s) * d / 2.0;
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

// The bearing length of a pin: the user's, else the thinnest thickness
// among the bodies it goes through that have a section or a plate.
std::optional<BearingLength> bearingLength(const Mechanism& doc, const std::optional<PinData>& pin,
                                           const std::vector<std::string>& bodies)
{
    if (pin && pin->bearingLength) return BearingLength{*pin->bearingLength, ""};
    return thinnestThickness(doc, bodies);
}

// The pin's data, bearing and notes; without data, only its force is sized.
void describe(PinSizing& p, const Mechanism& doc, const std::optional<PinData>& pin,
              const std::vector<std::string>& bodies, const char* noLengthWhy, const char* noPinWhy)
{
    p.pin = pin;
    if (!p.pin) {
        p.notes.push_back(noPinWhy);
        return;
    }
    p.bearing = bearingLength(doc, p.pin, bodies);
    if (!p.bearing) p.notes.push_back(noLengthWhy);
    utilisationNotes(p);
}

}  // namespace

std::optional<BearingLength> thinnestThickness(const Mechanism& doc, const std::vector<std::string>& bodies)
{
    std::optional<BearingLength> thinnest;
    for (const std::string& body : bodies)
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
        describe(p, doc, joint.pin, {joint.bodies[0], joint.bodies[1]},
                 "no bearing pressure or p·v: give the pin a bearing_length (neither body has a section or "
                 "plate whose thickness would give it)",
                 "no pin data: give the joint a pin (diameter, allowables) to size it");
        const CompiledJoint& cj = m.joints[j];
        sizeOne(p, r,
                {[j](const StepResult& s) { return s.joints[j].force.norm(); },
                 [&cj](const StepResult& s) {
                     return std::abs(angularVelocity(s, cj.body[1]) - angularVelocity(s, cj.body[0]));
                 }});
        out.push_back(std::move(p));
    }
    // A cylinder's end pin turns in the body there as the body turns against
    // the cylinder's line; the cylinder's own lug thickness is not known.
    const std::vector<CylinderEnd> ends = cylinderEnds(m);
    for (std::size_t e = 0; e < ends.size(); ++e) {
        const CylinderEnd& end = ends[e];
        const Driver& driver = doc.drivers[std::size_t(end.driver)];
        PinSizing p;
        p.cylinderEnd = int(e);
        p.name = end.name;
        describe(p, doc, driver.endPins[int(end.side)], {driver.ends[int(end.side)]->body},
                 "no bearing pressure or p·v: give the pin a bearing_length (the body at this end has no section "
                 "or plate whose thickness would give it)",
                 "no pin data: give this end of the cylinder a pin (diameter, allowables) to size it");
        sizeOne(p, r,
                {[&m, end](const StepResult& s) { return endReaction(m, s, end).force.norm(); },
                 [&m, end](const StepResult& s) {
                     return std::abs(angularVelocity(s, end.body) - cylinderRate(m, s, end.driver));
                 }});
        out.push_back(std::move(p));
    }
    return out;
}

}  // namespace clevis
