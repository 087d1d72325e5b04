// Mapping between the mechanism's plane (metres, y up) and the canvas widget
// (logical pixels, y down). Zoom is pixels per metre.
#pragma once

#include "core/model/geometry.h"

#include <QPointF>
#include <QRectF>

namespace clevis::ui {

class ViewTransform {
public:
    QPointF toScreen(const Vec2& p) const { return {origin_.x() + p.x() * scale_, origin_.y() - p.y() * scale_}; }
    Vec2 toWorld(const QPointF& s) const { return {(s.x() - origin_.x()) / scale_, (origin_.y() - s.y()) / scale_}; }
    double pixels(double metres) const { return metres * scale_; }
    double metres(double pixels) const { return pixels / scale_; }
    double scale() const { return scale_; }

    void panBy(const QPointF& pixels) { origin_ += pixels; }
    // Zooms by `factor` keeping the world point under `anchor` in place.
    void zoomAt(const QPointF& anchor, double factor);
    // Shows the world box [lo, hi] centred in `viewport` with a margin.
    void fit(const Vec2& lo, const Vec2& hi, const QRectF& viewport);

    bool operator==(const ViewTransform&) const = default;

private:
    QPointF origin_{400, 300};  // screen position of the world origin
    double scale_ = 2000.0;     // px/m: 1 mm is 2 px
};

}  // namespace clevis::ui
