#include "render/drawing_symbols.h"

#include <QPainter>
#include <QPainterPath>

#include <algorithm>
#include <cmath>

namespace clevis::ui {
namespace {

constexpr double kPi = 3.14159265358979323846;

// A head pointing along `direction` (unit) with its tip at `tip`.
void drawHead(QPainter& p, QPointF tip, QPointF direction, const ArrowStyle& style)
{
    const ArrowHead& h = style.head;
    const QPointF normal(-direction.y(), direction.x());
    const QPointF base = tip - direction * h.length;
    QPainterPath head;
    head.moveTo(tip);
    head.lineTo(base + normal * h.halfWidth);
    if (h.backMiddle < 1.0) head.lineTo(tip - direction * (h.backMiddle * h.length));  // a swept back
    head.lineTo(base - normal * h.halfWidth);
    head.closeSubpath();
    const QColor colour = style.shaft.color();
    p.setPen(h.rim > 0 ? QPen(colour, h.rim) : QPen(Qt::NoPen));
    p.setBrush(colour);
    p.drawPath(head);
}

}  // namespace

ArrowStyle figureArrow(const QColor& colour, double width, bool dashed)
{
    QPen pen(colour, width, dashed ? Qt::DashLine : Qt::SolidLine, Qt::RoundCap, Qt::RoundJoin);
    if (dashed) pen.setDashPattern({4.0, 2.5});
    const double length = 4.0 * width + 5.0;
    return {pen, {length, 0.38 * length, 0.72, 0.0}, 0.7 * length};
}

ArrowStyle sketchArrow(const QPen& pen) { return {pen, {9.0, 0.42 * 9.0, 1.0, 1.0}, 9.0}; }

void drawArrow(QPainter& p, QPointF tail, QPointF tip, const ArrowStyle& style)
{
    const QPointF d = tip - tail;
    const double length = std::hypot(d.x(), d.y());
    if (length < 1e-9) return;
    const QPointF unit = d / length;
    p.save();
    p.setPen(style.shaft);
    p.setBrush(Qt::NoBrush);
    const double shaft = std::max(0.0, length - style.shaftInset);
    if (shaft > 0) p.drawLine(tail, tail + unit * shaft);
    drawHead(p, tip, unit, style);
    p.restore();
}

void drawArcArrow(QPainter& p, QPointF centre, double radius, double startDeg, double spanDeg, const ArrowStyle& style)
{
    // Page angles with y down: a point at angle a is centre + r(cos a, −sin a),
    // so increasing a turns counter-clockwise as the reader sees it.
    const auto at = [&](double a) { return centre + QPointF(radius * std::cos(a), -radius * std::sin(a)); };
    const double turn = spanDeg >= 0 ? 1.0 : -1.0;
    const double start = startDeg * kPi / 180, end = start + spanDeg * kPi / 180;
    const double shaftEnd = end - turn * style.shaftInset / radius;
    QPainterPath arc;
    const int segments = 40;
    arc.moveTo(at(start));
    for (int i = 1; i <= segments; ++i) arc.lineTo(at(start + (shaftEnd - start) * i / segments));
    p.save();
    p.setPen(style.shaft);
    p.setBrush(Qt::NoBrush);
    p.drawPath(arc);
    // The head lies along the chord under it, so it follows the curve.
    const QPointF tip = at(end), before = at(end - turn * style.head.length / radius);
    QPointF d = tip - before;
    d /= std::hypot(d.x(), d.y());
    drawHead(p, tip, d, style);
    p.restore();
}

void drawCoupleArrow(QPainter& p, QPointF centre, double radius, bool counterClockwise, const ArrowStyle& style)
{
    drawArcArrow(p, centre, radius, 45.0, counterClockwise ? 261.0 : -261.0, style);
}

void drawPin(QPainter& p, QPointF at, double radius, const QColor& ink, const QColor& paper)
{
    p.save();
    p.setPen(QPen(ink, 1.2));
    p.setBrush(paper);
    p.drawEllipse(at, radius, radius);
    p.setPen(QPen(ink, 0.6));
    p.drawLine(at - QPointF(0.55 * radius, 0), at + QPointF(0.55 * radius, 0));
    p.drawLine(at - QPointF(0, 0.55 * radius), at + QPointF(0, 0.55 * radius));
    p.restore();
}

void drawCentreOfMass(QPainter& p, QPointF at, double radius, const QColor& ink, const QColor& paper, double rim)
{
    p.save();
    const QRectF box(at.x() - radius, at.y() - radius, 2 * radius, 2 * radius);
    p.setPen(Qt::NoPen);
    p.setBrush(paper);
    p.drawEllipse(box);
    p.setBrush(ink);
    // Qt pie angles are in 1/16 degree, counter-clockwise from 3 o'clock.
    p.drawPie(box, 0, 90 * 16);
    p.drawPie(box, 180 * 16, 90 * 16);
    p.setPen(QPen(ink, rim));
    p.setBrush(Qt::NoBrush);
    p.drawEllipse(box);
    p.restore();
}

void drawGroundMark(QPainter& p, QPointF at, double size, const QColor& ink)
{
    p.save();
    p.setPen(QPen(ink, 1.0));
    const double y = at.y() + size * 0.9;
    p.drawLine(at, QPointF(at.x() - 0.6 * size, y));
    p.drawLine(at, QPointF(at.x() + 0.6 * size, y));
    p.drawLine(QPointF(at.x() - size, y), QPointF(at.x() + size, y));
    for (int i = 0; i < 5; ++i) {
        const double x = at.x() - size + (i + 0.5) * (2 * size / 5);
        p.drawLine(QPointF(x, y), QPointF(x - 0.35 * size, y + 0.35 * size));
    }
    p.restore();
}

}  // namespace clevis::ui
