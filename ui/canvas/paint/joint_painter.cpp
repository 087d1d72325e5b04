#include "render/palette.h"
#include "ui/canvas/sketch_painter.h"
#include "ui/canvas/sketch_style.h"

#include <QPainterPath>
#include <QtMath>

namespace clevis::ui {
namespace {

bool open(const Joint& j) { return j.bodies[0].empty() || j.bodies[1].empty(); }

// Ground under a pin: a clevis bracket (two cheeks around the pin) standing
// on a hatched base.
void drawGroundBracket(QPainter& p, const QPointF& at)
{
    const double half = style::kGroundWidth / 2, drop = 15.0;
    QPainterPath bracket;
    bracket.moveTo(at + QPointF(-8, drop));
    bracket.lineTo(at + QPointF(-8, 0));
    bracket.arcTo(QRectF(at.x() - 8, at.y() - 8, 16, 16), 180, -180);
    bracket.lineTo(at + QPointF(8, drop));
    p.setPen(QPen(palette::groundHatch(), 1.6));
    p.setBrush(palette::paper());
    p.drawPath(bracket);
    p.setPen(QPen(palette::groundHatch(), 2.2, Qt::SolidLine, Qt::FlatCap));
    p.drawLine(at + QPointF(-half, drop), at + QPointF(half, drop));
    p.setPen(QPen(palette::groundHatch(), 1.0));
    for (double x = -half + 3; x <= half; x += 6) p.drawLine(at + QPointF(x, drop), at + QPointF(x - 6, drop + 6));
}

// A rail along the axis, hatched on one side when it is the frame's.
void drawRail(QPainter& p, const QPointF& at, double axisDeg, bool ground, double length)
{
    p.save();
    p.translate(at);
    p.rotate(-axisDeg);  // screen y points down
    const double gap = style::kBlockSize / 2 + 1.5;
    p.setPen(QPen(ground ? palette::groundHatch() : palette::link(), 1.6));
    p.drawLine(QPointF(-length, gap), QPointF(length, gap));
    p.drawLine(QPointF(-length, -gap), QPointF(length, -gap));
    if (ground) {
        p.setPen(QPen(palette::groundHatch(), 1.0));
        for (double x = -length + 3; x <= length; x += 6) p.drawLine(QPointF(x, gap), QPointF(x - 6, gap + 6));
    }
    p.restore();
}

void drawBlock(QPainter& p, const QPointF& at, double axisDeg)
{
    p.save();
    p.translate(at);
    p.rotate(-axisDeg);
    const double s = style::kBlockSize;
    p.setBrush(palette::linkFill());
    p.setPen(QPen(palette::link(), 1.6));
    p.drawRoundedRect(QRectF(-s * 0.75, -s / 2, s * 1.5, s), 3, 3);
    p.restore();
}

void drawSlot(QPainter& p, const QPointF& at, double axisDeg, bool ground)
{
    p.save();
    p.translate(at);
    p.rotate(-axisDeg);
    p.setBrush(palette::paper());
    p.setPen(QPen(ground ? palette::groundHatch() : palette::link(), 1.6));
    p.drawRoundedRect(QRectF(-30, -6, 60, 12), 6, 6);
    p.restore();
}

void drawPinRing(QPainter& p, const QPointF& at, bool isOpen)
{
    p.setBrush(palette::paper());
    // A pin still missing a body is dashed: it is drawn but not yet a joint.
    p.setPen(QPen(palette::ink(), 1.6, isOpen ? Qt::DotLine : Qt::SolidLine));
    p.drawEllipse(at, style::kPinRadius, style::kPinRadius);
}

}  // namespace

void paintJoints(PaintContext& c)
{
    QPainter& p = c.painter;
    p.save();
    for (const auto& j : c.mechanism.joints) {
        const QPointF at = c.view.toScreen(j.at);
        const bool ground = j.bodies[0] == kGroundName;
        p.setPen(c.haloPen(Selection::Kind::Joint, j.name, 2 * style::kPinRadius));
        p.setBrush(Qt::NoBrush);
        p.drawPoint(at);
        switch (j.type) {
        case JointType::Pin:
            if (ground) drawGroundBracket(p, at);
            drawPinRing(p, at, open(j));
            break;
        case JointType::Slider:
            drawRail(p, at, j.axisDeg, ground, 70.0);
            drawBlock(p, at, j.axisDeg);
            break;
        case JointType::PinInSlot:
            drawSlot(p, at, j.axisDeg, ground);
            drawPinRing(p, at, open(j));
            break;
        }
        if (j.type != JointType::Slider)
            drawLabel(p, at + QPointF(8, -8), QString::fromStdString(j.name), palette::ink());
    }
    p.restore();
}

}  // namespace clevis::ui
