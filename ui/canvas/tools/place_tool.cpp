#include "ui/canvas/tools/place_tool.h"

#include "ui/canvas/hit_test.h"
#include "ui/canvas/tools/rubber_band.h"

namespace clevis::ui {

void PlaceTool::press(const Pointer& p)
{
    const std::string body = bodyAt(mechanism(), host_.view(), p.screen);
    tryEdit([&](Mechanism& m, QString& problem) { return edit_(m, p.snap, body, problem); });
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
