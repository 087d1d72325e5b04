// Integrals and averages over the solved steps of a cycle by the trapezoid
// rule: the one place every cycle total (work, RMS, mean) is computed.
#pragma once

#include "core/results/results.h"

#include <cmath>
#include <vector>

namespace clevis {

// ∫ f dt over the steps, f evaluated on each StepResult.
template <class F>
double trapezoid(const std::vector<StepResult>& steps, F&& f)
{
    double sum = 0.0;
    for (std::size_t i = 1; i < steps.size(); ++i)
        sum += 0.5 * (steps[i].t - steps[i - 1].t) * (f(steps[i - 1]) + f(steps[i]));
    return sum;
}

inline double solvedSpan(const std::vector<StepResult>& steps)
{
    return steps.size() < 2 ? 0.0 : steps.back().t - steps.front().t;
}

// Time-weighted mean; a single step is its own mean.
template <class F>
double timeMean(const std::vector<StepResult>& steps, F&& f)
{
    if (steps.empty()) return 0.0;
    const double span = solvedSpan(steps);
    return span > 0.0 ? trapezoid(steps, f) / span : f(steps.front());
}

// Time-weighted root mean square.
template <class F>
double timeRms(const std::vector<StepResult>& steps, F&& f)
{
    return std::sqrt(timeMean(steps, [&](const StepResult& s) {
        const double v = f(s);
        return v * v;
    }));
}

}  // namespace clevis
