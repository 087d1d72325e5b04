// The largest analysis the core takes on: beyond these a request is refused
// with a message naming the limit, rather than running out of memory or
// time. Measured on generated four-bar chains (tests/chain_generator.h), one
// sweepCycle of 360 steps takes 0.1 s for 200 bodies (26 MB resident) and
// 0.25 s for 500 (59 MB); the results hold about 350 bytes per body and step
// (200 bodies over 10 000 steps: 0.7 GB resident), which is what the limits
// below guard.
#pragma once

#include <cstddef>
#include <optional>
#include <string>

namespace clevis {

inline constexpr std::size_t kMaxBodies = 500;
inline constexpr std::size_t kMaxJoints = 2 * kMaxBodies;  // joints and drivers together
inline constexpr std::size_t kMaxLoads = 2000;
inline constexpr int kMaxSteps = 100000;
// Bounds the memory of the results, which grows with bodies × (steps + 1):
// 40 bodies over 100 000 steps, at the limit, peaked at 1.5 GB resident.
inline constexpr long long kMaxBodySteps = 4'000'000;

enum class LimitKind { Bodies, Joints, Loads, Steps };

struct LimitExceeded {
    LimitKind kind;
    std::string message;  // names the limit and the figure asked for
};

struct ModelSize {
    std::size_t bodies = 0, joints = 0, drivers = 0, loads = 0;
    long long steps = 0;  // intervals over the cycle
};

// The first limit `size` exceeds, if any.
std::optional<LimitExceeded> exceededLimit(const ModelSize& size);

}  // namespace clevis
