// The bearing loads in the review report's sizing chapter: the polar diagram
// of every pin joint over the cycle, two to a row.
#pragma once

#include "render/page_flow.h"
#include "render/review_report.h"

namespace clevis::ui {

// Each pin is shown in one frame: its moving body's where the other is the
// frame (the frame's view is the global reaction, already plotted), else its
// second body's, on which its reaction acts.
void bearingPolarPages(PageFlow& f, const ReviewReportInput& in);

}  // namespace clevis::ui
