// Transmission angle μ at pins between two moving bodies that are not input
// links (see transmission_angle.cpp): the angle between
// the two bodies' lines through the pin. Force is passed on best at 90°; a
// common rule of practice is to keep μ within 40°–140°.
#pragma once

#include "core/results/results.h"
#include "core/solver/body_state.h"

namespace clevis {

std::vector<TransmissionPin> findTransmissionPins(const CompiledMechanism& m);

// μ in degrees: in [0°, 180°] between two links, folded into [0°, 90°] where
// a slide normal (which has no sense) takes a link's place.
double transmissionAngleDeg(const CompiledMechanism& m, const TransmissionPin& pin, const Pose& q);

}  // namespace clevis
