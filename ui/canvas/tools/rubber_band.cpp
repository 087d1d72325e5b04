#include "ui/canvas/tools/rubber_band.h"

#include "render/palette.h"
#include "ui/canvas/sketch_painter.h"
#include "ui/document/sketch_geometry.h"
#include "ui/shell/display_units.h"

#include <QObject>

namespace clevis::ui {

void paintRubberBand(QPainter& p, const ViewTransform& view, const Vec2& from, const Vec2& to, bool measured)
{
    const QPointF a = view.toScreen(from), b = view.toScreen(to);
    p.save();
    p.setPen(QPen(palette::ink(), 1.2, Qt::DashLine));
    p.drawLine(a, b);
    if (!measured) {
        p.restore();
        return;
    }
    const QString text = QStringLiteral("%1  at %2°")
                             .arg(DisplayUnits::instance().formatLength((to - from).norm()))
                             .arg(angleDeg(from, to), 0, 'f', 1);
    drawLabel(p, b + QPointF(12, -12), text, palette::ink());
    p.restore();
}

void paintTypedInput(QPainter& p, const QPointF& at, const QString& length, const QString& angle,
                     const QString& lengthUnit, bool onAngle)
{
    p.save();
    QFont f = p.font();
    f.setPointSizeF(9.0);
    p.setFont(f);
    const QFontMetricsF fm(f);
    const QString parts[2] = {
        QObject::tr("Length %1 %2").arg(length.isEmpty() ? QStringLiteral("…") : length, lengthUnit),
        QObject::tr("Angle %1°").arg(angle.isEmpty() ? QStringLiteral("…") : angle)};
    const double gap = 14, pad = 5;
    const double w0 = fm.horizontalAdvance(parts[0]), w1 = fm.horizontalAdvance(parts[1]);
    const QRectF box(at + QPointF(14, 14), QSizeF(w0 + w1 + gap + 2 * pad, fm.height() + 2 * pad));
    p.setPen(QPen(palette::ink(), 1.0));
    p.setBrush(palette::paper());
    p.drawRoundedRect(box, 3, 3);
    const double base = box.top() + pad + fm.ascent();
    const double x[2] = {box.left() + pad, box.left() + pad + w0 + gap};
    for (int i = 0; i < 2; ++i) {
        p.drawText(QPointF(x[i], base), parts[i]);
        if ((i == 1) == onAngle) p.drawLine(QPointF(x[i], base + 2), QPointF(x[i] + (i ? w1 : w0), base + 2));
    }
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
