// What the drive view and the report's Drive chapter draw, described once
// from the drive results (drive_train.h), so the window and the page show
// the same figures: for a motor behind a gearbox, the torque over the cycle
// at the motor shaft, its torque against speed at every step over the
// motor's characteristic, and the ratio study; for a cylinder, its pressure
// (with the supply) and flow over the cycle. A per-step quantity over the
// cycle is a pane of curves (CycleChart), so another one, such as a speed
// found by integration, is one more pane here.
#pragma once

#include "core/results/drive_train.h"
#include "render/plot_panes.h"
#include "render/xy_chart.h"

namespace clevis::ui {

// The drive results of the solved cycle (driveResults) with, for every
// motor behind a gearbox, its ratio study over ratioRangeAround(its ratio):
// what the drive view and the report show.
// `found` as for driveResults: the motion `r` was solved at, if a motor set it.
DriveResults driveResultsWithStudies(const Mechanism& doc, const CompiledMechanism& m, const CycleResult& r,
                                     const std::vector<bool>& unreliable,
                                     const std::optional<FoundMotion>& found = std::nullopt);

// Whether any driver has drive data to show: a gearbox or a cylinder.
bool hasDriveFigures(const DriveResults& d);

// The motor's torque at its shaft over the cycle.
std::vector<PlotPane> motorPanes(const CompiledMechanism& m, const MotorDuty& d, const RenderUnits& u);

// The found motion's speed at the output over the cycle (rpm), its time
// average drawn across, the fluctuation C_s in the title.
PlotPane speedPane(const CompiledMechanism& m, const CycleResult& r, const FoundMotion& found);

// The flywheel of a found motion in words: its inertia, and where sizing was
// asked for, the energy estimate, the integrated value and the C_s reached.
QString flywheelText(const CompiledMechanism& m, const FoundMotion& found);

// Pressure on the working side with the supply pressure across, and the flow into it (L/min).
std::vector<PlotPane> cylinderPanes(const CompiledMechanism& m, const CylinderDuty& c, const RenderUnits& u);

// Torque (display unit) against speed (rpm) at the motor shaft, one dot per
// step, over the motor's characteristic when one is given; the peak torque circled.
XyChartContent torqueSpeedContent(const CompiledMechanism& m, const MotorDuty& d,
                                  const std::optional<MotorCharacteristic>& motor, const RenderUnits& u);

// RMS and peak motor torque against the gear ratio (log scale), the least
// RMS torque and the gearbox's own ratio circled.
XyChartContent ratioStudyContent(const CompiledMechanism& m, const RatioStudy& s, double givenRatio,
                                 const RenderUnits& u);

}  // namespace clevis::ui
