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

// rootsBetween for a = 0 (a linear b·x + c): the same root, found the same way.
template <class Keep>
void linearRootBetween(double b, double c, double from, double to, Keep keep)
{
    const double atFrom = b * from + c, atTo = b * to + c;
    if ((atFrom < 0.0) == (atTo < 0.0) || atFrom == 0.0 || atTo == 0.0) return;
    const double x = -c / b;
    if (x > from && x < to) keep(x);
}

// The foot s of P on the line from A along e (0 ≤ s ≤ L), and the couple
// of a force F with couple C through P moved there; s is called for every
// load on every bar at every step.
std::pair<double, double> foot(const Vec2& a, const Vec2& e, double length, const Vec2& p, const Vec2& force,
                               double couple)
{
    const double snap = 1e-9 * length;
    double s = std::clamp((p - a).dot(e), 0.0, length);
    if (s < snap) s = 0.0;
    if (s > length - snap) s = length;
    return {s, couple + cross(p - (a + s * e), force)};
}

}  // namespace

// a(P) = a_G + α·(P − G)⊥ − ω²·(P − G)
Vec2 BarLoads::accel(const Vec2& p) const { return aG_ + alpha_ * perp(p - g_) - omega_ * omega_ * (p - g_); }

// Force F (with couple C) through P, moved to the foot of P on the line.
void BarLoads::add(const Vec2& p, const Vec2& force, double couple)
{
    const auto [s, moved] = foot(a_, e_, bar_->length, p, force, couple);
    loads_.push_back({s, force, moved});
}

void BarLoads::prepare(const BarModel& bar)
{
    bar_ = &bar;
    const MassSpread& spread = bar.spread;
    const double span = spread.to - spread.from;
    perLength_ = span > 0.0 ? spread.mass / span : 0.0;
    rotaryPerLength_ = span > 0.0 ? -spread.rotary / span : 0.0;
    perArea_ = bar.area > 0.0 ? 1.0 / bar.area : 0.0;
    perModulus_ = bar.area > 0.0 ? 1.0 / bar.sectionModulus : 0.0;
    // The pieces' fixed ends: 0, the spread's ends (0 ≤ from ≤ to ≤ L) and L,
    // each kept only beyond the one before (as peaks() merges them).
    const bool spreadOut = spread.to > spread.from;
    fixedCount_ = 0;
    for (const double x : {0.0, spreadOut ? spread.from : 0.0, spreadOut ? spread.to : 0.0, bar.length})
        if (fixedCount_ == 0 || x > fixed_[fixedCount_ - 1]) fixed_[fixedCount_++] = x;
}

void BarLoads::setMotion(const CompiledMechanism& m, const StepResult& s, const Pose& q)
{
    const BarModel& bar = *bar_;
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
}

