#include "render/body_outline.h"

#include "core/model/convex_hull.h"

#include <QPainterPathStroker>
#include <QPolygonF>

#include <algorithm>
#include <cmath>

namespace clevis::ui {
namespace {

// The hull of screen points: the flip of the y axis only reverses the order.
QPolygonF screenHull(const std::vector<QPointF>& pts)
{
    std::vector<Vec2> points;
    for (const QPointF& p : pts) points.emplace_back(p.x(), p.y());
    QPolygonF hull;
    for (const Vec2& p : clevis::convexHull(std::move(points))) hull << QPointF(p.x(), p.y());
    return hull;
}

// Points (nearly) on one line make a hull of no area, which Qt's path
// arithmetic cannot stroke and unite reliably: such a body is a bar between
// its two farthest points.
QPolygonF barIfFlat(const QPolygonF& hull)
{
    if (hull.size() < 3) return hull;
    double area = 0.0, longest = 0.0;
    QPointF a = hull.front(), b = hull.back();
    for (int i = 0; i < hull.size(); ++i) {
        const QPointF p = hull[i], q = hull[(i + 1) % hull.size()];
        area += p.x() * q.y() - q.x() * p.y();
        for (const QPointF& r : hull) {
            const QPointF d = r - p;
            if (QPointF::dotProduct(d, d) > longest) {
                longest = QPointF::dotProduct(d, d);
                a = p;
                b = r;
            }
        }
    }
    if (std::abs(area) / 2 > 1e-3 * longest) return hull;
    QPolygonF bar;
    bar << a << b;
    return bar;
}

QPainterPath block(const SlideBlock& b, double halfWidth)
{
    const QPointF u = b.axis, n(-b.axis.y(), b.axis.x());
    const double along = 1.7 * halfWidth, across = 1.25 * halfWidth;
    QPolygonF r;
    r << b.at + u * along + n * across << b.at - u * along + n * across << b.at - u * along - n * across
      << b.at + u * along - n * across;
    QPainterPath path;
    path.addPolygon(r);
    path.closeSubpath();
    return path;
}

}  // namespace

QPainterPath bodyOutlinePath(const std::vector<QPointF>& points, double halfWidth,
                             const std::vector<SlideBlock>& blocks)
{
    QPainterPath outline;
    outline.setFillRule(Qt::WindingFill);
    if (!points.empty()) {
        const QPolygonF hull = barIfFlat(screenHull(points));
        QPainterPath core;
        if (hull.size() == 1) core.addEllipse(hull.front(), halfWidth, halfWidth);
        else {
            core.addPolygon(hull);
            if (hull.size() > 2) core.closeSubpath();
            QPainterPathStroker stroker;
            stroker.setWidth(2 * halfWidth);
            stroker.setCapStyle(Qt::RoundCap);
            stroker.setJoinStyle(Qt::RoundJoin);
            core = stroker.createStroke(core).united(hull.size() > 2 ? core : QPainterPath());
        }
        outline = core;
    }
    for (const auto& b : blocks) outline = outline.united(block(b, halfWidth));
    return outline.simplified();
}

}  // namespace clevis::ui
