// Errors in a mechanism description, located by a JSON path such as
// `joints[2].bodies[1]` (or by line and column for malformed JSON).
#pragma once

#include <stdexcept>
#include <string>

namespace clevis {

class ModelError : public std::runtime_error {
public:
    ModelError(std::string path, const std::string& message)
        : std::runtime_error(path.empty() ? message : path + ": " + message), path_(std::move(path))
    {}
    const std::string& path() const { return path_; }

private:
    std::string path_;
};

}  // namespace clevis
