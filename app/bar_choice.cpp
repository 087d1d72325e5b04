#include "app/bar_choice.h"

namespace clevis::cli {

std::string listOf(const std::vector<std::string>& names)
{
    std::string text;
    for (const auto& n : names) text += (text.empty() ? "" : ", ") + n;
    return text;
}

const BarModel& chooseBar(const BarList& bars, const std::string& name)
{
    for (const auto& b : bars.bars)
        if (b.bodyName == name) return b;
    for (const auto& b : bars.others)
        if (b.bodyName == name) throw Refused("body \"" + name + "\" is not a bar: " + b.reason);
    std::vector<std::string> names;
    for (const auto& b : bars.bars) names.push_back(b.bodyName);
    if (name == kGroundName) throw Refused("ground is the frame, not a bar; bars: " + listOf(names));
    throw Refused("no body \"" + name + "\" (bars: " + listOf(names) + ")");
}

}  // namespace clevis::cli
