// Indented JSON text for files people read and edit.
#pragma once

#include <nlohmann/json.hpp>

#include <string>

namespace clevis {

// Like dump(2), except that an array holding no objects or arrays stays on
// one line, so points and tables read as [0.3, 0.0] rather than one number
// per line. Newline-terminated.
std::string layoutJson(const nlohmann::ordered_json& value);

}  // namespace clevis
