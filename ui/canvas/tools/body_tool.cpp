#include "ui/canvas/tools/body_tool.h"

#include "ui/canvas/tools/rubber_band.h"
#include "ui/document/mechanism_edits.h"

#include <QObject>

namespace clevis::ui {

QString BodyTool::hint() const
{
    if (shape_ == Shape::Bar)
        return points_.empty() ? QObject::tr("Link: click the first pin (or an empty spot for a new pin).")
                               : QObject::tr("Link: click the second pin. Esc cancels.");
    return points_.size() < 3 ? QObject::tr("Plate: click its pins one after another (%1 so far).").arg(points_.size())
                              : QObject::tr("Plate: click more pins, or press Enter to close it.");
}

std::optional<Vec2> BodyTool::strokeStart() const
{
    if (points_.empty()) return std::nullopt;
    return points_.back().point;
}

void BodyTool::press(const Pointer& p)
{
    if (shape_ == Shape::Plate && points_.size() >= 3 && (p.snap.point - points_.front().point).norm() < 1e-12) {
        commit();
        return;
    }
    for (const auto& q : points_)
        if ((q.point - p.snap.point).norm() < 1e-12) return;  // the same pin twice makes no body
    points_.push_back(p.snap);
    if (shape_ == Shape::Bar && points_.size() == 2) commit();
    host_.refresh();
}

void BodyTool::move(const Pointer& p)
{
    hover_ = p.snap;
    host_.refresh();
}

void BodyTool::finish()
{
    if (shape_ == Shape::Plate && points_.size() >= 3) commit();
}

bool BodyTool::cancel()
{
    if (points_.empty()) return false;
    points_.clear();
    host_.refresh();
    return true;
}

void BodyTool::commit()
{
    const std::vector<SnapResult> points = std::move(points_);
    points_.clear();
    tryEdit([&](Mechanism& m, QString&) {
        std::vector<std::string> joints;
        for (const auto& p : points)
            joints.push_back(p.kind == SnapResult::Kind::Pin ? m.joints[p.joint].name : edits::addPin(m, p.point));
        edits::addBody(m, joints);
        return shape_ == Shape::Bar ? QObject::tr("Add link") : QObject::tr("Add plate");
    });
    host_.refresh();
}

void BodyTool::paintPreview(QPainter& p) const
{
    const ViewTransform& view = host_.view();
    for (std::size_t i = 1; i < points_.size(); ++i) paintRubberBand(p, view, points_[i - 1].point, points_[i].point);
    if (hover_) {
        if (!points_.empty()) paintRubberBand(p, view, points_.back().point, hover_->point);
        paintSnapMark(p, view, hover_->point);
    }
}

}  // namespace clevis::ui
