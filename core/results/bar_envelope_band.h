// The band the internal loads of a bar sweep over the cycle: at each station
// s along it, the largest and the smallest N, V and M that any solved step
// puts there,
//
//   N⁺(s) = max_k N_k(s),   N⁻(s) = min_k N_k(s)   (likewise V and M),
//
// k over every step of the cycle. The stations are N equally spaced ones
// (both ends included) and every piece end a step has (the bar's ends, the
// ends of its spread mass, and the foot on the line of every load and point
// mass): there N, V and M jump, so the band takes the value just before and
// just beyond each piece end as two stations at the same s. Between stations
// the band is drawn straight; at the stations it is exact. A load that moves
// along the bar (a slider on it) has a piece end at each of its positions.
#pragma once

#include "core/results/internal_loads.h"

#include <vector>

namespace clevis {

struct BandStation {
    double s = 0.0;       // m from the first end
    bool before = false;  // the value just before s (towards the first end), as BarLoads::at takes it
    BarStation most;      // the largest N, V and M at s over the cycle (each on its own)
    BarStation least;     // the smallest
};

// The band of `bar` over every step of `r`, ordered along the bar (the
// station just before a piece end first). Throws std::invalid_argument for
// fewer than two stations.
std::vector<BandStation> barEnvelopeBand(const CompiledMechanism& m, const CycleResult& r, const BarModel& bar,
                                         int stations);
// The same for several bars in one pass over the cycle (each step posed once
// for all of them), in the order given.
std::vector<std::vector<BandStation>> barEnvelopeBands(const CompiledMechanism& m, const CycleResult& r,
                                                       const std::vector<BarModel>& bars, int stations);

// One step's N, V and M at the band's stations, and its exact peaks along
// the bar (BarLoads::peaks), for drawing the step over its band.
struct BarAtStep {
    std::vector<BarStation> values;  // one per band station, in its order
    BarPeaks peaks;
};
BarAtStep barAtStep(const CompiledMechanism& m, const BarModel& bar, const StepResult& s,
                    const std::vector<BandStation>& band);

// The piece ends of `bar` at step `s` (q its pose, `loads` what acts on it
// but its weight): 0, L, the ends of the spread mass and the feet of the
// loads and point masses on the line, ascending, without repeats.
std::vector<double> pieceEnds(const BarModel& bar, const Pose& q, const std::vector<BodyLoad>& loads);

}  // namespace clevis
