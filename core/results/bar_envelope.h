// The envelope of a bar's internal loads over the cycle: the largest tension
// and compression, and the largest |V| and |M|, over every station and every
// solved step, each with the station and the step where it occurs.
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
    EnvelopePeak tension;      // largest N > 0
    EnvelopePeak compression;  // most negative N
    EnvelopePeak shear;        // largest |V|
    EnvelopePeak moment;       // largest |M|
};

// One envelope per bar, in the order of `bars`, over `stations` stations per
// bar (as internalLoads) at every step of `r`: one pass over the cycle, the
// loads on all bodies gathered once per step.
std::vector<BarEnvelope> barEnvelopes(const CompiledMechanism& m, const CycleResult& r,
                                      const std::vector<BarModel>& bars, int stations);

}  // namespace clevis
