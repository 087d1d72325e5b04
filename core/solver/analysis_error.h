// A mechanism that is well formed but cannot be analysed as drawn (wrong
// number of drivers, redundant joints, does not assemble). `items` names the
// offending bodies, joints or drivers so a view can highlight them.
#pragma once

#include <stdexcept>
#include <string>
#include <vector>

namespace clevis {

class AnalysisError : public std::runtime_error {
public:
    AnalysisError(const std::string& message, std::vector<std::string> items)
        : std::runtime_error(message), items_(std::move(items))
    {}
    const std::vector<std::string>& items() const { return items_; }

private:
    std::vector<std::string> items_;
};

}  // namespace clevis
