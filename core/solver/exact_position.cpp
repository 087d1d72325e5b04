#include "core/solver/exact_position.h"

#include "core/solver/analysis_error.h"
#include "core/solver/driver_motion.h"
#include "core/solver/step_solver.h"

#include <algorithm>
#include <cmath>
#include <stdexcept>

namespace clevis {
namespace {

std::size_t nearestStep(const CycleResult& r, double t)
{
    std::size_t best = 0;
    for (std::size_t i = 1; i < r.steps.size(); ++i)
        if (std::abs(r.steps[i].t - t) < std::abs(r.steps[best].t - t)) best = i;
    return best;
}

// Signed gap from the target, rotary positions brought within half a turn.
double gap(const CompiledDriver& d, double position, double target)
{
    return d.type == DriverType::Rotary ? std::remainder(position - target, 2.0 * kPi) : position - target;
}

}  // namespace

StepResult solveAtTime(const CompiledMechanism& m, const CycleResult& r, double t)
{
    if (r.steps.empty() || !(t >= r.steps.front().t - 1e-12) || !(t <= r.steps.back().t + 1e-12))
        throw std::out_of_range("t = " + std::to_string(t) + " s is outside the solved cycle");
    const StepResult& from = r.steps[nearestStep(r, t)];
    // Taylor's series to second order about the nearest step.
    const double h = t - from.t;
    VectorXd q = from.q + h * from.qd + 0.5 * h * h * from.qdd;
    StepSolver solver(m);
    if (!solver.assemble(t, q))
        throw AnalysisError("The mechanism cannot be assembled at t = " + std::to_string(t) + " s.", {});
    return solver.analyse(t, q);
}

std::optional<double> timeAtDrivePosition(const CompiledMechanism& m, const CycleResult& r, int driver, double position)
{
    const CompiledDriver& d = m.drivers[std::size_t(driver)];
    const DriverMotion motion(d, m.duration);
    const auto f = [&](double t) { return gap(d, motion(t).position, position); };
    for (std::size_t i = 0; i < r.steps.size(); ++i) {
        double lo = r.steps[i].t, flo = f(lo);
        if (flo == 0.0) return lo;
        if (i + 1 == r.steps.size()) break;
        double hi = r.steps[i + 1].t, fhi = f(hi);
        // A sign change, not the jump of a rotary gap from +π to −π.
        if ((flo < 0.0) == (fhi < 0.0) || fhi == 0.0 || std::abs(flo - fhi) > kPi) continue;
        // Bisection until the bracket stops shrinking: exact to the last bit.
        for (double mid = 0.5 * (lo + hi); mid > lo && mid < hi; mid = 0.5 * (lo + hi)) {
            const double fm = f(mid);
            if (fm == 0.0) return mid;
            ((fm < 0.0) == (flo < 0.0) ? lo : hi) = mid;
        }
        return std::abs(f(lo)) <= std::abs(f(hi)) ? lo : hi;
    }
    return std::nullopt;
}

int insertStep(CycleResult& r, StepResult step)
{
    const auto at =
        std::lower_bound(r.steps.begin(), r.steps.end(), step.t, [](const StepResult& s, double t) { return s.t < t; });
    if (at != r.steps.end() && at->t == step.t) {
        *at = std::move(step);
        return int(at - r.steps.begin());
    }
    const auto inserted = r.steps.insert(at, std::move(step));
    return int(inserted - r.steps.begin());
}

}  // namespace clevis
