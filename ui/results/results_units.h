// The user's display units as the plain values the renderers take.
#pragma once

#include "render/render_units.h"

namespace clevis::ui {

class DisplayUnits;

RenderUnits renderUnits(const DisplayUnits& units);

}  // namespace clevis::ui
