// Figures over the cycle that a designer sizes parts with: peak and RMS pin
// loads, motor peak/RMS/mean effort and power, work per cycle, ground load
// peaks, transmission-angle extremes and the energy-balance check.
#pragma once

#include "core/results/results.h"

#include <string>
#include <vector>

namespace clevis {

struct PeakAt {
    double value = 0.0;  // SI
    int step = -1;       // index into CycleResult::steps
};

struct JointSummary {
    std::string name;
    PeakAt peak;        // N, peak reaction magnitude
    double rms = 0;     // N, time-weighted over the solved part of the cycle
    PeakAt peakMoment;  // N·m, sliders only (|moment|)
};

struct DriverSummary {
    std::string name;
    DriverType type;
    PeakAt peak;  // N·m or N, signed effort of largest magnitude
    double rms = 0, mean = 0;
    PeakAt peakPower;         // W, largest power delivered to the mechanism
    PeakAt peakRegenerative;  // W, most negative power (the mechanism drives the motor), ≤ 0
    double work = 0;          // J, ∫ power dt over the solved part of the cycle
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
struct EnergyBalance {
    double driverWork = 0, kineticChange = 0, gravityChange = 0, springChange = 0;  // J
    double damperWork = 0, loadWork = 0, residual = 0;                              // J
    double gross = 0;             // J, scale the residual is measured against
    double relativeResidual = 0;  // residual / gross
};

struct CycleSummary {
    std::vector<JointSummary> joints;
    std::vector<DriverSummary> drivers;
    PeakAt groundForce;   // N, peak magnitude of the shaking force
    PeakAt groundMoment;  // N·m, peak |moment| about the origin
    std::vector<TransmissionSummary> transmission;
    EnergyBalance energy;
    int nearSingularSteps = 0;
};

CycleSummary summarize(const CompiledMechanism& m, const CycleResult& r);

}  // namespace clevis
