#include "render/palette.h"
#include "ui/canvas/sketch_painter.h"
#include "ui/canvas/snapping.h"
#include "ui/shell/display_units.h"

#include <cmath>

namespace clevis::ui {
namespace {

void drawLines(QPainter& p, const ViewTransform& view, const QRectF& area, double step, const QColor& colour,
               double width)
{
    p.setPen(QPen(colour, width));
    const Vec2 lo = view.toWorld(area.bottomLeft()), hi = view.toWorld(area.topRight());
    for (double x = std::ceil(lo.x() / step) * step; x <= hi.x(); x += step) {
        const double sx = view.toScreen({x, 0}).x();
        p.drawLine(QPointF(sx, area.top()), QPointF(sx, area.bottom()));
    }
    for (double y = std::ceil(lo.y() / step) * step; y <= hi.y(); y += step) {
        const double sy = view.toScreen({0, y}).y();
        p.drawLine(QPointF(area.left(), sy), QPointF(area.right(), sy));
    }
}

}  // namespace

void paintGrid(QPainter& p, const ViewTransform& view, const QRectF& area)
{
    p.save();
    p.fillRect(area, palette::paper());
    const double step = gridSpacing(view);
    drawLines(p, view, area, step, palette::gridMinor(), 1.0);
    drawLines(p, view, area, step * 5, palette::gridMajor(), 1.0);
    // The origin: a small cross in the major-grid colour, heavier than the lines.
    const QPointF o = view.toScreen(Vec2::Zero());
    p.setPen(QPen(palette::gridMajor(), 2.0));
    p.drawLine(o - QPointF(10, 0), o + QPointF(10, 0));
    p.drawLine(o - QPointF(0, 10), o + QPointF(0, 10));
    p.restore();
}

void paintGridScale(QPainter& p, const ViewTransform& view, const QRectF& area)
{
    const QString scale = QStringLiteral("grid %1").arg(DisplayUnits::instance().formatLength(gridSpacing(view)));
    drawLabel(p, area.bottomLeft() + QPointF(10, -10), scale, palette::groundHatch());
}

}  // namespace clevis::ui
