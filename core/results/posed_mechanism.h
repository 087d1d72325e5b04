// The mechanism moved to the pose of one solved step, for drawing it there:
// every point that belongs to a body moves rigidly with that body, axes fixed
// in a body turn with it. Mass properties and values are unchanged.
#pragma once

#include "core/results/results.h"
#include "core/solver/compiled_mechanism.h"

namespace clevis {

// Parts whose bodies are not in `m` (a result older than the document) stay
// where they were drawn.
Mechanism posedMechanism(const Mechanism& drawn, const CompiledMechanism& m, const StepResult& step);

}  // namespace clevis
