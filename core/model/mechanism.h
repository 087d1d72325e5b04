// The mechanism as the user describes it: named parts, global coordinates at
// the drawn pose, SI units. This is the document; the solver works on a
// compiled copy (see compiled_mechanism.h) with names resolved to indices.
#pragma once

#include "core/model/geometry.h"
#include "core/model/materials.h"

#include <optional>
#include <string>
#include <variant>
#include <vector>

namespace clevis {

inline constexpr const char* kGroundName = "ground";

struct PointMass {
    std::string name;
    double mass = 0.0;       // kg
    Vec2 at = Vec2::Zero();  // global position at the drawn pose, m

    bool operator==(const PointMass&) const = default;
};

// A straight bar of rectangular cross-section between two points (by default
// the two farthest-apart joints on the body).
struct BarSection {
    double width = 0.0;                         // m, in the plane of motion
    double thickness = 0.0;                     // m, out of plane
    double density = 0.0;                       // kg/m³
    std::optional<std::pair<Vec2, Vec2>> ends;  // m
    // The material named in the file (empty: density given as a number). It
    // counts only while `density` is still that material's, so that an edit
    // of the density alone never keeps another material's strength.
    std::string material{};
    // What the bar's stress is measured against: a stress, or the material's
    // yield strength divided by a safety factor (at most one of the two).
    std::optional<double> allowableStress{};  // Pa
    std::optional<double> safetyFactor{};     // on yield, ≥ 1

    bool operator==(const BarSection&) const = default;
};

// A flat plate of uniform thickness whose outline is a polygon: by default
// the convex hull of the points it is attached at (joints, cylinder ends).
struct PlateSection {
    double thickness = 0.0;                    // m, out of plane
    double density = 0.0;                      // kg/m³
    std::optional<std::vector<Vec2>> outline;  // m, corners in order, at the drawn pose
    std::string material{};                    // as for a bar section

    bool operator==(const PlateSection&) const = default;
};

struct Body {
    std::string name;
    // Mass properties typed in directly ...
    std::optional<double> mass;     // kg
    std::optional<Vec2> cg;         // m, global at the drawn pose
    std::optional<double> inertia;  // kg·m² about the centre of mass
    // ... or derived from a bar section or a plate, plus point masses in every case.
    std::optional<BarSection> section;
    std::optional<PlateSection> plate;
    std::vector<PointMass> pointMasses;

    bool operator==(const Body&) const = default;
};

enum class JointType { Pin, Slider, PinInSlot };

// The pin through a joint and the bearing it turns in, for sizing: its size
// and what the user allows it (each allowable optional; without one the
// figure is reported but no utilisation).
struct PinData {
    double diameter = 0.0;                      // m
    int shearPlanes = 1;                        // 1: single shear, 2: double shear
    std::optional<double> bearingLength{};      // m; default: the thinner body's thickness
    std::optional<double> allowableShear{};     // Pa, on the pin's mean shear stress
    std::optional<double> allowablePressure{};  // Pa, on the projected bearing pressure
    std::optional<double> allowablePv{};        // Pa·m/s, on pressure × sliding speed

    bool operator==(const PinData&) const = default;
};

// `bodies[0]` is the first-listed body: reactions are the force it exerts on
// `bodies[1]`. For sliders and pin-in-slot joints the axis is fixed in the
// first body; the pin of a pin-in-slot belongs to the second.
struct Joint {
    std::string name;
    JointType type = JointType::Pin;
    std::string bodies[2];
    Vec2 at = Vec2::Zero();        // m, global at the drawn pose
    double axisDeg = 0.0;          // slide or slot direction at the drawn pose
    std::optional<PinData> pin{};  // pin and pin-in-slot joints only

    bool operator==(const Joint&) const = default;
};

enum class CamLaw { Cycloidal, Polynomial345, ModifiedTrapezoid };

// Motion of a driver's coordinate over time, in SI (rad or m).
struct ConstantSpeed {
    double speed = 0.0;  // rad/s or m/s
    double accel = 0.0;  // rad/s² or m/s²

    bool operator==(const ConstantSpeed&) const = default;
};
struct Rise {
    CamLaw law = CamLaw::Cycloidal;
    double from = 0.0, to = 0.0;  // rad or m
    double start = 0.0;           // s
    std::optional<double> end;    // s, defaults to the end of the cycle

    bool operator==(const Rise&) const = default;
};
struct MotionTable {
    std::vector<double> time;      // s, strictly increasing
    std::vector<double> position;  // rad or m

    bool operator==(const MotionTable&) const = default;
};
using Motion = std::variant<ConstantSpeed, Rise, MotionTable>;

struct BodyPointRef {
    std::string body;
    Vec2 at = Vec2::Zero();  // m, global at the drawn pose

    bool operator==(const BodyPointRef&) const = default;
};

enum class DriverType { Rotary, Linear };

// A gearbox between a rotary driver's motor and the driven joint (the
// output): the motor turns `ratio` times per output turn. The efficiency is
// applied in the direction of power flow; both inertias are referred to the
// motor shaft.
struct Gearbox {
    double ratio = 1.0;           // i, motor turns per output turn, > 0
    double efficiency = 1.0;      // η, in (0, 1]
    double motorInertia = 0.0;    // J_m, kg·m², the rotor
    double gearboxInertia = 0.0;  // J_g, kg·m², referred to the motor shaft

