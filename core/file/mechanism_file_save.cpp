// Writing mechanism files: the inverse of the reader, key for key, with
// optional values left out when they are absent and motions always in the
// long form.
#include "core/file/mechanism_file.h"

#include "core/file/json_layout.h"
#include "core/file/mechanism_file_format.h"

namespace clevis {
namespace {

// Ordered, so that a saved file lists keys as a person would write them.
using Json = nlohmann::ordered_json;

Json point(const Vec2& v) { return Json::array({v.x(), v.y()}); }

Json values(const std::vector<double>& si, FileUnit unit)
{
    Json out = Json::array();
    for (double v : si) out.push_back(fromSi(unit, v));
    return out;
}

void put(Json& out, const KeyWithUnit& key, double si) { out[key.name] = fromSi(key.unit, si); }

Json pointRef(const BodyPointRef& r) { return {{"body", r.body}, {"at", point(r.at)}}; }

Json pointMassJson(const PointMass& p)
{
    Json out;
    if (!p.name.empty()) out["name"] = p.name;
    out["mass"] = p.mass;
    out["at"] = point(p.at);
    return out;
}

Json materialJson(const MaterialProperties& m)
{
    Json out{{"name", m.name}, {"density", m.density}};
    if (m.youngsModulus) out["youngs_modulus"] = *m.youngsModulus;
    if (m.yieldStrength) out["yield_strength"] = *m.yieldStrength;
    return out;
}

// The material's name while it still gives the density, else the density.
void putDensity(Json& out, const std::string& material, double density, const std::vector<MaterialProperties>& defined)
{
    if (namedMaterial(defined, material, density)) out["material"] = material;
    else out["density"] = density;
}

Json sectionJson(const BarSection& s, const std::vector<MaterialProperties>& defined)
{
    Json out{{"width", s.width}, {"thickness", s.thickness}};
    putDensity(out, s.material, s.density, defined);
    if (s.ends) out["ends"] = Json::array({point(s.ends->first), point(s.ends->second)});
    if (s.allowableStress) out["allowable_stress"] = *s.allowableStress;
    if (s.safetyFactor) out["safety_factor"] = *s.safetyFactor;
    return out;
}

Json plateJson(const PlateSection& p, const std::vector<MaterialProperties>& defined)
{
    Json out{{"thickness", p.thickness}};
    putDensity(out, p.material, p.density, defined);
    if (p.outline) {
        out["outline"] = Json::array();
        for (const Vec2& corner : *p.outline) out["outline"].push_back(point(corner));
    }
    return out;
}

Json bodyJson(const Body& b, const std::vector<MaterialProperties>& defined)
{
    Json out{{"name", b.name}};
    if (b.mass) out["mass"] = *b.mass;
    if (b.cg) out["cg"] = point(*b.cg);
    if (b.inertia) out["inertia"] = *b.inertia;
    if (b.section) out["section"] = sectionJson(*b.section, defined);
    if (b.plate) out["plate"] = plateJson(*b.plate, defined);
    if (!b.pointMasses.empty()) {
        out["point_masses"] = Json::array();
        for (const PointMass& p : b.pointMasses) out["point_masses"].push_back(pointMassJson(p));
    }
    return out;
}

// Shear planes are written even at their default of 1, as the house writes
// defaults out; an absent bearing length stays absent (it follows the bodies).
Json pinJson(const PinData& p)
{
    Json out{{"diameter", p.diameter}, {"shear_planes", p.shearPlanes}};
    if (p.bearingLength) out["bearing_length"] = *p.bearingLength;
    if (p.allowableShear) out["allowable_shear_stress"] = *p.allowableShear;
    if (p.allowablePressure) out["allowable_pressure"] = *p.allowablePressure;
    if (p.allowablePv) out["allowable_pv"] = *p.allowablePv;
    return out;
}

Json jointJson(const Joint& j)
{
    Json out{{"name", j.name},
             {"type", jointTypeName(j.type)},
             {"bodies", Json::array({j.bodies[0], j.bodies[1]})},
             {"at", point(j.at)}};
    if (j.type != JointType::Pin) out["axis_deg"] = j.axisDeg;
    if (j.pin) out["pin"] = pinJson(*j.pin);  // on a slider too, for the reader to refuse
    return out;
}

Json motionJson(const Motion& motion, const DriverKeys& keys)
{
    Json out;
    if (const auto* c = std::get_if<ConstantSpeed>(&motion)) {
        out["law"] = "constant_speed";
        put(out, keys.speed, c->speed);
        put(out, keys.accel, c->accel);
    } else if (const auto* r = std::get_if<Rise>(&motion)) {
        out["law"] = camLawName(r->law);
        put(out, keys.from, r->from);
        put(out, keys.to, r->to);
        out["start_s"] = r->start;
        if (r->end) out["end_s"] = *r->end;
    } else {
        const auto& t = std::get<MotionTable>(motion);
        out["law"] = "table";
        out["time_s"] = t.time;
        out[keys.position.name] = values(t.position, keys.position.unit);
    }
    return out;
}

// Efficiency and inertias are written even at their defaults, as the house
// writes defaults out.
Json gearboxJson(const Gearbox& g)
{
    return {{"ratio", g.ratio},
            {"efficiency", g.efficiency},
            {"motor_inertia", g.motorInertia},
            {"gearbox_inertia", g.gearboxInertia}};
}

Json motorJson(const MotorCharacteristic& motor)
{
    if (const auto* line = std::get_if<MotorLine>(&motor)) {
        Json out{{"stall_torque", line->stallTorque}};
        put(out, kMotorNoLoadSpeed, line->noLoadSpeed);
        return out;
    }
    const auto& t = std::get<MotorTable>(motor);
    return {{"table", {{kMotorSpeed.name, values(t.speed, kMotorSpeed.unit)}, {"torque", t.torque}}}};
}

Json cylinderJson(const Cylinder& c)
{
    Json out{{"bore", c.bore}, {"rod", c.rod}};
    if (c.supplyPressure) out["supply_pressure"] = *c.supplyPressure;
    return out;
}

// Written whatever the driver's type, for the reader to refuse what does not apply.
void putDriveTrain(Json& out, const Driver& d)
{
    if (d.gearbox) out["gearbox"] = gearboxJson(*d.gearbox);
    if (d.motor) out["motor"] = motorJson(*d.motor);
    if (d.flywheel)
        out["flywheel"] = {{"inertia", d.flywheel->inertia}, {"on", nameOf(kFlywheelShafts, d.flywheel->on)}};
    if (d.fluctuationTarget) out["fluctuation_target"] = *d.fluctuationTarget;
    if (d.cylinder) out["cylinder"] = cylinderJson(*d.cylinder);
}

Json driverJson(const Driver& d)
{
    const DriverKeys& keys = driverKeysOf(d.type);
    Json out{{"name", d.name}, {"type", nameOf(kDriverTypes, d.type)}};
    if (d.ends[0] && d.ends[1]) {
        out["between"] = Json::array();
        for (std::size_t side = 0; side < 2; ++side) {
            Json end = pointRef(*d.ends[side]);
            if (d.endPins[side]) end["pin"] = pinJson(*d.endPins[side]);
            out["between"].push_back(end);
        }
    } else {
        out["joint"] = d.joint;
        put(out, keys.offset, d.offset);
    }
    out["motion"] = motionJson(d.motion, keys);
    putDriveTrain(out, d);
    return out;
}

// Positions are written in the unit of the driver they follow (SI when the
// driver is unknown, as the file would not load anyway).
Json profileJson(const LoadProfile& p, const std::vector<Driver>& drivers)
{
    Json out;
    if (p.driver.empty()) {
        out["time_s"] = p.at;
    } else {
        const Driver* d = findDriver(drivers, p.driver);
        const KeyWithUnit& at = driverKeysOf(d ? d->type : DriverType::Linear).profileAt;
        out["driver"] = p.driver;
        out[at.name] = values(p.at, at.unit);
    }
    out["factor"] = p.factor;
    return out;
}

Json loadHeader(const char* type, const std::string& name)
{
    Json out{{"type", type}};
    if (!name.empty()) out["name"] = name;
    return out;
}

Json betweenPoints(const char* type, const std::string& name, const BodyPointRef& a, const BodyPointRef& b)
{
    Json out = loadHeader(type, name);
    out["a"] = pointRef(a);
    out["b"] = pointRef(b);
    return out;
}

class LoadWriter {
public:
    explicit LoadWriter(const std::vector<Driver>& drivers) : drivers_(drivers) {}

