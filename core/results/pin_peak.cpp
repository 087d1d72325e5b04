#include "core/results/pin_peak.h"

namespace clevis {

std::optional<int> pinPeakStep(const CycleSummary& s, const std::string& name)
{
    for (const auto* pins : {&s.joints, &s.cylinderEnds})
        for (const auto& p : *pins)
            if (p.name == name) return p.peak.step;
    return std::nullopt;
}

std::vector<std::string> pinNames(const CycleSummary& s)
{
    std::vector<std::string> names;
    for (const auto* pins : {&s.joints, &s.cylinderEnds})
        for (const auto& p : *pins) names.push_back(p.name);
    return names;
}

}  // namespace clevis
