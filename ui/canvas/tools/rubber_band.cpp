#include "ui/canvas/tools/rubber_band.h"

#include "render/palette.h"
#include "ui/canvas/sketch_painter.h"
#include "ui/document/sketch_geometry.h"
#include "ui/shell/display_units.h"

namespace clevis::ui {

void paintRubberBand(QPainter& p, const ViewTransform& view, const Vec2& from, const Vec2& to)
{
    const QPointF a = view.toScreen(from), b = view.toScreen(to);
    p.save();
    p.setPen(QPen(palette::ink(), 1.2, Qt::DashLine));
    p.drawLine(a, b);
    const QString text = QStringLiteral("%1  at %2°")
                             .arg(DisplayUnits::instance().formatLength((to - from).norm()))
                             .arg(angleDeg(from, to), 0, 'f', 1);
    drawLabel(p, b + QPointF(12, -12), text, palette::ink());
    p.restore();
}

void paintSnapMark(QPainter& p, const ViewTransform& view, const Vec2& at)
{
    const QPointF s = view.toScreen(at);
    p.save();
    p.setPen(QPen(palette::ink(), 1.0));
    p.setBrush(Qt::NoBrush);
    p.drawRect(QRectF(s.x() - 6, s.y() - 6, 12, 12));
    p.restore();
}

}  // namespace clevis::ui
