// The convex hull of a set of points: the outline a plate or a body of
// several pins is drawn and weighed as.
#pragma once

#include "core/model/geometry.h"

#include <vector>

namespace clevis {

// Counter-clockwise, without repeated points; fewer than three points (or
// all on one line) come back as the distinct points themselves.
std::vector<Vec2> convexHull(std::vector<Vec2> points);

}  // namespace clevis
