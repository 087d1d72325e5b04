// The bearing loads in the review report's sizing chapter: the polar diagram
// of every pin joint over the cycle, two to a row.
#pragma once

#include "render/bearing_polar_diagram.h"
#include "render/page_flow.h"
#include "render/review_report.h"

#include <functional>
#include <memory>
#include <vector>

namespace clevis::ui {

using BearingPolarDiagrams = std::vector<std::unique_ptr<BearingPolarDiagram>>;

// The diagram of every pin, its labels placed; takes no painter, so it can
// be worked out on another thread. Each pin is shown in one frame: its
// moving body's where the other is the frame (the frame's view is the global
// reaction, already plotted), else its second body's, on which its reaction
// acts.
BearingPolarDiagrams bearingPolarDiagrams(const ReviewReportInput& in);

// The diagrams laid down two to a row; `advance` is told of each row and may cancel.
bool bearingPolarPages(PageFlow& f, const BearingPolarDiagrams& diagrams, const std::function<bool()>& advance);

}  // namespace clevis::ui
