// Where a driver at a joint is drawn on the canvas, shared by the painter and
// by picking, so that a click lands on what is drawn.
#pragma once

#include "core/model/mechanism.h"
#include "ui/canvas/view_transform.h"

#include <QLineF>
#include <QPointF>

#include <optional>

namespace clevis::ui {

// A rotary driver: an arc arrow of kMotorRadius round its pin, 250° of the
// circle. Its gap faces the driven body (the joint's second body, or its
// first when the second is ground), so the symbol does not cover a short
// crank, and it turns the way the driven body first turns.
// Angles in degrees, counter-clockwise as the reader sees the screen.
struct MotorArc {
    QPointF centre;
    double startDeg = 0;
    double spanDeg = 0;  // negative: clockwise
};
std::optional<MotorArc> motorArc(const Mechanism& m, const ViewTransform& view, const Driver& d);

// Whether `s` lies within `reach` pixels of the arc as drawn.
bool nearMotorArc(const MotorArc& arc, const QPointF& s, double reach);

// A linear driver at a slider: a double-headed arrow along the slide, beside
// the block.
std::optional<QLineF> slideArrow(const Mechanism& m, const ViewTransform& view, const Driver& d);

}  // namespace clevis::ui
