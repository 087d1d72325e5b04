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

CycleSeries reactionSeries(const std::string& name, const CycleResult& r, ReactionPart part, const RenderUnits& u,
                           const std::function<Vec2(const StepResult&)>& force)
{
    static const char* suffix[] = {" |F|", " Fx", " Fy"};
    const double k = u.forcePerNewton;
    return {QString::fromStdString(name) + suffix[int(part)], u.forceSymbol, collect(r, [&](const StepResult& s) {
                const Vec2 f = force(s);
                return k * (part == ReactionPart::Magnitude ? f.norm() : part == ReactionPart::X ? f.x() : f.y());
            })};
}

}  // namespace

CycleSeries jointReactionSeries(const CompiledMechanism& m, const CycleResult& r, int joint, ReactionPart part,
                                const RenderUnits& u)
{
    return reactionSeries(m.joints[joint].name, r, part, u,
                          [joint](const StepResult& s) { return s.joints[joint].force; });
}

CycleSeries endReactionSeries(const CompiledMechanism& m, const CycleResult& r, const CylinderEnd& end,
                              ReactionPart part, const RenderUnits& u)
{
    return reactionSeries(end.name, r, part, u, [&](const StepResult& s) { return endReaction(m, s, end).force; });
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

CurvePeak curvePeak(const std::vector<double>& values, const std::vector<bool>& unreliable)
{
    int steps[2] = {-1, -1};  // reliable, unreliable
    for (std::size_t i = 0; i < values.size(); ++i) {
        int& best = steps[i < unreliable.size() && unreliable[i] ? 1 : 0];
        if (best < 0 || std::abs(values[i]) > std::abs(values[std::size_t(best)])) best = int(i);
    }
    if (steps[0] < 0) return {steps[1], -1};  // every step unreliable
    if (steps[1] >= 0 && std::abs(values[std::size_t(steps[1])]) > std::abs(values[std::size_t(steps[0])]))
        return {steps[0], steps[1]};
    return {steps[0], -1};
}

QString peakText(const CycleSeries& s, const CycleAxis& axis, const CurvePeak& peak)
{
    const auto at = [&](int k) {
        return QStringLiteral("%1 at %2")
            .arg(formatQuantity(s.values[std::size_t(k)], s.unit),
                 axis.format(axis.values[std::min<std::size_t>(std::size_t(k), axis.values.size() - 1)]));
    };
    if (peak.step < 0 || axis.values.empty()) return {};
    QString text = at(peak.step);
    if (peak.flaggedStep >= 0) text += QStringLiteral("  (⚠ %1, unreliable)").arg(at(peak.flaggedStep));
    return text;
}

std::vector<std::pair<int, int>> unreliableRuns(const std::vector<bool>& unreliable)
{
    std::vector<std::pair<int, int>> runs;
    for (int i = 0; i < int(unreliable.size()); ++i) {
        if (!unreliable[std::size_t(i)]) continue;
        if (!runs.empty() && runs.back().second == i - 1) runs.back().second = i;
        else runs.emplace_back(i, i);
    }
    return runs;
}

}  // namespace clevis::ui
