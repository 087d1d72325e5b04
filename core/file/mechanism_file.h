// Mechanism files: the JSON document a user saves, edits by hand and loads
// again. The format is described in docs/file-format.md.
#pragma once

#include "core/model/mechanism.h"

#include <nlohmann/json.hpp>

#include <string>
#include <vector>

namespace clevis {

struct LoadedMechanism {
    Mechanism mechanism;
    // Keys the reader does not know, with their path, e.g.
    // `bodies[1].colour: unknown key (ignored)`.
    std::vector<std::string> warnings;
};

// Both throw ModelError naming the path of the offending value (or a line
// and column for text that is not JSON). Names are not resolved here: that
// a joint's body exists is for compile() to check.
LoadedMechanism parseMechanism(const std::string& jsonText);
LoadedMechanism loadMechanismFile(const std::string& path);

// parseMechanism(saveMechanismText(m)) reproduces m exactly, except that:
// unnamed loads receive their default names; an angle or rotary speed that
// no double in the file's unit converts to exactly (never one that came from
// degrees or rpm) comes back within one unit in the last place; and what the
// format cannot hold is not saved (mass properties beside a section, the
// axis of a pin joint, the offset of a driver between two points).
nlohmann::json mechanismToJson(const Mechanism& m);
std::string saveMechanismText(const Mechanism& m);  // 2-space indent, ends with a newline

// The file reader's rules applied to a mechanism held in memory, so that an
// editor refuses what a file would: writes `m` and reads it back. Returns the
// mechanism as its file reopens (equal to `m` but for the exceptions above);
// throws the reader's ModelError, naming the path of the first refused value.
Mechanism validateMechanism(const Mechanism& m);

}  // namespace clevis
