// clevis-draw: the program that runs the drawing commands (fbd, bar-diagram,
// bearing-polar, report). It links Qt; clevis-cli does not, so that its
// analysis starts without loading Qt's libraries (docs: DEVELOPERS.md,
// "Why clevis-cli and clevis-draw"). clevis-cli hands a drawing command over
// by replacing itself with clevis-draw, installed in the same folder.
#pragma once

#include <ostream>

namespace clevis::cli {

inline constexpr const char* kDrawingProgram = "clevis-draw";

// Replaces this process with clevis-draw beside it, run with the same
// arguments (`argv` as main got it). Returns only if that cannot be done: it
// then writes why, naming the program's path, to `err` and returns the exit
// code (1).
int handOverToDrawingProgram(char** argv, std::ostream& err);

}  // namespace clevis::cli
