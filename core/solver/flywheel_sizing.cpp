#include "core/solver/flywheel_sizing.h"

#include "core/results/number_text.h"

#include <cmath>
#include <optional>

namespace clevis {

SizedFlywheel sizeFlywheel(CycleIntegrator& cycles, const Driver& d)
{
    SizedFlywheel out;
    FlywheelSizing& f = out.sizing;
    f.target = *d.fluctuationTarget;
    f.on = d.flywheel ? d.flywheel->on : FlywheelShaft::Output;
    const double expected = std::abs(std::get<ConstantSpeed>(d.motion).speed);
    const double ratio = f.on == FlywheelShaft::Motor && d.gearbox ? d.gearbox->ratio : 1.0;
    // A trial: the steady cycle with inertia J on the flywheel's shaft, or none where it stalls.
    const auto trial = [&](double inertia) -> std::optional<SteadyCycle> {
        ++f.trials;
        try {
            return cycles.steady(driveTrainOf(d, inertia), expected);
        } catch (const MotorStall&) {
            return std::nullopt;
        }
    };
    std::optional<SteadyCycle> bare = trial(0.0);
    f.energySwing = cycles.energySwing(expected);
    f.speed = expected * ratio;
    f.estimate = f.energySwing / (f.target * f.speed * f.speed);
    const auto within = [&](const SteadyCycle& c) {
        return std::abs(c.fluctuation - f.target) <= kFluctuationTolerance * f.target;
    };
    if (bare && (bare->fluctuation <= f.target || within(*bare))) {
        f.achieved = bare->fluctuation;
        out.cycle = std::move(*bare);
        return out;
    }
    // 1/C_s − 1/C_target: negative while the fluctuation is too large (or the motor stalls).
    const auto mismatch = [&](const std::optional<SteadyCycle>& c) {
        return c ? 1.0 / c->fluctuation - 1.0 / f.target : -1.0 / f.target;
    };
    double lo = 0.0, mlo = mismatch(bare);
    double hi = std::max(f.estimate, 1e-12);
    std::optional<SteadyCycle> high = trial(hi);
    double mhi = mismatch(high);
    while (mhi < 0.0 && f.trials < kMaxFlywheelTrials) {
        lo = hi;
        mlo = mhi;
        hi *= 4.0;
        high = trial(hi);
        mhi = mismatch(high);
    }
    if (mhi < 0.0)
        throw AnalysisError("driver " + d.name + ": no flywheel up to " + significant(hi) +
                                " kg·m² brings the speed fluctuation down to " + significant(f.target),
                            {d.name});
    // The least fluctuation found is kept unless one within the tolerance
    // turns up (`high` holds a cycle: a stall's mismatch is negative).
    SteadyCycle best = std::move(*high);
    double bestInertia = hi;
    while (!within(best) && f.trials < kMaxFlywheelTrials) {
        double next = lo - mlo * (hi - lo) / (mhi - mlo);
        if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
        std::optional<SteadyCycle> c = trial(next);
        const double m = mismatch(c);
        if (m < 0.0 && !(c && within(*c))) {
            lo = next;
            mlo = m;
            continue;
        }
        hi = next;
        mhi = m;
        best = std::move(*c);
        bestInertia = next;
    }
    f.integrated = bestInertia;
    f.achieved = best.fluctuation;
    out.cycle = std::move(best);
    return out;
}

}  // namespace clevis
