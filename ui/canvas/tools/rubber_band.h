// The line from a stroke's start to the pointer, with its length and angle
// in display units, so the designer sees the dimension before committing.
#pragma once

#include "core/model/geometry.h"
#include "ui/canvas/view_transform.h"

#include <QPainter>

namespace clevis::ui {

// The dashed line; with `measured`, its length and angle beside the far end.
void paintRubberBand(QPainter& p, const ViewTransform& view, const Vec2& from, const Vec2& to, bool measured = true);
// The box of a length and an angle being typed, below and right of `at`;
// the field being typed into is underlined.
void paintTypedInput(QPainter& p, const QPointF& at, const QString& length, const QString& angle,
                     const QString& lengthUnit, bool onAngle);
void paintSnapMark(QPainter& p, const ViewTransform& view, const Vec2& at);

}  // namespace clevis::ui
