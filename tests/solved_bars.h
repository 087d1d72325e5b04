// A mechanism solved over its cycle with its bars found, for the tests of
// internal loads and sizing.
#pragma once

#include "core/results/bar_model.h"
#include "core/solver/cycle_sweep.h"

#include <stdexcept>
#include <string>

namespace clevis::test {

struct Solved {
    Mechanism doc;
    CompiledMechanism m;
    CycleResult r;
    BarList bars;
};

inline Solved solve(const Mechanism& doc)
{
    Solved s{doc, compile(doc), {}, {}};
    s.r = sweepCycle(s.m);
    s.bars = findBars(s.doc, s.m);
    return s;
}

// The index in s.bars.bars of the bar called `name`.
inline std::size_t barIndex(const Solved& s, const std::string& name)
{
    for (std::size_t b = 0; b < s.bars.bars.size(); ++b)
        if (s.bars.bars[b].bodyName == name) return b;
    throw std::runtime_error("no bar " + name);
}

}  // namespace clevis::test
