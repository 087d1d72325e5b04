#include "render/cycle_axis.h"

#include "core/results/drive_units.h"

#include <cmath>

namespace clevis::ui {
namespace {

bool strictlyMonotonic(const std::vector<double>& v)
{
    if (v.size() < 2) return false;
    const double sign = v[1] > v[0] ? 1.0 : -1.0;
    for (std::size_t i = 1; i < v.size(); ++i)
        if (sign * (v[i] - v[i - 1]) <= 0) return false;
    return true;
}

}  // namespace

int CycleAxis::nearestStep(double x) const
{
    int best = 0;
    for (std::size_t i = 1; i < values.size(); ++i)
        if (std::abs(values[i] - x) < std::abs(values[best] - x)) best = int(i);
    return best;
}

QString CycleAxis::format(double x) const
{
    // Degrees to a tenth; metres and seconds to four places (0.1 mm, 0.1 ms).
    return QString("%1 %2").arg(x, 0, 'f', unit == "°" ? 1 : 4).arg(unit);
}

CycleAxis cycleAxis(const CompiledMechanism& m, const CycleResult& r)
{
    CycleAxis axis;
    if (m.drivers.size() == 1) {
        const CompiledDriver& d = m.drivers.front();
        for (const auto& s : r.steps) axis.values.push_back(driveDisplayValue(d.type, s.drivePosition[0]));
        if (strictlyMonotonic(axis.values)) {
            axis.unit = driveDisplayUnit(d.type);
            axis.name = QString("%1 %2").arg(QString::fromStdString(d.name),
                                             d.type == DriverType::Rotary ? "angle" : "position");
            axis.label = QString("%1 (%2)").arg(axis.name, axis.unit);
            axis.byTime = false;
            return axis;
        }
        axis.values.clear();
    }
    for (const auto& s : r.steps) axis.values.push_back(s.t);
    axis.unit = "s";
    axis.name = "time";
    axis.label = "time (s)";
    return axis;
}

double plannedEnd(const CycleAxis& axis, const CycleResult& r)
{
    if (axis.values.empty()) return 0;
    const int solved = int(axis.values.size()) - 1;
    if (r.complete || solved <= 0) return axis.values.back();
    return axis.values.front() + (axis.values.back() - axis.values.front()) * r.plannedSteps / solved;
}

}  // namespace clevis::ui
