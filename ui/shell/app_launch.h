// What `clevis` does with its command line: open the window (optionally on a
// file), or render a screenshot and exit, or print help.
#pragma once

namespace clevis::ui {

int runDesktopApp(int argc, char** argv);

}  // namespace clevis::ui
