// The fields of a pin and its bearing, for a joint's form and for each end
// of a cylinder in a linear driver's form.
#pragma once

#include "ui/panels/properties/form_builder.h"

#include <functional>
#include <optional>
#include <string>
#include <vector>

namespace clevis::ui {

struct PinPlace {
    QString heading;                  // e.g. "Pin and bearing"
    QString sizeLabel;                // the tick that gives the pin data, e.g. "Size this pin"
    QString undo;                     // e.g. "Set crank_pin pin"
    QString keyPrefix;                // before each field's object name; empty for a joint's
    std::vector<std::string> bodies;  // the bodies the pin goes through, whose thickness is the default bearing
};

// The pin sized by clevis-cli analyze (core/results/pin_sizing.h); the
// document checks each value by the file reader's rules.
void pinFields(FormBuilder& f, const Mechanism& m, const PinPlace& place, const std::optional<PinData>& pin,
               const std::function<std::optional<PinData>&(Mechanism&)>& self);

}  // namespace clevis::ui
