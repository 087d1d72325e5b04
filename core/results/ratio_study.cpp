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

// At every ratio, T_m(i) at each step from the same output torque, speed
// and acceleration (motorTorque), then its RMS over time and its peak, as
// the motor duty does at the gearbox's own ratio.
RatioStudy ratioStudy(const CompiledMechanism& m, const CycleResult& r, const std::vector<bool>& unreliable, int driver,
                      const Gearbox& g, const RatioRange& range)
{
    RatioStudy out{driver, {}, 0};
    // What does not depend on the ratio, once per step.
    std::vector<double> accel;
    for (const StepResult& s : r.steps) accel.push_back(driverAcceleration(m, driver, s));
    const StepResult* first = r.steps.data();
    const Steps steps{r.steps, unreliable};
    for (const double ratio : studyRatios(range)) {
        const StepValue torque = [&](const StepResult& s) {
            return motorTorque(g, ratio, s.effort[driver], s.driveRate[driver], accel[&s - first]);
        };
        out.points.push_back({ratio, timeRms(r.steps, torque), largestMagnitude(steps, torque)});
        if (out.points.back().torqueRms < out.points[out.best].torqueRms) out.best = out.points.size() - 1;
    }
    return out;
}

}  // namespace clevis
