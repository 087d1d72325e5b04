// The mass, centre and inertia the solver will use for one body, worked out
// by the core's own rules while the rest of the sketch may still be unfinished.
#pragma once

#include "core/solver/compiled_mechanism.h"

#include <QString>

#include <optional>

namespace clevis::ui {

// nullopt with `problem` set when the body's mass cannot be worked out yet.
std::optional<MassProperties> previewMass(const Mechanism& m, const std::string& body, QString& problem);

}  // namespace clevis::ui
