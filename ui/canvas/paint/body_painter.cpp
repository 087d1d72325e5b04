#include "render/body_outline.h"
#include "render/palette.h"
#include "ui/canvas/sketch_painter.h"
#include "ui/canvas/sketch_style.h"
#include "ui/document/sketch_geometry.h"

#include <QPainterPath>

namespace clevis::ui {
namespace {

// A bar is the segment between its pins widened into a rounded slot; a plate
// is its pins' hull with the same rounded margin, so pins never sit on an edge.
QPainterPath bodyShape(const std::vector<Vec2>& outline, const ViewTransform& view)
{
    std::vector<QPointF> screen;
    for (const Vec2& p : outline) screen.push_back(view.toScreen(p));
    return bodyOutlinePath(screen, style::kBarWidth / 2);
}

QPointF labelPoint(const std::vector<Vec2>& outline, const ViewTransform& view)
{
    Vec2 c = Vec2::Zero();
    for (const auto& p : outline) c += p / double(outline.size());
    return view.toScreen(c) + QPointF(style::kBarWidth * 0.6, -style::kBarWidth * 0.7);
}

}  // namespace

void paintBodies(PaintContext& c)
{
    QPainter& p = c.painter;
    p.save();
    for (const auto& body : c.mechanism.bodies) {
        const std::vector<Vec2> outline = bodyOutline(c.mechanism, body.name);
        if (outline.empty()) continue;
        const QPainterPath shape = bodyShape(outline, c.view);
        p.setBrush(Qt::NoBrush);
        p.setPen(c.haloPen(Selection::Kind::Body, body.name, 1.6));
        p.drawPath(shape);
        QColor fill = palette::linkFill();
        if (outline.size() >= 3) fill.setAlpha(200);  // plates overlap the bars under them
        p.setBrush(fill);
        p.setPen(QPen(palette::link(), 1.6));
        p.drawPath(shape);
        drawLabel(p, labelPoint(outline, c.view), QString::fromStdString(body.name), palette::link());
    }
    p.restore();
}

}  // namespace clevis::ui
