// Where a ModelError stands, told as the part it concerns: the path
// `bodies[1].section` of a file becomes Body “rocker”, section. The command
// line and the file format keep the JSON path; the desktop, where a person
// sees parts and not lists, shows this.
#pragma once

#include "core/model/mechanism.h"
#include "core/model/model_error.h"

#include <string>

namespace clevis {

// The part and field a path in `m` points at, e.g. `Pin “P3”, second body`
// for `joints[3].bodies[1]`; a path that names no part (`cycle.steps`) reads
// as its fields (`Cycle, steps`). A line and column is returned unchanged.
std::string describePath(const Mechanism& m, const std::string& path);

// The error as one sentence for the desktop: `Body “rocker”, mass: must be a
// finite number >= 0 (got -1)`. `m` is the mechanism the path refers to.
std::string describeModelError(const Mechanism& m, const ModelError& e);

}  // namespace clevis
