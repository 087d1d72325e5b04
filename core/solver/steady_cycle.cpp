#include "core/solver/steady_cycle.h"

#include "core/file/file_units.h"
#include "core/results/drive_units.h"
#include "core/results/number_text.h"
#include "core/solver/dormand_prince.h"
#include "core/solver/motor_characteristic.h"

#include <algorithm>
#include <cmath>
#include <limits>

namespace clevis {
namespace {

constexpr double kTurn = 2.0 * kPi;
// No substep longer than this at the start (rad): a coarse output step is divided.
constexpr double kLongestSubstep = kTurn / 90.0;

using State = std::array<double, 2>;  // u = θ̇², t

// The cubic through u and du/ds at both ends of a substep: where its slope
// vanishes inside, an extreme of the speed between the nodes.
template <class Visit>
void interiorExtremes(double u0, double f0, double u1, double f1, double h, Visit&& visit)
{
    const double a = 6.0 * u0 + 3.0 * h * f0 - 6.0 * u1 + 3.0 * h * f1;
    const double b = -6.0 * u0 - 4.0 * h * f0 + 6.0 * u1 - 2.0 * h * f1;
    const double c = h * f0;
    const auto value = [&](double x) {
        const double x2 = x * x, x3 = x2 * x;
        return (2 * x3 - 3 * x2 + 1) * u0 + (x3 - 2 * x2 + x) * h * f0 + (-2 * x3 + 3 * x2) * u1 + (x3 - x2) * h * f1;
    };
    const auto consider = [&](double x) {
        if (x > 0.0 && x < 1.0) visit(value(x), x);
    };
    if (a == 0.0) {
        if (b != 0.0) consider(-c / b);
        return;
    }
    const double disc = b * b - 4.0 * a * c;
    if (disc < 0.0) return;
    const double root = std::sqrt(disc);
    consider((-b + root) / (2.0 * a));
    consider((-b - root) / (2.0 * a));
}

}  // namespace

struct CycleIntegrator::Run {
    std::vector<double> u, t;  // at the output steps
    Extreme high{-1.0, 0.0}, low{std::numeric_limits<double>::infinity(), 0.0};
    State y{};
    State slope{};
    double uScale = 0.0, tScale = 0.0;
    bool stalled = false;
    double stallAt = 0.0;  // s
};

CycleIntegrator::CycleIntegrator(const CompiledMechanism& m, int steps, int direction)
    : reduced_(m)
    , steps_(steps)
    , direction_(direction)
    , theta0_(m.drivers.front().offset)
    , intervals_(std::size_t(steps))
    , driver_(m.drivers.front().name)
{}

double CycleIntegrator::startOf(int k) const { return kTurn * double(k) / double(steps_); }

double CycleIntegrator::nodePosition(int k, int substep, int node) const
{
    const int n = intervals_[k].substeps;
    if (substep + 1 == n && node == 5) return startOf(k + 1);
    const double h = (startOf(k + 1) - startOf(k)) / n;
    return startOf(k) + (substep + kDormandPrinceNodes[node]) * h;
}

void CycleIntegrator::fill(int k, int substeps)
{
    Interval& iv = intervals_[k];
    const ReducedTerms start = k == 0 ? reduced_.at(theta0_) : at(k - 1, 5 * intervals_[k - 1].substeps);
    iv.substeps = substeps;
    iv.nodes.assign(std::size_t(5 * substeps + 1), {});
    iv.nodes[0] = start;
    for (int j = 0; j < substeps; ++j)
        for (int n = 1; n <= 5; ++n) iv.nodes[5 * j + n] = reduced_.at(theta0_ + direction_ * nodePosition(k, j, n));
}

const ReducedTerms& CycleIntegrator::at(int k, int node)
{
    if (intervals_[k].substeps == 0) {
        const double length = startOf(k + 1) - startOf(k);
        fill(k, std::max(1, int(std::ceil(length / kLongestSubstep - 1e-9))));
    }
    return intervals_[k].nodes[std::size_t(node)];
}

// One output step; false (and the run marked stalled) where the speed falls
// to zero within it.
bool CycleIntegrator::interval(const DriveTrain& d, int k, Run& run)
{
    const auto derivative = [&](const ReducedTerms& terms, const State& y) -> State {
        if (!(y[0] > 0.0)) return {std::numeric_limits<double>::quiet_NaN(), std::numeric_limits<double>::quiet_NaN()};
        const double speed = std::sqrt(y[0]);
        const double accel = driveAcceleration(d, terms, direction_ * speed).accel;
        return {2.0 * direction_ * accel, 1.0 / speed};
    };
    at(k, 0);
    for (;;) {
        const int n = intervals_[k].substeps;
        const double h = (startOf(k + 1) - startOf(k)) / n;
        State y = run.y, slope = run.slope;
        Extreme high = run.high, low = run.low;
        bool refine = false;
        for (int j = 0; j < n && !refine; ++j) {
            const std::vector<ReducedTerms>& nodes = intervals_[k].nodes;
            const auto step = dormandPrinceStep<2>(y, slope, h, [&](int node, const State& ys) {
                return derivative(nodes[std::size_t(5 * j + node)], ys);
            });
            const bool finite =
                std::isfinite(step.y[0]) && std::isfinite(step.y[1]) && step.y[0] > 0.0 && std::isfinite(step.slope[0]);
            const double error = std::max(std::abs(step.error[0]) / (kStepTolerance * run.uScale),
                                          std::abs(step.error[1]) / (kStepTolerance * run.tScale));
            if (!finite || error > 1.0) {
                if (n < kMaxSubsteps) {
                    refine = true;
                    break;
                }
                if (!finite) {
                    // The speed reaches zero: where the last good node's slope takes u to 0.
                    const double s = startOf(k) + j * h;
                    run.stalled = true;
                    run.stallAt = s + (slope[0] < 0.0 ? std::min(h, y[0] / -slope[0]) : 0.5 * h);
                    return false;
                }
            }
            const double s = startOf(k) + j * h;
            interiorExtremes(y[0], slope[0], step.y[0], step.slope[0], h, [&](double u, double x) {
                if (u > high.u) high = {u, s + x * h};
                if (u < low.u) low = {u, s + x * h};
            });
            if (step.y[0] > high.u) high = {step.y[0], s + h};
            if (step.y[0] < low.u) low = {step.y[0], s + h};
            y = step.y;
            slope = step.slope;
        }
        if (refine) {
            fill(k, 2 * n);
            continue;
        }
        run.y = y;
        run.slope = slope;
        run.high = high;
        run.low = low;
        return true;
    }
}

CycleIntegrator::Run CycleIntegrator::integrate(const DriveTrain& d, double u0)
{
    Run run;
    run.y = {u0, 0.0};
    run.uScale = u0;
    run.tScale = kTurn / std::sqrt(u0);
    const ReducedTerms& start = at(0, 0);
    run.slope = {2.0 * direction_ * driveAcceleration(d, start, direction_ * std::sqrt(u0)).accel, 1.0 / std::sqrt(u0)};
    run.high = run.low = {u0, 0.0};
    run.u.push_back(u0);
    run.t.push_back(0.0);
    for (int k = 0; k < steps_; ++k) {
        if (!interval(d, k, run)) return run;
        run.u.push_back(run.y[0]);
        run.t.push_back(run.y[1]);
    }
    return run;
}

CycleIntegrator::Turn CycleIntegrator::turn(const DriveTrain& d, double startSpeed)
{
    const Run run = integrate(d, startSpeed * startSpeed);
    Turn out;
    out.stallAt = theta0_ + direction_ * run.stallAt;
    if (run.stalled) return out;
    for (std::size_t k = 0; k < run.u.size(); ++k) {
        out.speed.push_back(std::sqrt(run.u[k]));
        out.time.push_back(run.t[k]);
    }
    return out;
}

SteadyCycle CycleIntegrator::cycleOf(const DriveTrain& d, const Run& run) const
{
    SteadyCycle out;
    for (int k = 0; k <= steps_; ++k) {
        const ReducedTerms& terms = k < steps_ ? intervals_[k].nodes.front() : intervals_[steps_ - 1].nodes.back();
        const double speed = direction_ * std::sqrt(run.u[k]);
        out.samples.push_back(
            {run.t[k], theta0_ + direction_ * startOf(k), speed, driveAcceleration(d, terms, speed).accel});
    }
    out.period = run.t.back();
    out.meanSpeed = direction_ * kTurn / out.period;
    out.speedMax = std::sqrt(run.high.u);
    out.speedMin = std::sqrt(run.low.u);
    out.maxAt = theta0_ + direction_ * run.high.s;
    out.minAt = theta0_ + direction_ * run.low.s;
    out.fluctuation = (out.speedMax - out.speedMin) / std::abs(out.meanSpeed);
    return out;
}

SteadyCycle CycleIntegrator::steady(const DriveTrain& d, double startSpeed)
{
    int turns = 0;
    const auto stall = [&](const Run& run) {
        const CompiledDriver shown{driver_, DriverType::Rotary, -1, {}, 0.0, ConstantSpeed{1.0, 0.0}};
        return MotorStall("driver " + driver_ + ": the motor cannot keep the mechanism turning: it stalls at " +
                              formatDrivePosition(shown, theta0_ + direction_ * run.stallAt) +
                              ", where the load needs more than the motor gives at that speed (with the energy "
                              "the moving parts and any flywheel store). Give a stronger motor, a higher gear "
                              "ratio or a larger flywheel.",
                          {driver_}, theta0_ + direction_ * run.stallAt);
    };
    const auto run = [&](double u) {
        ++turns;
        return integrate(d, u);
    };
    double ua = startSpeed * startSpeed;
    Run a = run(ua);
    if (a.stalled) {
        // The expected speed may be too low to carry the mechanism through; the motor's own top speed is the last try.
        const double top = noLoadSpeed(d.motor) / d.ratio;
        if (!(top > startSpeed)) throw stall(a);
        ua = top * top;
        a = run(ua);
        if (a.stalled) throw stall(a);
    }
    double ga = a.u.back() - ua;
    const auto steadyAt = [&](const Run& r, double u) { return std::abs(r.u.back() - u) <= kPeriodicityTolerance * u; };
    if (steadyAt(a, ua)) {
        SteadyCycle out = cycleOf(d, a);
        out.turns = turns;
        return out;
    }
    double ub = a.u.back();
    Run b = run(ub);
    if (b.stalled) throw stall(b);
    while (turns < kMaxTurns) {
        if (steadyAt(b, ub)) {
            SteadyCycle out = cycleOf(d, b);
            out.turns = turns;
            return out;
        }
        const double gb = b.u.back() - ub;
        double uc = gb != ga ? ub - gb * (ub - ua) / (gb - ga) : b.u.back();
        if (!(uc > 0.0) || !std::isfinite(uc)) uc = b.u.back();
        Run c = run(uc);
        if (c.stalled && uc != b.u.back()) {
            uc = b.u.back();
            c = run(uc);
        }
        if (c.stalled) throw stall(c);
        ua = ub;
        ga = gb;
        ub = uc;
        b = std::move(c);
    }
    throw AnalysisError("driver " + driver_ + ": no steady cycle after " + std::to_string(kMaxTurns) +
                            " turns: the speed keeps changing from turn to turn (start " +
                            significant(fromSi(FileUnit::Rpm, startSpeed)) + " rpm)",
                        {driver_});
}

double CycleIntegrator::energySwing(double speed)
{
    const double omega = direction_ * speed;
    const auto effort = [&](const ReducedTerms& t) {
        return direction_ * (0.5 * t.inertiaSlope * omega * omega - t.force - t.damping * omega);
    };
    std::vector<std::pair<double, double>> cumulative{{0.0, 0.0}};  // (s, ∫ effort ds)
    double total = 0.0;
    for (int k = 0; k < steps_; ++k) {
        at(k, 0);
        const Interval& iv = intervals_[k];
        const double h = (startOf(k + 1) - startOf(k)) / iv.substeps;
        for (int j = 0; j < iv.substeps; ++j) {
            double sum = 0.0;
            for (int n = 0; n < 6; ++n) sum += kDormandPrinceWeights[n] * effort(iv.nodes[std::size_t(5 * j + n)]);
            total += h * sum;
            cumulative.emplace_back(startOf(k) + (j + 1) * h, total);
        }
    }
    const double mean = total / kTurn;
    double high = 0.0, low = 0.0;
    for (const auto& [s, e] : cumulative) {
        high = std::max(high, e - mean * s);
        low = std::min(low, e - mean * s);
    }
    return high - low;
}

}  // namespace clevis
