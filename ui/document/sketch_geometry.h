// What the canvas draws, derived from the document alone: each body's
// outline, which joints share a point, where loads attach. Nothing here is
// stored; it is recomputed from the mechanism whenever needed. (A body's
// joint points, bodyPins, come with core/model/body_points.h.)
#pragma once

#include "core/model/body_points.h"
#include "core/model/mechanism.h"

#include <string>
#include <vector>

namespace clevis::ui {

// The polygon a body is drawn as: two points for a bar, the convex hull of
// the pins for a plate (three or more pins), one point for a lone block.
std::vector<Vec2> bodyOutline(const Mechanism& m, const std::string& body);

// Indices of joints whose point lies within `tolerance` of `p`.
std::vector<int> jointsAt(const Mechanism& m, const Vec2& p, double tolerance);

// Index by name, or -1.
int bodyIndex(const Mechanism& m, const std::string& name);
int jointIndex(const Mechanism& m, const std::string& name);
int driverIndex(const Mechanism& m, const std::string& name);

// `stem` followed by the smallest number that makes a name no part of `m`
// uses yet ("link1", "link2", ...).
std::string freshName(const Mechanism& m, const std::string& stem);

// The name shown for a load (its own, else its kind and index).
std::string loadName(const Load& load, int index);

// A point a load or driver is attached at, for hit-testing and drawing.
Vec2 loadAnchor(const Mechanism& m, const Load& load);

// Counter-clockwise angle of b − a in degrees, in (−180, 180].
double angleDeg(const Vec2& a, const Vec2& b);

}  // namespace clevis::ui
