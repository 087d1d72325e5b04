// The line from a stroke's start to the pointer, with its length and angle
// in display units, so the designer sees the dimension before committing.
#pragma once

#include "core/model/geometry.h"
#include "ui/canvas/view_transform.h"

#include <QPainter>

namespace clevis::ui {

void paintRubberBand(QPainter& p, const ViewTransform& view, const Vec2& from, const Vec2& to);
void paintSnapMark(QPainter& p, const ViewTransform& view, const Vec2& at);

}  // namespace clevis::ui
