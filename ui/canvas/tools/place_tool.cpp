#include "ui/canvas/tools/place_tool.h"

#include "ui/canvas/hit_test.h"
#include "ui/canvas/tools/rubber_band.h"

namespace clevis::ui {

void PlaceTool::press(const Pointer& p)
{
    Mechanism trial = mechanism();
    QString problem;
    const QString text = edit_(trial, p.snap, bodyAt(mechanism(), host_.view(), p.screen), problem);
    if (!problem.isEmpty()) {
        host_.tell(problem);
        return;
    }
    doc().apply(text, [trial](Mechanism& m) { m = trial; });
}

void PlaceTool::move(const Pointer& p)
{
    hover_ = p.snap.point;
    host_.refresh();
}

void PlaceTool::paintPreview(QPainter& p) const
{
    if (hover_) paintSnapMark(p, host_.view(), *hover_);
}

}  // namespace clevis::ui
