#include "render/cycle_series.h"

#include <algorithm>
#include <cmath>
#include <functional>

namespace clevis::ui {
namespace {

std::vector<double> collect(const CycleResult& r, const std::function<double(const StepResult&)>& f)
{
    std::vector<double> out;
    out.reserve(r.steps.size());
    for (const auto& s : r.steps) out.push_back(f(s));
    return out;
}

}  // namespace

CycleSeries jointReactionSeries(const CompiledMechanism& m, const CycleResult& r, int joint, ReactionPart part,
                                const RenderUnits& u)
{
    static const char* suffix[] = {" |F|", " Fx", " Fy"};
    const double k = u.forcePerNewton;
    return {QString::fromStdString(m.joints[joint].name) + suffix[int(part)], u.forceSymbol,
            collect(r, [&](const StepResult& s) {
                const Vec2& f = s.joints[joint].force;
                return k * (part == ReactionPart::Magnitude ? f.norm() : part == ReactionPart::X ? f.x() : f.y());
            })};
}

CycleSeries driverEffortSeries(const CompiledMechanism& m, const CycleResult& r, int driver, const RenderUnits& u)
{
    const bool rotary = m.drivers[driver].type == DriverType::Rotary;
    const double k = rotary ? u.torquePerNewtonMetre : u.forcePerNewton;
    return {QString::fromStdString(m.drivers[driver].name) + (rotary ? " torque" : " force"),
            rotary ? u.torqueSymbol : u.forceSymbol,
            collect(r, [&](const StepResult& s) { return k * s.effort[driver]; })};
}

CycleSeries driverPowerSeries(const CompiledMechanism& m, const CycleResult& r, int driver)
{
    return {QString::fromStdString(m.drivers[driver].name) + " power", "W",
            collect(r, [&](const StepResult& s) { return s.power[driver]; })};
}

CycleSeries shakingForceSeries(const CycleResult& r, const RenderUnits& u)
{
    return {"shaking force", u.forceSymbol,
            collect(r, [&](const StepResult& s) { return u.forcePerNewton * s.groundForce.norm(); })};
}

CycleSeries shakingMomentSeries(const CycleResult& r, const RenderUnits& u)
{
    return {"shaking moment (about origin)", u.torqueSymbol,
            collect(r, [&](const StepResult& s) { return u.torquePerNewtonMetre * s.groundMoment; })};
}

CycleSeries transmissionSeries(const CompiledMechanism& m, const CycleResult& r, int pin)
{
    return {QString::fromStdString(m.joints[r.transmissionPins[pin].joint].name) + " transmission angle", "°",
            collect(r, [&](const StepResult& s) { return s.transmissionDeg[pin]; })};
}

int peakStep(const std::vector<double>& values)
{
    const auto peak =
        std::max_element(values.begin(), values.end(), [](double a, double b) { return std::abs(a) < std::abs(b); });
    return peak == values.end() ? -1 : int(peak - values.begin());
}

std::vector<std::pair<int, int>> nearSingularRuns(const CycleResult& r)
{
    std::vector<std::pair<int, int>> runs;
    for (int i = 0; i < int(r.steps.size()); ++i) {
        if (!r.steps[i].nearSingular) continue;
        if (!runs.empty() && runs.back().second == i - 1) runs.back().second = i;
        else runs.emplace_back(i, i);
    }
    return runs;
}

}  // namespace clevis::ui
