#include "render/palette.h"
#include "ui/canvas/sketch_painter.h"

namespace clevis::ui {
namespace {

// The centre-of-mass mark: a ring with two opposite quarters filled.
void drawCentreOfMass(QPainter& p, const QPointF& at)
{
    const double r = 5.5;
    const QRectF box(at.x() - r, at.y() - r, 2 * r, 2 * r);
    p.setPen(QPen(palette::ink(), 1.2));
    p.setBrush(palette::paper());
    p.drawEllipse(box);
    p.setBrush(palette::ink());
    p.drawPie(box, 0, 90 * 16);
    p.drawPie(box, 180 * 16, 90 * 16);
}

}  // namespace

void paintMasses(PaintContext& c)
{
    QPainter& p = c.painter;
    p.save();
    for (const auto& body : c.mechanism.bodies) {
        if (body.cg && body.mass && !body.section) drawCentreOfMass(p, c.view.toScreen(*body.cg));
        for (const auto& pm : body.pointMasses) {
            const QPointF at = c.view.toScreen(pm.at);
            p.setPen(QPen(palette::ink(), 1.2));
            p.setBrush(palette::ink());
            p.drawRect(QRectF(at.x() - 4, at.y() - 4, 8, 8));
            drawLabel(p, at + QPointF(7, -6), QStringLiteral("%1 kg").arg(pm.mass, 0, 'g', 4), palette::ink());
        }
    }
    p.restore();
}

}  // namespace clevis::ui
