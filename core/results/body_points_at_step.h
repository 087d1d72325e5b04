// A body's points (see core/model/body_points.h) where a solved step puts
// them, for the figures drawn from results.
#pragma once

#include "core/model/body_points.h"
#include "core/results/results.h"
#include "core/solver/compiled_mechanism.h"

#include <vector>

namespace clevis {

// Joints (a point per side that is this body), cylinder ends, load points,
// then the centre of mass. A guide's axis turns with its body.
std::vector<BodyPointOf> bodyPointsAt(const CompiledMechanism& m, const StepResult& step, int body);

}  // namespace clevis
