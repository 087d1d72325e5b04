// Sizes of the drawn parts in logical pixels: the sketch is a diagram, so
// symbols keep their size on screen whatever the zoom.
#pragma once

namespace clevis::ui::style {

inline constexpr double kBarWidth = 16.0;     // rounded slot drawn for a bar
inline constexpr double kPinRadius = 4.5;     // ring at every pin
inline constexpr double kGroundWidth = 30.0;  // hatched base under a ground pin
inline constexpr double kMotorRadius = 17.0;  // arc arrow around a driven pin
inline constexpr double kArrowLength = 46.0;  // a force arrow, whatever its magnitude
inline constexpr double kBlockSize = 22.0;    // slider block
inline constexpr double kHitPixels = 7.0;     // how near the pointer must be to pick a part

}  // namespace clevis::ui::style
