#include "render/palette.h"
#include "ui/canvas/paint/body_shapes.h"
#include "ui/canvas/sketch_painter.h"

namespace clevis::ui {
namespace {

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
        std::vector<QPointF> screen;
        for (const Vec2& at : outline) screen.push_back(c.view.toScreen(at));
        const BodyShapes::Shape& shape = c.shapes->shape(b, screen);
        const QPen halo = c.haloPen(Selection::Kind::Body, body.name, BodyShapes::edgePen().widthF());
        if (halo.style() != Qt::NoPen) p.strokePath(shape.outline, halo);
        QColor fill = palette::linkFill();
        if (outline.size() >= 3) fill.setAlpha(200);  // plates overlap the bars under them
        p.fillPath(shape.outline, fill);
        // The edge's stroke as kept: the same pixels as drawing the outline with its pen.
        p.fillPath(shape.edge, BodyShapes::edgePen().brush());
        labelBody(c, body, outline);
    }
    p.restore();
}

}  // namespace clevis::ui
