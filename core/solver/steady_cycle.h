// The steady cycle of a mechanism driven by a motor: its equation of motion
// (equation_of_motion.h) integrated turn after turn of the driver until a
// turn ends at the speed it started with.
//
// The driver's position is the independent variable: θ = θ₀ + σ·s over one
// turn s ∈ [0, 2π] (σ the sense of turning), with the state
//   u = θ̇² (so du/ds = 2·σ·θ̈, finite even where θ̇ → 0),  t (dt/ds = 1/√u),
// integrated by the Dormand–Prince 5(4) pair (dormand_prince.h). Every
// output step (2π/N) is divided into equal substeps, halved for that output
// step until the error estimate of each is within 1e-10 of the state's scale
// (u, and for t the time of a turn at the start speed), or until 64 substeps.
// The mechanism's terms J, J', A, B depend only on the position, so they are
// solved once at each node and reused by every later turn.
//
// Turn after turn: the first turn starts at the expected speed, the second
// where the first ended; then each start speed is a secant step on the
// mismatch ω²_end − ω²_start of the last two turns (a turn that would stall
// falls back to starting where the last ended). The cycle is steady when
// |ω²_end − ω²_start| ≤ 1e-10·ω²_start.
#pragma once

#include "core/solver/analysis_error.h"
#include "core/solver/equation_of_motion.h"

#include <vector>

namespace clevis {

inline constexpr double kStepTolerance = 1e-10;
inline constexpr double kPeriodicityTolerance = 1e-10;
inline constexpr int kMaxSubsteps = 64;
inline constexpr int kMaxTurns = 100;

// The motor cannot keep the mechanism turning: it stops at `position`.
class MotorStall : public AnalysisError {
public:
    MotorStall(const std::string& message, std::vector<std::string> items, double position)
        : AnalysisError(message, std::move(items)), position_(position)
    {}
    double position() const { return position_; }  // rad

private:
    double position_;
};

struct SteadyCycle {
    std::vector<MotionSample> samples;      // at the N + 1 output steps, evenly spaced in position over one turn
    double period = 0.0;                    // s
    double meanSpeed = 0.0;                 // rad/s, signed: one turn over the period
    double fluctuation = 0.0;               // C_s = (ω_max − ω_min)/ω_mean
    double speedMax = 0.0, speedMin = 0.0;  // rad/s, magnitudes
    double maxAt = 0.0, minAt = 0.0;        // driver positions, rad
    int turns = 0;                          // turns integrated until the cycle repeated
};

class CycleIntegrator {
public:
    // `m` as for ReducedMechanism; `steps` output steps per turn; `direction`
    // +1 or −1, the sense in which the motor turns the driver.
    CycleIntegrator(const CompiledMechanism& m, int steps, int direction);

    // Throws MotorStall when the motor cannot keep the mechanism turning, and
    // AnalysisError when no steady cycle is reached in kMaxTurns turns.
    SteadyCycle steady(const DriveTrain& d, double startSpeed);

    // One turn from the drawn pose at `startSpeed` (rad/s, > 0): the speed
    // (rad/s, magnitude) and time at each output step; empty where it stalls.
    struct Turn {
        std::vector<double> speed, time;
        double stallAt = 0.0;  // rad, where it stalled
    };
    Turn turn(const DriveTrain& d, double startSpeed);

    // ΔE_max of the turning moment at the constant speed `speed` (rad/s, > 0):
    // the largest swing of ∫(T − T̄)dθ over a turn, T = ½·J'·θ̇² − A − B·θ̇ being
    // the effort the mechanism needs at that speed and T̄ its mean.
    double energySwing(double speed);

private:
    struct Interval {
        int substeps = 0;
        std::vector<ReducedTerms> nodes;  // [0]: the start; 5·j + n: node n of substep j
    };
    struct Extreme {
        double u, s;
    };
    struct Run;

    double startOf(int k) const;
    double nodePosition(int k, int substep, int node) const;
    void fill(int k, int substeps);
    const ReducedTerms& at(int k, int node);
    bool interval(const DriveTrain& d, int k, Run& run);
    Run integrate(const DriveTrain& d, double u0);
    SteadyCycle cycleOf(const DriveTrain& d, const Run& run) const;

    ReducedMechanism reduced_;
    int steps_, direction_;
    double theta0_;
    std::vector<Interval> intervals_;
    std::string driver_;
};

}  // namespace clevis
