// The internal loads along a bar at one step: axial force N, shear force V
// and bending moment M at stations from its first end to its second.
//
// Sign conventions (docs/method.md, "Internal loads along a bar"): s runs
// from the first end (s = 0) to the second (s = L) along e; n is e turned a
// quarter turn counter-clockwise. Cut the bar at s; on the near part
// (0 … s) the far part acts with N·e − V·n and a couple M
// (counter-clockwise positive). So N > 0 is tension; V > 0 pushes the near
// part's cut face towards −n; M > 0 sags the bar towards −n (fibres on the n
// side in compression). Looking along the bar with n up, these are the
// beam-table signs: V = +R at a left support, M = +wL²/8 at mid-span of a
// simply supported beam under a downward load w.
//
// What loads the bar (d'Alembert: each mass element dm adds dm·(g − a) at its
// point, a the acceleration of that point of the rigid body):
//   concentrated — joint reactions and driver actions, applied forces,
//     torques, springs, dampers, torsion springs, point masses; each moved
//     onto the line at the foot s_i of its point (clamped to the ends) as the
//     force F_i and the couple C_i + (P_i − foot) × F_i;
//   distributed — the spread mass of bar_model.h, μ = m/ℓ per length on
//     from ≤ s ≤ to at offset d along n:
//       q(s) = μ·(g − a₀ − s·(α·n − ω²·e)),   a₀ = a(A + d·n),
//       c(s) = −(J/ℓ)·α − d·(q(s)·e),          J the spread's rotary inertia,
//     where a(P) = a_G + α·(P − G)⊥ − ω²·(P − G).
// Near-side sums at a cut x (items with s_i ≤ x; at the second end, s_i < L):
//   F(x) = Σ F_i + ∫ q ds,
//   M_x(x) = Σ [C_i + (s_i − x)·(F_i·n)] + ∫ [(s − x)·(q·n) + c] ds,
// and N = −F·e, V = F·n, M = −M_x. The integrals of the linear q are taken
// in closed form: between two concentrated loads N and V are quadratic and
// M cubic in x (see internal_loads.cpp).
#pragma once

#include "core/results/bar_model.h"
#include "core/results/body_loads.h"
#include "core/results/free_body.h"

#include <array>
#include <vector>

namespace clevis {

struct BarStation {
    double s = 0.0;       // m from the first end
    double axial = 0.0;   // N, tension positive
    double shear = 0.0;   // N
    double moment = 0.0;  // N·m
};

// A peak along the bar: the value (with its sign) and its station. A value
// of 0 means none (a bar nowhere in tension, say).
struct PeakAlong {
    double value = 0.0;  // N or N·m
    double s = 0.0;      // m from the first end
};
struct BarPeaks {
    PeakAlong tension, compression, shear, moment;  // largest N > 0, most negative N, largest |V|, |M|
    // A section bar's normal stress at its extreme fibres, σ = N/A ± M/Z
    // (M > 0 puts the fibre on the n side in compression): the largest
    // tension and compression, in Pa, over both fibres.
    PeakAlong fibreTension, fibreCompression;
};

// What a step's fibre stresses must beat to matter, in Pa: more tension than
// `tension` (≥ 0), more compression than `compression` (≤ 0).
struct FibreFloor {
    double tension = 0.0, compression = 0.0;
};

// The loads on one bar at one step, moved onto its line and sorted along
// it, to be evaluated anywhere. One object serves a whole cycle: set() keeps
// its storage.
class BarLoads {
public:
    BarLoads() = default;
    // Ready for `bar` (which must outlive it), its figures that do not
    // change from step to step worked out once.
    explicit BarLoads(const BarModel& bar) { prepare(bar); }