    Json operator()(const ForceLoad& f) const
    {
        Json out = loadHeader("force", f.name);
        out["body"] = f.point.body;
        out["at"] = point(f.point.at);
        out["force"] = point(f.force);
        out["turns_with_body"] = f.turnsWithBody;
        if (f.profile) out["profile"] = profileJson(*f.profile, drivers_);
        return out;
    }
    Json operator()(const TorqueLoad& t) const
    {
        Json out = loadHeader("torque", t.name);
        out["body"] = t.body;
        out["torque"] = t.torque;
        if (t.profile) out["profile"] = profileJson(*t.profile, drivers_);
        return out;
    }
    Json operator()(const SpringLoad& s) const
    {
        Json out = betweenPoints("spring", s.name, s.a, s.b);
        out["stiffness"] = s.stiffness;
        out["free_length"] = s.freeLength;
        return out;
    }
    Json operator()(const DamperLoad& d) const
    {
        Json out = betweenPoints("damper", d.name, d.a, d.b);
        out["damping"] = d.damping;
        return out;
    }
    Json operator()(const TorsionSpringLoad& t) const
    {
        Json out = loadHeader("torsion_spring", t.name);
        out["joint"] = t.joint;
        out["stiffness"] = t.stiffness;
        put(out, kTorsionFreeAngle, t.freeAngle);
        return out;
    }

private:
    const std::vector<Driver>& drivers_;
};

template <class Item, class Write>
Json list(const std::vector<Item>& items, Write write)
{
    Json out = Json::array();
    for (const Item& item : items) out.push_back(write(item));
    return out;
}

// −0 arises from arithmetic on coordinates (a point mirrored about an axis,
// an angle of −0°); it means 0 and a person reading the file should see 0.
void clearNegativeZeros(Json& j)
{
    if (j.is_number_float() && j.get<double>() == 0.0) j = 0.0;
    else if (j.is_structured())
        for (Json& child : j) clearNegativeZeros(child);
}

Json document(const Mechanism& m)
{
    Json out{{"clevis", kFileVersion}};
    if (!m.name.empty()) out["name"] = m.name;
    out["gravity"] = m.gravity == Vec2::Zero() ? Json(false) : point(m.gravity);
    if (!m.materials.empty()) out["materials"] = list(m.materials, materialJson);
    out["bodies"] = list(m.bodies, [&](const Body& b) { return bodyJson(b, m.materials); });
    out["joints"] = list(m.joints, jointJson);
    out["drivers"] = list(m.drivers, driverJson);
    out["cycle"] = {{"steps", m.cycle.steps}};
    if (m.cycle.duration) out["cycle"]["duration_s"] = *m.cycle.duration;
    const LoadWriter writeLoad(m.drivers);
    out["loads"] = list(m.loads, [&](const Load& l) { return std::visit(writeLoad, l); });
    clearNegativeZeros(out);
    return out;
}

}  // namespace

nlohmann::json mechanismToJson(const Mechanism& m) { return nlohmann::json(document(m)); }

std::string saveMechanismText(const Mechanism& m) { return layoutJson(document(m)); }

}  // namespace clevis
