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

// The pin joints at `p` (within a nanometre), in file order. Two or more
// make a compound pin: the canvas draws them as one.
std::vector<int> pinsAt(const Mechanism& m, const Vec2& p);

// The bodies the joints join, each once, in the order first met: at a point
// where three or more bodies meet (a compound pin: one two-body joint per
// extra body) the list of everything pinned there.
std::vector<std::string> bodiesOf(const Mechanism& m, const std::vector<int>& joints);

// Index by name, or -1.
int bodyIndex(const Mechanism& m, const std::string& name);
int jointIndex(const Mechanism& m, const std::string& name);
int driverIndex(const Mechanism& m, const std::string& name);

// The kinds of part the drawing tools make. Every one is named in one scheme,
// "<kind> <n>" with the smallest n no part of the mechanism uses yet: "pin 3",
// "link 2", "plate 1", "motor 1", "force 1" (the names the file reader gives
// unnamed loads). Ground pins are pins: a pin fixed to the frame later keeps
// its name, and the bracket drawn under it says it is grounded.
enum class NewPart {
    Pin,
    Slider,
    Slot,
    Link,
    Plate,
    Block,
    Motor,
    Drive,
    Cylinder,
    Force,
    Torque,
    Spring,
    Damper,
    Mass
};

std::string freshName(const Mechanism& m, NewPart kind);

// The name shown for a load (its own, else its kind and index).
std::string loadName(const Load& load, int index);

// A point a load or driver is attached at, for hit-testing and drawing.
Vec2 loadAnchor(const Mechanism& m, const Load& load);

// Counter-clockwise angle of b − a in degrees, in (−180, 180].
double angleDeg(const Vec2& a, const Vec2& b);

}  // namespace clevis::ui
