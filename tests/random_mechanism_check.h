// What must hold for any mechanism the solver is given: either a clear
// diagnosis naming the offending part (it cannot be assembled, cannot
// complete its cycle, locks at a toggle, has a redundant joint, too few or
// too many drivers), or a solve in which every body is in equilibrium and
// the drivers' power balances the mechanism's energy at every reliable step,
// the energy balance over the cycle closes to the documented 0.1 % (or the
// summary says it does not), no
// output (the results, JSON, CSV and summary text) holds a NaN or an
// infinity, and no ill-conditioned step goes unflagged.
#pragma once

#include "core/results/results.h"
#include "tests/random_mechanisms.h"

#include <cstddef>
#include <string>
#include <vector>

namespace clevis::test {

enum class Outcome {
    Solved,          // the whole cycle, no step flagged
    SolvedFlagged,   // the whole cycle, some steps flagged near a singular position (named)
    CannotComplete,  // stopped where the links cannot be joined (the range named)
    Refused,         // AnalysisError naming the parts
    Broken,          // anything else: an exception the solver should not throw
};

struct Verdict {
    Outcome outcome = Outcome::Broken;
    std::string diagnosis;           // the refusal's kind, e.g. "redundant joints", or the first warning's code
    std::vector<std::string> rules;  // each rule broken, with where; empty when all hold
    int steps = 0, flaggedSteps = 0;
    double relativeResidual = 0.0;  // of the cycle's energy balance (complete, unflagged cycles)
    bool energyWarned = false;      // above 0.1 %, and the summary says so
};

// Up to this many bodies each step's balanced Jacobian is also judged by its
// own singular values (whose ratio falls with the size of the mechanism, so
// is fair only for small ones): a step with σ_min/σ_max below
// kUnflaggedConditionLimit must be marked unreliable. Over the small
// mechanisms among the first 1500 of the default seed (130 590 reliable
// steps) the least ratio at a reliable step was 5.5·10⁻⁴ and at a flagged
// one 3.6·10⁻⁴: a step below 10⁻⁵ is ill-conditioned by any measure.
inline constexpr std::size_t kDenseConditionBodies = 14;
inline constexpr double kUnflaggedConditionLimit = 1e-5;

Verdict checkMechanism(const RandomMechanism& r);

// The checks of a solved cycle alone (the rules after the solve).
Verdict checkResult(const RandomMechanism& r, const CompiledMechanism& cm, const CycleResult& result);

const char* outcomeName(Outcome o);

}  // namespace clevis::test
