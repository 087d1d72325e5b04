#include "ui/canvas/tool_icons.h"

#include "render/drawing_symbols.h"
#include "render/palette.h"
#include "ui/canvas/sketch_painter.h"

#include <QPainterPath>
#include <QPixmap>

namespace clevis::ui {
namespace {

void drawRing(QPainter& p, const QPointF& at)
{
    p.setPen(QPen(palette::ink(), 1.4));
    p.setBrush(palette::paper());
    p.drawEllipse(at, 2.6, 2.6);
}

void drawBar(QPainter& p, const QPointF& a, const QPointF& b)
{
    p.setPen(QPen(palette::link(), 7, Qt::SolidLine, Qt::RoundCap));
    p.drawLine(a, b);
    p.setPen(QPen(palette::linkFill(), 4.4, Qt::SolidLine, Qt::RoundCap));
    p.drawLine(a, b);
}

void drawIcon(QPainter& p, const QString& name)
{
    p.setBrush(Qt::NoBrush);
    if (name == "Select") {
        QPolygonF cursor;
        cursor << QPointF(7, 4) << QPointF(7, 19) << QPointF(11, 15) << QPointF(14, 21) << QPointF(16, 20)
               << QPointF(13, 14) << QPointF(18, 14);
        p.setPen(QPen(palette::ink(), 1.3));
        p.setBrush(palette::paper());
        p.drawPolygon(cursor);
    } else if (name == "Ground pin") {
        p.setPen(QPen(palette::groundHatch(), 1.4));
        p.drawLine(QPointF(4, 17), QPointF(20, 17));
        for (double x = 6; x <= 20; x += 4) p.drawLine(QPointF(x, 17), QPointF(x - 3, 21));
        p.drawLine(QPointF(8, 17), QPointF(8, 10));
        p.drawLine(QPointF(16, 17), QPointF(16, 10));
        p.drawArc(QRectF(8, 6, 8, 8), 0, 180 * 16);
        drawRing(p, {12, 10});
    } else if (name == "Pin") {
        drawRing(p, {12, 12});
        p.setPen(QPen(palette::ink(), 1.0, Qt::DotLine));
        p.drawEllipse(QPointF(12, 12), 7, 7);
    } else if (name == "Link") {
        drawBar(p, {6, 17}, {18, 7});
        drawRing(p, {6, 17});
        drawRing(p, {18, 7});
    } else if (name == "Plate") {
        QPolygonF tri;
        tri << QPointF(5, 18) << QPointF(19, 18) << QPointF(12, 6);
        p.setPen(QPen(palette::link(), 1.6, Qt::SolidLine, Qt::RoundCap, Qt::RoundJoin));
        p.setBrush(palette::linkFill());
        p.drawPolygon(tri);
        for (const auto& c : tri) drawRing(p, c);
    } else if (name == "Slider") {
        p.setPen(QPen(palette::groundHatch(), 1.2));
        p.drawLine(QPointF(2, 17), QPointF(22, 17));
        p.drawLine(QPointF(2, 7), QPointF(22, 7));
        p.setPen(QPen(palette::link(), 1.4));
        p.setBrush(palette::linkFill());
        p.drawRoundedRect(QRectF(7, 8.5, 10, 7), 1.5, 1.5);
    } else if (name == "Pin in slot") {
        p.setPen(QPen(palette::link(), 1.4));
        p.drawRoundedRect(QRectF(3, 8.5, 18, 7), 3.5, 3.5);
        drawRing(p, {15, 12});
    } else if (name == "Motor") {
        drawArcArrow(p, {12, 12}, 7.5, 120, 250, sketchArrow(QPen(palette::driver(), 1.8)));
        drawRing(p, {12, 12});
    } else if (name == "Cylinder") {
        p.setPen(QPen(palette::driver(), 2.0));
        p.drawLine(QPointF(12, 12), QPointF(21, 12));
        p.setPen(QPen(palette::driver(), 1.4));
        p.setBrush(palette::paper());
        p.drawRoundedRect(QRectF(3, 8.5, 11, 7), 1.5, 1.5);
    } else if (name == "Force") {
        drawArrow(p, {5, 19}, {19, 5}, sketchArrow(QPen(palette::load(), 2.0)));
    } else if (name == "Torque") {
        drawArcArrow(p, {12, 12}, 7.5, -60, 250, sketchArrow(QPen(palette::load(), 1.8)));
    } else if (name == "Spring") {
        p.setPen(QPen(palette::spring(), 1.5));
        drawZigZag(p, {3, 12}, {21, 12});
    } else if (name == "Damper") {
        p.setPen(QPen(palette::spring(), 1.5));
        p.drawLine(QPointF(3, 12), QPointF(10, 12));
        p.drawPolyline(QPolygonF() << QPointF(16, 7) << QPointF(9, 7) << QPointF(9, 17) << QPointF(16, 17));
        p.drawLine(QPointF(13, 9), QPointF(13, 15));
        p.drawLine(QPointF(13, 12), QPointF(21, 12));
    } else if (name == "Point mass") {
        p.setPen(QPen(palette::ink(), 1.2));
        p.setBrush(palette::ink());
        p.drawRect(QRectF(8, 8, 8, 8));
    }
}

}  // namespace

QIcon toolIcon(const QString& toolName)
{
    QIcon icon;
    for (int scale : {1, 2, 3}) {
        QPixmap pm(24 * scale, 24 * scale);
        pm.setDevicePixelRatio(scale);
        pm.fill(Qt::transparent);
        QPainter p(&pm);
        p.setRenderHint(QPainter::Antialiasing);
        drawIcon(p, toolName);
        p.end();
        icon.addPixmap(pm);
    }
    return icon;
}

}  // namespace clevis::ui