    bool operator==(const Gearbox&) const = default;
};

// A motor's torque against its speed, both at the motor shaft: a straight
// line from the stall torque at rest to zero at the no-load speed ...
struct MotorLine {
    double stallTorque = 0.0;  // N·m, > 0
    double noLoadSpeed = 0.0;  // rad/s, > 0

    bool operator==(const MotorLine&) const = default;
};
// ... or a table, joined by straight lines.
struct MotorTable {
    std::vector<double> speed;   // rad/s, strictly increasing
    std::vector<double> torque;  // N·m, one per speed

    bool operator==(const MotorTable&) const = default;
};
using MotorCharacteristic = std::variant<MotorLine, MotorTable>;

enum class FlywheelShaft { Output, Motor };

struct Flywheel {
    double inertia = 0.0;  // kg·m², ≥ 0
    FlywheelShaft on = FlywheelShaft::Output;

    bool operator==(const Flywheel&) const = default;
};

// A hydraulic or pneumatic cylinder doing a linear driver's work: it pushes
// on its cap side (the full bore) and pulls on its rod side (the annulus).
struct Cylinder {
    double bore = 0.0;                       // m, D > 0
    double rod = 0.0;                        // m, 0 < d < D
    std::optional<double> supplyPressure{};  // Pa, > 0; without it, no comparison

    bool operator==(const Cylinder&) const = default;
};

// Rotary: at a pin, rotation of its second body relative to its first.
// Linear: at a slider (displacement of its second body along the axis) or
// between two points (a cylinder's length).
// What drives it, for sizing the drive: a rotary driver may have a gearbox, a
// motor characteristic (whose constant `motion` speed is then the expected
// output speed), a flywheel and a target speed fluctuation; a linear one a
// cylinder. The reader allows the last three only where the driver is the
// mechanism's one driver.
struct Driver {
    std::string name;
    DriverType type = DriverType::Rotary;
    std::string joint;                    // rotary, or linear at a slider
    std::optional<BodyPointRef> ends[2];  // linear between two points
    double offset = 0.0;                  // position at the drawn pose, rad (rotary) or m (slider)
    Motion motion = ConstantSpeed{};
    std::optional<Gearbox> gearbox{};            // rotary
    std::optional<MotorCharacteristic> motor{};  // rotary
    std::optional<Flywheel> flywheel{};          // rotary
    std::optional<double> fluctuationTarget{};   // rotary: C_s = (ω_max − ω_min)/ω_mean, in (0, 2)
    std::optional<Cylinder> cylinder{};          // linear
    // Linear between two points: the pin at each end (cap end first), for
    // sizing as a joint's pin is; the cylinder's side has no thickness known.
    std::optional<PinData> endPins[2]{};

    bool operator==(const Driver&) const = default;
};

// Scale factor applied to a load over the cycle, linearly interpolated and
// held constant beyond the table ends.
struct LoadProfile {
    std::string driver;      // empty: over time
    std::vector<double> at;  // s, or driver position in rad / m
    std::vector<double> factor;

    bool operator==(const LoadProfile&) const = default;
};

struct ForceLoad {
    std::string name;
    BodyPointRef point;
    Vec2 force = Vec2::Zero();  // N, global at the drawn pose
    bool turnsWithBody = false;
    std::optional<LoadProfile> profile;

    bool operator==(const ForceLoad&) const = default;
};
struct TorqueLoad {
    std::string name;
    std::string body;
    double torque = 0.0;  // N·m, counter-clockwise positive
    std::optional<LoadProfile> profile;

    bool operator==(const TorqueLoad&) const = default;
};
struct SpringLoad {
    std::string name;
    BodyPointRef a, b;
    double stiffness = 0.0;   // N/m
    double freeLength = 0.0;  // m

    bool operator==(const SpringLoad&) const = default;
};
struct DamperLoad {
    std::string name;
    BodyPointRef a, b;
    double damping = 0.0;  // N·s/m

    bool operator==(const DamperLoad&) const = default;
};
struct TorsionSpringLoad {
    std::string name;
    std::string joint;       // a pin
    double stiffness = 0.0;  // N·m/rad
    double freeAngle = 0.0;  // rad, relative rotation at which it is relaxed (0 = drawn pose)

    bool operator==(const TorsionSpringLoad&) const = default;
};
using Load = std::variant<ForceLoad, TorqueLoad, SpringLoad, DamperLoad, TorsionSpringLoad>;

struct CycleSettings {
    int steps = 360;
    std::optional<double> duration;  // s

    bool operator==(const CycleSettings&) const = default;
};

struct Mechanism {
    std::string name;
    Vec2 gravity{0.0, -9.80665};                // m/s²
    std::vector<MaterialProperties> materials;  // defined by the file, besides the built-in ones
    std::vector<Body> bodies;                   // moving bodies; ground is implicit
    std::vector<Joint> joints;
    std::vector<Driver> drivers;
    std::vector<Load> loads;
    CycleSettings cycle;

    bool operator==(const Mechanism&) const = default;
};

}  // namespace clevis
