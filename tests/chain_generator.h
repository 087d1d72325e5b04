// A ladder of four-bar loops of any length, for timing the solver on large
// mechanisms and for checking that it still solves them.
#pragma once

#include "core/model/mechanism.h"

namespace clevis::test {

// A 1-DOF mechanism of exactly `bodies` moving bodies (at least 2): a crank
// driven at 60 rpm swings the first rocker through a coupler; each rocker
// swings the next through another coupler, all rockers pinned to ground in a
// row. With an even count the last rocker's pin runs in the slot of a final
// lever. Links are steel bars; gravity acts.
Mechanism fourBarChain(int bodies);

// A 1-DOF mechanism of 2·loops + 1 moving bodies: a hub driven at 60 rpm on a
// ground pin swings `loops` rockers, pinned to ground on a circle round it,
// each through its own coupler (every loop a crank-rocker four-bar). The hub
// is tied to every loop, so its Jacobian gathers into no narrow band.
Mechanism fourBarFan(int loops);

}  // namespace clevis::test
