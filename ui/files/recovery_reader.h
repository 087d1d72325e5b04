// Reads a recovery file. Unlike a saved file, it may hold pins not yet
// joined to two parts (a drawing in progress, or one whose link was just
// deleted): the file format writes the missing part as "", which a normal
// load refuses, so those come back as they were instead of being lost.
#pragma once

#include "core/model/mechanism.h"

#include <string>

namespace clevis::ui {

// Throws ModelError, with the normal loader's message, when the file is damaged.
Mechanism readRecoveryFile(const std::string& path);

}  // namespace clevis::ui
