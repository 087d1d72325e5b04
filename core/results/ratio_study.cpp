#include "core/results/ratio_study.h"

#include "core/results/drive_train.h"
#include "core/results/step_integral.h"

#include <cmath>

namespace clevis {

// i_k = i_from · (i_to / i_from)^(k / (n − 1)), k = 0 … n − 1.
std::vector<double> studyRatios(const RatioRange& range)
{
    std::vector<double> ratios;
    const double factor = std::log(range.to / range.from);
    for (int k = 0; k < range.count; ++k)
        ratios.push_back(k == range.count - 1 ? range.to
                                              : range.from * std::exp(factor * k / std::max(range.count - 1, 1)));
    return ratios;
}

RatioRange ratioRangeAround(double ratio) { return {ratio / 4.0, ratio * 4.0, 41}; }

std::string ratioStudyMotionText(const CompiledMechanism& m, const RatioStudy& s)
{
    if (m.drivers[std::size_t(s.driver)].found.empty()) return "the same motion at the output";
    return "the motion at the output found at the gearbox's own ratio; at another ratio the motor would turn the "
           "mechanism at another speed, which the study does not follow";
}

namespace {

// T_m at step k is a_k/i + b_k·i (motorTorque): a_k = T/η while power flows
// to the mechanism, T·η while it flows back (the direction does not depend
// on i), b_k = (J_m + J_g)·α.
struct Terms {
    std::vector<double> a, b;
};

Terms splitTorque(const CompiledMechanism& m, const CycleResult& r, int driver, const Gearbox& g)
{
    Terms t;
    for (const StepResult& s : r.steps) {
        t.a.push_back(motorTorque(g, 1.0, s.effort[driver], s.driveRate[driver], 0.0));
        t.b.push_back(motorTorque(g, 1.0, 0.0, 0.0, driverAcceleration(m, driver, s)));
    }
    return t;
}

// The signed T_m of largest magnitude, kept apart from unreliable steps as
// the summary's peaks are (Peak).
Peak peakTorque(const Terms& t, double ratio, const std::vector<bool>& unreliable)
{
    PeakAt best[2];  // over the reliable steps, over the unreliable ones
    for (std::size_t k = 0; k < t.a.size(); ++k) {
        const double v = t.a[k] / ratio + t.b[k] * ratio;
        PeakAt& p = best[unreliable[k] ? 1 : 0];
        if (p.step < 0 || std::abs(v) > std::abs(p.value)) p = {v, int(k), bool(unreliable[k])};
    }
    Peak out;
    static_cast<PeakAt&>(out) = best[0].step >= 0 ? best[0] : best[1];
    if (best[0].step >= 0 && best[1].step >= 0 && std::abs(best[1].value) > std::abs(best[0].value))
        out.flagged = best[1];
    return out;
}

}  // namespace

// With T_m = a/i + b·i at every step, its mean square over time is
//   ⟨T_m²⟩ = ⟨a²⟩/i² + 2⟨a·b⟩ + ⟨b²⟩·i²,
// the three means taken once by the summary's trapezoid rule (which is
// linear in the step values, so this is the RMS of the duty exactly); only
// the peak needs a pass over the steps at each ratio.
RatioStudy ratioStudy(const CompiledMechanism& m, const CycleResult& r, const std::vector<bool>& unreliable, int driver,
                      const Gearbox& g, const RatioRange& range)
{
    RatioStudy out{driver, {}, 0};
    const Terms t = splitTorque(m, r, driver, g);
    const StepResult* first = r.steps.data();
    const auto index = [first](const StepResult& s) { return std::size_t(&s - first); };
    const double aa = timeMean(r.steps, [&](const StepResult& s) { return t.a[index(s)] * t.a[index(s)]; });
    const double ab = timeMean(r.steps, [&](const StepResult& s) { return t.a[index(s)] * t.b[index(s)]; });
    const double bb = timeMean(r.steps, [&](const StepResult& s) { return t.b[index(s)] * t.b[index(s)]; });
    for (const double ratio : studyRatios(range)) {
        const double meanSquare = aa / (ratio * ratio) + 2.0 * ab + bb * ratio * ratio;
        out.points.push_back({ratio, std::sqrt(std::max(meanSquare, 0.0)), peakTorque(t, ratio, unreliable)});
        if (out.points.back().torqueRms < out.points[out.best].torqueRms) out.best = out.points.size() - 1;
    }
    return out;
}

}  // namespace clevis
