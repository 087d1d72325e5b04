// The pins at the two ends of a linear driver between two points (a
// cylinder): the cap end at the driver's first point, the rod end at its
// second. Each pin joins the cylinder to the body there and is reported as a
// joint is, the cylinder taking the place of its first body and the body at
// that end of its second: its reaction is the force of the cylinder on that
// body, in global axes (results.h), and it carries no moment.
//
// The cylinder has no mass in the model, so it is a two-force member: with
// E the driver's effort (on its second body, positive extending, results.h)
// and u the unit vector from the cap end to the rod end,
//   F_rod = E·u,   F_cap = −E·u.
// They are read from the constraint's actions (the generalised force
// −Φ_qᵀλ on each body, step_solver.cpp); an end on ground, which the
// solver gives no action, receives the opposite of the other end's.
//
// The cylinder's own frame, in which its side of each pin feels the load,
// is set as a body's is: the global axes at the drawn pose, turned since
// then with the line between the ends by
//   φ_c = ∠(r_rod − r_cap) − ∠(r_rod − r_cap)|drawn,
// and it turns at  ω_c = (d × ḋ)/|d|²,  d = r_rod − r_cap.
#pragma once

#include "core/results/results.h"

#include <string>
#include <vector>

namespace clevis {

enum class CylinderSide { Cap = 0, Rod = 1 };

// The word for such a pin where joints' types are listed.
inline constexpr const char* kCylinderEndType = "cylinder end";

struct CylinderEnd {
    std::string name;  // "<driver>.cap" or "<driver>.rod"
    int driver = -1;   // index into CompiledMechanism::drivers
    CylinderSide side = CylinderSide::Cap;
    int body = kGround;  // the body at this end, which the reaction acts on
};

// Every end of every linear driver between two points, in the drivers' order,
// the cap end of each before its rod end.
std::vector<CylinderEnd> cylinderEnds(const CompiledMechanism& m);

// The reaction at `end` at a solved step: the cylinder's force on the body
// there, global axes, no moment.
Reaction endReaction(const CompiledMechanism& m, const StepResult& s, const CylinderEnd& end);

// φ_c and ω_c above for driver `d` (a linear driver between two points).
double cylinderAngle(const CompiledMechanism& m, const StepResult& s, int d);
double cylinderRate(const CompiledMechanism& m, const StepResult& s, int d);

}  // namespace clevis
