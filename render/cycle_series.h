// The curves shown over the cycle, in display units, one value per step:
// joint reactions, driver effort and power, shaking force and moment on the
// frame, transmission angles. Shared by the plot panes and the report.
#pragma once

#include "core/results/cylinder_ends.h"
#include "core/results/results.h"
#include "render/cycle_axis.h"
#include "render/render_units.h"

#include <QString>

#include <vector>

namespace clevis::ui {

struct CycleSeries {
    QString name;  // e.g. "A |F|"
    QString unit;
    std::vector<double> values;
};

enum class ReactionPart { Magnitude, X, Y };

CycleSeries jointReactionSeries(const CompiledMechanism& m, const CycleResult& r, int joint, ReactionPart part,
                                const RenderUnits& u);
// The same for a cylinder's end pin (core/results/cylinder_ends.h).
CycleSeries endReactionSeries(const CompiledMechanism& m, const CycleResult& r, const CylinderEnd& end,
                              ReactionPart part, const RenderUnits& u);
CycleSeries driverEffortSeries(const CompiledMechanism& m, const CycleResult& r, int driver, const RenderUnits& u);
CycleSeries driverPowerSeries(const CompiledMechanism& m, const CycleResult& r, int driver);
CycleSeries shakingForceSeries(const CycleResult& r, const RenderUnits& u);
CycleSeries shakingMomentSeries(const CycleResult& r, const RenderUnits& u);
CycleSeries transmissionSeries(const CompiledMechanism& m, const CycleResult& r, int pin);

// Where a curve peaks, as the summary judges it: the step of largest |value|
// among the reliable steps (the first of equals) and, apart, the step of a
// larger |value| at an unreliable one (see unreliableSteps); −1 for none.
struct CurvePeak {
    int step = -1;
    int flaggedStep = -1;
};
CurvePeak curvePeak(const std::vector<double>& values, const std::vector<bool>& unreliable);

// "12.34 N at 120.0 °", and "(⚠ 156.0 kN at 179.0 °, unreliable)" after it
// when a larger value comes from an unreliable step.
QString peakText(const CycleSeries& s, const CycleAxis& axis, const CurvePeak& peak);

// Runs of consecutive unreliable steps, as [first, last] step indices.
std::vector<std::pair<int, int>> unreliableRuns(const std::vector<bool>& unreliable);

}  // namespace clevis::ui
