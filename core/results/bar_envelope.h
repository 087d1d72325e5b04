// The envelope of a bar's internal loads over the cycle: the largest tension
// and compression, and the largest |V| and |M|, anywhere along the bar at
// every solved step, each with the station and the step where it occurs.
// Along the bar the peaks are exact: between concentrated loads N and V are
// quadratic and M cubic in s, so their extremes are found where the slopes
// vanish (BarLoads::peaks), not by sampling.
#pragma once

#include "core/results/internal_loads.h"

#include <vector>

namespace clevis {

struct EnvelopePeak {
    double value = 0.0;  // N or N·m, with its sign
    double s = 0.0;      // m from the bar's first end
    int step = -1;       // -1: never (a bar never in tension, say)
};

struct BarEnvelope {
    int body = kGround;
    EnvelopePeak tension;                         // largest N > 0
    EnvelopePeak compression;                     // most negative N
    EnvelopePeak shear;                           // largest |V|
    EnvelopePeak moment;                          // largest |M|
    EnvelopePeak fibreTension, fibreCompression;  // Pa, section bars: σ = N/A ± M/Z at the extreme fibres
};

// One envelope per bar, in the order of `bars`, over every step of `r`: one
// pass over the cycle, the loads on all bodies gathered once per step.
std::vector<BarEnvelope> barEnvelopes(const CompiledMechanism& m, const CycleResult& r,
                                      const std::vector<BarModel>& bars);

}  // namespace clevis
