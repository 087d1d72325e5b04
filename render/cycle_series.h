// The curves shown over the cycle, in display units, one value per step:
// joint reactions, driver effort and power, shaking force and moment on the
// frame, transmission angles. Shared by the plot panes and the report.
#pragma once

#include "core/results/results.h"
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
CycleSeries driverEffortSeries(const CompiledMechanism& m, const CycleResult& r, int driver, const RenderUnits& u);
CycleSeries driverPowerSeries(const CompiledMechanism& m, const CycleResult& r, int driver);
CycleSeries shakingForceSeries(const CycleResult& r, const RenderUnits& u);
CycleSeries shakingMomentSeries(const CycleResult& r, const RenderUnits& u);
CycleSeries transmissionSeries(const CompiledMechanism& m, const CycleResult& r, int pin);

// The step where |value| is largest (the first of equals); -1 when there are no values.
int peakStep(const std::vector<double>& values);

// Runs of consecutive steps the solver flagged near a singular position, as
// [first, last] step indices.
std::vector<std::pair<int, int>> nearSingularRuns(const CycleResult& r);

}  // namespace clevis::ui
