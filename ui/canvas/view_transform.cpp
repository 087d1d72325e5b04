#include "ui/canvas/view_transform.h"

#include <algorithm>

namespace clevis::ui {

void ViewTransform::zoomAt(const QPointF& anchor, double factor)
{
    const Vec2 w = toWorld(anchor);
    // From a view of the solar system to one of a watch part.
    scale_ = std::clamp(scale_ * factor, 1.0, 1e6);
    const QPointF moved = toScreen(w);
    origin_ += anchor - moved;
}

void ViewTransform::fit(const Vec2& lo, const Vec2& hi, const QRectF& viewport)
{
    const double margin = 60.0;
    const double w = std::max(hi.x() - lo.x(), 1e-3), h = std::max(hi.y() - lo.y(), 1e-3);
    scale_ = std::clamp(std::min((viewport.width() - 2 * margin) / w, (viewport.height() - 2 * margin) / h), 1.0, 1e6);
    const Vec2 centre = (lo + hi) / 2;
    origin_ = viewport.center() - QPointF(centre.x() * scale_, -centre.y() * scale_);
}

}  // namespace clevis::ui
