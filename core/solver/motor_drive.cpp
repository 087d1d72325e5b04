#include "core/solver/motor_drive.h"

#include "core/solver/analysis_error.h"

#include <cmath>

namespace clevis {
namespace {

// A load scaled over time cannot be placed on a motion whose times are not
// known until it is found.
void refuseTimeProfiles(const CompiledMechanism& m, const std::string& driver)
{
    const auto refuse = [&](const std::string& load) {
        throw AnalysisError("load " + load + ": its profile is over time, but driver " + driver +
                                " has a motor, whose speed is found, not given: give the profile over the "
                                "driver's position (at_deg) instead",
                            {load});
    };
    for (const auto& f : m.forces)
        if (f.profile && f.profile->driver < 0) refuse(f.name);
    for (const auto& t : m.torques)
        if (t.profile && t.profile->driver < 0) refuse(t.name);
}

FoundMotion findMotion(const Driver& d, const CompiledMechanism& m, int steps)
{
    const double expected = std::get<ConstantSpeed>(d.motion).speed;
    CycleIntegrator cycles(m, steps, expected < 0.0 ? -1 : 1);
    FoundMotion out;
    if (d.fluctuationTarget) {
        SizedFlywheel sized = sizeFlywheel(cycles, d);
        out.cycle = std::move(sized.cycle);
        out.flywheelInertia = sized.sizing.integrated;
        out.sizing = sized.sizing;
    } else {
        out.flywheelInertia = d.flywheel ? d.flywheel->inertia : 0.0;
        out.cycle = cycles.steady(driveTrainOf(d, out.flywheelInertia), std::abs(expected));
    }
    return out;
}

}  // namespace

const Driver* motorDriver(const Mechanism& doc)
{
    if (doc.drivers.size() != 1 || !doc.drivers.front().motor) return nullptr;
    return &doc.drivers.front();
}

SolvedCycle solveCycle(const Mechanism& doc, const CompiledMechanism& m, const SweepOptions& options)
{
    SolvedCycle out{m, {}, std::nullopt};
    const Driver* d = motorDriver(doc);
    if (!d || m.drivers.size() != 1) {
        out.r = sweepCycle(m, options);
        return out;
    }
    // The prescribed cycle first: it checks that the mechanism moves as it
    // should and can be assembled all round, with the sweep's own messages.
    const CycleResult prescribed = sweepCycle(m, options);
    if (!prescribed.complete) {
        out.r = prescribed;
        return out;
    }
    refuseTimeProfiles(m, d->name);
    const int steps = options.steps > 0 ? options.steps : m.steps;
    out.found = findMotion(*d, m, steps);
    CompiledDriver& driver = out.m.drivers.front();
    driver.found = out.found->cycle.samples;
    out.m.duration = out.found->cycle.period;
    SweepOptions real = options;
    for (const MotionSample& s : driver.found) real.times.push_back(s.t);
    out.r = sweepCycle(out.m, real);
    return out;
}

}  // namespace clevis
