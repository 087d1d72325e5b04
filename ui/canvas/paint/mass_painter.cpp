#include "render/drawing_symbols.h"
#include "render/palette.h"
#include "ui/canvas/sketch_painter.h"

namespace clevis::ui {

void paintMasses(PaintContext& c)
{
    QPainter& p = c.painter;
    p.save();
    for (const auto& body : c.mechanism.bodies) {
        if (body.cg && body.mass && !body.section)
            drawCentreOfMass(p, c.view.toScreen(*body.cg), 5.5, palette::ink(), palette::paper(), 1.2);
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
