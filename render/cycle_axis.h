// The horizontal axis results are plotted against: the driver's position
// when a single driver moves steadily one way through the cycle (what a
// designer thinks in: crank angle, ram stroke), otherwise time.
#pragma once

#include "core/results/results.h"

#include <QString>

#include <vector>

namespace clevis::ui {

struct CycleAxis {
    QString name;   // e.g. "motor angle", "ram position" or "time"
    QString label;  // the name and the unit: "motor angle (°)"
    QString unit;   // "°", "m" or "s"
    bool byTime = true;
    std::vector<double> values;  // one per step, in `unit`

    // The step whose value is nearest `x`.
    int nearestStep(double x) const;
    // A position on the axis with its unit, to the precision a reader needs:
    // "120.0 °", "0.0412 m", "0.2500 s".
    QString format(double x) const;
};

CycleAxis cycleAxis(const CompiledMechanism& m, const CycleResult& r);

// Where the planned cycle ends on the axis: the last value when the cycle was
// completed, else extrapolated past it at the solved spacing, so the part not
// reached can be shown.
double plannedEnd(const CycleAxis& axis, const CycleResult& r);

}  // namespace clevis::ui
