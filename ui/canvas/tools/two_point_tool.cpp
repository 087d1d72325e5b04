#include "ui/canvas/tools/two_point_tool.h"

#include "ui/canvas/hit_test.h"
#include "ui/canvas/tools/rubber_band.h"

namespace clevis::ui {

std::optional<Vec2> TwoPointTool::strokeStart() const
{
    if (!first_) return std::nullopt;
    return first_->snap.point;
}

void TwoPointTool::press(const Pointer& p)
{
    const ClickedPoint here{p.snap, bodyAt(mechanism(), host_.view(), p.screen)};
    if (!first_) {
        first_ = here;
        host_.refresh();
        return;
    }
    if ((here.snap.point - first_->snap.point).norm() < 1e-12) return;  // a second click needs a second point
    const ClickedPoint first = *first_;
    first_.reset();
    host_.refresh();
    tryEdit([&](Mechanism& m, QString& problem) { return edit_(m, first, here, problem); });
}

void TwoPointTool::move(const Pointer& p)
{
    hover_ = p.snap.point;
    host_.refresh();
}

bool TwoPointTool::cancel()
{
    if (!first_) return false;
    first_.reset();
    host_.refresh();
    return true;
}

void TwoPointTool::paintPreview(QPainter& p) const
{
    if (first_ && hover_) paintRubberBand(p, host_.view(), first_->snap.point, *hover_);
    if (hover_) paintSnapMark(p, host_.view(), *hover_);
}

}  // namespace clevis::ui
