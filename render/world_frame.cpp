#include "render/world_frame.h"

#include <algorithm>

namespace clevis::ui {

WorldFrame WorldFrame::fit(const std::vector<Vec2>& points, const QRectF& area, double margin)
{
    WorldFrame f;
    f.page = area.center();
    if (points.empty()) return f;
    Vec2 lo = points.front(), hi = points.front();
    for (const Vec2& p : points) {
        lo = lo.cwiseMin(p);
        hi = hi.cwiseMax(p);
    }
    f.centre = 0.5 * (lo + hi);
    const double w = std::max(area.width() - 2 * margin, 1.0), h = std::max(area.height() - 2 * margin, 1.0);
    const Vec2 span = (hi - lo).cwiseMax(1e-9);
    f.scale = std::min(w / span.x(), h / span.y());
    // A single point (or a line) still needs a sensible size: 0.1 m across the area.
    if (span.maxCoeff() < 1e-6) f.scale = std::min(w, h) / 0.1;
    return f;
}

}  // namespace clevis::ui