    // `loads` is what acts on the bar's body but its weight (bodyLoads(m, s,
    // q)[bar.body]): the mass along the line stands for it; `q` is s's pose.
    void set(const CompiledMechanism& m, const BarModel& bar, const StepResult& s, const Pose& q,
             const std::vector<BodyLoad>& loads)
    {
        prepare(bar);
        set(m, s, q, loads);
    }
    // The same for the bar it was made or last set for.
    void set(const CompiledMechanism& m, const StepResult& s, const Pose& q, const std::vector<BodyLoad>& loads);
    // The same with the loads taken from `acting`, readied for step s.
    void set(const CompiledMechanism& m, const StepResult& s, const Pose& q, const BodyLoads& acting);

    // The loads at station x: just beyond a concentrated load there (towards
    // the second end), or just before it when `before`.
    BarStation at(double x, bool before) const;

    // The exact peaks along the bar at this step: the largest tension and
    // compression and the largest |V| and |M| (see internal_loads.cpp).
    // Fibre stresses that cannot beat `beat` (the envelope so far, say) may
    // be left out: a piece whose fibre stresses are provably no more than
    // beat.fibreTension and no less than beat.fibreCompression is not
    // searched for them, so the fibre peaks returned are then exact only
    // where they beat it. The default beats nothing a search would keep.
    BarPeaks peaks(const FibreFloor& beat = {}) const;

private:
    struct LineLoad {
        double s;
        Vec2 force;
        double couple;
    };
    // Near-side sums as polynomials in the cut's station x:
    // F(x) = f₀ + f₁x + f₂x² and S(x) = s₀ + s₁x + s₂x² + s₃x³, where
    // S = Σ [C_i + s_i·(F_i·n)] + ∫ [s·(q·n) + c] ds, so that M_x = S − x·(F·n).
    struct Sums {
        Vec2 f[3] = {Vec2::Zero(), Vec2::Zero(), Vec2::Zero()};
        double s[4] = {0.0, 0.0, 0.0, 0.0};
    };
    // N, V and M on one piece between concentrated loads, as polynomials in x.
    struct Piece {
        double n[3], v[3], m[4];
        BarStation at(double x) const;
    };
    void prepare(const BarModel& bar);
    // set() before and after the loads on the body are added.
    void setMotion(const CompiledMechanism& m, const StepResult& s, const Pose& q);
    void addOwnMass(const Pose& q);
    Vec2 accel(const Vec2& p) const;
    void add(const Vec2& p, const Vec2& force, double couple);
    void setDistributed(const MassSpread& spread);
    Piece piece(double x, const Vec2& force, double moment) const;
    bool fibresCannotBeat(const Piece& p, double to, double lowN, double highN, double highM,
                          const FibreFloor& beat) const;

    const BarModel* bar_ = nullptr;
    // The bar's own figures (prepare): the spread's μ = m/ℓ and −J/ℓ, and
    // 1/A and 1/Z (0 without a section).
    double perLength_ = 0.0, rotaryPerLength_ = 0.0, perArea_ = 0.0, perModulus_ = 0.0;
    Vec2 gravity_, a_, g_, aG_, e_, n_;
    double omega_ = 0.0, alpha_ = 0.0;
    Sums none_, inside_, beyond_;  // the spread mass's share before it, within it and beyond its end
    std::vector<LineLoad> loads_;
    std::array<double, 4> fixed_{};  // the pieces' ends that are the bar's own (prepare)
    int fixedCount_ = 0;
};

// N equally spaced stations (N ≥ 2, both ends included) of `bar` at step
// `s`; `items` is what acts on the bar's body there (freeBodyItems(m, s)
// [bar.body]), whose weight item gives way to the mass along the line. At a
// station where a concentrated load sits, the value just beyond it (towards
// the second end); at the second end, the value just before it. Throws
// std::invalid_argument for fewer than two stations.
std::vector<BarStation> internalLoads(const CompiledMechanism& m, const BarModel& bar, const StepResult& s,
                                      const std::vector<FreeBodyItem>& items, int stations);

}  // namespace clevis
