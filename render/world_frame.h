// The map from mechanism coordinates (metres, y up) to a page (y down): a
// uniform scale about a centre, so the drawing is true to shape.
#pragma once

#include "core/model/geometry.h"

#include <QPointF>
#include <QRectF>

#include <vector>

namespace clevis::ui {

struct WorldFrame {
    Vec2 centre = Vec2::Zero();  // m, drawn at `page`
    QPointF page;
    double scale = 1.0;  // page units per metre

    QPointF map(const Vec2& p) const
    {
        return {page.x() + (p.x() - centre.x()) * scale, page.y() - (p.y() - centre.y()) * scale};
    }
    // A direction (e.g. a force) as a page vector of the given page length per unit.
    QPointF mapDirection(const Vec2& v, double pagePerUnit) const
    {
        return {v.x() * pagePerUnit, -v.y() * pagePerUnit};
    }

    // Fits `points` (with `margin` page units around them) into `area`.
    static WorldFrame fit(const std::vector<Vec2>& points, const QRectF& area, double margin);
};

}  // namespace clevis::ui
