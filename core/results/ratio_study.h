// The gear ratio study: the RMS and peak motor torque a rotary driver's
// motor needs over a range of gear ratios, from one solved cycle (the
// motion at the output does not depend on the ratio, so nothing is solved
// again), and the ratio that needs the least RMS torque.
#pragma once

#include "core/results/cycle_summary.h"

#include <string>
#include <vector>

namespace clevis {

// `count` ratios from `from` to `to` (both included), spaced evenly on a
// logarithmic scale: each is the last times the same factor.
struct RatioRange {
    double from = 1.0, to = 10.0;
    int count = 2;
};

struct RatioPoint {
    double ratio = 0;
    double torqueRms = 0;  // N·m at the motor shaft, over time
    Peak torquePeak;       // N·m, signed, largest magnitude
};

struct RatioStudy {
    int driver = -1;
    std::vector<RatioPoint> points;
    std::size_t best = 0;  // the point of least RMS torque
};

std::vector<double> studyRatios(const RatioRange& range);

// The range a study shows when none is asked for: a factor of 4 either side
// of the gearbox's own `ratio` (ratio/4 … 4·ratio), 41 ratios log spaced, so
// `ratio` itself is the middle one and neighbours differ by 16^(1/40) ≈ 7 %.
RatioRange ratioRangeAround(double ratio);

// `g` supplies the efficiency and inertias; its ratio is replaced by each of the range's.
RatioStudy ratioStudy(const CompiledMechanism& m, const CycleResult& r, const std::vector<bool>& unreliable, int driver,
                      const Gearbox& g, const RatioRange& range);

// Which motion at the output the study holds fixed, in words: the prescribed
// one, or, where a motor characteristic sets the motion, the one found at
// the gearbox's own ratio (another ratio would change the speed the motor
// gives; following it would need the motion found again at every ratio).
std::string ratioStudyMotionText(const CompiledMechanism& m, const RatioStudy& s);

}  // namespace clevis
