// The load a joint puts on one of its two bodies over the cycle, seen from
// that body: the curve the tip of the force traces in the body's own frame
// (a polar diagram of the bearing load), its peak, whether the load reverses
// on the bearing, and the drive positions to mark along the curve. This is
// what an oil hole or a bearing split is placed by.
//
// The body's own frame: its axes are the global x and y at the drawn pose,
// carried round with the body by its angle φ since then (results.h: q holds
// φ for each body). The frame's own axes are the ground's: global x and y.
//
// For joint j between its first body A and its second body B, with R the
// reaction the results give (the force of A on B, global axes):
//   F_B = +R,  F_A = −R                                   (global axes)
//   F' = Rot(−φ)·F = (  F_x·cos φ + F_y·sin φ,
//                      −F_x·sin φ + F_y·cos φ )           (body frame)
// A rotation keeps the length, |F'| = |F|, so the peak is the joint's peak of
// the cycle summary (reliable steps, a larger flagged value kept apart).
//
// Whether the load reverses: the direction θ' = atan2(F'_y, F'_x) at each
// counted step (reliable steps, as for the peak, where the force is at least
// kDirectionFloor of the peak), sorted round the circle; g the largest gap
// between neighbours (going round, the gap from the last back to the first
// counts too). The load then lies in a sector of
//   span = 360° − g,
// the narrowest one at the pin that holds every direction. A span under 180°
// means a line through the pin has the load always on one side: it does not
// reverse, and the middle of the gap, θ_u = the gap's start + g/2, is the
// direction it never comes from. A span of 180° or more means no such line
// exists: the load reverses; near 360° it goes all the way round the bearing.
#pragma once

#include "core/results/cycle_summary.h"

#include <string>
#include <vector>

namespace clevis {

// A force below this share of the joint's peak has no direction worth
// placing a split or an oil hole by (its clearance is taken up by the larger
// loads); it is left out of the sector. A judgement of ours, not a standard.
inline constexpr double kDirectionFloor = 0.01;

struct LoadSector {
    bool defined = false;   // false: no counted step carries a load (all below the floor, or no step)
    double spanDeg = 0.0;   // [0, 360): the narrowest sector at the pin holding every direction
    double quietDeg = 0.0;  // (−180, 180]: the middle of the unloaded rest, body frame
    bool reverses = false;  // spanDeg ≥ 180°
    int counted = 0;        // steps whose direction is counted
};

struct BearingPolar {
    int joint = -1;           // or -1 for a cylinder's end
    int cylinderEnd = -1;     // index into cylinderEnds(m) (cylinder_ends.h), or -1 for a joint
    std::string pin;          // the joint's or the end's name
    int body = kGround;       // the body that receives the load, in whose frame it is given
    int other = kGround;      // the joint's other body, which exerts it (a cylinder's end: none, kGround)
    std::string otherName;    // the body's, or the cylinder's (its driver's) name
    std::vector<Vec2> force;  // N, per step, in the body's frame
    Peak peak;                // N, |F| over the cycle (the summary's peak of the joint)
    LoadSector sector;
};

// `body` must be one of the joint's two bodies (kGround for the frame);
// throws std::invalid_argument otherwise. `s` is summarize(m, r).
BearingPolar bearingPolar(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s, int joint, int body);

// The same for the pin at cylinder end `end` (an index into cylinderEnds(m)),
// on the body there: F_B = +R, the end's reaction (cylinder_ends.h). The
// cylinder's own side is not offered: in its frame the load lies on its
// drawn line at every step.
BearingPolar endBearingPolar(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s, int end);

// The narrowest sector holding the directions of `forces` (see above).
LoadSector loadSector(const std::vector<Vec2>& forces, double floor);

// A drive position marked on the curve, where the plotted axis (one value per
// step, rising or falling through the cycle) passes a whole multiple of the
// interval; the force there lies on the drawn curve, straight between the
// steps either side.
struct PolarMark {
    double position = 0.0;  // in the axis's unit
    Vec2 force = Vec2::Zero();
};
std::vector<PolarMark> polarMarks(const std::vector<Vec2>& force, const std::vector<double>& axis, double interval);

}  // namespace clevis
