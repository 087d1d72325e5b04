#include "render/drawing_symbols.h"
#include "render/palette.h"
#include "ui/canvas/sketch_painter.h"

#include <algorithm>
#include <limits>

namespace clevis::ui {
namespace {

// The nearest point of a body's outline (a segment for a bar, a convex
// polygon for a plate) to p; p itself when it lies inside the polygon.
Vec2 nearestOnOutline(const std::vector<Vec2>& outline, const Vec2& p)
{
    if (outline.size() == 1) return outline[0];
    bool inside = outline.size() >= 3;
    Vec2 best = outline[0];
    double bestDistance = std::numeric_limits<double>::infinity();
    for (std::size_t i = 0; i < outline.size(); ++i) {
        const Vec2 a = outline[i], b = outline[(i + 1) % outline.size()];
        const Vec2 ab = b - a;
        inside = inside && cross(ab, p - a) >= 0;  // the hull is counter-clockwise
        const double s = ab.squaredNorm() > 0 ? std::clamp((p - a).dot(ab) / ab.squaredNorm(), 0.0, 1.0) : 0.0;
        const Vec2 q = a + s * ab;
        if ((q - p).norm() < bestDistance) bestDistance = (q - p).norm(), best = q;
    }
    return inside ? p : best;
}

// A centre of mass typed in stays where it was typed when the pins move. When
// it has been left well away from its part, a dashed tether and a note say so.
void paintTypedCentre(PaintContext& c, const Body& body, const std::vector<Vec2>& outline)
{
    QPainter& p = c.painter;
    const QPointF at = c.view.toScreen(*body.cg);
    drawCentreOfMass(p, at, 5.5, palette::ink(), palette::paper(), 1.2);
    if (outline.empty()) return;
    const QPointF near = c.view.toScreen(nearestOnOutline(outline, *body.cg));
    const QPointF gap = at - near;
    if (std::hypot(gap.x(), gap.y()) < 24.0) return;  // px: on or beside its part
    p.setPen(QPen(palette::problem(), 1.0, Qt::DashLine));
    p.drawLine(near, at);
    c.label(QObject::tr("typed centre: does not follow the pins"), at, at - near, palette::problem());
}

}  // namespace

void paintMasses(PaintContext& c)
{
    QPainter& p = c.painter;
    p.save();
    for (std::size_t b = 0; b < c.mechanism.bodies.size(); ++b) {
        const Body& body = c.mechanism.bodies[b];
        if (body.cg && body.mass && !body.section && !body.plate) paintTypedCentre(c, body, c.outlines[b]);
        for (const auto& pm : body.pointMasses) {
            const QPointF at = c.view.toScreen(pm.at);
            p.setPen(QPen(palette::ink(), 1.2));
            p.setBrush(palette::ink());
            p.drawRect(QRectF(at.x() - 4, at.y() - 4, 8, 8));
            c.label(QStringLiteral("%1 kg").arg(pm.mass, 0, 'g', 4), at, QPointF(0.7, -0.7), palette::ink());
        }
    }
    p.restore();
}

}  // namespace clevis::ui
