// Transmission angle μ where it says how well force is passed on: at a pin
// between a coupler (a moving body with no joint to the frame) and an output
// link (a body joined to the frame, not driven) that lies farther from the
// drivers than the coupler, so that power flows from the coupler into the
// output. μ is the angle between the coupler's line through the pin and the
// output's line from its frame pivot to the pin (for an output on a slide,
// the slide's normal). Force is passed on best at 90°; a common rule of
// practice is to keep μ within 40°–140°. See docs/method.md.
#pragma once

#include "core/results/results.h"
#include "core/solver/body_state.h"

namespace clevis {

std::vector<TransmissionPin> findTransmissionPins(const CompiledMechanism& m);

// μ in degrees: in [0°, 180°] between two links, folded into [0°, 90°] where
// a slide normal (which has no sense) takes a link's place.
double transmissionAngleDeg(const CompiledMechanism& m, const TransmissionPin& pin, const Pose& q);

}  // namespace clevis
