// The edits of the tools drawn with two clicks: sliders and slots (a point,
// then the axis), springs, dampers and cylinders (end to end), forces (the
// point, then the direction it pushes). Each edits a trial copy of the
// mechanism and returns the undo text, or sets `problem`.
#pragma once

#include "ui/canvas/tools/two_point_tool.h"

namespace clevis::ui {

QString drawSlider(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem);
QString drawSlot(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem);
QString drawSpring(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem);
QString drawDamper(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem);
QString drawCylinder(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem);
QString drawForce(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem);

}  // namespace clevis::ui
