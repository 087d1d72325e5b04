#include "render/body_outline.h"
#include "render/palette.h"
#include "ui/canvas/sketch_painter.h"
#include "ui/canvas/sketch_style.h"

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

// A body's name sits by the middle of its outline, pushed off a bar to the
// side facing up the screen.
void labelBody(PaintContext& c, const Body& body, const std::vector<Vec2>& outline)
{
    Vec2 centre = Vec2::Zero();
    for (const auto& p : outline) centre += p / double(outline.size());
    QPointF push(0.6, -0.8);
    if (outline.size() == 2) {
        const QPointF along = c.view.toScreen(outline[1]) - c.view.toScreen(outline[0]);
        push = QPointF(along.y(), -along.x());
        if (push.y() > 0) push = -push;
    }
    c.label(QString::fromStdString(body.name), c.view.toScreen(centre), push, palette::link());
}

}  // namespace

void paintBodies(PaintContext& c)
{
    QPainter& p = c.painter;
    p.save();
    for (std::size_t b = 0; b < c.mechanism.bodies.size(); ++b) {
        const Body& body = c.mechanism.bodies[b];
        const std::vector<Vec2>& outline = c.outlines[b];
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
        labelBody(c, body, outline);
    }
    p.restore();
}

}  // namespace clevis::ui
