#include "core/results/bar_envelope_band.h"

#include "core/solver/body_state.h"

#include <algorithm>
#include <stdexcept>

namespace clevis {
namespace {

// Piece ends closer than this (a fraction of the length) are one: the same
// body point's foot differs by rounding from one step to the next.
constexpr double kSameStation = 1e-9;

// The station list: the equally spaced ones and every step's piece ends,
// merged; a piece end gives a station just before it and one just beyond.
std::vector<BandStation> bandStations(const BarModel& bar, const std::vector<double>& ends, int stations)
{
    const double L = bar.length, tol = kSameStation * L;
    std::vector<BandStation> out;
    for (int k = 0; k < stations; ++k) {
        // An equally spaced station within `tol` of a piece end is that end.
        double s = k == stations - 1 ? L : L * k / (stations - 1);
        const auto near = std::lower_bound(ends.begin(), ends.end(), s - tol);
        if (near != ends.end() && *near <= s + tol) s = *near;
        out.push_back({s, false, {}, {}});
    }
    for (const double e : ends) {
        out.push_back({e, true, {}, {}});
        out.push_back({e, false, {}, {}});
    }
    std::sort(out.begin(), out.end(), [](const BandStation& a, const BandStation& b) {
        return a.s < b.s || (a.s == b.s && a.before > b.before);
    });
    out.erase(
        std::unique(out.begin(), out.end(),
                    [](const BandStation& a, const BandStation& b) { return a.s == b.s && a.before == b.before; }),
        out.end());
    return out;
}

void widen(BarStation& most, BarStation& least, const BarStation& v, bool first)
{
    if (first) {
        most = least = v;
        return;
    }
    most.axial = std::max(most.axial, v.axial);
    most.shear = std::max(most.shear, v.shear);
    most.moment = std::max(most.moment, v.moment);
    least.axial = std::min(least.axial, v.axial);
    least.shear = std::min(least.shear, v.shear);
    least.moment = std::min(least.moment, v.moment);
}

// Sorted, with ends closer than `tol` merged into the first.
void mergeClose(std::vector<double>& v, double tol)
{
    std::sort(v.begin(), v.end());
    std::vector<double> out;
    for (const double x : v)
        if (out.empty() || x > out.back() + tol) out.push_back(x);
    v = std::move(out);
}

// The value at a band station at one step: at a piece end, at this step's
// own foot of it (`ends`), so the jump falls where the load sits.
BarStation valueAt(const BarLoads& along, const std::vector<double>& ends, const BandStation& st, double tol)
{
    double x = st.s;
    const auto near = std::lower_bound(ends.begin(), ends.end(), x - tol);
    if (near != ends.end() && *near <= x + tol) x = *near;
    BarStation v = along.at(x, st.before);
    v.s = st.s;
    return v;
}

}  // namespace

// The same foot as BarLoads::set() finds for each load (the same arithmetic,
// so the same number), clamped to the bar.
std::vector<double> pieceEnds(const BarModel& bar, const Pose& q, const std::vector<BodyLoad>& loads)
{
    const double L = bar.length, snap = kSameStation * L;
    const Vec2 a = q.point(bar.ends[0].point);
    const Vec2 e = (q.point(bar.ends[1].point) - a) / L;
    std::vector<double> out{0.0, L};
    const auto foot = [&](const Vec2& p) {
        double s = std::clamp((p - a).dot(e), 0.0, L);
        if (s < snap) s = 0.0;
        if (s > L - snap) s = L;
        out.push_back(s);
    };
    for (const auto& l : loads) foot(l.at);
    for (const auto& pm : bar.pointMasses) foot(q.point(pm.second));
    out.push_back(bar.spread.from);
    out.push_back(bar.spread.to);
    std::sort(out.begin(), out.end());
    out.erase(std::unique(out.begin(), out.end()), out.end());
    return out;
}

std::vector<BandStation> barEnvelopeBand(const CompiledMechanism& m, const CycleResult& r, const BarModel& bar,
                                         int stations)
{
    if (stations < 2)
        throw std::invalid_argument("an envelope band needs at least 2 stations (both ends), not " +
                                    std::to_string(stations));
    const double tol = kSameStation * bar.length;
    // One pass for the loads on the bar at every step and their piece ends,
    // which fix the stations; a second for the values there.
    std::vector<std::vector<BodyLoad>> onBar(r.steps.size());
    if (r.steps.empty()) return bandStations(bar, {}, stations);
    BodyLoads acting(m, r.steps.front());
    std::vector<Eigen::Matrix2d> rotations;
    std::vector<std::vector<double>> ends(r.steps.size());
    std::vector<double> all;
    for (std::size_t k = 0; k < r.steps.size(); ++k) {
        const Pose q(r.steps[k].q, rotations);
        acting.step(r.steps[k], q);
        acting.on(bar.body, onBar[k]);
        ends[k] = pieceEnds(bar, q, onBar[k]);
        all.insert(all.end(), ends[k].begin(), ends[k].end());
    }
    mergeClose(all, tol);
    std::vector<BandStation> band = bandStations(bar, all, stations);

    BarLoads along;
    for (std::size_t k = 0; k < r.steps.size(); ++k) {
        along.set(m, bar, r.steps[k], Pose(r.steps[k].q, rotations), onBar[k]);
        for (BandStation& st : band) widen(st.most, st.least, valueAt(along, ends[k], st, tol), k == 0);
    }
    return band;
}

BarAtStep barAtStep(const CompiledMechanism& m, const BarModel& bar, const StepResult& s,
                    const std::vector<BandStation>& band)
{
    const Pose q(s.q);
    BodyLoads acting(m, s);
    acting.step(s, q);
    std::vector<BodyLoad> onBar;
    acting.on(bar.body, onBar);
    BarLoads along;
    along.set(m, bar, s, q, onBar);
    const std::vector<double> ends = pieceEnds(bar, q, onBar);
    BarAtStep out;
    out.values.reserve(band.size());
    for (const BandStation& st : band) out.values.push_back(valueAt(along, ends, st, kSameStation * bar.length));
    out.peaks = along.peaks();
    return out;
}

}  // namespace clevis
