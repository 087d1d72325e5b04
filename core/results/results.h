// What the solver reports, per step and for the whole cycle. SI units.
//
// Sign conventions (used everywhere, documented in docs/method.md):
//  - a joint's reaction is the force its first-listed body exerts on its
//    second, in global axes; `moment` is the reaction couple about the joint
//    point on the second body (zero for pins, the slider's contact moment);
//  - a driver's effort is the torque (N·m) or force (N) it applies to its
//    second body, positive in the direction of its coordinate; the first
//    body receives the opposite;
//  - the ground load is the force the mechanism puts on the frame and its
//    moment about the global origin;
//  - angles are counter-clockwise from +x; body angles are rotations since
//    the drawn pose.
#pragma once

#include "core/solver/compiled_mechanism.h"

#include <Eigen/Core>
#include <string>
#include <vector>

namespace clevis {

// The force and couple a constraint puts on one body, as a force through a
// point on that body plus a couple.
// (The body comes last: 48 bytes instead of 64, there being one per
// constraint and side at every step.)
struct ConstraintAction {
    Vec2 at = Vec2::Zero();
    Vec2 force = Vec2::Zero();
    double couple = 0.0;
    int body = kGround;
};

struct Reaction {
    Vec2 force = Vec2::Zero();  // N, on the second body, global axes
    double moment = 0.0;        // N·m, about the joint point on the second body
};

struct StepResult {
    double t = 0.0;
    std::vector<double> drivePosition, driveRate;  // rad or m, per s
    Eigen::VectorXd q, qd, qdd;                    // [x, y, φ] per body and their rates
    Eigen::VectorXd lambda;                        // Lagrange multipliers, one per constraint row
    std::vector<Reaction> joints;
    std::vector<double> effort, power;         // per driver: N·m or N, W
    std::vector<ConstraintAction> actions[2];  // per constraint (joints, then drivers): on body[0], body[1]
    Vec2 groundForce = Vec2::Zero();           // N
    double groundMoment = 0.0;                 // N·m about the origin
    double kinetic = 0.0, gravityPotential = 0.0, springPotential = 0.0;  // J
    double damperDissipation = 0.0, appliedPower = 0.0;                   // W
    std::vector<double> transmissionDeg;                                  // per transmission pin
    // The near-singular measure μ (core/solver/near_singular_measure.h).
    double reciprocalCondition = 1.0;
    int jacobianSign = 1;       // sign of det Φ_q; a change between steps means a singular position was crossed
    bool nearSingular = false;  // close to, or just past, a singular position
};

struct Warning {
    std::string code;  // stable machine-readable tag, e.g. "near_singular"
    std::string message;
    int step = -1;  // -1: about the whole analysis
};

// A pin where a coupler drives an output link on the frame, whose
// transmission angle is reported (see core/solver/transmission_angle.h). The
// coupler's line through the pin runs to its farthest other joint point, the
// output's from its frame pivot; a slider or slot's normal (the direction in
// which the body's own point cannot move) takes the place of a line.
struct TransmissionPin {
    int joint = -1;
    BodyPoint far[2];
    int axisJoint[2] = {-1, -1};  // slider or slot whose normal is used instead of `far`
};

struct CycleResult {
    int plannedSteps = 0;   // intervals in the full cycle
    double duration = 0.0;  // s
    bool complete = false;  // false: stopped where the mechanism could not be assembled
    std::vector<StepResult> steps;
    std::vector<TransmissionPin> transmissionPins;
    std::vector<Warning> warnings;
};

}  // namespace clevis
