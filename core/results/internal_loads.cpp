#include "core/results/internal_loads.h"

#include "core/solver/body_state.h"

#include <algorithm>
#include <stdexcept>

namespace clevis {
namespace {

// A load moved onto the bar's line: force F_i and couple at station s.
struct LineLoad {
    double s;
    Vec2 force;
    double couple;
};

class BarAtStep {
public:
    BarAtStep(const CompiledMechanism& m, const BarModel& bar, const StepResult& s)
        : bar_(bar)
        , gravity_(m.gravity)
        , a_(pointPosition(s.q, bar.ends[0].point))
        , g_(bodyOrigin(s.q, bar.body))
        , aG_(s.qdd.segment<2>(3 * bar.body))
        , omega_(s.qd[3 * bar.body + 2])
        , alpha_(s.qdd[3 * bar.body + 2])
    {
        const Vec2 b = pointPosition(s.q, bar.ends[1].point);
        e_ = (b - a_) / bar.length;
        n_ = perp(e_);
        const MassSpread& spread = bar.spread;
        const double span = spread.to - spread.from;
        if (span > 0.0) {
            mu_ = spread.mass / span;
            free_ = gravity_ - accel(a_ + spread.offset * n_);
        }
    }

    // a(P) = a_G + α·(P − G)⊥ − ω²·(P − G)
    Vec2 accel(const Vec2& p) const { return aG_ + alpha_ * perp(p - g_) - omega_ * omega_ * (p - g_); }

    // Force F (with couple C) through P, moved to the foot of P on the line.
    LineLoad onLine(const Vec2& p, const Vec2& force, double couple) const
    {
        const double length = bar_.length, snap = 1e-9 * length;
        double s = std::clamp((p - a_).dot(e_), 0.0, length);
        if (s < snap) s = 0.0;
        if (s > length - snap) s = length;
        return {s, force, couple + cross(p - (a_ + s * e_), force)};
    }

    std::vector<LineLoad> concentrated(const std::vector<FreeBodyItem>& items, const VectorXd& q) const
    {
        std::vector<LineLoad> loads;
        loads.reserve(items.size() + bar_.pointMasses.size() + 1);
        for (const auto& item : items)
            if (item.kind != FreeBodyItemKind::Weight) loads.push_back(onLine(item.at, item.force, item.couple));
        for (const auto& [mass, point] : bar_.pointMasses) {
            const Vec2 p = pointPosition(q, point);
            loads.push_back(onLine(p, mass * (gravity_ - accel(p)), 0.0));
        }
        const MassSpread& spread = bar_.spread;
        if (spread.to <= spread.from && spread.mass > 0.0) {
            const Vec2 p = a_ + spread.from * e_ + spread.offset * n_;
            loads.push_back(onLine(p, spread.mass * (gravity_ - accel(p)), -spread.rotary * alpha_));
        }
        return loads;
    }

    // ∫ q ds and ∫ [(s − x)(q·n) + c] ds over from ≤ s ≤ min(x, to), with
    // u₀ = from, u₁ = min(x, to), Δk = u₁ᵏ − u₀ᵏ, b = (g − a₀)·n, p = (g − a₀)·e:
    //   ∫ q ds          = μ·[(g − a₀)·Δ1 − (α·n − ω²·e)·Δ2/2]
    //   ∫ (s − x)(q·n)  = μ·[b·((u₁ − x)² − (u₀ − x)²)/2 − α·(Δ3/3 − x·Δ2/2)]
    //   ∫ c ds          = −(J/ℓ)·α·Δ1 − d·μ·(p·Δ1 + ω²·Δ2/2)
    void addDistributed(double x, Vec2& force, double& moment) const
    {
        const MassSpread& spread = bar_.spread;
        const double u0 = spread.from, u1 = std::min(x, spread.to), span = spread.to - spread.from;
        if (span <= 0.0 || u1 <= u0) return;
        const double mu = mu_, d = spread.offset;
        const Vec2& free = free_;
        const double d1 = u1 - u0, d2 = u1 * u1 - u0 * u0, d3 = u1 * u1 * u1 - u0 * u0 * u0;
        const double w2 = omega_ * omega_;
        force += mu * (free * d1 - (alpha_ * n_ - w2 * e_) * (0.5 * d2));
        moment += mu * (free.dot(n_) * 0.5 * ((u1 - x) * (u1 - x) - (u0 - x) * (u0 - x)) -
                        alpha_ * (d3 / 3.0 - 0.5 * x * d2));
        moment += -spread.rotary / span * alpha_ * d1 - d * mu * (free.dot(e_) * d1 + 0.5 * w2 * d2);
    }

    BarStation station(double x, bool farEnd, const std::vector<LineLoad>& loads) const
    {
        Vec2 force = Vec2::Zero();
        double moment = 0.0;
        for (const auto& l : loads) {
            if (farEnd ? l.s >= bar_.length : l.s > x) continue;
            force += l.force;
            moment += l.couple + (l.s - x) * l.force.dot(n_);
        }
        addDistributed(x, force, moment);
        return {x, -force.dot(e_), force.dot(n_), -moment};
    }

private:
    const BarModel& bar_;
    Vec2 gravity_, a_, g_, aG_, e_, n_;
    double omega_, alpha_;
    double mu_ = 0.0;           // kg/m of the spread
    Vec2 free_ = Vec2::Zero();  // g − a₀, at the spread's start line
};

}  // namespace

std::vector<BarStation> internalLoads(const CompiledMechanism& m, const BarModel& bar, const StepResult& s,
                                      const std::vector<FreeBodyItem>& items, int stations)
{
    if (stations < 2)
        throw std::invalid_argument("internal loads need at least 2 stations (both ends), not " +
                                    std::to_string(stations));
    const BarAtStep at(m, bar, s);
    const std::vector<LineLoad> loads = at.concentrated(items, s.q);
    std::vector<BarStation> out;
    out.reserve(std::size_t(stations));
    for (int k = 0; k < stations; ++k) {
        const bool last = k == stations - 1;
        out.push_back(at.station(last ? bar.length : bar.length * k / (stations - 1), last, loads));
    }
    return out;
}

}  // namespace clevis
