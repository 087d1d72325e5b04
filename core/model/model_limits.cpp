#include "core/model/model_limits.h"

namespace clevis {
namespace {

std::string figure(long long n) { return std::to_string(n); }

}  // namespace

std::optional<LimitExceeded> exceededLimit(const ModelSize& s)
{
    if (s.bodies > kMaxBodies)
        return LimitExceeded{LimitKind::Bodies, figure(s.bodies) + " moving bodies is more than the " +
                                                    figure(kMaxBodies) + " this program analyses"};
    if (s.joints + s.drivers > kMaxJoints)
        return LimitExceeded{LimitKind::Joints, figure(s.joints + s.drivers) + " joints and drivers is more than the " +
                                                    figure(kMaxJoints) + " this program analyses"};
    if (s.loads > kMaxLoads)
        return LimitExceeded{LimitKind::Loads, figure(s.loads) + " loads is more than the " + figure(kMaxLoads) +
                                                   " this program analyses"};
    if (s.steps > kMaxSteps)
        return LimitExceeded{LimitKind::Steps, figure(s.steps) + " steps is more than the " + figure(kMaxSteps) +
                                                   " this program analyses"};
    const long long bodySteps = (long long)(s.bodies) * (s.steps + 1);
    if (bodySteps > kMaxBodySteps)
        return LimitExceeded{LimitKind::Steps, figure(s.steps) + " steps of " + figure(s.bodies) + " moving bodies (" +
                                                   figure(bodySteps) + " body positions) is more than the " +
                                                   figure(kMaxBodySteps) +
                                                   " body positions this program keeps in memory; use at most " +
                                                   figure(kMaxBodySteps / (long long)s.bodies - 1) + " steps"};
    return std::nullopt;
}

}  // namespace clevis
