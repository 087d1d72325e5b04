// A crank–rocker four-bar built as the drawing tools build it: two ground
// pins, two pins, three links and a motor at the first ground pin.
#pragma once

#include "ui/document/mechanism_edits.h"

inline clevis::Mechanism drawnFourBar()
{
    using namespace clevis::ui;
    clevis::Mechanism m;
    const std::string o1 = edits::addGroundPin(m, {0.0, 0.0});
    const std::string o2 = edits::addGroundPin(m, {0.2, 0.0});
    const std::string a = edits::addPin(m, {0.03, 0.04});
    const std::string b = edits::addPin(m, {0.17, 0.12});
    edits::addBody(m, {o1, a});
    edits::addBody(m, {a, b});
    edits::addBody(m, {b, o2});
    edits::addRotaryMotor(m, o1);
    return m;
}
