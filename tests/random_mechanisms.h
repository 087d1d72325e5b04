// Valid planar linkages drawn at random from a seed, for testing the solver
// at scale: four-bars of every Grashof class, offset slider-cranks (driven
// by the crank or by the piston), Watt and Stephenson six-bars, five-bars
// with two drivers, chains of several loops, fans of four-bars on one crank
// (up to the 500-body limit), and a few mechanisms with a fault put in on
// purpose (a driver missing or added, a redundant link, a driver started out
// of reach), each with random dimensions, masses, springs, dampers, loads
// and drivers (constant speed, or a rise by one of the cam laws).
//
// Every mechanism is drawn assembled (each dyad's pin found from its two
// circles), so any refusal or stop comes from the mechanism's motion, not
// from the drawing. Mechanism k of seed s depends on (s, k) alone, so one
// finding can be replayed without the ones before it.
#pragma once

#include "core/model/grashof.h"
#include "core/model/mechanism.h"

#include <array>
#include <cstdint>
#include <string>

namespace clevis::test {

enum class Fault {
    None,
    DriverMissing,      // a 1-DOF linkage with no driver: under-driven
    DriverAdded,        // a second driver on a fully driven linkage
    RedundantLink,      // a parallelogram with a third parallel link: joints fix one motion twice
    StartedOutOfReach,  // a piston driver whose rise starts where the rod cannot reach
};

struct RandomMechanism {
    Mechanism mechanism;
    std::string family;  // "four-bar", "slider-crank", "Watt six-bar", … (one tally per family)
    std::string kind;    // finer, e.g. "four-bar, crank-rocker, cam-driven"
    Fault fault = Fault::None;
    // Whether its drive is known to turn it through the whole cycle: a
    // four-bar whose driven crank turns fully by Grashof's condition (not at
    // a change point), a crank-driven slider-crank whose rod is longer than
    // crank and offset together, a fan, a gentle chain. Such a mechanism
    // must be solved over the whole cycle, neither stopped nor refused.
    bool completes = false;
    std::uint64_t seed = 0;
    int index = 0;
};

RandomMechanism randomMechanism(std::uint64_t seed, int index);

// The link lengths the generator draws for a four-bar of class `cls`,
// indexed by FourBarLink, in units of the shortest link.
std::array<double, 4> randomFourBarLengths(std::uint64_t seed, GrashofClass cls);

const char* faultName(Fault fault);

}  // namespace clevis::test
