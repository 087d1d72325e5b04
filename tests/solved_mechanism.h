// A mechanism compiled, swept over its cycle and summarised, for the tests
// that check the summary and the files and text made from it.
#pragma once

#include "core/results/cycle_summary.h"
#include "core/solver/compiled_mechanism.h"
#include "core/solver/cycle_sweep.h"

namespace clevis::test {

struct Solved {
    CompiledMechanism m;
    CycleResult r;
    CycleSummary s;
};

inline Solved solve(const Mechanism& mechanism)
{
    Solved out{compile(mechanism), {}, {}};
    out.r = sweepCycle(out.m);
    out.s = summarize(out.m, out.r);
    return out;
}

}  // namespace clevis::test