// The point masses and a spread of no length, then the loads in order along the bar.
void BarLoads::addOwnMass(const Pose& q)
{
    const BarModel& bar = *bar_;
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

void BarLoads::set(const CompiledMechanism& m, const StepResult& s, const Pose& q, const std::vector<BodyLoad>& loads)
{
    setMotion(m, s, q);
    for (const auto& l : loads) add(l.at, l.force, l.couple);
    addOwnMass(q);
}

void BarLoads::set(const CompiledMechanism& m, const StepResult& s, const Pose& q, const BodyLoads& acting)
{
    setMotion(m, s, q);
    acting.forEachOn(bar_->body, [this](const Vec2& at, const Vec2& force, double couple) { add(at, force, couple); });
    addOwnMass(q);
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
    const double mu = perLength_, u0 = spread.from, d = spread.offset, w2 = omega_ * omega_;
    const Vec2 free = gravity_ - accel(a_ + d * n_);
    const Vec2 k = alpha_ * n_ - w2 * e_;
    const double p = free.dot(e_), b = free.dot(n_);
    const double a0 = rotaryPerLength_ * alpha_ - d * mu * p, a1 = mu * (b - d * w2), a3 = -mu * alpha_ / 3.0;
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
inline BarLoads::Piece BarLoads::piece(double x, const Vec2& force, double moment) const
{
    const MassSpread& spread = bar_->spread;
    const Sums& d = x <= spread.from ? none_ : x <= spread.to ? inside_ : beyond_;
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

namespace {

// The running peaks of peaks(): a value replaces the one kept only when it
// is larger, so of equal values the first found stays.
template <class Larger>
void keepIf(PeakAlong& peak, double value, double x, Larger larger)
{
    if (larger(value, peak.value)) peak = {value, x};
}
const auto above = [](double v, double best) { return v > best; };
const auto below = [](double v, double best) { return v < best; };
const auto bigger = [](double v, double best) { return std::abs(v) > std::abs(best); };

struct RunningPeaks {
    PeakAlong tension, compression, shear, moment, fibreTension, fibreCompression;

    void axial(double x, double n)
    {
        keepIf(tension, n, x, above);
        keepIf(compression, n, x, below);
    }
    void shearAt(double x, double v) { keepIf(shear, v, x, bigger); }
    void momentAt(double x, double m) { keepIf(moment, m, x, bigger); }
    void all(const BarStation& st)
    {
        axial(st.s, st.axial);
        shearAt(st.s, st.shear);
        momentAt(st.s, st.moment);
    }
    void fibre(double x, double v)
    {
        keepIf(fibreTension, v, x, above);
        keepIf(fibreCompression, v, x, below);
    }
};

}  // namespace

// Whether no fibre stress σ = N/A ± M/Z on a piece ending at `to` can beat
// `beat`, given N's range [lowN, highN] and |M|'s largest, highM, there:
// everywhere on it lowN/A − highM/Z ≤ σ ≤ highN/A + highM/Z. Evaluated in
// floating point, σ, N and M each err by a few ulps of Σ|cᵢ|·xⁱ over their
// coefficients (the error bound of Horner's rule; 0 ≤ x ≤ to), and the roots
// found for the extremes by as little in value; an allowance of 1e-13 of
// those sums (hundreds of ulps) makes the bounds hold for the values
// peaks() would compute.
bool BarLoads::fibresCannotBeat(const Piece& p, double to, double lowN, double highN, double highM,
                                const FibreFloor& beat) const
{
    const double termsN = std::abs(p.n[0]) + to * (std::abs(p.n[1]) + to * std::abs(p.n[2]));
    const double termsM = std::abs(p.m[0]) + to * (std::abs(p.m[1]) + to * (std::abs(p.m[2]) + to * std::abs(p.m[3])));
    const double bending = highM * perModulus_ + 1e-13 * (termsN * perArea_ + termsM * perModulus_);
    return highN * perArea_ + bending <= beat.tension && lowN * perArea_ - bending >= beat.compression;
}

// On each piece the peaks lie at its ends or where a derivative vanishes:
// dN/dx = n₁ + 2n₂x, dV/dx = v₁ + 2v₂x, dM/dx = m₁ + 2m₂x + 3m₃x². (dM/dx =
// V − c, the shear less the distributed couple, as beam theory has it.)
// Pieces are taken from the first end on; of equal values the first found
// stays. This runs for every bar at every step: the pieces' ends are merged
// as they are walked, not stored.
BarPeaks BarLoads::peaks(const FibreFloor& beat) const
{
    RunningPeaks out;
    const double perArea = perArea_, perModulus = perModulus_;
    Vec2 force = Vec2::Zero();
    double sum = 0.0;
    auto next = loads_.begin();
    // The pieces' ends: the bar's own (prepare) and the loads' stations, both
    // in order, merged without repeats.
    const double* fixed = fixed_.data();
    const double* const fixedEnd = fixed + fixedCount_;
    auto load = loads_.begin();
    bool started = false;
    double from = 0.0;
    while (fixed != fixedEnd || load != loads_.end()) {
        const double to = load == loads_.end() || (fixed != fixedEnd && *fixed <= load->s) ? *fixed++ : (load++)->s;
        if (!started || !(to > from)) {
            if (!started) from = to;
            started = true;
            continue;
        }
        for (; next != loads_.end() && next->s <= from; ++next) {
            force += next->force;
            sum += next->couple + next->s * next->force.dot(n_);
        }
        const Piece p = piece(0.5 * (from + to), force, sum);
        const BarStation atFrom = p.at(from), atTo = p.at(to);
        out.all(atFrom);
        // N's range and |M|'s largest on the piece, for the fibres' bounds below.
        double lowN = std::min(atFrom.axial, atTo.axial), highN = std::max(atFrom.axial, atTo.axial);
        double highM = std::max(std::abs(atFrom.moment), std::abs(atTo.moment));
        linearRootBetween(2.0 * p.n[2], p.n[1], from, to, [&](double x) {
            const double n = p.n[0] + x * (p.n[1] + x * p.n[2]);
            out.axial(x, n);
            lowN = std::min(lowN, n);
            highN = std::max(highN, n);
        });
        linearRootBetween(2.0 * p.v[2], p.v[1], from, to,
                          [&](double x) { out.shearAt(x, p.v[0] + x * (p.v[1] + x * p.v[2])); });
        rootsBetween(3.0 * p.m[3], 2.0 * p.m[2], p.m[1], from, to, [&](double x) {
            const double m = p.at(x).moment;
            out.momentAt(x, m);
            highM = std::max(highM, std::abs(m));
        });
        out.all(atTo);
        if (perArea > 0.0 && !fibresCannotBeat(p, to, lowN, highN, highM, beat)) {
            // σ = N/A ± M/Z, each a cubic on the piece like M: its values at
            // the piece's ends, and where dσ/dx = 0 between them. (±1·M/Z is
            // ±(M/Z) exactly, so both fibres share the products.)
            const double na = atFrom.axial * perArea, ma = atFrom.moment * perModulus;
            const double nb = atTo.axial * perArea, mb = atTo.moment * perModulus;
            double n[3], m[4];
            for (int i = 0; i < 3; ++i) n[i] = p.n[i] * perArea;
            for (int i = 0; i < 4; ++i) m[i] = p.m[i] * perModulus;
            for (const double side : {1.0, -1.0}) {
                const bool plus = side > 0.0;
                out.fibre(from, plus ? na + ma : na - ma);
                out.fibre(to, plus ? nb + mb : nb - mb);
                const double c0 = plus ? n[0] + m[0] : n[0] - m[0], c1 = plus ? n[1] + m[1] : n[1] - m[1];
                const double c2 = plus ? n[2] + m[2] : n[2] - m[2], c3 = side * m[3];
                rootsBetween(3.0 * c3, 2.0 * c2, c1, from, to,
                             [&](double x) { out.fibre(x, c0 + x * (c1 + x * (c2 + x * c3))); });
            }
        }
        from = to;
    }
    return {out.tension, out.compression, out.shear, out.moment, out.fibreTension, out.fibreCompression};
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
