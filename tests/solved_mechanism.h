// A mechanism compiled, swept over its cycle, summarised and with its bars
// found, for the tests that check the summary, the files and text made from
// it, the internal loads and the sizing.
#pragma once

#include "core/results/bar_model.h"
#include "core/results/cycle_summary.h"
#include "core/solver/compiled_mechanism.h"
#include "core/solver/cycle_sweep.h"

#include <stdexcept>
#include <string>

namespace clevis::test {

struct Solved {
    Mechanism doc;
    CompiledMechanism m;
    CycleResult r;
    CycleSummary s;
    BarList bars;
};

inline Solved solve(const Mechanism& doc)
{
    Solved out{doc, compile(doc), {}, {}, {}};
    out.r = sweepCycle(out.m);
    out.s = summarize(out.m, out.r);
    out.bars = findBars(out.doc, out.m);
    return out;
}

// The index in s.bars.bars of the bar called `name`.
inline std::size_t barIndex(const Solved& s, const std::string& name)
{
    for (std::size_t b = 0; b < s.bars.bars.size(); ++b)
        if (s.bars.bars[b].bodyName == name) return b;
    throw std::runtime_error("no bar " + name);
}

}  // namespace clevis::test
