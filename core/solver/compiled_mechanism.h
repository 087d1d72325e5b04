// The mechanism checked and resolved for the solver: names become indices,
// mass properties are final, motions are in SI. Body index -1 is ground.
#pragma once

#include "core/model/mass_properties.h"
#include "core/model/mechanism.h"

#include <string>
#include <vector>

namespace clevis {

inline constexpr int kGround = -1;

// A point fixed in a body, by its offset from the centre of mass in the body
// frame (which coincides with the global frame at the drawn pose). For ground
// the offset is the global position.
struct BodyPoint {
    int body = kGround;
    Vec2 local = Vec2::Zero();
};

struct CompiledBody {
    std::string name;
    MassProperties mass;
    // Where the mass came from, for the report: a bar section or a plate
    // (else typed in) and how many point masses were added.
    std::optional<BarSection> section;
    std::optional<PlateSection> plate;
    std::size_t pointMasses = 0;
};

struct CompiledJoint {
    std::string name;
    JointType type;
    int body[2];
    BodyPoint point[2];  // the joint point on each body
    Vec2 axisLocal;      // unit axis in the first body's frame (sliders, slots)
};

// The driver's state at one instant of a motion found by integrating the
// equation of motion (core/solver/steady_cycle.h).
struct MotionSample {
    double t = 0.0;                                  // s
    double position = 0.0, rate = 0.0, accel = 0.0;  // rad or m, per s, per s²
};

struct CompiledDriver {
    std::string name;
    DriverType type;
    int joint = -1;  // rotary, or linear at a slider; -1 for a cylinder
    BodyPoint ends[2];
    double offset = 0.0;  // position at the drawn pose
    Motion motion;
    // When not empty, the motion found (a motor's real motion over one cycle,
    // samples in time order), which replaces `motion`; `motion` then keeps
    // the file's expected speed.
    std::vector<MotionSample> found{};
};

struct CompiledProfile {
    int driver = -1;      // -1: over time
    double period = 0.0;  // rotary drivers: positions are taken modulo one revolution
    std::vector<double> at, factor;
    double eval(double t, const std::vector<double>& drivePositions) const;
};

struct CompiledForce {
    std::string name;
    BodyPoint point;
    Vec2 force;
    bool turnsWithBody;
    std::optional<CompiledProfile> profile;
};
struct CompiledTorque {
    std::string name;
    int body;
    double torque;
    std::optional<CompiledProfile> profile;
};
struct CompiledSpring {
    std::string name;
    BodyPoint a, b;
    double stiffness, freeLength;
};
struct CompiledDamper {
    std::string name;
    BodyPoint a, b;
    double damping;
};
struct CompiledTorsionSpring {
    std::string name;
    int joint;
    double stiffness, freeAngle;
};

struct CompiledMechanism {
    std::string name;
    Vec2 gravity;
    std::vector<CompiledBody> bodies;
    std::vector<CompiledJoint> joints;
    std::vector<CompiledDriver> drivers;
    std::vector<CompiledForce> forces;
    std::vector<CompiledTorque> torques;
    std::vector<CompiledSpring> springs;
    std::vector<CompiledDamper> dampers;
    std::vector<CompiledTorsionSpring> torsionSprings;
    int steps = 360;
    double duration = 1.0;     // s
    double lengthScale = 1.0;  // m, characteristic size used to balance units

    std::string bodyName(int index) const { return index == kGround ? kGroundName : bodies[index].name; }
};

// Validates and resolves; throws ModelError with the offending item's path.
CompiledMechanism compile(const Mechanism& mechanism);

}  // namespace clevis
