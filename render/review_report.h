// The design-review report (PDF): the mechanism drawing, the inputs, the
// loads over the cycle, the peak-load table (the numbers of summarize(), as
// the command-line summary prints them), free-body diagrams at the critical
// positions, the sizing chapter (the N/V/M diagram of each bar at its
// critical position, the bearing loads in the body frame), the drive (when
// a driver has a gearbox or a cylinder: drive_report.h), the energy
// balance, and the cautions. Needs QtGui only, so it runs headless.
#pragma once

#include "core/results/cycle_summary.h"
#include "render/render_units.h"

#include <QString>

#include <functional>
#include <vector>

namespace clevis {
struct FoundMotion;
}

namespace clevis::ui {

struct ReviewReportInput {
    const CompiledMechanism& mechanism;
    const CycleResult& result;
    const CycleSummary& summary;
    QString sourceName;  // the file the mechanism came from
    RenderUnits units;
    // The mechanism as described, which `mechanism` was compiled from: it
    // tells which bodies are bars and their sections. None: the sizing
    // chapter says it cannot be drawn.
    const Mechanism* document = nullptr;
    // The motion `result` was solved at when a motor characteristic set it
    // (solveCycle); none when the motion is prescribed.
    const FoundMotion* found = nullptr;
};

// The report's numbered section titles, in order (tests look for them);
// with `drive`, the Drive chapter, written when a driver has a gearbox or a
// cylinder, is among them.
const std::vector<QString>& reviewReportSections(bool drive = false);

// Shared by the report's chapters: where a step is on the cycle's axis,
// "95.0 ° (step 95)", and a value from a step near a singular position with
// the mark the notes explain.
struct CycleAxis;
QString stepPlace(const CycleAxis& axis, int step);
QString markedValue(const QString& value, const PeakAt& p);

// A critical position: the step where a pin (a joint or a cylinder's end)
// carries its peak, and the body whose free-body diagram shows it. At most
// eight, the most heavily loaded pins first, one for each body and step.
struct CriticalPosition {
    QString reason;  // e.g. "peak at joint A"
    int body = -1;
    int step = -1;
};
std::vector<CriticalPosition> criticalPositions(const CompiledMechanism& m, const CycleSummary& s);

// Writes the report; `progress(done, total)` may return false to cancel.
// False with a message naming the file when it cannot be written.
bool writeReviewReport(const ReviewReportInput& in, const QString& path, QString* error,
                       const std::function<bool(int, int)>& progress = {});

}  // namespace clevis::ui
