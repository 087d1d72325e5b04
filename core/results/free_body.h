// One body cut free at one step of the cycle: everything that acts on it,
// with numbers, and the three equations of plane motion
//   ΣFx = m·aGx,  ΣFy = m·aGy,  ΣM_G = I_G·α
// with their sums and residuals. Signs follow results.h: a joint pushes its
// second body with +F and its first body with −F.
#pragma once

#include "core/results/results.h"
#include "core/solver/body_state.h"

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace clevis {

enum class FreeBodyItemKind { JointReaction, DriverAction, Weight, Force, Torque, Spring, Damper, TorsionSpring };

// A force through a point plus a couple, acting on the body.
struct FreeBodyItem {
    FreeBodyItemKind kind = FreeBodyItemKind::Force;
    std::string name;                      // joint, driver or load name; "weight" for gravity
    std::string otherBody;                 // joints and drivers: the body on the other side
    JointType jointType = JointType::Pin;  // joint reactions (and drivers at a joint)
    Vec2 axis = Vec2::Zero();              // sliders and slots: unit axis in global axes
    Vec2 at = Vec2::Zero();                // m, global
    Vec2 force = Vec2::Zero();             // N, global
    double couple = 0.0;                   // N·m, counter-clockwise
};

// Σ (applied side) against the kinetic side; residual = sum − kinetic.
struct FreeBodyEquation {
    double sum = 0.0, kinetic = 0.0, residual = 0.0;
};

struct FreeBodyDiagram {
    int body = kGround;
    std::string bodyName;
    int step = -1;
    double t = 0.0;                    // s
    Vec2 cg = Vec2::Zero();            // m, global
    double angle = 0.0;                // rad since the drawn pose
    double mass = 0.0, inertia = 0.0;  // kg, kg·m²
    Vec2 accel = Vec2::Zero();         // m/s², a_G
    double alpha = 0.0;                // rad/s²
    std::vector<FreeBodyItem> items;
    FreeBodyEquation fx, fy, moment;  // N, N, N·m about G

    Vec2 inertiaForce() const { return mass * accel; }        // m·a_G
    double inertiaCouple() const { return inertia * alpha; }  // I_G·α
};

// What acts on each moving body at one step (indexed by body), in the order
// of the diagram: joint reactions, driver actions, then applied loads and
// weight. One pass over the mechanism serves every body.
std::vector<std::vector<FreeBodyItem>> freeBodyItems(const CompiledMechanism& m, const StepResult& s);

// Where constraint k acts on its bodies, as a force through a point plus a
// couple: a joint's (or a driver's at a joint) at the joint's contact point,
// its second body's joint point (returned); a driver's between two points
// where it is attached (none: nullptr).
const BodyPoint* contactOf(const CompiledMechanism& m, std::size_t k);

// An action moved to act through `at` (when given) with the couple that keeps it the same.
ConstraintAction placedAt(const ConstraintAction& a, const std::optional<Vec2>& at);

// Constraint k's action on its side `side` (0: body[0]) at step s, placed
// where the constraint acts (contactOf).
ConstraintAction placedAction(const CompiledMechanism& m, const StepResult& s, const Pose& q, std::size_t k, int side);

// Which kind of applied load `source` (an AppliedLoad's) names; Weight for gravity.
FreeBodyItemKind loadKind(const CompiledMechanism& m, std::string_view source);

// The diagram of moving body `body` at steps[step]; throws std::out_of_range
// for ground or an index outside the mechanism or the result.
FreeBodyDiagram freeBodyDiagram(const CompiledMechanism& m, const CycleResult& r, int body, int step);

// Index of the body called `name`, kGround for "ground", -2 when there is none.
int findBody(const CompiledMechanism& m, const std::string& name);

const char* freeBodyItemKindName(FreeBodyItemKind kind);

}  // namespace clevis
