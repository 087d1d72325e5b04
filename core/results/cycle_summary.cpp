#include "core/results/cycle_summary.h"

#include "core/results/step_integral.h"

#include <cmath>
#include <functional>

namespace clevis {
namespace {

using StepValue = std::function<double(const StepResult&)>;

// The step where `key` is largest (first such step); value is f there.
PeakAt peakBy(const std::vector<StepResult>& steps, const StepValue& f, const StepValue& key)
{
    PeakAt p;
    double best = 0.0;
    for (std::size_t i = 0; i < steps.size(); ++i) {
        const double k = key(steps[i]);
        if (p.step < 0 || k > best) {
            best = k;
            p = {f(steps[i]), int(i)};
        }
    }
    return p;
}

PeakAt largest(const std::vector<StepResult>& steps, const StepValue& f) { return peakBy(steps, f, f); }

PeakAt smallest(const std::vector<StepResult>& steps, const StepValue& f)
{
    return peakBy(steps, f, [&](const StepResult& s) { return -f(s); });
}

// Signed value of largest magnitude.
PeakAt largestMagnitude(const std::vector<StepResult>& steps, const StepValue& f)
{
    return peakBy(steps, f, [&](const StepResult& s) { return std::abs(f(s)); });
}

JointSummary summarizeJoint(const CompiledMechanism& m, const std::vector<StepResult>& steps, std::size_t j)
{
    const StepValue force = [j](const StepResult& s) { return s.joints[j].force.norm(); };
    JointSummary out;
    out.name = m.joints[j].name;
    out.peak = largest(steps, force);
    out.rms = timeRms(steps, force);
    if (m.joints[j].type == JointType::Slider)
        out.peakMoment = largest(steps, [j](const StepResult& s) { return std::abs(s.joints[j].moment); });
    return out;
}

DriverSummary summarizeDriver(const CompiledMechanism& m, const std::vector<StepResult>& steps, std::size_t d)
{
    const StepValue effort = [d](const StepResult& s) { return s.effort[d]; };
    const StepValue power = [d](const StepResult& s) { return s.power[d]; };
    DriverSummary out;
    out.name = m.drivers[d].name;
    out.type = m.drivers[d].type;
    out.peak = largestMagnitude(steps, effort);
    out.rms = timeRms(steps, effort);
    out.mean = timeMean(steps, effort);
    // Power delivered and regenerated are reported only where they occur.
    if (const PeakAt p = largest(steps, power); p.value > 0.0) out.peakPower = p;
    if (const PeakAt p = smallest(steps, power); p.value < 0.0) out.peakRegenerative = p;
    out.work = trapezoid(steps, power);
    return out;
}

TransmissionSummary summarizeTransmission(const CompiledMechanism& m, const CycleResult& r, std::size_t k)
{
    const StepValue angle = [k](const StepResult& s) { return s.transmissionDeg[k]; };
    return {m.joints[r.transmissionPins[k].joint].name, smallest(r.steps, angle), largest(r.steps, angle)};
}

double totalDriverPower(const StepResult& s)
{
    double sum = 0.0;
    for (const double p : s.power) sum += p;
    return sum;
}

EnergyBalance balanceEnergy(const std::vector<StepResult>& steps)
{
    EnergyBalance e;
    if (steps.empty()) return e;
    const StepResult &first = steps.front(), &last = steps.back();
    e.driverWork = trapezoid(steps, totalDriverPower);
    e.kineticChange = last.kinetic - first.kinetic;
    e.gravityChange = last.gravityPotential - first.gravityPotential;
    e.springChange = last.springPotential - first.springPotential;
    e.damperWork = trapezoid(steps, [](const StepResult& s) { return s.damperDissipation; });
    e.loadWork = trapezoid(steps, [](const StepResult& s) { return s.appliedPower; });
    e.residual = e.driverWork - (e.kineticChange + e.gravityChange + e.springChange + e.damperWork - e.loadWork);
    e.gross = trapezoid(steps,
                        [](const StepResult& s) {
                            return std::abs(totalDriverPower(s)) + std::abs(s.appliedPower) + s.damperDissipation;
                        }) +
              std::abs(e.kineticChange) + std::abs(e.gravityChange) + std::abs(e.springChange);
    e.relativeResidual = e.gross > kNegligibleEnergy ? std::abs(e.residual) / e.gross : 0.0;
    return e;
}

}  // namespace

CycleSummary summarize(const CompiledMechanism& m, const CycleResult& r)
{
    const auto& steps = r.steps;
    CycleSummary out;
    for (std::size_t j = 0; j < m.joints.size(); ++j) out.joints.push_back(summarizeJoint(m, steps, j));
    for (std::size_t d = 0; d < m.drivers.size(); ++d) out.drivers.push_back(summarizeDriver(m, steps, d));
    out.groundForce = largest(steps, [](const StepResult& s) { return s.groundForce.norm(); });
    out.groundMoment = largest(steps, [](const StepResult& s) { return std::abs(s.groundMoment); });
    for (std::size_t k = 0; k < r.transmissionPins.size(); ++k)
        out.transmission.push_back(summarizeTransmission(m, r, k));
    out.energy = balanceEnergy(steps);
    for (const auto& s : steps) out.nearSingularSteps += s.nearSingular ? 1 : 0;
    return out;
}

}  // namespace clevis
