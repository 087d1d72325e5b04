#include "render/drawing_symbols.h"

#include <QPainter>
#include <QPainterPath>

#include <cmath>

namespace clevis::ui {
namespace {

constexpr double kPi = 3.14159265358979323846;

QPen strokePen(const StrokeStyle& s)
{
    QPen pen(s.colour, s.width, s.dashed ? Qt::DashLine : Qt::SolidLine, Qt::RoundCap, Qt::RoundJoin);
    if (s.dashed) pen.setDashPattern({4.0, 2.5});
    return pen;
}

// A head pointing along `direction` (unit) with its tip at `tip`.
void drawHead(QPainter& p, QPointF tip, QPointF direction, const StrokeStyle& s)
{
    const double length = 4.0 * s.width + 5.0, half = 0.38 * length;
    const QPointF normal(-direction.y(), direction.x());
    const QPointF base = tip - direction * length;
    QPainterPath head;
    head.moveTo(tip);
    head.lineTo(base + normal * half);
    head.lineTo(tip - direction * (0.72 * length));
    head.lineTo(base - normal * half);
    head.closeSubpath();
    p.setPen(Qt::NoPen);
    p.setBrush(s.colour);
    p.drawPath(head);
}

double headLength(const StrokeStyle& s) { return 4.0 * s.width + 5.0; }

}  // namespace

void drawArrow(QPainter& p, QPointF tail, QPointF head, const StrokeStyle& style)
{
    const QPointF d = head - tail;
    const double length = std::hypot(d.x(), d.y());
    if (length < 1e-9) return;
    const QPointF unit = d / length;
    p.save();
    p.setPen(strokePen(style));
    p.setBrush(Qt::NoBrush);
    // The shaft stops inside the head so the tip stays sharp.
    const double shaft = std::max(0.0, length - 0.7 * headLength(style));
    if (shaft > 0) p.drawLine(tail, tail + unit * shaft);
    drawHead(p, head, unit, style);
    p.restore();
}

void drawCoupleArrow(QPainter& p, QPointF centre, double radius, bool counterClockwise, const StrokeStyle& style)
{
    // Page angles with y down: a point at angle a is centre + r(cos a, −sin a),
    // so increasing a turns counter-clockwise as the reader sees it.
    const double start = kPi * 0.25, sweep = (counterClockwise ? 1.0 : -1.0) * kPi * 1.45;
    const auto at = [&](double a) { return centre + QPointF(radius * std::cos(a), -radius * std::sin(a)); };
    const double headAngle = headLength(style) / radius;
    const double end = start + sweep;
    QPainterPath arc;
    const int segments = 40;
    const double shaftEnd = end - (counterClockwise ? 1.0 : -1.0) * 0.7 * headAngle;
    arc.moveTo(at(start));
    for (int i = 1; i <= segments; ++i) arc.lineTo(at(start + (shaftEnd - start) * i / segments));
    p.save();
    p.setPen(strokePen(style));
    p.setBrush(Qt::NoBrush);
    p.drawPath(arc);
    // The head points along the chord from a little before the end to the end.
    const QPointF tip = at(end), before = at(end - (counterClockwise ? 1.0 : -1.0) * headAngle);
    QPointF d = tip - before;
    d /= std::hypot(d.x(), d.y());
    drawHead(p, tip, d, style);
    p.restore();
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

void drawCentreOfMass(QPainter& p, QPointF at, double radius, const QColor& ink, const QColor& paper)
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
    p.setPen(QPen(ink, 1.0));
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
