// Which part of the sketch lies under a pointer position, by the same
// geometry the painter draws.
#pragma once

#include "core/model/mechanism.h"
#include "ui/canvas/view_transform.h"
#include "ui/document/mechanism_document.h"

#include <string>

namespace clevis::ui {

// Pins first (they sit on top), then drivers, loads and bodies.
Selection partAt(const Mechanism& m, const ViewTransform& view, const QPointF& screen);

// The moving body drawn under the point, or "ground" where there is none.
std::string bodyAt(const Mechanism& m, const ViewTransform& view, const QPointF& screen);

// Distance in pixels from `p` to the segment a–b.
double distanceToSegment(const QPointF& p, const QPointF& a, const QPointF& b);

}  // namespace clevis::ui
