#include "core/results/internal_loads.h"

#include "core/solver/body_state.h"

#include <algorithm>
#include <cmath>
#include <stdexcept>

namespace clevis {
namespace {

// The real roots of a·x² + b·x + c = 0 strictly inside (from, to), looked
// for only where the signs show one (a sign change between the ends, or a
// vertex inside beyond which the curve crosses), since this runs for every
// piece of every bar at every step; then in a form that keeps its precision
// when b² ≫ |4ac| (an almost linear dM/dx).
template <class Keep>
void rootsBetween(double a, double b, double c, double from, double to, Keep keep)
{
    const double atFrom = (a * from + b) * from + c, atTo = (a * to + b) * to + c;
    const bool crosses = (atFrom < 0.0) != (atTo < 0.0) && atFrom != 0.0 && atTo != 0.0;
    const bool turnsInside = (2.0 * a * from + b < 0.0) != (2.0 * a * to + b < 0.0);
    if (!crosses && !turnsInside) return;
    const auto inside = [&](double x) {
        if (x > from && x < to) keep(x);
    };
    if (a == 0.0) {
        inside(-c / b);
        return;
    }
    const double disc = b * b - 4.0 * a * c;
    if (disc < 0.0) return;
    const double q = -0.5 * (b + std::copysign(std::sqrt(disc), b));
    inside(q / a);
    if (q != 0.0) inside(c / q);
}

}  // namespace

// a(P) = a_G + α·(P − G)⊥ − ω²·(P − G)
Vec2 BarLoads::accel(const Vec2& p) const { return aG_ + alpha_ * perp(p - g_) - omega_ * omega_ * (p - g_); }

// Force F (with couple C) through P, moved to the foot of P on the line.
void BarLoads::add(const Vec2& p, const Vec2& force, double couple)
{
    const double length = bar_->length, snap = 1e-9 * length;
    double s = std::clamp((p - a_).dot(e_), 0.0, length);
    if (s < snap) s = 0.0;
    if (s > length - snap) s = length;
    loads_.push_back({s, force, couple + cross(p - (a_ + s * e_), force)});
}

void BarLoads::set(const CompiledMechanism& m, const BarModel& bar, const StepResult& s, const Pose& q,
                   const std::vector<BodyLoad>& loads)
{
    bar_ = &bar;
    gravity_ = m.gravity;
    a_ = q.point(bar.ends[0].point);
    g_ = bodyOrigin(s.q, bar.body);
    aG_ = s.qdd.segment<2>(3 * bar.body);
    omega_ = s.qd[3 * bar.body + 2];
    alpha_ = s.qdd[3 * bar.body + 2];
    e_ = (q.point(bar.ends[1].point) - a_) / bar.length;
    n_ = perp(e_);
    setDistributed(bar.spread);

    loads_.clear();
    for (const auto& l : loads) add(l.at, l.force, l.couple);
    for (const auto& [mass, point] : bar.pointMasses) {
        const Vec2 p = q.point(point);
        add(p, mass * (gravity_ - accel(p)), 0.0);
    }
    const MassSpread& spread = bar.spread;
    if (spread.to <= spread.from && spread.mass > 0.0) {
        const Vec2 p = a_ + spread.from * e_ + spread.offset * n_;
        add(p, spread.mass * (gravity_ - accel(p)), -spread.rotary * alpha_);
    }
    // A handful of loads, mostly in order already: an insertion sort, stable
    // and without the temporary buffer std::stable_sort allocates.
    for (std::size_t i = 1; i < loads_.size(); ++i)
        for (std::size_t k = i; k > 0 && loads_[k].s < loads_[k - 1].s; --k) std::swap(loads_[k], loads_[k - 1]);
}

// The spread mass's share of the near-side sums, for u₀ = from ≤ x ≤ to,
// with k = α·n − ω²·e, b = (g − a₀)·n, p = (g − a₀)·e, so that
// q·n = μ·(b − α·s) and q·e = μ·(p + ω²·s):
//   ∫ q ds                = μ·[(g − a₀)·(x − u₀) − k·(x² − u₀²)/2],
//   ∫ [s·(q·n) + c] ds    = A₀·(x − u₀) + A₁·(x² − u₀²)/2 − μα·(x³ − u₀³)/3,
//     A₀ = −(J/ℓ)·α − d·μ·p,  A₁ = μ·(b − d·ω²);
// beyond x = to both stay at their value there.
void BarLoads::setDistributed(const MassSpread& spread)
{
    inside_ = beyond_ = Sums{};
    const double span = spread.to - spread.from;
    if (span <= 0.0) return;
    const double mu = spread.mass / span, u0 = spread.from, d = spread.offset, w2 = omega_ * omega_;
    const Vec2 free = gravity_ - accel(a_ + d * n_);
    const Vec2 k = alpha_ * n_ - w2 * e_;
    const double p = free.dot(e_), b = free.dot(n_);
    const double a0 = -spread.rotary / span * alpha_ - d * mu * p, a1 = mu * (b - d * w2), a3 = -mu * alpha_ / 3.0;
    inside_.f[0] = mu * (-free * u0 + k * (0.5 * u0 * u0));
    inside_.f[1] = mu * free;
    inside_.f[2] = -0.5 * mu * k;
    inside_.s[0] = -a0 * u0 - 0.5 * a1 * u0 * u0 - a3 * u0 * u0 * u0;
    inside_.s[1] = a0;
    inside_.s[2] = 0.5 * a1;
    inside_.s[3] = a3;
    const double x = spread.to;
    beyond_.f[0] = inside_.f[0] + x * (inside_.f[1] + x * inside_.f[2]);
    beyond_.s[0] = inside_.s[0] + x * (inside_.s[1] + x * (inside_.s[2] + x * inside_.s[3]));
}

// `force` = Σ F_i and `moment` = Σ [C_i + s_i·(F_i·n)] over the concentrated
// loads on the near side; x is any station of the piece (it tells whether
// the piece lies before, within or beyond the spread mass). With F and S the
// near-side sums: N = −F·e, V = F·n and M = −M_x = x·(F·n) − S.
BarLoads::Piece BarLoads::piece(double x, const Vec2& force, double moment) const
{
    static const Sums none;
    const MassSpread& spread = bar_->spread;
    const Sums& d = x <= spread.from ? none : x <= spread.to ? inside_ : beyond_;
    Piece p;
    for (int i = 0; i < 3; ++i) {
        const Vec2 f = i == 0 ? Vec2(force + d.f[0]) : d.f[i];
        p.n[i] = -f.dot(e_);
        p.v[i] = f.dot(n_);
    }
    p.m[0] = -(moment + d.s[0]);
    for (int i = 1; i < 4; ++i) p.m[i] = p.v[i - 1] - d.s[i];
    return p;
}

BarStation BarLoads::Piece::at(double x) const
{
    return {x, n[0] + x * (n[1] + x * n[2]), v[0] + x * (v[1] + x * v[2]), m[0] + x * (m[1] + x * (m[2] + x * m[3]))};
}

BarStation BarLoads::at(double x, bool before) const
{
    Vec2 force = Vec2::Zero();
    double moment = 0.0;
    for (const auto& l : loads_) {
        if (before ? l.s >= x : l.s > x) break;
        force += l.force;
        moment += l.couple + l.s * l.force.dot(n_);
    }
    return piece(x, force, moment).at(x);
}

// On each piece the peaks lie at its ends or where a derivative vanishes:
// dN/dx = n₁ + 2n₂x, dV/dx = v₁ + 2v₂x, dM/dx = m₁ + 2m₂x + 3m₃x². (dM/dx =
// V − c, the shear less the distributed couple, as beam theory has it.)
// Pieces are taken from the first end on; of equal values the first found stays.
BarPeaks BarLoads::peaks() const
{
    // The pieces' ends: 0, L, the spread's ends (0 ≤ from ≤ to ≤ L) and the
    // loads' stations (in order already), merged without repeats.
    const MassSpread& spread = bar_->spread;
    const bool spreadOut = spread.to > spread.from;
    const double fixed[4] = {0.0, spreadOut ? spread.from : 0.0, spreadOut ? spread.to : 0.0, bar_->length};
    breaks_.clear();
    const auto put = [&](double x) {
        if (breaks_.empty() || x > breaks_.back()) breaks_.push_back(x);
    };
    int f = 0;
    for (const auto& l : loads_) {
        for (; f < 4 && fixed[f] <= l.s; ++f) put(fixed[f]);
        put(l.s);
    }
    for (; f < 4; ++f) put(fixed[f]);

    BarPeaks out;
    const auto axial = [&](double x, double n) {
        if (n > out.tension.value) out.tension = {n, x};
        if (n < out.compression.value) out.compression = {n, x};
    };
    const auto shear = [&](double x, double v) {
        if (std::abs(v) > std::abs(out.shear.value)) out.shear = {v, x};
    };
    const auto moment = [&](double x, double m) {
        if (std::abs(m) > std::abs(out.moment.value)) out.moment = {m, x};
    };
    const auto all = [&](const BarStation& st) {
        axial(st.s, st.axial);
        shear(st.s, st.shear);
        moment(st.s, st.moment);
    };
    // σ = N/A ± M/Z, each a cubic on the piece like M: its values at the
    // piece's ends, and where dσ/dx = 0 between them.
    const double perArea = bar_->area > 0.0 ? 1.0 / bar_->area : 0.0;
    const double perModulus = bar_->area > 0.0 ? 1.0 / bar_->sectionModulus : 0.0;
    const auto fibre = [&](double x, double v) {
        if (v > out.fibreTension.value) out.fibreTension = {v, x};
        if (v < out.fibreCompression.value) out.fibreCompression = {v, x};
    };
    const auto fibres = [&](const Piece& p, const BarStation& a, const BarStation& b) {
        for (const double side : {1.0, -1.0}) {
            fibre(a.s, a.axial * perArea + side * a.moment * perModulus);
            fibre(b.s, b.axial * perArea + side * b.moment * perModulus);
            const double c0 = p.n[0] * perArea + side * p.m[0] * perModulus;
            const double c1 = p.n[1] * perArea + side * p.m[1] * perModulus;
            const double c2 = p.n[2] * perArea + side * p.m[2] * perModulus, c3 = side * p.m[3] * perModulus;
            rootsBetween(3.0 * c3, 2.0 * c2, c1, a.s, b.s,
                         [&](double x) { fibre(x, c0 + x * (c1 + x * (c2 + x * c3))); });
        }
    };
    Vec2 force = Vec2::Zero();
    double sum = 0.0;
    auto next = loads_.begin();
    for (std::size_t k = 0; k + 1 < breaks_.size(); ++k) {
        const double from = breaks_[k], to = breaks_[k + 1];
        for (; next != loads_.end() && next->s <= from; ++next) {
            force += next->force;
            sum += next->couple + next->s * next->force.dot(n_);
        }
        const Piece p = piece(0.5 * (from + to), force, sum);
        const BarStation atFrom = p.at(from), atTo = p.at(to);
        all(atFrom);
        rootsBetween(0.0, 2.0 * p.n[2], p.n[1], from, to,
                     [&](double x) { axial(x, p.n[0] + x * (p.n[1] + x * p.n[2])); });
        rootsBetween(0.0, 2.0 * p.v[2], p.v[1], from, to,
                     [&](double x) { shear(x, p.v[0] + x * (p.v[1] + x * p.v[2])); });
        rootsBetween(3.0 * p.m[3], 2.0 * p.m[2], p.m[1], from, to, [&](double x) { moment(x, p.at(x).moment); });
        all(atTo);
        if (perArea > 0.0) fibres(p, atFrom, atTo);
    }
    return out;
}

std::vector<BarStation> internalLoads(const CompiledMechanism& m, const BarModel& bar, const StepResult& s,
                                      const std::vector<FreeBodyItem>& items, int stations)
{
    if (stations < 2)
        throw std::invalid_argument("internal loads need at least 2 stations (both ends), not " +
                                    std::to_string(stations));
    std::vector<BodyLoad> loads;
    loads.reserve(items.size());
    for (const auto& item : items)
        if (item.kind != FreeBodyItemKind::Weight) loads.push_back({item.at, item.force, item.couple});
    BarLoads at;
    at.set(m, bar, s, Pose(s.q), loads);
    std::vector<BarStation> out;
    out.reserve(std::size_t(stations));
    for (int k = 0; k < stations; ++k) {
        const bool last = k == stations - 1;
        out.push_back(at.at(last ? bar.length : bar.length * k / (stations - 1), last));
    }
    return out;
}

}  // namespace clevis
