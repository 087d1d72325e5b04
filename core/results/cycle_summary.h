// Figures over the cycle that a designer sizes parts with: peak and RMS pin
// loads, motor peak/RMS/mean effort and power, work per cycle, ground load
// peaks, transmission-angle extremes, the energy each driver puts in and
// takes back, and the energy-balance check. A value from a step flagged near
// a singular position is marked as such, and the part that locks is named.
#pragma once

#include "core/results/results.h"

#include <algorithm>
#include <cmath>
#include <functional>
#include <string>
#include <vector>

namespace clevis {

struct PeakAt {
    double value = 0.0;         // SI
    int step = -1;              // index into CycleResult::steps
    bool nearSingular = false;  // the step is flagged near a singular position: the value is unreliable
};

// A peak over the steps that are not flagged near a singular position and,
// apart, any larger value at a flagged step (`flagged.step` −1 when there is
// none). Only where every step is flagged is the peak itself flagged.
struct Peak : PeakAt {
    PeakAt flagged;
};

using StepValue = std::function<double(const StepResult&)>;

// The solved steps and which of them are unreliable (see unreliableSteps).
struct Steps {
    const std::vector<StepResult>& all;
    const std::vector<bool>& flagged;
};

// Peaks of a value over the steps, kept apart from the unreliable ones as
// Peak describes: the largest value, the smallest, and the signed value of
// largest magnitude.
Peak largest(const Steps& steps, const StepValue& f);
Peak smallest(const Steps& steps, const StepValue& f);
Peak largestMagnitude(const Steps& steps, const StepValue& f);

// ∫ max(f, 0) dt and ∫ min(f, 0) dt by the trapezoid rule, each interval
// where f changes sign split at the zero of the straight line between its
// ends, so that the two parts add up to trapezoid(steps, f) exactly.
std::pair<double, double> positiveAndNegative(const std::vector<StepResult>& steps, const StepValue& f);

struct JointSummary {
    std::string name;
    Peak peak;        // N, peak reaction magnitude
    double rms = 0;   // N, time-weighted over the solved part of the cycle
    Peak peakMoment;  // N·m, sliders only (|moment|)
};

struct DriverSummary {
    std::string name;
    DriverType type;
    Peak peak;  // N·m or N, signed effort of largest magnitude
    double rms = 0, mean = 0;
    Peak peakPower;         // W, largest power delivered to the mechanism
    Peak peakRegenerative;  // W, most negative power (the mechanism drives the motor), ≤ 0
    double work = 0;        // J, ∫ P dt over the solved part of the cycle
    double workIn = 0;      // J, ∫ max(P, 0) dt: energy the driver puts in
    double workOut = 0;     // J, ∫ min(P, 0) dt ≤ 0: energy it takes back out
};

struct TransmissionSummary {
    std::string joint;
    PeakAt minimum, maximum;  // degrees
};

// Less energy than this passing through the mechanism over the cycle (J) is
// rounding noise: there is nothing to balance and relativeResidual is 0.
inline constexpr double kNegligibleEnergy = 1e-9;

// Energy balance over the solved span [t₀, t₁]:
//   W_drivers = ΔT + ΔV_gravity + ΔV_springs + W_dampers − W_loads + residual.
// The energy passing through the mechanism (the scale of every term) is what
// its sources put in:
//   E_through = Σ_drivers ∫ max(P_d, 0) dt + ∫ max(P_loads, 0) dt
//               + max(0, −(ΔT + ΔV_gravity + ΔV_springs)),
// the last term being stored energy the mechanism gave up over the span.
struct EnergyBalance {
    double driverWork = 0, kineticChange = 0, gravityChange = 0, springChange = 0;  // J
    double damperWork = 0, loadWork = 0, residual = 0;                              // J
    double throughput = 0;                                                          // J, E_through
    double relativeResidual = 0;                                                    // |residual| / E_through
};

// A term of the balance under this share of E_through is shown as "≈ 0":
// it is below what the trapezoid rule resolves at usual step counts (a
// judgement, as the 0.1 % residual bound of the summary text).
inline constexpr double kNegligibleEnergyShare = 1e-3;
inline bool negligibleEnergy(double value, const EnergyBalance& e)
{
    return std::abs(value) <= std::max(kNegligibleEnergyShare * e.throughput, kNegligibleEnergy);
}

// A run of steps flagged near a singular position and the part that locks
// there: the two bodies that move most in the motion the drivers cannot
// control at the worst step (the right singular vector of the smallest
// singular value of the balanced Jacobian), and the joint between them.
struct NearToggle {
    int first = -1, last = -1, worst = -1;  // steps
    int bodies[2] = {kGround, kGround};     // kGround where fewer than two bodies move
    int joint = -1;                         // joint between the two bodies, -1 if none
};

struct CycleSummary {
    std::vector<JointSummary> joints;
    std::vector<JointSummary> cylinderEnds;  // per cylinderEnds(m) (core/results/cylinder_ends.h)
    std::vector<DriverSummary> drivers;
    Peak groundForce;   // N, peak magnitude of the shaking force
    Peak groundMoment;  // N·m, peak |moment| about the origin
    std::vector<TransmissionSummary> transmission;
    EnergyBalance energy;
    std::vector<bool> unreliable;  // per step: see unreliableSteps
    int nearSingularSteps = 0;     // steps that are unreliable
    std::vector<NearToggle> toggles;
};

// Steps whose loads are unreliable: flagged near a singular position by the
// solver, or, where the cycle stops short, ill-conditioned on the approach to
// the position beyond which the links cannot be joined.
std::vector<bool> unreliableSteps(const CycleResult& r);

CycleSummary summarize(const CompiledMechanism& m, const CycleResult& r);

}  // namespace clevis
