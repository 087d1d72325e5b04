// Reading mechanism files: every value is checked for type and range where
// it stands, so that an error names its path.
#include "core/file/mechanism_file.h"

#include "core/file/json_reader.h"
#include "core/file/mechanism_file_format.h"
#include "core/model/materials.h"
#include "core/model/model_limits.h"

#include <cerrno>
#include <cstring>
#include <filesystem>
#include <fstream>
#include <map>
#include <tuple>

namespace clevis {
namespace {

constexpr std::size_t kMaxFileBytes = 16 * 1024 * 1024;

// Names must be unique within each list; remembers where each was first used.
class NameRegister {
public:
    void add(const std::string& name, const JsonNode& item)
    {
        const auto [first, added] = firstUse_.emplace(name, item.path());
        if (!added)
            throw ModelError(item.keyPath("name"), "duplicate name \"" + name + "\" (also " + first->second + ")");
    }
    bool contains(const std::string& name) const { return firstUse_.contains(name); }

private:
    std::map<std::string, std::string> firstUse_;
};

double quantity(const JsonNode& node, const KeyWithUnit& key) { return toSi(key.unit, node.at(key.name).number()); }

double quantityOr(const JsonNode& node, const KeyWithUnit& key, double fallback)
{
    return node.has(key.name) ? quantity(node, key) : fallback;
}

std::vector<double> quantities(const JsonNode& values, FileUnit unit)
{
    std::vector<double> out = values.numbers();
    for (double& v : out) v = toSi(unit, v);
    return out;
}

std::vector<double> increasingQuantities(const JsonNode& values, FileUnit unit)
{
    std::vector<double> out = values.increasing();
    for (double& v : out) v = toSi(unit, v);
    return out;
}

// A table's second column, as many values as its first.
std::vector<double> pairedColumn(const JsonNode& node, const char* key, const char* firstKey, std::size_t count,
                                 FileUnit unit)
{
    const JsonNode column = node.at(key);
    std::vector<double> out = quantities(column, unit);
    if (out.size() != count)
        throw column.error("has " + std::to_string(out.size()) + " values but " + firstKey + " has " +
                           std::to_string(count));
    return out;
}

BodyPointRef readPointRef(const JsonNode& node)
{
    node.object({"body", "at"});
    return {node.at("body").name(), node.at("at").point()};
}

std::vector<JsonNode> listOf(const JsonNode& root, const char* key)
{
    return root.has(key) ? root.at(key).elements() : std::vector<JsonNode>{};
}

// ---- bodies ----

PointMass readPointMass(const JsonNode& node)
{
    node.object({"name", "mass", "at"});
    PointMass p;
    if (const auto name = node.find("name")) p.name = name->string();
    p.mass = node.at("mass").number(Bound::NonNegative);
    p.at = node.at("at").point();
    return p;
}

// The materials a file defines, each with its density and, for sizing, its
// Young's modulus and yield strength. A built-in name cannot be taken, so
// that "steel" means the same in every file.
MaterialProperties readMaterial(const JsonNode& node)
{
    node.object({"name", "density", "youngs_modulus", "yield_strength"});
    MaterialProperties m;
    const JsonNode name = node.at("name");
    m.name = name.name();
    if (materialDensity(m.name)) throw name.error("\"" + m.name + "\" is a built-in material; give yours another name");
    m.density = node.at("density").number(Bound::Positive);
    if (const auto e = node.find("youngs_modulus")) m.youngsModulus = e->number(Bound::Positive);
    if (const auto y = node.find("yield_strength")) m.yieldStrength = y->number(Bound::Positive);
    return m;
}

// The density of a section or plate, given as a number or by a material's
// name (one the file defines, or a built-in one); the name is kept.
std::pair<double, std::string> readDensity(const JsonNode& section, const std::vector<MaterialProperties>& defined)
{
    const std::string key = section.oneOf({"density", "material"});
    if (key == "density") return {section.at("density").number(Bound::Positive), ""};
    const JsonNode material = section.at("material");
    const std::string name = material.name();
    if (const auto m = findMaterial(defined, name)) return {m->density, name};
    std::string known;
    for (const auto& m : materials()) known += (known.empty() ? "" : ", ") + std::string(m.name);
    for (const auto& m : defined) known += ", " + m.name;
    throw material.error("\"" + name + "\" is not one of: " + known +
                         " (define others in the top-level \"materials\" list)");
}

// What a bar's stress is measured against: an allowable stress, or a safety
// factor on its material's yield strength (which must then be known).
void readAllowable(const JsonNode& node, BarSection& s, const std::vector<MaterialProperties>& defined)
{
    const auto stress = node.find("allowable_stress"), factor = node.find("safety_factor");
    if (stress && factor) throw node.error("give either allowable_stress or safety_factor, not both");
    if (stress) s.allowableStress = stress->number(Bound::Positive);
    if (!factor) return;
    const double f = factor->number(Bound::Positive);
    if (f < 1.0)
        throw factor->error("must be at least 1 (got " + shortestDecimal(f) +
                            "): a factor below 1 allows more than the yield strength");
    const auto material = namedMaterial(defined, s.material, s.density);
    if (!material)
        throw factor->error(
            "a safety factor on yield needs the section's \"material\" (its density alone gives no "
            "yield strength); or give allowable_stress");
    if (!material->yieldStrength)
        throw factor->error("material \"" + material->name +
                            "\" has no yield strength (brittle, or none given): give allowable_stress instead");
    s.safetyFactor = f;
}

BarSection readSection(const JsonNode& node, const std::vector<MaterialProperties>& defined)
{
    node.object({"width", "thickness", "density", "material", "ends", "allowable_stress", "safety_factor"});
    BarSection s;
    s.width = node.at("width").number(Bound::Positive);
    s.thickness = node.at("thickness").number(Bound::Positive);
    std::tie(s.density, s.material) = readDensity(node, defined);
    if (const auto ends = node.find("ends")) {
        const std::vector<JsonNode> e = ends->elements(2);
        s.ends = std::pair{e[0].point(), e[1].point()};
    }
    readAllowable(node, s, defined);
    return s;
}

PlateSection readPlate(const JsonNode& node, const std::vector<MaterialProperties>& defined)
{
    node.object({"thickness", "density", "material", "outline"});
    PlateSection p;
    p.thickness = node.at("thickness").number(Bound::Positive);
    std::tie(p.density, p.material) = readDensity(node, defined);
    if (const auto outline = node.find("outline")) {
        const std::vector<JsonNode> corners = outline->elements();
        if (corners.size() < 3) throw outline->error("a plate outline needs at least three corners");
        p.outline.emplace();
        for (const JsonNode& c : corners) p.outline->push_back(c.point());
    }
    return p;
}

Body readBody(const JsonNode& node, const std::vector<MaterialProperties>& defined)
{
    node.object({"name", "mass", "cg", "inertia", "section", "plate", "point_masses"});
    Body b;
    const JsonNode name = node.at("name");
    b.name = name.name();
    if (b.name == kGroundName)
        throw name.error("\"ground\" is the fixed frame, present in every mechanism; it cannot be declared");
    if (const auto n = node.find("mass")) b.mass = n->number(Bound::NonNegative);
    if (const auto n = node.find("cg")) b.cg = n->point();
    if (const auto n = node.find("inertia")) b.inertia = n->number(Bound::NonNegative);
    if (const auto n = node.find("section")) {
        if (b.mass || b.cg || b.inertia)
            throw n->error("a body takes either mass, cg and inertia or a section, not both");
        b.section = readSection(*n, defined);
    }
    if (const auto n = node.find("plate")) {
        if (b.mass || b.cg || b.inertia || b.section)
            throw n->error("a body takes one of: mass, cg and inertia; a section; a plate");
        b.plate = readPlate(*n, defined);
    }
    for (const JsonNode& p : listOf(node, "point_masses")) b.pointMasses.push_back(readPointMass(p));
    return b;
}

// ---- joints ----

// A joint still being drawn joins fewer than two bodies: an empty name, or a
// list of one, leaves that side open. Such a file reads as it was saved;
// analysing it says what is missing.
void readJointBodies(const JsonNode& bodies, Joint& j)
{
    const std::vector<JsonNode> sides = bodies.elements();
    if (sides.empty() || sides.size() > 2)
        throw bodies.error("expected two body names (or one while the joint is being drawn), got " +
                           std::to_string(sides.size()));
    for (std::size_t side = 0; side < sides.size(); ++side) j.bodies[side] = sides[side].string();
    if (!j.bodies[0].empty() && j.bodies[0] == j.bodies[1])
        throw bodies.error("joins \"" + j.bodies[0] + "\" to itself");
}

// The pin of a pin or pin-in-slot joint and the user's allowables on it. A
// slider has no pin: its load is carried by a sliding face, which this data
// does not describe.
PinData readPin(const JsonNode& node, JointType type)
{
    if (type == JointType::Slider)
        throw node.error(
            "a slider has no pin: its load is carried by its sliding faces, not a pin (pin data applies to pin "
            "and pin_in_slot joints)");
    node.object(
        {"diameter", "shear_planes", "bearing_length", "allowable_shear_stress", "allowable_pressure", "allowable_pv"});
    PinData p;
    p.diameter = node.at("diameter").number(Bound::Positive);
    if (const auto planes = node.find("shear_planes")) {
        const double n = planes->number();
        if (n != 1.0 && n != 2.0)
            throw planes->error("must be 1 (single shear) or 2 (double shear) (got " + shortestDecimal(n) + ")");
        p.shearPlanes = int(n);
    }
    const auto optionalPositive = [&](const char* key) -> std::optional<double> {
        if (const auto v = node.find(key)) return v->number(Bound::Positive);
        return std::nullopt;
    };
    p.bearingLength = optionalPositive("bearing_length");
    p.allowableShear = optionalPositive("allowable_shear_stress");
    p.allowablePressure = optionalPositive("allowable_pressure");
    p.allowablePv = optionalPositive("allowable_pv");
    return p;
}

Joint readJoint(const JsonNode& node)
{
    node.object({"name", "type", "bodies", "at", "axis_deg", "pin"});
    Joint j;
    j.name = node.at("name").name();
    j.type = node.at("type").choice(kJointTypes).value;
    readJointBodies(node.at("bodies"), j);
    j.at = node.at("at").point();
    if (const auto axis = node.find("axis_deg")) {
        if (j.type == JointType::Pin) axis->warn("applies only to slider and pin_in_slot joints (ignored)");
        else j.axisDeg = axis->number();
    }
    if (const auto pin = node.find("pin")) j.pin = readPin(*pin, j.type);
    return j;
}

// ---- drivers ----

ConstantSpeed readConstantSpeed(const JsonNode& node, const DriverKeys& keys)
{
    return {quantity(node, keys.speed), quantityOr(node, keys.accel, 0.0)};
}

Rise readRise(const JsonNode& node, CamLaw law, const DriverKeys& keys)
{
    node.object({"law", keys.from.name, keys.to.name, "start_s", "end_s"});
    Rise r{law, quantity(node, keys.from), quantity(node, keys.to), 0.0, std::nullopt};
    if (const auto start = node.find("start_s")) r.start = start->number(Bound::NonNegative);
    if (const auto end = node.find("end_s")) {
        r.end = end->number();
        if (!(*r.end > r.start)) throw end->error("must be later than start_s (" + shortestDecimal(r.start) + ")");
    }
    return r;
}

MotionTable readMotionTable(const JsonNode& node, const DriverKeys& keys)
{
    node.object({"law", "time_s", keys.position.name});
    MotionTable t;
    t.time = node.at("time_s").increasing();
    t.position = pairedColumn(node, keys.position.name, "time_s", t.time.size(), keys.position.unit);
    return t;
}

Motion readMotion(const JsonNode& node, const DriverKeys& keys)
{
    const MotionLaw& law = node.at("law").choice(kMotionLaws);
    switch (law.kind) {
    case LawKind::ConstantSpeed:
        node.object({"law", keys.speed.name, keys.accel.name});
        return readConstantSpeed(node, keys);
    case LawKind::Rise: return readRise(node, law.cam, keys);
    case LawKind::Table: break;
    }
    return readMotionTable(node, keys);
}

// Constant speed may be written straight into the driver instead of a motion.
Motion readDriverMotion(const JsonNode& node, const DriverKeys& keys)
{
    if (std::string(node.oneOf({keys.speed.name, "motion"})) != "motion") return readConstantSpeed(node, keys);
    if (node.has(keys.accel.name))
        throw ModelError(node.keyPath(keys.accel.name),
                         std::string("only goes with ") + keys.speed.name + "; with a motion, put it there");
    return readMotion(node.at("motion"), keys);
}

// A linear driver acts at a slider joint or between two body points.
void readLinearPlace(const JsonNode& node, Driver& d)
{
    if (std::string(node.oneOf({"joint", "between"})) == "joint") {
        d.joint = node.at("joint").name();
        d.offset = quantityOr(node, kLinearKeys.offset, 0.0);
        return;
    }
    const std::vector<JsonNode> ends = node.at("between").elements(2);
    for (std::size_t side = 0; side < 2; ++side) {
        // An end is a body point, and the pin there (core/results/cylinder_ends.h).
        ends[side].object({"body", "at", "pin"});
        d.ends[side] = BodyPointRef{ends[side].at("body").name(), ends[side].at("at").point()};
        if (const auto pin = ends[side].find("pin")) d.endPins[side] = readPin(*pin, JointType::Pin);
    }
    if (const auto position = node.find(kLinearKeys.offset.name))
        position->warn("applies only to a linear driver at a slider joint (ignored)");
}

// ---- what drives a driver ----

Gearbox readGearbox(const JsonNode& node)
{
    node.object({"ratio", "efficiency", "motor_inertia", "gearbox_inertia"});
    Gearbox g;
    g.ratio = node.at("ratio").number(Bound::Positive);
    if (const auto eta = node.find("efficiency")) {
        g.efficiency = eta->number(Bound::Positive);
        if (g.efficiency > 1.0)
            throw eta->error("must be in (0, 1] (got " + shortestDecimal(g.efficiency) +
                             "): a gearbox cannot give out more power than it takes in");
    }
    if (const auto j = node.find("motor_inertia")) g.motorInertia = j->number(Bound::NonNegative);
    if (const auto j = node.find("gearbox_inertia")) g.gearboxInertia = j->number(Bound::NonNegative);
    return g;
}

MotorCharacteristic readMotor(const JsonNode& node)
{
    if (std::string(node.oneOf({"stall_torque", "table"})) == "stall_torque") {
        node.object({"stall_torque", "no_load_rpm"});
        return MotorLine{node.at("stall_torque").number(Bound::Positive),
                         toSi(kMotorNoLoadSpeed.unit, node.at(kMotorNoLoadSpeed.name).number(Bound::Positive))};
    }
    node.object({"table"});
    const JsonNode table = node.at("table");
    table.object({kMotorSpeed.name, "torque"});
    MotorTable t;
    t.speed = increasingQuantities(table.at(kMotorSpeed.name), kMotorSpeed.unit);
    if (t.speed.front() < 0.0)
        throw table.at(kMotorSpeed.name)
            .error("speeds must be >= 0 (the motor turns one way; got " +
                   shortestDecimal(fromSi(kMotorSpeed.unit, t.speed.front())) + ")");
    t.torque = pairedColumn(table, "torque", kMotorSpeed.name, t.speed.size(), FileUnit::Si);
    return t;
}

Flywheel readFlywheel(const JsonNode& node)
{
    node.object({"inertia", "on"});
    Flywheel f;
    f.inertia = node.at("inertia").number(Bound::NonNegative);
    if (const auto on = node.find("on")) f.on = on->choice(kFlywheelShafts).value;
    return f;
}

Cylinder readCylinder(const JsonNode& node)
{
    node.object({"bore", "rod", "supply_pressure"});
    Cylinder c;
    c.bore = node.at("bore").number(Bound::Positive);
    const JsonNode rod = node.at("rod");
    c.rod = rod.number(Bound::Positive);
    if (c.rod >= c.bore)
        throw rod.error("must be smaller than the bore (" + shortestDecimal(c.bore) + " m; got " +
                        shortestDecimal(c.rod) + " m): the rod side would have no area to pull with");
    if (const auto p = node.find("supply_pressure")) c.supplyPressure = p->number(Bound::Positive);
    return c;
}

// A motor characteristic replaces the prescribed motion, whose constant speed
// stays as the expected output speed (the start of an integration): any other
// motion, or an acceleration, would contradict the motor.
void checkMotorMotion(const JsonNode& node, const Driver& d)
{
    const auto* c = std::get_if<ConstantSpeed>(&d.motion);
    if (!c || c->accel != 0.0 || c->speed == 0.0)
        throw ModelError(node.keyPath("motor"),
                         "a motor sets its own speed: give the driver a constant, non-zero speed_rpm without "
                         "acceleration, the output speed expected");
}

// Gearbox, motor, flywheel and fluctuation target belong to rotary drivers,
// cylinders to linear ones.
void readDriveTrain(const JsonNode& node, Driver& d)
{
    const bool rotary = d.type == DriverType::Rotary;
    for (const char* key : {"gearbox", "motor", "flywheel", "fluctuation_target"})
        if (!rotary && node.has(key))
            throw ModelError(node.keyPath(key), "applies only to a rotary driver (a linear one may have a cylinder)");
    if (rotary && node.has("cylinder")) throw ModelError(node.keyPath("cylinder"), "applies only to a linear driver");
    if (const auto g = node.find("gearbox")) d.gearbox = readGearbox(*g);
    if (const auto motor = node.find("motor")) {
        d.motor = readMotor(*motor);
        checkMotorMotion(node, d);
    }
    if (const auto f = node.find("flywheel")) d.flywheel = readFlywheel(*f);
    if (const auto target = node.find("fluctuation_target")) {
        d.fluctuationTarget = target->number(Bound::Positive);
        if (*d.fluctuationTarget >= 2.0)
            throw target->error("must be below 2 (got " + shortestDecimal(*d.fluctuationTarget) +
                                "): (ω_max − ω_min)/ω_mean reaches 2 only when the driver stops");
    }
    if (const auto c = node.find("cylinder")) d.cylinder = readCylinder(*c);
}

Driver readDriver(const JsonNode& node)
{
    Driver d;
    d.type = node.at("type").choice(kDriverTypes).value;
    const DriverKeys& keys = driverKeysOf(d.type);
    const bool linear = d.type == DriverType::Linear;
    // "between" is known to linear drivers only; "joint" stands in for it otherwise.
    node.object({"name", "type", "joint", linear ? "between" : "joint", "motion", keys.offset.name, keys.speed.name,
                 keys.accel.name, "gearbox", "motor", "flywheel", "fluctuation_target", "cylinder"});
    d.name = node.at("name").name();
    if (linear) {
        readLinearPlace(node, d);
    } else {
        d.joint = node.at("joint").name();
        d.offset = quantityOr(node, keys.offset, 0.0);
    }
    d.motion = readDriverMotion(node, keys);
    readDriveTrain(node, d);
    return d;
}

// The speed of a mechanism with a motor characteristic or a flywheel follows
// from one equation of motion in one coordinate: another driver would fix
// the motion instead.
void checkSingleDriver(const JsonNode& root, const std::vector<Driver>& drivers)
{
    if (drivers.size() < 2) return;
    const std::vector<JsonNode> nodes = root.at("drivers").elements();
    for (std::size_t i = 0; i < drivers.size(); ++i)
        for (const char* key : {"motor", "flywheel", "fluctuation_target"})
            if (nodes[i].has(key))
                throw ModelError(nodes[i].keyPath(key),
                                 "needs the driver to be the mechanism's only one (there are " +
                                     std::to_string(drivers.size()) +
                                     "): with a second driver the speed is prescribed, not found");
}

// ---- loads ----

// Over time, or over a driver's position in the unit its type uses.
LoadProfile readProfile(const JsonNode& node, const std::vector<Driver>& drivers)
{
    node.object({"driver", "time_s", "at_deg", "at", "factor"});
    LoadProfile p;
    const char* key = node.oneOf({"time_s", kRotaryKeys.profileAt.name, kLinearKeys.profileAt.name});
    FileUnit unit = FileUnit::Si;
    if (std::string(key) == "time_s") {
        if (node.has("driver")) throw ModelError(node.keyPath("driver"), "a profile over time_s names no driver");
    } else {
        const JsonNode driver = node.at("driver");
        p.driver = driver.name();
        const Driver* d = findDriver(drivers, p.driver);
        if (!d) throw driver.error("no driver named \"" + p.driver + "\"");
        const KeyWithUnit& at = driverKeysOf(d->type).profileAt;
        if (at.name != std::string(key))
            throw ModelError(node.keyPath(key), "driver \"" + p.driver + "\" is " + nameOf(kDriverTypes, d->type) +
                                                    ": give its positions as \"" + at.name + "\"");
        unit = at.unit;
    }
    p.at = increasingQuantities(node.at(key), unit);
    p.factor = pairedColumn(node, "factor", key, p.at.size(), FileUnit::Si);
    return p;
}

std::optional<LoadProfile> readOptionalProfile(const JsonNode& node, const std::vector<Driver>& drivers)
{
    if (const auto profile = node.find("profile")) return readProfile(*profile, drivers);
    return std::nullopt;
}

Load readForce(const JsonNode& node, const std::vector<Driver>& drivers)
{
    node.object({"type", "name", "body", "at", "force", "turns_with_body", "profile"});
    ForceLoad f;
    f.point = {node.at("body").name(), node.at("at").point()};
    f.force = node.at("force").point();
    if (const auto turns = node.find("turns_with_body")) f.turnsWithBody = turns->boolean();
    f.profile = readOptionalProfile(node, drivers);
    return f;
}

Load readTorque(const JsonNode& node, const std::vector<Driver>& drivers)
{
    node.object({"type", "name", "body", "torque", "profile"});
    TorqueLoad t;
    t.body = node.at("body").name();
    t.torque = node.at("torque").number();
    t.profile = readOptionalProfile(node, drivers);
    return t;
}

Load readSpring(const JsonNode& node, const std::vector<Driver>&)
{
    node.object({"type", "name", "a", "b", "stiffness", "free_length"});
    SpringLoad s;
    s.a = readPointRef(node.at("a"));
    s.b = readPointRef(node.at("b"));
    s.stiffness = node.at("stiffness").number(Bound::NonNegative);
    s.freeLength = node.at("free_length").number(Bound::NonNegative);
    return s;
}

Load readDamper(const JsonNode& node, const std::vector<Driver>&)
{
    node.object({"type", "name", "a", "b", "damping"});
    DamperLoad d;
    d.a = readPointRef(node.at("a"));
    d.b = readPointRef(node.at("b"));
    d.damping = node.at("damping").number(Bound::NonNegative);
    return d;
}

Load readTorsionSpring(const JsonNode& node, const std::vector<Driver>&)
{
    node.object({"type", "name", "joint", "stiffness", "free_angle_deg"});
    TorsionSpringLoad t;
    t.joint = node.at("joint").name();
    t.stiffness = node.at("stiffness").number(Bound::NonNegative);
    t.freeAngle = quantityOr(node, kTorsionFreeAngle, 0.0);
    return t;
}

struct LoadType {
    const char* name;
    Load (*read)(const JsonNode&, const std::vector<Driver>&);
};
constexpr LoadType kLoadTypes[] = {
    {"force", readForce},
    {"torque", readTorque},
    {"spring", readSpring},
    {"damper", readDamper},
    {"torsion_spring", readTorsionSpring},
};

void setName(Load& load, const std::string& name)
{
    std::visit([&](auto& l) { l.name = name; }, load);
}

// Unnamed loads are called after their type and a count: "force 1",
// "force 2", … skipping names that other loads already have.
void nameUnnamedLoads(std::vector<Load>& loads, const std::vector<const LoadType*>& types,
                      const std::vector<JsonNode>& nodes, NameRegister& names)
{
    std::map<std::string, int> counts;
    for (std::size_t i = 0; i < loads.size(); ++i) {
        if (nodes[i].has("name")) continue;
        const std::string type = types[i]->name;
        std::string name;
        do name = type + " " + std::to_string(++counts[type]);
        while (names.contains(name));
        setName(loads[i], name);
        names.add(name, nodes[i]);
    }
}

std::vector<Load> readLoads(const JsonNode& root, const std::vector<Driver>& drivers)
{
    const std::vector<JsonNode> nodes = listOf(root, "loads");
    std::vector<Load> loads;
    std::vector<const LoadType*> types;
    NameRegister names;
    for (const JsonNode& node : nodes) {
        types.push_back(&node.at("type").choice(kLoadTypes));
        loads.push_back(types.back()->read(node, drivers));
        if (const auto name = node.find("name")) {
            setName(loads.back(), name->name());
            names.add(name->name(), node);
        }
    }
    nameUnnamedLoads(loads, types, nodes, names);
    return loads;
}

// ---- the document ----

void readVersion(const JsonNode& root)
{
    if (!root.has("clevis"))
        throw ModelError(
            "clevis", "required key missing; a mechanism file starts with \"clevis\": " + std::to_string(kFileVersion));
    const JsonNode version = root.at("clevis");
    const double v = version.number();
    if (v != kFileVersion)
        throw version.error("unsupported file version " + shortestDecimal(v) + "; this program reads version " +
                            std::to_string(kFileVersion));
}

Vec2 readGravity(const JsonNode& node)
{
    if (!node.isBoolean()) return node.point();
    if (node.boolean()) throw node.error("true is not allowed: give [gx, gy] in m/s², or false for no gravity");
    return Vec2::Zero();
}

CycleSettings readCycle(const JsonNode& node)
{
    node.object({"steps", "duration_s"});
    CycleSettings c;
    if (const auto steps = node.find("steps")) c.steps = steps->integer(1, kMaxSteps);
    if (const auto duration = node.find("duration_s")) c.duration = duration->number(Bound::Positive);
    return c;
}

template <class Item, class Read>
std::vector<Item> readNamedList(const JsonNode& root, const char* key, Read read)
{
    std::vector<Item> items;
    NameRegister names;
    for (const JsonNode& node : listOf(root, key)) {
        items.push_back(read(node));
        names.add(items.back().name, node);
    }
    return items;
}

Mechanism readMechanism(const JsonNode& root)
{
    readVersion(root);
    root.object({"clevis", "name", "gravity", "materials", "bodies", "joints", "drivers", "cycle", "loads"});
    Mechanism m;
    if (const auto name = root.find("name")) m.name = name->string();
    if (const auto gravity = root.find("gravity")) m.gravity = readGravity(*gravity);
    m.materials = readNamedList<MaterialProperties>(root, "materials", readMaterial);
    m.bodies = readNamedList<Body>(root, "bodies", [&](const JsonNode& n) { return readBody(n, m.materials); });
    m.joints = readNamedList<Joint>(root, "joints", readJoint);
    m.drivers = readNamedList<Driver>(root, "drivers", readDriver);
    checkSingleDriver(root, m.drivers);
    if (const auto cycle = root.find("cycle")) m.cycle = readCycle(*cycle);
    m.loads = readLoads(root, m.drivers);
    return m;
}

ModelError tooLarge(const std::string& path)
{
    return ModelError("", "\"" + path + "\" is larger than " + std::to_string(kMaxFileBytes >> 20) +
                              " MiB, too large to be a mechanism file");
}

// Refuses a huge file by its size, or, where the size is not known in
// advance (a pipe), once the limit is passed while reading.
std::string readFileText(const std::string& path)
{
    std::error_code unknownSize;
    const auto size = std::filesystem::file_size(path, unknownSize);
    if (!unknownSize && size > kMaxFileBytes) throw tooLarge(path);
    std::ifstream in(path, std::ios::binary);
    if (!in) throw ModelError("", "cannot open \"" + path + "\": " + std::strerror(errno));
    std::string text;
    char chunk[1 << 16];
    while (in.read(chunk, sizeof chunk) || in.gcount() > 0) {
        text.append(chunk, static_cast<std::size_t>(in.gcount()));
        if (text.size() > kMaxFileBytes) throw tooLarge(path);
    }
    if (in.bad()) throw ModelError("", "cannot read \"" + path + "\"");
    return text;
}

}  // namespace

LoadedMechanism parseMechanism(const std::string& jsonText)
{
    const nlohmann::json document = parseJsonText(jsonText);
    LoadedMechanism out;
    out.mechanism = readMechanism(JsonNode(document, "", out.warnings));
    return out;
}

LoadedMechanism loadMechanismFile(const std::string& path) { return parseMechanism(readFileText(path)); }

// Through the text, as a saved file goes: the one way to be sure that what
// passes here also opens.
Mechanism validateMechanism(const Mechanism& m) { return parseMechanism(saveMechanismText(m)).mechanism; }

}  // namespace clevis
