// The review report's Drive chapter: for each motor behind a gearbox its
// duty (torque, speed, power, regenerated energy, the inertia it sees), its
// torque over the cycle and against speed, and the gear ratio study (plot
// and table); for each cylinder its pressure and flow; and what these
// figures leave out. Written only when a driver has a gearbox or a cylinder.
#pragma once

#include "core/results/drive_train.h"
#include "render/cycle_axis.h"
#include "render/page_flow.h"
#include "render/review_report.h"

namespace clevis::ui {

void driveChapter(PageFlow& f, const ReviewReportInput& in, const CycleAxis& axis, const DriveResults& d);

}  // namespace clevis::ui
