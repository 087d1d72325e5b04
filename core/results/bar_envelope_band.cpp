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
    return std::move(barEnvelopeBands(m, r, {bar}, stations).front());
}

std::vector<std::vector<BandStation>> barEnvelopeBands(const CompiledMechanism& m, const CycleResult& r,
                                                       const std::vector<BarModel>& bars, int stations)
{
    if (stations < 2)
        throw std::invalid_argument("an envelope band needs at least 2 stations (both ends), not " +
                                    std::to_string(stations));
    std::vector<std::vector<BandStation>> bands;
    if (r.steps.empty()) {
        for (const BarModel& bar : bars) bands.push_back(bandStations(bar, {}, stations));
        return bands;
    }
    // One pass for the piece ends of every bar at every step, which fix the
    // stations; a second for the values there. Each pass poses the
    // mechanism once per step for all the bars, and finds the loads on a bar
    // afresh (cheaper than keeping them for every step).
    BodyLoads acting(m, r.steps.front());
    std::vector<Eigen::Matrix2d> rotations;
    std::vector<BodyLoad> onBar;
    std::vector<std::vector<double>> all(bars.size());
    for (const StepResult& step : r.steps) {
        const Pose q(step.q, rotations);
        acting.step(step, q);
        for (std::size_t b = 0; b < bars.size(); ++b) {
            acting.on(bars[b].body, onBar);
            const std::vector<double> ends = pieceEnds(bars[b], q, onBar);
            all[b].insert(all[b].end(), ends.begin(), ends.end());
        }
    }
    for (std::size_t b = 0; b < bars.size(); ++b) {
        mergeClose(all[b], kSameStation * bars[b].length);
        bands.push_back(bandStations(bars[b], all[b], stations));
    }

    BarLoads along;
    for (std::size_t k = 0; k < r.steps.size(); ++k) {
        const Pose q(r.steps[k].q, rotations);
        acting.step(r.steps[k], q);
        for (std::size_t b = 0; b < bars.size(); ++b) {
            acting.on(bars[b].body, onBar);
            const std::vector<double> ends = pieceEnds(bars[b], q, onBar);
            along.set(m, bars[b], r.steps[k], q, onBar);
            const double tol = kSameStation * bars[b].length;
            for (BandStation& st : bands[b]) widen(st.most, st.least, valueAt(along, ends, st, tol), k == 0);
        }
    }
    return bands;
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
