// Geometry that leaves a part without meaning, refused before solving with
// the part and its joints named, rather than solved silently:
//  - a body whose joints all lie at one point (a crank drawn with its pin on
//    its ground pivot, a coupler of zero length): it turns about that point
//    and carries nothing round, so the mechanism it belongs to is not the
//    one drawn. A compound hinge, several bodies on one pin, is fine: each
//    body has its other joints elsewhere. A slider, or a slot the body
//    carries, gives it a direction, so a slider block pinned where it
//    slides is fine too;
//  - a spring with a free length, or a damper, whose two ends coincide: the
//    line its force acts along is undefined there (a spring of zero free
//    length pulls with k·(b − a), defined everywhere, and is fine).
// Errors rather than warnings: either is a slip of the drawing (two clicks
// on one spot), and any figure solved from it would be wrong, not merely
// doubtful. A cylinder's coincident ends are refused where it is compiled.
#pragma once

#include "core/model/mechanism.h"
#include "core/solver/compiled_mechanism.h"

namespace clevis {

// Throws ModelError naming the body (path `bodies[i]`) or load (`loads[k]`).
void checkGeometryDefined(const Mechanism& in, const CompiledMechanism& compiled);

}  // namespace clevis
